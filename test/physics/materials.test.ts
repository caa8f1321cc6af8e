import { describe, expect, it } from 'vitest';
import {
  DEFAULT_MATERIAL,
  findPipeMaterial,
  PIPE_MATERIALS,
} from '../../src/lib/physics/materials';

const FOOT = 0.3048; // m, exact (international foot)

describe('PIPE_MATERIALS', () => {
  it('has the keys the contract names and a default that exists', () => {
    expect(PIPE_MATERIALS['carbon-steel']).toBeDefined();
    expect(PIPE_MATERIALS['stainless-steel']).toBeDefined();
    expect(DEFAULT_MATERIAL).toBe('carbon-steel');
    expect(findPipeMaterial(DEFAULT_MATERIAL)).toBe(PIPE_MATERIALS['carbon-steel']);
  });

  it('gives every material a positive roughness below 10 mm, a name and a source', () => {
    for (const material of Object.values(PIPE_MATERIALS)) {
      expect(material.roughness).toBeGreaterThan(0);
      expect(material.roughness).toBeLessThan(0.01);
      expect(material.name.length).toBeGreaterThan(0);
      expect(material.source.length).toBeGreaterThan(10);
    }
  });

  // Moody (1944), Trans. ASME 66, Fig. 1, roughness in feet (from memory), within the
  // rounding handbooks use when quoting them in millimetres (3 %).
  it.each([
    ['carbon-steel', 0.00015],
    ['galvanised-steel', 0.0005],
    ['cast-iron', 0.00085],
    ['asphalted-cast-iron', 0.0004],
    ['drawn-tubing', 0.000005],
  ])('%s matches the Moody (1944) chart table value %f ft (from memory)', (key, feet) => {
    const roughness = PIPE_MATERIALS[key].roughness;
    expect(Math.abs(roughness - feet * FOOT) / (feet * FOOT)).toBeLessThan(0.03);
  });

  it('returns undefined for unknown keys, including object prototype names', () => {
    expect(findPipeMaterial('unobtainium')).toBeUndefined();
    expect(findPipeMaterial('toString')).toBeUndefined();
    expect(findPipeMaterial('__proto__')).toBeUndefined();
  });
});
