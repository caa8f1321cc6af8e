import { describe, expect, it } from 'vitest';
import { scanJsonText } from '../../../src/lib/model/file/textScan';
import { MAX_CONTAINERS, MAX_DEPTH, MAX_ENTRIES } from '../../../src/lib/model/file/limits';

/** The duplicated key the scan finds (path and key), or undefined. */
function duplicate(text: string) {
  const problem = scanJsonText(text);
  return problem?.kind === 'duplicate-key' ? { path: problem.path, key: problem.key } : problem;
}

describe('the streaming scan: duplicate keys', () => {
  it('finds nothing in JSON without repeated keys', () => {
    expect(scanJsonText('{"a":1,"b":{"a":2},"c":[{"a":1},{"a":2}]}')).toBeUndefined();
    expect(scanJsonText('[1,2,3]')).toBeUndefined();
    expect(scanJsonText('"plain"')).toBeUndefined();
  });
  it('finds a repeated key at the top and nested, with its path', () => {
    expect(duplicate('{"a":1,"a":2}')).toEqual({ path: 'a', key: 'a' });
    expect(duplicate('{"nodes":{"P1":{},"P2":{},"P1":{}}}')).toEqual({
      path: 'nodes.P1',
      key: 'P1',
    });
    expect(duplicate('{"x":[{"k":1},{"k":1,"k":2}]}')).toEqual({ path: 'x[1].k', key: 'k' });
  });
  it('reads escapes, so "\\u0050" and "P" are the same key', () => {
    expect(duplicate('{"\\u0050":1,"P":2}')).toEqual({ path: 'P', key: 'P' });
  });
  it('is not fooled by braces, commas and quotes inside strings', () => {
    expect(scanJsonText('{"a":"x,\\"a\\":{","b":"}],a"}')).toBeUndefined();
    expect(duplicate('{"a":"}", "a": 1}')).toEqual({ path: 'a', key: 'a' });
    expect(scanJsonText('{"a":"\\\\","b":"\\\\\\""}')).toBeUndefined();
  });
  it('a huge duplicated key is cut in the message and the path', () => {
    const key = 'k'.repeat(1_000_000);
    const problem = scanJsonText(`{"${key}":1,"${key}":2}`);
    expect(problem?.kind).toBe('duplicate-key');
    expect(problem!.message.length).toBeLessThan(200);
    expect(problem!.path.length).toBeLessThan(60);
  });
});

describe('the streaming scan: depth, forbidden keys and counts', () => {
  it(`refuses nesting deeper than ${MAX_DEPTH}, naming where`, () => {
    const ok = `${'['.repeat(MAX_DEPTH)}${']'.repeat(MAX_DEPTH)}`;
    expect(scanJsonText(ok)).toBeUndefined();
    const deep = `${'['.repeat(MAX_DEPTH + 1)}${']'.repeat(MAX_DEPTH + 1)}`;
    expect(scanJsonText(deep)).toMatchObject({ kind: 'depth', path: '[0]'.repeat(MAX_DEPTH) });
  });
  it('stops at the first level too deep, whatever follows (no JSON needed)', () => {
    expect(scanJsonText('{"a":'.repeat(100) + 'garbage')).toMatchObject({ kind: 'depth' });
  });
  it('refuses prototype keys, escaped or not', () => {
    expect(scanJsonText('{"nodes":{"__proto__":{}}}')).toMatchObject({
      kind: 'forbidden-key',
      path: 'nodes.__proto__',
    });
    expect(scanJsonText('{"\\u0063onstructor":1}')).toMatchObject({
      kind: 'forbidden-key',
      key: 'constructor',
    });
  });
  it(`refuses more than ${MAX_ENTRIES} entries in one list or object`, () => {
    const list = `{"r":[${'0,'.repeat(MAX_ENTRIES)}0]}`;
    expect(scanJsonText(list)).toMatchObject({ kind: 'entries', path: 'r' });
    expect(scanJsonText(`{"r":[${'0,'.repeat(MAX_ENTRIES - 1)}0]}`)).toBeUndefined();
    const keys = Array.from({ length: MAX_ENTRIES + 1 }, (_, i) => `"k${i}":0`).join(',');
    expect(scanJsonText(`{"nodes":{${keys}}}`)).toMatchObject({ kind: 'entries', path: 'nodes' });
  });
  it(`refuses more than ${MAX_CONTAINERS} objects and lists in all`, () => {
    const row = `[${'[],'.repeat(9_999)}[]]`;
    const many = `[${Array.from({ length: MAX_CONTAINERS / 10_000 }, () => row).join(',')}]`;
    expect(scanJsonText(many)).toMatchObject({ kind: 'containers' });
  });
});
