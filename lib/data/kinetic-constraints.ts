import { z } from "zod";
import constraintsFile from "./kinetic-constraints.json";

/**
 * Default kinetic constraints (`lib/data/kinetic-constraints.json`): solids that equilibrium would allow but
 * that do not form in hydrated cement at service conditions, each with its reason and source. A constraint
 * may apply only below or above a temperature (°C): it is active when T < `whenTemperatureCBelow` and/or
 * T > `whenTemperatureCAbove` (both bounds, when given, must hold). A constraint with `whenAgeDaysBelow` holds for a
 * phase that forms only over weeks or months: it is active while a hydrating paste is younger than that age, and only
 * where the age is known (the hydration timeline, the heat curve, the paste at its age); a calculation without an age
 * (the durability scenarios, a single equilibrium) takes the long-term view and allows the phase. Callers override the
 * defaults per calculation.
 */
export const kineticConstraint = z
  .object({
    phase: z.string().min(1),
    reason: z.string().min(10),
    source: z.string().min(3),
    whenTemperatureCBelow: z.number().optional(),
    whenTemperatureCAbove: z.number().optional(),
    whenAgeDaysBelow: z.number().positive().optional(),
    recalledFromMemory: z.boolean().optional(),
  })
  .strict();

export const kineticConstraintsFile = z.object({
  title: z.string(),
  provenance: z.object({ sources: z.array(z.string()).min(1), generatedBy: z.string(), date: z.string() }),
  constraints: z.array(kineticConstraint),
});

export type KineticConstraint = z.infer<typeof kineticConstraint>;

const parsed = kineticConstraintsFile.parse(constraintsFile);

/** All default constraints, as in the file. */
export function kineticConstraints(): readonly KineticConstraint[] {
  return parsed.constraints;
}

/** True when the constraint applies at `temperatureC` (°C) and, for an age-dependent one, at a known `ageDays` (d). */
export function constraintApplies(constraint: KineticConstraint, temperatureC: number, ageDays?: number): boolean {
  if (constraint.whenTemperatureCBelow !== undefined && !(temperatureC < constraint.whenTemperatureCBelow)) return false;
  if (constraint.whenTemperatureCAbove !== undefined && !(temperatureC > constraint.whenTemperatureCAbove)) return false;
  if (constraint.whenAgeDaysBelow !== undefined && !(ageDays !== undefined && ageDays < constraint.whenAgeDaysBelow)) return false;
  return true;
}

export type SuppressedPhasesError = { code: "temperature_invalid"; field: "temperatureC"; value: number; message: string };

/**
 * Ids of the solids suppressed by default at `temperatureC` (°C) and, where known, the paste's `ageDays` (d), in file
 * order. Throws a typed error for a non-finite temperature.
 */
export function defaultSuppressedPhases(temperatureC: number, ageDays?: number): string[] {
  if (!Number.isFinite(temperatureC)) {
    const error: SuppressedPhasesError = { code: "temperature_invalid", field: "temperatureC", value: temperatureC, message: `temperatureC must be a finite number, got ${temperatureC}` };
    throw Object.assign(new Error(error.message), { detail: error });
  }
  return parsed.constraints.filter((c) => constraintApplies(c, temperatureC, ageDays)).map((c) => c.phase);
}

/**
 * The suppressed set for one calculation: the defaults at `temperatureC` (and the paste's `ageDays`, where known), minus
 * `enable`, plus `suppress` (user overrides; unknown ids are the caller's to validate against the data set).
 */
export function suppressedPhases(temperatureC: number, overrides: { enable?: readonly string[]; suppress?: readonly string[]; ageDays?: number } = {}): string[] {
  const enabled = new Set(overrides.enable ?? []);
  const result = defaultSuppressedPhases(temperatureC, overrides.ageDays).filter((id) => !enabled.has(id));
  for (const id of overrides.suppress ?? []) if (!result.includes(id)) result.push(id);
  return result;
}
