import { describe, expect, it } from 'vitest';
import { clampWindow, panWindow, zoomWindow } from '../../src/lib/chart/chainageWindow';

const RANGE: [number, number] = [0, 1000];

describe('zoomWindow', () => {
  it('keeps the anchor chainage at the same place in the window', () => {
    const w = zoomWindow([0, 1000], RANGE, 250, 0.5);
    expect(w[1] - w[0]).toBeCloseTo(500, 9);
    // 250 was a quarter of the way across; it still is.
    expect((250 - w[0]) / (w[1] - w[0])).toBeCloseTo(0.25, 9);
  });

  it('stops at the whole route when zooming out and at 1 % of it when zooming in', () => {
    expect(zoomWindow([100, 300], RANGE, 200, 10)).toEqual([0, 1000]);
    const w = zoomWindow([100, 110], RANGE, 105, 0.01);
    expect(w[1] - w[0]).toBeCloseTo(10, 9);
  });
});

describe('panWindow', () => {
  it('moves the window and stops at the route ends without shrinking it', () => {
    expect(panWindow([100, 300], RANGE, 50)).toEqual([150, 350]);
    expect(panWindow([100, 300], RANGE, -500)).toEqual([0, 200]);
    expect(panWindow([700, 900], RANGE, 500)).toEqual([800, 1000]);
  });

  it('clamps a window wider than the route to the route', () => {
    expect(clampWindow([-10, 2000], RANGE)).toEqual([0, 1000]);
  });
});
