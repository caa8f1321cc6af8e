/**
 * Line styles and inks of the profile, shared by the SVG export and the panel so both read the
 * same. Each line differs by dash pattern and weight as well as colour, so a greyscale print
 * still tells them apart.
 */

/** The lines of the profile. */
export type ProfileLineKey = 'pipe' | 'hgl' | 'egl' | 'vapour' | 'level';

/** Stroke, width (px) and dash pattern of one line. */
export interface LineStyle {
  stroke: string;
  width: number;
  dash: string;
}

/** Line styles: pipe heavy solid, HGL solid, EGL long dashes, vapour line dash-dot. */
export const PROFILE_LINES: Record<ProfileLineKey, LineStyle> = {
  pipe: { stroke: '#2f3a35', width: 3, dash: '' },
  hgl: { stroke: '#1f5f8b', width: 2, dash: '' },
  egl: { stroke: '#5b8fb3', width: 1.5, dash: '9 4' },
  vapour: { stroke: '#b3261e', width: 1.5, dash: '10 3 2 3' },
  level: { stroke: '#4f86ad', width: 2, dash: '' },
};

/**
 * Least drawn width of a marked span, px: narrower spans are widened about their centre and
 * get a marker at their smallest margin, so a short span on a long route cannot be missed.
 */
export const MIN_SPAN_PX = 8;

/** Inks for text, frames and the two marked-span levels (ink and a soft background). */
export const PROFILE_INK = {
  text: '#1d2521',
  muted: '#5b665f',
  frame: '#a9b0a5',
  grid: '#e2e5de',
  stop: { ink: '#b3261e', soft: '#f6dedb' },
  caution: { ink: '#9a6400', soft: '#f7ebd2' },
} as const;
