/**
 * One surge run: the steady solve of the case, the line along the route, the time step, the
 * method of characteristics with vapour cavities, and the envelope, cavities, traces and
 * findings. `runSurge` never throws on a schema-valid document; what stops it is a finding.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import {
  DEFAULT_RESTRAINT,
  liquidBulkModulus,
  joukowskyHead,
  criticalTime,
  closureHeadRise,
} from '../../physics/transient';
import { applyCase } from '../applyCase';
import { messageUnits } from '../findings/messageUnits';
import { GRAVITY } from '../network/laws';
import { defaultRoute, RouteError } from '../route';
import { solve } from '../solve';
import type { Finding, SolveResult } from '../types';
import {
  adjustedFinding,
  assumption,
  cannotRun,
  cavityFindings,
  closureFinding,
  notModelledFinding,
  pressureFindings,
} from './findings';
import { buildLine, isClosableValve, type Line } from './line';
import { runMoc, type TripSetup } from './moc';
import { estimatedInertia, runDown } from './pumpTrip';
import { chooseTimeStep } from './timeStep';
import {
  DEFAULT_SURGE_DURATION,
  type SurgeCavity,
  type SurgeEvent,
  type SurgeJoukowsky,
  type SurgeOptions,
  type SurgeResult,
} from './types';

const DEFAULT_TOLERANCE = 0.05;
const DEFAULT_WORK = 1e7;

function eventElement(event: SurgeEvent): Id {
  return event.kind === 'close' ? event.element : event.pump;
}

function emptyResult(event: SurgeEvent, caseId: Id | null, findings: Finding[]): SurgeResult {
  return {
    ok: false,
    event,
    caseId,
    route: [],
    pipes: [],
    joukowsky: null,
    envelope: [],
    cavities: [],
    findings: [...findings, notModelledFinding()],
    timeStep: NaN,
    duration: 0,
    waveSpeedAdjustment: NaN,
    times: [],
    traces: [],
    bulkModulus: null,
    pumpSpeed: [],
    inertia: null,
  };
}

/** The route through the event's element: the one given, a stored one, or the default route. */
function chooseRoute(
  doc: HeadrouteDocument,
  result: SolveResult,
  element: Id,
  given: Id[] | null | undefined,
): Id[] | null {
  if (given && given.length >= 2) return given;
  for (const r of Object.values(doc.routes)) if (r.nodes.includes(element)) return r.nodes;
  const d = defaultRoute(doc, result);
  return d && d.includes(element) ? d : null;
}

/** Checks the event against the document; a message when it cannot be run. */
function eventProblem(doc: HeadrouteDocument, event: SurgeEvent): string | null {
  const id = eventElement(event);
  if (!Object.hasOwn(doc.nodes, id)) return `there is no element “${id}” on the sheet.`;
  const node = doc.nodes[id];
  const name = node.name || id;
  if (event.kind === 'close') {
    if (!isClosableValve(node))
      return `“${name}” is not a valve that can be closed (a control valve, or a gate, globe, ball or butterfly valve).`;
    if (!(event.time >= 0) || !Number.isFinite(event.time))
      return `the closure time of “${name}” must be a number of seconds, 0 or more.`;
    return null;
  }
  if (node.kind !== 'pump') return `“${name}” is not a pump.`;
  if (!node.running) return `pump “${name}” is not running, so it cannot trip.`;
  if (event.inertia !== null && !(event.inertia > 0 && Number.isFinite(event.inertia)))
    return `the inertia of “${name}” must be a positive number of kg·m².`;
  return null;
}

/** Runs the surge event `event` on `doc`. */
export function runSurge(
  doc: HeadrouteDocument,
  event: SurgeEvent,
  options: SurgeOptions = {},
): SurgeResult {
  const caseId = options.caseId ?? null;
  const element = eventElement(event);
  const problem = eventProblem(doc, event);
  if (problem)
    return emptyResult(event, caseId, [
      cannotRun(problem, Object.hasOwn(doc.nodes, element) ? [element] : []),
    ]);
  const working = applyCase(doc, caseId);
  const result = solve(doc, caseId);
  const u = messageUnits(doc.settings.unitSystem);
  const elName = working.nodes[element].name || element;
  if (!result.converged)
    return emptyResult(event, caseId, [
      cannotRun('the steady solve did not balance, so there is no state to start from.', [element]),
    ]);
  const fluid = result.fluid;
  const bulk = liquidBulkModulus(
    working.settings.liquid,
    fluid.temperature,
    fluid.atmosphericPressure,
    fluid.density,
  );
  if (!bulk)
    return emptyResult(event, caseId, [
      cannotRun(
        `the liquid “${fluid.liquidName}” has no bulk modulus, so no wave speed can be found.`,
        [],
      ),
    ]);
  const route = chooseRoute(working, result, element, options.route);
  if (!route)
    return emptyResult(event, caseId, [
      cannotRun(`no stored or default route passes “${elName}”; choose a route through it.`, [
        element,
      ]),
    ]);
  const restraint = options.restraint ?? DEFAULT_RESTRAINT;
  let line: ReturnType<typeof buildLine>;
  try {
    line = buildLine(working, result, route, event, bulk.value, restraint);
  } catch (error) {
    if (error instanceof RouteError)
      return emptyResult(event, caseId, [cannotRun(error.message, [element])]);
    throw error;
  }
  if ('message' in line)
    return emptyResult(event, caseId, [cannotRun(line.message, line.elements)]);
  const vapourOffset =
    (fluid.vapourPressure - fluid.atmosphericPressure) / (fluid.density * GRAVITY);
  const flashing = line.pipes.find(
    (p) => p.headIn < p.zIn + vapourOffset || p.headOut < p.zOut + vapourOffset,
  );
  if (flashing) {
    return emptyResult(event, caseId, [
      cannotRun(
        `the steady state already falls below the vapour pressure on pipe “${flashing.name}”; a surge run needs a liquid-full start, so fix the steady flow first.`,
        [flashing.id],
      ),
    ]);
  }
  const l = line.links.findIndex((k) => k.nodeId === element);
  if (l < 0)
    return emptyResult(event, caseId, [
      cannotRun(`“${elName}” is not between two pipes of the route.`, [element]),
    ]);
  const findings: Finding[] = [];
  let trip: TripSetup | null = null;
  let inertia: SurgeResult['inertia'] = null;
  if (event.kind === 'trip') {
    const law = line.links[l].law;
    const pump = working.nodes[element];
    if (law.kind !== 'pump' || pump.kind !== 'pump')
      return emptyResult(event, caseId, [
        cannotRun(`pump “${elName}” carries no flow to trip from.`, [element]),
      ]);
    const rd = runDown(pump, fluid.density);
    if (!rd)
      return emptyResult(event, caseId, [
        cannotRun(`pump “${elName}” needs head and efficiency curves for its run-down torque.`, [
          element,
        ]),
      ]);
    let value = event.inertia;
    if (value === null) {
      value = estimatedInertia(result.pumps[element]?.shaftPower ?? NaN, pump.speed);
      if (!(value > 0))
        return emptyResult(event, caseId, [
          cannotRun(
            `type the inertia of pump “${elName}”: its shaft power is not known to estimate it.`,
            [element],
          ),
        ]);
      findings.push(
        assumption(
          `the inertia of pump “${elName}”, ${value.toFixed(3)} kg·m², is estimated from its shaft power and speed (Thorley & Faithfull correlation, from memory); type the machine's own figure.`,
          [element],
        ),
      );
    }
    inertia = { value, estimated: event.inertia === null };
    trip = { link: l, runDown: rd, inertia: value };
  }
  const duration = options.duration ?? DEFAULT_SURGE_DURATION;
  const tolerance = options.waveSpeedTolerance ?? DEFAULT_TOLERANCE;
  const travel = line.pipes.map((p) => p.length / p.wave.value);
  const choice = chooseTimeStep(travel, duration, tolerance, options.maxWork ?? DEFAULT_WORK);
  const rhoG = fluid.density * GRAVITY;
  const out = runMoc({
    line,
    dt: choice.dt,
    reaches: choice.reaches,
    steps: choice.steps,
    vapourOffset,
    trip,
    historySamples: options.historySamples ?? 400,
  });
  if (out.failure) {
    const pipe = line.pipes[out.pipeOf[out.failure.section]];
    return emptyResult(event, caseId, [
      cannotRun(
        `the run broke down at ${out.failure.time.toFixed(3)} s on pipe “${pipe.name}” (a head or flow stopped being a number); no envelope is shown.`,
        [pipe.id],
      ),
    ]);
  }
  const cavities: SurgeCavity[] = [];
  for (let i = 0; i < out.chainage.length; i++) {
    if (out.cavityMax[i] > 0) {
      cavities.push({
        chainage: out.chainage[i],
        maxVolume: out.cavityMax[i],
        duration: out.cavityTime[i],
        elementId: line.pipes[out.pipeOf[i]].id,
        firstOpen: out.cavityFirst[i],
        section: i,
      });
    }
  }
  const joukowsky = reachScreen(line, l, event);
  findings.push(...pressureFindings(line, out, rhoG, u), ...cavityFindings(line, cavities, out, u));
  if (event.kind === 'close' && joukowsky) {
    const slowerTime = Math.max(5 * joukowsky.criticalTime, event.time);
    const reach = reachPipes(line, l, event);
    const at = line.pipes[l];
    findings.push(
      closureFinding(
        element,
        elName,
        event.time,
        joukowsky,
        {
          time: slowerTime,
          rise: closureHeadRise(reach, at.wave.value, at.flow / at.area, slowerTime),
        },
        u,
      ),
    );
  }
  if (bulk.fromMemory)
    findings.push(
      assumption(
        `the liquid's bulk modulus comes from a speed of sound typed from memory (${bulk.source}).`,
        [],
      ),
    );
  const rigid = line.pipes.filter((p) => p.wave.method === 'rigid');
  if (rigid.length)
    findings.push(
      assumption(
        `${rigid.length === 1 ? 'pipe' : 'pipes'} ${rigid.map((p) => `“${p.name}”`).join(', ')} ${rigid.length === 1 ? 'has' : 'have'} no catalogue wall or wall modulus; the wave speed of a rigid pipe, √(K/ρ), is used (the highest possible, so the Joukowsky rise is not under-stated).`,
        rigid.map((p) => p.id),
      ),
    );
  if (choice.adjustment > tolerance)
    findings.push(
      adjustedFinding(
        choice.adjustment,
        tolerance,
        line.pipes.map((p) => p.id),
      ),
    );
  const sides = line.links.filter((k) => Math.abs(k.offtake) > 1e-9).map((k) => k.nodeId);
  if (sides.length)
    findings.push(
      assumption(
        'pipes off the route at its branch points keep their steady flow through the event.',
        sides,
      ),
    );
  findings.push(notModelledFinding());
  return {
    ok: true,
    event,
    caseId,
    route: line.nodes,
    pipes: line.pipes.map((p, i) => ({
      id: p.id,
      name: p.name,
      length: p.length,
      waveSpeed: p.wave.value,
      waveSpeedUsed: p.length / (choice.reaches[i] * choice.dt),
      velocity: p.flow / p.area,
      frictionFactor: p.friction,
      reaches: choice.reaches[i],
      waveSpeedSource: p.wave.source,
    })),
    joukowsky,
    envelope: Array.from(out.chainage, (c, i) => ({
      chainage: c,
      elevation: out.z[i],
      hglSteady: out.hSteady[i],
      hglMax: out.hMax[i],
      hglMin: out.hMin[i],
      vapourLine: out.z[i] + (fluid.vapourPressure - fluid.atmosphericPressure) / rhoG,
      elementId: line.pipes[out.pipeOf[i]].id,
    })),
    cavities,
    findings,
    timeStep: choice.dt,
    duration: choice.steps * choice.dt,
    waveSpeedAdjustment: choice.adjustment,
    times: out.times,
    traces: out.traced.map((s, k) => ({
      chainage: out.chainage[s],
      elementId: line.pipes[out.pipeOf[s]].id,
      head: out.traceHead[k],
      flow: out.traceFlow[k],
    })),
    bulkModulus: { value: bulk.value, source: bulk.source },
    pumpSpeed: out.pumpSpeed,
    inertia,
  };
}

/** Pipes of the event's reach: upstream of a closing valve, downstream of a tripped pump. */
function reachPipes(line: Line, l: number, event: SurgeEvent) {
  const pipes = event.kind === 'close' ? line.pipes.slice(0, l + 1) : line.pipes.slice(l + 1);
  return pipes.map((p) => ({
    length: p.length,
    waveSpeed: p.wave.value,
    velocity: p.flow / p.area,
  }));
}

/** Joukowsky rise and 2L/a of the event's reach. */
function reachScreen(line: Line, l: number, event: SurgeEvent): SurgeJoukowsky {
  const reach = reachPipes(line, l, event);
  const at = event.kind === 'close' ? line.pipes[l] : line.pipes[l + 1];
  const v = Math.abs(at.flow / at.area);
  const ids = (event.kind === 'close' ? line.pipes.slice(0, l + 1) : line.pipes.slice(l + 1)).map(
    (p) => p.id,
  );
  return {
    headRise: joukowskyHead(at.wave.value, v),
    criticalTime: criticalTime(reach),
    reach: ids,
    closureHeadRise:
      event.kind === 'close' ? closureHeadRise(reach, at.wave.value, v, event.time) : null,
  };
}
