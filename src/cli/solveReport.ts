/**
 * The figures `headroute solve` prints, gathered once from the document and the result and
 * then written as text, CSV or JSON. All values SI (m, s, Pa absolute unless "Gauge", W).
 */
import { SCREENING_CAUTION } from '../lib/chart/exportMeta';
import { nodeLabel } from '../lib/model/labels';
import type { FittingType, HeadrouteDocument, Id, PipeFittings } from '../lib/model/types';
import { fittingsListText } from '../lib/report/pipeFittingsTable';
import { profile } from '../lib/solver/profile';
import { defaultRoute, RouteError } from '../lib/solver/route';
import { lowestVapourMargin, routeFindings, routeName } from '../lib/solver/routeFindings';
import type {
  ControlValveResult,
  Finding,
  FluidState,
  PipeResult,
  PumpResult,
  SolveResult,
} from '../lib/solver/types';

/** One pipe's row. */
export interface PipeRow extends PipeResult {
  id: Id;
  name: string;
  from: string;
  to: string;
  length: number;
}

/** One pump's row. */
export interface PumpRow extends PumpResult {
  id: Id;
  name: string;
  running: boolean;
}

/** One control valve's row. */
export interface ControlValveRow extends ControlValveResult {
  id: Id;
  name: string;
}

/** One fitting's row (manual valves, check valves, elbows, reducers, orifices…). */
export interface FittingRow {
  id: Id;
  name: string;
  fittingType: FittingType;
  closed: boolean;
  flow: number;
  /** EGL drop across it, m. */
  headLoss: number;
  lossCoefficient: number | null;
}

/** A pipe that carries fittings (its fittings list and lumped K, not drawn as nodes). */
export interface PipeFittingsRow {
  id: Id;
  name: string;
  /** The list as the document holds it. */
  fittings: PipeFittings;
  /** The list in words, e.g. "6 × 90° elbow (3-K); lumped K 0.8". */
  text: string;
  /** K of the list at the solved flow (referred to the pipe's velocity); null when unsolved. */
  fittingK: number | null;
  /** Loss of the list, m; null when unsolved. */
  fittingLoss: number | null;
}

/** The lowest margin to vapour pressure along the default route. */
export interface RouteSummary {
  name: string;
  nodes: Id[];
  /** Developed length, m. */
  length: number;
  /** p_abs − p_v at the lowest point, Pa; null when the route has no solved station. */
  lowestVapourMargin: number | null;
  lowestPressureAbs: number | null;
  lowestChainage: number | null;
  lowestElement: Id | null;
  lowestElementName: string | null;
}

/** Everything `headroute solve` reports. */
export interface SolveReport {
  caution: string;
  project: string;
  file: string;
  case: { id: Id | null; name: string };
  unitSystem: 'SI' | 'US';
  units: 'SI';
  fluid: FluidState;
  converged: boolean;
  iterations: number;
  residual: number;
  massImbalance: number;
  pipes: PipeRow[];
  pumps: PumpRow[];
  controlValves: ControlValveRow[];
  fittings: FittingRow[];
  /** Pipes that carry fittings lists (in `pipes` their loss is `fittingLoss`). */
  pipeFittings: PipeFittingsRow[];
  route: RouteSummary | null;
  /** The solver's findings, then those along the default route (located by chainage). */
  findings: Finding[];
  counts: { stop: number; caution: number; note: number };
}

function label(doc: HeadrouteDocument, id: Id): string {
  return Object.hasOwn(doc.nodes, id) ? nodeLabel(doc.nodes[id]) : id;
}

/**
 * Rows in route (flow) order: elements on the default route by their place along it, then
 * the others by name (numbers in names in numeric order).
 */
function inRouteOrder<T extends { name: string; id: Id }>(
  rows: T[],
  place: ReadonlyMap<Id, number>,
): T[] {
  const at = (r: T) => place.get(r.id) ?? Infinity;
  return rows.sort(
    (a, b) =>
      at(a) - at(b) ||
      a.name.localeCompare(b.name, undefined, { numeric: true }) ||
      a.id.localeCompare(b.id),
  );
}

/** The route summary of the default route, and its findings; null when there is no route. */
function routeSummary(
  doc: HeadrouteDocument,
  result: SolveResult,
): { summary: RouteSummary; findings: Finding[]; place: Map<Id, number> } | null {
  const nodes = defaultRoute(doc, result);
  if (!nodes) return null;
  let prof;
  try {
    prof = profile(doc, result, nodes);
  } catch (error) {
    if (error instanceof RouteError) return null;
    throw error;
  }
  const place = new Map<Id, number>();
  prof.stations.forEach((s, i) => {
    if (!place.has(s.elementId)) place.set(s.elementId, i);
  });
  const lowest = lowestVapourMargin(prof);
  const last = prof.stations[prof.stations.length - 1];
  return {
    summary: {
      name: routeName(doc, prof),
      nodes: prof.route,
      length: last?.chainage ?? 0,
      lowestVapourMargin: lowest?.vapourMargin ?? null,
      lowestPressureAbs: lowest?.pressureAbs ?? null,
      lowestChainage: lowest?.chainage ?? null,
      lowestElement: lowest?.elementId ?? null,
      lowestElementName: lowest
        ? (doc.nodes[lowest.elementId]?.name ?? doc.pipes[lowest.elementId]?.name ?? null)
        : null,
    },
    findings: routeFindings(doc, result, prof),
    place,
  };
}

/** Gathers the report of one solve. */
export function solveReport(
  doc: HeadrouteDocument,
  result: SolveResult,
  file: string,
): SolveReport {
  const pipes: PipeRow[] = [];
  for (const [id, r] of Object.entries(result.pipes)) {
    const pipe = doc.pipes[id];
    pipes.push({
      id,
      name: pipe.name || id,
      from: label(doc, pipe.from.node),
      to: label(doc, pipe.to.node),
      length: pipe.length,
      ...r,
    });
  }
  const pumps: PumpRow[] = Object.entries(result.pumps).map(([id, r]) => {
    const node = doc.nodes[id];
    const running = node.kind === 'pump' ? node.running : false;
    return { id, name: label(doc, id), running, ...r };
  });
  const controlValves: ControlValveRow[] = Object.entries(result.controlValves).map(([id, r]) => ({
    id,
    name: label(doc, id),
    ...r,
  }));
  const fittings: FittingRow[] = [];
  for (const node of Object.values(doc.nodes)) {
    const r = result.nodes[node.id];
    if (node.kind !== 'fitting' || !r) continue;
    fittings.push({
      id: node.id,
      name: label(doc, node.id),
      fittingType: node.fittingType,
      closed: node.closed,
      flow: r.flow ?? 0,
      headLoss: r.headLoss ?? 0,
      lossCoefficient: r.lossCoefficient ?? null,
    });
  }
  const pipeFittings: PipeFittingsRow[] = [];
  for (const [id, pipe] of Object.entries(doc.pipes)) {
    if (!pipe.fittings) continue;
    const r = result.pipes[id];
    pipeFittings.push({
      id,
      name: pipe.name || id,
      fittings: pipe.fittings,
      text: fittingsListText(pipe.fittings),
      fittingK: r?.fittingK ?? null,
      fittingLoss: r ? (r.fittingLoss ?? 0) : null,
    });
  }
  const route = routeSummary(doc, result);
  const findings = [...result.findings, ...(route?.findings ?? [])];
  const place = route?.place ?? new Map<Id, number>();
  const counts = { stop: 0, caution: 0, note: 0 };
  for (const f of findings) counts[f.level]++;
  const caseId = result.caseId;
  return {
    caution: SCREENING_CAUTION,
    project: doc.name,
    file,
    case: {
      id: caseId,
      name:
        caseId !== null && Object.hasOwn(doc.cases, caseId) ? doc.cases[caseId].name : 'Base case',
    },
    unitSystem: doc.settings.unitSystem,
    units: 'SI',
    fluid: result.fluid,
    converged: result.converged,
    iterations: result.iterations,
    residual: result.residual,
    massImbalance: result.massImbalance,
    pipes: inRouteOrder(pipes, place),
    pumps: inRouteOrder(pumps, place),
    controlValves: inRouteOrder(controlValves, place),
    fittings: inRouteOrder(fittings, place),
    pipeFittings: inRouteOrder(pipeFittings, place),
    route: route?.summary ?? null,
    findings,
    counts,
  };
}
