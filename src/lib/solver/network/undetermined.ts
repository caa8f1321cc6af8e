/**
 * Parts of the solved sheet whose pressure the sheet does not determine, found after the solve.
 *
 * Before the solve (topology.ts) a part joins the rest through any link that passes head, a
 * non-return link (check valve, running pump) included, since it may open. Once solved, a
 * non-return link that carries no forward flow joins nothing: a section reached only through
 * such links (e.g. between a stopped pump and a check valve held shut) could sit at any
 * pressure on its side of the link, so it is undetermined, and a fixed flow forced into a
 * section whose only way out is a non-return link facing it (a duty pump against a check
 * valve) has no steady solution at all. A running pump at no flow still joins its sides while
 * the heads do not push it back past its shut-off head: it holds that head.
 */
import type { HeadrouteDocument } from '../../model/types';
import type { Finding } from '../types';
import type { HydraulicGraph } from './build';
import { PumpLaw } from './laws';
import { find, looseParts } from './topology';

/** Forward flow above which a non-return link counts as passing flow, m³/s. */
export const PASSING_FLOW = 1e-9;
/** Head by which the heads must push a running pump back past its shut-off head to hold it, m. */
const HOLD_HEAD = 1e-6;

/** Which active graph nodes have a determined head after the solve, with the findings. */
export interface DeterminedParts {
  /** 1 for every graph node whose head the solve determines. */
  known: Uint8Array;
  findings: Finding[];
  /** True when a fixed flow is forced against a non-return link. */
  forced: boolean;
  /** True when some active node is not determined. */
  any: boolean;
}

/** True when a solved active link joins its two ends (see the module comment). */
function joinsAtSolution(
  graph: HydraulicGraph,
  k: number,
  heads: Float64Array,
  flows: Float64Array,
) {
  const link = graph.links[k];
  const law = link.law;
  if (law === null) return false;
  if (!law.nonReturn) return true;
  const q = flows[k];
  if (q > PASSING_FLOW) return true;
  if (!(law instanceof PumpLaw)) return false;
  // A running pump at no flow: held only if the heads push back beyond its shut-off head.
  return heads[link.from] - heads[link.to] >= law.headLoss(0) - HOLD_HEAD;
}

/** The determined parts of a solved sheet (active nodes and links as solved). */
export function determinedParts(
  doc: HeadrouteDocument,
  graph: HydraulicGraph,
  activeNode: Uint8Array,
  activeLink: Uint8Array,
  heads: Float64Array,
  flows: Float64Array,
): DeterminedParts {
  const n = graph.nodeCount;
  const parent = new Int32Array(n);
  for (let i = 0; i < n; i++) parent[i] = i;
  const joins = (k: number) => activeLink[k] === 1 && joinsAtSolution(graph, k, heads, flows);
  let anyNonReturn = false;
  for (let k = 0; k < graph.links.length; k++) {
    if (!activeLink[k]) continue;
    if (graph.links[k].law?.nonReturn) anyNonReturn = true;
    if (!joins(k)) continue;
    const a = find(parent, graph.links[k].from);
    const b = find(parent, graph.links[k].to);
    if (a !== b) parent[a] = b;
  }
  const known = activeNode.slice();
  if (!anyNonReturn) return { known, findings: [], forced: false, any: false };
  const rootHasFixed = new Uint8Array(n);
  for (let i = 0; i < n; i++)
    if (activeNode[i] && graph.fixed[i]) rootHasFixed[find(parent, i)] = 1;
  const loose = new Uint8Array(n);
  let any = false;
  for (let i = 0; i < n; i++) {
    if (!activeNode[i] || rootHasFixed[find(parent, i)]) continue;
    loose[i] = 1;
    known[i] = 0;
    any = true;
  }
  if (!any) return { known, findings: [], forced: false, any };
  const { findings, forced } = looseParts(doc, graph, parent, loose, joins, false);
  return { known, findings, forced, any };
}
