/**
 * Curves for the pump chart in details: the fitted pump curve at running speed, the system
 * curve (the head the rest of the network asks of this pump at each flow, found by solving
 * with the pump on duty at that flow), and the operating point. Pure functions.
 */
import type { HeadrouteDocument, Id, Pump } from '../../model/types';
import {
  fitCurve,
  pumpEfficiency,
  pumpHead,
  pumpNpshRequired,
  type PumpCurveKind,
} from '../../physics/pump';
import type { SolveResult } from '../../solver/types';

export interface FlowHead {
  flow: number;
  head: number;
}

/** Flows from 0 to `max` in `n` equal steps (n + 1 points). */
export function flowSteps(max: number, n: number): number[] {
  return Array.from({ length: n + 1 }, (_, i) => (max * i) / n);
}

/** Largest flow worth drawing: 1.2 × the last curve point (or the operating flow if larger). */
export function chartFlowMax(pump: Pump, operatingFlow: number | null): number {
  const last = Math.max(0, ...pump.headCurve.map((p) => p.flow));
  const q = Math.max(last, operatingFlow ?? 0);
  return q > 0 ? q * 1.2 : 0.01;
}

/** The pump's head curve at running speed (affinity laws in the physics module). */
export function pumpCurve(pump: Pump, flows: number[]): FlowHead[] {
  const fit = fitCurve(pump.headCurve);
  if (fit.form === 'empty') return [];
  const ratio = pump.ratedSpeed > 0 ? pump.speed / pump.ratedSpeed : 1;
  return flows
    .map((flow) => ({ flow, head: pumpHead(fit, flow, ratio) }))
    .filter((p) => Number.isFinite(p.head) && p.head >= 0);
}

/** The document with pump `id` running on duty at `flow`. */
export function withDutyFlow(doc: HeadrouteDocument, id: Id, flow: number): HeadrouteDocument {
  const pump = doc.nodes[id] as Pump;
  return {
    ...doc,
    nodes: { ...doc.nodes, [id]: { ...pump, running: true, mode: 'duty', dutyFlow: flow } },
  };
}

/**
 * The system curve seen by pump `id`: for each flow, the head the pump must give when the
 * rest of the network stays as it is. Points where the solve fails or does not converge are
 * left out.
 */
export function systemCurve(
  doc: HeadrouteDocument,
  id: Id,
  flows: number[],
  solve: (doc: HeadrouteDocument) => SolveResult,
): FlowHead[] {
  const out: FlowHead[] = [];
  for (const flow of flows) {
    try {
      const r = solve(withDutyFlow(doc, id, flow));
      const p = r.pumps[id];
      if (r.converged && p && Number.isFinite(p.head)) out.push({ flow, head: p.head });
    } catch {
      // a failed point is simply not drawn
    }
  }
  return out;
}

/** A point of any pump curve: flow, m³/s, and its value (m, or a fraction for efficiency). */
export interface FlowValue {
  flow: number;
  value: number;
}

/** A pump curve at running speed, split where it leaves the given points. */
export interface CurveSeries {
  /** Below the first given point: the fit extrapolated towards zero flow (drawn dashed). */
  before: FlowValue[];
  /** From the first to the last given point (scaled to running speed). */
  within: FlowValue[];
  /** Beyond the last given point: the fit extrapolated (drawn dashed and labelled). */
  beyond: FlowValue[];
  /** The given points at running speed (affinity laws), as the fit sees them. */
  points: FlowValue[];
  /** Last given flow at running speed, m³/s; null when the curve has no points. */
  lastFlow: number | null;
}

const CURVE_POINTS = {
  head: 'headCurve',
  npshr: 'npshrCurve',
  efficiency: 'efficiencyCurve',
} as const;

/**
 * One of the pump's curves (head, NPSHr or efficiency) at running speed over `flows`, split
 * at the last given point. Affinity laws as in the solver: Q ∝ N, H and NPSHr ∝ N², efficiency
 * unchanged at corresponding points.
 */
export function curveSeries(pump: Pump, kind: PumpCurveKind, flows: number[]): CurveSeries {
  const given = pump[CURVE_POINTS[kind]];
  const fit = fitCurve(given);
  const empty: CurveSeries = { before: [], within: [], beyond: [], points: [], lastFlow: null };
  if (fit.form === 'empty' || fit.flowRange === null) return empty;
  const s = pump.ratedSpeed > 0 ? pump.speed / pump.ratedSpeed : 1;
  if (!(s > 0)) return empty;
  const at = (flow: number) =>
    kind === 'head'
      ? pumpHead(fit, flow, s)
      : kind === 'npshr'
        ? pumpNpshRequired(fit, flow, s)
        : pumpEfficiency(fit, flow, s);
  const valueScale = kind === 'efficiency' ? 1 : s * s;
  const firstFlow = fit.flowRange.min * s;
  const lastFlow = fit.flowRange.max * s;
  const usable = (v: number) => Number.isFinite(v) && v >= 0;
  const before: FlowValue[] = [];
  const within: FlowValue[] = [];
  const beyond: FlowValue[] = [];
  for (const flow of flows) {
    const value = at(flow);
    if (!usable(value)) continue;
    if (flow < firstFlow) before.push({ flow, value });
    else if (flow <= lastFlow) within.push({ flow, value });
    else beyond.push({ flow, value });
  }
  // The pieces meet at the first and last given flows, so solid and dashed lines join.
  const first = at(firstFlow);
  if (usable(first)) {
    if (within.length === 0 || within[0].flow > firstFlow)
      within.unshift({ flow: firstFlow, value: first });
    if (before.length > 0) before.push({ flow: firstFlow, value: first });
  }
  const last = at(lastFlow);
  if (usable(last)) {
    if (within.length === 0 || within[within.length - 1].flow < lastFlow)
      within.push({ flow: lastFlow, value: last });
    if (beyond.length > 0) beyond.unshift({ flow: lastFlow, value: last });
  }
  const points = given
    .filter((p) => Number.isFinite(p.flow) && Number.isFinite(p.value))
    .map((p) => ({ flow: p.flow * s, value: p.value * valueScale }));
  return { before, within, beyond, points, lastFlow };
}
