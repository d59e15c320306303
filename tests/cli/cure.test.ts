import { describe, it, expect } from "vitest";
import { spawnSync } from "node:child_process";
import { join } from "node:path";

const root = join(__dirname, "../..");
const fixture = join(root, "tests/curing/fixtures/mass-wall-typical.json");

function cli(args: string[], stdin?: string) {
  return spawnSync("npx", ["tsx", "lib/cli/main.ts", "cure", ...args], { cwd: root, encoding: "utf8", input: stdin, timeout: 60_000 });
}

const validMinimal = {
  element: { thicknessM: 0.5 },
  concrete: { binderKgPerM3: 350, waterBinderRatio: 0.5, fcm28MPa: 38 },
  cement: { phasesMassPercent: { C3S: 58.2, C2S: 15.2, C3A: 8.5, C4AF: 8.8 } },
  placementTemperatureC: 20,
  ambient: { kind: "constant", temperatureC: 15 },
  durationH: 24,
};

describe("cure command", () => {
  it("prints the heat, temperature, maturity, strength, evaporation, curing days and flags as JSON", () => {
    const r = cli(["--input", fixture]);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    for (const key of ["heat", "temperature", "maturity", "strength", "evaporationKgM2H", "minimumCuringDays", "flags", "cautions"]) expect(out).toHaveProperty(key);
    for (const key of ["timesH", "coreC", "surfaceC", "peakCoreC", "peakTimeH", "maxDifferenceC"]) expect(out.temperature).toHaveProperty(key);
    // ACI 305R nomograph example conditions are in the fixture: about 0.8 kg/m²/h (Uno 1998).
    expect(Math.abs(out.evaporationKgM2H - 0.8)).toBeLessThan(0.05);
  });

  it("reads standard input with --input -", () => {
    const r = cli(["--input", "-"], JSON.stringify(validMinimal));
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).temperature.timesH.at(-1)).toBe(24);
  });

  it("exits 2 naming the field and its limit for a thickness out of range", () => {
    const r = cli(["--input", "-"], JSON.stringify({ ...validMinimal, element: { thicknessM: 12 } }));
    expect(r.status).toBe(2);
    expect(r.stderr.trim()).toBe("input: element.thicknessM must be between 0.05 and 10 m");
    expect(r.stderr).not.toMatch(/at .*\.ts/); // no stack trace
  });

  it("exits 2 naming a missing required field", () => {
    const { fcm28MPa: _omit, ...concrete } = validMinimal.concrete;
    const r = cli(["--input", "-"], JSON.stringify({ ...validMinimal, concrete }));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/concrete\.fcm28MPa is required/);
  });

  it("exits 2 for an unknown formwork cover, listing the allowed ones", () => {
    const r = cli(["--input", "-"], JSON.stringify({ ...validMinimal, faces: { a: { cover: "cardboard" } } }));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/faces\.a\.cover must be one of .*plywood-formwork/);
  });

  it("exits 2 for a two-faced element without its second face", () => {
    const r = cli(["--input", "-"], JSON.stringify({ ...validMinimal, element: { thicknessM: 0.5, geometry: "two-faces" } }));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/faces\.b is required/);
  });

  it("exits 2 for a run that would exceed the step cap instead of hanging", () => {
    const r = cli(["--input", "-"], JSON.stringify({ ...validMinimal, durationH: 2000, timeStepMin: 0.5 }));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/timeStepMin/);
  });

  it("exits 2 when no input is given", () => {
    const r = cli([]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--input/);
  });
});

describe("cure command, binder form (thermodynamic heat)", () => {
  const binderForm = {
    element: { thicknessM: 2.0 },
    concrete: { binderKgPerM3: 420, waterBinderRatio: 0.42, fcm28MPa: 45 },
    binder: { cement: { kind: "preset", presetId: "en197-cem-i" }, heatCalculation: { points: 10 } },
    placementTemperatureC: 25,
    ambient: { kind: "constant", temperatureC: 20 },
    faces: { a: { cover: "plywood-formwork" } },
    durationH: 96,
  };

  it("takes the assessment's binder form, uses the thermodynamic heat curve and reports it", () => {
    const r = cli(["--input", "-"], JSON.stringify(binderForm));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.heatModel.label).toMatch(/thermodynamic heat/);
    expect(out.thermodynamicHeat.curve).toHaveLength(10);
    // A thick element (≥ 1.5 m) of a high-cement mix placed at 25 °C peaks above 60 °C (ACI 207.1R mass-concrete
    // behaviour, from memory; issue 6 acceptance).
    expect(out.temperature.peakCoreC).toBeGreaterThan(60);
  });

  it("exits 2 naming the field for a slag binder, which the thermodynamic heat does not cover", () => {
    const r = cli(["--input", "-"], JSON.stringify({ ...binderForm, binder: { cement: { kind: "preset", presetId: "en197-cem-iii-a" } } }));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^input: .*slag.*phase form/);
    expect(r.stderr).not.toMatch(/at .*\.ts/);
  });
});
