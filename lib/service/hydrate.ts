import { binderSystemFromInput } from "../cement/binder-system";
import { hydratePaste, type HydratedPaste, type HydrationWarning } from "../cement/hydrate-paste";
import { hydrationTimeline, type TimelineEntry, type TimelineWarning } from "../cement/hydration-timeline";
import { describeFailure } from "../equilibrium/failure";
import { phaseIds } from "../equilibrium/equilibrate";
import { loadDataset } from "../data/load-dataset";
import { hydrateInput, type HydrateInput } from "../schema/hydrate-input";
import { binderSystemIssue } from "../cement/binder-system-issue";
import { formatIssues } from "../schema/format-issues";
import { pasteFailureMessage } from "./paste-failure";
import { domainError, validationError, type ServiceOutcome } from "./outcome";
import type { BulkCompositionWarning } from "../cement/bulk-composition";

/** Default equilibrium temperature when reaction degrees are entered directly: 20 °C (EN 196-1 laboratory). */
const DEFAULT_TEMPERATURE_C = 20;

export type HydrateOutput = {
  assemblage: HydratedPaste["assemblage"];
  /** Phase id → cm³ per 100 g binder (hydrates, unreacted binder, pore solution). */
  volumes: Record<string, number>;
  phases: HydratedPaste["phases"];
  porosity: HydratedPaste["porosity"];
  poreSolution: HydratedPaste["poreSolution"];
  boundWaterG: number;
  portlanditeG: number;
  carbonatableCaMol: number;
  alkaliInCshMol: Record<string, number>;
  perM3: HydratedPaste["perM3"];
  reactionDegrees: unknown;
  timeline: TimelineEntry[];
  temperatureC: number;
  warnings: (HydrationWarning | BulkCompositionWarning | TimelineWarning)[];
  presetLabels: string[];
  versions: { dataset: string };
  basis: "per 100 g binder (perM3: per m³ of concrete)";
};

/** Validates unknown phase ids against the data set, naming the field. */
function unknownPhase(ids: readonly string[], field: string, known: ReadonlySet<string>) {
  const index = ids.findIndex((id) => !known.has(id));
  return index < 0 ? undefined : { path: `${field}[${index}]`, message: `unknown phase id "${ids[index]}"` };
}

/**
 * Binder + mix + age → the hydrate assemblage per 100 g binder and per m³, the pore solution, volumes
 * and, on request, the timeline. The service behind `hydrate` (CLI) and `POST /api/v1/hydrate`.
 */
export function runHydrate(raw: unknown): ServiceOutcome<HydrateOutput> {
  const parsed = hydrateInput.safeParse(raw);
  if (!parsed.success) return validationError(formatIssues(parsed.error));
  const input: HydrateInput = parsed.data;
  const dataset = loadDataset();
  if (!dataset.ok) return domainError("dataset_invalid", `${dataset.error.file}: ${dataset.error.message}`);
  const known = phaseIds(dataset.value);
  const bad = unknownPhase(input.suppressedPhases, "suppressedPhases", known) ?? unknownPhase(input.allowedPhases, "allowedPhases", known);
  if (bad) return validationError([bad]);

  const system = binderSystemFromInput({ cement: input.cement, supplementaryMaterials: input.supplementaryMaterials, mix: input.mix, age: input.age });
  if (!system.ok) {
    const error = system.error;
    return validationError(error.code === "invalid_input" ? error.issues : [binderSystemIssue(error)]);
  }
  const temperatureC = input.age.mode === "age" ? input.age.curingTemperatureC : (input.temperatureC ?? DEFAULT_TEMPERATURE_C);
  const overrides = { suppress: input.suppressedPhases, enable: input.allowedPhases, dataset: dataset.value };
  // The paste at its age: the age-dependent kinetic constraints apply (none without an age, in the degrees mode).
  const ageDays = input.age.mode === "age" ? input.age.ageDays : undefined;
  const paste = hydratePaste(system.value.composition, { temperatureC, binderContentKgPerM3: input.mix.binderContentKgPerM3, ageDays, ...overrides });
  if (!paste.ok) return domainError(paste.error.code, pasteFailureMessage(paste.error, { age: input.age, temperatureC, composition: system.value.composition }));
  let timeline: TimelineEntry[] = [];
  const warnings: HydrateOutput["warnings"] = [...paste.value.warnings];
  if (input.timeline) {
    const series = hydrationTimeline(system.value.binder, { temperatureC, ...input.timeline, ...overrides });
    if (!series.ok) return domainError(series.error.code, describeFailure(series.error), { ageDays: series.error.ageDays });
    timeline = series.value.entries;
    for (const w of series.value.warnings) if (!warnings.some((x) => x.code === w.code)) warnings.push(w);
  }
  const v = paste.value;
  return {
    ok: true,
    value: {
      assemblage: v.assemblage,
      volumes: v.volumes,
      phases: v.phases,
      porosity: v.porosity,
      poreSolution: v.poreSolution,
      boundWaterG: v.boundWaterG,
      portlanditeG: v.portlanditeG,
      carbonatableCaMol: v.carbonatableCaMol,
      alkaliInCshMol: v.alkaliInCshMol,
      perM3: v.perM3,
      reactionDegrees: system.value.degrees,
      timeline,
      temperatureC,
      warnings,
      presetLabels: system.value.binder.presetLabels,
      versions: { dataset: dataset.value.version },
      basis: "per 100 g binder (perM3: per m³ of concrete)",
    },
  };
}
