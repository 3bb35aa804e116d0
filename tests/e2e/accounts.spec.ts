import { expect, test, type Page } from '@playwright/test';

// Links are read from the local SMTP fake over its own HTTP interface (scripts/mail-fake.ts),
// never from the app's tables. scripts/test-e2e.sh exports MAIL_FAKE_URL.
const MAIL_FAKE_URL = process.env.MAIL_FAKE_URL ?? '';

type Mail = { subject: string; text: string; links: string[]; envelopeTo: string[] };

async function lastMailTo(address: string, subject: RegExp): Promise<Mail> {
  let found: Mail | undefined;
  await expect
    .poll(async () => {
      const res = await fetch(`${MAIL_FAKE_URL}/messages?to=${encodeURIComponent(address)}`);
      const list = (await res.json()) as Mail[];
      found = list.filter((m) => subject.test(m.subject)).at(-1);
      return Boolean(found);
    }, { timeout: 15_000 })
    .toBe(true);
  return found!;
}

async function signIn(page: Page, email: string, password: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

const unique = () => `${Date.now()}-${Math.floor(Math.random() * 1e6)}`;

test('the mail fake is running for these tests', async () => {
  expect(MAIL_FAKE_URL, 'scripts/test-e2e.sh sets MAIL_FAKE_URL').toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
  const res = await fetch(`${MAIL_FAKE_URL}/health`);
  expect(res.status).toBe(200);
});

test('a signed-out visitor of a workspace page is sent to sign-in and back', async ({ page }) => {
  await page.goto('/w/harbour-lane');
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fw%2Fharbour-lane/);
  await page.getByLabel('E-mail', { exact: true }).fill('viewer@harbourlane.test');
  await page.getByLabel('Password', { exact: true }).fill('harbour-view-26');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/w\/harbour-lane$/);
  await expect(page.getByRole('heading', { level: 1, name: 'Harbour Lane Motor Works' })).toBeVisible();
  await expect(page.getByText('you are viewer')).toBeVisible();
  // Viewers see no owner settings, and the seeded printer profile without a delete button.
  await expect(page.getByRole('form', { name: 'Invite someone' })).toHaveCount(0);
  const profiles = page.getByRole('list', { name: 'Workspace printer profiles' });
  await expect(profiles.getByText('Front desk laser')).toBeVisible();
  await expect(profiles.getByRole('button')).toHaveCount(0);
});

test("another member's workspace answers a real HTTP 404 and shows none of its data", async ({ page }) => {
  await signIn(page, 'viewer@harbourlane.test', 'harbour-view-26');
  await expect(page).toHaveURL(/\/account$/);
  // maren-ostby is the owner's personal workspace (db/seeds/01_demo_shop.ts); the viewer is not in it.
  const response = await page.goto('/w/maren-ostby');
  expect(response?.status()).toBe(404);
  await expect(page.getByRole('heading', { level: 1, name: 'Not found' })).toBeVisible();
  await expect(page.getByText('Maren Ostby')).toHaveCount(0);
});

test('a technician copies a printer profile kept in the browser into the workspace', async ({ page }) => {
  const name = `Bench laser ${unique()}`;
  await page.addInitScript((profileName) => {
    const profile = { id: 'local-1', name: profileName, printerScaleX: 0.987, printerScaleY: 1.004, createdAt: '2026-12-01T10:00:00.000Z' };
    window.localStorage.setItem('rimscale.printer-profiles.v1', JSON.stringify([profile]));
  }, name);
  await signIn(page, 'tech@harbourlane.test', 'harbour-tech-26');
  await expect(page).toHaveURL(/\/account$/);
  await page.goto('/w/harbour-lane');
  await page.getByRole('button', { name: `Save ${name} to the workspace` }).click();
  const profiles = page.getByRole('list', { name: 'Workspace printer profiles' });
  await expect(profiles.getByText(name, { exact: true })).toBeVisible();
  await expect(profiles.getByText('X 0.987 · Y 1.004')).toBeVisible();
  await profiles.getByRole('button', { name: `Delete ${name}` }).click();
  await expect(profiles.getByText(name, { exact: true })).toHaveCount(0);
});

test('sign-in says the same for an unknown address and a wrong password', async ({ page }) => {
  await signIn(page, `nobody-${unique()}@example.test`, 'whatever-password');
  const unknown = await page.getByRole('alert').filter({ hasText: /match/ }).textContent();
  await signIn(page, 'tech@harbourlane.test', 'not-the-password');
  const wrong = await page.getByRole('alert').filter({ hasText: /match/ }).textContent();
  expect(unknown).toBeTruthy();
  expect(wrong).toBe(unknown);
});

test('the credentials endpoint answers 429 after 5 failures for one account, and the sign-in page says why', async ({ page, request }) => {
  const email = `locked-${unique()}@example.test`;
  expect((await request.post('/api/v1/account/sign-up', { data: { name: 'Locked Out', email, password: 'the right password' } })).status()).toBe(201);
  const statuses: number[] = [];
  for (let i = 0; i < 6; i++) {
    const { csrfToken } = (await (await request.get('/api/auth/csrf')).json()) as { csrfToken: string };
    const res = await request.post('/api/auth/callback/credentials', { form: { csrfToken, email, password: 'a wrong password', json: 'true' } });
    statuses.push(res.status());
  }
  expect(statuses).toEqual([401, 401, 401, 401, 401, 429]);
  // Even the right password is refused now, with the reason on the page.
  await signIn(page, email, 'the right password');
  await expect(page.getByRole('alert').filter({ hasText: 'Too many sign-in attempts' })).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in/);
});

test('an owner invites by e-mail; the invitee signs up through the link and joins with the role', async ({ page, browser }) => {
  const invitee = `new-tech-${unique()}@example.test`;
  await signIn(page, 'owner@harbourlane.test', 'harbour-owner-26');
  await expect(page).toHaveURL(/\/account$/);
  await page.goto('/w/harbour-lane');
  const invite = page.getByRole('form', { name: 'Invite someone' });
  await invite.getByLabel('E-mail', { exact: true }).fill(invitee);
  await invite.getByLabel('Role', { exact: true }).selectOption('technician');
  await invite.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByText(`Invitation sent to ${invitee} as technician`)).toBeVisible();

  const mail = await lastMailTo(invitee, /invites you to Harbour Lane Motor Works/);
  const link = mail.links.find((l) => l.includes('/invitations/accept?token='));
  expect(link).toBeTruthy();

  // The invitee, in a browser of their own, has no account yet.
  const context = await browser.newContext();
  const guest = await context.newPage();
  await guest.goto(link!);
  await expect(guest.getByRole('heading', { name: 'Join Harbour Lane Motor Works' })).toBeVisible();
  await guest.getByRole('link', { name: 'Create an account' }).click();
  await expect(guest.getByLabel('E-mail', { exact: true })).toHaveValue(invitee);
  await guest.getByLabel('Your name', { exact: true }).fill('Invited Technician');
  await guest.getByLabel('Password', { exact: true }).fill('a long invitee password');
  await guest.getByRole('button', { name: 'Create account' }).click();
  await expect(guest).toHaveURL(/\/invitations\/accept\?token=/);
  await guest.getByRole('button', { name: 'Join Harbour Lane Motor Works' }).click();
  await expect(guest.getByText('You are now a member of Harbour Lane Motor Works as technician.')).toBeVisible();
  await guest.getByRole('link', { name: 'Open Harbour Lane Motor Works' }).click();
  await expect(guest.getByText('you are technician')).toBeVisible();
  // The header's switcher offers the shop and the new personal workspace.
  await expect(guest.getByRole('combobox', { name: 'Workspace' }).locator('option', { hasText: 'Harbour Lane Motor Works' })).toHaveCount(1);

  // The link worked once.
  await guest.goto(link!);
  await expect(guest.getByRole('alert').filter({ hasText: 'already been used' })).toBeVisible();
  await context.close();

  // The owner sees the new member.
  await page.reload();
  await expect(page.getByRole('cell', { name: invitee })).toBeVisible();

  // The only owner cannot demote themselves: after the confirm step the page says why and keeps the role.
  const ownRole = page.getByRole('combobox', { name: 'Role of Maren Ostby' });
  await ownRole.selectOption('viewer');
  await page.getByRole('button', { name: 'Change role of Maren Ostby' }).click();
  await page.getByRole('dialog', { name: 'Make Maren Ostby a viewer?' }).getByRole('button', { name: 'Make viewer' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'last owner of Harbour Lane Motor Works' })).toBeVisible();
  await expect(ownRole).toHaveValue('owner');
});

test('password reset by e-mailed link: the new password works, the old one and the used link do not', async ({ page, request, browser }) => {
  const email = `reset-${unique()}@example.test`;
  const created = await request.post('/api/v1/account/sign-up', {
    data: { name: 'Reset Tester', email, password: 'the original password' },
  });
  expect(created.status()).toBe(201);
  // A session opened with the old password somewhere else…
  const elsewhere = await browser.newContext();
  const oldSession = await elsewhere.newPage();
  await signIn(oldSession, email, 'the original password');
  await expect(oldSession).toHaveURL(/\/account$/);

  await page.goto('/reset-password');
  await page.getByLabel('E-mail', { exact: true }).fill(email);
  await page.getByRole('button', { name: 'Send the link' }).click();
  await expect(page.getByRole('status')).toContainText('If an account uses this address');

  const mail = await lastMailTo(email, /new Rimscale password/);
  const link = mail.links.find((l) => l.includes('/reset-password/confirm?token='));
  expect(link).toBeTruthy();
  await page.goto(link!);
  await page.getByLabel('New password', { exact: true }).fill('a brand new password');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await expect(page.getByText('Your password has been changed')).toBeVisible();

  await signIn(page, email, 'the original password');
  await expect(page.getByRole('alert').filter({ hasText: /match/ })).toBeVisible();
  await signIn(page, email, 'a brand new password');
  await expect(page).toHaveURL(/\/account$/);
  await expect(page.getByText(`Reset Tester · ${email}`)).toBeVisible();
  // …ends with the reset.
  await oldSession.goto('/account');
  await expect(oldSession).toHaveURL(/\/sign-in\?callbackUrl=%2Faccount/);
  await elsewhere.close();

  await page.goto(link!);
  await page.getByLabel('New password', { exact: true }).fill('yet another password');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'already been used' })).toBeVisible();
});

test('the development inbox lists the mail the fake caught', async ({ page }) => {
  await page.goto('/dev/inbox');
  await expect(page.getByRole('heading', { name: 'Development inbox' })).toBeVisible();
  await expect(page.getByText(/invites you to Harbour Lane Motor Works/).first()).toBeVisible();
});
