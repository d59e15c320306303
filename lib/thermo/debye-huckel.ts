import { avogadroPerMol, boltzmannJPerK, elementaryChargeC, vacuumPermittivityFPerM } from "./physical-constants";
import { waterDensityKgPerM3 } from "./water-density";
import { waterRelativePermittivity } from "./water-permittivity";

/**
 * Debye–Hückel parameters of water at 1 bar (Debye & Hückel 1923; in the form of Helgeson & Kirkham
 * 1974, Am. J. Sci. 274, 1199), for log₁₀ γ = −A z² √I / (1 + B å √I) with I in mol/kg and å in Å:
 *
 *   κ² = 2 N_A e² ρ_w I / (ε₀ ε k T)                    (inverse Debye length, I in mol/kg, ρ_w in kg/m³)
 *   A = e² κ / (8π ε₀ ε k T ln 10 √I)                   kg^½ mol^-½
 *   B = κ / √I                                          kg^½ mol^-½ m⁻¹, reported per Å (×10⁻¹⁰)
 *
 * With CODATA 2018 constants and ρ in g/cm³ these are A = 1.82483·10⁶ ρ^½ / (εT)^{3/2} and
 * B = 50.2916 ρ^½ / (εT)^½, matching Helgeson & Kirkham's 1.824829238·10⁶ and 50.29158649
 * (test `debye-huckel.test.ts`). ρ and ε come from `water-density.ts` and `water-permittivity.ts`.
 */
export type DebyeHuckelParameters = {
  /** A_γ, kg^½ mol^-½ (decadic). */
  aKgHalfPerMolHalf: number;
  /** B_γ, kg^½ mol^-½ Å⁻¹. */
  bKgHalfPerMolHalfPerAngstrom: number;
};

const metresPerAngstrom = 1e-10;
const kgPerM3PerGPerCm3 = 1000;

/**
 * Prefactors such that A = aPrefactor · ρ^½ / (εT)^{3/2} and B = bPrefactor · ρ^½ / (εT)^½, ρ in g/cm³,
 * computed from the fundamental constants (not typed in), so that they can be checked against
 * Helgeson & Kirkham 1974.
 */
export const debyeHuckelPrefactors = (() => {
  const e2OverEpsilon0K = (elementaryChargeC * elementaryChargeC) / (vacuumPermittivityFPerM * boltzmannJPerK); // m·K
  const kappaPrefactor = Math.sqrt(2 * avogadroPerMol * kgPerM3PerGPerCm3 * e2OverEpsilon0K); // m⁻¹ per √(ρ/(εT)) with I in mol/kg
  return {
    aPrefactorKgHalfK3HalfPerMolHalf: (e2OverEpsilon0K * kappaPrefactor) / (8 * Math.PI * Math.LN10),
    bPrefactorKgHalfKHalfPerMolHalfPerAngstrom: kappaPrefactor * metresPerAngstrom,
  };
})();

/** A and B of the Debye–Hückel equation for water at 1 bar, 273.15–373.15 K. */
export function debyeHuckelParameters(temperatureK: number): DebyeHuckelParameters {
  const densityGPerCm3 = waterDensityKgPerM3(temperatureK) / kgPerM3PerGPerCm3;
  const epsilonT = waterRelativePermittivity(temperatureK) * temperatureK;
  const p = debyeHuckelPrefactors;
  return {
    aKgHalfPerMolHalf: (p.aPrefactorKgHalfK3HalfPerMolHalf * Math.sqrt(densityGPerCm3)) / epsilonT ** 1.5,
    bKgHalfPerMolHalfPerAngstrom: (p.bPrefactorKgHalfKHalfPerMolHalfPerAngstrom * Math.sqrt(densityGPerCm3)) / Math.sqrt(epsilonT),
  };
}
