/**
 * How the findings' messages write their numbers: in the project's unit system, rounded for
 * reading. SI messages keep the units engineers read vapour margins in (kPa, kPa(g), m, m/s,
 * bar(g), °C); US messages use psia, psig, psi, ft, ft/s and °F. The decimals are chosen so a
 * message resolves about the same step in either system (0.1 kPa ≈ 0.015 psi, 0.01 m ≈ 0.03 ft).
 * Conversion factors come from the unit table (NIST SP 811, see units/quantities.ts).
 */
import { toDisplay } from '../../units/convert';
import { unitBySymbol, type UnitSystem } from '../../units/quantities';

/** Formatters for the quantities that appear in findings' messages (all take SI values). */
export interface MessageUnits {
  /** Absolute pressure, Pa → "52.9 kPa" / "7.67 psia". */
  pressureAbs(pa: number): string;
  /** Gauge pressure, Pa(g) → "−27.8 kPa(g)" / "−4.03 psig". */
  pressureGauge(pa: number): string;
  /** A pressure difference, Pa → "104.0 kPa" / "15.08 psi". */
  pressureDrop(pa: number): string;
  /** A pipe's design or working pressure, Pa(g) → "16.00 bar(g)" / "232.1 psig". */
  ratingGauge(pa: number): string;
  /** A head, m → "10.67 m" / "35.01 ft". */
  head(m: number): string;
  /** A small head imbalance, m → "0.0012 m" / "0.0039 ft". */
  headResidual(m: number): string;
  /** An elevation, m → "9.00 m" / "29.53 ft". */
  elevation(m: number): string;
  /** A chainage along a route, m → "76.5 m" / "251.0 ft". */
  chainage(m: number): string;
  /** A span of chainage, m → "10.0–24.5 m" / "32.8–80.4 ft". */
  chainageSpan(start: number, end: number): string;
  /** A volume flow, m³/s → "29.4 m³/h" / "129.6 gpm". */
  flow(q: number): string;
  /** A velocity, m/s → "2.31 m/s" / "7.58 ft/s". */
  velocity(ms: number): string;
  /** A temperature, K → "95.0 °C" / "203.0 °F". */
  temperature(k: number): string;
}

function fixed(value: number, digits: number): string {
  return Number.isFinite(value) ? value.toFixed(digits) : '–';
}

/** SI value divided by the unit's factor (linear units only). */
function inUnit(symbol: string): (value: number) => number {
  const unit = unitBySymbol(symbol);
  if (!unit) throw new Error(`Unit '${symbol}' is missing from the unit table`);
  return (value) => value / unit.factor;
}

const SI: MessageUnits = {
  pressureAbs: (pa) => `${fixed(pa / 1000, 1)} kPa`,
  pressureGauge: (pa) => `${fixed(pa / 1000, 1)} kPa(g)`,
  pressureDrop: (pa) => `${fixed(pa / 1000, 1)} kPa`,
  ratingGauge: (pa) => `${fixed(pa / 1e5, 2)} bar(g)`,
  head: (m) => `${fixed(m, 2)} m`,
  headResidual: (m) => `${fixed(m, 4)} m`,
  elevation: (m) => `${fixed(m, 2)} m`,
  chainage: (m) => `${fixed(m, 1)} m`,
  chainageSpan: (a, b) => `${fixed(a, 1)}–${fixed(b, 1)} m`,
  velocity: (ms) => `${fixed(ms, 2)} m/s`,
  flow: (q) => `${fixed(q * 3600, 1)} m³/h`,
  temperature: (k) => `${fixed(k - 273.15, 1)} °C`,
};

const psi = inUnit('psi');
const ft = inUnit('ft');
const fps = inUnit('ft/s');
const gpm = inUnit('gpm');

const US: MessageUnits = {
  pressureAbs: (pa) => `${fixed(psi(pa), 2)} psia`,
  pressureGauge: (pa) => `${fixed(psi(pa), 2)} psig`,
  pressureDrop: (pa) => `${fixed(psi(pa), 2)} psi`,
  ratingGauge: (pa) => `${fixed(psi(pa), 1)} psig`,
  head: (m) => `${fixed(ft(m), 2)} ft`,
  headResidual: (m) => `${fixed(ft(m), 4)} ft`,
  elevation: (m) => `${fixed(ft(m), 2)} ft`,
  chainage: (m) => `${fixed(ft(m), 1)} ft`,
  chainageSpan: (a, b) => `${fixed(ft(a), 1)}–${fixed(ft(b), 1)} ft`,
  velocity: (ms) => `${fixed(fps(ms), 2)} ft/s`,
  flow: (q) => `${fixed(gpm(q), 1)} gpm`,
  temperature: (k) => `${fixed(toDisplay(k, 'temperature', 'US'), 1)} °F`,
};

/** The message formatters of a unit system. */
export function messageUnits(system: UnitSystem): MessageUnits {
  return system === 'US' ? US : SI;
}
