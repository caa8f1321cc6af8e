/**
 * Young's modulus and Poisson's ratio of pipe materials, keyed like the roughness table
 * (physics/materials.ts). Values from memory of the table of pipe-wall properties in Wylie &
 * Streeter, Fluid Transients in Systems (1993), Table 2.1, and common handbook values; where
 * the table gives a range, the value picked is named. Check for design work.
 */

/** Wall elasticity of one material. */
export interface WallElasticity {
  /** Young's modulus E, Pa. */
  youngsModulus: number;
  /** Poisson's ratio μ. */
  poissonRatio: number;
  /** Where the values come from. */
  source: string;
}

const GPA = 1e9;

/** Wall elasticity by material key (keys of PIPE_MATERIALS). */
export const WALL_ELASTICITY: Readonly<Record<string, WallElasticity>> = {
  'carbon-steel': {
    youngsModulus: 207 * GPA,
    poissonRatio: 0.3,
    source: 'steel E = 207 GPa, μ = 0.30 (Wylie & Streeter 1993, Table 2.1) — from memory',
  },
  'stainless-steel': {
    youngsModulus: 193 * GPA,
    poissonRatio: 0.3,
    source: 'austenitic stainless E = 193 GPa, μ = 0.30, common handbook value — from memory',
  },
  'galvanised-steel': {
    youngsModulus: 207 * GPA,
    poissonRatio: 0.3,
    source: 'steel E = 207 GPa, μ = 0.30 (Wylie & Streeter 1993, Table 2.1) — from memory',
  },
  'riveted-steel': {
    youngsModulus: 207 * GPA,
    poissonRatio: 0.3,
    source: 'steel E = 207 GPa, μ = 0.30 (Wylie & Streeter 1993, Table 2.1) — from memory',
  },
  'cast-iron': {
    youngsModulus: 100 * GPA,
    poissonRatio: 0.25,
    source:
      'cast iron E = 80–170 GPa, 100 GPa taken; μ = 0.25 (Wylie & Streeter 1993, Table 2.1) — from memory',
  },
  'asphalted-cast-iron': {
    youngsModulus: 100 * GPA,
    poissonRatio: 0.25,
    source:
      'cast iron E = 80–170 GPa, 100 GPa taken; μ = 0.25 (Wylie & Streeter 1993, Table 2.1) — from memory',
  },
  'drawn-tubing': {
    youngsModulus: 110 * GPA,
    poissonRatio: 0.34,
    source:
      'copper E = 107–131 GPa, 110 GPa taken; μ = 0.34 (Wylie & Streeter 1993, Table 2.1) — from memory',
  },
  plastic: {
    youngsModulus: 3.0 * GPA,
    poissonRatio: 0.46,
    source:
      'rigid PVC E ≈ 2.4–3.3 GPa, 3.0 GPa taken, μ = 0.46 (Wylie & Streeter 1993, Table 2.1) — from memory; PE (≈ 0.8 GPa) gives a much slower wave',
  },
  concrete: {
    youngsModulus: 25 * GPA,
    poissonRatio: 0.15,
    source:
      'concrete E = 14–30 GPa, 25 GPa taken; μ = 0.15 (Wylie & Streeter 1993, Table 2.1) — from memory',
  },
};

/** The wall elasticity of a material key, or undefined when the key is unknown. */
export function findWallElasticity(material: string): WallElasticity | undefined {
  return Object.hasOwn(WALL_ELASTICITY, material) ? WALL_ELASTICITY[material] : undefined;
}
