/**
 * Which symbol draws a node. One key per distinct ISO 10628-2-style drawing of our own.
 */
import type { FittingType, SheetNode } from '../../model/types';

export type SymbolKey =
  | 'vessel-open'
  | 'vessel-closed'
  | 'pump'
  | 'control-valve'
  | 'waypoint'
  | 'junction'
  | 'boundary'
  | 'boundary-flow'
  | 'pipe'
  | FittingType;

/** The symbol for a node on the sheet. */
export function symbolKeyOf(node: SheetNode): SymbolKey {
  switch (node.kind) {
    case 'vessel':
      return node.open ? 'vessel-open' : 'vessel-closed';
    case 'fitting':
      return node.fittingType;
    case 'boundary':
      return node.holds === 'flow' ? 'boundary-flow' : 'boundary';
    default:
      return node.kind;
  }
}

/** Half extents of a symbol's drawing around its centre, sheet units (for hit boxes and badges). */
export function symbolExtent(key: SymbolKey): { w: number; h: number } {
  switch (key) {
    case 'vessel-open':
    case 'vessel-closed':
      return { w: 40, h: 60 };
    case 'pump':
      return { w: 18, h: 18 };
    case 'control-valve':
      return { w: 16, h: 26 };
    case 'waypoint':
    case 'junction':
      return { w: 8, h: 8 };
    default:
      return { w: 16, h: 12 };
  }
}
