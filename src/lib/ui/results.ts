/**
 * Reading solve results for display: findings grouped by element, and hover readouts in the
 * project's units. Pure functions.
 */
import { nodeLabel } from '../model/labels';
import type { HeadrouteDocument, Id, Vessel } from '../model/types';
import type { Finding, FindingLevel, NodeResult, SolveResult } from '../solver/types';
import { formatQuantity } from '../units/format';
import type { UnitSystem } from '../units/quantities';

/**
 * Flows smaller than this, m³/s (about 0.004 L/h), are solver round-off in a line that carries
 * nothing; they are shown as no flow rather than as 3e-13 m³/h.
 */
export const NO_FLOW = 1e-9;

/** A flow for display: |flow| with round-off below NO_FLOW shown as 0. */
export function shownFlow(flow: number): number {
  return Math.abs(flow) < NO_FLOW ? 0 : Math.abs(flow);
}

const RANK: Record<FindingLevel, number> = { stop: 3, caution: 2, note: 1 };

/** The more severe of two levels. */
export function worseLevel(a: FindingLevel | null, b: FindingLevel): FindingLevel {
  return a === null || RANK[b] > RANK[a] ? b : a;
}

/** Findings of each element and the worst level among them. */
export function findingsByElement(
  findings: readonly Finding[],
): Map<Id, { level: FindingLevel; findings: Finding[] }> {
  const map = new Map<Id, { level: FindingLevel; findings: Finding[] }>();
  for (const f of findings) {
    for (const id of f.elements) {
      const entry = map.get(id);
      if (entry) {
        entry.level = worseLevel(entry.level, f.level);
        entry.findings.push(f);
      } else {
        map.set(id, { level: f.level, findings: [f] });
      }
    }
  }
  return map;
}

/** Findings sorted stop → caution → note, keeping their order within a level. */
export function sortFindings(findings: readonly Finding[]): Finding[] {
  return findings
    .map((f, i) => ({ f, i }))
    .sort((a, b) => RANK[b.f.level] - RANK[a.f.level] || a.i - b.i)
    .map(({ f }) => f);
}

/** Count of findings at each level. */
export function findingCounts(findings: readonly Finding[]): Record<FindingLevel, number> {
  const counts = { stop: 0, caution: 0, note: 0 };
  for (const f of findings) counts[f.level]++;
  return counts;
}

export type ReadoutLine = [label: string, value: string];

/** Name of any element (node or pipe) for display. */
export function elementLabel(doc: HeadrouteDocument, id: Id): string {
  if (Object.hasOwn(doc.nodes, id)) return nodeLabel(doc.nodes[id]);
  if (Object.hasOwn(doc.pipes, id)) {
    const name = doc.pipes[id].name.trim();
    return name !== '' ? name : `Pipe ${id}`;
  }
  return id;
}

/** The lines of a hover readout for one element. */
export function readoutLines(
  doc: HeadrouteDocument,
  result: SolveResult | null,
  id: Id,
  system: UnitSystem,
): ReadoutLine[] {
  const f = (value: number, q: Parameters<typeof formatQuantity>[1]) =>
    Number.isFinite(value) ? formatQuantity(value, q, system, { digits: 3 }) : '—';
  const lines: ReadoutLine[] = [];
  if (Object.hasOwn(doc.pipes, id)) {
    const pipe = doc.pipes[id];
    lines.push(['Length', f(pipe.length, 'length')]);
    const r = result?.pipes[id];
    if (r) {
      lines.push(['Flow', f(shownFlow(r.flow), 'volumeFlow')]);
      lines.push(['Velocity', f(shownFlow(r.flow) === 0 ? 0 : Math.abs(r.velocity), 'velocity')]);
      lines.push(['Inner diameter', f(r.innerDiameter, 'diameter')]);
      lines.push(['Regime', r.regime]);
      lines.push(['Friction loss', f(r.frictionLoss, 'head')]);
    }
    return lines;
  }
  if (!Object.hasOwn(doc.nodes, id)) return lines;
  const node = doc.nodes[id];
  lines.push(['Elevation', f(node.z, 'elevation')]);
  if (node.kind === 'vessel') {
    lines.push(['Liquid surface elevation', f(node.liquidLevel, 'elevation')]);
    lines.push(['Depth above bottom', f(node.liquidLevel - node.z, 'length')]);
  }
  const nr = result?.nodes[id];
  if (nr) {
    for (const [port, pr] of Object.entries(nr.ports)) {
      lines.push([`p at ${port}`, f(pr.pressureGauge, 'pressureGauge')]);
    }
    if (nr.flow !== undefined) lines.push(['Flow', f(shownFlow(nr.flow), 'volumeFlow')]);
    if (nr.headLoss !== undefined && node.kind !== 'pump')
      lines.push(['Head loss', f(nr.headLoss, 'head')]);
  }
  const pr = result?.pumps[id];
  if (pr) {
    if (nr?.flow === undefined) lines.push(['Flow', f(shownFlow(pr.flow), 'volumeFlow')]);
    lines.push(['Head', f(pr.head, 'head')]);
    lines.push(['NPSHa', f(pr.npshAvailable, 'head')]);
    lines.push(['NPSHr', f(pr.npshRequired, 'head')]);
  }
  const cv = result?.controlValves[id];
  if (cv) {
    lines.push(['Δp', f(cv.pressureDrop, 'pressureDrop')]);
    if (cv.choked) lines.push(['Choked', cv.flowLimited ? 'flow held at the limit' : 'yes']);
  }
  return lines;
}

/** The liquid's depth above a vessel's bottom, for the details beside its surface elevation. */
export function liquidDepthText(vessel: Vessel, system: UnitSystem): string {
  const depth = vessel.liquidLevel - vessel.z;
  if (!Number.isFinite(depth)) return '';
  const text = formatQuantity(Math.abs(depth), 'length', system, { digits: 3 });
  return depth < 0 ? `${text} below the vessel bottom` : `Depth ${text} above the vessel bottom`;
}

/**
 * What the status line says of the solve: nothing to solve on an empty sheet, "solved" only
 * when the solve converged and every part is joined to a head, else what is missing.
 */
export function solveStateText(
  doc: HeadrouteDocument,
  result: SolveResult | null,
): { text: string; error: boolean } {
  if (Object.keys(doc.nodes).length === 0)
    return { text: 'empty sheet: add a vessel or a boundary', error: false };
  if (!result) return { text: 'solving…', error: false };
  const codes = new Set(result.findings.map((f) => f.code));
  if (codes.has('no-fixed-head')) return { text: 'not solved: nothing holds a head', error: true };
  if (!result.converged) return { text: 'not converged', error: true };
  if (codes.has('cut-off')) return { text: 'solved in part: some parts not joined', error: true };
  return { text: 'solved', error: false };
}

/** Short pressure text shown beside a node on the sheet (gauge, at its first port). */
export function nodePressureText(
  result: NodeResult | null | undefined,
  port: string | undefined,
  system: UnitSystem,
): string | null {
  if (!result || !port) return null;
  const pr = result.ports[port];
  if (!pr || !Number.isFinite(pr.pressureGauge)) return null;
  return formatQuantity(pr.pressureGauge, 'pressureGauge', system, { digits: 3 });
}
