/**
 * Route finding: shortest path along the flow, the fallback that ignores direction, the
 * default route, and stored routes with gaps.
 */
import { describe, expect, it } from 'vitest';
import type { Vessel } from '../../src/lib/model/types';
import { defaultRoute, findRoute, routeLegs, searchRoute } from '../../src/lib/solver/route';
import { solve } from '../../src/lib/solver/solve';
import { at, Sheet } from './helpers';

/**
 * Tank S (level 20 m) → pipe → junction J, which feeds tank T1 through a long line (two
 * waypoints, 300 m) and tank T2 through a short one (50 m); a pump on the T2 branch.
 */
function branched(): Sheet {
  const s = new Sheet();
  s.vessel('S', 20, { nozzleZ: 0 });
  s.node('junction', 'J');
  s.node('waypoint', 'W1', { z: 2 });
  s.node('waypoint', 'W2', { z: 1 });
  s.pump('P');
  s.vessel('T1', 0, { nozzleZ: 0 });
  s.vessel('T2', 5, { nozzleZ: 0 });
  s.pipe('s', at('S', 'N1'), at('J', 'hub'), { length: 10 });
  s.pipe('a1', at('J', 'hub'), at('W1', 'in'), { length: 100 });
  s.pipe('a2', at('W1', 'out'), at('W2', 'in'), { length: 100 });
  s.pipe('a3', at('W2', 'out'), at('T1', 'N1'), { length: 100 });
  s.pipe('b1', at('J', 'hub'), at('P', 'suction'), { length: 20 });
  s.pipe('b2', at('P', 'discharge'), at('T2', 'N1'), { length: 30 });
  return s;
}

describe('findRoute', () => {
  const s = branched();
  const result = solve(s.doc);

  it('follows the flow through junctions, waypoints and the pump', () => {
    expect(result.converged).toBe(true);
    expect(findRoute(s.doc, result, 'S', 'T1')).toEqual(['S', 'J', 'W1', 'W2', 'T1']);
    expect(findRoute(s.doc, result, 'S', 'T2')).toEqual(['S', 'J', 'P', 'T2']);
    const found = searchRoute(s.doc, result, 'S', 'T2')!;
    expect(found.followsFlow).toBe(true);
    expect(found.note).toBeNull();
    expect(found.legs.map((l) => l.pipe.id)).toEqual(['s', 'b1', 'b2']);
  });

  it('falls back to ignoring the direction, with a note naming the ends', () => {
    const found = searchRoute(s.doc, result, 'T1', 'S')!;
    expect(found.route).toEqual(['T1', 'W2', 'W1', 'J', 'S']);
    expect(found.followsFlow).toBe(false);
    expect(found.note).toMatch(/No route follows the flow from “T1” to “S”/);
    // Between two delivery tanks no route follows the flow either.
    expect(searchRoute(s.doc, result, 'T2', 'T1')!.route).toEqual([
      'T2',
      'P',
      'J',
      'W1',
      'W2',
      'T1',
    ]);
  });

  it('starts and ends at any node, not only vessels', () => {
    expect(findRoute(s.doc, result, 'W1', 'T1')).toEqual(['W1', 'W2', 'T1']);
    expect(findRoute(s.doc, result, 'J', 'P')).toEqual(['J', 'P']);
  });

  it('gives null for unknown, equal or unconnected nodes', () => {
    const t = branched();
    t.vessel('X', 1);
    const r = solve(t.doc);
    expect(findRoute(t.doc, r, 'S', 'nowhere')).toBeNull();
    expect(findRoute(t.doc, r, 'S', 'S')).toBeNull();
    expect(findRoute(t.doc, r, 'S', 'X')).toBeNull();
  });

  it('takes the shorter of two parallel paths, and follows flow against a drawn direction', () => {
    const t = new Sheet();
    t.vessel('A', 10, { nozzleZ: 0 });
    t.node('junction', 'J1');
    t.node('junction', 'J2');
    t.node('waypoint', 'Wlong', { z: 0 });
    t.vessel('B', 0, { nozzleZ: 0 });
    t.pipe('in', at('A', 'N1'), at('J1', 'hub'), { length: 5 });
    t.pipe('short', at('J1', 'hub'), at('J2', 'hub'), { length: 30 });
    t.pipe('long1', at('J1', 'hub'), at('Wlong', 'in'), { length: 40 });
    // Drawn from J2 back to the waypoint, but the liquid runs the other way.
    t.pipe('long2', at('J2', 'hub'), at('Wlong', 'out'), { length: 40 });
    t.pipe('out', at('J2', 'hub'), at('B', 'N1'), { length: 5 });
    const r = solve(t.doc);
    expect(r.converged).toBe(true);
    expect(r.pipes.long2.flow).toBeLessThan(0);
    expect(findRoute(t.doc, r, 'A', 'B')).toEqual(['A', 'J1', 'J2', 'B']);
    const viaLong = searchRoute(t.doc, r, 'Wlong', 'B')!;
    expect(viaLong.route).toEqual(['Wlong', 'J2', 'B']);
    expect(viaLong.followsFlow).toBe(true);
    expect(viaLong.legs[0].forward).toBe(false);
  });

  it('does not pass through a vessel on the way', () => {
    const t = new Sheet();
    t.vessel('A', 10, { nozzleZ: 0 });
    t.node<Vessel>('vessel', 'M', {
      liquidLevel: 5,
      height: 6,
      nozzles: [
        { id: 'N1', z: 0, entranceK: 0.5, exitK: 1 },
        { id: 'N2', z: 0, entranceK: 0.5, exitK: 1 },
      ],
    });
    t.vessel('B', 0, { nozzleZ: 0 });
    t.pipe('p1', at('A', 'N1'), at('M', 'N1'), { length: 5 });
    t.pipe('p2', at('M', 'N2'), at('B', 'N1'), { length: 5 });
    const r = solve(t.doc);
    expect(findRoute(t.doc, r, 'A', 'B')).toBeNull();
    // A stored route may still pass it.
    expect(routeLegs(t.doc, r, ['A', 'M', 'B']).legs.map((l) => l.pipe.id)).toEqual(['p1', 'p2']);
  });
});

describe('defaultRoute', () => {
  it('prefers the route through a pump over a longer gravity route', () => {
    const s = branched();
    expect(defaultRoute(s.doc, solve(s.doc))).toEqual(['S', 'J', 'P', 'T2']);
  });

  it('takes the longest route along the flow when there is no pump', () => {
    const s = branched();
    // Gravity only: the short branch runs straight from J into T2, now at level 0.
    delete s.doc.nodes.P;
    delete s.doc.pipes.b2;
    s.doc.pipes.b1.to = at('T2', 'N1');
    (s.doc.nodes.T2 as Vessel).liquidLevel = 0;
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(defaultRoute(s.doc, r)).toEqual(['S', 'J', 'W1', 'W2', 'T1']);
  });

  it('is null when no two vessels or boundaries are joined', () => {
    const s = new Sheet();
    s.vessel('A', 1);
    expect(defaultRoute(s.doc, solve(s.doc))).toBeNull();
  });
});

describe('routeLegs', () => {
  it('bridges gaps in a stored route and keeps direct pipes', () => {
    const s = branched();
    const r = solve(s.doc);
    const legs = routeLegs(s.doc, r, ['S', 'W2', 'T1']);
    expect(legs.nodes).toEqual(['S', 'J', 'W1', 'W2', 'T1']);
    expect(legs.legs.map((l) => l.pipe.id)).toEqual(['s', 'a1', 'a2', 'a3']);
    expect(legs.notes).toEqual([]);
  });

  it('names the node at fault', () => {
    const s = branched();
    const r = solve(s.doc);
    expect(() => routeLegs(s.doc, r, ['S', 'ghost'])).toThrow(/“ghost”/);
    expect(() => routeLegs(s.doc, r, ['S'])).toThrow(/at least two nodes/);
  });
});
