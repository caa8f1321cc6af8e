/**
 * The hydraulic graph of a sheet.
 *
 * Graph nodes: each port of each sheet node is a node, except that a waypoint's two ports and
 * a junction's hub collapse to one node, and a vessel or a boundary is a single fixed-head node
 * (its liquid surface; its ports all map onto it). Links: each pipe (its ends at vessels and
 * boundaries carry the entrance/exit loss), and each fitting, control valve and pump between
 * its two ports. A pump in duty mode is a flow-controlled link.
 *
 * Fixed heads are total heads of liquid at rest, gauge-referenced (HGL = z + p_gauge/ρg):
 *   vessel: liquid level + (gas pressure − p_atm)/ρg when closed, the level when open;
 *   boundary: z + (p − p_atm)/ρg — a header at rest at that pressure: liquid drawn from it
 *   starts with that total head (no entrance loss), liquid delivered into it keeps that
 *   pressure at the pipe end (its velocity head is lost, exit K = 1).
 */
import type { HeadrouteDocument, Id, Pipe, SheetNode } from '../../model/types';
import { hasPort } from '../../model/ports';
import { findPipeMaterial, DEFAULT_MATERIAL, PIPE_MATERIALS } from '../../physics/materials';
import { catalogueInnerDiameter } from '../../physics/pipeCatalogue';
import type { Finding } from '../types';
import { findings } from '../findings/catalogue';
import type { SolveFluid } from '../fluid';
import { GRAVITY, PipeLaw, type LinkLaw } from './laws';
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
  link: number;
  law: PipeLaw;
  elevationFrom: number;
  elevationTo: number;
}

/** The hydraulic graph built from a project document */
export interface HydraulicGraph {
  nodeCount: number;
  /** 1 for fixed-head nodes. */
  fixed: Uint8Array;
  /** Fixed total head, m, for fixed nodes (0 for free ones). */
  fixedHead: Float64Array;
  links: HydraulicLink[];
  /** Graph node of each connected port, keyed by portKey. */
  portNode: Map<string, number>;
  /** Valid pipes by id. */
  pipes: Map<Id, GraphPipe>;
  /** Pipes at each port, keyed by portKey. */
  portPipes: Map<string, GraphPipe[]>;
  /** Link index of each two-port sheet node. */
  nodeLink: Map<Id, number>;
  /** Sheet elements touching each graph node (for naming cut-off parts). */
  nodeElements: Id[][];
  /** The document's sheet nodes in document order (Object.values once per solve). */
  sheetNodes: SheetNode[];
  findings: Finding[];
}

/** Key of a port in the graph's maps. */
export function portKey(node: Id, port: string): string {
  return `${node}\u0000${port}`;
}

function getNode(doc: HeadrouteDocument, id: Id): SheetNode | undefined {
  return Object.hasOwn(doc.nodes, id) ? doc.nodes[id] : undefined;
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

/** Entrance and exit K at a pipe end on a vessel nozzle or a boundary; null elsewhere. */
function endCoefficients(node: SheetNode, port: string): { entrance: number; exit: number } | null {
  if (node.kind === 'boundary') return { entrance: 0, exit: 1 };
  if (node.kind === 'vessel') {
    const nozzle = node.nozzles.find((n) => n.id === port);
    return nozzle ? { entrance: nozzle.entranceK, exit: nozzle.exitK } : null;
  }
  return null;
}

/** Elevation of an existing port: a vessel nozzle's own elevation, otherwise the node's z. */
function elevationOf(node: SheetNode, port: string): number {
  if (node.kind === 'vessel') return node.nozzles.find((n) => n.id === port)!.z;
  return node.z;
}

function finite(...values: number[]): boolean {
  return values.every((v) => Number.isFinite(v));
}

/** Builds the hydraulic graph; problems with the input come back as findings. */
export function buildGraph(doc: HeadrouteDocument, fluid: SolveFluid): HydraulicGraph {
  const out: Finding[] = [];
  const rhoG = fluid.density * GRAVITY;
  const fixedList: number[] = [];
  const headList: number[] = [];
  const nodeElements: Id[][] = [];
  const portNode = new Map<string, number>();
  let nodeCount = 0;
  const newNode = (element: Id, head: number | null): number => {
    const index = nodeCount++;
    fixedList.push(head === null ? 0 : 1);
    headList.push(head ?? 0);
    nodeElements.push([element]);
    return index;
  };

  const usable = new Set<Id>();
  const sheetNodes = Object.values(doc.nodes);
  for (const node of sheetNodes) {
    if (!finite(node.z)) {
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
      case 'vessel': {
        const gas = node.open ? 0 : (node.gasPressureAbs - fluid.atmosphericPressure) / rhoG;
        const head = node.liquidLevel + gas;
        if (!finite(head) || (!node.open && !(node.gasPressureAbs > 0))) {
          out.push(
            findings.invalidInput(
              node.name,
              'its liquid level or gas pressure is not usable; it is left out of the solve',
              node.id,
            ),
          );
          continue;
        }
        const index = newNode(node.id, head);
        for (const nozzle of node.nozzles) portNode.set(portKey(node.id, nozzle.id), index);
        break;
      }
      case 'boundary': {
        const head = node.z + (node.pressureAbs - fluid.atmosphericPressure) / rhoG;
        if (!finite(head) || !(node.pressureAbs >= 0)) {
          out.push(
            findings.invalidInput(
              node.name,
              'its pressure is not usable; it is left out of the solve',
              node.id,
            ),
          );
          continue;
        }
        portNode.set(portKey(node.id, 'p'), newNode(node.id, head));
        break;
      }
      case 'waypoint': {
        const index = newNode(node.id, null);
        portNode.set(portKey(node.id, 'in'), index);
        portNode.set(portKey(node.id, 'out'), index);
        break;
      }
      case 'junction':
        portNode.set(portKey(node.id, 'hub'), newNode(node.id, null));
        break;
      case 'pump':
        portNode.set(portKey(node.id, 'suction'), newNode(node.id, null));
        portNode.set(portKey(node.id, 'discharge'), newNode(node.id, null));
        break;
      case 'fitting':
      case 'control-valve':
        portNode.set(portKey(node.id, 'in'), newNode(node.id, null));
        portNode.set(portKey(node.id, 'out'), newNode(node.id, null));
        break;
    }
    usable.add(node.id);
  }

  const links: HydraulicLink[] = [];
  const pipes = new Map<Id, GraphPipe>();
  const portPipes = new Map<string, GraphPipe[]>();
  const boreCache = new Map<string, number | undefined>();
  for (const pipe of Object.values(doc.pipes)) {
    const fromNode = getNode(doc, pipe.from.node);
    const toNode = getNode(doc, pipe.to.node);
    let broken = false;
    for (const [node, ref, end] of [
      [fromNode, pipe.from, 'from'],
      [toNode, pipe.to, 'to'],
    ] as const) {
      if (!node || !hasPort(node, ref.port)) {
        out.push(
          findings.brokenConnection(pipe.name, end, node?.name ?? ref.node, ref.port, pipe.id),
        );
        broken = true;
      } else if (!usable.has(node.id)) broken = true;
    }
    if (broken || !fromNode || !toNode) continue;
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
    const fromEnd = endCoefficients(fromNode, pipe.from.port);
    const toEnd = endCoefficients(toNode, pipe.to.port);
    // Forward flow leaves at `from` (entrance) and arrives at `to` (exit); reverse the other way.
    const kForward = (fromEnd?.entrance ?? 0) + (toEnd?.exit ?? 0);
    const kReverse = (fromEnd?.exit ?? 0) + (toEnd?.entrance ?? 0);
    const law = new PipeLaw(diameter, pipe.length, roughness / diameter, fluid, kForward, kReverse);
    const fromKey = portKey(pipe.from.node, pipe.from.port);
    const toKey = portKey(pipe.to.node, pipe.to.port);
    const from = portNode.get(fromKey)!;
    const to = portNode.get(toKey)!;
    const link = links.length;
    links.push({ element: pipe.id, kind: 'pipe', from, to, law, fixedFlow: 0, info: null });
    const graphPipe: GraphPipe = {
      pipe,
      link,
      law,
      // The ports were checked above, so this is portElevation (model/ports) without the checks.
      elevationFrom: elevationOf(fromNode, pipe.from.port),
      elevationTo: elevationOf(toNode, pipe.to.port),
    };
    pipes.set(pipe.id, graphPipe);
    for (const key of [fromKey, toKey]) {
      const list = portPipes.get(key);
      if (list) list.push(graphPipe);
      else portPipes.set(key, [graphPipe]);
    }
    nodeElements[from].push(pipe.id);
    nodeElements[to].push(pipe.id);
  }

  const nodeLink = new Map<Id, number>();
  for (const node of sheetNodes) {
    if (!usable.has(node.id)) continue;
    for (const port of portsNeedingPipe(node)) {
      if (!portPipes.has(portKey(node.id, port)))
        out.push(findings.unconnectedPort(node.name, port, node.id));
    }
    if (node.kind !== 'pump' && node.kind !== 'fitting' && node.kind !== 'control-valve') continue;
    const [inPort, outPort] = node.kind === 'pump' ? ['suction', 'discharge'] : ['in', 'out'];
    const inPipe = portPipes.get(portKey(node.id, inPort))?.[0];
    const outPipe = portPipes.get(portKey(node.id, outPort))?.[0];
    const made = twoPortLink(node, inPipe?.law.diameter, outPipe?.law.diameter, fluid, out);
    const link: HydraulicLink = {
      element: node.id,
      kind: node.kind,
      from: portNode.get(portKey(node.id, inPort))!,
      to: portNode.get(portKey(node.id, outPort))!,
      law: made.law,
      fixedFlow: made.fixedFlow,
      info: made.info,
    };
    nodeLink.set(node.id, links.length);
    links.push(link);
  }

  return {
    nodeCount,
    fixed: Uint8Array.from(fixedList),
    fixedHead: Float64Array.from(headList),
    links,
    portNode,
    pipes,
    portPipes,
    nodeLink,
    nodeElements,
    sheetNodes,
    findings: out,
  };
}

/** Ports that should have a pipe: both ports of two-port nodes, a junction's hub, a boundary's port. */
function portsNeedingPipe(node: SheetNode): string[] {
  switch (node.kind) {
    case 'pump':
      return ['suction', 'discharge'];
    case 'fitting':
    case 'control-valve':
    case 'waypoint':
      return ['in', 'out'];
    case 'junction':
      return ['hub'];
    case 'boundary':
      return ['p'];
    case 'vessel':
      return [];
  }
}
