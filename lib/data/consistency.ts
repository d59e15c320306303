import { elementEntropySumJPerMolK } from "../chem/element-entropy";

/** Reference temperature of the formation data, K. */
const referenceTemperatureK = 298.15;

/**
 * Internal consistency of an entry's formation data at 298.15 K (Gibbs–Helmholtz):
 *   residual = ΔfG° − (ΔfH° − T_r·(S° − Σ ν_e S°_e)),   J/mol,
 * with the element entropies of CODATA (Cox, Wagman & Medvedev 1989) and the aqueous-ion convention of
 * `elementEntropySumJPerMolK`. Tabulated sets are consistent to about 1 kJ/mol or better; a larger residual
 * signals a typing error, a wrong unit or mismatched sources. Returns undefined when the entry has no
 * standard data or no enthalpy.
 */
export function formationConsistencyJPerMol(species: {
  elements: Record<string, number>;
  charge: number;
  standard?: { gibbsJPerMol: number; enthalpyJPerMol?: number; entropyJPerMolK: number };
}): number | undefined {
  const standard = species.standard;
  if (!standard || standard.enthalpyJPerMol === undefined) return undefined;
  const formationEntropyJPerMolK = standard.entropyJPerMolK - elementEntropySumJPerMolK(species.elements, species.charge);
  return standard.gibbsJPerMol - (standard.enthalpyJPerMol - referenceTemperatureK * formationEntropyJPerMolK);
}
