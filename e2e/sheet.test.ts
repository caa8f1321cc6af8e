import { test, expect, type Page, type Locator } from '@playwright/test';

// The dev server reloads the page when files change under it; retry such a run.
test.describe.configure({ retries: 2 });

/** Start from an empty project so every test sees only what it draws. */
async function emptyProject(page: Page) {
  await page.goto('/');
  await page.getByRole('button', { name: /Project/ }).click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await expect(page.locator('g.node')).toHaveCount(0);
}

async function centreOf(locator: Locator) {
  const b = (await locator.boundingBox())!;
  return { x: b.x + b.width / 2, y: b.y + b.height / 2 };
}

/** Drag a part from the shelf to (dx, dy) pixels from the sheet's top-left corner. */
async function dragPart(page: Page, part: string, dx: number, dy: number) {
  const from = await centreOf(page.locator(`[data-part="${part}"]`));
  const sheet = (await page.locator('svg.sheet').boundingBox())!;
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(sheet.x + dx, sheet.y + dy, { steps: 10 });
  await page.mouse.up();
}

async function dragBetween(page: Page, a: Locator, b: Locator) {
  const from = await centreOf(a);
  const to = await centreOf(b);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps: 10 });
  await page.mouse.up();
}

function port(page: Page, node: string, name: string) {
  return page.locator(`g.port[data-node="${node}"][data-port="${name}"] .port-hit`);
}

async function nodeId(page: Page, kind: string, index = 0) {
  return (await page
    .locator(`g.node[data-kind="${kind}"]`)
    .nth(index)
    .getAttribute('data-node-id'))!;
}

async function position(page: Page, id: string) {
  const t = (await page.locator(`g.node[data-node-id="${id}"]`).getAttribute('transform'))!;
  const [x, y] = t
    .replace(/translate\(|\)/g, '')
    .split(/[ ,]+/)
    .map(Number);
  return { x, y };
}

test('a part dragged from the shelf lands on the sheet where it is dropped', async ({ page }) => {
  await emptyProject(page);
  await dragPart(page, 'pump', 400, 300);
  const pump = page.locator('g.node[data-kind="pump"]');
  await expect(pump).toHaveCount(1);
  const box = (await page.locator('svg.sheet').boundingBox())!;
  const c = await centreOf(pump.locator('.hit'));
  expect(Math.abs(c.x - (box.x + 400))).toBeLessThan(25);
  expect(Math.abs(c.y - (box.y + 300))).toBeLessThan(25);
  await page.screenshot({ path: 'e2e/screenshots/sheet-placed.png' });
});

test('two ports are joined by dragging from one to the other; a bad join is refused', async ({
  page,
}) => {
  await emptyProject(page);
  await dragPart(page, 'vessel-open', 200, 300);
  await dragPart(page, 'pump', 500, 340);
  const vessel = await nodeId(page, 'vessel');
  const pump = await nodeId(page, 'pump');
  await dragBetween(page, port(page, vessel, 'N1'), port(page, pump, 'suction'));
  await expect(page.locator('g.pipe')).toHaveCount(1);

  // A pipe from the pump's discharge back to its own suction is refused with the reason.
  await dragBetween(page, port(page, pump, 'discharge'), port(page, pump, 'suction'));
  await expect(page.locator('g.pipe')).toHaveCount(1);
  await expect(page.locator('.status-line .message')).toContainText('two different parts');
  await expect(page.locator('.refusal')).toBeVisible();
  await page.screenshot({ path: 'e2e/screenshots/sheet-connected.png' });
});

test('a node dragged on the sheet moves as one undo step', async ({ page }) => {
  await emptyProject(page);
  await dragPart(page, 'pump', 400, 300);
  const pump = await nodeId(page, 'pump');
  const start = await position(page, pump);
  const body = await centreOf(page.locator(`g.node[data-node-id="${pump}"] .hit`));
  await page.mouse.move(body.x, body.y);
  await page.mouse.down();
  for (let i = 1; i <= 10; i++) await page.mouse.move(body.x + 12 * i, body.y + 6 * i);
  await page.mouse.up();
  const moved = await position(page, pump);
  expect(moved.x - start.x).toBe(120);
  expect(moved.y - start.y).toBe(60);

  await page.getByRole('button', { name: 'Undo' }).click();
  expect(await position(page, pump)).toEqual(start);
  // one step back also removes the placement: proves the drag was exactly one step
  await page.getByRole('button', { name: 'Redo' }).click();
  expect(await position(page, pump)).toEqual(moved);
  await page.keyboard.press('Control+z');
  expect(await position(page, pump)).toEqual(start);
  await page.keyboard.press('Control+z');
  await expect(page.locator('g.node')).toHaveCount(0);
  await page.keyboard.press('Control+Shift+z');
  await page.keyboard.press('Control+Shift+z');
  expect(await position(page, pump)).toEqual(moved);
});

test('delete removes a part and its pipes; undo brings them back', async ({ page }) => {
  await emptyProject(page);
  await dragPart(page, 'vessel-open', 200, 300);
  await dragPart(page, 'pump', 500, 340);
  const vessel = await nodeId(page, 'vessel');
  const pump = await nodeId(page, 'pump');
  await dragBetween(page, port(page, vessel, 'N1'), port(page, pump, 'suction'));
  await expect(page.locator('g.pipe')).toHaveCount(1);
  await page.locator(`g.node[data-node-id="${pump}"] .symbol`).click();
  await page.keyboard.press('Delete');
  await expect(page.locator('g.node')).toHaveCount(1);
  await expect(page.locator('g.pipe')).toHaveCount(0);
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.locator('g.node')).toHaveCount(2);
  await expect(page.locator('g.pipe')).toHaveCount(1);
});

test('keyboard only: place a part from the shelf, move it, duplicate and delete it', async ({
  page,
}) => {
  await emptyProject(page);
  await page.locator('[data-part="gate-valve"]').focus();
  await page.keyboard.press('Enter');
  const valve = page.locator('g.node[data-kind="fitting"]');
  await expect(valve).toHaveCount(1);
  const id = (await valve.getAttribute('data-node-id'))!;
  // placed at the centre of the sheet
  const box = (await page.locator('svg.sheet').boundingBox())!;
  const c = await centreOf(valve.locator('.hit'));
  expect(Math.abs(c.x - (box.x + box.width / 2))).toBeLessThan(25);
  expect(Math.abs(c.y - (box.y + box.height / 2))).toBeLessThan(25);
  // focus is on the sheet, the new part selected: arrows move it one grid step
  const start = await position(page, id);
  await page.keyboard.press('ArrowRight');
  await page.keyboard.press('ArrowDown');
  expect(await position(page, id)).toEqual({ x: start.x + 20, y: start.y + 20 });
  await page.keyboard.press('Control+d');
  await expect(valve).toHaveCount(2);
  await page.keyboard.press('Delete');
  await expect(valve).toHaveCount(1);
  await page.keyboard.press('Control+c');
  await page.keyboard.press('Control+v');
  await expect(valve).toHaveCount(1);
  // ] selects the next part: the only one left
  await page.keyboard.press(']');
  await expect(page.locator(`g.node.selected[data-node-id="${id}"]`)).toHaveCount(1);
  await page.keyboard.press('Control+c');
  await page.keyboard.press('Control+v');
  await expect(valve).toHaveCount(2);
});

test('pipe tool: bends become waypoints in one undo step', async ({ page }) => {
  await emptyProject(page);
  await dragPart(page, 'vessel-open', 160, 300);
  await dragPart(page, 'vessel-open', 760, 300);
  const a = await nodeId(page, 'vessel', 0);
  const b = await nodeId(page, 'vessel', 1);
  const sheet = (await page.locator('svg.sheet').boundingBox())!;
  await page.locator('[data-part="pipe"]').click();
  await port(page, a, 'N1').click();
  await page.mouse.click(sheet.x + 360, sheet.y + 160);
  await page.mouse.click(sheet.x + 560, sheet.y + 160);
  // the second vessel's left-side nozzle is N2
  await port(page, b, 'N2').click();
  await expect(page.locator('g.node[data-kind="waypoint"]')).toHaveCount(2);
  await expect(page.locator('g.pipe')).toHaveCount(3);
  await page.screenshot({ path: 'e2e/screenshots/sheet-pipe-tool.png' });
  await page.keyboard.press('Escape');
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.locator('g.node[data-kind="waypoint"]')).toHaveCount(0);
  await expect(page.locator('g.pipe')).toHaveCount(0);
});

test('box selection, zoom keys and fit keep the sheet usable', async ({ page }) => {
  await emptyProject(page);
  await dragPart(page, 'pump', 300, 300);
  await dragPart(page, 'pump', 400, 300);
  const sheet = (await page.locator('svg.sheet').boundingBox())!;
  await page.mouse.move(sheet.x + 200, sheet.y + 200);
  await page.mouse.down();
  await page.mouse.move(sheet.x + 500, sheet.y + 400, { steps: 5 });
  await page.mouse.up();
  await expect(page.locator('g.node.selected')).toHaveCount(2);
  await page.keyboard.press('+');
  await expect(page.locator('.zoom-level')).toHaveText('125%');
  await page.keyboard.press('f');
  await expect(page.locator('.zoom-level')).toHaveText('150%');
});

test('a finding clicked in the list selects its element on the sheet', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('g.node')).not.toHaveCount(0, { timeout: 30_000 });
  await page.getByRole('button', { name: /Project/ }).click();
  await page.getByRole('menuitem', { name: /Siphon/ }).click();
  await expect(page.getByLabel('Project name')).toHaveValue(/siphon/i);
  const finding = page.locator('.findings button.finding').first();
  await expect(finding).toBeVisible();
  await finding.click();
  await expect(page.locator('g.node.selected, g.pipe.selected').first()).toBeVisible();
  // the badge of a finding is drawn on the sheet too
  await expect(page.locator('svg.sheet .badge').first()).toBeVisible();
  await page.screenshot({ path: 'e2e/screenshots/sheet-findings.png' });
});
