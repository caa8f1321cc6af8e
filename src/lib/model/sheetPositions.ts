/**
 * Whether two documents differ only in where nodes sit on the sheet. Hydraulics do not depend
 * on a symbol's position on the sheet (pipe lengths and elevations are properties of their
 * own), so a solve result for one document holds for the other: dragging parts around the
 * sheet needs no new solve.
 */
import type { HeadrouteDocument, SheetNode } from './types';

/** Node fields that place a node on the sheet and nothing else. */
const SHEET_ONLY = new Set(['x', 'y']);

function sameButPosition(a: SheetNode, b: SheetNode): boolean {
  const keysA = Object.keys(a);
  if (keysA.length !== Object.keys(b).length) return false;
  for (const key of keysA) {
    if (SHEET_ONLY.has(key)) continue;
    if (!Object.hasOwn(b, key)) return false;
    // Nested values (nozzles, curves) are shared by the document's structural sharing when
    // untouched; a rebuilt but equal array counts as a change, which only costs a solve.
    if (
      (a as unknown as Record<string, unknown>)[key] !==
      (b as unknown as Record<string, unknown>)[key]
    )
      return false;
  }
  return true;
}

/**
 * True when `next` equals `prev` except for nodes' sheet positions (x, y). Every other part of
 * the document must be the same object or hold the same values (names included: findings
 * quote them).
 */
export function onlySheetPositionsChanged(
  prev: HeadrouteDocument,
  next: HeadrouteDocument,
): boolean {
  if (prev === next) return true;
  for (const key of Object.keys(next) as Array<keyof HeadrouteDocument>)
    if (key !== 'nodes' && prev[key] !== next[key]) return false;
  if (Object.keys(prev).length !== Object.keys(next).length) return false;
  const before = prev.nodes;
  const after = next.nodes;
  const ids = Object.keys(after);
  if (ids.length !== Object.keys(before).length) return false;
  for (const id of ids) {
    const a = before[id];
    const b = after[id];
    if (a === b) continue;
    if (!a || !sameButPosition(a, b)) return false;
  }
  return true;
}
