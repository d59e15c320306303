import { binderInputSchema, formatIssues, type BinderInput, type InputIssue } from "../schema/binder-input";
import { bulkComposition, type BulkComposition, type BulkCompositionError } from "./bulk-composition";
import { reactionDegreesAtAges, reactionDegreesForInput, type ReactionDegrees } from "./reaction-degrees";
import { resolveBinder, type ResolveBinderError, type ResolvedBinder } from "./resolve-binder";

/**
 * From raw input (form, API or CLI JSON) to the system the equilibrium engine solves: validate, expand presets,
 * compute reaction degrees and the bulk composition. Every failure is a typed value; nothing throws for bad input.
 */
export type BinderSystem = {
  input: BinderInput;
  binder: ResolvedBinder;
  degrees: ReactionDegrees;
  composition: BulkComposition;
};

export type BinderSystemError =
  | { code: "invalid_input"; issues: InputIssue[] }
  | ResolveBinderError
  | BulkCompositionError;

export type BinderSystemResult = { ok: true; value: BinderSystem } | { ok: false; error: BinderSystemError };

export function binderSystemFromInput(raw: unknown): BinderSystemResult {
  const parsed = binderInputSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, error: { code: "invalid_input", issues: formatIssues(parsed.error) } };
  const resolved = resolveBinder(parsed.data);
  if (!resolved.ok) return { ok: false, error: resolved.error };
  const degrees = reactionDegreesForInput(resolved.value);
  const composition = bulkComposition(resolved.value, degrees);
  if (!composition.ok) return { ok: false, error: composition.error };
  return { ok: true, value: { input: parsed.data, binder: resolved.value, degrees, composition: composition.value } };
}

export type TimelinePoint = { ageDays: number; degrees: ReactionDegrees; composition: BulkComposition };

/**
 * Bulk compositions at each age (days) at one curing temperature, for a timeline solved point to point by the
 * engine. One Parrot–Killoh integration serves all ages.
 */
export function binderTimeline(
  binder: ResolvedBinder,
  agesDays: readonly number[],
  curingTemperatureC: number,
): { ok: true; value: TimelinePoint[] } | { ok: false; error: BulkCompositionError } {
  const series = reactionDegreesAtAges(binder, agesDays, curingTemperatureC);
  const points: TimelinePoint[] = [];
  for (let i = 0; i < agesDays.length; i++) {
    const composition = bulkComposition(binder, series[i]);
    if (!composition.ok) return { ok: false, error: composition.error };
    points.push({ ageDays: agesDays[i], degrees: series[i], composition: composition.value });
  }
  return { ok: true, value: points };
}

/** n ages evenly spaced on a logarithmic axis from `firstDays` to `lastDays` inclusive (n ≥ 2). */
export function logarithmicAgesDays(firstDays: number, lastDays: number, count: number): number[] {
  const n = Math.max(2, Math.floor(count));
  return Array.from({ length: n }, (_, i) => firstDays * Math.pow(lastDays / firstDays, i / (n - 1)));
}
