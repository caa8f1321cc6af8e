/**
 * `npm run bench` (surge part): how fast a surge envelope comes back for the
 * pump-trip-over-rack demo (151 m route) and a 30 s event, with the default time-step budget:
 * the same code the app's surge worker runs, timed here in Node. Figures are printed, never
 * asserted (the machine may be shared and busy).
 */
import { readFileSync } from 'node:fs';
import { parseProjectFile } from '../src/lib/model/file/index';
import { runSurge } from '../src/lib/solver/surge/run';
import type { SurgeEvent } from '../src/lib/solver/surge/types';

const FILE = 'static/examples/pump-trip-over-rack.headroute.json';
const REPEATS = 7;

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

const parsed = parseProjectFile(readFileSync(FILE, 'utf8'));
if (!parsed.ok) throw new Error(`${FILE} does not load`);
const doc = parsed.document;
const events: Array<[string, SurgeEvent]> = [
  ['trip P-401', { kind: 'trip', pump: 'P1', inertia: null }],
  ['close HV-402 in 0.5 s', { kind: 'close', element: 'F3', time: 0.5, law: 'linear' }],
];

console.log(
  `\nSurge envelope, ${FILE} (151 m route), 30 s event, default budget; median of ${REPEATS}`,
);
console.log('event                    time step   sections   steps    wall ms   cpu ms');
for (const [name, event] of events) {
  runSurge(doc, event, { duration: 30 }); // warm-up
  const wall: number[] = [];
  const cpu: number[] = [];
  let last = runSurge(doc, event, { duration: 30 });
  for (let i = 0; i < REPEATS; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    last = runSurge(doc, event, { duration: 30 });
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  const steps = Math.round(last.duration / last.timeStep);
  console.log(
    `${name.padEnd(24)} ${(last.timeStep * 1000).toFixed(3).padStart(6)} ms ${String(last.envelope.length).padStart(10)} ${String(steps).padStart(7)} ${median(wall).toFixed(0).padStart(10)} ${median(cpu).toFixed(0).padStart(8)}`,
  );
}
