import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseProjectFile } from '../../../src/lib/model/file';
import type { HeadrouteDocument } from '../../../src/lib/model/types';
import { solve } from '../../../src/lib/solver/solve';
import {
  nodeResultRows,
  pipeResultRows,
  pumpResultRows,
  reynoldsText,
} from '../../../src/lib/ui/details/resultRows';
import { caseChanges } from '../../../src/lib/ui/details/caseNote';

function demo(): HeadrouteDocument {
  const parsed = parseProjectFile(
    readFileSync('static/examples/pump-over-rack.headroute.json', 'utf8'),
  );
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.document;
}

const value = (rows: { label: string; value: string }[], label: string) =>
  rows.find((r) => r.label === label)?.value;

describe('details results', () => {
  const doc = demo();
  const result = solve(doc);

  it('a pipe shows velocity, Re and regime, friction, losses, end pressures and vapour margin', () => {
    const rows = pipeResultRows(doc, doc.pipes.L8, result, 'SI');
    const labels = rows.map((r) => r.label);
    for (const l of [
      'Flow',
      'Velocity',
      'Reynolds number',
      'Friction factor',
      'Friction loss',
      'Loss per 100 m',
      'Entrance/exit loss',
      'Pressure at start',
      'Pressure at end',
      'Margin to vapour pressure',
    ])
      expect(labels).toContain(l);
    const r = result.pipes.L8;
    // loss per 100 m is the friction loss scaled from the pipe's 40 m
    expect(value(rows, 'Loss per 100 m')).toBe(
      `${Number(((r.frictionLoss / doc.pipes.L8.length) * 100).toPrecision(3))} m`,
    );
    expect(value(rows, 'Pressure at end')).toMatch(/barg \(.* bara\)$/);
    // The rack run is under vacuum in demo 1 (a caution finding): the margin row says so.
    const margin = rows.find((x) => x.label === 'Margin to vapour pressure')!;
    expect(margin.level).toBe('caution');
    expect(margin.note).toMatch(/vacuum/);
  });

  it('US units: loss per 100 ft, psig and psia', () => {
    const rows = pipeResultRows(doc, doc.pipes.L8, result, 'US');
    expect(rows.map((r) => r.label)).toContain('Loss per 100 ft');
    expect(value(rows, 'Pressure at start')).toMatch(/psig \(.* psia\)$/);
  });

  it('a pump shows duty, efficiency, power, NPSH and its margin, and % of best-efficiency flow', () => {
    const rows = pumpResultRows(doc, doc.nodes.P1, result, 'SI');
    const p = result.pumps.P1;
    expect(value(rows, 'Head')).toBe(`${Number(p.head.toPrecision(3))} m`);
    expect(value(rows, 'Efficiency')).toBe(`${(p.efficiency * 100).toFixed(1)} %`);
    expect(value(rows, 'Shaft power')).toMatch(/kW$/);
    expect(value(rows, 'NPSH available')).toBe(`${Number(p.npshAvailable.toPrecision(3))} m`);
    expect(value(rows, 'NPSH margin')).toMatch(/ratio/);
    expect(value(rows, 'Flow / best-efficiency flow')).toBe(
      `${Math.round(p.bepFraction! * 100)} %`,
    );
  });

  it('a control valve shows its opening, drop, flow coefficient and choking', () => {
    const rows = nodeResultRows(doc, doc.nodes.CV1, result, 'SI');
    expect(rows.map((r) => r.label)).toEqual(
      expect.arrayContaining(['Flow', 'Opening', 'Pressure drop', 'Flow coefficient']),
    );
  });

  it('a vessel shows its net flow and nozzle pressure', () => {
    const rows = nodeResultRows(doc, doc.nodes.V1, result, 'SI');
    expect(rows[0].label).toBe('Net flow out');
    expect(rows.some((r) => r.label.startsWith('Pressure at nozzle'))).toBe(true);
  });

  it('Reynolds numbers at three significant figures', () => {
    expect(reynoldsText(281781)).toBe('2.82 × 10⁵');
    expect(reynoldsText(1234.5)).toBe('1230');
  });

  it('the case shown: what it changes here, with case and base values', () => {
    const hot = Object.values(doc.cases).find((c) => c.overrides.temperature !== undefined)!;
    const changes = caseChanges(doc, hot.id, null, 'SI');
    expect(changes).toEqual([{ field: 'Temperature', caseValue: '80 °C', baseValue: '60 °C' }]);
    expect(caseChanges(doc, null, null, 'SI')).toEqual([]);
  });
});
