import { test, expect, type Page, type Locator } from '@playwright/test';
import { execFileSync } from 'node:child_process';

test.describe.configure({ retries: 2 });

async function centreOf(locator: Locator) {
  const b = (await locator.boundingBox())!;
  return { x: b.x + b.width / 2, y: b.y + b.height / 2 };
}

async function dragPart(page: Page, part: string, dx: number, dy: number) {
  const from = await centreOf(page.locator(`[data-part="${part}"]`));
  const sheet = (await page.locator('svg.sheet').boundingBox())!;
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(sheet.x + dx, sheet.y + dy, { steps: 10 });
  await page.mouse.up();
}

async function join(page: Page, a: [string, string], b: [string, string]) {
  const port = (n: string, p: string) =>
    page.locator(`g.port[data-node="${n}"][data-port="${p}"] .port-hit`);
  const from = await centreOf(port(...a));
  const to = await centreOf(port(...b));
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps: 10 });
  await page.mouse.up();
}

async function type(field: Locator, text: string) {
  await field.fill(text);
  await field.press('Enter');
  await expect(field).toHaveAttribute('aria-invalid', 'false');
}

/** The number in a readout value such as "30.1 m3/h". */
function number(text: string | null): number {
  return Number((text ?? '').trim().split(/\s+/)[0]);
}

/** Open the app (it starts on a demo) and start a new, empty project. */
async function startEmptySheet(page: Page) {
  await page.goto('/');
  await expect(page.locator('g.node')).not.toHaveCount(0, { timeout: 30_000 });
  await page.getByRole('button', { name: /Project/ }).click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await expect(page.locator('g.node')).toHaveCount(0);
}

/**
 * Read the pump's flow and NPSHa from its hover readout, save the project, solve the saved
 * file with the command line, and check the screen agrees: it shows three significant
 * figures, so within half a unit of the last one.
 */
async function expectScreenMatchesCli(page: Page, pump: string, screenshot: string) {
  await page.locator(`g.node[data-node-id="${pump}"] .symbol`).hover();
  const readout = page.getByRole('tooltip');
  await expect(readout).toBeVisible();
  const value = (label: string) =>
    readout.locator('dt', { hasText: new RegExp(`^${label}$`) }).locator('+ dd');
  const shownFlow = number(await value('Flow').textContent());
  const shownNpsha = number(await value('NPSHa').textContent());
  await page.screenshot({ path: `e2e/screenshots/${screenshot}` });

  const download = page.waitForEvent('download');
  await page.keyboard.press('Control+s');
  const path = await (await download).path();
  const cli = JSON.parse(
    execFileSync('node', ['bin/headroute.js', 'solve', path, '--format', 'json'], {
      encoding: 'utf8',
    }),
  );
  expect(cli.converged).toBe(true);
  const solved = cli.pumps.find((p: { id: string }) => p.id === pump);
  const flowM3h = solved.flow * 3600;
  expect(flowM3h).toBeGreaterThan(0);
  expect(shownFlow).toBeGreaterThan(0);
  expect(Math.abs(shownFlow - flowM3h)).toBeLessThanOrEqual(0.005 * flowM3h + 1e-9);
  expect(Math.abs(shownNpsha - solved.npshAvailable)).toBeLessThanOrEqual(
    0.005 * solved.npshAvailable + 1e-9,
  );
}

test('a route drawn with the mouse solves on screen as the command line solves its file', async ({
  page,
}) => {
  await startEmptySheet(page);

  await dragPart(page, 'vessel-open', 160, 320);
  await dragPart(page, 'pump', 420, 380);
  await dragPart(page, 'vessel-open', 740, 260);
  const ids = await page
    .locator('g.node')
    .evaluateAll((els) => els.map((e) => e.getAttribute('data-node-id')!));
  const [tank, pump, receiver] = ids;
  await join(page, [tank, 'N1'], [pump, 'suction']);
  await join(page, [pump, 'discharge'], [receiver, 'N2']);
  await expect(page.locator('g.pipe')).toHaveCount(2);

  const details = page.getByRole('region', { name: 'Details' });
  // the receiver stands 8 m up; its liquid level is typed in feet
  await page.locator(`g.node[data-node-id="${receiver}"] .symbol`).click();
  await type(details.getByLabel('Bottom elevation'), '8 m');
  await type(details.getByLabel('Liquid surface elevation'), '36 ft');
  // a long discharge pipe, typed in feet
  const discharge = page.locator('g.pipe').nth(1);
  await discharge.locator('.hit').click({ force: true });
  await type(details.getByLabel('Length', { exact: true }), '150 ft');
  // nothing selected: project temperature in Fahrenheit
  await page.locator('svg.sheet').click({ position: { x: 20, y: 20 } });
  await type(details.getByLabel('Temperature'), '104 F');

  // read the pump's flow and NPSHa from its hover readout; save and solve the same file
  await expectScreenMatchesCli(page, pump, 'build-route.png');
});

/** Drag a part onto the sheet and return the id of the node it made. */
async function place(page: Page, part: string, dx: number, dy: number): Promise<string> {
  const idsNow = () =>
    page.locator('g.node').evaluateAll((els) => els.map((e) => e.getAttribute('data-node-id')!));
  const before = new Set(await idsNow());
  // the lower parts of the shelf may be scrolled out of view
  await page.locator(`[data-part="${part}"]`).scrollIntoViewIfNeeded();
  await dragPart(page, part, dx, dy);
  await expect.poll(async () => (await idsNow()).length).toBe(before.size + 1);
  return (await idsNow()).find((id) => !before.has(id))!;
}

test("demo 1's route drawn with the mouse: tank, strainer, pump, check valve, control valve, rack high point, vented receiver", async ({
  page,
}) => {
  await startEmptySheet(page);

  const tank = await place(page, 'vessel-open', 90, 220);
  const strainer = await place(page, 'strainer', 220, 280);
  const pump = await place(page, 'pump', 330, 280);
  const check = await place(page, 'swing-check-valve', 440, 280);
  const valve = await place(page, 'control-valve', 550, 280);
  const high = await place(page, 'waypoint', 660, 110);
  const receiver = await place(page, 'vessel-open', 790, 170);
  await join(page, [tank, 'N1'], [strainer, 'in']);
  await join(page, [strainer, 'out'], [pump, 'suction']);
  await join(page, [pump, 'discharge'], [check, 'in']);
  await join(page, [check, 'out'], [valve, 'in']);
  await join(page, [valve, 'out'], [high, 'in']);
  await join(page, [high, 'out'], [receiver, 'N1']);
  await expect(page.locator('g.pipe')).toHaveCount(6);

  const details = page.getByRole('region', { name: 'Details' });
  const select = (id: string) => page.locator(`g.node[data-node-id="${id}"] .symbol`).click();
  // the road crossing on the rack 14 m up, the vented receiver standing 8 m up
  await select(high);
  await type(details.getByLabel('Elevation'), '14 m');
  await select(receiver);
  await type(details.getByLabel('Bottom elevation'), '8 m');
  // warm water, as in the demo
  await page.locator('svg.sheet').click({ position: { x: 20, y: 20 } });
  await type(details.getByLabel('Temperature'), '60 °C');

  await expectScreenMatchesCli(page, pump, 'build-demo1-route.png');
});

test('a boundary switched to hold a flow draws that flow from the tank, and undo gives the header back', async ({
  page,
}) => {
  await startEmptySheet(page);
  const tank = await place(page, 'vessel-open', 200, 300);
  const drawOff = await place(page, 'boundary', 600, 340);
  await join(page, [tank, 'N1'], [drawOff, 'p']);
  await expect(page.locator('g.pipe')).toHaveCount(1);

  const details = page.getByRole('region', { name: 'Details' });
  await page.locator(`g.node[data-node-id="${drawOff}"] .symbol`).click();
  const holds = details.getByLabel('Holds');
  await expect(holds).toHaveValue('pressure');
  // The default header at 2 barg pushes liquid back into the 3 m tank (the label shows the
  // size of the flow; its arrow the direction).
  const flowText = page.locator('g.pipe text.flow');
  await expect.poll(async () => number(await flowText.textContent())).toBeGreaterThan(20);
  const headerFlow = number(await flowText.textContent());

  await holds.selectOption('flow');
  // Switching alone keeps the flow it passed, so nothing on the sheet changes yet.
  const outflow = details.getByLabel('Outflow');
  await expect(outflow).toBeVisible();
  await expect(outflow).toHaveValue(/^-/); // it supplied the tank
  await expect.poll(async () => number(await flowText.textContent())).toBe(headerFlow);
  await type(outflow, '12 m3/h');
  await expect.poll(async () => number(await flowText.textContent())).toBeCloseTo(12, 6);
  await expect(page.locator(`g.node[data-node-id="${drawOff}"] path.arrow`)).toHaveCount(1);
  await page.screenshot({ path: 'e2e/screenshots/boundary-draw-off.png' });

  await page.getByRole('button', { name: 'Undo' }).click();
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(holds).toHaveValue('pressure');
  await expect.poll(async () => number(await flowText.textContent())).toBe(headerFlow);
});
