/**
 * A new profile geometry keeps the objects of the marks that did not move, so the chart skips
 * them; marks that moved, and the scales, are the new ones.
 */
import { describe, expect, it } from 'vitest';
import { network } from '../../../bench/networks';
import { profileGeometry, type ProfileGeometry } from '../../../src/lib/chart';
import { updateNode } from '../../../src/lib/model/commands';
import { History } from '../../../src/lib/model/history';
import type { HeadrouteDocument } from '../../../src/lib/model/types';
import { defaultRoute } from '../../../src/lib/solver/route';
import { profile } from '../../../src/lib/solver/profile';
import { solve } from '../../../src/lib/solver/solve';
import { keepSameGeometry, sameItems } from '../../../src/lib/ui/profile/stableGeometry';

function geometry(doc: HeadrouteDocument, elevationWindow?: [number, number]): ProfileGeometry {
  const result = solve(doc, null);
  const route = defaultRoute(doc, result)!;
  return profileGeometry(
    profile(doc, result, route),
    { width: 900, height: 400 },
    { system: 'SI', nodes: doc.nodes, pumps: result.pumps, elevationWindow },
  );
}

describe('keepSameGeometry', () => {
  it('hands back every part of an equal geometry as it was', () => {
    const doc = network('series', 12);
    const first = geometry(doc);
    const again = keepSameGeometry(first, geometry(doc));
    for (const key of [
      'plot',
      'paths',
      'nodes',
      'labels',
      'steps',
      'pipeSegments',
      'ticks',
    ] as const)
      expect(again[key]).toBe(first[key]);
    expect(again.nodes.length).toBeGreaterThan(10);
  });

  it('gives new objects only for the marks a changed elevation moved', () => {
    const history = new History(network('series', 12));
    const first = geometry(history.doc);
    const waypoint = Object.values(history.doc.nodes).find((n) => n.kind === 'waypoint')!;
    history.apply(updateNode(waypoint.id, { z: waypoint.z + 1 }));
    // The elevation scale held still, as during a drag on the profile.
    const next = geometry(history.doc, first.elevationRange);
    const kept = keepSameGeometry(first, next);
    const changedNodes = kept.nodes.filter((n, i) => n !== first.nodes[i]);
    expect(changedNodes.map((n) => n.elementId)).toEqual([waypoint.id]);
    expect(changedNodes[0]).toEqual(next.nodes.find((n) => n.elementId === waypoint.id));
    expect(kept.labels).toBe(first.labels);
    expect(kept.paths.pipe).not.toBe(first.paths.pipe);
    // Everything drawn is what the new geometry says.
    expect(kept.nodes).toEqual(next.nodes);
    expect(kept.paths).toEqual(next.paths);
    expect(kept.y).toBe(next.y);
  });

  it('sameItems keeps the old array only when every item is unchanged', () => {
    const a = [{ id: 1 }, { id: 2 }];
    expect(sameItems(a, [{ id: 1 }, { id: 2 }])).toBe(a);
    const longer = sameItems(a, [{ id: 1 }, { id: 2 }, { id: 3 }]);
    expect(longer).not.toBe(a);
    expect(longer[0]).toBe(a[0]);
    const changed = sameItems(a, [{ id: 1 }, { id: 5 }]);
    expect(changed[0]).toBe(a[0]);
    expect(changed[1]).toEqual({ id: 5 });
    // A field added or missing is a change.
    const plain: object[] = [{ id: 1 }];
    expect(sameItems(plain, [{ id: 1, x: undefined }])[0]).not.toBe(plain[0]);
    expect(sameItems(plain, [{ id: 1 }])[0]).toBe(plain[0]);
  });
});
