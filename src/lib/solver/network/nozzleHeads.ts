/**
 * What a pipe on a vessel nozzle sees: the fixed head at the nozzle and its exit loss.
 *
 * A vessel's liquid is at rest, so below its surface the total head is the same everywhere
 * (hydrostatics): level + (p_gas − p_atm)/ρg. A submerged nozzle (centreline at or below the
 * surface) sees that head. A nozzle above the surface opens into the gas space, where the
 * pressure is the gas pressure (p_atm when the vessel is open; the gas column's own weight is
 * neglected): the pipe on it meets the head z_nozzle + (p_gas − p_atm)/ρg. Both are
 * max(level, z_nozzle) + (p_gas − p_atm)/ρg, which is continuous as the level passes the
 * nozzle and depends on the level and the nozzle only, never on the flow: the global gradient
 * method sees one more fixed head and nothing switches between its iterations.
 *
 * Liquid can enter the vessel through a nozzle above the surface (it falls through the gas
 * onto the surface; the fall is not a pipe loss) but cannot leave through one as liquid: the
 * nozzle would draw gas. The solve still uses the nozzle's head then, and the findings say
 * the flow is not physical (findings/nozzleLevel.ts).
 */
import type { Boundary, Nozzle, Vessel } from '../../model/types';
import { EXIT_K } from '../../physics/fittings/entranceExit';

/** (p_gas − p_atm)/ρg of a vessel's gas space, m: 0 when it is open to the atmosphere. */
export function vesselGasHead(vessel: Vessel, atmosphericPressure: number, rhoG: number): number {
  return vessel.open ? 0 : (vessel.gasPressureAbs - atmosphericPressure) / rhoG;
}

/**
 * What a vessel or a boundary holds: the fixed head of a vessel (liquid level plus gas head) or
 * of a pressure boundary (its elevation plus its gauge pressure head), m, with the vessel's gas
 * head; the demand of a boundary that holds a flow (m³/s leaving the sheet there); or why it
 * cannot be used (the words go into the invalid-input finding that leaves it out of the solve).
 */
export function fixedHeadOf(
  node: Vessel | Boundary,
  atmosphericPressure: number,
  rhoG: number,
): { head: number; gas: number } | { demand: number } | { problem: string } {
  if (node.kind === 'boundary' && node.holds === 'flow') {
    const demand = node.outflow ?? 0;
    return Number.isFinite(demand)
      ? { demand }
      : { problem: 'its flow is not a number; it is left out of the solve' };
  }
  if (node.kind === 'boundary') {
    const head = node.z + (node.pressureAbs - atmosphericPressure) / rhoG;
    return Number.isFinite(head) && node.pressureAbs >= 0
      ? { head, gas: 0 }
      : { problem: 'its pressure is not usable; it is left out of the solve' };
  }
  const gas = vesselGasHead(node, atmosphericPressure, rhoG);
  const head = node.liquidLevel + gas;
  return Number.isFinite(head) && (node.open || node.gasPressureAbs > 0)
    ? { head, gas }
    : { problem: 'its liquid level or gas pressure is not usable; it is left out of the solve' };
}

/** Whether a nozzle's centreline is above the vessel's liquid surface (it opens into the gas). */
export function isAboveLevel(vessel: Vessel, nozzle: Nozzle): boolean {
  return nozzle.z > vessel.liquidLevel;
}

/**
 * Fixed total head a pipe on a nozzle above the liquid meets, m (gauge-referenced):
 * z_nozzle + (p_gas − p_atm)/ρg, the gas pressure at the nozzle's own elevation.
 */
export function gasSpaceHead(nozzle: Nozzle, gasHead: number): number {
  return nozzle.z + gasHead;
}

/**
 * Entrance and exit K of a nozzle above the liquid. Liquid leaving the pipe there is a free
 * jet: its pressure at the exit plane is that of the gas around it, so its whole velocity head
 * is lost beyond the pipe end, K = 1 (free jet at ambient pressure, and exit K = 1.0 for any
 * pipe exit into a large space: Crane Technical Paper No. 410, A-29 — from memory). A typed exit
 * K above 1 is kept (losses in the nozzle itself); one below 1 would recover pressure below the
 * gas pressure, which a free jet cannot, so it counts as 1. The entrance K is kept as typed.
 */
export function freeDischargeEnd(nozzle: Nozzle): { entranceK: number; exitK: number } {
  return { entranceK: nozzle.entranceK, exitK: Math.max(EXIT_K, nozzle.exitK) };
}
