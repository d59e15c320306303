import { z } from "zod";
import elementsFile from "../data/elements.json";

/**
 * The element table of `lib/data/elements.json`: IUPAC CIAAW 2021 standard atomic weights
 * (conventional values for interval elements; Prohaska et al. 2022, Pure Appl. Chem. 94, 573) and the
 * standard entropy of each element's reference state at 298.15 K, 1 bar (CODATA Key Values, Cox, Wagman
 * & Medvedev 1989; NBS tables for Mn and Fe). Validated once, at module load.
 */
const elementRecord = z.object({
  symbol: z.string().regex(/^[A-Z][a-z]?$/),
  name: z.string(),
  atomicWeightGPerMol: z.number().positive(),
  atomicWeightSource: z.string().min(3),
  referenceState: z.string(),
  referenceStateEntropyJPerMolK: z.number().positive(),
  atomsPerReferenceFormula: z.number().int().positive(),
  entropySource: z.string().min(3),
  recalledFromMemory: z.boolean().optional(),
});

const elementsSchema = z.object({
  title: z.string(),
  provenance: z.object({ sources: z.array(z.string()).min(1), generatedBy: z.string(), date: z.string() }),
  units: z.object({ atomicWeight: z.literal("g/mol"), entropy: z.literal("J/(mol K)") }),
  hydrogenGasEntropyJPerMolK: z.number().positive(),
  hydrogenGasEntropySource: z.string(),
  elements: z.array(elementRecord).min(1),
});

export type ElementRecord = z.infer<typeof elementRecord>;

const parsedElements = elementsSchema.parse(elementsFile);

const bySymbol: ReadonlyMap<string, ElementRecord> = new Map(parsedElements.elements.map((e) => [e.symbol, e]));

/** S°(H2, g, 298.15 K, 1 bar) in J/(mol·K), CODATA (Cox et al. 1989); used by the aqueous-ion charge convention. */
export const hydrogenGasEntropyJPerMolK: number = parsedElements.hydrogenGasEntropyJPerMolK;

/** The record of one element, or undefined when the symbol is not in the table. */
export function findElement(symbol: string): ElementRecord | undefined {
  return bySymbol.get(symbol);
}

/** True when the element table holds the symbol (so its atomic weight and entropy are known). */
export function isKnownElement(symbol: string): boolean {
  return bySymbol.has(symbol);
}

/** All symbols in the table, in file order. */
export function knownElementSymbols(): string[] {
  return parsedElements.elements.map((e) => e.symbol);
}
