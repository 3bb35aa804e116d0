import { expect, test } from '@playwright/test';

// Demo technician of db/seeds/01_demo_shop.ts (invented shop).
const TECH = { email: 'tech@harbourlane.test', password: 'harbour-tech-26' };
const run = Date.now();
// A semicolon-separated file with decimal commas, as spreadsheet programs write it where "," is the decimal mark.
const SEMICOLON_CSV = `name;bore_mm;stroke_mm\r\nImport Komma 50 ${run};40;39,2\r\nImport Komma 125 ${run};54;54,5\r\n`;

test('imports a semicolon CSV with decimal commas, then offers skip or update on re-import', async ({ page }) => {
  await page.goto('/sign-in?callbackUrl=%2Fw%2Fharbour-lane%2Ftemplates%2Fimport');
  await page.getByLabel('E-mail', { exact: true }).fill(TECH.email);
  await page.getByLabel('Password', { exact: true }).fill(TECH.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/w\/harbour-lane\/templates\/import$/);
  await page.getByLabel('CSV file').setInputFiles({ name: 'komma.csv', mimeType: 'text/csv', buffer: Buffer.from(SEMICOLON_CSV) });
  await page.getByRole('button', { name: 'Check file' }).click();
  await expect(page.getByRole('status')).toContainText('2 rows checked: 2 new.');
  await page.getByRole('button', { name: 'Import', exact: true }).click();
  await expect(page.getByRole('status')).toContainText('Imported 2 templates.');

  // The same file again: both rows now match by name.
  await page.getByLabel('CSV file').setInputFiles({ name: 'komma.csv', mimeType: 'text/csv', buffer: Buffer.from(SEMICOLON_CSV.replace(';54;54,5', ';54;55,5')) });
  await page.getByRole('button', { name: 'Check file' }).click();
  await expect(page.getByRole('status')).toContainText('2 rows match an existing template by name');
  await page.getByLabel('Update those templates from the file').check();
  await page.getByRole('button', { name: 'Import', exact: true }).click();
  await expect(page.getByRole('status')).toContainText('Imported 0 new templates, 1 template updated, 1 template already the same.');
});
