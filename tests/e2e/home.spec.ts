import { expect, test } from '@playwright/test';

test('the home page loads in Chromium with its heading and navigation', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
  await expect(page).toHaveTitle(/Rimscale/);
});
