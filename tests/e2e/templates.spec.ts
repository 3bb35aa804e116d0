import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { PDFParse } from 'pdf-parse';
import sharp from 'sharp';

// Demo users of db/seeds/01_demo_shop.ts (invented shop).
const TECH = { email: 'tech@harbourlane.test', password: 'harbour-tech-26' };
const VIEWER = { email: 'viewer@harbourlane.test', password: 'harbour-view-26' };

async function signIn(page: Page, user: { email: string; password: string }) {
  await page.goto('/sign-in?callbackUrl=%2Fw%2Fharbour-lane%2Ftemplates');
  await page.getByLabel('E-mail', { exact: true }).fill(user.email);
  await page.getByLabel('Password', { exact: true }).fill(user.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/w\/harbour-lane\/templates$/);
}

/** Text of a PDF read by pdf-parse, an independent reader; line breaks of wrapped titles become spaces. */
async function pdfText(file: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(file) });
  try {
    return (await parser.getText()).text.replace(/\s+/g, ' ');
  } finally {
    await parser.destroy();
  }
}

async function downloadFrom(page: Page, click: () => Promise<void>): Promise<{ name: string; file: Buffer }> {
  const downloadPromise = page.waitForEvent('download');
  await click();
  const download = await downloadPromise;
  return { name: download.suggestedFilename(), file: await readFile((await download.path()) as string) };
}

test('a technician creates a template and prints a strip from it; a viewer can print but not edit', async ({ browser }) => {
  const name = `E2E strip single ${Date.now()}`;

  // Technician: the seeded list shows, then a new template is created through the form.
  const techContext = await browser.newContext();
  const tech = await techContext.newPage();
  await signIn(tech, TECH);
  await expect(tech.getByRole('link', { name: 'Coastline 125 scooter' })).toBeVisible();
  await tech.getByRole('link', { name: 'New template' }).click();
  await tech.getByLabel('Name', { exact: true }).fill(name);
  await tech.getByLabel('Engine description').fill('Invented 50 cc for the browser test');
  await tech.getByLabel(/^Flywheel rim diameter/).fill('abc');
  await tech.getByRole('button', { name: 'Create template' }).click();
  // The shared schema refuses the bad number in the browser, beside the field.
  await expect(tech.getByText(/Flywheel rim diameter must be a number/)).toBeVisible();
  await tech.getByLabel(/^Flywheel rim diameter/).fill('120');
  await tech.getByLabel(/^Static advance/).fill('18');
  await tech.getByRole('button', { name: 'Create template' }).click();
  await expect(tech.getByRole('heading', { level: 1, name })).toBeVisible();
  const templateUrl = tech.url();
  expect(templateUrl).toMatch(/\/w\/harbour-lane\/templates\/\d+$/);
  await expect(tech.getByRole('list', { name: 'History' })).toContainText('Version 1 — created by Teo Lindqvist');

  // One click opens the generator filled in from the template: a rim strip of 120 mm.
  await tech.getByRole('link', { name: 'Print a rim strip' }).click();
  await expect(tech).toHaveURL(/\/\?kind=strip&diameterMm=120&/);
  await expect(tech.getByLabel('Diameter', { exact: true })).toHaveValue('120');
  await expect(tech.getByRole('radio', { name: /^Rim strip/ })).toBeChecked();
  const printed = await downloadFrom(tech, () => tech.getByRole('button', { name: 'Download PDF' }).click());
  expect(printed.name).toMatch(/^rimscale-strip-120mm-.*\.pdf$/);
  expect(await pdfText(printed.file)).toContain(name);
  await techContext.close();

  // Viewer: reads and prints, but has no edit controls and the API refuses writes.
  const viewerContext = await browser.newContext();
  const viewer = await viewerContext.newPage();
  await signIn(viewer, VIEWER);
  await expect(viewer.getByRole('link', { name: 'New template' })).toHaveCount(0);
  await viewer.goto(templateUrl);
  await expect(viewer.getByRole('heading', { level: 1, name })).toBeVisible();
  await expect(viewer.getByRole('link', { name: 'Edit' })).toHaveCount(0);
  await expect(viewer.getByRole('button', { name: 'Archive' })).toHaveCount(0);
  await expect(viewer.getByRole('form', { name: 'Add a photo' })).toHaveCount(0);

  const sheet = await downloadFrom(viewer, () => viewer.getByRole('link', { name: 'rim strip PDF' }).click());
  expect(sheet.file.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  expect(await pdfText(sheet.file)).toContain(name);
  await expect(viewer.getByRole('link', { name: 'Print a rim strip' })).toBeVisible();

  const id = templateUrl.split('/').pop();
  const patch = await viewer.request.patch(`/api/v1/workspaces/harbour-lane/templates/${id}`, { data: { version: 1, name: 'Viewer was here' } });
  expect(patch.status()).toBe(403);
  await viewer.goto(`${templateUrl}/edit`);
  await expect(viewer.getByRole('alert').filter({ hasText: /needs the technician role/ })).toBeVisible();
  await viewer.goto(templateUrl);
  await expect(viewer.getByRole('heading', { level: 1, name })).toBeVisible();
  await viewerContext.close();
});

test('two edits from the same version: the later save is refused with who and when, and keeps the typed values', async ({ browser }) => {
  const context = await browser.newContext();
  const first = await context.newPage();
  await signIn(first, TECH);
  // Search and sort run on the server: "scooter" finds the three invented scooters.
  // Wait for the client list to have loaded (it is fetched after hydration), so typing is not lost.
  await expect(first.getByRole('status').filter({ hasText: /^\d+ templates$/ })).toBeVisible();
  await first.getByLabel('Search name and engine').fill('scooter');
  await expect(first.getByLabel('Search name and engine')).toHaveValue('scooter');
  await expect(first.getByRole('status').filter({ hasText: /^3 templates$/ })).toBeVisible();
  await first.getByRole('button', { name: /^Name/ }).click();
  await expect(first.locator('tbody tr').first()).toContainText('Quayside 150 scooter, disc valve');

  await first.getByRole('link', { name: 'Coastline 200 scooter' }).click();
  await expect(first).toHaveURL(/\/templates\/\d+$/);
  const editUrl = `${first.url()}/edit`;
  const second = await context.newPage();
  await first.goto(editUrl);
  await second.goto(editUrl);

  await first.getByLabel(/^Static advance/).fill('19');
  await first.getByRole('button', { name: 'Save changes' }).click();
  // Back on the detail page (the edit page's heading also contains the name, hence exact).
  await expect(first).toHaveURL(/\/templates\/\d+$/);
  await expect(first.getByRole('heading', { level: 1, name: 'Coastline 200 scooter', exact: true })).toBeVisible();

  await second.getByLabel(/^Static advance/).fill('16');
  await second.getByRole('button', { name: 'Save changes' }).click();
  await expect(second.getByRole('alert').filter({ hasText: /changed by Teo Lindqvist at .* — reload/ })).toBeVisible();
  await expect(second.getByLabel(/^Static advance/)).toHaveValue('16');

  // The winner's value stands and the history holds it as a revision.
  await first.reload();
  await expect(first.locator('dl').getByText('19° BTDC', { exact: true })).toBeVisible();
  await expect(first.getByRole('list', { name: 'History' })).toContainText(/Static advance: 18° BTDC → 19° BTDC/);
  await context.close();
});

test('a photo uploads through the page (a PNG named .jpg is kept as PNG) and an 11 MB file is refused', async ({ browser }) => {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, TECH);
  await page.getByRole('link', { name: 'Pier 100 reed-valve kart' }).click();
  await expect(page).toHaveURL(/\/templates\/\d+$/);
  const png = await sharp({ create: { width: 120, height: 80, channels: 3, background: '#c04030' } }).png().toBuffer();
  await page.getByLabel(/^Photo \(JPEG/).setInputFiles({ name: 'pointer.jpg', mimeType: 'image/jpeg', buffer: png });
  await page.getByLabel('Caption').fill('Pointer at the left crankcase bolt');
  await page.getByRole('button', { name: 'Upload' }).click();
  const thumb = page.getByRole('img', { name: 'Pointer at the left crankcase bolt' });
  await expect(thumb).toBeVisible();
  const full = await page.request.get((await thumb.locator('..').getAttribute('href'))!);
  expect(full.headers()['content-type']).toBe('image/png');

  const id = page.url().split('/').pop();
  const big = Buffer.alloc(11 * 1024 * 1024, 0);
  png.copy(big);
  const refused = await page.request.post(`/api/v1/workspaces/harbour-lane/templates/${id}/photos`, {
    multipart: { photo: { name: 'big.png', mimeType: 'image/png', buffer: big } },
  });
  expect(refused.status()).toBe(413);
  expect((await refused.json()).error).toMatch(/larger than 10 MB/);
  await context.close();
});

test('the list view lives in the URL: search and sort survive a reload and the back button, a shared link filters', async ({ browser }) => {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, TECH);
  const search = page.getByLabel('Search name and engine');
  const names = page.locator('tbody tr td:first-child');
  // Hold the page's scripts back, type into the server-rendered box, then let React hydrate:
  // what was typed before hydration must be kept and searched for.
  let release = () => {};
  const scriptsHeld = new Promise<void>((resolve) => (release = resolve));
  await page.route('**/_next/static/chunks/**', async (route) => {
    await scriptsHeld;
    await route.continue();
  });
  await page.goto('/w/harbour-lane/templates', { waitUntil: 'commit' });
  await search.fill('scooter');
  release();
  await page.unrouteAll({ behavior: 'wait' });
  await expect(page).toHaveURL(/\?q=scooter$/);
  await expect(names).toHaveText(['Coastline 125 scooter', 'Coastline 200 scooter', 'Quayside 150 scooter, disc valve']);

  // Bore twice: descending by bore (seeded 66, 57.5 and 54 mm).
  const bore = page.getByRole('columnheader', { name: /^Bore/ });
  await bore.getByRole('button').click();
  await expect(bore).toHaveAttribute('aria-sort', 'ascending');
  await bore.getByRole('button').click();
  await expect(bore).toHaveAttribute('aria-sort', 'descending');
  await expect(page).toHaveURL(/\?q=scooter&sort=boreMm&dir=desc$/);
  const byBoreDown = ['Coastline 200 scooter', 'Quayside 150 scooter, disc valve', 'Coastline 125 scooter'];
  await expect(names).toHaveText(byBoreDown);

  await page.reload();
  await expect(search).toHaveValue('scooter');
  await expect(bore).toHaveAttribute('aria-sort', 'descending');
  await expect(names).toHaveText(byBoreDown);

  // Into a template and back: the same view.
  await page.getByRole('link', { name: 'Quayside 150 scooter, disc valve' }).click();
  await expect(page).toHaveURL(/\/templates\/\d+$/);
  await page.goBack();
  await expect(search).toHaveValue('scooter');
  await expect(names).toHaveText(byBoreDown);

  // A shared link: only the archived template; a bad sort value falls back to the default without an error.
  await page.goto('/w/harbour-lane/templates?archived=true&sort=colour&page=zero');
  await expect(page.getByLabel('Show', { exact: true })).toHaveValue('true');
  await expect(page.getByRole('status').filter({ hasText: /^1 template$/ })).toBeVisible();
  await expect(names).toHaveText(['Old ferry 50 moped']);
  await expect(page.getByRole('columnheader', { name: /^Name/ })).toHaveAttribute('aria-sort', 'ascending');
  await context.close();
});
