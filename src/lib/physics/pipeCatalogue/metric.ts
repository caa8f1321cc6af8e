/**
 * Metric steel pipe, DN15 to DN900.
 *
 * Outside diameters: EN 10220 (= ISO 4200) series 1, the preferred outside diameters for
 * seamless and welded steel tubes. Wall thickness: the "normal" wall of DIN 2448 (seamless,
 * DN15–DN500) and DIN 2458 (welded, DN600–DN900). The outside diameters are well known; the
 * wall thicknesses were typed from memory and should be checked against the standards before
 * design use (the DN600–DN900 walls are the least certain).
 */

/** One metric size with its normal wall. */
export interface MetricSize {
  dn: number;
  outsideDiameterMm: number;
  wallMm: number;
  /** Schedule name under which the wall is offered. */
  schedule: 'DIN2448' | 'DIN2458';
}

/** Schedule names used for the metric series, with what they stand for. */
export const METRIC_SCHEDULE_SOURCES: Readonly<Record<MetricSize['schedule'], string>> = {
  DIN2448:
    'OD EN 10220 series 1; normal wall of DIN 2448 (seamless steel tubes) — walls from memory',
  DIN2458: 'OD EN 10220 series 1; normal wall of DIN 2458 (welded steel tubes) — walls from memory',
};

/** DN15–DN900 with EN 10220 series 1 outside diameters and DIN normal walls, mm. */
export const METRIC_SIZES: readonly MetricSize[] = [
  { dn: 15, outsideDiameterMm: 21.3, wallMm: 2.0, schedule: 'DIN2448' },
  { dn: 20, outsideDiameterMm: 26.9, wallMm: 2.3, schedule: 'DIN2448' },
  { dn: 25, outsideDiameterMm: 33.7, wallMm: 2.6, schedule: 'DIN2448' },
  { dn: 32, outsideDiameterMm: 42.4, wallMm: 2.6, schedule: 'DIN2448' },
  { dn: 40, outsideDiameterMm: 48.3, wallMm: 2.6, schedule: 'DIN2448' },
  { dn: 50, outsideDiameterMm: 60.3, wallMm: 2.9, schedule: 'DIN2448' },
  { dn: 65, outsideDiameterMm: 76.1, wallMm: 2.9, schedule: 'DIN2448' },
  { dn: 80, outsideDiameterMm: 88.9, wallMm: 3.2, schedule: 'DIN2448' },
  { dn: 100, outsideDiameterMm: 114.3, wallMm: 3.6, schedule: 'DIN2448' },
  { dn: 125, outsideDiameterMm: 139.7, wallMm: 4.0, schedule: 'DIN2448' },
  { dn: 150, outsideDiameterMm: 168.3, wallMm: 4.5, schedule: 'DIN2448' },
  { dn: 200, outsideDiameterMm: 219.1, wallMm: 6.3, schedule: 'DIN2448' },
  { dn: 250, outsideDiameterMm: 273.0, wallMm: 6.3, schedule: 'DIN2448' },
  { dn: 300, outsideDiameterMm: 323.9, wallMm: 7.1, schedule: 'DIN2448' },
  { dn: 350, outsideDiameterMm: 355.6, wallMm: 8.0, schedule: 'DIN2448' },
  { dn: 400, outsideDiameterMm: 406.4, wallMm: 8.8, schedule: 'DIN2448' },
  { dn: 450, outsideDiameterMm: 457.0, wallMm: 10.0, schedule: 'DIN2448' },
  { dn: 500, outsideDiameterMm: 508.0, wallMm: 11.0, schedule: 'DIN2448' },
  { dn: 600, outsideDiameterMm: 610.0, wallMm: 6.3, schedule: 'DIN2458' },
  { dn: 700, outsideDiameterMm: 711.0, wallMm: 7.1, schedule: 'DIN2458' },
  { dn: 800, outsideDiameterMm: 813.0, wallMm: 8.0, schedule: 'DIN2458' },
  { dn: 900, outsideDiameterMm: 914.0, wallMm: 10.0, schedule: 'DIN2458' },
];
