// @vitest-environment jsdom
// jsdom supplies DOMParser for the well-formedness check.
import { describe, expect, it } from 'vitest';
import { exportMeta, SCREENING_CAUTION } from '../../src/lib/chart/exportMeta';
import { profileSvg } from '../../src/lib/chart/profileSvg';
import { stationsCsv } from '../../src/lib/chart/stationsCsv';
import { demoDocument, demoProfile, demoResult } from './fixtures';

const DATE = new Date('2026-12-01T12:00:00Z');

function parseSvg(text: string): Document {
  return new DOMParser().parseFromString(text, 'image/svg+xml');
}

describe('profileSvg', () => {
  const svg = profileSvg(demoDocument(), demoResult(), demoProfile(), { date: DATE });
  const dom = parseSvg(svg);

  it('is well-formed XML with an svg root', () => {
    // The check itself catches broken XML.
    expect(parseSvg('<svg><g></svg>').getElementsByTagName('parsererror').length).toBeGreaterThan(
      0,
    );
    expect(dom.getElementsByTagName('parsererror')).toHaveLength(0);
    expect(dom.documentElement.tagName).toBe('svg');
    expect(dom.documentElement.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
  });

  it('draws the pipe, HGL, EGL and vapour lines as non-empty paths', () => {
    for (const key of ['pipe', 'hgl', 'egl', 'vapour']) {
      const path = dom.querySelector(`path[data-line="${key}"]`);
      expect(path, key).not.toBeNull();
      expect(path!.getAttribute('d')).toMatch(/^M[\d.-]+,[\d.-]+L/);
    }
  });

  it('hatches the marked spans and labels them', () => {
    expect(dom.querySelector('rect[data-span="vapour"]')!.getAttribute('fill')).toBe(
      'url(#hr-hatch-stop)',
    );
    expect(dom.querySelector('rect[data-span="vacuum"]')!.getAttribute('fill')).toBe(
      'url(#hr-hatch-caution)',
    );
    expect(dom.querySelector('pattern#hr-hatch-stop')).not.toBeNull();
    expect(dom.querySelector('text[data-span-label="vapour"]')!.textContent).toMatch(
      /Below vapour pressure: min/,
    );
  });

  it('carries the title block, the caution and the legend as text', () => {
    const text = dom.documentElement.textContent ?? '';
    expect(text).toContain('Tank farm transfer, "north" <A&B>');
    expect(text).toContain('Route: Feed tank → Day tank');
    expect(text).toContain('Case: Hot liquid');
    expect(text).toContain('Liquid: Water at');
    expect(text).toContain('Date: 2026-12-01');
    expect(dom.querySelector('[data-part="caution"]')!.textContent).toBe(SCREENING_CAUTION);
    expect(text).toContain('NPSHa');
    for (const entry of ['HGL', 'EGL', 'Vapour line', 'Stop: below vapour pressure']) {
      expect(dom.querySelector('[data-part="legend"]')!.textContent).toContain(entry);
    }
    // Self-contained: no external references or stylesheets.
    expect(svg).not.toMatch(/href=|<link|@import|url\(http/);
  });
});

describe('stationsCsv', () => {
  const doc = demoDocument();
  const meta = exportMeta(doc, demoResult(), demoProfile().route, { date: DATE });
  const names = Object.fromEntries(Object.values(doc.nodes).map((n) => [n.id, n.name]));
  const csv = stationsCsv(demoProfile(), 'SI', meta, names);
  const lines = csv.trimEnd().split('\n');

  it('starts with a comment block carrying the title block and the caution', () => {
    const comments = lines.filter((l) => l.startsWith('# '));
    expect(lines.slice(0, comments.length)).toEqual(comments);
    expect(comments).toContain('# Project: Tank farm transfer, "north" <A&B>');
    expect(comments).toContain('# Route: Feed tank → Day tank');
    expect(comments).toContain('# Case: Hot liquid');
    expect(comments).toContain('# Date: 2026-12-01');
    expect(comments).toContain(`# ${SCREENING_CAUTION}`);
  });

  it('has a header row with units and one row per station', () => {
    const header = lines.find((l) => !l.startsWith('#'))!;
    expect(header.split(',')[0]).toBe('chainage (m)');
    expect(header).toContain('HGL (m)');
    expect(header).toContain('margin to vapour pressure');
    const rows = lines.slice(lines.indexOf(header) + 1);
    expect(rows).toHaveLength(demoProfile().stations.length);
    const cols = header.split(',').length;
    for (const r of rows) expect(r.split(',')).toHaveLength(cols);
    const pumpOut = rows.find((r) => r.includes('Transfer pump,node-out'))!;
    expect(pumpOut.split(',')[4]).toBe('34.5');
  });
});
