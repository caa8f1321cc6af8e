/**
 * The parts shelf: every part the model has, grouped, with what placing it creates.
 */
import type { NodePatch } from '../../model/commands';
import type { FittingType, NodeKind } from '../../model/types';
import type { SymbolKey } from '../symbols/keys';

/** One shelf entry. `kind: 'pipe'` is the pipe tool, not a node. */
export interface ShelfPart {
  id: string;
  label: string;
  symbol: SymbolKey;
  kind: NodeKind | 'pipe';
  /** Properties given to the new node on top of the model's defaults. */
  props?: NodePatch;
}

export interface ShelfGroup {
  title: string;
  parts: ShelfPart[];
}

const fitting = (type: FittingType, label: string): ShelfPart => ({
  id: type,
  label,
  symbol: type,
  kind: 'fitting',
  props: { fittingType: type },
});

/** The shelf, in display order. */
export const SHELF: ShelfGroup[] = [
  {
    title: 'Vessels and pumps',
    parts: [
      {
        id: 'vessel-open',
        label: 'Open vessel',
        symbol: 'vessel-open',
        kind: 'vessel',
        props: { open: true },
      },
      {
        id: 'vessel-closed',
        label: 'Closed vessel',
        symbol: 'vessel-closed',
        kind: 'vessel',
        props: { open: false },
      },
      { id: 'pump', label: 'Pump', symbol: 'pump', kind: 'pump' },
    ],
  },
  {
    title: 'Valves',
    parts: [
      {
        id: 'control-valve',
        label: 'Control valve',
        symbol: 'control-valve',
        kind: 'control-valve',
      },
      fitting('gate-valve', 'Gate valve'),
      fitting('globe-valve', 'Globe valve'),
      fitting('ball-valve', 'Ball valve'),
      fitting('butterfly-valve', 'Butterfly valve'),
      fitting('swing-check-valve', 'Swing check'),
      fitting('lift-check-valve', 'Lift check'),
    ],
  },
  {
    title: 'Fittings',
    parts: [
      fitting('elbow-90-standard', '90° elbow'),
      fitting('elbow-90-long-radius', '90° long-radius'),
      fitting('elbow-45-standard', '45° elbow'),
      fitting('elbow-45-long-radius', '45° long-radius'),
      fitting('tee-run', 'Tee, run'),
      fitting('tee-branch', 'Tee, branch'),
      fitting('reducer', 'Reducer'),
      fitting('expander', 'Expander'),
      fitting('restriction-orifice', 'Restriction orifice'),
      fitting('strainer', 'Strainer'),
      fitting('flow-meter', 'Flow meter'),
    ],
  },
  {
    title: 'Route',
    parts: [
      { id: 'pipe', label: 'Pipe', symbol: 'pipe', kind: 'pipe' },
      { id: 'waypoint', label: 'Waypoint', symbol: 'waypoint', kind: 'waypoint' },
      { id: 'junction', label: 'Branch point', symbol: 'junction', kind: 'junction' },
      {
        id: 'boundary',
        label: 'Header (fixed pressure)',
        symbol: 'boundary',
        kind: 'boundary',
        props: { holds: 'pressure' },
      },
      {
        id: 'draw-off',
        label: 'Draw-off / supply (fixed flow)',
        symbol: 'boundary-flow',
        kind: 'boundary',
        props: { holds: 'flow', outflow: 0 },
      },
    ],
  },
];

/** Find a shelf part by id. */
export function shelfPart(id: string): ShelfPart | undefined {
  for (const g of SHELF) for (const p of g.parts) if (p.id === id) return p;
  return undefined;
}
