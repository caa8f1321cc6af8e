/**
 * Reading and changing one field of a case's overrides without touching the others. Pure:
 * every change returns new override records; emptied groups are dropped, so "as the base case"
 * is simply the absence of a value.
 */
import { CASE_NODE_GROUPS } from '../../model/caseTargets';
import type { CaseOverrides, Id, LiquidChoice } from '../../model/types';

/** One overridable field of a case. */
export type OverrideField =
  | { kind: 'liquid' }
  | { kind: 'temperature' }
  | { kind: 'atmosphericPressure' }
  | { kind: 'vessel'; id: Id; field: 'liquidLevel' | 'gasPressureAbs' }
  | { kind: 'pump'; id: Id; field: 'running' | 'speed' | 'mode' | 'dutyFlow' }
  | { kind: 'controlValve'; id: Id; field: 'opening' }
  | { kind: 'boundary'; id: Id; field: 'pressureAbs' | 'outflow' }
  | { kind: 'valve'; id: Id; field: 'closed' }
  | { kind: 'junction'; id: Id; field: 'outflow' };

/** A value an override can hold. */
export type OverrideValue = number | boolean | string | LiquidChoice;

const GROUP = {
  vessel: 'vessels',
  pump: 'pumps',
  controlValve: 'controlValves',
  boundary: 'boundaries',
  valve: 'valves',
  junction: 'junctions',
} as const;

/** The field's override, or undefined when the case leaves it as the base. */
export function overrideValue(o: CaseOverrides, f: OverrideField): OverrideValue | undefined {
  if (f.kind === 'liquid') return o.liquid;
  if (f.kind === 'temperature') return o.temperature;
  if (f.kind === 'atmosphericPressure') return o.atmosphericPressure;
  const group = o[GROUP[f.kind]] as Record<Id, Record<string, OverrideValue>> | undefined;
  return group?.[f.id]?.[f.field];
}

/** New overrides with the field set to `value`, or cleared (as the base) when undefined. */
export function withOverride(
  o: CaseOverrides,
  f: OverrideField,
  value: OverrideValue | undefined,
): CaseOverrides {
  const next: CaseOverrides = structuredClone(o);
  if (f.kind === 'liquid' || f.kind === 'temperature' || f.kind === 'atmosphericPressure') {
    if (value === undefined) delete next[f.kind];
    else (next as Record<string, unknown>)[f.kind] = value;
    return next;
  }
  const key = GROUP[f.kind];
  const group = { ...((next[key] as Record<Id, Record<string, unknown>>) ?? {}) };
  const entry = { ...(group[f.id] ?? {}) };
  if (value === undefined) delete entry[f.field];
  else entry[f.field] = value;
  if (Object.keys(entry).length > 0) group[f.id] = entry;
  else delete group[f.id];
  if (Object.keys(group).length > 0) (next as Record<string, unknown>)[key] = group;
  else delete next[key];
  return next;
}

/** How many fields the case overrides. */
export function overrideCount(o: CaseOverrides): number {
  let n = 0;
  if (o.liquid !== undefined) n++;
  if (o.temperature !== undefined) n++;
  if (o.atmosphericPressure !== undefined) n++;
  for (const [key] of CASE_NODE_GROUPS) {
    for (const entry of Object.values(o[key] ?? {})) n += Object.keys(entry).length;
  }
  return n;
}
