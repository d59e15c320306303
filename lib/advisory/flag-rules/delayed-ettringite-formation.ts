import curingLimits from "../../data/curing/curing-limits.json";
import type { Flag, Severity } from "../flag";
import type { ExposureInput } from "../../schema/exposure-input";
import { ettringiteStableIn, type TemperatureHistoryResult, type TemperatureState } from "../../scenarios/temperature-history";

/** The common specification limit on the maximum concrete temperature, °C, and the caution margin below it (`lib/data/curing/curing-limits.json`). */
const SPECIFICATION_LIMIT_C = curingLimits.defPeakTemperatureC.value;
const CAUTION_MARGIN_C = curingLimits.defPeakTemperatureC.cautionMarginC;

const f1 = (x: number) => x.toFixed(1);
const f2 = (x: number) => x.toFixed(2);

/**
 * The temperatures at which this flag's answer changes with the ettringite stability temperature T_s: the warning
 * compares the curing temperature with T_s, the caution with T_s − the caution margin. Knowing on which side of each
 * the limit lies decides the flag (`decidedStabilityLimit`).
 */
export function defDecisionTemperaturesC(curingMaxTemperatureC: number): number[] {
  return [curingMaxTemperatureC, curingMaxTemperatureC + CAUTION_MARGIN_C];
}

/**
 * `delayed-ettringite-formation`: the concrete was hotter during curing than ettringite tolerates, so its sulfate
 * went into AFm and the pore solution and can form ettringite later in the hardened paste, with expansion in moist
 * service (Taylor, Famy & Scrivener 2001, Cem. Concr. Res. 31, 683).
 *
 * - warning: the maximum curing temperature exceeds the ettringite stability temperature computed for this mix,
 *   or the common 70 °C specification limit;
 * - caution: it lies within the caution margin (5 °C) below the lower of the two;
 * - none otherwise, or when no curing temperature is known.
 */
export function delayedEttringiteFormationFlag(
  result: TemperatureHistoryResult,
  context: { exposure: ExposureInput; curingMaxTemperatureC?: number; waterBinderRatio: number },
): Flag | undefined {
  const s = result.summary;
  const curingC = context.curingMaxTemperatureC ?? s.curingTemperatureC ?? undefined;
  if (curingC === undefined) return undefined;
  // A bracketed (root finding failed) or decided limit counts at its lower end: the conservative reading, and for a decided limit (a Monte Carlo
  // sample, `defDecisionTemperaturesC`) the same answer as any value in the bracket.
  const stabilityC = s.ettringiteStabilityTemperatureC ?? (s.stabilityLimit.kind === "bracketed" || s.stabilityLimit.kind === "decided" ? s.stabilityLimit.bracketC[0] : null);
  const governingC = stabilityC === null ? SPECIFICATION_LIMIT_C : Math.min(stabilityC, SPECIFICATION_LIMIT_C);
  let severity: Severity;
  if (curingC > governingC) severity = "warning";
  else if (curingC > governingC - CAUTION_MARGIN_C) severity = "caution";
  else return undefined;

  const stabilityText =
    s.stabilityLimit.kind === "found"
      ? `In this mix the engine finds ettringite stable up to ${f1(s.stabilityLimit.temperatureC)} °C.`
      : s.stabilityLimit.kind === "stable-throughout"
        ? `In this mix the engine finds ettringite stable over the whole range computed (up to ${f1(s.stabilityLimit.upToC)} °C).`
        : s.stabilityLimit.kind === "bracketed"
          ? `In this mix the engine finds ettringite stable up to between ${f1(s.stabilityLimit.bracketC[0])} and ${f1(s.stabilityLimit.bracketC[1])} °C (the root finding did not converge).`
          : s.stabilityLimit.kind === "decided"
            ? `In this mix the engine finds ettringite stable up to between ${f1(s.stabilityLimit.bracketC[0])} and ${f1(s.stabilityLimit.bracketC[1])} °C (narrowed as far as this flag needs).`
          : "In this mix the engine finds no ettringite at any temperature computed.";
  const dataCaveat =
    "The computed stability temperature is likely too high: for typical Portland cements the model finds it well above the 65–75 °C that published studies of Portland pastes report " +
    "(Lothenbach et al. 2007; Taylor, Famy & Scrivener 2001). The model does not hold the sulfate that C-S-H takes up at high temperature, and above 50 °C siliceous hydrogarnet " +
    "takes the aluminium that AFm phases would otherwise hold, leaving ettringite the only solid host of sulfate; this is why the common 70 °C limit also applies here.";
  const atCuring = s.atCuring;
  // The index without ettringite is not computed on a Monte Carlo sample's path where ettringite is present (positive then).
  const indexText = (state: TemperatureState) =>
    state.ettringiteSaturationIndexWithoutIt === null || state.ettringiteFormationGibbsKJPerMol === null
      ? "a positive saturation index (ettringite is present)"
      : `a saturation index of ${f2(state.ettringiteSaturationIndexWithoutIt)} (ΔrG ${f1(state.ettringiteFormationGibbsKJPerMol)} kJ/mol)`;
  const curingText = atCuring
    ? `At ${f1(atCuring.temperatureC)} °C${s.curingTemperatureClampedFromC != null ? ` (the data set's limit; the computed maximum concrete temperature is ${f1(s.curingTemperatureClampedFromC)} °C)` : ""} the formation reaction 6 Ca²⁺ + 2 Al(OH)4⁻ + 3 SO4²⁻ + 4 OH⁻ + 26 H2O → ettringite has ${indexText(atCuring)}, ` +
      `${ettringiteStableIn(atCuring) ? "so ettringite is still just stable in the model" : "so ettringite dissolves"}, ` +
      `and ${f1(atCuring.sulfate.outsideAftMolSO3PerM3)} mol SO3 per m³ of concrete is held outside ettringite (in AFm and the pore solution).`
    : "";
  const serviceText =
    `At the service temperature of ${f1(s.atService.temperatureC)} °C${s.serviceTemperatureClampedFromC != null ? ` (the data set's limit; the service temperature entered is ${f1(s.serviceTemperatureClampedFromC)} °C)` : ""} the same reaction has ${indexText(s.atService)}: that sulfate is driven back into ettringite` +
    (s.sulfateToEttringiteOnCoolingMolSO3PerM3 !== null && s.ettringiteVolumeGainOnCoolingLitresPerM3 !== null
      ? `, about ${f1(s.sulfateToEttringiteOnCoolingMolSO3PerM3)} mol SO3 and ${f2(s.ettringiteVolumeGainOnCoolingLitresPerM3)} L of ettringite per m³, forming in the hardened paste.`
      : ".");
  const limitText =
    curingC > SPECIFICATION_LIMIT_C
      ? `The maximum concrete temperature of ${f1(curingC)} °C exceeds the ${SPECIFICATION_LIMIT_C} °C limit common in specifications.`
      : stabilityC !== null && curingC > stabilityC
        ? `The maximum concrete temperature of ${f1(curingC)} °C exceeds the computed ettringite stability temperature.`
        : `The maximum concrete temperature of ${f1(curingC)} °C is within ${CAUTION_MARGIN_C} °C of the ${f1(governingC)} °C limit.`;
  const moistureText =
    context.exposure.wetting === "dry"
      ? "The exposure is dry: DEF expansion needs moisture in service, so the risk is lower while the concrete stays dry."
      : "DEF expansion needs moisture in service; wet or humid exposure makes it more likely.";

  return {
    id: "delayed-ettringite-formation",
    severity,
    title: severity === "warning" ? "Delayed ettringite formation possible: curing temperature too high" : "Curing temperature close to the limit for delayed ettringite formation",
    explanation: [limitText, stabilityText, curingText, serviceText, moistureText, dataCaveat].filter(Boolean).join(" "),
    basis:
      `Common practice: specifications cap the maximum concrete temperature at ${SPECIFICATION_LIMIT_C} °C (heat-cured precast and mass concrete, e.g. ACI 301 mass concrete 160 °F, ` +
      "and national provisions applied with EN 13670); DEF is associated with concrete that exceeded about 70 °C (Taylor, Famy & Scrivener 2001, Cem. Concr. Res. 31, 683); " +
      "ettringite stability against temperature in Portland pastes: Lothenbach, Winnefeld, Alder, Wieland & Lunk 2007, Cem. Concr. Res. 37, 483; the equilibrium sweep of this assessment.",
    actions: [
      `Keep the maximum concrete temperature below ${SPECIFICATION_LIMIT_C} °C: lower the heat-curing temperature, extend the preset period, or reduce the cement content or use a low-heat binder (check with the curing model).`,
      "Binders with slag, fly ash or metakaolin, or a low SO3/Al2O3 ratio, are reported to reduce DEF risk: check with the supplier's data and testing.",
      "Where the history is uncertain, measure the temperature in the element (embedded sensors) and test the DEF susceptibility of the mix (e.g. the LCPC/IFSTTAR method, or the Duggan heat-cycle test).",
      "Follow the national annex and local code; a qualified engineer and licensed testing decide.",
    ],
  };
}
