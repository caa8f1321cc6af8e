import { describe, expect, it } from 'vitest';
import { MAX_SURVEY_BYTES, parseSurveyCsv } from '../../../src/lib/model/survey/parseSurvey';

describe('parseSurveyCsv', () => {
  it('reads chainage and elevation with or without a header, any common separator', () => {
    for (const text of [
      'chainage,elevation\n100,5\n150,7.5\n',
      '100;5\r\n150;7.5',
      '100\t5\n\n150\t7.5\n',
      '  100   5\n150 7.5',
    ]) {
      const r = parseSurveyCsv(text);
      expect(r.ok, text).toBe(true);
      if (r.ok)
        expect(r.points).toEqual([
          { chainage: 0, elevation: 5 },
          { chainage: 50, elevation: 7.5 },
        ]);
    }
  });

  it('reads feet when told or when the header says so (1 ft = 0.3048 m exactly, 1959 definition)', () => {
    const byHeader = parseSurveyCsv('Chainage (ft),Elevation (ft)\n0,10\n100,20\n');
    expect(byHeader.ok && byHeader.unit).toBe('ft');
    if (byHeader.ok) expect(byHeader.points[1]).toEqual({ chainage: 30.48, elevation: 6.096 });
    const told = parseSurveyCsv('0,10\n100,20\n', 'ft');
    expect(told.ok && told.points[1].chainage).toBeCloseTo(30.48, 12);
    const metres = parseSurveyCsv('station_m,z_m\n0,1\n5,2\n');
    expect(metres.ok && metres.unit).toBe('m');
  });

  it.each([
    ['text in a number', '0,1\n10,abc\n', 2, 'elevation "abc" is not a number'],
    ['decreasing chainage', '0,1\n10,2\n5,3\n', 3, 'does not increase'],
    ['repeated chainage', '0,1\n10,2\n10,3\n', 3, 'does not increase'],
    ['a missing column', 'ch,z\n0,1\n10\n', 3, 'one column'],
    ['a text row after the data', '0,1\nend,here\n', 2, 'chainage "end" is not a number'],
  ])('refuses %s with the line number', (_what, text, line, words) => {
    const r = parseSurveyCsv(text);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.line).toBe(line);
      expect(r.message).toContain(words);
    }
  });

  it('refuses too few points and a 10 MB text without reading it', () => {
    expect(parseSurveyCsv('ch,z\n0,1\n').ok).toBe(false);
    const big = '0,1\n'.repeat(2_600_000);
    expect(big.length).toBeGreaterThan(MAX_SURVEY_BYTES);
    const r = parseSurveyCsv(big);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/at most 2 MB/);
  });

  it('cuts a long or binary cell in its message', () => {
    const r = parseSurveyCsv(`0,1\n10,${'x'.repeat(5000)}\u0001\n`);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message.length).toBeLessThan(100);
  });
});
