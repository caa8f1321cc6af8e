import { test, expect, type Page, type Download } from '@playwright/test';
import { mkdirSync, readFileSync } from 'node:fs';

const SHOTS = 'e2e/screenshots';
mkdirSync(SHOTS, { recursive: true });

const CAUTION = 'Screening result — verify in detailed design';

function panel(page: Page) {
  return page.getByTestId('profile-panel');
}

/** The app opens demo 1 (pump over a pipe rack); wait until its profile is drawn. */
async function openDemo1(page: Page) {
  await page.goto('/');
  await expect(panel(page).locator('svg.chart path[data-line="hgl"]')).toHaveAttribute(
    'd',
    /^M[\d.]+,[\d.]+L/,
    { timeout: 20_000 },
  );
}

async function downloadText(download: Download): Promise<string> {
  return readFileSync((await download.path())!, 'utf8');
}

/** Well-formedness and content of an SVG document, checked by the browser's own XML parser. */
async function inspectSvg(page: Page, text: string) {
  return page.evaluate((svg) => {
    const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
    return {
      errors: doc.getElementsByTagName('parsererror').length,
      root: doc.documentElement.tagName,
      lines: [...doc.querySelectorAll('path[data-line]')]
        .filter((p) => (p.getAttribute('d') ?? '').startsWith('M'))
        .map((p) => p.getAttribute('data-line')),
      text: doc.documentElement.textContent ?? '',
    };
  }, text);
}

test('demo 1 shows the profile: grade lines, labels, legend and a readout on hover', async ({
  page,
}) => {
  await openDemo1(page);
  const chart = panel(page).locator('svg.chart');
  for (const line of ['pipe', 'hgl', 'egl', 'vapour']) {
    await expect(chart.locator(`path[data-line="${line}"]`)).toHaveAttribute('d', /^M/);
  }
  // The pump's NPSH note and at least one waypoint handle are on the chart.
  await expect(chart.locator('g.npsh text').first()).toContainText('NPSHa');
  await expect(chart.locator('[data-waypoint]').first()).toBeVisible();
  await expect(panel(page).getByRole('list', { name: 'Legend' })).toContainText('Vapour line');

  const box = (await chart.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.6, box.y + box.height * 0.45);
  const readout = panel(page).getByTestId('profile-readout');
  await expect(readout).toContainText('Chainage');
  await expect(readout).toContainText('To vapour');
  await page.screenshot({ path: `${SHOTS}/profile-demo1.png` });
});

async function openDemoByTitle(page: Page, title: string) {
  page.on('dialog', (d) => void d.accept());
  await page.getByRole('button', { name: /Project/ }).click();
  await page.getByRole('menuitem', { name: title }).click();
  await expect(page.getByText(`Opened the demo project`)).toBeVisible();
}

function details(page: Page) {
  return page.locator('section.details');
}

async function setTemperature(page: Page, text: string) {
  const field = details(page).getByLabel('Temperature', { exact: true });
  await field.fill(text);
  await field.press('Enter');
}

test('demo 1: raising the temperature until the rack high point flashes marks a stop span there; lowering it clears it', async ({
  page,
}) => {
  await openDemo1(page);
  const chart = panel(page).locator('svg.chart');
  const crossing = chart.locator('[data-waypoint="W1"]');
  await expect(crossing).toBeVisible();
  // 60 °C: past FV-101 the rack runs under vacuum (caution) but well above the vapour pressure.
  await expect(chart.locator('rect[data-span="vacuum"]').first()).toBeVisible();
  await expect(chart.locator('rect[data-span="vapour"]')).toHaveCount(0);

  // The road crossing (+14 m) sits near 73 kPa abs; water boils at 73 kPa near 91 °C
  // (IAPWS-IF97 region 4), while the pump suction stays near 122 kPa abs.
  await setTemperature(page, '95 °C');
  const stop = chart.locator('rect[data-span="vapour"]');
  await expect(stop).toHaveCount(1);
  await expect(chart.locator('text[data-span-label="vapour"]')).toContainText(
    'Below vapour pressure: min',
  );
  // The span covers the high point, not the pump suction.
  const span = (await stop.boundingBox())!;
  const high = (await crossing.boundingBox())!;
  const highX = high.x + high.width / 2;
  expect(highX).toBeGreaterThan(span.x);
  expect(highX).toBeLessThan(span.x + span.width);
  const pumpId = 'P1';
  const pumpLabel = (await chart.locator(`text.label[data-element="${pumpId}"]`).boundingBox())!;
  expect(pumpLabel.x + pumpLabel.width / 2).toBeLessThan(span.x);
  await page.screenshot({ path: `${SHOTS}/profile-demo1-95C.png` });

  await setTemperature(page, '60 °C');
  await expect(stop).toHaveCount(0);
  await page.screenshot({ path: `${SHOTS}/profile-demo1-60C.png` });
});

test('a waypoint dragged on the profile changes its elevation in details; one undo restores it', async ({
  page,
}) => {
  await openDemo1(page);
  const chart = panel(page).locator('svg.chart');
  const handle = chart.locator('[data-waypoint]').first();
  const pipeBefore = await chart.locator('path[data-line="pipe"]').getAttribute('d');
  const box = (await handle.boundingBox())!;
  const start = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  await page.mouse.move(start.x, start.y - 15, { steps: 4 });
  await page.mouse.move(start.x, start.y - 30, { steps: 4 });
  await page.mouse.up();

  // The drag selects the waypoint: details shows its new, higher elevation.
  const elevation = details(page).getByLabel('Elevation', { exact: true });
  await expect(elevation).not.toHaveValue('14 m');
  const raised = parseFloat(await elevation.inputValue());
  expect(raised).toBeGreaterThan(14);
  await expect(chart.locator('path[data-line="pipe"]')).not.toHaveAttribute('d', pipeBefore!);
  await page.screenshot({ path: `${SHOTS}/profile-waypoint-dragged.png` });

  await page.locator('svg.sheet').click({ position: { x: 5, y: 5 } });
  await page.keyboard.press('Control+z');
  await expect(chart.locator('path[data-line="pipe"]')).toHaveAttribute('d', pipeBefore!);
  await chart.locator('[data-waypoint]').first().focus();
  await page.keyboard.press('Enter');
  await expect(details(page).getByLabel('Elevation', { exact: true })).toHaveValue('14 m');

  // From the keyboard: the arrow keys move the focused waypoint by 0.1 m, one undo step each.
  await page.keyboard.press('ArrowUp');
  await expect(details(page).getByLabel('Elevation', { exact: true })).toHaveValue('14.1 m');
  await page.locator('svg.sheet').click({ position: { x: 5, y: 5 } });
  await page.keyboard.press('Control+z');
  await chart.locator('[data-waypoint]').first().focus();
  await page.keyboard.press('Enter');
  await expect(details(page).getByLabel('Elevation', { exact: true })).toHaveValue('14 m');
});

test('exports download: SVG parses with the lines and caution, PNG is 2×, CSV has its header', async ({
  page,
}) => {
  await openDemo1(page);
  const bar = panel(page);

  const [svgDownload] = await Promise.all([
    page.waitForEvent('download'),
    bar.getByRole('button', { name: 'SVG' }).click(),
  ]);
  expect(svgDownload.suggestedFilename()).toMatch(/-profile\.svg$/);
  const svg = await downloadText(svgDownload);
  const parsed = await inspectSvg(page, svg);
  expect(parsed.errors).toBe(0);
  expect(parsed.root).toBe('svg');
  expect(parsed.lines.sort()).toEqual(['egl', 'hgl', 'pipe', 'vapour']);
  expect(parsed.text).toContain(CAUTION);
  expect(parsed.text).toContain('Pump over a pipe rack into a vented receiver');
  expect(parsed.text).toContain('Route: Storage tank T-101 → Receiver V-201');
  expect(parsed.text).toContain('Case: Base case');
  expect(parsed.text).toMatch(/Liquid: Water at 60 °C/);
  expect(parsed.text).toMatch(/Date: \d{4}-\d{2}-\d{2}/);

  const [pngDownload] = await Promise.all([
    page.waitForEvent('download'),
    bar.getByRole('button', { name: 'PNG' }).click(),
  ]);
  const png = readFileSync((await pngDownload.path())!);
  // PNG signature, then the IHDR chunk: width and height as big-endian 32-bit integers.
  expect(png.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
  expect(png.readUInt32BE(16)).toBe(2400);
  expect(png.readUInt32BE(20)).toBe(1520);

  const [csvDownload] = await Promise.all([
    page.waitForEvent('download'),
    bar.getByRole('button', { name: 'CSV' }).click(),
  ]);
  const csv = (await downloadText(csvDownload)).split('\n');
  expect(csv[0]).toBe('# Project: Pump over a pipe rack into a vented receiver');
  expect(csv.some((l) => l.startsWith('# Screening result'))).toBe(true);
  const header = csv.find((l) => !l.startsWith('#'))!;
  expect(header.startsWith('chainage (m),element,at,elevation (m),HGL (m),EGL (m)')).toBe(true);

  // Look at the exported drawing as a person would.
  await page.setContent(svg.replace(/^<\?xml[^>]*\?>/, ''));
  await page.setViewportSize({ width: 1200, height: 760 });
  await page.screenshot({ path: `${SHOTS}/profile-export.png` });
});

test('selection and hover are shared between the profile and the sheet', async ({ page }) => {
  await openDemo1(page);
  const chart = panel(page).locator('svg.chart');
  const id = (await chart.locator('[data-waypoint]').first().getAttribute('data-waypoint'))!;
  const onSheet = page.locator(`svg.sheet g.node[data-node-id="${id}"]`);

  await chart.locator(`text.label[data-element="${id}"]`).hover();
  await expect(onSheet).toHaveClass(/hovered/);
  await chart.locator(`text.label[data-element="${id}"]`).click();
  await expect(onSheet).toHaveClass(/selected/);
  await expect(details(page)).toContainText('Road crossing high point');

  // And the other way round: a pump picked on the sheet is ringed on the profile.
  const pump = page.locator('svg.sheet g.node[data-kind="pump"]').first();
  const pumpId = (await pump.getAttribute('data-node-id'))!;
  await pump.click();
  await expect(pump).toHaveClass(/selected/);
  await expect(chart.locator('circle.node-ring:not(.hovered)')).toHaveCount(1);
  const ring = (await chart.locator('circle.node-ring:not(.hovered)').boundingBox())!;
  const label = (await chart.locator(`text.label[data-element="${pumpId}"]`).boundingBox())!;
  // The ring sits above the pump's label on the chainage axis (labels may shift sideways).
  expect(Math.abs(ring.x + ring.width / 2 - (label.x + label.width / 2))).toBeLessThan(60);
  await page.screenshot({ path: `${SHOTS}/profile-shared-selection.png` });
});

test('routes: a stored route can be chosen, a picked one kept, and zoom runs along chainage', async ({
  page,
}) => {
  await openDemo1(page);
  await openDemoByTitle(page, 'Branched feed with minimum-flow return');
  const bar = panel(page);
  const route = bar.getByLabel('Route', { exact: true });
  const to = bar.getByLabel('To', { exact: true });

  await route.selectOption({ label: 'T-301 to V-303' });
  await expect(to.locator('option:checked')).toHaveText('Pressurised receiver V-303');
  await to.selectOption({ label: 'Head tank V-302' });
  await expect(route.locator('option:checked')).toHaveText('Picked ends');
  await expect(bar.locator('svg.chart text.label').last()).toHaveText('Head tank V-302');
  await bar.getByRole('button', { name: 'Keep route' }).click();
  await expect(route.locator('option:checked')).toHaveText('Source tank T-301 → Head tank V-302');
  await expect(route.locator('option')).toHaveCount(4);
  await route.selectOption({ label: 'T-301 to V-303' });
  await expect(to.locator('option:checked')).toHaveText('Pressurised receiver V-303');

  // Zoom in with the wheel, then back to the whole route.
  const chart = bar.locator('svg.chart');
  const firstTick = () => chart.locator('g.axis text').filter({ hasText: /^\d/ }).allTextContents();
  const before = await firstTick();
  const box = (await chart.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.7, box.y + box.height * 0.4);
  await page.mouse.wheel(0, -600);
  const whole = bar.getByRole('button', { name: 'Whole' });
  await expect(whole).toBeEnabled();
  expect(await firstTick()).not.toEqual(before);
  await page.screenshot({ path: `${SHOTS}/profile-zoomed.png` });
  await whole.click();
  await expect(whole).toBeDisabled();
});

test('the profile follows the unit system and reads in the dark theme', async ({ page }) => {
  await openDemo1(page);
  const chart = panel(page).locator('svg.chart');
  await expect(chart.locator('g.axis')).toContainText('Chainage (m)');
  await page
    .getByRole('group', { name: 'Unit system' })
    .getByRole('button', { name: 'US' })
    .click();
  await expect(chart.locator('g.axis')).toContainText('Chainage (ft)');
  await expect(chart.locator('g.npsh')).toContainText('ft');
  await page.getByRole('button', { name: 'Dark theme' }).click();
  const box = (await chart.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.3, box.y + box.height * 0.4);
  await expect(panel(page).getByTestId('profile-readout')).toContainText('psi');
  await page.screenshot({ path: `${SHOTS}/profile-dark-us.png` });
});
