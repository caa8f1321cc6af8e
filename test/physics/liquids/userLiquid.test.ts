import { describe, expect, it } from 'vitest';
import type { UserLiquidRow } from '../../../src/lib/model/types';
import {
  liquidProperties,
  validateLiquidChoice,
  validateUserLiquid,
  type UserLiquidChoice,
} from '../../../src/lib/physics/liquids';

// Invented table values: these tests check the interpolation arithmetic, not physics.
const row = (
  temperature: number,
  density: number,
  viscosity: number,
  vapourPressure: number,
): UserLiquidRow => ({ temperature, density, viscosity, vapourPressure });

function user(table: UserLiquidRow[], criticalPressure?: number): UserLiquidChoice {
  return { kind: 'user', name: 'Test liquor', table, criticalPressure };
}

const TABLE = [row(280, 1000, 2e-3, 1000), row(320, 960, 1e-3, 16000)];

describe('user-defined liquid: interpolation', () => {
  it('interpolates density and viscosity linearly and vapour pressure in log space', () => {
    const p = liquidProperties(user(TABLE), 300);
    expect(p.name).toBe('Test liquor');
    expect(p.density).toBeCloseTo(980, 10);
    expect(p.viscosity).toBeCloseTo(1.5e-3, 12);
    // ln p halfway between ln 1000 and ln 16000: √(1000 × 16000) = 4000 Pa.
    expect(p.vapourPressure).toBeCloseTo(4000, 6);
    expect(p.extrapolated).toEqual([]);
    expect(p.validRange).toEqual({ min: 280, max: 320 });
  });

  it('returns the row values exactly at the rows', () => {
    const table = [...TABLE, row(360, 900, 0.5e-3, 90000)];
    for (const r of table) {
      const p = liquidProperties(user(table), r.temperature);
      expect(p.density).toBeCloseTo(r.density, 9);
      expect(p.viscosity).toBeCloseTo(r.viscosity, 12);
      expect(p.vapourPressure).toBeCloseTo(r.vapourPressure, 6);
      expect(p.extrapolated).toEqual([]);
    }
    // Second interval, a quarter of the way: linear density 960 − 0.25 × 60 = 945.
    const q = liquidProperties(user(table), 330);
    expect(q.density).toBeCloseTo(945, 9);
    expect(q.vapourPressure).toBeCloseTo(16000 * Math.pow(90000 / 16000, 0.25), 6);
  });

  it('holds the end values outside the table and flags every property', () => {
    const cold = liquidProperties(user(TABLE), 250);
    expect(cold.density).toBe(1000);
    expect(cold.vapourPressure).toBe(1000);
    expect(cold.extrapolated).toEqual(['density', 'viscosity', 'vapourPressure']);
    const hot = liquidProperties(user(TABLE), 400);
    expect(hot.viscosity).toBe(1e-3);
    expect(hot.vapourPressure).toBe(16000);
    expect(hot.extrapolated).toEqual(['density', 'viscosity', 'vapourPressure']);
  });

  it('treats one row as constant values at every temperature', () => {
    const choice = user([row(293.15, 1100, 5e-3, 2000)], 5e6);
    for (const t of [250, 293.15, 400]) {
      const p = liquidProperties(choice, t);
      expect(p.density).toBe(1100);
      expect(p.viscosity).toBe(5e-3);
      expect(p.vapourPressure).toBe(2000);
      expect(p.criticalPressure).toBe(5e6);
      expect(p.extrapolated).toEqual([]);
    }
    expect(validateUserLiquid(choice)).toEqual([]);
  });

  it('gives a null critical pressure when none is given', () => {
    expect(liquidProperties(user(TABLE), 300).criticalPressure).toBeNull();
  });
});

describe('user-defined liquid: invalid tables', () => {
  it('reports non-positive values, unsorted and repeated temperatures, tied to their rows', () => {
    const choice = user(
      [row(300, 1000, 1e-3, 3000), row(290, 1010, 0, 2000), row(290, 1010, 1e-3, -5)],
      -1,
    );
    const issues = validateUserLiquid(choice);
    expect(issues).toEqual([
      { row: 1, field: 'temperature', message: 'Row 2: temperatures must rise from row to row.' },
      { row: 1, field: 'viscosity', message: 'Row 2: viscosity must be greater than zero.' },
      {
        row: 2,
        field: 'temperature',
        message: 'Row 3: temperature repeats the row above; each row needs its own.',
      },
      {
        row: 2,
        field: 'vapourPressure',
        message: 'Row 3: vapour pressure must be greater than zero.',
      },
      {
        row: null,
        field: 'criticalPressure',
        message: 'Critical pressure must be greater than zero, or left empty.',
      },
    ]);
    expect(validateLiquidChoice(choice)).toEqual(issues.map((i) => i.message));
  });

  it('reports an empty table, a missing name and a non-finite temperature', () => {
    expect(validateUserLiquid({ kind: 'user', name: ' ', table: [] })).toEqual([
      { row: null, field: 'name', message: 'The liquid needs a name.' },
      { row: null, field: 'table', message: 'The property table needs at least one row.' },
    ]);
    expect(validateUserLiquid(user([row(Number.NaN, 1000, 1e-3, 1000)]))[0]).toEqual({
      row: 0,
      field: 'temperature',
      message: 'Row 1: temperature must be a positive absolute temperature.',
    });
  });

  it('still gives values from the usable rows of an invalid table', () => {
    // Unsorted, with a repeated temperature (the first listed wins) and a bad viscosity.
    const choice = user([
      row(320, 960, 1e-3, 16000),
      row(280, 1000, 0, 1000),
      row(280, 1200, 3e-3, 1200),
      row(300, 980, 1.5e-3, 4000),
    ]);
    const p = liquidProperties(choice, 290);
    expect(p.density).toBeCloseTo(990, 9); // rows at 280 (1000) and 300 (980)
    expect(p.viscosity).toBeCloseTo(2.25e-3, 12); // 280 K row 3 (3e-3) and 300 K (1.5e-3)
    expect(p.vapourPressure).toBeCloseTo(2000, 6); // √(1000 × 4000)
    expect(p.extrapolated).toEqual([]);
  });

  it('gives NaN, flagged, when no row is usable, without throwing', () => {
    const p = liquidProperties(user([row(300, -1, 1e-3, 1000)]), 300);
    expect(Number.isNaN(p.density)).toBe(true);
    expect(p.extrapolated).toEqual(['density']);
    expect(p.viscosity).toBe(1e-3);
    const empty = liquidProperties(user([]), 300);
    expect(empty.extrapolated).toEqual(['density', 'viscosity', 'vapourPressure']);
  });
});
