/**
 * File format version 2: fittings on pipes, pump flange elevations, branch-point draw-offs and
 * the case overrides for manual valves and draw-offs. A version 1 file migrates to version 2
 * with none of them (their absence means none); each new field round-trips and bad values are
 * refused with the JSON path and element named.
 */
import { describe, expect, it } from 'vitest';
import { addCase, updateNode, updatePipe } from '../../../src/lib/model/commands';
import {
  CURRENT_VERSION,
  MIGRATIONS,
  migrate,
  parseProjectFile,
  serializeProject,
} from '../../../src/lib/model/file';
import { build, sampleDocument } from '../helpers';

const fittings = {
  items: [
    { fittingType: 'elbow-90-standard', count: 6, lossMethod: '2K', fixedK: 0.3 },
    { fittingType: 'gate-valve', count: 1, lossMethod: '3K', fixedK: 0.2 },
  ],
  lumpedK: 1.2,
  place: 'chainage',
  chainage: 4,
} as const;

/** A pipe record as raw JSON, to be spoilt. */
type RawPipe = { fittings: { items: Array<Record<string, unknown>>; [k: string]: unknown } };

function v2Document() {
  return build(
    sampleDocument(),
    updatePipe('L1', { fittings: structuredClone(fittings) as never }),
    updateNode('P1', { suctionElevation: -0.3, dischargeElevation: 0.45 }),
    updateNode('J1', { outflow: 0.002 }),
    addCase('Shut and draw', { junctions: { J1: { outflow: -0.001 } } }),
  );
}

describe('file format version 2', () => {
  it('1 → 2: a version 1 file opens, migrated, with no new fields', () => {
    const raw = JSON.parse(serializeProject(sampleDocument()));
    raw.version = 1;
    const step = MIGRATIONS[1].migrate(raw);
    expect(step.ok).toBe(true);
    if (step.ok) expect(step.value.version).toBe(2);
    expect(migrate(raw, 1)).toEqual({ ok: true, value: { ...raw, version: CURRENT_VERSION } });
    const result = parseProjectFile(JSON.stringify(raw));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.migratedFrom).toBe(1);
    expect(result.document.version).toBe(CURRENT_VERSION);
    expect(result.document.pipes.L1).not.toHaveProperty('fittings');
    expect(result.document.nodes.P1).not.toHaveProperty('suctionElevation');
    expect(result.document.nodes.J1).not.toHaveProperty('outflow');
    expect({ ...result.document, version: 1 }).toEqual(raw);
  });

  it('the new fields round-trip', () => {
    const doc = v2Document();
    const result = parseProjectFile(serializeProject(doc));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.document).toEqual(doc);
    expect(result.document.pipes.L1.fittings).toEqual(fittings);
    expect(result.document.nodes.P1).toMatchObject({
      suctionElevation: -0.3,
      dischargeElevation: 0.45,
    });
  });

  it('a case shutting a manual valve round-trips; one naming a pump as a valve is refused', () => {
    const raw = JSON.parse(serializeProject(v2Document()));
    raw.nodes.F1 = {
      id: 'F1',
      kind: 'fitting',
      name: 'Isolation valve',
      x: 0,
      y: 0,
      z: 0,
      fittingType: 'gate-valve',
      lossMethod: '2K',
      fixedK: 0.2,
      closed: false,
    };
    raw.cases.C1.overrides.valves = { F1: { closed: true } };
    const good = parseProjectFile(JSON.stringify(raw));
    expect(good.ok).toBe(true);
    if (good.ok) expect(good.document.cases.C1.overrides.valves).toEqual({ F1: { closed: true } });
    raw.cases.C1.overrides.valves = { P1: { closed: true } };
    const bad = parseProjectFile(JSON.stringify(raw));
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors[0].path).toContain('cases.C1.overrides.valves');
  });

  it.each([
    ['a count of 0', (p: RawPipe) => (p.fittings.items[0].count = 0), 'count'],
    ['a fractional count', (p: RawPipe) => (p.fittings.items[0].count = 1.5), 'count'],
    [
      'a check valve (it must be drawn: it stops reverse flow)',
      (p: RawPipe) => (p.fittings.items[0].fittingType = 'swing-check-valve'),
      'fittingType',
    ],
    [
      'a reducer (its K needs diameters of its own)',
      (p: RawPipe) => (p.fittings.items[0].fittingType = 'reducer'),
      'fittingType',
    ],
    ['a negative lumped K', (p: RawPipe) => (p.fittings.lumpedK = -1), 'lumpedK'],
    ['an unknown place', (p: RawPipe) => (p.fittings.place = 'middle'), 'place'],
    ['K as text', (p: RawPipe) => (p.fittings.items[1].fixedK = '0.2'), 'fixedK'],
  ])('a pipe fittings list with %s is refused, naming the pipe', (_, spoil, field) => {
    const raw = JSON.parse(serializeProject(v2Document()));
    spoil(raw.pipes.L1);
    const result = parseProjectFile(JSON.stringify(raw));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors[0].path).toMatch(new RegExp(`^pipes\\.L1\\.fittings.*${field}`));
    expect(result.errors[0].element).toContain('L1');
  });

  it('a flange elevation or a draw-off as text is refused', () => {
    const raw = JSON.parse(serializeProject(v2Document()));
    raw.nodes.P1.suctionElevation = '1';
    const a = parseProjectFile(JSON.stringify(raw));
    expect(a.ok).toBe(false);
    if (!a.ok) expect(a.errors[0].path).toBe('nodes.P1.suctionElevation');
    const raw2 = JSON.parse(serializeProject(v2Document()));
    raw2.nodes.J1.outflow = null;
    const b = parseProjectFile(JSON.stringify(raw2));
    expect(b.ok).toBe(false);
    if (!b.ok) expect(b.errors[0].path).toBe('nodes.J1.outflow');
  });
});
