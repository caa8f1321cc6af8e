import { test, expect } from '@playwright/test';

test.describe.configure({ retries: 2 });

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('g.node[data-kind="pump"]')).toBeVisible({ timeout: 30_000 });
});

test('a hostile file is refused and the open project is untouched', async ({ page }) => {
  const name = await page.getByLabel('Project name').inputValue();
  const count = await page.locator('g.node').count();
  const hostile = JSON.stringify({
    format: 'headroute',
    version: 1,
    name: '<img src=x onerror=alert(1)>',
    __proto__: { polluted: true },
    nodes: { A: { kind: 'vessel', id: 'A', x: 'NaN' } },
  });
  await page.locator('input[type="file"]').setInputFiles({
    name: 'hostile.headroute.json',
    mimeType: 'application/json',
    buffer: Buffer.from(hostile),
  });
  await expect(page.locator('.status-line .message')).toContainText('was not opened');
  await expect(page.getByLabel('Project name')).toHaveValue(name);
  await expect(page.locator('g.node')).toHaveCount(count);
});

test('the project is saved as a file that opens again', async ({ page }) => {
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  await page.keyboard.press('ArrowRight');
  const download = page.waitForEvent('download');
  await page.keyboard.press('Control+s');
  const file = await download;
  expect(file.suggestedFilename()).toMatch(/\.headroute\.json$/);
  const path = await file.path();
  await page.getByRole('button', { name: /Project/ }).click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await expect(page.locator('g.node')).toHaveCount(0);
  await page.locator('input[type="file"]').setInputFiles(path);
  await expect(page.locator('g.node[data-kind="pump"]')).toHaveCount(1);
});

test('autosave brings the work back after a reload', async ({ page }) => {
  const before = await page.locator('g.node').count();
  await page.locator('[data-part="junction"]').focus();
  await page.keyboard.press('Enter');
  await expect(page.locator('g.node')).toHaveCount(before + 1);
  await page.waitForTimeout(1500); // autosave runs at most once a second
  await page.reload();
  await expect(page.locator('.notice')).toContainText('Restored');
  await expect(page.locator('g.node')).toHaveCount(before + 1);
  await expect(page.locator('g.node[data-kind="junction"]')).toHaveCount(1);
  await page.screenshot({ path: 'e2e/screenshots/restored.png' });
});
