/**
 * The wave speed of each pipe: the Korteweg form (physics/transient) from the liquid's bulk
 * modulus and the pipe's bore, catalogue wall and material; a rigid pipe's √(K/ρ) where the
 * wall or its material is not known (a typed bore), which is the highest speed the liquid
 * allows, so the Joukowsky rise is not under-estimated.
 */
import type { Pipe } from '../../model/types';
import { catalogueEntry, catalogueInnerDiameter } from '../../physics/pipeCatalogue';
import {
  findWallElasticity,
  kortewegWaveSpeed,
  rigidPipeWaveSpeed,
  type PipeRestraint,
} from '../../physics/transient';

/** A pipe's wave speed and how it was found. */
export interface PipeWaveSpeed {
  /** m/s */
  value: number;
  /** 'korteweg' from the wall; 'rigid' when the wall or its material is not known. */
  method: 'korteweg' | 'rigid';
  source: string;
}

/** The catalogue wall thickness of a catalogue-bore pipe, m; undefined otherwise. */
export function catalogueWallThickness(pipe: Pipe): number | undefined {
  if (pipe.bore.mode !== 'catalogue') return undefined;
  const { nominalSize, schedule } = pipe.bore;
  const inner = catalogueInnerDiameter(nominalSize, schedule);
  if (inner === undefined) return undefined;
  return catalogueEntry(nominalSize)?.walls.find((w) => w.innerDiameter === inner)?.wallThickness;
}

/** Wave speed of `pipe` with inner diameter `diameter` (m), liquid K (Pa) and ρ (kg/m³). */
export function pipeWaveSpeed(
  pipe: Pipe,
  diameter: number,
  bulkModulus: number,
  density: number,
  restraint: PipeRestraint,
): PipeWaveSpeed {
  const wall = catalogueWallThickness(pipe);
  const elasticity = findWallElasticity(pipe.material);
  if (wall !== undefined && elasticity) {
    const value = kortewegWaveSpeed({
      bulkModulus,
      density,
      diameter,
      wall,
      youngsModulus: elasticity.youngsModulus,
      poisson: elasticity.poissonRatio,
      restraint,
    });
    if (Number.isFinite(value)) {
      return {
        value,
        method: 'korteweg',
        source: `Korteweg form (Wylie & Streeter 1993, §2.3), wall ${(wall * 1000).toFixed(2)} mm, ${restraint}; ${elasticity.source}`,
      };
    }
  }
  const why =
    wall === undefined ? 'the pipe has no catalogue wall' : 'its material has no wall modulus';
  return {
    value: rigidPipeWaveSpeed(bulkModulus, density),
    method: 'rigid',
    source: `rigid pipe √(K/ρ): ${why}`,
  };
}
