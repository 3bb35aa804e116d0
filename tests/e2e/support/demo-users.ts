import { expect, type Browser, type BrowserContext, type Page } from '@playwright/test';

// Demo users of db/seeds/01_demo_shop.ts (an invented shop).
export const DEMO_SHOP_SLUG = 'harbour-lane';
export const DEMO_USERS = {
  owner: { email: 'owner@harbourlane.test', password: 'harbour-owner-26', name: 'Maren Ostby' },
  technician: { email: 'tech@harbourlane.test', password: 'harbour-tech-26', name: 'Teo Lindqvist' },
  viewer: { email: 'viewer@harbourlane.test', password: 'harbour-view-26', name: 'Ada Brennock' },
} as const;
export type DemoRole = keyof typeof DEMO_USERS;

/** Signs in through the sign-in form, as a person would. */
export async function signIn(page: Page, role: DemoRole) {
  const user = DEMO_USERS[role];
  await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(`/w/${DEMO_SHOP_SLUG}`)}`);
  await page.getByLabel('E-mail', { exact: true }).fill(user.email);
  await page.getByLabel('Password', { exact: true }).fill(user.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(new RegExp(`/w/${DEMO_SHOP_SLUG}$`));
}

/** A new browser context signed in as the role (or signed out for null). */
export async function contextAs(browser: Browser, role: DemoRole | null, options: Parameters<Browser['newContext']>[0] = {}): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext(options);
  const page = await context.newPage();
  if (role) await signIn(page, role);
  return { context, page };
}

/** The first template id of the demo shop, read through the JSON API as the signed-in page. */
export async function firstTemplateId(page: Page): Promise<number> {
  const response = await page.request.get(`/api/v1/workspaces/${DEMO_SHOP_SLUG}/templates?pageSize=1`);
  expect(response.ok()).toBe(true);
  return ((await response.json()) as { items: Array<{ id: number }> }).items[0]!.id;
}

/** The first build record of the demo shop, or null when the seed has none. */
async function firstBuildId(page: Page): Promise<number | null> {
  const response = await page.request.get(`/api/v1/workspaces/${DEMO_SHOP_SLUG}/builds?pageSize=1`);
  if (!response.ok()) return null;
  return ((await response.json()) as { items: Array<{ id: number }> }).items[0]?.id ?? null;
}

/** Every page of the app a role can reach, for the phone and accessibility sweeps. */
export async function pagesFor(page: Page, role: DemoRole | null): Promise<string[]> {
  const publicPages = ['/', '/printer-check', '/calculators', '/calculators/tdc', '/calculators/piston-drop', '/calculators/port-events', '/calculators/arc-chord', '/sign-in', '/sign-up', '/reset-password', '/not-here'];
  if (!role) return publicPages;
  const id = await firstTemplateId(page);
  const shop = `/w/${DEMO_SHOP_SLUG}`;
  const pages = ['/', '/printer-check', '/calculators/port-events', '/account', shop, `${shop}/templates`, `${shop}/templates/${id}`, `${shop}/builds`];
  const buildId = await firstBuildId(page);
  if (buildId) pages.push(`${shop}/builds/${buildId}`);
  if (role !== 'viewer') pages.push(`${shop}/templates/new`, `${shop}/templates/${id}/edit`, `${shop}/templates/import`, `${shop}/builds/new`);
  if (role !== 'viewer' && buildId) pages.push(`${shop}/builds/${buildId}/edit`);
  return pages;
}
