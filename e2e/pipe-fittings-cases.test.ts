/**
 * Issue 16 in Chromium, as a user works: a pipe's fittings typed in ("6 × 90° elbow") and
 * picked, listed in details and on the review sheet; a pump's suction flange raised, which
 * lowers NPSHa by the same height; a case that shuts a manual valve.
 */
import { test, expect, type Page } from '@playwright/test';

test.describe.configure({ retries: 2 });

async function ready(page: Page) {
  await page.goto('/');
  await page.waitForLoadState('networkidle');
  await expect(page.locator('g.node[data-kind="pump"]')).toBeVisible({ timeout: 30_000 });
}

function details(page: Page) {
  return page.getByRole('region', { name: 'Details' });
}

test('a pipe takes a fittings list typed or picked; the loss shows and undo removes it', async ({
  page,
}) => {
  await ready(page);
  await page.locator('g.pipe[data-pipe-id="L8"]').first().click({ force: true });
  const d = details(page);
  const add = d.getByLabel('Add fittings');
  await add.fill('6 × 90° elbow');
  await add.press('Enter');
  const table = d.getByRole('table', { name: /Fittings on/ });
  await expect(table).toContainText('90° elbow');
  await expect(d.getByLabel('Number of 90° elbow')).toHaveValue('6');
  // A check valve is refused with its reason, and nothing changes.
  await add.fill('swing check valve');
  await add.press('Enter');
  await expect(d.getByRole('alert')).toContainText('draw it on the sheet');
  await add.fill('');
  // Pick a gate valve from the list.
  await d.getByLabel('or pick').selectOption('gate-valve');
  await d.getByRole('button', { name: 'Add', exact: true }).click();
  await expect(table).toContainText('Gate valve');
  const results = d.getByRole('region', { name: 'Results' });
  await expect(results.getByText('Fittings loss', { exact: true })).toBeVisible();
  await expect(d.getByText('K of the fittings now')).toBeVisible();
  await page.screenshot({ path: 'e2e/screenshots/pipe-fittings.png' });
  // Losses at a chainage.
  await d.getByLabel('Losses act').selectOption('chainage');
  await expect(d.getByLabel('At chainage')).toBeVisible();
  // Undo takes the steps back (place, gate valve, elbows): the list is gone.
  for (let i = 0; i < 3; i++) await page.getByRole('button', { name: 'Undo' }).click();
  await expect(d.getByRole('table', { name: /Fittings on/ })).toHaveCount(0);
});

test('raising the suction flange lowers NPSHa by the same height', async ({ page }) => {
  await ready(page);
  await page.locator('g.node[data-kind="pump"] .symbol').click();
  const d = details(page);
  const results = d.getByRole('region', { name: 'Results' });
  const npsha = async () => {
    const row = results.getByText('NPSH available', { exact: true }).locator('xpath=..');
    const text = (await row.textContent()) ?? '';
    return Number(/(-?\d+(?:\.\d+)?)\s*m/.exec(text)?.[1]);
  };
  await expect(results.getByText('NPSH available', { exact: true })).toBeVisible();
  const before = await npsha();
  const elevation = await d.getByLabel('Elevation', { exact: true }).inputValue();
  const z = Number(/(-?\d+(?:\.\d+)?)/.exec(elevation)?.[1]);
  const flange = d.getByLabel('Suction flange');
  await flange.fill(`${z + 1} m`);
  await flange.press('Enter');
  await expect.poll(npsha).toBeCloseTo(before - 1, 1);
});

test('a case shuts a manual valve: its line stops, and the review sheet lists it', async ({
  page,
  context,
}) => {
  await ready(page);
  const panel = page.getByRole('region', { name: 'Cases' });
  await panel.getByRole('button', { name: '+ Case' }).click();
  const row = panel.locator('li[data-case]').last();
  const valve = panel.getByLabel('HV-102 open or shut');
  await valve.selectOption('shut');
  await expect(row).toContainText('1 changed');
  await row.getByRole('button', { name: /^Show / }).click();
  // The pump's line is shut: no flow along the rack in this case.
  await page.locator('g.pipe[data-pipe-id="L8"]').first().click({ force: true });
  const results = details(page).getByRole('region', { name: 'Results' });
  await expect(results).toContainText('no flow');
  const review = context.waitForEvent('page');
  await page.getByRole('button', { name: /Review sheet/ }).click();
  const sheet = await review;
  await sheet.waitForLoadState();
  await expect(sheet.locator('body')).toContainText('HV-102 shut');
});
