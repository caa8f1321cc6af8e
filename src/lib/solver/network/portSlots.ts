/**
 * Numeric port slots: every port of every sheet node gets one small integer per solve, so the
 * graph, the results and the findings look ports up in typed arrays instead of maps keyed by
 * text. A sheet node's ports take consecutive slots in the order of model/ports `portsOf`.
 */
import type { SheetNode } from '../../model/types';
import { EXIT_K } from '../../physics/fittings/entranceExit';
import { freeDischargeEnd, isAboveLevel } from './nozzleHeads';

/** Port names of the fixed-port kinds, in `portsOf` order (shared, never changed). */
const SUCTION_DISCHARGE: readonly string[] = ['suction', 'discharge'];
const IN_OUT: readonly string[] = ['in', 'out'];
const HUB: readonly string[] = ['hub'];
const BOUNDARY_PORT: readonly string[] = ['p'];

/** Number of ports of a sheet node (a vessel: its nozzles). */
export function portCount(node: SheetNode): number {
  switch (node.kind) {
    case 'vessel':
      return node.nozzles.length;
    case 'pump':
    case 'fitting':
    case 'control-valve':
    case 'waypoint':
      return 2;
    case 'junction':
    case 'boundary':
      return 1;
  }
}

/** Name of the node's port at position `local` (0-based, `portsOf` order). */
export function portName(node: SheetNode, local: number): string {
  switch (node.kind) {
    case 'vessel':
      return node.nozzles[local].id;
    case 'pump':
      return SUCTION_DISCHARGE[local];
    case 'fitting':
    case 'control-valve':
    case 'waypoint':
      return IN_OUT[local];
    case 'junction':
      return HUB[local];
    case 'boundary':
      return BOUNDARY_PORT[local];
  }
}

/**
 * Position of `port` among the node's ports (`portsOf` order), or −1 when the node has no such
 * port. A vessel with two nozzles of one id answers the first, as `Array.find` does.
 */
export function portIndex(node: SheetNode, port: string): number {
  switch (node.kind) {
    case 'vessel': {
      const nozzles = node.nozzles;
      for (let i = 0; i < nozzles.length; i++) if (nozzles[i].id === port) return i;
      return -1;
    }
    case 'pump':
      return port === 'suction' ? 0 : port === 'discharge' ? 1 : -1;
    case 'fitting':
    case 'control-valve':
    case 'waypoint':
      return port === 'in' ? 0 : port === 'out' ? 1 : -1;
    case 'junction':
      return port === 'hub' ? 0 : -1;
    case 'boundary':
      return port === 'p' ? 0 : -1;
  }
}

/**
 * Elevation of the node's port at position `local`: a vessel nozzle's own z, a pump flange's
 * own elevation when set (suction 0, discharge 1), otherwise the node's z.
 */
export function portElevationAt(node: SheetNode, local: number): number {
  if (node.kind === 'vessel') return node.nozzles[local].z;
  if (node.kind === 'pump') {
    const z = local === 0 ? node.suctionElevation : node.dischargeElevation;
    return z ?? node.z;
  }
  return node.z;
}

/**
 * The vessel nozzle or boundary at a pipe end on port position `local` (their entrance/exit K),
 * null elsewhere. A nozzle above the liquid is a free discharge (nozzleHeads.ts: exit K ≥ 1).
 */
export function endCoefficients(
  node: SheetNode,
  local: number,
): { entranceK: number; exitK: number } | null {
  if (node.kind === 'boundary') return node.holds === 'flow' ? null : BOUNDARY_END;
  if (node.kind === 'vessel') {
    const nozzle = node.nozzles[local];
    return isAboveLevel(node, nozzle) ? freeDischargeEnd(nozzle) : nozzle;
  }
  return null;
}

/** A boundary as a pipe end: no entrance loss, the velocity head lost on exit. */
const BOUNDARY_END = { entranceK: 0, exitK: EXIT_K } as const;

const BOTH: readonly number[] = [0, 1];
const FIRST: readonly number[] = [0];
const NONE: readonly number[] = [];

/** Ports (positions) that should have a pipe: both ports of two-port nodes, a junction's hub, a boundary's port. */
export function portsNeedingPipe(node: SheetNode): readonly number[] {
  switch (node.kind) {
    case 'pump':
    case 'fitting':
    case 'control-valve':
    case 'waypoint':
      return BOTH;
    case 'junction':
    case 'boundary':
      return FIRST;
    case 'vessel':
      return NONE;
  }
}
