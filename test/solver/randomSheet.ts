/**
 * Random valid sheets for the property tests and the convergence measurement
 * (bench/convergence.ts): a vessel at the root and junctions, vessels, waypoints, fittings (shut
 * gate valves and check valves among them), control valves, pumps (rating and duty, running or
 * stopped) and boundaries (holding a pressure, or a flow: draw-off or supply) hung below it, each
 * two-port element with at most one pipe per port; boundaries end a branch. Built from the
 * model's defaults; every number is invented for the test.
 */
import fc from 'fast-check';
import type { FittingType, PortRef } from '../../src/lib/model/types';
import { at, Sheet } from './helpers';

/** What a random element is. */
export type Kind =
  | 'junction'
  | 'vessel'
  | 'waypoint'
  | 'fitting'
  | 'pump'
  | 'duty-pump'
  | 'control-valve'
  | 'header'
  | 'flow-boundary';

/** The kinds of the first generator (trees of head-fixing elements only). */
export const HEAD_KINDS: Kind[] = ['junction', 'vessel', 'waypoint', 'fitting', 'pump'];
/** Every kind. */
export const ALL_KINDS: Kind[] = [
  ...HEAD_KINDS,
  'duty-pump',
  'control-valve',
  'header',
  'flow-boundary',
];

const FITTINGS: FittingType[] = [
  'elbow-90-standard',
  'gate-valve',
  'swing-check-valve',
  'globe-valve',
  'reducer',
  'tee-branch',
];

/** One random element and the pipe that hangs it on an earlier one. */
export function elementArbitrary(kinds: Kind[]) {
  return fc.record({
    parent: fc.nat(),
    kind: fc.constantFrom(...kinds),
    z: fc.double({ min: -10, max: 30, noNaN: true }),
    level: fc.double({ min: 0, max: 40, noNaN: true }),
    length: fc.double({ min: 0, max: 500, noNaN: true }),
    diameter: fc.double({ min: 0.02, max: 0.5, noNaN: true }),
    fitting: fc.constantFrom(...FITTINGS),
    closed: fc.boolean(),
    running: fc.boolean(),
    reversed: fc.boolean(),
    /** Duty flow of a duty pump, or outflow of a flow boundary (signed), m³/s. */
    flow: fc.double({ min: -0.03, max: 0.03, noNaN: true }),
    opening: fc.double({ min: 0, max: 1, noNaN: true }),
  });
}

/**
 * A random sheet: elements, then up to `loops` extra pipes each joining two junctions or
 * vessels picked by index (closing loops; a pick that is not a junction or vessel is skipped).
 */
export function sheetArbitrary(
  kinds: Kind[],
  loops = 0,
  maxLength = 25,
  size?: fc.SizeForArbitrary,
) {
  return fc.record({
    items: fc.array(elementArbitrary(kinds), { minLength: 1, maxLength, size }),
    loops: fc.array(
      fc.record({
        a: fc.nat(),
        b: fc.nat(),
        length: fc.double({ min: 1, max: 500, noNaN: true }),
        diameter: fc.double({ min: 0.02, max: 0.5, noNaN: true }),
      }),
      { maxLength: loops, size },
    ),
  });
}

/** One generated sheet's description. */
export type SheetSpec = ReturnType<typeof sheetArbitrary> extends fc.Arbitrary<infer T> ? T : never;

/** One generated element. */
export type Item = ReturnType<typeof elementArbitrary> extends fc.Arbitrary<infer T> ? T : never;

/** The sheet of a list of items (see the module comment). */
export function randomSheet(spec: Item[] | SheetSpec): Sheet {
  const items = Array.isArray(spec) ? spec : spec.items;
  const loops = Array.isArray(spec) ? [] : spec.loops;
  const s = new Sheet();
  s.vessel('n0', 10);
  const kinds: Kind[] = ['vessel'];
  const outUsed: boolean[] = [false];
  const terminal = (k: Kind) => k === 'header' || k === 'flow-boundary';
  items.forEach((item, index) => {
    const i = index + 1;
    const id = `n${i}`;
    // Parent: any earlier node that can take another pipe.
    const candidates = kinds
      .map((_, k) => k)
      .filter(
        (k) =>
          kinds[k] === 'junction' || kinds[k] === 'vessel' || (!terminal(kinds[k]) && !outUsed[k]),
      );
    const parent = candidates[item.parent % candidates.length];
    const parentId = `n${parent}`;
    let from: PortRef;
    const parentKind = kinds[parent];
    if (parentKind === 'junction') from = at(parentId, 'hub');
    else if (parentKind === 'vessel') {
      const v = s.doc.nodes[parentId];
      if (v.kind !== 'vessel') throw new Error('not a vessel');
      const nozzle = `N${v.nozzles.length + 1}`;
      v.nozzles.push({ id: nozzle, z: v.z, entranceK: 0.5, exitK: 1 });
      from = at(parentId, nozzle);
    } else {
      from = at(
        parentId,
        parentKind === 'pump' || parentKind === 'duty-pump' ? 'discharge' : 'out',
      );
      outUsed[parent] = true;
    }
    let to: PortRef = at(id, 'hub');
    switch (item.kind) {
      case 'junction':
        s.node('junction', id, { z: item.z });
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
      case 'duty-pump':
        s.pump(id, {
          running: item.running,
          z: item.z,
          mode: 'duty',
          dutyFlow: Math.abs(item.flow),
        });
        to = at(id, 'suction');
        break;
      case 'control-valve':
        s.node('control-valve', id, { z: item.z, opening: item.opening });
        to = at(id, 'in');
        break;
      case 'header':
        s.boundary(id, item.z, 101_325 + 1e4 * item.level);
        to = at(id, 'p');
        break;
      case 'flow-boundary':
        s.drawOff(id, item.z, item.flow);
        to = at(id, 'p');
        break;
    }
    kinds.push(item.kind);
    outUsed.push(false);
    const directed = item.kind === 'pump' || item.kind === 'duty-pump' || item.kind === 'fitting';
    const [a, b] = item.reversed && !directed && !terminal(item.kind) ? [to, from] : [from, to];
    s.pipe(`p${i}`, a, b, { length: item.length, diameter: item.diameter });
  });
  loops.forEach((loop, j) => {
    const a = loop.a % kinds.length;
    const b = loop.b % kinds.length;
    const end = (k: number): PortRef | null => {
      if (kinds[k] === 'junction') return at(`n${k}`, 'hub');
      if (kinds[k] !== 'vessel') return null;
      const v = s.doc.nodes[`n${k}`];
      if (v.kind !== 'vessel') return null;
      const nozzle = `N${v.nozzles.length + 1}`;
      v.nozzles.push({ id: nozzle, z: v.z, entranceK: 0.5, exitK: 1 });
      return at(`n${k}`, nozzle);
    };
    if (a === b) return;
    const from = end(a);
    const to = from && end(b);
    if (!from || !to) return;
    s.pipe(`loop${j}`, from, to, { length: loop.length, diameter: loop.diameter });
  });
  return s;
}
