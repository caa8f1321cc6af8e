/**
 * Control valves passing liquids: IEC 60534-2-1:2011, "Industrial-process control valves —
 * Part 2-1: Flow capacity — Sizing equations for fluid flow under installed conditions",
 * turbulent, non-choked flow without attached fittings (Fp = 1), plus inherent
 * characteristics and the choked-flow limit.
 *
 * Kv is the flow of water in m³/h through the valve at a pressure drop of 1 bar. The sizing
 * equation (IEC 60534-2-1 eq. (1), with N1 = 1 for m³/h and bar):
 *   Q = Kv · √(Δp / (ρ/ρ0))
 * where ρ/ρ0 is the relative density, which the standard sets to 1.0 for water at 15 °C.
 * So ρ0 is the density of water at 15 °C, 999.10 kg/m³ (IAPWS-IF97 at 288.15 K and
 * 101.325 kPa gives 999.101 kg/m³). Taking ρ0 = 1000 kg/m³ instead changes Kv by 0.045 %.
 */
import { CV_PER_KV } from '../units/quantities';

/** Inherent characteristic (the same names as the document's `ValveCharacteristic`). */
export type ValveCharacteristicName = 'linear' | 'equal-percentage' | 'quick-opening';

/** Reference density ρ0 of the relative density ρ/ρ0: water at 15 °C, kg/m³ (see above). */
export const REFERENCE_WATER_DENSITY = 999.1;

/** Pa per bar (NIST SP 811 (2008) Appendix B: bar = 1e5 Pa exactly). */
const BAR = 1e5;
/** s per hour. */
const HOUR = 3600;

/** Kv (m³/h at 1 bar) from Cv (US gal/min at 1 psi): Kv = Cv / 1.156 (IEC 60534-2-1). */
export function kvFromCv(cv: number): number {
  return cv / CV_PER_KV;
}

/** Cv from Kv: Cv = 1.156 · Kv (IEC 60534-2-1). */
export function cvFromKv(kv: number): number {
  return kv * CV_PER_KV;
}

/**
 * Relative flow coefficient Φ = Kv(x)/Kv(1) (0–1) against relative travel x (0 shut, 1 open).
 * - linear: Φ = x (IEC 60534-2-4 ideal inherent linear characteristic; from memory);
 * - equal-percentage: Φ = R^(x − 1), R the inherent rangeability (same source);
 * - quick-opening: Φ = √x, a common model (quick-opening trims have no single standard form).
 * Opening 0 means shut, so Φ(0) = 0 for every characteristic, although R^(x−1) tends to 1/R:
 * the equal-percentage valve jumps from shut to 1/R at the first movement, as a real plug
 * lifting off its seat does. Openings outside 0–1 are clamped; rangeability below 1 is taken
 * as 1. NaN opening gives NaN.
 */
export function relativeFlowCoefficient(
  characteristic: ValveCharacteristicName,
  opening: number,
  rangeability: number,
): number {
  if (Number.isNaN(opening)) return NaN;
  const x = Math.min(Math.max(opening, 0), 1);
  if (x === 0) return 0;
  switch (characteristic) {
    case 'linear':
      return x;
    case 'equal-percentage':
      return Math.pow(Math.max(rangeability, 1), x - 1);
    case 'quick-opening':
      return Math.sqrt(x);
  }
}

/**
 * Flow through the valve, m³/s, for a pressure drop Δp (Pa) and liquid density (kg/m³):
 * Q = Kv · √((Δp/1 bar) / (ρ/ρ0)) m³/h (IEC 60534-2-1 eq. (1), turbulent, not choked).
 * The sign of Δp gives the sign of the flow. Kv ≤ 0 (shut) gives 0.
 */
export function valveFlowFromPressureDrop(kv: number, dp: number, density: number): number {
  if (!(kv > 0)) return 0;
  const relativeDensity = density / REFERENCE_WATER_DENSITY;
  const q = kv * Math.sqrt(Math.abs(dp) / BAR / relativeDensity);
  return (Math.sign(dp) * q) / HOUR;
}

/**
 * Pressure drop across the valve, Pa, for a flow Q (m³/s): Δp = (ρ/ρ0)·(Q/Kv)² bar, the
 * inverse of `valveFlowFromPressureDrop`, signed like Q. A shut valve (Kv ≤ 0) gives Infinity
 * for any flow other than zero, and 0 for zero flow.
 */
export function valvePressureDropFromFlow(kv: number, flow: number, density: number): number {
  if (flow === 0) return 0;
  if (!(kv > 0)) return Math.sign(flow) * Infinity;
  const q = (flow * HOUR) / kv; // m³/h per unit Kv
  return (density / REFERENCE_WATER_DENSITY) * q * Math.abs(q) * BAR;
}

/**
 * Liquid critical pressure ratio factor FF = 0.96 − 0.28·√(pv/pc) (IEC 60534-2-1 eq. for FF).
 * pv/pc is limited to 0–1. Unknown critical pressure (null or not positive) gives 0.96, the
 * largest FF, which gives the smallest choked pressure drop (the cautious side).
 */
export function liquidCriticalPressureRatioFactor(
  vapourPressure: number,
  criticalPressure: number | null,
): number {
  if (criticalPressure === null || !(criticalPressure > 0)) return 0.96;
  const ratio = Math.min(Math.max(vapourPressure / criticalPressure, 0), 1);
  return 0.96 - 0.28 * Math.sqrt(ratio);
}

/**
 * Pressure drop at which liquid flow chokes, Pa: Δp_max = FL²·(p1 − FF·pv)
 * (IEC 60534-2-1, choked-flow condition for liquids without attached fittings).
 * Not below 0 (an inlet already below FF·pv chokes at once).
 */
export function chokedPressureDrop(
  FL: number,
  inletPressureAbs: number,
  vapourPressure: number,
  criticalPressure: number | null,
): number {
  const ff = liquidCriticalPressureRatioFactor(vapourPressure, criticalPressure);
  return Math.max(FL * FL * (inletPressureAbs - ff * vapourPressure), 0);
}
