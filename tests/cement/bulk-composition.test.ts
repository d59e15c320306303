import { describe, it, expect } from "vitest";
import { binderInputSchema, type BinderInputRaw, type OxideAnalysisMassPercent } from "../../lib/schema/binder-input";
import { resolveBinder, type ResolvedBinder } from "../../lib/cement/resolve-binder";
import { bulkComposition, bulkElements, type BulkComposition } from "../../lib/cement/bulk-composition";
import { reactionDegreesForInput } from "../../lib/cement/reaction-degrees";
import { atomicWeightGPerMol, molarMassGPerMol } from "../../lib/chem/atomic-weights";

function resolved(raw: BinderInputRaw): ResolvedBinder {
  const parsed = binderInputSchema.parse(raw);
  const result = resolveBinder(parsed);
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return result.value;
}

function compose(raw: BinderInputRaw): BulkComposition {
  const binder = resolved(raw);
  const result = bulkComposition(binder, reactionDegreesForInput(binder));
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return result.value;
}

const mix = { waterBinderRatio: 0.5, binderContentKgPerM3: 350 };
const partlyReacted = { mode: "degrees", clinkerDegrees: { alite: 0.7, belite: 0.3, aluminate: 0.8, ferrite: 0.5 } } as const;

/** Element moles of an oxide analysis scaled to `massG`, computed directly from the oxide formulas (test's own bookkeeping). */
const oxideFormulas: Record<string, Record<string, number>> = {
  CaO: { Ca: 1, O: 1 }, SiO2: { Si: 1, O: 2 }, Al2O3: { Al: 2, O: 3 }, Fe2O3: { Fe: 2, O: 3 }, MgO: { Mg: 1, O: 1 }, SO3: { S: 1, O: 3 },
  Na2O: { Na: 2, O: 1 }, K2O: { K: 2, O: 1 }, TiO2: { Ti: 1, O: 2 }, P2O5: { P: 2, O: 5 }, Mn2O3: { Mn: 2, O: 3 }, CO2: { C: 1, O: 2 }, H2O: { H: 2, O: 1 },
};
function cementElements(oxides: OxideAnalysisMassPercent, massG: number): Record<string, number> {
  const parts: Record<string, number> = {};
  for (const key of Object.keys(oxideFormulas)) {
    if (key === "H2O") continue;
    parts[key] = (oxides as Record<string, number | undefined>)[key] ?? 0;
  }
  parts.H2O = (oxides.LOI ?? 0) - (oxides.CO2 ?? 0);
  const chlorine = oxides.Cl ?? 0;
  const oxygenForChlorine = (0.5 * chlorine * atomicWeightGPerMol("O")) / atomicWeightGPerMol("Cl");
  const total = Object.values(parts).reduce((a, b) => a + b, 0) + chlorine - oxygenForChlorine;
  const out: Record<string, number> = {};
  for (const [key, massPercent] of Object.entries(parts)) {
    const moles = ((massPercent / total) * massG) / molarMassGPerMol(oxideFormulas[key]);
    for (const [element, count] of Object.entries(oxideFormulas[key])) out[element] = (out[element] ?? 0) + moles * count;
  }
  out.Cl = ((chlorine / total) * massG) / atomicWeightGPerMol("Cl");
  out.O -= out.Cl / 2;
  return out;
}

function totalElements(composition: BulkComposition): Record<string, number> {
  const out: Record<string, number> = { ...composition.reactedElementsMol };
  for (const solid of composition.unreactedSolids) for (const [e, n] of Object.entries(solid.elementsMol)) out[e] = (out[e] ?? 0) + n;
  return out;
}

const valence: Record<string, number> = { Ca: 2, Si: 4, Al: 3, Fe: 3, Mg: 2, S: 6, C: 4, Na: 1, K: 1, Cl: -1, H: 1, O: -2 };

describe("bulk composition of the reacting system", () => {
  it("conserves total mass, binder plus water, to 1e-9 relative for oxide, phase and blended inputs", () => {
    const inputs: BinderInputRaw[] = [
      { cement: { kind: "preset", presetId: "en197-cem-i" }, mix, age: partlyReacted },
      { cement: { kind: "preset", presetId: "en197-cem-v-a" }, mix, age: { mode: "age", ageDays: 28, curingTemperatureC: 20 } },
      { cement: { kind: "preset", presetId: "astm-c595-type-it" }, mix: { ...mix, waterBinderRatio: 0.3 }, age: { mode: "age", ageDays: 3, curingTemperatureC: 35 } },
      {
        cement: { kind: "phases", phasesMassPercent: { alite: 60, belite: 15, aluminate: 8, ferrite: 9, gypsum: 4, calcite: 2, arcanite: 1, periclase: 1 } },
        mix,
        age: partlyReacted,
      },
    ];
    for (const input of inputs) {
      const c = compose(input);
      const inputMassG = 100 + c.mixingWaterMassG;
      expect(Math.abs(c.reactedMassG + c.unreactedMassG - inputMassG) / inputMassG).toBeLessThan(1e-9);
    }
  });

  it("conserves every element of a CEM I analysis, Ti, P and Mn included, between reacted and unreacted parts", () => {
    const binder = resolved({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix, age: partlyReacted });
    if (binder.cement.kind !== "oxides") throw new Error("preset should be an oxide analysis");
    const result = bulkComposition(binder, reactionDegreesForInput(binder));
    if (!result.ok) throw new Error("composition failed");
    const expected = cementElements(binder.cement.oxidesMassPercent, 100);
    expected.H += (2 * 50) / molarMassGPerMol({ H: 2, O: 1 });
    expected.O += 50 / molarMassGPerMol({ H: 2, O: 1 });
    const actual = totalElements(result.value);
    for (const [element, moles] of Object.entries(expected)) {
      if (moles === 0) continue;
      expect(Math.abs((actual[element] ?? 0) - moles) / moles, element).toBeLessThan(1e-9);
    }
  });

  it("conserves every element of a blended cement with slag and fly ash, apart from the fly ash LOI of unstated composition", () => {
    const c = compose({ cement: { kind: "preset", presetId: "en197-cem-v-a" }, mix, age: { mode: "age", ageDays: 90, curingTemperatureC: 20 } });
    const binder = resolved({ cement: { kind: "preset", presetId: "en197-cem-v-a" }, mix, age: { mode: "age", ageDays: 90, curingTemperatureC: 20 } });
    if (binder.cement.kind !== "oxides") throw new Error("preset should be an oxide analysis");
    const expected = cementElements(binder.cement.oxidesMassPercent, binder.cementMassPercentOfBinder);
    let loiG = 0;
    for (const scm of binder.supplementaryMaterials) {
      const o = scm.oxidesMassPercent as Record<string, number | undefined>;
      const oxideSum = Object.keys(oxideFormulas).reduce((sum, key) => sum + (key === "H2O" ? 0 : (o[key] ?? 0)), 0);
      const loiRest = Math.max(0, (o.LOI ?? 0) - (o.CO2 ?? 0));
      loiG += (loiRest / (oxideSum + loiRest)) * scm.massPercentOfBinder;
      for (const key of Object.keys(oxideFormulas)) {
        if (key === "H2O" || !o[key]) continue;
        const moles = (((o[key] ?? 0) / (oxideSum + loiRest)) * scm.massPercentOfBinder) / molarMassGPerMol(oxideFormulas[key]);
        for (const [element, count] of Object.entries(oxideFormulas[key])) expected[element] = (expected[element] ?? 0) + moles * count;
      }
    }
    expected.H += (2 * 50) / molarMassGPerMol({ H: 2, O: 1 });
    expected.O += 50 / molarMassGPerMol({ H: 2, O: 1 });
    const actual = totalElements(c);
    for (const [element, moles] of Object.entries(expected)) {
      if (moles === 0) continue;
      expect(Math.abs((actual[element] ?? 0) - moles) / moles, element).toBeLessThan(1e-9);
    }
    const unassigned = c.unreactedSolids.reduce((sum, s) => sum + s.unassignedLoiMassG, 0);
    expect(unassigned).toBeCloseTo(loiG, 12);
  });

  it("hands the engine an electrically neutral system (oxidation states sum to zero, Cl⁻ replacing ½ O²⁻)", () => {
    for (const presetId of ["en197-cem-i", "en197-cem-iii-b", "astm-c595-type-ip"]) {
      const c = compose({ cement: { kind: "preset", presetId }, mix, age: { mode: "age", ageDays: 28, curingTemperatureC: 20 } });
      let charge = 0;
      let scale = 0;
      for (const element of bulkElements) {
        charge += valence[element] * c.reactedElementsMol[element];
        scale += Math.abs(valence[element] * c.reactedElementsMol[element]);
      }
      expect(Math.abs(charge) / scale).toBeLessThan(1e-12);
    }
  });

  it("dissolves all sulfate and alkali sulfate even before the clinker reacts (Taylor 1997 §7.2: within hours)", () => {
    const c = compose({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix, age: { mode: "degrees", clinkerDegrees: { alite: 0, belite: 0, aluminate: 0, ferrite: 0 } } });
    const binder = resolved({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix, age: partlyReacted });
    if (binder.cement.kind !== "oxides") throw new Error("oxides expected");
    const expectedSulfurMol = cementElements(binder.cement.oxidesMassPercent, 100).S;
    expect(c.reactedElementsMol.S).toBeCloseTo(expectedSulfurMol, 12);
    expect(c.reactedElementsMol.Si).toBe(0);
  });

  it("leaves only the inert minor oxides unreacted when every clinker phase has fully reacted", () => {
    const c = compose({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix, age: { mode: "degrees", clinkerDegrees: { alite: 1, belite: 1, aluminate: 1, ferrite: 1 } } });
    const binder = resolved({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix, age: partlyReacted });
    if (binder.cement.kind !== "oxides") throw new Error("oxides expected");
    const o = binder.cement.oxidesMassPercent;
    const total = 63.5 + 20.3 + 4.8 + 3.0 + 1.8 + 3.1 + 0.25 + 0.85 + 0.25 + 0.15 + 0.05 + 1.6 + 0.05 - (0.5 * 0.05 * atomicWeightGPerMol("O")) / atomicWeightGPerMol("Cl");
    expect(c.unreactedSolids.map((s) => s.id)).toEqual(["clinker-minor-oxides"]);
    expect(c.unreactedMassG).toBeCloseTo((((o.TiO2 ?? 0) + (o.P2O5 ?? 0) + (o.Mn2O3 ?? 0)) / total) * 100, 10);
  });

  it("warns that water is insufficient for full hydration below w/b ≈ 0.42 (Powers & Brownyard 1947, sealed)", () => {
    const dry = compose({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix: { ...mix, waterBinderRatio: 0.35 }, age: partlyReacted });
    expect(dry.warnings).toContainEqual(expect.objectContaining({ code: "water_insufficient_for_full_hydration", minimumSealed: expect.closeTo(0.42, 2) }));
    expect(compose({ cement: { kind: "preset", presetId: "en197-cem-i" }, mix, age: partlyReacted }).warnings.map((w) => w.code)).not.toContain("water_insufficient_for_full_hydration");
  });

  it("carries extrapolation warnings of the SCM models and analysis-total warnings into the result", () => {
    const old = compose({ cement: { kind: "preset", presetId: "en197-cem-ii-b-v" }, mix, age: { mode: "age", ageDays: 3000, curingTemperatureC: 20 } });
    expect(old.warnings).toContainEqual(expect.objectContaining({ code: "scm_model_extrapolated", type: "siliceous-fly-ash" }));
    const short = compose({ cement: { kind: "oxides", oxidesMassPercent: { CaO: 63.9, SiO2: 20.6, Al2O3: 5.07, Fe2O3: 2.9, SO3: 2.53 } }, mix, age: partlyReacted });
    expect(short.warnings).toContainEqual(expect.objectContaining({ code: "analysis_total_out_of_range", material: "cement" }));
  });

  it("returns a typed error rather than negative phases for an analysis too low in lime for Portland clinker", () => {
    const binder = resolved({ cement: { kind: "oxides", oxidesMassPercent: { CaO: 45, SiO2: 35, Al2O3: 10, Fe2O3: 3, SO3: 2, MgO: 5 } }, mix, age: partlyReacted });
    const result = bulkComposition(binder, reactionDegreesForInput(binder));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toMatchObject({ code: "clinker_phase_negative", phase: "alite" });
  });
});
