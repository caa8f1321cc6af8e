/**
 * The `headroute` command run as users run it (`node bin/headroute.js …` in a child process):
 * golden key figures of the demo projects from `--format json` (regression values from the
 * demo runs, compared with tolerances), text and CSV smoke checks, `--strict`, and errors.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const CAUTION = 'Screening result — verify in detailed design';
const EXAMPLES = 'static/examples';

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs the installed command's script with `args`; never rejects. */
function headroute(...args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      ['bin/headroute.js', ...args],
      { cwd: process.cwd(), timeout: 20_000, maxBuffer: 16 * 1024 * 1024 },
      (error, stdout, stderr) => {
        const code = error ? (typeof error.code === 'number' ? error.code : -1) : 0;
        resolve({ code, stdout, stderr });
      },
    );
  });
}

async function solveJson(file: string, ...more: string[]) {
  const run = await headroute('solve', `${EXAMPLES}/${file}`, '--format', 'json', ...more);
  expect(run.stderr).toBe('');
  expect(run.code).toBe(0);
  return JSON.parse(run.stdout);
}

/** |actual − expected| within a relative tolerance. */
function near(actual: number, expected: number, relative = 0.005): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * relative);
}

const M3H = 1 / 3600;

describe('headroute solve: golden key figures of the demo projects', () => {
  it('pump over a rack: duty point, NPSH and the lowest margin on the route', async () => {
    const r = await solveJson('pump-over-rack.headroute.json');
    expect(r.caution).toContain(CAUTION);
    expect(r.converged).toBe(true);
    const pump = r.pumps[0];
    expect(pump.name).toBe('Transfer pump P-101');
    near(pump.flow, 29.43 * M3H);
    near(pump.head, 22.13);
    near(pump.npshAvailable, 10.67);
    near(pump.npshRequired, 2.555);
    // FV-101 sits at the pump; past it the rack runs under vacuum up to the road crossing
    // (+14 m), which is the lowest margin to vapour pressure on the route.
    near(r.route.lowestVapourMargin, 52.95e3);
    near(r.route.lowestChainage, 76.5);
    expect(r.route.lowestElementName).toBe('Rack run east');
    expect(r.counts).toEqual({ stop: 0, caution: 4, note: 0 });
  }, 30_000);

  it('pump over a rack, hot case by name: less NPSH available', async () => {
    const r = await solveJson('pump-over-rack.headroute.json', '--case', 'Hot day 80 °C');
    expect(r.case).toEqual({ id: 'C2', name: 'Hot day 80 °C' });
    near(r.fluid.temperature, 353.15, 1e-6);
    near(r.pumps[0].npshAvailable, 7.889);
    near(r.pumps[0].flow, 29.47 * M3H);
  }, 30_000);

  it('siphon over a bund: flow, the crest margin and the vacuum spans by chainage', async () => {
    const r = await solveJson('siphon-over-bund.headroute.json');
    expect(r.pumps).toEqual([]);
    for (const p of r.pipes) near(p.flow, 61.57 * M3H);
    near(r.route.lowestVapourMargin, 38.13e3);
    near(r.route.lowestChainage, 9.0);
    const spans = r.findings.filter(
      (f: { code: string; chainage?: number }) => f.code === 'vacuum' && f.chainage !== undefined,
    );
    // The intake leg rises from −1.7 m at the pond; the vacuum starts on the up-leg.
    expect(spans.map((f: { chainage: number }) => Math.round(f.chainage * 10) / 10)).toEqual([
      3.7, 42.3,
    ]);
  }, 30_000);

  it('branched feed with a minimum-flow return: pump and branch flows', async () => {
    const r = await solveJson('branched-with-recirculation.headroute.json');
    const pump = r.pumps[0];
    // V-303's inlet N1 (5.5 m) is above its liquid (4 m): its pipe ends at the gas pressure at
    // the nozzle, not at the liquid head 1.5 m lower (solver/network/nozzleHeads.ts). Before
    // that fix these were 45.9 m3/h, 31.85 m, NPSHr 2.878 m, branches 6/20/20 m3/h.
    near(pump.flow, 45.13 * M3H);
    near(pump.head, 32.28);
    near(pump.npshAvailable, 11.95);
    near(pump.npshRequired, 2.811);
    const flows = new Set<number>(r.pipes.map((p: { flow: number }) => Math.round(p.flow / M3H)));
    expect([...flows].sort((a, b) => a - b)).toEqual([6, 19, 20, 45]);
    near(r.route.lowestVapourMargin, 116.4e3);
    // Mass balance: the three branches add up to the pump flow.
    const branch = (name: string) => r.pipes.find((p: { name: string }) => p.name === name).flow;
    near(branch('To V-302') + branch('To V-303') + branch('Minimum-flow return'), pump.flow, 1e-9);
  }, 30_000);
});

describe('headroute solve: text and CSV', () => {
  it('prints readable tables, the findings section and the caution footer', async () => {
    const run = await headroute('solve', `${EXAMPLES}/pump-over-rack.headroute.json`);
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('Transfer pump P-101');
    expect(run.stdout).toMatch(/^Pipes$/m);
    expect(run.stdout).toMatch(/^Pumps$/m);
    expect(run.stdout).toContain('flow (m3/h)');
    expect(run.stdout).toMatch(/^Findings \(0 stop, 4 caution, 0 note\)$/m);
    expect(run.stdout).toMatch(/^ {2}CAUTION Pipe “Rack run east” runs under vacuum/m);
    expect(run.stdout.trimEnd().split('\n').pop()).toMatch(/^Caution: Screening result/);
  }, 30_000);

  it('writes one CSV table per section with the caution as a comment', async () => {
    const run = await headroute(
      'solve',
      `${EXAMPLES}/siphon-over-bund.headroute.json`,
      '--format',
      'csv',
    );
    expect(run.code).toBe(0);
    const lines = run.stdout.split('\n');
    expect(lines).toContain(
      `# ${CAUTION} against the applicable codes, by a competent, licensed engineer.`,
    );
    for (const section of [
      '# Pipes',
      '# Pumps',
      '# Control valves',
      '# Fittings and valves',
      '# Findings',
    ])
      expect(lines).toContain(section);
    const header = lines[lines.indexOf('# Findings') + 1];
    expect(header).toBe('level,code,chainage (m),elements,message');
  }, 30_000);
});

describe('headroute solve: --strict and errors', () => {
  let dir = '';
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'headroute-cli-'));
    // The siphon with its crest raised 4.5 m: the crest falls below vapour pressure.
    const doc = JSON.parse(await readFile(`${EXAMPLES}/siphon-over-bund.headroute.json`, 'utf8'));
    doc.nodes.W1.z += 4.5;
    doc.nodes.F2.z += 4.5;
    await writeFile(join(dir, 'high-crest.headroute.json'), JSON.stringify(doc));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('exits 1 with --strict when there is a stop finding, 0 without', async () => {
    const file = join(dir, 'high-crest.headroute.json');
    const [strict, plain, clean] = await Promise.all([
      headroute('solve', file, '--strict'),
      headroute('solve', file),
      headroute('solve', `${EXAMPLES}/pump-over-rack.headroute.json`, '--strict'),
    ]);
    expect(strict.code).toBe(1);
    expect(strict.stderr).toMatch(/stop finding/);
    expect(strict.stdout).toMatch(/STOP\s+Route “Pond → Basin”, chainage/);
    expect(plain.code).toBe(0);
    expect(clean.code).toBe(0);
  }, 60_000);

  it('refuses a hostile file with the reader’s message and exit 3', async () => {
    const run = await headroute('solve', 'test/fixtures/hostile/proto-key.headroute.json');
    expect(run.code).toBe(3);
    expect(run.stdout).toBe('');
    expect(run.stderr).toMatch(/is not a valid Headroute project/);
    expect(run.stderr).toMatch(/__proto__/);
  }, 30_000);

  it('says what is wrong with a missing file, an unknown case or option', async () => {
    const rack = `${EXAMPLES}/pump-over-rack.headroute.json`;
    const [missing, badCase, badFormat] = await Promise.all([
      headroute('solve', join(dir, 'nope.headroute.json')),
      headroute('solve', rack, '--case', 'Winter'),
      headroute('solve', rack, '--format', 'xml'),
    ]);
    expect(missing.code).toBe(3);
    expect(missing.stderr).toMatch(/there is no such file/);
    expect(badCase.code).toBe(2);
    expect(badCase.stderr).toMatch(/no case “Winter”.*Low tank level/);
    expect(badFormat.code).toBe(2);
    expect(badFormat.stderr).toMatch(/--format must be one of text, json, csv/);
  }, 60_000);

  it('documents the exit codes in --help', async () => {
    const run = await headroute('--help');
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/Exit codes:/);
    for (const code of ['0', '1', '2', '3', '4'])
      expect(run.stdout).toMatch(new RegExp(`^  ${code} `, 'm'));
  }, 30_000);
});

describe('headroute profile', () => {
  const file = `${EXAMPLES}/pump-over-rack.headroute.json`;

  it('--from and --to take a tag within a name when only one name carries it', async () => {
    const run = await headroute('profile', file, '--from', 'T-101', '--to', 'v-201');
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const rows = run.stdout.split('\n').filter((l) => /^[\d.]+,/.test(l));
    expect(rows[0]).toMatch(/^0,Storage tank T-101,level,/);
    expect(rows[rows.length - 1]).toMatch(/^104\.5,Receiver V-201 \(vented\),level,/);
  }, 30_000);

  it('prints the stations as CSV between nodes named by name or id', async () => {
    const run = await headroute('profile', file, '--from', 'Storage tank T-101', '--to', 'V2');
    expect(run.code).toBe(0);
    const lines = run.stdout.split('\n');
    expect(lines.some((l) => l.startsWith('# Screening result'))).toBe(true);
    const header = lines.find((l) => !l.startsWith('#'))!;
    expect(header).toMatch(
      /^chainage \(m\),element,at,elevation \(m\),HGL \(m\),EGL \(m\),vapour line \(m\)/,
    );
    const rows = lines.filter((l) => /^[\d.]+,/.test(l));
    expect(rows[0]).toMatch(/^0,Storage tank T-101,level,/);
    expect(rows[rows.length - 1]).toMatch(/^104\.5,Receiver V-201 \(vented\),level,/);
  }, 30_000);

  it('prints JSON stations in order of chainage with findings and the caution', async () => {
    const run = await headroute(
      'profile',
      file,
      '--from',
      'V1',
      '--to',
      'V2',
      '--format',
      'json',
      '--segments',
      '4',
    );
    expect(run.code).toBe(0);
    const r = JSON.parse(run.stdout);
    expect(r.caution).toContain(CAUTION);
    expect(r.route.followsFlow).toBe(true);
    expect(r.route.nodes[0]).toBe('V1');
    const c = r.stations.map((s: { chainage: number }) => s.chainage);
    for (let i = 1; i < c.length; i++) expect(c[i]).toBeGreaterThanOrEqual(c[i - 1]);
    near(r.route.length, 104.5, 1e-9);
    const pumpIn = r.stations.find(
      (s: { elementId: string; at: string }) => s.elementId === 'P1' && s.at === 'node-in',
    );
    const pumpOut = r.stations.find(
      (s: { elementId: string; at: string }) => s.elementId === 'P1' && s.at === 'node-out',
    );
    near(pumpOut.egl - pumpIn.egl, 22.13);
    near(r.lowestVapourMargin.vapourMargin, 52.95e3);
  }, 30_000);

  it('draws an SVG with the caution, and follows a stored route by name', async () => {
    const run = await headroute('profile', file, '--route', 'T-101 to V-201', '--format', 'svg');
    expect(run.code).toBe(0);
    expect(run.stdout.startsWith('<?xml')).toBe(true);
    expect(run.stdout).toContain('<svg');
    expect(run.stdout).toContain(CAUTION);
  }, 30_000);

  it('notes a route against the flow, and refuses unknown nodes', async () => {
    const [back, unknown, half] = await Promise.all([
      headroute('profile', file, '--from', 'V2', '--to', 'V1', '--format', 'json'),
      headroute('profile', file, '--from', 'Nowhere', '--to', 'V2'),
      headroute('profile', file, '--from', 'V1'),
    ]);
    expect(back.code).toBe(0);
    expect(back.stderr).toMatch(/note: No route follows the flow/);
    expect(JSON.parse(back.stdout).route.followsFlow).toBe(false);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toMatch(/no node “Nowhere”/);
    expect(half.code).toBe(2);
  }, 60_000);
});

describe('solve text: tables in route order, fitting types in words', () => {
  it('demo 1: pipes L1 … L12 in flow order, fittings as words', async () => {
    const run = await headroute('solve', `${EXAMPLES}/pump-over-rack.headroute.json`);
    expect(run.code).toBe(0);
    const text = run.stdout;
    // Along the route: suction pipes before the rack run, the rack run before the receiver.
    const at = (name: string) => text.indexOf(name);
    expect(at('HV-101')).toBeGreaterThan(-1);
    expect(at('HV-101')).toBeLessThan(at('Strainer Y-101'));
    expect(at('Strainer Y-101')).toBeLessThan(at('NRV-101'));
    expect(at('Riser top elbow')).toBeLessThan(at('Rack drop elbow'));
    expect(text).toContain('gate valve');
    expect(text).not.toMatch(/\bgate-valve\b/);
  }, 30_000);

  it('JSON keeps the file kinds and ids (an interface), rows in route order', async () => {
    const json = await solveJson('pump-over-rack.headroute.json');
    const ids = json.pipes.map((p: { id: string }) => p.id);
    expect(ids.slice(0, 3)).toEqual(['L1', 'L2', 'L3']);
    expect(ids.indexOf('L10')).toBeLessThan(ids.indexOf('L7'));
    expect(json.fittings.find((f: { id: string }) => f.id === 'F1').fittingType).toBe('gate-valve');
  }, 30_000);
});
