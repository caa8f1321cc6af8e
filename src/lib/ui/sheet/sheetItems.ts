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

/**
 * What the previous call handed out, by element id: each record and the result it read its
 * text from, so an element whose result object and unit system are the same as last time is
 * not formatted again (an edit that does not solve, or a sheet change in between).
 */
export interface ItemCache<T> {
  system: UnitSystem;
  texts: boolean;
  entries: Map<Id, { item: T; source: object | undefined }>;
}

const NO_PORTS: ReadonlySet<string> = new Set();

/**
 * The flow a pipe shows for its result (null without one); without its text when `withText` is
 * false (texts are not drawn at far zoom).
 */
export function pipeFlow(
  result: PipeResult | null,
  system: UnitSystem,
  withText = true,
): PipeFlow | null {
  if (!result) return null;
  const flow = result.flow;
  const q = shownFlow(flow);
  return {
    text:
      !withText || !Number.isFinite(flow)
        ? null
        : q === 0
          ? 'no flow'
          : formatQuantity(q, 'volumeFlow', system, { digits: 3 }),
    reversed: flow < 0,
    noFlow: result.regime === 'no-flow' || q === 0,
  };
}

/** The cached record of `id` when its text was read from `source` with the same settings. */
function readFrom<T>(
  cache: ItemCache<T> | null,
  into: ItemCache<T>,
  id: Id,
  source: object | undefined,
): T | undefined {
  const same = cache && cache.system === into.system && cache.texts === into.texts;
  const entry = same ? cache.entries.get(id) : undefined;
  return entry && entry.source === source ? entry.item : undefined;
}

/** `next`, or `old` when it shows the same. */
function keptFlow(old: PipeFlow | null | undefined, next: PipeFlow | null): PipeFlow | null {
  const same =
    old &&
    next &&
    old.text === next.text &&
    old.reversed === next.reversed &&
    old.noFlow === next.noFlow;
  return same ? old : next;
}

/**
 * What the layers show of the result: in which units, and whether with texts (none at far
 * zoom, where they would be a few pixels high: then a solve changes almost no record).
 */
export interface ShownTexts {
  system: UnitSystem;
  texts: boolean;
}

/** Records of the nodes of `doc`, reusing those of `cache` that are unchanged. */
export function nodeItems(
  cache: ItemCache<NodeItem> | null,
  doc: HeadrouteDocument,
  result: SolveResult | null,
  { system, texts }: ShownTexts,
  badges: ReadonlyMap<Id, { level: FindingLevel }>,
  connected: ReadonlyMap<Id, ReadonlySet<string>>,
): { items: NodeItem[]; cache: ItemCache<NodeItem> } {
  const into: ItemCache<NodeItem> = { system, texts, entries: new Map() };
  const items = Object.values(doc.nodes).map((node) => {
    const source = result?.nodes[node.id];
    const port = portsOf(node)[0];
    const read = readFrom(cache, into, node.id, source);
    const pressure = !texts
      ? null
      : read && (read.node === node || portsOf(read.node)[0] === port)
        ? read.pressure
        : nodePressureText(source, port, system);
    const badge = badges.get(node.id)?.level ?? null;
    const ports = connected.get(node.id) ?? NO_PORTS;
    const old = cache?.entries.get(node.id)?.item;
    const same =
      old &&
      old.node === node &&
      old.pressure === pressure &&
      old.badge === badge &&
      old.connected === ports;
    const item = same ? old : { node, pressure, badge, connected: ports };
    into.entries.set(node.id, { item, source });
    return item;
  });
  return { items, cache: into };
}

/**
 * Records of the pipes of `doc` whose both end nodes exist, reusing those of `cache` that are
 * unchanged. A pipe's flow record is kept too while it shows the same, so the pipe's record is.
 */
export function pipeItems(
  cache: ItemCache<PipeItem> | null,
  doc: HeadrouteDocument,
  result: SolveResult | null,
  { system, texts }: ShownTexts,
  badges: ReadonlyMap<Id, { level: FindingLevel }>,
): { items: PipeItem[]; cache: ItemCache<PipeItem> } {
  const into: ItemCache<PipeItem> = { system, texts, entries: new Map() };
  const items: PipeItem[] = [];
  for (const pipe of Object.values(doc.pipes)) {
    const from = doc.nodes[pipe.from.node];
    const to = doc.nodes[pipe.to.node];
    if (!from || !to) continue;
    const source = result?.pipes[pipe.id];
    const old = cache?.entries.get(pipe.id)?.item;
    const read = readFrom(cache, into, pipe.id, source);
    const flow = read ? read.flow : keptFlow(old?.flow, pipeFlow(source ?? null, system, texts));
    const badge = badges.get(pipe.id)?.level ?? null;
    const same =
      old &&
      old.pipe === pipe &&
      old.from === from &&
      old.to === to &&
      old.flow === flow &&
      old.badge === badge;
    const item = same ? old : { pipe, from, to, flow, badge };
    into.entries.set(pipe.id, { item, source });
    items.push(item);
  }
  return { items, cache: into };
}
