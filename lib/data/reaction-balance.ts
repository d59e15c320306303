import type { Dataset, LoadedSpecies } from "./dataset";

export type ReactionBalance =
  | { ok: true; value: { elementResidual: Record<string, number>; chargeResidual: number } }
  | { ok: false; error: { code: "missing_reference"; speciesId: string; missingId: string; message: string } };

/**
 * Element and charge residuals of a `logK` definition `1 (species) = Σ ν_i (species_i)`:
 *   residual_e = Σ ν_i n_{e,i} − n_{e,species},   chargeResidual = Σ ν_i z_i − z_species.
 * A balanced reaction has every residual zero. Entries without `logK` return zero residuals.
 */
export function reactionBalance(dataset: Dataset, species: LoadedSpecies): ReactionBalance {
  const elementResidual: Record<string, number> = {};
  let chargeResidual = -species.charge;
  for (const [symbol, count] of Object.entries(species.elements)) elementResidual[symbol] = -count;
  if (!species.logK) return { ok: true, value: { elementResidual: {}, chargeResidual: 0 } };
  const byId = new Map(dataset.species.map((s) => [s.id, s]));
  for (const [id, coefficient] of Object.entries(species.logK.reaction)) {
    const reference = byId.get(id);
    if (!reference) {
      return {
        ok: false,
        error: { code: "missing_reference", speciesId: species.id, missingId: id, message: `reaction of "${species.id}" names "${id}", which is not in the data set` },
      };
    }
    for (const [symbol, count] of Object.entries(reference.elements)) {
      elementResidual[symbol] = (elementResidual[symbol] ?? 0) + coefficient * count;
    }
    chargeResidual += coefficient * reference.charge;
  }
  return { ok: true, value: { elementResidual, chargeResidual } };
}
