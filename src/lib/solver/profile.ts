/**
 * The profile along a route: stations in order of chainage with the pipe elevation, the
 * hydraulic and energy grade lines, the vapour line and the pressures.
 *
 * Definitions (DESIGN.md, "Physics to use"): HGL = z + p_gauge/ρg; EGL = HGL + v²/2g; vapour
 * line = z + (p_v − p_atm)/ρg, so where the HGL is below it the absolute pressure is below the
 * vapour pressure. Along a pipe of one bore the friction loss per metre is uniform
 * (Darcy–Weisbach with one friction factor) and the centreline runs straight between its end
 * elevations, so EGL, HGL and z are linear in chainage: the interior stations are exact linear
 * interpolations between the pipe-end results of the solve.
 */
import { portElevation } from '../model/ports';
import type { HeadrouteDocument, Id, PortRef, Vessel } from '../model/types';
import { applyCase } from './applyCase';
import { GRAVITY } from './network/laws';
import { vesselGasHead } from './network/nozzleHeads';
import { fittingStepAt } from './network/pipeFittings';
import { routeLegs, type RouteLeg } from './route';
import type { Profile, SolveResult, Station } from './types';

/** Interior spacing of pipe stations: each pipe is cut into this many equal pieces by default. */
export const DEFAULT_PIPE_SEGMENTS = 10;

/** Options for `profile`. */
export interface ProfileOptions {
  /** Pieces each pipe is cut into (stations at both ends and between); at least 1. */
  pipeSegments?: number;
}

/** Liquid and site values a station needs. */
interface StationFluid {
  rhoG: number;
  atmosphericPressure: number;
  vapourPressure: number;
}

/** A station from its elevation and grade lines; pressures follow from HGL − z. */
function station(
  fluid: StationFluid,
  elementId: Id,
  at: Station['at'],
  chainage: number,
  elevation: number,
  hgl: number,
  egl: number,
): Station {
  const pressureGauge = fluid.rhoG * (hgl - elevation);
  const pressureAbs = fluid.atmosphericPressure + pressureGauge;
  return {
    chainage,
    elevation,
    hgl,
    egl,
    // Vapour line z + (p_v − p_atm)/ρg (DESIGN.md).
    vapourLine: elevation + (fluid.vapourPressure - fluid.atmosphericPressure) / fluid.rhoG,
    pressureAbs,
    pressureGauge,
    vapourMargin: pressureAbs - fluid.vapourPressure,
    elementId,
    at,
  };
}

/**
 * The liquid surface of a vessel: at rest, HGL = EGL = level + (p_gas − p_atm)/ρg. A pipe that
 * reaches the vessel through a nozzle above the surface ends at the nozzle with the gas-space
 * head there (network/nozzleHeads.ts; its last station is the solve's pipe end), and the grade
 * lines then step down at this station by the liquid's fall from the nozzle to the surface.
 */
function levelStation(fluid: StationFluid, vessel: Vessel, chainage: number): Station {
  const gas = vesselGasHead(vessel, fluid.atmosphericPressure, fluid.rhoG);
  const head = vessel.liquidLevel + gas;
  return station(fluid, vessel.id, 'level', chainage, vessel.liquidLevel, head, head);
}

/** The station at a node's port from the solve's port result (NaN grade lines if unsolved). */
function portStation(
  doc: HeadrouteDocument,
  result: SolveResult,
  fluid: StationFluid,
  ref: PortRef,
  at: Station['at'],
  chainage: number,
): Station {
  const r = result.nodes[ref.node]?.ports[ref.port];
  const z = r?.elevation ?? portElevation(doc, ref);
  return station(fluid, ref.node, at, chainage, z, r?.head ?? NaN, r?.totalHead ?? NaN);
}

/**
 * Stations along one pipe of the route, from its start (chainage `start`) to its end. The EGL
 * falls by the friction loss evenly along the pipe and by the loss of the fittings it carries
 * where they act (pipeFittings.ts): a step, with two stations at one chainage, at the inlet,
 * the outlet or the given chainage, or evenly when spread. One bore: the HGL keeps the EGL's
 * distance below it (v²/2g) all along.
 */
function pipeStations(
  doc: HeadrouteDocument,
  result: SolveResult,
  fluid: StationFluid,
  leg: RouteLeg,
  start: number,
  segments: number,
): Station[] {
  const { pipe, forward } = leg;
  const r = result.pipes[pipe.id];
  const length = Number.isFinite(pipe.length) && pipe.length > 0 ? pipe.length : 0;
  const zFrom = r?.elevationFrom ?? portElevation(doc, pipe.from);
  const zTo = r?.elevationTo ?? portElevation(doc, pipe.to);
  const eglFrom = r?.totalHeadFrom ?? NaN;
  const eglTo = r?.totalHeadTo ?? NaN;
  const hglFrom = r?.headFrom ?? NaN;
  // The fittings' share of the EGL drop from → to (signed like the flow), the rest is friction.
  const fittingDrop = r ? Math.sign(r.flow) * (r.fittingLoss ?? 0) : 0;
  const frictionDrop = eglFrom - eglTo - fittingDrop;
  const n = length > 0 ? segments : 1;
  // Where the fittings' loss steps (null: spread evenly, or none), and the share of it taken
  // by t (fraction of the length from the `from` end), on the far side of a step when `after`.
  const step = length > 0 && fittingDrop !== 0 ? fittingStepAt(pipe) : null;
  const share = (t: number, after: boolean) =>
    step === null ? t : t * length > step || (t * length === step && after) ? 1 : 0;
  const points: Array<{ t: number; after: boolean }> = [];
  for (let i = 0; i <= n; i++) points.push({ t: i / n, after: true });
  if (step !== null) {
    const at = points.findIndex((p) => p.t * length >= step);
    const t = step / length;
    if (points[at].t * length === step) points.splice(at, 0, { t: points[at].t, after: false });
    else points.splice(at, 0, { t, after: false }, { t, after: true });
  }
  const stations = points.map(({ t, after }) => {
    const egl = eglFrom - frictionDrop * t - fittingDrop * share(t, after);
    return station(
      fluid,
      pipe.id,
      'pipe',
      start + length * (forward ? t : 1 - t),
      zFrom + (zTo - zFrom) * t,
      hglFrom + (egl - eglFrom),
      egl,
    );
  });
  if (!forward) stations.reverse();
  return stations;
}

/**
 * Stations at a node the route passes or ends on. Vessels give their liquid level ('level');
 * pumps, fittings, control valves and boundaries a station on each side the route touches
 * ('node-in' on the port it arrives at, 'node-out' on the port it leaves by), both at the same
 * chainage so the grade lines step there. Waypoints and junctions add none: the pipe ends on
 * either side already sit there.
 */
function nodeStations(
  doc: HeadrouteDocument,
  result: SolveResult,
  fluid: StationFluid,
  nodeId: Id,
  arrived: RouteLeg | null,
  leaving: RouteLeg | null,
  chainage: number,
): Station[] {
  const node = doc.nodes[nodeId];
  if (node.kind === 'vessel') return [levelStation(fluid, node, chainage)];
  if (node.kind === 'waypoint' || node.kind === 'junction') return [];
  const out: Station[] = [];
  if (arrived) {
    const ref = { node: nodeId, port: arrived.toPort };
    out.push(portStation(doc, result, fluid, ref, 'node-in', chainage));
  }
  if (leaving) {
    const ref = { node: nodeId, port: leaving.fromPort };
    out.push(portStation(doc, result, fluid, ref, 'node-out', chainage));
  }
  return out;
}

/**
 * The profile of `route` (node ids in order; nodes not joined directly by a pipe are bridged
 * by the shortest path) in the solved `result`, on the document as it stands in the result's
 * case (levels and elevations). Stations come in order of chainage (developed pipe length from
 * the first node): the start vessel's liquid level, each pipe cut into `pipeSegments` pieces,
 * two stations at every pump, fitting and control valve the route passes, and the end vessel's
 * level. Elements the solve could not reach give stations with NaN grade lines and pressures.
 * The returned route lists every node passed. Throws RouteError when the route cannot be
 * followed (a node not on the sheet, or two nodes with no pipe path between them).
 */
export function profile(
  doc: HeadrouteDocument,
  result: SolveResult,
  route: Id[],
  options: ProfileOptions = {},
): Profile {
  const working = applyCase(doc, result.caseId);
  const segments = Math.max(1, Math.round(options.pipeSegments ?? DEFAULT_PIPE_SEGMENTS));
  const { nodes, legs } = routeLegs(working, result, route);
  const fluid: StationFluid = {
    rhoG: result.fluid.density * GRAVITY,
    atmosphericPressure: result.fluid.atmosphericPressure,
    vapourPressure: result.fluid.vapourPressure,
  };
  const stations: Station[] = [];
  let chainage = 0;
  for (let i = 0; i < nodes.length; i++) {
    const arrived = i > 0 ? legs[i - 1] : null;
    const leaving = i < legs.length ? legs[i] : null;
    stations.push(...nodeStations(working, result, fluid, nodes[i], arrived, leaving, chainage));
    if (leaving) {
      stations.push(...pipeStations(working, result, fluid, leaving, chainage, segments));
      chainage = stations[stations.length - 1].chainage;
    }
  }
  return { route: nodes, stations };
}
