import { describe, expect, it } from 'vitest';
import { addNode, connect } from '../../src/lib/model/commands';
import { createDocument } from '../../src/lib/model/defaults';
import { solve } from '../../src/lib/solver/solve';
import { build } from './helpers';

describe('defaults solve once connected', () => {
  it.each(['SI', 'US'] as const)(
    'tank → fitting → pump → control valve → waypoint → junction → tank, boundary on the junction (%s defaults)',
    (system) => {
      const start = createDocument('Defaults');
      start.settings.unitSystem = system;
      const doc = build(
        start,
        addNode('vessel', { x: 0, y: 0 }),
        addNode('fitting', { x: 100, y: 0 }),
        addNode('control-valve', { x: 200, y: 0 }),
        addNode('waypoint', { x: 300, y: 0 }),
        addNode('pump', { x: 400, y: 0 }),
        addNode('junction', { x: 500, y: 0 }),
        addNode('vessel', { x: 600, y: 0 }),
        addNode('boundary', { x: 500, y: 100 }),
        connect({ node: 'V1', port: 'N1' }, { node: 'F1', port: 'in' }),
        connect({ node: 'F1', port: 'out' }, { node: 'P1', port: 'suction' }),
        connect({ node: 'P1', port: 'discharge' }, { node: 'CV1', port: 'in' }),
        connect({ node: 'CV1', port: 'out' }, { node: 'W1', port: 'in' }),
        connect({ node: 'W1', port: 'out' }, { node: 'J1', port: 'hub' }),
        connect({ node: 'J1', port: 'hub' }, { node: 'V2', port: 'N2' }),
        connect({ node: 'J1', port: 'hub' }, { node: 'B1', port: 'p' }),
      );
      const result = solve(doc);
      expect(result.converged).toBe(true);
      expect(result.pumps.P1.flow).toBeGreaterThan(0);
      expect(result.findings.filter((f) => f.level === 'stop')).toEqual([]);
    },
  );

  it('the default pump between two default tanks runs on its curve', () => {
    const doc = build(
      createDocument('Pump only'),
      addNode('vessel', { x: 0, y: 0 }),
      addNode('pump', { x: 100, y: 0 }),
      addNode('vessel', { x: 200, y: 0 }),
      connect({ node: 'V1', port: 'N1' }, { node: 'P1', port: 'suction' }),
      connect({ node: 'P1', port: 'discharge' }, { node: 'V2', port: 'N2' }),
    );
    const result = solve(doc);
    expect(result.converged).toBe(true);
    expect(result.pumps.P1.flow).toBeGreaterThan(0);
    expect(result.findings.filter((f) => f.level === 'stop')).toEqual([]);
  });
});
