import type { SpeciesAtTemperature } from "../equilibrium/types";
import { gasConstantJPerMolK } from "../thermo/physical-constants";

/**
 * Dissolution reactions of solids to the aqueous basis customary for cement hydrates (e.g. Lothenbach et al.
 * 2008, Cem. Concr. Res. 38, 848; Matschei, Lothenbach & Glasser 2007, Cem. Concr. Res. 37, 118):
 *   solid = Σ ν_i (Ca+2, Mg+2, Na+, K+, Al(OH)4-, Fe(OH)4-, SiO(OH)3- or SiO2(aq), SO4-2, CO3-2, Cl-) + ν_OH OH- + ν_w H2O(l),
 * where ν_OH closes the charge and ν_w the hydrogen balance (oxygen then balances by construction; it is checked).
 * log10 Ksp(T) = −ΔrG°(T)/(R T ln10), ΔrG° = Σ ν_i G_i(T) − G_solid(T).
 */

/** Basis species per element; Si per the caller's choice. */
const basisByElement: Record<string, { id: string; charge: number; oxygen: number; hydrogen: number }> = {
  Ca: { id: "Ca+2", charge: 2, oxygen: 0, hydrogen: 0 },
  Mg: { id: "Mg+2", charge: 2, oxygen: 0, hydrogen: 0 },
  Na: { id: "Na+", charge: 1, oxygen: 0, hydrogen: 0 },
  K: { id: "K+", charge: 1, oxygen: 0, hydrogen: 0 },
  Al: { id: "Al(OH)4-", charge: -1, oxygen: 4, hydrogen: 4 },
  Fe: { id: "Fe(OH)4-", charge: -1, oxygen: 4, hydrogen: 4 },
  S: { id: "SO4-2", charge: -2, oxygen: 4, hydrogen: 0 },
  C: { id: "CO3-2", charge: -2, oxygen: 3, hydrogen: 0 },
  Cl: { id: "Cl-", charge: -1, oxygen: 0, hydrogen: 0 },
};

const silicaBases = {
  "SiO(OH)3-": { id: "SiO(OH)3-", charge: -1, oxygen: 4, hydrogen: 3 },
  "SiO2(aq)": { id: "SiO2(aq)", charge: 0, oxygen: 2, hydrogen: 0 },
} as const;

export type SilicaBasis = keyof typeof silicaBases;

export type DissolutionError =
  | { code: "element_without_basis"; element: string; message: string }
  | { code: "oxygen_unbalanced"; oxygenResidual: number; message: string }
  | { code: "species_missing"; speciesId: string; message: string };

export type DissolutionReactionResult = { ok: true; value: Record<string, number> } | { ok: false; error: DissolutionError };

/** Coefficients below this are dropped (stoichiometries are given to 4–6 decimals). */
const negligibleCoefficient = 1e-9;

/**
 * The dissolution reaction of one formula unit, as `{ speciesId: ν }` (products positive; water may be
 * negative). Errors name the element with no basis species or the oxygen residual.
 */
export function dissolutionReaction(
  solid: { elements: Record<string, number>; charge: number },
  silicaBasis: SilicaBasis = "SiO(OH)3-",
): DissolutionReactionResult {
  const reaction: Record<string, number> = {};
  let basisCharge = 0;
  let oxygen = 0;
  let hydrogen = 0;
  for (const [element, count] of Object.entries(solid.elements)) {
    if (element === "H" || element === "O") continue;
    const basis = element === "Si" ? silicaBases[silicaBasis] : basisByElement[element];
    if (!basis) {
      return { ok: false, error: { code: "element_without_basis", element, message: `no aqueous basis species for element ${element}` } };
    }
    reaction[basis.id] = (reaction[basis.id] ?? 0) + count;
    basisCharge += basis.charge * count;
    oxygen += basis.oxygen * count;
    hydrogen += basis.hydrogen * count;
  }
  const hydroxide = basisCharge - solid.charge;
  const water = ((solid.elements.H ?? 0) - hydrogen - hydroxide) / 2;
  const oxygenResidual = oxygen + hydroxide + water - (solid.elements.O ?? 0);
  if (Math.abs(oxygenResidual) > 1e-6) {
    return { ok: false, error: { code: "oxygen_unbalanced", oxygenResidual, message: `oxygen does not balance (residual ${oxygenResidual})` } };
  }
  if (Math.abs(hydroxide) > negligibleCoefficient) reaction["OH-"] = hydroxide;
  if (Math.abs(water) > negligibleCoefficient) reaction["H2O(l)"] = water;
  return { ok: true, value: reaction };
}

export type Log10KResult = { ok: true; value: number } | { ok: false; error: DissolutionError };

/**
 * log10 K = −(Σ ν_i G_i − G_solid)/(R T ln10) of a reaction `solid = Σ ν_i i` from the species' standard
 * Gibbs energies at the temperature T (K) they were computed for (`speciesAtTemperature`).
 */
export function reactionLog10K(
  species: readonly SpeciesAtTemperature[],
  solidId: string,
  reaction: Record<string, number>,
  temperatureK: number,
): Log10KResult {
  const gibbs = new Map(species.map((s) => [s.id, s.gibbsJPerMol]));
  const solidGibbs = gibbs.get(solidId);
  if (solidGibbs === undefined) return { ok: false, error: { code: "species_missing", speciesId: solidId, message: `species ${solidId} is not in the data set` } };
  let productsJPerMol = 0;
  for (const [id, coefficient] of Object.entries(reaction)) {
    const g = gibbs.get(id);
    if (g === undefined) return { ok: false, error: { code: "species_missing", speciesId: id, message: `species ${id} is not in the data set` } };
    productsJPerMol += coefficient * g;
  }
  return { ok: true, value: -(productsJPerMol - solidGibbs) / (gasConstantJPerMolK * temperatureK * Math.LN10) };
}

/** log10 Ksp of a solid for its `dissolutionReaction` at T (K). */
export function dissolutionLog10K(
  species: readonly SpeciesAtTemperature[],
  solidId: string,
  temperatureK: number,
  silicaBasis: SilicaBasis = "SiO(OH)3-",
): Log10KResult & { reaction?: Record<string, number> } {
  const solid = species.find((s) => s.id === solidId);
  if (!solid) return { ok: false, error: { code: "species_missing", speciesId: solidId, message: `species ${solidId} is not in the data set` } };
  const reaction = dissolutionReaction(solid, silicaBasis);
  if (!reaction.ok) return reaction;
  const log10K = reactionLog10K(species, solidId, reaction.value, temperatureK);
  return log10K.ok ? { ...log10K, reaction: reaction.value } : log10K;
}

/** The reaction written out, e.g. `ettringite = 6 Ca+2 + 2 Al(OH)4- + 3 SO4-2 + 4 OH- + 26 H2O(l)`. */
export function formatReaction(solidId: string, reaction: Record<string, number>): string {
  const terms = Object.entries(reaction).map(([id, nu], i) => {
    const magnitude = Number(Math.abs(nu).toFixed(4));
    const sign = nu < 0 ? (i === 0 ? "-" : " - ") : i === 0 ? "" : " + ";
    return `${sign}${magnitude === 1 ? "" : `${magnitude} `}${id}`;
  });
  return `${solidId} = ${terms.join("")}`;
}
