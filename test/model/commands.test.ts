import { describe, expect, it } from 'vitest';
import {
  addCase,
  addNode,
  addRoute,
  connect,
  copyElements,
  deleteCase,
  deleteElements,
  deleteRoute,
  duplicateCase,
  duplicateElements,
  moveNodes,
  pasteElements,
  renameCase,
  renameDocument,
  setNodePosition,
  updateCaseOverrides,
  updateNode,
  updatePipe,
  updateRoute,
  updateSettings,
} from '../../src/lib/model/commands';
import { createDocument } from '../../src/lib/model/defaults';
import { parseProjectFile, serializeProject } from '../../src/lib/model/file';
import { build, ok, refused, sampleDocument } from './helpers';

describe('addNode', () => {
  it('adds a default node with the next free id', () => {
    const doc = createDocument('x');
    const r = ok(doc, addNode('pump', { x: 5, y: 6 }));
    expect(r.created).toEqual(['P1']);
    expect(r.doc.nodes.P1).toMatchObject({ kind: 'pump', x: 5, y: 6, name: 'P1' });
    const r2 = ok(r.doc, addNode('pump', { x: 0, y: 0 }));
    expect(r2.created).toEqual(['P2']);
  });
  it('applies props and refuses invalid ones', () => {
    const doc = createDocument('x');
    const r = ok(doc, addNode('waypoint', { x: 0, y: 0 }, { z: 12, name: 'Rack' }));
    expect(r.doc.nodes.W1).toMatchObject({ z: 12, name: 'Rack' });
    expect(refused(doc, addNode('waypoint', { x: 0, y: 0 }, { z: NaN })).code).toBe(
      'invalid-value',
    );
    expect(refused(doc, addNode('waypoint', { x: 0, y: 0 }, { colour: 'red' })).code).toBe(
      'invalid-value',
    );
  });
  it('refuses an id already in use or malformed', () => {
    const doc = sampleDocument();
    expect(refused(doc, addNode('junction', { x: 0, y: 0 }, { id: 'L1' })).code).toBe('id-taken');
    expect(refused(doc, addNode('junction', { x: 0, y: 0 }, { id: '__proto__' })).code).toBe(
      'invalid-value',
    );
  });
});

describe('connect: connection rules', () => {
  const doc = sampleDocument();
  it('connects two free ports with a default pipe', () => {
    const r = ok(doc, connect({ node: 'V2', port: 'N1' }, { node: 'J1', port: 'hub' }));
    expect(r.created).toEqual(['L3']);
    expect(r.doc.pipes.L3).toMatchObject({
      from: { node: 'V2', port: 'N1' },
      to: { node: 'J1', port: 'hub' },
      length: 10,
    });
  });
  it('refuses a pipe from a node to itself', () => {
    const e = refused(doc, connect({ node: 'V1', port: 'N2' }, { node: 'V1', port: 'N2' }));
    expect(e.code).toBe('same-node');
    const e2 = refused(doc, connect({ node: 'V2', port: 'N1' }, { node: 'V2', port: 'N1' }));
    expect(e2.code).toBe('same-node');
  });
  it('refuses two different ports of the same node', () => {
    const d = build(createDocument('x'), addNode('fitting', { x: 0, y: 0 }));
    expect(refused(d, connect({ node: 'F1', port: 'in' }, { node: 'F1', port: 'out' })).code).toBe(
      'same-node',
    );
  });
  it('refuses a second pipe on a taken port', () => {
    const e = refused(doc, connect({ node: 'V1', port: 'N1' }, { node: 'J1', port: 'hub' }));
    expect(e.code).toBe('port-taken');
    expect(e.elements).toEqual(['V1', 'L1']);
    expect(e.message).toContain('already has pipe L1');
  });
  it('lets a junction hub take several pipes', () => {
    const d = build(
      doc,
      addNode('boundary', { x: 0, y: 0 }),
      addNode('boundary', { x: 0, y: 0 }),
      addNode('boundary', { x: 0, y: 0 }),
    );
    const r = ok(
      build(
        d,
        connect({ node: 'B1', port: 'p' }, { node: 'J1', port: 'hub' }),
        connect({ node: 'J1', port: 'hub' }, { node: 'B2', port: 'p' }),
      ),
      connect({ node: 'J1', port: 'hub' }, { node: 'B3', port: 'p' }),
    );
    expect(
      Object.values(r.doc.pipes).filter((p) => p.from.node === 'J1' || p.to.node === 'J1'),
    ).toHaveLength(3);
  });
  it('a boundary takes one pipe', () => {
    const d = build(doc, addNode('boundary', { x: 0, y: 0 }));
    const d2 = build(d, connect({ node: 'B1', port: 'p' }, { node: 'J1', port: 'hub' }));
    expect(refused(d2, connect({ node: 'V2', port: 'N1' }, { node: 'B1', port: 'p' })).code).toBe(
      'port-taken',
    );
  });
  it('refuses missing nodes, missing ports and missing ends', () => {
    expect(
      refused(doc, connect({ node: 'X9', port: 'in' }, { node: 'J1', port: 'hub' })).code,
    ).toBe('node-missing');
    expect(
      refused(doc, connect({ node: 'P1', port: 'in' }, { node: 'J1', port: 'hub' })).code,
    ).toBe('port-missing');
    expect(refused(doc, connect({ node: 'J1', port: 'p' }, { node: 'V2', port: 'N1' })).code).toBe(
      'port-missing',
    );
    const noEnd = connect({ node: 'J1', port: 'hub' }, undefined as never);
    expect(refused(doc, noEnd).code).toBe('invalid-value');
  });
  it('refuses invalid pipe props', () => {
    const e = refused(
      doc,
      connect({ node: 'V2', port: 'N1' }, { node: 'J1', port: 'hub' }, { length: -3 }),
    );
    expect(e.code).toBe('invalid-value');
    expect(e.message).toContain('"length" must be greater than 0');
  });
});

describe('updatePipe', () => {
  const doc = sampleDocument();
  it('edits a pipe', () => {
    const r = ok(
      doc,
      updatePipe('L1', { length: 3, bore: { mode: 'typed', innerDiameter: 0.08 } }),
    );
    expect(r.doc.pipes.L1.length).toBe(3);
    expect(r.doc.pipes.L1.bore).toEqual({ mode: 'typed', innerDiameter: 0.08 });
  });
  it('moves an end to a free port and refuses a taken one or the same node', () => {
    const r = ok(doc, updatePipe('L2', { to: { node: 'J1', port: 'hub' } }));
    expect(r.doc.pipes.L2.to).toEqual({ node: 'J1', port: 'hub' });
    expect(refused(doc, updatePipe('L2', { to: { node: 'V1', port: 'N1' } })).code).toBe(
      'port-taken',
    );
    expect(refused(doc, updatePipe('L2', { to: { node: 'P1', port: 'suction' } })).code).toBe(
      'same-node',
    );
    // Keeping its own port is fine.
    ok(doc, updatePipe('L2', { to: { node: 'V2', port: 'N2' } }));
  });
  it('refuses bad values, id or kind changes and unknown pipes', () => {
    expect(refused(doc, updatePipe('L1', { length: Infinity })).code).toBe('invalid-value');
    expect(refused(doc, updatePipe('L1', { roughness: -1 })).code).toBe('invalid-value');
    expect(refused(doc, updatePipe('L1', { id: 'L9' })).code).toBe('fixed-field');
    expect(refused(doc, updatePipe('L9', { length: 1 })).code).toBe('pipe-missing');
  });
});

describe('updateNode', () => {
  const doc = sampleDocument();
  it('stores a negative zero as 0, so the saved file reads back equal (found by fast-check)', () => {
    // From a non-zero value, as fast-check found it (seed 470691940).
    const d = build(doc, updateNode('P1', { z: -5e-324 }), updateNode('P1', { z: -0 }));
    expect(Object.is(d.nodes.P1.z, 0)).toBe(true);
    const reread = parseProjectFile(serializeProject(d));
    expect(reread.ok && reread.document).toEqual(d);
  });
  it('edits fields and removes optional ones given as undefined', () => {
    const d = build(
      doc,
      addNode(
        'fitting',
        { x: 0, y: 0 },
        { fittingType: 'reducer', inletDiameter: 0.1, outletDiameter: 0.05 },
      ),
    );
    const r = ok(
      d,
      updateNode('F1', {
        inletDiameter: undefined,
        outletDiameter: undefined,
        fittingType: 'gate-valve',
      }),
    );
    expect(r.doc.nodes.F1).not.toHaveProperty('inletDiameter');
    expect(r.doc.nodes.F1).toMatchObject({ fittingType: 'gate-valve' });
  });
  it('refuses schema violations, kind or id changes and unknown nodes', () => {
    expect(refused(doc, updateNode('P1', { speed: 0 })).code).toBe('invalid-value');
    expect(refused(doc, updateNode('P1', { kind: 'vessel' } as never)).code).toBe('fixed-field');
    expect(refused(doc, updateNode('P1', { id: 'P7' })).code).toBe('fixed-field');
    expect(refused(doc, updateNode('P9', { name: 'x' })).code).toBe('node-missing');
    expect(refused(doc, updateNode('P1', { name: 'x'.repeat(201) })).code).toBe('invalid-value');
  });
  it('refuses to drop a nozzle that has a pipe, and duplicate nozzle names', () => {
    const vessel = doc.nodes.V1;
    if (vessel.kind !== 'vessel') throw new Error();
    const e = refused(doc, updateNode('V1', { nozzles: [vessel.nozzles[1]] }));
    expect(e.code).toBe('nozzle-in-use');
    expect(e.elements).toEqual(['V1', 'L1']);
    const dup = refused(doc, updateNode('V1', { nozzles: [vessel.nozzles[0], vessel.nozzles[0]] }));
    expect(dup.code).toBe('invalid-value');
    ok(doc, updateNode('V1', { nozzles: [vessel.nozzles[0]] }));
  });
});

describe('moving', () => {
  const doc = sampleDocument();
  it('moveNodes shifts the given nodes and ignores others', () => {
    const r = ok(doc, moveNodes(['P1', 'V2', 'L1', 'nope'], 10, -5));
    expect(r.doc.nodes.P1).toMatchObject({ x: 210, y: -5 });
    expect(r.doc.nodes.V2).toMatchObject({ x: 410, y: -5 });
    expect(r.doc.nodes.V1).toMatchObject({ x: 0, y: 0 });
    expect(refused(doc, moveNodes(['P1'], NaN, 0)).code).toBe('invalid-value');
  });
  it('setNodePosition places a node', () => {
    expect(ok(doc, setNodePosition('J1', -3, 4)).doc.nodes.J1).toMatchObject({ x: -3, y: 4 });
    expect(refused(doc, setNodePosition('Q1', 0, 0)).code).toBe('node-missing');
    expect(refused(doc, setNodePosition('J1', 1e9, 0)).code).toBe('invalid-value');
  });
});

describe('deleteElements', () => {
  it('deleting a node removes its pipes, route entries and case overrides in one step', () => {
    const doc = build(
      sampleDocument(),
      addRoute('Main', ['V1', 'P1', 'V2']),
      addRoute('Short', ['V1', 'P1']),
      addCase('Pump off', {
        pumps: { P1: { running: false } },
        vessels: { V1: { liquidLevel: 1 } },
      }),
    );
    const r = ok(doc, deleteElements(['P1']));
    expect(r.doc.nodes).not.toHaveProperty('P1');
    expect(Object.keys(r.doc.pipes)).toEqual([]);
    expect(r.doc.routes.R1.nodes).toEqual(['V1', 'V2']);
    expect(r.doc.routes).not.toHaveProperty('R2');
    expect(r.doc.cases.C1.overrides.pumps).toEqual({});
    expect(r.doc.cases.C1.overrides.vessels).toEqual({ V1: { liquidLevel: 1 } });
  });
  it('deletes a pipe alone, and ignores unknown ids', () => {
    const doc = sampleDocument();
    const r = ok(doc, deleteElements(['L2', 'ghost']));
    expect(Object.keys(r.doc.pipes)).toEqual(['L1']);
    expect(Object.keys(r.doc.nodes)).toHaveLength(4);
    expect(ok(doc, deleteElements(['ghost'])).patches).toEqual([]);
  });
});

describe('copy, paste and duplicate', () => {
  const doc = sampleDocument();
  it('copy takes the nodes and the pipes between them', () => {
    const clip = copyElements(doc, ['V1', 'P1']);
    expect(clip.nodes.map((n) => n.id)).toEqual(['V1', 'P1']);
    expect(clip.pipes.map((p) => p.id)).toEqual(['L1']);
  });
  it('paste gives fresh ids, rewires pipes and places the clip at the point', () => {
    const clip = copyElements(doc, ['V1', 'P1']);
    const r = ok(doc, pasteElements(clip, { x: 1000, y: 500 }));
    expect(r.created).toEqual(['V3', 'P2', 'L3']);
    expect(r.doc.nodes.V3).toMatchObject({ x: 1000, y: 500 });
    expect(r.doc.nodes.P2).toMatchObject({ x: 1200, y: 500 });
    expect(r.doc.pipes.L3).toMatchObject({
      from: { node: 'V3', port: 'N1' },
      to: { node: 'P2', port: 'suction' },
    });
    expect(refused(doc, pasteElements({ nodes: [], pipes: [] }, { x: 0, y: 0 })).code).toBe(
      'nothing-to-paste',
    );
  });
  it('duplicate shifts a copy by the offset', () => {
    const r = ok(doc, duplicateElements(['P1', 'V2'], { x: 20, y: 20 }));
    expect(r.created).toEqual(['P2', 'V3', 'L3']);
    expect(r.doc.nodes.P2).toMatchObject({ x: 220, y: 20 });
    expect(r.doc.nodes.V3).toMatchObject({ x: 420, y: 20 });
    expect(refused(doc, duplicateElements(['L1'], { x: 0, y: 0 })).code).toBe('nothing-to-paste');
  });
});

describe('cases', () => {
  const doc = sampleDocument();
  it('add, rename, duplicate, edit and delete', () => {
    const a = ok(doc, addCase('Hot day', { temperature: 353.15 }));
    expect(a.created).toEqual(['C1']);
    const b = ok(a.doc, renameCase('C1', 'Hot day 80 °C'));
    expect(b.doc.cases.C1.name).toBe('Hot day 80 °C');
    const c = ok(b.doc, duplicateCase('C1'));
    expect(c.doc.cases.C2).toEqual({
      id: 'C2',
      name: 'Hot day 80 °C (copy)',
      overrides: { temperature: 353.15 },
    });
    const d = ok(
      c.doc,
      updateCaseOverrides('C2', { controlValves: {}, vessels: { V1: { liquidLevel: 0.5 } } }),
    );
    expect(d.doc.cases.C2.overrides).toEqual({
      controlValves: {},
      vessels: { V1: { liquidLevel: 0.5 } },
    });
    const e = ok(d.doc, deleteCase('C1'));
    expect(Object.keys(e.doc.cases)).toEqual(['C2']);
  });
  it('refuses overrides naming missing or wrong-kind nodes, bad values, unknown cases', () => {
    const a = ok(doc, addCase('x')).doc;
    expect(refused(a, updateCaseOverrides('C1', { pumps: { V1: { running: false } } })).code).toBe(
      'invalid-value',
    );
    expect(refused(a, updateCaseOverrides('C1', { temperature: -1 })).code).toBe('invalid-value');
    expect(refused(doc, addCase('x', { vessels: { V7: { liquidLevel: 1 } } })).code).toBe(
      'invalid-value',
    );
    expect(refused(a, renameCase('C1', 'x'.repeat(300))).code).toBe('invalid-value');
    for (const c of [
      renameCase('C9', 'y'),
      duplicateCase('C9'),
      deleteCase('C9'),
      updateCaseOverrides('C9', {}),
    ]) {
      expect(refused(a, c).code).toBe('case-missing');
    }
  });
});

describe('routes', () => {
  const doc = sampleDocument();
  it('add, update and delete', () => {
    const a = ok(doc, addRoute('Tank to tank', ['V1', 'P1', 'V2']));
    expect(a.doc.routes.R1).toEqual({ id: 'R1', name: 'Tank to tank', nodes: ['V1', 'P1', 'V2'] });
    const b = ok(a.doc, updateRoute('R1', { name: 'Main', nodes: ['V1', 'V2'] }));
    expect(b.doc.routes.R1).toEqual({ id: 'R1', name: 'Main', nodes: ['V1', 'V2'] });
    expect(Object.keys(ok(b.doc, deleteRoute('R1')).doc.routes)).toEqual([]);
  });
  it('refuses short routes, missing nodes and unknown routes', () => {
    expect(refused(doc, addRoute('x', ['V1'])).code).toBe('route-too-short');
    expect(refused(doc, addRoute('x', ['V1', 'Z1'])).code).toBe('node-missing');
    expect(refused(doc, updateRoute('R4', { name: 'x' })).code).toBe('route-missing');
    expect(refused(doc, deleteRoute('R4')).code).toBe('route-missing');
  });
});

describe('project', () => {
  const doc = sampleDocument();
  it('updateSettings changes settings and refuses invalid ones', () => {
    const r = ok(doc, updateSettings({ temperature: 333.15, unitSystem: 'US' }));
    expect(r.doc.settings).toMatchObject({ temperature: 333.15, unitSystem: 'US' });
    expect(refused(doc, updateSettings({ temperature: -5 })).code).toBe('invalid-value');
    expect(refused(doc, updateSettings({ npshMargin: { ratio: 0.5, metres: 1 } })).code).toBe(
      'invalid-value',
    );
  });
  it('renameDocument', () => {
    expect(ok(doc, renameDocument('Transfer')).doc.name).toBe('Transfer');
    expect(refused(doc, renameDocument('x'.repeat(201))).code).toBe('invalid-value');
  });
});
