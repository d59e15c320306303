/**
 * What the equilibrium engine consumes and returns. The engine knows species, phases and elements;
 * it knows nothing of cement, data files or temperatures beyond the standard potentials it is given.
 */

/** One species at the temperature of the calculation. */
export type SpeciesAtTemperature = {
  id: string;
  phase: "aqueous" | "gas" | "solid";
  /** End-members of a solid solution name it here; pure solids leave it undefined. */
  solution?: string;
  /** Element stoichiometry, e.g. { Ca: 1, O: 2, H: 2 }. */
  elements: Record<string, number>;
  charge: number;
  /** Apparent standard Gibbs energy of formation at T (Benson–Helgeson convention), J/mol. */
  gibbsJPerMol: number;
  molarMassGPerMol: number;
  molarVolumeCm3PerMol?: number;
};

/**
 * Activity model of the aqueous solution at the calculation temperature.
 *
 * Water activity is written as ln a(H2O) = −M_w Σᵢ mᵢ cᵢ(I), a sum over solutes of their molality times
 * a coefficient that depends only on the ionic strength; every model whose solute terms depend on I alone
 * and that satisfies Gibbs–Duhem along the dilution path has this form (see `lib/thermo/truesdell-jones.ts`).
 */
export interface AqueousActivityModel {
  /**
   * Solutes with the same key have the same γ and water coefficient at every I (for a common-ion-size model,
   * the charge alone); the engine evaluates each key once per iteration.
   */
  parameterKey(speciesId: string, charge: number): string;
  /** log10 γ of a solute of the given id and charge at ionic strength I (mol/kg); neutral solutes included. */
  log10Gamma(speciesId: string, charge: number, ionicStrengthMolPerKg: number): number;
  /** cᵢ(I), dimensionless, in ln a(H2O) = −M_w Σᵢ mᵢ cᵢ(I), consistent with log10Gamma through Gibbs–Duhem. */
  waterCoefficient(speciesId: string, charge: number, ionicStrengthMolPerKg: number): number;
  /**
   * The engine's fast path, resolved once per solute class: a function of I (mol/kg) giving
   * [ln γ, d ln γ/dI, c, dc/dI], the same quantities as log10Gamma (times ln 10) and waterCoefficient.
   * The derivatives may be reported as 0 at I = 0, where they diverge (the engine uses them times I).
   */
  soluteTerms(speciesId: string, charge: number): (ionicStrengthMolPerKg: number) => SoluteActivityTerms;
}

/** [ln γ, d ln γ/dI (kg/mol), c, dc/dI (kg/mol)] of one solute at one ionic strength. */
export type SoluteActivityTerms = readonly [number, number, number, number];
