import { describe, it, expect } from "vitest";
import { computationNotesOf } from "../../lib/report/computation-notes";

describe("computation notes", () => {
  it("tells each warning of the result in a sentence with its figures", () => {
    const notes = computationNotesOf({
      warnings: [
        { code: "water_insufficient_for_full_hydration", waterBinderRatio: 0.26, minimumSealed: 0.419, minimumSaturated: 0.356 },
        { code: "ionic_strength_beyond_activity_model", ionicStrengthMolPerKg: 1.94, validUpToMolPerKg: 1 },
        { code: "scenario_failed", scenario: "thaumasite", reason: "no_convergence", message: "at 5 °C: the phase set cycles" },
        { code: "timeline_ages_unsolved", ageDays: [1030, 3650], reason: "no_convergence", message: "the engine could not solve the assemblage at ages 1030 d, 3650 d (the phase set cycles); the timeline leaves them out" },
        { code: "analysis_total_out_of_range", material: "cement", totalMassPercent: 95.4, minMassPercent: 97, maxMassPercent: 101 },
        { code: "scm_model_extrapolated", type: "slag", reason: "temperature_outside_data", curingTemperatureC: 80, minC: 5, maxC: 60 },
        { code: "near_invariant_point", message: "the assemblage lies near an invariant point" },
        { code: "clinker_reaction_limited_by_water", waterBinderRatio: 0.25, minimumSealed: 0.4195, maximumDegree: 0.596, phases: [{ phase: "alite", unlimitedDegree: 0.7512 }], supplementaryMaterials: [{ type: "slag", unlimitedDegree: 0.71 }] },
        { code: "alkali_uptake_limited_by_pore_water", boundFraction: 0.70499, distributionRatioFraction: 0.98420, poreWaterG: 0.2526 },
        { code: "thermodynamic_heat_unavailable", reason: "enthalpy_unavailable", message: "the data set has no enthalpy for the slag glass" },
        { code: "element_temperature_above_boiling", maxTemperatureC: 117.813, boilingPointC: 99.9743, message: "" },
        { code: "heat_curve_exceeded", maxEquivalentAgeH: 212.4, lastCurveAgeH: 168, message: "" },
        { code: "something_new" },
      ],
    });
    expect(notes).toEqual([
      "The w/b 0.26 is below the 0.356 (water-cured) to 0.419 (sealed) that full hydration needs (Powers' model): the paste self-desiccates and part of the binder stays unreacted.",
      "The pore solution's ionic strength, 1.94 mol/kg, is above the 1 mol/kg to which the extended Debye–Hückel activity model is used with confidence: dissolved concentrations and pH are less certain.",
      "The thaumasite scenario could not be computed (no_convergence): at 5 °C: the phase set cycles. Its chart and its flags are missing from this result.",
      "Hydration timeline: the engine could not solve the assemblage at ages 1030 d, 3650 d (the phase set cycles); the timeline leaves them out.",
      "The cement analysis sums to 95.4 %, outside 97–101 %: check it.",
      "The reaction degree of the slag is extrapolated: the curing temperature 80 °C lies outside the 5–60 °C of its data.",
      "The assemblage lies near an invariant point.",
      "Hydration is limited by the mixing water: at w/b 0.25 a sealed paste can react only to a degree of about 0.6 (w/b ÷ 0.42, Powers' model) before its capillary water is used up, so alite (computed 0.75) and the slag (computed 0.71) are held at 0.6.",
      "The paste is nearly dry (0.25 g of pore water per 100 g binder): the C-S-H could be given only 70 % of the alkalis, not the 98 % its distribution ratio asks, without the pore solution vanishing. Dissolved alkalis and pH are upper estimates.",
      "The heat of hydration could not be computed from the data set's enthalpies (the data set has no enthalpy for the slag glass): the element temperature uses the classic per-phase heats of Lerch & Bogue (1934) with the hydration curve of Schindler & Folliard (2005).",
      "The element temperature reaches 117.8 °C, at or above the 99.97 °C at which its pore water boils at atmospheric pressure. The heat model has no evaporation and the data set ends at 100 °C; cement hydrated this hot also reaches lower long-term degrees than the heat curve assumes (the crossover effect). The peak is an upper estimate: the element needs thermal control whatever the exact figure.",
      "Part of the element reaches an equivalent age of 212 h, beyond the last 168 h of the heat curve, where the heat is held at its last value: later temperatures are low estimates. Enter a longer curve or shorten the run.",
      "Note: something_new.",
    ]);
  });

  it("says when a warning concerns the hydration timeline only, not the assessment's age", () => {
    const notes = computationNotesOf({ warnings: [{ code: "scm_model_extrapolated", type: "slag", reason: "age_beyond_data", equivalentAgeDays: 3650, lastDataAgeDays: 365, scope: "timeline" }] });
    expect(notes).toEqual(["In the hydration timeline: the reaction degree of the slag is extrapolated beyond the last age of its data (365 d; equivalent age 3650 d)."]);
  });

  it("gives no notes for a result without warnings, and ignores entries that are not warnings", () => {
    expect(computationNotesOf({})).toEqual([]);
    expect(computationNotesOf({ warnings: [null, 3, { message: "no code" }] })).toEqual([]);
  });
});
