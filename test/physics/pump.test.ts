import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  STANDARD_GRAVITY,
  bestEfficiencyFlow,
  fitCurve,
  pumpCurveWarnings,
  pumpEfficiency,
  pumpHead,
  pumpHeadSlope,
  pumpNpshRequired,
  shaftPower,
  type CurvePoint,
} from '../../src/lib/physics/pump';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** Points sampled from a known polynomial c0 + c1·Q + c2·Q². */
function sample(c: [number, number, number], flows: number[]): CurvePoint[] {
  return flows.map((flow) => ({ flow, value: c[0] + c[1] * flow + c[2] * flow * flow }));
}

// A test curve shaped like a small end-suction pump's (invented for these checks only).
const HEAD: CurvePoint[] = [
  { flow: 0, value: 52.1 },
  { flow: 0.01, value: 51.6 },
  { flow: 0.02, value: 49.8 },
  { flow: 0.03, value: 46.9 },
  { flow: 0.04, value: 42.3 },
  { flow: 0.05, value: 36.8 },
];
const EFFICIENCY: CurvePoint[] = [
  { flow: 0, value: 0 },
  { flow: 0.01, value: 0.42 },
  { flow: 0.02, value: 0.63 },
  { flow: 0.03, value: 0.72 },
  { flow: 0.04, value: 0.7 },
  { flow: 0.05, value: 0.61 },
];

describe('fitCurve', () => {
  it('recovers a quadratic exactly from points on it (least squares reproduces its own degree)', () => {
    const c: [number, number, number] = [48, 120, -9000];
    const fit = fitCurve(sample(c, [0, 0.01, 0.02, 0.03, 0.04, 0.05, 0.06]));
    expect(fit.form).toBe('quadratic');
    expect(fit.coefficients[0]).toBeCloseTo(48, 9);
    expect(rel(fit.coefficients[1], 120)).toBeLessThan(1e-9);
    expect(rel(fit.coefficients[2], -9000)).toBeLessThan(1e-9);
  });

  it('matches numpy.polyfit(Q, H, 2) on scattered points (Debian python3-numpy 1.24.2)', () => {
    // np.polyfit([0,.01,.02,.03,.04,.05],[52.1,51.6,49.8,46.9,42.3,36.8],2)
    // → [-6464.28571429, 16.64285714, 52.09285714]
    const fit = fitCurve(HEAD);
    expect(fit.coefficients[0]).toBeCloseTo(52.09285714, 7);
    expect(fit.coefficients[1]).toBeCloseTo(16.64285714, 6);
    expect(fit.coefficients[2]).toBeCloseTo(-6464.28571429, 5);
  });

  it('three points: the parabola through them', () => {
    const pts = [
      { flow: 0.01, value: 40 },
      { flow: 0.02, value: 38 },
      { flow: 0.04, value: 30 },
    ];
    const fit = fitCurve(pts);
    for (const p of pts) expect(pumpHead(fit, p.flow, 1)).toBeCloseTo(p.value, 9);
  });

  it('two distinct flows: a straight line; one: a constant; none: empty', () => {
    const line = fitCurve([
      { flow: 0.01, value: 40 },
      { flow: 0.03, value: 30 },
    ]);
    expect(line.form).toBe('linear');
    expect(pumpHead(line, 0.02, 1)).toBeCloseTo(35, 10);
    expect(pumpHeadSlope(line, 0.02, 1)).toBeCloseTo(-500, 8);

    const repeated = fitCurve([
      { flow: 0.01, value: 40 },
      { flow: 0.01, value: 42 },
      { flow: 0.03, value: 30 },
    ]);
    expect(repeated.form).toBe('linear');
    expect(pumpHead(repeated, 0.01, 1)).toBeCloseTo(41, 10); // least squares: the mean at a repeated flow

    const constant = fitCurve([{ flow: 0.02, value: 3.5 }]);
    expect(constant.form).toBe('constant');
    expect(pumpNpshRequired(constant, 0.05, 1)).toBe(3.5);

    const empty = fitCurve([]);
    expect(empty.form).toBe('empty');
    expect(empty.flowRange).toBeNull();
    expect(pumpHead(empty, 0.01, 1)).toBeNaN();
    expect(bestEfficiencyFlow(empty, 1)).toBeNull();
  });

  it('ignores non-finite points', () => {
    const fit = fitCurve([...HEAD, { flow: NaN, value: 10 }]);
    expect(fit.pointCount).toBe(HEAD.length);
    expect(fit.coefficients[0]).toBeCloseTo(52.09285714, 7);
  });
});

describe('affinity laws (Karassik, Pump Handbook — from memory): Q ∝ N, H ∝ N², P ∝ N³', () => {
  const head = fitCurve(HEAD);
  const eff = fitCurve(EFFICIENCY);

  it('head and NPSHr at corresponding points scale with s²; efficiency is unchanged', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 1.3, noNaN: true }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        (s, q) => {
          const h1 = pumpHead(head, q, 1);
          expect(pumpHead(head, s * q, s)).toBeCloseTo(s * s * h1, 9);
          expect(pumpNpshRequired(head, s * q, s)).toBeCloseTo(s * s * h1, 9);
          expect(pumpEfficiency(eff, s * q, s)).toBeCloseTo(pumpEfficiency(eff, q, 1), 12);
        },
      ),
    );
  });

  it('shaft power at corresponding points scales with s³', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 1.3, noNaN: true }),
        fc.double({ min: 0.01, max: 0.05, noNaN: true }),
        (s, q) => {
          const p1 = shaftPower(998, q, pumpHead(head, q, 1), pumpEfficiency(eff, q, 1));
          const qs = s * q;
          const ps = shaftPower(998, qs, pumpHead(head, qs, s), pumpEfficiency(eff, qs, s));
          expect(rel(ps, s ** 3 * p1)).toBeLessThan(1e-9);
        },
      ),
    );
  });

  it('efficiency of a stopped pump is NaN', () => {
    expect(pumpEfficiency(eff, 0.01, 0)).toBeNaN();
  });
});

describe('pumpHeadSlope', () => {
  it('matches a central difference of pumpHead', () => {
    const fit = fitCurve(HEAD);
    for (const s of [0.7, 1, 1.2]) {
      for (const q of [0, 0.012, 0.033, 0.06]) {
        const h = 1e-6;
        const fd = (pumpHead(fit, q + h, s) - pumpHead(fit, q - h, s)) / (2 * h);
        expect(pumpHeadSlope(fit, q, s)).toBeCloseTo(fd, 4);
      }
    }
  });
});

describe('bestEfficiencyFlow', () => {
  it('the vertex of the fitted efficiency parabola, matching numpy.polyfit (−b/2c = 0.0341758)', () => {
    const eff = fitCurve(EFFICIENCY);
    expect(bestEfficiencyFlow(eff, 1)).toBeCloseTo(0.03417579, 7);
    expect(bestEfficiencyFlow(eff, 0.8)).toBeCloseTo(0.8 * 0.03417579, 7);
  });

  it('the better end when the vertex is outside the points or the curve is a line', () => {
    const rising = fitCurve(sample([0.2, 30, -200], [0.01, 0.02, 0.03])); // vertex at 0.075
    expect(bestEfficiencyFlow(rising, 1)).toBe(0.03);
    const line = fitCurve([
      { flow: 0.01, value: 0.7 },
      { flow: 0.03, value: 0.5 },
    ]);
    expect(bestEfficiencyFlow(line, 1)).toBe(0.01);
  });
});

describe('shaftPower = ρ g Q H / η (hydraulic power over efficiency)', () => {
  it('independent computation: 1000 kg/m³, 0.1 m³/s, 50 m, η 0.75', () => {
    // 1000 × 9.80665 × 0.1 × 50 / 0.75 = 65377.666… W (g: standard gravity, NIST SP 811)
    expect(shaftPower(1000, 0.1, 50, 0.75)).toBeCloseTo(65377.6667, 3);
    expect(STANDARD_GRAVITY).toBe(9.80665);
  });

  it('NaN for an efficiency that is not positive', () => {
    expect(shaftPower(1000, 0.1, 50, 0)).toBeNaN();
    expect(shaftPower(1000, 0.1, 50, -0.5)).toBeNaN();
    expect(shaftPower(1000, 0.1, 50, NaN)).toBeNaN();
  });
});

describe('pumpCurveWarnings', () => {
  const codes = (pts: CurvePoint[], kind?: 'head' | 'npshr' | 'efficiency') =>
    pumpCurveWarnings(pts, kind).map((w) => w.code);

  it('a sound head curve has no warnings', () => {
    expect(pumpCurveWarnings(HEAD)).toEqual([]);
    expect(pumpCurveWarnings(EFFICIENCY, 'efficiency')).toEqual([]);
  });

  it('head rising with flow over most of the range', () => {
    const rising = sample([30, 200, 1000], [0, 0.01, 0.02, 0.03]);
    expect(codes(rising)).toEqual(['rising-head']);
    // NPSHr normally rises with flow: no warning
    expect(codes(rising, 'npshr')).toEqual([]);
    // a small droop near shut-off is normal and not flagged
    const droop = sample([40, 100, -8000], [0, 0.01, 0.02, 0.03, 0.04]);
    expect(codes(droop)).toEqual([]);
  });

  it('negative values, duplicate flows, non-numbers, efficiency above one, few points', () => {
    const w = pumpCurveWarnings([
      { flow: -0.01, value: 40 },
      { flow: 0.01, value: -2 },
      { flow: 0.01, value: 30 },
      { flow: NaN, value: 1 },
    ]);
    expect(w.map((x) => [x.code, x.point])).toEqual([
      ['negative-flow', 0],
      ['negative-value', 1],
      ['duplicate-flow', 2],
      ['not-a-number', 3],
      ['few-points', undefined],
    ]);
    expect(w[2].message).toBe('Point 3 of the head curve repeats the flow of point 2');
    expect(codes([{ flow: 0.01, value: 72 }], 'efficiency')).toEqual([
      'efficiency-above-one',
      'few-points',
    ]);
    expect(codes([])).toEqual(['no-points']);
  });
});
