import { describe, expect, it } from 'vitest';
import type { Finding } from '../../src/lib/solver/types';
import {
  findingCounts,
  findingsByElement,
  shownFlow,
  sortFindings,
  worseLevel,
} from '../../src/lib/ui/results';

const f = (level: Finding['level'], elements: string[], code = 'x'): Finding => ({
  code,
  level,
  message: `${level} ${elements.join(',')}`,
  elements,
});

describe('findings for display', () => {
  it('worseLevel ranks stop over caution over note', () => {
    expect(worseLevel(null, 'note')).toBe('note');
    expect(worseLevel('note', 'stop')).toBe('stop');
    expect(worseLevel('stop', 'caution')).toBe('stop');
    expect(worseLevel('caution', 'note')).toBe('caution');
  });

  it('groups findings by element with the worst level', () => {
    const map = findingsByElement([
      f('note', ['P1']),
      f('stop', ['P1', 'L2']),
      f('caution', ['L2']),
    ]);
    expect(map.get('P1')?.level).toBe('stop');
    expect(map.get('P1')?.findings).toHaveLength(2);
    expect(map.get('L2')?.level).toBe('stop');
    expect(map.has('V1')).toBe(false);
  });

  it('sorts by level and keeps order within a level; counts each level', () => {
    const list = [f('note', ['a']), f('stop', ['b']), f('caution', ['c']), f('stop', ['d'])];
    expect(sortFindings(list).map((x) => x.elements[0])).toEqual(['b', 'd', 'c', 'a']);
    expect(findingCounts(list)).toEqual({ stop: 2, caution: 1, note: 1 });
  });
});

describe('flows for display', () => {
  it('round-off flows show as no flow; real flows keep their size, sign dropped', () => {
    expect(shownFlow(3e-15)).toBe(0);
    expect(shownFlow(-6.5e-11 / 3600)).toBe(0);
    expect(shownFlow(-0.0083)).toBe(0.0083);
    expect(shownFlow(1e-6)).toBe(1e-6);
  });
});
