import { describe, it, expect } from "vitest";
import { boilingPointAtOneAtmosphereC, curingModelWarnings } from "../../lib/curing/model-range-warnings";
import { adviseCuring } from "../../lib/curing/advise-curing";
import { parseCuringInput } from "../../lib/schema/curing-input";
import { boilingReference } from "../thermo/water-reference";

const KELVIN_OFFSET = 273.15;

describe("the boiling point the curing warnings use", () => {
  it("is the IAPWS-IF97 boiling temperature at 101.325 kPa, 99.97 °C (python3-iapws fixture)", () => {
    const atmosphere = boilingReference.find((p) => p.pressureBar === 1.01325)!;
    expect(Math.abs(boilingPointAtOneAtmosphereC - (atmosphere.temperatureK - KELVIN_OFFSET))).toBeLessThan(1e-3);
  });
});

describe("curingModelWarnings", () => {
  it("warns at and above the boiling point, naming the temperatures, and not below it", () => {
    expect(curingModelWarnings({ maxTemperatureC: 99.9, maxSourceEquivalentAgeH: 10 })).toEqual([]);
    const [hot] = curingModelWarnings({ maxTemperatureC: 104.26, maxSourceEquivalentAgeH: 10 });
    expect(hot).toMatchObject({ code: "element_temperature_above_boiling", maxTemperatureC: 104.26 });
    expect(hot.message).toContain("104.3 °C");
    expect(hot.message).toContain("99.97 °C");
  });

  it("warns when the element runs past the last age of a sampled heat curve, not for a closed-form curve", () => {
    expect(curingModelWarnings({ maxTemperatureC: 40, maxSourceEquivalentAgeH: 200 })).toEqual([]);
    expect(curingModelWarnings({ maxTemperatureC: 40, maxSourceEquivalentAgeH: 100, heatCurveLastAgeH: 168 })).toEqual([]);
    const [beyond] = curingModelWarnings({ maxTemperatureC: 40, maxSourceEquivalentAgeH: 200, heatCurveLastAgeH: 168 });
    expect(beyond).toMatchObject({ code: "heat_curve_exceeded", maxEquivalentAgeH: 200, lastCurveAgeH: 168 });
  });
});

/** A 0.5 m wall, plywood both sides, 20 °C: the curing input of the command-line tests. */
const wall = {
  element: { thicknessM: 0.5 },
  concrete: { binderKgPerM3: 350, waterBinderRatio: 0.5, fcm28MPa: 38 },
  cement: { phasesMassPercent: { C3S: 58.2, C2S: 15.2, C3A: 8.5, C4AF: 8.8 } },
  placementTemperatureC: 20,
  ambient: { kind: "constant", temperatureC: 20 },
  faces: { a: { cover: "plywood-formwork" } },
  durationH: 72,
};

function advice(raw: Record<string, unknown>) {
  const input = parseCuringInput(raw);
  if (!input.ok) throw new Error(input.error.message);
  return adviseCuring(input.value);
}

describe("the warnings of the curing advice", () => {
  it("are empty for an ordinary wall with the per-phase heats", () => {
    expect(advice(wall).warnings).toEqual([]);
  });

  it("flag a measured curve of 24 h run for 72 h, and not when the run stays within it (6 h)", () => {
    // An invented calorimetry-like curve (demo values): 0, 100, 250 J/g at 0, 12, 24 h.
    const heatCurve = { referenceTemperatureC: 20, activationEnergyJPerMol: 40000, points: [{ equivalentAgeH: 0, cumulativeHeatJPerG: 0 }, { equivalentAgeH: 12, cumulativeHeatJPerG: 100 }, { equivalentAgeH: 24, cumulativeHeatJPerG: 250 }] };
    const long = advice({ ...wall, heatCurve });
    expect(long.warnings.map((w) => w.code)).toEqual(["heat_curve_exceeded"]);
    expect(advice({ ...wall, heatCurve, durationH: 6 }).warnings).toEqual([]);
  });

  it("flag an insulated element heated past the boiling point by an entered curve (adiabatic limit: 500 kg/m³ × 500 J/g over 2400 kg/m³ × 1000 J/(kg K) is a 104 K rise)", () => {
    const heatCurve = { referenceTemperatureC: 20, activationEnergyJPerMol: 40000, points: [{ equivalentAgeH: 0, cumulativeHeatJPerG: 0 }, { equivalentAgeH: 24, cumulativeHeatJPerG: 500 }, { equivalentAgeH: 100000, cumulativeHeatJPerG: 500 }] };
    const hot = advice({
      ...wall,
      element: { thicknessM: 1 },
      concrete: { binderKgPerM3: 500, waterBinderRatio: 0.4, fcm28MPa: 55, densityKgPerM3: 2400, specificHeatJPerKgK: 1000 },
      faces: { a: { cover: "adiabatic" } },
      heatCurve,
    });
    expect(hot.temperature.maxTemperatureC).toBeGreaterThan(100);
    expect(hot.warnings.map((w) => w.code)).toContain("element_temperature_above_boiling");
  });
});
