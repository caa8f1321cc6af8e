import { describe, expect, it } from 'vitest';
import { fitCurve, pumpEfficiency } from '../../src/lib/physics/pump';
import { EFFICIENCY_FLOOR } from '../../src/lib/solver/results';
import { solve } from '../../src/lib/solver/solve';
import type { Pump } from '../../src/lib/model/types';
import { at, expectAllFinite, Sheet } from './helpers';

const M3H = 1 / 3600;
const g = 9.80665; // standard gravity, CGPM 1901

/** Tank A (level 2 m) → 5 m suction → the default new pump in duty mode → 20 m line → tank B (level 5 m). */
function dutyLine(dutyFlowM3h: number) {
  const s = new Sheet();
  s.vessel('A', 2);
  s.vessel('B', 5, { nozzleZ: 4 });
  s.pump('P', { z: 0, mode: 'duty', dutyFlow: dutyFlowM3h * M3H } as Partial<Pump>);
  s.pipe('S', at('A', 'N1'), at('P', 'suction'), { length: 5 });
  s.pipe('D', at('P', 'discharge'), at('B', 'N1'), { length: 20 });
  return s;
}

describe('pump efficiency far beyond best efficiency', () => {
  it('the default pump curve, extrapolated to 60 m³/h, fits a negative efficiency', () => {
    const s = dutyLine(60);
    const fit = fitCurve((s.doc.nodes.P as Pump).efficiencyCurve);
    expect(pumpEfficiency(fit, 60 * M3H, 1)).toBeLessThan(0);
  });

  it('holds the efficiency at its floor, keeps shaft power finite and positive, and raises pump-off-bep', () => {
    const s = dutyLine(60);
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expectAllFinite(r);
    const pump = r.pumps.P;
    expect(pump.flow).toBeCloseTo(60 * M3H, 9);
    expect(pump.efficiency).toBe(EFFICIENCY_FLOOR);
    expect(pump.bepFraction).toBeGreaterThan(1.2);
    expect(pump.head).toBeGreaterThan(0);
    // P = ρ g Q H / η (hydraulic power over efficiency, definition).
    const expected = (r.fluid.density * g * pump.flow * pump.head) / EFFICIENCY_FLOOR;
    expect(pump.shaftPower).toBeGreaterThan(0);
    expect(Math.abs(pump.shaftPower - expected)).toBeLessThan(1e-9 * expected);
    expect(r.findings.some((f) => f.code === 'pump-off-bep' && f.elements.includes('P'))).toBe(
      true,
    );
  });

  it('leaves an efficiency above the floor as the fitted curve gives it', () => {
    const s = dutyLine(20);
    const r = solve(s.doc);
    const fit = fitCurve((s.doc.nodes.P as Pump).efficiencyCurve);
    expect(r.pumps.P.efficiency).toBeCloseTo(pumpEfficiency(fit, 20 * M3H, 1), 12);
    expect(r.pumps.P.efficiency).toBeGreaterThan(0.5);
  });
});
