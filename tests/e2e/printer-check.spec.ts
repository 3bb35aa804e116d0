import { readFile } from 'node:fs/promises';
import { expect, test } from '@playwright/test';
import { PDFParse } from 'pdf-parse';

// The expected factors follow the scale-check sheet's own definition (DEVELOPERS.md, "Sheets",
// issue 3): 100 mm bars, factor = measured ÷ 100, bars outside 90–110 mm refused.

test('measuring 98 and 100 mm stores a profile that the sheet maker offers and sends', async ({ page }) => {
  await page.goto('/printer-check');
  await expect(page.getByRole('heading', { level: 1, name: 'Printer check' })).toBeVisible();
  await page.getByLabel('Profile name').fill('Workshop laser');
  await page.getByLabel('Horizontal bar measures').fill('98');
  await page.getByLabel('Vertical bar measures').fill('100');
  await page.getByRole('button', { name: 'Save profile' }).click();

  const list = page.getByRole('list', { name: 'Saved printer profiles' });
  await expect(list).toContainText('Workshop laser');
  await expect(list).toContainText('X 0.980 · Y 1.000'); // 98 ÷ 100 and 100 ÷ 100

  await page.goto('/');
  const select = page.getByLabel('Printer correction');
  await expect(select.locator('option', { hasText: 'Workshop laser' })).toHaveText(/X 0\.980 · Y 1\.000/);
  await expect(select.locator('option:checked')).toContainText('Workshop laser');

  await page.getByLabel('Diameter', { exact: true }).fill('120');
  const requestPromise = page.waitForRequest((r) => r.url().endsWith('/api/v1/sheets') && r.method() === 'POST');
  const downloadPromise = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Download PDF' }).click();
  const body = (await requestPromise).postDataJSON() as Record<string, unknown>;
  expect(body).toMatchObject({ printerScaleX: 0.98, printerScaleY: 1, printerProfileName: 'Workshop laser', format: 'pdf', diameterMm: 120 });
  const file = await readFile((await (await downloadPromise).path()) as string);
  expect(file.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  // The title block names the profile (issue 3, "Printer check"), read back with pdf-parse.
  const parser = new PDFParse({ data: new Uint8Array(file) });
  const { text } = await parser.getText();
  await parser.destroy();
  expect(text.replace(/\s+/g, ' ')).toContain('Workshop laser');

  // "No correction" sends factors of 1 and no profile name.
  await select.selectOption({ label: 'No correction' });
  const plainPromise = page.waitForRequest((r) => r.url().endsWith('/api/v1/sheets') && r.method() === 'POST');
  await page.getByRole('button', { name: 'Download SVG' }).click();
  const plain = (await plainPromise).postDataJSON() as Record<string, unknown>;
  expect(plain).toMatchObject({ printerScaleX: 1, printerScaleY: 1, format: 'svg' });
  expect(plain.printerProfileName).toBeUndefined();

  await page.goto('/printer-check');
  await page.getByRole('button', { name: 'Delete Workshop laser' }).click();
  await expect(page.getByText('No printer profiles saved in this browser yet.')).toBeVisible();
});

test('a bar of 80 mm is refused: the printer is probably scaling to fit the page', async ({ page }) => {
  await page.goto('/printer-check');
  await page.getByLabel('Profile name').fill('Shrinking printer');
  const horizontal = page.getByLabel('Horizontal bar measures');
  await horizontal.fill('80');
  await page.getByLabel('Vertical bar measures').fill('100');
  await page.getByRole('button', { name: 'Save profile' }).click();
  const errorId = (await horizontal.getAttribute('aria-describedby'))?.split(' ').find((id) => id.endsWith('-error'));
  await expect(page.locator(`[id="${errorId}"]`)).toHaveText(/Horizontal bar must be at least 90 mm \(allowed 90–110 mm\).*probably scaling to fit the page/);
  await expect(horizontal).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByText('No printer profiles saved in this browser yet.')).toBeVisible();
});

test('the scale check sheet downloads as a PDF on the chosen paper (A4 = 595.28 × 841.89 pt)', async ({ page }) => {
  await page.goto('/printer-check');
  await page.getByLabel('Paper').selectOption('A4');
  const downloadPromise = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Download the scale check sheet (PDF)' }).click();
  const file = await readFile((await (await downloadPromise).path()) as string);
  expect(file.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  const parser = new PDFParse({ data: new Uint8Array(file) });
  const info = await parser.getInfo({ parsePageInfo: true });
  await parser.destroy();
  // ISO 216 A4 is 210 × 297 mm; × 72/25.4 pt per mm (ISO 32000 unit 1/72 in) = 595.28 × 841.89 pt.
  expect(info.pages).toHaveLength(1);
  expect(info.pages[0]?.width).toBeCloseTo((210 * 72) / 25.4, 1);
  expect(info.pages[0]?.height).toBeCloseTo((297 * 72) / 25.4, 1);
  // The check sheet carries the 100 mm bars that the form asks for.
  const text = await new PDFParse({ data: new Uint8Array(file) }).getText();
  expect(text.text).toMatch(/100 mm/);
});
