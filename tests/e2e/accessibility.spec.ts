import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { contextAs, DEMO_SHOP_SLUG, pagesFor, type DemoRole } from './support/demo-users';

// axe-core (Deque's rule engine, through @axe-core/playwright) checks WCAG 2.x A and AA rules in the real page.
// The bar: no violation of "serious" or "critical" impact on any page, for any role, on a desktop and a phone.

const SHEET_KINDS = ['wheel', 'ring', 'strip', 'scribe', 'check'];

async function seriousViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa']).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .flatMap((v) => v.nodes.map((node) => `${v.id} (${v.impact}): ${node.target.join(' ')} — ${node.failureSummary?.split('\n')[1]?.trim() ?? v.help}`));
}

async function audit(page: Page, path: string): Promise<string[]> {
  await page.goto(path);
  await page.waitForLoadState('networkidle');
  return (await seriousViolations(page)).map((line) => `${path}: ${line}`);
}

for (const role of [null, 'owner', 'technician', 'viewer'] as Array<DemoRole | null>) {
  test(`axe finds nothing serious on any page, ${role ?? 'signed out'}, desktop and phone`, async ({ browser }) => {
    test.setTimeout(360_000); // a sweep of every page, not one interaction
    const found: string[] = [];
    for (const viewport of [{ width: 1280, height: 900 }, { width: 390, height: 844 }]) {
      const { context, page } = await contextAs(browser, role, { viewport });
      const paths = await pagesFor(page, role);
      if (!role) paths.push(...SHEET_KINDS.map((kind) => `/?kind=${kind}&numbering=full&portEvents=${encodeURIComponent('[{"name":"Exhaust","opensCrankDeg":95,"closesCrankDeg":265}]')}`));
      if (role === 'owner') paths.push(`/w/${DEMO_SHOP_SLUG}?activity=members`);
      for (const path of paths) found.push(...(await audit(page, path)));
      await context.close();
    }
    expect(found).toEqual([]);
  });
}

test('the confirm dialog and the open phone menu pass axe too', async ({ browser }) => {
  const { context, page } = await contextAs(browser, 'owner', { viewport: { width: 390, height: 844 } });
  await page.getByRole('combobox', { name: 'Role of Ada Brennock' }).selectOption('owner');
  await page.getByRole('button', { name: 'Change role of Ada Brennock' }).click();
  await expect(page.getByRole('dialog')).toBeVisible();
  expect(await seriousViolations(page)).toEqual([]);
  await page.keyboard.press('Escape');
  await page.getByRole('button', { name: 'Menu' }).click();
  expect(await seriousViolations(page)).toEqual([]);
  await context.close();
});

/** Presses Tab until the target has focus (a keyboard user's path; fails if it is never reached). */
async function tabTo(page: Page, name: string, target: ReturnType<Page['getByRole']> | ReturnType<Page['getByLabel']>, limit = 80) {
  for (let i = 0; i < limit; i += 1) {
    if (await target.evaluate((el) => el === document.activeElement).catch(() => false)) return;
    await page.keyboard.press('Tab');
  }
  throw new Error(`${name} was not reached with ${limit} presses of Tab`);
}

test('a whole sheet by keyboard alone: kind, diameter, numbering, title, download', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByLabel('Diameter', { exact: true })).toBeEnabled();
  await tabTo(page, 'the kind', page.getByRole('radio', { name: /^Degree wheel/ }));
  await page.keyboard.press('ArrowDown'); // radio group: the next kind, a flange ring
  await page.keyboard.press('ArrowDown'); // and the one after, a rim strip
  await expect(page.getByRole('radio', { name: /^Rim strip/ })).toBeChecked();
  await tabTo(page, 'the diameter', page.getByLabel('Diameter', { exact: true }));
  await page.keyboard.press('ControlOrMeta+a');
  await page.keyboard.type('128.4');
  await tabTo(page, 'the numbering', page.getByRole('radio', { name: /^From TDC both ways/ }));
  await page.keyboard.press('ArrowDown');
  await expect(page.getByRole('radio', { name: /^Full circle/ })).toBeChecked();
  await tabTo(page, 'the title', page.getByLabel('Title'));
  await page.keyboard.type('Keyboard sheet');
  await tabTo(page, 'the PDF download', page.getByRole('button', { name: 'Download PDF' }), 120);
  const download = page.waitForEvent('download');
  await page.keyboard.press('Enter');
  // The file name says kind and size: the download carried what was typed.
  expect((await download).suggestedFilename()).toBe('rimscale-strip-128.4mm-keyboard-sheet.pdf');
});

test('a whole build record by keyboard alone: customer, engine number, create', async ({ browser }) => {
  const { context, page } = await contextAs(browser, 'technician');
  await page.goto(`/w/${DEMO_SHOP_SLUG}/builds/new`);
  const customer = page.getByLabel('Customer name');
  await expect(customer).toBeEnabled();
  await page.keyboard.press('Tab');
  await tabTo(page, 'the customer name', customer, 120);
  await page.keyboard.type('Keyboard Customer');
  await tabTo(page, 'the engine number', page.getByLabel('Engine number'));
  await page.keyboard.type('KB-001');
  await tabTo(page, 'the create button', page.getByRole('button', { name: 'Create record' }), 200);
  await page.keyboard.press('Enter');
  await expect(page.getByRole('heading', { level: 1, name: /Keyboard Customer/ })).toBeVisible();
  await context.close();
});
