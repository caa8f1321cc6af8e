/**
 * Screenshots to read with an engineer's eye (e2e/screenshots/look-*.png): demo 1 as it
 * opens, a pipe's and a pump's details, the pump chart tabs, a case shown, the dark theme and
 * US units. Each step checks what the screenshot is meant to show.
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

const details = (page: Page) => page.getByRole('region', { name: 'Details' });

test('look: demo 1 light, pipe and pump details', async ({ page }) => {
  await ready(page);
  await expect(page.locator('html')).not.toHaveAttribute('data-theme', 'dark');
  await page.screenshot({ path: `${SHOTS}/look-demo1-light.png` });
  await page.locator('g.pipe[data-pipe-id="L8"]').first().click({ force: true });
  await expect(details(page)).toContainText('Reynolds number');
  await page.screenshot({ path: `${SHOTS}/look-pipe-details.png` });
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  await expect(details(page)).toContainText('NPSH margin');
  await page.screenshot({ path: `${SHOTS}/look-pump-details.png` });
});

test('look: pump chart tabs, case shown, dark and US', async ({ page }) => {
  await ready(page);
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  for (const tab of ['NPSHr', 'Efficiency']) {
    await details(page).getByRole('tab', { name: tab }).click();
    const chart = details(page).locator('.pump-chart');
    await expect(chart.locator('text.axis').last()).toContainText(tab);
    await chart.screenshot({ path: `${SHOTS}/look-pump-chart-${tab}.png` });
  }
  await page.getByRole('button', { name: /^Show Hot/ }).click();
  await expect(details(page).getByRole('note')).toContainText('Showing case');
  await page.screenshot({ path: `${SHOTS}/look-case-details.png` });
  await page.getByRole('button', { name: 'Dark theme' }).click();
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark');
  await page.screenshot({ path: `${SHOTS}/look-dark.png` });
  await page.getByRole('button', { name: 'US', exact: true }).click();
  await expect(details(page).getByRole('region', { name: /^Results/ })).toContainText('psig');
  await page.screenshot({ path: `${SHOTS}/look-us.png` });
});
