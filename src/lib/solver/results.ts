/**
 * Per-element results from the solved hydraulic graph: pipes, node ports, pumps and control
 * valves. Graph heads are total heads (EGL); the HGL at a port is EGL − v²/2g with the velocity
 * of the pipe on that port.
 */
import type { HeadrouteDocument, Id, SheetNode } from '../model/types';
import { portsOf, portElevation } from '../model/ports';
import { chokedPressureDrop } from '../physics/controlValve';
import { LAMINAR_LIMIT_REYNOLDS } from '../physics/friction';
import { bestEfficiencyFlow, pumpEfficiency, pumpNpshRequired, shaftPower } from '../physics/pump';
import type { SolveFluid } from './fluid';
import { portKey, type GraphPipe, type HydraulicGraph } from './network/build';
import type { GgaOutcome } from './network/gga';
import { GRAVITY } from './network/laws';
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

function clean(value: number): number {
  return Number.isFinite(value) ? value : 0;
}

/** Builds every element's results; all numbers are finite. */
export function elementResults(
  doc: HeadrouteDocument,
  graph: HydraulicGraph,
  outcome: GgaOutcome,
  activeLink: Uint8Array,
  fluid: SolveFluid,
): ElementResults {
  const g2 = 2 * GRAVITY;
  const rhoG = fluid.density * GRAVITY;
  const { heads, flows } = outcome;
  const pipes: Record<Id, PipeResult> = {};

  /** EGL at a pipe's end, m: the graph head, or for an end on a vessel/boundary the fixed head less the entrance loss / plus the exit loss. */
  const endTotalHead = (gp: GraphPipe, end: 'from' | 'to'): number => {
    const link = graph.links[gp.link];
    const node = end === 'from' ? link.from : link.to;
    const head = heads[node];
    if (!graph.fixed[node]) return head;
    const q = flows[gp.link];
    const v = q / gp.law.area;
    const vh = (v * v) / g2;
    const ref = end === 'from' ? gp.pipe.from : gp.pipe.to;
    const sheetNode = doc.nodes[ref.node];
    let entrance = 0;
    let exit = 1;
    if (sheetNode.kind === 'vessel') {
      const nozzle = sheetNode.nozzles.find((n) => n.id === ref.port);
      entrance = nozzle?.entranceK ?? 0;
      exit = nozzle?.exitK ?? 1;
    }
    const leaving = end === 'from' ? q >= 0 : q <= 0;
    return leaving ? head - entrance * vh : head + exit * vh;
  };

  for (const [id, gp] of graph.pipes) {
    const active = activeLink[gp.link] === 1;
    const q = active ? flows[gp.link] : 0;
    const law = gp.law;
    const v = q / law.area;
    const re = law.reynolds(q);
    const noFlow = Math.abs(v) < NO_FLOW_VELOCITY;
    const friction = re > 0 ? law.frictionFactor(q) : null;
    const vh = (v * v) / g2;
    const totalFrom = active ? endTotalHead(gp, 'from') : 0;
    const totalTo = active ? endTotalHead(gp, 'to') : 0;
    pipes[id] = {
      flow: clean(q),
      velocity: clean(v),
      reynolds: clean(re),
      regime: noFlow
        ? 'no-flow'
        : re <= LAMINAR_LIMIT_REYNOLDS
          ? 'laminar'
          : (friction?.regime ?? 'laminar'),
      frictionFactor: clean(friction?.factor ?? 0),
      frictionLoss: clean(Math.abs(law.friction(q))),
      endLosses: clean(Math.abs(law.endLoss(q))),
      innerDiameter: law.diameter,
      headFrom: clean(totalFrom - vh),
      headTo: clean(totalTo - vh),
      totalHeadFrom: clean(totalFrom),
      totalHeadTo: clean(totalTo),
      elevationFrom: gp.elevationFrom,
      elevationTo: gp.elevationTo,
    };
  }

  const portResult = (node: SheetNode, port: string): PortResult => {
    const elevation = portElevation(doc, { node: node.id, port });
    const key = portKey(node.id, port);
    const graphNode = graph.portNode.get(key);
    const attached = graph.portPipes.get(key) ?? [];
    // The pipe carrying the most flow sets the port's velocity (a port normally has one pipe).
    // Flows equal to rounding (a junction joining two pipes in series) keep the first pipe, so
    // the choice does not hang on the last bit of the iteration.
    let best: GraphPipe | null = null;
    for (const gp of attached) {
      if (best === null) best = gp;
      else {
        const q = Math.abs(pipes[gp.pipe.id].flow);
        const qBest = Math.abs(pipes[best.pipe.id].flow);
        if (q - qBest > 1e-9 * qBest + 1e-15) best = gp;
      }
    }
    let total = graphNode === undefined ? 0 : heads[graphNode];
    let velocity = 0;
    if (best) {
      const r = pipes[best.pipe.id];
      velocity = Math.abs(r.velocity);
      const atFrom = best.pipe.from.node === node.id && best.pipe.from.port === port;
      total = atFrom ? r.totalHeadFrom! : r.totalHeadTo!;
    }
    const head = total - (velocity * velocity) / g2;
    const pressureGauge = rhoG * (head - elevation);
    return {
      head: clean(head),
      totalHead: clean(total),
      pressureAbs: clean(pressureGauge + fluid.atmosphericPressure),
      pressureGauge: clean(pressureGauge),
      velocity: clean(velocity),
      elevation,
    };
  };

  const nodes: Record<Id, NodeResult> = {};
  const pumps: Record<Id, PumpResult> = {};
  const controlValves: Record<Id, ControlValveResult> = {};
  for (const node of graph.sheetNodes) {
    if (!graph.portNode.has(portKey(node.id, portsOf(node)[0] ?? ''))) {
      if (node.kind !== 'vessel' || node.nozzles.length > 0) continue;
    }
    const ports: Record<string, PortResult> = {};
    for (const port of portsOf(node)) ports[port] = portResult(node, port);
    const result: NodeResult = { ports };
    const k = graph.nodeLink.get(node.id);
    if (k !== undefined) {
      const link = graph.links[k];
      const q = activeLink[k] ? flows[k] : 0;
      result.flow = clean(q);
      result.headLoss = activeLink[k] ? clean(heads[link.from] - heads[link.to]) : 0;
      if (link.info?.kind === 'fitting' && link.info.law)
        result.lossCoefficient = clean(link.info.law.lossCoefficient);
      if (link.info?.kind === 'pump') {
        const [suction, discharge] = [ports.suction, ports.discharge];
        pumps[node.id] = pumpResult(link.info, q, suction, discharge, fluid);
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
        controlValves[node.id] = {
          flow: clean(q),
          pressureDrop: clean(dp),
          opening: node.opening,
          kv: clean(link.info.kv),
          chokedPressureDrop: clean(dpChoked),
          choked:
            !link.info.closed &&
            Math.abs(q) > 0 &&
            Math.abs(dp) > dpChoked &&
            Math.abs(q) * 3600 > 1e-6,
        };
      }
    }
    nodes[node.id] = result;
  }
  return { pipes, nodes, pumps, controlValves };
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
      ? Math.max(clean(pumpEfficiency(info.efficiencyFit, q, s)), EFFICIENCY_FLOOR)
      : 0;
  const power = efficiency > 0 ? shaftPower(fluid.density, q, head, efficiency) : 0;
  const bep = info.running ? bestEfficiencyFlow(info.efficiencyFit, s) : null;
  return {
    flow: clean(flow),
    head: clean(head),
    npshAvailable: clean(npshAvailable),
    npshRequired: clean(npshRequired),
    npshMargin: clean(npshAvailable - npshRequired),
    npshRatio: npshRequired > 0 ? clean(npshAvailable / npshRequired) : 0,
    efficiency,
    shaftPower: clean(power),
    bepFraction: bep !== null && bep > 0 ? clean(q / bep) : 0,
  };
}
