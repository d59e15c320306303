import { describe, it, expect } from "vitest";
import { cementPhasesForThermalModel, prepareAssessInput } from "../../../components/form/prepare-input";
import { bogueAstmC150 } from "../../../lib/cement/bogue";
import cementPresets from "../../../lib/data/binders/cement-presets.json";

describe("form values completed for the schema", () => {
  it("gives the thermal model the Bogue phases of an oxide analysis (ASTM C150 example: C3S 58.2, C2S 15.2, C3A 8.5, C4AF 8.8)", () => {
    // ASTM C150 Annex A1 equations applied to CaO 63.9, SiO2 20.6, Al2O3 5.07, Fe2O3 2.90, SO3 2.53 (reference values file),
    // without the free-lime/alkali corrections (none given here).
    const phases = cementPhasesForThermalModel({ kind: "oxides", oxidesMassPercent: { CaO: 63.9, SiO2: 20.6, Al2O3: 5.07, Fe2O3: 2.9, SO3: 2.53 } })!;
    expect(phases.C3S).toBeCloseTo(58.2, 0);
    expect(phases.C2S).toBeCloseTo(15.2, 0);
    expect(phases.C3A).toBeCloseTo(8.5, 0);
    expect(phases.C4AF).toBeCloseTo(8.8, 0);
  });

  it("takes a phase analysis as it is (alite → C3S, belite → C2S, aluminate → C3A, ferrite → C4AF)", () => {
    expect(cementPhasesForThermalModel({ kind: "phases", phasesMassPercent: { alite: 60, belite: 15, aluminate: 7, ferrite: 10 } })).toEqual({ C3S: 60, C2S: 15, C3A: 7, C4AF: 10 });
  });

  it("uses the preset's own oxide analysis for a cement type", () => {
    const preset = cementPresets.presets.find((p) => p.id === "en197-cem-i")!;
    const expected = bogueAstmC150(preset.cement.oxidesMassPercent).phasesMassPercent;
    const phases = cementPhasesForThermalModel({ kind: "preset", presetId: "en197-cem-i" })!;
    expect(phases.C3S).toBeCloseTo(expected.C3S, 1);
    expect(phases.C4AF).toBeCloseTo(expected.C4AF + expected.ssFerrite, 1);
    expect(phases.SO3).toBe(preset.cement.oxidesMassPercent.SO3);
    expect(cementPhasesForThermalModel({ kind: "preset", presetId: "no-such-cement" })).toBeUndefined();
  });

  it("copies thickness, binder content, w/b and the blended SCMs into the thermal model and the cover into the exposure", () => {
    const out = prepareAssessInput({
      project: { name: "x", element: { type: "wall", thicknessM: 0.8, coverMm: 40 } },
      binder: { cement: { kind: "preset", presetId: "en197-cem-ii-b-s" }, supplementaryMaterials: [{ type: "siliceous-fly-ash", massPercentOfBinder: 10, composition: { kind: "preset" } }] },
      mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 330, aggregateVolume: { unit: "litresPerM3", value: undefined } },
      exposure: {},
      curing: { thermal: { placementTemperatureC: 15 } },
    });
    expect(out.curing.thermal.element.thicknessM).toBe(0.8);
    expect(out.curing.thermal.concrete).toEqual({ binderKgPerM3: 330, waterBinderRatio: 0.5 });
    expect(out.curing.thermal.supplementaryMaterials).toEqual([
      { type: "slag", massPercentOfBinder: 30 },
      { type: "siliceous-fly-ash", massPercentOfBinder: 10 },
    ]);
    expect(out.exposure.coverMm).toBe(40);
    expect(out.mix.aggregateVolume).toBeUndefined();
    expect(out.binder.supplementaryMaterials[0].composition).toEqual({ kind: "preset", presetId: "siliceous-fly-ash-typical" });
  });

  it("drops wholly empty series points and strength targets and a range with neither bound, keeping half-filled rows for the schema to name", () => {
    const out = prepareAssessInput({
      exposure: { serviceTemperatureC: { minC: undefined, maxC: undefined } },
      curing: {
        thermal: {
          ambient: { kind: "series", points: [{ timeH: 0, temperatureC: 10 }, { timeH: undefined, temperatureC: undefined }, { timeH: 5, temperatureC: undefined }] },
          strengthTargets: [{ label: undefined, strengthMPa: undefined }, { label: "stripping", strengthMPa: 10 }, { label: undefined, strengthMPa: 25 }],
        },
      },
    });
    expect(out.exposure).not.toHaveProperty("serviceTemperatureC");
    expect(out.curing.thermal.ambient.points).toEqual([{ timeH: 0, temperatureC: 10 }, { timeH: 5, temperatureC: undefined }]);
    expect(out.curing.thermal.strengthTargets).toEqual([{ label: "stripping", strengthMPa: 10 }, { label: undefined, strengthMPa: 25 }]);
    expect(prepareAssessInput({ exposure: { serviceTemperatureC: { minC: 3, maxC: undefined } } }).exposure.serviceTemperatureC).toEqual({ minC: 3, maxC: undefined });
  });
});
