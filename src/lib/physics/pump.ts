/**
 * Centrifugal pump curves: fitting user points, speed changes by the affinity laws, best
 * efficiency flow, shaft power and checks for curves that cannot be right.
 *
 * Curve forms, fitted at rated speed by least squares in flow Q (m³/s):
 * - 3 or more distinct flows: quadratic  y = c0 + c1·Q + c2·Q²
 * - 2 distinct flows:         straight line y = c0 + c1·Q
 * - 1 distinct flow:          constant y = c0 (the mean of the values given)
 * - no points:                'empty'; every evaluation returns NaN, so callers check
 *                             `fit.form === 'empty'` first.
 * The polynomial is used as it stands outside the points' flow range; `flowRange` lets the
 * caller flag operation off the curve. A constant (one-point) head curve has zero slope, so
 * the flow it delivers is set by the system alone; `pumpCurveWarnings` reports it.
 *
 * Affinity laws for a speed ratio s = N/N_rated (Karassik et al., Pump Handbook, 4th ed.,
 * 2008, ch. 2 — from memory; the standard textbook form): Q ∝ N, H ∝ N², P ∝ N³, and the
 * efficiency at corresponding points is unchanged. So H(Q, s) = s²·H_rated(Q/s).
 * NPSH required is scaled as ∝ N² (common practice; measured exponents range roughly 1.5–2.5,
 * from memory), NPSHr(Q, s) = s²·NPSHr_rated(Q/s).
 */

/** Standard acceleration of gravity, m/s² (3rd CGPM, 1901; NIST SP 811 (2008)). */
export const STANDARD_GRAVITY = 9.80665;

/** One curve point: flow (m³/s) and a value (head m, NPSHr m, or efficiency 0–1). */
export interface CurvePoint {
  flow: number;
  value: number;
}

/** A fitted pump curve at rated speed. */
export interface PumpFit {
  /** value = c0 + c1·Q + c2·Q² at rated speed, Q in m³/s. */
  coefficients: readonly [number, number, number];
  form: 'quadratic' | 'linear' | 'constant' | 'empty';
  /** Smallest and largest flow among the points, m³/s at rated speed; null when empty. */
  flowRange: { min: number; max: number } | null;
  /** Number of finite points used. */
  pointCount: number;
}

/** Solve a small dense system A·x = b by Gaussian elimination with partial pivoting. */
function solveSmall(a: number[][], b: number[]): number[] {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) {
      if (Math.abs(m[r][col]) > Math.abs(m[pivot][col])) pivot = r;
    }
    [m[col], m[pivot]] = [m[pivot], m[col]];
    for (let r = col + 1; r < n; r++) {
      const f = m[r][col] / m[col][col];
      for (let c = col; c <= n; c++) m[r][c] -= f * m[col][c];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = m[r][n];
    for (let c = r + 1; c < n; c++) s -= m[r][c] * x[c];
    x[r] = s / m[r][r];
  }
  return x;
}

/**
 * Fit a curve through user points (least squares; see the module comment for the form used
 * for 0, 1, 2 and ≥3 distinct flows). Non-finite points are ignored; `pumpCurveWarnings`
 * reports them.
 */
export function fitCurve(points: readonly CurvePoint[]): PumpFit {
  const pts = points.filter((p) => Number.isFinite(p.flow) && Number.isFinite(p.value));
  if (pts.length === 0) {
    return { coefficients: [0, 0, 0], form: 'empty', flowRange: null, pointCount: 0 };
  }
  const flows = pts.map((p) => p.flow);
  const min = Math.min(...flows);
  const max = Math.max(...flows);
  const distinct = new Set(flows).size;
  const flowRange = { min, max };
  if (distinct === 1) {
    const mean = pts.reduce((s, p) => s + p.value, 0) / pts.length;
    return { coefficients: [mean, 0, 0], form: 'constant', flowRange, pointCount: pts.length };
  }
  // Work in x = Q/scale, x in [-1, 1], so the normal equations stay well conditioned.
  const scale = Math.max(Math.abs(min), Math.abs(max));
  const degree = distinct === 2 ? 1 : 2;
  const n = degree + 1;
  const ata = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const atb = new Array<number>(n).fill(0);
  for (const p of pts) {
    const x = p.flow / scale;
    const basis = [1, x, x * x].slice(0, n);
    for (let i = 0; i < n; i++) {
      atb[i] += basis[i] * p.value;
      for (let j = 0; j < n; j++) ata[i][j] += basis[i] * basis[j];
    }
  }
  const c = solveSmall(ata, atb);
  const coefficients: [number, number, number] = [
    c[0],
    c[1] / scale,
    degree === 2 ? c[2] / (scale * scale) : 0,
  ];
  return {
    coefficients,
    form: degree === 2 ? 'quadratic' : 'linear',
    flowRange,
    pointCount: pts.length,
  };
}

/** Rated-speed curve value at flow Q. */
function atRated(fit: PumpFit, flow: number): number {
  if (fit.form === 'empty') return NaN;
  const [c0, c1, c2] = fit.coefficients;
  return c0 + c1 * flow + c2 * flow * flow;
}

/**
 * Head, m, at flow Q (m³/s) and speed ratio s = N/N_rated: H = s²·H_rated(Q/s)
 * = c0·s² + c1·s·Q + c2·Q² (affinity laws, see module comment).
 */
export function pumpHead(fit: PumpFit, flow: number, speedRatio: number): number {
  if (fit.form === 'empty') return NaN;
  const [c0, c1, c2] = fit.coefficients;
  const s = speedRatio;
  return c0 * s * s + c1 * s * flow + c2 * flow * flow;
}

/** dH/dQ, m per m³/s, of `pumpHead` at flow Q and speed ratio s: c1·s + 2·c2·Q. */
export function pumpHeadSlope(fit: PumpFit, flow: number, speedRatio: number): number {
  if (fit.form === 'empty') return NaN;
  const [, c1, c2] = fit.coefficients;
  return c1 * speedRatio + 2 * c2 * flow;
}

/** NPSH required, m, at flow Q and speed ratio s: s²·NPSHr_rated(Q/s) (∝ N², common practice). */
export function pumpNpshRequired(fit: PumpFit, flow: number, speedRatio: number): number {
  return pumpHead(fit, flow, speedRatio);
}

/**
 * Efficiency (0–1) at flow Q and speed ratio s: η_rated(Q/s), unchanged at corresponding
 * points by the affinity laws. NaN for s ≤ 0 (a stopped pump has no efficiency).
 */
export function pumpEfficiency(fit: PumpFit, flow: number, speedRatio: number): number {
  if (!(speedRatio > 0)) return NaN;
  return atRated(fit, flow / speedRatio);
}

/**
 * Flow of best efficiency, m³/s, at speed ratio s: the maximum of the fitted efficiency curve
 * within the points' flow range (the vertex of a downward quadratic if it lies inside,
 * otherwise the better end), scaled by Q ∝ N. Null for an empty fit and for a flat one (one
 * point, or all equal: no flow is better than another).
 */
export function bestEfficiencyFlow(effFit: PumpFit, speedRatio: number): number | null {
  if (effFit.form === 'empty' || effFit.form === 'constant' || effFit.flowRange === null)
    return null;
  const { min, max } = effFit.flowRange;
  const [, c1, c2] = effFit.coefficients;
  const atMin = atRated(effFit, min);
  const atMax = atRated(effFit, max);
  let best = atMin >= atMax ? min : max;
  let peak = Math.max(atMin, atMax);
  if (effFit.form === 'quadratic' && c2 < 0) {
    const vertex = -c1 / (2 * c2);
    if (vertex > min && vertex < max) {
      best = vertex;
      peak = atRated(effFit, vertex);
    }
  }
  // A flat curve (points all equal, fitted to rounding) has no best-efficiency flow.
  if (!(peak - Math.min(atMin, atMax) > FLAT_EFFICIENCY)) return null;
  return best * speedRatio;
}

/** Spread of efficiency over the tested range below which a curve is flat (no BEP), fraction. */
export const FLAT_EFFICIENCY = 1e-9;

/**
 * Shaft power, W: P = ρ·g·Q·H / η (hydraulic power over pump efficiency; e.g. Karassik et al.,
 * Pump Handbook — from memory; g is standard gravity). NaN when η is not a positive number.
 */
export function shaftPower(
  density: number,
  flow: number,
  head: number,
  efficiency: number,
): number {
  if (!(efficiency > 0) || !Number.isFinite(efficiency)) return NaN;
  return (density * STANDARD_GRAVITY * flow * head) / efficiency;
}

/** Which curve a set of points describes. */
export type PumpCurveKind = 'head' | 'npshr' | 'efficiency';

/** Codes of the checks made by `pumpCurveWarnings`. */
export type PumpCurveWarningCode =
  | 'no-points'
  | 'not-a-number'
  | 'negative-flow'
  | 'negative-value'
  | 'duplicate-flow'
  | 'few-points'
  | 'rising-head'
  | 'efficiency-above-one';

/** A problem with a curve's points; `point` is the 0-based index of the point at fault. */
export interface PumpCurveWarning {
  code: PumpCurveWarningCode;
  message: string;
  point?: number;
}

const CURVE_NAME: Record<PumpCurveKind, string> = {
  head: 'head curve',
  npshr: 'NPSHr curve',
  efficiency: 'efficiency curve',
};

/**
 * Checks for curves that cannot be physical or that the fit handles specially: missing or
 * non-numeric points, negative flows or values, repeated flows, fewer than three distinct
 * flows (fitted as a line or a constant), efficiency above 1 (probably typed as %), and a
 * head curve whose fitted head rises with flow over more than half its range.
 */
export function pumpCurveWarnings(
  points: readonly CurvePoint[],
  curve: PumpCurveKind = 'head',
): PumpCurveWarning[] {
  const name = CURVE_NAME[curve];
  const warnings: PumpCurveWarning[] = [];
  if (points.length === 0) {
    return [{ code: 'no-points', message: `The ${name} has no points` }];
  }
  const seen = new Map<number, number>();
  points.forEach((p, i) => {
    const label = `Point ${i + 1} of the ${name}`;
    if (!Number.isFinite(p.flow) || !Number.isFinite(p.value)) {
      warnings.push({ code: 'not-a-number', message: `${label} is not a number`, point: i });
      return;
    }
    if (p.flow < 0) {
      warnings.push({ code: 'negative-flow', message: `${label} has a negative flow`, point: i });
    }
    if (p.value < 0) {
      warnings.push({ code: 'negative-value', message: `${label} has a negative value`, point: i });
    }
    if (curve === 'efficiency' && p.value > 1) {
      warnings.push({
        code: 'efficiency-above-one',
        message: `${label} has an efficiency above 100 % (was it typed as a percentage?)`,
        point: i,
      });
    }
    const first = seen.get(p.flow);
    if (first !== undefined) {
      warnings.push({
        code: 'duplicate-flow',
        message: `${label} repeats the flow of point ${first + 1}`,
        point: i,
      });
    } else {
      seen.set(p.flow, i);
    }
  });
  const fit = fitCurve(points);
  if (fit.form === 'linear' || fit.form === 'constant') {
    warnings.push({
      code: 'few-points',
      message: `The ${name} has fewer than three distinct flows; it is fitted as a ${fit.form === 'linear' ? 'straight line' : 'constant'}`,
    });
  }
  if (curve === 'head' && fit.flowRange && fit.flowRange.max > fit.flowRange.min) {
    const { min, max } = fit.flowRange;
    const samples = 100;
    let rising = 0;
    for (let k = 0; k <= samples; k++) {
      if (pumpHeadSlope(fit, min + ((max - min) * k) / samples, 1) > 0) rising++;
    }
    if (rising > (samples + 1) / 2) {
      warnings.push({
        code: 'rising-head',
        message: `The ${name} rises with flow over most of its range; a centrifugal pump's head falls as flow rises`,
      });
    }
  }
  return warnings;
}
