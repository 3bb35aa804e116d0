import { expect, test, type Browser, type Page } from '@playwright/test';
import { PDFParse } from 'pdf-parse';

// Demo users of db/seeds/01_demo_shop.ts and the demo template of db/seeds/02_demo_templates.ts (all invented).
const TECH = { email: 'tech@harbourlane.test', password: 'harbour-tech-26' };
const VIEWER = { email: 'viewer@harbourlane.test', password: 'harbour-view-26' };
const CUSTOMER = { name: 'Tamsin Orrell', email: `tamsin.orrell.${Date.now()}@customer.test` };

async function signedIn(browser: Browser, user: { email: string; password: string }): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await page.goto('/sign-in?callbackUrl=%2Fw%2Fharbour-lane%2Fbuilds');
  await page.getByLabel('E-mail', { exact: true }).fill(user.email);
  await page.getByLabel('Password', { exact: true }).fill(user.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/w\/harbour-lane\/builds$/);
  return page;
}

type CaughtMail = { subject: string; attachments: Array<{ filename: string; contentType: string; size: number }>; id: number };

async function inbox(to: string): Promise<CaughtMail[]> {
  const res = await fetch(`${process.env.MAIL_FAKE_URL}/messages?to=${encodeURIComponent(to)}`);
  return (await res.json()) as CaughtMail[];
}

test('a technician runs an engine from template to the customer’s inbox; a viewer sees the record read-only', async ({ browser }) => {
  const tech = await signedIn(browser, TECH);
  // The demo list shows the seeded records; the template page starts a new one from its figures.
  await expect(tech.getByRole('link', { name: 'Odile Marchbank' })).toBeVisible();
  await tech.goto('/w/harbour-lane/templates');
  await tech.getByRole('link', { name: 'Coastline 125 scooter' }).click();
  await expect(tech.getByRole('heading', { name: 'Builds from this template' })).toBeVisible();
  await tech.getByRole('link', { name: 'New build record from this template' }).click();
  await expect(tech.getByRole('heading', { level: 1, name: /New build record: Coastline 125 scooter/ })).toBeVisible();
  await expect(tech.getByLabel(/^Stroke/)).toHaveValue('54.5');

  await tech.getByLabel('Customer name').fill(CUSTOMER.name);
  await tech.getByLabel('Customer e-mail').fill(CUSTOMER.email);
  await tech.getByLabel('Engine number').fill('CL125-E2E');

  // Stops at 338° and 24° on a full wheel: TDC midway, at 1.0°, corrected by −1.0° (common practice).
  await tech.getByLabel(/^Reading A/).fill('338');
  await tech.getByLabel(/^Reading B/).fill('24');
  await expect(tech.getByTestId('tdc-result')).toContainText('TDC at 1.0° on the wheel · correction −1.0°');

  // 17° BTDC with stroke 54.5 mm and rod 104 mm is 1.496 mm of piston travel (Heywood eq. 2.5).
  await tech.getByLabel(/^Timing set \(degrees\)/).fill('17');
  await expect(tech.getByTestId('timing-result')).toContainText('17.0° BTDC = 1.50 mm BTDC');
  await tech.getByLabel('Timing checked by').selectOption('static-light');

  // Edges 33.07 and 44.24 mm with a 0.3 mm deck open 172.0° and 118.0° (eq. 2.5 inverse): within ±2° of 172° and 118°.
  await tech.getByLabel(/^Deck height/).fill('0.3');
  await tech.getByLabel('Edge depth (mm) 1').fill('33.07');
  await tech.getByLabel('Edge depth (mm) 2').fill('44.24');
  await tech.getByLabel('Edge depth (mm) 2').fill('45.5');
  await expect(tech.getByTestId('port-result').nth(1)).toContainText('outside ±2°');
  await tech.getByLabel('Edge depth (mm) 2').fill('44.24');
  await expect(tech.getByTestId('port-result').nth(0)).toContainText('172.0° · target 172.0° · ±0.0° within ±2°');
  await expect(tech.getByTestId('port-result').nth(1)).toContainText('within ±2°');

  await tech.getByRole('button', { name: 'Create record' }).click();
  await expect(tech.getByRole('heading', { level: 1, name: new RegExp(CUSTOMER.name) })).toBeVisible();
  const recordUrl = tech.url();
  expect(recordUrl).toMatch(/\/w\/harbour-lane\/builds\/\d+$/);
  await expect(tech.getByTestId('tdc-result')).toContainText('correction −1.0°');
  await expect(tech.getByText('From template')).toContainText('Coastline 125 scooter version');

  await tech.getByRole('button', { name: 'Mark done' }).click();
  await expect(tech.getByRole('heading', { level: 1 })).toContainText('done');

  tech.once('dialog', (dialog) => dialog.accept());
  await tech.getByRole('button', { name: `Send to ${CUSTOMER.email}` }).click();
  await expect(tech.getByRole('list', { name: 'Sent copies' })).toContainText(`Sent to ${CUSTOMER.email}`);
  await expect(tech.getByRole('list', { name: 'Sent copies' })).toContainText('by Teo Lindqvist');

  // The customer's mail arrived, once, with the PDF attached.
  const caught = await inbox(CUSTOMER.email);
  expect(caught).toHaveLength(1);
  expect(caught[0]!.subject).toBe('Harbour Lane Motor Works: the timing record of your engine');
  expect(caught[0]!.attachments).toEqual([{ filename: expect.stringMatching(/^timing-record-\d+\.pdf$/), contentType: 'application/pdf', size: expect.any(Number) }]);
  const pdf = Buffer.from(await (await fetch(`${process.env.MAIL_FAKE_URL}/messages/${caught[0]!.id}/attachments/0`)).arrayBuffer());
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  const text = (await parser.getText()).text.replace(/\s+/g, ' ');
  await parser.destroy();
  expect(text).toContain(CUSTOMER.name);
  expect(text).toContain('The engine maker’s manual and local regulations come first.');

  // A viewer reads the record and downloads the copy, but has nothing to change it with.
  const viewer = await signedIn(browser, VIEWER);
  await viewer.goto(recordUrl);
  await expect(viewer.getByRole('heading', { level: 1, name: new RegExp(CUSTOMER.name) })).toBeVisible();
  await expect(viewer.getByTestId('timing-result')).toContainText('17.0° BTDC = 1.50 mm BTDC');
  await expect(viewer.getByRole('link', { name: 'Download PDF (A4)' })).toBeVisible();
  await expect(viewer.getByRole('link', { name: 'Edit' })).toHaveCount(0);
  await expect(viewer.getByRole('button', { name: /Mark|Reopen|Send|Delete/ })).toHaveCount(0);
  await expect(viewer.getByRole('link', { name: 'New record' })).toHaveCount(0);
});
