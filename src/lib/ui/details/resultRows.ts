/**
 * The results Details shows under an element's inputs: what an engineer checks first for a
 * pipe, a pump, a vessel, a valve or a control valve, in the project's units, each row marked
 * when a check fails (from the solve's findings, so the app and its findings agree). Pure.
 */
import type { HeadrouteDocument, Id, Pipe, SheetNode } from '../../model/types';
import { netPipeOutflow } from '../../solver/nodeFlows';
import type { Finding, FindingLevel, SolveResult } from '../../solver/types';
import { formatQuantity, type Quantity, type UnitSystem } from '../../units';
import { shownFlow } from '../results';

/** One line of results: what, its value, and the level of a failed check on it (if any). */
export interface ResultRow {
  label: string;
  value: string;
  level?: FindingLevel;
  /** A short note under the value (the limit it is checked against, the finding's words). */
  note?: string;
}

const G = 9.80665; // standard gravity, m/s² (3rd CGPM 1901, NIST SP 811)

function formatter(system: UnitSystem) {
  return (value: number | undefined, q: Quantity, digits = 3) =>
    value !== undefined && Number.isFinite(value)
      ? formatQuantity(value, q, system, { digits })
      : '—';
}

function findingsOf(result: SolveResult, id: Id, codes: readonly string[]): Finding[] {
  return result.findings.filter((f) => f.elements.includes(id) && codes.includes(f.code));
}

function worst(findings: readonly Finding[]): FindingLevel | undefined {
  if (findings.some((f) => f.level === 'stop')) return 'stop';
  if (findings.some((f) => f.level === 'caution')) return 'caution';
  return findings.length > 0 ? 'note' : undefined;
}

const REGIME: Record<string, string> = {
  laminar: 'laminar',
  transitional: 'transitional',
  turbulent: 'turbulent',
  'no-flow': 'no flow',
};

/** Reynolds number at three significant figures: "2.82 × 10⁵" (no spurious digits). */
export function reynoldsText(re: number): string {
  if (!Number.isFinite(re)) return '—';
  if (re < 1e4) return String(Number(re.toPrecision(3)));
  const exponent = Math.floor(Math.log10(re));
  const mantissa = Number((re / 10 ** exponent).toPrecision(3));
  const SUP = '⁰¹²³⁴⁵⁶⁷⁸⁹';
  const sup = String(exponent)
    .split('')
    .map((d) => SUP[Number(d)])
    .join('');
  return `${mantissa} × 10${sup}`;
}

/** Gauge and absolute pressure on one line, e.g. "1.21 barg (2.22 bara)". */
function pressurePair(
  abs: number | undefined,
  atm: number,
  f: ReturnType<typeof formatter>,
): string {
  if (abs === undefined || !Number.isFinite(abs)) return '—';
  return `${f(abs - atm, 'pressureGauge')} (${f(abs, 'pressureAbs')})`;
}

/** Results of a pipe: flow, velocity against guidance, Re, friction, losses, end pressures. */
export function pipeResultRows(
  doc: HeadrouteDocument,
  pipe: Pipe,
  result: SolveResult,
  system: UnitSystem,
): ResultRow[] {
  const r = result.pipes[pipe.id];
  if (!r) return [];
  const f = formatter(system);
  const { density, atmosphericPressure: atm, vapourPressure: pv } = result.fluid;
  const rhoG = density * G;
  const flow = shownFlow(r.flow);
  const rows: ResultRow[] = [];
  rows.push({ label: 'Flow', value: f(flow, 'volumeFlow') });

  const guidance = doc.settings.velocityGuidance;
  const velocityFindings = findingsOf(result, pipe.id, ['velocity-high', 'velocity-low']);
  rows.push({
    label: 'Velocity',
    value: f(flow === 0 ? 0 : Math.abs(r.velocity), 'velocity'),
    level: worst(velocityFindings),
    note:
      velocityFindings.length > 0
        ? velocityFindings.map((x) => x.message).join(' ')
        : `guidance: suction ≤ ${f(guidance.suctionMax, 'velocity', 2)}, discharge ${f(guidance.dischargeMin, 'velocity', 2)} to ${f(guidance.dischargeMax, 'velocity', 2)} (common practice)`,
  });
  rows.push({
    label: 'Reynolds number',
    value:
      r.regime === 'no-flow'
        ? 'no flow'
        : `${reynoldsText(r.reynolds)}, ${REGIME[r.regime] ?? r.regime}`,
  });
  rows.push({
    label: 'Friction factor',
    value:
      r.regime === 'no-flow' || !Number.isFinite(r.frictionFactor)
        ? '—'
        : `${r.frictionFactor.toPrecision(3)} (Darcy)`,
  });
  rows.push({ label: 'Friction loss', value: f(r.frictionLoss, 'head') });
  if (pipe.length > 0)
    rows.push({
      label: system === 'US' ? 'Loss per 100 ft' : 'Loss per 100 m',
      value: f((r.frictionLoss / pipe.length) * (system === 'US' ? 30.48 : 100), 'head'),
    });
  rows.push({ label: 'Entrance/exit loss', value: f(r.endLosses, 'head') });
  if (pipe.fittings) rows.push({ label: 'Fittings loss', value: f(r.fittingLoss ?? 0, 'head') });

  const pressureAt = (head: number | undefined, z: number | undefined) =>
    head === undefined || z === undefined ? undefined : atm + rhoG * (head - z);
  const pStart = pressureAt(r.headFrom, r.elevationFrom);
  const pEnd = pressureAt(r.headTo, r.elevationTo);
  rows.push({ label: 'Pressure at start', value: pressurePair(pStart, atm, f) });
  rows.push({ label: 'Pressure at end', value: pressurePair(pEnd, atm, f) });
  if (pStart !== undefined && pEnd !== undefined) {
    const low = Math.min(pStart, pEnd);
    const margin = low - pv;
    const below = findingsOf(result, pipe.id, ['below-vapour-pressure', 'vacuum']);
    rows.push({
      label: 'Margin to vapour pressure',
      value: f(margin, 'pressureDrop'),
      level: margin < 0 ? 'stop' : worst(below),
      note:
        below.length > 0
          ? below.map((x) => x.message).join(' ')
          : `lowest pressure, at its ${pStart <= pEnd ? 'start' : 'end'}; vapour pressure ${f(pv, 'pressureAbs')}`,
    });
  }
  return rows;
}

/** Results of a pump: duty, power, NPSH against what it needs, and where it runs on its curve. */
export function pumpResultRows(
  doc: HeadrouteDocument,
  node: SheetNode,
  result: SolveResult,
  system: UnitSystem,
): ResultRow[] {
  const p = result.pumps[node.id];
  if (!p) return [];
  const f = formatter(system);
  const settings = doc.settings.npshMargin;
  const npshFindings = findingsOf(result, node.id, ['npsh-below-required', 'npsh-margin-low']);
  const bepFindings = findingsOf(result, node.id, ['pump-off-bep', 'pump-at-shutoff']);
  const rows: ResultRow[] = [
    { label: 'Flow', value: f(shownFlow(p.flow), 'volumeFlow') },
    { label: 'Head', value: f(p.head, 'head') },
    {
      label: 'Efficiency',
      value: Number.isFinite(p.efficiency) ? `${(p.efficiency * 100).toFixed(1)} %` : '—',
    },
    { label: 'Shaft power', value: f(p.shaftPower, 'power') },
    { label: 'NPSH available', value: f(p.npshAvailable, 'head') },
    { label: 'NPSH required', value: f(p.npshRequired, 'head') },
    {
      label: 'NPSH margin',
      value: Number.isFinite(p.npshMargin)
        ? `${f(p.npshMargin, 'head')} (ratio ${Number.isFinite(p.npshRatio) ? p.npshRatio.toFixed(2) : '—'})`
        : '—',
      level: worst(npshFindings),
      note:
        npshFindings.length > 0
          ? npshFindings.map((x) => x.message).join(' ')
          : `wanted: NPSHa/NPSHr ≥ ${settings.ratio} and NPSHa − NPSHr ≥ ${f(settings.metres, 'head', 2)}`,
    },
    {
      label: 'Flow / best-efficiency flow',
      value:
        p.bepFraction !== undefined && Number.isFinite(p.bepFraction)
          ? `${Math.round(p.bepFraction * 100)} %`
          : '—',
      level: worst(bepFindings),
      note: bepFindings.length > 0 ? bepFindings.map((x) => x.message).join(' ') : undefined,
    },
  ];
  return rows;
}

/**
 * Results of any other node: net flow in or out (vessels, branch points, headers, draw-offs),
 * flow through it, pressures at its ports, its loss; a control valve's opening, drop and
 * choking.
 */
export function nodeResultRows(
  doc: HeadrouteDocument,
  node: SheetNode,
  result: SolveResult,
  system: UnitSystem,
): ResultRow[] {
  const nr = result.nodes[node.id];
  if (!nr) return [];
  const f = formatter(system);
  const atm = result.fluid.atmosphericPressure;
  const pv = result.fluid.vapourPressure;
  const rows: ResultRow[] = [];
  if (node.kind === 'vessel' || node.kind === 'boundary') {
    const out = netPipeOutflow(doc, result, node.id);
    if (out !== null) {
      const q = shownFlow(out);
      rows.push({
        label: q === 0 ? 'Net flow' : out > 0 ? 'Net flow out' : 'Net flow in',
        value: f(q, 'volumeFlow'),
      });
    }
  }
  if (nr.flow !== undefined)
    rows.push({ label: 'Flow', value: f(shownFlow(nr.flow), 'volumeFlow') });
  for (const [port, pr] of Object.entries(nr.ports)) {
    rows.push({
      label: `Pressure at ${node.kind === 'vessel' ? 'nozzle ' : ''}${port}`,
      value: pressurePair(pr.pressureAbs, atm, f),
      level: pr.pressureAbs < pv ? 'stop' : undefined,
    });
  }
  if (nr.headLoss !== undefined && node.kind !== 'pump') {
    const rhoG = result.fluid.density * G;
    rows.push({
      label: 'Loss across it',
      value: `${f(nr.headLoss, 'head')} (${f(nr.headLoss * rhoG, 'pressureDrop')})`,
    });
  }
  if (nr.lossCoefficient !== undefined && Number.isFinite(nr.lossCoefficient))
    rows.push({ label: 'Loss coefficient K', value: nr.lossCoefficient.toPrecision(3) });
  const cv = result.controlValves[node.id];
  if (cv) {
    rows.push({ label: 'Opening', value: `${Math.round(cv.opening * 100)} %` });
    rows.push({ label: 'Pressure drop', value: f(cv.pressureDrop, 'pressureDrop') });
    rows.push({ label: 'Flow coefficient', value: f(cv.kv, 'kvCoefficient') });
    rows.push({
      label: 'Choked at a drop of',
      value: f(cv.chokedPressureDrop, 'pressureDrop'),
      level: cv.choked ? 'stop' : undefined,
      note: cv.choked
        ? cv.flowLimited
          ? 'choked: the flow is held at the most the valve passes'
          : 'choked'
        : undefined,
    });
  }
  return rows;
}
