import { describe, expect, it } from 'vitest';
import {
  addNode,
  addRoute,
  connect,
  importSurvey,
  updatePipe,
} from '../../../src/lib/model/commands';
import { pipeRun } from '../../../src/lib/model/pipeRun';
import { createDocument } from '../../../src/lib/model/defaults';
import type { SurveyPoint } from '../../../src/lib/model/survey/parseSurvey';
import { solve } from '../../../src/lib/solver/solve';
import { build, ok, refused } from '../helpers';

/** Two open tanks 3 m apart in level, one pipe L1 between them (gravity flow). */
function gravityLine() {
  return build(
    createDocument('Survey'),
    addNode('vessel', { x: 0, y: 0 }),
    addNode('vessel', { x: 600, y: 0 }),
    connect({ node: 'V1', port: 'N1' }, { node: 'V2', port: 'N1' }),
    updatePipe('L1', { length: 100 }),
  );
}

/** A route over a rise: up 4 m to a crest at 40 m, down to 1 m at 100 m, in 1 m steps. */
function survey(): SurveyPoint[] {
  return Array.from({ length: 101 }, (_, i) => ({
    chainage: i,
    elevation: i <= 40 ? (4 * i) / 40 : 4 - (3 * (i - 40)) / 60,
  }));
}

describe('importSurvey', () => {
  it('lays waypoints at the kept points, keeps the crest, and sets lengths from the survey', () => {
    const doc = gravityLine();
    const r = ok(doc, importSurvey('L1', survey(), 0.01));
    const waypoints = Object.values(r.doc.nodes).filter((n) => n.kind === 'waypoint');
    // A straight rise and a straight fall: only the crest survives the thinning.
    expect(waypoints.map((w) => w.z)).toEqual([4]);
    const pipes = Object.values(r.doc.pipes);
    expect(pipes.map((p) => p.id).sort()).toEqual(['L1', 'L2']);
    // Developed lengths: √(40² + 4²) and √(60² + 3²) (Pythagoras on the survey's straight runs).
    expect(r.doc.pipes.L1.length).toBeCloseTo(Math.hypot(40, 4), 9);
    expect(r.doc.pipes.L2.length).toBeCloseTo(Math.hypot(60, 3), 9);
    expect(r.doc.pipes.L1.bore).toEqual(doc.pipes.L1.bore);
    expect(r.created.sort()).toEqual(['L2', 'W1']);
  });

  it('replaces the whole run when imported again onto any of its pipes', () => {
    const once = ok(gravityLine(), importSurvey('L1', survey(), 0.01)).doc;
    expect(pipeRun(once, 'L2')?.pipes).toEqual(['L1', 'L2']);
    const bumpy = survey().map((p) => ({
      ...p,
      elevation: p.elevation + (p.chainage === 70 ? 1 : 0),
    }));
    const twice = ok(once, importSurvey('L2', bumpy, 0.01)).doc;
    const zs = Object.values(twice.nodes)
      .filter((n) => n.kind === 'waypoint')
      .map((n) => n.z);
    expect(zs.length).toBeGreaterThanOrEqual(3); // crest, the bump's high and the lows beside it
    expect(Math.max(...zs)).toBe(4);
    const total = Object.values(twice.pipes).reduce((s, p) => s + p.length, 0);
    let developed = 0;
    for (let i = 1; i < bumpy.length; i++) {
      developed += Math.hypot(
        bumpy[i].chainage - bumpy[i - 1].chainage,
        bumpy[i].elevation - bumpy[i - 1].elevation,
      );
    }
    expect(total).toBeCloseTo(developed, 9);
  });

  it('keeps the flow of a gravity line: friction depends on length, not on the crest', () => {
    const doc = gravityLine();
    const imported = ok(doc, importSurvey('L1', survey(), 0.01)).doc;
    const total = Object.values(imported.pipes).reduce((s, p) => s + p.length, 0);
    const straight = build(doc, updatePipe('L1', { length: total }));
    const a = solve(straight);
    const b = solve(imported);
    expect(a.converged && b.converged).toBe(true);
    expect(b.pipes.L1.flow).toBeCloseTo(a.pipes.L1.flow, 9);
  });

  it('takes removed waypoints out of stored routes', () => {
    const once = ok(gravityLine(), importSurvey('L1', survey(), 0.01)).doc;
    const routed = build(once, addRoute('Main', ['V1', 'W1', 'V2']));
    const again = ok(routed, importSurvey('L1', survey(), 0.01)).doc;
    const route = Object.values(again.routes)[0];
    expect(route.nodes).toEqual(['V1', 'V2']);
  });

  it('refuses a missing pipe, a one-point survey and a negative tolerance, changing nothing', () => {
    const doc = gravityLine();
    expect(refused(doc, importSurvey('L9', survey(), 0.01)).code).toBe('pipe-missing');
    expect(refused(doc, importSurvey('L1', survey().slice(0, 1), 0.01)).message).toMatch(
      /two points/,
    );
    expect(refused(doc, importSurvey('L1', survey(), -1)).message).toMatch(/tolerance/);
  });

  it('imports a 5,000-point survey (figures for the bench are printed there, not asserted)', () => {
    const points = Array.from({ length: 5000 }, (_, i) => ({
      chainage: i * 0.5,
      elevation: 5 + 3 * Math.sin(i / 300) + 0.5 * Math.sin(i / 37),
    }));
    const r = ok(gravityLine(), importSurvey('L1', points, 0.05));
    const zs = Object.values(r.doc.nodes).filter((n) => n.kind === 'waypoint');
    expect(zs.length).toBeGreaterThan(10);
    expect(zs.length).toBeLessThan(2000);
  });
});

describe('importSurvey with fittings on the pipes', () => {
  it('keeps every fitting of the run once, on the first new pipe', () => {
    const doc = build(
      gravityLine(),
      updatePipe('L1', {
        fittings: {
          items: [{ fittingType: 'elbow-90-standard', count: 6, lossMethod: '2K', fixedK: 0.75 }],
          lumpedK: 1.5,
          place: 'chainage',
          chainage: 30,
        },
      }),
    );
    const r = ok(doc, importSurvey('L1', survey(), 0.01));
    expect(r.doc.pipes.L1.fittings).toEqual({
      items: [{ fittingType: 'elbow-90-standard', count: 6, lossMethod: '2K', fixedK: 0.75 }],
      lumpedK: 1.5,
      place: 'spread',
    });
    expect(r.doc.pipes.L2.fittings).toBeUndefined();
  });
});
