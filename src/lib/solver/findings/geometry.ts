/**
 * Impossible geometry, whatever the flows: a vessel's liquid surface below its bottom or above
 * its top, a nozzle outside the shell, a pipe shorter than the straight-line rise between its
 * ends (a pipe cannot climb more than its own length). Each is a stop naming the element and
 * saying by how much.
 */
import type { SheetNode } from '../../model/types';
import type { HydraulicGraph } from '../network/build';
import type { Finding } from '../types';
import type { findingsIn } from './catalogue';

/** Slack allowed for rounding of typed values, m. */
export const GEOMETRY_TOLERANCE = 1e-9;

/** Findings on one vessel's level and nozzles (none for other kinds). */
export function vesselGeometryFindings(
  node: SheetNode,
  findings: ReturnType<typeof findingsIn>,
): Finding[] {
  if (node.kind !== 'vessel') return [];
  const out: Finding[] = [];
  const bottom = node.z;
  const top = node.z + node.height;
  if (node.liquidLevel < bottom - GEOMETRY_TOLERANCE || node.liquidLevel > top + GEOMETRY_TOLERANCE)
    out.push(
      findings.levelOutsideVessel(
        node.name,
        node.liquidLevel,
        bottom,
        top,
        node.liquidLevel < bottom,
        node.id,
      ),
    );
  for (const nozzle of node.nozzles)
    if (nozzle.z < bottom - GEOMETRY_TOLERANCE || nozzle.z > top + GEOMETRY_TOLERANCE)
      out.push(findings.nozzleOutsideVessel(node.name, nozzle.id, nozzle.z, bottom, top, node.id));
  return out;
}

/** Geometry findings for every vessel and pipe in the graph. */
export function geometryFindings(
  graph: HydraulicGraph,
  findings: ReturnType<typeof findingsIn>,
): Finding[] {
  const out: Finding[] = [];
  for (const node of graph.sheetNodes) out.push(...vesselGeometryFindings(node, findings));
  for (const gp of graph.pipeList) {
    const rise = Math.abs(gp.elevationTo - gp.elevationFrom);
    if (gp.pipe.length < rise - GEOMETRY_TOLERANCE)
      out.push(findings.pipeShorterThanRise(gp.pipe.name, gp.pipe.length, rise, gp.id));
  }
  return out;
}
