/**
 * Zoom and pan along chainage: pure arithmetic on the visible window [start, end] (m), kept
 * inside the route's full range and no narrower than a minimum width.
 */

/** A visible chainage window, m. */
export type ChainageWindow = [number, number];

/** Narrowest window as a fraction of the route length. */
const MIN_FRACTION = 0.01;

/**
 * Zooms the window by `factor` (< 1 zooms in) about the chainage `anchor`, which stays under
 * the pointer. Zooming out past the whole route gives the whole route.
 */
export function zoomWindow(
  view: ChainageWindow,
  range: ChainageWindow,
  anchor: number,
  factor: number,
): ChainageWindow {
  const full = range[1] - range[0];
  const width = Math.max(full * MIN_FRACTION, (view[1] - view[0]) * factor);
  if (width >= full) return [range[0], range[1]];
  const t = (anchor - view[0]) / (view[1] - view[0]);
  const start = anchor - t * width;
  return clampWindow([start, start + width], range);
}

/** Moves the window by `delta` metres of chainage, stopping at the route ends. */
export function panWindow(
  view: ChainageWindow,
  range: ChainageWindow,
  delta: number,
): ChainageWindow {
  return clampWindow([view[0] + delta, view[1] + delta], range);
}

/** Shifts a window back inside the range without changing its width (unless it is wider). */
export function clampWindow(view: ChainageWindow, range: ChainageWindow): ChainageWindow {
  const width = view[1] - view[0];
  if (width >= range[1] - range[0]) return [range[0], range[1]];
  if (view[0] < range[0]) return [range[0], range[0] + width];
  if (view[1] > range[1]) return [range[1] - width, range[1]];
  return view;
}

/** True when the view shows the whole range. */
export function isWholeRoute(view: ChainageWindow, range: ChainageWindow): boolean {
  return view[0] <= range[0] && view[1] >= range[1];
}
