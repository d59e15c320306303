import { z } from "zod";
import { formatIssues, type FieldIssue } from "./format-issues";
import cementPresets from "../data/binders/cement-presets.json";
import scmPresets from "../data/binders/scm-presets.json";

/**
 * The one input schema for a binder, its mix and its age: shared by the form, the API and the CLI.
 * Every message names the field and its limit. Limits are those of the models behind the fields
 * (w/b and binder content: the ranges of ordinary structural concrete, common practice; age: 1 h to
 * 10 years, the range of the reaction-degree models; curing temperature 0–100 °C, liquid water; Blaine
 * fineness 200–800 m²/kg around the 250–600 m²/kg of commercial cements, common practice; SCMs up to 95 % of
 * the binder, the upper limit of EN 197-1 CEM III/C and ASTM C595 type IS).
 */

const cementPresetIds = cementPresets.presets.map((preset) => preset.id);
const scmPresetIds = scmPresets.presets.map((preset) => preset.id);

export const scmTypes = [
  "slag",
  "siliceous-fly-ash",
  "calcareous-fly-ash",
  "silica-fume",
  "metakaolin",
  "limestone",
  "natural-pozzolan",
] as const;

/** A finite number between `min` and `max`; `label` is how the limits are printed ("0.25", "0.80"). */
function boundedNumber(field: string, min: number, max: number, minLabel = String(min), maxLabel = String(max), unit = "") {
  const limits = `${field} must be between ${minLabel} and ${maxLabel}${unit}`;
  return z
    .number({ error: (issue) => (issue.input === undefined ? `${field} is required` : `${field} must be a number`) })
    .min(min, { error: limits })
    .max(max, { error: limits });
}

function massPercent(field: string) {
  return boundedNumber(field, 0, 100, "0", "100", " mass %");
}

const optionalOxideKeys = ["MgO", "SO3", "Na2O", "K2O", "TiO2", "P2O5", "Mn2O3", "CO2", "LOI", "freeLime", "Cl"] as const;

/** Oxide analysis in mass % (EN 196-2 / ASTM C114 list). `required` oxides must be given; the rest default to 0. */
function oxideAnalysis(prefix: string, required: readonly string[]) {
  const shape: Record<string, z.ZodType<number | undefined>> = {};
  for (const key of ["CaO", "SiO2", "Al2O3", "Fe2O3", ...optionalOxideKeys]) {
    const field = massPercent(`${prefix}.${key}`);
    shape[key] = required.includes(key) ? field : field.optional();
  }
  return z
    .object(shape as Record<string, z.ZodNumber>, { error: `${prefix} must be an object of oxide mass percentages` })
    .partial()
    .superRefine((oxides, context) => {
      for (const key of required) {
        if (oxides[key] === undefined) context.addIssue({ code: "custom", path: [key], message: `${prefix}.${key} is required` });
      }
      if (oxides.freeLime !== undefined && oxides.CaO !== undefined && oxides.freeLime > oxides.CaO) {
        context.addIssue({ code: "custom", path: ["freeLime"], message: `${prefix}.freeLime must not exceed ${prefix}.CaO (${oxides.CaO} mass %)` });
      }
    });
}

const cementOxides = oxideAnalysis("cement.oxidesMassPercent", ["CaO", "SiO2", "Al2O3", "Fe2O3"]);
const scmOxides = oxideAnalysis("supplementaryMaterials[].composition.oxidesMassPercent", []);

const blaine = boundedNumber("cement.blaineM2PerKg", 200, 800, "200", "800", " m²/kg").optional();

const phaseKeysRequired = ["alite", "belite", "aluminate", "ferrite"] as const;
const phaseKeysOptional = ["periclase", "freeLime", "calcite", "gypsum", "bassanite", "anhydrite", "arcanite", "aphthitalite"] as const;

const phaseAnalysis = z.object(
  Object.fromEntries([
    ...phaseKeysRequired.map((key) => [key, massPercent(`cement.phasesMassPercent.${key}`)]),
    ...phaseKeysOptional.map((key) => [key, massPercent(`cement.phasesMassPercent.${key}`).optional()]),
  ]) as Record<(typeof phaseKeysRequired)[number], z.ZodNumber> & Record<(typeof phaseKeysOptional)[number], z.ZodOptional<z.ZodNumber>>,
  { error: "cement.phasesMassPercent must be an object of phase mass percentages" },
);

export const cementInputSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("oxides"), oxidesMassPercent: cementOxides, blaineM2PerKg: blaine }),
    z.object({ kind: z.literal("phases"), phasesMassPercent: phaseAnalysis, blaineM2PerKg: blaine }),
    z.object({
      kind: z.literal("preset"),
      presetId: z.enum(cementPresetIds as [string, ...string[]], { error: `cement.presetId must be one of ${cementPresetIds.join(", ")}` }),
      blaineM2PerKg: blaine,
    }),
  ],
  { error: "cement.kind must be one of oxides, phases, preset" },
);

export const scmInputSchema = z.object({
  type: z.enum(scmTypes, { error: `supplementaryMaterials[].type must be one of ${scmTypes.join(", ")}` }),
  massPercentOfBinder: boundedNumber("supplementaryMaterials[].massPercentOfBinder", 0, 95, "0", "95", " mass % of binder"),
  composition: z.discriminatedUnion(
    "kind",
    [
      z.object({ kind: z.literal("oxides"), oxidesMassPercent: scmOxides }),
      z.object({
        kind: z.literal("preset"),
        presetId: z.enum(scmPresetIds as [string, ...string[]], { error: `supplementaryMaterials[].composition.presetId must be one of ${scmPresetIds.join(", ")}` }),
      }),
    ],
    { error: "supplementaryMaterials[].composition.kind must be one of oxides, preset" },
  ),
  /** Glassy / reactive mass fraction of the material; defaults to the preset's value for its type. */
  reactiveFraction: boundedNumber("supplementaryMaterials[].reactiveFraction", 0, 1).optional(),
});

function volumeInput(field: string, maxLitresPerM3: number) {
  return z.discriminatedUnion(
    "unit",
    [
      z.object({ unit: z.literal("litresPerM3"), value: boundedNumber(`${field}.value`, 0, maxLitresPerM3, "0", String(maxLitresPerM3), " L/m³") }),
      z.object({ unit: z.literal("fraction"), value: boundedNumber(`${field}.value`, 0, maxLitresPerM3 / 1000, "0", (maxLitresPerM3 / 1000).toFixed(2)) }),
    ],
    { error: `${field}.unit must be one of litresPerM3, fraction` },
  );
}

export const mixInputSchema = z.object(
  {
    waterBinderRatio: boundedNumber("waterBinderRatio", 0.25, 0.8, "0.25", "0.80"),
    binderContentKgPerM3: boundedNumber("binderContentKgPerM3", 200, 700, "200", "700", " kg/m³"),
    aggregateVolume: volumeInput("mix.aggregateVolume", 850).optional(),
    airVolume: volumeInput("mix.airVolume", 150).optional(),
  },
  { error: "mix must be an object with waterBinderRatio and binderContentKgPerM3" },
);

const degree = (field: string) => boundedNumber(field, 0, 1);

export const ageInputSchema = z.discriminatedUnion(
  "mode",
  [
    z.object({
      mode: z.literal("degrees"),
      clinkerDegrees: z.object(
        {
          alite: degree("age.clinkerDegrees.alite"),
          belite: degree("age.clinkerDegrees.belite"),
          aluminate: degree("age.clinkerDegrees.aluminate"),
          ferrite: degree("age.clinkerDegrees.ferrite"),
        },
        { error: "age.clinkerDegrees must give alite, belite, aluminate and ferrite (0-1)" },
      ),
      scmDegrees: z.partialRecord(z.enum(scmTypes), degree("age.scmDegrees.<type>")).optional(),
    }),
    z.object({
      mode: z.literal("age"),
      ageDays: boundedNumber("age.ageDays", 1 / 24, 3652.5, "0.0417 (1 hour)", "3652.5 (10 years)", " days"),
      curingTemperatureC: boundedNumber("age.curingTemperatureC", 0, 100, "0", "100", " °C"),
    }),
  ],
  { error: "age.mode must be one of degrees, age" },
);

type CementPreset = (typeof cementPresets.presets)[number];

/** The cement preset with this id when it is a blended cement (it carries its own supplementary materials). */
function blendedCementPreset(presetId: string): CementPreset | undefined {
  const preset = cementPresets.presets.find((entry) => entry.id === presetId);
  return preset && preset.supplementaryMaterials.length > 0 ? preset : undefined;
}

/** Why a blended cement preset takes no further supplementary materials, and what to do instead. */
export function blendedPresetMessage(preset: Pick<CementPreset, "name" | "standard" | "supplementaryMaterials">): string {
  const own = preset.supplementaryMaterials.map((scm) => `${scm.type} ${scm.massPercentOfBinder} %`).join(", ");
  return (
    `supplementaryMaterials must be empty with the blended cement ${preset.name} (${preset.standard}), which already contains ${own} of the binder; ` +
    "to add your own, choose a Portland cement type (CEM I or ASTM C150) or give the cement's oxide analysis"
  );
}

export const binderInputSchema = z
  .object(
    {
      cement: cementInputSchema,
      supplementaryMaterials: z.array(scmInputSchema).max(scmTypes.length).default([]),
      mix: mixInputSchema,
      age: ageInputSchema,
    },
    { error: "input must be an object with cement, mix and age" },
  )
  .superRefine((input, context) => {
    const blendedPreset = input.cement.kind === "preset" ? blendedCementPreset(input.cement.presetId) : undefined;
    if (blendedPreset && input.supplementaryMaterials.length > 0) {
      context.addIssue({ code: "custom", path: ["supplementaryMaterials"], message: blendedPresetMessage(blendedPreset) });
    }
    const totalScm = input.supplementaryMaterials.reduce((sum, scm) => sum + scm.massPercentOfBinder, 0);
    if (totalScm > 95) {
      context.addIssue({ code: "custom", path: ["supplementaryMaterials"], message: `supplementaryMaterials: massPercentOfBinder must sum to at most 95 (got ${totalScm})` });
    }
    const seen = new Set<string>();
    input.supplementaryMaterials.forEach((scm, index) => {
      if (seen.has(scm.type)) {
        context.addIssue({ code: "custom", path: ["supplementaryMaterials", index, "type"], message: `supplementaryMaterials: type ${scm.type} must appear only once` });
      }
      seen.add(scm.type);
      if (scm.composition.kind === "oxides" && scm.reactiveFraction === undefined) {
        context.addIssue({ code: "custom", path: ["supplementaryMaterials", index, "reactiveFraction"], message: "supplementaryMaterials[].reactiveFraction is required with an oxide analysis (0-1)" });
      }
    });
    if (input.age.mode === "degrees") {
      input.supplementaryMaterials.forEach((scm, index) => {
        if (scm.type !== "limestone" && input.age.mode === "degrees" && input.age.scmDegrees?.[scm.type] === undefined) {
          context.addIssue({ code: "custom", path: ["age", "scmDegrees", scm.type], message: `age.scmDegrees.${scm.type} is required (0-1) for supplementaryMaterials[${index}]` });
        }
      });
    }
  });

export type BinderInput = z.infer<typeof binderInputSchema>;
export type BinderInputRaw = z.input<typeof binderInputSchema>;
export type CementInput = z.infer<typeof cementInputSchema>;
export type ScmInput = z.infer<typeof scmInputSchema>;
export type MixInput = z.infer<typeof mixInputSchema>;
export type AgeInput = z.infer<typeof ageInputSchema>;
export type ScmTypeInput = (typeof scmTypes)[number];
/** Oxide analysis in mass %; absent oxides are zero. */
export type OxideAnalysisMassPercent = {
  CaO?: number; SiO2?: number; Al2O3?: number; Fe2O3?: number; MgO?: number; SO3?: number; Na2O?: number; K2O?: number;
  TiO2?: number; P2O5?: number; Mn2O3?: number; CO2?: number; LOI?: number; freeLime?: number; Cl?: number;
};
export type PhaseAnalysisMassPercent = z.infer<typeof phaseAnalysis>;

/** One issue of a failed parse, with the dotted path of the field (`mix.waterBinderRatio`, `supplementaryMaterials.0.type`). */
export type InputIssue = FieldIssue;
export { formatIssues };
