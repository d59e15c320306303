import { arrheniusAgeFactor } from "./arrhenius-rate";

/**
 * Equivalent age by ASTM C1074 (Arrhenius form):
 *   t_e = Σ exp[−(E/R)(1/T_a − 1/T_s)] · Δt
 * with T_a the average concrete temperature over each interval (here the mean of its two end readings),
 * T_s the reference temperature. Returns the cumulative equivalent age (h) at each given time.
 */
export function equivalentAgeH(
  timesH: readonly number[],
  temperaturesC: readonly number[],
  activationEnergyJPerMol: number,
  referenceTemperatureC: number,
): number[] {
  if (timesH.length !== temperaturesC.length) throw new RangeError("timesH and temperaturesC differ in length");
  const ages = new Array<number>(timesH.length);
  let ageH = 0;
  for (let i = 0; i < timesH.length; i++) {
    if (i > 0) {
      const meanC = 0.5 * (temperaturesC[i] + temperaturesC[i - 1]);
      ageH += arrheniusAgeFactor(meanC, activationEnergyJPerMol, referenceTemperatureC) * (timesH[i] - timesH[i - 1]);
    }
    ages[i] = ageH;
  }
  return ages;
}
