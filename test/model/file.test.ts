import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import {
  CURRENT_VERSION,
  MIGRATIONS,
  migrate,
  parseProjectFile,
  projectFileName,
  serializeProject,
} from '../../src/lib/model/file';
import { addCase, addNode, addRoute, updateNode, updatePipe } from '../../src/lib/model/commands';
import { build, sampleDocument } from './helpers';

const draftV0 = readFileSync(
  fileURLToPath(new URL('./fixtures/draft-v0.headroute.json', import.meta.url)),
  'utf8',
);

describe('project file round trip', () => {
  it('serialize then parse gives the same document', () => {
    const doc = build(
      sampleDocument(),
      updateNode('V1', { open: false, gasPressureAbs: 301325 }),
      updatePipe('L1', {
        bore: { mode: 'typed', innerDiameter: 0.0779 },
        roughness: 4.5e-5,
        designPressureGauge: 1e6,
      }),
      addCase('Hot', { temperature: 353.15, pumps: { P1: { speed: 2600 } } }),
      addRoute('Main', ['V1', 'P1', 'V2']),
    );
    const result = parseProjectFile(serializeProject(doc));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.document).toEqual(doc);
    expect(result.migratedFrom).toBeUndefined();
    expect(serializeProject(result.document)).toBe(serializeProject(doc));
  });

  it('a boundary holding a flow keeps what it holds, its flow and its pressure', () => {
    const doc = build(
      sampleDocument(),
      addNode('boundary', { x: 400, y: 0 }, { id: 'B9', holds: 'flow', outflow: -0.0025 }),
    );
    const result = parseProjectFile(serializeProject(doc));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.document).toEqual(doc);
    expect(result.document.nodes.B9).toMatchObject({ holds: 'flow', outflow: -0.0025 });
  });

  it('unknown extra fields are refused with their path, not dropped', () => {
    const raw = JSON.parse(serializeProject(sampleDocument()));
    raw.nodes.P1.colour = 'red';
    const result = parseProjectFile(JSON.stringify(raw));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors[0]).toMatchObject({ path: 'nodes.P1.colour' });
    expect(result.errors[0].message).toContain('Unknown field "colour" in "P1"');
  });

  it('a byte-order mark at the start is accepted', () => {
    expect(parseProjectFile(`\uFEFF${serializeProject(sampleDocument())}`).ok).toBe(true);
  });

  it('file names are made safe', () => {
    const doc = { ...sampleDocument(), name: 'Pump / over: rack <1>' };
    expect(projectFileName(doc)).toBe('Pump-over-rack-1.headroute.json');
    expect(projectFileName({ ...doc, name: '///' })).toBe('project.headroute.json');
  });
});

describe('migrations', () => {
  it('there is one step per version up to the current one', () => {
    expect(MIGRATIONS.map((m) => [m.from, m.to])).toEqual(
      Array.from({ length: CURRENT_VERSION }, (_, i) => [i, i + 1]),
    );
  });

  it('0 → 1: the pre-release draft format loads and reports it was migrated', () => {
    const result = parseProjectFile(draftV0);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.migratedFrom).toBe(0);
    const doc = result.document;
    expect(doc.version).toBe(CURRENT_VERSION);
    expect(doc.settings.liquid).toEqual({ kind: 'library', id: 'water' });
    expect(doc.settings.temperature).toBeCloseTo(313.15, 9);
    expect(doc.settings.atmosphericPressureOverride).toBeNull();
    expect(doc.settings.npshMargin).toEqual({ ratio: 1.1, metres: 1 });
    expect(doc.nodes.V1.z).toBe(0);
    expect(doc.nodes.B1.z).toBe(3);
    expect(doc.nodes.B1).not.toHaveProperty('elevation');
    expect(doc.pipes.L1).toEqual({
      id: 'L1',
      kind: 'pipe',
      name: 'Drain',
      from: { node: 'B1', port: 'p' },
      to: { node: 'V1', port: 'N1' },
      length: 25,
      bore: { mode: 'typed', innerDiameter: 0.0525 },
      material: 'carbon-steel',
      roughness: null,
      designPressureGauge: null,
    });
    expect(doc.cases).toEqual({});
    expect(doc.routes).toEqual({});
  });

  it.each([1, 2])(
    '%i → 3: a file without the later fields reads unchanged but for the version',
    (version) => {
      const doc = sampleDocument();
      const old = { ...JSON.parse(serializeProject(doc)), version };
      const step = migrate(old, version);
      expect(step.ok).toBe(true);
      if (step.ok) expect(step.value).toEqual({ ...old, version: 3 });
      const result = parseProjectFile(JSON.stringify(old));
      expect(result.ok).toBe(true);
      if (!result.ok) return;
      expect(result.migratedFrom).toBe(version);
      expect(result.document).toEqual({ ...doc, version: CURRENT_VERSION });
    },
  );

  it.each([1, 2])(
    '%i → 3: boundary holds/outflow and case boundary overrides written before version 3 are kept',
    (version) => {
      const doc = build(
        sampleDocument(),
        addNode('boundary', { x: 400, y: 0 }, { id: 'B9', holds: 'flow', outflow: 0.004 }),
        addCase('Less draw-off', { boundaries: { B9: { outflow: 0.001 } } }),
      );
      const old = { ...JSON.parse(serializeProject(doc)), version };
      const result = parseProjectFile(JSON.stringify(old));
      expect(result.ok).toBe(true);
      if (!result.ok) return;
      expect(result.migratedFrom).toBe(version);
      expect(result.document.nodes.B9).toMatchObject({ holds: 'flow', outflow: 0.004 });
      expect(result.document.cases.C1.overrides.boundaries).toEqual({ B9: { outflow: 0.001 } });
    },
  );

  it.each([1, 2])('%i → 3: a key unknown to version 3 is refused, not dropped', (version) => {
    const old = { ...JSON.parse(serializeProject(sampleDocument())), version };
    old.pipes.L1.lenght = 40;
    const result = parseProjectFile(JSON.stringify(old));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0].path).toBe('pipes.L1.lenght');
  });

  it('0 → 1 leaves shapes it does not know for the schema to report', () => {
    const raw = JSON.parse(draftV0);
    raw.nodes = 'none';
    const step = migrate(raw, 0);
    expect(step.ok).toBe(true);
    const result = parseProjectFile(JSON.stringify(raw));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0]).toMatchObject({ path: 'nodes' });
  });

  it('0 → 1: a draft with a negative length is still refused after migrating', () => {
    const raw = JSON.parse(draftV0);
    raw.pipes[0].length = -1;
    const result = parseProjectFile(JSON.stringify(raw));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors[0]).toMatchObject({
        path: 'pipes.L1.length',
        element: 'Pipe "Drain" (L1)',
      });
    }
  });
});
