import { test, expect } from '@playwright/test';

// The dev server reloads the page when files change under it; retry such a run.
test.describe.configure({ retries: 2 });

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('g.node[data-kind="pump"]')).toBeVisible({ timeout: 30_000 });
});

test('details: a value with a unit is applied, converted and undoable', async ({ page }) => {
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  const details = page.getByRole('region', { name: 'Details' });
  const elevation = details.getByLabel('Elevation', { exact: true });
  await expect(elevation).toHaveValue('0.5 m');
  await elevation.fill('5 ft');
  await elevation.press('Enter');
  // 5 ft = 1.524 m exactly (NIST SP 811)
  await expect(elevation).toHaveValue('1.524 m');
  await page.keyboard.press('Escape');
  await elevation.blur();
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(elevation).toHaveValue('0.5 m');
});

test('details: invalid input is refused inline with its reason and never applied', async ({
  page,
}) => {
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  const details = page.getByRole('region', { name: 'Details' });
  const elevation = details.getByLabel('Elevation', { exact: true });
  await elevation.fill('12 gpm');
  await elevation.press('Enter');
  await expect(elevation).toHaveAttribute('aria-invalid', 'true');
  await expect(details.getByRole('alert')).toBeVisible();
  const message = await details.getByRole('alert').textContent();
  expect(message?.length ?? 0).toBeGreaterThan(10);
  // nothing reached the document: no undo step was made
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
  await elevation.press('Escape');
  await expect(elevation).toHaveValue('0.5 m');
  await page.screenshot({ path: 'e2e/screenshots/details-refused.png' });
});

test('details: keyboard only, place a valve and set its loss coefficient', async ({ page }) => {
  await page.locator('[data-part="globe-valve"]').focus();
  await page.keyboard.press('Enter');
  const details = page.getByRole('region', { name: 'Details' });
  await expect(details.getByText('Fitting ·')).toBeVisible();
  await details.getByLabel('Loss method').focus();
  // typing the first letter picks "Fixed K" in a closed select
  await page.keyboard.press('f');
  await expect(details.getByLabel('Loss method')).toHaveValue('fixed');
  await page.keyboard.press('Tab');
  await page.keyboard.type('x');
  await page.keyboard.press('Enter');
  await expect(details.getByRole('alert')).toContainText('enter a number');
  await page.keyboard.press('Control+a');
  await page.keyboard.type('6.5');
  await page.keyboard.press('Enter');
  await expect(details.getByLabel('K', { exact: true })).toHaveValue('6.5');
  await expect(details.getByRole('alert')).toHaveCount(0);
});

test('details: pump curve table and chart', async ({ page }) => {
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  const details = page.getByRole('region', { name: 'Details' });
  await expect(details.getByRole('img', { name: /Pump head curve/ })).toBeVisible();
  await expect(details.locator('circle.operating')).toHaveCount(1);
  const firstHead = details.getByLabel('Head curve at rated speed row 1 Head, m');
  const before = await firstHead.inputValue();
  await firstHead.fill('55');
  await firstHead.press('Enter');
  await expect(firstHead).toHaveValue('55');
  expect(before).not.toBe('55');
  await page.screenshot({ path: 'e2e/screenshots/details-pump.png' });
});

test('with nothing selected, details shows the project settings', async ({ page }) => {
  const details = page.getByRole('region', { name: 'Details' });
  await expect(details.getByText('Project settings')).toBeVisible();
  const temperature = details.getByLabel('Temperature');
  await temperature.fill('140 F');
  await temperature.press('Enter');
  // 140 °F = 60 °C
  await expect(temperature).toHaveValue(/^60(\.0+)? °C$/);
});
