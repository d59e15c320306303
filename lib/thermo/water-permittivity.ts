import { requireLiquidWaterTemperature } from "./liquid-water-range";
import { waterDensityAndDerivativeUnchecked } from "./water-density";

/**
 * Static relative permittivity of water, IAPWS R8-97 (Fernández, Goodwin, Lemmon, Levelt Sengers &
 * Williams 1997, J. Phys. Chem. Ref. Data 26, 1125), evaluated on the density of `water-density.ts`:
 *
 *   g = 1 + Σₖ₌₁¹¹ Nₖ δ^iₖ τ^jₖ + N₁₂ δ (T/228 K − 1)^−1.2,   δ = ρ/ρc, τ = Tc/T
 *   A = N_A μ² ρ g / (M ε₀ k T),   B = N_A α ρ / (3 M ε₀)
 *   ε = [1 + A + 5B + √(9 + 2A + 18B + A² + 10AB + 9B²)] / (4 − 4B)
 *
 * The physical constants are those printed in the release (1986 CODATA values of k, N_A, ε₀, as the
 * release's coefficients were fitted with them), not newer CODATA values.
 */
const release = {
  boltzmannJPerK: 1.380658e-23,
  avogadroPerMol: 6.0221367e23,
  vacuumPermittivityFPerM: 8.854187817e-12,
  meanMolecularPolarizabilityC2M2PerJ: 1.636e-40,
  dipoleMomentCM: 6.138e-30,
  molarMassKgPerMol: 0.018015268,
  criticalTemperatureK: 647.096,
  criticalDensityKgPerM3: 322,
  /** Temperature in the N₁₂ term of g, K. */
  divergenceTemperatureK: 228,
  densityExponents: [1, 1, 1, 2, 3, 3, 4, 5, 6, 7, 10],
  temperatureExponents: [0.25, 1, 2.5, 1.5, 1.5, 2.5, 2, 2, 5, 0.5, 10],
  coefficients: [
    0.978224486826, -0.957771379375, 0.237511794148, 0.714692244396, -0.298217036956, -0.108863472196,
    0.949327488264e-1, -0.980469816509e-2, 0.16516763497e-4, 0.937359795772e-4, -0.12317921872e-9,
  ],
  coefficient12: 0.196096504426e-2,
} as const;

/** A-coefficient prefactor N_A μ² / (M ε₀ k), in K·m³/kg, so that A = prefactor · ρ g / T. */
const dipoleTermKM3PerKg =
  (release.avogadroPerMol * release.dipoleMomentCM ** 2) /
  (release.molarMassKgPerMol * release.vacuumPermittivityFPerM * release.boltzmannJPerK);
/** B-coefficient prefactor N_A α / (3 M ε₀), m³/kg, so that B = prefactor · ρ. */
const polarizabilityTermM3PerKg =
  (release.avogadroPerMol * release.meanMolecularPolarizabilityC2M2PerJ) /
  (3 * release.molarMassKgPerMol * release.vacuumPermittivityFPerM);

type PermittivityWithDerivative = { relativePermittivity: number; derivativePerK: number };

/**
 * ε and (∂ε/∂T)_P from density, its temperature derivative and temperature (chain rule through g, A, B).
 * No range checks: internal, also used just outside the range for finite differences.
 */
function permittivityFromDensity(densityKgPerM3: number, densityDerivativeKgPerM3PerK: number, temperatureK: number): PermittivityWithDerivative {
  const r = release;
  const delta = densityKgPerM3 / r.criticalDensityKgPerM3;
  const deltaDerivativePerK = densityDerivativeKgPerM3PerK / r.criticalDensityKgPerM3;
  const tau = r.criticalTemperatureK / temperatureK;
  const tauDerivativePerK = -r.criticalTemperatureK / temperatureK ** 2;

  let g = 1;
  let gDerivativePerK = 0;
  for (let k = 0; k < r.coefficients.length; k++) {
    const i = r.densityExponents[k];
    const j = r.temperatureExponents[k];
    const n = r.coefficients[k];
    g += n * delta ** i * tau ** j;
    gDerivativePerK += n * (i * delta ** (i - 1) * deltaDerivativePerK * tau ** j + delta ** i * j * tau ** (j - 1) * tauDerivativePerK);
  }
  const u = temperatureK / r.divergenceTemperatureK - 1;
  g += r.coefficient12 * delta * u ** -1.2;
  gDerivativePerK += r.coefficient12 * (deltaDerivativePerK * u ** -1.2 - (1.2 * delta * u ** -2.2) / r.divergenceTemperatureK);

  const a = (dipoleTermKM3PerKg * densityKgPerM3 * g) / temperatureK;
  const aDerivativePerK =
    dipoleTermKM3PerKg *
    ((densityDerivativeKgPerM3PerK * g) / temperatureK + (densityKgPerM3 * gDerivativePerK) / temperatureK - (densityKgPerM3 * g) / temperatureK ** 2);
  const b = polarizabilityTermM3PerKg * densityKgPerM3;
  const bDerivativePerK = polarizabilityTermM3PerKg * densityDerivativeKgPerM3PerK;

  const root = Math.sqrt(9 + 2 * a + 18 * b + a * a + 10 * a * b + 9 * b * b);
  const numerator = 1 + a + 5 * b + root;
  const denominator = 4 * (1 - b);
  const relativePermittivity = numerator / denominator;
  const dEpsilonDA = (1 + (2 + 2 * a + 10 * b) / (2 * root)) / denominator;
  const dEpsilonDB = (5 + (18 + 10 * a + 18 * b) / (2 * root)) / denominator + (4 * numerator) / denominator ** 2;
  return { relativePermittivity, derivativePerK: dEpsilonDA * aDerivativePerK + dEpsilonDB * bDerivativePerK };
}

/** IAPWS R8-97 ε at a given density (kg/m³) and temperature (K); the release's own form, for checks. */
export function relativePermittivityFromDensity(densityKgPerM3: number, temperatureK: number): number {
  return permittivityFromDensity(densityKgPerM3, 0, temperatureK).relativePermittivity;
}

/** Unchecked ε and dε/dT at 1 bar (used by finite differences that step a fraction of a kelvin past the ends). */
function permittivityAtOneBar(temperatureK: number): PermittivityWithDerivative {
  const { densityKgPerM3, derivativeKgPerM3PerK } = waterDensityAndDerivativeUnchecked(temperatureK);
  return permittivityFromDensity(densityKgPerM3, derivativeKgPerM3PerK, temperatureK);
}

/** Static relative permittivity ε of liquid water at 1 bar, 273.15–373.15 K (IAPWS R8-97 on Kell 1975 density). */
export function waterRelativePermittivity(temperatureK: number): number {
  requireLiquidWaterTemperature(temperatureK);
  return permittivityAtOneBar(temperatureK).relativePermittivity;
}

/** (∂ε/∂T) at 1 bar, 1/K: analytic derivative of the IAPWS R8-97 expression along the 1 bar isobar. */
export function waterRelativePermittivityDerivativePerK(temperatureK: number): number {
  requireLiquidWaterTemperature(temperatureK);
  return permittivityAtOneBar(temperatureK).derivativePerK;
}

/** Step of the central difference for the second derivative, K. Truncation error ~ step²·ε⁗/6, negligible here. */
const secondDerivativeStepK = 0.05;

/** (∂²ε/∂T²) at 1 bar, 1/K²: central difference of the analytic first derivative. */
export function waterRelativePermittivitySecondDerivativePerK2(temperatureK: number): number {
  requireLiquidWaterTemperature(temperatureK);
  const above = permittivityAtOneBar(temperatureK + secondDerivativeStepK).derivativePerK;
  const below = permittivityAtOneBar(temperatureK - secondDerivativeStepK).derivativePerK;
  return (above - below) / (2 * secondDerivativeStepK);
}
