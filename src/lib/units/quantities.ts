/**
 * The table of units Headroute knows, per physical dimension, and which quantity shows which
 * unit in each display system.
 *
 * Every unit converts to SI by `si = value * factor + offset`. Conversion factors follow
 * NIST Special Publication 811 (2008 edition), "Guide for the Use of the International System
 * of Units (SI)", Appendix B (B.8 and B.9). Factors that NIST lists as exact are built here
 * from their defining values (inch = 0.0254 m, avoirdupois pound = 0.45359237 kg, standard
 * gravity = 9.80665 m/s², US gallon = 231 in³) so they carry full double precision.
 */

/** A quantity Headroute reads or shows. Each maps to one physical dimension. */
export type Quantity =
  | 'length'
  | 'diameter'
  | 'roughness'
  | 'elevation'
  | 'volumeFlow'
  | 'massFlow'
  | 'velocity'
  | 'pressureAbs'
  | 'pressureGauge'
  | 'pressureDrop'
  | 'head'
  | 'temperature'
  | 'density'
  | 'dynamicViscosity'
  | 'kinematicViscosity'
  | 'power'
  | 'kvCoefficient'
  | 'fraction';

/** Display unit system: SI (metric engineering units) or US customary. */
export type UnitSystem = 'SI' | 'US';

/** A physical dimension; several quantities share one (diameter and head are both lengths). */
export type Dimension =
  | 'length'
  | 'volumeFlow'
  | 'massFlow'
  | 'velocity'
  | 'pressure'
  | 'temperature'
  | 'density'
  | 'dynamicViscosity'
  | 'kinematicViscosity'
  | 'power'
  | 'flowCoefficient'
  | 'fraction';

/**
 * Pressure reference carried by a unit: 'abs' (bara, psia), 'gauge' (barg, psig) or 'plain'
 * (bar, kPa, Pa, psi), which takes the reference of the quantity it is typed into.
 */
export type PressureReference = 'abs' | 'gauge' | 'plain';

/** One unit: its symbol as shown, accepted spellings, and its conversion to SI. */
export interface UnitDefinition {
  /** Symbol as Headroute shows it. */
  symbol: string;
  dimension: Dimension;
  /** SI value = value × factor + offset. */
  factor: number;
  offset: number;
  /** Other spellings accepted when parsing (matched after normalising, see parse.ts). */
  aliases: readonly string[];
  /** Pressure units only. */
  reference?: PressureReference;
}

// Exact defining values (NIST SP 811 (2008), Appendix B, footnotes and B.8 entries).
const INCH = 0.0254; // m, exact
const FOOT = 12 * INCH; // 0.3048 m, exact
const POUND = 0.45359237; // kg, exact
const STANDARD_GRAVITY = 9.80665; // m/s², exact (3rd CGPM, 1901)
const POUND_FORCE = POUND * STANDARD_GRAVITY; // 4.448222 N (NIST SP 811 B.8)
const PSI = POUND_FORCE / (INCH * INCH); // 6.894757 E+03 Pa (NIST SP 811 B.8)
const US_GALLON = 231 * INCH ** 3; // 3.785412 E-03 m³ (NIST SP 811 B.8: 231 in³)
const HORSEPOWER = 550 * FOOT * POUND_FORCE; // 7.456999 E+02 W (NIST SP 811 B.8, 550 ft·lbf/s)

/**
 * Cv per Kv: Cv = 1.156 Kv, the rounded ratio used by IEC 60534-2-1:2011 (its constant N1 is
 * 1e-1 for Kv and 8.65e-2 for Cv with m³/h and kPa; from memory). The ratio built from the unit
 * definitions, (US gal/min per m³/h) × √(psi/bar), is 1.15612.
 */
export const CV_PER_KV = 1.156;

function unit(
  symbol: string,
  dimension: Dimension,
  factor: number,
  aliases: readonly string[] = [],
  offset = 0,
  reference?: PressureReference,
): UnitDefinition {
  return { symbol, dimension, factor, offset, aliases, reference };
}

/** Every unit Headroute accepts. Symbols and aliases are unique across the whole table. */
export const UNITS: readonly UnitDefinition[] = [
  // length
  unit('m', 'length', 1, ['metre', 'metres', 'meter', 'meters']),
  unit('mm', 'length', 1e-3),
  unit('cm', 'length', 1e-2),
  unit('km', 'length', 1e3),
  unit('µm', 'length', 1e-6, ['um', 'μm', 'micron', 'microns']),
  unit('in', 'length', INCH, ['inch', 'inches', '"']),
  unit('ft', 'length', FOOT, ['feet', 'foot', "'"]),
  // volume flow
  unit('m3/s', 'volumeFlow', 1),
  unit('m3/h', 'volumeFlow', 1 / 3600, ['m3/hr', 'cmh']),
  unit('L/s', 'volumeFlow', 1e-3, ['l/s', 'lps']),
  unit('L/min', 'volumeFlow', 1e-3 / 60, ['l/min', 'lpm']),
  unit('gpm', 'volumeFlow', US_GALLON / 60, ['gal/min', 'usgpm']),
  unit('ft3/s', 'volumeFlow', FOOT ** 3, ['cfs']),
  // mass flow
  unit('kg/s', 'massFlow', 1),
  unit('kg/h', 'massFlow', 1 / 3600, ['kg/hr']),
  unit('t/h', 'massFlow', 1000 / 3600, ['t/hr', 'tph']),
  unit('lb/s', 'massFlow', POUND),
  unit('lb/h', 'massFlow', POUND / 3600, ['lb/hr', 'pph']),
  // velocity
  unit('m/s', 'velocity', 1),
  unit('ft/s', 'velocity', FOOT, ['fps']),
  // pressure (bar = 1e5 Pa exact, NIST SP 811 B.8)
  unit('Pa', 'pressure', 1, [], 0, 'plain'),
  unit('kPa', 'pressure', 1e3, [], 0, 'plain'),
  unit('kPag', 'pressure', 1e3, ['kPa(g)', 'kPa.g'], 0, 'gauge'),
  unit('kPaa', 'pressure', 1e3, ['kPa(a)', 'kPa.a'], 0, 'abs'),
  unit('MPa', 'pressure', 1e6, [], 0, 'plain'),
  unit('mbar', 'pressure', 100, [], 0, 'plain'),
  unit('bar', 'pressure', 1e5, [], 0, 'plain'),
  unit('barg', 'pressure', 1e5, ['bar(g)', 'bar.g'], 0, 'gauge'),
  unit('bara', 'pressure', 1e5, ['bar(a)', 'bar.a'], 0, 'abs'),
  unit('psi', 'pressure', PSI, [], 0, 'plain'),
  unit('psig', 'pressure', PSI, ['psi(g)'], 0, 'gauge'),
  unit('psia', 'pressure', PSI, ['psi(a)'], 0, 'abs'),
  // temperature: T/K = t/°C + 273.15; T/K = (t/°F + 459.67)/1.8 (NIST SP 811 B.8)
  unit('°C', 'temperature', 1, ['C', 'degC', 'ºC', 'celsius'], 273.15),
  unit('°F', 'temperature', 1 / 1.8, ['F', 'degF', 'ºF', 'fahrenheit'], 459.67 / 1.8),
  unit('K', 'temperature', 1, ['kelvin']),
  // density (lb/ft³ = 1.601846 E+01 kg/m³, NIST SP 811 B.8)
  unit('kg/m3', 'density', 1),
  unit('g/cm3', 'density', 1e3, ['g/ml', 'kg/L', 'kg/l']),
  unit('lb/ft3', 'density', POUND / FOOT ** 3),
  // dynamic viscosity (centipoise = 1.0 E-03 Pa·s, NIST SP 811 B.8)
  unit('Pa.s', 'dynamicViscosity', 1),
  unit('mPa.s', 'dynamicViscosity', 1e-3),
  unit('cP', 'dynamicViscosity', 1e-3, ['cp', 'centipoise']),
  unit('P', 'dynamicViscosity', 0.1, ['poise']),
  // kinematic viscosity (centistokes = 1.0 E-06 m²/s, NIST SP 811 B.8)
  unit('m2/s', 'kinematicViscosity', 1),
  unit('mm2/s', 'kinematicViscosity', 1e-6),
  unit('cSt', 'kinematicViscosity', 1e-6, ['cst', 'centistokes']),
  unit('St', 'kinematicViscosity', 1e-4, ['stokes']),
  unit('ft2/s', 'kinematicViscosity', FOOT ** 2),
  // power
  unit('W', 'power', 1),
  unit('kW', 'power', 1e3),
  unit('MW', 'power', 1e6),
  unit('hp', 'power', HORSEPOWER, ['bhp']),
  // flow coefficient: the SI value is Kv (m³/h at 1 bar); Cv = 1.156 Kv (IEC 60534-2-1)
  unit('Kv', 'flowCoefficient', 1),
  unit('Cv', 'flowCoefficient', 1 / CV_PER_KV),
  // fraction (a valve opening shown as %); the SI value is 0–1
  unit('%', 'fraction', 0.01, ['percent']),
];

/** Dimension of each quantity. */
export const QUANTITY_DIMENSION: Readonly<Record<Quantity, Dimension>> = {
  length: 'length',
  diameter: 'length',
  roughness: 'length',
  elevation: 'length',
  volumeFlow: 'volumeFlow',
  massFlow: 'massFlow',
  velocity: 'velocity',
  pressureAbs: 'pressure',
  pressureGauge: 'pressure',
  pressureDrop: 'pressure',
  head: 'length',
  temperature: 'temperature',
  density: 'density',
  dynamicViscosity: 'dynamicViscosity',
  kinematicViscosity: 'kinematicViscosity',
  power: 'power',
  kvCoefficient: 'flowCoefficient',
  fraction: 'fraction',
};

/** Display unit of each quantity in each system (symbols from `UNITS`). */
export const DISPLAY_UNITS: Readonly<Record<Quantity, Readonly<Record<UnitSystem, string>>>> = {
  length: { SI: 'm', US: 'ft' },
  diameter: { SI: 'mm', US: 'in' },
  roughness: { SI: 'mm', US: 'in' },
  elevation: { SI: 'm', US: 'ft' },
  volumeFlow: { SI: 'm3/h', US: 'gpm' },
  massFlow: { SI: 'kg/s', US: 'lb/h' },
  velocity: { SI: 'm/s', US: 'ft/s' },
  pressureAbs: { SI: 'bara', US: 'psia' },
  pressureGauge: { SI: 'barg', US: 'psig' },
  pressureDrop: { SI: 'kPa', US: 'psi' },
  head: { SI: 'm', US: 'ft' },
  temperature: { SI: '°C', US: '°F' },
  density: { SI: 'kg/m3', US: 'lb/ft3' },
  dynamicViscosity: { SI: 'cP', US: 'cP' },
  kinematicViscosity: { SI: 'cSt', US: 'cSt' },
  power: { SI: 'kW', US: 'hp' },
  kvCoefficient: { SI: 'Kv', US: 'Cv' },
  fraction: { SI: '%', US: '%' },
};

/** How a quantity is named in messages ("'gpm' is a flow, not a length"). */
export const QUANTITY_NOUN: Readonly<Record<Quantity, string>> = {
  length: 'a length',
  diameter: 'a diameter',
  roughness: 'a roughness',
  elevation: 'an elevation',
  volumeFlow: 'a flow',
  massFlow: 'a mass flow',
  velocity: 'a velocity',
  pressureAbs: 'an absolute pressure',
  pressureGauge: 'a gauge pressure',
  pressureDrop: 'a pressure drop',
  head: 'a head',
  temperature: 'a temperature',
  density: 'a density',
  dynamicViscosity: 'a dynamic viscosity',
  kinematicViscosity: 'a kinematic viscosity',
  power: 'a power',
  kvCoefficient: 'a flow coefficient',
  fraction: 'a fraction',
};

/** How a dimension is named in messages. */
export const DIMENSION_NOUN: Readonly<Record<Dimension, string>> = {
  length: 'a length',
  volumeFlow: 'a flow',
  massFlow: 'a mass flow',
  velocity: 'a velocity',
  pressure: 'a pressure',
  temperature: 'a temperature',
  density: 'a density',
  dynamicViscosity: 'a dynamic viscosity',
  kinematicViscosity: 'a kinematic viscosity',
  power: 'a power',
  flowCoefficient: 'a flow coefficient',
  fraction: 'a fraction',
};

const BY_SYMBOL = new Map(UNITS.map((u) => [u.symbol, u]));

/** The unit with this exact symbol, or undefined. */
export function unitBySymbol(symbol: string): UnitDefinition | undefined {
  return BY_SYMBOL.get(symbol);
}

/** Symbols of the units accepted for a quantity (pressure drops take no gauge/abs units). */
export function unitsFor(quantity: Quantity): string[] {
  const dimension = QUANTITY_DIMENSION[quantity];
  return UNITS.filter(
    (u) =>
      u.dimension === dimension &&
      !(quantity === 'pressureDrop' && u.reference !== undefined && u.reference !== 'plain'),
  ).map((u) => u.symbol);
}

/** Display unit symbol of a quantity in a unit system. */
export function displayUnit(quantity: Quantity, system: UnitSystem): string {
  return DISPLAY_UNITS[quantity][system];
}

/** Pressure reference a quantity is stored in ('abs', 'gauge', or none for a drop). */
export function quantityReference(quantity: Quantity): 'abs' | 'gauge' | null {
  if (quantity === 'pressureAbs') return 'abs';
  if (quantity === 'pressureGauge') return 'gauge';
  return null;
}
