import { describe, expect, it } from 'vitest';
import {
  clickedSelection,
  nudgedElevation,
  pannedWindow,
  pipeSegmentsFor,
  PROFILE_STATION_BUDGET,
  roundElevation,
  zoomedWindow,
} from '../../../src/lib/ui/profile/panelMath';
import { DEFAULT_PIPE_SEGMENTS } from '../../../src/lib/solver/profile';

describe('profile panel arithmetic', () => {
  it('zooming out past the whole route gives the whole route (null)', () => {
    expect(zoomedWindow(null, [0, 100], 50, 0.5)).toEqual([25, 75]);
    expect(zoomedWindow([25, 75], [0, 100], 50, 4)).toBeNull();
  });

  it('a drag of one plot width pans by one window width, against the pointer', () => {
    expect(pannedWindow([20, 40], [0, 100], -200, 200)).toEqual([40, 60]);
  });

  it('elevations round to 0.01 of the display unit; a nudge is 0.1 of it', () => {
    expect(roundElevation(12.3456, 'SI')).toBeCloseTo(12.35, 12);
    expect(nudgedElevation(12, 3, 'SI')).toBeCloseTo(12.3, 12);
    // 1 ft = 0.3048 m exactly (NIST SP 811, Appendix B.8)
    expect(nudgedElevation(0.3048 * 10, -1, 'US')).toBeCloseTo(0.3048 * 9.9, 12);
  });

  it('a click selects one element; an added click toggles it', () => {
    expect(clickedSelection(['a', 'b'], 'c', false)).toEqual(['c']);
    expect(clickedSelection(['a'], 'b', true)).toEqual(['a', 'b']);
    expect(clickedSelection(['a', 'b'], 'a', true)).toEqual(['b']);
  });
});

describe('pipeSegmentsFor', () => {
  it('keeps the default on ordinary routes and thins long ones to the station budget', () => {
    expect(pipeSegmentsFor(12)).toBe(DEFAULT_PIPE_SEGMENTS);
    expect(pipeSegmentsFor(0)).toBe(DEFAULT_PIPE_SEGMENTS);
    expect(pipeSegmentsFor(500)).toBe(PROFILE_STATION_BUDGET / 500);
    expect(pipeSegmentsFor(500) * 500).toBeLessThanOrEqual(PROFILE_STATION_BUDGET);
    expect(pipeSegmentsFor(50_000)).toBe(1);
  });
});
