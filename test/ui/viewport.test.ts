import { describe, expect, it } from 'vitest';
import {
  boundsOf,
  fitToView,
  panBy,
  rectContains,
  rectFromCorners,
  reveal,
  sheetCentre,
  snap,
  snapPoint,
  toScreen,
  toSheet,
  wheelZoomFactor,
  zoomAt,
  MAX_ZOOM,
  MIN_ZOOM,
} from '../../src/lib/ui/sheet/viewport';

describe('viewport transforms', () => {
  it('toSheet undoes toScreen', () => {
    const vp = { x: 37, y: -12, k: 1.7 };
    const p = { x: 123.4, y: -56.7 };
    const back = toSheet(vp, toScreen(vp, p));
    expect(back.x).toBeCloseTo(p.x, 9);
    expect(back.y).toBeCloseTo(p.y, 9);
  });

  it('zoomAt keeps the anchor point fixed on screen', () => {
    const vp = { x: 10, y: 20, k: 1 };
    const anchor = { x: 300, y: 200 };
    const before = toSheet(vp, anchor);
    const zoomed = zoomAt(vp, anchor, 2);
    expect(zoomed.k).toBe(2);
    const after = toScreen(zoomed, before);
    expect(after.x).toBeCloseTo(anchor.x, 9);
    expect(after.y).toBeCloseTo(anchor.y, 9);
  });

  it('zoomAt clamps to the zoom limits', () => {
    expect(zoomAt({ x: 0, y: 0, k: 1 }, { x: 0, y: 0 }, 1e6).k).toBe(MAX_ZOOM);
    expect(zoomAt({ x: 0, y: 0, k: 1 }, { x: 0, y: 0 }, 1e-6).k).toBe(MIN_ZOOM);
  });

  it('panBy moves the camera only', () => {
    expect(panBy({ x: 1, y: 2, k: 3 }, 10, -5)).toEqual({ x: 11, y: -3, k: 3 });
  });

  it('wheel zoom factor: scrolling down zooms out, up zooms in, lines scaled', () => {
    expect(wheelZoomFactor(100)).toBeLessThan(1);
    expect(wheelZoomFactor(-100)).toBeGreaterThan(1);
    expect(wheelZoomFactor(0)).toBe(1);
    expect(wheelZoomFactor(3, 1)).toBeCloseTo(wheelZoomFactor(48, 0), 12);
    // one huge step is limited
    expect(wheelZoomFactor(1e5)).toBeCloseTo(wheelZoomFactor(200), 12);
  });
});

describe('fit to view', () => {
  it('centres the bounds and fits them inside the padding', () => {
    const bounds = { x: 100, y: 50, width: 400, height: 100 };
    const vp = fitToView(bounds, 1000, 600, 50, 10);
    // width-limited: (1000 - 100) / 400 = 2.25
    expect(vp.k).toBeCloseTo(2.25, 9);
    const centre = toScreen(vp, { x: 300, y: 100 });
    expect(centre.x).toBeCloseTo(500, 9);
    expect(centre.y).toBeCloseTo(300, 9);
    const corner = toScreen(vp, { x: 100, y: 50 });
    expect(corner.x).toBeCloseTo(50, 9);
  });

  it('does not zoom in beyond maxK for a single point', () => {
    const vp = fitToView({ x: 5, y: 5, width: 0, height: 0 }, 800, 600, 40, 1.5);
    expect(vp.k).toBe(1.5);
    const c = toScreen(vp, { x: 5, y: 5 });
    expect(c.x).toBeCloseTo(400, 9);
    expect(c.y).toBeCloseTo(300, 9);
  });

  it('with nothing to fit, centres the origin at scale 1', () => {
    expect(fitToView(null, 800, 600)).toEqual({ x: 400, y: 300, k: 1 });
  });
});

describe('geometry helpers', () => {
  it('boundsOf covers every point and is null for none', () => {
    expect(boundsOf([])).toBeNull();
    expect(
      boundsOf([
        { x: 3, y: -1 },
        { x: -2, y: 4 },
        { x: 0, y: 0 },
      ]),
    ).toEqual({ x: -2, y: -1, width: 5, height: 5 });
  });

  it('snap rounds to the nearest grid line', () => {
    expect(snap(29, 20)).toBe(20);
    expect(snap(31, 20)).toBe(40);
    expect(snap(-31, 20)).toBe(-40);
    expect(snapPoint({ x: 9, y: 11 }, 20)).toEqual({ x: 0, y: 20 });
  });

  it('rectFromCorners normalises and rectContains includes edges', () => {
    const r = rectFromCorners({ x: 10, y: 10 }, { x: -10, y: 0 });
    expect(r).toEqual({ x: -10, y: 0, width: 20, height: 10 });
    expect(rectContains(r, { x: 10, y: 10 })).toBe(true);
    expect(rectContains(r, { x: 0, y: 5 })).toBe(true);
    expect(rectContains(r, { x: 11, y: 5 })).toBe(false);
  });

  it('sheetCentre is the sheet point at the middle of the screen', () => {
    const vp = { x: 100, y: 50, k: 2 };
    expect(sheetCentre(vp, 800, 600)).toEqual({ x: 150, y: 125 });
  });

  it('reveal leaves a visible point alone and centres a hidden one', () => {
    const vp = { x: 0, y: 0, k: 1 };
    expect(reveal(vp, { x: 400, y: 300 }, 800, 600)).toBe(vp);
    const moved = reveal(vp, { x: 2000, y: 300 }, 800, 600);
    const s = toScreen(moved, { x: 2000, y: 300 });
    expect(s.x).toBeCloseTo(400, 9);
    expect(s.y).toBeCloseTo(300, 9);
  });
});
