/**
 * `headroute surge` through `main` with a captured output: the JSON keys of the fixed
 * interface, the other formats, and command-line errors.
 */
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main';

const DEMO = 'static/examples/pump-trip-over-rack.headroute.json';

async function run(...args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { out: (s) => void (stdout += s), err: (s) => void (stderr += s) });
  return { code, stdout, stderr };
}

describe('headroute surge', () => {
  it('--trip --format json has the keys of the interface, SI', async () => {
    const r = await run('surge', DEMO, '--trip', 'P1', '--duration', '3', '--format', 'json');
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.event).toMatchObject({ kind: 'trip', pump: 'P1' });
    expect(j.units).toBe('SI');
    for (const p of j.pipes)
      expect(Object.keys(p)).toEqual(
        expect.arrayContaining(['id', 'waveSpeed', 'velocity', 'length']),
      );
    expect(Object.keys(j.joukowsky)).toEqual(expect.arrayContaining(['headRise', 'criticalTime']));
    for (const e of j.envelope)
      expect(Object.keys(e)).toEqual(
        expect.arrayContaining(['chainage', 'elevation', 'hglSteady', 'hglMax', 'hglMin']),
      );
    expect(j.cavities.length).toBeGreaterThan(0);
    for (const c of j.cavities)
      expect(Object.keys(c)).toEqual(expect.arrayContaining(['chainage', 'maxVolume', 'duration']));
    expect(j.findings.map((f: { code: string }) => f.code)).toContain('surge-column-separation');
    expect(j.pipes.map((p: { id: string }) => p.id)).toEqual([
      'L1',
      'L2',
      'L3',
      'L4',
      'L5',
      'L6',
      'L7',
      'L8',
    ]);
  }, 60_000);

  it('--close with --route and --law, text, csv and svg', async () => {
    const text = await run(
      'surge',
      DEMO,
      '--close',
      'HV-402',
      '--time',
      '0.2',
      '--law',
      'linear',
      '--route',
      'R1',
      '--duration',
      '1',
    );
    expect(text.code).toBe(0);
    expect(text.stdout).toMatch(/Joukowsky a·Δv\/g/);
    expect(text.stdout).toMatch(/Screening result/);
    const csv = await run(
      'surge',
      DEMO,
      '--close',
      'F3',
      '--time',
      '0.2',
      '--duration',
      '1',
      '--format',
      'csv',
    );
    expect(csv.stdout.split('\n')[2]).toMatch(/^chainage \(m\),elevation \(m\),HGL steady/);
    const svg = await run(
      'surge',
      DEMO,
      '--close',
      'F3',
      '--time',
      '0.2',
      '--duration',
      '1',
      '--format',
      'svg',
    );
    expect(svg.stdout.startsWith('<svg')).toBe(true);
    expect(svg.stdout).toMatch(/max HGL/);
  }, 60_000);

  it('refuses a bad command line with exit 2, and a run it cannot make with exit 1', async () => {
    expect((await run('surge', DEMO, '--format', 'json')).code).toBe(2);
    expect((await run('surge', DEMO, '--close', 'F3', '--format', 'json')).code).toBe(2);
    expect((await run('surge', DEMO, '--trip', 'P1', '--time', '1')).code).toBe(2);
    expect((await run('surge', DEMO, '--trip', 'NOPE')).code).toBe(2);
    const bad = await run('surge', DEMO, '--close', 'W1', '--time', '1', '--format', 'json');
    expect(bad.code).toBe(1);
    const j = JSON.parse(bad.stdout);
    expect(j.ok).toBe(false);
    expect(j.findings[0]).toMatchObject({ code: 'surge-cannot-run', level: 'stop' });
  }, 60_000);
});
