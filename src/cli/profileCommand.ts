/**
 * `headroute profile FILE [--from NODE --to NODE | --route NAME] [--case NAME]
 * [--format csv|json|svg] [--segments N]`: the stations along a route.
 */
import { exportMeta, SCREENING_CAUTION } from '../lib/chart/exportMeta';
import { profileSvg } from '../lib/chart/profileSvg';
import { stationsCsv } from '../lib/chart/stationsCsv';
import type { HeadrouteDocument, Id } from '../lib/model/types';
import { DEFAULT_PIPE_SEGMENTS, profile } from '../lib/solver/profile';
import { defaultRoute, RouteError, searchRoute } from '../lib/solver/route';
import { lowestVapourMargin, routeFindings, routeName } from '../lib/solver/routeFindings';
import { solve } from '../lib/solver/solve';
import type { SolveResult } from '../lib/solver/types';
import { choice, CliError, EXIT, parseArgs, projectFileArgument, type ParsedArgs } from './args';
import type { CliIo } from './io';
import { loadProject, resolveCase, resolveNode, resolveStoredRoute } from './project';

/** Output formats of `headroute profile`. */
export const PROFILE_FORMATS = ['csv', 'json', 'svg'] as const;

interface ChosenRoute {
  nodes: Id[];
  name: string | undefined;
  note: string | null;
}

function nameOf(doc: HeadrouteDocument, id: Id): string {
  return doc.nodes[id]?.name || id;
}

/** The route asked for: --from/--to, a stored --route, or the default route. */
function chooseRoute(
  doc: HeadrouteDocument,
  result: SolveResult,
  args: ParsedArgs,
  file: string,
): ChosenRoute {
  const from = args.values.get('from');
  const to = args.values.get('to');
  const stored = args.values.get('route');
  if (stored !== undefined && (from !== undefined || to !== undefined))
    throw new CliError('Give either --route or --from and --to, not both.', EXIT.usage);
  if (stored !== undefined) {
    const route = resolveStoredRoute(doc, stored, file);
    return { nodes: route.nodes, name: route.name, note: null };
  }
  if ((from === undefined) !== (to === undefined))
    throw new CliError(
      'Give both --from and --to (or neither, for the default route).',
      EXIT.usage,
    );
  if (from === undefined || to === undefined) {
    const nodes = defaultRoute(doc, result);
    if (!nodes)
      throw new CliError(
        `No route to show in ${file}: no two vessels, headers or draw-offs are joined by pipes.`,
        EXIT.noRoute,
      );
    return { nodes, name: undefined, note: null };
  }
  const a = resolveNode(doc, from, file);
  const b = resolveNode(doc, to, file);
  if (a === b) throw new CliError('--from and --to name the same node.', EXIT.usage);
  const found = searchRoute(doc, result, a, b);
  if (!found) {
    throw new CliError(
      `No pipes join “${nameOf(doc, a)}” to “${nameOf(doc, b)}” in ${file}.`,
      EXIT.noRoute,
    );
  }
  return { nodes: found.route, name: undefined, note: found.note };
}

function segmentsOption(args: ParsedArgs): number {
  const text = args.values.get('segments');
  if (text === undefined) return DEFAULT_PIPE_SEGMENTS;
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1 || n > 1000)
    throw new CliError(
      `--segments must be a whole number from 1 to 1000 (got “${text}”).`,
      EXIT.usage,
    );
  return n;
}

function jsonNumber(_key: string, value: unknown): unknown {
  return typeof value === 'number' && !Number.isFinite(value) ? null : value;
}

/** Runs `headroute profile`; returns the exit code. */
export async function profileCommand(argv: readonly string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv, {
    values: ['from', 'to', 'route', 'case', 'format', 'segments'],
    flags: [],
  });
  const file = projectFileArgument(args, 'profile');
  const format = choice(args, 'format', PROFILE_FORMATS, 'csv');
  const pipeSegments = segmentsOption(args);
  const doc = await loadProject(file);
  const caseId = resolveCase(doc, args.values.get('case'), file);
  const result = solve(doc, caseId);
  const chosen = chooseRoute(doc, result, args, file);
  let prof;
  try {
    prof = profile(doc, result, chosen.nodes, { pipeSegments });
  } catch (error) {
    if (error instanceof RouteError) throw new CliError(error.message, EXIT.noRoute);
    throw error;
  }
  const name = chosen.name ?? routeName(doc, prof);
  if (chosen.note) io.err(`headroute: note: ${chosen.note}\n`);
  if (format === 'svg') {
    io.out(profileSvg(doc, result, prof, { routeName: name }));
  } else if (format === 'csv') {
    const meta = exportMeta(doc, result, prof.route, { routeName: name });
    const names: Record<Id, string> = {};
    for (const n of Object.values(doc.nodes)) names[n.id] = n.name || n.id;
    for (const p of Object.values(doc.pipes)) names[p.id] = p.name || p.id;
    io.out(stationsCsv(prof, doc.settings.unitSystem, meta, names));
  } else {
    const lowest = lowestVapourMargin(prof);
    const report = {
      caution: SCREENING_CAUTION,
      project: doc.name,
      file,
      case: { id: caseId, name: caseId === null ? 'Base case' : doc.cases[caseId].name },
      units: 'SI',
      route: {
        name,
        nodes: prof.route,
        names: prof.route.map((id) => nameOf(doc, id)),
        followsFlow: chosen.note === null,
        note: chosen.note,
        length: prof.stations[prof.stations.length - 1]?.chainage ?? 0,
      },
      fluid: result.fluid,
      lowestVapourMargin: lowest,
      stations: prof.stations,
      findings: routeFindings(doc, result, prof, name),
    };
    io.out(JSON.stringify(report, jsonNumber, 2) + '\n');
  }
  return EXIT.ok;
}
