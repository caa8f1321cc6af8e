/**
 * Keeping what did not change in a new profile geometry identical to the last one, so the
 * chart updates only the marks that moved. Each solve during a waypoint drag lays the profile
 * out again (profileGeometry builds new objects throughout); on a long route hundreds of
 * handles, element labels and leaders sit where they were, and handing the chart the same
 * objects for them lets it skip them.
 */
import type { ProfileGeometry } from '$lib/chart';
import { sameFields } from '../sameFields';

/** `next`, or `previous` when it has the same fields. */
function same<T extends object>(previous: T, next: T): T {
  return sameFields(previous, next) ? previous : next;
}

/**
 * `next` with each item that has the same fields as the item at its place in `previous`
 * replaced by that item; `previous` itself when every item was.
 */
export function sameItems<T extends object>(previous: readonly T[], next: T[]): T[] {
  let all = previous.length === next.length;
  const items = next.map((item, i) => {
    const old = previous[i];
    if (old !== undefined && sameFields(old, item)) return old;
    all = false;
    return item;
  });
  return all ? (previous as T[]) : items;
}

/**
 * `next` with its parts that equal those of `previous` (field by field, one level deep)
 * replaced by them. The scales and the helpers bound to them are always `next`'s.
 */
export function keepSameGeometry(
  previous: ProfileGeometry | null,
  next: ProfileGeometry,
): ProfileGeometry {
  if (!previous) return next;
  const ticks = {
    x: sameItems(previous.ticks.x, next.ticks.x),
    y: sameItems(previous.ticks.y, next.ticks.y),
  };
  return {
    ...next,
    size: same(previous.size, next.size),
    plot: same(previous.plot, next.plot),
    paths: same(previous.paths, next.paths),
    pipeSegments: sameItems(previous.pipeSegments, next.pipeSegments),
    steps: sameItems(previous.steps, next.steps),
    levels: sameItems(previous.levels, next.levels),
    nodes: sameItems(previous.nodes, next.nodes),
    spans: sameItems(previous.spans, next.spans),
    labels: sameItems(previous.labels, next.labels),
    npsh: sameItems(previous.npsh, next.npsh),
    topNotes: sameItems(previous.topNotes, next.topNotes),
    ticks: same(previous.ticks, ticks),
    axisTitles: same(previous.axisTitles, next.axisTitles),
  };
}
