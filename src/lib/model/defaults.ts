/**
 * Default elements. Each default is a plausible piece of plant so a sheet solves as soon as it
 * is connected: a 2" Sch 40 carbon-steel pipe 10 m long; a small end-suction water pump of about
 * 30 m shut-off head with its best efficiency near 20 m³/h at 2900 rpm; open tanks with an outlet
 * nozzle near the bottom and an inlet near the top. Values are invented, typical of the trade.
 *
 * A part placed in a project shown in US units gets round values in those units (a 30 ft pipe,
 * a 10 ft level, a pump curve in gpm and ft, a Cv valve, a 30 psig header) rather than metric
 * defaults that would read as 32.81 ft or 9.843 ft. Inside they are SI like everything else.
 */
import { CURRENT_VERSION } from './file/version';
import { ENTRANCE_K, EXIT_K } from '../physics/fittings/entranceExit';
import type { UnitSystem } from '../units/quantities';
import type {
  Boundary,
  ControlValve,
  Fitting,
  HeadrouteDocument,
  Id,
  Junction,
  NodeKind,
  Pipe,
  PortRef,
  ProjectSettings,
  Pump,
  PumpPoint,
  SheetNode,
  Vessel,
  Waypoint,
} from './types';

/** Standard atmosphere at sea level, Pa (ISO 2533). */
export const STANDARD_ATMOSPHERE = 101_325;
/** 0 °C in kelvin. */
export const ZERO_CELSIUS = 273.15;

const M3H = 1 / 3600; // one m³/h in m³/s
// Exact conversion factors, NIST SP 811 (2008) Appendix B.8: ft = 0.3048 m, US gal = 231 in³,
// psi = lbf/in² with lbf = 0.45359237 kg × 9.80665 m/s².
const FT = 0.3048;
const GPM = (231 * 0.0254 ** 3) / 60; // one US gal/min in m³/s
const PSI = (0.45359237 * 9.80665) / 0.0254 ** 2;

/** Round default values of new parts, per display unit system (SI values). */
interface PartDefaults {
  pipeLength: number;
  vesselLevel: number;
  vesselHeight: number;
  outletZ: number;
  inletZ: number;
  /** [flow m³/s, value] rows for the head, NPSHr and efficiency curves, and the duty flow. */
  head: Array<[number, number]>;
  npshr: Array<[number, number]>;
  efficiency: Array<[number, number]>;
  dutyFlow: number;
  valve: { ratedCoefficient: number; coefficientUnit: 'Kv' | 'Cv' };
  boundaryGauge: number;
}

const SI_DEFAULTS: PartDefaults = {
  pipeLength: 10,
  vesselLevel: 3,
  vesselHeight: 5,
  outletZ: 0.3,
  inletZ: 4.5,
  head: [
    [0, 30],
    [10 * M3H, 29],
    [20 * M3H, 26],
    [30 * M3H, 20],
  ],
  npshr: [
    [5 * M3H, 1.5],
    [20 * M3H, 2.2],
    [30 * M3H, 3.5],
  ],
  efficiency: [
    [5 * M3H, 0.35],
    [10 * M3H, 0.55],
    [20 * M3H, 0.68],
    [30 * M3H, 0.6],
  ],
  dutyFlow: 20 * M3H,
  valve: { ratedCoefficient: 63, coefficientUnit: 'Kv' },
  // A header at about 2 barg (sea level): plausible as a supply or as a delivery point.
  boundaryGauge: 2e5,
};

/** The same pieces of plant in round US figures (about the SI defaults). */
const US_DEFAULTS: PartDefaults = {
  pipeLength: 30 * FT,
  vesselLevel: 10 * FT,
  vesselHeight: 16 * FT,
  outletZ: 1 * FT,
  inletZ: 15 * FT,
  head: [
    [0, 100 * FT],
    [45 * GPM, 95 * FT],
    [90 * GPM, 85 * FT],
    [130 * GPM, 65 * FT],
  ],
  npshr: [
    [20 * GPM, 5 * FT],
    [90 * GPM, 7 * FT],
    [130 * GPM, 11.5 * FT],
  ],
  efficiency: [
    [20 * GPM, 0.35],
    [45 * GPM, 0.55],
    [90 * GPM, 0.68],
    [130 * GPM, 0.6],
  ],
  dutyFlow: 90 * GPM,
  valve: { ratedCoefficient: 73, coefficientUnit: 'Cv' },
  boundaryGauge: 30 * PSI,
};

function partDefaults(system: UnitSystem): PartDefaults {
  return system === 'US' ? US_DEFAULTS : SI_DEFAULTS;
}

/** Default project settings: water at 20 °C at sea level, SI display. */
export function defaultSettings(): ProjectSettings {
  return {
    liquid: { kind: 'library', id: 'water' },
    temperature: ZERO_CELSIUS + 20,
    siteElevation: 0,
    atmosphericPressureOverride: null,
    unitSystem: 'SI',
    // Common practice: NPSHa at least 1.1 × NPSHr and at least 1 m above it.
    npshMargin: { ratio: 1.1, metres: 1 },
    // Common practice for water: suction up to about 1.5 m/s, discharge about 1–3 m/s.
    velocityGuidance: { suctionMax: 1.5, dischargeMin: 1, dischargeMax: 3 },
  };
}

/** A new, empty project document */
export function createDocument(name: string): HeadrouteDocument {
  return {
    format: 'headroute',
    version: CURRENT_VERSION,
    name,
    settings: defaultSettings(),
    nodes: {},
    pipes: {},
    cases: {},
    routes: {},
  };
}

function points(rows: Array<[flow: number, value: number]>): PumpPoint[] {
  return rows.map(([flow, value]) => ({ flow, value }));
}

/**
 * A new node of `kind` at sheet position `at`, with id `id` (also its first name), with round
 * default values in the units of `system`.
 */
export function createNode(
  kind: NodeKind,
  at: { x: number; y: number },
  id: Id,
  system: UnitSystem = 'SI',
): SheetNode {
  const d = partDefaults(system);
  const base = { id, name: id, x: at.x, y: at.y, z: 0 };
  switch (kind) {
    case 'vessel':
      return {
        ...base,
        kind,
        open: true,
        gasPressureAbs: STANDARD_ATMOSPHERE,
        liquidLevel: d.vesselLevel,
        height: d.vesselHeight,
        nozzles: [
          // Entrance K 0.5 (sharp-edged) and exit K 1.0: common handbook values, from memory.
          { id: 'N1', z: d.outletZ, entranceK: ENTRANCE_K, exitK: EXIT_K },
          { id: 'N2', z: d.inletZ, entranceK: ENTRANCE_K, exitK: EXIT_K },
        ],
      } satisfies Vessel;
    case 'pump':
      return {
        ...base,
        kind,
        headCurve: points(d.head),
        npshrCurve: points(d.npshr),
        efficiencyCurve: points(d.efficiency),
        ratedSpeed: 2900,
        speed: 2900,
        running: true,
        mode: 'rating',
        dutyFlow: d.dutyFlow,
      } satisfies Pump;
    case 'fitting':
      return {
        ...base,
        kind,
        fittingType: 'elbow-90-standard',
        lossMethod: '3K',
        // Used only with the 'fixed' method; about 0.75 for a standard 90° elbow, from memory.
        fixedK: 0.75,
        closed: false,
      } satisfies Fitting;
    case 'control-valve':
      return {
        ...base,
        kind,
        ...d.valve,
        characteristic: 'equal-percentage',
        rangeability: 50,
        opening: 0.7,
        pressureRecoveryFactor: 0.9,
      } satisfies ControlValve;
    case 'waypoint':
      return { ...base, kind } satisfies Waypoint;
    case 'junction':
      return { ...base, kind } satisfies Junction;
    case 'boundary':
      return {
        ...base,
        kind,
        pressureAbs: STANDARD_ATMOSPHERE + d.boundaryGauge,
      } satisfies Boundary;
  }
}

/** A new pipe from `from` to `to` with id `id`: 2" Sch 40 carbon steel, 10 m (30 ft in US units). */
export function createPipe(from: PortRef, to: PortRef, id: Id, system: UnitSystem = 'SI'): Pipe {
  return {
    id,
    kind: 'pipe',
    name: id,
    from: { ...from },
    to: { ...to },
    length: partDefaults(system).pipeLength,
    bore: { mode: 'catalogue', nominalSize: '2', schedule: '40' },
    material: 'carbon-steel',
    roughness: null,
    designPressureGauge: null,
  };
}
