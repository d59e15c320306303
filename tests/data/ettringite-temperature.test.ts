import { describe, it, expect } from "vitest";
import { componentTotals, equilibrateSystem } from "../../lib/equilibrium/equilibrate";
import { defaultSuppressedPhases } from "../../lib/data/kinetic-constraints";
import { loadDataset, type Dataset } from "../../lib/data/load-dataset";

/**
 * Ettringite against temperature in a fully hydrated Portland-cement-like composition, w/c 0.5 (issue 3
 * acceptance): published temperature studies find ettringite in Portland pastes at 20 °C but not after curing at
 * 80–90 °C, where sulfate is held in monosulfate, the pore solution and the C-S-H (Lothenbach, Winnefeld, Alder,
 * Wieland & Lunk 2007, Cem. Concr. Res. 37, 483; Paul & Glasser 2000, Cem. Concr. Res. 30, 1869; Taylor, Famy &
 * Scrivener 2001, Cem. Concr. Res. 31, 683; from memory).
 *
 * Composition: the typical CEM I oxides of tests/data/cement-equilibria.test.ts (the ASTM C150 Bogue example with
 * typical MgO and alkalis) with 1 g calcite per 100 g as a minor additional constituent; typical, not a specific
 * cement. Without the calcite this composition holds no ettringite even at 20 °C in the model (monosulfate and
 * C4AH13 take the sulfate and the rest of the Al), so the calcite is part of the preset.
 */
const typicalCementWithMinorCalcite = { CaO: 63.9, SiO2: 20.6, Al2O3: 5.07, Fe2O3: 2.9, SO3: 2.53, MgO: 2.0, Na2O: 0.2, K2O: 0.8, H2O: 50, CaCO3: 1 };
/** The hydrogarnets that the default kinetic constraints enable from 50 °C (lib/data/kinetic-constraints.json). */
const HYDROGARNETS = ["katoite", "siliceous-hydrogarnet"];
const SULFATE_HOSTS_AFM = ["monosulfate-14", "monosulfate-12", "monosulfate-10.5", "kuzel-salt", "fe-monosulfate"];

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const elementsOf = new Map(loaded.value.species.map((s) => [s.id, s.elements]));

function equilibrium(temperatureC: number, extraSuppressed: string[] = [], dataset?: Dataset) {
  const totals = componentTotals(typicalCementWithMinorCalcite, "g");
  if (!totals.ok) throw new Error(totals.error.message);
  const result = equilibrateSystem({ temperatureC, elementTotalsMol: totals.value, suppressedPhases: [...defaultSuppressedPhases(temperatureC), ...extraSuppressed], dataset });
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return result.value;
}
type Result = ReturnType<typeof equilibrium>;
const moles = (r: Result, id: string) => r.phases.find((p) => p.id === id)?.moles ?? 0;
/** Sulfur held by the given solids, mol per 100 g cement. */
const sulfurIn = (r: Result, ids: string[]) => ids.reduce((sum, id) => sum + moles(r, id) * (elementsOf.get(id)?.S ?? 0), 0);
const sulfurInSolution = (r: Result) => (r.solution?.elementMolality.S ?? 0) * (r.solution?.waterKg ?? 0);
const cementTotals = componentTotals(typicalCementWithMinorCalcite, "g");
if (!cementTotals.ok) throw new Error(cementTotals.error.message);
const totalSulfurMol = cementTotals.value.S;

describe("ettringite in a hydrated Portland-cement-like composition, w/c 0.5, at 20 °C", () => {
  const r = equilibrium(20);

  it("is stable (Lothenbach et al. 2007, Cem. Concr. Res. 37, 483; Lothenbach & Winnefeld 2006, Cem. Concr. Res. 36, 209)", () => {
    expect(moles(r, "ettringite")).toBeGreaterThan(0);
  });

  it("accounts for all the sulfate in solids and solution (mass balance, 1e-6 relative)", () => {
    const held = sulfurIn(r, ["ettringite", ...SULFATE_HOSTS_AFM, "gypsum", "anhydrite", "syngenite"]) + sulfurInSolution(r);
    expect(Math.abs(held / totalSulfurMol - 1)).toBeLessThan(1e-6);
  });
});

describe("ettringite in the same composition at 85 °C", () => {
  it("is still stable with the default kinetic constraints: KNOWN DEVIATION", () => {
    // KNOWN DEVIATION. Target: no ettringite at 80–90 °C, sulfate in AFm and solution (Lothenbach et al. 2007;
    // Paul & Glasser 2000; Taylor, Famy & Scrivener 2001; from memory). Reason, from the numbers: from 50 °C the
    // default constraints let siliceous hydrogarnet form, and it is so much more stable than the AFm phases in this
    // data set (saturation index about +1.4 already at 20 °C, where it is suppressed) that it takes all the Al not in
    // ettringite and hydrotalcite; no AFm is left to take sulfate, so ettringite remains the only solid sulfate host
    // until it gives way to anhydrite between 87 and 88 °C. Sulfate uptake by C-S-H, large at high temperature, is not in the
    // data set either. The Cp of Al(OH)4- is not the cause (see below). Pinned: ettringite 6–8 mmol per 100 g
    // cement (7.0 computed), holding about two thirds of the sulfate, next to siliceous hydrogarnet and no AFm.
    const r = equilibrium(85);
    expect(moles(r, "ettringite")).toBeGreaterThan(0.006);
    expect(moles(r, "ettringite")).toBeLessThan(0.008);
    expect(moles(r, "siliceous-hydrogarnet")).toBeGreaterThan(0);
    expect(sulfurIn(r, SULFATE_HOSTS_AFM)).toBe(0);
  });

  it("is not stable, and sulfate is held in monosulfate and the pore solution, when the hydrogarnets stay suppressed as at 20 °C (the published picture: Paul & Glasser 2000; Taylor, Famy & Scrivener 2001; from memory)", () => {
    // Diagnostic, not the default: whether Al-siliceous hydrogarnet should be enabled at 85 °C in pastes heat-cured
    // for hours to days is a kinetic question the data set answers with a single 50 °C switch.
    const r = equilibrium(85, HYDROGARNETS);
    expect(moles(r, "ettringite")).toBe(0);
    const inAfmAndSolution = sulfurIn(r, SULFATE_HOSTS_AFM) + sulfurInSolution(r);
    expect(Math.abs(inAfmAndSolution / totalSulfurMol - 1)).toBeLessThan(1e-6);
    expect(sulfurIn(r, SULFATE_HOSTS_AFM)).toBeGreaterThan(0);
  });

  it("does not depend on the heat capacity of Al(OH)4-: Al is conserved among the solids, so the ion cancels (a property of the mass balance, not a reference value)", () => {
    // Cp of Al(OH)4- raised by 300 J/(mol K), far beyond any published difference from the constant value.
    const species = loaded.value.species.map((s) =>
      s.id === "Al(OH)4-" && s.heatCapacity?.model === "constant" ? { ...s, heatCapacity: { ...s.heatCapacity, cpJPerMolK: s.heatCapacity.cpJPerMolK + 300 } } : s,
    );
    // A new version string: standard-state properties are cached per data-set version.
    const changed = { ...loaded.value, species, version: `${loaded.value.version}-al-hydroxide-cp-plus-300` };
    const base = equilibrium(85);
    const shifted = equilibrium(85, [], changed);
    expect(Math.abs(moles(shifted, "ettringite") / moles(base, "ettringite") - 1)).toBeLessThan(1e-3);
  });
});
