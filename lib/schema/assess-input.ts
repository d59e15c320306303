import { z } from "zod";
import { ageInputSchema, binderInputSchema, cementInputSchema, mixInputSchema, scmInputSchema } from "./binder-input";
import { curingInputSchema } from "./curing-input";
import { exposureInput } from "./exposure-input";
import { specificationInput } from "./specification-input";

/**
 * The assessment input: one schema for the form, the API (`POST /api/v1/assess`) and the CLI
 * (`npm run cli -- assess`). It composes the binder/mix/age schema, the exposure schema and, optionally,
 * the thermal curing model's schema, plus the project and element description and the run options.
 *
 * `binder` is the binder part of the binder schema (cement and supplementary materials); `mix` and `age`
 * sit beside it, as engineers list them. `curing.maxTemperatureC` alone is enough for the temperature
 * history; `curing.thermal` runs the element temperature model and its peak then governs.
 */
export const elementTypes = ["wall", "slab", "footing", "column", "beam", "pile", "tunnel-lining", "precast-unit", "other"] as const;

export const projectInput = z
  .object({
    name: z.string({ error: "project.name must be text" }).trim().min(1, { error: "project.name is required" }).max(200, { error: "project.name must be at most 200 characters" }),
    reference: z.string().trim().max(100, { error: "project.reference must be at most 100 characters" }).optional(),
    element: z
      .object({
        type: z.enum(elementTypes, { error: `project.element.type must be one of ${elementTypes.join(", ")}` }),
        thicknessM: z.number({ error: "project.element.thicknessM must be a number (m)" }).min(0.05, { error: "project.element.thicknessM must be between 0.05 and 10 m" }).max(10, { error: "project.element.thicknessM must be between 0.05 and 10 m" }),
        coverMm: z.number({ error: "project.element.coverMm must be a number (mm)" }).min(10, { error: "project.element.coverMm must be between 10 and 150 mm" }).max(150, { error: "project.element.coverMm must be between 10 and 150 mm" }).optional(),
      })
      .optional(),
  })
  .strict();

export const assessOptions = z
  .object({
    /** Points per scenario sweep (charts and root-finding). */
    sweepPoints: z.number().int().min(5, { error: "options.sweepPoints must be between 5 and 80" }).max(80, { error: "options.sweepPoints must be between 5 and 80" }).default(40),
    monteCarlo: z
      .object({
        samples: z.number().int().min(10, { error: "options.monteCarlo.samples must be between 10 and 1000" }).max(1000, { error: "options.monteCarlo.samples must be between 10 and 1000" }),
        seed: z.number().int().min(0).max(2 ** 31 - 1).default(1),
      })
      .optional(),
    /** Phases to suppress on top of the default kinetic constraints, and defaults to lift. */
    suppressedPhases: z.array(z.string()).default([]),
    allowedPhases: z.array(z.string()).default([]),
  })
  .strict();

export const assessInput = z
  .object({
    project: projectInput.optional(),
    binder: z.object({ cement: cementInputSchema, supplementaryMaterials: z.array(scmInputSchema).default([]) }, { error: "binder must be an object with cement" }),
    mix: mixInputSchema,
    /** Strength class, sulfate resistance and the like, for the exposure-class comparison only. */
    specification: specificationInput.optional(),
    age: ageInputSchema,
    exposure: exposureInput,
    curing: z
      .object({
        maxTemperatureC: z.number({ error: "curing.maxTemperatureC must be a number (°C)" }).min(0, { error: "curing.maxTemperatureC must be between 0 and 100 °C" }).max(100, { error: "curing.maxTemperatureC must be between 0 and 100 °C" }).optional(),
        thermal: curingInputSchema.optional(),
      })
      .strict()
      .default({}),
    options: assessOptions.default({ sweepPoints: 40, suppressedPhases: [], allowedPhases: [] }),
  })
  .strict()
  .superRefine((input, context) => {
    // The binder schema's own cross-field rules (SCM totals, duplicates, required degrees), with paths
    // mapped to where the fields sit in this input.
    const checked = binderInputSchema.safeParse(binderInputOf(input));
    if (checked.success) return;
    for (const issue of checked.error.issues) {
      const [head, ...rest] = issue.path;
      const path = head === "cement" || head === "supplementaryMaterials" ? ["binder", head, ...rest] : issue.path;
      context.addIssue({ code: "custom", path, message: issue.message });
    }
  });

export type AssessInput = z.output<typeof assessInput>;
export type AssessInputRaw = z.input<typeof assessInput>;

/** The binder schema's input assembled from an assessment input (binder + mix + age). */
export function binderInputOf(input: Pick<AssessInput, "binder" | "mix" | "age">): z.input<typeof binderInputSchema> {
  return { cement: input.binder.cement, supplementaryMaterials: input.binder.supplementaryMaterials, mix: input.mix, age: input.age } as z.input<typeof binderInputSchema>;
}
