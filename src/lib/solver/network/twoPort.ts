/**
 * Links for two-port sheet nodes: fittings and manual valves, check valves, reducers and
 * expanders, restriction orifices, control valves and pumps.
 */
import type { ControlValve, Fitting, Pump, SheetNode } from '../../model/types';
import {
  kvFromCv,
  relativeFlowCoefficient,
  valvePressureDropFromFlow,
} from '../../physics/controlValve';
import {
  diameterChangeK,
  fittingLossCoefficient,
  orificeLossCoefficient,
} from '../../physics/fittings';
import { reynoldsNumber } from '../../physics/friction';
import { fitCurve, pumpHead, pumpHeadSlope, type PumpFit } from '../../physics/pump';
import type { Finding } from '../types';
import { findings } from '../findings/catalogue';
import type { SolveFluid } from '../fluid';
import {
  area,
  CLOSED_RESISTANCE,
  ClosedLaw,
  GRAVITY,
  LocalLossLaw,
  PumpLaw,
  QuadraticLaw,
  type LinkLaw,
} from './laws';

/** Bore assumed for a two-port element with no pipe on either side, m (it carries no flow). */
const FALLBACK_DIAMETER = 0.05;

/** What the results need to know about a two-port link. */
export type TwoPortInfo =
  | { kind: 'fitting'; closed: boolean; nonReturn: boolean; law: LocalLossLaw | null }
  | {
      kind: 'pump';
      running: boolean;
      duty: boolean;
      speedRatio: number;
      headFit: PumpFit;
      npshrFit: PumpFit;
      efficiencyFit: PumpFit;
    }
  | { kind: 'control-valve'; kv: number; closed: boolean };

/** A two-port link's law (null when flow-controlled), fixed flow and information. */
export interface TwoPortLink {
  law: LinkLaw | null;
  fixedFlow: number;
  info: TwoPortInfo;
}

/**
 * Control-valve coefficient c (h = c·Q|Q|, s²/m⁵) from which a valve counts as shut: it then
 * passes less at 100 m of head (√(100/c)) than a shut valve's CLOSED_RESISTANCE lets through
 * (100/R), i.e. c ≥ R²/100. Such a valve (e.g. linear, opened 1e-9) would otherwise put slopes
 * beyond working precision into the node equations.
 */
export const NEAR_SHUT_COEFFICIENT = (CLOSED_RESISTANCE * CLOSED_RESISTANCE) / 100;

const NON_RETURN = new Set(['swing-check-valve', 'lift-check-valve']);

/**
 * The link of a fitting, control valve or pump.
 * @param dIn inner diameter of the pipe on the inlet/suction port, if any
 * @param dOut inner diameter of the pipe on the outlet/discharge port, if any
 */
export function twoPortLink(
  node: Fitting | ControlValve | Pump | SheetNode,
  dIn: number | undefined,
  dOut: number | undefined,
  fluid: SolveFluid,
  out: Finding[],
): TwoPortLink {
  const inlet = dIn ?? dOut ?? FALLBACK_DIAMETER;
  const outlet = dOut ?? dIn ?? FALLBACK_DIAMETER;
  switch (node.kind) {
    case 'fitting':
      return fittingLink(node, inlet, outlet, fluid, out);
    case 'control-valve':
      return controlValveLink(node, inlet, fluid);
    case 'pump':
      return pumpLink(node, inlet, out);
    default:
      throw new Error(`${node.kind} is not a two-port element`);
  }
}

function fittingLink(
  fitting: Fitting,
  pipeIn: number,
  pipeOut: number,
  fluid: SolveFluid,
  out: Finding[],
): TwoPortLink {
  const nonReturn = NON_RETURN.has(fitting.fittingType);
  if (fitting.closed) {
    return {
      law: new ClosedLaw(),
      fixedFlow: 0,
      info: { kind: 'fitting', closed: true, nonReturn, law: null },
    };
  }
  const type = fitting.fittingType;
  const declared = (d: number | undefined) => (d !== undefined && d > 0 ? d : undefined);
  const isDiameterChange = type === 'reducer' || type === 'expander';
  // A reducer's own diameters set its K; other fittings take the pipes' bores.
  const dIn = isDiameterChange ? (declared(fitting.inletDiameter) ?? pipeIn) : pipeIn;
  const dOut = isDiameterChange ? (declared(fitting.outletDiameter) ?? pipeOut) : pipeOut;
  const cone = fitting.coneAngle !== undefined && fitting.coneAngle > 0 ? fitting.coneAngle : 180;
  const reynolds = (flow: number, d: number) =>
    reynoldsNumber(flow / area(d), d, fluid.density, fluid.viscosity);

  const coefficient = (flow: number): { k: number; area: number } => {
    const forward = flow >= 0;
    const up = forward ? dIn : dOut;
    const down = forward ? dOut : dIn;
    if (fitting.lossMethod === 'fixed') return { k: fitting.fixedK, area: area(up) };
    if (isDiameterChange) return { k: diameterChangeK(up, down, cone), area: area(up) };
    if (type === 'restriction-orifice') {
      const bore = fitting.boreDiameter ?? 0;
      return { k: orificeLossCoefficient(up, bore, reynolds(flow, up)), area: area(up) };
    }
    return {
      k: fittingLossCoefficient(type, fitting.lossMethod, reynolds(flow, up), up, fitting.fixedK),
      area: area(up),
    };
  };

  let safe = coefficient;
  try {
    coefficient(area(dIn));
    coefficient(-area(dOut));
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    out.push(
      findings.invalidInput(
        fitting.name,
        `its loss coefficient cannot be found (${why}); fixed K ${fitting.fixedK} is used instead`,
        fitting.id,
      ),
    );
    safe = (flow) => ({ k: fitting.fixedK, area: area(flow >= 0 ? dIn : dOut) });
  }
  const law = new LocalLossLaw(safe, nonReturn, area(dIn) * 1);
  return { law, fixedFlow: 0, info: { kind: 'fitting', closed: false, nonReturn, law } };
}

function controlValveLink(valve: ControlValve, pipeIn: number, fluid: SolveFluid): TwoPortLink {
  const rated =
    valve.coefficientUnit === 'Cv' ? kvFromCv(valve.ratedCoefficient) : valve.ratedCoefficient;
  const kv =
    rated * relativeFlowCoefficient(valve.characteristic, valve.opening, valve.rangeability);
  if (!(kv > 0) || !Number.isFinite(kv)) {
    return {
      law: new ClosedLaw(),
      fixedFlow: 0,
      info: { kind: 'control-valve', kv: 0, closed: true },
    };
  }
  // IEC 60534-2-1 eq. (1): Δp is quadratic in Q, so c = Δp(Q = 1 m³/s)/(ρg).
  const c = valvePressureDropFromFlow(kv, 1, fluid.density) / (fluid.density * GRAVITY);
  if (!(c < NEAR_SHUT_COEFFICIENT)) {
    // Opened so little that it passes less than a shut valve does (see NEAR_SHUT_COEFFICIENT).
    return {
      law: new ClosedLaw(),
      fixedFlow: 0,
      info: { kind: 'control-valve', kv, closed: true },
    };
  }
  return {
    // Start at 1 m/s in the pipe, or at the flow that 10 m of head would pass if less.
    law: new QuadraticLaw(c, Math.min(area(pipeIn) * 1, Math.sqrt(10 / c))),
    fixedFlow: 0,
    info: { kind: 'control-valve', kv, closed: false },
  };
}

function pumpLink(pump: Pump, pipeIn: number, out: Finding[]): TwoPortLink {
  if (pump.running && !(pump.ratedSpeed > 0 && Number.isFinite(pump.ratedSpeed))) {
    out.push(
      findings.invalidInput(
        pump.name,
        'its rated speed is not a positive number, so it is treated as stopped',
        pump.id,
      ),
    );
  }
  const speedRatio = pump.ratedSpeed > 0 && pump.speed > 0 ? pump.speed / pump.ratedSpeed : 0;
  const running = pump.running && speedRatio > 0 && Number.isFinite(speedRatio);
  const duty = pump.mode === 'duty';
  const headFit = fitCurve(pump.headCurve);
  const info: TwoPortInfo = {
    kind: 'pump',
    running,
    duty: running && duty,
    speedRatio: running ? speedRatio : 0,
    headFit,
    npshrFit: fitCurve(pump.npshrCurve),
    efficiencyFit: fitCurve(pump.efficiencyCurve),
  };
  if (!running) return { law: new ClosedLaw(), fixedFlow: 0, info };
  if (duty) {
    if (!(pump.dutyFlow >= 0) || !Number.isFinite(pump.dutyFlow)) {
      out.push(
        findings.invalidInput(
          pump.name,
          'its duty flow is not a positive number, so it is treated as stopped',
          pump.id,
        ),
      );
      return { law: new ClosedLaw(), fixedFlow: 0, info: { ...info, duty: false } };
    }
    return { law: null, fixedFlow: pump.dutyFlow, info };
  }
  if (headFit.form === 'empty') {
    out.push(findings.pumpCurveMissing(pump.name, pump.id));
    return { law: new ClosedLaw(), fixedFlow: 0, info: { ...info, running: false } };
  }
  const range = headFit.flowRange;
  const middle = range ? ((range.min + range.max) / 2) * speedRatio : 0;
  const initialFlow = middle > 0 ? middle : area(pipeIn) * 1;
  const law = new PumpLaw(
    (q) => pumpHead(headFit, q, speedRatio),
    (q) => pumpHeadSlope(headFit, q, speedRatio),
    initialFlow,
  );
  return { law, fixedFlow: 0, info };
}
