import { describe, expect, it } from 'vitest';
import { profileGeometry } from '../../src/lib/chart/profileChart';
import { readoutAt } from '../../src/lib/chart/readout';
import { placeInLanes } from '../../src/lib/chart/labelLanes';
import { demoDocument, demoProfile, demoResult, station } from './fixtures';

// Paths are written to 3 decimals of a pixel (polylinePath), so vertices are compared to 2
// decimals; straight runs are drawn by their ends, so stations are checked to lie on the line.
/** Vertices of a d3 line path ("M x,y L x,y …"), one array per sub-path. */
function vertices(d: string): Array<Array<[number, number]>> {
  return d
    .split('M')
    .filter(Boolean)
    .map((part) => part.split('L').map((p) => p.split(',').map(Number) as [number, number]));
}

/** Distance from a point to a polyline, px. */
function offLine(poly: Array<[number, number]>, px: number, py: number): number {
  let best = Infinity;
  for (let k = 1; k < poly.length; k++) {
    const [ax, ay] = poly[k - 1];
    const [bx, by] = poly[k];
    const [dx, dy] = [bx - ax, by - ay];
    const len2 = dx * dx + dy * dy;
    const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / len2));
    best = Math.min(best, Math.hypot(px - (ax + t * dx), py - (ay + t * dy)));
  }
  return best;
}

/** Every vertex of `poly` is one of the points, in order. */
function verticesAreStations(poly: Array<[number, number]>, xs: number[], ys: number[]): void {
  let k = 0;
  for (const [vx, vy] of poly) {
    while (k < xs.length && (Math.abs(xs[k] - vx) > 0.01 || Math.abs(ys[k] - vy) > 0.01)) k++;
    expect(k, `vertex ${vx},${vy} is a station, in order`).toBeLessThan(xs.length);
    k++;
  }
}

const SIZE = { width: 800, height: 400 };

describe('profileGeometry', () => {
  it('draws the HGL through every station, with a vertical step at the pump', () => {
    const profile = demoProfile();
    const g = profileGeometry(profile, SIZE, { system: 'SI' });
    const [hgl] = vertices(g.paths.hgl);
    const xs = profile.stations.map((s) => g.x(s.chainage));
    const ys = profile.stations.map((s) => g.y(s.hgl));
    verticesAreStations(hgl, xs, ys);
    xs.forEach((x, i) => expect(offLine(hgl, x, ys[i])).toBeLessThan(0.06));
    expect(hgl[0]).toEqual([expect.closeTo(xs[0], 2), expect.closeTo(ys[0], 2)]);
    // The pump's suction and discharge stations share a chainage: a vertical segment upwards.
    const suction = profile.stations.findIndex((s) => s.elementId === 'PU' && s.at === 'node-in');
    const at = (i: number) =>
      hgl.findIndex(([vx, vy]) => Math.hypot(vx - xs[i], vy - ys[i]) < 0.01);
    const [before, after] = [at(suction), at(suction + 1)];
    expect(after).toBe(before + 1);
    expect(hgl[after][0]).toBeCloseTo(hgl[before][0], 2);
    expect(hgl[after][1]).toBeLessThan(hgl[before][1]);
    expect(g.steps).toEqual([expect.objectContaining({ elementId: 'PU', direction: 'rise' })]);
  });

  it('leaves vessel liquid surfaces out of the pipe and vapour lines', () => {
    const profile = demoProfile();
    const g = profileGeometry(profile, SIZE, { system: 'SI' });
    const pipeStations = profile.stations.filter((s) => s.at !== 'level');
    const [pipe] = vertices(g.paths.pipe);
    const [vapour] = vertices(g.paths.vapour);
    for (const s of pipeStations) {
      expect(offLine(pipe, g.x(s.chainage), g.y(s.elevation))).toBeLessThan(0.06);
      expect(offLine(vapour, g.x(s.chainage), g.y(s.vapourLine))).toBeLessThan(0.06);
    }
    // The surfaces are not on the lines: both ends of the pipe line are pipe stations.
    expect(pipe[0][1]).toBeCloseTo(g.y(pipeStations[0].elevation), 2);
    expect(pipe.at(-1)![1]).toBeCloseTo(g.y(pipeStations.at(-1)!.elevation), 2);
    expect(g.levels.map((l) => l.elementId)).toEqual(['T1', 'T2']);
    expect(g.levels[0].y).toBeCloseTo(g.y(5), 6);
    // Each surface mark starts at its route end and runs into the plot.
    expect(g.levels[0].x1).toBeCloseTo(g.x(0), 6);
    expect(g.levels[0].x2).toBeGreaterThan(g.levels[0].x1);
    expect(g.levels[1].x2).toBeCloseTo(g.x(220), 6);
    expect(g.levels[1].x1).toBeLessThan(g.levels[1].x2);
  });

  it('breaks a line where a value is not finite (line.defined)', () => {
    const stations = [station(0, 0, 5), station(10, 0, 4), station(20, 0, 3), station(30, 0, 2)];
    stations[2] = { ...stations[2], hgl: Number.NaN };
    const g = profileGeometry({ stations }, SIZE, { system: 'SI' });
    const parts = vertices(g.paths.hgl);
    expect(parts.map((p) => p.length)).toEqual([2, 1]);
    expect(vertices(g.paths.pipe)).toHaveLength(1);
  });

  it('maps the route onto the plot width and inverts chainage, in SI and US units', () => {
    for (const system of ['SI', 'US'] as const) {
      const g = profileGeometry(demoProfile(), SIZE, { system });
      expect(g.x(0)).toBeCloseTo(g.plot.left, 9);
      expect(g.x(220)).toBeCloseTo(g.plot.left + g.plot.width, 9);
      expect(g.chainageAt(g.x(123.4))).toBeCloseTo(123.4, 9);
      expect(g.elevationAt(g.y(17.5))).toBeCloseTo(17.5, 9);
      // Every value of the profile lies inside the plot vertically.
      for (const s of demoProfile().stations) {
        for (const v of [s.elevation, s.hgl, s.egl, s.vapourLine]) {
          expect(g.y(v)).toBeGreaterThanOrEqual(g.plot.top - 1e-9);
          expect(g.y(v)).toBeLessThanOrEqual(g.plot.top + g.plot.height + 1e-9);
        }
      }
    }
    // 220 m is about 721.8 ft (1 ft = 0.3048 m exactly, NIST SP 811 B.9): the US axis says ft.
    const us = profileGeometry(demoProfile(), SIZE, { system: 'US' });
    expect(us.xScale.domain()[1]).toBeCloseTo(220 / 0.3048, 6);
    expect(us.axisTitles.x).toContain('ft');
  });

  it('zooms to a chainage window', () => {
    const g = profileGeometry(demoProfile(), SIZE, { system: 'SI', chainageWindow: [100, 150] });
    expect(g.x(100)).toBeCloseTo(g.plot.left, 9);
    expect(g.x(150)).toBeCloseTo(g.plot.left + g.plot.width, 9);
    expect(g.chainageRange).toEqual([0, 220]);
    expect(g.ticks.x.every((t) => t.value >= 100 && t.value <= 150)).toBe(true);
  });

  it('holds the elevation scale still when given the range it showed', () => {
    const first = profileGeometry(demoProfile(), SIZE, { system: 'SI' });
    const raised = demoProfile();
    for (const s of raised.stations) if (s.chainage === 120) s.elevation = 60;
    const held = profileGeometry(raised, SIZE, {
      system: 'SI',
      elevationWindow: first.elevationRange,
    });
    expect(held.y(17)).toBeCloseTo(first.y(17), 9);
    expect(held.elevationAt(first.y(42))).toBeCloseTo(42, 9);
  });

  it('places the marked spans, element labels and the pump NPSH note', () => {
    const doc = demoDocument();
    const g = profileGeometry(demoProfile(), SIZE, {
      system: 'SI',
      nodes: doc.nodes,
      pumps: demoResult().pumps,
    });
    const stop = g.spans.find((s) => s.kind === 'vapour')!;
    expect(stop.x0).toBeCloseTo(g.x(stop.start), 9);
    expect(stop.x1).toBeCloseTo(g.x(stop.end), 9);
    expect(stop.text).toMatch(/^Below vapour pressure: min .+ at .+/);
    expect(g.labels.map((l) => l.text)).toEqual([
      'Feed tank',
      'Transfer pump',
      'Rack high point',
      'Day tank',
    ]);
    // The waypoint has no station of its own: it sits where its two pipes meet.
    const waypoint = g.nodes.find((n) => n.elementId === 'W1')!;
    expect(waypoint.kind).toBe('waypoint');
    expect(waypoint.chainage).toBe(120);
    expect(waypoint.y).toBeCloseTo(g.y(30), 9);
    // A vessel sits at its nozzle: the pipe end, not its liquid surface.
    const feed = g.nodes.find((n) => n.elementId === 'T1')!;
    expect(feed.y).toBeCloseTo(g.y(1), 9);
    expect(g.npsh).toHaveLength(1);
    expect(g.npsh[0].lines[0]).toMatch(/^NPSHa 11\.8/);
    expect(g.npsh[0].lines[1]).toMatch(/^NPSHr 3\.2/);
    expect(g.npsh[0].short).toBe(false);
    expect(g.npsh[0].anchorX).toBeCloseTo(g.x(20), 9);
  });
});

describe('placeInLanes', () => {
  it('keeps labels apart: an overlapping label moves to the next lane', () => {
    const placed = placeInLanes(
      [
        { anchor: 100, width: 60 },
        { anchor: 120, width: 60 },
        { anchor: 300, width: 60 },
      ],
      { min: 0, max: 1000 },
      4,
    );
    expect(placed.map((p) => p.lane)).toEqual([0, 1, 0]);
    expect(placed[0].centre).toBe(100);
    expect(placed[1].centre).toBe(120);
  });

  it('places by priority first and leaves out what fits nowhere when asked to', () => {
    const placed = placeInLanes(
      [
        { anchor: 100, width: 60, priority: 4 },
        { anchor: 110, width: 60, priority: 0 },
        { anchor: 120, width: 60, priority: 4 },
      ],
      { min: 0, max: 1000 },
      4,
      2,
      'drop',
    );
    // The priority-0 label takes lane 0 at its anchor; one of the others gets lane 1.
    expect(placed[1]).toEqual({ left: 80, centre: 110, lane: 0 });
    expect(placed[0]).toEqual({ left: 70, centre: 100, lane: 1 });
    expect(placed[2]).toBeNull();
  });

  it('keeps labels inside the bounds', () => {
    const [p] = placeInLanes([{ anchor: 5, width: 40 }], { min: 0, max: 100 });
    expect(p.left).toBe(0);
  });
});

describe('readoutAt', () => {
  it('interpolates every value linearly between stations', () => {
    const stations = [station(0, 0, 10), station(100, 20, 30)];
    const r = readoutAt(stations, 25)!;
    expect(r.chainage).toBe(25);
    expect(r.elevation).toBeCloseTo(5, 12);
    expect(r.hgl).toBeCloseTo(15, 12);
    expect(r.egl).toBeCloseTo(15.2, 12);
    expect(r.pressureGauge).toBeCloseTo(stations[0].pressureGauge, 6);
    expect(r.vapourMarginHead).toBeCloseTo(r.hgl - r.vapourLine, 12);
    expect(r.elementId).toBe('P1');
  });

  it('clamps to the route ends and reads the downstream side at a node', () => {
    const p = demoProfile();
    expect(readoutAt(p.stations, -5)!.chainage).toBe(0);
    expect(readoutAt(p.stations, 999)!.chainage).toBe(220);
    const atPump = readoutAt(p.stations, 20)!;
    expect(atPump.hgl).toBeCloseTo(34.5, 12);
  });
});
