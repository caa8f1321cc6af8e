import { describe, expect, it } from 'vitest';
import {
  region1Properties,
  waterDensity,
  waterSaturationPressure,
} from '../../../src/lib/physics/water';
import fixture from '../../fixtures/iapws-water.json';
import { expectRelativelyClose, expectToTableDigits } from './tolerance';

const MPa = 1e6;
const kJ = 1e3;

// IAPWS R7-97(2012), Table 5: region 1 properties printed to 9 significant digits
// (values from memory; the same points from iapws 1.5.2 are in the fixture's
// tablePoints.if97Table5Region1 and checked against these printed values below).
const TABLE_5 = [
  {
    T: 300,
    p: 3 * MPa,
    v: 0.100215168e-2,
    h: 0.115331273e3 * kJ,
    u: 0.112324818e3 * kJ,
    s: 0.392294792 * kJ,
    cp: 0.417301218e1 * kJ,
    w: 0.150773921e4,
  },
  {
    T: 300,
    p: 80 * MPa,
    v: 0.971180894e-3,
    h: 0.184142828e3 * kJ,
    u: 0.106448356e3 * kJ,
    s: 0.368563852 * kJ,
    cp: 0.401008987e1 * kJ,
    w: 0.163469054e4,
  },
  {
    T: 500,
    p: 3 * MPa,
    v: 0.1202418e-2,
    h: 0.975542239e3 * kJ,
    u: 0.971934985e3 * kJ,
    s: 0.258041912e1 * kJ,
    cp: 0.465580682e1 * kJ,
    w: 0.124071337e4,
  },
];

describe('region1Properties — IAPWS-IF97 region 1, Eq. 7', () => {
  it.each(TABLE_5)('IAPWS R7-97(2012) Table 5 at T = $T K, p = $p Pa', (row) => {
    const props = region1Properties(row.T, row.p);
    expectToTableDigits(props.specificVolume, row.v, 9);
    expectToTableDigits(props.enthalpy, row.h, 9);
    expectToTableDigits(props.internalEnergy, row.u, 9);
    expectToTableDigits(props.entropy, row.s, 9);
    expectToTableDigits(props.isobaricHeatCapacity, row.cp, 9);
    expectToTableDigits(props.speedOfSound, row.w, 9);
    expect(props.density).toBeCloseTo(1 / row.v, 4);
  });

  it('the printed Table 5 values agree with iapws 1.5.2 at the same points (fixture)', () => {
    const fromLibrary = fixture.tablePoints.if97Table5Region1;
    expect(fromLibrary.map((r) => [r.T, r.p])).toEqual(TABLE_5.map((r) => [r.T, r.p]));
    fromLibrary.forEach((r, k) => {
      const row = TABLE_5[k];
      for (const key of ['v', 'h', 'u', 's', 'cp', 'w'] as const) {
        expectToTableDigits(r[key], row[key], 9);
      }
    });
  });

  it('matches iapws 1.5.2 iapws97._Region1 at 43 temperatures from 0.01 to 200 °C (fixture)', () => {
    for (const point of fixture.points) {
      expectRelativelyClose(waterDensity(point.T, point.p), point.rho, 1e-12);
    }
  });

  it('agrees with the IAPWS-95 scientific formulation (iapws 1.5.2 IAPWS95) within 0.002 %', () => {
    // IF97 is an industrial fit to IAPWS-95. The largest difference seen in this range is
    // 1.5e-5 (fixture, iapws 1.5.2 IAPWS95 class); the bound leaves a little room above it.
    for (const point of fixture.points) {
      expectRelativelyClose(waterDensity(point.T, point.p), point.rho95, 2e-5);
    }
  });
});

describe('waterDensity', () => {
  it('defaults the pressure to max(101 325 Pa, ps(T)) as the fixture does', () => {
    for (const point of fixture.points) {
      expect(Math.max(101325, waterSaturationPressure(point.T))).toBeCloseTo(point.p, 6);
      expectRelativelyClose(waterDensity(point.T), point.rho, 1e-12);
    }
  });

  it('has its maximum near 3.98 °C at one atmosphere (IAPWS-95; common knowledge)', () => {
    const at = (c: number) => waterDensity(273.15 + c);
    expect(at(3.98)).toBeGreaterThan(at(2));
    expect(at(3.98)).toBeGreaterThan(at(6));
  });

  it('rises with pressure (compressed liquid) by about 0.046 % per MPa at 20 °C', () => {
    const rho1 = waterDensity(293.15, 101325);
    const rho2 = waterDensity(293.15, 1.101325e6);
    expect(rho2).toBeGreaterThan(rho1);
    // Isothermal compressibility of water at 20 °C is about 4.6e-10 1/Pa (from memory).
    expect((rho2 / rho1 - 1) / 1e6).toBeCloseTo(4.6e-10, 11);
  });

  it('stays finite and positive for any finite input (guards, not physics)', () => {
    for (const T of [-100, 0, 200, 243.15, 273.15, 473.15, 623.15, 640, 700, 5000, Infinity]) {
      for (const p of [-1e6, 0, 101325, 1e7, 1e8, 1e9, Infinity]) {
        const rho = waterDensity(T, p);
        expect(Number.isFinite(rho)).toBe(true);
        expect(rho).toBeGreaterThan(0);
      }
      expect(waterDensity(T)).toBeGreaterThan(0);
    }
    expect(Number.isNaN(waterDensity(NaN))).toBe(true);
  });
});
