/**
 * `headroute review`: the review sheet written by the command line, checked against
 * `headroute solve --format json` on the same file (the two must agree), with names holding
 * markup to prove they stay text.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main';
import type { CliIo } from '../../src/cli/io';
import { escapeHtml } from '../../src/lib/report/html';
import { parseProjectFile, serializeProject } from '../../src/lib/model/file';
import type { HeadrouteDocument } from '../../src/lib/model/types';
import { formatQuantity } from '../../src/lib/units';
import { Sheet, at } from '../solver/helpers';

const run = promisify(execFile);

/** Captures what a command writes. */
function captureIo(): CliIo & { stdout: string; stderr: string } {
  const io = {
    stdout: '',
    stderr: '',
    out(text: string) {
      io.stdout += text;
    },
    err(text: string) {
      io.stderr += text;
    },
  };
  return io;
}

/** Feed tank → pump → rack crossing → day tank; hostile names; a hot case. */
function project(): HeadrouteDocument {
  const s = new Sheet();
  s.doc.name = 'Rack <img src=x> transfer';
  s.vessel('T1', 3, { name: 'Feed tank', nozzleZ: 0.3, x: 0, y: 0 });
  s.pump('PU', { name: 'Pump <em>A</em>', z: 0, x: 150, y: 40 });
  s.node('waypoint', 'W1', { name: 'Rack crossing', z: 12, x: 300, y: -60 });
  s.vessel('T2', 6, { name: 'Day tank', nozzleZ: 8, x: 450, y: 0 });
  s.pipe('P1', at('T1', 'N1'), at('PU', 'suction'), { length: 6, diameter: 0.08 });
  s.pipe('P2', at('PU', 'discharge'), at('W1', 'in'), { length: 40, diameter: 0.065 });
  s.pipe('P3', at('W1', 'out'), at('T2', 'N1'), { length: 30, diameter: 0.065 });
  s.doc.cases = { hot: { id: 'hot', name: 'Hot day', overrides: { temperature: 273.15 + 95 } } };
  s.doc.routes = { R1: { id: 'R1', name: 'Feed to day tank', nodes: ['T1', 'PU', 'W1', 'T2'] } };
  return s.doc;
}

let dir = '';
let file = '';

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'headroute-review-'));
  file = join(dir, 'rack.headroute.json');
  await writeFile(file, serializeProject(project()), 'utf8');
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('headroute review', () => {
  it('writes the review sheet, agreeing with headroute solve on the same file', async () => {
    const out = join(dir, 'rack.html');
    const io = captureIo();
    const code = await main(['review', file, '--out', out, '--date', '2026-05-06'], io);
    expect(code, io.stderr).toBe(0);
    expect(io.stderr).toMatch(/^headroute: wrote .*rack\.html \(2 case\(s\); \d+ stop/);
    const html = await readFile(out, 'utf8');

    const solveIo = captureIo();
    expect(await main(['solve', file, '--format', 'json'], solveIo)).toBe(0);
    const solved = JSON.parse(solveIo.stdout);
    const pump = solved.pumps.find((p: { id: string }) => p.id === 'PU');

    // Caution, sections, the stored route's profile, tables.
    expect(html).toContain('verify in detailed design against the applicable codes');
    expect(html).toContain('data-route="Feed to day tank"');
    expect(html).toContain('data-line="hgl"');
    expect(html).toContain('data-line="vapour"');
    for (const caption of ['Pipes', 'Pumps', 'Vessels and boundaries', 'Fittings and valves']) {
      expect(html).toMatch(new RegExp(`<caption>${caption}</caption>|${caption}: none`));
    }
    expect(html).toContain('Date</dt><dd>2026-05-06');
    // The figures agree with `headroute solve` on the same file.
    expect(html).toContain(`<td class="num">${formatQuantity(pump.flow, 'volumeFlow', 'SI')}</td>`);
    expect(html).toContain(
      `<td class="num">${formatQuantity(pump.npshAvailable, 'head', 'SI', { digits: 3 })}</td>`,
    );
    // Every finding of the base solve appears, with its level in words.
    for (const f of solved.findings.filter(
      (x: { chainage?: number }) => x.chainage === undefined,
    )) {
      expect(html).toContain(escapeHtml(f.message));
    }
    // Markup in names stays text; no script anywhere.
    expect(html).toContain('Rack &lt;img src=x&gt; transfer');
    expect(html).toContain('Pump &lt;em&gt;A&lt;/em&gt;');
    expect(html).not.toContain('<img');
    expect(html).not.toContain('<em>A</em>');
    expect(html.toLowerCase()).not.toContain('<script');
  });

  it('shows a case by name and writes to standard output without --out', async () => {
    const io = captureIo();
    expect(await main(['review', file, '--case', 'Hot day', '--date', '2026-05-06'], io)).toBe(0);
    expect(io.stdout.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(io.stdout).toContain('Case shown</dt><dd>Hot day');
    expect(io.stdout).toContain('<span class="level level-stop">STOP</span>');
  });

  it('refuses a bad date, an unknown case and a missing file with clear messages', async () => {
    let io = captureIo();
    expect(await main(['review', file, '--date', '2026-02-30'], io)).toBe(2);
    expect(io.stderr).toContain('--date must be a date as YYYY-MM-DD (got “2026-02-30”)');
    io = captureIo();
    expect(await main(['review', file, '--case', 'Cold'], io)).toBe(2);
    expect(io.stderr).toContain('There is no case “Cold”');
    io = captureIo();
    expect(await main(['review', join(dir, 'none.headroute.json')], io)).toBe(3);
    expect(io.stderr).toContain('there is no such file');
    io = captureIo();
    expect(await main(['review', file, '--out', join(dir, 'no-such-dir', 'x.html')], io)).toBe(3);
    expect(io.stderr).toContain('Cannot write');
  });

  it('runs from the installed command (bin/headroute.js)', async () => {
    const out = join(dir, 'bin.html');
    const { stderr } = await run(process.execPath, [
      'bin/headroute.js',
      'review',
      file,
      '--out',
      out,
      '--date',
      '2026-05-06',
    ]);
    expect(stderr).toContain('headroute: wrote');
    const html = await readFile(out, 'utf8');
    expect(html).toContain('<section id="comparison">');
    expect(html).toContain('◆ marks the worst value in each row');
  }, 30_000);

  it('is listed in headroute --help', async () => {
    const io = captureIo();
    expect(await main(['--help'], io)).toBe(0);
    expect(io.stdout).toContain('headroute review FILE [--out FILE.html]');
  });
});

describe('headroute review on the demo projects', async () => {
  const examples = 'static/examples';
  const demos = (await readdir(examples)).filter((f) => f.endsWith('.headroute.json')).sort();

  it('finds the demo projects', () => {
    expect(demos).toContain('pump-over-rack.headroute.json');
  });

  for (const demo of demos) {
    it(`${demo}: caution, findings, each stored route's profile and the tables`, async () => {
      const path = join(examples, demo);
      const parsed = parseProjectFile(await readFile(path, 'utf8'));
      if (!parsed.ok) throw new Error(`${demo} does not parse`);
      const doc = parsed.document;
      const io = captureIo();
      expect(await main(['review', path, '--date', '2026-05-06'], io), io.stderr).toBe(0);
      const html = io.stdout;
      const solveIo = captureIo();
      expect(await main(['solve', path, '--format', 'json'], solveIo)).toBe(0);
      const solved = JSON.parse(solveIo.stdout);

      expect(html).toContain('verify in detailed design against the applicable codes');
      expect(html).toContain(`<title>Review sheet — ${escapeHtml(doc.name)}</title>`);
      const routes = Object.values(doc.routes);
      for (const r of routes) {
        const figure = html.indexOf(`<figure data-route="${escapeHtml(r.name)}">`);
        expect(figure, r.name).toBeGreaterThan(0);
        expect(html.indexOf('data-line="hgl"', figure)).toBeGreaterThan(figure);
      }
      if (routes.length === 0) expect(html).toContain('<figure data-route="Default route">');
      expect(html).toContain('<caption>Pipes</caption>');
      expect(html).toContain('<section id="findings">');
      for (const f of solved.findings) {
        if (f.chainage === undefined) expect(html).toContain(escapeHtml(f.message));
      }
      for (const c of Object.values(doc.cases)) {
        expect(html).toContain(`<th>${escapeHtml(c.name)}</th>`); // a comparison column
      }
      for (const p of solved.pumps) {
        expect(html).toContain(
          `<td class="num">${formatQuantity(p.flow, 'volumeFlow', 'SI')}</td>`,
        );
      }
      expect(html.toLowerCase()).not.toContain('<script');
    });
  }

  it('keeps markup typed into a demo’s names as text', async () => {
    const path = join(examples, 'pump-over-rack.headroute.json');
    const parsed = parseProjectFile(await readFile(path, 'utf8'));
    if (!parsed.ok) throw new Error('demo 1 does not parse');
    const doc = parsed.document;
    const pump = Object.values(doc.nodes).find((n) => n.kind === 'pump')!;
    pump.name = '<svg onload=alert(1)>P-101';
    const firstCase = Object.values(doc.cases)[0];
    firstCase.name = 'Low & "dry" <case>';
    const hostile = join(dir, 'hostile-demo.headroute.json');
    await writeFile(hostile, serializeProject(doc), 'utf8');
    const io = captureIo();
    expect(await main(['review', hostile], io), io.stderr).toBe(0);
    expect(io.stdout).toContain('&lt;svg onload=alert(1)&gt;P-101');
    expect(io.stdout).toContain('Low &amp; &quot;dry&quot; &lt;case&gt;');
    expect(io.stdout).not.toContain('<svg onload');
    expect(io.stdout).not.toContain('<case>');
  });
});
