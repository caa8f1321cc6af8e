/**
 * Work across cases on a sheet of about 1,000 elements with three stored cases: how long the
 * comparison table and the HGL envelope take to compute (the page's main thread was blocked
 * that long when they ran there), and what the page's thread still does now that they run in
 * the case worker: copy the document to the worker and the answer back (structured clone).
 * Figures are printed (median of BENCH_RUNS, default 5), never asserted.
 *
 * Run: npx tsx bench/case-work.bench.ts
 */
import { addCase } from '../src/lib/model/commands';
import { History } from '../src/lib/model/history';
import { defaultRoute } from '../src/lib/solver/route';
import { solve } from '../src/lib/solver/solve';
import { runCaseJob, type CaseJob } from '../src/lib/ui/cases/caseJobs';
import { elementCount } from '../src/lib/ui/solveRunner';
import { network } from './networks';

const RUNS = Number(process.env.BENCH_RUNS ?? 5);

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function time<T>(work: () => T): [number, T] {
  const t0 = performance.now();
  const value = work();
  return [performance.now() - t0, value];
}

const history = new History(network('tree', 500));
history.apply(addCase('Hot liquid', { temperature: 353.15 }));
history.apply(addCase('Cold liquid', { temperature: 278.15 }));
history.apply(addCase('Low site pressure', { atmosphericPressure: 90_000 }));
const doc = history.doc;
const base = solve(doc, null);
const route = defaultRoute(doc, base) ?? [];

const jobs: Array<[string, CaseJob]> = [
  ['comparison table', { kind: 'compare', doc }],
  ['HGL envelope', { kind: 'envelope', doc, route, known: new Map([['', base]]) }],
];

console.log(
  `sheet: ${elementCount(doc)} elements, ${Object.keys(doc.cases).length} stored cases, route of ${route.length} nodes`,
);
for (const [name, job] of jobs) {
  runCaseJob(job); // warm up
  const work: number[] = [];
  const copy: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const [ms, value] = time(() => runCaseJob(job));
    work.push(ms);
    const [out] = time(() => structuredClone({ id: 1, ...job }));
    const [back] = time(() => structuredClone({ id: 1, ok: true, value }));
    copy.push(out + back);
  }
  console.log(
    `${name}: computed in ${median(work).toFixed(1)} ms (main thread blocked this long when run in the page); ` +
      `main thread now: ${median(copy).toFixed(1)} ms to copy the request and the reply`,
  );
}
