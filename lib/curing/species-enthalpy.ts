import type { Dataset, LoadedSpecies } from "../data/dataset";
import { referenceTemperatureK } from "../thermo/physical-constants";
import { apparentEnthalpyJPerMol } from "../thermo/standard-gibbs";

/**
 * Apparent standard enthalpy of formation H(T) at 1 bar (J/mol) of every entry of the thermodynamic data set,
 * consistent with the Gibbs energies the engine uses (`lib/data/species-at-temperature.ts`):
 * - entries with formation data: H(T) = ΔfH°(Tr) + ∫Tr→T Cp dT (`apparentEnthalpyJPerMol`, Benson–Helgeson
 *   convention; Helgeson et al. 1978, Am. J. Sci. 278-A);
 * - entries defined by a reaction 1 (this) = Σ ν_i (i) with van 't Hoff ΔrH° and ΔrCp°:
 *   ΔrH(T) = ΔrH° + ΔrCp°(T − Tr) = Σ ν_i H_i(T) − H_this(T), so H_this(T) = Σ ν_i H_i(T) − ΔrH(T)
 *   (the temperature derivative of the integrated van 't Hoff equation; Anderson & Crerar 1993, ch. 11).
 * Formation data take precedence over a reaction, as in the engine. Standard-state (infinite dilution) values:
 * excess enthalpies of the non-ideal pore solution are not included.
 */
export type SpeciesEnthalpyError =
  | { code: "missing_species"; speciesId: string; message: string }
  | { code: "missing_enthalpy"; speciesId: string; message: string }
  | { code: "reaction_cycle"; speciesId: string; message: string };

export class SpeciesEnthalpyFailure extends Error {
  constructor(readonly detail: SpeciesEnthalpyError) {
    super(detail.message);
    this.name = "SpeciesEnthalpyFailure";
  }
}

/** A resolver of H(T) by species id for one data set and one temperature (K), memoised. Throws SpeciesEnthalpyFailure. */
export function speciesEnthalpyResolver(dataset: Dataset, temperatureK: number): (speciesId: string) => number {
  const byId = new Map<string, LoadedSpecies>(dataset.species.map((s) => [s.id, s]));
  const known = new Map<string, number>();
  const visiting = new Set<string>();
  const resolve = (id: string): number => {
    const cached = known.get(id);
    if (cached !== undefined) return cached;
    const species = byId.get(id);
    if (!species) throw new SpeciesEnthalpyFailure({ code: "missing_species", speciesId: id, message: `species "${id}" is not in the thermodynamic data set` });
    let enthalpyJPerMol: number;
    if (species.standard && species.heatCapacity) {
      if (species.standard.enthalpyJPerMol === undefined)
        throw new SpeciesEnthalpyFailure({ code: "missing_enthalpy", speciesId: id, message: `species "${id}" has no standard enthalpy of formation in the data set` });
      enthalpyJPerMol = apparentEnthalpyJPerMol({ standard: species.standard, heatCapacity: species.heatCapacity }, temperatureK);
    } else if (species.logK) {
      if (visiting.has(id)) throw new SpeciesEnthalpyFailure({ code: "reaction_cycle", speciesId: id, message: `the reaction definitions of "${id}" form a cycle` });
      visiting.add(id);
      let sumJPerMol = 0;
      for (const [otherId, coefficient] of Object.entries(species.logK.reaction)) sumJPerMol += coefficient * resolve(otherId);
      visiting.delete(id);
      const reactionEnthalpyJPerMol = species.logK.deltaHJPerMol + species.logK.deltaCpJPerMolK * (temperatureK - referenceTemperatureK);
      enthalpyJPerMol = sumJPerMol - reactionEnthalpyJPerMol;
    } else {
      throw new SpeciesEnthalpyFailure({ code: "missing_enthalpy", speciesId: id, message: `species "${id}" has neither formation data nor a reaction` });
    }
    known.set(id, enthalpyJPerMol);
    return enthalpyJPerMol;
  };
  return resolve;
}
