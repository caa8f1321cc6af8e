/**
 * Head-loss laws of the links of the hydraulic graph. Heads at graph nodes are total heads
 * (EGL, m of liquid); every law gives the total-head drop from a link's `from` node to its `to`
 * node as a function of the flow (m³/s, positive from → to), and its slope.
 *
 * Energy equation with losses per unit weight (extended Bernoulli):
 *   z₁ + p₁/ρg + v₁²/2g + h_pump = z₂ + p₂/ρg + v₂²/2g + h_loss,
 * so across a link the EGL changes only by losses and pump head. The HGL (EGL − v²/2g) then
 * steps by the velocity-head change wherever the bore changes, with or without loss.
 */
import { ISA_STANDARD_GRAVITY } from '../../physics/atmosphere';
import {
  colebrookWhite,
  darcyFrictionFactor,
  type FrictionFactorResult,
  LAMINAR_LIMIT_REYNOLDS,
  reynoldsNumber,
  TURBULENT_LIMIT_REYNOLDS,
} from '../../physics/friction';
import { colebrookWhiteFrom } from './colebrook';

/** Standard gravity, m/s² (ISO 2533 / CGPM 1901). */
export const GRAVITY = ISA_STANDARD_GRAVITY;

/**
 * Resistance of a shut link, and of a non-return link (pump, check valve) against reverse
 * flow, s/m²: h = R·Q. A closed element is a stiff linear resistance rather than a removed
 * link, so the pressure in a blocked-in section still follows from the rest of the sheet; it
 * passes |ΔH|/R, i.e. 1e-8 m³/s (0.036 L/h) for 100 m of head across it.
 */
export const CLOSED_RESISTANCE = 1e10;

/** A link's head-loss law. */
export interface LinkLaw {
  /** Update coefficients that are lagged one iteration (Reynolds-dependent K) at this flow. */
  refresh(flow: number): void;
  /** EGL at `from` minus EGL at `to`, m, at this flow. */
  headLoss(flow: number): number;
  /** d(headLoss)/d(flow), s/m²; may be zero or negative, the iteration floors it. */
  slope(flow: number): number;
  /** A starting flow for the iteration, m³/s. */
  readonly initialFlow: number;
  /** True for a non-return link (pump, check valve): reverse flow meets CLOSED_RESISTANCE. */
  readonly nonReturn?: boolean;
  /**
   * Set by the iteration on a non-return link that sits at zero flow with no head pushing it
   * shut: from then on its forward law is used on both sides of Q = 0, so rounding-level flows
   * do not flip it between branches (see gga.ts).
   */
  forwardOnly?: boolean;
}

/** Pipe cross-section area, m². */
export function area(diameter: number): number {
  return (Math.PI * diameter * diameter) / 4;
}

/** A shut element: h = R·Q. */
export class ClosedLaw implements LinkLaw {
  readonly initialFlow = 0;
  refresh(): void {}
  headLoss(flow: number): number {
    return CLOSED_RESISTANCE * flow;
  }
  slope(): number {
    return CLOSED_RESISTANCE;
  }
}

/** Liquid properties a law needs. */
export interface LawFluid {
  density: number;
  viscosity: number;
}

/**
 * Colebrook–White friction factors by (Re, ε/D), shared by the pipe laws of one solve. A
 * pipe's first turbulent evaluation is at its starting flow of 1 m/s, where Re = ρD/μ is the
 * same for every pipe of one bore, so pipes of one size and material find the factor once.
 * The factor is physics/friction `colebrookWhite` of the same arguments, so nothing changes.
 */
export class ColebrookMemo {
  private readonly byRoughness = new Map<number, Map<number, number>>();

  /** colebrookWhite(reynolds, relativeRoughness), found once per distinct pair. */
  factor(reynolds: number, relativeRoughness: number): number {
    let byReynolds = this.byRoughness.get(relativeRoughness);
    if (!byReynolds) {
      byReynolds = new Map();
      this.byRoughness.set(relativeRoughness, byReynolds);
    }
    let f = byReynolds.get(reynolds);
    if (f === undefined) {
      f = colebrookWhite(reynolds, relativeRoughness);
      byReynolds.set(reynolds, f);
    }
    return f;
  }
}

/**
 * A pipe: Darcy–Weisbach friction h_f = f (L/D) v|v|/2g with the physics friction factor
 * (Colebrook–White, 64/Re, interpolated transition); in laminar flow the equivalent linear
 * Hagen–Poiseuille form h_f = 32 μ L v /(ρ g D²), which keeps the slope finite and non-zero at
 * Q = 0 (the small-flow linearisation). Plus the entrance/exit loss K v|v|/2g where an end sits
 * on a vessel nozzle or a boundary, K depending on the flow direction.
 */
export class PipeLaw implements LinkLaw {
  readonly area: number;
  readonly initialFlow: number;
  private readonly laminarSlope: number;
  /** L/D/2g of Darcy–Weisbach, s²/m. */
  private readonly lOverD2g: number;

  /**
   * @param diameter inner diameter, m
   * @param length developed length, m
   * @param relativeRoughness ε/D
   * @param fluid density and viscosity
   * @param kForward end-loss K for flow from → to (entrance at `from` plus exit at `to`)
   * @param kReverse end-loss K for flow to → from
   * @param memo Colebrook–White factors shared by the pipes of one solve, for first evaluations
   */
  constructor(
    readonly diameter: number,
    readonly length: number,
    readonly relativeRoughness: number,
    private readonly fluid: LawFluid,
    readonly kForward: number,
    readonly kReverse: number,
    private readonly memo: ColebrookMemo | null = null,
  ) {
    this.area = area(diameter);
    this.initialFlow = this.area * 1; // 1 m/s
    // Hagen–Poiseuille: h = 32 μ L v /(ρ g D²), per unit flow (v = Q/A).
    this.laminarSlope =
      (32 * fluid.viscosity * length) / (fluid.density * GRAVITY * diameter * diameter * this.area);
    this.lOverD2g = length / diameter / (2 * GRAVITY);
  }

  refresh(): void {}

  /** Reynolds number at this flow. */
  reynolds(flow: number): number {
    return reynoldsNumber(
      flow / this.area,
      this.diameter,
      this.fluid.density,
      this.fluid.viscosity,
    );
  }

  /** Friction head loss, m, signed like the flow. */
  friction(flow: number): number {
    this.evaluateFriction(flow);
    return this.memoLoss;
  }

  /** Entrance/exit loss at vessel or boundary ends, m, signed like the flow. */
  endLoss(flow: number): number {
    const k = flow >= 0 ? this.kForward : this.kReverse;
    const v = flow / this.area;
    return (k * v * Math.abs(v)) / (2 * GRAVITY);
  }

  headLoss(flow: number): number {
    return this.friction(flow) + this.endLoss(flow);
  }

  slope(flow: number): number {
    const k = flow >= 0 ? this.kForward : this.kReverse;
    const endSlope = (2 * k * Math.abs(flow)) / (2 * GRAVITY * this.area * this.area);
    this.evaluateFriction(flow);
    return this.memoSlope + endSlope;
  }

  /**
   * Darcy friction factor and flow regime at this flow, as physics/friction's
   * darcyFrictionFactor gives them; above the laminar limit it is the factor already found for
   * this flow by the loss evaluation (no second Colebrook–White solve).
   */
  frictionFactor(flow: number): FrictionFactorResult {
    const re = this.reynolds(flow);
    if (this.length > 0 && re > LAMINAR_LIMIT_REYNOLDS && Number.isFinite(re)) {
      this.evaluateFriction(flow);
      const uncertain = re < TURBULENT_LIMIT_REYNOLDS;
      return {
        factor: this.memoFactor,
        regime: uncertain ? 'transitional' : 'turbulent',
        uncertain,
      };
    }
    return darcyFrictionFactor(re, this.relativeRoughness);
  }

  /** Flow of the last friction evaluation (NaN before the first), and its loss and slope. */
  private memoFlow = NaN;
  private memoLoss = 0;
  private memoSlope = 0;
  /** Darcy friction factor of the last evaluation (turbulent and transitional flow only). */
  private memoFactor = 0;
  /** 1/√f of the last turbulent evaluation (NaN before one), its Re and d(1/√f)/dRe there. */
  private rootX = NaN;
  private rootReynolds = NaN;
  private rootSlope = NaN;
  /** Colebrook–White f at Re = 4000 for this pipe, the upper end of the transition (lazy). */
  private turbulentAtLimit = NaN;

  /**
   * Friction loss h_f and its slope d(h_f)/dQ at this flow, kept for the next call at the same
   * flow: the iteration asks for the loss and the slope of every pipe at one flow, and the
   * results ask for the loss again, so the friction factor is found once per pipe per iteration.
   *
   * With v = Q/A and Re = ρ|v|D/μ, h_f = f(Re)(L/D)v|v|/2g gives
   *   d(h_f)/dQ = (L/D)/(2g) · (|v|/A) · (Re·df/dRe + 2f).
   * df/dRe in turbulent flow follows from Colebrook–White by implicit differentiation: with
   * x = 1/√f, a = (ε/D)/3.7, b = 2.51/Re, s = a + b x and G(x, Re) = x + 2 log10(s) = 0,
   *   dx/dRe = (2 b x /(ln10 · s · Re)) / (1 + 2b/(ln10 · s)),  df/dRe = −2 x⁻³ dx/dRe.
   * In the transition (linear in Re, physics/friction.ts) df/dRe is the interpolation's slope.
   */
  private evaluateFriction(flow: number): void {
    if (flow === this.memoFlow) return;
    this.memoFlow = flow;
    if (this.length === 0) {
      this.memoLoss = 0;
      this.memoSlope = 0;
      return;
    }
    if (flow === 0) {
      this.memoLoss = 0;
      this.memoSlope = this.laminarSlope;
      return;
    }
    const re = this.reynolds(flow);
    if (re <= LAMINAR_LIMIT_REYNOLDS) {
      this.memoLoss = this.laminarSlope * flow;
      this.memoSlope = this.laminarSlope;
      return;
    }
    let f: number;
    let dfdRe: number;
    if (re < TURBULENT_LIMIT_REYNOLDS) {
      if (Number.isNaN(this.turbulentAtLimit))
        this.turbulentAtLimit = colebrookWhite(TURBULENT_LIMIT_REYNOLDS, this.relativeRoughness);
      const laminar = 64 / LAMINAR_LIMIT_REYNOLDS;
      dfdRe =
        (this.turbulentAtLimit - laminar) / (TURBULENT_LIMIT_REYNOLDS - LAMINAR_LIMIT_REYNOLDS);
      f = laminar + (re - LAMINAR_LIMIT_REYNOLDS) * dfdRe;
    } else {
      // The first turbulent evaluation starts from Serghides' estimate (physics/friction);
      // later ones from this pipe's last root moved along its slope (colebrook.ts), which
      // reaches the same root to rounding.
      let start = this.rootX + this.rootSlope * (re - this.rootReynolds);
      if (!(start > 0)) start = this.rootX;
      f =
        start > 0 && re < Infinity
          ? colebrookWhiteFrom(re, this.relativeRoughness, start)
          : this.memo
            ? this.memo.factor(re, this.relativeRoughness)
            : colebrookWhite(re, this.relativeRoughness);
      const x = 1 / Math.sqrt(f);
      const b = 2.51 / re;
      const s = this.relativeRoughness / 3.7 + b * x;
      const dxdRe = (2 * b * x) / (Math.LN10 * s * re) / (1 + (2 * b) / (Math.LN10 * s));
      dfdRe = (-2 * dxdRe) / (x * x * x);
      this.rootX = x;
      this.rootReynolds = re;
      this.rootSlope = dxdRe;
    }
    this.memoFactor = f;
    const v = flow / this.area;
    const speed = Math.abs(v);
    const lOverD2g = this.lOverD2g;
    this.memoLoss = f * lOverD2g * v * speed;
    this.memoSlope = lOverD2g * (speed / this.area) * (re * dfdRe + 2 * f);
  }
}

/**
 * A local loss K v|v|/2g with K per direction (each referred to its own reference area), K
 * taken from `coefficient` at the flow of the previous iteration (Reynolds-dependent K), and
 * optionally a non-return: reverse flow meets the closed resistance.
 */
export class LocalLossLaw implements LinkLaw {
  readonly initialFlow: number;
  private kNow = 0;
  private areaNow: number;

  /**
   * @param coefficient K and reference area (m²) for a flow (sign gives the direction)
   * @param nonReturn true for check valves: reverse flow is held by CLOSED_RESISTANCE
   * @param initialFlow starting flow, m³/s
   */
  constructor(
    private readonly coefficient: (flow: number) => { k: number; area: number },
    readonly nonReturn: boolean,
    initialFlow: number,
  ) {
    this.initialFlow = initialFlow;
    const start = coefficient(initialFlow);
    this.kNow = start.k;
    this.areaNow = start.area;
  }

  /** The K in use (referred to the velocity in the reference area). */
  get lossCoefficient(): number {
    return this.kNow;
  }

  refresh(flow: number): void {
    const { k, area } = this.coefficient(flow);
    this.kNow = k;
    this.areaNow = area;
  }

  forwardOnly = false;

  headLoss(flow: number): number {
    if (this.nonReturn && flow < 0 && !this.forwardOnly) return CLOSED_RESISTANCE * flow;
    const v = flow / this.areaNow;
    return (this.kNow * v * Math.abs(v)) / (2 * GRAVITY);
  }

  slope(flow: number): number {
    if (this.nonReturn && flow < 0 && !this.forwardOnly) return CLOSED_RESISTANCE;
    return (this.kNow * Math.abs(flow)) / (GRAVITY * this.areaNow * this.areaNow);
  }
}

/**
 * A control valve by IEC 60534-2-1 eq. (1) (turbulent, not choked): Δp = (ρ/ρ0)(Q/Kv)² bar,
 * i.e. a quadratic law h = c·Q|Q| with c = Δp(1 m³/s)/(ρg). Choking is checked afterwards
 * and reported as a finding.
 */
export class QuadraticLaw implements LinkLaw {
  readonly initialFlow: number;
  /** @param coefficient c in h = c·Q|Q|, s²/m⁵ */
  constructor(
    readonly coefficient: number,
    initialFlow: number,
  ) {
    this.initialFlow = initialFlow;
  }
  refresh(): void {}
  headLoss(flow: number): number {
    return this.coefficient * flow * Math.abs(flow);
  }
  slope(flow: number): number {
    return 2 * this.coefficient * Math.abs(flow);
  }
}

/**
 * A running centrifugal pump in rating mode: the total-head drop across it is −H(Q) for
 * Q ≥ 0, H from the fitted curve at the running speed (affinity laws in physics/pump). It has a
 * built-in non-return: for Q < 0 the law continues as −H(0) + R·Q with the closed resistance,
 * so reverse flow is negligible and the law stays continuous and monotone.
 */
export class PumpLaw implements LinkLaw {
  readonly nonReturn = true;
  constructor(
    private readonly head: (flow: number) => number,
    private readonly headSlope: (flow: number) => number,
    readonly initialFlow: number,
  ) {}
  refresh(): void {}
  forwardOnly = false;
  headLoss(flow: number): number {
    if (flow < 0 && !this.forwardOnly) return -this.head(0) + CLOSED_RESISTANCE * flow;
    return -this.head(flow);
  }
  slope(flow: number): number {
    if (flow < 0 && !this.forwardOnly) return CLOSED_RESISTANCE;
    // Where the curve rises with flow (dH/dQ > 0, near shut-off on some fits) the true slope
    // of the law is negative; its magnitude is used instead, a chord step that keeps the matrix
    // positive definite and does not amplify rounding at a dead end.
    return Math.abs(this.headSlope(flow));
  }
}
