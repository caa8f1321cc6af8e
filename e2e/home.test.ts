import { test, expect } from '@playwright/test';

test('home page opens the first demo project on the sheet', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'Headroute' })).toBeVisible();
  // the demo's name in the project name field
  await expect(page.getByLabel('Project name')).not.toHaveValue('Untitled project');
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
