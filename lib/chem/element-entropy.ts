import { findElement, hydrogenGasEntropyJPerMolK } from "./element-table";

/**
 * Standard entropy per atom of an element in its reference state at 298.15 K, 1 bar, J/(mol·K):
 * S°(reference formula) / atoms in it, e.g. S°(O2, g)/2 = 102.576 (CODATA Key Values, Cox, Wagman &
 * Medvedev 1989). Throws for a symbol outside `lib/data/elements.json`.
 */
export function elementEntropyJPerMolK(symbol: string): number {
  const element = findElement(symbol);
  if (!element) throw new Error(`elementEntropyJPerMolK: element ${symbol} is not in lib/data/elements.json`);
  return element.referenceStateEntropyJPerMolK / element.atomsPerReferenceFormula;
}

/**
 * Σ ν S° of the elements from which one mole of a species of the given stoichiometry and charge is formed,
 * J/(mol·K), with the conventional aqueous-ion treatment: forming an ion of charge z consumes z/2 H2(g)
 * and releases z H+ (S°(H+) = 0 by convention), so
 *   Σ = Σ_e ν_e S°_e − (z/2)·S°(H2, g).
 * Then ΔfS° = S° − Σ and ΔfG° = ΔfH° − T·ΔfS° (Gibbs–Helmholtz at 298.15 K). Check: H+ gives 0.
 */
export function elementEntropySumJPerMolK(elements: Record<string, number>, charge: number): number {
  let sumJPerMolK = 0;
  for (const [symbol, count] of Object.entries(elements)) sumJPerMolK += count * elementEntropyJPerMolK(symbol);
  return sumJPerMolK - (charge / 2) * hydrogenGasEntropyJPerMolK;
}
