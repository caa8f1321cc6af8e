import { describe, expect, it } from 'vitest';
import {
  catalogueEntry,
  catalogueInnerDiameter,
  nominalSizes,
  schedulesFor,
} from '../../src/lib/physics/pipeCatalogue';

const INCH = 0.0254; // m, exact

/** Schedule names agreed in the module contracts. */
const CONTRACT_SCHEDULES = new Set([
  '5S',
  '10S',
  '40S',
  '80S',
  '10',
  '20',
  '30',
  '40',
  'STD',
  '60',
  '80',
  'XS',
  '100',
  '120',
  '140',
  '160',
  'XXS',
]);

describe('ASME B36.10M / B36.19M inner diameters', () => {
  // Inner diameters as the standards' inch columns give them (ASME B36.10M / B36.19M,
  // remembered inch IDs — from memory). The catalogue computes ID from the mm columns
  // (OD − 2 × wall), which round differently from the inch columns.
  it.each([
    ['2', '40', 2.067],
    ['4', '40', 4.026],
    ['6', '80', 5.761],
    ['1/2', '80', 0.546],
    ['1', '40', 1.049],
    ['3', '40', 3.068],
    ['8', '40', 7.981],
    ['12', 'STD', 12.0],
    ['12', '40', 11.938],
    ['4', '160', 3.438],
    ['2', 'XXS', 1.503],
    ['24', 'XS', 23.0],
    ['36', 'STD', 35.25],
    ['2', '10S', 2.157],
    ['10', '40S', 10.02],
    ['12', '80S', 11.75],
  ])('NPS %s Sch %s has ID %f in (ASME B36.10M/B36.19M inch table)', (nps, schedule, idInch) => {
    const id = catalogueInnerDiameter(nps, schedule);
    expect(id).toBeDefined();
    // mm ODs are tabulated to 0.1 mm (e.g. 21.3 mm for 0.840 in = 21.34 mm): allow 0.05 mm
    // or 0.1 %, whichever is larger.
    const tolerance = Math.max(0.05e-3, 1e-3 * idInch * INCH);
    expect(Math.abs(id! - idInch * INCH)).toBeLessThan(tolerance);
  });

  it('gives the brief’s spot values within 0.05 mm (ASME B36.10M: 2" Sch 40 52.50 mm, 4" Sch 40 102.26 mm, 6" Sch 80 146.33 mm)', () => {
    expect(Math.abs(catalogueInnerDiameter('2', '40')! * 1000 - 52.5)).toBeLessThan(0.05);
    expect(Math.abs(catalogueInnerDiameter('4', '40')! * 1000 - 102.26)).toBeLessThan(0.05);
    expect(Math.abs(catalogueInnerDiameter('6', '80')! * 1000 - 146.33)).toBeLessThan(0.05);
  });

  it('keeps the standards’ mm outside diameters and walls (ASME B36.10M: 4" OD 114.3 mm, Sch 40 wall 6.02 mm)', () => {
    const wall = catalogueEntry('4')!.walls.find((w) => w.schedule === '40')!;
    expect(wall.outsideDiameter).toBeCloseTo(0.1143, 10);
    expect(wall.wallThickness).toBeCloseTo(0.00602, 10);
    expect(wall.standard).toBe('ASME B36.10M');
    // ASME B36.19M rounds NPS 10 to 273.1 mm where B36.10M has 273.0 mm.
    const stainless = catalogueEntry('10')!.walls.find((w) => w.schedule === '40S')!;
    expect(stainless.outsideDiameter).toBeCloseTo(0.2731, 10);
    expect(stainless.standard).toBe('ASME B36.19M');
  });
});

describe('metric DN series', () => {
  // Outside diameters: EN 10220 / ISO 4200 series 1. Walls: DIN 2448 / DIN 2458 normal wall
  // (from memory).
  it.each([
    ['DN15', 21.3, 2.0],
    ['DN50', 60.3, 2.9],
    ['DN65', 76.1, 2.9],
    ['DN100', 114.3, 3.6],
    ['DN150', 168.3, 4.5],
    ['DN300', 323.9, 7.1],
    ['DN900', 914.0, 10.0],
  ])('%s has OD %f mm (EN 10220 series 1) and wall %f mm', (size, odMm, wallMm) => {
    const entry = catalogueEntry(size)!;
    expect(entry.series).toBe('metric');
    const wall = entry.walls[0];
    expect(wall.outsideDiameter * 1000).toBeCloseTo(odMm, 9);
    expect(wall.wallThickness * 1000).toBeCloseTo(wallMm, 9);
    expect(catalogueInnerDiameter(size, wall.schedule)! * 1000).toBeCloseTo(odMm - 2 * wallMm, 9);
  });
});

describe('catalogue structure', () => {
  it('lists NPS 1/2 to 36 and DN15 to DN900', () => {
    const sizes = nominalSizes();
    for (const size of ['1/2', '3/4', '1', '1-1/4', '1-1/2', '2', '2-1/2', '3', '4', '6', '8']) {
      expect(sizes).toContain(size);
    }
    for (const size of ['10', '12', '14', '16', '18', '20', '24', '30', '36']) {
      expect(sizes).toContain(size);
    }
    expect(sizes).toContain('DN15');
    expect(sizes).toContain('DN900');
  });

  it('uses only the contract’s ASME schedule names, in the contract’s order', () => {
    const order = [...CONTRACT_SCHEDULES];
    for (const size of nominalSizes().filter((s) => !s.startsWith('DN'))) {
      const schedules = schedulesFor(size);
      expect(schedules.length).toBeGreaterThan(0);
      for (const s of schedules) expect(CONTRACT_SCHEDULES.has(s)).toBe(true);
      const positions = schedules.map((s) => order.indexOf(s));
      expect([...positions].sort((a, b) => a - b)).toEqual(positions);
    }
  });

  it('has positive inner diameters below the outside diameter everywhere', () => {
    for (const size of nominalSizes()) {
      for (const wall of catalogueEntry(size)!.walls) {
        expect(wall.innerDiameter).toBeGreaterThan(0);
        expect(wall.innerDiameter).toBeCloseTo(wall.outsideDiameter - 2 * wall.wallThickness, 12);
      }
    }
  });

  it('orders walls by the B36.10M schedule series: Sch 40 < 80 < 160 < XXS thickness (NPS 2)', () => {
    const ids = ['40', '80', '160', 'XXS'].map((s) => catalogueInnerDiameter('2', s)!);
    for (let i = 1; i < ids.length; i++) expect(ids[i]).toBeLessThan(ids[i - 1]);
  });

  it('accepts common spellings and returns undefined for unknown combinations', () => {
    expect(catalogueInnerDiameter('1 1/4', 'sch 40')).toBe(catalogueInnerDiameter('1-1/4', '40'));
    expect(catalogueInnerDiameter('dn 50', 'DIN2448')).toBe(
      catalogueInnerDiameter('DN50', 'DIN2448'),
    );
    expect(catalogueInnerDiameter('2', 'std')).toBe(catalogueInnerDiameter('2', 'STD'));
    expect(catalogueInnerDiameter('7', '40')).toBeUndefined();
    expect(catalogueInnerDiameter('2', '99')).toBeUndefined();
    expect(catalogueInnerDiameter('36', 'XXS')).toBeUndefined();
    expect(schedulesFor('nonsense')).toEqual([]);
  });
});
