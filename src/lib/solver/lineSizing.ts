/**
 * Line sizing: for a pipe's run (the pipes joined through waypoints), the catalogue sizes around
 * the present one, each judged by a real solve of the whole sheet with the run at that size —
 * velocity, friction loss per 100 m, the flow and pump duty it gives, the NPSH margin and the
 * lowest margin to vapour pressure — against the project's guidance. The smallest size that
 * meets every rule is recommended.
 */
import { pipeRun } from '../model/pipeRun';
import type { HeadrouteDocument, Id, PipeBore } from '../model/types';
import { catalogueInnerDiameter, nominalSizes, schedulesFor } from '../physics/pipeCatalogue';
import { solve } from './solve';
import type { Finding, SolveResult } from './types';

/** How many catalogue sizes below and above the present one are tried. */
export const SIZES_EACH_SIDE = 4;
/** Relative shortfall of flow still read as meeting the required flow (solver tolerance). */
const FLOW_TOLERANCE = 1e-3;

/** One rule's outcome for a candidate: met, or the findings that say why not. */
export interface RuleOutcome {
  met: boolean;
  /** Messages of the findings that break the rule (empty when met). */
  why: string[];
}

/** One candidate size and what a solve of the sheet with it gives. */
export interface SizeCandidate {
  nominalSize: string;
  schedule: string;
  innerDiameter: number;
  /** True for the size the run has now. */
  current: boolean;
  converged: boolean;
  /** Largest speed in the run's pipes, m/s. */
  velocity: number;
  /** Friction loss per 100 m of the run, m of liquid. */
  lossPer100m: number;
  /** Flow through the run's first pipe, m³/s (sign: along the pipe as drawn). */
  flow: number;
  /** Each running pump's duty. */
  pumps: Array<{ id: Id; flow: number; head: number }>;
  /** Smallest NPSHa − NPSHr over the running pumps, m; null without pumps. */
  npshMargin: number | null;
  /** Lowest absolute pressure less vapour pressure at any pipe end of the sheet, Pa. */
  vapourMargin: number | null;
  rules: {
    solved: RuleOutcome;
    flow: RuleOutcome;
    velocity: RuleOutcome;
    npsh: RuleOutcome;
    vapour: RuleOutcome;
  };
  meetsAll: boolean;
}

/** The sizing of one run. */
export interface LineSizing {
  pipes: Id[];
  /** The flow the run must carry, m³/s (given, or the flow it carries at its present size). */
  requiredFlow: number;
  candidates: SizeCandidate[];
  /** The smallest candidate meeting every rule, or null when none does. */
  recommended: string | null;
}

const VELOCITY = new Set(['velocity-high', 'velocity-low']);
const NPSH = new Set(['npsh-below-required', 'npsh-margin-low']);
const VAPOUR = new Set(['below-vapour-pressure']);

function outcome(findings: Finding[], codes: Set<string>, on?: Set<Id>): RuleOutcome {
  const why = findings
    .filter((f) => codes.has(f.code) && (!on || f.elements.some((e) => on.has(e))))
    .map((f) => f.message);
  return { met: why.length === 0, why };
}

/** The catalogue sizes tried: the present size's family (NPS or DN), a window around it. */
function candidateSizes(bore: PipeBore): Array<{ size: string; schedule: string; id: number }> {
  const metric = bore.mode === 'catalogue' && bore.nominalSize.startsWith('DN');
  const family = nominalSizes().filter((s) => s.startsWith('DN') === metric);
  const wanted = bore.mode === 'catalogue' ? bore.schedule : '40';
  const sized = family.flatMap((size) => {
    const schedules = schedulesFor(size);
    const schedule = schedules.includes(wanted) ? wanted : schedules[0];
    const id = schedule === undefined ? undefined : catalogueInnerDiameter(size, schedule);
    return id === undefined ? [] : [{ size, schedule, id }];
  });
  const present =
    bore.mode === 'catalogue'
      ? catalogueInnerDiameter(bore.nominalSize, bore.schedule)
      : bore.innerDiameter;
  let at = 0;
  for (let i = 0; i < sized.length; i++) {
    if (Math.abs(sized[i].id - (present ?? 0)) < Math.abs(sized[at].id - (present ?? 0))) at = i;
  }
  return sized.slice(Math.max(0, at - SIZES_EACH_SIDE), at + SIZES_EACH_SIDE + 1);
}

/** Lowest p_abs − p_v at the ends of every pipe with a solved head, Pa. */
function lowestVapourMargin(result: SolveResult): number | null {
  const { density, vapourPressure, atmosphericPressure } = result.fluid;
  const rhoG = density * 9.80665; // standard gravity (CGPM 1901)
  let lowest: number | null = null;
  for (const r of Object.values(result.pipes)) {
    for (const [head, z] of [
      [r.headFrom, r.elevationFrom],
      [r.headTo, r.elevationTo],
    ]) {
      if (head === undefined || z === undefined || !Number.isFinite(head)) continue;
      const margin = atmosphericPressure + rhoG * (head - z) - vapourPressure;
      if (lowest === null || margin < lowest) lowest = margin;
    }
  }
  return lowest;
}

/**
 * Size the run of `pipeId` in case `caseId`: one full solve per candidate size. A candidate
 * must carry `requiredFlow` (m³/s; by default the flow of the present size) and meet the
 * project's velocity guidance on the run, the NPSH margin rule at every pump and stay above
 * vapour pressure everywhere. Null when the pipe does not exist or lies on a ring of waypoints.
 */
export function sizeLine(
  doc: HeadrouteDocument,
  pipeId: Id,
  caseId: Id | null = null,
  requiredFlow: number | null = null,
): LineSizing | null {
  if (!Object.hasOwn(doc.pipes, pipeId)) return null;
  const run = pipeRun(doc, pipeId);
  if (!run) return null;
  const onRun = new Set<Id>(run.pipes);
  const bore = doc.pipes[pipeId].bore;
  const presentId =
    bore.mode === 'catalogue'
      ? catalogueInnerDiameter(bore.nominalSize, bore.schedule)
      : bore.innerDiameter;
  const candidates: SizeCandidate[] = [];
  for (const { size, schedule, id } of candidateSizes(bore)) {
    const pipes = { ...doc.pipes };
    for (const p of run.pipes) {
      pipes[p] = { ...pipes[p], bore: { mode: 'catalogue', nominalSize: size, schedule } };
    }
    const result = solve({ ...doc, pipes }, caseId);
    const runResults = run.pipes.map((p) => result.pipes[p]).filter((r) => r !== undefined);
    const length = run.pipes.reduce((s, p) => s + doc.pipes[p].length, 0);
    const friction = runResults.reduce((s, r) => s + r.frictionLoss, 0);
    const pumps = Object.entries(result.pumps).map(([pid, r]) => ({
      id: pid,
      flow: r.flow,
      head: r.head,
    }));
    const margins = Object.values(result.pumps)
      .filter((r) => r.flow > 0 && Number.isFinite(r.npshMargin))
      .map((r) => r.npshMargin);
    const stopSolve = result.findings
      .filter((f) => f.code === 'no-convergence')
      .map((f) => f.message);
    const rules = {
      solved: { met: result.converged, why: result.converged ? [] : stopSolve },
      flow: { met: true, why: [] as string[] },
      velocity: outcome(result.findings, VELOCITY, onRun),
      npsh: outcome(result.findings, NPSH),
      vapour: outcome(result.findings, VAPOUR),
    };
    candidates.push({
      nominalSize: size,
      schedule,
      innerDiameter: id,
      current: presentId !== undefined && Math.abs(id - presentId) < 1e-9,
      converged: result.converged,
      velocity: Math.max(0, ...runResults.map((r) => Math.abs(r.velocity))),
      lossPer100m: length > 0 ? (100 * friction) / length : 0,
      flow: runResults[0]?.flow ?? 0,
      pumps,
      npshMargin: margins.length > 0 ? Math.min(...margins) : null,
      vapourMargin: lowestVapourMargin(result),
      rules,
      meetsAll: Object.values(rules).every((r) => r.met),
    });
  }
  const required = requiredFlow ?? Math.abs(solve(doc, caseId).pipes[pipeId]?.flow ?? 0);
  for (const c of candidates) {
    if (Math.abs(c.flow) < required * (1 - FLOW_TOLERANCE)) {
      const m3h = (q: number) => `${(Math.abs(q) * 3600).toFixed(2)} m³/h`;
      c.rules.flow = { met: false, why: [`Carries ${m3h(c.flow)}, less than ${m3h(required)}.`] };
      c.meetsAll = false;
    }
  }
  const recommended = candidates.find((c) => c.meetsAll)?.nominalSize ?? null;
  return { pipes: run.pipes, requiredFlow: required, candidates, recommended };
}
