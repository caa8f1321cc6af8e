/**
 * The `headroute` command: solve project files and print profiles without a browser, with the
 * same solver modules as the app.
 */
import { SCREENING_CAUTION } from '../lib/chart/exportMeta';
import { CliError, EXIT } from './args';
import { processIo, type CliIo } from './io';
import { profileCommand } from './profileCommand';
import { REVIEW_HELP, reviewCommand } from './review';
import { solveCommand } from './solveCommand';
import { SURGE_HELP } from './surgeHelp';

/** The text of `headroute --help`. */
export const HELP = `headroute — solve Headroute project files (*.headroute.json) from the command line

Usage:
  headroute solve FILE [--case NAME] [--format text|json|csv] [--strict]
      Solve the network and print pipes, pumps, valves, the default route's lowest
      margin to vapour pressure, and all findings. Text and CSV are in the project's
      unit system; JSON is in SI (m, s, Pa absolute unless named Gauge, W).
      --case NAME     solve an operating case (by name or id); default: the base document
      --format F      text (default), json or csv (one table per section)
      --strict        exit with code 1 when there is any stop finding

  headroute profile FILE [--from NODE --to NODE | --route NAME] [--case NAME]
                         [--format csv|json|svg] [--segments N]
      Print the stations along a route: chainage, elevation, HGL, EGL, vapour line,
      absolute and gauge pressure, margin to vapour pressure.
      --from, --to    the route's ends (node name or id); the shortest route along the
                      flow is taken, or one ignoring the flow direction with a note
      --route NAME    a route stored in the project (by name or id)
                      (neither: the default route, through the pumps, longest first)
      --format F      csv (default, project units), json (SI) or svg (a drawing)
      --segments N    pieces each pipe is cut into (default 10)

${REVIEW_HELP}
${SURGE_HELP}
  headroute --help | --version

Exit codes:
  0   done
  1   --strict and at least one stop finding; surge: the run could not be made
  2   bad command line, or a case, node or route the project does not have
  3   the project file is missing, unreadable or not a valid project
  4   no pipes join the nodes asked for, so there is no profile
  70  an internal error in headroute (please report it)

${SCREENING_CAUTION}
`;

/** The version printed by --version. */
export const VERSION = '0.1.0';

/** Runs the command line `argv` (without "node" and the script); returns the exit code. */
export async function main(argv: readonly string[], io: CliIo = processIo): Promise<number> {
  const [command, ...rest] = argv;
  try {
    if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
      (command === undefined ? io.err : io.out)(HELP);
      return command === undefined ? EXIT.usage : EXIT.ok;
    }
    if (command === '--version' || command === '-v') {
      io.out(`headroute ${VERSION}\n`);
      return EXIT.ok;
    }
    if (rest.includes('--help') || rest.includes('-h')) {
      io.out(HELP);
      return EXIT.ok;
    }
    if (command === 'solve') return await solveCommand(rest, io);
    if (command === 'profile') return await profileCommand(rest, io);
    if (command === 'review') return await reviewCommand(rest, io);
    // Loaded only when asked for, so the other commands start as quickly as before.
    if (command === 'surge') return await (await import('./surgeCommand')).surgeCommand(rest, io);
    throw new CliError(`Unknown command “${command}”. See headroute --help.`, EXIT.usage);
  } catch (error) {
    if (error instanceof CliError) {
      io.err(`headroute: ${error.message}\n`);
      return error.exitCode;
    }
    const detail = error instanceof Error ? (error.stack ?? error.message) : String(error);
    io.err(`headroute: internal error, please report it:\n${detail}\n`);
    return EXIT.internal;
  }
}
