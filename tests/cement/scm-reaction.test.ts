import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { scmReactionDegree, equivalentAgeDays } from "../../lib/cement/scm-reaction";
import type { ScmType } from "../../lib/cement/clinker-phases";

const kinetic: ScmType[] = ["slag", "siliceous-fly-ash", "calcareous-fly-ash", "silica-fume", "metakaolin", "natural-pozzolan"];

describe("reaction degree of supplementary cementitious materials", () => {
  it("never decreases with age and stays within 0–1 for every kinetic material (property test)", () => {
    fc.assert(
      fc.property(fc.constantFrom(...kinetic), fc.double({ min: 1 / 24, max: 3652.5, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }), fc.double({ min: 0, max: 80, noNaN: true }), (type, age, factor, temperatureC) => {
        const young = scmReactionDegree(type, age, temperatureC).degree;
        const old = scmReactionDegree(type, age * factor, temperatureC).degree;
        expect(old).toBeGreaterThanOrEqual(young);
        expect(young).toBeGreaterThanOrEqual(0);
        expect(old).toBeLessThanOrEqual(1);
      }),
      { numRuns: 200 },
    );
  });

  it("reacts further at a higher curing temperature at the same age (thermal activation; Lothenbach, Scrivener & Hooton 2011, Cem. Concr. Res. 41, 1244)", () => {
    for (const type of kinetic) {
      expect(scmReactionDegree(type, 28, 40).degree).toBeGreaterThan(scmReactionDegree(type, 28, 20).degree);
    }
  });

  it("orders the materials as reviewed: silica fume and metakaolin ahead of slag, slag ahead of siliceous fly ash at 28 d (Lothenbach, Scrivener & Hooton 2011; Taylor 1997 ch. 9, from memory)", () => {
    const at28 = (type: ScmType) => scmReactionDegree(type, 28, 20).degree;
    expect(at28("silica-fume")).toBeGreaterThan(at28("slag"));
    expect(at28("metakaolin")).toBeGreaterThan(at28("slag"));
    expect(at28("slag")).toBeGreaterThan(at28("siliceous-fly-ash"));
  });

  it("treats a hotter cure as an older one: the degree at 40 °C equals the 20 °C degree at the equivalent age (Freiesleben Hansen & Pedersen 1977)", () => {
    const hot = scmReactionDegree("slag", 10, 40);
    const equivalent = equivalentAgeDays(10, 40, 50000);
    expect(hot.equivalentAgeDays).toBeCloseTo(equivalent, 9);
    expect(hot.degree).toBeCloseTo(scmReactionDegree("slag", equivalent, 20).degree, 12);
    // E = 50 kJ/mol between 20 and 40 °C: factor exp(50000/8.314 (1/293.15 − 1/313.15)) = 3.71 (hand calculation).
    expect(equivalent / 10).toBeCloseTo(3.71, 2);
  });

  it("warns that the model is extrapolated beyond its last data age and outside its temperature range", () => {
    expect(scmReactionDegree("siliceous-fly-ash", 3000, 20).warnings).toContainEqual(expect.objectContaining({ code: "scm_model_extrapolated", reason: "age_beyond_data" }));
    expect(scmReactionDegree("slag", 28, 80).warnings).toContainEqual(expect.objectContaining({ code: "scm_model_extrapolated", reason: "temperature_outside_data", maxC: 60 }));
    expect(scmReactionDegree("slag", 28, 20).warnings).toEqual([]);
  });

  it("states an uncertainty for every material", () => {
    for (const type of kinetic) expect(scmReactionDegree(type, 28, 20).uncertaintyAbsolute).toBeGreaterThan(0);
  });

  it("hands all of the limestone to the equilibrium calculation (Lothenbach et al. 2008, Cem. Concr. Res. 38, 848)", () => {
    const limestone = scmReactionDegree("limestone", 7, 20);
    expect(limestone.model).toBe("equilibrium");
    expect(limestone.degree).toBe(1);
  });
});
