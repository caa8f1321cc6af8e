/**
 * Plain arithmetic behind the profile panel's zoom, pan, waypoint elevations and selection,
 * kept out of the component so it reads as wiring.
 */
import { isWholeRoute, panWindow, zoomWindow } from '../../chart';
import type { Id } from '../../model/types';
import { DEFAULT_PIPE_SEGMENTS } from '../../solver/profile';
import { fromDisplay, toDisplay, type UnitSystem } from '../../units';

type Window = [number, number];

/** The chainage window after zooming by `factor` about `anchor`; null means the whole route. */
export function zoomedWindow(
  zoom: Window | null,
  whole: Window,
  anchor: number,
  factor: number,
): Window | null {
  const next = zoomWindow(zoom ?? whole, whole, anchor, factor);
  return isWholeRoute(next, whole) ? null : next;
}

/** The window `from` panned by a pointer move of `dx` pixels over a plot `plotWidth` wide. */
export function pannedWindow(from: Window, whole: Window, dx: number, plotWidth: number): Window {
  const metresPerPixel = (from[1] - from[0]) / plotWidth;
  return panWindow(from, whole, -dx * metresPerPixel);
}

/** An elevation rounded to 0.01 of the display unit, back in metres. */
export function roundElevation(z: number, system: UnitSystem): number {
  return fromDisplay(
    Math.round(toDisplay(z, 'elevation', system) * 100) / 100,
    'elevation',
    system,
  );
}

/** An elevation moved by `steps` tenths of the display unit (keyboard nudge), rounded. */
export function nudgedElevation(z: number, steps: number, system: UnitSystem): number {
  const shown = toDisplay(z, 'elevation', system) + steps * 0.1;
  return roundElevation(fromDisplay(shown, 'elevation', system), system);
}

/** Selection after a click on `id`: replace it, or with `add` toggle `id` in it. */
export function clickedSelection(selected: readonly Id[], id: Id, add: boolean): Id[] {
  if (!add) return [id];
  return selected.includes(id) ? selected.filter((s) => s !== id) : [...selected, id];
}

/** Stations the panel aims for along a whole route (a few per pixel of a wide chart). */
export const PROFILE_STATION_BUDGET = 2000;

/**
 * Pieces each pipe is cut into on the profile: the solver's default (10) on ordinary routes,
 * fewer on routes of hundreds of pipes, where a pipe is a few pixels wide. The grade lines are
 * straight along a pipe, so fewer interior stations change nothing drawn; spans and readouts
 * interpolate between stations.
 */
export function pipeSegmentsFor(legs: number): number {
  return Math.max(
    1,
    Math.min(DEFAULT_PIPE_SEGMENTS, Math.floor(PROFILE_STATION_BUDGET / Math.max(1, legs))),
  );
}
