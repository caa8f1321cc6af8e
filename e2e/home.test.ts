import { test, expect } from '@playwright/test';

test('home page opens the first demo project on the sheet', async ({ page }) => {
  await page.goto('/');
  // the first load of the dev server can be slow while it prepares modules
  await expect(page.getByRole('heading', { name: 'Headroute' })).toBeVisible({ timeout: 30_000 });
  // the demo's name in the project name field
  await expect(page.getByLabel('Project name')).toHaveValue(/pipe rack/i, { timeout: 15_000 });
  await expect(page.getByLabel('Project name')).not.toHaveValue('');
  // the parts shelf
  const shelf = page.getByRole('navigation', { name: 'Parts shelf' });
  await expect(shelf.getByRole('button', { name: /Pump/ })).toBeVisible();
  await expect(shelf.getByRole('button', { name: /Open vessel/ })).toBeVisible();
  // the sheet with the demo's vessels, pump and pipes, solved
  const sheet = page.getByRole('application', { name: 'Sheet' });
  await expect(sheet.locator('g.node[data-kind="vessel"]').first()).toBeVisible();
  await expect(sheet.locator('g.node[data-kind="pump"]').first()).toBeVisible();
  expect(await sheet.locator('g.pipe').count()).toBeGreaterThan(2);
  await expect(sheet.locator('.flow').first()).toBeVisible();
  await page.screenshot({ path: 'e2e/screenshots/home.png' });
});
