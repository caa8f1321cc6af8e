import { describe, expect, it } from 'vitest';
import {
  ISA_AIR_GAS_CONSTANT,
  ISA_SEA_LEVEL_PRESSURE,
  ISA_SEA_LEVEL_TEMPERATURE,
  ISA_STANDARD_GRAVITY,
  ISA_TEMPERATURE_GRADIENT,
  atmosphereInputProblem,
  geopotentialAltitude,
  isaPressure,
  isaPressureAtGeopotentialAltitude,
  siteAtmosphericPressure,
} from '../../src/lib/physics/atmosphere';

// ISA table, ISO 2533:1975 / ICAO Doc 7488 (Manual of the ICAO Standard Atmosphere): pressure
// at geopotential altitude, printed to six significant digits (values from memory; each is
// also checked against an independent integration of the hydrostatic equation below).
const ISA_TABLE = [
  { H: 0, p: 101325, digits: 6 },
  { H: 1000, p: 89874.6, digits: 6 },
  { H: 2000, p: 79495.2, digits: 6 },
  { H: 11000, p: 22632, digits: 5 },
];

function expectToTableDigits(actual: number, printed: number, digits: number) {
  const lastDigit = 10 ** (Math.floor(Math.log10(Math.abs(printed))) - digits + 1);
  expect(Math.abs(actual - printed)).toBeLessThanOrEqual(0.5 * lastDigit * (1 + 1e-9));
}

/**
 * Hydrostatic equation dp/dH = −p·gn/(R·T(H)) with T = T0 + β·H (the definition the ISA
 * pressure equation comes from, ISO 2533:1975), integrated by classical Runge–Kutta.
 */
function integrateHydrostatic(H: number, steps = 2000): number {
  const f = (h: number, p: number) =>
    (-p * ISA_STANDARD_GRAVITY) /
    (ISA_AIR_GAS_CONSTANT * (ISA_SEA_LEVEL_TEMPERATURE + ISA_TEMPERATURE_GRADIENT * h));
  const dh = H / steps;
  let p = ISA_SEA_LEVEL_PRESSURE;
  for (let k = 0; k < steps; k++) {
    const h = k * dh;
    const k1 = f(h, p);
    const k2 = f(h + dh / 2, p + (dh / 2) * k1);
    const k3 = f(h + dh / 2, p + (dh / 2) * k2);
    const k4 = f(h + dh, p + dh * k3);
    p += (dh / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
  }
  return p;
}

describe('ISA pressure — ISO 2533:1975 troposphere', () => {
  it.each(ISA_TABLE)('ISO 2533 / ICAO Doc 7488 table: p(H = $H m) = $p Pa', ({ H, p, digits }) => {
    expectToTableDigits(isaPressureAtGeopotentialAltitude(H), p, digits);
  });

  it.each(ISA_TABLE)(
    'the table value at H = $H m agrees with the hydrostatic equation',
    ({ H, p, digits }) => {
      expectToTableDigits(integrateHydrostatic(H), p, digits);
    },
  );

  it('equals the integrated hydrostatic equation to 1e-10 over −2 km to 11 km', () => {
    for (let H = -2000; H <= 11000; H += 500) {
      const p = integrateHydrostatic(H);
      expect(Math.abs(isaPressureAtGeopotentialAltitude(H) - p) / p).toBeLessThan(1e-10);
    }
  });

  it('agrees with the molar barometric formula, exponent g0·M/(R*·L) = 5.25588 (from memory)', () => {
    // U.S. Standard Atmosphere 1976 form with M = 0.0289644 kg/mol, R* = 8.31432 J/(mol·K).
    const exponent = (9.80665 * 0.0289644) / (8.31432 * 0.0065);
    expect(exponent).toBeCloseTo(5.25588, 5);
    for (const H of [0, 500, 1000, 2000, 3000]) {
      const p = 101325 * (1 - (0.0065 * H) / 288.15) ** exponent;
      expect(Math.abs(isaPressureAtGeopotentialAltitude(H) - p) / p).toBeLessThan(1e-6);
    }
  });

  it('converts site elevation (geometric) to geopotential altitude, H = r·z/(r + z)', () => {
    expect(geopotentialAltitude(0)).toBe(0);
    // ISO 2533:1975 uses r = 6 356 766 m; at 2000 m the two heights differ by about 0.63 m.
    expect(2000 - geopotentialAltitude(2000)).toBeCloseTo(0.629, 3);
    expect(isaPressure(2000)).toBe(isaPressureAtGeopotentialAltitude(geopotentialAltitude(2000)));
    // The conversion moves the pressure at 1000 m by under 2 Pa (0.002 %).
    expect(Math.abs(isaPressure(1000) - 89874.6)).toBeLessThan(2);
  });

  it('is held at the ends of its range and never returns NaN (documented guards)', () => {
    expect(isaPressure(NaN)).toBe(ISA_SEA_LEVEL_PRESSURE);
    expect(isaPressure(Infinity)).toBeCloseTo(isaPressureAtGeopotentialAltitude(11000), 6);
    expect(isaPressure(-Infinity)).toBeCloseTo(isaPressureAtGeopotentialAltitude(-2000), 6);
    expect(isaPressure(1e9)).toBeCloseTo(isaPressureAtGeopotentialAltitude(11000), 6);
    expect(isaPressure(-1e9)).toBeCloseTo(isaPressureAtGeopotentialAltitude(-2000), 6);
    expect(isaPressureAtGeopotentialAltitude(NaN)).toBe(ISA_SEA_LEVEL_PRESSURE);
    let previous = Infinity;
    for (let z = -3000; z <= 12000; z += 250) {
      const p = isaPressure(z);
      expect(p).toBeLessThanOrEqual(previous);
      previous = p;
    }
  });
});

describe('siteAtmosphericPressure', () => {
  it('uses the typed override when it is not null', () => {
    expect(
      siteAtmosphericPressure({ siteElevation: 1500, atmosphericPressureOverride: 95000 }),
    ).toBe(95000);
  });

  it('uses the ISA pressure at the site elevation when the override is null', () => {
    expect(
      siteAtmosphericPressure({ siteElevation: 1500, atmosphericPressureOverride: null }),
    ).toBe(isaPressure(1500));
    expect(siteAtmosphericPressure({ siteElevation: 0, atmosphericPressureOverride: null })).toBe(
      101325,
    );
  });

  it('falls back to ISA for an unusable override and says so', () => {
    for (const bad of [0, -5, NaN, Infinity]) {
      const settings = { siteElevation: 300, atmosphericPressureOverride: bad };
      expect(siteAtmosphericPressure(settings)).toBe(isaPressure(300));
      expect(atmosphereInputProblem(settings)?.field).toBe('atmosphericPressureOverride');
    }
  });

  it('reports a NaN or out-of-range site elevation and nothing for usable settings', () => {
    const problem = (siteElevation: number, atmosphericPressureOverride: number | null = null) =>
      atmosphereInputProblem({ siteElevation, atmosphericPressureOverride });
    expect(problem(NaN)).toMatchObject({ field: 'siteElevation' });
    expect(problem(NaN)?.message).toMatch(/Sea-level pressure/);
    for (const z of [12000, -2500, Infinity, -Infinity]) {
      expect(problem(z)).toMatchObject({ field: 'siteElevation' });
      expect(problem(z)?.message).toMatch(/outside/);
    }
    expect(problem(850)).toBeNull();
    expect(problem(-400)).toBeNull();
    expect(problem(12000, 20000)).toBeNull();
  });
});
