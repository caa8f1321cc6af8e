import { describe, expect, it } from 'vitest';
import {
  fittingsSummary,
  parseFittingEntry,
  withFittings,
} from '../../src/lib/model/pipeFittingList';

describe('quick entry of pipe fittings', () => {
  it.each([
    ['6 × 90° elbow', 6, 'elbow-90-standard'],
    ['6x 90 ell', 6, 'elbow-90-standard'],
    ['6 x 90° LR elbow', 6, 'elbow-90-long-radius'],
    ['90° elbow', 1, 'elbow-90-standard'],
    ['45 elbow long radius', 1, 'elbow-45-long-radius'],
    ['2 * 45° bend', 2, 'elbow-45-standard'],
    ['2 gate valves', 2, 'gate-valve'],
    ['1 globe valve', 1, 'globe-valve'],
    ['ball valve', 1, 'ball-valve'],
    ['3 off butterfly valve', 3, 'butterfly-valve'],
    ['tee branch', 1, 'tee-branch'],
    ['4 tee', 4, 'tee-run'],
    ['Y strainer', 1, 'strainer'],
    ['1 × flow meter', 1, 'flow-meter'],
  ])('“%s” → %i × %s', (text, count, fittingType) => {
    expect(parseFittingEntry(text)).toEqual({ ok: true, count, fittingType });
  });

  it.each([
    ['', /Type a fitting/],
    ['2 swing check valves', /draw it on the sheet/],
    ['reducer', /draw them on the sheet/],
    ['3 widgets', /“widgets” is not a fitting/],
    ['0 × gate valve', /whole number from 1/],
    ['5000 × gate valve', /whole number from 1/],
  ])('“%s” is refused with the reason', (text, message) => {
    const r = parseFittingEntry(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message);
  });

  it('adds to the line of the same type, or starts a new one', () => {
    let list = withFittings(undefined, 'elbow-90-standard', 6);
    list = withFittings(list, 'gate-valve', 1);
    list = withFittings(list, 'elbow-90-standard', 2);
    expect(list.items.map((i) => [i.fittingType, i.count, i.lossMethod])).toEqual([
      ['elbow-90-standard', 8, '3K'],
      ['gate-valve', 1, '3K'],
    ]);
    expect(withFittings(undefined, 'strainer', 1).items[0].lossMethod).toBe('fixed');
    expect(fittingsSummary({ ...list, lumpedK: 1.5 })).toBe(
      '8 × 90° elbow, 1 × gate valve, lumped K 1.5',
    );
    expect(fittingsSummary(undefined)).toBe('none');
  });
});
