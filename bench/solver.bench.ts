/**
 * `npm run bench`: solve time, iterations and memory of generated networks of 100 to 100,000
 * pipes in three shapes, the fitted scaling exponent, and the time of a profile on the demo
 * projects. Figures are printed, never asserted (the machine may be shared and busy).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { parseProjectFile } from '../src/lib/model/file/index';
import { profile } from '../src/lib/solver/profile';
import { defaultRoute } from '../src/lib/solver/route';
import { solve } from '../src/lib/solver/solve';
import { network, type Shape } from './networks';

const SIZES = [100, 1_000, 10_000, 100_000];
const SHAPES: Shape[] = ['series', 'tree', 'grid'];
/**
 * Timed repeats per size: fewer for the big sheets so the whole run stays within minutes; 41 at
 * 1,000 pipes so the median is not set by the few runs that meet the sweeping after `gc()`.
 */
const REPEATS: Record<number, number> = { 100: 25, 1_000: 41, 10_000: 3, 100_000: 1 };
/** A size is skipped when the previous size's median predicts a solve slower than this, ms. */
const PREDICTED_LIMIT_MS = 60_000;

// A handle on the garbage collector, so each row starts from a settled heap.
setFlagsFromString('--expose-gc');
const gc = runInNewContext('gc') as () => void;

const MB = 1024 * 1024;

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** A measured size: pipes and a median time, ms. */
interface Point {
  pipes: number;
  ms: number;
}

/** Least-squares slope of ln(time) against ln(pipes). */
function exponent(points: Point[]): number {
  if (points.length < 2) return NaN;
  const xs = points.map((p) => Math.log(p.pipes));
  const ys = points.map((p) => Math.log(p.ms));
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < xs.length; i++) {
    sxy += (xs[i] - mx) * (ys[i] - my);
    sxx += (xs[i] - mx) ** 2;
  }
  return sxy / sxx;
}

function row(cells: Array<string | number>, widths: number[]): string {
  return cells.map((c, i) => String(c).padStart(widths[i])).join('  ');
}

function fixed(v: number, digits: number): string {
  return Number.isFinite(v) ? v.toFixed(digits) : '—';
}

function benchNetworks(): void {
  const widths = [7, 8, 8, 10, 11, 10, 11, 6, 10, 10, 12, 10, 11];
  console.log(
    'Network solve (median of the timed repeats; one untimed warm-up below 100,000 pipes)',
  );
  console.log(
    'wall: elapsed time of solve(); CPU: user + system CPU time of the process over the solve ' +
      '(less disturbed when the machine is shared). first: wall time of the first (untimed) ' +
      'solve of the sheet, which also decides how to solve its node equations (a direct factor ' +
      'and its ordering, or for a big mesh multigrid-preconditioned conjugate gradients: ' +
      'sparse/linearSolver.ts); the timed repeats reuse that. ' +
      'clone ms: median wall time of solving a fresh structured clone of the sheet each repeat ' +
      "(not counting the clone): a document whose records are all new objects, as the app's " +
      'solver worker holds after it receives a whole document or applies a change to one.',
  );
  const head = ['shape', 'target', 'pipes', 'first ms', 'wall ms', 'min wall', 'CPU ms', 'runs'];
  console.log(
    row([...head, 'iterations', 'heap Δ MB', 'RSS peak MB', 'converged', 'clone ms'], widths),
  );
  const fits: string[] = [];
  for (const shape of SHAPES) {
    const points: Point[] = [];
    const cpuPoints: Point[] = [];
    for (const size of SIZES) {
      const last = points[points.length - 1];
      if (last) {
        const k = Math.max(1, points.length >= 2 ? exponent(points) : 1);
        const predicted = last.ms * (size / last.pipes) ** k;
        if (predicted > PREDICTED_LIMIT_MS) {
          const why = `skipped: predicted ${(predicted / 1000).toFixed(0)} s`;
          console.log(row([shape, size, '—', why, '', '', '', '', '', '', '', '', ''], widths));
          continue;
        }
      }
      const doc = network(shape, size);
      const pipes = Object.keys(doc.pipes).length;
      const repeats = REPEATS[size];
      // The first solve of a sheet also works out how to solve its node equations; later solves
      // of the same connections reuse that (sparse/linearSolver.ts), so it is timed on its own.
      const f0 = performance.now();
      if (size < 100_000) solve(doc);
      const first = size < 100_000 ? performance.now() - f0 : NaN;
      gc();
      const base = process.memoryUsage().heapUsed;
      let heapPeak = 0;
      const times: number[] = [];
      const cpu: number[] = [];
      let iterations = 0;
      let converged = true;
      for (let r = 0; r < repeats; r++) {
        const c0 = process.cpuUsage();
        const t0 = performance.now();
        const result = solve(doc);
        times.push(performance.now() - t0);
        const c1 = process.cpuUsage(c0);
        cpu.push((c1.user + c1.system) / 1000);
        heapPeak = Math.max(heapPeak, process.memoryUsage().heapUsed - base);
        iterations = result.iterations;
        converged &&= result.converged;
      }
      const rss = process.resourceUsage().maxRSS / 1024;
      // The worker's case: a new copy of the document on every message (same connections, so
      // the ordering is reused). Timed after the rows' figures above, so they are unchanged.
      // Not at 100,000 pipes, to keep the whole run within minutes.
      const cloneTimes: number[] = [];
      for (let r = 0; r < (size < 100_000 ? repeats : 0); r++) {
        const copy = structuredClone(doc);
        const t0 = performance.now();
        solve(copy);
        cloneTimes.push(performance.now() - t0);
      }
      const ms = median(times);
      points.push({ pipes, ms });
      cpuPoints.push({ pipes, ms: median(cpu) });
      const cells = [
        shape,
        size,
        pipes,
        fixed(first, 2),
        fixed(ms, 2),
        fixed(Math.min(...times), 2),
      ];
      cells.push(fixed(median(cpu), 2), repeats, iterations, fixed(heapPeak / MB, 1));
      const tail = [fixed(rss, 0), converged ? 'yes' : 'NO', fixed(median(cloneTimes), 2)];
      console.log(row([...cells, ...tail], widths));
    }
    fits.push(`${shape.padStart(7)}: wall ${fit(points)}; CPU ${fit(cpuPoints)}`);
  }
  console.log('\nFitted scaling exponent (least squares of ln time against ln pipes; 1 = linear)');
  for (const f of fits) console.log(f);
  console.log(
    '\nheap Δ: largest heap in use right after a solve, above the settled heap before the row ' +
      '(results plus garbage not yet collected). RSS peak: the process high-water mark so far.',
  );
}

/** The exponent over all sizes, and over the sizes of 1,000 pipes and more. */
function fit(points: Point[]): string {
  const big = points.filter((p) => p.pipes >= 1000);
  const tail = big.length >= 2 ? ` (${fixed(exponent(big), 2)} from 1,000 pipes up)` : '';
  return `${fixed(exponent(points), 2)} over ${points.length} sizes${tail}`;
}

function benchDemos(): void {
  const dir = new URL('../static/examples/', import.meta.url);
  let files: string[];
  try {
    files = readdirSync(dir).filter((f) => f.endsWith('.headroute.json'));
  } catch {
    files = [];
  }
  console.log('\nDemo projects: solve, default route and profile (median of 50 runs each)');
  if (files.length === 0) {
    console.log('  no demo projects found in static/examples/');
    return;
  }
  const widths = [40, 6, 9, 11, 11, 13, 9];
  console.log(
    row(['file', 'pipes', 'stations', 'solve ms', 'route ms', 'profile ms', 'total ms'], widths),
  );
  for (const file of files.sort()) {
    const parsed = parseProjectFile(readFileSync(new URL(file, dir), 'utf8'));
    if (!parsed.ok) {
      console.log(`  ${file}: not a valid project (${parsed.errors[0]?.message})`);
      continue;
    }
    const doc = parsed.document;
    const t = { solve: [] as number[], route: [] as number[], profile: [] as number[] };
    let stations = 0;
    for (let i = 0; i < 55; i++) {
      const t0 = performance.now();
      const result = solve(doc);
      const t1 = performance.now();
      const nodes = defaultRoute(doc, result);
      const t2 = performance.now();
      const prof = nodes ? profile(doc, result, nodes) : null;
      const t3 = performance.now();
      stations = prof?.stations.length ?? 0;
      if (i < 5) continue; // warm-up
      t.solve.push(t1 - t0);
      t.route.push(t2 - t1);
      t.profile.push(t3 - t2);
    }
    const [s, r, p] = [median(t.solve), median(t.route), median(t.profile)];
    console.log(
      row(
        [
          file,
          Object.keys(doc.pipes).length,
          stations,
          fixed(s, 3),
          fixed(r, 3),
          fixed(p, 3),
          fixed(s + r + p, 3),
        ],
        widths,
      ),
    );
  }
}

const started = performance.now();
console.log(`headroute bench — Node ${process.version}, ${new Date().toISOString()}\n`);
benchNetworks();
benchDemos();
console.log(`\nBench took ${((performance.now() - started) / 1000).toFixed(0)} s.`);
