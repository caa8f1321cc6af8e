/**
 * Surge in Chromium: the pump-trip-over-rack demo, a trip of P-401 run from the Surge panel
 * (in the worker), its key figures, findings and envelope drawing, a valve closure, the CSV
 * export and the review sheet's surge section.
 */
import { test, expect, type Page } from '@playwright/test';
import { mkdirSync } from 'node:fs';

const SHOTS = 'e2e/screenshots';
mkdirSync(SHOTS, { recursive: true });

async function openTripDemo(page: Page) {
  await page.goto('/');
  await page.waitForLoadState('networkidle');
  await page.getByRole('button', { name: 'Project ▾' }).click();
  await page.getByRole('menuitem', { name: 'Pump trip over a rack high point' }).click();
  await expect(page.getByLabel('Project name')).toHaveValue('Pump trip over a rack high point', {
    timeout: 20_000,
  });
}

test('a pump trip parts the column on the rack; a fast closure; exports and review sheet', async ({
  page,
}) => {
  test.setTimeout(180_000);
  await openTripDemo(page);
  const panel = page.getByRole('region', { name: 'Surge' });
  await panel.getByRole('button', { name: 'Open' }).click();
  await expect(panel.getByLabel('Surge event')).toHaveValue('trip');
  const figures = panel.locator('[data-surge-figures]');
  await expect(figures).toContainText('Joukowsky', { timeout: 60_000 });
  await expect(figures).toContainText('largest cavity');
  await expect(panel.getByRole('list', { name: 'Surge findings' })).toContainText('column parts');
  const view = page.locator('[data-surge-view]');
  await expect(view.locator('svg').first()).toContainText('max HGL');
  await expect(view.locator('circle').first()).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/surge-trip.png` });

  // A sudden closure of HV-402: a stop finding against the design pressure.
  await panel.getByLabel('Surge event').selectOption('close');
  await panel.getByLabel('Element of the event').selectOption({ label: 'HV-402' });
  await panel.getByLabel('Closure time, s').fill('0');
  const findings = panel.getByRole('list', { name: 'Surge findings' });
  await expect(findings).toContainText('closing “HV-402” in 0.00 s', { timeout: 60_000 });
  await expect(findings).toContainText('above its design pressure');
  await expect(panel.getByRole('status')).not.toContainText('running');
  await page.screenshot({ path: `${SHOTS}/surge-close.png` });

  const download = page.waitForEvent('download');
  await view.getByRole('button', { name: 'CSV' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toMatch(/surge\.csv$/);

  const popup = page.waitForEvent('popup');
  await page
    .getByRole('region', { name: 'Cases' })
    .getByRole('button', { name: 'Review sheet' })
    .click();
  const sheet = await popup;
  await sheet.waitForLoadState();
  await expect(sheet.locator('#surge')).toContainText('HV-402');
  await expect(sheet.locator('#surge')).toContainText('Not modelled');
});
