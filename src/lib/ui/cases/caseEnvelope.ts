/**
 * What the profile draws across cases for one route: every case's profile along it, the HGL
 * envelope (band and marked spans naming the worst case), and at each pump on the route the
 * case with the least NPSH margin. Pure; solves each case once.
 */
import { hglEnvelope, type Envelope, type EnvelopeCase } from '../../chart/envelope';
import type { TopNote } from '../../chart/topNotes';
import type { HeadrouteDocument, Id } from '../../model/types';
import { profile } from '../../solver/profile';
import { solve } from '../../solver/solve';
import type { SolveResult } from '../../solver/types';

/** The case with the least NPSH margin at one pump of the route. */
export interface PumpWorstCase {
  pumpId: Id;
  /** Chainage of the pump's suction on the route, m. */
  chainage: number;
  caseName: string;
  /** NPSHa − NPSHr in that case, m. */
  npshMargin: number;
}

/** The envelope of a route across the base case and every stored case. */
export interface CaseEnvelope extends Envelope {
  caseNames: string[];
  pumps: PumpWorstCase[];
}

/**
 * Solves the base case and each stored case and builds the envelope along `route`. Cases whose
 * results cannot follow the route are left out. Null when fewer than two cases have a profile.
 * `known` may hold results already computed (by case id, '' for the base) to save solving.
 */
export function caseEnvelope(
  doc: HeadrouteDocument,
  route: readonly Id[],
  known: ReadonlyMap<string, SolveResult> = new Map(),
): CaseEnvelope | null {
  const ids: Array<Id | null> = [null, ...Object.keys(doc.cases)];
  const cases: Array<EnvelopeCase & { result: SolveResult }> = [];
  for (const id of ids) {
    const result = known.get(id ?? '') ?? solve(doc, id);
    try {
      const name = id === null ? 'Base case' : doc.cases[id].name;
      cases.push({ name, profile: profile(doc, result, [...route]), result });
    } catch {
      // this case's flow cannot follow the route: no line for it
    }
  }
  if (cases.length < 2) return null;
  const envelope = hglEnvelope(cases);
  const pumps: PumpWorstCase[] = [];
  for (const id of route) {
    if (doc.nodes[id]?.kind !== 'pump') continue;
    const suction = cases[0].profile.stations.find((s) => s.elementId === id && s.at === 'node-in');
    let worst: PumpWorstCase | null = null;
    for (const c of cases) {
      const p = c.result.pumps[id];
      const running = c.result.nodes[id] !== undefined && p !== undefined && p.flow > 0;
      if (!running) continue;
      if (!worst || p.npshMargin < worst.npshMargin) {
        worst = {
          pumpId: id,
          chainage: suction?.chainage ?? 0,
          caseName: c.name,
          npshMargin: p.npshMargin,
        };
      }
    }
    if (worst && suction) pumps.push(worst);
  }
  return { ...envelope, caseNames: cases.map((c) => c.name), pumps };
}

/**
 * The envelope's words for the profile's note lanes above the plot: the worst case over each
 * merged marked span and, at each pump's suction, the case with the least NPSH margin.
 */
export function envelopeNotes(envelope: CaseEnvelope): TopNote[] {
  return [
    ...envelope.spans.map((s) => ({
      key: `span:${s.kind}:${s.start}`,
      text: `worst: ${s.worstCaseName}`,
      start: s.start,
      end: s.end,
    })),
    ...envelope.pumps.map((p) => ({
      key: `pump:${p.pumpId}`,
      text: `least NPSH margin: ${p.caseName}`,
      start: p.chainage,
    })),
  ];
}
