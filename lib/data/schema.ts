import { z } from "zod";

/**
 * The form of every thermodynamic data file in `lib/data/`: one file per family, with provenance,
 * a units statement and a source on every entry. Loaded and checked by `load-dataset.ts`.
 *
 * Conventions (state them once, here):
 * - Standard state 298.15 K, 1 bar. Energies in J/mol, entropies and heat capacities in J/(mol·K).
 *   Data published in calories are converted with the thermochemical calorie, 4.184 J, by whoever
 *   writes the file (say so in `note`), except the HKF coefficients, which keep their published
 *   calorie units and say so in their field names.
 * - Aqueous species: molality scale, hypothetical 1 mol/kg ideal solution; conventional ΔfG°(H+) = 0,
 *   S°(H+) = 0, Cp°(H+) = 0 at every temperature.
 * - Gases: ideal gas at 1 bar.
 * - `gibbsJPerMol` and `enthalpyJPerMol` are the standard Gibbs energy and enthalpy of formation from
 *   the elements; `entropyJPerMolK` is the third-law entropy.
 */

/** Cp(T) = a + b·T + c·T⁻² + d·T⁻⁰·⁵ (Maier & Kelley 1932; Haas & Fisher 1976), T in K. */
export const haasFisherHeatCapacity = z.object({
  model: z.literal("haas-fisher"),
  aJPerMolK: z.number(),
  bJPerMolK2: z.number(),
  cJKPerMol: z.number(),
  dJPerMolK05: z.number(),
});

/**
 * Revised HKF model (Tanger & Helgeson 1988; Shock et al. 1992) at the 1 bar reference pressure, where
 * the a1–a4 volume terms vanish and the solvent g-function is zero below 100 °C, so only c1, c2 and the
 * Born coefficient ω remain. Units are the published ones (calories).
 */
export const hkfHeatCapacity = z.object({
  model: z.literal("hkf-1bar"),
  c1CalPerMolK: z.number(),
  c2CalKPerMol: z.number(),
  omegaCalPerMol: z.number(),
});

/** A constant heat capacity, for entries whose source gives only Cp°(298 K). */
export const constantHeatCapacity = z.object({
  model: z.literal("constant"),
  cpJPerMolK: z.number(),
});

export const heatCapacity = z.discriminatedUnion("model", [haasFisherHeatCapacity, hkfHeatCapacity, constantHeatCapacity]);

/** Formation properties at 298.15 K, 1 bar. */
export const standardFormation = z.object({
  gibbsJPerMol: z.number(),
  enthalpyJPerMol: z.number().optional(),
  entropyJPerMolK: z.number(),
});

/**
 * A species defined by a published reaction instead of formation data:
 * `1 (this species) = Σ ν_i (species_i)`, products positive, reactants negative, species by id,
 * K = Π a_i^ν_i. Temperature dependence by van 't Hoff with constant ΔrH° and ΔrCp°.
 */
export const reactionDefinition = z.object({
  reaction: z.record(z.string(), z.number()),
  log10K25: z.number(),
  deltaHJPerMol: z.number(),
  deltaCpJPerMolK: z.number().default(0),
});

export const phaseKind = z.enum(["aqueous", "gas", "solid"]);

export const speciesEntry = z
  .object({
    /** Aqueous and gas species: the formula as written (`Ca+2`, `CO2(aq)`, `CO2(g)`); solids: lowercase mineral or descriptive id. */
    id: z.string().min(1),
    formula: z.string().min(1),
    name: z.string().optional(),
    phase: phaseKind,
    /** For an end-member of a solid solution: the id of that solution (declared in `solutions`). */
    solution: z.string().optional(),
    standard: standardFormation.optional(),
    heatCapacity: heatCapacity.optional(),
    logK: reactionDefinition.optional(),
    molarVolumeCm3PerMol: z.number().positive().optional(),
    /** Citation: author(s), year, journal volume and page, or table. */
    source: z.string().min(3),
    /** One standard uncertainty of log10 of the entry's formation or dissolution constant at 25 °C. */
    uncertaintyLog10K: z.number().nonnegative().optional(),
    /** True where a value was recalled rather than copied from the cited source. */
    recalledFromMemory: z.boolean().optional(),
    note: z.string().optional(),
  })
  .refine((e) => (e.standard && e.heatCapacity) || e.logK, {
    message: "an entry needs either standard formation data with a heat capacity, or a logK reaction",
  })
  .refine((e) => e.phase !== "solid" || e.molarVolumeCm3PerMol !== undefined, {
    message: "every solid needs molarVolumeCm3PerMol",
  });

export const solutionEntry = z.object({
  id: z.string().min(1),
  name: z.string(),
  /** Mixing model; only ideal mixing on one site is implemented by the engine. */
  model: z.literal("ideal"),
  source: z.string().min(3),
  note: z.string().optional(),
});

export const dataFile = z.object({
  family: z.string().min(1),
  title: z.string(),
  /** Where the values came from, how the file was made, and when. */
  provenance: z.object({
    sources: z.array(z.string()).min(1),
    generatedBy: z.string(),
    date: z.string(),
  }),
  units: z.object({
    energy: z.literal("J/mol"),
    entropy: z.literal("J/(mol K)"),
    heatCapacity: z.literal("J/(mol K)"),
    molarVolume: z.literal("cm3/mol"),
  }),
  /** Default uncertainty (log10 K units) for entries that do not state one, with its justification. */
  defaultUncertaintyLog10K: z.object({ value: z.number().nonnegative(), basis: z.string() }),
  species: z.array(speciesEntry),
  solutions: z.array(solutionEntry).default([]),
});

export type HeatCapacity = z.infer<typeof heatCapacity>;
export type SpeciesEntry = z.infer<typeof speciesEntry>;
export type SolutionEntry = z.infer<typeof solutionEntry>;
export type DataFile = z.infer<typeof dataFile>;
