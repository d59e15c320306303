import { valueAt } from "./key-figures";

/**
 * The notes of a result's computation, in sentences for the results page and the reports: what the engine could not
 * compute (a scenario, ages of the timeline), where a model is extrapolated or beyond its range, and how an input was
 * read. They come from `result.warnings` (`{ code, ... }`, see `AssessmentResult.warnings`); a code not known here is
 * told by its own message, or by its code. A warning of the hydration timeline alone (`scope: "timeline"`) says so.
 */
export function computationNotesOf(result: unknown): string[] {
  const warnings = valueAt(result, ["warnings"]);
  if (!Array.isArray(warnings)) return [];
  const notes = warnings
    .filter((w): w is Record<string, unknown> => typeof w === "object" && w !== null && typeof (w as { code?: unknown }).code === "string")
    .map((w) => (w.scope === "timeline" && w.code !== "timeline_ages_unsolved" ? `In the hydration timeline: ${lowerFirst(noteOf(w))}` : noteOf(w)));
  return notes.filter((note, index) => notes.indexOf(note) === index);
}

const num = (value: unknown, digits = 3) => (typeof value === "number" && Number.isFinite(value) ? String(Number(value.toPrecision(digits))) : "?");
const text = (value: unknown, fallback = "?") => (typeof value === "string" && value ? value : fallback);
const lowerFirst = (value: string) => value.charAt(0).toLowerCase() + value.slice(1);
const listOf = (items: string[]) => (items.length < 2 ? items.join("") : `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`);
const sentence = (value: string) => value.charAt(0).toUpperCase() + value.slice(1) + (/[.!?]$/.test(value) ? "" : ".");

function noteOf(w: Record<string, unknown>): string {
  switch (w.code) {
    case "scenario_failed":
      return `The ${text(w.scenario)} scenario could not be computed (${text(w.reason)}): ${text(w.message)}. Its chart and its flags are missing from this result.`;
    case "timeline_ages_unsolved":
      return sentence(`hydration timeline: ${text(w.message)}`);
    case "analysis_total_out_of_range":
      return `The ${text(w.material)} analysis sums to ${num(w.totalMassPercent)} %, outside ${num(w.minMassPercent)}–${num(w.maxMassPercent)} %: check it.`;
    case "loi_taken_as_co2":
      return `The loss on ignition of the ${text(w.material)} (${num(w.loiMassPercent)} %) is taken as CO2 (calcite), as no CO2 was given.`;
    case "water_insufficient_for_full_hydration":
      return `The w/b ${num(w.waterBinderRatio)} is below the ${num(w.minimumSaturated)} (water-cured) to ${num(w.minimumSealed)} (sealed) that full hydration needs (Powers' model): the paste self-desiccates and part of the binder stays unreacted.`;
    case "clinker_reaction_limited_by_water": {
      const held = [
        ...(Array.isArray(w.phases) ? w.phases : []).map((p: { phase?: unknown; unlimitedDegree?: unknown }) => `${text(p.phase)} (computed ${num(p.unlimitedDegree, 2)})`),
        ...(Array.isArray(w.supplementaryMaterials) ? w.supplementaryMaterials : []).map((m: { type?: unknown; unlimitedDegree?: unknown }) => `the ${text(m.type)} (computed ${num(m.unlimitedDegree, 2)})`),
      ];
      return `Hydration is limited by the mixing water: at w/b ${num(w.waterBinderRatio)} a sealed paste can react only to a degree of about ${num(w.maximumDegree, 2)} (w/b ÷ ${num(w.minimumSealed, 2)}, Powers' model) before its capillary water is used up, so ${listOf(held)} ${held.length === 1 ? "is" : "are"} held at ${num(w.maximumDegree, 2)}.`;
    }
    case "ionic_strength_beyond_activity_model":
      return `The pore solution's ionic strength, ${num(w.ionicStrengthMolPerKg)} mol/kg, is above the ${num(w.validUpToMolPerKg)} mol/kg to which the extended Debye–Hückel activity model is used with confidence: dissolved concentrations and pH are less certain.`;
    case "alkali_uptake_limited_by_pore_water":
      return `The paste is nearly dry (${num(w.poreWaterG, 2)} g of pore water per 100 g binder): the C-S-H could be given only ${num(100 * (w.boundFraction as number), 2)} % of the alkalis, not the ${num(100 * (w.distributionRatioFraction as number), 2)} % its distribution ratio asks, without the pore solution vanishing. Dissolved alkalis and pH are upper estimates.`;
    case "thermodynamic_heat_unavailable":
      return `The heat of hydration could not be computed from the data set's enthalpies (${text(w.message)}): the element temperature uses the classic per-phase heats of Lerch & Bogue (1934) with the hydration curve of Schindler & Folliard (2005).`;
    case "element_temperature_above_boiling":
      return `The element temperature reaches ${num(w.maxTemperatureC, 4)} °C, at or above the ${num(w.boilingPointC, 4)} °C at which its pore water boils at atmospheric pressure. The heat model has no evaporation and the data set ends at 100 °C; cement hydrated this hot also reaches lower long-term degrees than the heat curve assumes (the crossover effect). The peak is an upper estimate: the element needs thermal control whatever the exact figure.`;
    case "heat_curve_exceeded":
      return `Part of the element reaches an equivalent age of ${num(w.maxEquivalentAgeH)} h, beyond the last ${num(w.lastCurveAgeH)} h of the heat curve, where the heat is held at its last value: later temperatures are low estimates. Enter a longer curve or shorten the run.`;
    case "scm_model_extrapolated":
      return w.reason === "temperature_outside_data"
        ? `The reaction degree of the ${text(w.type)} is extrapolated: the curing temperature ${num(w.curingTemperatureC)} °C lies outside the ${num(w.minC)}–${num(w.maxC)} °C of its data.`
        : `The reaction degree of the ${text(w.type)} is extrapolated beyond the last age of its data (${num(w.lastDataAgeDays)} d; equivalent age ${num(w.equivalentAgeDays)} d).`;
    default:
      return typeof w.message === "string" && w.message ? sentence(w.message) : `Note: ${String(w.code)}.`;
  }
}
