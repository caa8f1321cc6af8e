import { describe, expect, it } from 'vitest';
import { createDocument, createNode, createPipe } from '../../src/lib/model/defaults';
import { portPosition } from '../../src/lib/model/ports';
import {
  keepSameSets,
  labelAnchor,
  orthogonalRoute,
  pipeRoute,
  polylinePath,
  portDirection,
  routeBetween,
  PORT_LEAD,
  simplify,
} from '../../src/lib/ui/sheet/geometry';

describe('pipe routes on the sheet', () => {
  it('runs out of each port along its direction, then orthogonally', () => {
    const route = orthogonalRoute({ x: 0, y: 0 }, 1, { x: 100, y: 40 }, -1);
    expect(route[0]).toEqual({ x: 0, y: 0 });
    expect(route[route.length - 1]).toEqual({ x: 100, y: 40 });
    // every segment is horizontal or vertical
    for (let i = 1; i < route.length; i++) {
      const a = route[i - 1];
      const b = route[i];
      expect(a.x === b.x || a.y === b.y).toBe(true);
    }
    expect(route).toHaveLength(4);
  });

  it('a straight run between facing ports on one line is a single segment', () => {
    expect(orthogonalRoute({ x: 0, y: 10 }, 1, { x: 80, y: 10 }, -1)).toEqual([
      { x: 0, y: 10 },
      { x: 80, y: 10 },
    ]);
  });

  it('simplify drops duplicates and collinear points', () => {
    expect(
      simplify([
        { x: 0, y: 0 },
        { x: 0, y: 0 },
        { x: 5, y: 0 },
        { x: 10, y: 0 },
        { x: 10, y: 5 },
      ]),
    ).toEqual([
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 5 },
    ]);
  });

  it('follows the model port positions and directions', () => {
    const doc = createDocument('t');
    const pump = createNode('pump', { x: 0, y: 0 }, 'P1');
    const valve = createNode('fitting', { x: 200, y: 100 }, 'F1');
    doc.nodes = { P1: pump, F1: valve };
    expect(portDirection(pump, 'suction')).toBe(-1);
    expect(portDirection(pump, 'discharge')).toBe(1);
    const pipe = createPipe({ node: 'P1', port: 'discharge' }, { node: 'F1', port: 'in' }, 'L1');
    const route = pipeRoute(doc, pipe)!;
    expect(route[0]).toEqual(portPosition(pump, 'discharge'));
    // leaves the discharge heading right, at least one lead long
    expect(route[1].y).toBe(route[0].y);
    expect(route[1].x - route[0].x).toBeGreaterThanOrEqual(PORT_LEAD);
    expect(route[route.length - 1]).toEqual(portPosition(valve, 'in'));
  });

  it('has no route when an end node is missing', () => {
    const doc = createDocument('t');
    const pipe = createPipe({ node: 'A', port: 'out' }, { node: 'B', port: 'in' }, 'L1');
    expect(pipeRoute(doc, pipe)).toBeNull();
  });

  it('labels sit on the longest segment, angled along it', () => {
    const a = labelAnchor([
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 100 },
      { x: 20, y: 100 },
    ]);
    expect(a).toEqual({ x: 10, y: 50, angle: 90 });
    expect(
      polylinePath([
        { x: 1, y: 2 },
        { x: 3, y: 4 },
      ]),
    ).toBe('M 1 2 L 3 4');
  });
});

describe('redraw helpers', () => {
  it('routeBetween gives the route pipeRoute draws, from the end node records', () => {
    const doc = createDocument('t');
    doc.nodes = {
      P1: createNode('pump', { x: 0, y: 0 }, 'P1'),
      F1: createNode('fitting', { x: 200, y: 100 }, 'F1'),
    };
    const pipe = createPipe({ node: 'P1', port: 'discharge' }, { node: 'F1', port: 'in' }, 'L1');
    doc.pipes = { L1: pipe };
    const route = routeBetween(pipe, doc.nodes.P1, doc.nodes.F1);
    expect(route).toEqual(pipeRoute(doc, pipe));
    expect(route[0]).toEqual(portPosition(doc.nodes.P1, 'discharge'));
    expect(route[route.length - 1]).toEqual(portPosition(doc.nodes.F1, 'in'));
  });

  it('keepSameSets reuses unchanged port sets', () => {
    const a = new Map([['P1', new Set(['suction'])]]);
    const b = keepSameSets(a, new Map([['P1', new Set(['suction'])]]));
    expect(b.get('P1')).toBe(a.get('P1'));
    const c = keepSameSets(a, new Map([['P1', new Set(['suction', 'discharge'])]]));
    expect(c.get('P1')).not.toBe(a.get('P1'));
  });
});
