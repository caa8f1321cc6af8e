import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { EXAMPLES, exampleUrl, loadExample } from '../../src/lib/model/examples';
import { CURRENT_VERSION, parseProjectFile, serializeProject } from '../../src/lib/model/file';
import { portElevation } from '../../src/lib/model/ports';
import type { HeadrouteDocument, Pump } from '../../src/lib/model/types';

const staticDir = fileURLToPath(new URL('../../static', import.meta.url));
const fromDisk = async (url: string) => readFileSync(`${staticDir}${url}`, 'utf8');

async function load(file: string): Promise<HeadrouteDocument> {
  const example = EXAMPLES.find((e) => e.file === file)!;
  const result = await loadExample(example, fromDisk);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.document;
}

describe('demo projects', () => {
  it('the list names exactly the files in static/examples', () => {
    const files = readdirSync(`${staticDir}/examples`).filter((f) => f.endsWith('.headroute.json'));
    expect(EXAMPLES.map((e) => e.file).sort()).toEqual(files.sort());
    expect(exampleUrl(EXAMPLES[0], '/app')).toBe('/app/examples/pump-over-rack.headroute.json');
  });

  it.each(EXAMPLES.map((e) => e.file))('%s loads through the validated file path', async (file) => {
    const text = await fromDisk(`/examples/${file}`);
    const direct = parseProjectFile(text);
    expect(direct.ok).toBe(true);
    const doc = await load(file);
    if (direct.ok) expect(doc).toEqual(direct.document);
    expect(doc.version).toBe(CURRENT_VERSION);
    // Written as this app writes files (a save round-trips to the same text).
    expect(serializeProject(doc)).toBe(text);
    // Every node is connected and every stored route names existing nodes.
    const connected = new Set(Object.values(doc.pipes).flatMap((p) => [p.from.node, p.to.node]));
    expect([...connected].sort()).toEqual(Object.keys(doc.nodes).sort());
  });

  it('pump-over-rack has the scenario it describes', async () => {
    const doc = await load('pump-over-rack.headroute.json');
    expect(doc.settings.temperature).toBeCloseTo(333.15, 9);
    const kinds = Object.values(doc.nodes).map((n) =>
      n.kind === 'fitting' ? n.fittingType : n.kind,
    );
    for (const k of [
      'strainer',
      'gate-valve',
      'swing-check-valve',
      'elbow-90-standard',
      'control-valve',
      'waypoint',
      'pump',
    ]) {
      expect(kinds).toContain(k);
    }
    // The road crossing on the rack is the high point; FV-101 throttles at the pump, upstream
    // of it, and the receiver is vented, so nothing holds the rack above atmospheric pressure.
    expect(doc.nodes.W1.z).toBeCloseTo(14, 9);
    const receiver = doc.nodes.V2;
    expect(receiver.kind === 'vessel' && receiver.open).toBe(true);
    expect(doc.routes.R1.nodes.indexOf('CV1')).toBeLessThan(doc.routes.R1.nodes.indexOf('W1'));
    expect(doc.nodes.CV1.kind === 'control-valve' && doc.nodes.CV1.opening).toBeCloseTo(0.68, 9);
    expect(Object.values(doc.cases).map((c) => c.name)).toEqual([
      'Low tank level',
      'Hot day 80 °C',
    ]);
    expect(doc.routes.R1.nodes[0]).toBe('V1');
    expect(doc.routes.R1.nodes.at(-1)).toBe('V2');
    // Suction one size bigger than the discharge.
    expect(doc.pipes.L1.bore).toMatchObject({ nominalSize: '4' });
    expect(doc.pipes.L4.bore).toMatchObject({ nominalSize: '3' });
  });

  it('siphon-over-bund rises over the crest and ends lower than it starts', async () => {
    const doc = await load('siphon-over-bund.headroute.json');
    const pond = doc.nodes.V1;
    const basin = doc.nodes.V2;
    if (pond.kind !== 'vessel' || basin.kind !== 'vessel') throw new Error('vessels expected');
    expect(pond.liquidLevel - basin.liquidLevel).toBeCloseTo(4, 9);
    expect(doc.nodes.W1.z).toBeCloseTo(5, 9);
    expect(Object.values(doc.pipes).every((p) => p.material === 'plastic')).toBe(true);
    expect(Object.values(doc.nodes).some((n) => n.kind === 'pump')).toBe(false);
    expect(portElevation(doc, { node: 'V1', port: 'N1' })).toBeLessThan(pond.liquidLevel);
  });

  it('branched-with-recirculation: one pump, a junction with three legs, an orifice return', async () => {
    const doc = await load('branched-with-recirculation.headroute.json');
    const pumps = Object.values(doc.nodes).filter((n): n is Pump => n.kind === 'pump');
    expect(pumps).toHaveLength(1);
    const legs = Object.values(doc.pipes).filter((p) => p.from.node === 'J1' || p.to.node === 'J1');
    expect(legs).toHaveLength(4); // one in, three out
    const orifice = doc.nodes.F12;
    expect(orifice.kind === 'fitting' && orifice.fittingType).toBe('restriction-orifice');
    expect(orifice.kind === 'fitting' && orifice.boreDiameter).toBeCloseTo(0.012, 9);
    const returnPipe = Object.values(doc.pipes).find((p) => p.to.node === 'V1');
    expect(returnPipe?.to.port).toBe('N2');
  });

  it('a failed fetch is a message, not a throw', async () => {
    const result = await loadExample(EXAMPLES[0], async () => {
      throw new Error('HTTP 404');
    });
    expect(result).toEqual({
      ok: false,
      errors: [
        {
          path: '$',
          message: 'The demo project "Pump over a pipe rack" could not be loaded (HTTP 404).',
        },
      ],
    });
  });
});
