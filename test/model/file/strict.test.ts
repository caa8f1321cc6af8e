/**
 * The project file is strict: a key the schema does not know is refused with its JSON path,
 * at every level of the document, never dropped.
 */
import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../src/lib/model/file';
import { addCase, addNode, addRoute } from '../../../src/lib/model/commands';
import { joinPath } from '../../../src/lib/model/integrity';
import type { HeadrouteDocument } from '../../../src/lib/model/types';
import { build, sampleDocument } from '../helpers';

/** A document holding every kind of record and every optional object the schema knows. */
function everyShape(): HeadrouteDocument {
  const doc = build(
    sampleDocument(),
    addNode('fitting', { x: 0, y: 300 }, { id: 'F1' }),
    addNode('control-valve', { x: 100, y: 300 }, { id: 'CV1' }),
    addNode('waypoint', { x: 200, y: 300 }, { id: 'W1' }),
    addNode('boundary', { x: 300, y: 300 }, { id: 'B1', holds: 'flow', outflow: 0.001 }),
    addCase('Everything', {
      liquid: { kind: 'library', id: 'water' },
      temperature: 330,
      atmosphericPressure: 100000,
      vessels: { V1: { liquidLevel: 2, gasPressureAbs: 200000 } },
      pumps: { P1: { running: true, speed: 2900, mode: 'rating', dutyFlow: 0.01 } },
      controlValves: { CV1: { opening: 0.5 } },
      boundaries: { B1: { outflow: 0.002 } },
    }),
    addRoute('Main', ['V1', 'P1', 'V2']),
  );
  return {
    ...doc,
    settings: {
      ...doc.settings,
      liquid: {
        kind: 'user',
        name: 'Brine',
        table: [{ temperature: 293, density: 1100, viscosity: 0.0015, vapourPressure: 2000 }],
      },
    },
  };
}

/** Paths of objects keyed by id (a new key there is a new record, not an unknown field). */
const RECORD_PATHS =
  /^(nodes|pipes|cases|routes|cases\.\w+\.overrides\.(vessels|pumps|controlValves|boundaries))$/;

/** Every plain object in the document, with its path. */
function objectPaths(value: unknown, path = ''): string[] {
  if (Array.isArray(value)) return value.flatMap((item, i) => objectPaths(item, joinPath(path, i)));
  if (typeof value !== 'object' || value === null) return [];
  const own = RECORD_PATHS.test(path) ? [] : [path];
  return [...own, ...Object.entries(value).flatMap(([k, v]) => objectPaths(v, joinPath(path, k)))];
}

function at(root: Record<string, unknown>, path: string): Record<string, unknown> {
  if (path === '') return root;
  const keys = path.match(/[^.[\]]+/g) ?? [];
  return keys.reduce<Record<string, unknown>>((o, k) => o[k] as Record<string, unknown>, root);
}

describe('unknown keys are refused with their path', () => {
  const doc = everyShape();
  const text = serializeProject(doc);

  it('the document with every shape reads as written', () => {
    const result = parseProjectFile(text);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.document).toEqual(doc);
  });

  const paths = objectPaths(JSON.parse(text));

  it('the walk reaches every level (settings, nodes, nozzles, curves, bore, overrides)', () => {
    for (const p of [
      '',
      'settings',
      'settings.liquid',
      'settings.liquid.table[0]',
      'settings.npshMargin',
      'settings.velocityGuidance',
      'nodes.V1',
      'nodes.V1.nozzles[0]',
      'nodes.P1.headCurve[0]',
      'nodes.F1',
      'nodes.CV1',
      'nodes.W1',
      'nodes.B1',
      'pipes.L1',
      'pipes.L1.from',
      'pipes.L1.bore',
      'cases.C1',
      'cases.C1.overrides',
      'cases.C1.overrides.liquid',
      'cases.C1.overrides.pumps.P1',
      'cases.C1.overrides.vessels.V1',
      'cases.C1.overrides.controlValves.CV1',
      'cases.C1.overrides.boundaries.B1',
      'routes.R1',
    ]) {
      expect(paths).toContain(p);
    }
  });

  it.each(paths.map((p) => [p || '(top)', p]))('a misspelt key in %s', (_label, path) => {
    const raw = JSON.parse(text) as Record<string, unknown>;
    at(raw, path).lenght = 12;
    const result = parseProjectFile(JSON.stringify(raw));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors[0].path).toBe(joinPath(path, 'lenght'));
    expect(result.errors[0].message).toContain('Unknown field "lenght"');
  });

  it('names the element the unknown field belongs to', () => {
    const raw = JSON.parse(text);
    raw.nodes.V1.gasPresure = 200000;
    const result = parseProjectFile(JSON.stringify(raw));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors[0]).toMatchObject({
      path: 'nodes.V1.gasPresure',
      element: expect.stringContaining('V1'),
    });
    expect(result.errors[0].message).toMatch(/^Unknown field "gasPresure" in "V1"/);
  });

  it('a huge unknown key is cut to a few dozen characters in the message', () => {
    const raw = JSON.parse(text);
    raw.settings[`x${'k'.repeat(100_000)}`] = 1;
    const result = parseProjectFile(JSON.stringify(raw));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors[0].message.length).toBeLessThan(300);
    expect(result.errors[0].message).toContain(`Unknown field "x${'k'.repeat(39)}…" in "settings"`);
    expect(result.errors[0].path).toBe(`settings["x${'k'.repeat(39)}…"]`);
  });
});
