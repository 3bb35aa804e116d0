import { expect, test, type Page } from '@playwright/test';
import { contextAs, pagesFor, type DemoRole } from './support/demo-users';

const PHONE = { width: 390, height: 844 };

/** How far the page reaches past the viewport's right edge, in CSS px (0 = no sideways scroll). */
async function sidewaysOverflowPx(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

for (const role of [null, 'owner', 'technician', 'viewer'] as Array<DemoRole | null>) {
  test(`no page scrolls sideways on a 390 px phone, ${role ?? 'signed out'}`, async ({ browser }) => {
    test.setTimeout(360_000); // a sweep of every page, not one interaction
    const { context, page } = await contextAs(browser, role, { viewport: PHONE, hasTouch: true, isMobile: true });
    for (const path of await pagesFor(page, role)) {
      await page.goto(path);
      await page.waitForLoadState('networkidle');
      expect({ path, overflowPx: await sidewaysOverflowPx(page) }).toEqual({ path, overflowPx: 0 });
    }
    // The header's menu holds the navigation and the account controls.
    await page.goto('/calculators');
    const menu = page.getByRole('button', { name: 'Menu' });
    await expect(menu).toHaveAttribute('aria-expanded', 'false');
    await menu.click();
    await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Calculators' })).toHaveAttribute('aria-current', 'page');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Printer check' }).click();
    await expect(page).toHaveURL(/\/printer-check$/);
    await expect(menu).toHaveAttribute('aria-expanded', 'false');
    await context.close();
  });
}

test('on a phone the preview is one tap away and the fields open the decimal keyboard', async ({ browser }) => {
  const { context, page } = await contextAs(browser, null, { viewport: PHONE, hasTouch: true, isMobile: true });
  await page.goto('/');
  const diameter = page.getByLabel('Diameter', { exact: true });
  await expect(diameter).toHaveAttribute('inputmode', 'decimal');
  await expect(page.getByTestId('sheet-preview')).toBeHidden();
  await page.getByRole('button', { name: 'Preview and download' }).click();
  await expect(page.getByTestId('sheet-preview')).toBeVisible();
  await expect(page.getByRole('img', { name: /^Preview of the degree wheel, / })).toBeVisible();
  // Tap targets of the switch and the downloads: at least 44 CSS px tall (WCAG 2.2 SC 2.5.5 target size, enhanced).
  for (const name of ['Settings', 'Download PDF']) {
    const box = await page.getByRole('button', { name }).boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
  }
  await context.close();
});

test('calculator → sheet maker keeps 128.4 mm, full numbering and the title; a reload keeps everything', async ({ page }) => {
  await page.goto('/');
  await page.getByLabel('Diameter', { exact: true }).fill('128.4');
  await page.getByRole('radio', { name: /^Full circle/ }).check();
  await page.getByLabel('Title').fill('Bench engine, left side');
  await expect(page).toHaveURL(/diameterMm=128\.4/);
  await expect(page).toHaveURL(/title=Bench\+engine%2C\+left\+side/);

  // A reload shows the same form.
  await page.reload();
  await expect(page.getByLabel('Diameter', { exact: true })).toHaveValue('128.4');
  await expect(page.getByRole('radio', { name: /^Full circle/ })).toBeChecked();
  await expect(page.getByLabel('Title')).toHaveValue('Bench engine, left side');

  // Heywood eq. 2.5 with s = 132 − 1.8 mm gives 18.79° (see calculators.spec.ts): its link adds one mark.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Calculators' }).click();
  await page.goto('/calculators/piston-drop');
  await page.getByLabel(/I know the drop/).check();
  await page.getByLabel('Piston drop below TDC').fill('1.8');
  await page.getByRole('link', { name: /Mark 18\.8° BTDC on a wheel/ }).click();
  await expect(page.getByLabel('Diameter', { exact: true })).toHaveValue('128.4');
  await expect(page.getByRole('radio', { name: /^Full circle/ })).toBeChecked();
  await expect(page.getByLabel('Title')).toHaveValue('Bench engine, left side');
  await expect(page.getByLabel('Advance marks (° BTDC)')).toHaveValue('18.8');
  await expect(page.getByRole('status').filter({ hasText: 'added to your last sheet' })).toBeVisible();
  await expect(page).toHaveURL(/diameterMm=128\.4.*advanceMarksDeg=18\.8/);
  await expect(page).not.toHaveURL(/keep=/);

  // The TDC note is written for the full numbering this sheet uses.
  await page.goto('/calculators/tdc');
  await page.getByLabel(/^Split/).check();
  await page.getByLabel('Reading A (first stop)').fill('20');
  await page.getByLabel('Reading B (other stop)').fill('30');
  // Stops 20° BTDC (crank order 340) and 30° ATDC: TDC midway at 5° ATDC (common practice: halve the sweep).
  await page.getByRole('link', { name: /note/ }).click();
  await expect(page.getByLabel('Note (optional)')).toHaveValue(/^True TDC reads 5° on this wheel/);
  await expect(page.getByLabel('Diameter', { exact: true })).toHaveValue('128.4');

  // The back button returns to the sheet as it was before the note.
  await page.goBack();
  await page.goBack();
  await expect(page.getByLabel('Advance marks (° BTDC)')).toHaveValue('18.8');
  await expect(page.getByLabel('Diameter', { exact: true })).toHaveValue('128.4');

  // The bare page (the header link) brings the last sheet back; "Start a new sheet" clears it.
  await page.goto('/');
  await expect(page.getByLabel('Diameter', { exact: true })).toHaveValue('128.4');
  await page.getByRole('button', { name: 'Start a new sheet', exact: true }).click();
  await expect(page.getByLabel('Diameter', { exact: true })).toHaveValue('120');
  await expect(page.getByLabel('Title')).toHaveValue('');
});
