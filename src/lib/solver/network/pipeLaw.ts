/**
 * The pipe law of the hydraulic graph (Darcy–Weisbach with the physics friction factor), with
 * each law's numbers kept in one typed array shared by the pipes of a solve (PipeLawStore):
 * a law is then one small object instead of an object with a dozen separately boxed numbers,
 * which the engine would otherwise allocate, and the garbage collector copy, for every pipe of
 * every solve. The arithmetic is that of a law holding its numbers in fields.
 */
import {
  colebrookWhite,
  darcyFrictionFactor,
  type FrictionFactorResult,
  LAMINAR_LIMIT_REYNOLDS,
  LAMINAR_REYNOLDS_FLOOR,
  reynoldsNumber,
  TURBULENT_LIMIT_REYNOLDS,
} from '../../physics/friction';
import { colebrookWhiteFrom } from './colebrook';
import { area, GRAVITY, type LawFluid, type LinkLaw } from './laws';

// Positions of a law's numbers in its slot of the store.
const DIAMETER = 0;
const LENGTH = 1;
const ROUGHNESS = 2;
const K_FORWARD = 3;
const K_REVERSE = 4;
const AREA = 5;
const INITIAL_FLOW = 6;
const LAMINAR_SLOPE = 7;
const L_OVER_D_2G = 8;
const MEMO_FLOW = 9;
const MEMO_LOSS = 10;
const MEMO_SLOPE = 11;
const MEMO_FACTOR = 12;
const ROOT_X = 13;
const ROOT_REYNOLDS = 14;
const ROOT_SLOPE = 15;
const TURBULENT_AT_LIMIT = 16;
const FITTINGS_K1 = 17;
const FITTINGS_K0 = 18;
/** Numbers per pipe law. */
const STRIDE = 19;

/** The numbers of the pipe laws of one solve, STRIDE per law, in one Float64Array. */
export class PipeLawStore {
  /** The laws' numbers. */
  readonly data: Float64Array;
  private used = 0;

  /** @param capacity how many laws the store holds (a law beyond it gets its own array) */
  constructor(capacity: number) {
    this.data = new Float64Array(Math.max(0, capacity) * STRIDE);
  }

  /** The offset of a new law's slot, or −1 when the store is full. */
  take(): number {
    if ((this.used + 1) * STRIDE > this.data.length) return -1;
    return this.used++ * STRIDE;
  }
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
 * on a vessel nozzle or a boundary, K depending on the flow direction, and the loss of the
 * fittings the pipe carries, K v|v|/2g with K = k1/Re + k0 (2-K and 3-K methods, fixed K and a
 * lumped K summed over the list; see `setFittings`), evaluated at the flow itself.
 */
export class PipeLaw implements LinkLaw {
  /** The store's array (or the law's own) and the offset of this law's numbers in it. */
  private readonly d: Float64Array;
  private readonly o: number;

  /**
   * @param diameter inner diameter, m
   * @param length developed length, m
   * @param relativeRoughness ε/D
   * @param fluid density and viscosity
   * @param kForward end-loss K for flow from → to (entrance at `from` plus exit at `to`)
   * @param kReverse end-loss K for flow to → from
   * @param memo Colebrook–White factors shared by the pipes of one solve, for first evaluations
   * @param store where the law keeps its numbers (its own array when null or full)
   */
  constructor(
    diameter: number,
    length: number,
    relativeRoughness: number,
    private readonly fluid: LawFluid,
    kForward: number,
    kReverse: number,
    private readonly memo: ColebrookMemo | null = null,
    store: PipeLawStore | null = null,
  ) {
    const offset = store ? store.take() : -1;
    this.d = offset >= 0 ? store!.data : new Float64Array(STRIDE);
    this.o = offset >= 0 ? offset : 0;
    const d = this.d;
    const o = this.o;
    const a = area(diameter);
    d[o + DIAMETER] = diameter;
    d[o + LENGTH] = length;
    d[o + ROUGHNESS] = relativeRoughness;
    d[o + K_FORWARD] = kForward;
    d[o + K_REVERSE] = kReverse;
    d[o + AREA] = a;
    d[o + INITIAL_FLOW] = a * 1; // 1 m/s
    // Hagen–Poiseuille: h = 32 μ L v /(ρ g D²), per unit flow (v = Q/A).
    d[o + LAMINAR_SLOPE] =
      (32 * fluid.viscosity * length) / (fluid.density * GRAVITY * diameter * diameter * a);
    d[o + L_OVER_D_2G] = length / diameter / (2 * GRAVITY); // L/D/2g of Darcy–Weisbach, s²/m
    // Flow of the last friction evaluation (NaN before the first), and its loss and slope.
    d[o + MEMO_FLOW] = NaN;
    d[o + MEMO_LOSS] = 0;
    d[o + MEMO_SLOPE] = 0;
    // Darcy friction factor of the last evaluation (turbulent and transitional flow only).
    d[o + MEMO_FACTOR] = 0;
    // 1/√f of the last turbulent evaluation (NaN before one), its Re and d(1/√f)/dRe there.
    d[o + ROOT_X] = NaN;
    d[o + ROOT_REYNOLDS] = NaN;
    d[o + ROOT_SLOPE] = NaN;
    // Colebrook–White f at Re = 4000 for this pipe, the upper end of the transition (lazy).
    d[o + TURBULENT_AT_LIMIT] = NaN;
    // The fittings on the pipe: K = k1/Re + k0 (none until setFittings).
    d[o + FITTINGS_K1] = 0;
    d[o + FITTINGS_K0] = 0;
  }

  /**
   * The fittings the pipe carries, as the two parts of their summed loss coefficient referred
   * to the pipe's velocity: K = k1/Re + k0 (Re no smaller than LAMINAR_REYNOLDS_FLOOR).
   */
  setFittings(k1: number, k0: number): void {
    this.d[this.o + FITTINGS_K1] = k1;
    this.d[this.o + FITTINGS_K0] = k0;
  }

  /** True when the pipe carries fittings with a loss. */
  get hasFittings(): boolean {
    return this.d[this.o + FITTINGS_K1] !== 0 || this.d[this.o + FITTINGS_K0] !== 0;
  }

  /** Loss coefficient of the pipe's fittings at this flow, referred to the pipe's velocity. */
  fittingsK(flow: number): number {
    const k1 = this.d[this.o + FITTINGS_K1];
    const k0 = this.d[this.o + FITTINGS_K0];
    if (k1 === 0) return k0;
    return k1 / Math.max(this.reynolds(flow), LAMINAR_REYNOLDS_FLOOR) + k0;
  }

  /** Loss of the fittings the pipe carries, m, signed like the flow: K v|v|/2g. */
  fittingLoss(flow: number): number {
    if (!this.hasFittings) return 0;
    const v = flow / this.area;
    return (this.fittingsK(flow) * v * Math.abs(v)) / (2 * GRAVITY);
  }

  /**
   * d(fittingLoss)/dQ. With K = k1/Re + k0 and Re ∝ |Q| above the floor, the k1 part of the
   * loss is linear in Q (slope (k1/Re)|v|/(2gA)) and the k0 part quadratic (slope 2k0|v|/(2gA));
   * below the floor Re is held, so both parts are quadratic.
   */
  private fittingSlope(flow: number): number {
    if (!this.hasFittings) return 0;
    const k1 = this.d[this.o + FITTINGS_K1];
    const k0 = this.d[this.o + FITTINGS_K0];
    const a = this.area;
    const speed = Math.abs(flow / a);
    const re = this.reynolds(flow);
    const k1Part = k1 === 0 ? 0 : k1 / Math.max(re, LAMINAR_REYNOLDS_FLOOR);
    const k1Factor = re > LAMINAR_REYNOLDS_FLOOR ? 1 : 2;
    return ((k1Factor * k1Part + 2 * k0) * speed) / (2 * GRAVITY * a);
  }

  /** Inner diameter, m. */
  get diameter(): number {
    return this.d[this.o + DIAMETER];
  }
  /** Developed length, m. */
  get length(): number {
    return this.d[this.o + LENGTH];
  }
  /** ε/D. */
  get relativeRoughness(): number {
    return this.d[this.o + ROUGHNESS];
  }
  /** End-loss K for flow from → to. */
  get kForward(): number {
    return this.d[this.o + K_FORWARD];
  }
  /** End-loss K for flow to → from. */
  get kReverse(): number {
    return this.d[this.o + K_REVERSE];
  }
  /** Bore area, m². */
  get area(): number {
    return this.d[this.o + AREA];
  }
  /** Starting flow of the iteration (1 m/s), m³/s. */
  get initialFlow(): number {
    return this.d[this.o + INITIAL_FLOW];
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
    return this.d[this.o + MEMO_LOSS];
  }

  /** Entrance/exit loss at vessel or boundary ends, m, signed like the flow. */
  endLoss(flow: number): number {
    const k = flow >= 0 ? this.kForward : this.kReverse;
    const v = flow / this.area;
    return (k * v * Math.abs(v)) / (2 * GRAVITY);
  }

  headLoss(flow: number): number {
    return this.friction(flow) + this.endLoss(flow) + this.fittingLoss(flow);
  }

  slope(flow: number): number {
    const k = flow >= 0 ? this.kForward : this.kReverse;
    const a = this.area;
    const endSlope = (2 * k * Math.abs(flow)) / (2 * GRAVITY * a * a);
    this.evaluateFriction(flow);
    return this.d[this.o + MEMO_SLOPE] + endSlope + this.fittingSlope(flow);
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
        factor: this.d[this.o + MEMO_FACTOR],
        regime: uncertain ? 'transitional' : 'turbulent',
        uncertain,
      };
    }
    return darcyFrictionFactor(re, this.relativeRoughness);
  }

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
    const d = this.d;
    const o = this.o;
    if (flow === d[o + MEMO_FLOW]) return;
    d[o + MEMO_FLOW] = flow;
    if (d[o + LENGTH] === 0) {
      d[o + MEMO_LOSS] = 0;
      d[o + MEMO_SLOPE] = 0;
      return;
    }
    const laminarSlope = d[o + LAMINAR_SLOPE];
    if (flow === 0) {
      d[o + MEMO_LOSS] = 0;
      d[o + MEMO_SLOPE] = laminarSlope;
      return;
    }
    const re = this.reynolds(flow);
    if (re <= LAMINAR_LIMIT_REYNOLDS) {
      d[o + MEMO_LOSS] = laminarSlope * flow;
      d[o + MEMO_SLOPE] = laminarSlope;
      return;
    }
    const roughness = d[o + ROUGHNESS];
    let f: number;
    let dfdRe: number;
    if (re < TURBULENT_LIMIT_REYNOLDS) {
      if (Number.isNaN(d[o + TURBULENT_AT_LIMIT]))
        d[o + TURBULENT_AT_LIMIT] = colebrookWhite(TURBULENT_LIMIT_REYNOLDS, roughness);
      const laminar = 64 / LAMINAR_LIMIT_REYNOLDS;
      dfdRe =
        (d[o + TURBULENT_AT_LIMIT] - laminar) / (TURBULENT_LIMIT_REYNOLDS - LAMINAR_LIMIT_REYNOLDS);
      f = laminar + (re - LAMINAR_LIMIT_REYNOLDS) * dfdRe;
    } else {
      // The first turbulent evaluation starts from Serghides' estimate (physics/friction);
      // later ones from this pipe's last root moved along its slope (colebrook.ts), which
      // reaches the same root to rounding.
      const rootX = d[o + ROOT_X];
      let start = rootX + d[o + ROOT_SLOPE] * (re - d[o + ROOT_REYNOLDS]);
      if (!(start > 0)) start = rootX;
      f =
        start > 0 && re < Infinity
          ? colebrookWhiteFrom(re, roughness, start)
          : this.memo
            ? this.memo.factor(re, roughness)
            : colebrookWhite(re, roughness);
      const x = 1 / Math.sqrt(f);
      const b = 2.51 / re;
      const s = roughness / 3.7 + b * x;
      const dxdRe = (2 * b * x) / (Math.LN10 * s * re) / (1 + (2 * b) / (Math.LN10 * s));
      dfdRe = (-2 * dxdRe) / (x * x * x);
      d[o + ROOT_X] = x;
      d[o + ROOT_REYNOLDS] = re;
      d[o + ROOT_SLOPE] = dxdRe;
    }
    d[o + MEMO_FACTOR] = f;
    const a = d[o + AREA];
    const v = flow / a;
    const speed = Math.abs(v);
    const lOverD2g = d[o + L_OVER_D_2G];
    d[o + MEMO_LOSS] = f * lOverD2g * v * speed;
    d[o + MEMO_SLOPE] = lOverD2g * (speed / a) * (re * dfdRe + 2 * f);
  }
}
