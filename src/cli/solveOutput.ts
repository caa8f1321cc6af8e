/**
 * `headroute solve` output in its three formats. Every format carries the screening caution:
 * text as a footer, CSV as a comment line, JSON as a "caution" field.
 */
import { fittingTypeName } from '../lib/model/labels';
import type { Finding } from '../lib/solver/types';
import { formatQuantity, type UnitSystem } from '../lib/units';
import type {
  ControlValveRow,
  FittingRow,
  PipeFittingsRow,
  PipeRow,
  PumpRow,
  SolveReport,
} from './solveReport';
import { csvTable, textTable, type Column } from './table';

const PIPE_COLUMNS: Column<PipeRow>[] = [
  { title: 'pipe', quantity: null, value: (r) => r.name },
  { title: 'from → to', quantity: null, value: (r) => `${r.from} → ${r.to}` },
  { title: 'length', quantity: 'length', value: (r) => r.length },
  { title: 'bore', quantity: 'diameter', value: (r) => r.innerDiameter },
  { title: 'flow', quantity: 'volumeFlow', value: (r) => r.flow },
  { title: 'velocity', quantity: 'velocity', value: (r) => r.velocity },
  { title: 'Re', quantity: null, value: (r) => Math.round(r.reynolds), digits: 6 },
  { title: 'regime', quantity: null, value: (r) => r.regime },
  { title: 'f', quantity: null, value: (r) => r.frictionFactor, digits: 4 },
  { title: 'friction loss', quantity: 'head', value: (r) => r.frictionLoss },
  { title: 'end losses', quantity: 'head', value: (r) => r.endLosses },
];

const PUMP_COLUMNS: Column<PumpRow>[] = [
  { title: 'pump', quantity: null, value: (r) => r.name },
  { title: 'state', quantity: null, value: (r) => (r.running ? 'running' : 'off') },
  { title: 'flow', quantity: 'volumeFlow', value: (r) => r.flow },
  { title: 'head', quantity: 'head', value: (r) => r.head },
  { title: 'NPSHa', quantity: 'head', value: (r) => r.npshAvailable },
  { title: 'NPSHr', quantity: 'head', value: (r) => r.npshRequired },
  { title: 'NPSH margin', quantity: 'head', value: (r) => r.npshMargin },
  { title: 'NPSHa/NPSHr', quantity: null, value: (r) => r.npshRatio, digits: 3 },
  { title: 'efficiency', quantity: 'fraction', value: (r) => r.efficiency },
  { title: 'shaft power', quantity: 'power', value: (r) => r.shaftPower },
  { title: 'of BEP flow', quantity: 'fraction', value: (r) => r.bepFraction ?? null },
];

const CONTROL_VALVE_COLUMNS: Column<ControlValveRow>[] = [
  { title: 'control valve', quantity: null, value: (r) => r.name },
  { title: 'opening', quantity: 'fraction', value: (r) => r.opening },
  { title: 'Kv at opening', quantity: null, value: (r) => r.kv, digits: 4 },
  { title: 'flow', quantity: 'volumeFlow', value: (r) => r.flow },
  { title: 'pressure drop', quantity: 'pressureDrop', value: (r) => r.pressureDrop },
  { title: 'choked-flow drop', quantity: 'pressureDrop', value: (r) => r.chokedPressureDrop },
  { title: 'choked', quantity: null, value: (r) => (r.choked ? 'yes' : 'no') },
];

const FITTING_COLUMNS: Column<FittingRow>[] = [
  { title: 'fitting or valve', quantity: null, value: (r) => r.name },
  {
    title: 'type',
    quantity: null,
    value: (r) => fittingTypeName(r.fittingType).toLowerCase() + (r.closed ? ' (shut)' : ''),
  },
  { title: 'flow', quantity: 'volumeFlow', value: (r) => r.flow },
  { title: 'K', quantity: null, value: (r) => r.lossCoefficient, digits: 3 },
  { title: 'loss', quantity: 'head', value: (r) => r.headLoss },
];

const PIPE_FITTINGS_COLUMNS: Column<PipeFittingsRow>[] = [
  { title: 'pipe', quantity: null, value: (r) => r.name },
  { title: 'fittings', quantity: null, value: (r) => r.text },
  { title: 'K', quantity: null, value: (r) => r.fittingK, digits: 3 },
  { title: 'loss', quantity: 'head', value: (r) => r.fittingLoss },
];

const FINDING_COLUMNS: Column<Finding>[] = [
  { title: 'level', quantity: null, value: (f) => f.level },
  { title: 'code', quantity: null, value: (f) => f.code },
  { title: 'chainage', quantity: 'length', value: (f) => f.chainage ?? null },
  { title: 'elements', quantity: null, value: (f) => f.elements.join(' ') },
  { title: 'message', quantity: null, value: (f) => f.message },
];

const LEVEL_ORDER = { stop: 0, caution: 1, note: 2 } as const;

function sortedFindings(findings: readonly Finding[]): Finding[] {
  return [...findings].sort((a, b) => LEVEL_ORDER[a.level] - LEVEL_ORDER[b.level]);
}

function fq(value: number, quantity: Parameters<typeof formatQuantity>[1], system: UnitSystem) {
  return formatQuantity(value, quantity, system);
}

function headerLines(r: SolveReport): string[] {
  const s = r.unitSystem;
  const f = r.fluid;
  return [
    `Project: ${r.project} (${r.file})`,
    `Case: ${r.case.name}`,
    `Liquid: ${f.liquidName} at ${fq(f.temperature, 'temperature', s)}; density ${fq(f.density, 'density', s)}, viscosity ${fq(f.viscosity, 'dynamicViscosity', s)}, vapour pressure ${fq(f.vapourPressure, 'pressureAbs', s)}; atmospheric pressure ${fq(f.atmosphericPressure, 'pressureAbs', s)}`,
    `Solve: ${r.converged ? 'converged' : 'NOT converged'} after ${r.iterations} iterations (largest head residual ${r.residual.toExponential(2)} m, mass balance ${r.massImbalance.toExponential(2)} m³/s)`,
  ];
}

function routeLine(r: SolveReport): string {
  const route = r.route;
  if (!route) return 'Route: none (no two vessels, headers or draw-offs are joined by pipes).';
  const s = r.unitSystem;
  const base = `Route ${route.name}: ${fq(route.length, 'length', s)} along ${route.nodes.length} nodes`;
  if (route.lowestVapourMargin === null) return `${base}; no solved stations.`;
  return `${base}; lowest margin to vapour pressure ${fq(route.lowestVapourMargin, 'pressureDrop', s)} (absolute pressure ${fq(route.lowestPressureAbs!, 'pressureAbs', s)}) at chainage ${fq(route.lowestChainage!, 'length', s)}, on ${route.lowestElementName ?? route.lowestElement}.`;
}

/** The readable report: header, tables of pipes, pumps, valves and fittings, findings, caution. */
export function solveText(r: SolveReport): string {
  const s = r.unitSystem;
  const out = [`Headroute — ${r.project}`, ...headerLines(r), ''];
  out.push('Pipes', textTable(r.pipes, PIPE_COLUMNS, s), '');
  out.push('Pumps', textTable(r.pumps, PUMP_COLUMNS, s), '');
  out.push('Control valves', textTable(r.controlValves, CONTROL_VALVE_COLUMNS, s), '');
  out.push('Fittings and valves', textTable(r.fittings, FITTING_COLUMNS, s), '');
  if (r.pipeFittings.length) {
    out.push('Fittings on pipes', textTable(r.pipeFittings, PIPE_FITTINGS_COLUMNS, s), '');
  }
  out.push(routeLine(r), '');
  const { stop, caution, note } = r.counts;
  out.push(`Findings (${stop} stop, ${caution} caution, ${note} note)`);
  if (r.findings.length === 0) out.push('  (none)');
  for (const f of sortedFindings(r.findings))
    out.push(`  ${f.level.toUpperCase().padEnd(7)} ${f.message}`);
  out.push('', `Caution: ${r.caution}`, '');
  return out.join('\n');
}

/** One CSV table per section, each headed by a "# Section" comment; the caution as a comment. */
export function solveCsv(r: SolveReport): string {
  const s = r.unitSystem;
  const out = [...headerLines(r), routeLine(r), `Units: ${s}`, r.caution].map((l) => `# ${l}`);
  const section = <T>(title: string, rows: readonly T[], columns: Column<T>[]) => {
    out.push('', `# ${title}`, ...csvTable(rows, columns, s));
  };
  section('Pipes', r.pipes, [{ title: 'id', quantity: null, value: (p) => p.id }, ...PIPE_COLUMNS]);
  section('Pumps', r.pumps, [{ title: 'id', quantity: null, value: (p) => p.id }, ...PUMP_COLUMNS]);
  section('Control valves', r.controlValves, [
    { title: 'id', quantity: null, value: (p) => p.id },
    ...CONTROL_VALVE_COLUMNS,
  ]);
  section('Fittings and valves', r.fittings, [
    { title: 'id', quantity: null, value: (p) => p.id },
    ...FITTING_COLUMNS,
  ]);
  section('Fittings on pipes', r.pipeFittings, [
    { title: 'id', quantity: null, value: (p) => p.id },
    ...PIPE_FITTINGS_COLUMNS,
  ]);
  section('Findings', sortedFindings(r.findings), FINDING_COLUMNS);
  out.push('');
  return out.map((l) => (l.startsWith('#') ? l.replace(/\n/g, ' ') : l)).join('\n');
}

/** The report as JSON (SI values), with the caution as a field. */
export function solveJson(r: SolveReport): string {
  return (
    JSON.stringify(
      r,
      (_key, value) => (typeof value === 'number' && !Number.isFinite(value) ? null : value),
      2,
    ) + '\n'
  );
}
