import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import type { PumpPoint } from '../../src/lib/model/types';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const g = 9.80665;

/** Test pump: H = 40 − 10⁴·Q² m (Q in m³/s) at rated speed; four points on it, so the quadratic fit is exact. */
const curve: PumpPoint[] = [0, 0.02, 0.04, 0.06].map((q) => ({ flow: q, value: 40 - 1e4 * q * q }));
const H = (q: number, s = 1) => 40 * s * s - 1e4 * q * q;

/** Colebrook–White by fixed-point iteration, written here independently of the physics module. */
function friction(re: number, rel: number): number {
  if (re < 2000) return 64 / re;
  let x = 8;
  for (let i = 0; i < 200; i++) x = -2 * Math.log10(rel / 3.7 + (2.51 * x) / re);
  return 1 / (x * x);
}

/** System head: static lift plus entrance, exit and friction losses in a D = 0.1 m line of total length L. */
function systemHead(q: number, staticLift: number, length: number, rho: number, mu: number) {
  const d = 0.1;
  const v = q / ((Math.PI * d * d) / 4);
  const f = friction((rho * v * d) / mu, 4.5e-5 / d);
  return staticLift + ((0.5 + 1 + (f * length) / d) * (v * v)) / (2 * g);
}

/** Bisection on Q for pumpHead(Q) = systemHead(Q). */
function operatingPoint(pumpHead: (q: number) => number, system: (q: number) => number): number {
  let lo = 0;
  let hi = 0.2;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (pumpHead(mid) > system(mid)) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** Tank A (level 2 m) → 5 m suction → pump(s) → 100 m discharge → tank B (level 20 m). */
function pumpLine(
  arrangement: 'single' | 'parallel' | 'series',
  props: Record<string, unknown> = {},
) {
  const s = new Sheet();
  s.vessel('A', 2);
  s.vessel('B', 20, { nozzleZ: 19 });
  const pump = (id: string) => s.pump(id, { headCurve: curve, z: 0, ...props });
  if (arrangement === 'single') {
    pump('P');
    s.pipe('S', at('A', 'N1'), at('P', 'suction'), { length: 5 });
    s.pipe('D', at('P', 'discharge'), at('B', 'N1'), { length: 100 });
  } else if (arrangement === 'parallel') {
    s.node('junction', 'J1');
    s.node('junction', 'J2');
    pump('P1');
    pump('P2');
    s.pipe('S', at('A', 'N1'), at('J1', 'hub'), { length: 5 });
    s.pipe('a1', at('J1', 'hub'), at('P1', 'suction'), { length: 0 });
    s.pipe('a2', at('J1', 'hub'), at('P2', 'suction'), { length: 0 });
    s.pipe('b1', at('P1', 'discharge'), at('J2', 'hub'), { length: 0 });
    s.pipe('b2', at('P2', 'discharge'), at('J2', 'hub'), { length: 0 });
    s.pipe('D', at('J2', 'hub'), at('B', 'N1'), { length: 100 });
  } else {
    pump('P1');
    pump('P2');
    s.pipe('S', at('A', 'N1'), at('P1', 'suction'), { length: 5 });
    s.pipe('m', at('P1', 'discharge'), at('P2', 'suction'), { length: 0 });
    s.pipe('D', at('P2', 'discharge'), at('B', 'N1'), { length: 100 });
  }
  return s;
}

describe('pumps', () => {
  it('one pump: operating point equals pump curve ∩ system curve by bisection (check written in this test)', () => {
    const s = pumpLine('single');
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    const { density, viscosity } = r.fluid;
    const q = operatingPoint(H, (x) => systemHead(x, 18, 105, density, viscosity));
    expect(Math.abs(r.pumps.P.flow - q) / q).toBeLessThan(1e-6);
    expect(r.pumps.P.head).toBeCloseTo(H(q), 5);
  });

  it('two identical pumps in parallel: each gives H(Q/2) of one pump curve', () => {
    const s = pumpLine('parallel');
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    const q = operatingPoint(
      (x) => H(x / 2),
      (x) => systemHead(x, 18, 105, r.fluid.density, r.fluid.viscosity),
    );
    expect(Math.abs(r.pipes.D.flow - q) / q).toBeLessThan(1e-6);
    expect(r.pumps.P1.flow).toBeCloseTo(q / 2, 9);
    expect(r.pumps.P2.flow).toBeCloseTo(q / 2, 9);
    expect(r.pumps.P1.head).toBeCloseTo(H(q / 2), 5);
  });

  it('two identical pumps in series: together 2·H(Q) of one pump curve', () => {
    const s = pumpLine('series');
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    const q = operatingPoint(
      (x) => 2 * H(x),
      (x) => systemHead(x, 18, 105, r.fluid.density, r.fluid.viscosity),
    );
    expect(Math.abs(r.pipes.D.flow - q) / q).toBeLessThan(1e-6);
    expect(r.pumps.P1.head + r.pumps.P2.head).toBeCloseTo(2 * H(q), 5);
  });

  it('running speed by the affinity laws (H ∝ N², Q ∝ N): 80 % speed', () => {
    const s = pumpLine('single', { speed: 2320, ratedSpeed: 2900 });
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    const q = operatingPoint(
      (x) => H(x, 0.8),
      (x) => systemHead(x, 18, 105, r.fluid.density, r.fluid.viscosity),
    );
    expect(Math.abs(r.pumps.P.flow - q) / q).toBeLessThan(1e-6);
  });

  it('duty mode fixes the flow and reports the head the pump must give (the system head)', () => {
    const s = pumpLine('single', { mode: 'duty', dutyFlow: 0.03 });
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    expect(r.pumps.P.flow).toBeCloseTo(0.03, 12);
    expect(r.pumps.P.head).toBeCloseTo(
      systemHead(0.03, 18, 105, r.fluid.density, r.fluid.viscosity),
      6,
    );
  });

  it('a pump that is off passes no flow', () => {
    const s = pumpLine('single', { running: false });
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.pumps.P.flow)).toBeLessThan(1e-8);
    expect(r.pipes.D.regime).toBe('no-flow');
  });

  it('a pump whose shut-off head is below the static lift does not run backwards', () => {
    const s = pumpLine('single', { speed: 1800, ratedSpeed: 2900 }); // 40·0.385 = 15.4 m < 18 m
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.pumps.P.flow)).toBeLessThan(1e-8);
    expect(r.findings.map((f) => f.code)).toContain('pump-at-shutoff');
  });
});

describe('dead-headed pumps', () => {
  it('a pump against a shut valve gives its shut-off head and no flow', () => {
    const s = new Sheet();
    s.vessel('A', 2);
    s.pump('P', { headCurve: curve });
    s.fitting('V', { fittingType: 'gate-valve', closed: true });
    s.vessel('B', 20, { nozzleZ: 19 });
    s.pipe('S', at('A', 'N1'), at('P', 'suction'), { length: 5 });
    s.pipe('D', at('P', 'discharge'), at('V', 'in'), { length: 5 });
    s.pipe('E', at('V', 'out'), at('B', 'N1'), { length: 5 });
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.pumps.P.flow)).toBeLessThan(1e-8);
    expect(r.pumps.P.head).toBeCloseTo(40, 6); // shut-off head of the test curve
    expect(r.nodes.V.ports.in.totalHead).toBeCloseTo(2 + 40, 6);
  });

  it('two running pumps in series against a capped line settle at twice the shut-off head', () => {
    const s = new Sheet();
    s.vessel('A', 2);
    s.pump('P1', { headCurve: curve });
    s.pump('P2', { headCurve: curve });
    s.pipe('S', at('A', 'N1'), at('P1', 'suction'), { length: 0 });
    s.pipe('M', at('P1', 'discharge'), at('P2', 'suction'), { length: 0 });
    s.node('waypoint', 'W');
    s.pipe('D', at('P2', 'discharge'), at('W', 'in'), { length: 0 });
    const r = solve(s.doc);
    expectAllFinite(r);
    expect(r.converged).toBe(true);
    expect(r.massImbalance).toBeLessThan(1e-9);
    expect(r.nodes.W.ports.in.totalHead).toBeCloseTo(2 + 80, 5);
  });
});

describe('check valve', () => {
  function line(levelA: number, levelB: number) {
    const s = new Sheet();
    s.vessel('A', levelA);
    s.vessel('B', levelB);
    s.fitting('C', { fittingType: 'swing-check-valve', lossMethod: 'fixed', fixedK: 2 });
    s.pipe('P1', at('A', 'N1'), at('C', 'in'), { length: 20 });
    s.pipe('P2', at('C', 'out'), at('B', 'N1'), { length: 20 });
    return s;
  }

  it('stops reverse flow (B higher than A)', () => {
    const s = line(5, 10);
    const r = solve(s.doc);
    expectAllFinite(r);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.pipes.P1.flow)).toBeLessThan(1e-8);
    expect(r.findings.find((f) => f.code === 'non-return-closed')?.elements).toEqual(['C']);
    // The closed valve holds the full head difference: EGL on each side is that tank's level.
    expect(r.nodes.C.ports.in.totalHead).toBeCloseTo(5, 6);
    expect(r.nodes.C.ports.out.totalHead).toBeCloseTo(10, 6);
  });

  it('passes forward flow with its K (A higher than B)', () => {
    const s = line(10, 5);
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    const v = r.pipes.P1.velocity;
    expect(r.nodes.C.headLoss!).toBeCloseTo((2 * v * v) / (2 * g), 9);
    expect(r.nodes.C.lossCoefficient).toBe(2);
  });
});
