/**
 * Details show results: a pipe's velocity, Reynolds number, friction and end pressures; a
 * pump's duty, NPSH and efficiency; the pump chart's tabs each draw their own curve with the
 * extrapolated part dashed; a shown case's values; and `?` lists the keyboard shortcuts.
 */
import { test, expect, type Page } from '@playwright/test';

async function ready(page: Page) {
  await page.goto('/');
  await page.waitForLoadState('networkidle');
  await expect(page.locator('g.node[data-kind="pump"]')).toBeVisible({ timeout: 30_000 });
}

function details(page: Page) {
  return page.getByRole('region', { name: 'Details' });
}

test('a pipe selected shows its results', async ({ page }) => {
  await ready(page);
  await page.locator('g.pipe[data-pipe-id="L8"]').first().click({ force: true });
  const results = details(page).getByRole('region', { name: 'Results' });
  await expect(results).toBeVisible();
  for (const label of [
    'Velocity',
    'Reynolds number',
    'Friction factor',
    'Friction loss',
    'Loss per 100 m',
    'Pressure at start',
    'Pressure at end',
    'Margin to vapour pressure',
  ])
    await expect(results.getByText(label, { exact: true })).toBeVisible();
  await expect(results).toContainText('turbulent');
  await expect(results).toContainText(/barg \(\d.* bara\)/);
});

test('a pump selected shows its duty, NPSH and efficiency; each chart tab its own curve', async ({
  page,
}) => {
  await ready(page);
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  const results = details(page).getByRole('region', { name: 'Results' });
  for (const label of [
    'Head',
    'Efficiency',
    'Shaft power',
    'NPSH available',
    'NPSH required',
    'NPSH margin',
    'Flow / best-efficiency flow',
  ])
    await expect(results.getByText(label, { exact: true })).toBeVisible();
  const chart = details(page).locator('figure.pump-chart');
  const given = chart.locator('path[data-part="given"]');
  const paths: Record<string, string | null> = {};
  for (const tab of ['Head', 'NPSHr', 'Efficiency']) {
    await details(page).getByRole('tab', { name: tab }).click();
    await expect(chart).toHaveAttribute(
      'data-curve',
      tab === 'Head' ? 'head' : tab === 'NPSHr' ? 'npshr' : 'efficiency',
    );
    await expect(chart.locator('text.axis').last()).toContainText(tab);
    paths[tab] = await given.getAttribute('d');
    // beyond the last given point the fit is dashed and called extrapolated
    await expect(chart.locator('path[data-part="extrapolated"]').first()).toBeVisible();
    await expect(chart.locator('text.extrapolated-label')).toHaveText('extrapolated');
  }
  expect(new Set(Object.values(paths)).size).toBe(3);
});

test('with a case shown, Details shows the case values', async ({ page }) => {
  await ready(page);
  await page.getByRole('button', { name: /^Show Hot/ }).click();
  const d = details(page);
  await expect(d.getByRole('note')).toContainText('Temperature: 80 °C (base 60 °C)');
  await expect(d.getByLabel('Temperature', { exact: true })).toHaveValue('80 °C');
  await page.getByRole('button', { name: 'Show Base case' }).click();
  await expect(d.getByLabel('Temperature', { exact: true })).toHaveValue('60 °C');
});

test('? opens the list of keyboard shortcuts', async ({ page }) => {
  await ready(page);
  await page.locator('body').press('?');
  const dialog = page.getByRole('dialog', { name: 'Keyboard shortcuts' });
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText('Undo');
  await expect(dialog).toContainText('Pipe tool');
  await page.keyboard.press('Escape');
  await expect(dialog).toBeHidden();
  // typed into a field, ? is just a character
  const name = page.getByLabel('Project name');
  await name.focus();
  await page.keyboard.press('?');
  await expect(dialog).toBeHidden();
});
