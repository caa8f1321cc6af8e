/**
 * `npm run bench:cli`: the CPU time of `headroute solve` on each demo project, against the CPU
 * time of `node -e ''` measured in the same run (the target: at most 2× that floor). CPU time
 * (user + system, from bash's `times` for its children) rather than wall time, so a busy
 * machine changes the figures less. Printed, never asserted.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';

const RUNS = 15;
const demos = readdirSync('static/examples')
  .filter((f) => f.endsWith('.headroute.json'))
  .sort();

if (!existsSync('dist/cli/headroute.mjs')) {
  console.error('dist/cli/headroute.mjs is missing: run `npm run build:cli` first.');
  process.exit(1);
}

/** CPU seconds per run of `command` (a shell word list), over RUNS runs. */
function cpuPerRun(command: string): number {
  const script = `for i in $(seq ${RUNS}); do ${command} >/dev/null; done; times`;
  const out = execFileSync('bash', ['-c', script], { encoding: 'utf8' });
  // `times` prints the shell's own user/sys, then its children's: "0m1.234s 0m0.123s".
  const child = out.trim().split('\n').at(-1) ?? '';
  const seconds = [...child.matchAll(/(\d+)m([\d.]+)s/g)].map((m) => +m[1] * 60 + +m[2]);
  return (seconds[0] + seconds[1]) / RUNS;
}

const floor = cpuPerRun(`node -e ''`);
console.log(`CLI start (CPU time a run, ${RUNS} runs each; target ≤ 2× the floor)`);
console.log(
  `  node -e ''  (floor)                      ${(floor * 1000).toFixed(0).padStart(5)} ms`,
);
for (const demo of demos) {
  const cpu = cpuPerRun(`node bin/headroute.js solve static/examples/${demo}`);
  const label = `headroute solve ${demo.replace('.headroute.json', '')}`.padEnd(40);
  console.log(
    `  ${label} ${(cpu * 1000).toFixed(0).padStart(5)} ms  ${(cpu / floor).toFixed(2)}× floor`,
  );
}
