/**
 * A tripped pump's run-down: the rotating parts slow under the pump's own torque,
 * I·dω/dt = −T (Wylie & Streeter, Fluid Transients in Systems, 1993, ch. 4, pump run-down).
 * The torque comes from the pump's head and efficiency curves at rated speed through the
 * affinity laws: at speed ratio α and flow Q, the corresponding rated-speed flow is q = Q/α and
 * T = α²·T_r(q), T_r(q) = ρ·g·q·H_r(q)/(η_r(q)·ω_r). Outside the flows where the efficiency
 * curve holds (η ≥ 0.1 within its points) T_r is held at the nearest end: at low flow that
 * over-states the torque of a radial pump, so the pump slows faster, which does not hide a
 * down-surge. No four-quadrant data: the pump does not turn or flow backwards.
 */
import type { Pump } from '../../model/types';
import { fitCurve, pumpHead, pumpEfficiency, type PumpFit } from '../../physics/pump';
import { GRAVITY } from '../network/laws';

/** Lowest efficiency taken as "the curve holds here". */
const MIN_EFFICIENCY = 0.1;

/** The run-down torque of one pump. */
export interface RunDown {
  /** Rated angular speed ω_r, rad/s. */
  ratedOmega: number;
  /** Shaft torque, N·m, at speed ratio α (N/N_rated) and flow Q (m³/s). */
  torque(alpha: number, flow: number): number;
}

/** The run-down torque model of `pump` for liquid density `density`; null without curves. */
export function runDown(pump: Pump, density: number): RunDown | null {
  const head = fitCurve(pump.headCurve);
  const eff = fitCurve(pump.efficiencyCurve);
  if (head.form === 'empty' || eff.form === 'empty' || eff.flowRange === null) return null;
  const range = usableRange(eff, eff.flowRange);
  if (!range) return null;
  const ratedOmega = (2 * Math.PI * pump.ratedSpeed) / 60;
  const ratedTorque = (q: number) => {
    const qc = Math.min(Math.max(q, range.min), range.max);
    const h = pumpHead(head, qc, 1);
    const n = pumpEfficiency(eff, qc, 1);
    return (density * GRAVITY * qc * h) / (n * ratedOmega);
  };
  return {
    ratedOmega,
    torque(alpha, flow) {
      if (!(alpha > 1e-9)) return 0;
      return Math.max(0, alpha * alpha * ratedTorque(flow / alpha));
    },
  };
}

/** Flows (rated speed) within the efficiency points where η ≥ MIN_EFFICIENCY; null if none. */
function usableRange(
  eff: PumpFit,
  points: { min: number; max: number },
): { min: number; max: number } | null {
  const n = 200;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i <= n; i++) {
    const q = points.min + ((points.max - points.min) * i) / n;
    if (q > 0 && pumpEfficiency(eff, q, 1) >= MIN_EFFICIENCY) {
      lo = Math.min(lo, q);
      hi = Math.max(hi, q);
    }
  }
  return lo <= hi ? { min: lo, max: hi } : null;
}

/**
 * Rotating inertia of pump and motor, kg·m², estimated from shaft power `power` (W) and speed
 * `speed` (rpm) by the correlations of Thorley & Faithfull (1992), as quoted in Thorley, Fluid
 * Transients in Pipeline Systems (2nd ed., 2004) — from memory, so take it as a first guess:
 *   pump  I = 0.03768·(P/N³)^0.9556,  motor I = 0.0043·(P/N)^1.48,  P in kW, N in 1000 rpm.
 */
export function estimatedInertia(power: number, speed: number): number {
  const p = power / 1000;
  const n = speed / 1000;
  if (!(p > 0) || !(n > 0)) return NaN;
  return 0.03768 * Math.pow(p / (n * n * n), 0.9556) + 0.0043 * Math.pow(p / n, 1.48);
}
