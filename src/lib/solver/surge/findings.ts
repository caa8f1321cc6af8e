/**
 * The surge run's findings, with codes from the one catalogue (findings/catalogue.ts):
 * pressure above a pipe's design pressure, column separation, the closure time against 2L/a,
 * the assumptions the run had to make, and what it does not model.
 */
import type { Id } from '../../model/types';
import { finding } from '../findings/catalogue';
import type { MessageUnits } from '../findings/messageUnits';
import type { Finding } from '../types';
import type { Line } from './line';
import type { MocOutput } from './moc';
import { SURGE_NOT_MODELLED, type SurgeCavity, type SurgeJoukowsky } from './types';

/** A stop finding: the run could not be made. */
export function cannotRun(message: string, elements: Id[]): Finding {
  return finding('surge-cannot-run', `Surge: ${message}`, elements);
}

/** Peak gauge pressure against each pipe's design pressure; one note for pipes without one. */
export function pressureFindings(
  line: Line,
  out: MocOutput,
  rhoG: number,
  u: MessageUnits,
): Finding[] {
  const findings: Finding[] = [];
  let unrated = null as { pipe: number; p: number; chainage: number } | null;
  let unratedCount = 0;
  for (let p = 0; p < line.pipes.length; p++) {
    const pipe = line.pipes[p];
    let peak = -Infinity;
    let at = 0;
    for (let i = 0; i < out.pipeOf.length; i++) {
      if (out.pipeOf[i] !== p) continue;
      const gauge = rhoG * (out.hMax[i] - out.z[i]);
      if (gauge > peak) {
        peak = gauge;
        at = out.chainage[i];
      }
    }
    const design = pipe.designPressureGauge;
    if (design === null) {
      unratedCount++;
      if (!unrated || peak > unrated.p) unrated = { pipe: p, p: peak, chainage: at };
    } else if (peak > design) {
      findings.push(
        finding(
          'surge-above-design-pressure',
          `Surge: pipe “${pipe.name}” at chainage ${u.chainage(at)} reaches ${u.ratingGauge(peak)}, above its design pressure ${u.ratingGauge(design)}.`,
          [pipe.id],
          at,
        ),
      );
    }
  }
  if (unrated) {
    const pipe = line.pipes[unrated.pipe];
    findings.push(
      finding(
        'surge-peak-pressure',
        `Surge: ${unratedCount} pipe${unratedCount === 1 ? ' has' : 's have'} no design pressure to check against; the highest surge pressure among them is ${u.ratingGauge(unrated.p)} on “${pipe.name}” at chainage ${u.chainage(unrated.chainage)}.`,
        [pipe.id],
        unrated.chainage,
      ),
    );
  }
  return findings;
}

/** Cavities smaller than this (m³, 1 mL) are listed but make no finding. */
export const FINDING_MIN_CAVITY = 1e-6;

/** Cavities grouped into runs of neighbouring sections: one caution each. */
export function cavityFindings(
  line: Line,
  cavities: SurgeCavity[],
  out: MocOutput,
  u: MessageUnits,
): Finding[] {
  const findings: Finding[] = [];
  let group: SurgeCavity[] = [];
  const flush = () => {
    if (group.length === 0) return;
    const biggest = group.reduce((m, c) => (c.maxVolume > m.maxVolume ? c : m));
    const start = group[0].chainage;
    const end = group[group.length - 1].chainage;
    const where =
      start === end ? `chainage ${u.chainage(start)}` : `chainage ${u.chainageSpan(start, end)}`;
    const pipes = [...new Set(group.map((c) => c.elementId))];
    const names = pipes
      .map((id) => `“${line.pipes.find((p) => p.id === id)?.name ?? id}”`)
      .join(', ');
    const i = indexAt(out, biggest.chainage);
    const litres = biggest.maxVolume * 1000;
    findings.push(
      finding(
        'surge-column-separation',
        `Surge: the column parts at ${where} on ${names} (elevation ${u.elevation(out.z[i])}): the largest vapour cavity is ${litres < 0.1 ? litres.toExponential(1) : litres.toFixed(litres < 10 ? 2 : 1)} L, open ${biggest.duration.toFixed(2)} s from ${biggest.firstOpen.toFixed(2)} s; when it closes the rejoining columns raise the head (in the envelope).`,
        pipes,
        biggest.chainage,
      ),
    );
    group = [];
  };
  let last = -2;
  for (const c of cavities) {
    if (c.maxVolume < FINDING_MIN_CAVITY) continue;
    const i = indexAt(out, c.chainage);
    if (i - last > 2) flush();
    group.push(c);
    last = i;
  }
  flush();
  return findings;
}

function indexAt(out: MocOutput, chainage: number): number {
  let best = 0;
  for (let i = 0; i < out.chainage.length; i++) {
    if (Math.abs(out.chainage[i] - chainage) < Math.abs(out.chainage[best] - chainage)) best = i;
  }
  return best;
}

/** The closure time against 2L/a, with what a slower closure would give (Michaud). */
export function closureFinding(
  element: Id,
  name: string,
  time: number,
  jouk: SurgeJoukowsky,
  slower: { time: number; rise: number },
  u: MessageUnits,
): Finding {
  const tc = jouk.criticalTime;
  const text =
    time <= tc
      ? `Surge: closing “${name}” in ${time.toFixed(2)} s is not slower than 2L/a = ${tc.toFixed(2)} s, so the rise is the full Joukowsky a·v/g = ${u.head(jouk.headRise)}; a closure slower than 2L/a, over ${slower.time.toFixed(1)} s, would cut the peak rise to about ${u.head(slower.rise)} (Michaud's estimate 2Lv/(g·t)).`
      : `Surge: closing “${name}” over ${time.toFixed(2)} s is slower than 2L/a = ${tc.toFixed(2)} s; the hand estimate of the rise is ${u.head(jouk.closureHeadRise ?? NaN)} (Michaud) against ${u.head(jouk.headRise)} for a sudden closure.`;
  return finding('surge-closure-time', text, [element]);
}

/** A caution about an assumption the run had to make. */
export function assumption(message: string, elements: Id[]): Finding {
  return finding('surge-assumption', `Surge: ${message}`, elements);
}

/** The note on wave speeds adjusted beyond the tolerance. */
export function adjustedFinding(adjustment: number, tolerance: number, pipes: Id[]): Finding {
  return finding(
    'surge-wave-speed-adjusted',
    `Surge: to fit whole reaches in the time budget, wave speeds were adjusted by up to ${(adjustment * 100).toFixed(1)} % (more than the ${(tolerance * 100).toFixed(0)} % sought); short pipes carry the largest change.`,
    pipes,
  );
}

/** What the screening does not model. */
export function notModelledFinding(): Finding {
  return finding(
    'surge-not-modelled',
    `Surge screening does not model: ${SURGE_NOT_MODELLED.join('; ')}.`,
    [],
  );
}
