/**
 * Vessel nozzles above the liquid level: a pipe discharging into the gas space ends at the gas
 * pressure at the nozzle's own elevation, and liquid drawn out through such a nozzle is a stop
 * finding. Sheets whose nozzles are all submerged keep one fixed head per vessel.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseProjectFile } from '../../src/lib/model/file';
import type { HeadrouteDocument, Nozzle, Vessel } from '../../src/lib/model/types';
import { solveFluid } from '../../src/lib/solver/fluid';
import { buildGraph } from '../../src/lib/solver/network/build';
import { profile } from '../../src/lib/solver/profile';
import { routeFindings } from '../../src/lib/solver/routeFindings';
import { solve } from '../../src/lib/solver/solve';
import type { SolveResult, Station } from '../../src/lib/solver/types';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

/** Standard gravity, m/s² (CGPM 1901 / ISO 80000-3). */
const G = 9.80665;
const RHO = 1000;
const P_ATM = 101_325;
/** Absolute roughness the test pipes use (helpers.ts default), m. */
const ROUGHNESS = 4.5e-5;

const withCode = (r: SolveResult, code: string) => r.findings.filter((f) => f.code === code);

/** A liquid of constant properties and a typed atmosphere, so the figures can be had by hand. */
function constantLiquid(s: Sheet): void {
  s.doc.settings.liquid = {
    kind: 'user',
    name: 'test liquid',
    table: [{ temperature: 293.15, density: RHO, viscosity: 1e-3, vapourPressure: 2339 }],
  };
  s.doc.settings.atmosphericPressureOverride = P_ATM;
}

function nozzle(id: string, z: number, entranceK = 0.5, exitK = 1): Nozzle {
  return { id, z, entranceK, exitK };
}

function vesselWith(s: Sheet, id: string, level: number, nozzles: Nozzle[], props = {}): Vessel {
  return s.node<Vessel>('vessel', id, {
    z: Math.min(0, ...nozzles.map((n) => n.z)),
    liquidLevel: level,
    height: 20,
    nozzles,
    ...props,
  });
}

/**
 * Darcy friction factor by the Colebrook–White equation (Colebrook 1939),
 * 1/√f = −2 log10(ε/(3.7 D) + 2.51/(Re √f)), solved here by fixed-point iteration, independent
 * of the solver's own friction code.
 */
function colebrook(re: number, relativeRoughness: number): number {
  let x = 8; // 1/√f
  for (let i = 0; i < 200; i++) x = -2 * Math.log10(relativeRoughness / 3.7 + (2.51 * x) / re);
  return 1 / (x * x);
}

/**
 * Flow of a single line of bore `d` and length `length` driven by a head difference `dh`, with
 * end losses `k` velocity heads (extended Bernoulli: dh = (k + f L/D) v²/2g), by bisection.
 */
function lineFlow(dh: number, length: number, d: number, k: number): number {
  const area = (Math.PI * d * d) / 4;
  const loss = (v: number) => {
    const f = colebrook((RHO * v * d) / 1e-3, ROUGHNESS / d);
    return (k + (f * length) / d) * ((v * v) / (2 * G));
  };
  let lo = 1e-6;
  let hi = 50;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (loss(mid) > dh) hi = mid;
    else lo = mid;
  }
  return ((lo + hi) / 2) * area;
}

/**
 * Head tank S (open, level 20 m, bottom outlet at 0 m) → p1 30 m → rack waypoint W at 11.5 m →
 * p2 20 m → vented receiver R (bottom 8 m, liquid at 10 m) through its top inlet N2 at 11.5 m;
 * its bottom nozzle N1 at 9 m is capped. Both pipes 50 mm bore.
 */
function ventedReceiver(options: { exitK?: number; receiver?: Partial<Vessel> } = {}): Sheet {
  const s = new Sheet();
  constantLiquid(s);
  vesselWith(s, 'S', 20, [nozzle('N1', 0)], { name: 'Head tank' });
  s.node('waypoint', 'W', { z: 11.5, name: 'Rack' });
  vesselWith(s, 'R', 10, [nozzle('N1', 9), nozzle('N2', 11.5, 0.5, options.exitK ?? 1)], {
    z: 8,
    name: 'Receiver',
    ...options.receiver,
  });
  s.pipe('p1', at('S', 'N1'), at('W', 'in'), { length: 30, diameter: 0.05, name: 'Feed' });
  s.pipe('p2', at('W', 'out'), at('R', 'N2'), { length: 20, diameter: 0.05, name: 'Inlet' });
  return s;
}

describe('a vented receiver filled through a top inlet above its liquid', () => {
  it('the pipe ends at atmospheric pressure at the nozzle, with no vacuum finding', () => {
    const s = ventedReceiver();
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    // Free discharge: the jet leaves the pipe at the pressure around it (the gas space, here the
    // atmosphere), so HGL = nozzle elevation at the pipe end (extended Bernoulli with exit K = 1).
    expect(r.pipes.p2.headTo!).toBeCloseTo(11.5, 9);
    expect(Math.abs(r.nodes.R.ports.N2.pressureGauge)).toBeLessThan(1e-6);
    expect(r.nodes.R.ports.N2.pressureAbs).toBeCloseTo(P_ATM, 6);
    expect(withCode(r, 'vacuum')).toEqual([]);
    // The capped bottom nozzle sits 1 m under the surface: hydrostatics, ρ g (10 − 9).
    expect(r.nodes.R.ports.N1.pressureGauge).toBeCloseTo(RHO * G * 1, 6);
  });

  it('the flow is the one the nozzle elevation drives, not the liquid level (hand Bernoulli + Colebrook–White 1939)', () => {
    const r = solve(ventedReceiver().doc);
    // 20 m − 11.5 m = (0.5 entrance + f L/D + 1 exit) v²/2g over 50 m of 50 mm pipe.
    const expected = lineFlow(20 - 11.5, 50, 0.05, 0.5 + 1);
    expect(Math.abs(r.pipes.p1.flow / expected - 1)).toBeLessThan(1e-6);
    // The old single-level head (10 m) would give a clearly larger flow: the check discriminates.
    expect(lineFlow(20 - 10, 50, 0.05, 1.5) / expected).toBeGreaterThan(1.05);
  });

  it('an exit K below 1 counts as 1 at a free discharge; one above 1 is kept', () => {
    const plain = solve(ventedReceiver().doc);
    const low = solve(ventedReceiver({ exitK: 0.5 }).doc);
    expect(low.pipes.p2.flow).toBe(plain.pipes.p2.flow);
    expect(low.pipes.p2.headTo!).toBeCloseTo(11.5, 9);
    const high = solve(ventedReceiver({ exitK: 1.5 }).doc);
    const vh = high.pipes.p2.velocity ** 2 / (2 * G);
    // Pipe end above the gas pressure by the extra 0.5 velocity heads lost in the nozzle.
    expect(high.pipes.p2.headTo!).toBeCloseTo(11.5 + 0.5 * vh, 9);
    expect(high.pipes.p2.flow).toBeLessThan(plain.pipes.p2.flow);
  });

  it('a closed receiver: the pipe end is at the gas pressure, not the liquid head', () => {
    const s = ventedReceiver({ receiver: { open: false, gasPressureAbs: P_ATM + 50_000 } });
    s.doc.nodes.S = { ...(s.doc.nodes.S as Vessel), liquidLevel: 25 };
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    expect(r.nodes.R.ports.N2.pressureAbs).toBeCloseTo(P_ATM + 50_000, 5);
    // (p_gas − p_atm)/ρg above the nozzle (DESIGN.md: HGL = z + p_gauge/ρg).
    expect(r.pipes.p2.headTo!).toBeCloseTo(11.5 + 50_000 / (RHO * G), 9);
    const expected = lineFlow(25 - 11.5 - 50_000 / (RHO * G), 50, 0.05, 1.5);
    expect(Math.abs(r.pipes.p1.flow / expected - 1)).toBeLessThan(1e-6);
  });

  it('the profile: the pipe ends at the nozzle with gauge 0, the surface station stays at the level', () => {
    const s = ventedReceiver();
    const r = solve(s.doc);
    const prof = profile(s.doc, r, ['S', 'W', 'R']);
    const st = prof.stations;
    const last = st[st.length - 1];
    const end = st[st.length - 2];
    expect(last).toMatchObject({ elementId: 'R', at: 'level', elevation: 10, hgl: 10, egl: 10 });
    expect(end).toMatchObject({ elementId: 'p2', at: 'pipe', elevation: 11.5 });
    expect(Math.abs(end.pressureGauge)).toBeLessThan(1e-6);
    expect(end.hgl).toBeCloseTo(11.5, 9);
    expect(routeFindings(s.doc, r, prof).filter((f) => f.code === 'vacuum')).toEqual([]);
    // Every station of the line is at or above atmospheric pressure (the rack falls to 0 at W).
    for (const x of st) expect(x.pressureGauge).toBeGreaterThan(-1e-6);
  });
});

describe('liquid drawn out through a nozzle above the level', () => {
  /** Tank T-1 (liquid at 10 m; N1 at 0.5 m capped, N2 at 11.5 m) → "Overflow line" → basin B. */
  function highOutlet(level = 10): Sheet {
    const s = new Sheet();
    constantLiquid(s);
    vesselWith(s, 'T', level, [nozzle('N1', 0.5), nozzle('N2', 11.5)], { name: 'Tank T-1' });
    vesselWith(s, 'B', 0, [nozzle('N1', -1)], { z: -2, name: 'Basin' });
    s.pipe('p', at('T', 'N2'), at('B', 'N1'), {
      length: 40,
      diameter: 0.05,
      name: 'Overflow line',
    });
    return s;
  }

  it('is a stop finding naming the vessel, the nozzle and the pipe; the numbers stay finite', () => {
    const s = highOutlet();
    const r = solve(s.doc);
    expectAllFinite(r);
    expect(r.converged).toBe(true);
    expectConservation(s.doc, r);
    const found = withCode(r, 'nozzle-above-level');
    expect(found).toHaveLength(1);
    expect(found[0].level).toBe('stop');
    expect(found[0].elements).toEqual(['T', 'p']);
    expect(found[0].message).toContain('Nozzle N2 of “Tank T-1” is above the liquid level');
    expect(found[0].message).toContain('nozzle at 11.50 m, liquid at 10.00 m');
    expect(found[0].message).toContain('pipe “Overflow line” would draw gas, not liquid');
    // The solve used the nozzle's own head (11.5 m) as the line's start (hand Bernoulli +
    // Colebrook–White 1939): the same fixed head whichever way the liquid goes.
    const expected = lineFlow(11.5 - 0, 40, 0.05, 0.5 + 1);
    expect(Math.abs(r.pipes.p.flow / expected - 1)).toBeLessThan(1e-6);
  });

  it('no finding once the level covers the nozzle; the nozzle then shares the level head', () => {
    const s = highOutlet(12);
    const r = solve(s.doc);
    expect(withCode(r, 'nozzle-above-level')).toEqual([]);
    const graph = buildGraph(s.doc, solveFluid(s.doc.settings));
    const t = graph.sheetNodes.findIndex((n) => n.id === 'T');
    const slots = graph.portStart[t];
    expect(graph.portNode[slots + 1]).toBe(graph.portNode[slots]);
    expect(graph.fixedHead[graph.portNode[slots]]).toBe(12);
  });

  it('a pipe drawn from the basin into the tank is not flagged (liquid enters, it does not leave)', () => {
    const s = highOutlet();
    s.doc.pipes.p = { ...s.doc.pipes.p, from: at('B', 'N1'), to: at('T', 'N2') };
    (s.doc.nodes.B as Vessel).liquidLevel = 30;
    const r = solve(s.doc);
    expect(r.pipes.p.flow).toBeGreaterThan(0);
    expect(withCode(r, 'nozzle-above-level')).toEqual([]);
  });

  it('no flip-flop: the head is continuous as the level passes the nozzle and the solve settles', () => {
    // Levels from 11.4 m to 11.6 m across the nozzle at 11.5 m (centreline).
    let previous = -Infinity;
    for (let i = 0; i <= 20; i++) {
      const level = 11.4 + i * 0.01;
      const r = solve(highOutlet(level).doc);
      expect(r.converged).toBe(true);
      expect(r.iterations).toBeLessThan(15);
      // The start head is max(level, 11.5): the flow never falls as the level rises.
      expect(r.pipes.p.flow).toBeGreaterThanOrEqual(previous);
      previous = r.pipes.p.flow;
      expect(withCode(r, 'nozzle-above-level')).toHaveLength(level < 11.5 - 1e-12 ? 1 : 0);
    }
    const below = solve(highOutlet(11.5 - 1e-9).doc).pipes.p.flow;
    const above = solve(highOutlet(11.5 + 1e-9).doc).pipes.p.flow;
    expect(Math.abs(above / below - 1)).toBeLessThan(1e-8);
  });
});

describe('conservation with nozzles above the level', () => {
  /**
   * Tank A (level 3 m) → pump P → junction J at 12 m, then two receivers: R1 through a top
   * inlet at 9 m above its 5 m liquid, R2 through a submerged nozzle at 1 m under its 8 m liquid.
   */
  function pumpedBranches(): Sheet {
    const s = new Sheet();
    constantLiquid(s);
    vesselWith(s, 'A', 3, [nozzle('N1', 0)], { name: 'Feed tank' });
    s.pump('P', { name: 'Feed pump' });
    s.node('junction', 'J', { z: 12, name: 'Header' });
    vesselWith(s, 'R1', 5, [nozzle('N1', 9)], { name: 'Top-filled receiver' });
    vesselWith(s, 'R2', 8, [nozzle('N1', 1)], { name: 'Bottom-filled receiver' });
    s.pipe('suction', at('A', 'N1'), at('P', 'suction'), { length: 5, diameter: 0.1 });
    s.pipe('header', at('P', 'discharge'), at('J', 'hub'), { length: 30, diameter: 0.08 });
    s.pipe('b1', at('J', 'hub'), at('R1', 'N1'), { length: 25, diameter: 0.05 });
    s.pipe('b2', at('J', 'hub'), at('R2', 'N1'), { length: 25, diameter: 0.05 });
    return s;
  }

  it('mass at every node and EGL = losses along every pipe (helpers expectConservation)', () => {
    const s = pumpedBranches();
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    expect(r.pipes.b1.flow).toBeGreaterThan(0);
    expect(r.pipes.b1.flow + r.pipes.b2.flow).toBeCloseTo(r.pipes.header.flow, 12);
    expect(r.pipes.b1.headTo!).toBeCloseTo(9, 9); // open top inlet: gauge 0 at the nozzle
    expect(withCode(r, 'nozzle-above-level')).toEqual([]);
  });

  it('along the route, each EGL step is the losses less the pump head, plus the fall to the surface', () => {
    const s = pumpedBranches();
    const r = solve(s.doc);
    const prof = profile(s.doc, r, ['A', 'P', 'J', 'R1']);
    const st = prof.stations;
    const vh = (pipe: string) => r.pipes[pipe].velocity ** 2 / (2 * G);
    // EGL drop from station a to the next station b that the solve's losses and heads predict.
    const predicted = (a: Station, b: Station): number => {
      if (a.at === 'pipe' && b.at === 'pipe' && a.elementId === b.elementId)
        return (
          (r.pipes[a.elementId].frictionLoss * (b.chainage - a.chainage)) /
          s.doc.pipes[a.elementId].length
        );
      if (a.at === 'level') return 0.5 * vh(b.elementId); // entrance K 0.5 into 'suction'
      // Arriving at R1: exit loss (K 1, a whole velocity head) at the nozzle, then the free
      // fall from the nozzle (9 m) to the surface (5 m), energy the pipe losses do not count.
      if (b.at === 'level') return 1 * vh(a.elementId) + (9 - 5);
      if (a.at === 'node-in' && b.at === 'node-out') return -r.pumps[a.elementId].head;
      return 0;
    };
    let total = 0;
    for (let i = 0; i + 1 < st.length; i++) {
      const drop = st[i].egl - st[i + 1].egl;
      expect(Math.abs(drop - predicted(st[i], st[i + 1])), `step ${i}`).toBeLessThan(1e-6);
      total += drop;
    }
    expect(total).toBeCloseTo(3 - 5, 9); // surface of A to surface of R1
  });
});

describe('the demo projects', () => {
  const load = (file: string): HeadrouteDocument => {
    const parsed = parseProjectFile(readFileSync(`static/examples/${file}`, 'utf8'));
    if (!parsed.ok) throw new Error(parsed.errors[0].message);
    return parsed.document;
  };

  it('vessels with every nozzle submerged keep one fixed head; V-303’s top inlet gets its own', () => {
    for (const file of [
      'pump-over-rack.headroute.json',
      'siphon-over-bund.headroute.json',
      'branched-with-recirculation.headroute.json',
    ]) {
      const doc = load(file);
      const fluid = solveFluid(doc.settings);
      const graph = buildGraph(doc, fluid);
      graph.sheetNodes.forEach((node, i) => {
        if (node.kind !== 'vessel') return;
        const gas = node.open
          ? 0
          : (node.gasPressureAbs - fluid.atmosphericPressure) / (fluid.density * G);
        const levelNode = graph.portNode[graph.portStart[i]];
        node.nozzles.forEach((n, local) => {
          const own = graph.portNode[graph.portStart[i] + local];
          const where = `${file}, ${node.name} ${n.id}`;
          // Only V-303's N1 (5.5 m, liquid at 4 m) is above its level in the base documents.
          expect(n.z > node.liquidLevel, where).toBe(node.name === 'Pressurised receiver V-303');
          if (n.z > node.liquidLevel) expect(graph.fixedHead[own], where).toBeCloseTo(n.z + gas, 9);
          else {
            expect(graph.fixedHead[own], where).toBeCloseTo(node.liquidLevel + gas, 9);
            expect(own, where).toBe(levelNode);
          }
        });
      });
      expect(solve(doc).findings.filter((f) => f.code === 'nozzle-above-level')).toEqual([]);
    }
  });

  it('siphon demo, case “Pond drawn down to −1.5 m”: the intake (−1.7 m) stays covered, no stop', () => {
    // The demo's intake sat at −1 m until this check showed the drawn-down case uncovering it;
    // it now sits 0.3 m above the pond bottom (−2 m).
    const doc = load('siphon-over-bund.headroute.json');
    const r = solve(doc, 'C1');
    expectAllFinite(r);
    expect(r.findings.filter((f) => f.code === 'nozzle-above-level')).toEqual([]);
    // Drawn down 1.5 m, the pond drops below the old intake height: that intake would be dry.
    const old = structuredClone(doc);
    (old.nodes.V1 as Vessel).nozzles[0].z = -1;
    const dry = solve(old, 'C1').findings.filter((f) => f.code === 'nozzle-above-level');
    expect(dry.map((f) => f.elements[0])).toEqual(['V1']);
    expect(dry[0].message).toContain('Nozzle N1 of “Pond”');
  });

  it('branched demo: the pipe into V-303 (inlet 5.5 m over liquid at 4 m, 3 bar abs gas) ends at the gas pressure', () => {
    const doc = load('branched-with-recirculation.headroute.json');
    const r = solve(doc);
    expectConservation(doc, r);
    const v303 = doc.nodes.V3 as Vessel;
    expect(r.nodes.V3.ports.N1.pressureAbs).toBeCloseTo(v303.gasPressureAbs, 3);
    const rhoG = r.fluid.density * G;
    const inlet = Object.keys(doc.pipes).find((id) => doc.pipes[id].to.node === 'V3')!;
    expect(r.pipes[inlet].headTo!).toBeCloseTo(
      5.5 + (v303.gasPressureAbs - r.fluid.atmosphericPressure) / rhoG,
      9,
    );
  });
});
