/**
 * Tables of the review sheet: pipes, fittings and control valves, pumps, vessels and
 * boundaries, each with its inputs (as the case applies them) and its results, in the
 * project's unit system.
 */
import type { HeadrouteDocument, Id, Pipe, SheetNode } from '../model/types';
import { PIPE_MATERIALS } from '../physics/materials';
import { netPipeOutflow } from '../solver/nodeFlows';
import type { SolveResult } from '../solver/types';
import { formatQuantity, NOT_A_VALUE, type Quantity, type UnitSystem } from '../units';
import { tableHtml, type Cell } from './html';

/** Formats SI values for one review sheet. */
export interface Formatter {
  system: UnitSystem;
  /** A value with its unit, or "—" when missing. */
  q(value: number | null | undefined, quantity: Quantity, digits?: number): string;
}

/** A formatter in the document's unit system. */
export function formatterFor(system: UnitSystem): Formatter {
  return {
    system,
    q(value, quantity, digits) {
      if (value === null || value === undefined || !Number.isFinite(value)) return NOT_A_VALUE;
      return formatQuantity(value, quantity, system, { digits });
    },
  };
}

const num = (text: string): Cell => ({ text, className: 'num' });

function nodeName(doc: HeadrouteDocument, id: Id): string {
  const n = Object.hasOwn(doc.nodes, id) ? doc.nodes[id] : undefined;
  return n?.name || id;
}

function boreText(pipe: Pipe): string {
  return pipe.bore.mode === 'catalogue'
    ? `NPS ${pipe.bore.nominalSize} Sch ${pipe.bore.schedule}`
    : 'typed';
}

function materialText(pipe: Pipe, fmt: Formatter): string {
  // The material's name up to its first comma ("Carbon steel"); the full name is in the methods.
  const name = (PIPE_MATERIALS[pipe.material]?.name ?? pipe.material).split(',')[0];
  return pipe.roughness === null ? name : `${name}, ε ${fmt.q(pipe.roughness, 'roughness')}`;
}

/** Pipes: route, length, bore, material; flow, velocity, Reynolds number, regime, f, losses. */
export function pipesTable(doc: HeadrouteDocument, result: SolveResult, fmt: Formatter): string {
  const rows = Object.values(doc.pipes).map((pipe): Cell[] => {
    const r = result.pipes[pipe.id];
    return [
      pipe.name || pipe.id,
      `${nodeName(doc, pipe.from.node)} → ${nodeName(doc, pipe.to.node)}`,
      num(fmt.q(pipe.length, 'length')),
      `${boreText(pipe)}, ${fmt.q(r?.innerDiameter, 'diameter')}`,
      materialText(pipe, fmt),
      num(fmt.q(r?.flow, 'volumeFlow')),
      num(fmt.q(r?.velocity, 'velocity', 3)),
      num(r ? formatNumberPlain(r.reynolds) : NOT_A_VALUE),
      r?.regime ?? 'not solved',
      num(r ? formatNumberPlain(r.frictionFactor, 3) : NOT_A_VALUE),
      num(fmt.q(r ? r.frictionLoss : null, 'head', 3)),
    ];
  });
  return tableHtml(
    'Pipes',
    [
      'Pipe',
      'From → to',
      'Length',
      'Bore, inner dia.',
      'Material',
      'Flow',
      'Velocity',
      'Re',
      'Regime',
      'f',
      'Loss',
    ],
    rows,
  );
}

function formatNumberPlain(v: number, digits = 4): string {
  if (!Number.isFinite(v)) return NOT_A_VALUE;
  return Math.abs(v) >= 10 ** digits
    ? String(Math.round(v))
    : String(Number(v.toPrecision(digits)));
}

const FITTING_NAMES: Record<string, string> = {
  'elbow-90-standard': '90° elbow, standard',
  'elbow-90-long-radius': '90° elbow, long radius',
  'elbow-45-standard': '45° elbow, standard',
  'elbow-45-long-radius': '45° elbow, long radius',
  'tee-run': 'Tee, run',
  'tee-branch': 'Tee, branch',
  'gate-valve': 'Gate valve',
  'globe-valve': 'Globe valve',
  'ball-valve': 'Ball valve',
  'butterfly-valve': 'Butterfly valve',
  'swing-check-valve': 'Swing check valve',
  'lift-check-valve': 'Lift check valve',
  strainer: 'Strainer',
  'flow-meter': 'Flow meter',
  reducer: 'Reducer',
  expander: 'Expander',
  'restriction-orifice': 'Restriction orifice',
};

const METHOD_NAMES = { fixed: 'fixed K', '2K': '2-K (Hooper 1981)', '3K': '3-K (Darby 2001)' };

/** Fittings and manual valves: type, method, K used, flow and head loss. */
export function fittingsTable(doc: HeadrouteDocument, result: SolveResult, fmt: Formatter): string {
  const rows: Cell[][] = [];
  for (const n of Object.values(doc.nodes)) {
    if (n.kind !== 'fitting') continue;
    const r = result.nodes[n.id];
    const geometry =
      n.fittingType === 'restriction-orifice'
        ? `bore ${fmt.q(n.boreDiameter, 'diameter')}`
        : n.fittingType === 'reducer' || n.fittingType === 'expander'
          ? `${fmt.q(n.inletDiameter, 'diameter')} → ${fmt.q(n.outletDiameter, 'diameter')}, ${n.coneAngle ?? 180}°`
          : '';
    const isGeometric = geometry !== '';
    rows.push([
      n.name || n.id,
      FITTING_NAMES[n.fittingType] ?? n.fittingType,
      isGeometric
        ? geometry
        : n.lossMethod === 'fixed'
          ? `fixed K ${n.fixedK}`
          : METHOD_NAMES[n.lossMethod],
      n.closed ? 'shut' : 'open',
      num(r?.lossCoefficient !== undefined ? formatNumberPlain(r.lossCoefficient, 3) : NOT_A_VALUE),
      num(fmt.q(r?.flow, 'volumeFlow')),
      num(fmt.q(r?.headLoss, 'head', 3)),
    ]);
  }
  return tableHtml(
    'Fittings and valves',
    ['Fitting', 'Type', 'Method', 'State', 'K', 'Flow', 'Head loss'],
    rows,
  );
}

/** Control valves (IEC 60534-2-1): coefficient, characteristic, opening, Δp, choked limit. */
export function controlValvesTable(
  doc: HeadrouteDocument,
  result: SolveResult,
  fmt: Formatter,
): string {
  const rows: Cell[][] = [];
  for (const n of Object.values(doc.nodes)) {
    if (n.kind !== 'control-valve') continue;
    const r = result.controlValves[n.id];
    rows.push([
      n.name || n.id,
      `${n.coefficientUnit} ${n.ratedCoefficient}, ${n.characteristic}, R ${n.rangeability}, FL ${n.pressureRecoveryFactor}`,
      num(fmt.q(n.opening, 'fraction', 3)),
      num(fmt.q(r?.flow, 'volumeFlow')),
      num(fmt.q(r?.pressureDrop, 'pressureDrop')),
      num(fmt.q(r?.chokedPressureDrop, 'pressureDrop')),
      r ? (r.choked ? (r.flowLimited ? 'CHOKED, flow held' : 'CHOKED') : 'no') : 'not solved',
    ]);
  }
  return tableHtml(
    'Control valves',
    ['Valve', 'Inputs', 'Opening', 'Flow', 'Δp', 'Choked Δp', 'Choked'],
    rows,
  );
}

/** Pumps: state, speed, mode; flow, head, NPSHa, NPSHr, margin, efficiency, power, BEP. */
export function pumpsTable(doc: HeadrouteDocument, result: SolveResult, fmt: Formatter): string {
  const rows: Cell[][] = [];
  for (const n of Object.values(doc.nodes)) {
    if (n.kind !== 'pump') continue;
    const r = result.pumps[n.id];
    const on = n.running;
    const mode = n.mode === 'duty' ? `duty ${fmt.q(n.dutyFlow, 'volumeFlow')}` : 'rating';
    const flanges =
      n.suctionElevation !== undefined || n.dischargeElevation !== undefined
        ? `; flanges: suction ${fmt.q(n.suctionElevation ?? n.z, 'elevation')}, discharge ${fmt.q(n.dischargeElevation ?? n.z, 'elevation')}`
        : '';
    rows.push([
      n.name || n.id,
      (on ? `on, ${Math.round(n.speed)} of ${Math.round(n.ratedSpeed)} rpm, ${mode}` : 'off') +
        flanges,
      num(fmt.q(r?.flow, 'volumeFlow')),
      num(fmt.q(r?.head, 'head')),
      num(fmt.q(r?.npshAvailable, 'head', 3)),
      num(on ? fmt.q(r?.npshRequired, 'head', 3) : NOT_A_VALUE),
      num(on ? fmt.q(r?.npshMargin, 'head', 3) : NOT_A_VALUE),
      num(on && r && r.npshRatio > 0 ? formatNumberPlain(r.npshRatio, 3) : NOT_A_VALUE),
      num(on ? fmt.q(r?.efficiency, 'fraction', 3) : NOT_A_VALUE),
      num(on ? fmt.q(r?.shaftPower, 'power', 3) : NOT_A_VALUE),
      num(on && r ? fmt.q(r.bepFraction, 'fraction', 3) : NOT_A_VALUE),
    ]);
  }
  return tableHtml(
    'Pumps',
    [
      'Pump',
      'State',
      'Flow',
      'Head',
      'NPSHa',
      'NPSHr',
      'Margin',
      'Ratio',
      'Eff.',
      'Power',
      'Q/Q BEP',
    ],
    rows,
  );
}

function vesselInputs(n: SheetNode, fmt: Formatter): string {
  if (n.kind === 'junction') return `fixed draw-off ${fmt.q(n.outflow ?? 0, 'volumeFlow')}`;
  if (n.kind === 'boundary')
    return n.holds === 'flow'
      ? `fixed outflow ${fmt.q(n.outflow ?? 0, 'volumeFlow')}`
      : `fixed ${fmt.q(n.pressureAbs, 'pressureAbs')}`;
  if (n.kind !== 'vessel') return '';
  const gas = n.open ? 'open' : `closed, gas ${fmt.q(n.gasPressureAbs, 'pressureAbs')}`;
  const nozzles = n.nozzles.map((z) => `${z.id} at ${fmt.q(z.z, 'elevation')}`).join(', ');
  return `${gas}; level ${fmt.q(n.liquidLevel, 'elevation')}; bottom ${fmt.q(n.z, 'elevation')}; nozzles ${nozzles}`;
}

/** Vessels, boundaries and branch points with a draw-off: inputs and the pressure and flow at each port. */
export function vesselsTable(doc: HeadrouteDocument, result: SolveResult, fmt: Formatter): string {
  const rows: Cell[][] = [];
  for (const n of Object.values(doc.nodes)) {
    const drawOff = n.kind === 'junction' && n.outflow !== undefined;
    if (n.kind !== 'vessel' && n.kind !== 'boundary' && !drawOff) continue;
    const ports = result.nodes[n.id]?.ports ?? {};
    const portText = Object.entries(ports)
      .map(
        ([port, p]) =>
          `${port}: ${fmt.q(p.pressureAbs, 'pressureAbs')}, HGL ${fmt.q(p.head, 'elevation')}`,
      )
      .join('; ');
    rows.push([
      n.name || n.id,
      n.kind === 'vessel' ? 'vessel' : n.kind === 'junction' ? 'branch point' : 'boundary',
      vesselInputs(n, fmt),
      portText || NOT_A_VALUE,
      num(fmt.q(netPipeOutflow(doc, result, n.id), 'volumeFlow')),
    ]);
  }
  return tableHtml(
    'Vessels and boundaries',
    ['Element', 'Kind', 'Inputs', 'At the ports', 'Net outflow'],
    rows,
  );
}
