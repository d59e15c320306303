import { z } from "zod";

/**
 * Input of one equilibrium calculation, shared by the CLI (`equilibrate`), the API and the library.
 * Components are formulas (`H2O`, `Ca(OH)2`, `CaSO4·2H2O`) with amounts; `unit` says mol or g.
 */
export const equilibrateInput = z
  .object({
    temperatureC: z
      .number({ error: "temperatureC must be a number (°C)" })
      .min(0, { error: "temperatureC must be between 0 and 100 °C" })
      .max(100, { error: "temperatureC must be between 0 and 100 °C" }),
    components: z
      .record(z.string().min(1), z.number({ error: "component amounts must be numbers" }).nonnegative({ error: "component amounts must be ≥ 0" }), {
        error: "components is required: an object of formula → amount",
      })
      .refine((c) => Object.keys(c).length > 0, { error: "components must list at least one formula" }),
    unit: z.enum(["mol", "g"], { error: 'unit must be "mol" or "g"' }).default("mol"),
    fixedPartialPressuresBar: z
      .record(z.string().min(1), z.number().positive({ error: "fixed partial pressures must be > 0 bar" }).max(1, { error: "fixed partial pressures must be ≤ 1 bar" }))
      .default({}),
    suppressedPhases: z.array(z.string().min(1)).default([]),
    activityModel: z
      .object({
        ionSizeAngstrom: z.number().min(2).max(8),
        bDotKgPerMol: z.number().min(0).max(0.3),
      })
      .optional(),
    /** Use the individual Truesdell–Jones å and ḃ of the ions that have them (lib/data/ion-size-parameters.json). */
    individualIonParameters: z.boolean({ error: "individualIonParameters must be true or false" }).default(true),
    timeLimitMs: z.number().int().min(10).max(60_000).default(5000),
  })
  .strict();

export type EquilibrateInput = z.input<typeof equilibrateInput>;
export type EquilibrateParsedInput = z.output<typeof equilibrateInput>;
