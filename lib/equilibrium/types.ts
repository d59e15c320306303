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

/** Activity model of the aqueous solution at the calculation temperature. */
export interface AqueousActivityModel {
  /** log10 γ of a solute of the given charge at ionic strength I (mol/kg); neutral solutes included. */
  log10Gamma(charge: number, ionicStrengthMolPerKg: number): number;
  /**
   * ln a(H2O), consistent with log10Gamma through the Gibbs–Duhem relation, from the total solute
   * molality, the molality of charged solutes and the ionic strength (all mol/kg).
   */
  lnWaterActivity(totalSoluteMolPerKg: number, chargedSoluteMolPerKg: number, ionicStrengthMolPerKg: number): number;
}
