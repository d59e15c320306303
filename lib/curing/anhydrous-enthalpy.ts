import { z } from "zod";
import data from "../data/binders/anhydrous-enthalpies.json";
import { parseFormulaOrThrow } from "../chem/formula";
import type { Dataset } from "../data/dataset";
import { apparentEnthalpyJPerMol } from "../thermo/standard-gibbs";
import { speciesEnthalpyResolver } from "./species-enthalpy";

const reactantEntry = z.union([
  z.object({
    id: z.string().min(1),
    formula: z.string().min(1),
    enthalpyJPerMol: z.number(),
    heatCapacityJPerMolK: z.number().positive(),
    source: z.string().min(3),
    recalledFromMemory: z.boolean().optional(),
  }),
  z.object({ id: z.string().min(1), datasetId: z.string().min(1), source: z.string().min(3) }),
]);

const anhydrousEnthalpyFile = z.object({
  reactants: z.array(reactantEntry).min(1),
  clinkerSolidSolution: z.object({ MgO: z.string(), Na2O: z.string(), K2O: z.string() }),
  chloride: z.object({ calciumChlorideId: z.string(), limeId: z.string() }),
  supplementaryMaterials: z.object({
    covered: z.array(z.string()),
    normativeIds: z.object({
      SO3WithCaO: z.string(), CO2WithCaO: z.string(), CO2WithMgO: z.string(), SiO2: z.string(), CaO: z.string(),
      MgO: z.string(), Al2O3: z.string(), Fe2O3: z.string(), Na2O: z.string(), K2O: z.string(),
    }),
  }),
});

/** The anhydrous-reactant data file (`lib/data/binders/anhydrous-enthalpies.json`), validated at first use. */
export const anhydrousEnthalpyData = anhydrousEnthalpyFile.parse(data);

export type AnhydrousReactant = { id: string; elements: Record<string, number>; enthalpyJPerMol: number };

/**
 * Apparent enthalpy H(T) (J/mol) and element stoichiometry of the anhydrous reactants at T (K):
 * H(T) = ΔfH°(298.15 K) + Cp°·(T − 298.15 K) for the file's own entries (constant Cp, via
 * `apparentEnthalpyJPerMol`); entries naming a `datasetId` take the thermodynamic data set's value, so that
 * a solid appearing on both sides (calcite, anhydrite, gypsum) cancels exactly.
 */
export function anhydrousReactantResolver(dataset: Dataset, temperatureK: number): (id: string) => AnhydrousReactant {
  const speciesEnthalpy = speciesEnthalpyResolver(dataset, temperatureK);
  const datasetElements = new Map(dataset.species.map((s) => [s.id, s.elements]));
  const cache = new Map<string, AnhydrousReactant>();
  return (id) => {
    const cached = cache.get(id);
    if (cached) return cached;
    const entry = anhydrousEnthalpyData.reactants.find((r) => r.id === id);
    if (!entry) throw new RangeError(`no anhydrous-reactant entry "${id}" in lib/data/binders/anhydrous-enthalpies.json`);
    let reactant: AnhydrousReactant;
    if ("datasetId" in entry) {
      const elements = datasetElements.get(entry.datasetId);
      if (!elements) throw new RangeError(`anhydrous reactant "${id}" names data-set species "${entry.datasetId}", which is not loaded`);
      reactant = { id, elements, enthalpyJPerMol: speciesEnthalpy(entry.datasetId) };
    } else {
      reactant = {
        id,
        elements: parseFormulaOrThrow(entry.formula).elements,
        enthalpyJPerMol: apparentEnthalpyJPerMol(
          // Only ΔfH° and Cp enter H(T); G and S are not used by the enthalpy and are not stored for these entries.
          { standard: { gibbsJPerMol: Number.NaN, entropyJPerMolK: Number.NaN, enthalpyJPerMol: entry.enthalpyJPerMol }, heatCapacity: { model: "constant", cpJPerMolK: entry.heatCapacityJPerMolK } },
          temperatureK,
        ),
      };
    }
    cache.set(id, reactant);
    return reactant;
  };
}
