/**
 * Results that come out as NaN or ±Infinity. Nothing is replaced by a number: the element's
 * result is left out (no figure is better than an invented one) and a stop finding names the
 * element and the input that most likely drove it out of range (a flow, pressure, length or
 * bore far beyond what a liquid line can have), so the user can correct it.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import type { HydraulicGraph } from '../network/build';
import type { ElementResults, IndexedResults } from '../results';
import type { Finding } from '../types';
import type { findingsIn } from './catalogue';

/** True when every number in the record (one level of nesting: ports) is finite. */
function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (value !== null && typeof value === 'object')
    return Object.values(value).every((v) => allFinite(v));
  return true;
}

/**
 * Inputs beyond these magnitudes are named as the likely cause (no liquid transfer line comes
 * near them; common practice bounds chosen wide, not from a source): flow 1e3 m³/s, pressure
 * 1e9 Pa, length 1e7 m, elevation 1e5 m, bore outside 1e-5 … 100 m.
 */
const LIMITS = { flow: 1e3, pressure: 1e9, length: 1e7, elevation: 1e5 } as const;

/** A description of the most extreme input on the sheet, or null when none is out of range. */
export function extremeInput(doc: HeadrouteDocument): { id: Id; what: string } | null {
  let best: { id: Id; what: string; ratio: number } | null = null;
  const consider = (id: Id, what: string, value: number, limit: number) => {
    const ratio = Number.isFinite(value) ? Math.abs(value) / limit : Infinity;
    if (ratio > 1 && (best === null || ratio > best.ratio)) best = { id, what, ratio };
  };
  for (const node of Object.values(doc.nodes)) {
    const name = `“${node.name}”`;
    consider(node.id, `the elevation of ${name}, ${node.z} m`, node.z, LIMITS.elevation);
    if (node.kind === 'boundary') {
      if (node.holds === 'flow')
        consider(
          node.id,
          `the flow of ${name}, ${node.outflow} m³/s`,
          node.outflow ?? 0,
          LIMITS.flow,
        );
      else
        consider(
          node.id,
          `the pressure of ${name}, ${node.pressureAbs} Pa`,
          node.pressureAbs,
          LIMITS.pressure,
        );
    }
    if (node.kind === 'pump' && node.mode === 'duty')
      consider(
        node.id,
        `the duty flow of ${name}, ${node.dutyFlow} m³/s`,
        node.dutyFlow,
        LIMITS.flow,
      );
    if (node.kind === 'vessel') {
      consider(
        node.id,
        `the liquid surface of ${name}, ${node.liquidLevel} m`,
        node.liquidLevel,
        LIMITS.elevation,
      );
      if (!node.open)
        consider(
          node.id,
          `the gas pressure of ${name}, ${node.gasPressureAbs} Pa`,
          node.gasPressureAbs,
          LIMITS.pressure,
        );
    }
  }
  for (const pipe of Object.values(doc.pipes)) {
    const name = `“${pipe.name}”`;
    consider(pipe.id, `the length of ${name}, ${pipe.length} m`, pipe.length, LIMITS.length);
    if (pipe.bore.mode === 'typed') {
      const d = pipe.bore.innerDiameter;
      if (d > 0) consider(pipe.id, `the bore of ${name}, ${d} m`, Math.max(d / 100, 1e-5 / d), 1);
    }
  }
  const found = best as { id: Id; what: string } | null;
  return found ? { id: found.id, what: found.what } : null;
}

/**
 * Removes every element result with a non-finite number from `records` and `indexed`, and
 * returns one stop finding per such element (none when all are finite).
 */
export function nonFiniteFindings(
  doc: HeadrouteDocument,
  graph: HydraulicGraph,
  records: ElementResults,
  indexed: IndexedResults,
  findings: ReturnType<typeof findingsIn>,
): Finding[] {
  const bad: Id[] = [];
  const drop = (record: Record<Id, unknown>, id: Id) => {
    if (Object.hasOwn(record, id) && !allFinite(record[id])) {
      delete record[id];
      if (!bad.includes(id)) bad.push(id);
    }
  };
  for (const id of Object.keys(records.pipes)) drop(records.pipes, id);
  for (const id of Object.keys(records.nodes)) drop(records.nodes, id);
  for (const id of Object.keys(records.pumps)) drop(records.pumps, id);
  for (const id of Object.keys(records.controlValves)) drop(records.controlValves, id);
  if (bad.length === 0) return [];
  // Element results by position follow the records.
  graph.pipeList.forEach((gp, p) => {
    if (bad.includes(gp.id)) indexed.pipes[p] = undefined;
  });
  graph.nodeIds.forEach((id, i) => {
    if (bad.includes(id)) indexed.nodes[i] = undefined;
  });
  const cause = extremeInput(doc);
  const why = cause
    ? `most likely from ${cause.what}`
    : 'the inputs around it drive the numbers out of range';
  return bad.map((id) => {
    const name = Object.hasOwn(doc.nodes, id) ? doc.nodes[id].name : (doc.pipes[id]?.name ?? id);
    return findings.nonFiniteResult(name, why, cause && cause.id !== id ? [id, cause.id] : [id]);
  });
}
