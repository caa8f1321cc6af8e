/**
 * The mark of a span below vapour pressure cannot be missed: demo 1 at 91.4 °C has a span of
 * about 2 m near the road-crossing high point of its ~105 m route (the solver's own profile,
 * checked in test/chart/spanMarks.test.ts). It is drawn at least MIN_SPAN_PX wide, over the
 * vacuum span, with a marker at its smallest margin and a label with that margin.
 */
import { test, expect } from '@playwright/test';
import { mkdirSync } from 'node:fs';
import { MIN_SPAN_PX } from '../src/lib/chart/profileStyle';

mkdirSync('e2e/screenshots', { recursive: true });

for (const width of [1440, 1024]) {
  test(`a 2 m span below vapour pressure shows on a 105 m route (${width} px wide)`, async ({
    page,
  }) => {
    await page.setViewportSize({ width, height: 900 });
    await page.goto('/');
    await page.waitForLoadState('networkidle');
    await expect(page.locator('g.node[data-kind="pump"]')).toBeVisible({ timeout: 30_000 });
    const details = page.getByRole('region', { name: 'Details' });
    const temperature = details.getByLabel('Temperature', { exact: true });
    await temperature.fill('91.4 °C');
    await temperature.press('Enter');
    const profile = page.getByRole('region', { name: 'Profile' });
    const span = profile.locator('rect[data-span="vapour"]');
    await expect(span).toHaveCount(1);
    const box = (await span.boundingBox())!;
    expect(box.width).toBeGreaterThanOrEqual(MIN_SPAN_PX - 0.5);
    // Drawn over the vacuum span: later in the document, so painted above it.
    const order = await profile
      .locator('rect[data-span]')
      .evaluateAll((els) => els.map((e) => e.getAttribute('data-span')));
    expect(order.lastIndexOf('vacuum')).toBeLessThan(order.indexOf('vapour'));
    await expect(profile.locator('[data-span-marker="vapour"]')).toBeVisible();
    await expect(profile.locator('line[data-span-mark="vapour"]')).toHaveCount(1);
    await expect(profile.locator('text[data-span-label="vapour"]')).toContainText(
      /Below vapour pressure: min -\d/,
    );
    await page.screenshot({ path: `e2e/screenshots/span-2m-${width}.png` });
  });
}
