import { describe, it, expect } from "vitest";
import { binderSystemFromInput } from "../../lib/cement/binder-system";
import { loadDataset } from "../../lib/data/load-dataset";
import { anhydrousReactantResolver } from "../../lib/curing/anhydrous-enthalpy";
import { reactedBinder } from "../../lib/curing/reacted-binder";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const reactant = anhydrousReactantResolver(loaded.value, 298.15);
const mix = { waterBinderRatio: 0.45, binderContentKgPerM3: 380 };
const partly = { mode: "degrees", clinkerDegrees: { alite: 0.7, belite: 0.3, aluminate: 0.8, ferrite: 0.5 } } as const;

/** Σ ν·elements of the reactants, against the bulk composition computed independently by lib/cement. */
function closure(input: Record<string, unknown>): number {
  const s = binderSystemFromInput({ mix, age: partly, ...input });
  if (!s.ok) throw new Error(JSON.stringify(s.error));
  const r = reactedBinder(s.value.binder, s.value.degrees);
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  const found: Record<string, number> = {};
  for (const a of r.value.reactants) for (const [e, n] of Object.entries(reactant(a.id).elements)) found[e] = (found[e] ?? 0) + n * a.mol;
  let worst = 0;
  for (const [e, expected] of Object.entries(s.value.composition.reactedElementsMol)) {
    if (expected === 0 && !found[e]) continue;
    worst = Math.max(worst, Math.abs((found[e] ?? 0) - expected) / Math.abs(expected));
  }
  return worst;
}

describe("reacted anhydrous binder", () => {
  it("holds the same elements as the bulk composition for an oxide analysis, a phase analysis, limestone and silica fume (mass conservation, common practice)", () => {
    expect(closure({ cement: { kind: "preset", presetId: "en197-cem-i" } })).toBeLessThan(1e-12);
    expect(closure({ cement: { kind: "phases", phasesMassPercent: { alite: 60, belite: 15, aluminate: 8, ferrite: 9, gypsum: 5, freeLime: 1, periclase: 1, arcanite: 1 } } })).toBeLessThan(1e-12);
    expect(closure({ cement: { kind: "preset", presetId: "en197-cem-ii-a-ll" } })).toBeLessThan(1e-12);
    expect(closure({
      cement: { kind: "preset", presetId: "en197-cem-i" },
      supplementaryMaterials: [{ type: "silica-fume", massPercentOfBinder: 10, composition: { kind: "preset", presetId: "silica-fume-typical" } }],
      age: { ...partly, scmDegrees: { "silica-fume": 0.6 } },
    })).toBeLessThan(1e-12);
  });

  it("lists a reacted slag as uncovered with its reacted mass, and an unreacted one not at all", () => {
    const slag = (degree: number) => {
      const s = binderSystemFromInput({ mix, cement: { kind: "preset", presetId: "en197-cem-iii-a" }, age: { ...partly, scmDegrees: { slag: degree } } });
      if (!s.ok) throw new Error();
      const r = reactedBinder(s.value.binder, s.value.degrees);
      if (!r.ok) throw new Error();
      return r.value.uncovered;
    };
    expect(slag(0)).toEqual([]);
    const uncovered = slag(0.4);
    expect(uncovered).toHaveLength(1);
    expect(uncovered[0].scmType).toBe("slag");
    expect(uncovered[0].reactedMassG).toBeGreaterThan(0);
  });
});
