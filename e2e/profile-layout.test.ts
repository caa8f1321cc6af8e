/**
 * The centre column's layout in Chromium: the splitter between the sheet and the profile
 * (pointer and keyboard), the profile getting about half the height by default, and the case
 * envelope staying off until asked for.
 */
import { test, expect, type Page } from '@playwright/test';
import { mkdirSync, readFileSync } from 'node:fs';
import { parseProjectFile } from '../src/lib/model/file';

const SHOTS = 'e2e/screenshots';
mkdirSync(SHOTS, { recursive: true });

function demoName(): string {
  const parsed = parseProjectFile(
    readFileSync('static/examples/pump-over-rack.headroute.json', 'utf8'),
  );
  if (!parsed.ok) throw new Error('demo 1 does not parse');
  return parsed.document.name;
}

async function openDemo1(page: Page) {
  await page.setViewportSize({ width: 1440, height: 900 });
  await page.goto('/');
  await page.waitForLoadState('networkidle');
  await expect(page.getByLabel('Project name')).toHaveValue(demoName(), { timeout: 20_000 });
  await expect(page.getByTestId('profile-panel').locator('rect.plot')).toBeVisible();
}

async function plotHeight(page: Page): Promise<number> {
  return Number(
    await page.getByTestId('profile-panel').locator('rect.plot').getAttribute('height'),
  );
}

test('the profile gets about half the centre column, and the splitter resizes it', async ({
  page,
}) => {
  await openDemo1(page);
  const splitter = page.getByRole('separator', { name: 'Resize the profile' });
  await expect(splitter).toHaveAttribute('aria-valuenow', '50');
  // At 1440×900 the plot itself (inside the axes) is well over 150 px tall.
  const start = await plotHeight(page);
  expect(start).toBeGreaterThan(150);
  await page.screenshot({ path: `${SHOTS}/profile-layout-1440.png` });

  // Keyboard: Up gives the profile more room, Down less; Home and End go to the limits.
  await splitter.focus();
  await splitter.press('Shift+ArrowUp');
  await expect(splitter).toHaveAttribute('aria-valuenow', '60');
  await expect.poll(() => plotHeight(page)).toBeGreaterThan(start + 40);
  // End: as small as the profile may go (at least 160 px, so never below 15 %); still drawn.
  await splitter.press('End');
  const least = Number(await splitter.getAttribute('aria-valuenow'));
  expect(least).toBeGreaterThanOrEqual(15);
  expect(least).toBeLessThanOrEqual(25);
  await expect(page.getByTestId('profile-panel').locator('rect.plot')).toBeVisible();
  await splitter.press('Home');
  await expect(splitter).toHaveAttribute('aria-valuenow', '85');

  // Pointer: drag the splitter down to about two thirds of the way.
  const column = (await page.locator('main.centre').boundingBox())!;
  const box = (await splitter.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width / 2, column.y + column.height * 0.6, { steps: 5 });
  await page.mouse.up();
  const now = Number(await splitter.getAttribute('aria-valuenow'));
  expect(now).toBeGreaterThanOrEqual(38);
  expect(now).toBeLessThanOrEqual(42);

  // The size is session state: it is not in the saved document.
  const saved = await page.evaluate(() => JSON.stringify(localStorage));
  expect(saved).not.toContain('profileShare');
});

test('the case envelope is off until asked for, and its notes sit above the plot', async ({
  page,
}) => {
  await openDemo1(page);
  const profile = page.getByTestId('profile-panel');
  const toggle = profile.getByLabel('Case envelope');
  await expect(toggle).not.toBeChecked();
  await expect(profile.locator('[data-envelope="band"]')).toHaveCount(0);
  await toggle.check();
  await expect(profile.locator('[data-envelope="band"]')).toHaveAttribute('d', /^M/);
  const plotTop = Number(await profile.locator('rect.plot').getAttribute('y'));
  const notes = profile.locator('[data-envelope-pump], [data-envelope-span]');
  expect(await notes.count()).toBeGreaterThan(0);
  for (const y of await notes.evaluateAll((els) => els.map((e) => Number(e.getAttribute('y'))))) {
    expect(y).toBeLessThan(plotTop);
  }
  await toggle.uncheck();
  await expect(profile.locator('[data-envelope="band"]')).toHaveCount(0);
});

test('the case envelope waits while a waypoint is dragged and catches up when it is let go', async ({
  page,
}) => {
  await openDemo1(page);
  const profile = page.getByTestId('profile-panel');
  await profile.getByLabel('Case envelope').check();
  const band = profile.locator('g[data-part="envelope"]');
  await expect(band).toHaveCount(1);
  await expect(band).not.toHaveClass(/stale/);

  const handle = profile.locator('svg.chart [data-waypoint]').first();
  const box = (await handle.boundingBox())!;
  const start = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  await page.mouse.move(start.x, start.y - 20, { steps: 4 });
  // Held: the document has changed, the envelope has not been solved again (drawn dimmed).
  await page.waitForTimeout(600);
  await expect(band).toHaveClass(/stale/);
  await page.mouse.up();
  // Let go: it is solved once for the new document.
  await expect(band).not.toHaveClass(/stale/, { timeout: 5_000 });
  await page.keyboard.press('Control+z');
});
