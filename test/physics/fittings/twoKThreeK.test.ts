import { describe, expect, it } from 'vitest';
import {
  DARBY_3K,
  darby3K,
  HOOPER_2K,
  hooper2K,
  METRES_PER_INCH,
} from '../../../src/lib/physics/fittings';

const TWO_INCH_SCH40_ID = 2.067 * METRES_PER_INCH; // ASME B36.10M, 2" Sch 40

function relativeError(value: number, reference: number): number {
  return Math.abs(value - reference) / Math.abs(reference);
}

describe('Hooper 2-K method (Hooper, Chem. Eng., 24 Aug 1981)', () => {
  it('evaluates K = K1/Re + K∞(1 + 1/D[in]) with D converted from metres to inches', () => {
    // Standard globe valve (K1 = 1500, K∞ = 4.0) in a 2.000 in bore at Re = 1e4:
    // 1500/1e4 + 4.0 × (1 + 1/2) = 6.15 by hand. The same number is the documented example of
    // the `fluids` reference library, Hooper2K(Di=2, Re=1e4, name='Valve, Globe, Standard').
    const k = hooper2K(HOOPER_2K['globe-valve']!, 1e4, 2 * METRES_PER_INCH);
    expect(k).toBeCloseTo(6.15, 12);
  });

  it('uses K1 at low Re and K∞ at high Re in large pipe, as Hooper describes', () => {
    const elbow = HOOPER_2K['elbow-90-long-radius']!;
    // Re → ∞ in a 1 in bore: K = 2 K∞ (Hooper 1981: K∞ is the large-fitting, high-Re value).
    expect(hooper2K(elbow, Infinity, METRES_PER_INCH)).toBeCloseTo(2 * elbow.kInfinity, 12);
    // Large pipe, high Re: K → K∞ (1 + 1/36).
    expect(hooper2K(elbow, Infinity, 36 * METRES_PER_INCH)).toBeCloseTo(
      elbow.kInfinity * (1 + 1 / 36),
      12,
    );
    // Laminar: the K1/Re term dominates (Re = 100: 800/100 = 8).
    expect(hooper2K(elbow, 100, 2 * METRES_PER_INCH)).toBeCloseTo(8 + 0.2 * 1.5, 12);
  });

  it('gives a 2" welded 90° elbow near Crane TP-410’s 20 fT = 0.38 at high Re (Crane TP-410 A-29, fT = 0.019 for 2" — from memory)', () => {
    const k = hooper2K(HOOPER_2K['elbow-90-standard']!, 1e7, TWO_INCH_SCH40_ID);
    expect(relativeError(k, 20 * 0.019)).toBeLessThan(0.05);
  });
});

describe('Darby 3-K method (Darby, Chem. Eng., April 2001)', () => {
  it('evaluates K = K1/Re + Ki(1 + Kd/D[in]^0.3) with D converted from metres to inches', () => {
    // The `fluids` reference library documents Darby3K(NPS=2, Re=1e4, 45° angle valve
    // K1 = 950, Ki = 0.25, Kd = 4) = 1.1572523963562353 and Darby3K(NPS=12, Re=1e4, same
    // constants) = 0.819510280626355.
    const angleValve = { k1: 950, ki: 0.25, kd: 4 };
    expect(darby3K(angleValve, 1e4, 2 * METRES_PER_INCH)).toBeCloseTo(1.1572523963562353, 12);
    expect(darby3K(angleValve, 1e4, 12 * METRES_PER_INCH)).toBeCloseTo(0.819510280626355, 12);
  });

  it('gives a 2" standard 90° elbow at high Re close to the tabulated Crane value (Crane TP-410: r/d = 1 bend 20 fT, fT = 0.019 — from memory)', () => {
    // Darby's table (flanged/welded r/D = 1: 800, 0.091, 4.0) at Re = 1e7 in 2" Sch 40:
    // 0.091 × (1 + 4/2.067^0.3) = 0.3838 by hand.
    const k = darby3K(DARBY_3K['elbow-90-standard']!, 1e7, TWO_INCH_SCH40_ID);
    expect(k).toBeCloseTo(800 / 1e7 + 0.091 * (1 + 4 / Math.pow(2.067, 0.3)), 12);
    expect(relativeError(k, 20 * 0.019)).toBeLessThan(0.05);
  });

  it('falls with size and with Reynolds number, toward Ki in large pipe (Darby 2001)', () => {
    const elbow = DARBY_3K['elbow-90-standard']!;
    const small = darby3K(elbow, 1e6, 2 * METRES_PER_INCH);
    const large = darby3K(elbow, 1e6, 36 * METRES_PER_INCH);
    expect(large).toBeLessThan(small);
    expect(darby3K(elbow, 1e3, 2 * METRES_PER_INCH)).toBeGreaterThan(small);
    // Re → ∞: only Ki (1 + Kd/D^0.3) remains.
    expect(darby3K(elbow, Infinity, 36 * METRES_PER_INCH)).toBeCloseTo(
      elbow.ki * (1 + elbow.kd / Math.pow(36, 0.3)),
      12,
    );
  });

  it('holds Darby’s table rows as checked against the `fluids` transcription of Darby (2001)', () => {
    expect(DARBY_3K['gate-valve']).toMatchObject({ k1: 300, ki: 0.037, kd: 3.9 });
    expect(DARBY_3K['globe-valve']).toMatchObject({ k1: 1500, ki: 1.7, kd: 3.6 });
    expect(DARBY_3K['lift-check-valve']).toMatchObject({ k1: 2000, ki: 2.85, kd: 3.8 });
    expect(HOOPER_2K['swing-check-valve']).toMatchObject({ k1: 1500, kInfinity: 1.5 });
  });
});

/**
 * Every row Headroute uses, against a transcription of the papers' tables: the `Hooper` and
 * `Darby` dictionaries of the `fluids` library as Debian ships it (python3-fluids 1.0.22,
 * fluids/fittings.py), which transcribe Hooper (1981) Table 1 and Darby (2001) Table 1. The
 * numbers below were read from that package, not from this project's code.
 */
describe('each Hooper and Darby row against the python3-fluids 1.0.22 transcription', () => {
  const hooper: Array<[keyof typeof HOOPER_2K, string, number, number]> = [
    ['elbow-90-standard', 'Elbow, 90°, Standard (R/D = 1), Flanged/welded', 800, 0.25],
    ['elbow-90-long-radius', 'Elbow, 90°, Long-radius (R/D = 1.5), All types', 800, 0.2],
    ['elbow-45-standard', 'Elbow, 45°, Standard (R/D = 1), All types', 500, 0.2],
    ['elbow-45-long-radius', 'Elbow, 45°, Long-radius (R/D 1.5), All types', 500, 0.15],
    ['tee-run', 'Tee, Through, Flanged or welded', 150, 0.05],
    ['tee-branch', 'Elbow, Elbow, Standard, Flanged/welded (tee used as elbow)', 800, 0.8],
    ['gate-valve', 'Valve, Gate, Full line size, Beta = 1', 300, 0.1],
    ['ball-valve', 'Valve, Gate, Full line size, Beta = 1 (gate, ball, plug row)', 300, 0.1],
    ['globe-valve', 'Valve, Globe, Standard', 1500, 4.0],
    ['butterfly-valve', 'Valve, Butterfly,', 800, 0.25],
    ['swing-check-valve', 'Valve, Check, Swing', 1500, 1.5],
    ['lift-check-valve', 'Valve, Check, Lift', 2000, 10.0],
  ];
  it.each(hooper)('Hooper %s: %s (K1 = %d, K∞ = %d)', (type, _row, k1, kInfinity) => {
    expect(HOOPER_2K[type]).toMatchObject({ k1, kInfinity });
  });

  const darby: Array<[keyof typeof DARBY_3K, string, number, number, number]> = [
    ['elbow-90-standard', 'Elbow, 90°, flanged, welded, bends, (r/D = 1)', 800, 0.091, 4.0],
    ['elbow-90-long-radius', 'Elbow, 90°, threaded, long radius, (r/D = 1.5)', 800, 0.071, 4.2],
    ['elbow-45-standard', 'Elbow, 45°, threaded standard, (r/D = 1)', 500, 0.071, 4.2],
    ['elbow-45-long-radius', 'Elbow, 45°, long radius, (r/D = 1.5)', 500, 0.052, 4.0],
    ['tee-run', 'Tee, Run-through, flanged, (r/D = 1)', 150, 0.05, 4.0],
    ['tee-branch', 'Tee, Through-branch, (as elbow), flanged, (r/D = 1)', 800, 0.28, 4.0],
    ['gate-valve', 'Valve, Gate valve, standard, β = 1', 300, 0.037, 3.9],
    ['ball-valve', 'Valve, Ball valve, standard, β = 1', 300, 0.017, 3.5],
    ['globe-valve', 'Valve, Globe valve, standard, β = 1', 1500, 1.7, 3.6],
    ['swing-check-valve', 'Valve, Swing check', 1500, 0.46, 4.0],
    ['lift-check-valve', 'Valve, Lift check', 2000, 2.85, 3.8],
  ];
  it.each(darby)('Darby %s: %s (K1 = %d, Ki = %d, Kd = %d)', (type, _row, k1, ki, kd) => {
    expect(DARBY_3K[type]).toMatchObject({ k1, ki, kd });
  });

  it('Darby tee run-through at Re = 1e5 in 4" (python3-fluids 1.0.22 Darby3K gives 0.18345079108)', () => {
    // fluids.fittings.Darby3K(NPS=4, Re=1e5, name='Tee, Run-through, flanged, (r/D = 1)').
    expect(darby3K(DARBY_3K['tee-run']!, 1e5, 4 * METRES_PER_INCH)).toBeCloseTo(
      0.18345079107728943,
      10,
    );
  });

  it('Darby has no butterfly valve row; Hooper has every type Darby has', () => {
    expect(DARBY_3K['butterfly-valve']).toBeUndefined();
    for (const type of Object.keys(DARBY_3K)) expect(HOOPER_2K[type as never]).toBeDefined();
  });
});
