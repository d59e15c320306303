import { cementFractionOfBinder, type CuringBinder } from "./binder-description";
import { degreeOfHydration, hydrationParameters, type HydrationParameters } from "./hydration-degree";
import { ultimateHeatJPerKgBinder } from "./ultimate-heat";
import { hydrationActivationEnergyJPerMol } from "./hydration-activation-energy";
import { hydrationModelData } from "./curing-data";

/**
 * What the element temperature model needs from a heat-of-hydration model: the cumulative heat released
 * per kg of binder as a function of equivalent age, and the Arrhenius parameters that define that
 * equivalent age. Any model can plug in here (the thermodynamic-engine heat, a measured calorimetry curve,
 * the Schindler & Folliard curve below). The function must be non-decreasing.
 */
export interface HeatSource {
  label: string;
  /** Reference temperature of the equivalent age the curve is written in, °C. */
  referenceTemperatureC: number;
  /** Apparent activation energy used to convert real time to equivalent age, J/mol. */
  activationEnergyJPerMol: number;
  cumulativeHeatJPerKgBinder(equivalentAgeH: number): number;
  /** Last equivalent age a sampled curve covers, h (the heat is held at its last value beyond); absent for a closed form. */
  lastEquivalentAgeH?: number;
}

export type DefaultHeatSourceDetails = {
  source: HeatSource;
  parameters: HydrationParameters;
  ultimateHeatJPerKgBinder: number;
  cementFractionOfBinder: number;
};

/**
 * Default heat source: Q(te) = Hu · α(te), with Hu from the per-phase heats and SCM terms and α(te) the
 * three-parameter exponential of Schindler & Folliard (2005), ACI Mater. J. 102, 24, with the activation
 * energy of Schindler (2004), ACI Mater. J. 101, 72, at their 21.1 °C reference temperature.
 */
export function hydrationHeatSource(binder: CuringBinder): DefaultHeatSourceDetails {
  const parameters = hydrationParameters(binder);
  const ultimate = ultimateHeatJPerKgBinder(binder);
  return {
    parameters,
    ultimateHeatJPerKgBinder: ultimate,
    cementFractionOfBinder: cementFractionOfBinder(binder),
    source: {
      label: "Schindler & Folliard (2005) degree of hydration × per-phase ultimate heat",
      referenceTemperatureC: hydrationModelData.referenceTemperatureC.value,
      activationEnergyJPerMol: hydrationActivationEnergyJPerMol(binder),
      cumulativeHeatJPerKgBinder: (equivalentAgeH) => ultimate * degreeOfHydration(equivalentAgeH, parameters),
    },
  };
}

export type HeatSample = { equivalentAgeH: number; cumulativeHeatJPerKgBinder: number };

/**
 * A heat source from a sampled curve (e.g. isothermal calorimetry or a future engine run), linearly
 * interpolated, zero before the first sample if that starts above zero age, held constant after the last.
 */
export function sampledHeatSource(
  samples: readonly HeatSample[],
  referenceTemperatureC: number,
  activationEnergyJPerMol: number,
  label = "sampled heat curve",
): HeatSource {
  if (samples.length < 2) throw new RangeError("a sampled heat curve needs at least two samples");
  for (let i = 1; i < samples.length; i++) {
    if (!(samples[i].equivalentAgeH > samples[i - 1].equivalentAgeH)) throw new RangeError("sample ages must increase");
    if (samples[i].cumulativeHeatJPerKgBinder < samples[i - 1].cumulativeHeatJPerKgBinder)
      throw new RangeError("cumulative heat must not decrease");
  }
  const first = samples[0];
  const last = samples[samples.length - 1];
  return {
    label,
    referenceTemperatureC,
    activationEnergyJPerMol,
    lastEquivalentAgeH: last.equivalentAgeH,
    cumulativeHeatJPerKgBinder(ageH) {
      if (ageH <= first.equivalentAgeH) {
        return first.equivalentAgeH > 0 ? Math.max(0, (first.cumulativeHeatJPerKgBinder * ageH) / first.equivalentAgeH) : first.cumulativeHeatJPerKgBinder;
      }
      if (ageH >= last.equivalentAgeH) return last.cumulativeHeatJPerKgBinder;
      let lo = 0;
      let hi = samples.length - 1;
      while (hi - lo > 1) {
        const mid = (lo + hi) >> 1;
        if (samples[mid].equivalentAgeH <= ageH) lo = mid;
        else hi = mid;
      }
      const a = samples[lo];
      const b = samples[hi];
      const w = (ageH - a.equivalentAgeH) / (b.equivalentAgeH - a.equivalentAgeH);
      return a.cumulativeHeatJPerKgBinder + w * (b.cumulativeHeatJPerKgBinder - a.cumulativeHeatJPerKgBinder);
    },
  };
}
