import type { HeatCapacity } from "../data/schema";
import { polynomialHeatCapacityIntegrals, polynomialHeatCapacityJPerMolK } from "./haas-fisher-integrals";
import { hkfIncrements } from "./hkf-standard-state";
import { referenceTemperatureK } from "./physical-constants";
import { liquidWaterMaximumTemperatureK, liquidWaterMinimumTemperatureK } from "./liquid-water-range";
import { ThermoInputError, requireInRange } from "./thermo-error";

/**
 * Apparent standard properties at temperature T and 1 bar in the Benson–Helgeson convention
 * (Benson 1968, Thermochemical Kinetics; Helgeson et al. 1978, Am. J. Sci. 278-A):
 *
 *   G(T) = ΔfG°(Tr) − S°(Tr)(T − Tr) + ∫Tr→T Cp dT − T ∫Tr→T Cp/T dT
 *   H(T) = ΔfH°(Tr) + ∫Tr→T Cp dT,      S(T) = S°(Tr) + ∫Tr→T Cp/T dT
 *
 * so that ∂G/∂T = −S, ∂H/∂T = Cp and G − H + TS = ΔfG° − ΔfH° + Tr S° (a constant: the elements'
 * entropy at Tr). Cp models: Haas–Fisher polynomial and constant (closed forms in
 * `haas-fisher-integrals.ts`), revised HKF at 1 bar for aqueous species (`hkf-standard-state.ts`).
 *
 * Temperature ranges: HKF 273.15–373.15 K (the water property range); the polynomial models 200–1000 K
 * (a generous envelope around the project's 0–100 °C; a given fit may be valid over less).
 */
export type StandardStateEntry = {
  standard: { gibbsJPerMol: number; enthalpyJPerMol?: number; entropyJPerMolK: number };
  heatCapacity: HeatCapacity;
};

export const polynomialMinimumTemperatureK = 200;
export const polynomialMaximumTemperatureK = 1000;

function requireTemperatureFor(heatCapacity: HeatCapacity, temperatureK: number): void {
  if (heatCapacity.model === "hkf-1bar") {
    requireInRange("temperatureK", temperatureK, liquidWaterMinimumTemperatureK, liquidWaterMaximumTemperatureK, "K");
  } else {
    requireInRange("temperatureK", temperatureK, polynomialMinimumTemperatureK, polynomialMaximumTemperatureK, "K");
  }
}

type Increments = { enthalpyIncrementJPerMol: number; entropyIncrementJPerMolK: number; gibbsIncrementJPerMol: number };

function increments(heatCapacity: HeatCapacity, temperatureK: number): Increments {
  requireTemperatureFor(heatCapacity, temperatureK);
  if (heatCapacity.model === "hkf-1bar") return hkfIncrements(heatCapacity, temperatureK);
  const integrals = polynomialHeatCapacityIntegrals(heatCapacity, temperatureK);
  return {
    ...integrals,
    gibbsIncrementJPerMol: integrals.enthalpyIncrementJPerMol - temperatureK * integrals.entropyIncrementJPerMolK,
  };
}

/** Standard heat capacity Cp°(T) at 1 bar, J/(mol·K). */
export function heatCapacityJPerMolK(heatCapacity: HeatCapacity, temperatureK: number): number {
  requireTemperatureFor(heatCapacity, temperatureK);
  if (heatCapacity.model === "hkf-1bar") return hkfIncrements(heatCapacity, temperatureK).heatCapacityJPerMolK;
  return polynomialHeatCapacityJPerMolK(heatCapacity, temperatureK);
}

/** Apparent standard Gibbs energy of formation G(T) at 1 bar, J/mol (Benson–Helgeson convention). */
export function apparentGibbsJPerMol(entry: StandardStateEntry, temperatureK: number): number {
  const { gibbsIncrementJPerMol } = increments(entry.heatCapacity, temperatureK);
  return entry.standard.gibbsJPerMol - entry.standard.entropyJPerMolK * (temperatureK - referenceTemperatureK) + gibbsIncrementJPerMol;
}

/** Apparent standard enthalpy of formation H(T) at 1 bar, J/mol. Throws ThermoInputError if ΔfH° is absent. */
export function apparentEnthalpyJPerMol(entry: StandardStateEntry, temperatureK: number): number {
  const enthalpyJPerMol = entry.standard.enthalpyJPerMol;
  if (enthalpyJPerMol === undefined || !Number.isFinite(enthalpyJPerMol)) {
    throw new ThermoInputError(
      "missing-field",
      "standard.enthalpyJPerMol",
      enthalpyJPerMol,
      undefined,
      "standard.enthalpyJPerMol is required for the apparent enthalpy and must be a finite number",
    );
  }
  return enthalpyJPerMol + increments(entry.heatCapacity, temperatureK).enthalpyIncrementJPerMol;
}

/** Standard (third-law) entropy S°(T) at 1 bar, J/(mol·K). */
export function standardEntropyJPerMolK(entry: StandardStateEntry, temperatureK: number): number {
  return entry.standard.entropyJPerMolK + increments(entry.heatCapacity, temperatureK).entropyIncrementJPerMolK;
}
