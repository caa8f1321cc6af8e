/**
 * Atmospheric pressure at a site from the ISA standard atmosphere (troposphere).
 *
 * Source: ISO 2533:1975 "Standard Atmosphere" (identical to the ICAO Standard Atmosphere,
 * ICAO Doc 7488): sea-level values and constants of its Table 1, the pressure equation for a
 * layer with a constant temperature gradient, and the conversion from geometric to
 * geopotential altitude. Constants below are from memory; the tabulated pressures are checked
 * in test/physics/atmosphere.test.ts.
 */

/** Sea-level pressure p0, Pa (ISO 2533:1975). */
export const ISA_SEA_LEVEL_PRESSURE = 101325;
/** Sea-level temperature T0, K (ISO 2533:1975). */
export const ISA_SEA_LEVEL_TEMPERATURE = 288.15;
/** Temperature gradient of the troposphere β, K/m (ISO 2533:1975). */
export const ISA_TEMPERATURE_GRADIENT = -0.0065;
/** Standard acceleration of free fall gn, m/s² (ISO 2533:1975). */
export const ISA_STANDARD_GRAVITY = 9.80665;
/** Specific gas constant of dry air R, J/(kg·K) (ISO 2533:1975). */
export const ISA_AIR_GAS_CONSTANT = 287.05287;
/** Nominal Earth radius r used for geopotential altitude, m (ISO 2533:1975). */
export const ISA_EARTH_RADIUS = 6356766;

/**
 * Geopotential altitude range, m, over which this module applies the troposphere equation:
 * ISO 2533:1975 tabulates the standard atmosphere from −2000 m, with the troposphere's
 * gradient, up to the tropopause at 11 000 m. Elevations outside are held at these limits.
 */
export const ISA_ALTITUDE_RANGE = { min: -2000, max: 11000 } as const;

/**
 * Geopotential altitude H, m, for geometric height `elevation` z in m above sea level:
 * H = r·z / (r + z) (ISO 2533:1975). At 2000 m the two differ by about 0.6 m.
 */
export function geopotentialAltitude(elevation: number): number {
  return (ISA_EARTH_RADIUS * elevation) / (ISA_EARTH_RADIUS + elevation);
}

/**
 * ISA pressure, Pa, at geopotential altitude `altitude` H in m, troposphere layer:
 * p = p0·[1 + β·H/T0]^(−gn/(β·R)) (ISO 2533:1975, pressure equation for β ≠ 0).
 * H is held within {@link ISA_ALTITUDE_RANGE} (±Infinity included); NaN is taken as sea level.
 */
export function isaPressureAtGeopotentialAltitude(altitude: number): number {
  const H = Number.isNaN(altitude)
    ? 0
    : Math.min(Math.max(altitude, ISA_ALTITUDE_RANGE.min), ISA_ALTITUDE_RANGE.max);
  const exponent = -ISA_STANDARD_GRAVITY / (ISA_TEMPERATURE_GRADIENT * ISA_AIR_GAS_CONSTANT);
  return (
    ISA_SEA_LEVEL_PRESSURE *
    (1 + (ISA_TEMPERATURE_GRADIENT * H) / ISA_SEA_LEVEL_TEMPERATURE) ** exponent
  );
}

/**
 * ISA atmospheric pressure, Pa absolute, at a site `elevation` in m above sea level
 * (geometric height, converted to geopotential altitude first; ISO 2533:1975).
 *
 * Never throws and never returns NaN: the altitude is held within {@link ISA_ALTITUDE_RANGE}
 * (−2 km to the 11 km tropopause; ±Infinity goes to the nearer end), and a NaN elevation gives
 * the sea-level pressure 101 325 Pa. Use {@link atmosphereInputProblem} to tell the user about
 * such input.
 */
export function isaPressure(elevation: number): number {
  if (Number.isNaN(elevation)) return ISA_SEA_LEVEL_PRESSURE;
  // Hold z before converting, so far-out values cannot reach the pole of H(z) at z = −r.
  const z = Math.min(Math.max(elevation, GEOMETRIC_RANGE.min), GEOMETRIC_RANGE.max);
  return isaPressureAtGeopotentialAltitude(geopotentialAltitude(z));
}

/** Geometric heights of the ends of {@link ISA_ALTITUDE_RANGE}: z = r·H / (r − H). */
const GEOMETRIC_RANGE = {
  min: (ISA_EARTH_RADIUS * ISA_ALTITUDE_RANGE.min) / (ISA_EARTH_RADIUS - ISA_ALTITUDE_RANGE.min),
  max: (ISA_EARTH_RADIUS * ISA_ALTITUDE_RANGE.max) / (ISA_EARTH_RADIUS - ISA_ALTITUDE_RANGE.max),
};

/** The project settings that fix the atmospheric pressure at the site. */
export interface SiteAtmosphereSettings {
  /** Site elevation above sea level, m. */
  siteElevation: number;
  /** Typed atmospheric pressure, Pa absolute; null uses the ISA value at the site elevation. */
  atmosphericPressureOverride: number | null;
}

/**
 * Atmospheric pressure at the site, Pa absolute: the typed override when it is not null,
 * otherwise the ISA pressure at the site elevation ({@link isaPressure}).
 *
 * Never throws and never returns NaN: an override that is not a finite positive number is
 * ignored in favour of the ISA value, and {@link atmosphereInputProblem} reports it.
 */
export function siteAtmosphericPressure(settings: SiteAtmosphereSettings): number {
  const override = settings.atmosphericPressureOverride;
  if (override !== null && Number.isFinite(override) && override > 0) return override;
  return isaPressure(settings.siteElevation);
}

/** A problem with the site atmosphere settings, naming the setting at fault. */
export interface AtmosphereInputProblem {
  field: keyof SiteAtmosphereSettings;
  message: string;
}

/**
 * Checks the site atmosphere settings and returns the first problem, or null when they are
 * usable as typed. Reports what {@link siteAtmosphericPressure} does instead, so the user's
 * values are never silently replaced.
 */
export function atmosphereInputProblem(
  settings: SiteAtmosphereSettings,
): AtmosphereInputProblem | null {
  const override = settings.atmosphericPressureOverride;
  if (override !== null && !(Number.isFinite(override) && override > 0)) {
    return {
      field: 'atmosphericPressureOverride',
      message: `Atmospheric pressure must be a positive number of pascals (absolute); got ${override}. The ISA value at the site elevation is used instead.`,
    };
  }
  if (override !== null) return null;
  const z = settings.siteElevation;
  if (Number.isNaN(z)) {
    return {
      field: 'siteElevation',
      message: `Site elevation must be a number of metres; got ${z}. Sea-level pressure (101 325 Pa) is used instead.`,
    };
  }
  if (z < GEOMETRIC_RANGE.min || z > GEOMETRIC_RANGE.max) {
    return {
      field: 'siteElevation',
      message: `Site elevation ${z} m is outside the standard atmosphere's troposphere (−2000 m to 11 000 m); the pressure at the nearer limit is used. Type the atmospheric pressure to override it.`,
    };
  }
  return null;
}
