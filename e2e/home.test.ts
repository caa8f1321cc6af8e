import { test, expect } from '@playwright/test';

test('home page loads and names the tool', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'Headroute' })).toBeVisible();
});
