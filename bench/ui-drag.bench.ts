/**
 * UI benchmark: in Chromium, the time from a pointer move that drags a node to (a) the sheet
 * painted with the node moved and (b) the sheet and profile painted with the solve result for
 * that document revision. Demo projects and a generated sheet of about 1,000 elements.
 * Figures are printed (median and 95th percentile), never asserted.
 *
 * Run: npx tsx bench/ui-drag.bench.ts   (starts its own `vite dev` on BENCH_PORT, default 4183)
 */
import { chromium, type Page } from '@playwright/test';
import { spawn } from 'node:child_process';
import { findChromium } from '../scripts/browser-path.js';
import { EXAMPLES } from '../src/lib/model/examples';
import { serializeProject } from '../src/lib/model/file';
import { network } from './networks';

const PORT = Number(process.env.BENCH_PORT ?? 4183);
const MOVES = Number(process.env.BENCH_MOVES ?? 40);

function quantile(sorted: number[], q: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1));
  return sorted[i];
}

/** A series route of about `elements` nodes + pipes, laid out in rows on the sheet. */
function generatedSheet(elements: number): string {
  const doc = network('series', Math.round(elements / 2));
  const ids = Object.keys(doc.nodes);
  const perRow = 25;
  ids.forEach((id, i) => {
    const row = Math.floor(i / perRow);
    const col = row % 2 === 0 ? i % perRow : perRow - 1 - (i % perRow);
    doc.nodes[id] = { ...doc.nodes[id], x: col * 120, y: row * 140 };
  });
  doc.name = `Generated series sheet, ${ids.length + Object.keys(doc.pipes).length} elements`;
  return serializeProject(doc);
}

async function waitForServer(url: string) {
  let last = '';
  for (let i = 0; i < 240; i++) {
    try {
      const response = await fetch(url);
      if (response.ok) return;
      last = `HTTP ${response.status}`;
    } catch (error) {
      last = String(error); // not up yet
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`dev server did not start at ${url}: ${last}`);
}

/**
 * In-page probe, as plain JavaScript text (tsx adds helpers to compiled functions that do not
 * exist in the page): each pointermove while armed yields the time to the frame painted with
 * the node moved, and to the frame painted with the result for that revision.
 */
const PROBE = `
  if (!window.__samples) {
  window.__samples = [];
  window.__armed = false;
  const afterPaint = (cb) => requestAnimationFrame(() => {
    const ch = new MessageChannel();
    ch.port1.onmessage = () => cb();
    ch.port2.postMessage(null);
  });
  window.addEventListener('pointermove', (e) => {
    if (!window.__armed) return;
    const t0 = e.timeStamp;
    const wrap = document.querySelector('.sheet-wrap');
    const moved = new MutationObserver(() => {
      moved.disconnect();
      afterPaint(() => {
        const sheet = performance.now() - t0;
        const done = () => afterPaint(() => window.__samples.push({ sheet, solved: performance.now() - t0 }));
        if (!wrap.classList.contains('stale')) return done();
        const solved = new MutationObserver(() => {
          if (wrap.classList.contains('stale')) return;
          solved.disconnect();
          done();
        });
        solved.observe(wrap, { attributes: true, attributeFilter: ['class'] });
      });
    });
    moved.observe(document.querySelector('svg.sheet'), { attributes: true, subtree: true, attributeFilter: ['transform'] });
  }, { capture: true });
  }
`;

async function measure(page: Page, label: string) {
  // the dev server may have reloaded the page since the last sheet
  await page.evaluate(PROBE);
  await page.waitForFunction("!document.querySelector('.sheet-wrap')?.classList.contains('stale')");
  await page.keyboard.press('f');
  const node = page.locator('g.node[data-kind="pump"], g.node[data-kind="waypoint"]').first();
  const box = (await node.locator('.symbol').boundingBox())!;
  const k = Number((await page.locator('.zoom-level').textContent())!.replace('%', '')) / 100;
  const step = 20 * k + 1; // just over one grid step on screen
  const x = box.x + box.width / 2;
  const y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.evaluate('window.__armed = true');
  for (let i = 1; i <= MOVES; i++) {
    const before = Number(await page.evaluate('window.__samples.length'));
    await page.mouse.move(x + (i % 2 === 1 ? step : 0), y);
    await page.waitForFunction(`window.__samples.length > ${before}`, null, { timeout: 10_000 });
  }
  await page.evaluate('window.__armed = false');
  await page.mouse.up();
  const samples = (await page.evaluate(
    '(() => { const s = window.__samples; window.__samples = []; return s; })()',
  )) as Array<{ sheet: number; solved: number }>;
  const sheet = samples.map((s) => s.sheet).sort((a, b) => a - b);
  const solved = samples.map((s) => s.solved).sort((a, b) => a - b);
  const elements = await page.locator('g.node, g.pipe').count();
  const f = (v: number) => v.toFixed(1).padStart(7);
  console.log(
    `${label.padEnd(44)} ${String(elements).padStart(5)}  ${f(quantile(sheet, 0.5))} ${f(quantile(sheet, 0.95))}   ${f(quantile(solved, 0.5))} ${f(quantile(solved, 0.95))}`,
  );
  // put the node back: undo the drag (one step)
  await page.keyboard.press('Control+z');
}

async function main() {
  // Own process group, so the whole server goes when the benchmark ends.
  const server = spawn(
    'node_modules/.bin/vite',
    ['dev', '--port', String(PORT), '--strictPort', '--host', '127.0.0.1'],
    { stdio: ['ignore', 'ignore', 'inherit'], detached: true },
  );
  const stop = () => {
    if (server.pid && server.exitCode === null) process.kill(-server.pid, 'SIGTERM');
  };
  process.on('exit', stop);
  const url = `http://127.0.0.1:${PORT}/`;
  try {
    await waitForServer(url);
    const browser = await chromium.launch({
      executablePath: findChromium(),
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking'],
    });
    const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
    // the unsaved-changes question when switching sheets: yes, discard
    page.on('dialog', (d) => void d.accept().catch(() => undefined));
    await page.goto(url);
    await page.locator('g.node[data-kind="pump"]').first().waitFor({ timeout: 60_000 });
    await page.evaluate(PROBE);
    console.log(
      `UI drag benchmark: ${MOVES} pointer moves per sheet, times in ms (Chromium, headless)`,
    );
    console.log(
      `${'sheet'.padEnd(44)} ${'elems'.padStart(5)}  ${'moved p50'.padStart(7)} ${'p95'.padStart(7)}   ${'solved p50'.padStart(7)} ${'p95'.padStart(7)}`,
    );
    for (const example of EXAMPLES) {
      await page.getByRole('button', { name: /Project/ }).click();
      await page.getByRole('menuitem', { name: example.title }).click();
      await page.getByLabel('Project name').waitFor();
      await page.waitForTimeout(500);
      await measure(page, example.title);
    }
    await page.locator('input[type="file"]').setInputFiles({
      name: 'generated.headroute.json',
      mimeType: 'application/json',
      buffer: Buffer.from(generatedSheet(1000)),
    });
    await page.waitForFunction("document.querySelectorAll('g.node').length > 400", null, {
      timeout: 60_000,
    });
    await measure(page, 'Generated series, ~1,000 elements');
    await browser.close();
  } finally {
    stop();
  }
}

await main();
