import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { csvField, neutralise } from '../../src/lib/chart/stationsCsv';

describe('CSV cells a spreadsheet will not run', () => {
  it.each([
    ['=HYPERLINK("x")', `'=HYPERLINK("x")`],
    ['+1+cmd', "'+1+cmd"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\tTab', "'\tTab"],
    ['\rCR', "'\rCR"],
    ['-2+3+cmd', "'-2+3+cmd"],
    ['-pump', "'-pump"],
    ['-5', '-5'],
    ['-0.25', '-0.25'],
    ['Pump P-1', 'Pump P-1'],
  ])('%j → %j', (input, expected) => {
    expect(neutralise(input)).toBe(expected);
  });

  it('no field starts with a formula character, whatever the name (fixed seed)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), (name) => {
        const cell = csvField(name);
        const body = cell.startsWith('"') ? cell.slice(1) : cell;
        const risky = /^[=+@\t\r]/.test(body) || /^-(?!\d+(\.\d+)?([eE][+-]?\d+)?"?$)/.test(body);
        expect(risky).toBe(false);
      }),
      { seed: 13, numRuns: 500 },
    );
  });
});
