/**
 * Dynamic viscosity of water, IAPWS 2008 formulation.
 *
 * Source: IAPWS R12-08, "Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary
 * Water Substance", and Huber et al., J. Phys. Chem. Ref. Data 38 (2009) 101–125: the
 * dilute-gas term μ0 (Eq. 11, coefficients of Table 1) and the residual term μ1 (Eq. 12,
 * coefficients of Table 2). The coefficients were typed from memory and checked digit for
 * digit against iapws 1.5.2 (`_iapws._Viscosity`); the verification values of Table 4 of the
 * release are checked in test/physics/water/viscosity.test.ts.
 *
 * The critical enhancement μ2 (Eqs. 14–21) is taken as 1. It matters only in a small region
 * around the critical point (roughly 645.91 K < T < 650.77 K and 245.8 kg/m³ < ρ < 405.3
 * kg/m³ — from memory), far from the liquid states (0.01–200 °C, ρ > 860 kg/m³) this module
 * serves: there iapws 1.5.2's IAPWS95 class, which includes μ2, differs from μ2 = 1 by less
 * than 1e-9 relative (test/fixtures/iapws-water.json). Table 4 of the release is reproduced
 * to all printed digits with μ2 = 1.
 */

/** Reference temperature T* = Tc, K (IAPWS R12-08, Eq. 3). */
const T_STAR = 647.096;
/** Reference density ρ* = ρc, kg/m³ (IAPWS R12-08, Eq. 4). */
const RHO_STAR = 322.0;
/** Reference viscosity μ* = 1.00×10⁻⁶ Pa·s (IAPWS R12-08, Eq. 6). */
const MU_STAR = 1.0e-6;

/**
 * Temperature guards, K, for evaluating the formulation. The release covers 253.15 K (for
 * metastable liquid) to 1173.15 K; outside these guards the value at the guard is returned so
 * results stay finite (below about 150 K the μ0 denominator changes sign).
 */
export const VISCOSITY_GUARD_TEMPERATURE = { min: 243.15, max: 1173.15 } as const;

// IAPWS R12-08, Table 1: H0…H3 of Eq. 11 (from memory; matched against iapws 1.5.2).
const H0 = [1.67752, 2.20462, 0.6366564, -0.241605];

// IAPWS R12-08, Table 2: the 21 non-zero H_ij of Eq. 12, as (i, j, H_ij) (from memory;
// matched against iapws 1.5.2).
const H1: ReadonlyArray<readonly [number, number, number]> = [
  [0, 0, 5.20094e-1],
  [1, 0, 8.50895e-2],
  [2, 0, -1.08374],
  [3, 0, -2.89555e-1],
  [0, 1, 2.22531e-1],
  [1, 1, 9.99115e-1],
  [2, 1, 1.88797],
  [3, 1, 1.26613],
  [5, 1, 1.20573e-1],
  [0, 2, -2.81378e-1],
  [1, 2, -9.06851e-1],
  [2, 2, -7.72479e-1],
  [3, 2, -4.89837e-1],
  [4, 2, -2.5704e-1],
  [0, 3, 1.61913e-1],
  [1, 3, 2.57399e-1],
  [0, 4, -3.25372e-2],
  [3, 4, 6.98452e-2],
  [4, 5, 8.72102e-3],
  [3, 6, -4.35673e-3],
  [5, 6, -5.93264e-4],
];

/**
 * Dynamic viscosity of water, Pa·s, at temperature `temperature` in K and density `density`
 * in kg/m³: μ = μ*·μ0(T̄)·μ1(T̄, ρ̄) (IAPWS R12-08, Eq. 10 with μ2 = 1).
 *
 * Pressure enters only through the density, as in the release. Inputs are kept finite rather
 * than rejected: T is held within {@link VISCOSITY_GUARD_TEMPERATURE} and a negative density is
 * taken as 0 (the dilute-gas limit). NaN inputs give NaN.
 */
export function waterViscosity(temperature: number, density: number): number {
  const T = Math.min(
    Math.max(temperature, VISCOSITY_GUARD_TEMPERATURE.min),
    VISCOSITY_GUARD_TEMPERATURE.max,
  );
  const Tbar = T / T_STAR;
  const rhoBar = Math.max(density, 0) / RHO_STAR;

  // Eq. 11: μ0 = 100·√T̄ / Σ Hi/T̄^i.
  let denominator = 0;
  for (let i = 0; i < H0.length; i++) denominator += H0[i] / Tbar ** i;
  const mu0 = (100 * Math.sqrt(Tbar)) / denominator;

  // Eq. 12: μ1 = exp(ρ̄ Σ Σ Hij (1/T̄ − 1)^i (ρ̄ − 1)^j).
  const x = 1 / Tbar - 1;
  const y = rhoBar - 1;
  let sum = 0;
  for (const [i, j, h] of H1) sum += h * x ** i * y ** j;
  const mu1 = Math.exp(rhoBar * sum);

  return MU_STAR * mu0 * mu1;
}
