import { describe, it, expect } from "vitest";
import { loadDataset } from "../../lib/data/load-dataset";
import { speciesAtTemperature } from "../../lib/data/species-at-temperature";
import { buildProblem, GAS_CONSTANT_J_PER_MOL_K, type EquilibriumProblem } from "../../lib/equilibrium/problem";
import type { SpeciesAtTemperature } from "../../lib/equilibrium/types";
import { truesdellJonesModel, potassiumHydroxideDominatedParameters } from "../../lib/thermo/truesdell-jones";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const dataset = loaded.value;
/** A lime–gypsum–water system: 0.02 mol Ca(OH)2, 0.005 mol CaSO4, 55.5 mol H2O (an arbitrary test composition). */
const totals = { Ca: 0.025, S: 0.005, O: 0.04 + 0.02 + 55.5, H: 0.04 + 111 };

function problemAt(species: readonly SpeciesAtTemperature[], temperatureK: number): EquilibriumProblem {
  const built = buildProblem({ temperatureK, species: species as SpeciesAtTemperature[], elementTotalsMol: totals, activity: truesdellJonesModel(temperatureK, potassiumHydroxideDominatedParameters) });
  if (!built.ok) throw new Error(JSON.stringify(built.error));
  return built.value;
}

describe("buildProblem's reuse of a problem's structure", () => {
  it("gives every species μ°/RT of its own temperature when the structure comes from another temperature", () => {
    const first = problemAt(speciesAtTemperature(dataset, 298.15), 298.15);
    const species = speciesAtTemperature(dataset, 341.37);
    const second = problemAt(species, 341.37);
    expect(second.temperatureK).toBe(341.37);
    expect(second.stoich).toBe(first.stoich);
    const byId = new Map(species.map((s) => [s.id, s]));
    // μ°/RT by definition, R from CODATA 2018.
    for (const sp of second.species) expect(sp.g, sp.id).toBe(byId.get(sp.id)!.gibbsJPerMol / (GAS_CONSTANT_J_PER_MOL_K * 341.37));
  });

  it("does not reuse the structure of a list that differs in more than its energies", () => {
    const species = speciesAtTemperature(dataset, 298.15);
    const fewer = species.filter((s) => s.id !== "gypsum");
    const problem = problemAt(fewer, 298.15);
    expect(problem.phases.some((p) => p.id === "gypsum")).toBe(false);
    expect(problemAt(species, 298.15).phases.some((p) => p.id === "gypsum")).toBe(true);
  });
});
