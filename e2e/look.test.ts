/**
 * Screenshots to read with an engineer's eye: each demo as it opens (light, dark, US units),
 * and the details of a pipe and a pump. Nothing is asserted beyond the page being ready; the
 * figures are checked by the other specs.
 */
import { test, expect, type Page } from '@playwright/test';
import { mkdirSync } from 'node:fs';

const SHOTS = 'e2e/screenshots';
mkdirSync(SHOTS, { recursive: true });

async function ready(page: Page) {
  await page.goto('/');
  await page.waitForLoadState('networkidle');
  await expect(page.locator('g.node[data-kind="pump"]')).toBeVisible({ timeout: 30_000 });
}

test('look: demo 1 light, pipe and pump details', async ({ page }) => {
  await ready(page);
  await page.screenshot({ path: `${SHOTS}/look-demo1-light.png` });
  await page.locator('g.pipe[data-pipe-id="L8"]').first().click({ force: true });
  await page.screenshot({ path: `${SHOTS}/look-pipe-details.png` });
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  await page.screenshot({ path: `${SHOTS}/look-pump-details.png` });
});

test('look: pump chart tabs, case shown, dark and US', async ({ page }) => {
  await ready(page);
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  const details = page.getByRole('region', { name: 'Details' });
  for (const tab of ['NPSHr', 'Efficiency']) {
    await details.getByRole('tab', { name: tab }).click();
    await details
      .locator('.pump-chart')
      .screenshot({ path: `${SHOTS}/look-pump-chart-${tab}.png` });
  }
  await page.getByRole('button', { name: /^Show Hot/ }).click();
  await page.screenshot({ path: `${SHOTS}/look-case-details.png` });
  await page.getByRole('button', { name: 'Dark theme' }).click();
  await page.screenshot({ path: `${SHOTS}/look-dark.png` });
  await page.getByRole('button', { name: 'US', exact: true }).click();
  await page.screenshot({ path: `${SHOTS}/look-us.png` });
});
