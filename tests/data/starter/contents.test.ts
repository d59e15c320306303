import { describe, it, expect } from "vitest";
import { loadDataset } from "../../../lib/data/load-dataset";
import type { LoadedSpecies } from "../../../lib/data/dataset";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
// Only the starter files: other families (lib/data/cement/) have their own content tests.
const species = loaded.value.species.filter((s) => s.family.startsWith("starter-"));
const byId = new Map(species.map((s) => [s.id, s]));

function haasFisherCpJPerMolK(entry: LoadedSpecies, temperatureK: number): number {
  const cp = entry.heatCapacity;
  if (!cp || cp.model !== "haas-fisher") throw new Error(`${entry.id} has no haas-fisher heat capacity`);
  // Cp = a + bT + c/T² + d/√T (Haas & Fisher 1976, Am. J. Sci. 276, 525).
  return cp.aJPerMolK + cp.bJPerMolK2 * temperatureK + cp.cJKPerMol / temperatureK ** 2 + cp.dJPerMolK05 / Math.sqrt(temperatureK);
}

const haasFisher = species.filter((s) => s.heatCapacity?.model === "haas-fisher");

describe("starter data set", () => {
  it("holds the species the starter system needs", () => {
    const needed = ["H2O(l)", "H+", "OH-", "Ca+2", "CaOH+", "Na+", "K+", "Cl-", "SO4-2", "HSO4-", "CaSO4(aq)", "CO2(aq)", "HCO3-", "CO3-2", "CaCO3(aq)", "CaHCO3+", "CO2(g)", "H2O(g)", "portlandite", "gypsum", "anhydrite", "calcite"];
    for (const id of needed) expect(byId.has(id), id).toBe(true);
  });

  it.each(haasFisher.map((s) => [s.id, s] as const))("gives %s a positive heat capacity from 0 to 100 °C", (_id, entry) => {
    for (let temperatureK = 273.15; temperatureK <= 373.15; temperatureK += 1) {
      expect(haasFisherCpJPerMolK(entry, temperatureK)).toBeGreaterThan(0);
    }
  });

  // Cp°(298.15 K) tabulated independently of the Cp(T) equations in the data: CODATA Key Values (Cox et al.
  // 1989) for H2O(l), H2O(g), CO2(g); Robie & Hemingway (1995) for calcite; NBS tables (Wagman et al. 1982) for
  // gypsum and anhydrite. All from memory.
  it.each([
    ["H2O(l)", 75.29],
    ["H2O(g)", 33.58],
    ["CO2(g)", 37.13],
    ["calcite", 83.47],
    ["gypsum", 186.02],
    ["anhydrite", 99.66],
  ])("matches the tabulated Cp°(298.15 K) of %s within 2 %%", (id, tabulatedJPerMolK) => {
    const entry = byId.get(id)!;
    expect(Math.abs(haasFisherCpJPerMolK(entry, 298.15) / tabulatedJPerMolK - 1)).toBeLessThan(0.02);
  });

  it("flags every entry typed from memory", () => {
    // Every starter value was recalled; only the H+ convention (zero by definition) needs no flag.
    for (const entry of species.filter((s) => s.id !== "H+")) expect(entry.recalledFromMemory, entry.id).toBe(true);
  });

  it("gives every solid a molar volume near its formula mass over a mineral density of 2–3 g/cm3", () => {
    // Densities of calcium hydroxide, sulfate and carbonate minerals lie between 2.2 and 3.0 g/cm3 (common practice).
    for (const entry of species.filter((s) => s.phase === "solid")) {
      const densityGPerCm3 = entry.molarMassGPerMol / entry.molarVolumeCm3PerMol!;
      expect(densityGPerCm3, entry.id).toBeGreaterThan(2.1);
      expect(densityGPerCm3, entry.id).toBeLessThan(3.0);
    }
  });
});
