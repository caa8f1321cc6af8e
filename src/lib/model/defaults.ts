/**
 * Default elements. Each default is a plausible piece of plant so a sheet solves as soon as it
 * is connected: a 2" Sch 40 carbon-steel pipe 10 m long; a small end-suction water pump of about
 * 30 m shut-off head with its best efficiency near 20 m³/h at 2900 rpm; open tanks with an outlet
 * nozzle near the bottom and an inlet near the top. Values are invented, typical of the trade.
 */
import { CURRENT_VERSION } from './file/version';
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

function points(rows: Array<[flowM3h: number, value: number]>): PumpPoint[] {
  return rows.map(([q, value]) => ({ flow: q * M3H, value }));
}

/** A new node of `kind` at sheet position `at`, with id `id` (also its first name). */
export function createNode(kind: NodeKind, at: { x: number; y: number }, id: Id): SheetNode {
  const base = { id, name: id, x: at.x, y: at.y, z: 0 };
  switch (kind) {
    case 'vessel':
      return {
        ...base,
        kind,
        open: true,
        gasPressureAbs: STANDARD_ATMOSPHERE,
        liquidLevel: 3,
        height: 5,
        nozzles: [
          // Entrance K 0.5 (sharp-edged) and exit K 1.0: common handbook values, from memory.
          { id: 'N1', z: 0.3, entranceK: 0.5, exitK: 1 },
          { id: 'N2', z: 4.5, entranceK: 0.5, exitK: 1 },
        ],
      } satisfies Vessel;
    case 'pump':
      return {
        ...base,
        kind,
        headCurve: points([
          [0, 30],
          [10, 29],
          [20, 26],
          [30, 20],
        ]),
        npshrCurve: points([
          [5, 1.5],
          [20, 2.2],
          [30, 3.5],
        ]),
        efficiencyCurve: points([
          [5, 0.35],
          [10, 0.55],
          [20, 0.68],
          [30, 0.6],
        ]),
        ratedSpeed: 2900,
        speed: 2900,
        running: true,
        mode: 'rating',
        dutyFlow: 20 * M3H,
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
        ratedCoefficient: 63,
        coefficientUnit: 'Kv',
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
      // A header at about 2 barg (sea level): plausible as a supply or as a delivery point.
      return { ...base, kind, pressureAbs: STANDARD_ATMOSPHERE + 2e5 } satisfies Boundary;
  }
}

/** A new pipe from `from` to `to` with id `id`: 2" Sch 40 carbon steel, 10 m. */
export function createPipe(from: PortRef, to: PortRef, id: Id): Pipe {
  return {
    id,
    kind: 'pipe',
    name: id,
    from: { ...from },
    to: { ...to },
    length: 10,
    bore: { mode: 'catalogue', nominalSize: '2', schedule: '40' },
    material: 'carbon-steel',
    roughness: null,
    designPressureGauge: null,
  };
}
