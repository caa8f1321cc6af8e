/**
 * `npx tsx bench/solver-breakdown.ts [shape] [pipes] [runs]`: where the time of one solve goes.
 * Solves a generated network `runs` times and prints the median time of each stage of solve()
 * (case and fluid, graph building, active parts, the gradient iteration, element results,
 * findings). Figures are printed, never asserted.
 */
import { applyCase } from '../src/lib/solver/applyCase';
import { sheetFindings } from '../src/lib/solver/findings/sheet';
import { solveFluid } from '../src/lib/solver/fluid';
import { buildGraph } from '../src/lib/solver/network/build';
import { gradientSolve } from '../src/lib/solver/network/gga';
import { activeParts } from '../src/lib/solver/network/topology';
import { elementResults } from '../src/lib/solver/results';
import { solve } from '../src/lib/solver/solve';
import { network, type Shape } from './networks';

const shape = (process.argv[2] ?? 'grid') as Shape;
const size = Number(process.argv[3] ?? 1000);
const runs = Number(process.argv[4] ?? 50);
const doc = network(shape, size);

const stages = ['case+fluid', 'graph', 'parts', 'iteration', 'results', 'findings', 'solve()'];
const times: number[][] = stages.map(() => []);
let iterations = 0;
let linear = '';
for (let r = 0; r < runs + 5; r++) {
  const t: number[] = [performance.now()];
  const working = applyCase(doc, null);
  const fluid = solveFluid(working.settings);
  t.push(performance.now());
  const graph = buildGraph(working, fluid);
  t.push(performance.now());
  const parts = activeParts(working, graph);
  t.push(performance.now());
  const outcome = gradientSolve(graph, parts.activeNode, parts.activeLink);
  t.push(performance.now());
  const { records, indexed } = elementResults(graph, outcome, parts.activeLink, fluid);
  t.push(performance.now());
  sheetFindings(working, working.settings, graph, records, indexed, fluid);
  t.push(performance.now());
  solve(doc);
  t.push(performance.now());
  iterations = outcome.iterations;
  const { method, cgIterations, fallbacks } = outcome.linear;
  linear =
    method === 'direct'
      ? 'node equations by direct LDLᵀ'
      : `node equations by AMG-preconditioned CG: ${cgIterations} CG steps over the iterations, ${fallbacks} direct fallbacks`;
  if (r < 5) continue; // warm-up
  for (let s = 0; s < stages.length; s++) times[s].push(t[s + 1] - t[s]);
}
const median = (v: number[]) => [...v].sort((a, b) => a - b)[v.length >> 1];
console.log(
  `${shape}, ${Object.keys(doc.pipes).length} pipes, ${iterations} iterations, median of ${runs} runs (ms):`,
);
console.log(linear);
for (let s = 0; s < stages.length; s++)
  console.log(`${stages[s].padStart(12)}  ${median(times[s]).toFixed(3).padStart(9)}`);
