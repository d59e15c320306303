import { standardAtmosphereBar } from "../thermo/physical-constants";
import { saturationTemperatureK } from "../thermo/water-saturation-pressure";

const KELVIN_OFFSET = 273.15;

/** Boiling point of water at the standard atmosphere, °C: 99.97 (IAPWS-IF97 region 4, `saturationTemperatureK`). */
export const boilingPointAtOneAtmosphereC = saturationTemperatureK(standardAtmosphereBar) - KELVIN_OFFSET;

/**
 * Where a curing result lies outside what its models hold, as typed warnings (the results page and the reports tell
 * them in sentences, `lib/report/computation-notes.ts`):
 * - `element_temperature_above_boiling`: the element reaches the boiling point of its pore water at atmospheric
 *   pressure. The heat model has no evaporation or boiling, and the data set ends at 100 °C; the heat curve, applied by
 *   equivalent age, also overstates the heat at such temperatures, as cement hydrated hot reaches lower long-term degrees
 *   (the crossover effect: Kjellsen & Detwiler 1992, Cem. Concr. Res. 22, 112; Escalante-García & Sharp 1998, Cem.
 *   Concr. Res. 28, 1245; from memory). The computed peak is then an upper estimate, not a prediction.
 * - `heat_curve_exceeded`: some part of the element ran past the last equivalent age of a sampled heat curve, where
 *   the heat is held at its last value: the heat released afterwards, and the temperature it drives, are missing.
 */
export type CuringModelWarning =
  | { code: "element_temperature_above_boiling"; maxTemperatureC: number; boilingPointC: number; message: string }
  | { code: "heat_curve_exceeded"; maxEquivalentAgeH: number; lastCurveAgeH: number; message: string };

export type CuringRangeFacts = {
  /** Highest temperature anywhere in the element over the run, °C. */
  maxTemperatureC: number;
  /** Largest equivalent age reached anywhere in the element, in the heat source's reference temperature, h. */
  maxSourceEquivalentAgeH: number;
  /** Last equivalent age of a sampled heat curve, h; undefined for a closed-form curve. */
  heatCurveLastAgeH?: number;
};

const oneDecimal = (x: number) => x.toFixed(1);

export function curingModelWarnings(facts: CuringRangeFacts): CuringModelWarning[] {
  const warnings: CuringModelWarning[] = [];
  if (facts.maxTemperatureC >= boilingPointAtOneAtmosphereC) {
    warnings.push({
      code: "element_temperature_above_boiling",
      maxTemperatureC: facts.maxTemperatureC,
      boilingPointC: boilingPointAtOneAtmosphereC,
      message: `the element reaches ${oneDecimal(facts.maxTemperatureC)} °C, at or above the ${boilingPointAtOneAtmosphereC.toFixed(2)} °C at which its pore water boils at atmospheric pressure; the model has no evaporation and its heat curve overstates the heat of cement hydrated this hot, so the peak is an upper estimate`,
    });
  }
  if (facts.heatCurveLastAgeH !== undefined && facts.maxSourceEquivalentAgeH > facts.heatCurveLastAgeH) {
    warnings.push({
      code: "heat_curve_exceeded",
      maxEquivalentAgeH: facts.maxSourceEquivalentAgeH,
      lastCurveAgeH: facts.heatCurveLastAgeH,
      message: `the element reaches an equivalent age of ${oneDecimal(facts.maxSourceEquivalentAgeH)} h, beyond the heat curve's last ${oneDecimal(facts.heatCurveLastAgeH)} h; the heat is held at its last value there, so the later temperatures are low estimates`,
    });
  }
  return warnings;
}
