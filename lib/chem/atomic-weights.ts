import { findElement } from "./element-table";

/**
 * Standard atomic weight of one element in g/mol: IUPAC CIAAW 2021 (Prohaska et al. 2022, Pure Appl. Chem.
 * 94, 573), the conventional value where the standard weight is an interval. Throws for a symbol outside
 * `lib/data/elements.json` — formulas from `parseFormula` never contain one.
 */
export function atomicWeightGPerMol(symbol: string): number {
  const element = findElement(symbol);
  if (!element) throw new Error(`atomicWeightGPerMol: element ${symbol} is not in lib/data/elements.json`);
  return element.atomicWeightGPerMol;
}

/**
 * Molar mass M = Σ ν_e A_e (g/mol) of an element stoichiometry, e.g. { Ca: 1, O: 2, H: 2 } → 74.09.
 * The mass of electrons gained or lost by an ion is neglected (under 0.002 % for any ion here), as is common practice.
 */
export function molarMassGPerMol(elements: Record<string, number>): number {
  let massGPerMol = 0;
  for (const [symbol, count] of Object.entries(elements)) massGPerMol += count * atomicWeightGPerMol(symbol);
  return massGPerMol;
}
