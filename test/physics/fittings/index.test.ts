import { describe, expect, it } from 'vitest';
import { createNode } from '../../../src/lib/model/defaults';
import type { FittingType, Vessel } from '../../../src/lib/model/types';
import {
  DARBY_3K,
  darby3K,
  ENTRANCE_K,
  EXIT_K,
  fittingLossCoefficient,
  GEOMETRIC_FITTINGS,
  HOOPER_2K,
  lossCoefficientSource,
} from '../../../src/lib/physics/fittings';

const ID = 0.0525; // m, 2" Sch 40 (ASME B36.10M)
const ID_INCHES = 0.0525 / 0.0254;

const TABLE_FITTINGS: FittingType[] = [
  'elbow-90-standard',
  'elbow-90-long-radius',
  'elbow-45-standard',
  'elbow-45-long-radius',
  'tee-run',
  'tee-branch',
  'gate-valve',
  'globe-valve',
  'ball-valve',
  'butterfly-valve',
  'swing-check-valve',
  'lift-check-valve',
];

describe('fittingLossCoefficient', () => {
  it('returns the fixed K for the fixed method, whatever the fitting', () => {
    expect(fittingLossCoefficient('globe-valve', 'fixed', 1e5, ID, 7.3)).toBe(7.3);
    expect(fittingLossCoefficient('reducer', 'fixed', 1e5, ID, 0.2)).toBe(0.2);
  });

  it('applies Hooper 2-K with the diameter in inches (Hooper 1981: K1/Re + K∞(1 + 1/D))', () => {
    const k = fittingLossCoefficient('elbow-90-standard', '2K', 5e4, ID, 99);
    expect(k).toBeCloseTo(800 / 5e4 + 0.25 * (1 + 1 / ID_INCHES), 12);
  });

  it('applies Darby 3-K with the diameter in inches (Darby 2001: K1/Re + Ki(1 + Kd/D^0.3))', () => {
    const k = fittingLossCoefficient('gate-valve', '3K', 5e4, ID, 99);
    expect(k).toBeCloseTo(300 / 5e4 + 0.037 * (1 + 3.9 / ID_INCHES ** 0.3), 12);
    expect(k).toBe(darby3K(DARBY_3K['gate-valve']!, 5e4, ID));
  });

  it('falls back to Hooper’s butterfly valve under 3-K (not in Darby’s table)', () => {
    expect(DARBY_3K['butterfly-valve']).toBeUndefined();
    const k = fittingLossCoefficient('butterfly-valve', '3K', 5e4, ID, 99);
    expect(k).toBeCloseTo(800 / 5e4 + 0.25 * (1 + 1 / ID_INCHES), 12);
    expect(lossCoefficientSource('butterfly-valve', '3K')).toMatch(/Not in Darby/);
  });

  it('uses the typed K for strainers and flow meters under 2-K and 3-K (in neither table)', () => {
    for (const method of ['2K', '3K'] as const) {
      expect(fittingLossCoefficient('strainer', method, 5e4, ID, 1.8)).toBe(1.8);
      expect(fittingLossCoefficient('flow-meter', method, 5e4, ID, 0.4)).toBe(0.4);
      expect(lossCoefficientSource('strainer', method)).toMatch(/fixed K as typed/);
    }
  });

  it('has a 2-K row for every table fitting and a 3-K row for all but the butterfly valve', () => {
    for (const type of TABLE_FITTINGS) {
      expect(HOOPER_2K[type]).toBeDefined();
      if (type !== 'butterfly-valve') expect(DARBY_3K[type]).toBeDefined();
    }
  });

  it('stays finite at zero and reverse flow', () => {
    for (const re of [0, -1e4, 1e-300]) {
      for (const method of ['2K', '3K'] as const) {
        const k = fittingLossCoefficient('elbow-90-standard', method, re, ID, 0);
        expect(Number.isFinite(k)).toBe(true);
        expect(k).toBeGreaterThan(0);
      }
    }
    expect(fittingLossCoefficient('globe-valve', '3K', -1e4, ID, 0)).toBe(
      fittingLossCoefficient('globe-valve', '3K', 1e4, ID, 0),
    );
  });

  it('refuses table methods for geometric fittings and a non-positive diameter', () => {
    for (const type of GEOMETRIC_FITTINGS) {
      expect(() => fittingLossCoefficient(type, '2K', 1e5, ID, 0)).toThrow(/diameters/);
    }
    expect(() => fittingLossCoefficient('gate-valve', '3K', 1e5, 0, 0)).toThrow(/positive/);
  });
});

describe('entrance and exit', () => {
  it('uses K = 0.5 for a square-edged entrance and K = 1.0 for an exit (Crane TP-410 — from memory)', () => {
    expect(ENTRANCE_K).toBe(0.5);
    expect(EXIT_K).toBe(1.0);
  });

  it('are the K of a new vessel’s nozzles (model defaults use them)', () => {
    const vessel = createNode('vessel', { x: 0, y: 0 }, 'V') as Vessel;
    expect(vessel.nozzles.length).toBeGreaterThan(0);
    for (const n of vessel.nozzles) expect([n.entranceK, n.exitK]).toEqual([ENTRANCE_K, EXIT_K]);
  });
});
