/**
 * What a wheel event means on the sheet. A pinch on a trackpad arrives as a wheel event with
 * ctrlKey; a two-finger scroll as small pixel deltas (pan); a mouse wheel as line steps or
 * large whole pixel steps (zoom).
 */
export type WheelIntent =
  { kind: 'zoom'; deltaY: number } | { kind: 'pan'; dx: number; dy: number };

export interface WheelLike {
  deltaX: number;
  deltaY: number;
  deltaMode: number;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
}

/** Classify a wheel event. */
export function wheelIntent(e: WheelLike): WheelIntent {
  if (e.ctrlKey || e.metaKey) return { kind: 'zoom', deltaY: e.deltaY };
  const looksLikeMouse =
    e.deltaMode !== 0 || (e.deltaX === 0 && Math.abs(e.deltaY) >= 50 && Number.isInteger(e.deltaY));
  if (looksLikeMouse && !e.shiftKey) {
    return { kind: 'zoom', deltaY: e.deltaMode === 1 ? e.deltaY * 16 : e.deltaY };
  }
  if (e.shiftKey && e.deltaX === 0) return { kind: 'pan', dx: -e.deltaY, dy: 0 };
  return { kind: 'pan', dx: -e.deltaX, dy: -e.deltaY };
}
