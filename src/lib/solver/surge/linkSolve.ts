/**
 * The flow through a node between two pipes at one time step of the method of
 * characteristics. The upstream side follows its C⁺ characteristic H_A = c_A − b_A·Q, the
 * downstream side its C⁻ characteristic H_B = c_B + b_B·(Q − s) (s: flow taken off the route
 * here); a side with a vapour cavity holds its head at the vapour head instead (b = 0). The node's
 * law gives H_A − H_B = L(Q) (Wylie & Streeter, Fluid Transients in Systems, 1993, ch. 3 for
 * the boundary conditions: valve, junction, pump).
 */
import type { LinkLaw } from './line';

/**
 * Flow of k·Q·|Q| + d + B·Q = C (k ≥ 0): the root of a quadratic taken in the form that does
 * not cancel. NaN when B = 0 and k = 0 (no law to fix the flow).
 */
export function lossFlow(k: number, d: number, c: number, b: number): number {
  const r = c - d;
  if (!(k > 0)) return b > 0 ? r / b : NaN;
  if (!(b > 0)) return Math.sign(r) * Math.sqrt(Math.abs(r) / k);
  return (2 * r) / (b + Math.sqrt(b * b + 4 * k * Math.abs(r)));
}

/**
 * Flow through a pump: −(c₀α² + c₁αQ + c₂Q² + c) + B·Q = C, the larger root (the pump's
 * falling branch); 0 when there is none or it is negative (no reverse flow).
 */
export function pumpFlow(
  coefficients: readonly [number, number, number],
  offset: number,
  alpha: number,
  c: number,
  b: number,
): number {
  const [c0, c1, c2] = coefficients;
  const a2 = -c2;
  const b2 = b - c1 * alpha;
  const k2 = -(c0 * alpha * alpha + offset + c);
  let q: number;
  if (Math.abs(a2) < 1e-12 * Math.max(1, Math.abs(b2))) {
    q = b2 !== 0 ? -k2 / b2 : 0;
  } else {
    const disc = b2 * b2 - 4 * a2 * k2;
    if (disc < 0) return 0;
    const s = Math.sqrt(disc);
    if (a2 > 0) q = b2 >= 0 ? (-2 * k2) / (b2 + s) : (-b2 + s) / (2 * a2);
    else q = (-b2 - s) / (2 * a2);
  }
  return q > 0 && Number.isFinite(q) ? q : 0;
}

/** The flow through a node with law `law` at time `t` (s), pump speed ratio `alpha`. */
export function linkFlow(
  law: LinkLaw,
  t: number,
  alpha: number,
  cA: number,
  bA: number,
  cB: number,
  bB: number,
  offtake: number,
): number {
  const b = bA + bB;
  const c = cA - cB + bB * offtake;
  switch (law.kind) {
    case 'closed':
      return 0;
    case 'loss': {
      const q = lossFlow(law.k, law.d, c, b);
      return law.nonReturn && q < 0 ? 0 : q;
    }
    case 'valve': {
      const tau = law.tau(t);
      if (!(tau > 0)) return 0;
      return lossFlow(law.k0 / (tau * tau), 0, c, b);
    }
    case 'pump':
      return pumpFlow(law.fit.coefficients, law.c, alpha, c, b);
  }
}
