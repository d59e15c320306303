import { describe, it, expect } from "vitest";
import { culvertDemo } from "../../lib/demo/culvert-demo";
import { assessInput } from "../../lib/schema/assess-input";
import { binderSystemOf } from "../../lib/service/assessment-core";
import { assessmentCuring } from "../../lib/service/assessment-curing";
import { THERMODYNAMIC_HEAT_LABEL, thermodynamicHeatCurve } from "../../lib/curing/thermodynamic-heat";
import { adviseCuring } from "../../lib/curing/advise-curing";
import { loadDataset } from "../../lib/data/load-dataset";
import { newWarmStartBook, readingBook } from "../../lib/scenarios/sweep";
import { sampleDataset } from "../../lib/service/perturbed-dataset";
import { createRng } from "../../lib/advisory/random";

/**
 * The heat source of an assessment's element temperature (issue 6: the heat from the data set's enthalpies is the
 * method, the classic per-phase heats the check). The demo binder has slag, whose glass has no enthalpy in the data
 * set; the same demo with its slag removed is a plain CEM I.
 */
const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const dataset = loaded.value;

function parsed(raw: unknown) {
  const input = assessInput.safeParse(raw);
  if (!input.success) throw new Error(JSON.stringify(input.error.issues));
  const binder = binderSystemOf(input.data);
  if (!binder.ok) throw new Error(JSON.stringify(binder.error));
  return { input: input.data, binder: binder.value };
}

const thermal = culvertDemo.curing!.thermal!;
const plainCemI = {
  ...culvertDemo,
  binder: { cement: culvertDemo.binder.cement, supplementaryMaterials: [] },
  curing: { thermal: { ...thermal, supplementaryMaterials: [] } },
};

describe("the curing advice of an assessment", () => {
  it("drives the element temperature of a plain Portland cement with the heat from the data set's enthalpies", () => {
    const { input, binder } = parsed(plainCemI);
    const { curing, warnings } = assessmentCuring(input, binder, dataset, undefined);
    expect(warnings).toEqual([]);
    expect(curing!.heatModel.label).toBe(THERMODYNAMIC_HEAT_LABEL);
    expect(curing!.heatModel).toMatchObject({ source: "thermodynamic", sourceName: "data-set enthalpies" });
    // The reported curve is the thermodynamic curve: at one year (8760 h, its last age) the same heat.
    const curve = thermodynamicHeatCurve(binder.binder, { dataset });
    if (!curve.ok) throw new Error(JSON.stringify(curve.error));
    const lastComputed = curve.value.points[curve.value.points.length - 1];
    const lastReported = curing!.heatModel.curve[curing!.heatModel.curve.length - 1];
    expect(lastReported.equivalentAgeH).toBeCloseTo(lastComputed.equivalentAgeH, 6);
    expect(lastReported.cumulativeHeatJPerGBinder).toBeCloseTo(lastComputed.cumulativeHeatJPerG, 1);
    // The per-phase heats stay beside it as the check (Lerch & Bogue 1934; Taylor 1997).
    expect(curing!.heatModel.perPhaseCheckJPerGCement.lerchBogue).toBeGreaterThan(400);
    expect(curing!.heatModel.cementFractionOfBinder).toBe(1);
    // Beside it, the element temperature the per-phase heats give: two published heat models, 13 °C apart at the peak
    // for this 0.45 m wall (64.3 against 50.8 °C when written; 42.3 °C before the τ regression was corrected to C3S).
    const perPhase = adviseCuring(input.curing.thermal!);
    expect(curing!.perPhaseHeatCheck).toEqual({ label: perPhase.heatModel.label, peakCoreC: perPhase.temperature.peakCoreC, peakTimeH: perPhase.temperature.peakTimeH, maxDifferenceC: perPhase.temperature.maxDifferenceC });
    expect(curing!.temperature.peakCoreC - perPhase.temperature.peakCoreC).toBeGreaterThan(10);
  });

  it("KNOWN DEVIATION pin: the thermodynamic heat comes early, 60–120 J/g by 5 h at 20 °C for the CEM I preset", () => {
    // Isothermal calorimetry of Portland cements shows a dormant period and a few tens of J/g before the main peak
    // (common practice). The Parrot & Killoh (1984) degrees have no dormant period (alite 0.15 and belite 0.10 reacted
    // at 5 h at w/c 0.45), so this heat, and the element peak it drives, errs early and high; the README says so.
    const { input, binder } = parsed(plainCemI);
    const { curing } = assessmentCuring(input, binder, dataset, undefined);
    const atFiveHours = curing!.heatModel.curve.filter((p) => p.equivalentAgeH <= 5.5).pop()!;
    expect(atFiveHours.equivalentAgeH).toBeGreaterThan(4);
    expect(atFiveHours.cumulativeHeatJPerGBinder).toBeGreaterThan(60);
    expect(atFiveHours.cumulativeHeatJPerGBinder).toBeLessThan(120);
  });

  it("keeps an entered heat curve (a measured calorimetry curve governs)", () => {
    const heatCurve = { points: [{ equivalentAgeH: 0, cumulativeHeatJPerG: 0 }, { equivalentAgeH: 100, cumulativeHeatJPerG: 300 }], referenceTemperatureC: 20, activationEnergyJPerMol: 40000 };
    const { input, binder } = parsed({ ...plainCemI, curing: { thermal: { ...plainCemI.curing.thermal, heatCurve } } });
    const { curing, warnings } = assessmentCuring(input, binder, dataset, undefined);
    // The run is longer than the curve's 100 h: the element passes its end, which is told, not hidden.
    expect(warnings.map((w) => w.code)).toEqual(["heat_curve_exceeded"]);
    expect(curing!.heatModel).toMatchObject({ label: "entered heat curve", source: "entered" });
  });

  it("falls back to the classic per-phase heats for a slag binder, with a warning naming the missing enthalpy", () => {
    const { input, binder } = parsed(culvertDemo);
    const { curing, warnings } = assessmentCuring(input, binder, dataset, undefined);
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatchObject({ code: "thermodynamic_heat_unavailable", reason: "enthalpy_unavailable" });
    expect(warnings[0].message).toMatch(/slag/);
    expect(curing).toEqual(adviseCuring(input.curing.thermal!));
    expect(curing!.heatModel.source).toBe("per-phase");
  });

  it("gives a Monte Carlo sample the reference run's heat curve, so its element temperature is the deterministic one", () => {
    const { input, binder } = parsed(plainCemI);
    const book = newWarmStartBook();
    const reference = assessmentCuring(input, binder, dataset, book);
    expect(book.heatCurve).not.toBeUndefined();
    expect(reference.curing!.perPhaseHeatCheck).toBeUndefined();
    const sampled = sampleDataset(dataset, createRng(7, 3));
    const sample = assessmentCuring(input, binder, sampled, readingBook(book));
    expect(sample.curing!.temperature.peakCoreC).toBe(reference.curing!.temperature.peakCoreC);
    expect(sample.curing!.heatModel.label).toBe(THERMODYNAMIC_HEAT_LABEL);
    expect(sample.curing!.perPhaseHeatCheck).toBeUndefined();
  });

  it("runs without the thermal model: no curing advice", () => {
    const { input, binder } = parsed({ ...plainCemI, curing: {} });
    expect(assessmentCuring(input, binder, dataset, undefined)).toEqual({ warnings: [] });
  });
});

describe("an element the model heats past the boiling point", () => {
  // 500 kg/m³ of the ASTM Type III preset at w/b 0.40 in a 2 m wall (a rich mix in a thick section; invented for the
  // check): the thermodynamic heat drives the core above 100 °C, beyond the data set and the pore water's boiling point.
  const rich = {
    ...plainCemI,
    project: { ...plainCemI.project, element: { type: "wall", thicknessM: 2, coverMm: 50 } },
    binder: { cement: { kind: "preset", presetId: "astm-c150-type-iii" }, supplementaryMaterials: [] },
    mix: { ...plainCemI.mix, waterBinderRatio: 0.4, binderContentKgPerM3: 500 },
    curing: { thermal: { ...thermal, element: { thicknessM: 2, geometry: "symmetric" }, concrete: { binderKgPerM3: 500, waterBinderRatio: 0.4, fcm28MPa: 55 }, supplementaryMaterials: [], durationH: 168 } },
  };

  it("says so in the warnings, and the assessment still runs its DEF scenario at the data set's 100 °C", async () => {
    const { input, binder } = parsed(rich);
    const { curing, warnings } = assessmentCuring(input, binder, dataset, undefined);
    expect(curing!.temperature.maxTemperatureC).toBeGreaterThan(100);
    expect(warnings.map((w) => w.code)).toContain("element_temperature_above_boiling");
    // Before, the temperature scenario refused the computed peak (outside 0–100 °C) and the DEF flag was missing.
    const { runAssessment } = await import("../../lib/service/assess");
    const r = await runAssessment(rich);
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    expect(r.value.scenarioErrors.temperature).toBeUndefined();
    expect(r.value.flags.find((f) => f.id === "delayed-ettringite-formation")?.severity).toBe("warning");
    expect(r.value.warnings.map((w) => w.code)).toContain("element_temperature_above_boiling");
  }, 60_000);
});
