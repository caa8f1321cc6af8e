/**
 * Profile stations along a route: order, stations at nodes, grade-line steps, the vapour line,
 * pressures and the energy balance along the route.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseProjectFile } from '../../src/lib/model/file';
import type { Fitting, HeadrouteDocument } from '../../src/lib/model/types';
import { profile } from '../../src/lib/solver/profile';
import { defaultRoute, RouteError } from '../../src/lib/solver/route';
import { solve } from '../../src/lib/solver/solve';
import type { Profile, SolveResult, Station } from '../../src/lib/solver/types';
import { at, Sheet } from './helpers';

/** Standard gravity, m/s² (CGPM 1901 / ISO 80000-3). */
const G = 9.80665;

/**
 * Tank A (level 3 m) → p1 5 m → pump P → p2 20 m → rack waypoint W at 12 m → p3 10 m →
 * gate valve F → p4 15 m → tank B (level 8 m, nozzle at 1 m). A liquid of constant
 * properties and a typed atmosphere so the vapour line can be checked by hand.
 */
function rackLine(): Sheet {
  const s = new Sheet();
  s.doc.settings.liquid = {
    kind: 'user',
    name: 'test liquid',
    table: [{ temperature: 293.15, density: 1000, viscosity: 1e-3, vapourPressure: 2339 }],
  };
  s.doc.settings.atmosphericPressureOverride = 101_325;
  s.vessel('A', 3, { nozzleZ: 0 });
  s.pump('P', { name: 'Feed pump' });
  s.node('waypoint', 'W', { z: 12, name: 'Rack' });
  s.fitting('F', { fittingType: 'gate-valve', name: 'Gate' });
  s.vessel('B', 8, { nozzleZ: 1 });
  s.pipe('p1', at('A', 'N1'), at('P', 'suction'), { length: 5 });
  s.pipe('p2', at('P', 'discharge'), at('W', 'in'), { length: 20 });
  s.pipe('p3', at('W', 'out'), at('F', 'in'), { length: 10 });
  s.pipe('p4', at('F', 'out'), at('B', 'N1'), { length: 15 });
  return s;
}

const ROUTE = ['A', 'P', 'W', 'F', 'B'];

function solved(doc: HeadrouteDocument, caseId?: string): SolveResult {
  const result = solve(doc, caseId);
  expect(result.converged).toBe(true);
  return result;
}

function pair(prof: Profile, id: string): [Station, Station] {
  const ins = prof.stations.filter((s) => s.elementId === id && s.at === 'node-in');
  const outs = prof.stations.filter((s) => s.elementId === id && s.at === 'node-out');
  expect(ins).toHaveLength(1);
  expect(outs).toHaveLength(1);
  return [ins[0], outs[0]];
}

describe('profile stations', () => {
  const s = rackLine();
  const result = solved(s.doc);
  const prof = profile(s.doc, result, ROUTE, { pipeSegments: 4 });

  it('runs in order of chainage from the start level to the end level', () => {
    const c = prof.stations.map((st) => st.chainage);
    for (let i = 1; i < c.length; i++) expect(c[i]).toBeGreaterThanOrEqual(c[i - 1]);
    expect(prof.stations[0]).toMatchObject({ elementId: 'A', at: 'level', chainage: 0 });
    const last = prof.stations[prof.stations.length - 1];
    expect(last).toMatchObject({ elementId: 'B', at: 'level' });
    expect(last.chainage).toBeCloseTo(50, 12); // 5 + 20 + 10 + 15 m of developed length
    expect(prof.route).toEqual(ROUTE);
  });

  it('cuts each pipe into the asked number of pieces', () => {
    for (const id of ['p1', 'p2', 'p3', 'p4']) {
      expect(prof.stations.filter((st) => st.elementId === id)).toHaveLength(5);
    }
    const p2 = prof.stations.filter((st) => st.elementId === 'p2').map((st) => st.chainage);
    expect(p2).toEqual([5, 10, 15, 20, 25]);
    const dense = profile(s.doc, result, ROUTE);
    expect(dense.stations.filter((st) => st.elementId === 'p2')).toHaveLength(11);
  });

  it('puts two stations at each pump and fitting, at one chainage, in before out', () => {
    for (const id of ['P', 'F']) {
      const [a, b] = pair(prof, id);
      expect(a.chainage).toBe(b.chainage);
      expect(prof.stations.indexOf(a) + 1).toBe(prof.stations.indexOf(b));
    }
    expect(pair(prof, 'P')[0].chainage).toBe(5);
    expect(pair(prof, 'F')[0].chainage).toBe(35);
    // A waypoint adds no station of its own: the pipe ends on either side sit there.
    expect(prof.stations.some((st) => st.elementId === 'W')).toBe(false);
  });

  it('steps the EGL up by the pump head and down by the fitting loss', () => {
    const [pin, pout] = pair(prof, 'P');
    expect(pout.egl - pin.egl).toBeCloseTo(result.pumps.P.head, 9);
    expect(pout.hgl - pin.hgl).toBeCloseTo(result.pumps.P.head, 9); // same bore both sides
    expect(result.pumps.P.head).toBeGreaterThan(1);
    const [fin, fout] = pair(prof, 'F');
    expect(fin.egl - fout.egl).toBeCloseTo(result.nodes.F.headLoss!, 9);
    expect(result.nodes.F.headLoss!).toBeGreaterThan(0);
  });

  it('draws the vapour line at z + (p_v − p_atm)/ρg, checked by hand', () => {
    // (2339 − 101325) / (1000 × 9.80665) = −98986 / 9806.65 = −10.093763 m (hand division).
    for (const st of prof.stations) expect(st.vapourLine - st.elevation).toBeCloseTo(-10.093763, 5);
    const rack = prof.stations.find((st) => st.elementId === 'p2' && st.chainage === 25)!;
    expect(rack.elevation).toBe(12);
    expect(rack.vapourLine).toBeCloseTo(1.906237, 5);
  });

  it('gives pressures from HGL − z: p_abs = p_atm + ρg(HGL − z), margin = p_abs − p_v', () => {
    for (const st of prof.stations) {
      expect(st.pressureGauge).toBeCloseTo(1000 * G * (st.hgl - st.elevation), 6);
      expect(st.pressureAbs).toBeCloseTo(101_325 + st.pressureGauge, 6);
      expect(st.vapourMargin).toBeCloseTo(st.pressureAbs - 2339, 6);
      // HGL below the vapour line exactly where p_abs < p_v (DESIGN.md definition).
      expect(st.hgl < st.vapourLine).toBe(st.vapourMargin < 0);
    }
  });

  it('matches the solve at the pipe ends and the node ports', () => {
    const p3 = prof.stations.filter((st) => st.elementId === 'p3');
    expect(p3[0].hgl).toBeCloseTo(result.pipes.p3.headFrom!, 12);
    expect(p3[p3.length - 1].egl).toBeCloseTo(result.pipes.p3.totalHeadTo!, 12);
    const [fin] = pair(prof, 'F');
    expect(fin.hgl).toBeCloseTo(result.nodes.F.ports.in.head, 12);
    expect(fin.hgl).toBeCloseTo(p3[p3.length - 1].hgl, 9);
    // Levels: liquid at rest at the surface, gauge pressure zero in an open tank.
    expect(prof.stations[0]).toMatchObject({ elevation: 3, hgl: 3, egl: 3, pressureGauge: 0 });
  });

  it('keeps the energy balance: EGL drop equals losses minus pump heads to 1e-6 m', () => {
    // Extended Bernoulli between any two stations (DESIGN.md): ΔEGL = Σ losses − Σ pump heads.
    const st = prof.stations;
    let losses = 0;
    for (const id of ['p1', 'p2', 'p3', 'p4'])
      losses += result.pipes[id].frictionLoss + result.pipes[id].endLosses;
    losses += result.nodes.F.headLoss!;
    const drop = st[0].egl - st[st.length - 1].egl;
    expect(Math.abs(drop - (losses - result.pumps.P.head))).toBeLessThan(1e-6);
    // Step by step: each piece of a pipe loses its share of the friction loss.
    for (let i = 1; i < st.length; i++) {
      const [a, b] = [st[i - 1], st[i]];
      if (a.at !== 'pipe' || b.at !== 'pipe' || a.elementId !== b.elementId) continue;
      const length = s.doc.pipes[a.elementId].length;
      const share = (result.pipes[a.elementId].frictionLoss * (b.chainage - a.chainage)) / length;
      expect(Math.abs(a.egl - b.egl - share)).toBeLessThan(1e-9);
    }
  });
});

describe('profile grade-line steps and routes', () => {
  it('steps the HGL through a reducer by the loss plus the velocity-head change', () => {
    const s = new Sheet();
    s.vessel('A', 10, { nozzleZ: 0 });
    s.fitting('R', {
      fittingType: 'reducer',
      inletDiameter: 0.1,
      outletDiameter: 0.05,
      coneAngle: 30,
    } as Partial<Fitting>);
    s.vessel('B', 0, { nozzleZ: 0 });
    s.pipe('big', at('A', 'N1'), at('R', 'in'), { length: 10, diameter: 0.1 });
    s.pipe('small', at('R', 'out'), at('B', 'N1'), { length: 10, diameter: 0.05 });
    const result = solved(s.doc);
    const prof = profile(s.doc, result, ['A', 'R', 'B']);
    const [rin, rout] = pair(prof, 'R');
    const vIn = result.pipes.big.velocity;
    const vOut = result.pipes.small.velocity;
    // HGL = EGL − v²/2g on each side (DESIGN.md), so ΔHGL = ΔEGL − (v_out² − v_in²)/2g.
    const expected = rout.egl - rin.egl - (vOut ** 2 - vIn ** 2) / (2 * G);
    expect(rout.hgl - rin.hgl).toBeCloseTo(expected, 9);
    expect(rin.hgl - rout.hgl).toBeGreaterThan(rin.egl - rout.egl);
  });

  it('uses the case: the level station stands at the case level', () => {
    const s = rackLine();
    s.doc.cases.low = { id: 'low', name: 'Low', overrides: { vessels: { A: { liquidLevel: 1 } } } };
    const result = solved(s.doc, 'low');
    const prof = profile(s.doc, result, ROUTE);
    expect(prof.stations[0]).toMatchObject({ elementId: 'A', at: 'level', elevation: 1, hgl: 1 });
    const base = profile(s.doc, solved(s.doc), ROUTE);
    expect(base.stations[0].elevation).toBe(3);
  });

  it('bridges route nodes that are not joined directly, and lists every node passed', () => {
    const s = rackLine();
    const result = solved(s.doc);
    const prof = profile(s.doc, result, ['A', 'B']);
    expect(prof.route).toEqual(ROUTE);
    expect(prof.stations).toHaveLength(profile(s.doc, result, ROUTE).stations.length);
  });

  it('runs a route against the flow with chainage still increasing and the EGL rising', () => {
    const s = rackLine();
    const result = solved(s.doc);
    const prof = profile(s.doc, result, [...ROUTE].reverse(), { pipeSegments: 2 });
    const st = prof.stations;
    expect(st[0]).toMatchObject({ elementId: 'B', at: 'level' });
    for (let i = 1; i < st.length; i++)
      expect(st[i].chainage).toBeGreaterThanOrEqual(st[i - 1].chainage);
    const p4 = st.filter((x) => x.elementId === 'p4');
    expect(p4[0].elevation).toBe(1); // starts at B's nozzle
    expect(p4[p4.length - 1].egl).toBeGreaterThan(p4[0].egl);
  });

  it('refuses a route with an unknown node or no pipe path', () => {
    const s = rackLine();
    s.vessel('lonely', 2);
    const result = solved(s.doc);
    expect(() => profile(s.doc, result, ['A', 'nowhere'])).toThrow(RouteError);
    expect(() => profile(s.doc, result, ['A', 'lonely'])).toThrow(/No pipe path/);
  });
});

describe('energy along the default route of each demo project', () => {
  const files = [
    'pump-over-rack.headroute.json',
    'siphon-over-bund.headroute.json',
    'branched-with-recirculation.headroute.json',
  ];

  /** EGL drop from station a to the next station b that the solve's losses and heads predict, m. */
  function predictedDrop(doc: HeadrouteDocument, result: SolveResult, a: Station, b: Station) {
    const g2 = 2 * G;
    const nozzleK = (vesselId: string, pipeId: string, which: 'entranceK' | 'exitK') => {
      const pipe = doc.pipes[pipeId];
      const ref = pipe.from.node === vesselId ? pipe.from : pipe.to;
      const vessel = doc.nodes[vesselId];
      if (vessel.kind !== 'vessel') throw new Error('not a vessel');
      return vessel.nozzles.find((n) => n.id === ref.port)![which];
    };
    const vh = (pipeId: string) => result.pipes[pipeId].velocity ** 2 / g2;
    if (a.at === 'pipe' && b.at === 'pipe' && a.elementId === b.elementId) {
      const length = doc.pipes[a.elementId].length;
      return (result.pipes[a.elementId].frictionLoss * (b.chainage - a.chainage)) / length;
    }
    if (a.at === 'level') return nozzleK(a.elementId, b.elementId, 'entranceK') * vh(b.elementId);
    if (b.at === 'level') return nozzleK(b.elementId, a.elementId, 'exitK') * vh(a.elementId);
    if (a.at === 'node-in' && b.at === 'node-out') {
      const pump = result.pumps[a.elementId];
      return pump ? -pump.head : result.nodes[a.elementId].headLoss!;
    }
    return 0; // a pipe end and the port it sits on, or two pipes meeting at a junction or waypoint
  }

  for (const file of files) {
    it(`${file}: every EGL step equals losses minus pump heads to 1e-6 m`, () => {
      const parsed = parseProjectFile(readFileSync(`static/examples/${file}`, 'utf8'));
      if (!parsed.ok) throw new Error(parsed.errors[0].message);
      const doc = parsed.document;
      const result = solved(doc);
      const prof = profile(doc, result, defaultRoute(doc, result)!);
      const st = prof.stations;
      expect(st[0].at).toBe('level');
      expect(st[st.length - 1].at).toBe('level');
      let total = 0;
      for (let i = 1; i < st.length; i++) {
        const drop = predictedDrop(doc, result, st[i - 1], st[i]);
        expect(
          Math.abs(st[i - 1].egl - st[i].egl - drop),
          `${st[i - 1].elementId} → ${st[i].elementId}`,
        ).toBeLessThan(1e-6);
        total += drop;
      }
      expect(Math.abs(st[0].egl - st[st.length - 1].egl - total)).toBeLessThan(1e-6);
    });
  }
});
