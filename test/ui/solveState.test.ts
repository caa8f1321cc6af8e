import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { liquidDepthText, readoutLines, solveStateText } from '../../src/lib/ui/results';
import { at, Sheet } from '../solver/helpers';

describe('the status line says what the solve is, never "solved" for nothing', () => {
  it('an empty sheet says so and what is missing', () => {
    const s = new Sheet();
    const state = solveStateText(s.doc, solve(s.doc));
    expect(state.text).not.toMatch(/^solved/);
    expect(state.text).toMatch(/empty sheet: add a vessel or a boundary/);
  });

  it('a part not joined to anything that holds a head: solved in part, and no pressure on it', () => {
    const s = new Sheet();
    s.vessel('A', 5);
    s.node('junction', 'J', { z: 0 });
    s.pipe('P1', at('A', 'N1'), at('J', 'hub'));
    s.node('waypoint', 'W', { z: 3 });
    const r = solve(s.doc);
    expect(solveStateText(s.doc, r)).toEqual({
      text: 'solved in part: some parts not joined',
      error: true,
    });
    // No "0 barg" on the unjoined waypoint: no pressure line at all.
    expect(readoutLines(s.doc, r, 'W', 'SI').some(([label]) => label.startsWith('p at'))).toBe(
      false,
    );
  });

  it('a joined, converged sheet is solved', () => {
    const s = new Sheet();
    s.vessel('A', 5);
    s.node('junction', 'J', { z: 0 });
    s.pipe('P1', at('A', 'N1'), at('J', 'hub'));
    expect(solveStateText(s.doc, solve(s.doc))).toEqual({ text: 'solved', error: false });
  });
});

describe('a vessel shows its liquid surface as an elevation, with the depth beside it', () => {
  it('depth above the bottom, or how far below it', () => {
    const s = new Sheet();
    const v = s.vessel('A', 7, { z: 2 });
    expect(liquidDepthText(v, 'SI')).toBe('Depth 5 m above the vessel bottom');
    v.liquidLevel = 1;
    expect(liquidDepthText(v, 'SI')).toBe('1 m below the vessel bottom');
    const lines = readoutLines(s.doc, solve(s.doc), 'A', 'SI').map(([label]) => label);
    expect(lines).toContain('Liquid surface elevation');
    expect(lines).toContain('Depth above bottom');
  });
});
