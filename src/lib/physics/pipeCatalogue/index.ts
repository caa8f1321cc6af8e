/**
 * Pipe catalogue: inner diameters from a nominal size and a schedule.
 *
 * ASME sizes are named '1/2', '3/4', '1', '1-1/4', … '36' (ASME B36.10M and B36.19M);
 * metric sizes 'DN15' … 'DN900' (EN 10220 series 1 outside diameters with DIN normal walls).
 * Inner diameter = outside diameter − 2 × nominal wall. All results are in metres.
 * A typed inner diameter is always allowed in the model; this module only offers sizes.
 */

import {
  ASME_SIZES,
  B36_10M_WALLS,
  B36_19M_OUTSIDE_DIAMETER_MM,
  B36_19M_WALLS,
  type WallTable,
} from './asme';
import { METRIC_SCHEDULE_SOURCES, METRIC_SIZES } from './metric';

/** One schedule of one nominal size. Lengths in metres. */
export interface CatalogueWall {
  schedule: string;
  outsideDiameter: number;
  wallThickness: number;
  innerDiameter: number;
  /** The standard the dimensions come from. */
  standard: string;
}

/** A nominal size with every schedule the catalogue holds for it. */
export interface CatalogueEntry {
  nominalSize: string;
  series: 'ASME' | 'metric';
  /** Metric nominal diameter DN. */
  dn: number;
  walls: CatalogueWall[];
}

/** Schedule order offered to the user (stainless first, then B36.10M by thickness). */
const SCHEDULE_ORDER = [
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
];

const MM = 1e-3;

function wall(
  schedule: string,
  outsideDiameterMm: number,
  wallMm: number,
  standard: string,
): CatalogueWall {
  return {
    schedule,
    outsideDiameter: outsideDiameterMm * MM,
    wallThickness: wallMm * MM,
    innerDiameter: (outsideDiameterMm - 2 * wallMm) * MM,
    standard,
  };
}

function asmeWalls(nps: string, outsideDiameterMm: number): CatalogueWall[] {
  const stainlessOd = B36_19M_OUTSIDE_DIAMETER_MM[nps] ?? outsideDiameterMm;
  const found: CatalogueWall[] = [];
  const add = (tables: Readonly<Record<string, WallTable>>, od: number, standard: string) => {
    for (const [schedule, table] of Object.entries(tables)) {
      const thickness = table[nps];
      if (thickness !== undefined) found.push(wall(schedule, od, thickness, standard));
    }
  };
  add(B36_19M_WALLS, stainlessOd, 'ASME B36.19M');
  add(B36_10M_WALLS, outsideDiameterMm, 'ASME B36.10M');
  found.sort((a, b) => SCHEDULE_ORDER.indexOf(a.schedule) - SCHEDULE_ORDER.indexOf(b.schedule));
  return found;
}

const ENTRIES: ReadonlyMap<string, CatalogueEntry> = new Map([
  ...ASME_SIZES.map((size): [string, CatalogueEntry] => [
    size.nps,
    {
      nominalSize: size.nps,
      series: 'ASME',
      dn: size.dn,
      walls: asmeWalls(size.nps, size.outsideDiameterMm),
    },
  ]),
  ...METRIC_SIZES.map((size): [string, CatalogueEntry] => [
    `DN${size.dn}`,
    {
      nominalSize: `DN${size.dn}`,
      series: 'metric',
      dn: size.dn,
      walls: [
        wall(
          size.schedule,
          size.outsideDiameterMm,
          size.wallMm,
          METRIC_SCHEDULE_SOURCES[size.schedule],
        ),
      ],
    },
  ]),
]);

/**
 * Normalise how a size is typed: trims, accepts '1 1/4' for '1-1/4' and 'dn 50' for 'DN50'.
 */
function normaliseSize(nominalSize: string): string {
  const text = nominalSize.trim().replace(/"$/, '').trim();
  const dn = /^dn\s*(\d+)$/i.exec(text);
  if (dn) return `DN${Number(dn[1])}`;
  return text.replace(/\s+/g, '-');
}

/** Normalise a schedule: upper case, without a leading 'SCH'. */
function normaliseSchedule(schedule: string): string {
  return schedule
    .trim()
    .toUpperCase()
    .replace(/^SCH(EDULE)?\.?\s*/, '');
}

/** Every nominal size in the catalogue: ASME sizes by size, then metric DN sizes. */
export function nominalSizes(): string[] {
  return [...ENTRIES.keys()];
}

/** The catalogue entry for a nominal size, or undefined when the size is unknown. */
export function catalogueEntry(nominalSize: string): CatalogueEntry | undefined {
  return ENTRIES.get(normaliseSize(nominalSize));
}

/** Schedules available for a nominal size (empty when the size is unknown). */
export function schedulesFor(nominalSize: string): string[] {
  return catalogueEntry(nominalSize)?.walls.map((w) => w.schedule) ?? [];
}

/**
 * Inner diameter, m, for a nominal size and schedule; undefined when the catalogue does not
 * hold that combination (the caller reports it against the pipe).
 */
export function catalogueInnerDiameter(nominalSize: string, schedule: string): number | undefined {
  const wanted = normaliseSchedule(schedule);
  return catalogueEntry(nominalSize)?.walls.find((w) => w.schedule.toUpperCase() === wanted)
    ?.innerDiameter;
}
