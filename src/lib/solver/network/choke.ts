/**
 * Control valves that choke. Once the pressure drop across a valve passes
 * Δp_max = FL²·(p1 − FF·pv), the flow no longer rises with the drop: it stays at the choked
 * flow Q_max = Kv·√(Δp_max/Δp0 / (ρ/ρ0)) (IEC 60534-2-1, liquid choked-flow equations), and the
 * liquid cavitates or flashes in the valve. Q_max depends on the inlet pressure p1, which itself
 * depends on the flow (less flow, less loss upstream, a pump higher on its curve), so it is not a
 * head-loss law the gradient method can take directly.
 *
 * The sheet is solved first with every valve on its unchoked law. For each valve that chokes,
 * its flow is held at a cap x (network/laws.ts ChokedValveLaw) and x is moved until the flow it
 * lets through equals the choked flow at the inlet pressure that results:
 * F(x) = |Q(x)| − Q_max(p1(x)) = 0. F rises with x (a higher cap, more flow, lower p1, smaller
 * Q_max) from F(0) ≤ 0 to F(Q_free) > 0, so the root is bracketed and found by regula falsi with
 * the Illinois modification (Dowell and Jarratt, 1971, BIT 11, "A modified regula falsi method
 * for computing the root of an equation"). Several choking valves are settled in turn, in
 * passes, until none moves. Every evaluation is a full solve; sheets without a choking valve pay
 * nothing.
 */
import type { Id } from '../../model/types';
import type { SolveFluid } from '../fluid';
import { elementResults } from '../results';
import type { HydraulicGraph } from './build';
import { gradientSolve, type GgaOutcome } from './gga';
import { ChokedValveLaw, GRAVITY, QuadraticLaw } from './laws';

/** Most full solves spent on settling choked valves. */
export const MAX_CHOKE_SOLVES = 80;
/** Most passes over the choking valves. */
const MAX_PASSES = 6;
/** A cap is settled when |F| is below this, m³/s, plus CHOKE_RELATIVE of the flow. */
const CHOKE_FLOW_TOLERANCE = 1e-9;
const CHOKE_RELATIVE = 1e-8;

/** A solved sheet: the iteration's outcome and the element results built from it. */
export interface SolvedState {
  outcome: GgaOutcome;
  results: ReturnType<typeof elementResults>;
}

/** The solve with choked control valves held at their choked flow. */
export interface ChokeSolve extends SolvedState {
  /** Control valves (ids) whose flow is held at the choked flow. */
  limited: Set<Id>;
  /** True when the choked flows did not settle within MAX_CHOKE_SOLVES: no flow is held then. */
  unsettled: boolean;
  /** Full solves spent (1 without a choking valve). */
  solves: number;
}

interface Valve {
  link: number;
  id: Id;
  law: QuadraticLaw;
  /** Slope of the held law beyond its cap, s/m² (set when the valve first chokes). */
  steep: number;
}

/**
 * Slope beyond the cap for a valve that passes `free` when unchoked: 1000 times the quadratic's
 * slope there, kept below 1e7 s/m² (under the iteration's stiff-branch slope, 1e8) unless that
 * is less than 4 times the quadratic's slope, which it must exceed for the law to fall as the
 * cap rises (every cap lies below `free`).
 */
function steepness(coefficient: number, free: number): number {
  const quadratic = 2 * coefficient * free;
  return Math.max(Math.min(1000 * quadratic, 1e7), 4 * quadratic, 1);
}

/** Solves the active part of the graph, holding every choking control valve at its choked flow. */
export function solveWithChokedValves(
  graph: HydraulicGraph,
  activeNode: Uint8Array,
  activeLink: Uint8Array,
  fluid: SolveFluid,
): ChokeSolve {
  let solves = 0;
  const run = (): SolvedState => {
    solves++;
    const outcome = gradientSolve(graph, activeNode, activeLink);
    return { outcome, results: elementResults(graph, outcome, activeLink, fluid) };
  };
  let state = run();
  const valves = valveLinks(graph, activeLink);
  const chokes = (s: SolvedState, v: Valve) =>
    s.outcome.converged && s.results.records.controlValves[v.id]?.choked === true;
  if (!valves.some((v) => chokes(state, v)))
    return { ...state, limited: new Set(), unsettled: false, solves };

  const rhoG = fluid.density * GRAVITY;
  /** The choked flow at the inlet pressure of state `s`, m³/s: c·Q² = Δp_max/ρg. */
  const chokedFlow = (s: SolvedState, v: Valve) =>
    Math.sqrt(s.results.records.controlValves[v.id].chokedPressureDrop / rhoG / v.law.coefficient);
  const flowOf = (s: SolvedState, v: Valve) => Math.abs(s.outcome.flows[v.link]);
  const setCap = (v: Valve, cap: number | null) => {
    graph.links[v.link].law =
      cap === null ? v.law : new ChokedValveLaw(v.law.coefficient, cap, v.steep, v.law.initialFlow);
  };
  const caps = new Map<number, number>();
  /** F at cap x for valve v (a full solve), with the state it leaves. */
  const residual = (v: Valve, x: number): number => {
    setCap(v, x);
    state = run();
    return state.outcome.converged ? flowOf(state, v) - chokedFlow(state, v) : NaN;
  };

  const capOf = (v: Valve) => {
    const law = graph.links[v.link].law;
    return law instanceof ChokedValveLaw ? law.cap : null;
  };
  let settled = false;
  let failed = false;
  for (let pass = 0; pass < MAX_PASSES && !settled && !failed; pass++) {
    let moved = false;
    for (const v of valves) {
      const cap = caps.get(v.link);
      if (cap !== undefined && state.outcome.converged) {
        // Held already: still at its cap, and the cap still the choked flow there?
        const q = flowOf(state, v);
        if (q >= cap - tolerance(cap) && Math.abs(q - chokedFlow(state, v)) <= tolerance(cap))
          continue;
      }
      if (cap !== undefined) {
        setCap(v, null);
        state = run();
      }
      if (!chokes(state, v)) {
        if (caps.delete(v.link)) moved = true;
        continue;
      }
      const free = flowOf(state, v);
      v.steep = steepness(v.law.coefficient, free);
      const root = settleCap(v, free, chokedFlow(state, v), residual, () => solves);
      if (root === null) {
        failed = true;
        break;
      }
      if (cap === undefined || Math.abs(cap - root) > tolerance(root)) moved = true;
      caps.set(v.link, root);
      // Leave the state solved at the root (the search may have stopped on another cap).
      if (capOf(v) !== root) residual(v, root);
    }
    settled = !failed && (!moved || valves.length === 1);
  }

  if (!settled || !state.outcome.converged) {
    // Holding the flows did not settle: back to the unchoked laws, and the findings say so.
    for (const v of valves) setCap(v, null);
    state = run();
    return { ...state, limited: new Set(), unsettled: true, solves };
  }
  const limited = new Set<Id>();
  for (const v of valves) {
    if (!caps.has(v.link)) continue;
    limited.add(v.id);
    const record = state.results.records.controlValves[v.id];
    if (record) {
      record.choked = true;
      record.flowLimited = true;
    }
  }
  // The graph belongs to this solve only, but leave its laws as built.
  for (const v of valves) setCap(v, null);
  return { ...state, limited, unsettled: false, solves };
}

function tolerance(flow: number): number {
  return CHOKE_FLOW_TOLERANCE + CHOKE_RELATIVE * Math.abs(flow);
}

/**
 * The cap x in [0, free] with F(x) = 0 by Illinois regula falsi, starting from the bracket
 * [start, free] (start = the choked flow while free; widened to [0, start] if F(start) > 0).
 * Returns null when the budget runs out or a solve fails.
 */
function settleCap(
  v: Valve,
  free: number,
  start: number,
  residual: (v: Valve, x: number) => number,
  spent: () => number,
): number | null {
  let hi = free;
  // F(free) = free − Q_max(free) > 0: the valve chokes when free.
  let fHi = free - start;
  let lo = Math.min(start, free);
  let fLo = residual(v, lo);
  if (!Number.isFinite(fLo)) return null;
  if (fLo > 0) {
    hi = lo;
    fHi = fLo;
    lo = 0;
    fLo = residual(v, 0);
    if (!Number.isFinite(fLo)) return null;
    // Still choking with the cap at 0: the inlet is at or below FF·pv even at rest, or the
    // held law cannot hold it; give up (the caller falls back to the unchoked laws and says so).
    if (fLo >= 0) return null;
  }
  if (Math.abs(fLo) <= tolerance(lo)) return lo;
  let side = 0;
  while (spent() < MAX_CHOKE_SOLVES) {
    const x = hi - (fHi * (hi - lo)) / (fHi - fLo);
    const fx = residual(v, x);
    if (!Number.isFinite(fx)) return null;
    // Settled, or the bracket is down to the last bits of a double.
    if (Math.abs(fx) <= tolerance(x) || hi - lo <= 4 * Number.EPSILON * hi) return x;
    if (fx > 0) {
      hi = x;
      fHi = fx;
      if (side === 1) fLo /= 2; // Illinois: halve the end that stayed
      side = 1;
    } else {
      lo = x;
      fLo = fx;
      if (side === -1) fHi /= 2;
      side = -1;
    }
  }
  return null;
}

/** Open control valves on active links, with their unchoked laws. */
function valveLinks(graph: HydraulicGraph, activeLink: Uint8Array): Valve[] {
  const out: Valve[] = [];
  for (let i = 0; i < graph.sheetNodes.length; i++) {
    const k = graph.nodeLink[i];
    if (k < 0 || !activeLink[k]) continue;
    const link = graph.links[k];
    if (link.info?.kind !== 'control-valve' || link.info.closed) continue;
    if (!(link.law instanceof QuadraticLaw)) continue;
    out.push({ link: k, id: graph.nodeIds[i], law: link.law, steep: 0 });
  }
  return out;
}
