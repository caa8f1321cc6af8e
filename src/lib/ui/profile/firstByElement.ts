/**
 * Lookup of chart marks by element id, so a mark per waypoint is found without a search of
 * every mark.
 */
import type { Id } from '../../model/types';

/** The first item for each element id, in the order given (what `Array.find` would return). */
export function firstByElement<T extends { elementId: Id }>(items: readonly T[]): Map<Id, T> {
  const byId = new Map<Id, T>();
  for (const item of items) if (!byId.has(item.elementId)) byId.set(item.elementId, item);
  return byId;
}
