/** Which groups of a case's overrides name nodes, and the kind of node each group names. */
import type { CaseOverrides, NodeKind } from './types';

/** The node-naming override groups with their node kind (checked on edits and on load). */
export const CASE_NODE_GROUPS = [
  ['vessels', 'vessel'],
  ['pumps', 'pump'],
  ['controlValves', 'control-valve'],
  ['boundaries', 'boundary'],
  ['valves', 'fitting'],
  ['junctions', 'junction'],
] as const satisfies ReadonlyArray<readonly [keyof CaseOverrides, NodeKind]>;
