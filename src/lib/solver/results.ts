/**
 * Per-element results from the solved hydraulic graph: pipes, node ports, pumps and control
 * valves. Graph heads are total heads (EGL); the HGL at a port is EGL − v²/2g with the velocity
 * of the pipe on that port.
 */
import type { Id, SheetNode } from '../model/types';
import { chokedPressureDrop } from '../physics/controlValve';
import { LAMINAR_LIMIT_REYNOLDS } from '../physics/friction';
import { bestEfficiencyFlow, pumpEfficiency, pumpNpshRequired, shaftPower } from '../physics/pump';
import type { SolveFluid } from './fluid';
import type { HydraulicGraph } from './network/build';
import type { GgaOutcome } from './network/gga';
import { GRAVITY } from './network/laws';
import { portElevationAt, portIndex, portName } from './network/portSlots';
import type { ControlValveResult, NodeResult, PipeResult, PortResult, PumpResult } from './types';

/** Velocity below which a pipe is reported as carrying no flow, m/s. */
export const NO_FLOW_VELOCITY = 1e-4;

/**
 * Least pump efficiency used in the results, 0.01: a fitted curve extrapolated far beyond its
 * points can give zero or negative efficiency, which would make the shaft power infinite or
 * negative. A floor of 1 % keeps it finite; no real centrifugal pump in service runs that low.
 */
export const EFFICIENCY_FLOOR = 0.01;

/** Results keyed by element id. */
export interface ElementResults {
  pipes: Record<Id, PipeResult>;
  nodes: Record<Id, NodeResult>;
  pumps: Record<Id, PumpResult>;
  controlValves: Record<Id, ControlValveResult>;
}

/** The same results by position, for the findings: pipes as graph.pipeList, nodes as graph.sheetNodes. */
export interface IndexedResults {
  /** Undefined for a pipe whose heads the solve did not determine. */
  pipes: Array<PipeResult | undefined>;
  /** Undefined for a sheet node left out of the solve. */
  nodes: Array<NodeResult | undefined>;
}

/**
 * Builds the results of every element whose heads the solve determined: `known` marks the graph
 * nodes with a determined head (by default those at the ends of active links). A pipe needs
 * both ends known; a node gets the ports that are known (none: no result); a pump or a control
 * valve needs both. Values are the raw numbers of the solve: nothing non-finite is replaced here
 * (solve() reports it, see findings/nonFinite.ts).
 */
export function elementResults(
  graph: HydraulicGraph,
  outcome: GgaOutcome,
  activeLink: Uint8Array,
  fluid: SolveFluid,
  known: Uint8Array = knownFromLinks(graph, activeLink),
): { records: ElementResults; indexed: IndexedResults } {
  const g2 = 2 * GRAVITY;
  const rhoG = fluid.density * GRAVITY;
  const { heads, flows } = outcome;
  const fixed = graph.fixed;
  const pipes: Record<Id, PipeResult> = {};
  const pipeList = graph.pipeList;
  const nPipes = pipeList.length;
  const pipeResults = new Array<PipeResult | undefined>(nPipes);
  /** Each pipe's result flow, speed and end total heads, for the ports on it. */
  const pipeFlow = new Float64Array(nPipes);
  const pipeSpeed = new Float64Array(nPipes);
  const pipeTotalFrom = new Float64Array(nPipes);
  const pipeTotalTo = new Float64Array(nPipes);

  for (let p = 0; p < nPipes; p++) {
    const gp = pipeList[p];
    const k = gp.link;
    const link = graph.links[k];
    if (!known[link.from] || !known[link.to]) continue;
    const active = activeLink[k] === 1;
    const q = active ? flows[k] : 0;
    const law = gp.law;
    const v = q / law.area;
    const re = law.reynolds(q);
    const noFlow = Math.abs(v) < NO_FLOW_VELOCITY;
    const friction = re > 0 ? law.frictionFactor(q) : null;
    const vh = (v * v) / g2;
    let totalFrom = 0;
    let totalTo = 0;
    if (active) {
      // EGL at a pipe's end: the graph head, or at a vessel/boundary the fixed head less the
      // entrance loss (liquid leaving it) or plus the exit loss (liquid arriving).
      totalFrom = heads[link.from];
      if (fixed[link.from]) totalFrom += q >= 0 ? -gp.entranceFrom * vh : gp.exitFrom * vh;
      totalTo = heads[link.to];
      if (fixed[link.to]) totalTo += q <= 0 ? -gp.entranceTo * vh : gp.exitTo * vh;
    }
    const result: PipeResult = {
      flow: q,
      velocity: v,
      reynolds: re,
      regime: noFlow
        ? 'no-flow'
        : re <= LAMINAR_LIMIT_REYNOLDS
          ? 'laminar'
          : (friction?.regime ?? 'laminar'),
      frictionFactor: friction?.factor ?? 0,
      frictionLoss: Math.abs(law.friction(q)),
      endLosses: Math.abs(law.endLoss(q)),
      fittingLoss: Math.abs(law.fittingLoss(q)),
      innerDiameter: law.diameter,
      headFrom: totalFrom - vh,
      headTo: totalTo - vh,
      totalHeadFrom: totalFrom,
      totalHeadTo: totalTo,
      elevationFrom: gp.elevationFrom,
      elevationTo: gp.elevationTo,
    };
    if (law.hasFittings) result.fittingK = law.fittingsK(q);
    pipes[gp.id] = result;
    pipeResults[p] = result;
    pipeFlow[p] = result.flow;
    pipeSpeed[p] = Math.abs(result.velocity);
    pipeTotalFrom[p] = result.totalHeadFrom!;
    pipeTotalTo[p] = result.totalHeadTo!;
  }

  const { portPipeStart, portPipeList, portNode } = graph;
  const portResult = (node: SheetNode, slot: number, local: number): PortResult => {
    const elevation = portElevationAt(node, local);
    const graphNode = portNode[slot];
    // The pipe carrying the most flow sets the port's velocity (a port normally has one pipe).
    // Flows equal to rounding (a junction joining two pipes in series) keep the first pipe, so
    // the choice does not hang on the last bit of the iteration.
    let best = -1;
    for (let e = portPipeStart[slot]; e < portPipeStart[slot + 1]; e++) {
      const p = portPipeList[e];
      if (!pipeResults[p]) continue;
      if (best < 0) best = p;
      else {
        const q = Math.abs(pipeFlow[p]);
        const qBest = Math.abs(pipeFlow[best]);
        if (q - qBest > 1e-9 * qBest + 1e-15) best = p;
      }
    }
    let total = graphNode < 0 ? 0 : heads[graphNode];
    let velocity = 0;
    if (best >= 0) {
      velocity = pipeSpeed[best];
      total = pipeList[best].fromSlot === slot ? pipeTotalFrom[best] : pipeTotalTo[best];
    }
    const head = total - (velocity * velocity) / g2;
    const pressureGauge = rhoG * (head - elevation);
    return {
      head: head,
      totalHead: total,
      pressureAbs: pressureGauge + fluid.atmosphericPressure,
      pressureGauge: pressureGauge,
      velocity: velocity,
      elevation,
    };
  };

  const nodes: Record<Id, NodeResult> = {};
  const pumps: Record<Id, PumpResult> = {};
  const controlValves: Record<Id, ControlValveResult> = {};
  const sheetNodes = graph.sheetNodes;
  const nodeResults = new Array<NodeResult | undefined>(sheetNodes.length);
  for (let i = 0; i < sheetNodes.length; i++) {
    const node = sheetNodes[i];
    // A node left out of the solve has no result, but a vessel without nozzles still gets one.
    if (!graph.usable[i] && (node.kind !== 'vessel' || node.nozzles.length > 0)) continue;
    const ports: Record<string, PortResult> = {};
    const start = graph.portStart[i];
    const count = graph.portStart[i + 1] - start;
    let shown = 0;
    for (let local = 0; local < count; local++) {
      // A repeated nozzle id names its first nozzle, whose pipes are its pipes.
      const at = node.kind === 'vessel' ? portIndex(node, portName(node, local)) : local;
      const graphNode = portNode[start + at];
      if (graphNode < 0 || !known[graphNode]) continue;
      ports[portName(node, local)] = portResult(node, start + at, at);
      shown++;
    }
    if (shown === 0 && count > 0) continue;
    const result: NodeResult = { ports };
    const k = graph.nodeLink[i];
    if (k >= 0 && known[graph.links[k].from] && known[graph.links[k].to]) {
      const link = graph.links[k];
      // An inactive link between known ends is shut: no flow.
      const q = activeLink[k] ? flows[k] : 0;
      result.flow = q;
      result.headLoss = heads[link.from] - heads[link.to];
      if (link.info?.kind === 'fitting' && link.info.law)
        result.lossCoefficient = link.info.law.lossCoefficient;
      if (link.info?.kind === 'pump') {
        const [suction, discharge] = [ports.suction, ports.discharge];
        pumps[graph.nodeIds[i]] = pumpResult(link.info, q, suction, discharge, fluid);
      }
      if (node.kind === 'control-valve' && link.info?.kind === 'control-valve') {
        const dp = ports.in.pressureAbs - ports.out.pressureAbs;
        const inlet = q >= 0 ? ports.in.pressureAbs : ports.out.pressureAbs;
        const dpChoked = chokedPressureDrop(
          node.pressureRecoveryFactor,
          inlet,
          fluid.vapourPressure,
          fluid.criticalPressure,
        );
        controlValves[graph.nodeIds[i]] = {
          flow: q,
          pressureDrop: dp,
          opening: node.opening,
          kv: link.info.kv,
          chokedPressureDrop: dpChoked,
          choked:
            !link.info.closed &&
            Math.abs(q) > 0 &&
            Math.abs(dp) > dpChoked &&
            Math.abs(q) * 3600 > 1e-6,
        };
      }
    }
    nodes[graph.nodeIds[i]] = result;
    nodeResults[i] = result;
  }
  return {
    records: { pipes, nodes, pumps, controlValves },
    indexed: { pipes: pipeResults, nodes: nodeResults },
  };
}

/** Graph nodes at an end of an active link, or fixed. */
function knownFromLinks(graph: HydraulicGraph, activeLink: Uint8Array): Uint8Array {
  const known = new Uint8Array(graph.nodeCount);
  for (let i = 0; i < graph.nodeCount; i++) if (graph.fixed[i]) known[i] = 1;
  graph.links.forEach((link, k) => {
    if (activeLink[k]) known[link.from] = known[link.to] = 1;
  });
  return known;
}

function pumpResult(
  info: Extract<NonNullable<HydraulicGraph['links'][number]['info']>, { kind: 'pump' }>,
  flow: number,
  suction: PortResult,
  discharge: PortResult,
  fluid: SolveFluid,
): PumpResult {
  const g2 = 2 * GRAVITY;
  const rhoG = fluid.density * GRAVITY;
  const s = info.speedRatio;
  const head = discharge.totalHead - suction.totalHead;
  // NPSHa at the suction flange = (p_abs − p_v)/ρg + v²/2g.
  const npshAvailable =
    (suction.pressureAbs - fluid.vapourPressure) / rhoG +
    (suction.velocity * suction.velocity) / g2;
  const q = Math.max(flow, 0);
  const npshRequired =
    info.running && info.npshrFit.form !== 'empty'
      ? Math.max(pumpNpshRequired(info.npshrFit, q, s), 0)
      : 0;
  // Far beyond its points a fitted efficiency curve can fall to zero or below; the efficiency is
  // held at EFFICIENCY_FLOOR there so the shaft power stays finite and positive (the pump is
  // then far from its best-efficiency flow and gets a pump-off-bep finding).
  const efficiency =
    info.running && info.efficiencyFit.form !== 'empty'
      ? Math.max(pumpEfficiency(info.efficiencyFit, q, s), EFFICIENCY_FLOOR)
      : 0;
  const power = efficiency > 0 ? shaftPower(fluid.density, q, head, efficiency) : 0;
  const bep = info.running ? bestEfficiencyFlow(info.efficiencyFit, s) : null;
  const result: PumpResult = {
    flow,
    head,
    npshAvailable,
    npshRequired,
    npshMargin: npshAvailable - npshRequired,
    npshRatio: npshRequired > 0 ? npshAvailable / npshRequired : 0,
    efficiency,
    shaftPower: power,
  };
  if (bep !== null && bep > 0) result.bepFraction = q / bep;
  return result;
}
