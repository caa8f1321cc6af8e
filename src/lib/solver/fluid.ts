/**
 * The liquid and site state a solve uses: liquid properties at the project temperature and
 * the site's atmospheric pressure, after a case has been applied.
 */
import type { ProjectSettings } from '../model/types';
import { siteAtmosphericPressure } from '../physics/atmosphere';
import { liquidProperties } from '../physics/liquids';
import type { FluidState } from './types';

/** Fluid state plus what the findings need to know about it. */
export interface SolveFluid extends FluidState {
  criticalPressure: number | null;
  extrapolated: string[];
  /** True when every property is a finite positive number (vapour pressure may be 0). */
  usable: boolean;
}

/** Liquid properties (physics liquids) at the project temperature and p_atm (physics atmosphere). */
export function solveFluid(settings: ProjectSettings): SolveFluid {
  const liquid = liquidProperties(settings.liquid, settings.temperature);
  const atmosphericPressure = siteAtmosphericPressure(settings);
  const usable =
    liquid.density > 0 &&
    Number.isFinite(liquid.density) &&
    liquid.viscosity > 0 &&
    Number.isFinite(liquid.viscosity) &&
    liquid.vapourPressure >= 0 &&
    Number.isFinite(liquid.vapourPressure) &&
    Number.isFinite(settings.temperature);
  return {
    density: usable ? liquid.density : 1000,
    viscosity: usable ? liquid.viscosity : 1e-3,
    vapourPressure: usable ? liquid.vapourPressure : 0,
    atmosphericPressure,
    temperature: Number.isFinite(settings.temperature) ? settings.temperature : 293.15,
    liquidName: liquid.name,
    criticalPressure: liquid.criticalPressure,
    extrapolated: liquid.extrapolated,
    usable,
  };
}
