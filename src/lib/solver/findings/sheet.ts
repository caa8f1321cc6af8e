/**
 * Sheet-wide findings from a solved network: pressures against vapour pressure, vacuum and
 * design pressure at every pipe end and node port; velocities against the project's guidance;
 * pumps against NPSH and best efficiency; choked control valves; flow regimes and directions;
 * liquid leaving a vessel by a nozzle above its level (nozzleLevel.ts).
 * Along a pipe the HGL and the centreline are both straight between the ends, so the lowest
 * and highest pressures of a pipe are at its ends.
 */
import type { HeadrouteDocument, Id, ProjectSettings } from '../../model/types';
import type { SolveFluid } from '../fluid';
import type { HydraulicGraph } from '../network/build';
import { portName } from '../network/portSlots';
import type { ElementResults, IndexedResults } from '../results';
import type { Finding } from '../types';
import { findingsIn } from './catalogue';
import { geometryFindings } from './geometry';
import { nozzleLevelFindings } from './nozzleLevel';
import { DISCHARGE, pipeService, SUCTION } from './service';

/** Best-efficiency band (fraction of BEP flow) outside which a pump gets a caution: 70–120 %, common practice. */
export const BEP_BAND = { min: 0.7, max: 1.2 } as const;

/** All findings that follow from the results. */
export function sheetFindings(
  doc: HeadrouteDocument,
  settings: ProjectSettings,
  graph: HydraulicGraph,
  results: ElementResults,
  indexed: IndexedResults,
  fluid: SolveFluid,
): Finding[] {
  const findings = findingsIn(settings.unitSystem);
  const out: Finding[] = [];
  const pv = fluid.vapourPressure;
  const pAtm = fluid.atmosphericPressure;
  const rhoG = fluid.density * 9.80665;

  if (fluid.extrapolated.length > 0) {
    out.push(
      findings.propertyExtrapolated(fluid.liquidName, fluid.extrapolated, fluid.temperature),
    );
  }

  out.push(...geometryFindings(graph, findings));
  out.push(...nozzleLevelFindings(graph, indexed, findings));

  // Nodes: lowest port pressure against vapour pressure; a closed vessel's gas space too.
  const { portStart, portPipeStart } = graph;
  for (let i = 0; i < graph.sheetNodes.length; i++) {
    const node = graph.sheetNodes[i];
    const result = indexed.nodes[i];
    if (!result) continue;
    let lowest: { p: number; port: string } | null = null;
    if (node.kind === 'vessel') {
      for (const [port, r] of Object.entries(result.ports))
        if (lowest === null || r.pressureAbs < lowest.p) lowest = { p: r.pressureAbs, port };
    } else {
      for (let slot = portStart[i]; slot < portStart[i + 1]; slot++) {
        if (portPipeStart[slot + 1] === portPipeStart[slot]) continue;
        const port = portName(node, slot - portStart[i]);
        const r = result.ports[port];
        if (!r) continue;
        if (lowest === null || r.pressureAbs < lowest.p) lowest = { p: r.pressureAbs, port };
      }
    }
    if (node.kind === 'vessel') {
      const surface = node.open ? pAtm : node.gasPressureAbs;
      if (surface < pv)
        out.push(findings.belowVapourPressure(node.name, 'gas space', surface, pv, node.id));
      else if (lowest && lowest.p < pv) {
        out.push(
          findings.belowVapourPressure(node.name, `nozzle ${lowest.port}`, lowest.p, pv, node.id),
        );
      }
    } else if (lowest && lowest.p < pv) {
      const where =
        node.kind === 'pump'
          ? `${lowest.port}`
          : node.kind === 'junction' || node.kind === 'waypoint'
            ? ''
            : `${lowest.port} port`;
      out.push(findings.belowVapourPressure(node.name, where, lowest.p, pv, node.id));
    }
  }

  const service = pipeService(graph, indexed);
  const guidance = settings.velocityGuidance;
  for (let p = 0; p < graph.pipeList.length; p++) {
    const gp = graph.pipeList[p];
    const id = gp.pipe.id;
    const r = indexed.pipes[p];
    if (!r) continue;
    const name = gp.pipe.name;
    const pStart = pAtm + rhoG * ((r.headFrom ?? 0) - gp.elevationFrom);
    const pEnd = pAtm + rhoG * ((r.headTo ?? 0) - gp.elevationTo);
    const low = pStart <= pEnd ? pStart : pEnd;
    const high = pStart >= pEnd ? pStart : pEnd;
    if (low < pv) {
      const where = pStart <= pEnd ? 'at its start' : 'at its end';
      out.push(findings.belowVapourPressure(name, where, low, pv, id));
    } else if (low < pAtm - 1e-6 * pAtm) out.push(findings.vacuum(name, low - pAtm, id));
    const design = gp.pipe.designPressureGauge;
    if (design !== null && high - pAtm > design)
      out.push(findings.aboveDesignPressure(name, high - pAtm, design, id));

    if (r.regime === 'no-flow') continue;
    const speed = Math.abs(r.velocity);
    const kind = service[p];
    if (kind === SUCTION && speed > guidance.suctionMax)
      out.push(findings.velocityHigh(name, speed, guidance.suctionMax, true, id));
    if (kind !== SUCTION && speed > guidance.dischargeMax)
      out.push(findings.velocityHigh(name, speed, guidance.dischargeMax, false, id));
    if (kind === DISCHARGE && speed < guidance.dischargeMin)
      out.push(findings.velocityLow(name, speed, guidance.dischargeMin, id));
    if (r.regime === 'laminar') out.push(findings.laminarFlow(name, r.reynolds, id));
    if (r.regime === 'transitional') out.push(findings.transitionalFlow(name, r.reynolds, id));
    if (r.flow < 0) out.push(findings.reversedFlow(name, id));
  }

  out.push(...pumpFindings(doc, graph, results, settings));
  for (const [id, cv] of Object.entries(results.controlValves)) {
    if (cv.choked)
      out.push(
        findings.controlValveChoked(
          doc.nodes[id].name,
          cv.pressureDrop,
          cv.chokedPressureDrop,
          cv.flowLimited === true ? Math.abs(cv.flow) : null,
          id,
        ),
      );
  }
  for (let i = 0; i < graph.sheetNodes.length; i++) {
    const k = graph.nodeLink[i];
    if (k < 0) continue;
    const info = graph.links[k].info;
    if (info?.kind !== 'fitting' || !info.nonReturn || info.closed) continue;
    const node = graph.sheetNodes[i];
    const flow = indexed.nodes[i]?.flow ?? 0;
    if (isHeld(flow, indexed.nodes[i]?.headLoss ?? 0))
      out.push(findings.nonReturnClosed(node.name, node.id));
  }
  return out;
}

/** A non-return element is holding when its flow is reverse or nil and the head pushes backwards. */
function isHeld(flow: number, headLoss: number): boolean {
  return flow <= 1e-9 && headLoss < 0;
}

function pumpFindings(
  doc: HeadrouteDocument,
  graph: HydraulicGraph,
  results: ElementResults,
  settings: ProjectSettings,
): Finding[] {
  const findings = findingsIn(settings.unitSystem);
  const out: Finding[] = [];
  const rule = settings.npshMargin;
  const pumpLinks = new Map<Id, number>();
  graph.sheetNodes.forEach((node, i) => {
    if (node.kind === 'pump' && graph.nodeLink[i] >= 0) pumpLinks.set(node.id, graph.nodeLink[i]);
  });
  for (const [id, pump] of Object.entries(results.pumps)) {
    const node = doc.nodes[id];
    const k = pumpLinks.get(id);
    const info = k === undefined ? null : graph.links[k].info;
    if (info?.kind !== 'pump' || !info.running) continue;
    if (!info.duty && isHeld(pump.flow, -pump.head) && pump.flow <= 1e-9) {
      out.push(findings.pumpAtShutoff(node.name, id));
      continue;
    }
    if (info.npshrFit.form === 'empty') out.push(findings.npshrCurveMissing(node.name, id));
    else if (pump.npshAvailable < pump.npshRequired) {
      out.push(findings.npshBelowRequired(node.name, pump.npshAvailable, pump.npshRequired, id));
    } else if (
      pump.npshRequired > 0 &&
      (pump.npshRatio < rule.ratio || pump.npshMargin < rule.metres)
    ) {
      out.push(
        findings.npshMarginLow(
          node.name,
          pump.npshAvailable,
          pump.npshRequired,
          rule.ratio,
          rule.metres,
          id,
        ),
      );
    }
    // No best-efficiency flow (no curve, or a flat one): no fraction and no finding.
    if (
      pump.bepFraction !== undefined &&
      pump.bepFraction > 0 &&
      (pump.bepFraction < BEP_BAND.min || pump.bepFraction > BEP_BAND.max)
    ) {
      out.push(findings.pumpOffBep(node.name, pump.bepFraction, id));
    }
  }
  return out;
}
