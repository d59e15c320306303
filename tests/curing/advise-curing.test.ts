import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { adviseCuring } from "../../lib/curing/advise-curing";
import { parseCuringInput, type CuringInput } from "../../lib/schema/curing-input";

const fixture = JSON.parse(readFileSync(join(__dirname, "fixtures/mass-wall-typical.json"), "utf8"));

function input(raw: unknown): CuringInput {
  const parsed = parseCuringInput(raw);
  if (!parsed.ok) throw new Error(parsed.error.message);
  return parsed.value;
}

// A thin precast beam (typical) for the steam and cold-weather cases.
const beam = {
  element: { thicknessM: 0.3, geometry: "symmetric" },
  concrete: { binderKgPerM3: 420, waterBinderRatio: 0.38, fcm28MPa: 58, cementClass: "R" },
  cement: { phasesMassPercent: { C3S: 62, C2S: 12, C3A: 8, C4AF: 9, SO3: 3.2 }, blaineM2PerKg: 450 },
  placementTemperatureC: 20,
  ambient: { kind: "constant", temperatureC: 20 },
  faces: { a: { cover: "steel-formwork" } },
  durationH: 48,
};

describe("curing advisory", () => {
  it("returns every part the issue asks for, with the cautions", () => {
    const a = adviseCuring(input(fixture));
    for (const key of ["heat", "temperature", "maturity", "strength", "evaporationKgM2H", "minimumCuringDays", "flags", "cautions"])
      expect(a).toHaveProperty(key);
    expect(Object.keys(a.temperature)).toEqual(expect.arrayContaining(["timesH", "coreC", "surfaceC", "peakCoreC", "peakTimeH", "maxDifferenceC"]));
    expect(a.temperature.timesH.length).toBe(a.temperature.coreC.length);
    expect(a.cautions.map((c) => c.text).join(" ")).toMatch(/ACI 207/);
    expect(a.cautions.map((c) => c.text).join(" ")).toMatch(/EN 13670/);
    expect(a.cautions.map((c) => c.text).join(" ")).toMatch(/monitoring/);
  });

  it("flags DEF risk and thermal cracking for the 1.5 m high-cement wall, and the Uno evaporation of the ACI 305R example", () => {
    const a = adviseCuring(input(fixture));
    const ids = a.flags.map((f) => f.id);
    expect(a.temperature.peakCoreC).toBeGreaterThan(60); // ACI 207.1R mass-concrete behaviour, from memory
    expect(ids).toContain("thermal-cracking");
    expect(Math.abs(a.evaporationKgM2H! - 0.8)).toBeLessThan(0.05); // ACI 305R nomograph example
    expect(ids).toContain("peak-temperature-def"); // above the common 70 °C (Taylor, Famy & Scrivener 2001)
  });

  it("flags insufficient curing only when the plan is shorter than the computed EN 13670 period", () => {
    const a = adviseCuring(input(fixture));
    expect(a.minimumCuringDays).not.toBeNull();
    const planned = (days: number) =>
      adviseCuring(input({ ...fixture, curing: { curingClass: 2, plannedCuringDays: days } })).flags.map((f) => f.id);
    expect(planned(a.minimumCuringDays! * 1.5)).not.toContain("insufficient-curing");
    expect(planned(a.minimumCuringDays! * 0.5)).toContain("insufficient-curing");
  });

  it("raises the surface of a steam-cured beam to the hold temperature and gains strength faster than at 20 °C", () => {
    const plain = adviseCuring(input({ ...beam, strengthTargets: [{ label: "transfer", strengthMPa: 30 }] }));
    const steam = adviseCuring(
      input({ ...beam, strengthTargets: [{ label: "transfer", strengthMPa: 30 }], steamCuring: { presetH: 3, rampCPerH: 15, holdTemperatureC: 60, holdH: 8, coolingCPerH: 10 } }),
    );
    expect(Math.max(...steam.temperature.surfaceC)).toBeGreaterThan(55);
    expect(steam.strengthTargets[0].surfaceTimeH!).toBeLessThan(plain.strengthTargets[0].surfaceTimeH!);
  });

  it("flags early freezing when a thin exposed slab meets a frost soon after placement", () => {
    const frost = {
      ...beam,
      element: { thicknessM: 0.15, geometry: "symmetric" },
      concrete: { ...beam.concrete, cementClass: "S", fcm28MPa: 30 },
      placementTemperatureC: 5,
      faces: { a: { cover: "exposed", windSpeedMPerS: 5 } },
      ambient: { kind: "series", points: [{ timeH: 0, temperatureC: 4 }, { timeH: 4, temperatureC: -8 }, { timeH: 48, temperatureC: -8 }] },
    };
    const a = adviseCuring(input(frost));
    expect(a.coldWeather.firstSubZeroSurfaceH).not.toBeNull();
    expect(a.flags.map((f) => f.id)).toContain("early-freezing");
  });

  it("uses an entered heat curve in place of the default model", () => {
    const curve = { points: [{ equivalentAgeH: 0, cumulativeHeatJPerG: 0 }, { equivalentAgeH: 24, cumulativeHeatJPerG: 200 }, { equivalentAgeH: 200, cumulativeHeatJPerG: 300 }], referenceTemperatureC: 20, activationEnergyJPerMol: 40000 };
    const a = adviseCuring(input({ ...beam, heatCurve: curve }));
    expect(a.heatModel.label).toBe("entered heat curve");
    expect(a.heatModel.ultimateHeatJPerGBinder).toBeNull();
  });
});
