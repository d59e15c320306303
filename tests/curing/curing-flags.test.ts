import { describe, it, expect } from "vitest";
import { curingFlags, type CuringFlagFacts } from "../../lib/curing/curing-flags";

const quiet: CuringFlagFacts = {
  peakCoreC: 40,
  peakTimeH: 20,
  maxTemperatureC: 40,
  maxDifferenceC: 8,
  maxDifferenceTimeH: 30,
  evaporationKgPerM2H: 0.3,
  lowWaterBinderOrSilicaFume: false,
  firstSubZeroSurfaceH: null,
  strengthAtFirstSubZeroMPa: null,
  freezingStrengthMPa: 5,
  plannedCuringDays: 7,
  minimumCuringDays: 2,
  curingClass: 2,
};
const ids = (f: CuringFlagFacts) => curingFlags(f).map((x) => x.id);

describe("curing risk flags", () => {
  it("raises nothing for a mild case", () => {
    expect(curingFlags(quiet)).toEqual([]);
  });

  it("warns of DEF above 70 °C (Taylor, Famy & Scrivener 2001) and above a lower mix-specific ettringite limit", () => {
    expect(curingFlags({ ...quiet, peakCoreC: 72, maxTemperatureC: 72 })[0]).toMatchObject({ id: "peak-temperature-def", severity: "warning" });
    expect(curingFlags({ ...quiet, peakCoreC: 67, maxTemperatureC: 67 })[0]).toMatchObject({ id: "peak-temperature-def", severity: "caution" });
    expect(ids({ ...quiet, peakCoreC: 62, maxTemperatureC: 62, ettringiteStabilityTemperatureC: 60 })).toContain("peak-temperature-def");
  });

  it("flags thermal cracking above the 20 °C rule of thumb (common practice) or a user limit", () => {
    expect(ids({ ...quiet, maxDifferenceC: 21 })).toContain("thermal-cracking");
    expect(ids({ ...quiet, maxDifferenceC: 16, differenceLimitC: 15 })).toContain("thermal-cracking");
  });

  it("flags plastic shrinkage above 1.0 kg/m²/h (ACI 305R), or 0.5 for low-w/cm mixes (ACI 305R/308R)", () => {
    expect(ids({ ...quiet, evaporationKgPerM2H: 1.2 })).toContain("plastic-shrinkage");
    expect(ids({ ...quiet, evaporationKgPerM2H: 0.7 })).not.toContain("plastic-shrinkage");
    expect(ids({ ...quiet, evaporationKgPerM2H: 0.7, lowWaterBinderOrSilicaFume: true })).toContain("plastic-shrinkage");
  });

  it("flags early freezing when the surface freezes below the required strength", () => {
    expect(ids({ ...quiet, firstSubZeroSurfaceH: 10, strengthAtFirstSubZeroMPa: 2 })).toContain("early-freezing");
    expect(ids({ ...quiet, firstSubZeroSurfaceH: 60, strengthAtFirstSubZeroMPa: 12 })).not.toContain("early-freezing");
  });

  it("flags insufficient curing when the plan is shorter than the computed minimum", () => {
    expect(ids({ ...quiet, plannedCuringDays: 1 })).toContain("insufficient-curing");
    expect(ids({ ...quiet, minimumCuringDays: null })).toContain("insufficient-curing");
  });

  it("gives every flag the shared shape: id, severity, title, explanation, basis and actions", () => {
    const all = curingFlags({ ...quiet, peakCoreC: 75, maxTemperatureC: 75, maxDifferenceC: 30, evaporationKgPerM2H: 2, firstSubZeroSurfaceH: 5, strengthAtFirstSubZeroMPa: 1, plannedCuringDays: 0.5 });
    expect(all.map((f) => f.id)).toEqual(["peak-temperature-def", "thermal-cracking", "plastic-shrinkage", "early-freezing", "insufficient-curing"]);
    for (const f of all) {
      expect(f.title.length && f.explanation.length && f.basis.length).toBeTruthy();
      expect(f.actions.length).toBeGreaterThan(0);
    }
  });
});
