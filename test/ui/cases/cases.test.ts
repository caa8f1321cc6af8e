/**
 * Pure helpers behind the cases panel: one override changed without touching the others, and
 * the envelope across cases along a route (solved separately here to check it).
 */
import { describe, expect, it } from 'vitest';
import { caseEnvelope } from '../../../src/lib/ui/cases/caseEnvelope';
import { overrideCount, overrideValue, withOverride } from '../../../src/lib/ui/cases/overrides';
import type { CaseOverrides } from '../../../src/lib/model/types';
import { profile } from '../../../src/lib/solver/profile';
import { solve } from '../../../src/lib/solver/solve';
import { Sheet, at } from '../../solver/helpers';

describe('withOverride', () => {
  it('sets and clears one field, dropping emptied groups, leaving the input alone', () => {
    const start: CaseOverrides = Object.freeze({ temperature: 350 });
    const a = withOverride(start, { kind: 'vessel', id: 'T1', field: 'liquidLevel' }, 0.5);
    expect(a).toEqual({ temperature: 350, vessels: { T1: { liquidLevel: 0.5 } } });
    const b = withOverride(a, { kind: 'pump', id: 'PU', field: 'running' }, false);
    expect(overrideValue(b, { kind: 'pump', id: 'PU', field: 'running' })).toBe(false);
    expect(overrideCount(b)).toBe(3);
    const c = withOverride(b, { kind: 'vessel', id: 'T1', field: 'liquidLevel' }, undefined);
    expect(c).toEqual({ temperature: 350, pumps: { PU: { running: false } } });
    const d = withOverride(c, { kind: 'temperature' }, undefined);
    expect(d).toEqual({ pumps: { PU: { running: false } } });
    expect(start).toEqual({ temperature: 350 });
    expect(a).toEqual({ temperature: 350, vessels: { T1: { liquidLevel: 0.5 } } });
  });

  it('a boundary flow is its own group, counted and cleared like the others', () => {
    const a = withOverride({}, { kind: 'boundary', id: 'B1', field: 'outflow' }, 0.002);
    expect(a).toEqual({ boundaries: { B1: { outflow: 0.002 } } });
    expect(overrideCount(a)).toBe(1);
    expect(withOverride(a, { kind: 'boundary', id: 'B1', field: 'outflow' }, undefined)).toEqual(
      {},
    );
  });
});

describe('caseEnvelope', () => {
  const s = new Sheet();
  s.vessel('T1', 3, { name: 'Feed tank', nozzleZ: 0.3 });
  s.pump('PU', { name: 'Transfer pump' });
  s.node('waypoint', 'W1', { name: 'Rack crossing', z: 12 });
  s.vessel('T2', 6, { name: 'Day tank', nozzleZ: 8 });
  s.pipe('P1', at('T1', 'N1'), at('PU', 'suction'), { length: 6, diameter: 0.08 });
  s.pipe('P2', at('PU', 'discharge'), at('W1', 'in'), { length: 40, diameter: 0.065 });
  s.pipe('P3', at('W1', 'out'), at('T2', 'N1'), { length: 30, diameter: 0.065 });
  s.doc.cases = {
    low: { id: 'low', name: 'Low level', overrides: { vessels: { T1: { liquidLevel: 0.8 } } } },
    hot: { id: 'hot', name: 'Hot', overrides: { temperature: 273.15 + 90 } },
  };
  const route = ['T1', 'PU', 'W1', 'T2'];

  it('spans the HGL of every case and names the least NPSH margin at the pump', () => {
    const env = caseEnvelope(s.doc, route)!;
    expect(env.caseNames).toEqual(['Base case', 'Low level', 'Hot']);
    const profiles = [null, 'low', 'hot'].map((id) => profile(s.doc, solve(s.doc, id), route));
    // Every station lies inside the band at its chainage (at a step, between the band's
    // lowest and highest point on either side of it).
    for (const p of profiles) {
      for (const st of p.stations.filter((x) => x.at !== 'level')) {
        const here = env.points.filter((q) => q.chainage === st.chainage);
        expect(here.length, `grid point at ${st.chainage}`).toBeGreaterThan(0);
        expect(st.hgl).toBeGreaterThanOrEqual(Math.min(...here.map((q) => q.low)) - 1e-9);
        expect(st.hgl).toBeLessThanOrEqual(Math.max(...here.map((q) => q.high)) + 1e-9);
      }
    }
    const margins = [null, 'low', 'hot'].map((id) => solve(s.doc, id).pumps.PU.npshMargin);
    const least = Math.min(...margins);
    expect(env.pumps).toHaveLength(1);
    expect(env.pumps[0].caseName).toBe('Hot');
    expect(env.pumps[0].npshMargin).toBe(least);
  });

  it('is null without cases to compare', () => {
    const lone = structuredClone(s.doc);
    lone.cases = {};
    expect(caseEnvelope(lone, route)).toBeNull();
  });
});
