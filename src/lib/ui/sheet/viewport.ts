/**
 * Sheet viewport maths: pure functions between sheet units and screen pixels.
 * screen = sheet · k + (x, y). No DOM here, so it is unit-tested in Node.
 */

/** A point in sheet units (schematic plan position). */
export type SheetPoint = { x: number; y: number } & { readonly __space?: 'sheet' };
/** A point in screen pixels, relative to the sheet element's top-left corner. */
export type ScreenPoint = { x: number; y: number } & { readonly __space?: 'screen' };

/** Camera: translation in pixels and scale in pixels per sheet unit. */
export interface Viewport {
  x: number;
  y: number;
  k: number;
}

/** Axis-aligned rectangle. */
export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Smallest and largest zoom allowed. */
export const MIN_ZOOM = 0.1;
export const MAX_ZOOM = 8;

/** Grid pitch in sheet units; positions snap to it. */
export const GRID = 20;

/** The identity viewport. */
export const IDENTITY: Viewport = { x: 0, y: 0, k: 1 };

/** Clamp a number into [lo, hi]. */
export function clamp(value: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, value));
}

/** Screen pixel → sheet units. */
export function toSheet(vp: Viewport, p: ScreenPoint): SheetPoint {
  return { x: (p.x - vp.x) / vp.k, y: (p.y - vp.y) / vp.k };
}

/** Sheet units → screen pixel. */
export function toScreen(vp: Viewport, p: SheetPoint): ScreenPoint {
  return { x: p.x * vp.k + vp.x, y: p.y * vp.k + vp.y };
}

/** Zoom by `factor` keeping the sheet point under `anchor` (screen) fixed. */
export function zoomAt(
  vp: Viewport,
  anchor: ScreenPoint,
  factor: number,
  min = MIN_ZOOM,
  max = MAX_ZOOM,
): Viewport {
  const k = clamp(vp.k * factor, min, max);
  const fixed = toSheet(vp, anchor);
  return { k, x: anchor.x - fixed.x * k, y: anchor.y - fixed.y * k };
}

/** Move the camera by a screen-pixel offset. */
export function panBy(vp: Viewport, dx: number, dy: number): Viewport {
  return { k: vp.k, x: vp.x + dx, y: vp.y + dy };
}

/**
 * Zoom factor for a wheel event: smooth for trackpads (small deltas) and mice (±100 lines).
 * deltaMode 1 (lines) is scaled to pixels first.
 */
export function wheelZoomFactor(deltaY: number, deltaMode = 0): number {
  const pixels = deltaMode === 1 ? deltaY * 16 : deltaMode === 2 ? deltaY * 400 : deltaY;
  return Math.exp(-clamp(pixels, -200, 200) * 0.002);
}

/** Bounding rectangle of points; null when there are none. */
export function boundsOf(points: Iterable<{ x: number; y: number }>): Rect | null {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  if (minX === Infinity) return null;
  return { x: minX, y: minY, width: maxX - minX, height: maxY - minY };
}

/**
 * Viewport that shows `bounds` (sheet units) centred in a `width` × `height` screen area
 * with `padding` pixels around it, never zooming in beyond `maxK`.
 */
export function fitToView(
  bounds: Rect | null,
  width: number,
  height: number,
  padding = 48,
  maxK = 1.5,
): Viewport {
  if (!bounds || width <= 0 || height <= 0) return { x: width / 2, y: height / 2, k: 1 };
  const availW = Math.max(1, width - 2 * padding);
  const availH = Math.max(1, height - 2 * padding);
  const kx = bounds.width > 0 ? availW / bounds.width : maxK;
  const ky = bounds.height > 0 ? availH / bounds.height : maxK;
  const k = clamp(Math.min(kx, ky, maxK), MIN_ZOOM, MAX_ZOOM);
  const cx = bounds.x + bounds.width / 2;
  const cy = bounds.y + bounds.height / 2;
  return { k, x: width / 2 - cx * k, y: height / 2 - cy * k };
}

/** Snap a coordinate to the grid. */
export function snap(value: number, grid = GRID): number {
  return Math.round(value / grid) * grid;
}

/** Snap a point to the grid. */
export function snapPoint(p: SheetPoint, grid = GRID): SheetPoint {
  return { x: snap(p.x, grid), y: snap(p.y, grid) };
}

/** Normalised rectangle spanned by two corner points. */
export function rectFromCorners(a: { x: number; y: number }, b: { x: number; y: number }): Rect {
  return {
    x: Math.min(a.x, b.x),
    y: Math.min(a.y, b.y),
    width: Math.abs(a.x - b.x),
    height: Math.abs(a.y - b.y),
  };
}

/** Whether the point lies inside (or on the edge of) the rectangle. */
export function rectContains(r: Rect, p: { x: number; y: number }): boolean {
  return p.x >= r.x && p.x <= r.x + r.width && p.y >= r.y && p.y <= r.y + r.height;
}

/** The sheet point at the centre of a screen area. */
export function sheetCentre(vp: Viewport, width: number, height: number): SheetPoint {
  return toSheet(vp, { x: width / 2, y: height / 2 });
}

/** Viewport moved (not zoomed) so that sheet point `p` is inside the screen area with a margin. */
export function reveal(
  vp: Viewport,
  p: SheetPoint,
  width: number,
  height: number,
  margin = 64,
): Viewport {
  const s = toScreen(vp, p);
  let dx = 0;
  let dy = 0;
  if (s.x < margin || s.x > width - margin) dx = width / 2 - s.x;
  if (s.y < margin || s.y > height - margin) dy = height / 2 - s.y;
  return dx === 0 && dy === 0 ? vp : panBy(vp, dx, dy);
}
