import { z } from "zod";
import parametersFile from "./ion-size-parameters.json";
import type { IonParameters } from "../thermo/truesdell-jones";

/**
 * Individual Truesdell–Jones ion parameters (`lib/data/ion-size-parameters.json`, with its sources): å in Å,
 * ḃ in kg/mol, by aqueous species id. Validated at load.
 */
const ionEntry = z
  .object({
    id: z.string().min(1),
    ionSizeAngstrom: z.number().positive().max(20),
    bDotKgPerMol: z.number().min(-1).max(1),
    source: z.string().min(3),
    recalledFromMemory: z.boolean().optional(),
  })
  .strict();

const ionSizeParametersFile = z.object({
  title: z.string(),
  provenance: z.object({ sources: z.array(z.string()).min(1), generatedBy: z.string(), date: z.string() }),
  units: z.object({ ionSize: z.string(), bDot: z.string() }),
  scope: z.string(),
  ions: z.array(ionEntry).min(1),
});

const parsed = ionSizeParametersFile.parse(parametersFile);

/** Species id → { ionSizeAngstrom, bDotKgPerMol }, as in the file. */
export function individualIonParameters(): Record<string, IonParameters> {
  return Object.fromEntries(parsed.ions.map((ion) => [ion.id, { ionSizeAngstrom: ion.ionSizeAngstrom, bDotKgPerMol: ion.bDotKgPerMol }]));
}
