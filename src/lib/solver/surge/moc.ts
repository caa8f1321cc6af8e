/**
 * The method of characteristics along the line with a discrete vapour cavity model.
 *
 * Along each reach of a pipe (Courant number 1, Δx = a·Δt) the compatibility equations with
 * steady Darcy friction (Wylie & Streeter, Fluid Transients in Systems, 1993, ch. 3):
 *   C⁺: H_P = H_A − B·(Q_P − Q_A) − R·Q_A·|Q_A|,  C⁻: H_P = H_B + B·(Q_P − Q_B) + R·Q_B·|Q_B|,
 *   B = a/(g·A), R = f·Δx/(2·g·D·A²).
 * Discrete vapour cavity model (Wylie 1984; Wylie & Streeter 1993, ch. 8; Bergant & Simpson's
 * papers on the discrete gas and vapour cavity models): at every computing section the head
 * may not fall below the vapour head H_v = z + (p_v − p_atm)/ρg. Where it would, H = H_v, the
 * flows on the two sides of the section (Q_u arriving, Q_d leaving) part, and the cavity
 * volume grows by ∫(Q_d − Q_u)dt, taken with the weighting ψ = 0.5 between the old and the new
 * step; when the volume returns to zero the cavity collapses and the section is solved as
 * liquid again (the columns rejoin).
 */
import { GRAVITY } from '../network/laws';
import type { Line } from './line';
import { linkFlow } from './linkSolve';
import type { RunDown } from './pumpTrip';

/** Weighting of new against old flows in the cavity volume (Wylie & Streeter 1993, ch. 8). */
const PSI = 0.5;

/** A tripped pump: which link, its run-down torque and inertia (kg·m²). */
export interface TripSetup {
  link: number;
  runDown: RunDown;
  inertia: number;
}

/** What the method needs besides the line. */
export interface MocSetup {
  line: Line;
  dt: number;
  reaches: number[];
  steps: number;
  /** (p_v − p_atm)/ρg, m: the vapour line lies this far from the pipe centreline. */
  vapourOffset: number;
  trip: TripSetup | null;
  historySamples: number;
}

/** The run's record. Arrays are per computing section in chainage order. */
export interface MocOutput {
  chainage: Float64Array;
  z: Float64Array;
  hSteady: Float64Array;
  /** Index of the line pipe each section lies on. */
  pipeOf: Int32Array;
  hMax: Float64Array;
  hMin: Float64Array;
  cavityMax: Float64Array;
  cavityTime: Float64Array;
  /** Time the cavity first opened, s (NaN: never). */
  cavityFirst: Float64Array;
  times: number[];
  /** Sections with a trace, and their head and flow samples. */
  traced: number[];
  traceHead: number[][];
  traceFlow: number[][];
  pumpSpeed: number[];
  /** First section where a head or flow stopped being a finite number, and the time. */
  failure: { section: number; time: number } | null;
}

/** Sections traced at most (besides every node side and line end). */
const TRACE_SECTIONS = 160;

/** Runs the method of characteristics; never throws on a finite line. */
export function runMoc(setup: MocSetup): MocOutput {
  const { line, dt, reaches, steps } = setup;
  const P = line.pipes.length;
  const first = new Int32Array(P);
  let S = 0;
  for (let p = 0; p < P; p++) {
    first[p] = S;
    S += reaches[p] + 1;
  }
  const chainage = new Float64Array(S);
  const z = new Float64Array(S);
  const hSteady = new Float64Array(S);
  const pipeOf = new Int32Array(S);
  const hv = new Float64Array(S);
  let H = new Float64Array(S);
  let Qu = new Float64Array(S);
  let Qd = new Float64Array(S);
  let V = new Float64Array(S);
  let Hn = new Float64Array(S);
  let Qun = new Float64Array(S);
  let Qdn = new Float64Array(S);
  let Vn = new Float64Array(S);
  const Bp = new Float64Array(P);
  const Rp = new Float64Array(P);
  for (let p = 0; p < P; p++) {
    const pipe = line.pipes[p];
    const n = reaches[p];
    const aUsed = pipe.length / (n * dt);
    Bp[p] = aUsed / (GRAVITY * pipe.area);
    Rp[p] = (pipe.friction * (pipe.length / n)) / (2 * GRAVITY * pipe.diameter * pipe.area ** 2);
    for (let j = 0; j <= n; j++) {
      const i = first[p] + j;
      const f = j / n;
      chainage[i] = pipe.chainage + pipe.length * f;
      z[i] = pipe.zIn + (pipe.zOut - pipe.zIn) * f;
      hSteady[i] = pipe.headIn + (pipe.headOut - pipe.headIn) * f;
      hv[i] = z[i] + setup.vapourOffset;
      pipeOf[i] = p;
      H[i] = hSteady[i];
      Qu[i] = Qd[i] = pipe.flow;
    }
  }
  const hMax = Float64Array.from(H);
  const hMin = Float64Array.from(H);
  const cavityMax = new Float64Array(S);
  const cavityTime = new Float64Array(S);
  const cavityFirst = new Float64Array(S).fill(NaN);

  const traced = traceSections(S, first, reaches, P);
  const stride = Math.max(1, Math.ceil(steps / Math.max(1, setup.historySamples)));
  const times: number[] = [];
  const traceHead: number[][] = traced.map(() => []);
  const traceFlow: number[][] = traced.map(() => []);
  const pumpSpeed: number[] = [];
  const trip = setup.trip;
  const alphas = line.links.map((l) => (l.law.kind === 'pump' ? l.law.alpha : 0));
  const ratedOmega = trip ? trip.runDown.ratedOmega : 0;
  const record = (t: number) => {
    times.push(t);
    traced.forEach((s, k) => {
      traceHead[k].push(H[s]);
      traceFlow[k].push(Qd[s]);
    });
    if (trip) pumpSpeed.push(alphas[trip.link]);
  };
  record(0);

  // C⁺ arriving at section i from i − 1 and C⁻ arriving from i + 1, same pipe p.
  const cPlus = (i: number, p: number) =>
    H[i - 1] + Bp[p] * Qd[i - 1] - Rp[p] * Qd[i - 1] * Math.abs(Qd[i - 1]);
  const cMinus = (i: number, p: number) =>
    H[i + 1] - Bp[p] * Qu[i + 1] + Rp[p] * Qu[i + 1] * Math.abs(Qu[i + 1]);

  let failure: MocOutput['failure'] = null;
  for (let n = 1; n <= steps; n++) {
    const t = n * dt;
    for (let p = 0; p < P; p++) {
      const B = Bp[p];
      for (let i = first[p] + 1; i < first[p] + reaches[p]; i++) {
        const cp = H[i - 1] + B * Qd[i - 1] - Rp[p] * Qd[i - 1] * Math.abs(Qd[i - 1]);
        const cm = H[i + 1] - B * Qu[i + 1] + Rp[p] * Qu[i + 1] * Math.abs(Qu[i + 1]);
        let h = 0.5 * (cp + cm);
        if (V[i] > 0 || h < hv[i]) {
          const qu = (cp - hv[i]) / B;
          const qd = (hv[i] - cm) / B;
          const vol = V[i] + (PSI * (qd - qu) + (1 - PSI) * (Qd[i] - Qu[i])) * dt;
          if (vol > 0) {
            Hn[i] = hv[i];
            Qun[i] = qu;
            Qdn[i] = qd;
            Vn[i] = vol;
            continue;
          }
          h = 0.5 * (cp + cm);
          if (h < hv[i]) {
            // The cavity closes this step but the liquid solution would sit below vapour:
            // the section stays at the vapour head with no volume (columns just meeting).
            Hn[i] = hv[i];
            Qun[i] = qu;
            Qdn[i] = qd;
            Vn[i] = 0;
            continue;
          }
        }
        Hn[i] = h;
        Qun[i] = Qdn[i] = (cp - cm) / (2 * B);
        Vn[i] = 0;
      }
    }
    // Line ends.
    endSection(true);
    endSection(false);
    // Nodes between pipes.
    for (let l = 0; l < line.links.length; l++) {
      const a = first[l] + reaches[l];
      const b = first[l + 1];
      const cA = cPlus(a, l);
      const cB = cMinus(b, l + 1);
      const link = line.links[l];
      const bA0 = Bp[l];
      const bB0 = Bp[l + 1];
      let cavA = V[a] > 0;
      let cavB = V[b] > 0;
      let shutA = false;
      let shutB = false;
      let q = 0;
      let hA = 0;
      let hB = 0;
      let vA = 0;
      let vB = 0;
      let qinA = 0;
      let qoutB = 0;
      for (let iter = 0; iter < 6; iter++) {
        const ca = cavA ? hv[a] : cA;
        const ba = cavA ? 0 : bA0;
        const cb = cavB ? hv[b] : cB;
        const bb = cavB ? 0 : bB0;
        q = linkFlow(link.law, t, alphas[l], ca, ba, cb, bb, link.offtake);
        qinA = (cA - hv[a]) / bA0;
        if (Number.isNaN(q)) q = qinA; // both sides open to vapour and no law: one cavity, on B
        hA = cavA ? hv[a] : cA - bA0 * q;
        hB = cavB ? hv[b] : cB + bB0 * (q - link.offtake);
        let again = false;
        if (!cavA && !shutA && hA < hv[a]) again = cavA = true;
        if (!cavB && !shutB && hB < hv[b]) again = cavB = true;
        if (again) continue;
        if (cavA) {
          vA = V[a] + (PSI * (q - qinA) + (1 - PSI) * (Qd[a] - Qu[a])) * dt;
          if (!(vA > 0)) {
            cavA = false;
            shutA = true;
            vA = 0;
            again = true;
          }
        }
        if (cavB) {
          qoutB = (hv[b] - cB) / bB0;
          vB = V[b] + (PSI * (qoutB - (q - link.offtake)) + (1 - PSI) * (Qd[b] - Qu[b])) * dt;
          if (!(vB > 0)) {
            cavB = false;
            shutB = true;
            vB = 0;
            again = true;
          }
        }
        if (!again) break;
      }
      // A cavity that closed this step with the liquid solution below vapour: hold the head
      // at the vapour line (zero volume), as at the sections along a pipe.
      if (hA < hv[a]) hA = hv[a];
      if (hB < hv[b]) hB = hv[b];
      Hn[a] = hA;
      Qun[a] = cavA ? qinA : q;
      Qdn[a] = q;
      Vn[a] = cavA ? vA : 0;
      Hn[b] = hB;
      Qun[b] = q - link.offtake;
      Qdn[b] = cavB ? qoutB : q - link.offtake;
      Vn[b] = cavB ? vB : 0;
      if (trip && trip.link === l) {
        const torque = trip.runDown.torque(alphas[l], q);
        alphas[l] = Math.max(0, alphas[l] - (dt * torque) / (trip.inertia * ratedOmega));
      }
    }
    [H, Hn] = [Hn, H];
    [Qu, Qun] = [Qun, Qu];
    [Qd, Qdn] = [Qdn, Qd];
    [V, Vn] = [Vn, V];
    for (let i = 0; i < S; i++) {
      const h = H[i];
      if (!Number.isFinite(h) || !Number.isFinite(Qu[i]) || !Number.isFinite(Qd[i])) {
        failure = { section: i, time: t };
        break;
      }
      if (h > hMax[i]) hMax[i] = h;
      if (h < hMin[i]) hMin[i] = h;
      if (V[i] > 0) {
        cavityTime[i] += dt;
        if (V[i] > cavityMax[i]) cavityMax[i] = V[i];
        if (Number.isNaN(cavityFirst[i])) cavityFirst[i] = t;
      }
    }
    if (failure) break;
    if (n % stride === 0 || n === steps) record(t);
  }
  return {
    chainage,
    z,
    hSteady,
    pipeOf,
    hMax,
    hMin,
    cavityMax,
    cavityTime,
    cavityFirst,
    times,
    traced,
    traceHead,
    traceFlow,
    pumpSpeed,
    failure,
  };

  function endSection(atStart: boolean): void {
    const p = atStart ? 0 : P - 1;
    const i = atStart ? 0 : S - 1;
    const B = Bp[p];
    const end = atStart ? line.start : line.end;
    // The characteristic that reaches the end: C⁻ at the start, C⁺ at the end.
    const c = atStart ? cMinus(i, p) : cPlus(i, p);
    const sign = atStart ? 1 : -1; // H = c + sign·B·Q
    if (end.kind === 'head') {
      Hn[i] = end.head;
      Qun[i] = Qdn[i] = (sign * (end.head - c)) / B;
      Vn[i] = 0;
      return;
    }
    const h = c + sign * B * end.flow;
    if (V[i] > 0 || h < hv[i]) {
      const qPipe = (sign * (hv[i] - c)) / B;
      const [qu, qd] = atStart ? [end.flow, qPipe] : [qPipe, end.flow];
      const vol = V[i] + (PSI * (qd - qu) + (1 - PSI) * (Qd[i] - Qu[i])) * dt;
      if (vol > 0) {
        Hn[i] = hv[i];
        Qun[i] = qu;
        Qdn[i] = qd;
        Vn[i] = vol;
        return;
      }
    }
    Hn[i] = Math.max(h, hv[i]);
    Qun[i] = Qdn[i] = end.flow;
    Vn[i] = 0;
  }
}

/** Sections to trace: every pipe end and an even spread between, at most ~TRACE_SECTIONS. */
function traceSections(S: number, first: Int32Array, reaches: number[], P: number): number[] {
  const set = new Set<number>();
  for (let p = 0; p < P; p++) {
    set.add(first[p]);
    set.add(first[p] + reaches[p]);
  }
  const every = Math.max(1, Math.ceil(S / TRACE_SECTIONS));
  for (let i = 0; i < S; i += every) set.add(i);
  return [...set].sort((x, y) => x - y);
}
