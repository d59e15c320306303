import { describe, expect, it } from "vitest";
import { loadDataset } from "../../lib/data/load-dataset";
import { runAssessment } from "../../lib/service/assess";

const input = {
  project: { name: "Invented test wall", element: { type: "wall", thicknessM: 0.3, coverMm: 35 } },
  binder: { cement: { kind: "preset", presetId: "en197-cem-i" } },
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 340 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  exposure: { sulfateMgPerL: 1200, sulfateCation: "Na", relativeHumidityPercent: 70, wetting: "wet-dry", coverMm: 35 },
  options: { sweepPoints: 8 },
};

describe("runAssessment", () => {
  it("returns the documented keys, flags by severity and the cautions", async () => {
    const r = await runAssessment(input);
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    for (const key of ["assemblage", "scenarios", "exposureClasses", "flags", "cautions"]) expect(r.value).toHaveProperty(key);
    // Sulfate and humidity are given: every scenario that applies has run.
    for (const key of ["sulfate", "carbonation", "temperature", "thaumasite", "drying"]) expect(r.value.scenarios).toHaveProperty(key);
    expect(r.value.cautions.join(" ")).toMatch(/guide/);
    const rank = { warning: 0, caution: 1, info: 2 } as const;
    const order = r.value.flags.map((f) => rank[f.severity]);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
    expect(r.value.versions.dataset).toMatch(/^[0-9a-f]{16}$/);
  });

  it("uses one cover, the exposure's before the element's, for the carbonation depth and its flag", async () => {
    const r = await runAssessment({ ...input, project: { ...input.project, element: { ...input.project.element, coverMm: 60 } }, exposure: { ...input.exposure, coverMm: 20 } });
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    const depth = r.value.scenarios.carbonation!.depth!;
    // Papadakis: x = k √t, so the front reaches 20 mm at (20/k)² years.
    expect(depth.timeToCoverYears).toBeCloseTo((20 / depth.coefficientMmPerSqrtYear) ** 2, 6);
  });

  it("rejects bad input with field paths", async () => {
    const r = await runAssessment({ ...input, mix: { waterBinderRatio: 0.1, binderContentKgPerM3: 340 } });
    expect(r.ok).toBe(false);
    if (!r.ok && r.error.kind === "validation") expect(r.error.issues[0].path).toBe("mix.waterBinderRatio");
  });

  it("tells a binder the model cannot build as a field error in words, not as a dump of the internal error", async () => {
    const blended = await runAssessment({
      ...input,
      binder: { cement: { kind: "preset", presetId: "en197-cem-iii-a" }, supplementaryMaterials: [{ type: "limestone", massPercentOfBinder: 10, composition: { kind: "preset", presetId: "limestone-typical" } }] },
    });
    const slagAsCement = await runAssessment({ ...input, binder: { cement: { kind: "oxides", oxidesMassPercent: { CaO: 42, SiO2: 35, Al2O3: 11, Fe2O3: 0.5, MgO: 8, SO3: 1 } } } });
    for (const [r, path] of [[blended, "binder.supplementaryMaterials"], [slagAsCement, "binder.cement.oxidesMassPercent"]] as const) {
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      expect(r.error.kind).toBe("validation");
      if (r.error.kind !== "validation") continue;
      expect(r.error.issues).toHaveLength(1);
      expect(r.error.issues[0].path).toBe(path);
      expect(r.error.issues[0].message).not.toMatch(/[{}"]/);
    }
  });

  it("gives identical Monte Carlo results for the same seed", async () => {
    const mc = { ...input, options: { sweepPoints: 8, monteCarlo: { samples: 10, seed: 7 } } };
    const [a, b] = await Promise.all([runAssessment(mc), runAssessment(mc)]);
    if (!a.ok || !b.ok) throw new Error();
    expect(a.value.uncertainty).toEqual(b.value.uncertainty);
    expect(a.value.flags.map((f) => f.robustness)).toEqual(b.value.flags.map((f) => f.robustness));
  }, 240_000);

  // The samples do not follow the deterministic path (lib/service/assess.ts): each starts every equilibrium from a
  // reference run at the same point, solves drying at the service conditions only, and finds the ettringite and
  // thaumasite stability temperatures by root finding from the reference's instead of on a grid. Like is still compared
  // with like: the base paste is the same system (its volumes must agree to 1e-10 cm³), and every flag the
  // deterministic run raises must fire in every sample; a path that reached another minimum or another limit would fail.
  it("makes every sample equal the deterministic result when the uncertainties are zero", async () => {
    const dataset = loadDataset();
    if (!dataset.ok) throw new Error();
    const certain = { ...dataset.value, species: dataset.value.species.map((s) => ({ ...s, uncertaintyLog10K: 0 })), version: `${dataset.value.version}-certain` };
    const r = await runAssessment({ ...input, options: { sweepPoints: 8, monteCarlo: { samples: 10, seed: 1 } } }, { dataset: certain });
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    for (const [id, v] of Object.entries(r.value.assemblage.paste.volumes)) {
      const u = r.value.uncertainty!.phaseVolumesCm3[id];
      expect(u.p5, id).toBeCloseTo(v, 10);
      expect(u.p95, id).toBeCloseTo(v, 10);
    }
    for (const flag of r.value.flags.filter((f) => f.severity !== "info")) expect(flag.robustness?.firedFraction).toBe(1);
  }, 240_000);
});
