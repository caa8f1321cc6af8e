import { describe, expect, it } from 'vitest';
import { recordValues } from '../../src/lib/solver/network/recordValues';

describe('recordValues (Object.values, faster on big records)', () => {
  it('gives what Object.values gives, in its order, below and above the fast-mode limit', () => {
    for (const n of [0, 1, 5, 1020, 1021, 3000]) {
      const record: Record<string, { i: number }> = {};
      // Integer-like ids go first in ascending order, the rest in insertion order.
      for (let i = n - 1; i >= 0; i--) record[i % 3 === 0 ? String(i) : `N${i}`] = { i };
      const got = recordValues(record);
      const want = Object.values(record);
      expect(got.length).toBe(want.length);
      for (let k = 0; k < want.length; k++) expect(got[k]).toBe(want[k]);
    }
  });

  it('reads a structured clone and a parsed copy of a big record the same way', () => {
    const record: Record<string, number> = {};
    for (let i = 0; i < 2000; i++) record[`P${(i * 7919) % 2000}`] = i;
    for (const copy of [structuredClone(record), JSON.parse(JSON.stringify(record))])
      expect(recordValues(copy)).toEqual(Object.values(copy));
  });
});
