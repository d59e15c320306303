import { describe, expect, it } from "vitest";
import { POST as cure } from "../../app/api/v1/cure/route";
import { POST as equilibrateRoute } from "../../app/api/v1/equilibrate/route";
import { POST as hydrate } from "../../app/api/v1/hydrate/route";
import { equilibrate } from "../../lib/equilibrium/equilibrate";
import { context, json, jsonRequest } from "./request";

const portlanditeSystem = { temperatureC: 25, components: { H2O: 55.508, "Ca(OH)2": 0.1 } };

describe("POST /api/v1/equilibrate", () => {
  it("answers 200 with the engine's result (same pH as the library call) and the versions, without the solver state", async () => {
    const response = await equilibrateRoute(jsonRequest("/equilibrate", "POST", portlanditeSystem), context());
    expect(response.status).toBe(200);
    const body = await json(response);
    const direct = equilibrate(portlanditeSystem);
    expect(direct.ok).toBe(true);
    if (direct.ok) expect(body.pH).toBeCloseTo(direct.value.pH!, 10);
    expect(body).not.toHaveProperty("state");
    expect(body.versions).toMatchObject({ engine: expect.any(String), dataset: expect.any(String) });
  });

  it("answers 422 naming every invalid field with its limit", async () => {
    const response = await equilibrateRoute(jsonRequest("/equilibrate", "POST", { temperatureC: 150, components: {} }), context());
    expect(response.status).toBe(422);
    const body = await json(response);
    expect(body.error).toBe("validation");
    const issues = body.issues as { path: string; message: string }[];
    expect(issues).toContainEqual({ path: "temperatureC", message: "temperatureC must be between 0 and 100 °C" });
    expect(issues.some((i) => i.path === "components")).toBe(true);
  });

  it("answers 422 naming the component when a formula does not parse", async () => {
    const response = await equilibrateRoute(jsonRequest("/equilibrate", "POST", { temperatureC: 25, components: { "Xq(OH": 1 } }), context());
    expect(response.status).toBe(422);
    const body = await json(response);
    expect((body.issues as { path: string }[])[0].path).toBe("components.Xq(OH");
  });

  it("answers 400 for a body that is not JSON", async () => {
    const response = await equilibrateRoute(jsonRequest("/equilibrate", "POST", "{ not json"), context());
    expect(response.status).toBe(400);
    expect((await json(response)).error).toBe("invalid_json");
  });

  it("answers 413 for a body above 256 kB", async () => {
    const big = { ...portlanditeSystem, suppressedPhases: Array.from({ length: 30_000 }, (_, i) => `phase-${i}`) };
    const response = await equilibrateRoute(jsonRequest("/equilibrate", "POST", big), context());
    expect(response.status).toBe(413);
    expect(await json(response)).toMatchObject({ error: "payload_too_large", limitBytes: 262144 });
  });
});

describe("POST /api/v1/cure", () => {
  const validMinimal = {
    element: { thicknessM: 0.5 },
    concrete: { binderKgPerM3: 350, waterBinderRatio: 0.5, fcm28MPa: 38 },
    cement: { phasesMassPercent: { C3S: 58.2, C2S: 15.2, C3A: 8.5, C4AF: 8.8 } },
    placementTemperatureC: 20,
    ambient: { kind: "constant", temperatureC: 15 },
    durationH: 24,
  };

  it("answers 200 with the temperature history, flags and cautions", async () => {
    const response = await cure(jsonRequest("/cure", "POST", validMinimal), context());
    expect(response.status).toBe(200);
    const body = await json(response);
    const temperature = body.temperature as { peakCoreC: number; timesH: number[] };
    // The core of a hydrating element warms above its placement temperature (common practice).
    expect(temperature.peakCoreC).toBeGreaterThan(20);
    expect(Array.isArray(body.flags) && Array.isArray(body.cautions)).toBe(true);
  });

  it("answers 422 naming the thickness and its limit", async () => {
    const response = await cure(jsonRequest("/cure", "POST", { ...validMinimal, element: { thicknessM: 12 } }), context());
    expect(response.status).toBe(422);
    const issues = (await json(response)).issues as { path: string; message: string }[];
    expect(issues[0].path).toBe("element.thicknessM");
    expect(issues[0].message).toMatch(/between 0.05 and 10/);
  });
});

describe("POST /api/v1/cure with the binder given as the assessment gives it", () => {
  const binderForm = {
    element: { thicknessM: 0.5 },
    concrete: { binderKgPerM3: 350, waterBinderRatio: 0.5, fcm28MPa: 38 },
    binder: { cement: { kind: "preset", presetId: "en197-cem-i" } },
    placementTemperatureC: 20,
    ambient: { kind: "constant", temperatureC: 15 },
    durationH: 24,
  };

  it("answers 200 with the thermodynamic heat of that binder driving the element temperature, as the command line does", async () => {
    const response = await cure(jsonRequest("/cure", "POST", binderForm), context());
    expect(response.status).toBe(200);
    const body = await json(response);
    expect((body.heatModel as { source: string }).source).toBe("thermodynamic");
    const section = body.thermodynamicHeat as { curve: { cumulativeHeatJPerG: number }[] };
    expect(section.curve.length).toBeGreaterThan(2);
    expect(section.curve[section.curve.length - 1].cumulativeHeatJPerG).toBeGreaterThan(300);
  });

  it("answers 422 naming the binder field, in the input's own terms", async () => {
    const response = await cure(jsonRequest("/cure", "POST", { ...binderForm, concrete: { ...binderForm.concrete, waterBinderRatio: 0.1 } }), context());
    expect(response.status).toBe(422);
    const issues = (await json(response)).issues as { path: string; message: string }[];
    expect(issues[0].path).toBe("concrete.waterBinderRatio");
    const both = await cure(jsonRequest("/cure", "POST", { ...binderForm, cement: { phasesMassPercent: { C3S: 58, C2S: 15, C3A: 8, C4AF: 9 } } }), context());
    expect(both.status).toBe(422);
    expect(((await json(both)).issues as { path: string }[])[0].path).toBe("cement");
  });
});

describe("POST /api/v1/hydrate", () => {
  const input = {
    cement: { kind: "preset", presetId: "en197-cem-i" },
    mix: { waterBinderRatio: 0.45, binderContentKgPerM3: 360 },
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  };

  it("answers 200 with the assemblage volumes and the data-set version", async () => {
    const response = await hydrate(jsonRequest("/hydrate", "POST", input), context());
    expect(response.status).toBe(200);
    const body = await json(response);
    expect((body.volumes as Record<string, number>)["pore-solution"]).toBeGreaterThan(0);
    expect(body.versions).toMatchObject({ dataset: expect.any(String) });
  });

  it("answers 422 with the w/b limit", async () => {
    const response = await hydrate(jsonRequest("/hydrate", "POST", { ...input, mix: { waterBinderRatio: 0.95, binderContentKgPerM3: 360 } }), context());
    expect(response.status).toBe(422);
    const issues = (await json(response)).issues as { message: string }[];
    expect(issues.some((i) => i.message.includes("between 0.25 and 0.80"))).toBe(true);
  });
});
