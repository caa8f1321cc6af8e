import { describe, expect, it } from 'vitest';
import { findDuplicateKey } from '../../../src/lib/model/file/duplicateKeys';

describe('findDuplicateKey', () => {
  it('finds nothing in JSON without repeated keys', () => {
    expect(findDuplicateKey('{"a":1,"b":{"a":2},"c":[{"a":1},{"a":2}]}')).toBeUndefined();
    expect(findDuplicateKey('[1,2,3]')).toBeUndefined();
    expect(findDuplicateKey('"plain"')).toBeUndefined();
  });
  it('finds a repeated key at the top and nested, with its path', () => {
    expect(findDuplicateKey('{"a":1,"a":2}')).toEqual({ path: 'a', key: 'a' });
    expect(findDuplicateKey('{"nodes":{"P1":{},"P2":{},"P1":{}}}')).toEqual({
      path: 'nodes.P1',
      key: 'P1',
    });
    expect(findDuplicateKey('{"x":[{"k":1},{"k":1,"k":2}]}')).toEqual({ path: 'x[1].k', key: 'k' });
  });
  it('reads escapes, so "\\u0050" and "P" are the same key', () => {
    expect(findDuplicateKey('{"\\u0050":1,"P":2}')).toEqual({ path: 'P', key: 'P' });
  });
  it('is not fooled by braces, commas and quotes inside strings', () => {
    expect(findDuplicateKey('{"a":"x,\\"a\\":{","b":"}],a"}')).toBeUndefined();
    expect(findDuplicateKey('{"a":"}", "a": 1}')).toEqual({ path: 'a', key: 'a' });
  });
});
