import { expect, test } from '@playwright/test';
import { contextAs, DEMO_SHOP_SLUG } from './support/demo-users';

const shop = `/w/${DEMO_SHOP_SLUG}`;

test('a page a viewer may not open answers 403 with what they can do instead; unknown pages answer 404', async ({ browser }) => {
  const { context, page } = await contextAs(browser, 'viewer');
  const refused = await page.goto(`${shop}/templates/new`);
  expect(refused?.status()).toBe(403); // RFC 9110 §15.5.4: understood, refused
  await expect(page.getByRole('heading', { level: 1, name: 'Your role does not open this page' })).toBeVisible();
  await expect(page.getByText(/This needs the technician role or higher in Harbour Lane Motor Works; you are viewer/)).toBeVisible();
  await page.getByRole('link', { name: 'Read and print the engine templates' }).click();
  await expect(page).toHaveURL(new RegExp(`${shop}/templates$`));

  expect((await page.goto(`${shop}/templates/999999`))?.status()).toBe(404); // RFC 9110 §15.5.5
  expect((await page.goto('/no-such-page'))?.status()).toBe(404);
  expect((await page.goto('/w/no-such-shop'))?.status()).toBe(404);
  await context.close();
});

test('a role change needs a confirm step that names it; an arrow key in the menu saves nothing', async ({ browser }) => {
  const { context, page } = await contextAs(browser, 'owner');
  const writes: string[] = [];
  page.on('request', (request) => {
    if (request.method() !== 'GET' && request.url().includes('/members/')) writes.push(`${request.method()} ${request.url()}`);
  });
  const menu = page.getByRole('combobox', { name: 'Role of Ada Brennock' });
  await expect(menu).toHaveValue('viewer');
  await menu.focus();
  await page.keyboard.press('ArrowDown');
  await expect(menu).not.toHaveValue('viewer');
  await expect(page.getByRole('button', { name: 'Change role of Ada Brennock' })).toBeVisible();
  expect(writes).toEqual([]);

  // Asking, then cancelling, changes nothing.
  await menu.selectOption('technician');
  await page.getByRole('button', { name: 'Change role of Ada Brennock' }).click();
  const dialog = page.getByRole('dialog', { name: 'Make Ada Brennock a technician?' });
  await expect(dialog).toContainText('Ada Brennock is a viewer now');
  await expect(dialog.getByRole('button', { name: 'Cancel' })).toBeFocused();
  await page.keyboard.press('Escape');
  await expect(dialog).toBeHidden();
  expect(writes).toEqual([]);
  await page.reload();
  await expect(menu).toHaveValue('viewer');

  // Confirmed, it saves; and back again, so the demo viewer stays a viewer for other tests.
  for (const [role, article] of [['technician', 'a'], ['viewer', 'a']] as const) {
    await menu.selectOption(role);
    await page.getByRole('button', { name: 'Change role of Ada Brennock' }).click();
    await page.getByRole('dialog', { name: `Make Ada Brennock ${article} ${role}?` }).getByRole('button', { name: `Make ${role}` }).click();
    await expect(page.getByRole('status').filter({ hasText: `Ada Brennock is now ${article} ${role}.` })).toBeVisible();
  }
  expect(writes).toHaveLength(2);
  await page.reload();
  await expect(menu).toHaveValue('viewer');

  // Removing a member asks too, naming the consequence; cancelled here.
  await page.getByRole('button', { name: 'Remove Teo Lindqvist' }).click();
  await expect(page.getByRole('dialog', { name: 'Remove Teo Lindqvist?' })).toContainText('loses access');
  await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
  expect(writes).toHaveLength(2);
  await context.close();
});

test('an arrow key in the workspace menu does not leave the page; Open does', async ({ browser }) => {
  const { context, page } = await contextAs(browser, 'owner');
  const menu = page.getByRole('combobox', { name: 'Workspace' });
  await expect(menu).toHaveValue(DEMO_SHOP_SLUG);
  await menu.focus();
  // The shop is the last option, so the arrow that moves the choice is up (to the personal workspace).
  await page.keyboard.press('ArrowUp');
  await expect(menu).not.toHaveValue(DEMO_SHOP_SLUG);
  await expect(page).toHaveURL(new RegExp(`${shop}$`));
  const picked = await menu.inputValue();
  await page.getByRole('button', { name: 'Open' }).click();
  await expect(page).toHaveURL(new RegExp(`/w/${picked}$`));
  await context.close();
});
