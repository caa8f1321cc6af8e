/**
 * What the solver returns. Plain data, SI units, keyed by the document's element ids.
 */
import type { Id } from '../model/types';

/** Finding severity: stop (must fix), caution (look at it), note (for information). */
export type FindingLevel = 'stop' | 'caution' | 'note';

/** A problem or remark tied to elements, from the one findings catalogue. */
export interface Finding {
  /** Stable code from the catalogue, e.g. 'below-vapour-pressure'. */
  code: string;
  level: FindingLevel;
  /** Plain-words message naming the element (and chainage where it applies). */
  message: string;
  /** Elements at fault (nodes or pipes). */
  elements: Id[];
  /** Chainage along the route, m, when the finding sits on a route. */
  chainage?: number;
}

/** Flow regime of a pipe. */
export type FlowRegime = 'laminar' | 'transitional' | 'turbulent' | 'no-flow';

export interface PipeResult {
  /** Volumetric flow, m³/s, positive from `from` to `to`. */
  flow: number;
  /** Mean velocity, m/s (signed like flow). */
  velocity: number;
  reynolds: number;
  regime: FlowRegime;
  frictionFactor: number;
  /** Friction loss along the pipe, m of liquid. */
  frictionLoss: number;
  /** Entrance/exit losses charged to this pipe at vessel nozzles, m. */
  endLosses: number;
  /**
   * Loss of the fittings the pipe carries (its fittings list and lumped K), m; 0 or absent when
   * it carries none. Drawn fitting nodes are not counted here (their loss is the node's).
   */
  fittingLoss?: number;
  /** Loss coefficient of the pipe's fittings at this flow (referred to its velocity); absent when none. */
  fittingK?: number;
  innerDiameter: number;
  /** HGL at the pipe's `from` end, m (inside the pipe, after any entrance loss). */
  headFrom?: number;
  /** HGL at the pipe's `to` end, m (inside the pipe, before any exit loss). */
  headTo?: number;
  /** EGL at the pipe's `from` end, m. */
  totalHeadFrom?: number;
  /** EGL at the pipe's `to` end, m. */
  totalHeadTo?: number;
  /** Elevation of the pipe's `from` end (its port), m. */
  elevationFrom?: number;
  /** Elevation of the pipe's `to` end (its port), m. */
  elevationTo?: number;
}

export interface PortResult {
  /** Piezometric head (HGL) at the port, m. */
  head: number;
  /** Total head (EGL) at the port, m. */
  totalHead: number;
  pressureAbs: number;
  pressureGauge: number;
  /** Velocity at the port, m/s. */
  velocity: number;
  /** Port elevation, m. */
  elevation: number;
}

export interface NodeResult {
  /** Result at each of the node's ports, by port name. */
  ports: Record<string, PortResult>;
  /** Flow through a two-port node, m³/s, positive from 'in'/'suction' to 'out'/'discharge'. */
  flow?: number;
  /** Head loss across a two-port node (fitting, valve), m; negative across a pump. */
  headLoss?: number;
  /** Loss coefficient used (fittings), referred to the inlet velocity. */
  lossCoefficient?: number;
}

export interface PumpResult {
  flow: number;
  head: number;
  npshAvailable: number;
  npshRequired: number;
  /** NPSHa − NPSHr, m. */
  npshMargin: number;
  /** NPSHa / NPSHr. */
  npshRatio: number;
  efficiency: number;
  /** Shaft power, W. */
  shaftPower: number;
  /**
   * Flow as a fraction of best-efficiency flow (at running speed); absent when the pump has no
   * best-efficiency flow (stopped, no efficiency curve, or a flat one: one point or all equal).
   */
  bepFraction?: number;
}

export interface ControlValveResult {
  flow: number;
  pressureDrop: number;
  opening: number;
  /** Effective flow coefficient at this opening, Kv (m³/h at 1 bar). */
  kv: number;
  /** Pressure drop at which flow chokes (IEC 60534-2-1), Pa. */
  chokedPressureDrop: number;
  choked: boolean;
  /**
   * True when the valve chokes and the solve holds its flow at the choked flow (the flow shown
   * is then the most the valve passes at its inlet pressure); absent or false otherwise.
   */
  flowLimited?: boolean;
}

/** Liquid and site state the solve used. */
export interface FluidState {
  density: number;
  viscosity: number;
  vapourPressure: number;
  atmosphericPressure: number;
  temperature: number;
  liquidName: string;
}

/** The whole result of one solve. */
export interface SolveResult {
  caseId: Id | null;
  converged: boolean;
  iterations: number;
  /** Largest head-balance residual at the end, m. */
  residual: number;
  /** Largest mass-balance error at any node, m³/s. */
  massImbalance: number;
  fluid: FluidState;
  pipes: Record<Id, PipeResult>;
  nodes: Record<Id, NodeResult>;
  pumps: Record<Id, PumpResult>;
  controlValves: Record<Id, ControlValveResult>;
  findings: Finding[];
}

/** One point of a profile along a route. */
export interface Station {
  /** Distance along the route, m. */
  chainage: number;
  /** Elevation of the pipe centreline (or liquid level at a vessel), m. */
  elevation: number;
  /** Hydraulic grade line, m. */
  hgl: number;
  /** Energy grade line, m. */
  egl: number;
  /** z + (p_v − p_atm)/ρg: where the HGL falls below it, p_abs < p_v. */
  vapourLine: number;
  pressureAbs: number;
  pressureGauge: number;
  /** p_abs − p_v, Pa. */
  vapourMargin: number;
  /** The element this station sits on. */
  elementId: Id;
  /** Where on that element: along a pipe, just before / after a node, or a vessel level. */
  at: 'pipe' | 'node-in' | 'node-out' | 'level';
}

/** A profile: stations in order of chainage and the route it follows. */
export interface Profile {
  route: Id[];
  stations: Station[];
}
