import type { HeatCapacity } from "../data/schema";
import { referenceTemperatureK } from "./physical-constants";

type HaasFisherHeatCapacity = Extract<HeatCapacity, { model: "haas-fisher" }>;
type ConstantHeatCapacity = Extract<HeatCapacity, { model: "constant" }>;

/**
 * Heat capacity polynomial of Maier & Kelley (1932, J. Am. Chem. Soc. 54, 3243) extended by Haas &
 * Fisher (1976, Am. J. Sci. 276, 525): Cp = a + bT + cT⁻² + dT^-½, and its closed-form integrals from
 * Tr = 298.15 K to T (K, J, mol):
 *
 *   ∫Cp dT   = a(T − Tr) + (b/2)(T² − Tr²) − c(1/T − 1/Tr) + 2d(√T − √Tr)
 *   ∫Cp/T dT = a ln(T/Tr) + b(T − Tr) − (c/2)(1/T² − 1/Tr²) − 2d(1/√T − 1/√Tr)
 *
 * A constant Cp is the case b = c = d = 0.
 */
export type HeatCapacityIntegrals = {
  /** ∫Tr→T Cp dT, J/mol. */
  enthalpyIncrementJPerMol: number;
  /** ∫Tr→T Cp/T dT, J/(mol·K). */
  entropyIncrementJPerMolK: number;
};

function coefficients(heatCapacity: HaasFisherHeatCapacity | ConstantHeatCapacity) {
  if (heatCapacity.model === "constant") return { a: heatCapacity.cpJPerMolK, b: 0, c: 0, d: 0 };
  return { a: heatCapacity.aJPerMolK, b: heatCapacity.bJPerMolK2, c: heatCapacity.cJKPerMol, d: heatCapacity.dJPerMolK05 };
}

/** Cp(T), J/(mol·K). */
export function polynomialHeatCapacityJPerMolK(heatCapacity: HaasFisherHeatCapacity | ConstantHeatCapacity, temperatureK: number): number {
  const { a, b, c, d } = coefficients(heatCapacity);
  return a + b * temperatureK + c / temperatureK ** 2 + d / Math.sqrt(temperatureK);
}

export function polynomialHeatCapacityIntegrals(heatCapacity: HaasFisherHeatCapacity | ConstantHeatCapacity, temperatureK: number): HeatCapacityIntegrals {
  const { a, b, c, d } = coefficients(heatCapacity);
  const t = temperatureK;
  const tr = referenceTemperatureK;
  return {
    enthalpyIncrementJPerMol: a * (t - tr) + (b / 2) * (t * t - tr * tr) - c * (1 / t - 1 / tr) + 2 * d * (Math.sqrt(t) - Math.sqrt(tr)),
    entropyIncrementJPerMolK: a * Math.log(t / tr) + b * (t - tr) - (c / 2) * (1 / (t * t) - 1 / (tr * tr)) - 2 * d * (1 / Math.sqrt(t) - 1 / Math.sqrt(tr)),
  };
}
