/**
 * `solve(document, caseId?)`: flows, heads and pressures over the whole sheet, with findings.
 *
 * Conventions (see network/build.ts, network/laws.ts, network/gga.ts):
 * - Heads are gauge-referenced: HGL = z + p_gauge/ρg, EGL = HGL + v²/2g. The graph's node heads
 *   are total heads (EGL); a port's HGL is its EGL less the velocity head of the pipe on it, so
 *   across a reducer the HGL steps by the velocity-head change even with no loss, and at a
 *   junction of unequal bores the EGL is common (no junction loss unless a tee fitting is drawn).
 * - Vessels and boundaries are fixed heads of liquid at rest; the entrance/exit K of a vessel
 *   nozzle (a boundary: 0 and 1) is charged to the pipe on it, chosen by the flow direction.
 *   A nozzle above the liquid meets the gas pressure at its own elevation instead (a fixed head
 *   of its own, network/nozzleHeads.ts); liquid leaving through one is a stop finding.
 * - Shut valves and stopped pumps take no part in the solve: nothing passes them. Non-return
 *   links (pumps, check valves) against reverse flow are a stiff linear resistance (laws.ts
 *   CLOSED_RESISTANCE): ≤ 1e-8 m³/s per 100 m of head.
 * - A fixed flow (duty pump, supply, draw-off) forced where it cannot go is a 'forced-flow' stop
 *   (network/topology.ts before the solve, network/undetermined.ts after it); a section whose
 *   pressure the sheet does not determine (shut in behind shut or held non-return elements) gets
 *   no results and one 'blocked-in' note. `converged` holds only when the node balance and the
 *   head balance both meet their tolerances (network/gga.ts) and no flow is forced.
 * - A pump in duty mode is a flow-controlled link; its result head is the EGL rise the sheet
 *   asks of it at that flow.
 * - A control valve follows IEC 60534-2-1; one that chokes is held at its choked flow (the flow
 *   no longer rises with the drop; network/choke.ts), and that is a stop finding.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import { applyCase } from './applyCase';
import { findings, findingsIn } from './findings/catalogue';
import { extremeInput, nonFiniteFindings } from './findings/nonFinite';
import { sheetFindings } from './findings/sheet';
import { solveFluid } from './fluid';
import { buildGraph } from './network/build';
import { solveWithChokedValves } from './network/choke';
import { activeParts } from './network/topology';
import { determinedParts } from './network/undetermined';
import { elementResults } from './results';
import type { Finding, SolveResult } from './types';

/**
 * Findings about parts not joined to a fixed head wait until the part is joined: the 'cut-off'
 * or 'blocked-in' finding names those elements once, and remarks on their open ports and
 * pipe lengths are dropped.
 */
function withoutLooseRemarks(all: Finding[]): Finding[] {
  const loose = new Set(
    all.filter((f) => f.code === 'cut-off' || f.code === 'blocked-in').flatMap((f) => f.elements),
  );
  if (loose.size === 0) return all;
  return all.filter(
    (f) =>
      (f.code !== 'unconnected-port' && f.code !== 'pipe-shorter-than-rise') ||
      !f.elements.every((id) => loose.has(id)),
  );
}

/**
 * Solves the document (in case `caseId`, or the base document) by the global gradient
 * method over the whole sheet. Pure and never throws on a schema-valid document: problems
 * come back as findings on the elements involved. Numbers are the raw results: an element whose
 * result is not finite is left out with a 'non-finite-result' stop naming the input behind it.
 * Elements the solve could not reach or determine (cut off, blocked in, broken connections)
 * have no entry in `pipes`/`nodes`; `converged` is false when the iteration did not settle or
 * balance, or a flow is forced where it cannot go.
 */
export function solve(doc: HeadrouteDocument, caseId?: Id | null): SolveResult {
  const pre: Finding[] = [];
  if (caseId !== null && caseId !== undefined && !Object.hasOwn(doc.cases, caseId)) {
    pre.push(findings.unknownCase(caseId));
  }
  const working = applyCase(doc, caseId);
  const fluid = solveFluid(working.settings);
  const base: SolveResult = {
    caseId: caseId ?? null,
    converged: false,
    iterations: 0,
    residual: 0,
    massImbalance: 0,
    fluid: {
      density: fluid.density,
      viscosity: fluid.viscosity,
      vapourPressure: fluid.vapourPressure,
      atmosphericPressure: fluid.atmosphericPressure,
      temperature: fluid.temperature,
      liquidName: fluid.liquidName,
    },
    pipes: {},
    nodes: {},
    pumps: {},
    controlValves: {},
    findings: pre,
  };
  if (!fluid.usable) {
    base.findings.push(
      findings.invalidInput(
        fluid.liquidName,
        'its properties cannot be evaluated at the project temperature, so nothing was solved',
        '',
      ),
    );
    base.findings[base.findings.length - 1].elements = [];
    return base;
  }
  try {
    const graph = buildGraph(working, fluid);
    const parts = activeParts(working, graph);
    const solved = solveWithChokedValves(graph, parts.activeNode, parts.activeLink, fluid);
    const { outcome } = solved;
    const determined = determinedParts(
      working,
      graph,
      parts.activeNode,
      parts.activeLink,
      outcome.heads,
      outcome.flows,
    );
    const { records: results, indexed } = determined.any
      ? elementResults(graph, outcome, parts.activeLink, fluid, determined.known)
      : solved.results;
    const nothingFixed = parts.findings.some((f) => f.code === 'no-fixed-head');
    const unit = findingsIn(working.settings.unitSystem);
    const result: SolveResult = {
      ...base,
      converged: outcome.converged && !nothingFixed && !parts.forced && !determined.forced,
      iterations: outcome.iterations,
      residual: outcome.residual,
      massImbalance: outcome.massImbalance,
      ...results,
      findings: [...pre, ...graph.findings, ...parts.findings, ...determined.findings],
    };
    const nameOf = (id: Id) => working.nodes[id]?.name ?? working.pipes[id]?.name ?? id;
    if (!outcome.converged && outcome.worstNodes.length > 0 && outcome.worstLinks.length === 0) {
      const worst = [
        ...new Set(outcome.worstNodes.map((i) => graph.sheetNodes[graph.nodeOwner[i]].id)),
      ];
      result.findings.push(
        unit.unbalanced(outcome.massImbalance, outcome.massTolerance, worst.map(nameOf), worst),
      );
    } else if (!outcome.converged) {
      const worst = outcome.worstLinks.map((k) => graph.links[k].element);
      const names = worst.map(nameOf);
      result.findings.push(unit.noConvergence(outcome.iterations, outcome.residual, names, worst));
    }
    const nonFinite = nonFiniteFindings(working, graph, results, indexed, unit);
    if (nonFinite.length > 0) {
      result.converged = false;
      result.findings.push(...nonFinite);
    }
    result.findings.push(
      ...sheetFindings(working, working.settings, graph, results, indexed, fluid),
    );
    result.findings = withoutLooseRemarks(result.findings);
    return result;
  } catch (error) {
    // An input far out of range can drive the numbers to NaN/Infinity deep inside a law: name it.
    const cause = extremeInput(working);
    if (cause) {
      const name = working.nodes[cause.id]?.name ?? working.pipes[cause.id]?.name ?? cause.id;
      base.findings.push(
        findings.nonFiniteResult(name, `from ${cause.what}; nothing was solved`, [cause.id]),
      );
      return base;
    }
    // A defect, not an input problem: keep the app alive and say so.
    const why = error instanceof Error ? error.message : String(error);
    base.findings.push(findings.noConvergence(0, 0, [], []));
    base.findings[base.findings.length - 1].message = `The solver failed (${why}); no results.`;
    return base;
  }
}
