/**
 * `headroute surge FILE [--case ID] (--close ELEMENT_ID --time SECONDS [--law linear|characteristic]
 * | --trip PUMP_ID [--inertia KGM2]) [--duration SECONDS] [--route ID] --format json|text|csv|svg`:
 * a surge screening run along a route. JSON is SI (m, s, m³/s, m³).
 */
import { SCREENING_CAUTION } from '../lib/chart/exportMeta';
import { surgeEnvelopeCsv, surgeEnvelopeSvg } from '../lib/chart/surgeChart';
import type { HeadrouteDocument } from '../lib/model/types';
import { runSurge, type SurgeEvent, type SurgeResult } from '../lib/solver/surge';
import { choice, CliError, EXIT, parseArgs, projectFileArgument, type ParsedArgs } from './args';
import type { CliIo } from './io';
export { SURGE_HELP } from './surgeHelp';
import { loadProject, resolveCase, resolveNode, resolveStoredRoute } from './project';

/** Output formats of `headroute surge`. */
export const SURGE_FORMATS = ['json', 'text', 'csv', 'svg'] as const;

function numberOption(args: ParsedArgs, name: string, min: number): number | undefined {
  const text = args.values.get(name);
  if (text === undefined) return undefined;
  const n = Number(text);
  if (!Number.isFinite(n) || n < min)
    throw new CliError(
      `--${name} must be a number of at least ${min} (got “${text}”).`,
      EXIT.usage,
    );
  return n;
}

function surgeEvent(doc: HeadrouteDocument, args: ParsedArgs, file: string): SurgeEvent {
  const close = args.values.get('close');
  const trip = args.values.get('trip');
  if ((close === undefined) === (trip === undefined))
    throw new CliError(
      'Give either --close ELEMENT_ID --time SECONDS or --trip PUMP_ID.',
      EXIT.usage,
    );
  if (close !== undefined) {
    if (args.values.has('inertia')) throw new CliError('--inertia goes with --trip.', EXIT.usage);
    const time = numberOption(args, 'time', 0);
    if (time === undefined) throw new CliError('--close needs --time SECONDS.', EXIT.usage);
    const law = choice(args, 'law', ['linear', 'characteristic'] as const, 'linear');
    return { kind: 'close', element: resolveNode(doc, close, file), time, law };
  }
  if (args.values.has('time') || args.values.has('law'))
    throw new CliError('--time and --law go with --close.', EXIT.usage);
  const inertia = numberOption(args, 'inertia', Number.MIN_VALUE);
  return { kind: 'trip', pump: resolveNode(doc, trip!, file), inertia: inertia ?? null };
}

function eventJson(doc: HeadrouteDocument, event: SurgeEvent) {
  if (event.kind === 'close') {
    const name = doc.nodes[event.element]?.name || event.element;
    return { kind: 'close', element: event.element, name, time: event.time, law: event.law };
  }
  const name = doc.nodes[event.pump]?.name || event.pump;
  return { kind: 'trip', pump: event.pump, name, inertia: event.inertia };
}

function jsonNumber(_key: string, value: unknown): unknown {
  return typeof value === 'number' && !Number.isFinite(value) ? null : value;
}

function describe(doc: HeadrouteDocument, event: SurgeEvent): string {
  const e = eventJson(doc, event);
  return e.kind === 'close'
    ? `close “${e.name}” over ${e.time} s (${e.law})`
    : `trip “${e.name}”${e.inertia === null ? '' : ` (inertia ${e.inertia} kg·m²)`}`;
}

/** The readable summary of a run. */
export function surgeText(doc: HeadrouteDocument, run: SurgeResult, file: string): string {
  const out: string[] = [
    `Headroute surge — ${doc.name}`,
    `File: ${file}`,
    `Event: ${describe(doc, run.event)}`,
  ];
  if (run.ok) {
    out.push(
      `Route: ${run.route.map((id) => doc.nodes[id]?.name || id).join(' → ')}`,
      `Time step ${(run.timeStep * 1000).toFixed(3)} ms over ${run.duration.toFixed(2)} s; wave speeds adjusted by up to ${(run.waveSpeedAdjustment * 100).toFixed(1)} %`,
      '',
      'Pipes (wave speed m/s, used m/s, steady velocity m/s, length m)',
    );
    for (const p of run.pipes)
      out.push(
        `  ${p.name.padEnd(28)} ${p.waveSpeed.toFixed(0).padStart(6)} ${p.waveSpeedUsed.toFixed(0).padStart(6)} ${p.velocity.toFixed(2).padStart(7)} ${p.length.toFixed(1).padStart(8)}`,
      );
    if (run.joukowsky)
      out.push(
        '',
        `Joukowsky a·Δv/g ${run.joukowsky.headRise.toFixed(2)} m; 2L/a ${run.joukowsky.criticalTime.toFixed(3)} s`,
      );
    const top = run.envelope.reduce((m, p) => (p.hglMax > m.hglMax ? p : m));
    const low = run.envelope.reduce((m, p) => (p.hglMin < m.hglMin ? p : m));
    out.push(
      `Highest HGL ${top.hglMax.toFixed(2)} m at chainage ${top.chainage.toFixed(1)} m (steady ${top.hglSteady.toFixed(2)} m)`,
      `Lowest HGL ${low.hglMin.toFixed(2)} m at chainage ${low.chainage.toFixed(1)} m (vapour line ${low.vapourLine.toFixed(2)} m)`,
    );
    const cav = run.cavities.reduce<SurgeResult['cavities'][number] | null>(
      (m, c) => (!m || c.maxVolume > m.maxVolume ? c : m),
      null,
    );
    out.push(
      cav
        ? `Largest vapour cavity ${(cav.maxVolume * 1000).toPrecision(3)} L at chainage ${cav.chainage.toFixed(1)} m, open ${cav.duration.toFixed(2)} s in all`
        : 'No vapour cavity: the column does not part.',
    );
  }
  out.push('', 'Findings');
  for (const f of run.findings) out.push(`  [${f.level}] ${f.message}`);
  out.push('', SCREENING_CAUTION, '');
  return out.join('\n');
}

/** Runs `headroute surge`; returns the exit code. */
export async function surgeCommand(argv: readonly string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv, {
    values: ['case', 'close', 'time', 'law', 'trip', 'inertia', 'duration', 'route', 'format'],
    flags: [],
  });
  const file = projectFileArgument(args, 'surge');
  const format = choice(args, 'format', SURGE_FORMATS, 'text');
  const doc = await loadProject(file);
  const caseId = resolveCase(doc, args.values.get('case'), file);
  const event = surgeEvent(doc, args, file);
  const duration = numberOption(args, 'duration', Number.MIN_VALUE);
  if (duration !== undefined && duration > 3600)
    throw new CliError('--duration is at most 3600 s.', EXIT.usage);
  const routeArg = args.values.get('route');
  const route = routeArg === undefined ? null : resolveStoredRoute(doc, routeArg, file).nodes;
  const run = runSurge(doc, event, { caseId, route, duration });
  const title = `${doc.name} — ${describe(doc, event)}`;
  if (format === 'json') {
    const report = {
      caution: SCREENING_CAUTION,
      project: doc.name,
      file,
      case: { id: caseId, name: caseId === null ? 'Base case' : doc.cases[caseId].name },
      units: 'SI',
      ok: run.ok,
      event: eventJson(doc, event),
      route: run.route,
      timeStep: run.timeStep,
      duration: run.duration,
      waveSpeedAdjustment: run.waveSpeedAdjustment,
      bulkModulus: run.bulkModulus,
      inertia: run.inertia,
      pipes: run.pipes.map((p) => ({
        id: p.id,
        name: p.name,
        waveSpeed: p.waveSpeed,
        waveSpeedUsed: p.waveSpeedUsed,
        velocity: p.velocity,
        length: p.length,
        frictionFactor: p.frictionFactor,
        reaches: p.reaches,
        waveSpeedSource: p.waveSpeedSource,
      })),
      joukowsky: run.joukowsky,
      envelope: run.envelope.map((p) => ({
        chainage: p.chainage,
        elevation: p.elevation,
        hglSteady: p.hglSteady,
        hglMax: p.hglMax,
        hglMin: p.hglMin,
        vapourLine: p.vapourLine,
        elementId: p.elementId,
      })),
      cavities: run.cavities.map((c) => ({
        chainage: c.chainage,
        maxVolume: c.maxVolume,
        duration: c.duration,
        firstOpen: c.firstOpen,
        elementId: c.elementId,
      })),
      findings: run.findings,
    };
    io.out(JSON.stringify(report, jsonNumber, 2) + '\n');
  } else if (format === 'csv') {
    io.out(surgeEnvelopeCsv(run, title));
  } else if (format === 'svg') {
    io.out(surgeEnvelopeSvg(run, { title }) + '\n');
  } else {
    io.out(surgeText(doc, run, file));
  }
  if (!run.ok) {
    io.err('headroute: the surge run could not be made; see its findings.\n');
    return EXIT.stopFindings;
  }
  return EXIT.ok;
}
