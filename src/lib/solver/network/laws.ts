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

/** Standard gravity, m/s² (ISO 2533 / CGPM 1901). */
export const GRAVITY = ISA_STANDARD_GRAVITY;

/**
 * Resistance of a non-return link (pump, check valve) against reverse flow, s/m²: h = R·Q; it
 * passes |ΔH|/R, i.e. 1e-8 m³/s (0.036 L/h) for 100 m of head across it. A shut link (ClosedLaw,
 * the same R) marks a shut valve or a stopped pump: it takes no part in the solve (topology.ts),
 * so nothing passes it, and a section shut in behind it has no determined pressure.
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
 * (choke.ts), which then holds the valve at its choked flow with `ChokedValveLaw`.
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
 * A control valve whose flow is held near a cap (IEC 60534-2-1: once the pressure drop passes
 * FL²(p1 − FF·pv) the flow no longer rises with it): the quadratic law up to |Q| = cap, then a
 * straight line of slope `steep`. choke.ts sets `steep` well above the quadratic's slope at any
 * flow it will meet (so the law falls as the cap rises, and the flow stays near the cap) but
 * below the stiff-branch slope where it can (so the iteration checks it in head, not only in
 * flow), and moves the cap until the flow that actually passes is the choked flow: the
 * steepness does not enter the answer. Continuous and monotone.
 */
export class ChokedValveLaw implements LinkLaw {
  readonly initialFlow: number;
  /**
   * @param coefficient c in h = c·Q|Q| below the cap, s²/m⁵
   * @param cap the choked flow, m³/s (≥ 0), in either direction
   * @param steep slope of the law beyond the cap, s/m²
   */
  constructor(
    readonly coefficient: number,
    readonly cap: number,
    /** Slope beyond the cap, s/m². */
    readonly steep: number,
    initialFlow: number,
  ) {
    this.initialFlow = Math.min(initialFlow, cap);
  }
  refresh(): void {}
  headLoss(flow: number): number {
    const q = Math.abs(flow);
    if (q <= this.cap) return this.coefficient * flow * q;
    const atCap = this.coefficient * this.cap * this.cap;
    return Math.sign(flow) * (atCap + this.steep * (q - this.cap));
  }
  slope(flow: number): number {
    const q = Math.abs(flow);
    return q <= this.cap ? 2 * this.coefficient * q : this.steep;
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
