/**
 * Temperature correlations used by the liquids library, each stored as plain data
 * (coefficients, valid range, source) and evaluated by `evaluateCorrelation`.
 *
 * Forms (SI: K, Pa, kg/m³, Pa·s):
 * - DIPPR equation 101: Y = exp(C1 + C2/T + C3·ln T + C4·T^C5). Perry's Chemical Engineers'
 *   Handbook, 8th ed. (2008), uses it for the vapour pressure of liquids (Table 2-8, Y in Pa)
 *   and for the viscosity of liquids (Table 2-313, Y in Pa·s).
 * - DIPPR equation 105: ρ = C1 / C2^(1 + (1 − T/C3)^C4), molar density in kmol/m³; Perry's
 *   8th ed., Table 2-32 (Density of Inorganic and Organic Liquids). Multiplied here by the
 *   molar mass, kg/kmol, to give kg/m³.
 * - Wagner equation, "2.5-5" form: ln(p/pc) = (A·τ + B·τ^1.5 + C·τ^2.5 + D·τ^5)/Tr with
 *   Tr = T/Tc, τ = 1 − Tr; Poling, Prausnitz and O'Connell, The Properties of Gases and Liquids,
 *   5th ed. (2001), Eq. 7-3.3 and Appendix A.
 */

/** A closed temperature interval, K. */
export interface TemperatureRange {
  min: number;
  max: number;
}

/** Fields shared by every stored correlation. */
interface CorrelationBase {
  /** Temperatures, K, over which the source states the correlation holds. */
  range: TemperatureRange;
  /** Where the coefficients come from: handbook, edition, table; "from memory" if so. */
  source: string;
}

/** DIPPR equation 101, Y = exp(C1 + C2/T + C3 ln T + C4 T^C5); Y in Pa or Pa·s. */
export interface Dippr101 extends CorrelationBase {
  form: 'dippr101';
  c: readonly [number, number, number, number, number];
}

/** DIPPR equation 105, molar density in kmol/m³, times `molarMass` (kg/kmol) → kg/m³. */
export interface Dippr105 extends CorrelationBase {
  form: 'dippr105';
  c: readonly [number, number, number, number];
  molarMass: number;
}

/** Wagner 2.5-5 vapour-pressure equation with its critical constants (Tc in K, pc in Pa). */
export interface Wagner25 extends CorrelationBase {
  form: 'wagner25';
  a: number;
  b: number;
  c: number;
  d: number;
  criticalTemperature: number;
  criticalPressure: number;
}

/** Any stored temperature correlation. */
export type Correlation = Dippr101 | Dippr105 | Wagner25;

/**
 * DIPPR equation 101 (Perry's 8th ed., Tables 2-8 and 2-313):
 * Y = exp(C1 + C2/T + C3·ln T + C4·T^C5).
 */
export function dippr101(c: Dippr101['c'], temperature: number): number {
  const [c1, c2, c3, c4, c5] = c;
  const t = temperature;
  return Math.exp(c1 + c2 / t + c3 * Math.log(t) + c4 * Math.pow(t, c5));
}

/**
 * DIPPR equation 105 (Perry's 8th ed., Table 2-32): molar density, kmol/m³,
 * ρ = C1 / C2^(1 + (1 − T/C3)^C4). Above C3 (the critical temperature) the base of the inner
 * power is negative; it is taken as 0 there so the value stays finite (ρ = C1/C2, the
 * critical density) — such temperatures are outside every stored range and get flagged.
 */
export function dippr105(c: Dippr105['c'], temperature: number): number {
  const [c1, c2, c3, c4] = c;
  const tau = Math.max(0, 1 - temperature / c3);
  return c1 / Math.pow(c2, 1 + Math.pow(tau, c4));
}

/**
 * Wagner "2.5-5" vapour-pressure equation (Poling et al., 5th ed., Eq. 7-3.3), Pa. Above the
 * critical temperature τ is taken as 0 (p = pc) so the value stays finite.
 */
export function wagner25(w: Wagner25, temperature: number): number {
  const tr = temperature / w.criticalTemperature;
  const tau = Math.max(0, 1 - tr);
  const sum = w.a * tau + w.b * tau ** 1.5 + w.c * tau ** 2.5 + w.d * tau ** 5;
  return w.criticalPressure * Math.exp(sum / tr);
}

/** Evaluates a stored correlation at `temperature`, K. */
export function evaluateCorrelation(correlation: Correlation, temperature: number): number {
  switch (correlation.form) {
    case 'dippr101':
      return dippr101(correlation.c, temperature);
    case 'dippr105':
      return dippr105(correlation.c, temperature) * correlation.molarMass;
    case 'wagner25':
      return wagner25(correlation, temperature);
  }
}

/** True when `temperature` lies inside `range` (ends included). NaN is never inside. */
export function inRange(range: TemperatureRange, temperature: number): boolean {
  return temperature >= range.min && temperature <= range.max;
}

/** The overlap of several ranges (where all of them hold). */
export function intersectRanges(ranges: readonly TemperatureRange[]): TemperatureRange {
  return {
    min: Math.max(...ranges.map((r) => r.min)),
    max: Math.min(...ranges.map((r) => r.max)),
  };
}
