import { describe, expect, it } from 'vitest';
import { addNode, applyCommand } from '../../src/lib/model/commands';
import { createDocument, createNode, createPipe } from '../../src/lib/model/defaults';
import { formatQuantity } from '../../src/lib/units/format';
import { validateDocument } from '../../src/lib/model/file/validate';
import type { NodeKind } from '../../src/lib/model/types';

const KINDS: NodeKind[] = [
  'vessel',
  'pump',
  'fitting',
  'control-valve',
  'waypoint',
  'junction',
  'boundary',
];

describe('defaults', () => {
  it('a new document is valid and empty', () => {
    const doc = createDocument('New project');
    expect(validateDocument(doc).ok).toBe(true);
    expect(Object.keys(doc.nodes)).toHaveLength(0);
    expect(doc.settings.liquid).toEqual({ kind: 'library', id: 'water' });
    expect(doc.settings.temperature).toBeCloseTo(293.15, 9);
  });

  it.each(KINDS)('a default %s passes the schema', (kind) => {
    const doc = createDocument('x');
    const node = createNode(kind, { x: 10, y: 20 }, 'A1');
    const result = validateDocument({ ...doc, nodes: { A1: node } });
    expect(result.ok).toBe(true);
    expect(node).toMatchObject({ id: 'A1', kind, x: 10, y: 20 });
  });

  it('a new pipe is 2" Sch 40 carbon steel, 10 m', () => {
    const pipe = createPipe({ node: 'A', port: 'in' }, { node: 'B', port: 'out' }, 'L1');
    expect(pipe.bore).toEqual({ mode: 'catalogue', nominalSize: '2', schedule: '40' });
    expect(pipe.material).toBe('carbon-steel');
    expect(pipe.length).toBe(10);
  });

  it('a new pump has about 30 m shut-off head and its best efficiency near 20 m³/h', () => {
    const pump = createNode('pump', { x: 0, y: 0 }, 'P1');
    if (pump.kind !== 'pump') throw new Error('not a pump');
    const shutOff = pump.headCurve.find((p) => p.flow === 0);
    expect(shutOff?.value).toBeCloseTo(30, 6);
    const best = pump.efficiencyCurve.reduce((a, b) => (b.value > a.value ? b : a));
    expect(best.flow * 3600).toBeCloseTo(20, 6);
    // Head falls with flow (a stable curve).
    for (let i = 1; i < pump.headCurve.length; i++) {
      expect(pump.headCurve[i].value).toBeLessThan(pump.headCurve[i - 1].value);
    }
  });

  it('a new vessel has nozzles inside its shell and a level between them', () => {
    const vessel = createNode('vessel', { x: 0, y: 0 }, 'V1');
    if (vessel.kind !== 'vessel') throw new Error('not a vessel');
    expect(vessel.nozzles.length).toBeGreaterThanOrEqual(2);
    for (const n of vessel.nozzles) {
      expect(n.z).toBeGreaterThanOrEqual(vessel.z);
      expect(n.z).toBeLessThanOrEqual(vessel.z + vessel.height);
    }
    expect(vessel.liquidLevel).toBeGreaterThan(vessel.nozzles[0].z);
  });
});

describe('defaults in a project shown in US units', () => {
  // Display in US units: a new part must read as round figures there (not 32.81 ft).
  const us = (q: number, quantity: Parameters<typeof formatQuantity>[1]) =>
    formatQuantity(q, quantity, 'US');

  it('a pipe is 30 ft and a vessel 10 ft of liquid in a 16 ft shell, nozzles at 1 and 15 ft', () => {
    const pipe = createPipe({ node: 'A', port: 'in' }, { node: 'B', port: 'out' }, 'L1', 'US');
    expect(us(pipe.length, 'length')).toBe('30 ft');
    const vessel = createNode('vessel', { x: 0, y: 0 }, 'V1', 'US');
    if (vessel.kind !== 'vessel') throw new Error('not a vessel');
    expect(us(vessel.liquidLevel, 'elevation')).toBe('10 ft');
    expect(us(vessel.height, 'length')).toBe('16 ft');
    expect(vessel.nozzles.map((n) => us(n.z, 'elevation'))).toEqual(['1 ft', '15 ft']);
  });

  it('a pump curve reads in gpm and ft, a control valve in Cv, a boundary at 30 psig', () => {
    const pump = createNode('pump', { x: 0, y: 0 }, 'P1', 'US');
    if (pump.kind !== 'pump') throw new Error('not a pump');
    expect(
      pump.headCurve.map((p) => `${us(p.flow, 'volumeFlow')} @ ${us(p.value, 'head')}`),
    ).toEqual(['0 gpm @ 100 ft', '45 gpm @ 95 ft', '90 gpm @ 85 ft', '130 gpm @ 65 ft']);
    expect(us(pump.dutyFlow, 'volumeFlow')).toBe('90 gpm');
    const best = pump.efficiencyCurve.reduce((a, b) => (b.value > a.value ? b : a));
    expect(us(best.flow, 'volumeFlow')).toBe('90 gpm');
    const valve = createNode('control-valve', { x: 0, y: 0 }, 'CV1', 'US');
    expect(valve).toMatchObject({ coefficientUnit: 'Cv', ratedCoefficient: 73 });
    const boundary = createNode('boundary', { x: 0, y: 0 }, 'B1', 'US');
    if (boundary.kind !== 'boundary') throw new Error('not a boundary');
    expect(formatQuantity(boundary.pressureAbs - 101_325, 'pressureGauge', 'US')).toBe('30 psig');
  });

  it('the commands place US defaults when the project shows US units', () => {
    const doc = createDocument('US');
    doc.settings.unitSystem = 'US';
    const placed = applyCommand(doc, addNode('vessel', { x: 0, y: 0 }));
    if (!placed.ok) throw new Error(placed.error.message);
    expect(us((placed.doc.nodes.V1 as { liquidLevel: number }).liquidLevel, 'elevation')).toBe(
      '10 ft',
    );
  });
});
