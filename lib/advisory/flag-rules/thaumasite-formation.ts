import type { Flag, Severity } from "../flag";
import { belowSulfateClassesSentence, severeSulfateExposure, severityForSulfateClass } from "../sulfate-exposure";
import type { ExposureInput } from "../../schema/exposure-input";
import type { ThaumasiteResult } from "../../scenarios/thaumasite";

/**
 * Service temperature at or below which thaumasite attack is most often reported, °C: "most cases below about 15 °C"
 * (Thaumasite Expert Group 1999, DETR, London; BRE Special Digest 1; from memory). A screening value of this tool.
 */
const COLD_SERVICE_TEMPERATURE_C = 15;

/**
 * Wetting regimes in which the concrete is wet often enough for the sulfate and carbonate to be carried in and for
 * thaumasite to form (Thaumasite Expert Group 1999: a continuous supply of mobile groundwater or wet soil is one of
 * the necessary conditions). `dry` and `sheltered` are not.
 */
const WET_REGIMES: readonly NonNullable<ExposureInput["wetting"]>[] = ["permanently-wet", "wet-rarely-dry", "wet-dry", "unsheltered"];

const f1 = (x: number) => x.toFixed(1);
const f2 = (x: number) => x.toFixed(2);

/** Wet when the regime says so; when no regime is given, wet if the exposure names a groundwater or soil sulfate (buried concrete). */
function isWet(exposure: ExposureInput, sulfatePresent: boolean): boolean {
  return exposure.wetting === undefined ? sulfatePresent : WET_REGIMES.includes(exposure.wetting);
}

/**
 * `thaumasite-formation`: the equilibrium assemblage of the paste with the exposure's sulfate and carbonate holds
 * thaumasite at the (coldest) service temperature, and the concrete is wet. Thaumasite takes its silicate from
 * C-S-H, so the paste loses its binder rather than just expanding.
 *
 * - warning: thaumasite forms, wet exposure, exposure sulfate present, service minimum at or below 15 °C;
 * - caution: the same but warmer service (thaumasite attack is reported far less often above about 15 °C);
 * - both weighed by the sulfate class (`severityForSulfateClass`): a caution at most in XA1/S1, information without a class;
 * - none: dry or sheltered exposure, no sulfate in the exposure, or no thaumasite at the service temperature.
 */
export function thaumasiteFormationFlag(
  result: ThaumasiteResult,
  context: { exposure: ExposureInput; curingMaxTemperatureC?: number; waterBinderRatio: number },
): Flag | undefined {
  const s = result.summary;
  if (!s.exposureSulfatePresent) return undefined;
  if (!isWet(context.exposure, s.exposureSulfatePresent)) return undefined;
  if (!(s.atService.thaumasiteMol > 0)) return undefined;
  const sulfateClass = severeSulfateExposure(context.exposure);
  const severity: Severity = severityForSulfateClass(s.serviceTemperatureC <= COLD_SERVICE_TEMPERATURE_C ? "warning" : "caution", sulfateClass);

  const carbonate = s.carbonateMolPer100gBinder;
  const sources = [
    carbonate.binder > 0 ? `the binder (${f1(carbonate.binder * 1000)} mmol CO2 per 100 g binder, limestone filler and clinker carbonate)` : "",
    carbonate.aggregate > 0 ? "carbonate aggregate" : "",
    carbonate.water > 0 ? "bicarbonate/carbonate in the water" : "",
  ].filter(Boolean);
  const limitText =
    s.stabilityLimit.kind === "found"
      ? `With this exposure the engine finds thaumasite stable up to ${f1(s.stabilityLimit.temperatureC)} °C.`
      : s.stabilityLimit.kind === "stable-throughout"
        ? `With this exposure the engine finds thaumasite stable over the whole range computed (up to ${f1(s.stabilityLimit.upToC)} °C); field experience puts most attack below about ${COLD_SERVICE_TEMPERATURE_C} °C, where it is fastest.`
        : s.stabilityLimit.kind === "bracketed"
          ? `With this exposure the engine finds thaumasite stable up to between ${f1(s.stabilityLimit.bracketC[0])} and ${f1(s.stabilityLimit.bracketC[1])} °C.`
          : "";
  const explanation = [
    `At ${f1(s.serviceTemperatureC)} °C${s.serviceTemperatureClampedFromC !== null ? ` (the data set's lower limit; the service minimum is ${f1(s.serviceTemperatureClampedFromC)} °C)` : ""} the reaction ` +
      "6 Ca²⁺ + 2 SiO(OH)3⁻ + 2 SO4²⁻ + 2 CO3²⁻ + 2 OH⁻ + 26 H2O → thaumasite, Ca6Si2(SO4)2(CO3)2(OH)12·24H2O, " +
      `has a saturation index of ${f2(s.atService.saturationIndexWithoutIt)} in the paste without thaumasite (ΔrG ${f1(s.atService.formationGibbsKJPerMol)} kJ/mol): thaumasite is stable.`,
    `With the exposure's sulfate (${f2(s.sulfateDoseSo3MassPercentOfBinder)} % SO3 of the binder mass as the ${s.sulfateCation} salt, with its water) and the carbonate of ${sources.length ? sources.join(", ") : "the paste"}, ` +
      `about ${f1(s.atService.thaumasiteLitresPerM3)} L of thaumasite per m³ of concrete forms, taking ${f1(s.atService.siliconInThaumasitePercent)} % of the paste's reacted silicon out of the C-S-H: the binder softens and loses strength.`,
    limitText,
    "The calculation is an equilibrium state of a surface zone saturated with sulfate; thaumasite forms slowly, over years, in cold and wet ground.",
    sulfateClass.any ? "" : belowSulfateClassesSentence(context.exposure.sulfateMgPerL),
  ]
    .filter(Boolean)
    .join(" ");

  return {
    id: "thaumasite-formation",
    severity,
    title:
      severity === "warning"
        ? "Thaumasite sulfate attack possible: cold, wet, sulfate and carbonate present"
        : sulfateClass.any
          ? "Thaumasite can form with this sulfate and carbonate"
          : "Thaumasite could form with much more sulfate than this exposure brings",
    explanation,
    basis:
      "Thaumasite Expert Group 1999, The thaumasite form of sulfate attack (DETR, London): sulfate, carbonate, mobile water and cold (most cases below about 15 °C) together; " +
      "BRE Special Digest 1, Concrete in aggressive ground (design sulfate class and aggregate carbonate range); " +
      "Schmidt, Lothenbach, Romer, Scrivener, Rentsch & Figi 2008, Cem. Concr. Res. 38, 337 (thaumasite stability by equilibrium calculation and experiment); the equilibrium sweep of this assessment.",
    actions: [
      "Classify the ground to BRE SD1 (design sulfate class, mobile groundwater) and EN 206 XA; for limestone-filler binders or carbonate aggregate in cold sulfate ground, follow the binder and aggregate restrictions of the national provisions.",
      "Consider a binder with a high slag or fly ash content and a low w/cm to slow sulfate ingress; check the limestone content and the aggregate carbonate content.",
      "Test sulfate resistance at low temperature (e.g. prisms stored in sulfate solution at 5 °C, as in the thaumasite test programmes behind BRE SD1) rather than at 20 °C only.",
      "Where thaumasite is suspected in an existing structure, confirm it by XRD/SEM of the softened surface zone.",
      "National annexes and local codes govern; a qualified engineer and licensed testing decide.",
    ],
  };
}
