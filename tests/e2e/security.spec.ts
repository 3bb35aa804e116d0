import fs from 'node:fs';
import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';

// Demo owner of db/seeds/01_demo_shop.ts (invented shop).
const OWNER = { email: 'owner@harbourlane.test', password: 'harbour-owner-26' };

async function signIn(page: Page, email: string, password: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).not.toHaveURL(/\/sign-in/);
}

/** Every page of the app (app/**\/page.tsx), a dynamic segment filled from `params` by "parent/[name]" or "[name]" (else 1). */
function pagePaths(params: Record<string, string>): string[] {
  const walk = (dir: string): string[] =>
    fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(path.join(dir, e.name)) : e.name === 'page.tsx' ? [dir] : []));
  return walk(path.join(process.cwd(), 'app'))
    .map((dir) => path.relative(path.join(process.cwd(), 'app'), dir).split(path.sep).filter((s) => s && !/^\(.*\)$/.test(s)))
    .map((segments) => `/${segments.map((s, i) => params[`${segments[i - 1]}/${s}`] ?? params[s] ?? s.replace(/^\[.+\]$/, '1')).join('/')}`)
    .sort();
}

test('every page passes its Content-Security-Policy and carries the security headers', async ({ page }) => {
  const violations: string[] = [];
  page.on('console', (message) => {
    if (/Content.Security.Policy|Refused to (execute|load|apply|connect|frame)/i.test(message.text())) violations.push(`${page.url()}: ${message.text()}`);
  });
  // The browser's own report of every blocked script, style, image or frame (W3C CSP Level 3 §5.3).
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => console.error(`Content Security Policy violation: ${e.violatedDirective} ${e.blockedURI}`));
  });

  await signIn(page, OWNER.email, OWNER.password);
  const firstId = async (what: string) => String((await (await page.request.get(`/api/v1/workspaces/harbour-lane/${what}?pageSize=1`)).json()).items[0].id);
  const paths = pagePaths({ '[workspace]': 'harbour-lane', 'templates/[id]': await firstId('templates'), 'builds/[id]': await firstId('builds') });
  expect(paths.length).toBeGreaterThan(15);

  for (const pathname of paths) {
    const response = await page.goto(pathname);
    expect(response, pathname).not.toBeNull();
    const headers = response!.headers();
    const policy = headers['content-security-policy'] ?? '';
    expect(policy, pathname).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
    expect(policy, pathname).toContain("frame-ancestors 'none'");
    expect(policy, pathname).not.toContain('unsafe-eval');
    expect(headers['referrer-policy'], pathname).toBe('strict-origin-when-cross-origin');
    expect(headers['x-content-type-options'], pathname).toBe('nosniff');
    expect(headers['x-frame-options'], pathname).toBe('DENY');
    // Next's inline scripts ran under the nonce: the React Server Components payload queue exists.
    await expect.poll(() => page.evaluate(() => Array.isArray((window as unknown as { __next_f?: unknown[] }).__next_f)), { message: pathname }).toBe(true);
  }
  expect(violations).toEqual([]);
});

test('the pages still work under the policy: a client form hydrates and answers', async ({ page }) => {
  await page.goto('/calculators/tdc');
  // A live form is disabled until hydrated (React), so an enabled field proves the app's scripts ran.
  await expect(page.locator('input:not([disabled])').first()).toBeVisible();
});

test('a session cookie saved before signing out answers 401 afterwards', async ({ page, browser }) => {
  const email = `signout-${Date.now()}@example.test`;
  const created = await page.request.post('/api/v1/account/sign-up', { data: { name: 'Sign Out Tester', email, password: 'a long password' } });
  expect(created.status()).toBe(201);
  await signIn(page, email, 'a long password');
  const saved = await page.context().cookies();
  expect(saved.some((c) => c.name.includes('session-token'))).toBe(true);
  expect((await page.request.get('/api/v1/workspaces')).status()).toBe(200);

  await page.goto('/account');
  await page.getByRole('button', { name: 'Sign out', exact: true }).click();
  await expect(page.getByRole('button', { name: 'Sign out', exact: true })).toHaveCount(0);

  // Someone who copied the cookie before the sign-out replays it.
  const replay = await browser.newContext();
  await replay.addCookies(saved);
  expect((await replay.request.get('/api/v1/workspaces')).status()).toBe(401);
  await replay.close();
});
