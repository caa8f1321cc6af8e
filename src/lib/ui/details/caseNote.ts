/**
 * What the case shown changes on the element in Details (or on the project settings), in
 * words with the case's and the base's values, so Details can show the case's values and say
 * which ones differ from the base. Pure.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import { findLibraryLiquid } from '../../physics/liquids/library';
import { formatQuantity, type Quantity, type UnitSystem } from '../../units';

/** One changed field: its name in words, the case's value and the base's. */
export interface CaseChange {
  field: string;
  caseValue: string;
  baseValue: string;
}

const FIELDS: Record<string, { words: string; quantity?: Quantity }> = {
  liquidLevel: { words: 'Liquid level', quantity: 'elevation' },
  gasPressureAbs: { words: 'Gas pressure', quantity: 'pressureAbs' },
  running: { words: 'Running' },
  speed: { words: 'Speed, rpm' },
  mode: { words: 'Mode' },
  dutyFlow: { words: 'Duty flow', quantity: 'volumeFlow' },
  opening: { words: 'Opening', quantity: 'fraction' },
  pressureAbs: { words: 'Pressure', quantity: 'pressureAbs' },
  outflow: { words: 'Flow', quantity: 'volumeFlow' },
};

const GROUPS = ['vessels', 'pumps', 'controlValves', 'boundaries'] as const;

function text(value: unknown, quantity: Quantity | undefined, system: UnitSystem): string {
  if (typeof value === 'number' && quantity)
    return formatQuantity(value, quantity, system, { digits: 4 });
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (value === null || value === undefined) return '—';
  if (typeof value === 'object' && 'kind' in value) {
    const liquid = value as unknown as { kind: string; id?: string; name?: string };
    return liquid.kind === 'library'
      ? (findLibraryLiquid(String(liquid.id))?.name ?? String(liquid.id))
      : String(liquid.name ?? 'own liquid');
  }
  return String(value);
}

/**
 * The fields case `caseId` changes on element `id` (null: the project settings), with the
 * case's and the base's values. Empty when no case is shown or it changes nothing here.
 */
export function caseChanges(
  doc: HeadrouteDocument,
  caseId: Id | null,
  id: Id | null,
  system: UnitSystem,
): CaseChange[] {
  if (caseId === null || !Object.hasOwn(doc.cases, caseId)) return [];
  const o = doc.cases[caseId].overrides;
  const out: CaseChange[] = [];
  if (id === null) {
    const s = doc.settings;
    if (o.liquid !== undefined)
      out.push({
        field: 'Liquid',
        caseValue: text(o.liquid, undefined, system),
        baseValue: text(s.liquid, undefined, system),
      });
    if (o.temperature !== undefined)
      out.push({
        field: 'Temperature',
        caseValue: text(o.temperature, 'temperature', system),
        baseValue: text(s.temperature, 'temperature', system),
      });
    if (o.atmosphericPressure !== undefined)
      out.push({
        field: 'Atmosphere',
        caseValue: text(o.atmosphericPressure, 'pressureAbs', system),
        baseValue:
          s.atmosphericPressureOverride === null
            ? 'from site elevation'
            : text(s.atmosphericPressureOverride, 'pressureAbs', system),
      });
    return out;
  }
  if (!Object.hasOwn(doc.nodes, id)) return out;
  const base = doc.nodes[id] as unknown as Record<string, unknown>;
  for (const group of GROUPS) {
    const entry = (o[group] as Record<Id, Record<string, unknown>> | undefined)?.[id];
    if (!entry) continue;
    for (const [key, value] of Object.entries(entry)) {
      const field = FIELDS[key] ?? { words: key };
      out.push({
        field: field.words,
        caseValue: text(value, field.quantity, system),
        baseValue: text(base[key], field.quantity, system),
      });
    }
  }
  return out;
}
