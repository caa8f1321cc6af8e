/**
 * Case comparison: overrides laid over the base document without changing it, and every row of
 * the comparison equal to a separate solve of its case.
 */
import { describe, expect, it } from 'vitest';
import { applyCase } from '../../src/lib/solver/applyCase';
import {
  compareCases,
  minVapourMargin,
  worstFinding,
  worstIndex,
} from '../../src/lib/solver/compareCases';
import { profile } from '../../src/lib/solver/profile';
import { defaultRoute } from '../../src/lib/solver/route';
import { solve } from '../../src/lib/solver/solve';
import type { HeadrouteDocument } from '../../src/lib/model/types';
import type { Finding } from '../../src/lib/solver/types';
import { Sheet, at } from './helpers';

const CELSIUS = 273.15;

/** Feed tank → pump → rack high point → day tank, with a hot, a low-level and a pump-off case. */
function pumpedLine(): HeadrouteDocument {
  const s = new Sheet();
  s.doc.name = 'Rack transfer <b>north</b>';
  s.vessel('T1', 3, { name: 'Feed tank', nozzleZ: 0.3 });
  s.pump('PU', { name: 'Transfer pump', z: 0 });
  s.node('waypoint', 'W1', { name: 'Rack crossing', z: 12 });
  s.vessel('T2', 6, { name: 'Day tank', nozzleZ: 8 });
  s.pipe('P1', at('T1', 'N1'), at('PU', 'suction'), { length: 6, diameter: 0.08 });
  s.pipe('P2', at('PU', 'discharge'), at('W1', 'in'), { length: 40, diameter: 0.065 });
  s.pipe('P3', at('W1', 'out'), at('T2', 'N1'), { length: 30, diameter: 0.065 });
  s.doc.cases = {
    hot: { id: 'hot', name: 'Hot liquid', overrides: { temperature: CELSIUS + 90 } },
    low: {
      id: 'low',
      name: 'Low feed level',
      overrides: { vessels: { T1: { liquidLevel: 0.8 } } },
    },
    off: { id: 'off', name: 'Pump stopped', overrides: { pumps: { PU: { running: false } } } },
  };
  return s.doc;
}

/** Freezes an object and everything inside it. */
function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}

describe('case overrides leave the base document alone', () => {
  it('applyCase returns the overrides on a copy; the base deep-equals its copy from before', () => {
    const doc = pumpedLine();
    const before = structuredClone(doc);
    const low = applyCase(doc, 'low');
    expect(low.nodes.T1.kind === 'vessel' && low.nodes.T1.liquidLevel).toBe(0.8);
    const hot = applyCase(doc, 'hot');
    expect(hot.settings.temperature).toBe(CELSIUS + 90);
    const off = applyCase(doc, 'off');
    expect(off.nodes.PU.kind === 'pump' && off.nodes.PU.running).toBe(false);
    expect(doc).toEqual(before);
    expect(doc.nodes.T1.kind === 'vessel' && doc.nodes.T1.liquidLevel).toBe(3);
  });

  it('compareCases works on a deeply frozen document and does not change it', () => {
    const doc = pumpedLine();
    const before = structuredClone(doc);
    deepFreeze(doc);
    const comparison = compareCases(doc);
    expect(comparison.cases.map((c) => c.name)).toEqual([
      'Base case',
      'Hot liquid',
      'Low feed level',
      'Pump stopped',
    ]);
    expect(doc).toEqual(before);
  });
});

describe('comparison rows equal separate solves', () => {
  const doc = pumpedLine();
  const comparison = compareCases(doc);
  const ids = [null, 'hot', 'low', 'off'] as const;
  const separate = ids.map((id) => solve(doc, id));
  const row = (key: string) => {
    const r = comparison.rows.find((x) => x.key === key);
    if (!r) throw new Error(`no row ${key}`);
    return r;
  };

  it('lists the pump rows, the vapour-margin row and the findings row', () => {
    expect(comparison.rows.map((r) => r.key)).toEqual([
      'pump:PU:flow',
      'pump:PU:head',
      'pump:PU:power',
      'pump:PU:npshAvailable',
      'pump:PU:npshRequired',
      'pump:PU:npshMargin',
      'vapour-margin',
      'worst-finding',
    ]);
    expect(row('pump:PU:npshAvailable').label).toBe('Transfer pump — NPSHa');
  });

  it('pump figures of running cases equal each separate solve exactly', () => {
    const fields = [
      ['flow', 'flow'],
      ['head', 'head'],
      ['power', 'shaftPower'],
      ['npshAvailable', 'npshAvailable'],
      ['npshRequired', 'npshRequired'],
      ['npshMargin', 'npshMargin'],
    ] as const;
    for (const [key, field] of fields) {
      const values = row(`pump:PU:${key}`).values;
      for (let i = 0; i < 3; i++) {
        expect(values[i], `${key} case ${ids[i]}`).toBe(separate[i].pumps.PU[field]);
      }
      // The stopped pump has no figures and a note saying so.
      expect(values[3]).toBeNull();
      expect(row(`pump:PU:${key}`).notes[3]).toBe('off');
    }
    expect(separate[0].pumps.PU.flow).toBeGreaterThan(0);
  });

  it('the least vapour margin equals the minimum over each case profile along the default route', () => {
    const route = defaultRoute(doc, separate[0]);
    expect(route).not.toBeNull();
    expect(comparison.route).toEqual(route);
    const values = row('vapour-margin').values;
    separate.forEach((result, i) => {
      const stations = profile(doc, result, route!).stations.filter((s) => s.at !== 'level');
      const least = stations.reduce((m, s) => (s.vapourMargin < m.vapourMargin ? s : m));
      expect(values[i]).toBe(least.vapourMargin);
      const where = comparison.cases[i].minVapourMargin!;
      expect(where.elementId).toBe(least.elementId);
      expect(where.chainage).toBe(least.chainage);
      // Margin as head: p / (ρ g), g = 9.80665 m/s² (standard gravity, CGPM 1901).
      expect(where.marginHead).toBeCloseTo(
        least.vapourMargin / (result.fluid.density * 9.80665),
        12,
      );
    });
  });

  it('the worst finding of each case is its most severe finding', () => {
    const values = row('worst-finding').values as Array<Finding | null>;
    separate.forEach((result, i) => {
      const expected = worstFinding(result.findings);
      expect(values[i]).toEqual(expected);
      if (expected)
        expect(result.findings.some((f) => f.level === 'stop')).toBe(expected.level === 'stop');
    });
  });

  it('marks the hot case worst for NPSHa and margin, the low level next, and the base best', () => {
    // Hot water at 90 °C has a vapour pressure near 70 kPa against about 2.3 kPa at 20 °C
    // (IAPWS-IF97 region 4; 70.18 and 2.339 kPa from iapws 1.5.2), so NPSHa falls by several metres.
    const npsha = row('pump:PU:npshAvailable');
    expect(npsha.worst).toBe(1);
    const v = npsha.values as number[];
    expect(v[1]).toBeLessThan(v[2]);
    expect(v[2]).toBeLessThan(v[0]);
    expect(v[0] - v[1]).toBeGreaterThan(6);
    expect(row('pump:PU:npshMargin').worst).toBe(1);
    expect(row('vapour-margin').worst).toBe(1);
    // Less static suction head gives a little less flow: the low level delivers least.
    expect(row('pump:PU:flow').worst).toBe(2);
  });
});

describe('worstIndex and worstFinding', () => {
  it('finds the extreme in the given direction and skips missing values', () => {
    expect(worstIndex([3, 1, null, 2], 'lower')).toBe(1);
    expect(worstIndex([3, 1, null, 5], 'higher')).toBe(3);
    expect(worstIndex([null, 4, Number.NaN], 'lower')).toBeNull();
  });

  it('marks nothing when every value is the same', () => {
    expect(worstIndex([2, 2, 2], 'lower')).toBeNull();
    expect(worstIndex([1, 1 + 1e-12], 'lower')).toBeNull();
  });

  it('orders findings stop > caution > note, first of a level wins', () => {
    const f = (code: string, level: Finding['level']): Finding => ({
      code,
      level,
      message: code,
      elements: [],
    });
    expect(worstFinding([])).toBeNull();
    expect(worstFinding([f('a', 'note'), f('b', 'caution'), f('c', 'caution')])?.code).toBe('b');
    expect(worstFinding([f('a', 'note'), f('b', 'stop'), f('c', 'caution')])?.code).toBe('b');
  });
});

describe('without pumps', () => {
  it('compares the flow in the first pipe of the route, and falls back to ports without a route', () => {
    const s = new Sheet();
    s.vessel('A', 10, { name: 'Upper tank', nozzleZ: 0.5 });
    s.vessel('B', 2, { name: 'Lower tank', nozzleZ: 0.5 });
    s.pipe('L1', at('A', 'N1'), at('B', 'N1'), {
      length: 100,
      diameter: 0.05,
      name: 'Gravity line',
    });
    s.doc.cases = {
      drawn: { id: 'drawn', name: 'Drawn down', overrides: { vessels: { A: { liquidLevel: 4 } } } },
    };
    const c = compareCases(s.doc);
    const flow = c.rows.find((r) => r.key === 'pipe:L1:flow')!;
    expect(flow.label).toBe('Gravity line — flow');
    expect(flow.values[0]).toBe(Math.abs(solve(s.doc).pipes.L1.flow));
    expect(flow.values[1]).toBe(Math.abs(solve(s.doc, 'drawn').pipes.L1.flow));
    expect(flow.worst).toBe(1);

    // Without a profile, the least margin is taken over every solved port.
    const result = solve(s.doc);
    const m = minVapourMargin(s.doc, result, null)!;
    const ports = Object.values(result.nodes).flatMap((n) => Object.values(n.ports));
    const least = Math.min(...ports.map((p) => p.pressureAbs - result.fluid.vapourPressure));
    expect(m.marginPa).toBe(least);
    expect(m.chainage).toBeUndefined();
  });
});
