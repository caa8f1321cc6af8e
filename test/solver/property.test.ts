import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solve } from '../../src/lib/solver/solve';
import type { FittingType, PortRef } from '../../src/lib/model/types';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

type Kind = 'junction' | 'vessel' | 'waypoint' | 'fitting' | 'pump';
const KINDS: Kind[] = ['junction', 'vessel', 'waypoint', 'fitting', 'pump'];
const FITTINGS: FittingType[] = [
  'elbow-90-standard',
  'gate-valve',
  'swing-check-valve',
  'globe-valve',
  'reducer',
  'tee-branch',
];

const element = fc.record({
  parent: fc.nat(),
  kind: fc.constantFrom(...KINDS),
  z: fc.double({ min: -10, max: 30, noNaN: true }),
  level: fc.double({ min: 0, max: 40, noNaN: true }),
  length: fc.double({ min: 0, max: 500, noNaN: true }),
  diameter: fc.double({ min: 0.02, max: 0.5, noNaN: true }),
  fitting: fc.constantFrom(...FITTINGS),
  closed: fc.boolean(),
  running: fc.boolean(),
  reversed: fc.boolean(),
});

/**
 * Random valid tree networks (a vessel at the root; junctions, vessels, waypoints, fittings and
 * pumps hung below it, each two-port element with at most one pipe per port), built from the
 * model's defaults. Property: the solve never throws and never gives NaN/Infinity; it either
 * converges with continuity at every node to 1e-9 m³/s and the EGL bookkeeping of every pipe to
 * 1e-6 m, or it returns a stop finding naming the elements.
 */
type Item = typeof element extends fc.Arbitrary<infer T> ? T : never;

function treeSheet(items: Item[]) {
  const s = new Sheet();
  s.vessel('n0', 10);
  const kinds: Kind[] = ['vessel'];
  const outUsed: boolean[] = [false];
  items.forEach((item, index) => {
    const i = index + 1;
    const id = `n${i}`;
    // Parent: any earlier node that can take another pipe.
    const candidates = kinds
      .map((_, k) => k)
      .filter((k) => kinds[k] === 'junction' || kinds[k] === 'vessel' || !outUsed[k]);
    const parent = candidates[item.parent % candidates.length];
    const parentId = `n${parent}`;
    let from: PortRef;
    if (kinds[parent] === 'junction') from = at(parentId, 'hub');
    else if (kinds[parent] === 'vessel') {
      const v = s.doc.nodes[parentId];
      if (v.kind !== 'vessel') throw new Error('not a vessel');
      const nozzle = `N${v.nozzles.length + 1}`;
      v.nozzles.push({ id: nozzle, z: v.z, entranceK: 0.5, exitK: 1 });
      from = at(parentId, nozzle);
    } else {
      from = at(parentId, kinds[parent] === 'pump' ? 'discharge' : 'out');
      outUsed[parent] = true;
    }
    let to: PortRef = at(id, 'hub');
    switch (item.kind) {
      case 'junction':
        s.node('junction', id, { z: item.z });
        to = at(id, 'hub');
        break;
      case 'vessel':
        s.vessel(id, item.level, { nozzleZ: Math.min(item.z, item.level) });
        to = at(id, 'N1');
        break;
      case 'waypoint':
        s.node('waypoint', id, { z: item.z });
        to = at(id, 'in');
        break;
      case 'fitting':
        s.fitting(id, {
          fittingType: item.fitting,
          closed: item.closed && item.fitting === 'gate-valve',
          z: item.z,
          inletDiameter: item.diameter,
          outletDiameter: item.diameter / 2,
        });
        to = at(id, 'in');
        break;
      case 'pump':
        s.pump(id, { running: item.running, z: item.z });
        to = at(id, 'suction');
        break;
    }
    kinds.push(item.kind);
    outUsed.push(false);
    const [a, b] =
      item.reversed && item.kind !== 'pump' && item.kind !== 'fitting' ? [to, from] : [from, to];
    s.pipe(`p${i}`, a, b, { length: item.length, diameter: item.diameter });
  });
  return s;
}

describe('random tree networks (property)', () => {
  it('converge with balances, or say why naming the elements; never NaN/Infinity', () => {
    fc.assert(
      fc.property(fc.array(element, { minLength: 1, maxLength: 25 }), (items) => {
        const s = treeSheet(items);
        const r = solve(s.doc);
        expectAllFinite(r);
        if (r.converged) {
          expectConservation(s.doc, r);
        } else {
          const stops = r.findings.filter((f) => f.level === 'stop');
          expect(stops.length).toBeGreaterThan(0);
          expect(stops.some((f) => f.elements.length > 0)).toBe(true);
        }
      }),
      { numRuns: 150 },
    );
  });
});

describe('hostile numbers (property)', () => {
  it('odd but schema-shaped values never throw and never give NaN/Infinity', () => {
    const odd = fc.constantFrom(0, 1e-9, 1e-3, 1, 1e3, 1e6, -1);
    fc.assert(
      fc.property(
        fc.record({
          diameter: odd,
          length: odd,
          level: fc.double({ min: -50, max: 200, noNaN: true }),
          speed: fc.constantFrom(0, 1, 1450, 2900, 6000),
          opening: fc.double({ min: 0, max: 1, noNaN: true }),
          temperature: fc.double({ min: 250, max: 450, noNaN: true }),
          gas: fc.constantFrom(1, 1e3, 1e5, 1e7),
          open: fc.boolean(),
        }),
        (v) => {
          const s = new Sheet();
          s.vessel('A', v.level, { open: v.open, gasPressureAbs: v.gas });
          s.pump('P', { speed: v.speed });
          s.node('control-valve', 'CV', { opening: v.opening });
          s.vessel('B', 5);
          s.pipe('S', at('A', 'N1'), at('P', 'suction'), {
            diameter: v.diameter,
            length: v.length,
          });
          s.pipe('D', at('P', 'discharge'), at('CV', 'in'), { diameter: 0.05, length: v.length });
          s.pipe('E', at('CV', 'out'), at('B', 'N1'), { diameter: 0.05 });
          s.doc.settings.temperature = v.temperature;
          const r = solve(s.doc);
          expectAllFinite(r);
          if (!r.converged) expect(r.findings.some((f) => f.level === 'stop')).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });
});
