/**
 * Operating cases: a case's overrides laid over the base document, on a copy.
 */
import type { HeadrouteDocument, Id, SheetNode } from '../model/types';

/**
 * The document as it stands in case `caseId`: the case's overrides (liquid, temperature,
 * atmospheric pressure, vessel levels and gas pressures, pump running/speed/mode/duty flow,
 * control-valve openings, boundary pressures or flows, manual valves open or shut, branch-point
 * draw-offs) applied to a shallow copy. The base document is never changed.
 * A null, missing or unknown case id gives the base document itself. Overrides naming a node
 * that does not exist, or a node of another kind, are skipped.
 */
export function applyCase(
  doc: HeadrouteDocument,
  caseId: Id | null | undefined,
): HeadrouteDocument {
  if (caseId === null || caseId === undefined || !Object.hasOwn(doc.cases, caseId)) return doc;
  const overrides = doc.cases[caseId].overrides;
  const settings = { ...doc.settings };
  if (overrides.liquid !== undefined) settings.liquid = overrides.liquid;
  if (overrides.temperature !== undefined) settings.temperature = overrides.temperature;
  if (overrides.atmosphericPressure !== undefined) {
    settings.atmosphericPressureOverride = overrides.atmosphericPressure;
  }

  const nodes: Record<Id, SheetNode> = { ...doc.nodes };
  const node = (id: Id): SheetNode | undefined =>
    Object.hasOwn(nodes, id) ? nodes[id] : undefined;
  for (const [id, patch] of Object.entries(overrides.vessels ?? {})) {
    const target = node(id);
    if (target?.kind !== 'vessel') continue;
    nodes[id] = {
      ...target,
      liquidLevel: patch.liquidLevel ?? target.liquidLevel,
      gasPressureAbs: patch.gasPressureAbs ?? target.gasPressureAbs,
    };
  }
  for (const [id, patch] of Object.entries(overrides.pumps ?? {})) {
    const target = node(id);
    if (target?.kind !== 'pump') continue;
    nodes[id] = {
      ...target,
      running: patch.running ?? target.running,
      speed: patch.speed ?? target.speed,
      mode: patch.mode ?? target.mode,
      dutyFlow: patch.dutyFlow ?? target.dutyFlow,
    };
  }
  for (const [id, patch] of Object.entries(overrides.controlValves ?? {})) {
    const target = node(id);
    if (target?.kind !== 'control-valve') continue;
    nodes[id] = { ...target, opening: patch.opening ?? target.opening };
  }
  for (const [id, patch] of Object.entries(overrides.boundaries ?? {})) {
    const target = node(id);
    if (target?.kind !== 'boundary') continue;
    nodes[id] = {
      ...target,
      pressureAbs: patch.pressureAbs ?? target.pressureAbs,
      outflow: patch.outflow ?? target.outflow,
    };
  }
  for (const [id, patch] of Object.entries(overrides.valves ?? {})) {
    const target = node(id);
    if (target?.kind !== 'fitting') continue;
    nodes[id] = { ...target, closed: patch.closed ?? target.closed };
  }
  for (const [id, patch] of Object.entries(overrides.junctions ?? {})) {
    const target = node(id);
    if (target?.kind !== 'junction') continue;
    nodes[id] = { ...target, outflow: patch.outflow ?? target.outflow };
  }
  return { ...doc, settings, nodes };
}
