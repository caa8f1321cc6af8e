/**
 * The Headroute document: plain, serialisable records keyed by id.
 *
 * All quantities are SI inside: metres, seconds, kilograms, kelvin, pascals.
 * Pressures named `...Abs` are absolute, `...Gauge` are gauge (relative to the site's
 * atmospheric pressure). Plan positions (x, y) are sheet units and never enter the physics.
 */

import type { FittingType, LossMethod } from '../physics/fittings/fittingTypes';
import type { LiquidChoice, UserLiquidRow } from '../physics/liquids/liquidChoice';

/** Identifier of a node, pipe, case or route; unique within its document */
export type Id = string;

/** The liquid choice and fitting types belong to physics; the document re-exports them. */
export type { FittingType, LiquidChoice, LossMethod, UserLiquidRow };

/** A connection end: a node and one of its ports. */
export interface PortRef {
  node: Id;
  port: string;
}

interface NodeBase {
  id: Id;
  name: string;
  /** Plan position on the sheet, sheet units (schematic). */
  x: number;
  y: number;
  /** Elevation of the node's centreline (vessel: its bottom), m. */
  z: number;
}

/** A vessel nozzle: a port with its own elevation. */
export interface Nozzle {
  /** Port name, unique within the vessel. */
  id: string;
  /** Nozzle centreline elevation, m. */
  z: number;
  /** Loss coefficient when liquid leaves the vessel into the pipe (pipe entrance). */
  entranceK: number;
  /** Loss coefficient when liquid enters the vessel from the pipe (pipe exit). */
  exitK: number;
  /** Shell side the nozzle is drawn on (drawing only); absent uses the default in ports.ts. */
  side?: 'left' | 'right';
}

/**
 * A tank or vessel: a fixed head at its liquid level (plus gas-space pressure if closed). A pipe
 * through a nozzle above the liquid sees the gas pressure at the nozzle's own height instead
 * (it discharges into the gas space); drawing liquid out through one is a stop finding.
 */
export interface Vessel extends NodeBase {
  kind: 'vessel';
  /** Open to atmosphere, or closed with a gas-space pressure. */
  open: boolean;
  /** Gas-space pressure, Pa abs; used when `open` is false. */
  gasPressureAbs: number;
  /** Liquid surface elevation, m. */
  liquidLevel: number;
  /** Height of the vessel shell above z, m (drawing and sanity checks only). */
  height: number;
  nozzles: Nozzle[];
}

/** One point of a pump's test curve at rated speed. */
export interface PumpPoint {
  /** Volumetric flow, m³/s. */
  flow: number;
  /** Value at that flow: head in m, NPSHr in m, or efficiency as a fraction 0–1. */
  value: number;
}

/** A centrifugal pump. Ports: 'suction', 'discharge'. Never runs backwards. */
export interface Pump extends NodeBase {
  kind: 'pump';
  /** Head against flow at rated speed. */
  headCurve: PumpPoint[];
  /** NPSH required against flow at rated speed. */
  npshrCurve: PumpPoint[];
  /** Efficiency (0–1) against flow at rated speed. */
  efficiencyCurve: PumpPoint[];
  /** Rated speed, rpm. */
  ratedSpeed: number;
  /** Running speed, rpm (affinity laws). */
  speed: number;
  /** Off means closed: no flow. */
  running: boolean;
  /** Rating uses the curve; duty fixes `dutyFlow` and reports the head the pump must give. */
  mode: 'rating' | 'duty';
  /** Duty flow, m³/s; used when mode is 'duty'. */
  dutyFlow: number;
  /** Suction flange centreline elevation, m; absent means z (NPSHa is taken at this flange). */
  suctionElevation?: number;
  /** Discharge flange centreline elevation, m; absent means z. */
  dischargeElevation?: number;
}

/**
 * An inline fitting, manual valve, check valve, strainer, meter, reducer/expander or
 * restriction orifice. Ports: 'in', 'out'. A tee is drawn as a junction plus a fitting of
 * type tee-run or tee-branch on the leg it applies to.
 */
export interface Fitting extends NodeBase {
  kind: 'fitting';
  fittingType: FittingType;
  lossMethod: LossMethod;
  /** Loss coefficient used when lossMethod is 'fixed' (referred to the inlet velocity). */
  fixedK: number;
  /** Manual valves: open or shut. Check valves are always free to close on reverse flow. */
  closed: boolean;
  /** Reducer/expander: inlet and outlet inner diameters, m. */
  inletDiameter?: number;
  outletDiameter?: number;
  /** Reducer/expander: included cone angle, degrees (180 = sudden). */
  coneAngle?: number;
  /** Restriction orifice: bore diameter, m. */
  boreDiameter?: number;
}

/** Control-valve inherent characteristic. */
export type ValveCharacteristic = 'linear' | 'equal-percentage' | 'quick-opening';

/** A control valve sized by IEC 60534-2-1. Ports: 'in', 'out'. */
export interface ControlValve extends NodeBase {
  kind: 'control-valve';
  /** Rated flow coefficient at full opening, in the unit given. */
  ratedCoefficient: number;
  coefficientUnit: 'Kv' | 'Cv';
  characteristic: ValveCharacteristic;
  /** Inherent rangeability (e.g. 50). */
  rangeability: number;
  /** Travel, 0 (shut) to 1 (fully open). */
  opening: number;
  /** Liquid pressure recovery factor FL (IEC 60534-2-1). */
  pressureRecoveryFactor: number;
}

/** A route vertex whose only job is to carry an elevation. Ports: 'in', 'out'. */
export interface Waypoint extends NodeBase {
  kind: 'waypoint';
}

/**
 * A branch point where several pipes meet. Port 'hub' takes any number of pipes. It may take a
 * fixed draw-off (a known flow leaving the sheet there, positive) or supply (negative).
 */
export interface Junction extends NodeBase {
  kind: 'junction';
  /** Flow leaving the sheet at the branch point, m³/s; negative enters it; absent means none. */
  outflow?: number;
}

/**
 * Where the sheet meets plant that is not drawn (a header, a battery limit, a consumer). It
 * holds either a pressure (the default) or a flow: a draw-off of known flow to a user not on
 * the sheet (positive outflow) or a supply of known flow into it (negative). Port: 'p'.
 */
export interface Boundary extends NodeBase {
  kind: 'boundary';
  /** Fixed pressure, Pa abs (kept, unused, while the boundary holds a flow). */
  pressureAbs: number;
  /** What the boundary fixes; absent means 'pressure'. */
  holds?: 'pressure' | 'flow';
  /** Flow leaving the sheet here while it holds a flow, m³/s; negative enters the sheet. */
  outflow?: number;
}

/** Any node on the sheet. */
export type SheetNode = Vessel | Pump | Fitting | ControlValve | Waypoint | Junction | Boundary;
export type NodeKind = SheetNode['kind'];

/** Pipe bore: from a catalogue size and schedule, or typed in. */
export type PipeBore =
  | { mode: 'catalogue'; nominalSize: string; schedule: string }
  | { mode: 'typed'; innerDiameter: number };

/**
 * Fitting types a pipe's fittings list may carry. Not reducers, expanders or orifices (their K
 * comes from diameters of their own) nor check valves (they stop reverse flow): those are
 * drawn as fitting nodes.
 */
export type PipeFittingType = Exclude<
  FittingType,
  'reducer' | 'expander' | 'restriction-orifice' | 'swing-check-valve' | 'lift-check-valve'
>;

/** One line of a pipe's fittings list: `count` fittings of one type, K as for a fitting node. */
export interface PipeFittingItem {
  fittingType: PipeFittingType;
  /** How many of them (a whole number, at least 1). */
  count: number;
  lossMethod: LossMethod;
  /** K of one fitting when lossMethod is 'fixed' (and where a table has no row). */
  fixedK: number;
}

/**
 * Where a pipe's fitting losses act along it: at its inlet (the `from` end), its outlet (the
 * `to` end), spread evenly along it, or at one chainage from its `from` end.
 */
export type FittingLossPlace = 'inlet' | 'outlet' | 'spread' | 'chainage';

/** Fittings carried by a pipe instead of being drawn as nodes (K referred to the pipe's bore). */
export interface PipeFittings {
  items: PipeFittingItem[];
  /** An extra lumped K, referred to the pipe's velocity (0 for none). */
  lumpedK: number;
  place: FittingLossPlace;
  /** Chainage from the pipe's `from` end, m; used when place is 'chainage'. */
  chainage?: number;
}

/** A pipe: a connection record between two ports. Flow is positive from `from` to `to`. */
export interface Pipe {
  id: Id;
  kind: 'pipe';
  name: string;
  from: PortRef;
  to: PortRef;
  /** Developed length, m. */
  length: number;
  bore: PipeBore;
  /** Material key in the roughness table. */
  material: string;
  /** Absolute roughness override, m; null uses the material's. */
  roughness: number | null;
  /** Design pressure, Pa gauge; null when not set. */
  designPressureGauge: number | null;
  /** Fittings on the pipe (elbows, valves… not drawn as nodes); absent means none. */
  fittings?: PipeFittings;
}

/** NPSH margin rule: both must hold. */
export interface NpshMarginRule {
  /** Minimum NPSHa/NPSHr. */
  ratio: number;
  /** Minimum NPSHa − NPSHr, m. */
  metres: number;
}

/** Velocity guidance, m/s. */
export interface VelocityGuidance {
  suctionMax: number;
  dischargeMin: number;
  dischargeMax: number;
}

/** Project-wide settings. */
export interface ProjectSettings {
  liquid: LiquidChoice;
  /** Liquid temperature, K. */
  temperature: number;
  /** Site elevation above sea level, m (ISA atmosphere). */
  siteElevation: number;
  /** Typed atmospheric pressure, Pa abs; null uses the ISA value at the site elevation. */
  atmosphericPressureOverride: number | null;
  unitSystem: 'SI' | 'US';
  npshMargin: NpshMarginRule;
  velocityGuidance: VelocityGuidance;
}

/** Overrides a case applies on top of the base document; absent means "as the base". */
export interface CaseOverrides {
  liquid?: LiquidChoice;
  temperature?: number;
  atmosphericPressure?: number;
  vessels?: Record<Id, { liquidLevel?: number; gasPressureAbs?: number }>;
  pumps?: Record<
    Id,
    { running?: boolean; speed?: number; mode?: 'rating' | 'duty'; dutyFlow?: number }
  >;
  controlValves?: Record<Id, { opening?: number }>;
  /** A boundary's pressure (Pa abs) or, when it holds a flow, its outflow (m³/s). */
  boundaries?: Record<Id, { pressureAbs?: number; outflow?: number }>;
  /** Manual valves (fitting nodes) opened or shut. */
  valves?: Record<Id, { closed?: boolean }>;
  /** A branch point's draw-off (m³/s leaving; negative is a supply). */
  junctions?: Record<Id, { outflow?: number }>;
}

/** A named set of overrides (an operating case). */
export interface Case {
  id: Id;
  name: string;
  overrides: CaseOverrides;
}

/** A stored route: the nodes it passes, in order of flow. */
export interface Route {
  id: Id;
  name: string;
  nodes: Id[];
}

/** The project document: what a `*.headroute.json` file holds */
export interface HeadrouteDocument {
  format: 'headroute';
  version: number;
  name: string;
  settings: ProjectSettings;
  nodes: Record<Id, SheetNode>;
  pipes: Record<Id, Pipe>;
  cases: Record<Id, Case>;
  routes: Record<Id, Route>;
}
