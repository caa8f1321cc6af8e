/**
 * The line a surge run works on: the route's pipes in order (steady flow, heads, friction and
 * wave speed of each), the law of every node between two pipes, and the two ends. Built from
 * the steady solve; problems come back as findings and no line.
 */
import type { HeadrouteDocument, Id, SheetNode } from '../../model/types';
import { findPipeMaterial } from '../../physics/materials';
import { fitCurve, type PumpFit } from '../../physics/pump';
import { relativeFlowCoefficient } from '../../physics/controlValve';
import type { PipeRestraint } from '../../physics/transient';
import { routeLegs, type RouteLeg } from '../route';
import type { SolveResult } from '../types';
import { pipeWaveSpeed, type PipeWaveSpeed } from './wave';
import type { ClosureLaw } from './types';

/** One pipe of the line, in route direction. */
export interface LinePipe {
  id: Id;
  name: string;
  length: number;
  diameter: number;
  area: number;
  wave: PipeWaveSpeed;
  friction: number;
  /** Steady flow along the route, m³/s. */
  flow: number;
  /** Steady HGL at the route-upstream and route-downstream ends, m. */
  headIn: number;
  headOut: number;
  /** Elevations at those ends, m. */
  zIn: number;
  zOut: number;
  /** Chainage of the route-upstream end, m. */
  chainage: number;
  designPressureGauge: number | null;
}

/** The law across a node between two pipes: H_A − H_B as a function of the flow Q through it. */
export type LinkLaw =
  /** k·Q·|Q| + d; non-return when it is a check valve. */
  | { kind: 'loss'; k: number; d: number; nonReturn: boolean }
  | { kind: 'closed' }
  /** k₀·Q·|Q|/τ(t)², closing: τ(t) is the relative flow coefficient. */
  | { kind: 'valve'; k0: number; tau: (t: number) => number }
  /** −(H_pump(Q, α) + c), α = N/N_rated; tripped pumps slow down; never backwards. */
  | { kind: 'pump'; fit: PumpFit; c: number; alpha: number; pumpId: Id };

/** A node between two pipes of the line. */
export interface LineLink {
  nodeId: Id;
  law: LinkLaw;
  /** Flow leaving the route here to pipes off it (held at its steady value), m³/s. */
  offtake: number;
}

/** An end of the line: a fixed head (vessel, header) or a fixed flow. */
export type LineEnd = { kind: 'head'; head: number } | { kind: 'flow'; flow: number };

/** The line and the notes made while building it. */
export interface Line {
  nodes: Id[];
  pipes: LinePipe[];
  links: LineLink[];
  start: LineEnd;
  end: LineEnd;
}

/** Why a line could not be built, with the elements at fault. */
export interface LineProblem {
  message: string;
  elements: Id[];
}

/** The event, as the line builder needs it. */
export type LineEvent =
  { kind: 'close'; element: Id; time: number; law: ClosureLaw } | { kind: 'trip'; pump: Id };

const VALVE_FITTINGS = new Set(['gate-valve', 'globe-valve', 'ball-valve', 'butterfly-valve']);
const CHECK_FITTINGS = new Set(['swing-check-valve', 'lift-check-valve']);
const TINY_FLOW = 1e-9;

function nameOf(node: SheetNode): string {
  return node.name || node.id;
}

/** Linear closure: τ falls from 1 to 0 over `time` s. */
export function linearTau(time: number): (t: number) => number {
  return (t) => (time > 0 ? Math.max(0, 1 - t / time) : t > 0 ? 0 : 1);
}

/** Fully rough Darcy factor (Colebrook–White at Re → ∞), for pipes with no steady flow. */
function fullyRough(diameter: number, roughness: number): number {
  if (!(roughness > 0) || !(diameter > 0)) return 0;
  const x = 2 * Math.log10((3.7 * diameter) / roughness);
  return 1 / (x * x);
}

function linePipes(
  doc: HeadrouteDocument,
  result: SolveResult,
  legs: RouteLeg[],
  bulkModulus: number,
  restraint: PipeRestraint,
): LinePipe[] | LineProblem {
  const out: LinePipe[] = [];
  let chainage = 0;
  for (const leg of legs) {
    const pipe = leg.pipe;
    const r = result.pipes[pipe.id];
    const ok =
      r &&
      [r.headFrom, r.headTo, r.elevationFrom, r.elevationTo, r.flow, r.innerDiameter].every(
        (v) => v !== undefined && Number.isFinite(v),
      );
    if (!ok || !(pipe.length > 0) || !(r.innerDiameter > 0)) {
      return {
        message: `Pipe “${pipe.name || pipe.id}” has no steady result to start a surge run from.`,
        elements: [pipe.id],
      };
    }
    const sign = leg.forward ? 1 : -1;
    const diameter = r.innerDiameter;
    const roughness = pipe.roughness ?? findPipeMaterial(pipe.material)?.roughness ?? 0;
    const friction =
      Number.isFinite(r.frictionFactor) && r.frictionFactor > 0 && Math.abs(r.flow) > TINY_FLOW
        ? r.frictionFactor
        : fullyRough(diameter, roughness);
    out.push({
      id: pipe.id,
      name: pipe.name || pipe.id,
      length: pipe.length,
      diameter,
      area: (Math.PI * diameter * diameter) / 4,
      wave: pipeWaveSpeed(pipe, diameter, bulkModulus, result.fluid.density, restraint),
      friction,
      flow: sign * r.flow,
      headIn: (leg.forward ? r.headFrom : r.headTo)!,
      headOut: (leg.forward ? r.headTo : r.headFrom)!,
      zIn: (leg.forward ? r.elevationFrom : r.elevationTo)!,
      zOut: (leg.forward ? r.elevationTo : r.elevationFrom)!,
      chainage,
      designPressureGauge: pipe.designPressureGauge,
    });
    chainage += pipe.length;
  }
  return out;
}

function closingLaw(
  node: SheetNode,
  event: Extract<LineEvent, { kind: 'close' }>,
  q0: number,
  drop: number,
): LinkLaw | LineProblem {
  const name = nameOf(node);
  if (Math.abs(q0) <= TINY_FLOW)
    return {
      message: `“${name}” carries no steady flow, so closing it changes nothing.`,
      elements: [node.id],
    };
  if (!(drop > 0))
    return {
      message: `“${name}” shows no steady pressure drop to close from.`,
      elements: [node.id],
    };
  const k0 = drop / (q0 * Math.abs(q0));
  if (event.law === 'linear') return { kind: 'valve', k0, tau: linearTau(event.time) };
  if (node.kind !== 'control-valve') {
    return {
      message: `“${name}” is a ${node.kind === 'fitting' ? node.fittingType.replace(/-/g, ' ') : node.kind} with no characteristic; close it with the linear law.`,
      elements: [node.id],
    };
  }
  const x0 = node.opening;
  const phi = (x: number) => relativeFlowCoefficient(node.characteristic, x, node.rangeability);
  const phi0 = phi(x0);
  const line = linearTau(event.time);
  // The travel falls linearly from its opening to shut; τ follows the inherent characteristic.
  return { kind: 'valve', k0, tau: (t) => (phi0 > 0 ? phi(x0 * line(t)) / phi0 : 0) };
}

function linkLaw(
  node: SheetNode,
  event: LineEvent,
  qA: number,
  headA: number,
  headB: number,
): LinkLaw | LineProblem {
  const drop = headA - headB;
  if (event.kind === 'close' && event.element === node.id) return closingLaw(node, event, qA, drop);
  if (node.kind === 'vessel' || node.kind === 'boundary') {
    return {
      message: `The route passes through “${nameOf(node)}”; run surge on a route that ends there.`,
      elements: [node.id],
    };
  }
  if (node.kind === 'pump') {
    if (!node.running || Math.abs(qA) <= TINY_FLOW) return { kind: 'closed' };
    const fit = fitCurve(node.headCurve);
    const alpha = node.ratedSpeed > 0 ? node.speed / node.ratedSpeed : 1;
    const c = headB - headA - (fit.form === 'empty' ? 0 : pumpHeadAt(fit, qA, alpha));
    return { kind: 'pump', fit, c, alpha, pumpId: node.id };
  }
  if (node.kind === 'fitting' && node.closed) return { kind: 'closed' };
  const nonReturn = node.kind === 'fitting' && CHECK_FITTINGS.has(node.fittingType);
  if (node.kind === 'fitting' || node.kind === 'control-valve') {
    if (Math.abs(qA) > TINY_FLOW && drop > 0) {
      return { kind: 'loss', k: drop / (qA * Math.abs(qA)), d: 0, nonReturn };
    }
  }
  return { kind: 'loss', k: 0, d: drop, nonReturn };
}

function pumpHeadAt(fit: PumpFit, q: number, alpha: number): number {
  const [c0, c1, c2] = fit.coefficients;
  return c0 * alpha * alpha + c1 * alpha * q + c2 * q * q;
}

function lineEnd(node: SheetNode, head: number, flow: number): LineEnd {
  if (node.kind === 'boundary' && node.holds === 'flow') return { kind: 'flow', flow };
  return { kind: 'head', head };
}

/** True when `node` is a valve the surge event may close. */
export function isClosableValve(node: SheetNode): boolean {
  return (
    node.kind === 'control-valve' ||
    (node.kind === 'fitting' && VALVE_FITTINGS.has(node.fittingType))
  );
}

/**
 * Builds the line along `route` of the case-applied document `doc` solved as `result`, with
 * the liquid's bulk modulus (Pa) and the pipes' restraint.
 */
export function buildLine(
  doc: HeadrouteDocument,
  result: SolveResult,
  route: readonly Id[],
  event: LineEvent,
  bulkModulus: number,
  restraint: PipeRestraint,
): Line | LineProblem {
  const { nodes, legs } = routeLegs(doc, result, route);
  const pipes = linePipes(doc, result, legs, bulkModulus, restraint);
  if (!Array.isArray(pipes)) return pipes;
  const links: LineLink[] = [];
  for (let i = 1; i < nodes.length - 1; i++) {
    const node = doc.nodes[nodes[i]];
    const a = pipes[i - 1];
    const b = pipes[i];
    const law = linkLaw(node, event, a.flow, a.headOut, b.headIn);
    if ('message' in law) return law;
    links.push({ nodeId: node.id, law, offtake: law.kind === 'closed' ? 0 : a.flow - b.flow });
  }
  const first = pipes[0];
  const last = pipes[pipes.length - 1];
  return {
    nodes,
    pipes,
    links,
    start: lineEnd(doc.nodes[nodes[0]], first.headIn, first.flow),
    end: lineEnd(doc.nodes[nodes[nodes.length - 1]], last.headOut, last.flow),
  };
}
