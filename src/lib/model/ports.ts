/**
 * Ports of each node kind, their elevations, and where they sit on the sheet.
 *
 * Port names per kind:
 *   vessel → its nozzle ids; pump → 'suction', 'discharge';
 *   fitting, control-valve, waypoint → 'in', 'out'; junction → 'hub'; boundary → 'p'.
 * Only a junction's 'hub' takes more than one pipe.
 *
 * Sheet geometry (sheet units, y grows downwards, symbols centred on the node's x, y):
 *   pump            suction (x − 30, y), discharge (x + 30, y)
 *   fitting, valve  in (x − 30, y), out (x + 30, y)
 *   waypoint        in (x − 10, y), out (x + 10, y)
 *   junction        hub (x, y)
 *   boundary        p (x + 20, y)
 *   vessel          shell VESSEL_WIDTH × VESSEL_HEIGHT centred on (x, y); a nozzle sits on the
 *                   right shell side (x + 40) or the left (x − 40) — its `side`, or by default
 *                   right for even list positions and left for odd — at a height proportional to
 *                   (nozzle z − vessel z) / vessel height, clamped to the shell.
 */
import type { HeadrouteDocument, Nozzle, PortRef, Pump, SheetNode, Vessel } from './types';

/** Drawn vessel shell width, sheet units. */
export const VESSEL_WIDTH = 80;
/** Drawn vessel shell height, sheet units (the whole `height` of the vessel maps onto it). */
export const VESSEL_HEIGHT = 120;
/** Half the distance between the 'in' and 'out' ports of pumps, fittings and valves. */
export const INLINE_PORT_OFFSET = 30;
/** Half the distance between a waypoint's ports. */
export const WAYPOINT_PORT_OFFSET = 10;
/** Offset of a boundary's port to the right of its centre. */
export const BOUNDARY_PORT_OFFSET = 20;

/** Port name of a junction, the only port that takes several pipes. */
export const HUB_PORT = 'hub';

/** The port names of a node, in drawing order. */
export function portsOf(node: SheetNode): string[] {
  switch (node.kind) {
    case 'vessel':
      return node.nozzles.map((n) => n.id);
    case 'pump':
      return ['suction', 'discharge'];
    case 'fitting':
    case 'control-valve':
    case 'waypoint':
      return ['in', 'out'];
    case 'junction':
      return [HUB_PORT];
    case 'boundary':
      return ['p'];
  }
}

/** True when the port takes any number of pipes (a junction's hub). */
export function isMultiPort(node: SheetNode, port: string): boolean {
  return node.kind === 'junction' && port === HUB_PORT;
}

/** True when `port` is one of the node's ports. */
export function hasPort(node: SheetNode, port: string): boolean {
  return portsOf(node).includes(port);
}

function nozzleOf(vessel: Vessel, port: string): Nozzle | undefined {
  return vessel.nozzles.find((n) => n.id === port);
}

/**
 * Elevation of a port, m: a vessel nozzle's own elevation, a pump flange's own elevation when
 * set, otherwise the node's z.
 * Throws when the node or port does not exist (a validated document never has such refs).
 */
export function portElevation(doc: HeadrouteDocument, ref: PortRef): number {
  const node = Object.hasOwn(doc.nodes, ref.node) ? doc.nodes[ref.node] : undefined;
  if (!node) throw new Error(`No node with id "${ref.node}"`);
  if (!hasPort(node, ref.port)) throw new Error(`Node "${ref.node}" has no port "${ref.port}"`);
  if (node.kind === 'vessel') return nozzleOf(node, ref.port)!.z;
  if (node.kind === 'pump') return pumpFlangeElevation(node, ref.port);
  return node.z;
}

/** Elevation of a pump's 'suction' or 'discharge' flange, m (the pump's z where not set). */
export function pumpFlangeElevation(pump: Pump, port: string): number {
  const z = port === 'suction' ? pump.suctionElevation : pump.dischargeElevation;
  return z ?? pump.z;
}

/**
 * Where a port sits on the sheet, sheet units (see the geometry in this module's comment).
 * An unknown port gives the node's centre.
 */
export function portPosition(node: SheetNode, port: string): { x: number; y: number } {
  const { x, y } = node;
  switch (node.kind) {
    case 'pump':
      return { x: port === 'suction' ? x - INLINE_PORT_OFFSET : x + INLINE_PORT_OFFSET, y };
    case 'fitting':
    case 'control-valve':
      return { x: port === 'in' ? x - INLINE_PORT_OFFSET : x + INLINE_PORT_OFFSET, y };
    case 'waypoint':
      return { x: port === 'in' ? x - WAYPOINT_PORT_OFFSET : x + WAYPOINT_PORT_OFFSET, y };
    case 'junction':
      return { x, y };
    case 'boundary':
      return { x: x + BOUNDARY_PORT_OFFSET, y };
    case 'vessel': {
      const index = node.nozzles.findIndex((n) => n.id === port);
      if (index < 0) return { x, y };
      const nozzle = node.nozzles[index];
      const side = nozzle.side ?? (index % 2 === 0 ? 'right' : 'left');
      const fraction =
        node.height > 0 ? Math.min(1, Math.max(0, (nozzle.z - node.z) / node.height)) : 0;
      return {
        x: side === 'right' ? x + VESSEL_WIDTH / 2 : x - VESSEL_WIDTH / 2,
        y: y + VESSEL_HEIGHT / 2 - fraction * VESSEL_HEIGHT,
      };
    }
  }
}
