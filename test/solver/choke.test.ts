/**
 * Choked control valves (IEC 60534-2-1, liquids): once Δp passes Δp_max = FL²·(p1 − FF·pv) the
 * flow stays at Q_max = Kv·√(Δp_max/1 bar ÷ ρ/ρ0) m³/h whatever the drop, with
 * FF = 0.96 − 0.28·√(pv/pc) (IEC 60534-2-1 equation for FF). The checks are written out here:
 * the held flow against that equation at the inlet pressure the solve reports, the defining
 * property of choked flow (it does not change when the downstream pressure falls further), a
 * duty pump pushing a fixed flow through a choked valve (the inlet pressure the equation needs),
 * and two valves choking in parallel.
 */
import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import type { SolveResult } from '../../src/lib/solver/types';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

/** Reference water density of IEC 60534's ρ/ρ0, kg/m³ (as physics/controlValve.ts). */
const RHO0 = 999.1;
/** Critical pressure of water, Pa (IAPWS-IF97: 22.064 MPa). */
const PC_WATER = 22.064e6;
const M3H = 1 / 3600;

/** Q_max, m³/s, for Kv, FL and the inlet pressure, written out from IEC 60534-2-1. */
function chokedFlow(kv: number, fl: number, p1: number, r: SolveResult): number {
  const pv = r.fluid.vapourPressure;
  const ff = 0.96 - 0.28 * Math.sqrt(pv / PC_WATER);
  const dpMax = fl * fl * (p1 - ff * pv);
  return kv * Math.sqrt(dpMax / 1e5 / (r.fluid.density / RHO0)) * M3H;
}

/** An empty sheet of water at 95 °C (p_v ≈ 84.6 kPa) at sea-level atmosphere. */
function hotWaterSheet(): Sheet {
  const s = new Sheet();
  s.doc.settings.temperature = 368.15;
  s.doc.settings.atmosphericPressureOverride = 101_325;
  return s;
}

/**
 * Hot water from a pressurised header through a 2" valve into a tank at `sinkAbs`. Both pipes
 * have the valve's bore, so the static Δp across it is its EGL drop (IEC 60534 measures Δp
 * between taps in pipes of the valve's size).
 */
function valveLine(sinkAbs: number, opening = 1) {
  const s = hotWaterSheet();
  s.boundary('H', 0, 12e5);
  s.node('control-valve', 'CV', {
    name: 'PV-7',
    ratedCoefficient: 20,
    characteristic: 'linear',
    opening,
    pressureRecoveryFactor: 0.9,
  });
  s.vessel('B', 2, { open: false, gasPressureAbs: sinkAbs });
  s.pipe('P1', at('H', 'p'), at('CV', 'in'), { diameter: 0.0525, length: 40 });
  s.pipe('P2', at('CV', 'out'), at('B', 'N1'), { diameter: 0.0525, length: 10 });
  return s;
}

describe('a choked control valve is held at its choked flow (IEC 60534-2-1)', () => {
  it('the held flow is Q_max at the inlet pressure the solve reports, below the unchoked flow', () => {
    const s = valveLine(1.2e5);
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    const cv = r.controlValves.CV;
    expect(cv.choked).toBe(true);
    expect(cv.flowLimited).toBe(true);
    const p1 = r.nodes.CV.ports.in.pressureAbs;
    // Settled to 1e-9 m³/s + 1e-8 of the flow (choke.ts): within 5e-7 here.
    expect(cv.flow / chokedFlow(20, 0.9, p1, r)).toBeCloseTo(1, 6);
    expect(cv.pressureDrop).toBeGreaterThan(cv.chokedPressureDrop);
    // Unchoked, the same drop would pass Kv·√(Δp/1 bar ÷ ρ/ρ0) (IEC 60534-2-1 eq. 1): more.
    const unchoked = 20 * Math.sqrt(cv.pressureDrop / 1e5 / (r.fluid.density / RHO0)) * M3H;
    expect(cv.flow).toBeLessThan(unchoked);
    const f = r.findings.find((x) => x.code === 'control-valve-choked');
    expect(f?.level).toBe('stop');
    expect(f?.message).toMatch(/held at the choked flow, [\d.]+ m³\/h/);
  });

  it('the choked flow does not change when the downstream pressure falls further', () => {
    const a = solve(valveLine(1.2e5).doc);
    const b = solve(valveLine(0.9e5).doc);
    expect(a.controlValves.CV.flowLimited && b.controlValves.CV.flowLimited).toBe(true);
    expect(b.controlValves.CV.flow / a.controlValves.CV.flow).toBeCloseTo(1, 6);
    expect(b.controlValves.CV.pressureDrop).toBeGreaterThan(a.controlValves.CV.pressureDrop);
    // Upstream of the valve nothing moves either.
    expect(b.nodes.CV.ports.in.pressureAbs).toBeCloseTo(a.nodes.CV.ports.in.pressureAbs, 2);
  });

  it('a valve that does not choke keeps its unchoked flow and is not held', () => {
    const r = solve(valveLine(11.6e5).doc);
    expectConservation(valveLine(11.6e5).doc, r);
    expect(r.controlValves.CV.choked).toBe(false);
    expect(r.controlValves.CV.flowLimited).toBeUndefined();
    const cv = r.controlValves.CV;
    const q = 20 * Math.sqrt(cv.pressureDrop / 1e5 / (r.fluid.density / RHO0)) * M3H;
    expect(cv.flow).toBeCloseTo(q, 10);
  });

  it('a duty pump pushing a fixed flow through a choked valve raises the inlet pressure to suit it', () => {
    const s = hotWaterSheet();
    s.vessel('A', 3, { nozzleZ: 0 });
    s.pump('P', { z: 0, mode: 'duty', dutyFlow: 12 * M3H });
    s.node('control-valve', 'CV', {
      name: 'FV-9',
      ratedCoefficient: 6,
      characteristic: 'linear',
      opening: 1,
      pressureRecoveryFactor: 0.9,
    });
    s.vessel('B', 2, { open: false, gasPressureAbs: 0.9e5 });
    s.pipe('S', at('A', 'N1'), at('P', 'suction'), { diameter: 0.0779, length: 5 });
    s.pipe('D', at('P', 'discharge'), at('CV', 'in'), { diameter: 0.0525, length: 20 });
    s.pipe('E', at('CV', 'out'), at('B', 'N1'), { diameter: 0.0779, length: 10 });
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    expect(r.pumps.P.flow).toBeCloseTo(12 * M3H, 12);
    const cv = r.controlValves.CV;
    expect(cv.flowLimited).toBe(true);
    // The inlet pressure is the one at which 12 m³/h is the choked flow.
    const p1 = r.nodes.CV.ports.in.pressureAbs;
    expect(chokedFlow(6, 0.9, p1, r) / (12 * M3H)).toBeCloseTo(1, 6);
  });

  it('two valves choking in parallel from one header are both held, and the mass balances', () => {
    const s = hotWaterSheet();
    s.boundary('H', 0, 5e5);
    s.node('junction', 'J', { z: 0 });
    s.node('junction', 'K', { z: 0 });
    for (const [id, kv] of [
      ['CV1', 15],
      ['CV2', 8],
    ] as const)
      s.node('control-valve', id, {
        ratedCoefficient: kv,
        characteristic: 'linear',
        opening: 1,
        pressureRecoveryFactor: 0.85,
      });
    s.vessel('B', 2, { open: false, gasPressureAbs: 1.0e5 });
    s.pipe('M', at('H', 'p'), at('J', 'hub'), { diameter: 0.0779, length: 60 });
    s.pipe('A1', at('J', 'hub'), at('CV1', 'in'), { diameter: 0.0525, length: 5 });
    s.pipe('A2', at('J', 'hub'), at('CV2', 'in'), { diameter: 0.0409, length: 15 });
    s.pipe('B1', at('CV1', 'out'), at('K', 'hub'), { diameter: 0.0525, length: 5 });
    s.pipe('B2', at('CV2', 'out'), at('K', 'hub'), { diameter: 0.0525, length: 5 });
    s.pipe('R', at('K', 'hub'), at('B', 'N1'), { diameter: 0.1023, length: 10 });
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    for (const [id, kv] of [
      ['CV1', 15],
      ['CV2', 8],
    ] as const) {
      const cv = r.controlValves[id];
      expect(cv.flowLimited, id).toBe(true);
      const p1 = r.nodes[id].ports.in.pressureAbs;
      expect(cv.flow / chokedFlow(kv, 0.85, p1, r), id).toBeCloseTo(1, 6);
    }
    expect(r.pipes.M.flow).toBeCloseTo(r.controlValves.CV1.flow + r.controlValves.CV2.flow, 12);
  });
});
