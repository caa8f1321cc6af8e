import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { applyCommand, setRunBore } from '../../src/lib/model/commands';
import { parseProjectFile } from '../../src/lib/model/file';
import type { HeadrouteDocument } from '../../src/lib/model/types';
import { sizeLine } from '../../src/lib/solver/lineSizing';
import { solve } from '../../src/lib/solver/solve';

function demo(name: string): HeadrouteDocument {
  const parsed = parseProjectFile(readFileSync(`static/examples/${name}.headroute.json`, 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors[0].message);
  return parsed.document;
}

describe('sizeLine', () => {
  it('on the rack run of the pump demo recommends the smallest size meeting every rule', () => {
    const doc = demo('pump-over-rack');
    const sizing = sizeLine(doc, 'L8')!;
    expect(sizing.pipes).toEqual(['L8', 'L9']);
    const at = sizing.candidates.findIndex((c) => c.nominalSize === sizing.recommended);
    expect(at).toBeGreaterThan(0);
    const chosen = sizing.candidates[at];
    const smaller = sizing.candidates[at - 1];
    expect(chosen.meetsAll).toBe(true);
    expect(Object.values(chosen.rules).every((r) => r.met)).toBe(true);
    expect(smaller.meetsAll).toBe(false);
    expect(Object.values(smaller.rules).some((r) => !r.met && r.why.length > 0)).toBe(true);
    // Every candidate smaller than the recommendation fails a rule.
    for (const c of sizing.candidates.slice(0, at)) expect(c.meetsAll).toBe(false);
  });

  it('reports figures of a real solve of the sheet with that size', () => {
    const doc = demo('pump-over-rack');
    const sizing = sizeLine(doc, 'L8')!;
    for (const c of sizing.candidates) {
      const applied = applyCommand(
        doc,
        setRunBore(sizing.pipes, {
          mode: 'catalogue',
          nominalSize: c.nominalSize,
          schedule: c.schedule,
        }),
      );
      if (!applied.ok) throw new Error(applied.error.message);
      const result = solve(applied.doc);
      expect(c.flow).toBe(result.pipes.L8.flow);
      expect(c.velocity).toBe(
        Math.max(Math.abs(result.pipes.L8.velocity), Math.abs(result.pipes.L9.velocity)),
      );
      expect(c.pumps[0].head).toBe(result.pumps.P1.head);
    }
  });

  it('a smaller bore raises velocity and friction loss (Darcy–Weisbach: loss grows as Q²/D⁵)', () => {
    const sizing = sizeLine(demo('branched-with-recirculation'), 'L1')!;
    for (let i = 1; i < sizing.candidates.length; i++) {
      const [a, b] = [sizing.candidates[i - 1], sizing.candidates[i]];
      expect(a.innerDiameter).toBeLessThan(b.innerDiameter);
      expect(a.velocity).toBeGreaterThan(b.velocity);
      expect(a.lossPer100m).toBeGreaterThan(b.lossPer100m);
    }
  });

  it('a required flow the line cannot carry at any size tried leaves no recommendation', () => {
    const sizing = sizeLine(demo('pump-over-rack'), 'L8', null, 1)!; // 3,600 m³/h
    expect(sizing.recommended).toBeNull();
    expect(sizing.candidates.every((c) => !c.rules.flow.met)).toBe(true);
  });

  it('returns null for a pipe the sheet does not have', () => {
    expect(sizeLine(demo('pump-over-rack'), 'L99')).toBeNull();
  });
});
