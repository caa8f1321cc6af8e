import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../src/lib/model/file';
import { MAX_ELEMENTS, MAX_FILE_CHARS } from '../../src/lib/model/file/limits';
import { createDocument, createNode, createPipe } from '../../src/lib/model/defaults';

const dir = fileURLToPath(new URL('../fixtures/hostile/', import.meta.url));

/** Each hostile file → a fragment of its first message, and its path (and element, if any). */
const EXPECTED: Record<string, { message: string; path: string; element?: string }> = {
  truncated: { message: 'not valid JSON; it may be cut short', path: '$' },
  empty: { message: 'not valid JSON', path: '$' },
  'not-an-object': { message: 'expected a JSON object', path: '$' },
  'wrong-format': { message: 'not a Headroute project file', path: 'format' },
  'newer-version': {
    message: 'saved by a newer version of Headroute (file format version 7',
    path: 'version',
  },
  'version-as-text': { message: 'no valid format version', path: 'version' },
  'length-as-text': {
    message: '"length" should be a number, but is the text "12 m"',
    path: 'pipes.L1.length',
    element: 'Pipe "Suction line" (L1)',
  },
  'nan-as-text': {
    message: '"z" should be a number, but is the text "NaN"',
    path: 'nodes.P1.z',
    element: 'Pump "Transfer pump" (P1)',
  },
  'infinite-length': {
    message: '"length" must be a finite number, but is Infinity',
    path: 'pipes.L1.length',
  },
  'negative-length': {
    message: '"length" must be greater than 0, but is -5',
    path: 'pipes.L2.length',
    element: 'Pipe "Discharge line" (L2)',
  },
  'negative-diameter': {
    message: '"innerDiameter" must be greater than 0, but is -0.05',
    path: 'pipes.L1.bore.innerDiameter',
  },
  'negative-speed': { message: '"speed" must be greater than 0', path: 'nodes.P1.speed' },
  'opening-above-one': {
    message: '"opening" must be at most 1, but is 1.5',
    path: 'nodes.CV1.opening',
    element: 'Control valve "FV-101" (CV1)',
  },
  'key-id-mismatch': {
    message: 'stored under "P1" but its id is "P2"',
    path: 'nodes.P1.id',
    element: 'Pump "Transfer pump" (P1)',
  },
  'duplicate-id': {
    message: 'The id "V1" is used twice (in nodes and in pipes)',
    path: 'pipes.V1',
  },
  'duplicate-key': {
    message: 'The key "J1" is written twice in the same object',
    path: 'nodes.J1',
  },
  'draft-duplicate-ids': { message: 'Two nodes have the id "J1"', path: 'nodes[1].id' },
  'pipe-to-missing-node': {
    message: 'names node "X9", which is not in the project',
    path: 'pipes.L2.to.node',
    element: 'Pipe "Discharge line" (L2)',
  },
  'pipe-to-missing-port': {
    message: 'names port "outlet" on "Transfer pump" (P1), which has no such port',
    path: 'pipes.L1.to.port',
  },
  'pipe-to-itself': { message: 'already has pipe L1', path: 'pipes.L2.to' },
  'port-used-twice': {
    message: 'Port "suction" of "Transfer pump" (P1) already has pipe L1',
    path: 'pipes.L3.to',
  },
  'proto-key': { message: 'key named "__proto__", which is not allowed', path: 'nodes.__proto__' },
  'constructor-key': {
    message: 'key named "constructor", which is not allowed',
    path: 'settings.constructor',
  },
  'prototype-key': {
    message: 'key named "prototype", which is not allowed',
    path: 'nodes.V1.prototype',
  },
  'name-too-long': {
    message: '"name" is too long: 500 characters, at most 200 allowed',
    path: 'nodes.V2.name',
  },
  'too-deep': {
    message: 'nested more than 16 levels deep',
    path: 'extra.a.a.a.a.a.a.a.a.a.a.a.a.a.a.a',
  },
  'unknown-kind': {
    message: '"kind" is the text "teleporter", which is not one of the allowed values',
    path: 'nodes.J1.kind',
  },
  'missing-length': {
    message: '"length" is missing',
    path: 'pipes.L1.length',
    element: 'Pipe "Suction line" (L1)',
  },
  'bad-id-key': { message: 'The record key "bad id!" is not a valid id', path: 'nodes["bad id!"]' },
  'route-to-missing-node': {
    message: 'The route passes node "Z7", which is not in the project',
    path: 'routes.R1.nodes[1]',
    element: 'Route "Main" (R1)',
  },
  'case-wrong-target': {
    message: 'The case changes pump "V1", but there is no pump with that id',
    path: 'cases.C1.overrides.pumps.V1',
    element: 'Case "Hot" (C1)',
  },
  'outflow-as-text': {
    message: '"outflow" should be a number, but is the text "5 m3/h"',
    path: 'nodes.B1.outflow',
    element: 'Header or draw-off "Draw-off to unit 2" (B1)',
  },
  'boundary-holds-unknown': {
    message: '"holds" is the text "vacuum", which is not one of the allowed values',
    path: 'nodes.B1.holds',
    element: 'Header or draw-off "Draw-off to unit 2" (B1)',
  },
  'nodes-as-list': {
    message: '"nodes" should be an object of records keyed by id, but is a list',
    path: 'nodes',
  },
};

describe('hostile files', () => {
  const files = readdirSync(dir).filter((f) => f.endsWith('.headroute.json'));

  it('every fixture has an expected message, and every expectation a fixture', () => {
    const names = files.map((f) => f.replace(/\.headroute\.json$/, '')).sort();
    expect(names).toEqual(Object.keys(EXPECTED).sort());
  });

  it.each(Object.entries(EXPECTED))('%s is refused with a clear message', (name, expected) => {
    const text = readFileSync(`${dir}${name}.headroute.json`, 'utf8');
    const result = parseProjectFile(text);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const first = result.errors[0];
    expect(first.message).toContain(expected.message);
    expect(first.path).toBe(expected.path);
    if (expected.element) expect(first.element).toBe(expected.element);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('no prototype is polluted by __proto__ or constructor keys anywhere', () => {
    const text = JSON.stringify({ format: 'headroute', version: 1 }).replace(
      '{',
      '{"__proto__":{"polluted":1},',
    );
    expect(parseProjectFile(text).ok).toBe(false);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.prototype).not.toHaveProperty('polluted');
  });

  it('refuses a file over the size cap before parsing it', () => {
    const text = ' '.repeat(MAX_FILE_CHARS + 1);
    const result = parseProjectFile(text);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0].message).toContain('too large');
  });

  it(`refuses more than ${MAX_ELEMENTS} nodes`, () => {
    const doc = createDocument('Huge');
    for (let i = 1; i <= MAX_ELEMENTS + 1; i++) {
      doc.nodes[`J${i}`] = createNode('junction', { x: i, y: 0 }, `J${i}`);
    }
    const result = parseProjectFile(serializeProject(doc));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors[0].path).toBe('nodes');
      expect(result.errors[0].message).toBe(
        '"nodes" has more than 20,000 entries; no part of a project file holds that many.',
      );
    }
  }, 60_000);

  it(`refuses more than ${MAX_ELEMENTS} nodes and pipes together on load`, () => {
    const doc = createDocument('Over the limit');
    for (let i = 1; i <= 10_001; i++) {
      doc.nodes[`J${i}`] = createNode('junction', { x: i, y: 0 }, `J${i}`);
    }
    for (let i = 1; i <= 10_000; i++) {
      doc.pipes[`L${i}`] = createPipe(
        { node: `J${i}`, port: 'hub' },
        { node: `J${i + 1}`, port: 'hub' },
        `L${i}`,
      );
    }
    const result = parseProjectFile(serializeProject(doc));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors[0]).toEqual({
      path: 'pipes',
      message:
        'The project has 20,001 elements (nodes and pipes together); Headroute works with at most 20,000, as when adding parts.',
    });
  }, 60_000);

  it('reports at most 50 problems plus a summary line', () => {
    const doc = createDocument('Many faults');
    for (let i = 1; i <= 80; i++) {
      doc.nodes[`J${i}`] = { ...createNode('junction', { x: 0, y: 0 }, `J${i}`), z: Number.NaN };
    }
    const text = serializeProject(doc); // NaN is written as null
    const result = parseProjectFile(text);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors).toHaveLength(51);
      expect(result.errors[50].message).toBe('…and 30 more problems.');
      expect(result.errors[0].message).toBe('"z" should be a number, but is empty (null).');
    }
  });

  it('names with markup stay plain text through save and load', () => {
    const doc = createDocument('<script>alert("x")</script>');
    doc.nodes.V1 = {
      ...createNode('vessel', { x: 0, y: 0 }, 'V1'),
      name: '<img src=x onerror=alert(1)> & "T-1"',
    };
    const result = parseProjectFile(serializeProject(doc));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.document.name).toBe('<script>alert("x")</script>');
    expect(result.document.nodes.V1.name).toBe('<img src=x onerror=alert(1)> & "T-1"');
  });
});
