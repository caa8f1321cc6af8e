/**
 * Which route the profile follows: the automatic default, a stored route, or a start and an
 * end picked by the user. Session state (never saved); resolved against the current document
 * and result each time, so a choice whose nodes were deleted falls back to the default.
 */
import type { HeadrouteDocument, Id, NodeKind } from '../../model/types';
import type { SolveResult } from '../../solver/types';
import { defaultRoute, searchRoute } from '../../solver/route';

/** The user's choice of route. */
export type RouteChoice =
  { kind: 'default' } | { kind: 'stored'; id: Id } | { kind: 'ends'; from: Id; to: Id };

/** A resolved route: its nodes, a name, and why it fell back when it did. */
export interface ResolvedRoute {
  nodes: Id[];
  name: string;
  /** The stored route shown, when one is. */
  storedId: Id | null;
  /** Set when the chosen route could not be followed (the default is shown instead, or nothing). */
  problem: string | null;
}

/** A node offered in the start and end pickers. */
export interface NodeOption {
  id: Id;
  label: string;
  kind: NodeKind;
}

/** Kinds a route can start or end at, in the order the pickers list them. */
const END_KINDS: NodeKind[] = [
  'vessel',
  'boundary',
  'pump',
  'control-valve',
  'fitting',
  'waypoint',
  'junction',
];

/** The last list built, keyed on the ids, names and kinds it was built from. */
let lastOptions: { key: string; options: NodeOption[] } | null = null;

/**
 * Nodes for the start and end pickers, vessels and boundaries first, then by name. Moving a
 * node changes only its position, so the sorted list is kept and handed back (same array)
 * until an id, name or kind changes.
 */
export function nodeOptions(doc: HeadrouteDocument): NodeOption[] {
  const nodes = Object.values(doc.nodes);
  let key = '';
  for (const n of nodes) key += `${n.id}\u0000${n.name}\u0000${n.kind}\u0001`;
  if (lastOptions && lastOptions.key === key) return lastOptions.options;
  // One collator for the whole sort: the same order as localeCompare with these options,
  // without building a collator per comparison.
  const collator = new Intl.Collator(undefined, { numeric: true });
  const options = nodes
    .map((n) => ({ id: n.id, label: n.name || n.id, kind: n.kind }))
    .sort(
      (a, b) =>
        END_KINDS.indexOf(a.kind) - END_KINDS.indexOf(b.kind) || collator.compare(a.label, b.label),
    );
  lastOptions = { key, options };
  return options;
}

function nameOf(doc: HeadrouteDocument, id: Id): string {
  return doc.nodes[id]?.name || id;
}

/** "Start → End" for a list of route nodes. */
export function endsName(doc: HeadrouteDocument, nodes: readonly Id[]): string {
  return nodes.length ? `${nameOf(doc, nodes[0])} → ${nameOf(doc, nodes[nodes.length - 1])}` : '';
}

/** Follows the choice; falls back to the default route with a message when it cannot. */
export function resolveRoute(
  doc: HeadrouteDocument,
  result: SolveResult,
  choice: RouteChoice,
): ResolvedRoute {
  let problem: string | null = null;
  if (choice.kind === 'stored') {
    const stored = doc.routes[choice.id];
    if (stored && stored.nodes.every((id) => Object.hasOwn(doc.nodes, id))) {
      return { nodes: [...stored.nodes], name: stored.name, storedId: stored.id, problem: null };
    }
    problem = stored
      ? `Route ${stored.name} passes a node that is no longer on the sheet.`
      : 'The stored route was deleted.';
  } else if (choice.kind === 'ends') {
    const { from, to } = choice;
    if (!Object.hasOwn(doc.nodes, from) || !Object.hasOwn(doc.nodes, to)) {
      problem = 'A picked end is no longer on the sheet.';
    } else if (from === to) {
      problem = 'Start and end are the same node: pick two different ones.';
    } else {
      // searchRoute is findRoute with a note when the route has to run against the flow.
      const found = searchRoute(doc, result, from, to);
      if (found) {
        const nodes = found.route;
        return { nodes, name: endsName(doc, nodes), storedId: null, problem: found.note };
      }
      problem = `No route along the pipes from ${nameOf(doc, from)} to ${nameOf(doc, to)}.`;
    }
  }
  const nodes = defaultRoute(doc, result);
  if (!nodes) {
    return {
      nodes: [],
      name: '',
      storedId: null,
      problem: problem ?? 'No route to show: connect two vessels (or boundaries) with pipes.',
    };
  }
  return { nodes, name: endsName(doc, nodes), storedId: null, problem };
}
