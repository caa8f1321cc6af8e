/**
 * Which parts of the hydraulic graph can be solved: every connected part needs a fixed head.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import type { Finding } from '../types';
import { findings } from '../findings/catalogue';
import type { HydraulicGraph } from './build';

/** Graph nodes and links that take part in the solve. */
export interface ActiveParts {
  activeNode: Uint8Array;
  activeLink: Uint8Array;
  findings: Finding[];
}

function find(parent: Int32Array, i: number): number {
  while (parent[i] !== i) {
    parent[i] = parent[parent[i]];
    i = parent[i];
  }
  return i;
}

/**
 * The sheet elements of each part without a fixed head, by the part's root: for each graph
 * node in order, its sheet node and then the pipes on it in document order.
 */
function cutParts(
  graph: HydraulicGraph,
  parent: Int32Array,
  activeNode: Uint8Array,
): Map<number, Set<Id>> {
  const n = graph.nodeCount;
  const pipesAt: Id[][] = Array.from({ length: n }, () => []);
  for (const gp of graph.pipeList) {
    const link = graph.links[gp.link];
    if (!activeNode[link.from]) pipesAt[link.from].push(gp.pipe.id);
    if (!activeNode[link.to]) pipesAt[link.to].push(gp.pipe.id);
  }
  const cut = new Map<number, Set<Id>>();
  for (let i = 0; i < n; i++) {
    if (activeNode[i]) continue;
    const root = find(parent, i);
    const set = cut.get(root) ?? new Set<Id>();
    set.add(graph.sheetNodes[graph.nodeOwner[i]].id);
    for (const id of pipesAt[i]) set.add(id);
    cut.set(root, set);
  }
  return cut;
}

/**
 * Splits the graph into connected parts (through links with a head-loss law, closed ones
 * included; a duty pump fixes a flow, not a head, so it does not join its two sides) and keeps
 * the parts that contain a fixed head. Each other part gives a 'cut-off' finding naming its
 * elements; a sheet with no fixed head at all gives 'no-fixed-head'.
 */
export function activeParts(doc: HeadrouteDocument, graph: HydraulicGraph): ActiveParts {
  const n = graph.nodeCount;
  const parent = new Int32Array(n);
  for (let i = 0; i < n; i++) parent[i] = i;
  for (const link of graph.links) {
    if (link.law === null) continue;
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
  let anyCut = false;
  for (let i = 0; i < n; i++) {
    if (rootHasFixed[find(parent, i)]) activeNode[i] = 1;
    else anyCut = true;
  }
  const activeLink = new Uint8Array(graph.links.length);
  const links = graph.links;
  for (let k = 0; k < links.length; k++)
    activeLink[k] = activeNode[links[k].from] && activeNode[links[k].to] ? 1 : 0;
  const cut = anyCut ? cutParts(graph, parent, activeNode) : new Map<number, Set<Id>>();

  const out: Finding[] = [];
  if (n > 0 && !anyFixed) {
    out.push(findings.noFixedHead(Object.keys(doc.nodes)));
  } else {
    // Merge parts that belong to the same sheet element (a pump's two sides) into one message each.
    const reported = new Set<Id>();
    for (const ids of cut.values()) {
      const fresh = [...ids].filter((id) => !reported.has(id));
      if (fresh.length === 0) continue;
      fresh.forEach((id) => reported.add(id));
      const names = fresh.map((id) =>
        Object.hasOwn(doc.nodes, id)
          ? doc.nodes[id].name
          : Object.hasOwn(doc.pipes, id)
            ? doc.pipes[id].name
            : id,
      );
      out.push(findings.cutOff(names, fresh));
    }
  }
  return { activeNode, activeLink, findings: out };
}
