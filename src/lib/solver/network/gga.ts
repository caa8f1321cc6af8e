/**
 * The global gradient method (Todini and Pilati, 1988, "A gradient algorithm for the analysis
 * of pipe networks", in Computer Applications in Water Supply, vol. 1, pp. 1–20): Newton's
 * method on the link head-loss equations and the node continuity equations together, reduced
 * to a symmetric positive-definite system in the unknown node heads:
 *
 *   (A21 G⁻¹ A12) H = −A21 (Q − G⁻¹ h(Q)) − A10 terms of fixed heads − fixed flows,
 *   then Q ← Q − G⁻¹ h(Q) + G⁻¹ (H_from − H_to),
 *
 * with G the diagonal of link slopes dh/dQ (floored at MIN_SLOPE so the matrix stays positive
 * definite). After the first iteration every flow set satisfies continuity at every node to
 * the precision of the linear solve, whatever the head residual.
 */
import { nodeSolverFor, type LinearMethod, type NodeSolverOptions } from '../sparse/linearSolver';
import type { HydraulicGraph } from './build';
import { PipeLaw } from './pipeLaw';

/** Smallest link slope used in the matrix, s/m² (a lossless link at zero flow). */
export const MIN_SLOPE = 1e-4;
/** Head-balance tolerance on every link, m. */
export const HEAD_TOLERANCE = 1e-9;
/**
 * Slope above which a link is on a stiff branch (shut, or a non-return holding reverse flow),
 * s/m². There a head residual means nothing (R·δQ for rounding δQ), so such links are checked
 * in flow instead: |ΔH − h(Q)|/slope ≤ STIFF_FLOW_TOLERANCE.
 */
export const STIFF_SLOPE = 1e8;
/** Flow tolerance on stiff links, m³/s. */
export const STIFF_FLOW_TOLERANCE = 1e-9;
/**
 * After this many iterations a non-return link still at zero flow (|Q| ≤ LATCH_FLOW) with no
 * head holding it shut is latched onto its forward law. At a dead end beyond such a link
 * (e.g. two running pumps in series against a capped line) rounding-level flows would
 * otherwise flip it between its forward branch and the stiff reverse branch for ever.
 */
export const LATCH_AFTER = 25;
const LATCH_FLOW = 1e-8;
/**
 * Head tolerance accepted after LATCH_AFTER iterations, m. Where a lossless link (slope at
 * MIN_SLOPE) feeds a dead end, rounding of the heads (≈ 1e-14 × head) becomes flow noise of
 * ≈ 1e-10 m³/s and, through a pump curve's slope, head noise of ≈ 1e-8 m: the iteration cannot
 * do better than that, so it stops there and reports the residual it reached.
 */
export const NOISE_HEAD_TOLERANCE = 1e-7;
/**
 * Inexact Newton forcing term (Dembo, Eisenstat and Steihaug, 1982, "Inexact Newton methods",
 * SIAM J. Numer. Anal. 19(2)): an iterative node solve (sparse/linearSolver.ts) may stop once its
 * residual is this fraction of its starting one, which is the current iterate's own imbalance
 * and shrinks as the heads settle. The tight absolute target still applies below that, and the
 * iteration only ends after a tight solve. A direct solve is exact whatever this says.
 */
export const LINEAR_FORCING = 1e-2;
/**
 * Node-balance (mass) tolerance, m³/s: the largest |inflow − outflow − demand| allowed at a free
 * node for the solve to count as converged, 1e-9 m³/s (3.6 mL/h) or MASS_RELATIVE of the largest
 * flow on the sheet where that is more (rounding of large flows).
 */
export const MASS_TOLERANCE = 1e-9;
/** See MASS_TOLERANCE. */
export const MASS_RELATIVE = 1e-12;
/** Iteration limit. */
export const MAX_ITERATIONS = 200;

/** Outcome of the iteration. */
export interface GgaOutcome {
  /** Total head at every graph node, m (fixed heads included; 0 for inactive nodes). */
  heads: Float64Array;
  /** Flow in every link, m³/s (0 for inactive links). */
  flows: Float64Array;
  iterations: number;
  /** Largest |H_from − H_to − h(Q)| over the links not on a stiff branch, m. */
  residual: number;
  /** Largest continuity error at a free node, m³/s. */
  massImbalance: number;
  /** The node-balance tolerance this solve was held to, m³/s (MASS_TOLERANCE). */
  massTolerance: number;
  /**
   * True only when both balances meet their tolerances: every link's head balance (HEAD_TOLERANCE,
   * NOISE_HEAD_TOLERANCE after LATCH_AFTER iterations; STIFF_FLOW_TOLERANCE on stiff links) and
   * every free node's mass balance (MASS_TOLERANCE).
   */
  converged: boolean;
  /** Links with the largest head residual, worst first (for a no-convergence finding). */
  worstLinks: number[];
  /** Graph nodes with the largest mass imbalance above the tolerance, worst first. */
  worstNodes: number[];
  /** How the node equations were solved: the method, and conjugate-gradient steps and direct fallbacks over all iterations (for benchmarks). */
  linear: { method: LinearMethod; cgIterations: number; fallbacks: number };
}

/**
 * Runs the global gradient iteration on the active part of the graph. `linear` chooses how the
 * node equations are solved (sparse/linearSolver.ts; by default its size-and-fill rule).
 */
export function gradientSolve(
  graph: HydraulicGraph,
  activeNode: Uint8Array,
  activeLink: Uint8Array,
  linear: NodeSolverOptions = {},
): GgaOutcome {
  const links = graph.links;
  const nLinks = links.length;
  const heads = new Float64Array(graph.nodeCount);
  const flows = new Float64Array(nLinks);
  const freeIndex = new Int32Array(graph.nodeCount).fill(-1);
  let nFree = 0;
  for (let i = 0; i < graph.nodeCount; i++) {
    if (!activeNode[i]) continue;
    if (graph.fixed[i]) heads[i] = graph.fixedHead[i];
    else freeIndex[i] = nFree++;
  }

  // Per-link data in flat arrays; the active links with a law split into pipes (one law class,
  // so the calls below stay monomorphic) and the rest. Each link's law is evaluated on its own,
  // so the split does not change any number; the matrix is assembled in link order.
  const from = new Int32Array(nLinks);
  const to = new Int32Array(nLinks);
  const freeFrom = new Int32Array(nLinks);
  const freeTo = new Int32Array(nLinks);
  const active: number[] = [];
  const pipeLinks: number[] = [];
  const pipeLaws: PipeLaw[] = [];
  const otherLinks: number[] = [];
  const edgeA: number[] = [];
  const edgeB: number[] = [];
  const edgeLink: number[] = [];
  for (let k = 0; k < nLinks; k++) {
    const link = links[k];
    from[k] = link.from;
    to[k] = link.to;
    freeFrom[k] = freeIndex[link.from];
    freeTo[k] = freeIndex[link.to];
    if (!activeLink[k]) continue;
    active.push(k);
    const law = link.law;
    if (law === null) {
      flows[k] = link.fixedFlow;
      continue;
    }
    flows[k] = law.initialFlow;
    if (law instanceof PipeLaw) {
      pipeLinks.push(k);
      pipeLaws.push(law);
    } else otherLinks.push(k);
    const a = freeFrom[k];
    const b = freeTo[k];
    if (a >= 0 && b >= 0 && a !== b) {
      edgeA.push(a);
      edgeB.push(b);
      edgeLink.push(k);
    }
  }
  const linearSolver = nodeSolverFor(nFree, edgeA, edgeB, linear);
  const statsBefore = { ...linearSolver.stats };
  const diagonal = new Float64Array(nFree);
  const offDiagonal = new Float64Array(edgeA.length);
  const rhs = new Float64Array(nFree);
  /** The node heads of the last solve: an iterative solve starts from them. */
  const solution = new Float64Array(nFree);
  const loss = new Float64Array(nLinks);
  const slope = new Float64Array(nLinks);
  /** Flow at which each law is linearised this iteration (the current flow, or 0 to reopen a non-return). */
  const point = new Float64Array(nLinks);

  let iterations = 0;
  let residual = Infinity;
  let converged = false;
  for (let iteration = 1; iteration <= MAX_ITERATIONS + 1; iteration++) {
    // Laws at the current flows; the head residual of the previous solve comes for free.
    residual = 0;
    let stiffSettled = true;
    for (let i = 0; i < pipeLinks.length; i++) {
      const k = pipeLinks[i];
      const law = pipeLaws[i];
      const q = flows[k];
      const lossK = law.headLoss(q);
      const slopeK = law.slope(q);
      loss[k] = lossK;
      point[k] = q;
      const linkResidual = Math.abs(heads[from[k]] - heads[to[k]] - lossK);
      if (slopeK >= STIFF_SLOPE) {
        if (!(linkResidual / slopeK <= STIFF_FLOW_TOLERANCE)) stiffSettled = false;
      } else residual = Math.max(residual, linkResidual);
      slope[k] = Math.max(slopeK, MIN_SLOPE);
    }
    for (let i = 0; i < otherLinks.length; i++) {
      const k = otherLinks[i];
      const law = links[k].law!;
      const drop = heads[from[k]] - heads[to[k]];
      const q = flows[k];
      law.refresh(q);
      loss[k] = law.headLoss(q);
      slope[k] = law.slope(q);
      point[k] = q;
      const linkResidual = Math.abs(drop - loss[k]);
      if (slope[k] >= STIFF_SLOPE) {
        if (!(linkResidual / slope[k] <= STIFF_FLOW_TOLERANCE)) stiffSettled = false;
      } else residual = Math.max(residual, linkResidual);
      if (law.nonReturn && q < 0) {
        const atZero = law.headLoss(0);
        if (
          !law.forwardOnly &&
          iteration > LATCH_AFTER &&
          q >= -LATCH_FLOW &&
          drop >= atZero - 1e-6
        ) {
          law.forwardOnly = true;
          loss[k] = law.headLoss(q);
          slope[k] = law.slope(q);
        } else if (iteration > 1 && drop > atZero) {
          // Held shut but the heads now push forward (drop above its loss at zero flow, e.g.
          // a pump's shut-off head): linearise on the forward branch at Q = 0. On the stiff
          // reverse branch it could only creep open by |ΔH|/R per step.
          point[k] = 0;
          law.refresh(0);
          loss[k] = atZero;
          slope[k] = law.slope(0);
        }
      } else if (
        law.nonReturn &&
        !law.forwardOnly &&
        iteration > LATCH_AFTER &&
        q <= LATCH_FLOW &&
        drop >= law.headLoss(0) - 1e-6
      ) {
        law.forwardOnly = true;
      }
      slope[k] = Math.max(slope[k], MIN_SLOPE);
    }
    if (!Number.isFinite(residual)) break;
    const tolerance = iteration > LATCH_AFTER ? NOISE_HEAD_TOLERANCE : HEAD_TOLERANCE;
    const headsSettled = iteration > 1 && residual <= tolerance && stiffSettled;
    // Converged only when the flows come from a solve held to the absolute mass-balance target;
    // after an inexact (early-stopped) iterative solve, one more iteration solves tightly.
    if (headsSettled && linearSolver.lastTight) {
      converged = true;
      break;
    }
    if (iteration > MAX_ITERATIONS) break;
    iterations = iteration;

    diagonal.fill(0);
    rhs.fill(0);
    // Known demands (a boundary holding a flow) leave their node, as a duty link's flow does.
    for (let i = 0; i < graph.nodeCount; i++)
      if (graph.demand[i] !== 0 && freeIndex[i] >= 0) rhs[freeIndex[i]] -= graph.demand[i];
    for (let i = 0; i < active.length; i++) {
      const k = active[i];
      const a = freeFrom[k];
      const b = freeTo[k];
      const link = links[k];
      if (link.law === null) {
        // Flow-controlled link: a known outflow at `from` and inflow at `to`.
        if (a >= 0) rhs[a] -= link.fixedFlow;
        if (b >= 0) rhs[b] += link.fixedFlow;
        continue;
      }
      if (from[k] === to[k]) continue;
      const w = 1 / slope[k];
      const y = point[k] - loss[k] * w;
      if (a >= 0) {
        diagonal[a] += w;
        rhs[a] -= y;
        if (b < 0) rhs[a] += w * heads[to[k]];
      }
      if (b >= 0) {
        diagonal[b] += w;
        rhs[b] += y;
        if (a < 0) rhs[b] += w * heads[from[k]];
      }
    }
    for (let e = 0; e < edgeLink.length; e++) offDiagonal[e] = -1 / slope[edgeLink[e]];
    const forcing = headsSettled ? 0 : LINEAR_FORCING;
    if (!linearSolver.solve(diagonal, offDiagonal, rhs, solution, forcing)) break;
    for (let i = 0; i < graph.nodeCount; i++)
      if (freeIndex[i] >= 0) heads[i] = solution[freeIndex[i]];
    for (let i = 0; i < pipeLinks.length; i++) {
      const k = pipeLinks[i];
      flows[k] = point[k] + (heads[from[k]] - heads[to[k]] - loss[k]) / slope[k];
    }
    for (let i = 0; i < otherLinks.length; i++) {
      const k = otherLinks[i];
      flows[k] = point[k] + (heads[from[k]] - heads[to[k]] - loss[k]) / slope[k];
    }
  }

  const balance = nodeBalance(graph, activeNode, activeLink, flows);
  let largestFlow = 0;
  for (const k of active) largestFlow = Math.max(largestFlow, Math.abs(flows[k]));
  const massTolerance = Math.max(MASS_TOLERANCE, MASS_RELATIVE * largestFlow);
  const unbalanced: Array<[number, number]> = [];
  for (let i = 0; i < graph.nodeCount; i++) {
    if (!activeNode[i] || graph.fixed[i]) continue;
    const b = Math.abs(balance[i]);
    if (!(b <= massTolerance)) unbalanced.push([i, Number.isFinite(b) ? b : Infinity]);
  }
  unbalanced.sort((x, y) => y[1] - x[1]);
  if (unbalanced.length > 0) converged = false;

  // Only a no-convergence finding names the worst links; a converged solve skips the pass.
  const worst: Array<[number, number]> = [];
  for (let k = 0; k < nLinks && !converged; k++) {
    const link = graph.links[k];
    if (!activeLink[k] || link.law === null || link.law.slope(flows[k]) >= STIFF_SLOPE) continue;
    const r = Math.abs(heads[link.from] - heads[link.to] - link.law.headLoss(flows[k]));
    if (!(r <= (iterations > LATCH_AFTER ? NOISE_HEAD_TOLERANCE : HEAD_TOLERANCE)))
      worst.push([k, Number.isFinite(r) ? r : Infinity]);
  }
  worst.sort((x, y) => y[1] - x[1]);

  return {
    heads,
    flows,
    iterations,
    residual,
    massImbalance: largestOf(balance, activeNode, graph.fixed),
    massTolerance,
    converged,
    worstLinks: worst.slice(0, 5).map(([k]) => k),
    worstNodes: unbalanced.slice(0, 5).map(([i]) => i),
    linear: {
      method: linearSolver.method,
      cgIterations: linearSolver.stats.cgIterations - statsBefore.cgIterations,
      fallbacks: linearSolver.stats.fallbacks - statsBefore.fallbacks,
    },
  };
}

/** Flow in minus flow out at each graph node, less the demand taken there, m³/s. */
function nodeBalance(
  graph: HydraulicGraph,
  activeNode: Uint8Array,
  activeLink: Uint8Array,
  flows: Float64Array,
): Float64Array {
  const balance = new Float64Array(graph.nodeCount);
  for (let i = 0; i < graph.nodeCount; i++) balance[i] = activeNode[i] ? -graph.demand[i] : 0;
  graph.links.forEach((link, k) => {
    if (!activeLink[k]) return;
    balance[link.from] -= flows[k];
    balance[link.to] += flows[k];
  });
  return balance;
}

/** Largest |balance| at a free active node (NaN if any is NaN). */
function largestOf(balance: Float64Array, activeNode: Uint8Array, fixed: Uint8Array): number {
  let worst = 0;
  for (let i = 0; i < balance.length; i++) {
    if (!activeNode[i] || fixed[i]) continue;
    const b = Math.abs(balance[i]);
    if (!(b <= worst)) worst = b;
  }
  return worst;
}

/** Largest |Σ outflow − Σ inflow| at a free active node, m³/s (raw: NaN or Infinity if the flows are). */
export function massImbalance(
  graph: HydraulicGraph,
  activeNode: Uint8Array,
  activeLink: Uint8Array,
  flows: Float64Array,
): number {
  return largestOf(nodeBalance(graph, activeNode, activeLink, flows), activeNode, graph.fixed);
}
