import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  LIQUID_LIBRARY,
  findLibraryLiquid,
  liquidProperties,
  validateLiquidChoice,
} from '../../../src/lib/physics/liquids';
import { dippr101, dippr105 } from '../../../src/lib/physics/liquids/correlations';
import {
  waterDensity,
  waterSaturationPressure,
  waterViscosity,
} from '../../../src/lib/physics/water';

const C = 273.15;

describe('water through the dispatcher', () => {
  it.each([5, 20, 60, 80, 150])('agrees exactly with the water module at %f °C', (tC) => {
    const t = tC + C;
    const p = liquidProperties({ kind: 'library', id: 'water' }, t);
    expect(p.vapourPressure).toBe(waterSaturationPressure(t));
    expect(p.density).toBe(waterDensity(t));
    expect(p.viscosity).toBe(waterViscosity(t, waterDensity(t)));
    expect(p.criticalPressure).toBe(22.064e6); // IAPWS R7-97(2012), Eq. 4
    expect(p.extrapolated).toEqual([]);
  });

  // Reference: iapws 1.5.2 (Debian python3-iapws): _PSat_T, _Region1 at max(0.101325 MPa, ps),
  // _Viscosity — values printed by /usr/bin/python3 while writing this test.
  it.each([
    [293.15, 2339.214766776897, 998.2060924679477, 0.00100159685462303],
    [333.15, 19945.801924678744, 983.2106104649623, 0.0004660432080668163],
    [353.15, 47414.71992637833, 971.8028995563232, 0.0003540581487442565],
  ])('matches iapws 1.5.2 at %f K', (t, ps, rho, mu) => {
    const p = liquidProperties({ kind: 'library', id: 'water' }, t);
    expect(Math.abs(p.vapourPressure / ps - 1)).toBeLessThan(1e-6);
    expect(Math.abs(p.density / rho - 1)).toBeLessThan(1e-6);
    expect(Math.abs(p.viscosity / mu - 1)).toBeLessThan(1e-6);
  });

  it('flags water outside IF97 region 1 and region 4', () => {
    const hot = liquidProperties({ kind: 'library', id: 'water' }, 630);
    expect(hot.extrapolated).toContain('density');
    expect(hot.extrapolated).not.toContain('vapourPressure');
    const frozen = liquidProperties({ kind: 'library', id: 'water' }, 263.15);
    expect(frozen.extrapolated).toEqual(['density', 'viscosity', 'vapourPressure']);
  });
});

describe('extrapolation flagging', () => {
  it('flags only the property whose range is left, and still returns its correlation value', () => {
    // Methanol: Perry's Table 2-313 viscosity stops at 337.85 K; density (Table 2-32) and
    // vapour pressure (Table 2-8) run to 512.5 K.
    const methanol = findLibraryLiquid('methanol');
    if (!methanol || methanol.viscosity.form !== 'dippr101') throw new Error('fixture');
    const t = 360;
    const p = liquidProperties({ kind: 'library', id: 'methanol' }, t);
    expect(p.extrapolated).toEqual(['viscosity']);
    expect(p.viscosity).toBe(dippr101(methanol.viscosity.c, t));
  });

  it('flags all three below every range and returns the correlation values', () => {
    const benzene = findLibraryLiquid('benzene');
    if (!benzene || benzene.density.form !== 'dippr105') throw new Error('fixture');
    // Benzene freezes at 278.68 K, Perry's Tmin for all three correlations.
    const t = 270;
    const p = liquidProperties({ kind: 'library', id: 'benzene' }, t);
    expect(p.extrapolated).toEqual(['density', 'viscosity', 'vapourPressure']);
    expect(p.density).toBeCloseTo(dippr105(benzene.density.c, t) * benzene.density.molarMass, 9);
  });

  it('does not flag at the ends of the ranges', () => {
    const methanol = findLibraryLiquid('methanol');
    if (!methanol) throw new Error('fixture');
    expect(
      liquidProperties({ kind: 'library', id: 'methanol' }, methanol.validRange.min).extrapolated,
    ).toEqual([]);
    expect(
      liquidProperties({ kind: 'library', id: 'methanol' }, methanol.validRange.max).extrapolated,
    ).toEqual([]);
  });

  it('never throws and always gives finite, positive values for any finite temperature', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...LIQUID_LIBRARY.map((l) => l.id)),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        (id, t) => {
          const p = liquidProperties({ kind: 'library', id }, t);
          for (const v of [p.density, p.viscosity, p.vapourPressure]) {
            expect(Number.isFinite(v)).toBe(true);
            expect(v).toBeGreaterThanOrEqual(0);
          }
          const liquid = findLibraryLiquid(id)!;
          const inside = t >= liquid.validRange.min && t <= liquid.validRange.max;
          if (!inside) expect(p.extrapolated.length).toBeGreaterThan(0);
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('unknown library id', () => {
  it('gives NaN values, every property flagged, and a message from validateLiquidChoice', () => {
    const choice = { kind: 'library', id: 'unobtainium' } as const;
    const p = liquidProperties(choice, 300);
    expect(Number.isNaN(p.density)).toBe(true);
    expect(p.extrapolated).toEqual(['density', 'viscosity', 'vapourPressure']);
    expect(validateLiquidChoice(choice)).toEqual([
      'There is no liquid "unobtainium" in the library; choose another liquid.',
    ]);
    expect(validateLiquidChoice({ kind: 'library', id: 'toluene' })).toEqual([]);
  });
});
