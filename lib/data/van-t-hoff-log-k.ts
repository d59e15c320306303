import { gasConstantJPerMolK, referenceTemperatureK } from "../thermo/physical-constants";

/**
 * log10 K(T) of a reaction with constant ΔrH° and ΔrCp° (integrated van 't Hoff equation):
 *   log10 K(T) = log10 K(T_r) − ΔrH°/(R ln10)·(1/T − 1/T_r) + ΔrCp°/(R ln10)·(T_r/T − 1 + ln(T/T_r)),
 * T_r = 298.15 K, R = 8.314462618 J/(mol·K) (CODATA 2018), T in K, ΔrH° in J/mol, ΔrCp° in J/(mol·K).
 * (E.g. Anderson & Crerar 1993, Thermodynamics in Geochemistry, Oxford, ch. 11.)
 */
export function vanTHoffLog10K(
  reaction: { log10K25: number; deltaHJPerMol: number; deltaCpJPerMolK: number },
  temperatureK: number,
): number {
  const rLn10JPerMolK = gasConstantJPerMolK * Math.LN10;
  const t = temperatureK;
  const tr = referenceTemperatureK;
  return (
    reaction.log10K25 -
    (reaction.deltaHJPerMol / rLn10JPerMolK) * (1 / t - 1 / tr) +
    (reaction.deltaCpJPerMolK / rLn10JPerMolK) * (tr / t - 1 + Math.log(t / tr))
  );
}
