/**
 * ASME pipe dimensions, NPS 1/2 to 36, in millimetres as the standards tabulate them.
 *
 * - ASME B36.10M (welded and seamless wrought steel pipe): schedules 10, 20, 30, 40, STD, 60,
 *   80, XS, 100, 120, 140, 160, XXS.
 * - ASME B36.19M (stainless steel pipe): schedules 5S, 10S, 40S, 80S. B36.19M gives
 *   NPS 10 and 12 outside diameters as 273.1 and 323.9 mm where B36.10M gives 273.0 and
 *   323.8 mm (the same 10.750 in and 12.750 in, rounded differently).
 *
 * Source of the numbers: the mm columns of ASME B36.10M and B36.19M, typed from a public
 * transcription of those tables (the piping data of the open-source `fluids` library) and
 * checked against memory; spot values are tested in test/physics/pipeCatalogue.test.ts.
 */

/** One ASME nominal pipe size: its name, metric DN equivalent and outside diameter, mm. */
export interface AsmeSize {
  nps: string;
  dn: number;
  outsideDiameterMm: number;
}

/** NPS 1/2 to 36, with B36.10M outside diameters. */
export const ASME_SIZES: readonly AsmeSize[] = [
  { nps: '1/2', dn: 15, outsideDiameterMm: 21.3 },
  { nps: '3/4', dn: 20, outsideDiameterMm: 26.7 },
  { nps: '1', dn: 25, outsideDiameterMm: 33.4 },
  { nps: '1-1/4', dn: 32, outsideDiameterMm: 42.2 },
  { nps: '1-1/2', dn: 40, outsideDiameterMm: 48.3 },
  { nps: '2', dn: 50, outsideDiameterMm: 60.3 },
  { nps: '2-1/2', dn: 65, outsideDiameterMm: 73.0 },
  { nps: '3', dn: 80, outsideDiameterMm: 88.9 },
  { nps: '3-1/2', dn: 90, outsideDiameterMm: 101.6 },
  { nps: '4', dn: 100, outsideDiameterMm: 114.3 },
  { nps: '5', dn: 125, outsideDiameterMm: 141.3 },
  { nps: '6', dn: 150, outsideDiameterMm: 168.3 },
  { nps: '8', dn: 200, outsideDiameterMm: 219.1 },
  { nps: '10', dn: 250, outsideDiameterMm: 273.0 },
  { nps: '12', dn: 300, outsideDiameterMm: 323.8 },
  { nps: '14', dn: 350, outsideDiameterMm: 355.6 },
  { nps: '16', dn: 400, outsideDiameterMm: 406.4 },
  { nps: '18', dn: 450, outsideDiameterMm: 457.0 },
  { nps: '20', dn: 500, outsideDiameterMm: 508.0 },
  { nps: '22', dn: 550, outsideDiameterMm: 559.0 },
  { nps: '24', dn: 600, outsideDiameterMm: 610.0 },
  { nps: '26', dn: 650, outsideDiameterMm: 660.0 },
  { nps: '28', dn: 700, outsideDiameterMm: 711.0 },
  { nps: '30', dn: 750, outsideDiameterMm: 762.0 },
  { nps: '32', dn: 800, outsideDiameterMm: 813.0 },
  { nps: '34', dn: 850, outsideDiameterMm: 864.0 },
  { nps: '36', dn: 900, outsideDiameterMm: 914.0 },
];

/** B36.19M outside diameters where they differ from B36.10M's rounding, mm. */
export const B36_19M_OUTSIDE_DIAMETER_MM: Readonly<Record<string, number>> = {
  '10': 273.1,
  '12': 323.9,
};

/** Wall thickness, mm, by NPS, for one schedule. */
export type WallTable = Readonly<Record<string, number>>;

/**
 * Build a wall table from NPS names and walls listed in the same order.
 * Keeps the tables below compact and readable against the standards' columns.
 */
function walls(sizes: string, thicknesses: number[]): WallTable {
  const names = sizes.trim().split(/\s+/);
  if (names.length !== thicknesses.length) {
    throw new Error(`pipe catalogue: ${names.length} sizes but ${thicknesses.length} walls`);
  }
  return Object.fromEntries(names.map((name, i) => [name, thicknesses[i]]));
}

const SMALL = '1/2 3/4 1 1-1/4 1-1/2 2 2-1/2 3 3-1/2 4';

/** ASME B36.10M wall thicknesses, mm. */
export const B36_10M_WALLS: Readonly<Record<string, WallTable>> = {
  '10': walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 22 24 26 28 30 32 34 36`,
    [
      2.11, 2.11, 2.77, 2.77, 2.77, 2.77, 3.05, 3.05, 3.05, 3.05, 3.4, 3.4, 3.76, 4.19, 4.57, 6.35,
      6.35, 6.35, 6.35, 6.35, 6.35, 7.92, 7.92, 7.92, 7.92, 7.92, 7.92,
    ],
  ),
  '20': walls(
    '8 10 12 14 16 18 20 22 24 26 28 30 32 34 36',
    [6.35, 6.35, 6.35, 7.92, 7.92, 7.92, 9.53, 9.53, 9.53, 12.7, 12.7, 12.7, 12.7, 12.7, 12.7],
  ),
  '30': walls(
    `${SMALL} 8 10 12 14 16 18 20 22 24 28 30 32 34 36`,
    [
      2.41, 2.41, 2.9, 2.97, 3.18, 3.18, 4.78, 4.78, 4.78, 4.78, 7.04, 7.8, 8.38, 9.53, 9.53, 11.13,
      12.7, 12.7, 14.27, 15.88, 15.88, 15.88, 15.88, 15.88,
    ],
  ),
  '40': walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 24 32 34 36`,
    [
      2.77, 2.87, 3.38, 3.56, 3.68, 3.91, 5.16, 5.49, 5.74, 6.02, 6.55, 7.11, 8.18, 9.27, 10.31,
      11.13, 12.7, 14.27, 15.09, 17.48, 17.48, 17.48, 19.05,
    ],
  ),
  STD: walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 22 24 26 28 30 32 34 36`,
    [
      2.77, 2.87, 3.38, 3.56, 3.68, 3.91, 5.16, 5.49, 5.74, 6.02, 6.55, 7.11, 8.18, 9.27, 9.53,
      9.53, 9.53, 9.53, 9.53, 9.53, 9.53, 9.53, 9.53, 9.53, 9.53, 9.53, 9.53,
    ],
  ),
  '60': walls(
    '8 10 12 14 16 18 20 22 24',
    [10.31, 12.7, 14.27, 15.09, 16.66, 19.05, 20.62, 22.23, 24.61],
  ),
  '80': walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 22 24`,
    [
      3.73, 3.91, 4.55, 4.85, 5.08, 5.54, 7.01, 7.62, 8.08, 8.56, 9.53, 10.97, 12.7, 15.09, 17.48,
      19.05, 21.44, 23.83, 26.19, 28.58, 30.96,
    ],
  ),
  XS: walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 22 24 26 28 30 32 34 36`,
    [
      3.73, 3.91, 4.55, 4.85, 5.08, 5.54, 7.01, 7.62, 8.08, 8.56, 9.53, 10.97, 12.7, 12.7, 12.7,
      12.7, 12.7, 12.7, 12.7, 12.7, 12.7, 12.7, 12.7, 12.7, 12.7, 12.7, 12.7,
    ],
  ),
  '100': walls(
    '8 10 12 14 16 18 20 22 24',
    [15.09, 18.26, 21.44, 23.83, 26.19, 29.36, 32.54, 34.93, 38.89],
  ),
  '120': walls(
    '4 5 6 8 10 12 14 16 18 20 22 24',
    [11.13, 12.7, 14.27, 18.26, 21.44, 25.4, 27.79, 30.96, 34.93, 38.1, 41.28, 46.02],
  ),
  '140': walls(
    '8 10 12 14 16 18 20 22 24',
    [20.62, 25.4, 28.58, 31.75, 36.53, 39.67, 44.45, 47.63, 52.37],
  ),
  '160': walls(
    '1/2 3/4 1 1-1/4 1-1/2 2 2-1/2 3 4 5 6 8 10 12 14 16 18 20 22 24',
    [
      4.78, 5.56, 6.35, 6.35, 7.14, 8.74, 9.53, 11.13, 13.49, 15.88, 18.26, 23.01, 28.58, 33.32,
      35.71, 40.49, 45.24, 50.01, 53.98, 59.54,
    ],
  ),
  XXS: walls(
    '1/2 3/4 1 1-1/4 1-1/2 2 2-1/2 3 4 5 6 8 10 12',
    [7.47, 7.82, 9.09, 9.7, 10.15, 11.07, 14.02, 15.24, 17.12, 19.05, 21.95, 22.23, 25.4, 25.4],
  ),
};

/** ASME B36.19M wall thicknesses, mm. */
export const B36_19M_WALLS: Readonly<Record<string, WallTable>> = {
  '5S': walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 22 24 30`,
    [
      1.65, 1.65, 1.65, 1.65, 1.65, 1.65, 2.11, 2.11, 2.11, 2.11, 2.77, 2.77, 2.77, 3.4, 3.96, 3.96,
      4.19, 4.19, 4.78, 4.78, 5.54, 6.35,
    ],
  ),
  '10S': walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 22 24 30`,
    [
      2.11, 2.11, 2.77, 2.77, 2.77, 2.77, 3.05, 3.05, 3.05, 3.05, 3.4, 3.4, 3.76, 4.19, 4.57, 4.78,
      4.78, 4.78, 5.54, 5.54, 6.35, 7.92,
    ],
  ),
  '40S': walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 24`,
    [
      2.77, 2.87, 3.38, 3.56, 3.68, 3.91, 5.16, 5.49, 5.74, 6.02, 6.55, 7.11, 8.18, 9.27, 9.53,
      9.53, 9.53, 9.53, 9.53, 9.53,
    ],
  ),
  '80S': walls(
    `${SMALL} 5 6 8 10 12 14 16 18 20 24`,
    [
      3.73, 3.91, 4.55, 4.85, 5.08, 5.54, 7.01, 7.62, 8.08, 8.56, 9.53, 10.97, 12.7, 12.7, 12.7,
      12.7, 12.7, 12.7, 12.7, 12.7,
    ],
  ),
};
