/**
 * The result of a solve that could not run at all (the solver, or the worker around it, threw):
 * no flows, heads or pressures, and one stop finding saying why, so the app shows a finding
 * rather than waiting for a result that will never come.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import { applyCase } from './applyCase';
import { findings } from './findings/catalogue';
import { solveFluid } from './fluid';
import type { FluidState, SolveResult } from './types';

/** The liquid's state for the failed result; NaN (shown as a dash) where even that fails. */
function fluidOf(doc: HeadrouteDocument, caseId: Id | null): FluidState {
  try {
    const f = solveFluid(applyCase(doc, caseId).settings);
    return {
      density: f.density,
      viscosity: f.viscosity,
      vapourPressure: f.vapourPressure,
      atmosphericPressure: f.atmosphericPressure,
      temperature: f.temperature,
      liquidName: f.liquidName,
    };
  } catch {
    return {
      density: NaN,
      viscosity: NaN,
      vapourPressure: NaN,
      atmosphericPressure: NaN,
      temperature: doc.settings.temperature,
      liquidName: '',
    };
  }
}

/**
 * A not-converged result with no figures and one stop finding: "The solver failed (why); no
 * results." (the same words `solve` uses when it catches a defect itself).
 */
export function failedSolve(doc: HeadrouteDocument, caseId: Id | null, why: string): SolveResult {
  const finding = findings.noConvergence(0, 0, [], []);
  finding.message = `The solver failed (${why}); no results.`;
  return {
    caseId,
    converged: false,
    iterations: 0,
    residual: 0,
    massImbalance: 0,
    fluid: fluidOf(doc, caseId),
    pipes: {},
    nodes: {},
    pumps: {},
    controlValves: {},
    findings: [finding],
  };
}
