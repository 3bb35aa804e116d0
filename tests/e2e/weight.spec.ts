import { expect, test } from '@playwright/test';

// Budget for a first visit to the home page (the sheet maker): at most 350 kB over the wire, of it at most 180 kB of
// JavaScript (gzip). React DOM and the Next runtime come to about 140 kB of that; the sheet maker's validation (zod and
// the shared schema) is loaded on the first change, not with the page.
// Measured by Chromium itself (DevTools protocol: encodedDataLength = bytes received, headers and compression included).
const BUDGET_TOTAL_KB = 350;
const BUDGET_JS_KB = 180;

test('a first visit to the sheet maker stays within the transfer budget', async ({ browser }) => {
  const context = await browser.newContext(); // empty cache, no cookies
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  const types = new Map<string, string>();
  const urls = new Map<string, string>();
  const bytes = new Map<string, number>();
  cdp.on('Network.responseReceived', (event) => {
    types.set(event.requestId, event.type);
    urls.set(event.requestId, event.response.url);
  });
  cdp.on('Network.loadingFinished', (event) => bytes.set(event.requestId, event.encodedDataLength));

  await page.goto('/', { waitUntil: 'networkidle' });
  await expect(page.getByTestId('sheet-preview')).toBeVisible({ timeout: 15_000 });
  await page.waitForLoadState('networkidle');

  let totalBytes = 0;
  let scriptBytes = 0;
  let fontBytes = 0;
  for (const [id, size] of bytes) {
    totalBytes += size;
    if (types.get(id) === 'Script') scriptBytes += size;
    if (types.get(id) === 'Font') fontBytes += size;
  }
  const kb = (n: number) => Math.round(n / 102.4) / 10;
  console.log(`first visit to /: ${kb(totalBytes)} kB transferred (budget ${BUDGET_TOTAL_KB} kB), ${kb(scriptBytes)} kB JavaScript (gzip; budget ${BUDGET_JS_KB} kB), ${kb(fontBytes)} kB fonts, ${bytes.size} requests`);
  for (const [id, size] of [...bytes].sort((a, b) => b[1] - a[1]).slice(0, 8)) console.log(`  ${kb(size)} kB ${types.get(id)} ${urls.get(id)}`);
  expect([...types.values()].filter((t) => t === 'Font').length).toBeGreaterThan(0);
  for (const [id, type] of types) if (type === 'Font') expect(urls.get(id)).toMatch(/\.woff2$/);
  expect(kb(totalBytes)).toBeLessThanOrEqual(BUDGET_TOTAL_KB);
  expect(kb(scriptBytes)).toBeLessThanOrEqual(BUDGET_JS_KB);
  await context.close();
});
