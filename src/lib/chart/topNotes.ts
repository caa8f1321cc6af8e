/**
 * Notes drawn above the plot, in lanes of their own over the marked-span labels: the case
 * envelope's "worst: …" and "least NPSH margin: …" notes. Kept out of the plot area so they
 * never cross the grade lines.
 */
import { estimateTextWidth, placeInLanes } from './labelLanes';

/** A note to place above the plot: its text and the chainage (or chainage span) it names. */
export interface TopNote {
  /** Stable key for the caller (e.g. "span:stop:12.5", "pump:P1"). */
  key: string;
  text: string;
  /** Chainage the note points at, m (the start of the span when `end` is given). */
  start: number;
  /** End of the span the note names, m; absent for a note at a point. */
  end?: number;
}

/** A placed note: its text's centre and baseline, and the span (or point) it marks, px. */
export interface PlacedTopNote extends TopNote {
  x: number;
  y: number;
  /** Left and right of the marked span, px (equal for a point). */
  x0: number;
  x1: number;
  lane: number;
}

/** Most note lanes kept above the plot; further notes share the last lane. */
export const MAX_NOTE_LANES = 2;

/**
 * Places the notes that fall inside the chainage window [c0, c1] in lanes across the plot's
 * width. Lane 0 is nearest the plot; `y` is filled in by the caller once the plot top is known.
 */
export function placeTopNotes(
  notes: readonly TopNote[],
  ctx: {
    x: (chainage: number) => number;
    plot: { left: number; width: number };
    fontSize: number;
    c0: number;
    c1: number;
  },
): Array<Omit<PlacedTopNote, 'y'>> {
  const shown = notes.filter(
    (n) => (n.end ?? n.start) >= ctx.c0 - 1e-9 && n.start <= ctx.c1 + 1e-9,
  );
  const marks = shown.map((n) => {
    const x0 = ctx.x(Math.max(n.start, ctx.c0));
    const x1 = ctx.x(Math.min(n.end ?? n.start, ctx.c1));
    return { n, x0, x1 };
  });
  const placed = placeInLanes(
    marks.map((m) => ({
      anchor: (m.x0 + m.x1) / 2,
      width: estimateTextWidth(m.n.text, ctx.fontSize) + 4,
    })),
    { min: ctx.plot.left, max: ctx.plot.left + ctx.plot.width },
    8,
    MAX_NOTE_LANES,
  );
  return marks.map((m, i) => ({
    ...m.n,
    x: placed[i].centre,
    x0: m.x0,
    x1: m.x1,
    lane: placed[i].lane,
  }));
}
