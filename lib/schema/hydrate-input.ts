import { z } from "zod";
import { ageInputSchema, binderInputSchema, cementInputSchema, mixInputSchema, scmInputSchema } from "./binder-input";

/**
 * Input of `npm run cli -- hydrate` and `POST /api/v1/hydrate`: the binder, mix and age (as the binder
 * schema), plus the temperature when degrees are entered directly, the timeline request and phase overrides.
 */
export const hydrateInput = z
  .object({
    cement: cementInputSchema,
    supplementaryMaterials: z.array(scmInputSchema).default([]),
    mix: mixInputSchema,
    age: ageInputSchema,
    /** Temperature of the equilibrium when `age.mode` is "degrees" (default 20 °C, the EN 196 laboratory temperature). */
    temperatureC: z.number({ error: "temperatureC must be a number (°C)" }).min(0, { error: "temperatureC must be between 0 and 100 °C" }).max(100, { error: "temperatureC must be between 0 and 100 °C" }).optional(),
    timeline: z
      .object({
        points: z.number().int().min(2, { error: "timeline.points must be between 2 and 80" }).max(80, { error: "timeline.points must be between 2 and 80" }).default(40),
        firstAgeDays: z.number().min(1 / 24, { error: "timeline.firstAgeDays must be between 1/24 (1 hour) and 1 day" }).max(1, { error: "timeline.firstAgeDays must be between 1/24 (1 hour) and 1 day" }).default(1 / 24),
        lastAgeDays: z.number().min(1, { error: "timeline.lastAgeDays must be between 1 and 3650 days (10 years)" }).max(3650, { error: "timeline.lastAgeDays must be between 1 and 3650 days (10 years)" }).default(3650),
      })
      .strict()
      .optional(),
    suppressedPhases: z.array(z.string()).default([]),
    allowedPhases: z.array(z.string()).default([]),
  })
  .strict()
  .superRefine((input, context) => {
    const checked = binderInputSchema.safeParse({ cement: input.cement, supplementaryMaterials: input.supplementaryMaterials, mix: input.mix, age: input.age });
    if (checked.success) return;
    for (const issue of checked.error.issues) context.addIssue({ code: "custom", path: issue.path, message: issue.message });
  });

export type HydrateInput = z.output<typeof hydrateInput>;
