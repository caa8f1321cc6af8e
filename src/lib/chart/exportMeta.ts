/**
 * What every profile export carries: project, route, case, liquid and temperature, date, and
 * the caution line that results are a screening.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import type { SolveResult } from '../solver/types';
import { formatQuantity, type UnitSystem } from '../units';

/** The caution printed on every export. */
export const SCREENING_CAUTION =
  'Screening result — verify in detailed design against the applicable codes, by a competent, licensed engineer.';

/** Title-block facts of one export. */
export interface ExportMeta {
  projectName: string;
  routeName: string;
  caseName: string;
  liquidName: string;
  /** Liquid temperature, K. */
  temperature: number;
  /** Date of the export, YYYY-MM-DD. */
  date: string;
  system: UnitSystem;
}

/** Options for exportMeta: a route name (else "first → last" node) and the date (else today). */
export interface ExportMetaOptions {
  routeName?: string;
  date?: Date;
}

/** Name of a route from its end nodes, e.g. "Feed tank → Day tank". */
export function routeLabel(doc: HeadrouteDocument, route: readonly Id[]): string {
  if (route.length === 0) return 'no route';
  const name = (id: Id) => doc.nodes[id]?.name || doc.pipes[id]?.name || id;
  const first = route.find((id) => doc.nodes[id]) ?? route[0];
  const last = [...route].reverse().find((id) => doc.nodes[id]) ?? route[route.length - 1];
  return `${name(first)} → ${name(last)}`;
}

/** Gathers the title-block facts from the document and the result it was solved into. */
export function exportMeta(
  doc: HeadrouteDocument,
  result: SolveResult | null,
  route: readonly Id[],
  options: ExportMetaOptions = {},
): ExportMeta {
  const caseName =
    result?.caseId != null ? (doc.cases[result.caseId]?.name ?? result.caseId) : 'Base case';
  const liquid = doc.settings.liquid;
  const liquidName = result?.fluid.liquidName ?? (liquid.kind === 'user' ? liquid.name : liquid.id);
  return {
    projectName: doc.name,
    routeName: options.routeName ?? routeLabel(doc, route),
    caseName,
    liquidName,
    temperature: result?.fluid.temperature ?? doc.settings.temperature,
    date: isoDate(options.date ?? new Date()),
    system: doc.settings.unitSystem,
  };
}

/** The title-block lines, in reading order, without the caution. */
export function metaLines(meta: ExportMeta): string[] {
  const temperature = formatQuantity(meta.temperature, 'temperature', meta.system, {
    withUnit: true,
  });
  return [
    `Project: ${meta.projectName}`,
    `Route: ${meta.routeName}`,
    `Case: ${meta.caseName}`,
    `Liquid: ${meta.liquidName} at ${temperature}`,
    `Date: ${meta.date}`,
  ];
}

function isoDate(d: Date): string {
  return d.toISOString().slice(0, 10);
}
