import { test, expect } from '@playwright/test';

// The app works offline once loaded: the service worker caches the built app and the demos.
test('once loaded, the app opens again with the network off', async ({ page, context }) => {
  test.skip(!!process.env.E2E_DEV, 'the service worker caches the built app, not the dev server');
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'Headroute' })).toBeVisible({ timeout: 30_000 });
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  // A reload puts the page under the worker's control, and the worker has the assets cached.
  await page.reload();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);

  await context.setOffline(true);
  await page.reload();
  await expect(page.getByRole('heading', { name: 'Headroute' })).toBeVisible();
  const sheet = page.getByRole('application', { name: 'Sheet' });
  await expect(sheet.locator('g.node[data-kind="pump"]').first()).toBeVisible();
  await expect(sheet.locator('.flow').first()).toBeVisible();
  await context.setOffline(false);
});
