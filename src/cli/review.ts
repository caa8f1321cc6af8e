/**
 * `headroute review FILE [--out FILE.html] [--case NAME] [--date YYYY-MM-DD]`: the review
 * sheet as a static HTML file (inline CSS and SVG, no scripts), for printing or sharing.
 */
import { writeFile } from 'node:fs/promises';
import { reviewSheetHtml } from '../lib/report/reviewSheet';
import { compareCases } from '../lib/solver/compareCases';
import { CliError, EXIT, parseArgs, projectFileArgument } from './args';
import type { CliIo } from './io';
import { loadProject, resolveCase } from './project';

/** Help lines of `headroute review`, for the main help text. */
export const REVIEW_HELP = `  headroute review FILE [--out FILE.html] [--case NAME] [--date YYYY-MM-DD]
      Write the review sheet: project and cases, the sheet drawing, each stored
      route's profile, tables of pipes, fittings, pumps and vessels, findings, the
      cases side by side, methods and sources, and the caution. Static HTML with
      inline SVG; print it from a browser (A4 or US Letter, greyscale).
      --out FILE      write to FILE (default: standard output)
      --case NAME     the case shown in the drawing, profiles and tables (default: base)
      --date D        the date printed on the sheet (default: today)
`;

function dateOption(text: string | undefined): Date | undefined {
  if (text === undefined) return undefined;
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  const date = match ? new Date(`${text}T12:00:00Z`) : null;
  if (!date || Number.isNaN(date.getTime()) || date.toISOString().slice(0, 10) !== text) {
    throw new CliError(`--date must be a date as YYYY-MM-DD (got “${text}”).`, EXIT.usage);
  }
  return date;
}

/** Runs `headroute review`; returns the exit code. */
export async function reviewCommand(argv: readonly string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv, { values: ['out', 'case', 'date'], flags: [] });
  const file = projectFileArgument(args, 'review');
  const date = dateOption(args.values.get('date'));
  const out = args.values.get('out');
  const doc = await loadProject(file);
  const caseId = resolveCase(doc, args.values.get('case'), file);
  const comparison = compareCases(doc);
  const html = reviewSheetHtml(doc, { caseId, date, comparison });
  if (out === undefined) {
    io.out(html);
    return EXIT.ok;
  }
  try {
    await writeFile(out, html, 'utf8');
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    throw new CliError(`Cannot write ${out}: ${why}.`, EXIT.file);
  }
  const shown = comparison.cases.find((c) => c.caseId === caseId) ?? comparison.cases[0];
  const count = (level: string) => shown.result.findings.filter((f) => f.level === level).length;
  io.err(
    `headroute: wrote ${out} (${comparison.cases.length} case(s); ${count('stop')} stop, ${count('caution')} caution, ${count('note')} note in ${shown.name}).\n`,
  );
  return EXIT.ok;
}
