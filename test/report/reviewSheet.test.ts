/**
 * The review sheet as an HTML string: the sections it must hold, escaped text, inline SVG
 * without scripts, print CSS, and the figures agreeing with a separate solve.
 */
import { describe, expect, it } from 'vitest';
import { reviewSheetHtml, REVIEW_CAUTION } from '../../src/lib/report';
import { escapeHtml } from '../../src/lib/report/html';
import { sheetDrawingSvg } from '../../src/lib/report/sheetDrawing';
import { REVIEW_SHEET_CSS } from '../../src/lib/report/printCss';
import { compareCases } from '../../src/lib/solver/compareCases';
import { envelopeSpans } from '../../src/lib/chart/envelope';
import { profile } from '../../src/lib/solver/profile';
import { solve } from '../../src/lib/solver/solve';
import { formatQuantity } from '../../src/lib/units';
import type { HeadrouteDocument } from '../../src/lib/model/types';
import { Sheet, at } from '../solver/helpers';

const CELSIUS = 273.15;
const DATE = new Date('2026-03-04T10:00:00Z');

/** Feed tank → pump → elbow → rack high point → day tank, with hostile names and a hot case. */
function project(): HeadrouteDocument {
  const s = new Sheet();
  s.doc.name = 'North <script>alert(1)</script> & "rack"';
  s.vessel('T1', 3, { name: 'Feed <b>tank</b>', nozzleZ: 0.3, x: 0, y: 0 });
  s.pump('PU', { name: 'Transfer pump', z: 0, x: 150, y: 40 });
  s.fitting('E1', { name: 'Elbow 1', z: 0, x: 250, y: 40 });
  s.node('waypoint', 'W1', { name: 'Rack crossing', z: 12, x: 350, y: -60 });
  // Inlet below the liquid (6 m): the line ends at the level, so the rack runs under vacuum.
  s.vessel('T2', 6, { name: 'Day tank', nozzleZ: 5, x: 500, y: 0 });
  s.pipe('P1', at('T1', 'N1'), at('PU', 'suction'), { length: 6, diameter: 0.08, name: 'Suction' });
  s.pipe('P2', at('PU', 'discharge'), at('E1', 'in'), { length: 5, diameter: 0.065 });
  s.pipe('P3', at('E1', 'out'), at('W1', 'in'), { length: 35, diameter: 0.065 });
  s.pipe('P4', at('W1', 'out'), at('T2', 'N1'), { length: 30, diameter: 0.065 });
  s.doc.cases = {
    hot: { id: 'hot', name: 'Hot <i>day</i>', overrides: { temperature: CELSIUS + 98 } },
  };
  s.doc.routes = {
    R1: { id: 'R1', name: 'Feed to day tank', nodes: ['T1', 'PU', 'E1', 'W1', 'T2'] },
    R2: { id: 'R2', name: 'Pump to rack', nodes: ['PU', 'W1'] },
  };
  return s.doc;
}

describe('reviewSheetHtml', () => {
  const doc = project();
  const before = structuredClone(doc);
  const html = reviewSheetHtml(doc, { date: DATE });

  it('is a complete HTML document with no scripts and inline SVG', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain('</html>');
    expect(html.toLowerCase()).not.toContain('<script');
    expect(html).not.toContain('<?xml');
    expect(html).not.toMatch(/\son[a-z]+=/i); // no event-handler attributes
    expect((html.match(/<svg /g) ?? []).length).toBe(3); // the sheet and two profiles
    expect(doc).toEqual(before);
  });

  it('escapes every name: markup in names stays text', () => {
    expect(html).toContain('North &lt;script&gt;alert(1)&lt;/script&gt; &amp; &quot;rack&quot;');
    expect(html).toContain('Feed &lt;b&gt;tank&lt;/b&gt;');
    expect(html).toContain('Hot &lt;i&gt;day&lt;/i&gt;');
    expect(html).not.toContain('<b>tank</b>');
    expect(html).not.toContain('<i>day</i>');
  });

  it('holds the caution, project facts, each stored route profile, tables, findings, comparison and methods', () => {
    expect(html).toContain(escapeHtml(REVIEW_CAUTION));
    expect(html).toContain('verify in detailed design');
    expect(html).toContain('competent, licensed engineer');
    for (const id of [
      'project',
      'sheet',
      'profiles',
      'findings',
      'comparison',
      'elements',
      'methods',
    ]) {
      expect(html).toContain(`<section id="${id}">`);
    }
    expect(html).toContain('data-route="Feed to day tank"');
    expect(html).toContain('data-route="Pump to rack"');
    expect(html).toContain('data-line="hgl"');
    for (const caption of ['Pipes', 'Fittings and valves', 'Pumps', 'Vessels and boundaries']) {
      expect(html).toContain(`<caption>${caption}</caption>`);
    }
    expect(html).toContain('Darcy–Weisbach');
    expect(html).toContain('Colebrook–White');
    expect(html).toContain('Hooper, 1981');
    expect(html).toContain('Darby, 2001');
    expect(html).toContain('IAPWS-IF97');
    expect(html).toContain('IAPWS 2008');
    expect(html).toContain('ISO 2533');
    expect(html).toContain('common practice');
    expect(html).toContain('Date</dt><dd>2026-03-04');
  });

  it('gives each inline profile its own pattern and clip ids', () => {
    const ids = [...html.matchAll(/ id="([^"]+)"/g)].map((m) => m[1]);
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids).toContain('hr-hatch-stop-r1');
    expect(ids).toContain('hr-hatch-stop-r2');
    expect(html).toContain('url(#hr-chart-clip-r2)');
    expect(html).not.toContain('url(#hr-chart-clip)');
  });

  it('shows the solved figures in the project units', () => {
    const result = solve(doc);
    const flow = formatQuantity(result.pumps.PU.flow, 'volumeFlow', 'SI');
    const npsha = formatQuantity(result.pumps.PU.npshAvailable, 'head', 'SI', { digits: 3 });
    expect(html).toContain(`<td class="num">${flow}</td>`);
    expect(html).toContain(`<td class="num">${npsha}</td>`);
    const us = reviewSheetHtml(
      { ...doc, settings: { ...doc.settings, unitSystem: 'US' } },
      { date: DATE },
    );
    expect(us).toContain(formatQuantity(result.pumps.PU.flow, 'volumeFlow', 'US'));
    expect(us).toContain(' gpm');
  });

  it('lists the findings of the shown case with their level in words', () => {
    const result = solve(doc);
    for (const f of result.findings) expect(html).toContain(escapeHtml(f.message));
    const hot = solve(doc, 'hot');
    const stop = hot.findings.find((f) => f.level === 'stop');
    // Water at 95 °C: vapour pressure about 84.6 kPa (IAPWS-IF97 region 4, iapws 1.5.2), so
    // the rack crossing at 12 m is far under vapour pressure in the hot case.
    expect(stop).toBeDefined();
    expect(html).toContain(escapeHtml(stop!.message));
    expect(html).toContain('<span class="level level-stop">STOP</span>');
  });

  it('marks the worst case of each comparison row in words, not by colour', () => {
    const comparison = compareCases(doc);
    const npsha = comparison.rows.find((r) => r.key === 'pump:PU:npshAvailable')!;
    expect(npsha.worst).toBe(1);
    const same = reviewSheetHtml(doc, { date: DATE, comparison });
    expect(same).toBe(html);
    expect(html).toContain('class="num worst"');
    expect(REVIEW_SHEET_CSS).toContain("content: ' ◆ worst'");
    expect(html).toContain('◆ marks the worst value in each row');
  });

  it('lists the marked spans across all cases per route, naming the worst case', () => {
    const route = doc.routes.R1.nodes;
    const cases = [null, 'hot'].map((id) => ({
      name: id === null ? 'Base case' : doc.cases[id].name,
      profile: profile(doc, solve(doc, id), route),
    }));
    const spans = envelopeSpans(cases);
    const vapour = spans.find((s) => s.kind === 'vapour');
    // Water at 98 °C (vapour pressure 94 kPa, IAPWS-IF97) over a 12 m rack crossing near
    // 85 kPa abs: under vapour pressure in the hot case only.
    expect(vapour?.worstCaseName).toBe('Hot <i>day</i>');
    expect(html).toContain('<caption>Marked spans across all cases — Feed to day tank</caption>');
    expect(html).toContain('<th>STOP: below vapour pressure</th><td class="num">');
    expect(html).toContain(
      `${formatQuantity(vapour!.start, 'length', 'SI')} – ${formatQuantity(vapour!.end, 'length', 'SI')}`,
    );
    expect(html).toContain('<td>Hot &lt;i&gt;day&lt;/i&gt;</td>');
  });

  it('can show a case other than the base', () => {
    const hot = reviewSheetHtml(doc, { date: DATE, caseId: 'hot' });
    expect(hot).toContain('Case shown</dt><dd>Hot &lt;i&gt;day&lt;/i&gt;');
    const r = solve(doc, 'hot');
    expect(hot).toContain(formatQuantity(r.pumps.PU.npshAvailable, 'head', 'SI', { digits: 3 }));
  });
});

describe('print CSS', () => {
  it('fits A4 and US Letter and keeps tables whole', () => {
    expect(REVIEW_SHEET_CSS).toContain('@page { size: auto; margin: 15mm');
    // Letter is 215.9 mm wide: 15 + 15 mm margins leave 185.9 mm ≥ the 180 mm layout width.
    expect(REVIEW_SHEET_CSS).toContain('max-width: 180mm');
    expect(REVIEW_SHEET_CSS).toMatch(/table \{[^}]*page-break-inside: avoid/);
  });

  it('uses greys only', () => {
    const colours = REVIEW_SHEET_CSS.match(/#[0-9a-f]{3,6}\b/gi) ?? [];
    expect(colours.length).toBeGreaterThan(0);
    for (const c of colours) {
      const hex = c.length === 4 ? c.slice(1).replace(/./g, (d) => d + d) : c.slice(1);
      expect(hex.slice(0, 2), c).toBe(hex.slice(2, 4));
      expect(hex.slice(2, 4), c).toBe(hex.slice(4, 6));
    }
  });
});

describe('sheetDrawingSvg', () => {
  it('draws every node and pipe with its name, escaped', () => {
    const doc = project();
    const svg = sheetDrawingSvg(doc, solve(doc));
    for (const id of Object.keys(doc.nodes)) expect(svg).toContain(`data-node="${id}"`);
    for (const id of Object.keys(doc.pipes)) expect(svg).toContain(`data-pipe="${id}"`);
    expect(svg).toContain('Feed &lt;b&gt;tank&lt;/b&gt;');
    // Pipes are labelled with name and flow where the label has room (the tables hold all).
    expect(svg).toMatch(/>P3 · [\d.]+ m3\/h</);
    expect(svg).not.toContain('Suction · '); // 120 units of pipe: too short for its label
    expect((svg.match(/<polyline /g) ?? []).length).toBe(Object.keys(doc.pipes).length);
  });

  it('draws an empty sheet without failing', () => {
    const doc = new Sheet().doc;
    expect(sheetDrawingSvg(doc, null)).toMatch(/^<svg [^>]*viewBox="-60 -60 520 320"/);
  });
});
