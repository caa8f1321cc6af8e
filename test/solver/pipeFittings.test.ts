/**
 * Fittings carried by a pipe (its fittings list and lumped K) against the same fittings drawn
 * as nodes: the loss K v²/2g is the same whichever way they are entered, referred to the same
 * bore and Reynolds number (2-K: Hooper, 1981; 3-K: Darby, 2001), so the heads must be the same.
 * Where the loss acts along the pipe changes the profile, never the answer.
 */
import { describe, expect, it } from 'vitest';
import type { PipeFittings } from '../../src/lib/model/types';
import { GRAVITY } from '../../src/lib/solver/network/laws';
import { profile } from '../../src/lib/solver/profile';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const LIST: PipeFittings = {
  items: [
    { fittingType: 'elbow-90-standard', count: 6, lossMethod: '2K', fixedK: 0.3 },
    { fittingType: 'gate-valve', count: 2, lossMethod: '3K', fixedK: 0.2 },
    { fittingType: 'strainer', count: 1, lossMethod: 'fixed', fixedK: 1.5 },
  ],
  lumpedK: 0.8,
  place: 'spread',
};

/** Tank → pump → 60 m of 3" line carrying LIST → tank, the fittings on the middle pipe. */
function onPipe(fittings: PipeFittings = LIST): Sheet {
  const s = new Sheet();
  s.vessel('S', 3);
  s.pump('P');
  s.vessel('D', 18, { nozzleZ: 12 });
  s.pipe('suction', at('S', 'N1'), at('P', 'suction'), { length: 5, diameter: 0.078 });
  s.pipe('line', at('P', 'discharge'), at('D', 'N1'), {
    length: 60,
    diameter: 0.078,
    fittings,
  });
  return s;
}

/** The same sheet with each fitting of LIST drawn as a node between pieces of the same line. */
function asNodes(): Sheet {
  const s = new Sheet();
  s.vessel('S', 3);
  s.pump('P');
  s.vessel('D', 18, { nozzleZ: 12 });
  s.pipe('suction', at('S', 'N1'), at('P', 'suction'), { length: 5, diameter: 0.078 });
  const chain: Array<[string, Parameters<Sheet['fitting']>[1]]> = [];
  for (let i = 0; i < 6; i++)
    chain.push([`E${i}`, { fittingType: 'elbow-90-standard', lossMethod: '2K', fixedK: 0.3 }]);
  for (let i = 0; i < 2; i++)
    chain.push([`G${i}`, { fittingType: 'gate-valve', lossMethod: '3K', fixedK: 0.2 }]);
  chain.push(['ST', { fittingType: 'strainer', lossMethod: 'fixed', fixedK: 1.5 }]);
  // The lumped K as a fixed-K fitting.
  chain.push(['LK', { fittingType: 'flow-meter', lossMethod: 'fixed', fixedK: 0.8 }]);
  let previous = at('P', 'discharge');
  const piece = 60 / (chain.length + 1);
  chain.forEach(([id, props], i) => {
    s.fitting(id, props);
    s.pipe(`L${i}`, previous, at(id, 'in'), { length: piece, diameter: 0.078 });
    previous = at(id, 'out');
  });
  s.pipe('Llast', previous, at('D', 'N1'), { length: piece, diameter: 0.078 });
  return s;
}

describe('fittings on a pipe', () => {
  it('give the same heads as the same fittings drawn as nodes', () => {
    const a = onPipe();
    const b = asNodes();
    const ra = solve(a.doc);
    const rb = solve(b.doc);
    expectAllFinite(ra);
    expectConservation(a.doc, ra);
    expectConservation(b.doc, rb);
    const qa = ra.pumps.P.flow;
    const qb = rb.pumps.P.flow;
    expect(qa).toBeGreaterThan(0.002);
    // Same flow, pump head and NPSHa to the solver's tolerance.
    expect(Math.abs(qa - qb) / qb).toBeLessThan(1e-8);
    expect(ra.pumps.P.head).toBeCloseTo(rb.pumps.P.head, 7);
    expect(ra.pumps.P.npshAvailable).toBeCloseTo(rb.pumps.P.npshAvailable, 7);
    // The pipe's fitting loss equals the nodes' losses summed.
    const nodeLoss = Object.values(rb.nodes).reduce((sum, n) => sum + (n.headLoss ?? 0), 0);
    const pumpRise = -rb.nodes.P.headLoss!;
    expect(ra.pipes.line.fittingLoss!).toBeCloseTo(nodeLoss + pumpRise, 7);
    // Friction of the whole line is the same as of its pieces.
    const pieces = Object.entries(rb.pipes)
      .filter(([id]) => id !== 'suction')
      .reduce((sum, [, p]) => sum + p.frictionLoss, 0);
    expect(ra.pipes.line.frictionLoss).toBeCloseTo(pieces, 7);
  });

  it("the list's K is Σ count × K, each as a fitting node computes it", () => {
    const a = onPipe();
    const r = solve(a.doc);
    const b = asNodes();
    const rb = solve(b.doc);
    const kNodes = ['E0', 'E1', 'E2', 'E3', 'E4', 'E5', 'G0', 'G1', 'ST', 'LK'].reduce(
      (sum, id) => sum + rb.nodes[id].lossCoefficient!,
      0,
    );
    expect(r.pipes.line.fittingK!).toBeCloseTo(kNodes, 6);
    const v = r.pipes.line.velocity;
    expect(r.pipes.line.fittingLoss!).toBeCloseTo(
      (r.pipes.line.fittingK! * v * v) / (2 * GRAVITY),
      9,
    );
  });

  it('an empty list and no lumped K change nothing', () => {
    const bare = new Sheet();
    bare.vessel('S', 3);
    bare.pump('P');
    bare.vessel('D', 18, { nozzleZ: 12 });
    bare.pipe('suction', at('S', 'N1'), at('P', 'suction'), { length: 5, diameter: 0.078 });
    bare.pipe('line', at('P', 'discharge'), at('D', 'N1'), { length: 60, diameter: 0.078 });
    const empty = onPipe({ items: [], lumpedK: 0, place: 'inlet' });
    expect(solve(empty.doc).pumps.P.flow).toBe(solve(bare.doc).pumps.P.flow);
    expect(solve(empty.doc).pipes.line.fittingLoss).toBe(0);
  });

  it('where the losses act moves the step on the profile, never the heads at the ends', () => {
    const places: PipeFittings[] = [
      { ...LIST, place: 'inlet' },
      { ...LIST, place: 'outlet' },
      { ...LIST, place: 'spread' },
      { ...LIST, place: 'chainage', chainage: 22.5 },
    ];
    const flows = places.map((p) => solve(onPipe(p).doc).pumps.P.flow);
    for (const q of flows) expect(q).toBe(flows[0]);
    for (const place of places) {
      const s = onPipe(place);
      const r = solve(s.doc);
      const pr = profile(s.doc, r, ['S', 'P', 'D'], { pipeSegments: 8 });
      const line = pr.stations.filter((st) => st.elementId === 'line');
      const start = line[0].chainage;
      const loss = r.pipes.line.fittingLoss!;
      const friction = r.pipes.line.frictionLoss;
      // Ends: the solve's pipe-end heads.
      expect(line[0].egl).toBeCloseTo(r.pipes.line.totalHeadFrom!, 9);
      expect(line[line.length - 1].egl).toBeCloseTo(r.pipes.line.totalHeadTo!, 9);
      // Along the pipe: EGL = start − friction share − fittings share; HGL keeps v²/2g below.
      const v = r.pipes.line.velocity;
      for (const st of line) expect(st.egl - st.hgl).toBeCloseTo((v * v) / (2 * GRAVITY), 9);
      const steps = line.slice(1).filter((st, i) => st.chainage === line[i].chainage);
      if (place.place === 'spread') {
        expect(steps).toHaveLength(0);
        const mid = line[4];
        const t = (mid.chainage - start) / 60;
        expect(line[0].egl - mid.egl).toBeCloseTo((friction + loss) * t, 9);
      } else {
        expect(steps).toHaveLength(1);
        const i = line.indexOf(steps[0]);
        expect(line[i - 1].egl - line[i].egl).toBeCloseTo(loss, 9);
        const where = { inlet: 0, outlet: 60, chainage: 22.5 }[place.place];
        expect(steps[0].chainage - start).toBeCloseTo(where, 9);
      }
    }
  });

  it('a route against the pipe direction sees the step mirrored', () => {
    const s = onPipe({ ...LIST, place: 'chainage', chainage: 15 });
    const r = solve(s.doc);
    const pr = profile(s.doc, r, ['D', 'P', 'S'], { pipeSegments: 4 });
    const line = pr.stations.filter((st) => st.elementId === 'line');
    const steps = line.slice(1).filter((st, i) => st.chainage === line[i].chainage);
    expect(steps).toHaveLength(1);
    // 45 m from the discharge tank's end = 15 m from the pump's.
    expect(steps[0].chainage - line[0].chainage).toBeCloseTo(45, 9);
    for (let i = 1; i < line.length; i++)
      expect(line[i].chainage).toBeGreaterThanOrEqual(line[i - 1].chainage);
  });

  it('fittings placed beyond the pipe are shown at its end, with a finding naming the pipe', () => {
    const s = onPipe({ ...LIST, place: 'chainage', chainage: 75 });
    const r = solve(s.doc);
    expectAllFinite(r);
    const f = r.findings.find((x) => x.code === 'invalid-input' && x.elements.includes('line'));
    expect(f?.message).toMatch(/beyond its length/);
    const pr = profile(s.doc, r, ['S', 'P', 'D']);
    const line = pr.stations.filter((st) => st.elementId === 'line');
    expect(line[line.length - 2].chainage).toBe(line[line.length - 1].chainage);
  });
});
