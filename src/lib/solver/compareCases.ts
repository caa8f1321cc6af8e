/**
 * The cases side by side: the base case and every stored case solved separately, reduced to
 * rows of key figures (flow, pump head, power, NPSH, margin to vapour pressure, worst finding),
 * each row marking the case with the worst value.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import type { Quantity } from '../units';
import { applyCase } from './applyCase';
import { profile } from './profile';
import { defaultRoute } from './route';
import { solve } from './solve';
import type { Finding, FindingLevel, Profile, SolveResult } from './types';

/** Which end of a row is the worse one. */
export type WorseWhen = 'higher' | 'lower';

/** Where the smallest margin between absolute pressure and vapour pressure was found. */
export interface VapourMarginPoint {
  /** p_abs − p_v, Pa. */
  marginPa: number;
  /** The same margin as head of the case's liquid, m. */
  marginHead: number;
  elementId: Id;
  /** The element's name (its id when it has none). */
  elementName: string;
  /** Chainage along the compared route, m; absent when no route could be followed. */
  chainage?: number;
}

/** One case solved: its id (null for the base case), its name and its result. */
export interface ComparedCase {
  caseId: Id | null;
  name: string;
  result: SolveResult;
  /** Profile along the compared route in this case, when there is a route. */
  profile: Profile | null;
  /** Smallest margin to vapour pressure (route stations, else every solved port). */
  minVapourMargin: VapourMarginPoint | null;
  /** The most severe finding (stop before caution before note), or null. */
  worstFinding: Finding | null;
  /** Pumps switched on in this case. */
  runningPumps: Id[];
}

/** A cell of the comparison: a number (SI) or a finding, or nothing. */
export type ComparisonValue = number | Finding | null;

/** One row of the comparison table. */
export interface ComparisonRow {
  /** Stable key, e.g. 'pump:PU1:npshAvailable', 'vapour-margin', 'worst-finding'. */
  key: string;
  /** Row heading, e.g. "Feed pump — NPSHa". */
  label: string;
  /** Quantity for formatting numeric cells; null for the findings row. */
  quantity: Quantity | null;
  /** Which end is worse. For the findings row: 'higher' severity. */
  worseWhen: WorseWhen;
  /** One value per compared case, in the order of `cases`. */
  values: ComparisonValue[];
  /** Remark per case ("off", "2 stop"), or null. Where a vapour margin lies: see `cases`. */
  notes: Array<string | null>;
  /** Index into `cases` of the worst value; null when all values are equal or missing. */
  worst: number | null;
}

/** The whole comparison. */
export interface CaseComparison {
  /** Route the vapour margins were sought along (node and pipe ids), or null. */
  route: Id[] | null;
  cases: ComparedCase[];
  rows: ComparisonRow[];
}

const LEVEL_RANK: Record<FindingLevel, number> = { stop: 3, caution: 2, note: 1 };
const G = 9.80665; // standard gravity, m/s² (CGPM 1901)

/** The most severe finding of a result (first of its level), or null when there is none. */
export function worstFinding(findings: readonly Finding[]): Finding | null {
  let worst: Finding | null = null;
  for (const f of findings) {
    if (!worst || LEVEL_RANK[f.level] > LEVEL_RANK[worst.level]) worst = f;
  }
  return worst;
}

function elementName(doc: HeadrouteDocument, id: Id): string {
  const n = Object.hasOwn(doc.nodes, id) ? doc.nodes[id] : undefined;
  const p = Object.hasOwn(doc.pipes, id) ? doc.pipes[id] : undefined;
  return n?.name || p?.name || id;
}

/**
 * Smallest p_abs − p_v over a profile's line stations (vessel liquid surfaces excluded), or,
 * without a profile, over every solved port. Null when nothing was solved.
 */
export function minVapourMargin(
  doc: HeadrouteDocument,
  result: SolveResult,
  along: Profile | null,
): VapourMarginPoint | null {
  const rhoG = result.fluid.density * G;
  let best: VapourMarginPoint | null = null;
  const consider = (marginPa: number, elementId: Id, chainage?: number) => {
    if (!Number.isFinite(marginPa)) return;
    if (best && marginPa >= best.marginPa) return;
    best = {
      marginPa,
      marginHead: rhoG > 0 ? marginPa / rhoG : 0,
      elementId,
      elementName: elementName(doc, elementId),
    };
    if (chainage !== undefined) best.chainage = chainage;
  };
  if (along && along.stations.length > 0) {
    for (const s of along.stations) {
      if (s.at !== 'level') consider(s.vapourMargin, s.elementId, s.chainage);
    }
    if (best) return best;
  }
  const pv = result.fluid.vapourPressure;
  for (const [id, node] of Object.entries(result.nodes)) {
    for (const port of Object.values(node.ports)) consider(port.pressureAbs - pv, id);
  }
  return best;
}

/** The route compared: the default route of the base case, else of the first case with one. */
function comparedRoute(doc: HeadrouteDocument, results: SolveResult[]): Id[] | null {
  for (const r of results) {
    const route = defaultRoute(doc, r);
    if (route && route.length > 0) return route;
  }
  return null;
}

/** Index of the worst value, or null when fewer than two values differ. */
export function worstIndex(
  values: readonly (number | null)[],
  worseWhen: WorseWhen,
): number | null {
  let worst: number | null = null;
  let distinct = false;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v === null || !Number.isFinite(v)) continue;
    if (worst === null) {
      worst = i;
      continue;
    }
    const w = values[worst] as number;
    // Values equal to about 1e-9 relative count as the same.
    if (Math.abs(v - w) > 1e-9 * Math.max(1, Math.abs(v), Math.abs(w))) distinct = true;
    if (worseWhen === 'higher' ? v > w : v < w) worst = i;
  }
  return distinct ? worst : null;
}

function findingScore(f: Finding | null): number {
  return f ? LEVEL_RANK[f.level] : 0;
}

/** Solves one case and gathers what the comparison reads from it. */
function compared(
  doc: HeadrouteDocument,
  caseId: Id | null,
  result: SolveResult,
  route: Id[] | null,
): ComparedCase {
  const working = applyCase(doc, caseId);
  let along: Profile | null = null;
  if (route) {
    try {
      along = profile(doc, result, route);
    } catch {
      along = null; // a route this case cannot follow: fall back to every solved port
    }
  }
  return {
    caseId,
    name: caseId === null ? 'Base case' : doc.cases[caseId].name,
    result,
    profile: along,
    minVapourMargin: minVapourMargin(working, result, along),
    worstFinding: worstFinding(result.findings),
    runningPumps: Object.values(working.nodes)
      .filter((n) => n.kind === 'pump' && n.running)
      .map((n) => n.id),
  };
}

/**
 * Solves the base case and every stored case (`solve(doc, caseId)`, in the order of
 * `doc.cases`) and lays their key figures side by side. Pure: the document is read, never
 * changed. Rows: per pump (running in any case) its flow, head, shaft power, NPSHa, NPSHr and
 * NPSH margin; with no pumps, the flow in the first pipe of the compared route; then the
 * smallest margin to vapour pressure (with element and chainage) and the worst finding.
 * Worse means: less flow, more head, more power, less NPSHa, more NPSHr, less margin, lower
 * vapour margin, a more severe finding.
 */
export function compareCases(doc: HeadrouteDocument): CaseComparison {
  const ids: Array<Id | null> = [null, ...Object.keys(doc.cases)];
  const results = ids.map((id) => solve(doc, id));
  const route = comparedRoute(doc, results);
  const cases = ids.map((id, i) => compared(doc, id, results[i], route));
  const rows: ComparisonRow[] = [];

  const numberRow = (
    key: string,
    label: string,
    quantity: Quantity,
    worseWhen: WorseWhen,
    pick: (c: ComparedCase) => number | null,
    note: (c: ComparedCase) => string | null = () => null,
  ) => {
    const values = cases.map(pick);
    rows.push({
      key,
      label,
      quantity,
      worseWhen,
      values,
      notes: cases.map(note),
      worst: worstIndex(values, worseWhen),
    });
  };

  const pumpIds = Object.keys(doc.nodes).filter(
    (id) => doc.nodes[id].kind === 'pump' && cases.some((c) => c.result.pumps[id]),
  );
  for (const id of pumpIds) {
    const name = elementName(doc, id);
    const pump = (c: ComparedCase) =>
      c.runningPumps.includes(id) ? (c.result.pumps[id] ?? null) : null;
    const off = (c: ComparedCase) =>
      !c.runningPumps.includes(id) ? 'off' : pump(c) ? null : 'not solved';
    numberRow(
      `pump:${id}:flow`,
      `${name} — flow`,
      'volumeFlow',
      'lower',
      (c) => pump(c)?.flow ?? null,
      off,
    );
    numberRow(
      `pump:${id}:head`,
      `${name} — head`,
      'head',
      'higher',
      (c) => pump(c)?.head ?? null,
      off,
    );
    numberRow(
      `pump:${id}:power`,
      `${name} — shaft power`,
      'power',
      'higher',
      (c) => pump(c)?.shaftPower ?? null,
      off,
    );
    numberRow(
      `pump:${id}:npshAvailable`,
      `${name} — NPSHa`,
      'head',
      'lower',
      (c) => pump(c)?.npshAvailable ?? null,
      off,
    );
    numberRow(
      `pump:${id}:npshRequired`,
      `${name} — NPSHr`,
      'head',
      'higher',
      (c) => pump(c)?.npshRequired ?? null,
      off,
    );
    numberRow(
      `pump:${id}:npshMargin`,
      `${name} — NPSH margin`,
      'head',
      'lower',
      (c) => pump(c)?.npshMargin ?? null,
      off,
    );
  }
  if (pumpIds.length === 0) {
    const first = cases
      .flatMap((c) => c.profile?.stations ?? [])
      .find((s) => Object.hasOwn(doc.pipes, s.elementId));
    if (first) {
      const pipeId = first.elementId;
      const pipeFlow = (c: ComparedCase) =>
        c.result.pipes[pipeId] ? Math.abs(c.result.pipes[pipeId].flow) : null;
      numberRow(
        `pipe:${pipeId}:flow`,
        `${elementName(doc, pipeId)} — flow`,
        'volumeFlow',
        'lower',
        pipeFlow,
      );
    }
  }

  numberRow(
    'vapour-margin',
    'Least margin to vapour pressure',
    'pressureDrop',
    'lower',
    (c) => c.minVapourMargin?.marginPa ?? null,
  );

  const severities = cases.map((c) => findingScore(c.worstFinding));
  rows.push({
    key: 'worst-finding',
    label: 'Worst finding',
    quantity: null,
    worseWhen: 'higher',
    values: cases.map((c) => c.worstFinding),
    notes: cases.map((c) => {
      const n = c.result.findings.filter((f) => f.level === c.worstFinding?.level).length;
      return c.worstFinding ? `${n} ${c.worstFinding.level}` : null;
    }),
    worst: worstIndex(severities, 'higher'),
  });

  return { route, cases, rows };
}
