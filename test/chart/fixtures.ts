/**
 * Hand-made profiles for the chart tests. Stations are built from elevation and HGL with the
 * definitions in DESIGN.md (HGL = z + p_gauge/ρg; vapour line = z + (p_v − p_atm)/ρg), so every
 * station is self-consistent. Liquid values are invented round numbers, not property data.
 */
import type { HeadrouteDocument, SheetNode } from '../../src/lib/model/types';
import type { Profile, SolveResult, Station } from '../../src/lib/solver/types';

export const RHO = 1000;
export const G = 9.80665;
export const P_ATM = 101325;
export const P_VAPOUR = 20000;
export const RHO_G = RHO * G;

/** A station at a chainage from its elevation, HGL and velocity head. */
export function station(
  chainage: number,
  elevation: number,
  hgl: number,
  elementId = 'P1',
  at: Station['at'] = 'pipe',
  velocityHead = 0.2,
): Station {
  const pressureGauge = RHO_G * (hgl - elevation);
  const pressureAbs = P_ATM + pressureGauge;
  return {
    chainage,
    elevation,
    hgl,
    egl: hgl + velocityHead,
    vapourLine: elevation + (P_VAPOUR - P_ATM) / RHO_G,
    pressureAbs,
    pressureGauge,
    vapourMargin: pressureAbs - P_VAPOUR,
    elementId,
    at,
  };
}

/**
 * Feed tank → pump → rack high point (waypoint) → day tank, laid out the way
 * src/lib/solver/profile.ts lays out stations: a vessel gives its liquid level only, a pump a
 * station on each side, a waypoint none (the pipe ends on either side sit at it). The HGL dips
 * under the vapour line over the high point, between stations.
 */
export function demoProfile(): Profile {
  return {
    route: ['T1', 'PU', 'W1', 'T2'],
    stations: [
      station(0, 5, 5, 'T1', 'level', 0),
      station(0, 1, 4.8, 'P1', 'pipe'),
      station(20, 0.5, 4.5, 'P1', 'pipe'),
      station(20, 0.5, 4.5, 'PU', 'node-in'),
      station(20, 0.5, 34.5, 'PU', 'node-out'),
      station(20, 0.5, 34.5, 'P2', 'pipe'),
      station(70, 15.25, 27.25, 'P2', 'pipe'),
      station(120, 30, 20, 'P2', 'pipe'),
      station(120, 30, 20, 'P3', 'pipe'),
      station(220, 8, 9, 'P3', 'pipe'),
      station(220, 9, 9, 'T2', 'level', 0),
    ],
  };
}

function node(n: Partial<SheetNode> & Pick<SheetNode, 'id' | 'kind' | 'name'>): SheetNode {
  return { x: 0, y: 0, z: 0, ...n } as SheetNode;
}

/** A document holding the nodes of demoProfile (pipes kept minimal). */
export function demoDocument(): HeadrouteDocument {
  const nodes: Record<string, SheetNode> = {
    T1: node({ id: 'T1', kind: 'vessel', name: 'Feed tank', liquidLevel: 5 } as never),
    PU: node({ id: 'PU', kind: 'pump', name: 'Transfer pump' } as never),
    W1: node({ id: 'W1', kind: 'waypoint', name: 'Rack high point', z: 30 }),
    T2: node({ id: 'T2', kind: 'vessel', name: 'Day tank', liquidLevel: 9 } as never),
  };
  return {
    format: 'headroute',
    version: 1,
    name: 'Tank farm transfer, "north" <A&B>',
    settings: {
      liquid: { kind: 'library', id: 'water' },
      temperature: 333.15,
      siteElevation: 0,
      atmosphericPressureOverride: null,
      unitSystem: 'SI',
      npshMargin: { ratio: 1.1, metres: 1 },
      velocityGuidance: { suctionMax: 1.5, dischargeMin: 0.9, dischargeMax: 3 },
    },
    nodes,
    pipes: {},
    cases: { hot: { id: 'hot', name: 'Hot liquid', overrides: { temperature: 353.15 } } },
    routes: {},
  };
}

/** A solve result carrying what the chart reads: fluid state and one pump. */
export function demoResult(): SolveResult {
  return {
    caseId: 'hot',
    converged: true,
    iterations: 5,
    residual: 0,
    massImbalance: 0,
    fluid: {
      density: RHO,
      viscosity: 0.001,
      vapourPressure: P_VAPOUR,
      atmosphericPressure: P_ATM,
      temperature: 353.15,
      liquidName: 'Water',
    },
    pipes: {},
    nodes: {},
    pumps: {
      PU: {
        flow: 0.01,
        head: 30,
        npshAvailable: 11.8,
        npshRequired: 3.2,
        npshMargin: 8.6,
        npshRatio: 11.8 / 3.2,
        efficiency: 0.7,
        shaftPower: 4200,
        bepFraction: 0.9,
      },
    },
    controlValves: {},
    findings: [],
  };
}
