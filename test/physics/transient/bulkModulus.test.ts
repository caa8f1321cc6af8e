import { describe, expect, it } from 'vitest';
import {
  LIBRARY_SOUND_SPEED_25C,
  liquidBulkModulus,
  waterBulkModulus,
} from '../../../src/lib/physics/transient';
import { LIQUID_LIBRARY } from '../../../src/lib/physics/liquids';

// Reference values printed by Debian's python3-iapws 1.5.2 at p = 0.101325 MPa:
//   IAPWS97(T, P).rho·w² and IAPWS95(T, P).rho·w², in GPa.
const IAPWS_REFERENCE = [
  { T: 278.15, if97: 2.03396, iapws95: 2.03389 },
  { T: 293.15, if97: 2.19658, iapws95: 2.19341 },
  { T: 313.15, if97: 2.32665, iapws95: 2.31935 },
  { T: 333.15, if97: 2.37394, iapws95: 2.3651 },
  { T: 353.15, if97: 2.35609, iapws95: 2.34809 },
];

describe('water bulk modulus K = ρ·w² (IAPWS-IF97 region 1)', () => {
  for (const row of IAPWS_REFERENCE) {
    it(`at ${row.T} K matches python3-iapws IAPWS97 to 0.01 % and IAPWS-95 to 0.5 %`, () => {
      const k = waterBulkModulus(row.T, 101325) / 1e9;
      // Source: python3-iapws 1.5.2, IAPWS97 class (same formulation).
      expect(Math.abs(k / row.if97 - 1)).toBeLessThan(1e-4);
      // Source: python3-iapws 1.5.2, IAPWS95 class (the scientific formulation IF97 fits).
      expect(Math.abs(k / row.iapws95 - 1)).toBeLessThan(5e-3);
    });
  }

  it('is the water source for the library water choice', () => {
    const k = liquidBulkModulus({ kind: 'library', id: 'water' }, 293.15, 101325, 998.2);
    expect(k?.fromMemory).toBe(false);
    expect(k!.value / 1e9).toBeCloseTo(2.19658, 3); // python3-iapws 1.5.2, IAPWS97
  });
});

describe('library liquids', () => {
  it('every library liquid but water has a speed of sound (from memory, marked so)', () => {
    for (const liquid of LIQUID_LIBRARY) {
      if (liquid.id === 'water') continue;
      expect(LIBRARY_SOUND_SPEED_25C[liquid.id], liquid.id).toBeGreaterThan(900);
      const k = liquidBulkModulus({ kind: 'library', id: liquid.id }, 298.15, 101325, 800);
      expect(k?.fromMemory).toBe(true);
      expect(k?.source).toMatch(/from memory/);
    }
  });

  it('K = ρ·w² (definition; Wylie & Streeter 1993, §1.2, rigid-pipe wave speed √(K/ρ))', () => {
    const k = liquidBulkModulus({ kind: 'library', id: 'toluene' }, 298.15, 101325, 862);
    expect(k!.value).toBeCloseTo(862 * 1306 * 1306, 0);
  });

  it('a user-defined liquid has no bulk modulus (none is made up)', () => {
    const user = {
      kind: 'user' as const,
      name: 'x',
      table: [{ temperature: 293, density: 900, viscosity: 1e-3, vapourPressure: 1000 }],
    };
    expect(liquidBulkModulus(user, 293, 101325, 900)).toBeNull();
  });
});
