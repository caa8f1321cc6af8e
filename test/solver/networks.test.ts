import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const g = 9.80665;
const eps = 4.5e-5;

/** Colebrook–White by fixed-point iteration on 1/√f, written here independently of the physics module. */
function friction(re: number, rel: number): number {
  if (re < 2000) return 64 / Math.max(re, 1e-12);
  let x = 8;
  for (let i = 0; i < 100; i++) {
    const next = -2 * Math.log10(rel / 3.7 + (2.51 * x) / re);
    if (Math.abs(next - x) < 1e-14 * x) break;
    x = next;
  }
  return 1 / (x * x);
}

/** Flow (signed) through a pipe for a head difference dh = f (L/D) v|v|/2g, by fixed-point iteration on v. */
function pipeFlow(dh: number, length: number, d: number, rho: number, mu: number): number {
  if (dh === 0) return 0;
  const A = (Math.PI * d * d) / 4;
  let v = 1;
  for (let i = 0; i < 200; i++) {
    const f = friction((rho * v * d) / mu, eps / d);
    const next = Math.sqrt((2 * g * Math.abs(dh) * d) / (f * length));
    if (Math.abs(next - v) < 1e-14 * next) break;
    v = next;
  }
  return Math.sign(dh) * v * A;
}

interface P {
  id: string;
  a: string;
  b: string;
  length: number;
  d: number;
}

/**
 * Independent nodal solution: Cross (1936, Univ. of Illinois Bulletin 286), "method of balancing
 * heads": sweep the junctions, each time setting one junction's head by bisection so that its
 * flows balance, until nothing changes. Written here; minor losses and velocity heads neglected
 * as in the textbook form (the sheet uses entrance and exit K = 0 to match).
 */
function balanceHeads(
  pipes: P[],
  fixed: Record<string, number>,
  junctions: string[],
  rho: number,
  mu: number,
) {
  const head: Record<string, number> = { ...fixed };
  const levels = Object.values(fixed);
  for (const j of junctions) head[j] = (Math.max(...levels) + Math.min(...levels)) / 2;
  const inflow = (j: string, hj: number) =>
    pipes.reduce((sum, p) => {
      if (p.a === j) return sum - pipeFlow(hj - head[p.b], p.length, p.d, rho, mu);
      if (p.b === j) return sum + pipeFlow(head[p.a] - hj, p.length, p.d, rho, mu);
      return sum;
    }, 0);
  for (let sweep = 0; sweep < 400; sweep++) {
    let change = 0;
    for (const j of junctions) {
      // Secant iteration on the junction head for zero net inflow.
      let h0 = head[j];
      let h1 = head[j] + 0.01;
      let f0 = inflow(j, h0);
      for (let i = 0; i < 50; i++) {
        const f1 = inflow(j, h1);
        if (f1 === f0) break;
        const h2 = h1 - (f1 * (h1 - h0)) / (f1 - f0);
        h0 = h1;
        f0 = f1;
        h1 = Math.min(Math.max(h2, Math.min(...levels)), Math.max(...levels));
        if (Math.abs(h1 - h0) < 1e-13) break;
      }
      change = Math.max(change, Math.abs(head[j] - h1));
      head[j] = h1;
    }
    if (change < 1e-11) break;
  }
  return Object.fromEntries(
    pipes.map((p) => [p.id, pipeFlow(head[p.a] - head[p.b], p.length, p.d, rho, mu)]),
  );
}

function sheetOf(pipes: P[], reservoirs: Record<string, number>, junctions: string[]) {
  const s = new Sheet();
  for (const [id, level] of Object.entries(reservoirs))
    s.vessel(id, level, { entranceK: 0, exitK: 0 });
  for (const j of junctions) s.node('junction', j);
  const port = (id: string) => (id in reservoirs ? at(id, 'N1') : at(id, 'hub'));
  // Each reservoir has one nozzle, so a reservoir with several pipes gets one nozzle per pipe.
  const used: Record<string, number> = {};
  const nozzle = (id: string) => {
    if (!(id in reservoirs)) return port(id);
    used[id] = (used[id] ?? 0) + 1;
    const v = s.doc.nodes[id];
    if (v.kind === 'vessel' && used[id] > v.nozzles.length)
      v.nozzles.push({ id: `N${used[id]}`, z: 0, entranceK: 0, exitK: 0 });
    return at(id, `N${used[id]}`);
  };
  for (const p of pipes)
    s.pipe(p.id, nozzle(p.a), nozzle(p.b), { length: p.length, diameter: p.d, roughness: eps });
  return s;
}

describe('branched and looped networks', () => {
  it('three-reservoir problem (classic textbook set-up, e.g. Streeter & Wylie, Fluid Mechanics — from memory; numbers ours) vs balancing heads', () => {
    const pipes: P[] = [
      { id: 'PA', a: 'A', b: 'J', length: 1000, d: 0.3 },
      { id: 'PB', a: 'J', b: 'B', length: 500, d: 0.2 },
      { id: 'PC', a: 'J', b: 'C', length: 800, d: 0.25 },
    ];
    const levels = { A: 30, B: 18, C: 9 };
    const s = sheetOf(pipes, levels, ['J']);
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    const expected = balanceHeads(pipes, levels, ['J'], r.fluid.density, r.fluid.viscosity);
    for (const p of pipes) expect(Math.abs(r.pipes[p.id].flow - expected[p.id])).toBeLessThan(1e-7);
    // Flow leaves A and reaches C; the junction head lies between the levels.
    expect(r.pipes.PA.flow).toBeGreaterThan(0);
    expect(r.pipes.PC.flow).toBeGreaterThan(0);
  });

  it('a two-loop network between three reservoirs vs balancing heads (Cross 1936), and energy around each loop', () => {
    const pipes: P[] = [
      { id: 'p1', a: 'A', b: 'J1', length: 500, d: 0.3 },
      { id: 'p2', a: 'J1', b: 'J2', length: 400, d: 0.2 },
      { id: 'p3', a: 'J1', b: 'J3', length: 300, d: 0.15 },
      { id: 'p4', a: 'J3', b: 'J2', length: 300, d: 0.15 },
      { id: 'p5', a: 'J2', b: 'C', length: 600, d: 0.25 },
      { id: 'p6', a: 'J3', b: 'D', length: 400, d: 0.15 },
      { id: 'p7', a: 'J2', b: 'J4', length: 250, d: 0.15 },
      { id: 'p8', a: 'J3', b: 'J4', length: 350, d: 0.1 },
    ];
    const levels = { A: 50, C: 10, D: 25 };
    const junctions = ['J1', 'J2', 'J3', 'J4'];
    const s = sheetOf(pipes, levels, junctions);
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    const expected = balanceHeads(pipes, levels, junctions, r.fluid.density, r.fluid.viscosity);
    for (const p of pipes) expect(Math.abs(r.pipes[p.id].flow - expected[p.id])).toBeLessThan(1e-7);
    // Around loop J1–J2–J3: the signed EGL drops sum to zero (energy, 1e-6 m).
    const drop = (id: string) => Math.sign(r.pipes[id].flow) * r.pipes[id].frictionLoss;
    expect(Math.abs(drop('p2') - drop('p3') - drop('p4'))).toBeLessThan(1e-6);
    // Around loop J3–J2–J4: J3→J2→J4 against J3→J4.
    expect(Math.abs(drop('p4') + drop('p7') - drop('p8'))).toBeLessThan(1e-6);
  });
});
