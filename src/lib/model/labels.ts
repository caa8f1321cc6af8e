/** Words the user reads for each kind of element. */
import type { NodeKind, SheetNode } from './types';

/** Plain name of each node kind. */
export const NODE_KIND_LABEL: Record<NodeKind, string> = {
  vessel: 'Vessel',
  pump: 'Pump',
  fitting: 'Fitting',
  'control-valve': 'Control valve',
  waypoint: 'Waypoint',
  junction: 'Junction',
  boundary: 'Boundary',
};

/**
 * The label to show for a node: its name when it has one, otherwise its kind and id
 * (e.g. "Pump P1"). Always plain text; callers must render it as text, never as HTML.
 */
export function nodeLabel(node: Pick<SheetNode, 'kind' | 'id' | 'name'>): string {
  const name = node.name.trim();
  return name !== '' ? name : `${NODE_KIND_LABEL[node.kind]} ${node.id}`;
}
