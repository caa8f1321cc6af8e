/**
 * Which parts of the hydraulic graph can be solved: every connected part needs a fixed head.
 * Parts without one are classified (`looseParts`): a fixed flow forced into a part that has no
 * way out is a stop; a part shut in behind shut or non-return elements has no determined
 * pressure (a note); anything else is cut off. Nothing in such a part gets a result.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import type { Finding } from '../types';
import { findingsIn } from '../findings/catalogue';
import type { HydraulicGraph, HydraulicLink } from './build';
import { MASS_TOLERANCE } from './gga';
import { ClosedLaw } from './laws';

/** Graph nodes and links that take part in the solve. */
export interface ActiveParts {
  activeNode: Uint8Array;
  activeLink: Uint8Array;
  findings: Finding[];
  /** True when a fixed flow is forced where it cannot go (a 'forced-flow' finding). */
  forced: boolean;
}

/** Union-find root of i, halving the path. */
export function find(parent: Int32Array, i: number): number {
  while (parent[i] !== i) {
    parent[i] = parent[parent[i]];
    i = parent[i];
  }
  return i;
}

/** Net fixed flow into a part below which it counts as balanced, m³/s: the solve's node-balance tolerance. */
export const FORCED_FLOW_TOLERANCE = MASS_TOLERANCE;

/** True when a link passes head between its ends: it has a law and is not shut. */
export function passesHead(link: HydraulicLink): boolean {
  return link.law !== null && !(link.law instanceof ClosedLaw);
}

function nameOf(doc: HeadrouteDocument, id: Id): string {
  return Object.hasOwn(doc.nodes, id)
    ? doc.nodes[id].name
    : Object.hasOwn(doc.pipes, id)
      ? doc.pipes[id].name
      : id;
}

/**
 * The sheet elements of each loose part, by the part's root: for each graph node in order, its
 * sheet node and then the pipes on it in document order.
 */
function partElements(
  graph: HydraulicGraph,
  parent: Int32Array,
  loose: Uint8Array,
): Map<number, Set<Id>> {
  const n = graph.nodeCount;
  const pipesAt: Id[][] = Array.from({ length: n }, () => []);
  for (const gp of graph.pipeList) {
    const link = graph.links[gp.link];
    if (loose[link.from]) pipesAt[link.from].push(gp.pipe.id);
    if (loose[link.to]) pipesAt[link.to].push(gp.pipe.id);
  }
  const parts = new Map<number, Set<Id>>();
  for (let i = 0; i < n; i++) {
    if (!loose[i]) continue;
    const root = find(parent, i);
    const set = parts.get(root) ?? new Set<Id>();
    set.add(graph.sheetNodes[graph.nodeOwner[i]].id);
    for (const id of pipesAt[i]) set.add(id);
    parts.set(root, set);
  }
  return parts;
}

/**
 * Findings for the loose graph nodes (`loose[i]` = 1: in a part with no fixed head), whose parts
 * are given by `parent` (union-find over the links that `joins` accepts). For each part, the
 * fixed flow forced into it (duty links ending in it, demands in it) and the links at its edge
 * that do not join it to the rest (shut, stopped, or non-return links holding):
 * - net fixed flow ≠ 0: 'forced-flow', naming the forcing elements, the blocking ones and the
 *   part;
 * - else blocked by such links: gathered into one 'blocked-in' note;
 * - else (pass `cutOff`): 'cut-off'.
 */
export function looseParts(
  doc: HeadrouteDocument,
  graph: HydraulicGraph,
  parent: Int32Array,
  loose: Uint8Array,
  joins: (k: number) => boolean,
  cutOff: boolean,
): { findings: Finding[]; forced: boolean } {
  const findings = findingsIn(doc.settings.unitSystem);
  const n = graph.nodeCount;
  const parts = partElements(graph, parent, loose);
  const net = new Map<number, number>();
  const forcing = new Map<number, Set<Id>>();
  const blocking = new Map<number, Set<Id>>();
  const add = (map: Map<number, Set<Id>>, root: number, id: Id) => {
    const set = map.get(root) ?? new Set<Id>();
    set.add(id);
    map.set(root, set);
  };
  for (let i = 0; i < n; i++) {
    if (!loose[i] || graph.demand[i] === 0) continue;
    const root = find(parent, i);
    net.set(root, (net.get(root) ?? 0) - graph.demand[i]);
    add(forcing, root, graph.sheetNodes[graph.nodeOwner[i]].id);
  }
  const links = graph.links;
  for (let k = 0; k < links.length; k++) {
    const link = links[k];
    for (const [end, other, sign] of [
      [link.from, link.to, -1],
      [link.to, link.from, 1],
    ]) {
      if (!loose[end]) continue;
      const root = find(parent, end);
      if (link.law === null) {
        net.set(root, (net.get(root) ?? 0) + sign * link.fixedFlow);
        if (link.fixedFlow !== 0) add(forcing, root, link.element);
      } else if (link.kind !== 'pipe' && !joins(k) && find(parent, other) !== root)
        add(blocking, root, link.element);
    }
  }

  const out: Finding[] = [];
  let forced = false;
  // A sheet element on two parts (a pump's two sides) is named once.
  const reported = new Set<Id>();
  const blockedIds: Id[] = [];
  const blockers: Id[] = [];
  const names = (ids: Id[]) => ids.map((id) => nameOf(doc, id));
  for (const [root, ids] of parts) {
    const by = [...(blocking.get(root) ?? [])];
    const flow = net.get(root) ?? 0;
    if (Math.abs(flow) > FORCED_FLOW_TOLERANCE) {
      forced = true;
      const sources = [...(forcing.get(root) ?? [])];
      const inside = [...ids].filter((id) => !sources.includes(id) && !by.includes(id));
      out.push(
        findings.forcedFlow(names(sources), names(by), names(inside), flow, [
          ...sources,
          ...by,
          ...inside,
        ]),
      );
      ids.forEach((id) => reported.add(id));
      continue;
    }
    const fresh = [...ids].filter((id) => !reported.has(id));
    if (fresh.length === 0) continue;
    fresh.forEach((id) => reported.add(id));
    if (by.length > 0 || !cutOff) {
      blockedIds.push(...fresh.filter((id) => !by.includes(id)));
      for (const id of by) if (!blockers.includes(id)) blockers.push(id);
    } else out.push(findings.cutOff(names(fresh), fresh));
  }
  if (blockedIds.length > 0)
    out.push(findings.blockedIn(names(blockedIds), names(blockers), blockedIds));
  return { findings: out, forced };
}

/**
 * Splits the graph into connected parts through the links that pass head (pipes, open fittings
 * and valves, running pumps; a shut link or a stopped pump does not join its two sides, nor does
 * a duty pump, which fixes a flow, not a head) and keeps the parts that contain a fixed head;
 * the others are classified by `looseParts`. Shut links take no part in the solve: no flow
 * passes them. A sheet with no fixed head at all gives 'no-fixed-head'.
 */
export function activeParts(doc: HeadrouteDocument, graph: HydraulicGraph): ActiveParts {
  const n = graph.nodeCount;
  const links = graph.links;
  const parent = new Int32Array(n);
  for (let i = 0; i < n; i++) parent[i] = i;
  for (const link of links) {
    if (!passesHead(link)) continue;
    const a = find(parent, link.from);
    const b = find(parent, link.to);
    if (a !== b) parent[a] = b;
  }
  const rootHasFixed = new Uint8Array(n);
  let anyFixed = false;
  for (let i = 0; i < n; i++) {
    if (graph.fixed[i]) {
      rootHasFixed[find(parent, i)] = 1;
      anyFixed = true;
    }
  }
  const activeNode = new Uint8Array(n);
  const loose = new Uint8Array(n);
  let anyLoose = false;
  for (let i = 0; i < n; i++) {
    if (rootHasFixed[find(parent, i)]) activeNode[i] = 1;
    else {
      loose[i] = 1;
      anyLoose = true;
    }
  }
  const activeLink = new Uint8Array(links.length);
  for (let k = 0; k < links.length; k++)
    activeLink[k] =
      activeNode[links[k].from] && activeNode[links[k].to] && !(links[k].law instanceof ClosedLaw)
        ? 1
        : 0;

  if (n > 0 && !anyFixed)
    return {
      activeNode,
      activeLink,
      findings: [findingsIn(doc.settings.unitSystem).noFixedHead(Object.keys(doc.nodes))],
      forced: false,
    };
  if (!anyLoose) return { activeNode, activeLink, findings: [], forced: false };
  const { findings, forced } = looseParts(
    doc,
    graph,
    parent,
    loose,
    (k) => passesHead(links[k]),
    true,
  );
  return { activeNode, activeLink, findings, forced };
}
