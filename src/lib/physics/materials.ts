/**
 * Absolute roughness of pipe materials for the Colebrook–White equation.
 *
 * Values are for new, clean pipe. Most come from the table on Moody's chart (L. F. Moody,
 * "Friction factors for pipe flow", Trans. ASME 66 (1944) 671–684, Fig. 1), which gives them
 * in feet; they are converted here at 1 ft = 0.3048 m and rounded as handbooks usually quote
 * them. All were typed from memory of that table and of common handbook practice, as each
 * entry's `source` says; check against your own reference for design work.
 */

/** A pipe material and its absolute roughness. */
export interface PipeMaterial {
  /** Name shown to the user. */
  name: string;
  /** Absolute (equivalent sand-grain) roughness ε, m. */
  roughness: number;
  /** Where the roughness value comes from. */
  source: string;
}

const MM = 1e-3;

/** Pipe materials by key. Keys are stable: they are stored in project files. */
export const PIPE_MATERIALS: Record<string, PipeMaterial> = {
  'carbon-steel': {
    name: 'Carbon steel, commercial (new)',
    roughness: 0.045 * MM,
    source:
      'Moody (1944) Fig. 1, "commercial steel or wrought iron" 0.00015 ft = 0.046 mm; 0.045 mm as commonly quoted — from memory',
  },
  'stainless-steel': {
    name: 'Stainless steel, commercial pipe',
    roughness: 0.015 * MM,
    source:
      'Common practice for commercial stainless pipe (between Moody\'s "drawn tubing" 0.0015 mm and commercial steel 0.045 mm) — from memory',
  },
  'galvanised-steel': {
    name: 'Galvanised steel',
    roughness: 0.15 * MM,
    source: 'Moody (1944) Fig. 1, "galvanized iron" 0.0005 ft = 0.15 mm — from memory',
  },
  'cast-iron': {
    name: 'Cast iron, uncoated',
    roughness: 0.26 * MM,
    source: 'Moody (1944) Fig. 1, "cast iron" 0.00085 ft = 0.26 mm — from memory',
  },
  'asphalted-cast-iron': {
    name: 'Cast iron, asphalt dipped',
    roughness: 0.12 * MM,
    source: 'Moody (1944) Fig. 1, "asphalted cast iron" 0.0004 ft = 0.12 mm — from memory',
  },
  'drawn-tubing': {
    name: 'Drawn tubing (copper, brass, glass)',
    roughness: 0.0015 * MM,
    source: 'Moody (1944) Fig. 1, "drawn tubing" 0.000005 ft = 0.0015 mm — from memory',
  },
  plastic: {
    name: 'Plastic (PVC, PE, PP)',
    roughness: 0.0015 * MM,
    source: 'Common practice: hydraulically smooth, taken as drawn tubing 0.0015 mm — from memory',
  },
  concrete: {
    name: 'Concrete',
    roughness: 1.0 * MM,
    source:
      'Moody (1944) Fig. 1, "concrete" 0.001–0.01 ft = 0.3–3 mm; 1.0 mm chosen within the range — from memory',
  },
  'riveted-steel': {
    name: 'Riveted steel',
    roughness: 3.0 * MM,
    source:
      'Moody (1944) Fig. 1, "riveted steel" 0.003–0.03 ft = 0.9–9 mm; 3 mm chosen within the range — from memory',
  },
};

/** Material key used for new pipes. */
export const DEFAULT_MATERIAL = 'carbon-steel';

/** The material with this key, or undefined when the key is unknown. */
export function findPipeMaterial(key: string): PipeMaterial | undefined {
  return Object.hasOwn(PIPE_MATERIALS, key) ? PIPE_MATERIALS[key] : undefined;
}
