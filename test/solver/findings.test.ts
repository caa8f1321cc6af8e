import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import type { SolveResult } from '../../src/lib/solver/types';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const g = 9.80665;
const codes = (r: SolveResult) => r.findings.map((f) => f.code);
const withCode = (r: SolveResult, code: string) => r.findings.filter((f) => f.code === code);

describe('vapour pressure, vacuum and NPSH', () => {
  function siphon(crest: number) {
    const s = new Sheet();
    s.vessel('A', 10, { nozzleZ: 0 });
    s.vessel('B', 0, { nozzleZ: -5, z: -5 });
    s.node('waypoint', 'W', { name: 'Crest', z: crest });
    s.pipe('up', at('A', 'N1'), at('W', 'in'), { length: 20, diameter: 0.05 });
    s.pipe('down', at('W', 'out'), at('B', 'N1'), { length: 30, diameter: 0.05 });
    s.doc.settings.atmosphericPressureOverride = 101325;
    return s;
  }

  it('a siphon whose crest is far above the upper level falls below vapour pressure (stop)', () => {
    const s = siphon(20);
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    const crest = r.nodes.W.ports.in;
    // Energy from the upper tank surface to the crest (extended Bernoulli), written here.
    const p = r.pipes.up;
    const vh = (p.velocity * p.velocity) / (2 * g);
    const hglCrest = 10 - (0.5 + 1) * vh - p.frictionLoss;
    expect(crest.head).toBeCloseTo(hglCrest, 6);
    expect(crest.pressureAbs).toBeCloseTo(101325 + r.fluid.density * g * (hglCrest - 20), 3);
    const below = withCode(r, 'below-vapour-pressure');
    expect(below.map((f) => f.elements[0])).toContain('W');
    expect(below[0].level).toBe('stop');
    expect(below.find((f) => f.elements[0] === 'W')!.message).toMatch(/Crest.*indicative/s);
  });

  it('a siphon crest 2 m above the upper level is under vacuum but above vapour pressure (caution)', () => {
    const s = siphon(12);
    const r = solve(s.doc);
    expect(codes(r)).not.toContain('below-vapour-pressure');
    expect(withCode(r, 'vacuum').map((f) => f.elements[0])).toEqual(
      expect.arrayContaining(['up', 'down']),
    );
  });

  function hotSuction(temperatureK: number) {
    const s = new Sheet();
    s.vessel('T', 1, { nozzleZ: 0.2 });
    s.pump('P', { name: 'Feed pump', z: 0 });
    s.vessel('B', 10, { nozzleZ: 10 });
    s.pipe('S', at('T', 'N1'), at('P', 'suction'), { length: 8, diameter: 0.0525 });
    s.pipe('D', at('P', 'discharge'), at('B', 'N1'), { length: 30, diameter: 0.0525 });
    s.doc.settings.temperature = temperatureK;
    s.doc.settings.atmosphericPressureOverride = 101325;
    return s;
  }

  it('hot water (95 °C) at a pump suction: NPSHa < NPSHr is a stop; at 20 °C it is not', () => {
    const hot = solve(hotSuction(368.15).doc);
    expectAllFinite(hot);
    // Vapour pressure of water at 95 °C: 84.609 kPa (IAPWS-IF97 via python3-iapws 1.5.2).
    expect(hot.fluid.vapourPressure).toBeCloseTo(84609, -1);
    const pump = hot.pumps.P;
    const suction = hot.nodes.P.ports.suction;
    // NPSHa at the suction flange = (p_abs − p_v)/ρg + v²/2g.
    const npsha =
      (suction.pressureAbs - hot.fluid.vapourPressure) / (hot.fluid.density * g) +
      suction.velocity ** 2 / (2 * g);
    expect(pump.npshAvailable).toBeCloseTo(npsha, 9);
    expect(pump.npshAvailable).toBeLessThan(pump.npshRequired);
    const stop = withCode(hot, 'npsh-below-required');
    expect(stop).toHaveLength(1);
    expect(stop[0].message).toContain('Feed pump');
    expect(stop[0].level).toBe('stop');

    const cold = solve(hotSuction(293.15).doc);
    expect(codes(cold)).not.toContain('npsh-below-required');
    expect(cold.pumps.P.npshAvailable).toBeGreaterThan(hot.pumps.P.npshAvailable + 8);
  });

  it('NPSH margin inside the rule is a caution', () => {
    const s = hotSuction(293.15);
    s.doc.settings.npshMargin = { ratio: 1.1, metres: 50 };
    const r = solve(s.doc);
    expect(withCode(r, 'npsh-margin-low')).toHaveLength(1);
    expect(withCode(r, 'npsh-margin-low')[0].level).toBe('caution');
  });
});

describe('sheet problems', () => {
  it('no fixed head: a stop, converged false, no throw', () => {
    const s = new Sheet();
    s.node('junction', 'J1');
    s.node('junction', 'J2');
    s.pipe('P', at('J1', 'hub'), at('J2', 'hub'));
    const r = solve(s.doc);
    expectAllFinite(r);
    expect(r.converged).toBe(false);
    expect(codes(r)).toContain('no-fixed-head');
  });

  it('a part cut off from every vessel and boundary is named', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.vessel('B', 5);
    s.pipe('P1', at('A', 'N1'), at('B', 'N1'));
    s.node('junction', 'J', { name: 'Lost junction' });
    s.node('waypoint', 'W');
    s.pipe('P2', at('J', 'hub'), at('W', 'in'));
    const r = solve(s.doc);
    expectAllFinite(r);
    expect(r.converged).toBe(true);
    const cut = withCode(r, 'cut-off');
    expect(cut).toHaveLength(1);
    expect(cut[0].elements.sort()).toEqual(['J', 'P2', 'W']);
    expect(cut[0].message).toContain('Lost junction');
    expect(r.pipes.P1.flow).toBeGreaterThan(0);
  });

  it('an unconnected port on a two-port node is a caution naming it', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.fitting('F', { name: 'Elbow 3' });
    s.pipe('P1', at('A', 'N1'), at('F', 'in'));
    const r = solve(s.doc);
    const f = withCode(r, 'unconnected-port');
    expect(f).toHaveLength(1);
    expect(f[0].elements).toEqual(['F']);
    expect(f[0].message).toContain('Elbow 3');
    expect(Math.abs(r.pipes.P1.flow)).toBeLessThan(1e-9);
    expect(r.pipes.P1.regime).toBe('no-flow');
  });

  it('a pipe to a missing port or an unknown catalogue size is reported, not thrown', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.vessel('B', 5);
    s.pipe('P1', at('A', 'N1'), at('B', 'nope'));
    const p2 = s.pipe('P2', at('A', 'N1'), at('B', 'N1'));
    p2.bore = { mode: 'catalogue', nominalSize: '7-1/8', schedule: '40' };
    const r = solve(s.doc);
    expectAllFinite(r);
    expect(codes(r)).toEqual(expect.arrayContaining(['broken-connection', 'invalid-input']));
  });

  it('pressure above a pipe design pressure is a stop', () => {
    const s = new Sheet();
    s.vessel('A', 2);
    s.pump('P');
    s.vessel('B', 10, { nozzleZ: 10 });
    s.pipe('S', at('A', 'N1'), at('P', 'suction'), { diameter: 0.0525 });
    s.pipe('D', at('P', 'discharge'), at('B', 'N1'), {
      diameter: 0.0525,
      designPressureGauge: 1e5,
    });
    const r = solve(s.doc);
    const f = withCode(r, 'above-design-pressure');
    expect(f.map((x) => x.elements[0])).toEqual(['D']);
  });

  it('reversed flow against the drawn direction is a note; laminar flow of a viscous liquid is a note', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.vessel('B', 5);
    s.pipe('P1', at('B', 'N1'), at('A', 'N1'), { diameter: 0.05 });
    // A user liquid: one row, constant properties (invented test values).
    s.doc.settings.liquid = {
      kind: 'user',
      name: 'Heavy oil',
      table: [{ temperature: 293.15, density: 900, viscosity: 0.5, vapourPressure: 100 }],
    };
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    expect(r.pipes.P1.flow).toBeLessThan(0);
    expect(codes(r)).toEqual(expect.arrayContaining(['reversed-flow', 'laminar-flow']));
    // Hagen–Poiseuille plus end losses, solved here for v (quadratic): 5 = 32μLv/(ρgD²) + 1.5 v²/2g.
    const a = 1.5 / (2 * g);
    const b = (32 * 0.5 * 10) / (900 * g * 0.05 * 0.05);
    const v = (-b + Math.sqrt(b * b + 4 * a * 5)) / (2 * a);
    expect(Math.abs(r.pipes.P1.velocity)).toBeCloseTo(v, 8);
  });

  it('a shut manual valve stops the flow', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.vessel('B', 5);
    s.fitting('V', { fittingType: 'gate-valve', closed: true });
    s.pipe('P1', at('A', 'N1'), at('V', 'in'));
    s.pipe('P2', at('V', 'out'), at('B', 'N1'));
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.pipes.P1.flow)).toBeLessThan(1e-9);
    expect(r.pipes.P1.regime).toBe('no-flow');
    expect(r.nodes.V.ports.in.totalHead).toBeCloseTo(10, 6);
  });
});

describe('control valve (IEC 60534-2-1)', () => {
  function valveLine(opening: number, gasPressureAbs: number, temperature: number) {
    const s = new Sheet();
    s.vessel('A', 5, { open: false, gasPressureAbs });
    s.node('control-valve', 'CV', {
      name: 'LV-101',
      ratedCoefficient: 10,
      characteristic: 'linear',
      opening,
    });
    s.vessel('B', 2);
    s.pipe('P1', at('A', 'N1'), at('CV', 'in'), { diameter: 0.0525, length: 5 });
    s.pipe('P2', at('CV', 'out'), at('B', 'N1'), { diameter: 0.0525, length: 5 });
    s.doc.settings.temperature = temperature;
    return s;
  }

  it('flow and pressure drop satisfy Q = Kv·√(Δp/1 bar ÷ ρ/ρ0) (IEC 60534-2-1 eq. 1) at the valve opening', () => {
    const s = valveLine(0.5, 3e5, 293.15);
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    const cv = r.controlValves.CV;
    expect(cv.kv).toBeCloseTo(5, 12); // linear characteristic: Kv = 10 × 0.5
    // ρ0 = 999.1 kg/m³, the reference water density of physics/controlValve.ts.
    const q = (5 * Math.sqrt(cv.pressureDrop / 1e5 / (r.fluid.density / 999.1))) / 3600;
    expect(cv.flow).toBeCloseTo(q, 10);
    expect(cv.choked).toBe(false);
  });

  it('hot water across a large drop chokes (stop)', () => {
    const s = valveLine(0.2, 12e5, 368.15);
    const r = solve(s.doc);
    const cv = r.controlValves.CV;
    expect(cv.pressureDrop).toBeGreaterThan(cv.chokedPressureDrop);
    expect(cv.choked).toBe(true);
    expect(withCode(r, 'control-valve-choked')[0].message).toContain('LV-101');
  });
});

describe('liquid properties', () => {
  it('a temperature outside a user table is a caution naming the liquid', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.vessel('B', 5);
    s.pipe('P1', at('A', 'N1'), at('B', 'N1'));
    // Invented test table covering 10–40 °C; the project runs at 70 °C.
    s.doc.settings.liquid = {
      kind: 'user',
      name: 'Brine 20 %',
      table: [
        { temperature: 283.15, density: 1160, viscosity: 2.2e-3, vapourPressure: 1000 },
        { temperature: 313.15, density: 1150, viscosity: 1.3e-3, vapourPressure: 6000 },
      ],
    };
    s.doc.settings.temperature = 343.15;
    const r = solve(s.doc);
    expectAllFinite(r);
    const f = withCode(r, 'property-extrapolated');
    expect(f).toHaveLength(1);
    expect(f[0].level).toBe('caution');
    expect(f[0].message).toContain('Brine 20 %');
  });
});
