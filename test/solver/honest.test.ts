/**
 * Every answer honest: impossible specifications are stop findings naming the elements,
 * `converged` means balanced, parts the sheet does not determine get no numbers, nothing
 * non-finite is turned into 0, and trivially solvable sheets converge with no flow.
 * All sheets are invented for the tests.
 */
import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

/** Vessel A (level 2 m) → pump P → fitting V → vessel B (level 5 m). */
function pumpLine(pump: Parameters<Sheet['pump']>[1], valve: Parameters<Sheet['fitting']>[1]) {
  const s = new Sheet();
  s.vessel('A', 2);
  s.pump('P', pump);
  s.fitting('V', valve);
  s.vessel('B', 5);
  s.pipe('S', at('A', 'N1'), at('P', 'suction'));
  s.pipe('D', at('P', 'discharge'), at('V', 'in'));
  s.pipe('E', at('V', 'out'), at('B', 'N1'));
  return s;
}

const codes = (r: ReturnType<typeof solve>) => r.findings.map((f) => f.code);

describe('flow forced against something that cannot pass it', () => {
  it('a duty pump against a shut valve is a stop naming both, never converged, no head of millions of metres', () => {
    const s = pumpLine(
      { mode: 'duty', dutyFlow: 20 / 3600 },
      { fittingType: 'gate-valve', closed: true },
    );
    const r = solve(s.doc);
    expect(r.converged).toBe(false);
    const stop = r.findings.find((f) => f.code === 'forced-flow');
    expect(stop?.level).toBe('stop');
    expect(stop?.elements).toEqual(expect.arrayContaining(['P', 'V']));
    expect(stop?.message).toMatch(/“P”.*20\.0 m³\/h.*“V”.*open “V”/);
    // Nothing flows through the shut valve, and the pump shows no invented head or power.
    expect(r.nodes.V?.flow ?? 0).toBe(0);
    expect(r.pumps.P).toBeUndefined();
    expect(r.pipes.D).toBeUndefined();
    expectAllFinite(r);
  });

  it('a duty pump against a check valve facing it is a stop naming both', () => {
    const s = new Sheet();
    s.vessel('A', 2);
    s.pump('P', { mode: 'duty', dutyFlow: 0.01 });
    s.fitting('C', { fittingType: 'swing-check-valve' });
    s.vessel('B', 5);
    s.pipe('S', at('A', 'N1'), at('P', 'suction'));
    s.pipe('D', at('P', 'discharge'), at('C', 'out'));
    s.pipe('E', at('C', 'in'), at('B', 'N1'));
    const r = solve(s.doc);
    expect(r.converged).toBe(false);
    const stop = r.findings.find((f) => f.code === 'forced-flow');
    expect(stop?.elements).toEqual(expect.arrayContaining(['P', 'C']));
    expect(r.pumps.P).toBeUndefined();
  });

  it('a draw-off on a capped line is a stop that says the line has no way in', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.fitting('V', { fittingType: 'gate-valve', closed: true });
    s.node('junction', 'J', { z: 0 });
    s.drawOff('X', 0, 0.002);
    s.pipe('P1', at('A', 'N1'), at('V', 'in'));
    s.pipe('P2', at('V', 'out'), at('J', 'hub'));
    s.pipe('P3', at('J', 'hub'), at('X', 'p'));
    const r = solve(s.doc);
    expect(r.converged).toBe(false);
    const stop = r.findings.find((f) => f.code === 'forced-flow');
    expect(stop?.elements).toEqual(expect.arrayContaining(['X', 'V']));
    expect(stop?.message).toMatch(/out of .*no way in but through “V”/);
    expect(r.pipes.P3).toBeUndefined();
  });
});

describe('converged means balanced', () => {
  it('a solve reports the node-balance tolerance it was held to and meets it when converged', () => {
    const s = pumpLine({}, { fittingType: 'gate-valve' });
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(r.massImbalance).toBeLessThanOrEqual(1e-9);
    expectConservation(s.doc, r);
  });
});

describe('parts the sheet does not determine', () => {
  it('a part cut off from every fixed head gets no pressures, no margins and only the cut-off finding', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.node('junction', 'J', { z: 0 });
    s.pipe('P1', at('A', 'N1'), at('J', 'hub'));
    // An island: a pump and a high waypoint joined to nothing that holds a head.
    s.pump('Q', { z: 20 });
    s.node('waypoint', 'W', { z: 30 });
    s.pipe('I1', at('Q', 'discharge'), at('W', 'in'));
    const r = solve(s.doc);
    expect(r.pipes.I1).toBeUndefined();
    expect(r.nodes.W).toBeUndefined();
    expect(r.nodes.Q).toBeUndefined();
    expect(r.pumps.Q).toBeUndefined();
    const onIsland = r.findings.filter((f) =>
      f.elements.some((id) => ['Q', 'W', 'I1'].includes(id)),
    );
    expect(onIsland.map((f) => f.code)).toEqual(['cut-off']);
  });

  it('a section between a stopped pump and a check valve is undetermined: no pressure, left out of the checks', () => {
    const s = new Sheet();
    s.vessel('A', 2);
    s.pump('P', { running: false });
    s.node('waypoint', 'W', { z: 40 });
    s.fitting('C', { fittingType: 'swing-check-valve' });
    s.vessel('B', 5);
    s.pipe('S', at('A', 'N1'), at('P', 'suction'));
    s.pipe('D', at('P', 'discharge'), at('W', 'in'));
    s.pipe('D2', at('W', 'out'), at('C', 'in'));
    s.pipe('E', at('C', 'out'), at('B', 'N1'));
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    for (const id of ['D', 'D2']) expect(r.pipes[id]).toBeUndefined();
    expect(r.nodes.W).toBeUndefined();
    const note = r.findings.find((f) => f.code === 'blocked-in');
    expect(note?.level).toBe('note');
    expect(note?.elements).toEqual(expect.arrayContaining(['D', 'W', 'D2']));
    // A waypoint 40 m up would be far below vapour pressure if it were given a pressure.
    expect(codes(r)).not.toContain('below-vapour-pressure');
    expect(codes(r)).not.toContain('vacuum');
  });
});

describe('non-finite values', () => {
  it('a supply of 1e308 m³/s is a stop naming the boundary and that input; no 0 in its place', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.node('junction', 'J', { z: 0 });
    s.drawOff('S', 0, -1e308);
    s.pipe('P1', at('A', 'N1'), at('J', 'hub'));
    s.pipe('P2', at('S', 'p'), at('J', 'hub'));
    const r = solve(s.doc);
    expect(r.converged).toBe(false);
    const stop = r.findings.find((f) => f.code === 'non-finite-result');
    expect(stop?.level).toBe('stop');
    expect(stop?.elements).toContain('S');
    expect(stop?.message).toContain('1e+308 m³/s');
    expect(r.pipes.P1).toBeUndefined();
    expectAllFinite(r.pipes);
    expectAllFinite(r.nodes);
  });
});

describe('trivially solvable sheets converge with no flow', () => {
  it('a lone tank', () => {
    const s = new Sheet();
    s.vessel('T', 5);
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(r.findings.filter((f) => f.level === 'stop')).toEqual([]);
  });

  it('a control valve opened 1e-9 (linear) into a dead end', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.node('control-valve', 'CV', { opening: 1e-9, characteristic: 'linear' });
    s.node('junction', 'J', { z: 1 });
    s.pipe('P1', at('A', 'N1'), at('CV', 'in'));
    s.pipe('P2', at('CV', 'out'), at('J', 'hub'));
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.pipes.P1.flow)).toBeLessThan(1e-12);
  });

  it('a dead end', () => {
    const s = new Sheet();
    s.vessel('A', 10);
    s.node('junction', 'J', { z: 3 });
    s.pipe('P1', at('A', 'N1'), at('J', 'hub'));
    const r = solve(s.doc);
    expect(r.converged).toBe(true);
    expect(Math.abs(r.pipes.P1.flow)).toBeLessThan(1e-12);
  });
});

describe('impossible geometry is a stop naming the element and by how much', () => {
  it('a vessel level below its bottom or above its top', () => {
    const low = new Sheet();
    low.vessel('T', -1, { z: 0, height: 5 });
    const below = solve(low.doc).findings.find((f) => f.code === 'level-outside-vessel');
    expect(below?.level).toBe('stop');
    expect(below?.elements).toEqual(['T']);
    expect(below?.message).toMatch(/below its bottom \(0\.00 m\) by 1\.00 m/);
    const high = new Sheet();
    high.vessel('T', 9, { z: 0, height: 5 });
    expect(
      solve(high.doc).findings.find((f) => f.code === 'level-outside-vessel')?.message,
    ).toMatch(/above its top \(5\.00 m\) by 4\.00 m/);
  });

  it('a nozzle outside the shell', () => {
    const s = new Sheet();
    s.vessel('T', 3, { z: 0, height: 5, nozzleZ: 7 });
    const f = solve(s.doc).findings.find((x) => x.code === 'nozzle-outside-vessel');
    expect(f?.elements).toEqual(['T']);
    expect(f?.message).toMatch(/nozzle N1 at 7\.00 m .*2\.00 m above the top/);
  });

  it('a 4 m pipe spanning a 9.5 m rise says it is 5.5 m too short', () => {
    const s = new Sheet();
    s.vessel('A', 2);
    s.node('junction', 'J', { z: 9.5 });
    s.pipe('P1', at('A', 'N1'), at('J', 'hub'), { length: 4 });
    const f = solve(s.doc).findings.find((x) => x.code === 'pipe-shorter-than-rise');
    expect(f?.level).toBe('stop');
    expect(f?.elements).toEqual(['P1']);
    expect(f?.message).toMatch(/length 4\.00 m .* 9\.50 m .* 5\.50 m too short/);
  });
});

describe('a flat efficiency curve has no best-efficiency flow', () => {
  for (const [what, curve] of [
    ['one point', [{ flow: 0.01, value: 0.7 }]],
    [
      'all equal',
      [
        { flow: 0.005, value: 0.7 },
        { flow: 0.01, value: 0.7 },
        { flow: 0.02, value: 0.7 },
      ],
    ],
  ] as const) {
    it(`${what}: no % of BEP and no off-BEP finding`, () => {
      const s = pumpLine({ efficiencyCurve: [...curve] }, { fittingType: 'gate-valve' });
      const r = solve(s.doc);
      expect(r.converged).toBe(true);
      expect(r.pumps.P.bepFraction).toBeUndefined();
      expect(codes(r)).not.toContain('pump-off-bep');
    });
  }
});
