/**
 * A closed vessel's gas head is taken against the site's atmospheric pressure, and the
 * thresholds of the vapour-pressure findings are exact (p_abs < p_v is a finding, p_abs = p_v
 * is not).
 */
import { describe, expect, it } from 'vitest';
import type { Vessel } from '../../src/lib/model/types';
import { profile } from '../../src/lib/solver/profile';
import { negativeSpans } from '../../src/lib/solver/routeFindings';
import { solve } from '../../src/lib/solver/solve';
import type { Station } from '../../src/lib/solver/types';
import { at, Sheet } from './helpers';

/** Standard gravity, m/s² (CGPM 1901 / ISO 80000-3). */
const G = 9.80665;
const RHO = 1000;
const PV = 2339;
/**
 * ISA pressure at 1,500 m geometric (1,499.65 m geopotential), Pa: ISO 2533:1975 gives
 * 84,556 Pa at 1,500 m geopotential (from memory); the barometric formula of ISO 2533 for the
 * troposphere, p = 101,325 (1 − 0.0065 H/288.15)^(g/(R·0.0065)) with R = 287.05287 J/(kg·K),
 * evaluated here outside the project at H = 1,499.65 m gives 84,559.67 Pa.
 */
const P_ATM_1500 = 84_559.67;

/** Closed vessel T (gas 150 kPa abs, level 3 m) → 20 m of 50 mm pipe → open vessel B (level 0). */
function closedFeed(site: number, gasPressureAbs = 150_000): Sheet {
  const s = new Sheet();
  s.doc.settings.liquid = {
    kind: 'user',
    name: 'test liquid',
    table: [{ temperature: 293.15, density: RHO, viscosity: 1e-3, vapourPressure: PV }],
  };
  s.doc.settings.siteElevation = site;
  s.doc.settings.atmosphericPressureOverride = null;
  s.vessel('T', 3, { nozzleZ: 0, open: false, gasPressureAbs, name: 'Tank' } as Partial<Vessel>);
  s.vessel('B', 0, { nozzleZ: 0, name: 'Basin' });
  s.pipe('p', at('T', 'N1'), at('B', 'N1'), { length: 20, diameter: 0.05, name: 'Line' });
  return s;
}

describe('a closed vessel at a site 1,500 m up', () => {
  it('uses the site pressure (ISA at 1,500 m) for its gas head, not 101,325 Pa', () => {
    const s = closedFeed(1500);
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.fluid.atmosphericPressure - P_ATM_1500)).toBeLessThan(1);
    // Fixed head of the tank: level + (p_gas − p_atm)/ρg (hydrostatics in the vessel).
    const head = 3 + (150_000 - P_ATM_1500) / (RHO * G);
    const prof = profile(s.doc, r, ['T', 'B']);
    const level = prof.stations.find((st) => st.elementId === 'T' && st.at === 'level')!;
    expect(level.hgl).toBeCloseTo(head, 3);
    expect(level.egl).toBeCloseTo(head, 3);
    expect(level.elevation).toBe(3);
    // Its absolute pressure is the gas pressure (the surface of the liquid).
    expect(level.pressureAbs).toBeCloseTo(150_000, 0);
    // The pipe's inlet EGL is that head less the entrance loss 0.5 v²/2g (nozzle K of the sheet).
    const vh = r.pipes.p.velocity ** 2 / (2 * G);
    expect(r.pipes.p.totalHeadFrom!).toBeCloseTo(head - 0.5 * vh, 4);
    // 101,325 Pa in place of the site pressure would put the head 1.7 m lower.
    expect(head - (3 + (150_000 - 101_325) / (RHO * G))).toBeGreaterThan(1.7);
  });

  it('drives the same flow as a sea-level tank with its gas pressure raised by the difference', () => {
    const high = solve(closedFeed(1500).doc);
    const sea = closedFeed(0, 150_000 + (101_325 - P_ATM_1500));
    const low = solve(sea.doc);
    expect(Math.abs(high.pipes.p.flow / low.pipes.p.flow - 1)).toBeLessThan(1e-6);
  });
});

describe('below-vapour thresholds are exact', () => {
  it('a closed vessel whose gas is at the vapour pressure is not a finding; 1 Pa below is', () => {
    const at = closedFeed(0, PV);
    const atFound = solve(at.doc).findings.filter(
      (f) => f.code === 'below-vapour-pressure' && f.elements.includes('T'),
    );
    expect(atFound).toEqual([]);
    const below = solve(closedFeed(0, PV - 1).doc).findings.filter(
      (f) => f.code === 'below-vapour-pressure' && f.elements.includes('T'),
    );
    expect(below).toHaveLength(1);
    expect(below[0].message).toMatch(/gas space/);
  });

  it('a route margin of exactly zero opens no span; the smallest negative margin does', () => {
    const st = (chainage: number, m: number): Station => ({
      chainage,
      elevation: 0,
      hgl: 0,
      egl: 0,
      vapourLine: 0,
      pressureAbs: m + PV,
      pressureGauge: m,
      vapourMargin: m,
      elementId: `e${chainage}`,
      at: 'pipe',
    });
    const margin = (s: Station) => s.vapourMargin;
    expect(negativeSpans([st(0, 5), st(10, 0), st(20, 5)], margin)).toEqual([]);
    expect(negativeSpans([st(0, 5), st(10, -1e-9), st(20, 5)], margin)).toHaveLength(1);
    // With a tolerance, a margin of exactly −tolerance is still inside it.
    expect(negativeSpans([st(0, 5), st(10, -2), st(20, 5)], margin, 2)).toEqual([]);
    expect(negativeSpans([st(0, 5), st(10, -2.001), st(20, 5)], margin, 2)).toHaveLength(1);
  });
});
