/** Words the user reads for each kind of element. */
import type { FittingType, NodeKind, SheetNode } from './types';

/** Plain name of each node kind. */
export const NODE_KIND_LABEL: Record<NodeKind, string> = {
  vessel: 'Vessel',
  pump: 'Pump',
  fitting: 'Fitting',
  'control-valve': 'Control valve',
  waypoint: 'Waypoint',
  junction: 'Branch point',
  boundary: 'Header or draw-off',
};

/**
 * The name of a node's kind as the user reads it; a boundary is named for what it holds:
 * "Header (fixed pressure)" or "Draw-off / supply (fixed flow)". The file keeps its kinds.
 */
export function nodeKindName(node: Pick<SheetNode, 'kind'> & { holds?: string }): string {
  if (node.kind === 'boundary')
    return node.holds === 'flow' ? 'Draw-off / supply (fixed flow)' : 'Header (fixed pressure)';
  return NODE_KIND_LABEL[node.kind];
}

/**
 * The label to show for a node: its name when it has one, otherwise its kind and id
 * (e.g. "Pump P1"). Always plain text; callers must render it as text, never as HTML.
 */
export function nodeLabel(node: Pick<SheetNode, 'kind' | 'id' | 'name'>): string {
  const name = node.name.trim();
  return name !== '' ? name : `${NODE_KIND_LABEL[node.kind]} ${node.id}`;
}

/** Each fitting type in words, in the order pickers list them. */
export const FITTING_TYPE_NAMES: ReadonlyArray<readonly [FittingType, string]> = [
  ['elbow-90-standard', '90° elbow, standard'],
  ['elbow-90-long-radius', '90° elbow, long radius'],
  ['elbow-45-standard', '45° elbow, standard'],
  ['elbow-45-long-radius', '45° elbow, long radius'],
  ['tee-run', 'Tee, flow through run'],
  ['tee-branch', 'Tee, flow through branch'],
  ['gate-valve', 'Gate valve'],
  ['globe-valve', 'Globe valve'],
  ['ball-valve', 'Ball valve'],
  ['butterfly-valve', 'Butterfly valve'],
  ['swing-check-valve', 'Swing check valve'],
  ['lift-check-valve', 'Lift check valve'],
  ['strainer', 'Strainer'],
  ['flow-meter', 'Flow meter'],
  ['reducer', 'Reducer'],
  ['expander', 'Expander'],
  ['restriction-orifice', 'Restriction orifice'],
];

/** A fitting type in words ("Gate valve"); the type itself when it is not in the list. */
export function fittingTypeName(type: FittingType): string {
  return FITTING_TYPE_NAMES.find(([t]) => t === type)?.[1] ?? type;
}
