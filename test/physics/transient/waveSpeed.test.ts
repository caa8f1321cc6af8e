import { describe, expect, it } from 'vitest';
import {
  closureHeadRise,
  criticalTime,
  findWallElasticity,
  joukowskyHead,
  kortewegWaveSpeed,
  restraintFactor,
  rigidPipeWaveSpeed,
  WALL_ELASTICITY,
} from '../../../src/lib/physics/transient';
import { PIPE_MATERIALS } from '../../../src/lib/physics/materials';

const steel4in = {
  bulkModulus: 2.19e9,
  density: 998,
  diameter: 0.1023, // NPS 4 Sch 40 inner diameter (ASME B36.10M: 114.3 − 2·6.02 mm)
  wall: 0.00602,
  youngsModulus: 207e9,
  poisson: 0.3,
  restraint: 'anchored-throughout' as const,
};

describe('Korteweg wave speed (Wylie & Streeter 1993, §2.3)', () => {
  it('matches a hand calculation of the formula for NPS 4 Sch 40 steel, water', () => {
    // Hand calculation (python): c1 = 2e/D(1+μ) + D(1−μ²)/(D+e) = 1.012427,
    // a = √((K/ρ)/(1 + c1·K·D/(E·e))) = 1362.525 m/s.
    expect(restraintFactor('anchored-throughout', 0.1023, 0.00602, 0.3)).toBeCloseTo(1.012427, 5);
    expect(kortewegWaveSpeed(steel4in)).toBeCloseTo(1362.525, 2);
  });

  it('lies in the 1200–1400 m/s band quoted for water in steel process pipe (common practice)', () => {
    const a = kortewegWaveSpeed(steel4in);
    expect(a).toBeGreaterThan(1200);
    expect(a).toBeLessThan(1400);
  });

  it('tends to the rigid-pipe speed √(K/ρ) as the wall gets stiff (limit of the formula)', () => {
    const a = kortewegWaveSpeed({ ...steel4in, youngsModulus: 1e20 });
    expect(a / rigidPipeWaveSpeed(2.19e9, 998)).toBeCloseTo(1, 9);
  });

  it('thin-walled limit: c1 → 1 − μ/2, 1 − μ², 1 (Wylie & Streeter 1993, §2.3)', () => {
    expect(restraintFactor('anchored-upstream', 1, 1e-9, 0.3)).toBeCloseTo(0.85, 6);
    expect(restraintFactor('anchored-throughout', 1, 1e-9, 0.3)).toBeCloseTo(0.91, 6);
    expect(restraintFactor('expansion-joints', 1, 1e-9, 0.3)).toBeCloseTo(1, 6);
  });

  it('a soft plastic wall gives a much slower wave than steel (the formula, E 3 vs 207 GPa)', () => {
    const pvc = kortewegWaveSpeed({ ...steel4in, youngsModulus: 3e9, poisson: 0.46 });
    expect(pvc).toBeLessThan(500);
    expect(pvc).toBeGreaterThan(200);
  });

  it('is NaN, not a number made up, for impossible inputs', () => {
    expect(kortewegWaveSpeed({ ...steel4in, wall: 0 })).toBeNaN();
    expect(kortewegWaveSpeed({ ...steel4in, bulkModulus: NaN })).toBeNaN();
  });

  it('every pipe material has a wall elasticity with its source', () => {
    for (const key of Object.keys(PIPE_MATERIALS)) {
      const w = findWallElasticity(key);
      expect(w, key).toBeDefined();
      expect(w!.source.length).toBeGreaterThan(10);
    }
    expect(Object.keys(WALL_ELASTICITY).sort()).toEqual(Object.keys(PIPE_MATERIALS).sort());
  });
});

describe('hand formulas (Joukowsky; Michaud, as quoted in Wylie & Streeter 1993)', () => {
  it('Joukowsky ΔH = a·Δv/g', () => {
    // 1000 m/s × 1 m/s / 9.80665 m/s² = 101.97 m (arithmetic of the formula)
    expect(joukowskyHead(1000, 1)).toBeCloseTo(101.97, 2);
  });

  it('2L/a over a reach of two pipes and the slow-closure estimate', () => {
    const reach = [
      { length: 600, waveSpeed: 1200, velocity: 2 },
      { length: 400, waveSpeed: 1000, velocity: 1 },
    ];
    expect(criticalTime(reach)).toBeCloseTo(2 * (0.5 + 0.4), 12);
    // faster than 2L/a: Joukowsky of the pipe at the valve
    expect(closureHeadRise(reach, 1000, 1, 1)).toBeCloseTo(joukowskyHead(1000, 1), 9);
    // slower: 2·Σ L·v/(g·tc) = 2·(1200 + 400)/(9.80665·10) = 32.63 m
    expect(closureHeadRise(reach, 1000, 1, 10)).toBeCloseTo(32.63, 2);
  });
});
