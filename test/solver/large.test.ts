/**
 * Large sheets: a 1,000-pipe series line against an independent solution, and a 1,000-pipe
 * looped grid checked for conservation and for identical results when solved again (the
 * second solve reuses the ordering and symbolic factorisation of the first).
 */
import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, gridSheet, Sheet } from './helpers';

const g = 9.80665; // standard gravity, CGPM 1901

/** Colebrook–White by plain fixed-point iteration, written here independently of the physics module. */
function colebrookHere(re: number, relRough: number): number {
  let x = 8; // 1/√f
  for (let i = 0; i < 200; i++) x = -2 * Math.log10(relRough / 3.7 + (2.51 * x) / re);
  return 1 / (x * x);
}

const N = 1000;
const LENGTH = 10;
const D = 0.1;
const EPS = 4.5e-5;
const LEVEL_S = 110;
const LEVEL_T = 2;

/** Tank S → N pipes of 10 m, 100 mm bore through N − 1 waypoints that rise and fall → tank T. */
function seriesLine(): Sheet {
  const s = new Sheet();
  s.vessel('S', LEVEL_S);
  s.vessel('T', LEVEL_T);
  let prev = at('S', 'N1');
  for (let i = 1; i < N; i++) {
    s.node('waypoint', `W${i}`, { z: 3 * Math.sin(i / 7) });
    s.pipe(`L${i}`, prev, at(`W${i}`, 'in'), { length: LENGTH, diameter: D, roughness: EPS });
    prev = at(`W${i}`, 'out');
  }
  s.pipe(`L${N}`, prev, at('T', 'N1'), { length: LENGTH, diameter: D, roughness: EPS });
  return s;
}

describe('a 1,000-pipe series line', () => {
  it('matches an independent bisection on the whole line (entrance 0.5 + exit 1 + Σ fL/D)', () => {
    const s = seriesLine();
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expectAllFinite(r);
    const rho = r.fluid.density;
    const mu = r.fluid.viscosity;
    const area = (Math.PI * D * D) / 4;
    const lossPerVelocityHead = (q: number) => {
      const v = q / area;
      return 0.5 + 1 + (colebrookHere((rho * v * D) / mu, EPS / D) * N * LENGTH) / D;
    };
    let lo = 1e-6;
    let hi = 1;
    for (let i = 0; i < 200; i++) {
      const q = (lo + hi) / 2;
      const v = q / area;
      if (LEVEL_S - LEVEL_T - (lossPerVelocityHead(q) * v * v) / (2 * g) > 0) lo = q;
      else hi = q;
    }
    const q = (lo + hi) / 2;
    for (const id of ['L1', 'L500', `L${N}`]) {
      expect(Math.abs(r.pipes[id].flow - q) / q, id).toBeLessThan(1e-9);
    }
    // EGL after pipe i: S's level less the entrance loss and i pipes of friction.
    const v = q / area;
    const f = colebrookHere((rho * v * D) / mu, EPS / D);
    const vh = (v * v) / (2 * g);
    for (const i of [1, 250, 999]) {
      const expected = LEVEL_S - (0.5 + (f * i * LENGTH) / D) * vh;
      expect(Math.abs(r.pipes[`L${i}`].totalHeadTo! - expected), `EGL after L${i}`).toBeLessThan(
        1e-6,
      );
    }
  });
});

describe('a 1,000-pipe looped grid', () => {
  it('conserves mass and energy, and solving again gives identical numbers', () => {
    const s = gridSheet(22); // 2·22·21 = 924 grid pipes plus feed and outlets
    expect(Object.keys(s.doc.pipes).length).toBeGreaterThan(925);
    const first = solve(s.doc);
    expectAllFinite(first);
    expectConservation(s.doc, first);
    const second = solve(s.doc);
    expect(second).toEqual(first);
    // Everything fed from S leaves through the five outlets.
    const out = [0, 1, 2, 3, 4].reduce((sum, m) => sum + first.pipes[`out${m}`].flow, 0);
    expect(Math.abs(out - first.pipes.feed.flow)).toBeLessThan(1e-9);
  });
});
