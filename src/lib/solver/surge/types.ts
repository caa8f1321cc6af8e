/**
 * Surge screening: the event asked for, the options of a run, and what a run returns. Plain
 * data, SI units (m, s, m³/s, Pa), keyed by the document's element ids.
 */
import type { Id } from '../../model/types';
import type { PipeRestraint } from '../../physics/transient';
import type { Finding } from '../types';

/** How a closing valve's opening falls with time. */
export type ClosureLaw = 'linear' | 'characteristic';

/**
 * The event: a valve (a control valve or an inline fitting valve) closing over `time` seconds,
 * or a pump tripping (its drive cut) with its rotating inertia (kg·m²; null estimates it).
 */
export type SurgeEvent =
  | { kind: 'close'; element: Id; time: number; law: ClosureLaw }
  | { kind: 'trip'; pump: Id; inertia: number | null };

/** Options of one surge run. */
export interface SurgeOptions {
  /** Operating case to start from (its steady solve); null or absent: the base case. */
  caseId?: Id | null;
  /** Route (node ids in order); absent: a stored or default route through the event element. */
  route?: Id[] | null;
  /** Simulated time after the event starts, s (default {@link DEFAULT_SURGE_DURATION}). */
  duration?: number;
  /** Axial restraint of every pipe (default: anchored throughout). */
  restraint?: PipeRestraint;
  /** Largest relative wave-speed adjustment sought to fit whole reaches (default 0.05). */
  waveSpeedTolerance?: number;
  /** Work budget: computing sections × time steps (default 2·10⁷). */
  maxWork?: number;
  /** Time samples kept for the time plot (default 400). */
  historySamples?: number;
}

/** Simulated time when none is given, s. */
export const DEFAULT_SURGE_DURATION = 30;

/** One pipe of the route as the surge run sees it. */
export interface SurgePipe {
  id: Id;
  name: string;
  /** Length, m. */
  length: number;
  /** Wave speed from the Korteweg form (or rigid pipe, see `waveSpeedSource`), m/s. */
  waveSpeed: number;
  /** Wave speed used after fitting whole reaches to the time step, m/s. */
  waveSpeedUsed: number;
  /** Steady velocity along the route, m/s. */
  velocity: number;
  /** Darcy friction factor from the steady solve. */
  frictionFactor: number;
  /** Reaches the pipe is cut into. */
  reaches: number;
  /** How the wave speed was found, in words. */
  waveSpeedSource: string;
}

/** One computing section of the envelope (two at a node: its inlet and outlet side). */
export interface SurgeEnvelopePoint {
  chainage: number;
  elevation: number;
  hglSteady: number;
  hglMax: number;
  hglMin: number;
  vapourLine: number;
  /** The pipe the section lies on. */
  elementId: Id;
}

/** Where the column parted: one computing section with a vapour cavity. */
export interface SurgeCavity {
  chainage: number;
  /** Largest cavity volume, m³. */
  maxVolume: number;
  /** Total time the cavity was open, s. */
  duration: number;
  elementId: Id;
  /** Time the cavity first opened, s. */
  firstOpen: number;
  /** Index of its section in the envelope. */
  section: number;
}

/** Head and flow against time at one section. */
export interface SurgeTrace {
  chainage: number;
  elementId: Id;
  /** HGL, m. */
  head: number[];
  /** Flow along the route, m³/s. */
  flow: number[];
}

/** The quick hand screening of the event's reach. */
export interface SurgeJoukowsky {
  /** a·Δv/g of the pipe at the event, m. */
  headRise: number;
  /** 2·Σ L/a from the event to the reflecting fixed head, s. */
  criticalTime: number;
  /** Pipes of that reach. */
  reach: Id[];
  /** For a closure: the rise by Joukowsky or, slower than 2L/a, Michaud's estimate, m. */
  closureHeadRise: number | null;
}

/** What a surge run returns. */
export interface SurgeResult {
  /** False when the run could not be made (stop findings say why); the lists are then empty. */
  ok: boolean;
  event: SurgeEvent;
  caseId: Id | null;
  /** Node ids of the route followed. */
  route: Id[];
  pipes: SurgePipe[];
  joukowsky: SurgeJoukowsky | null;
  envelope: SurgeEnvelopePoint[];
  cavities: SurgeCavity[];
  findings: Finding[];
  /** Time step, s. */
  timeStep: number;
  /** Simulated time, s. */
  duration: number;
  /** Largest |a_used/a − 1| over the pipes. */
  waveSpeedAdjustment: number;
  /** Sample times of the traces, s. */
  times: number[];
  /** Head and flow against time at a selection of sections (node sides and along pipes). */
  traces: SurgeTrace[];
  /** Liquid bulk modulus used, Pa, and its source. */
  bulkModulus: { value: number; source: string } | null;
  /** Pump speed ratio N/N₀ against `times` for a trip; empty otherwise. */
  pumpSpeed: number[];
  /** Pump inertia used for a trip, kg·m², and whether it was estimated. */
  inertia: { value: number; estimated: boolean } | null;
}

/** What the screening does not model; said in the app, the review sheet and the README. */
export const SURGE_NOT_MODELLED: readonly string[] = [
  'unsteady (frequency-dependent) friction: friction is the steady Darcy factor of the steady solve, so later peaks decay slower than in a real line',
  'fluid–structure interaction: pipes do not move; supports and restraint only set the wave speed',
  'air valves, surge vessels and relief valves',
  'two-phase flow beyond discrete vapour cavities at the computing sections (no released gas, no distributed cavitation)',
  'side branches off the route: each keeps its steady flow through the event',
  'pumps other than a tripped one keep their speed; no pump runs or flows backwards (built-in non-return, as in the steady solve)',
];
