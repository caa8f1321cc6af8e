/**
 * Findings along a route, located by chainage: a siphon crest below vapour pressure (stop)
 * and the vacuum around it (caution), with span ends found independently from the pipe-end
 * results of the solve.
 */
import { describe, expect, it } from 'vitest';
import type { HeadrouteDocument } from '../../src/lib/model/types';
import { profile } from '../../src/lib/solver/profile';
import {
  lowestVapourMargin,
  negativeSpans,
  routeFindings,
} from '../../src/lib/solver/routeFindings';
import { solve } from '../../src/lib/solver/solve';
import type { SolveResult } from '../../src/lib/solver/types';
import { at, Sheet } from './helpers';

/** Standard gravity, m/s² (CGPM 1901). */
const G = 9.80665;

/**
 * A siphon: pond A (level 5 m) → 30 m rising to a crest waypoint at `crest` m → 40 m down to
 * basin B (level 0 m, outlet at −2 m). Water at 20 °C (the solver's IAPWS-IF97 properties).
 */
function siphon(crest: number): Sheet {
  const s = new Sheet();
  s.vessel('A', 5, { nozzleZ: 0 });
  s.node('waypoint', 'C', { z: crest, name: 'Crest' });
  s.vessel('B', 0, { nozzleZ: -2 });
  s.pipe('up', at('A', 'N1'), at('C', 'in'), { length: 30, diameter: 0.08, name: 'Up leg' });
  s.pipe('down', at('C', 'out'), at('B', 'N1'), { length: 40, diameter: 0.08, name: 'Down leg' });
  return s;
}

/** Where p_abs − p_v crosses zero on the rising leg, from the pipe-end results alone. */
function crossingOnUpLeg(doc: HeadrouteDocument, r: SolveResult, margin: 'vapour' | 'vacuum') {
  const rhoG = r.fluid.density * G;
  const up = r.pipes.up;
  const shift = margin === 'vapour' ? r.fluid.atmosphericPressure - r.fluid.vapourPressure : 0;
  // Margin at each end: ρg(HGL − z) + (p_atm − p_v) for vapour, ρg(HGL − z) for vacuum; linear between.
  const m0 = rhoG * (up.headFrom! - up.elevationFrom!) + shift;
  const m1 = rhoG * (up.headTo! - up.elevationTo!) + shift;
  return (doc.pipes.up.length * m0) / (m0 - m1);
}

describe('routeFindings', () => {
  it('flags a siphon crest below vapour pressure as a stop, from where the span starts', () => {
    const s = siphon(14);
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    const prof = profile(s.doc, r, ['A', 'C', 'B']);
    const found = routeFindings(s.doc, r, prof);
    const vapour = found.filter((f) => f.code === 'below-vapour-pressure');
    expect(vapour).toHaveLength(1);
    expect(vapour[0].level).toBe('stop');
    expect(vapour[0].chainage!).toBeCloseTo(crossingOnUpLeg(s.doc, r, 'vapour'), 6);
    expect(vapour[0].elements).toEqual(['up', 'down']);
    expect(vapour[0].message).toMatch(/Route “A → B”, chainage \d+\.\d–\d+\.\d m/);
    expect(vapour[0].message).toMatch(/at chainage 30\.0 m \(“Up leg”\)/);
    expect(vapour[0].message).toMatch(/not physical and only indicative/);
    // The lowest margin is at the crest (chainage 30 m), the highest point of the line.
    const lowest = lowestVapourMargin(prof)!;
    expect(lowest.chainage).toBe(30);
    expect(lowest.vapourMargin).toBeLessThan(0);

    const vacuum = found.filter((f) => f.code === 'vacuum');
    expect(vacuum).toHaveLength(1);
    expect(vacuum[0].level).toBe('caution');
    expect(vacuum[0].chainage!).toBeCloseTo(crossingOnUpLeg(s.doc, r, 'vacuum'), 6);
    expect(vacuum[0].chainage!).toBeLessThan(vapour[0].chainage!);
  });

  it('reports vacuum only when the crest stays above vapour pressure', () => {
    const s = siphon(8);
    const r = solve(s.doc);
    const prof = profile(s.doc, r, ['A', 'C', 'B']);
    const found = routeFindings(s.doc, r, prof, 'Pond to basin');
    expect(found.map((f) => f.code)).toEqual(['vacuum']);
    expect(found[0].message).toMatch(/^Route “Pond to basin”/);
    expect(lowestVapourMargin(prof)!.vapourMargin).toBeGreaterThan(0);
  });

  it('reports nothing on a line under positive pressure', () => {
    const s = new Sheet();
    s.vessel('A', 10, { nozzleZ: 0 });
    s.vessel('B', 2, { nozzleZ: 0 });
    s.pipe('p', at('A', 'N1'), at('B', 'N1'), { length: 100 });
    const r = solve(s.doc);
    expect(routeFindings(s.doc, r, profile(s.doc, r, ['A', 'B']))).toEqual([]);
  });
});

describe('negativeSpans', () => {
  const st = (chainage: number, m: number, at: 'pipe' | 'level' = 'pipe') => ({
    chainage,
    elevation: 0,
    hgl: 0,
    egl: 0,
    vapourLine: 0,
    pressureAbs: 0,
    pressureGauge: m,
    vapourMargin: m,
    elementId: `e${chainage}`,
    at,
  });

  it('interpolates span ends linearly and skips level stations', () => {
    // Margin 10 → −10 between 0 and 10 m crosses at 5 m; −20 → 30 between 20 and 30 m at 20 + 10 × 20/50 = 24 m.
    const spans = negativeSpans(
      [st(0, -50, 'level'), st(0, 10), st(10, -10), st(20, -20), st(30, 30)],
      (s) => s.vapourMargin,
    );
    expect(spans).toHaveLength(1);
    expect(spans[0].start).toBeCloseTo(5, 12);
    expect(spans[0].end).toBeCloseTo(24, 12);
    expect(spans[0].lowestMargin).toBe(-20);
    expect(spans[0].lowest.chainage).toBe(20);
    expect(spans[0].elements).toEqual(['e10', 'e20']);
  });

  it('closes a span at a gap of non-finite margins and at the last station', () => {
    const spans = negativeSpans(
      [st(0, -1), st(5, -2), st(6, NaN), st(7, 1), st(8, -1)],
      (s) => s.vapourMargin,
    );
    expect(spans.map((s) => [s.start, s.end])).toEqual([
      [0, 5],
      [7.5, 8],
    ]);
  });
});
