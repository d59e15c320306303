import type { HeatCapacity } from "../data/schema";
import { bornXPerK2, bornYPerK } from "./born-functions";
import { joulesPerCalorie, referenceTemperatureK } from "./physical-constants";
import { waterRelativePermittivity } from "./water-permittivity";

type HkfHeatCapacity = Extract<HeatCapacity, { model: "hkf-1bar" }>;

/**
 * Revised HKF equations of state for aqueous species (Tanger & Helgeson 1988, Am. J. Sci. 288, 19;
 * Shock & Helgeson 1988, Geochim. Cosmochim. Acta 52, 2009; Shock et al. 1992, J. Chem. Soc. Faraday
 * Trans. 88, 803) at P = Pr = 1 bar. There the a₁–a₄ (pressure) terms vanish, and below 100 °C the
 * solvent g-function is zero, so ω is constant. With Θ = 228 K, Tr = 298.15 K, Y and X the Born
 * functions, ε the permittivity of water (subscript r: at Tr):
 *
 *   Cp = c₁ + c₂/(T − Θ)² + ωTX
 *   H − ΔfH° = c₁(T − Tr) − c₂[1/(T − Θ) − 1/(Tr − Θ)] + ω(1/ε − 1) + ωTY − ω(1/εr − 1) − ωTrYr
 *   S − S°   = c₁ ln(T/Tr) − (c₂/Θ){[1/(T − Θ) − 1/(Tr − Θ)] + (1/Θ) ln[Tr(T − Θ)/(T(Tr − Θ))]} + ωY − ωYr
 *   G − ΔfG° = −S°(T − Tr) − c₁[T ln(T/Tr) − T + Tr]
 *              − c₂{[1/(T − Θ) − 1/(Tr − Θ)](Θ − T)/Θ − (T/Θ²) ln[Tr(T − Θ)/(T(Tr − Θ))]}
 *              + ω(1/ε − 1) − ω(1/εr − 1) + ωYr(T − Tr)
 *
 * c₁ (cal/(mol·K)), c₂ (cal·K/mol) and ω (cal/mol) are converted with the thermochemical calorie.
 * ε, Y and X come from IAPWS R8-97 (this project's permittivity) at every T including Tr, rather than
 * the Johnson & Norton (1991) permittivity the HKF authors used (εr = 78.47 vs 78.41 here). Only the
 * temperature variation of the Born term enters G(T) − G(Tr), and using one permittivity throughout
 * keeps G, H, S and Cp mutually consistent; the log Kw check in the tests bounds the effect.
 */
export const hkfSolventTemperatureK = 228; // Θ, K (Helgeson, Kirkham & Flowers 1981)

export type HkfIncrements = {
  heatCapacityJPerMolK: number;
  /** H(T) − ΔfH°, J/mol. */
  enthalpyIncrementJPerMol: number;
  /** S(T) − S°, J/(mol·K). */
  entropyIncrementJPerMolK: number;
  /** G(T) − ΔfG° + S°(T − Tr), J/mol: the part that does not depend on S°. */
  gibbsIncrementJPerMol: number;
};

/** HKF increments from Tr to T at 1 bar, 273.15–373.15 K, in J. */
export function hkfIncrements(heatCapacity: HkfHeatCapacity, temperatureK: number): HkfIncrements {
  const c1 = heatCapacity.c1CalPerMolK * joulesPerCalorie;
  const c2 = heatCapacity.c2CalKPerMol * joulesPerCalorie;
  const omega = heatCapacity.omegaCalPerMol * joulesPerCalorie;
  const theta = hkfSolventTemperatureK;
  const t = temperatureK;
  const tr = referenceTemperatureK;

  const epsilon = waterRelativePermittivity(t);
  const epsilonR = waterRelativePermittivity(tr);
  const y = bornYPerK(t);
  const yR = bornYPerK(tr);
  const x = bornXPerK2(t);

  const inverseDifference = 1 / (t - theta) - 1 / (tr - theta);
  const logTerm = Math.log((tr * (t - theta)) / (t * (tr - theta)));
  const bornGibbs = omega * (1 / epsilon - 1) - omega * (1 / epsilonR - 1);

  return {
    heatCapacityJPerMolK: c1 + c2 / (t - theta) ** 2 + omega * t * x,
    enthalpyIncrementJPerMol: c1 * (t - tr) - c2 * inverseDifference + bornGibbs + omega * t * y - omega * tr * yR,
    entropyIncrementJPerMolK: c1 * Math.log(t / tr) - (c2 / theta) * (inverseDifference + logTerm / theta) + omega * y - omega * yR,
    gibbsIncrementJPerMol:
      -c1 * (t * Math.log(t / tr) - t + tr) - c2 * (inverseDifference * ((theta - t) / theta) - (t / theta ** 2) * logTerm) + bornGibbs + omega * yR * (t - tr),
  };
}
