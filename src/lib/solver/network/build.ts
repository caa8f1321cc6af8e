/**
 * The hydraulic graph of a sheet.
 *
 * Graph nodes: each port of each sheet node is a node, except that a waypoint's two ports and
 * a junction's hub collapse to one node, and a vessel or a boundary is a single fixed-head node
 * (its liquid surface; its submerged nozzles all map onto it, while each nozzle above the liquid
 * is a fixed-head node of its own, see nozzleHeads.ts). Links: each pipe (its ends at vessels and
 * boundaries carry the entrance/exit loss), and each fitting, control valve and pump between
 * its two ports. A pump in duty mode is a flow-controlled link.
 *
 * Fixed heads are total heads of liquid at rest, gauge-referenced (HGL = z + p_gauge/ρg):
 *   vessel: liquid level + (gas pressure − p_atm)/ρg when closed, the level when open; at a
 *   nozzle above the liquid, the nozzle's elevation in place of the level;
 *   boundary: z + (p − p_atm)/ρg — a header at rest at that pressure: liquid drawn from it
 *   starts with that total head (no entrance loss), liquid delivered into it keeps that
 *   pressure at the pipe end (its velocity head is lost, exit K = 1).
 * A boundary that holds a flow is a free node with a known demand (the flow leaving the sheet
 * there; Todini and Pilati's node demand q), and its pipe end has no entrance or exit loss.
 */
import type { HeadrouteDocument, Id, Pipe, SheetNode } from '../../model/types';
import { findPipeMaterial, DEFAULT_MATERIAL, PIPE_MATERIALS } from '../../physics/materials';
import { catalogueInnerDiameter } from '../../physics/pipeCatalogue';
import type { Finding } from '../types';
import { findings } from '../findings/catalogue';
import type { SolveFluid } from '../fluid';
import { GRAVITY, type LinkLaw } from './laws';
import { fixedHeadOf, gasSpaceHead, isAboveLevel } from './nozzleHeads';
import { ColebrookMemo, PipeLaw, PipeLawStore } from './pipeLaw';
import {
  endCoefficients,
  portCount,
  portElevationAt,
  portIndex,
  portName,
  portsNeedingPipe,
} from './portSlots';
import { fittingsBeyondEnd, pipeFittingTerms } from './pipeFittings';
import { recordKeysAndValues } from './recordValues';
import { twoPortLink, type TwoPortInfo } from './twoPort';

/** A link of the hydraulic graph. */
export interface HydraulicLink {
  /** The pipe or sheet node this link stands for. */
  element: Id;
  kind: 'pipe' | 'fitting' | 'control-valve' | 'pump';
  from: number;
  to: number;
  /** Head-loss law, or null for a flow-controlled link (duty pump). */
  law: LinkLaw | null;
  /** Fixed flow of a flow-controlled link, m³/s. */
  fixedFlow: number;
  /** Extra information for two-port elements (null for pipes). */
  info: TwoPortInfo | null;
}

/** A pipe as the graph sees it. */
export interface GraphPipe {
  pipe: Pipe;
  /** The pipe's id (the document record's own key string when it is the same text). */
  id: Id;
  link: number;
  law: PipeLaw;
  elevationFrom: number;
  elevationTo: number;
  /** Port slots of the pipe's two ends (see portSlots.ts). */
  fromSlot: number;
  toSlot: number;
  /** Entrance and exit K at each end on a vessel nozzle or a boundary (0 and 1 elsewhere; unused there). */
  entranceFrom: number;
  exitFrom: number;
  entranceTo: number;
  exitTo: number;
}

/** The hydraulic graph built from a project document */
export interface HydraulicGraph {
  nodeCount: number;
  /** 1 for fixed-head nodes. */
  fixed: Uint8Array;
  /** Fixed total head, m, for fixed nodes (0 for free ones). */
  fixedHead: Float64Array;
  /** Known flow leaving the sheet at each node, m³/s (a boundary holding a flow; else 0). */
  demand: Float64Array;
  links: HydraulicLink[];
  /** The document's sheet nodes in document order (Object.values once per solve). */
  sheetNodes: SheetNode[];
  /** Each sheet node's id (the document record's own key string when it is the same text). */
  nodeIds: Id[];
  /** 1 for each sheet node (by index in sheetNodes) that takes part in the graph. */
  usable: Uint8Array;
  /**
   * First port slot of each sheet node (length sheetNodes.length + 1): node i's ports, in
   * model/ports `portsOf` order, take the slots portStart[i] … portStart[i + 1] − 1.
   */
  portStart: Int32Array;
  /** Sheet node (index) owning each port slot. */
  slotOwner: Int32Array;
  /** Graph node of each port slot, −1 where the sheet node is left out of the solve. */
  portNode: Int32Array;
  /** Pipes at each port slot: indices into `pipeList`, from portPipeStart[s] to portPipeStart[s + 1]. */
  portPipeStart: Int32Array;
  portPipeList: Int32Array;
  /** Valid pipes in document order. */
  pipeList: GraphPipe[];
  /** Link index of each sheet node (by index) that is a two-port element, −1 otherwise. */
  nodeLink: Int32Array;
  /** Sheet node (index) each graph node belongs to (for naming cut-off parts). */
  nodeOwner: Int32Array;
  findings: Finding[];
}

function pipeDiameter(pipe: Pipe, cache: Map<string, number | undefined>): number | undefined {
  if (pipe.bore.mode === 'typed') return pipe.bore.innerDiameter;
  const key = `${pipe.bore.nominalSize}\u0000${pipe.bore.schedule}`;
  if (!cache.has(key))
    cache.set(key, catalogueInnerDiameter(pipe.bore.nominalSize, pipe.bore.schedule));
  return cache.get(key);
}

function pipeRoughness(pipe: Pipe): number {
  if (pipe.roughness !== null) return pipe.roughness;
  return (findPipeMaterial(pipe.material) ?? PIPE_MATERIALS[DEFAULT_MATERIAL]).roughness;
}

/** Port slot of a pipe end, or −1 when its node or port is not on the sheet. */
function endSlot(
  sheetNodes: SheetNode[],
  portStart: Int32Array,
  index: number | undefined,
  port: string,
): number {
  if (index === undefined) return -1;
  const local = portIndex(sheetNodes[index], port);
  return local < 0 ? -1 : portStart[index] + local;
}

/** Builds the hydraulic graph; problems with the input come back as findings. */
export function buildGraph(doc: HeadrouteDocument, fluid: SolveFluid): HydraulicGraph {
  const out: Finding[] = [];
  const rhoG = fluid.density * GRAVITY;
  const { keys: nodeKeys, values: sheetNodes } = recordKeysAndValues(doc.nodes);
  // Each node's id, as the record's own key string where it is the same text (see recordValues.ts).
  const nodeIds = sheetNodes.map((node, i) => (nodeKeys[i] === node.id ? nodeKeys[i] : node.id));
  const nSheet = sheetNodes.length;
  const nodeIndex = new Map<Id, number>();
  const portStart = new Int32Array(nSheet + 1);
  for (let i = 0; i < nSheet; i++) {
    const node = sheetNodes[i];
    // Object.values lists each key once, so a repeated id can only come from a node whose id
    // differs from its key; the first keeps the id, as a lookup by key would find one node.
    if (!nodeIndex.has(node.id)) nodeIndex.set(node.id, i);
    portStart[i + 1] = portStart[i] + portCount(node);
  }
  const nSlots = portStart[nSheet];
  const slotOwner = new Int32Array(nSlots);
  for (let i = 0; i < nSheet; i++)
    for (let slot = portStart[i]; slot < portStart[i + 1]; slot++) slotOwner[slot] = i;
  const portNode = new Int32Array(nSlots).fill(-1);
  const usable = new Uint8Array(nSheet);
  // Graph nodes: at most one per port slot plus one per vessel.
  const capacity = nSlots + nSheet;
  const fixed = new Uint8Array(capacity);
  const fixedHead = new Float64Array(capacity);
  const demand = new Float64Array(capacity);
  const nodeOwner = new Int32Array(capacity);
  let nodeCount = 0;
  const newNode = (owner: number, head: number | null): number => {
    const index = nodeCount++;
    if (head !== null) {
      fixed[index] = 1;
      fixedHead[index] = head;
    }
    nodeOwner[index] = owner;
    return index;
  };

  for (let i = 0; i < nSheet; i++) {
    const node = sheetNodes[i];
    const s = portStart[i];
    if (!Number.isFinite(node.z)) {
      out.push(
        findings.invalidInput(
          node.name,
          'its elevation is not a number; it is left out of the solve',
          node.id,
        ),
      );
      continue;
    }
    switch (node.kind) {
      case 'vessel':
      case 'boundary': {
        const at = fixedHeadOf(node, fluid.atmosphericPressure, rhoG);
        if ('problem' in at) {
          out.push(findings.invalidInput(node.name, at.problem, node.id));
          continue;
        }
        if ('demand' in at) {
          // A boundary holding a flow: a free node that the demand leaves.
          portNode[s] = newNode(i, null);
          demand[portNode[s]] = at.demand;
          break;
        }
        portNode.fill(newNode(i, at.head), s, portStart[i + 1]);
        // A nozzle above the liquid opens into the gas space: a fixed head of its own there.
        if (node.kind === 'vessel')
          for (let n = 0; n < node.nozzles.length; n++)
            if (isAboveLevel(node, node.nozzles[n]))
              portNode[s + n] = newNode(i, gasSpaceHead(node.nozzles[n], at.gas));
        break;
      }
      case 'waypoint': {
        const index = newNode(i, null);
        portNode[s] = index;
        portNode[s + 1] = index;
        break;
      }
      case 'junction':
        portNode[s] = newNode(i, null);
        // A draw-off (or, negative, a supply) at the branch point: a known node demand.
        if (node.outflow !== undefined && node.outflow !== 0) {
          if (Number.isFinite(node.outflow)) demand[portNode[s]] = node.outflow;
          else
            out.push(
              findings.invalidInput(
                node.name,
                'its draw-off is not a number; the branch point is solved with none',
                node.id,
              ),
            );
        }
        break;
      case 'pump':
      case 'fitting':
      case 'control-valve':
        portNode[s] = newNode(i, null);
        portNode[s + 1] = newNode(i, null);
        break;
    }
    usable[i] = 1;
  }

  const links: HydraulicLink[] = [];
  const pipeList: GraphPipe[] = [];
  const boreCache = new Map<string, number | undefined>();
  const colebrook = new ColebrookMemo();
  const { keys: pipeKeys, values: docPipes } = recordKeysAndValues(doc.pipes);
  const store = new PipeLawStore(docPipes.length);
  for (let d = 0; d < docPipes.length; d++) {
    const pipe = docPipes[d];
    const fromIndex = nodeIndex.get(pipe.from.node);
    const toIndex = nodeIndex.get(pipe.to.node);
    const fromSlot = endSlot(sheetNodes, portStart, fromIndex, pipe.from.port);
    const toSlot = endSlot(sheetNodes, portStart, toIndex, pipe.to.port);
    let broken = false;
    if (fromSlot < 0) {
      const name = fromIndex === undefined ? pipe.from.node : sheetNodes[fromIndex].name;
      out.push(findings.brokenConnection(pipe.name, 'from', name, pipe.from.port, pipe.id));
      broken = true;
    } else if (!usable[fromIndex!]) broken = true;
    if (toSlot < 0) {
      const name = toIndex === undefined ? pipe.to.node : sheetNodes[toIndex].name;
      out.push(findings.brokenConnection(pipe.name, 'to', name, pipe.to.port, pipe.id));
      broken = true;
    } else if (!usable[toIndex!]) broken = true;
    if (broken) continue;
    const fromNode = sheetNodes[fromIndex!];
    const toNode = sheetNodes[toIndex!];
    const diameter = pipeDiameter(pipe, boreCache);
    const roughness = pipeRoughness(pipe);
    if (diameter === undefined || !(diameter > 0) || !Number.isFinite(diameter)) {
      const what =
        pipe.bore.mode === 'catalogue'
          ? `size ${pipe.bore.nominalSize} schedule ${pipe.bore.schedule} is not in the pipe catalogue`
          : 'its inner diameter is not a positive number';
      out.push(
        findings.invalidInput(pipe.name, `${what}; the pipe is left out of the solve`, pipe.id),
      );
      continue;
    }
    if (!(pipe.length >= 0) || !Number.isFinite(pipe.length)) {
      out.push(
        findings.invalidInput(
          pipe.name,
          'its length is not a positive number; the pipe is left out of the solve',
          pipe.id,
        ),
      );
      continue;
    }
    if (!(roughness >= 0) || !(roughness / diameter < 1)) {
      out.push(
        findings.invalidInput(
          pipe.name,
          'its roughness is not usable for its bore; the pipe is left out of the solve',
          pipe.id,
        ),
      );
      continue;
    }
    const fromLocal = fromSlot - portStart[fromIndex!];
    const toLocal = toSlot - portStart[toIndex!];
    // Entrance/exit K at an end on a vessel nozzle or a boundary (a boundary: 0 and 1).
    const fromEnd = endCoefficients(fromNode, fromLocal);
    const toEnd = endCoefficients(toNode, toLocal);
    // Forward flow leaves at `from` (entrance) and arrives at `to` (exit); reverse the other way.
    const kForward = (fromEnd ? fromEnd.entranceK : 0) + (toEnd ? toEnd.exitK : 0);
    const kReverse = (fromEnd ? fromEnd.exitK : 0) + (toEnd ? toEnd.entranceK : 0);
    const law = new PipeLaw(
      diameter,
      pipe.length,
      roughness / diameter,
      fluid,
      kForward,
      kReverse,
      colebrook,
      store,
    );
    const terms = pipeFittingTerms(pipe, diameter);
    if ('problem' in terms) {
      out.push(
        findings.invalidInput(
          pipe.name,
          `${terms.problem}; the pipe is solved without its fittings`,
          pipe.id,
        ),
      );
    } else if (terms.k1 !== 0 || terms.k0 !== 0) law.setFittings(terms.k1, terms.k0);
    if (fittingsBeyondEnd(pipe)) {
      out.push(
        findings.invalidInput(
          pipe.name,
          'its fittings are placed beyond its length; the profile shows them at its end',
          pipe.id,
        ),
      );
    }
    const from = portNode[fromSlot];
    const to = portNode[toSlot];
    const link = links.length;
    links.push({ element: pipe.id, kind: 'pipe', from, to, law, fixedFlow: 0, info: null });
    pipeList.push({
      pipe,
      id: pipeKeys[d] === pipe.id ? pipeKeys[d] : pipe.id,
      link,
      law,
      elevationFrom: portElevationAt(fromNode, fromLocal),
      elevationTo: portElevationAt(toNode, toLocal),
      fromSlot,
      toSlot,
      entranceFrom: fromEnd ? fromEnd.entranceK : 0,
      exitFrom: fromEnd ? fromEnd.exitK : 1,
      entranceTo: toEnd ? toEnd.entranceK : 0,
      exitTo: toEnd ? toEnd.exitK : 1,
    });
  }

  // Pipes at each port slot, in document order (CSR).
  const portPipeStart = new Int32Array(nSlots + 1);
  for (const gp of pipeList) {
    portPipeStart[gp.fromSlot + 1]++;
    portPipeStart[gp.toSlot + 1]++;
  }
  for (let s = 0; s < nSlots; s++) portPipeStart[s + 1] += portPipeStart[s];
  const portPipeList = new Int32Array(portPipeStart[nSlots]);
  const cursor = portPipeStart.slice(0, nSlots);
  for (let p = 0; p < pipeList.length; p++) {
    const gp = pipeList[p];
    portPipeList[cursor[gp.fromSlot]++] = p;
    if (gp.toSlot !== gp.fromSlot) portPipeList[cursor[gp.toSlot]++] = p;
  }
  // A pipe with both ends on one port is listed once there (as a keyed list of pipes would
  // list it twice; the results only read the first pipe and whether there is one).
  const graph = { portPipeStart, portPipeList };

  const nodeLink = new Int32Array(nSheet).fill(-1);
  for (let i = 0; i < nSheet; i++) {
    if (!usable[i]) continue;
    const node = sheetNodes[i];
    const s = portStart[i];
    for (const local of portsNeedingPipe(node)) {
      if (portPipeStart[s + local + 1] === portPipeStart[s + local])
        out.push(findings.unconnectedPort(node.name, portName(node, local), node.id));
    }
    if (node.kind !== 'pump' && node.kind !== 'fitting' && node.kind !== 'control-valve') continue;
    const inPipe = firstPipe(graph, pipeList, s);
    const outPipe = firstPipe(graph, pipeList, s + 1);
    const made = twoPortLink(node, inPipe?.law.diameter, outPipe?.law.diameter, fluid, out);
    nodeLink[i] = links.length;
    links.push({
      element: node.id,
      kind: node.kind,
      from: portNode[s],
      to: portNode[s + 1],
      law: made.law,
      fixedFlow: made.fixedFlow,
      info: made.info,
    });
  }

  return {
    nodeCount,
    fixed: fixed.slice(0, nodeCount),
    fixedHead: fixedHead.slice(0, nodeCount),
    demand: demand.slice(0, nodeCount),
    links,
    sheetNodes,
    nodeIds,
    usable,
    portStart,
    slotOwner,
    portNode,
    portPipeStart,
    portPipeList,
    pipeList,
    nodeLink,
    nodeOwner: nodeOwner.slice(0, nodeCount),
    findings: out,
  };
}

/** The first pipe at a port slot, if any. */
export function firstPipe(
  graph: Pick<HydraulicGraph, 'portPipeStart' | 'portPipeList'>,
  pipeList: GraphPipe[],
  slot: number,
): GraphPipe | undefined {
  const p = graph.portPipeStart[slot];
  return p < graph.portPipeStart[slot + 1] ? pipeList[graph.portPipeList[p]] : undefined;
}
