/**
 * Cases and the review sheet in Chromium: a hot-liquid case added to demo 1 becomes the worst
 * NPSH case in the comparison; the review sheet opens in a new window, holds the caution, the
 * findings and each stored route's profile, and prints to PDF.
 */
import { test, expect, type Page } from '@playwright/test';
import { mkdirSync, readFileSync } from 'node:fs';
import { parseProjectFile } from '../src/lib/model/file';
import type { HeadrouteDocument } from '../src/lib/model/types';
import { compareCases } from '../src/lib/solver/compareCases';
import { comparisonCellText } from '../src/lib/report/comparisonCells';

const SHOTS = 'e2e/screenshots';
mkdirSync(SHOTS, { recursive: true });

const DEMO = 'static/examples/pump-over-rack.headroute.json';
const HOT_NAME = 'Hot liquid 97 °C';
const HOT_TEXT = '97 °C';
const HOT_KELVIN = 273.15 + 97;

function demoDocument(): HeadrouteDocument {
  const parsed = parseProjectFile(readFileSync(DEMO, 'utf8'));
  if (!parsed.ok) throw new Error('demo 1 does not parse');
  return parsed.document;
}

async function openDemo1(page: Page) {
  await page.goto('/');
  // The dev server may reload the page once while it prepares dependencies on first use.
  await page.waitForLoadState('networkidle');
  await expect(page.getByLabel('Project name')).toHaveValue(demoDocument().name, {
    timeout: 20_000,
  });
  // The demo's own cases are listed once it has loaded.
  await expect(casesPanel(page).locator('li[data-case]')).toHaveCount(
    Object.keys(demoDocument().cases).length,
  );
}

function casesPanel(page: Page) {
  return page.getByRole('region', { name: 'Cases' });
}

/** Adds a case, names it and sets its temperature through the panel. */
async function addHotCase(page: Page) {
  const panel = casesPanel(page);
  const before = await panel.locator('li[data-case]').count();
  await panel.getByRole('button', { name: '+ Case' }).click();
  await expect(panel.locator('li[data-case]')).toHaveCount(before + 1);
  const row = panel.locator('li[data-case]').last();
  const id = (await row.getAttribute('data-case'))!;
  await row.getByRole('button', { name: /^Rename / }).click();
  const rename = row.getByRole('textbox');
  await rename.fill(HOT_NAME);
  await rename.press('Enter');
  await expect(row.getByRole('button', { name: `Show ${HOT_NAME}` })).toBeVisible();
  const temperature = panel.getByRole('textbox', { name: 'Temperature' });
  await temperature.fill(HOT_TEXT);
  await temperature.press('Enter');
  await expect(row).toContainText('1 changed');
  return id;
}

test('a hot-liquid case on demo 1 becomes the worst NPSH case in the comparison', async ({
  page,
}) => {
  await openDemo1(page);
  const id = await addHotCase(page);
  const panel = casesPanel(page);
  // The new case is the one shown on the sheet and profile.
  await expect(panel.getByRole('button', { name: `Show ${HOT_NAME}` })).toHaveAttribute(
    'aria-pressed',
    'true',
  );

  // The sheet's findings are those of the case shown: the hot case's NPSH margin is short.
  const findings = page.getByRole('region', { name: 'Findings' });
  await expect(findings).toContainText('NPSH available');
  await panel.getByRole('button', { name: 'Show Base case' }).click();
  await expect(findings).not.toContainText('NPSH available');
  await panel.getByRole('button', { name: `Show ${HOT_NAME}` }).click();
  await expect(findings).toContainText('NPSH available');

  await panel.getByRole('button', { name: 'Compare' }).click();
  const table = page.getByRole('table', { name: 'Cases compared' });
  await expect(table).toBeVisible();
  await expect(table.locator('thead th').last()).toContainText(HOT_NAME);

  // The same document solved in Node: the table's figures and its worst marks agree.
  const doc = demoDocument();
  doc.cases[id] = { id, name: HOT_NAME, overrides: { temperature: HOT_KELVIN } };
  const comparison = compareCases(doc);
  const pumpId = Object.values(doc.nodes).find((n) => n.kind === 'pump')!.id;
  for (const key of [
    `pump:${pumpId}:npshAvailable`,
    `pump:${pumpId}:npshMargin`,
    'vapour-margin',
  ]) {
    const row = comparison.rows.find((r) => r.key === key)!;
    const hotIndex = comparison.cases.findIndex((c) => c.caseId === id);
    expect(row.worst, key).toBe(hotIndex);
    const cell = table.locator(`tr[data-row="${key}"] td[data-case="${id}"]`);
    await expect(cell).toHaveAttribute('data-worst', 'true');
    // Worst is said in words too, not by colour alone.
    await expect(cell).toContainText('◆ worst');
    await expect(cell).toContainText(comparisonCellText(comparison, row, hotIndex, 'SI').value);
    // Exactly one worst cell in the row.
    await expect(table.locator(`tr[data-row="${key}"] td[data-worst="true"]`)).toHaveCount(1);
  }
  await page.screenshot({ path: `${SHOTS}/cases-compare.png` });

  // On the profile, the envelope across cases names the hot case at the pump's suction.
  await page
    .getByRole('dialog', { name: 'Cases compared' })
    .getByRole('button', { name: 'Close' })
    .click();
  await expect(page.getByRole('dialog', { name: 'Cases compared' })).toHaveCount(0);
  const profile = page.getByTestId('profile-panel');
  // The envelope is off until asked for (it solves every case).
  await expect(profile.locator('[data-envelope="band"]')).toHaveCount(0);
  await profile.getByLabel('Case envelope').check();
  await expect(profile.locator('[data-envelope="band"]')).toHaveAttribute('d', /^M[\d.]+ [\d.]+L/);
  const pumpMark = profile.locator(`[data-envelope-pump="${pumpId}"]`);
  await expect(pumpMark).toHaveAttribute('data-worst-case', HOT_NAME);
  await expect(pumpMark).toContainText(`least NPSH margin: ${HOT_NAME}`);
  // The note sits above the plot, clear of the grade lines.
  const plotTop = Number(await profile.locator('rect.plot').getAttribute('y'));
  expect(Number(await pumpMark.getAttribute('y'))).toBeLessThan(plotTop);
  await page.screenshot({ path: `${SHOTS}/cases-envelope.png` });
  await panel.getByRole('button', { name: 'Compare' }).click();
  // The comparison sits under the sheet: the case list and the profile stay in view.
  const dialog = page.getByRole('dialog', { name: 'Cases compared' });
  await expect(dialog).toBeVisible();
  await expect(panel.getByRole('button', { name: `Show ${HOT_NAME}` })).toBeInViewport();
  await expect(profile.locator('rect.plot')).toBeInViewport();
  // Escape closes it and gives focus back to Compare; Compare opens it again.
  await dialog.press('Escape');
  await expect(dialog).toHaveCount(0);
  await expect(panel.getByRole('button', { name: 'Compare' })).toBeFocused();
  await panel.getByRole('button', { name: 'Compare' }).click();

  // The table follows edits: a cooler hot case is no longer the worst NPSHa.
  const temperature = panel.getByRole('textbox', { name: 'Temperature' });
  await temperature.fill('40 °C');
  await temperature.press('Enter');
  const npsha = table.locator(`tr[data-row="pump:${pumpId}:npshAvailable"]`);
  await expect(npsha.locator(`td[data-case="${id}"]`)).not.toHaveAttribute('data-worst', 'true');
  await expect(npsha.locator('td[data-worst="true"]')).toHaveCount(1);

  // Bad input is refused with its reason and the case keeps its last good value.
  await temperature.fill('hot');
  await temperature.press('Enter');
  await expect(panel.getByRole('alert')).toContainText('not a number');
  await expect(npsha.locator(`td[data-case="${id}"]`)).not.toHaveAttribute('data-worst', 'true');
});

test('cases can be duplicated, renamed, deleted, and the deletion undone', async ({ page }) => {
  await openDemo1(page);
  const panel = casesPanel(page);
  const start = await panel.locator('li[data-case]').count();
  const first = panel.locator('li[data-case]').first();
  const label = await first.getByRole('button', { name: /^Show / }).getAttribute('aria-label');
  const name = label!.replace(/^Show /, '');
  await first.getByRole('button', { name: /^Duplicate / }).click();
  await expect(panel.locator('li[data-case]')).toHaveCount(start + 1);
  const copy = panel.locator('li[data-case]').last();
  await expect(copy).toContainText(`${name} (copy)`);
  await copy.getByRole('button', { name: /^Delete / }).click();
  await expect(panel.locator('li[data-case]')).toHaveCount(start);
  await page.getByRole('button', { name: /^Undo/ }).click();
  await expect(panel.locator('li[data-case]')).toHaveCount(start + 1);
});

test('the review sheet opens in a new window, holds caution, findings and profiles, and prints to PDF', async ({
  page,
}) => {
  await openDemo1(page);
  await addHotCase(page);
  const doc = demoDocument();

  const [review] = await Promise.all([
    page.waitForEvent('popup'),
    casesPanel(page).getByRole('button', { name: 'Review sheet' }).click(),
  ]);
  await review.waitForLoadState('load');
  await expect(review).toHaveTitle(`Review sheet — ${doc.name}`);
  const html = await review.content();
  expect(html).toContain('verify in detailed design against the applicable codes');
  expect(html).toContain('competent, licensed engineer');
  await expect(review.locator('#findings')).toContainText('Findings');
  // The shown (hot) case's findings are listed with their level in words; the other cases too.
  await expect(review.locator('#findings')).toContainText(`On the sheet — ${HOT_NAME}`);
  const margin = review.locator('#findings li[data-code="npsh-margin-low"]').first();
  await expect(margin).toContainText('CAUTION');
  await expect(margin).toContainText('NPSH');
  for (const c of Object.values(doc.cases)) {
    await expect(review.locator('#findings')).toContainText(`In case “${c.name}”`);
  }
  for (const route of Object.values(doc.routes)) {
    const figure = review.locator(`figure[data-route="${route.name}"]`);
    await expect(figure).toHaveCount(1);
    await expect(figure.locator('path[data-line="hgl"]')).toHaveAttribute('d', /^M/);
  }
  await expect(review.locator('#comparison th').filter({ hasText: HOT_NAME })).toHaveCount(1);
  await expect(review.locator('script')).toHaveCount(0);

  await review.setViewportSize({ width: 900, height: 1200 });
  await review.screenshot({ path: `${SHOTS}/review-sheet.png`, fullPage: true });
  await review.emulateMedia({ media: 'print' });
  await review.screenshot({ path: `${SHOTS}/review-sheet-print.png`, fullPage: true });

  for (const format of ['A4', 'Letter'] as const) {
    const pdf = await review.pdf({ format, printBackground: true });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdf.length).toBeGreaterThan(50_000);
    // Page count from the PDF's page objects: the sheet runs to several pages.
    const pages = pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? [];
    expect(pages.length, `${format} pages`).toBeGreaterThan(2);
  }
});
