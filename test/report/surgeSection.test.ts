import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { surgeEnvelopeCsv, surgeEnvelopeSvg, surgeTimeSvg } from '../../src/lib/chart/surgeChart';
import { parseProjectFile } from '../../src/lib/model/file';
import { reviewSheetHtml } from '../../src/lib/report/reviewSheet';
import { runSurge } from '../../src/lib/solver/surge';

const parsed = parseProjectFile(
  readFileSync('static/examples/pump-trip-over-rack.headroute.json', 'utf8'),
);
if (!parsed.ok) throw new Error('demo does not load');
const doc = parsed.document;
const run = runSurge(doc, { kind: 'trip', pump: 'P1', inertia: 0.02 }, { duration: 2 });

describe('surge on the review sheet and in the drawings', () => {
  it('the review sheet shows the event, figures, drawing and what is not modelled', () => {
    const html = reviewSheetHtml(doc, { surge: run, date: new Date('2026-01-01') });
    const section = html.slice(html.indexOf('<section id="surge">'));
    expect(section).toContain('Trip of pump “Transfer pump P-401” with inertia 0.02 kg·m²');
    expect(section).toContain('Joukowsky a·Δv/g');
    expect(section).toContain('data-part="surge"');
    expect(section).toContain('Not modelled');
    expect(section).toContain('unsteady');
  }, 60_000);

  it('without a run the section says so, and still says what is not modelled', () => {
    const html = reviewSheetHtml(doc, { date: new Date('2026-01-01') });
    const section = html.slice(html.indexOf('<section id="surge">'));
    expect(section).toContain('No surge event was run');
    expect(section).toContain('Not modelled');
  }, 60_000);

  it('SVG and CSV carry every line and the caution; text is escaped', () => {
    const svg = surgeEnvelopeSvg(run, { title: 'A <b> & “c”' });
    for (const label of ['pipe', 'vapour line', 'steady HGL', 'max HGL', 'min HGL', 'cavity'])
      expect(svg).toContain(`>${label}<`);
    expect(svg).toContain('A &lt;b&gt; &amp; “c”');
    expect(svg).toContain('Screening result');
    expect(svg).not.toMatch(/NaN/);
    expect(surgeTimeSvg(run, 0)).not.toMatch(/NaN/);
    const csv = surgeEnvelopeCsv(run).trim().split('\n');
    expect(csv[0]).toMatch(/^# Screening result/);
    expect(csv.length - 2).toBe(run.envelope.length);
  });
});
