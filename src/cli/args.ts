/**
 * Command-line arguments: a command, positional arguments, `--name value` / `--name=value`
 * options and `--flag` switches. Anything the command does not know is a usage error.
 */

/** Exit codes of `headroute` (also listed in `--help`). */
export const EXIT = {
  /** Done. */
  ok: 0,
  /** `--strict` and at least one stop finding. */
  stopFindings: 1,
  /** Bad command line, or a case, node or route the file does not have. */
  usage: 2,
  /** The project file is missing, unreadable or not a valid project. */
  file: 3,
  /** The two nodes are not joined by pipes, so there is no profile. */
  noRoute: 4,
  /** Something went wrong inside headroute (a defect): please report it. */
  internal: 70,
} as const;

/** An error the user can act on, with the exit code it ends the run with. */
export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode: number,
  ) {
    super(message);
  }
}

/** What a command accepts. */
export interface ArgSpec {
  /** Options that take a value, without the leading dashes. */
  values: readonly string[];
  /** Switches without a value. */
  flags: readonly string[];
}

/** Parsed arguments of one command. */
export interface ParsedArgs {
  positional: string[];
  values: Map<string, string>;
  flags: Set<string>;
}

/** Parses `argv` (after the command name) against `spec`; throws CliError on anything unknown. */
export function parseArgs(argv: readonly string[], spec: ArgSpec): ParsedArgs {
  const parsed: ParsedArgs = { positional: [], values: new Map(), flags: new Set() };
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === '--') {
      parsed.positional.push(...argv.slice(i + 1));
      break;
    }
    if (!arg.startsWith('--') || arg === '--') {
      parsed.positional.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const name = arg.slice(2, eq < 0 ? undefined : eq);
    if (spec.flags.includes(name)) {
      if (eq >= 0) throw new CliError(`Option --${name} takes no value.`, EXIT.usage);
      parsed.flags.add(name);
    } else if (spec.values.includes(name)) {
      let value: string | undefined;
      if (eq >= 0) value = arg.slice(eq + 1);
      else if (i + 1 < argv.length) value = argv[++i];
      if (value === undefined || value === '')
        throw new CliError(`Option --${name} needs a value.`, EXIT.usage);
      if (parsed.values.has(name))
        throw new CliError(`Option --${name} is given more than once.`, EXIT.usage);
      parsed.values.set(name, value);
    } else {
      throw new CliError(`Unknown option --${name}. See headroute --help.`, EXIT.usage);
    }
  }
  return parsed;
}

/** The value of an option that must be one of `choices`; `fallback` when absent. */
export function choice<T extends string>(
  args: ParsedArgs,
  name: string,
  choices: readonly T[],
  fallback: T,
): T {
  const value = args.values.get(name);
  if (value === undefined) return fallback;
  if (!(choices as readonly string[]).includes(value)) {
    throw new CliError(
      `--${name} must be one of ${choices.join(', ')} (got “${value}”).`,
      EXIT.usage,
    );
  }
  return value as T;
}

/** Exactly one positional argument: the project file. */
export function projectFileArgument(args: ParsedArgs, command: string): string {
  if (args.positional.length === 0)
    throw new CliError(
      `headroute ${command} needs a project file. See headroute --help.`,
      EXIT.usage,
    );
  if (args.positional.length > 1) {
    throw new CliError(
      `headroute ${command} takes one project file; also got “${args.positional[1]}”.`,
      EXIT.usage,
    );
  }
  return args.positional[0];
}
