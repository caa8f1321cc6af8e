/**
 * What each node and pipe of the sheet draws, as one record per element that keeps its identity
 * while what it draws is unchanged. The layers iterate these records, so after a new solve only
 * the elements whose shown text changed (most pressures and flows move in a digit beyond the
 * three shown, or not at all) are updated, and after an edit only the elements it touched.
 * Results are read here once per solve, not by every element from the whole result.
 */
import { portsOf } from '../../model/ports';
import type { HeadrouteDocument, Id, Pipe, SheetNode } from '../../model/types';
import type { FindingLevel, PipeResult, SolveResult } from '../../solver/types';
import { formatQuantity } from '../../units/format';
import type { UnitSystem } from '../../units/quantities';
import { nodePressureText, shownFlow } from '../results';

/** A node on the sheet with the texts it shows. */
export interface NodeItem {
  node: SheetNode;
  /** Gauge pressure at its first port, or null (no result, or not finite). */
  pressure: string | null;
  badge: FindingLevel | null;
  /** Its ports that have a pipe. */
  connected: ReadonlySet<string>;
}

/** What a pipe shows of its result. */
export interface PipeFlow {
  /** The flow as text ('no flow' for none), or null when the flow is not finite. */
  text: string | null;
  /** The flow runs from the pipe's `to` end to its `from` end. */
  reversed: boolean;
  /** No flow (drawn dashed, without an arrow). */
  noFlow: boolean;
}

/** A pipe on the sheet with its end nodes and what it shows of the result. */
export interface PipeItem {
  pipe: Pipe;
  from: SheetNode;
  to: SheetNode;
  /** Null while there is no result. */
  flow: PipeFlow | null;
  badge: FindingLevel | null;
}

/** Records of the previous call, by element id, to hand back unchanged ones as they were. */
export type ItemCache<T> = Map<Id, T>;

const NO_PORTS: ReadonlySet<string> = new Set();

/** True when two records have the same fields (compared with ===). */
function sameFields<T extends object>(a: T, b: T): boolean {
  for (const key in a) if (a[key] !== b[key]) return false;
  return true;
}

/** The flow a pipe shows for its result (null without one). */
export function pipeFlow(result: PipeResult | null, system: UnitSystem): PipeFlow | null {
  if (!result) return null;
  const flow = result.flow;
  const q = shownFlow(flow);
  return {
    text: !Number.isFinite(flow)
      ? null
      : q === 0
        ? 'no flow'
        : formatQuantity(q, 'volumeFlow', system, { digits: 3 }),
    reversed: flow < 0,
    noFlow: result.regime === 'no-flow' || q === 0,
  };
}

/**
 * Keep `next` as the record of `id` unless the cache holds one with the same fields; returns
 * the record to use and puts it in `into`.
 */
function keep<T extends object>(
  cache: ItemCache<T> | null,
  into: ItemCache<T>,
  id: Id,
  next: T,
): T {
  const old = cache?.get(id);
  const item = old && sameFields(old, next) ? old : next;
  into.set(id, item);
  return item;
}

/** Records of the nodes of `doc`, reusing those of `cache` that are unchanged. */
export function nodeItems(
  cache: ItemCache<NodeItem> | null,
  doc: HeadrouteDocument,
  result: SolveResult | null,
  system: UnitSystem,
  badges: ReadonlyMap<Id, { level: FindingLevel }>,
  connected: ReadonlyMap<Id, ReadonlySet<string>>,
): { items: NodeItem[]; cache: ItemCache<NodeItem> } {
  const into: ItemCache<NodeItem> = new Map();
  const items = Object.values(doc.nodes).map((node) =>
    keep(cache, into, node.id, {
      node,
      pressure: nodePressureText(result?.nodes[node.id], portsOf(node)[0], system),
      badge: badges.get(node.id)?.level ?? null,
      connected: connected.get(node.id) ?? NO_PORTS,
    }),
  );
  return { items, cache: into };
}

/**
 * Records of the pipes of `doc` whose both end nodes exist, reusing those of `cache` that are
 * unchanged. A pipe's flow record is kept too while its fields are the same, so the pipe's
 * record is.
 */
export function pipeItems(
  cache: ItemCache<PipeItem> | null,
  doc: HeadrouteDocument,
  result: SolveResult | null,
  system: UnitSystem,
  badges: ReadonlyMap<Id, { level: FindingLevel }>,
): { items: PipeItem[]; cache: ItemCache<PipeItem> } {
  const into: ItemCache<PipeItem> = new Map();
  const items: PipeItem[] = [];
  for (const pipe of Object.values(doc.pipes)) {
    const from = doc.nodes[pipe.from.node];
    const to = doc.nodes[pipe.to.node];
    if (!from || !to) continue;
    const old = cache?.get(pipe.id)?.flow;
    const flow = pipeFlow(result?.pipes[pipe.id] ?? null, system);
    items.push(
      keep(cache, into, pipe.id, {
        pipe,
        from,
        to,
        flow: old && flow && sameFields(old, flow) ? old : flow,
        badge: badges.get(pipe.id)?.level ?? null,
      }),
    );
  }
  return { items, cache: into };
}
