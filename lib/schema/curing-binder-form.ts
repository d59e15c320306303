import { z } from "zod";
import { cementInputSchema, scmInputSchema, scmTypes } from "./binder-input";
import { binderIndependentCuringFields, boundedInteger, boundedNumber, checkCuringFields } from "./curing-input";

/**
 * The binder form of the curing input (`cure` command and `POST /api/v1/cure`): the curing input without `cement`,
 * `supplementaryMaterials` and `heatCurve`, with instead `binder: { cement, supplementaryMaterials, heatCalculation? }`
 * as in the assessment (`binder-input.ts`). The heat curve is then the thermodynamic heat of hydration of that binder
 * (`lib/curing/binder-form-input.ts`), computed at `heatCalculation`'s temperature. The mix is `concrete`'s w/b and
 * binder content; the binder model's own limits and the binder rules (blended presets, SCM totals) are checked when
 * the binder is resolved, with the same messages as in the assessment.
 */
const heatCalculationKeys = ["temperatureC", "activationEnergyJPerMol", "points"] as const;

/** The calculation temperature is held to 5–60 °C: the Parrot & Killoh constants refer to 20 °C and reach other temperatures only through their Arrhenius terms. */
export const heatCalculationSchema = z.strictObject(
  {
    temperatureC: boundedNumber("binder.heatCalculation.temperatureC", 5, 60, " °C").optional(),
    activationEnergyJPerMol: boundedNumber("binder.heatCalculation.activationEnergyJPerMol", 10000, 80000, " J/mol").optional(),
    points: boundedInteger("binder.heatCalculation.points", 4, 40).optional(),
  },
  {
    error: (issue) =>
      issue.code === "unrecognized_keys" ? `binder.heatCalculation allows only ${heatCalculationKeys.join(", ")} (got ${issue.keys[0]})` : "binder.heatCalculation must be an object",
  },
);

const binderKeys = ["cement", "supplementaryMaterials", "heatCalculation"] as const;

export const curingBinderSectionSchema = z.strictObject(
  {
    cement: cementInputSchema,
    supplementaryMaterials: z.array(scmInputSchema, { error: "binder.supplementaryMaterials must be a list" }).max(scmTypes.length, { error: `binder.supplementaryMaterials must have at most ${scmTypes.length} entries` }).default([]),
    heatCalculation: heatCalculationSchema.optional(),
  },
  {
    error: (issue) =>
      issue.code === "unrecognized_keys" ? `binder allows only ${binderKeys.join(", ")} (got ${issue.keys[0]})` : "binder must be an object with cement and supplementaryMaterials",
  },
);

export const curingBinderFormSchema = z
  .object({ ...binderIndependentCuringFields, binder: curingBinderSectionSchema }, { error: "input must be a JSON object" })
  .superRefine(checkCuringFields);

export type CuringBinderFormInput = z.infer<typeof curingBinderFormSchema>;

/**
 * The first issue of a failed parse as a field and a message. An unknown key is named by its own path
 * (`binder.heatCalculation.temperature`), so the field points at what to remove.
 */
export function firstCuringBinderFormIssue(error: z.ZodError): { field: string; message: string } {
  const issue = error.issues[0];
  const path = issue.path.map(String);
  if (issue.code === "unrecognized_keys") path.push(issue.keys[0]);
  const field = path.join(".") || "input";
  const head = field.split(".")[0];
  return { field, message: issue.message.includes(head) ? issue.message : `${field}: ${issue.message}` };
}
