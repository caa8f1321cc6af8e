/**
 * `headroute solve FILE [--case NAME] [--format text|json|csv] [--strict]`: solves the project
 * and prints the results and findings.
 */
import { solve } from '../lib/solver/solve';
import { choice, EXIT, parseArgs, projectFileArgument } from './args';
import type { CliIo } from './io';
import { loadProject, resolveCase } from './project';
import { solveCsv, solveJson, solveText } from './solveOutput';
import { solveReport } from './solveReport';

/** Output formats of `headroute solve`. */
export const SOLVE_FORMATS = ['text', 'json', 'csv'] as const;

/** Runs `headroute solve`; returns the exit code. */
export async function solveCommand(argv: readonly string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv, { values: ['case', 'format'], flags: ['strict'] });
  const file = projectFileArgument(args, 'solve');
  const format = choice(args, 'format', SOLVE_FORMATS, 'text');
  const doc = await loadProject(file);
  const caseId = resolveCase(doc, args.values.get('case'), file);
  const result = solve(doc, caseId);
  const report = solveReport(doc, result, file);
  io.out(
    format === 'json' ? solveJson(report) : format === 'csv' ? solveCsv(report) : solveText(report),
  );
  if (args.flags.has('strict') && report.counts.stop > 0) {
    io.err(
      `headroute: ${report.counts.stop} stop finding${report.counts.stop === 1 ? '' : 's'} (--strict).\n`,
    );
    return EXIT.stopFindings;
  }
  return EXIT.ok;
}
