import { z } from "zod";
import statesFile from "./hydration-states.json";

/**
 * Hydration-state families (`lib/data/hydration-states.json`): solids differing only in water content, and the
 * published transition relative humidities (%, at a temperature in °C) between neighbours. `usedToDeriveData`
 * marks transitions from which data entries were derived (a map computed from such data reproduces them by construction).
 */
const transition = z
  .object({
    wetter: z.string().min(1),
    drier: z.string().min(1),
    relativeHumidityPercent: z.number().gt(0).max(100),
    temperatureC: z.number().min(0).max(100),
    usedToDeriveData: z.boolean(),
    source: z.string().min(3),
    recalledFromMemory: z.boolean(),
  })
  .strict();

const family = z
  .object({
    family: z.string().min(1),
    members: z.array(z.object({ id: z.string().min(1), waterPerFormulaInCementNotation: z.number().nonnegative() }).strict()).min(2),
    transitions: z.array(transition),
    note: z.string().optional(),
  })
  .strict();

export const hydrationStatesFile = z.object({
  title: z.string(),
  provenance: z.object({ sources: z.array(z.string()).min(1), generatedBy: z.string(), date: z.string() }),
  families: z.array(family),
});

export type HydrationFamily = z.infer<typeof family>;
export type HydrationTransition = z.infer<typeof transition>;

const parsed = hydrationStatesFile.parse(statesFile);

/** All hydration-state families, as in the file. */
export function hydrationFamilies(): readonly HydrationFamily[] {
  return parsed.families;
}
