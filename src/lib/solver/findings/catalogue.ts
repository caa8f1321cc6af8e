/**
 * The one catalogue of findings: stable codes, their level, and the plain-words message of
 * each. Every finding the solver (and the profile along a route) reports is built here.
 * Messages name elements by their names; numbers are in the project's unit system and rounded
 * for reading (messageUnits.ts).
 */
import type { Id } from '../../model/types';
import type { UnitSystem } from '../../units/quantities';
import type { Finding, FindingLevel } from '../types';
import { messageUnits, type MessageUnits } from './messageUnits';

/** Every finding code with its level. Codes are stable: files and tests refer to them. */
export const FINDING_LEVELS = {
  'no-fixed-head': 'stop',
  'cut-off': 'stop',
  'broken-connection': 'stop',
  'invalid-input': 'stop',
  'no-convergence': 'stop',
  'below-vapour-pressure': 'stop',
  'npsh-below-required': 'stop',
  'control-valve-choked': 'stop',
  'above-design-pressure': 'stop',
  'pump-curve-missing': 'stop',
  'nozzle-above-level': 'stop',
  'forced-flow': 'stop',
  'level-outside-vessel': 'stop',
  'nozzle-outside-vessel': 'stop',
  'pipe-shorter-than-rise': 'stop',
  'non-finite-result': 'stop',
  'surge-cannot-run': 'stop',
  'surge-above-design-pressure': 'stop',
  'unconnected-port': 'caution',
  'npsh-margin-low': 'caution',
  vacuum: 'caution',
  'velocity-high': 'caution',
  'velocity-low': 'caution',
  'pump-off-bep': 'caution',
  'pump-at-shutoff': 'caution',
  'property-extrapolated': 'caution',
  'unknown-case': 'caution',
  'surge-column-separation': 'caution',
  'surge-assumption': 'caution',
  'laminar-flow': 'note',
  'transitional-flow': 'note',
  'reversed-flow': 'note',
  'non-return-closed': 'note',
  'npshr-curve-missing': 'note',
  'blocked-in': 'note',
  'surge-closure-time': 'note',
  'surge-peak-pressure': 'note',
  'surge-wave-speed-adjusted': 'note',
  'surge-not-modelled': 'note',
} as const satisfies Record<string, FindingLevel>;

/** A stable finding code. */
export type FindingCode = keyof typeof FINDING_LEVELS;

/** A finding with its level taken from the catalogue. */
export function finding(
  code: FindingCode,
  message: string,
  elements: Id[],
  chainage?: number,
): Finding {
  const result: Finding = { code, level: FINDING_LEVELS[code], message, elements };
  if (chainage !== undefined && Number.isFinite(chainage)) result.chainage = chainage;
  return result;
}

/** Quote an element's name for a message. */
function q(name: string): string {
  return `“${name}”`;
}

function list(names: string[], max = 6): string {
  const shown = names.slice(0, max).map(q);
  const more = names.length > max ? ` and ${names.length - max} more` : '';
  return shown.join(', ') + more;
}

function at(u: MessageUnits, chainage?: number): string {
  return chainage !== undefined && Number.isFinite(chainage)
    ? ` at chainage ${u.chainage(chainage)}`
    : '';
}

/** A flow in the message units, or in m³/s where it would round to nothing there. */
function smallFlow(u: MessageUnits, q: number): string {
  const shown = u.flow(q);
  return /^0\.0 /.test(shown) ? `${q.toExponential(1)} m³/s` : shown;
}

function fixed(value: number, digits: number): string {
  return Number.isFinite(value) ? value.toFixed(digits) : '–';
}

/**
 * Message builders, one per code, writing numbers in `system`'s units. Each returns a complete
 * Finding; quantities are passed in SI.
 */
export function findingsIn(system: UnitSystem) {
  const u = messageUnits(system);
  return {
    noFixedHead: (elements: Id[]) =>
      finding(
        'no-fixed-head',
        'Nothing on the sheet fixes a head: add a vessel or a header (fixed pressure) so the flows and pressures can be found.',
        elements,
      ),
    cutOff: (names: string[], elements: Id[]) =>
      finding(
        'cut-off',
        `${list(names)} ${names.length === 1 ? 'is' : 'are'} not connected to any vessel or header, so ${names.length === 1 ? 'its' : 'their'} pressures cannot be found; connect them or remove them.`,
        elements,
      ),
    /**
     * A fixed flow (duty pump, supply, draw-off) forced into (`flow` > 0) or out of a part that
     * reaches no fixed head except through shut elements (`blockers`) or capped ends.
     */
    forcedFlow: (
      sources: string[],
      blockers: string[],
      inside: string[],
      flow: number,
      elements: Id[],
    ) =>
      finding(
        'forced-flow',
        `${list(sources)} ${sources.length === 1 ? 'forces' : 'force'} ${smallFlow(u, Math.abs(flow))} ${flow > 0 ? 'into' : 'out of'} ${inside.length ? list(inside) : 'a line'}, which has no way ${flow > 0 ? 'out' : 'in'} but through ${blockers.length ? `${list(blockers)}, shut, stopped or non-return against it` : 'a capped end'}: no steady flow is possible, so that part is not solved. To solve it, ${blockers.length ? `open ${list(blockers)} (or turn a non-return element round), ` : ''}connect the line to a vessel or a boundary that holds a pressure, or stop the forcing element (a pump on its curve instead of a duty flow, a boundary holding a pressure instead of a flow).`,
        elements,
      ),
    /** Parts shut in behind shut or non-return elements: their pressure is not determined. */
    blockedIn: (names: string[], blockers: string[], elements: Id[]) =>
      finding(
        'blocked-in',
        `${list(names)} ${names.length === 1 ? 'is' : 'are'} shut in behind ${list(blockers)} with no flow: ${names.length === 1 ? 'its' : 'their'} pressure is not determined by the sheet, so none is shown and ${names.length === 1 ? 'it is' : 'they are'} left out of the checks.`,
        elements,
      ),
    /** A vessel's liquid surface below its bottom (`below`) or above its top. */
    levelOutsideVessel: (
      name: string,
      level: number,
      bottom: number,
      top: number,
      below: boolean,
      id: Id,
    ) =>
      finding(
        'level-outside-vessel',
        `Vessel ${q(name)}: its liquid surface elevation ${u.elevation(level)} is ${below ? `below its bottom (${u.elevation(bottom)}) by ${u.head(bottom - level)}` : `above its top (${u.elevation(top)}) by ${u.head(level - top)}`}; a vessel cannot hold liquid there. Correct the liquid surface elevation, the vessel's elevation or its height.`,
        [id],
      ),
    /** A vessel nozzle outside the shell (below the bottom or above the top). */
    nozzleOutsideVessel: (
      name: string,
      nozzle: string,
      nozzleZ: number,
      bottom: number,
      top: number,
      id: Id,
    ) =>
      finding(
        'nozzle-outside-vessel',
        `Vessel ${q(name)}: nozzle ${nozzle} at ${u.elevation(nozzleZ)} is outside the shell (${u.elevation(bottom)} to ${u.elevation(top)}), ${nozzleZ < bottom ? `${u.head(bottom - nozzleZ)} below the bottom` : `${u.head(nozzleZ - top)} above the top`}. Move the nozzle onto the shell or correct the vessel's elevation or height.`,
        [id],
      ),
    /** A pipe shorter than the straight-line rise between its ends. */
    pipeShorterThanRise: (name: string, length: number, rise: number, id: Id) =>
      finding(
        'pipe-shorter-than-rise',
        `Pipe ${q(name)}: its length ${u.head(length)} is less than the ${u.head(rise)} difference in elevation between its ends, ${u.head(rise - length)} too short. Lengthen it or correct the elevations of its ends.`,
        [id],
      ),
    /** A result that came out as NaN or ±Infinity, with the input that drove it. */
    nonFiniteResult: (name: string, cause: string, elements: Id[]) =>
      finding(
        'non-finite-result',
        `${q(name)}: its results are not finite numbers (${cause}), so none are shown; check that input.`,
        elements,
      ),
    /** A solve whose node balance misses its tolerance (the heads may have settled). */
    unbalanced: (imbalance: number, tolerance: number, names: string[], elements: Id[]) =>
      finding(
        'no-convergence',
        `The network solve did not balance: the flows into and out of ${names.length ? list(names, 3) : 'a node'} differ by ${Number.isFinite(imbalance) ? imbalance.toExponential(1) : 'a value that is not a number'} m³/s, more than the tolerance of ${tolerance.toExponential(1)} m³/s; the figures shown are not a solution.`,
        elements,
      ),
    brokenConnection: (pipeName: string, end: 'from' | 'to', node: string, port: string, id: Id) =>
      finding(
        'broken-connection',
        `Pipe ${q(pipeName)}: its ${end === 'from' ? 'start' : 'end'} is on port “${port}” of “${node}”, which does not exist; the pipe is left out of the solve.`,
        [id],
      ),
    invalidInput: (name: string, what: string, id: Id) =>
      finding('invalid-input', `${q(name)}: ${what}.`, [id]),
    noConvergence: (iterations: number, residual: number, names: string[], elements: Id[]) =>
      finding(
        'no-convergence',
        `The network solve did not settle after ${iterations} iterations (largest head imbalance ${u.headResidual(residual)}${names.length ? `, worst at ${list(names, 3)}` : ''}); the figures shown are not a solution.`,
        elements,
      ),
    belowVapourPressure: (
      name: string,
      where: string,
      pAbs: number,
      pv: number,
      id: Id,
      chainage?: number,
    ) =>
      finding(
        'below-vapour-pressure',
        `${q(name)}${where ? ` (${where})` : ''}${at(u, chainage)}: absolute pressure ${u.pressureAbs(pAbs)} is below the vapour pressure ${u.pressureAbs(pv)}. The liquid would flash or the column would separate here; the single-liquid-phase results beyond this point are not physical and only indicative.`,
        [id],
        chainage,
      ),
    npshBelowRequired: (name: string, npsha: number, npshr: number, id: Id) =>
      finding(
        'npsh-below-required',
        `Pump ${q(name)}: NPSH available ${u.head(npsha)} is below NPSH required ${u.head(npshr)}; the pump will cavitate.`,
        [id],
      ),
    npshMarginLow: (
      name: string,
      npsha: number,
      npshr: number,
      ruleRatio: number,
      ruleMetres: number,
      id: Id,
    ) =>
      finding(
        'npsh-margin-low',
        `Pump ${q(name)}: NPSH available ${u.head(npsha)} against ${u.head(npshr)} required (ratio ${fixed(npsha / npshr, 2)}, margin ${u.head(npsha - npshr)}) is inside the project's rule of at least ${fixed(ruleRatio, 2)} × and ${u.head(ruleMetres)}.`,
        [id],
      ),
    /** `limitedFlow`: the choked flow the solve holds the valve at, m³/s; null when it could not. */
    controlValveChoked: (
      name: string,
      dp: number,
      dpChoked: number,
      limitedFlow: number | null,
      id: Id,
    ) =>
      finding(
        'control-valve-choked',
        `Control valve ${q(name)}: pressure drop ${u.pressureDrop(dp)} exceeds the choked-flow limit ${u.pressureDrop(dpChoked)} (IEC 60534-2-1); the flow cannot rise with more drop and the valve will cavitate or flash. ${
          limitedFlow === null
            ? 'The flow shown assumes no choking and is too high.'
            : `The flow is held at the choked flow, ${u.flow(limitedFlow)}; what leaves the valve is not a single liquid phase, so the figures downstream of it are indicative.`
        }`,
        [id],
      ),
    aboveDesignPressure: (
      name: string,
      pGauge: number,
      design: number,
      id: Id,
      chainage?: number,
    ) =>
      finding(
        'above-design-pressure',
        `Pipe ${q(name)}${at(u, chainage)}: pressure ${u.ratingGauge(pGauge)} is above its design pressure ${u.ratingGauge(design)}.`,
        [id],
        chainage,
      ),
    /** Liquid shown leaving a vessel through a nozzle above its liquid surface. */
    nozzleAboveLevel: (
      vessel: string,
      nozzle: string,
      nozzleZ: number,
      level: number,
      pipe: string,
      elements: Id[],
    ) =>
      finding(
        'nozzle-above-level',
        `Nozzle ${nozzle} of ${q(vessel)} is above the liquid level (nozzle at ${u.elevation(nozzleZ)}, liquid at ${u.elevation(level)}): pipe ${q(pipe)} would draw gas, not liquid. The flow shown leaving through it is not physical; lower the nozzle or raise the level.`,
        elements,
      ),
    pumpCurveMissing: (name: string, id: Id) =>
      finding(
        'pump-curve-missing',
        `Pump ${q(name)} has no usable head curve, so it is treated as shut; give its curve points or run it in duty mode.`,
        [id],
      ),
    unconnectedPort: (name: string, port: string, id: Id) =>
      finding(
        'unconnected-port',
        `${q(name)} has nothing connected to its “${port}” port; it is treated as capped (no flow).`,
        [id],
      ),
    vacuum: (name: string, pGauge: number, id: Id, chainage?: number) =>
      finding(
        'vacuum',
        `Pipe ${q(name)}${at(u, chainage)} runs under vacuum (${u.pressureGauge(pGauge)}, the HGL is below the pipe): air can leak in at joints and vents.`,
        [id],
        chainage,
      ),
    velocityHigh: (name: string, velocity: number, limit: number, suction: boolean, id: Id) =>
      finding(
        'velocity-high',
        `Pipe ${q(name)}: velocity ${u.velocity(velocity)} is above the project's ${suction ? 'suction' : 'discharge'} guidance of ${u.velocity(limit)} (common practice).`,
        [id],
      ),
    velocityLow: (name: string, velocity: number, limit: number, id: Id) =>
      finding(
        'velocity-low',
        `Pipe ${q(name)}: velocity ${u.velocity(velocity)} is below the project's guidance of ${u.velocity(limit)} (common practice); solids may settle.`,
        [id],
      ),
    pumpOffBep: (name: string, fraction: number, id: Id) =>
      finding(
        'pump-off-bep',
        `Pump ${q(name)} runs at ${fixed(fraction * 100, 0)} % of its best-efficiency flow, outside 70–120 % (common practice): expect more vibration, recirculation or wear.`,
        [id],
      ),
    pumpAtShutoff: (name: string, id: Id) =>
      finding(
        'pump-at-shutoff',
        `Pump ${q(name)} runs but delivers no flow: the head against it is above its shut-off head, or its line is shut. A pump run dead-headed heats up.`,
        [id],
      ),
    propertyExtrapolated: (liquid: string, properties: string[], temperature: number) =>
      finding(
        'property-extrapolated',
        `${liquid}: ${properties.join(', ')} at ${u.temperature(temperature)} lies outside the range of its source and is extrapolated.`,
        [],
      ),
    unknownCase: (caseId: string) =>
      finding('unknown-case', `There is no case “${caseId}”; the base document was solved.`, []),
    laminarFlow: (name: string, reynolds: number, id: Id) =>
      finding('laminar-flow', `Pipe ${q(name)}: laminar flow (Re ${fixed(reynolds, 0)}).`, [id]),
    transitionalFlow: (name: string, reynolds: number, id: Id) =>
      finding(
        'transitional-flow',
        `Pipe ${q(name)}: transitional flow (Re ${fixed(reynolds, 0)}); its friction factor is an interpolation and uncertain.`,
        [id],
      ),
    reversedFlow: (name: string, id: Id) =>
      finding('reversed-flow', `Pipe ${q(name)}: the flow runs against its drawn direction.`, [id]),
    nonReturnClosed: (name: string, id: Id) =>
      finding('non-return-closed', `${q(name)} holds back reverse flow: it is closed (no flow).`, [
        id,
      ]),
    npshrCurveMissing: (name: string, id: Id) =>
      finding(
        'npshr-curve-missing',
        `Pump ${q(name)} has no NPSHr curve; its NPSH margin cannot be checked.`,
        [id],
      ),
    /** A span of a route where p_abs < p_v, located by chainage (the finding's chainage is its start). */
    routeBelowVapourPressure: (
      route: string,
      start: number,
      end: number,
      lowestAt: string,
      lowestMargin: number,
      lowestChainage: number,
      pv: number,
      elements: Id[],
    ) =>
      finding(
        'below-vapour-pressure',
        `Route ${q(route)}, chainage ${u.chainageSpan(start, end)}: absolute pressure is below the vapour pressure ${u.pressureAbs(pv)}, lowest ${u.pressureDrop(-lowestMargin)} under it at chainage ${u.chainage(lowestChainage)} (${q(lowestAt)}). The liquid would flash or the column would separate here; the single-liquid-phase results beyond this point are not physical and only indicative.`,
        elements,
        start,
      ),
    /** A span of a route under vacuum (HGL below the pipe), located by chainage. */
    routeVacuum: (
      route: string,
      start: number,
      end: number,
      lowestAt: string,
      lowestGauge: number,
      lowestChainage: number,
      elements: Id[],
    ) =>
      finding(
        'vacuum',
        `Route ${q(route)}, chainage ${u.chainageSpan(start, end)} runs under vacuum (the HGL is below the pipe), down to ${u.pressureGauge(lowestGauge)} at chainage ${u.chainage(lowestChainage)} (${q(lowestAt)}): air can leak in at joints and vents.`,
        elements,
        start,
      ),
  };
}

/** The builders with SI numbers (messages without quantities read the same in both systems). */
export const findings = findingsIn('SI');
