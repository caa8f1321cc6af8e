/**
 * A pump's suction and discharge flanges at their own elevations. NPSHa is taken at the suction
 * flange: NPSHa = (p_abs − p_v)/ρg + v²/2g (DESIGN.md). The total head reaching the flange
 * does not depend on where the flange is, so by Bernoulli (a fact of the trade) raising the
 * suction flange by Δz lowers its pressure head, and NPSHa, by exactly Δz.
 */
import { describe, expect, it } from 'vitest';
import { portElevation } from '../../src/lib/model/ports';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

function pumpSheet(flanges: { suctionElevation?: number; dischargeElevation?: number } = {}) {
  const s = new Sheet();
  s.vessel('S', 4);
  s.pump('P', { z: 0.5, ...flanges });
  s.vessel('D', 20, { nozzleZ: 15 });
  s.pipe('suction', at('S', 'N1'), at('P', 'suction'), { length: 8, diameter: 0.078 });
  s.pipe('discharge', at('P', 'discharge'), at('D', 'N1'), { length: 80, diameter: 0.0626 });
  return s;
}

describe('pump flange elevations', () => {
  it('absent flanges sit at the pump z', () => {
    const s = pumpSheet();
    expect(portElevation(s.doc, at('P', 'suction'))).toBe(0.5);
    expect(portElevation(s.doc, at('P', 'discharge'))).toBe(0.5);
    const r = solve(s.doc);
    expect(r.nodes.P.ports.suction.elevation).toBe(0.5);
  });

  it.each([
    [0.5, 1.25],
    [0.5, -0.4],
    [0.2, 2.0],
  ])('NPSHa changes by minus the suction flange rise (%s m → %s m)', (from, to) => {
    const a = pumpSheet({ suctionElevation: from, dischargeElevation: 0.9 });
    const b = pumpSheet({ suctionElevation: to, dischargeElevation: 0.9 });
    const ra = solve(a.doc);
    const rb = solve(b.doc);
    expectAllFinite(rb);
    expectConservation(b.doc, rb);
    expect(rb.nodes.P.ports.suction.elevation).toBe(to);
    expect(rb.nodes.P.ports.discharge.elevation).toBe(0.9);
    // The flow does not depend on the flange elevations (only on heads and losses).
    expect(rb.pumps.P.flow).toBeCloseTo(ra.pumps.P.flow, 12);
    expect(rb.pumps.P.npshAvailable - ra.pumps.P.npshAvailable).toBeCloseTo(-(to - from), 9);
  });

  it('the discharge flange elevation sets the discharge pressure, not NPSHa', () => {
    const a = pumpSheet({ dischargeElevation: 0.5 });
    const b = pumpSheet({ dischargeElevation: 1.7 });
    const ra = solve(a.doc);
    const rb = solve(b.doc);
    expect(rb.pumps.P.npshAvailable).toBeCloseTo(ra.pumps.P.npshAvailable, 9);
    const rhoG = ra.fluid.density * 9.80665;
    const dp = rb.nodes.P.ports.discharge.pressureGauge - ra.nodes.P.ports.discharge.pressureGauge;
    expect(dp / rhoG).toBeCloseTo(-1.2, 9);
  });
});
