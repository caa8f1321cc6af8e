import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const g = 9.80665;

/** Colebrook–White solved by plain fixed-point iteration, written here independently of the physics module. */
function colebrookHere(re: number, relRough: number): number {
  if (re < 2000) return 64 / re;
  let x = 8; // 1/√f
  for (let i = 0; i < 200; i++) x = -2 * Math.log10(relRough / 3.7 + (2.51 * x) / re);
  return 1 / (x * x);
}

/** Bisection on Q for a single pipe between two open tanks: ΔH = (K_ent + K_exit + fL/D) v²/2g. */
function bisectSeries(
  dh: number,
  length: number,
  d: number,
  eps: number,
  kEnds: number,
  rho: number,
  mu: number,
): number {
  const A = (Math.PI * d * d) / 4;
  const residual = (q: number) => {
    const v = q / A;
    const f = colebrookHere((rho * v * d) / mu, eps / d);
    return dh - ((kEnds + (f * length) / d) * (v * v)) / (2 * g);
  };
  let lo = 1e-9;
  let hi = 10;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (residual(mid) > 0) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe('series line', () => {
  it('tank → pipe → tank matches an independent bisection on Q (check written in this test)', () => {
    const s = new Sheet();
    s.vessel('A', 20);
    s.vessel('B', 5);
    s.pipe('P1', at('A', 'N1'), at('B', 'N1'), { length: 200, diameter: 0.1, roughness: 4.5e-5 });
    const result = solve(s.doc);
    expectAllFinite(result);
    expectConservation(s.doc, result);
    const { density, viscosity } = result.fluid;
    const q = bisectSeries(15, 200, 0.1, 4.5e-5, 0.5 + 1, density, viscosity);
    expect(result.pipes.P1.flow).toBeGreaterThan(0);
    expect(Math.abs(result.pipes.P1.flow - q) / q).toBeLessThan(1e-6);
  });

  it('a chain of waypoints gives the same flow as the single pipe of the same total length', () => {
    const s = new Sheet();
    s.vessel('A', 20);
    s.vessel('B', 5);
    const n = 6;
    for (let i = 1; i < n; i++) s.node('waypoint', `W${i}`, { z: i % 2 === 0 ? 8 : -3 });
    for (let i = 0; i < n; i++) {
      const from = i === 0 ? at('A', 'N1') : at(`W${i}`, 'out');
      const to = i === n - 1 ? at('B', 'N1') : at(`W${i + 1}`, 'in');
      s.pipe(`P${i}`, from, to, { length: 200 / n, diameter: 0.1 });
    }
    const result = solve(s.doc);
    expectConservation(s.doc, result);
    const { density, viscosity } = result.fluid;
    const q = bisectSeries(15, 200, 0.1, 4.5e-5, 1.5, density, viscosity);
    for (let i = 0; i < n; i++)
      expect(Math.abs(result.pipes[`P${i}`].flow - q) / q).toBeLessThan(1e-6);
  });
});
