/**
 * UI benchmark: in Chromium, the time from a pointer move that drags a node to (a) the sheet
 * (or profile) painted with the node moved and (b) the sheet and profile painted with the solve
 * result for that document revision. Two drags per sheet: a node moved on the sheet (no new
 * solve is needed: positions on the sheet do not enter the hydraulics) and a waypoint dragged
 * up and down on the profile (every move is solved). Demo projects and a generated sheet of
 * about 1,000 elements.
 * Figures are printed (median and 95th percentile), never asserted.
 *
 * Run: npx tsx bench/ui-drag.bench.ts
 * By default it measures the production build: `vite build`, then the built app is copied to a
 * temporary folder and served from there by a small static server on BENCH_PORT (default 4183),
 * so another build into build/ cannot change it mid-run. BENCH_DEV=1 measures `vite dev`
 * instead (unbundled modules, slower); BENCH_SKIP_BUILD=1 serves the existing build/.
 * BENCH_PROFILE=1 also records a Chromium CPU profile during each sheet's drag and prints the
 * functions with the most self time (BENCH_MINIFY=0 builds unminified for readable names).
 * BENCH_HIDE=<css selector> hides that part of the page during the run (what does it cost?).
 * BENCH_TRACE=1 records a Chromium trace of each drag and prints main-thread time per move by
 * kind of work (script, style, layout, paint, commit) and raster time (bench/traceSummary.ts).
 * BENCH_SAVE=<folder> also writes each drag's trace (.json) and CPU profile (.cpuprofile) there,
 * for a closer look in Chromium's DevTools.
 */
import { chromium, type CDPSession, type Page } from '@playwright/test';
import { spawn, spawnSync } from 'node:child_process';
import {
  cpSync,
  mkdirSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { createServer, type Server } from 'node:http';
import { tmpdir } from 'node:os';
import { extname, join, normalize } from 'node:path';
import { findChromium } from '../scripts/browser-path.js';
import { EXAMPLES } from '../src/lib/model/examples';
import { serializeProject } from '../src/lib/model/file';
import { network } from './networks';
import { TRACE_CATEGORIES, traceLines } from './traceSummary';

const PORT = Number(process.env.BENCH_PORT ?? 4183);
const MOVES = Number(process.env.BENCH_MOVES ?? 40);
const DEV = Boolean(process.env.BENCH_DEV);
const PROFILE = Boolean(process.env.BENCH_PROFILE);
const TRACE = Boolean(process.env.BENCH_TRACE);
const SAVE = process.env.BENCH_SAVE;

const TYPES: Record<string, string> = {
  '.html': 'text/html',
  '.js': 'text/javascript',
  '.css': 'text/css',
  '.json': 'application/json',
  '.svg': 'image/svg+xml',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.webmanifest': 'application/manifest+json',
};

/** Serve a built single-page app from `root` (unknown paths get index.html, as the host does). */
function serveStatic(root: string, port: number): Promise<Server> {
  const server = createServer((req, res) => {
    const path = normalize(decodeURIComponent(new URL(req.url ?? '/', 'http://x').pathname));
    let file = join(root, path);
    try {
      if (!file.startsWith(root) || !statSync(file).isFile()) file = join(root, 'index.html');
    } catch {
      file = join(root, 'index.html');
    }
    res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream' });
    res.end(readFileSync(file));
  });
  return new Promise((resolve, reject) => {
    server.once('error', (error) => reject(new Error(`cannot serve on port ${port}: ${error}`)));
    server.listen(port, '127.0.0.1', () => resolve(server));
  });
}

/** Build the app and copy it to a temporary folder; returns that folder. */
function buildApp(): string {
  if (!process.env.BENCH_SKIP_BUILD) {
    const args = ['build', ...(process.env.BENCH_MINIFY === '0' ? ['--minify', 'false'] : [])];
    const built = spawnSync('node_modules/.bin/vite', args, {
      stdio: ['ignore', 'ignore', 'inherit'],
    });
    if (built.status !== 0) throw new Error(`vite build failed (exit ${built.status})`);
  }
  const dir = mkdtempSync(join(tmpdir(), 'headroute-bench-'));
  cpSync('build', dir, { recursive: true });
  return dir;
}

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  hitCount?: number;
}

/** Folder the built app is served from (for naming the source module of a profiled line). */
let servedDir: string | null = null;
const markers = new Map<string, Array<{ line: number; module: string }>>();

/**
 * The source module a line of an unminified bundle came from: the bundler writes a
 * `// src/...` comment before each module's code.
 */
function moduleAt(url: string, line: number): string {
  if (!servedDir || !url.includes('/_app/')) return '';
  const path = new URL(url).pathname;
  let list = markers.get(path);
  if (!list) {
    list = [];
    try {
      readFileSync(join(servedDir, path), 'utf8')
        .split('\n')
        .forEach((text, i) => {
          const m = /^\/\/ ((?:src|node_modules)\/\S+)/.exec(text);
          if (m) list!.push({ line: i, module: m[1] });
        });
    } catch {
      // not a file of ours
    }
    markers.set(path, list);
  }
  let found = '';
  for (const m of list) {
    if (m.line > line) break;
    found = m.module;
  }
  return found.replace(/^node_modules\/(\.pnpm\/)?/, '');
}

/** Self time summed by source module (needs an unminified build), as printable lines. */
function topModules(
  profile: { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] },
  n = Number(process.env.BENCH_TOP ?? 12),
) {
  const byNode = new Map<number, number>();
  profile.samples.forEach((id, i) =>
    byNode.set(id, (byNode.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0)),
  );
  const total = new Map<string, number>();
  for (const node of profile.nodes) {
    const f = node.callFrame;
    const key = moduleAt(f.url, f.lineNumber) || f.functionName || '(anonymous)';
    total.set(key, (total.get(key) ?? 0) + (byNode.get(node.id) ?? 0));
  }
  return [...total.entries()]
    .sort((a, b) => b[1] - a[1])
    .slice(0, n)
    .map(([k, us]) => `    ${(us / 1000).toFixed(1).padStart(8)} ms  ${k}`);
}

/** The functions with the most self time in a CDP CPU profile, as printable lines. */
function topSelfTime(
  profile: { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] },
  n = 15,
) {
  const byNode = new Map<number, number>();
  profile.samples.forEach((id, i) =>
    byNode.set(id, (byNode.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0)),
  );
  const total = new Map<string, number>();
  let sum = 0;
  for (const node of profile.nodes) {
    const us = byNode.get(node.id) ?? 0;
    sum += us;
    const f = node.callFrame;
    const file = f.url.split('/').pop() ?? '';
    const where = moduleAt(f.url, f.lineNumber) || file;
    const key = `${f.functionName || '(anonymous)'}  ${where}${file ? `:${f.lineNumber + 1}` : ''}`;
    total.set(key, (total.get(key) ?? 0) + us);
  }
  return [...total.entries()]
    .sort((a, b) => b[1] - a[1])
    .slice(0, n)
    .map(
      ([k, us]) =>
        `    ${(us / 1000).toFixed(1).padStart(8)} ms ${((100 * us) / sum).toFixed(1).padStart(5)}%  ${k}`,
    );
}

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
  window.__frame = 0;
  const tick = () => { window.__frame++; requestAnimationFrame(tick); };
  requestAnimationFrame(tick);
  const afterPaint = (cb) => requestAnimationFrame(() => {
    const ch = new MessageChannel();
    ch.port1.onmessage = () => cb();
    ch.port2.postMessage(null);
  });
  window.addEventListener('pointermove', (e) => {
    if (!window.__armed) return;
    const t0 = e.timeStamp;
    const handled = performance.now();
    const frame0 = window.__frame;
    const wrap = document.querySelector('.sheet-wrap');
    const moved = new MutationObserver(() => {
      moved.disconnect();
      afterPaint(() => {
        const painted = performance.now();
        const sheet = painted - t0;
        const push = (end) => window.__samples.push({ sheet, solved: end - t0, work: end - handled, frames: window.__frame - frame0 });
        // The frame just painted already showed the result for this revision.
        if (!wrap.classList.contains('stale')) return push(painted);
        const solved = new MutationObserver(() => {
          if (wrap.classList.contains('stale')) return;
          solved.disconnect();
          afterPaint(() => push(performance.now()));
        });
        solved.observe(wrap, { attributes: true, attributeFilter: ['class'] });
      });
    });
    const watch = window.__watch || { selector: 'svg.sheet', attribute: 'transform' };
    moved.observe(document.querySelector(watch.selector), { attributes: true, subtree: true, attributeFilter: [watch.attribute] });
  }, { capture: true });
  }
`;

/**
 * What a drag moves. 'sheet': a node dragged sideways on the sheet (only its place on the sheet
 * changes, so no solve is needed: the result is carried over). 'profile': a waypoint dragged
 * up and down on the profile (its elevation changes, so every move is solved and the sheet and
 * profile redrawn with the new result).
 */
type DragKind = 'sheet' | 'profile';

async function dragTarget(page: Page, kind: DragKind) {
  if (kind === 'profile') {
    const handle = page.locator('[data-testid="profile-panel"] [data-waypoint]').first();
    if ((await handle.count()) === 0) return null;
    const box = (await handle.boundingBox())!;
    await page.evaluate(
      `window.__watch = { selector: '[data-testid="profile-panel"] svg.chart', attribute: 'd' }`,
    );
    return { x: box.x + box.width / 2, y: box.y + box.height / 2, dx: 0, dy: -8 };
  }
  await page.keyboard.press('f');
  const node = page.locator('g.node[data-kind="pump"], g.node[data-kind="waypoint"]').first();
  const box = (await node.locator('.symbol').boundingBox())!;
  const k = Number((await page.locator('.zoom-level').textContent())!.replace('%', '')) / 100;
  await page.evaluate(`window.__watch = { selector: 'svg.sheet', attribute: 'transform' }`);
  // just over one grid step on screen
  return { x: box.x + box.width / 2, y: box.y + box.height / 2, dx: 20 * k + 1, dy: 0 };
}

async function measure(page: Page, label: string, cdp: CDPSession | null, kind: DragKind) {
  // the dev server may have reloaded the page since the last sheet
  await page.evaluate(PROBE);
  await page.waitForFunction("!document.querySelector('.sheet-wrap')?.classList.contains('stale')");
  const target = await dragTarget(page, kind);
  if (!target) {
    console.log(`${label.padEnd(62)}   (no waypoint on the route shown)`);
    return;
  }
  const { x, y, dx, dy } = target;
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.evaluate('window.__armed = true');
  const metrics = async () =>
    new Map(
      (
        (await cdp!.send('Performance.getMetrics')).metrics as Array<{
          name: string;
          value: number;
        }>
      ).map((m) => [m.name, m.value]),
    );
  const before = cdp ? await metrics() : null;
  if (cdp) await cdp.send('Profiler.start');
  const browser = page.context().browser();
  if (TRACE && browser) await browser.startTracing(page, { categories: TRACE_CATEGORIES });
  for (let i = 1; i <= MOVES; i++) {
    const before = Number(await page.evaluate('window.__samples.length'));
    const out = i % 2 === 1 ? 1 : 0;
    await page.mouse.move(x + out * dx, y + out * dy);
    await page.waitForFunction(`window.__samples.length > ${before}`, null, { timeout: 10_000 });
  }
  await page.evaluate('window.__armed = false');
  const profile = cdp ? (await cdp.send('Profiler.stop')).profile : null;
  const trace = TRACE && browser ? await browser.stopTracing() : null;
  if (cdp && before) {
    const after = await metrics();
    const names = ['TaskDuration', 'ScriptDuration', 'RecalcStyleDuration', 'LayoutDuration'];
    console.log(
      '  main thread per move, ms: ' +
        names
          .map(
            (n) =>
              `${n.replace('Duration', '')} ${((1000 * ((after.get(n) ?? 0) - (before.get(n) ?? 0))) / MOVES).toFixed(1)}`,
          )
          .join(', '),
    );
  }
  await page.mouse.up();
  const samples = (await page.evaluate(
    '(() => { const s = window.__samples; window.__samples = []; return s; })()',
  )) as Array<{ sheet: number; solved: number; work: number; frames: number }>;
  const sorted = (key: 'sheet' | 'solved' | 'work' | 'frames') =>
    samples.map((s) => s[key]).sort((a, b) => a - b);
  const [sheet, solved, work, frames] = [
    sorted('sheet'),
    sorted('solved'),
    sorted('work'),
    sorted('frames'),
  ];
  const elements = await page.locator('g.node, g.pipe').count();
  const f = (v: number) => v.toFixed(1).padStart(7);
  console.log(
    `${label.padEnd(62)} ${String(elements).padStart(5)}  ${f(quantile(sheet, 0.5))} ${f(quantile(sheet, 0.95))}   ${f(quantile(solved, 0.5))} ${f(quantile(solved, 0.95))}   ${f(quantile(work, 0.5))} ${f(quantile(work, 0.95))}   ${f(quantile(frames, 0.5))} ${f(quantile(frames, 0.95))}`,
  );
  if (SAVE) {
    mkdirSync(SAVE, { recursive: true });
    const name = join(SAVE, label.replace(/[^A-Za-z0-9]+/g, '-').toLowerCase());
    if (trace) writeFileSync(`${name}.json`, trace);
    if (profile) writeFileSync(`${name}.cpuprofile`, JSON.stringify(profile));
  }
  if (trace) {
    console.log('  main thread and raster per move (Chromium trace):');
    console.log(traceLines(trace, MOVES).join('\n'));
  }
  if (profile) {
    console.log('  self time by function:');
    console.log(topSelfTime(profile as never).join('\n'));
    console.log('  self time by source module:');
    console.log(topModules(profile as never).join('\n'));
  }
  // put the node back: undo the drag (one step)
  await page.keyboard.press('Control+z');
}

/**
 * The probe's floor: the same measurement on a bare page whose pointermove handler only moves
 * one SVG group. What a sheet adds is its figure minus this one (a frame must pass either way).
 */
async function measureFloor(page: Page) {
  await page.setContent(
    `<div class="sheet-wrap"><svg class="sheet" width="600" height="400"><g id="g"><rect width="40" height="40"/></g></svg></div>` +
      `<script>addEventListener('pointermove', (e) => document.getElementById('g').setAttribute('transform', 'translate(' + e.clientX + ' 0)'));</script>`,
  );
  await page.evaluate(PROBE);
  await page.mouse.move(20, 20);
  await page.evaluate('window.__armed = true');
  for (let i = 1; i <= MOVES; i++) {
    const before = Number(await page.evaluate('window.__samples.length'));
    await page.mouse.move(20 + (i % 2) * 21, 20);
    await page.waitForFunction(`window.__samples.length > ${before}`, null, { timeout: 10_000 });
  }
  await page.evaluate('window.__armed = false');
  const samples = (await page.evaluate('window.__samples')) as Array<{
    sheet: number;
    work: number;
  }>;
  const t = samples.map((x) => x.sheet).sort((a, b) => a - b);
  const w = samples.map((x) => x.work).sort((a, b) => a - b);
  const f = (v: number) => v.toFixed(1).padStart(7);
  const blank = ''.padStart(7);
  console.log(
    `${'(floor: bare page, one SVG group moved)'.padEnd(62)} ${'1'.padStart(5)}  ${f(quantile(t, 0.5))} ${f(quantile(t, 0.95))}   ${blank} ${blank}   ${f(quantile(w, 0.5))} ${f(quantile(w, 0.95))}`,
  );
}

async function main() {
  let stop = () => {};
  if (DEV) {
    // Own process group, so the whole server goes when the benchmark ends.
    const server = spawn(
      'node_modules/.bin/vite',
      ['dev', '--port', String(PORT), '--strictPort', '--host', '127.0.0.1'],
      { stdio: ['ignore', 'ignore', 'inherit'], detached: true },
    );
    stop = () => {
      if (server.pid && server.exitCode === null) process.kill(-server.pid, 'SIGTERM');
    };
  } else {
    const dir = buildApp();
    servedDir = dir;
    const server = await serveStatic(dir, PORT);
    stop = () => {
      server.close();
      server.closeAllConnections();
      rmSync(dir, { recursive: true, force: true });
    };
  }
  process.on('exit', () => stop());
  const url = `http://127.0.0.1:${PORT}/`;
  try {
    await waitForServer(url);
    const browser = await chromium.launch({
      executablePath: findChromium(),
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking'],
    });
    const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
    const page = await context.newPage();
    let cdp: CDPSession | null = null;
    if (PROFILE) {
      cdp = await context.newCDPSession(page);
      await cdp.send('Profiler.enable');
      await cdp.send('Performance.enable');
      await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
    }
    // the unsaved-changes question when switching sheets: yes, discard
    page.on('dialog', (d) => void d.accept().catch(() => undefined));
    await page.goto(url);
    await page.locator('g.node[data-kind="pump"]').first().waitFor({ timeout: 60_000 });
    // BENCH_HIDE=<css selector> hides part of the page, to see what that part costs per move.
    if (process.env.BENCH_HIDE)
      await page.addStyleTag({
        content: `${process.env.BENCH_HIDE} { display: none !important; }`,
      });
    await page.evaluate(PROBE);
    console.log(
      `UI drag benchmark (${DEV ? 'vite dev' : 'production build'}): ${MOVES} pointer moves per sheet, times in ms (Chromium, headless)`,
    );
    console.log(
      [
        'moved: input event → frame painted with the node moved; solved: → frame painted with',
        'the sheet and profile solved for that revision; work: from the handler starting (input',
        'is delivered at the next frame) to that frame painted; frames: animation frames from',
        'the handler to the solved paint (1 = the same frame).',
      ].join('\n'),
    );
    console.log(
      `${'sheet'.padEnd(62)} ${'elems'.padStart(5)}  ${'moved p50'.padStart(7)} ${'p95'.padStart(7)}   ${'solved p50'.padStart(7)} ${'p95'.padStart(7)}   ${'work p50'.padStart(7)} ${'p95'.padStart(7)}   ${'frames p50'.padStart(7)} ${'p95'.padStart(7)}`,
    );
    const bare = await context.newPage();
    await measureFloor(bare);
    await bare.close();
    // BENCH_SHEETS=generated (or a demo title's first word) limits the run to some sheets.
    const only = process.env.BENCH_SHEETS?.toLowerCase();
    for (const example of EXAMPLES.filter((e) => !only || e.title.toLowerCase().includes(only))) {
      await page.getByRole('button', { name: /Project/ }).click();
      await page.getByRole('menuitem', { name: example.title }).click();
      await page.getByLabel('Project name').waitFor();
      await page.waitForTimeout(500);
      await measure(page, `${example.title}: sheet drag`, cdp, 'sheet');
      await measure(page, `${example.title}: waypoint elevation`, cdp, 'profile');
    }
    if (only && !'generated'.includes(only)) return await browser.close();
    await page.locator('input[type="file"]').setInputFiles({
      name: 'generated.headroute.json',
      mimeType: 'application/json',
      buffer: Buffer.from(generatedSheet(1000)),
    });
    await page.waitForFunction("document.querySelectorAll('g.node').length > 400", null, {
      timeout: 60_000,
    });
    await measure(page, 'Generated series, 1,000: sheet drag', cdp, 'sheet');
    await measure(page, 'Generated series, 1,000: waypoint elevation', cdp, 'profile');
    await browser.close();
  } finally {
    stop();
  }
}

await main();
