import { describe, expect, it } from 'vitest';
import { createNode } from '../../src/lib/model/defaults';
import { nodeLabel } from '../../src/lib/model/labels';
import {
  hasPort,
  isMultiPort,
  portElevation,
  portPosition,
  portsOf,
  VESSEL_HEIGHT,
} from '../../src/lib/model/ports';
import type { NodeKind, Vessel } from '../../src/lib/model/types';
import { sampleDocument } from './helpers';

const at = { x: 100, y: 200 };

describe('ports', () => {
  it.each([
    ['pump', ['suction', 'discharge']],
    ['fitting', ['in', 'out']],
    ['control-valve', ['in', 'out']],
    ['waypoint', ['in', 'out']],
    ['junction', ['hub']],
    ['boundary', ['p']],
    ['vessel', ['N1', 'N2']],
  ] as Array<[NodeKind, string[]]>)('%s has ports %j', (kind, ports) => {
    const node = createNode(kind, at, 'A1');
    expect(portsOf(node)).toEqual(ports);
    for (const p of ports) expect(hasPort(node, p)).toBe(true);
    expect(hasPort(node, 'nope')).toBe(false);
    expect(ports.every((p) => isMultiPort(node, p))).toBe(kind === 'junction');
  });

  it('port elevations: nozzle z for vessels, node z otherwise', () => {
    const doc = sampleDocument();
    expect(portElevation(doc, { node: 'V1', port: 'N1' })).toBeCloseTo(0.3, 12);
    expect(portElevation(doc, { node: 'V1', port: 'N2' })).toBeCloseTo(4.5, 12);
    expect(portElevation(doc, { node: 'P1', port: 'suction' })).toBe(0);
    expect(() => portElevation(doc, { node: 'Q', port: 'in' })).toThrow(/No node/);
    expect(() => portElevation(doc, { node: 'P1', port: 'in' })).toThrow(/no port/);
  });

  it('port positions follow the documented geometry', () => {
    expect(portPosition(createNode('pump', at, 'P'), 'suction')).toEqual({ x: 70, y: 200 });
    expect(portPosition(createNode('pump', at, 'P'), 'discharge')).toEqual({ x: 130, y: 200 });
    expect(portPosition(createNode('fitting', at, 'F'), 'in')).toEqual({ x: 70, y: 200 });
    expect(portPosition(createNode('control-valve', at, 'F'), 'out')).toEqual({ x: 130, y: 200 });
    expect(portPosition(createNode('waypoint', at, 'W'), 'in')).toEqual({ x: 90, y: 200 });
    expect(portPosition(createNode('junction', at, 'J'), 'hub')).toEqual({ x: 100, y: 200 });
    expect(portPosition(createNode('boundary', at, 'B'), 'p')).toEqual({ x: 120, y: 200 });
  });

  it('vessel nozzles sit on the shell side at a height set by elevation', () => {
    const v = createNode('vessel', at, 'V') as Vessel;
    const low = portPosition(v, 'N1');
    const high = portPosition(v, 'N2');
    expect(low.x).toBe(140); // first nozzle: right side
    expect(high.x).toBe(60); // second: left side
    // N1 at 0.3 m of a 5 m shell: 6 % up from the bottom edge at y + 60.
    expect(low.y).toBeCloseTo(200 + VESSEL_HEIGHT / 2 - 0.06 * VESSEL_HEIGHT, 9);
    expect(high.y).toBeLessThan(low.y);
    const sided: Vessel = { ...v, nozzles: [{ ...v.nozzles[0], side: 'left', z: 99 }] };
    expect(portPosition(sided, 'N1')).toEqual({ x: 60, y: 200 - VESSEL_HEIGHT / 2 });
  });
});

describe('nodeLabel', () => {
  it('uses the name, or kind and id when the name is blank', () => {
    expect(nodeLabel({ kind: 'pump', id: 'P1', name: 'Feed pump' })).toBe('Feed pump');
    expect(nodeLabel({ kind: 'control-valve', id: 'CV1', name: '  ' })).toBe('Control valve CV1');
    expect(nodeLabel({ kind: 'vessel', id: 'V1', name: '<b>T-1</b>' })).toBe('<b>T-1</b>');
  });
});
