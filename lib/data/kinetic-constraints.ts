import { z } from "zod";
import constraintsFile from "./kinetic-constraints.json";

/**
 * Default kinetic constraints (`lib/data/kinetic-constraints.json`): solids that equilibrium would allow but
 * that do not form in hydrated cement at service conditions, each with its reason and source. A constraint
 * may apply only below or above a temperature (°C): it is active when T < `whenTemperatureCBelow` and/or
 * T > `whenTemperatureCAbove` (both bounds, when given, must hold). Callers override the defaults per calculation.
 */
export const kineticConstraint = z
  .object({
    phase: z.string().min(1),
    reason: z.string().min(10),
    source: z.string().min(3),
    whenTemperatureCBelow: z.number().optional(),
    whenTemperatureCAbove: z.number().optional(),
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

/** True when the constraint applies at `temperatureC` (°C). */
export function constraintApplies(constraint: KineticConstraint, temperatureC: number): boolean {
  if (constraint.whenTemperatureCBelow !== undefined && !(temperatureC < constraint.whenTemperatureCBelow)) return false;
  if (constraint.whenTemperatureCAbove !== undefined && !(temperatureC > constraint.whenTemperatureCAbove)) return false;
  return true;
}

export type SuppressedPhasesError = { code: "temperature_invalid"; field: "temperatureC"; value: number; message: string };

/** Ids of the solids suppressed by default at `temperatureC` (°C), in file order. Throws a typed error for a non-finite temperature. */
export function defaultSuppressedPhases(temperatureC: number): string[] {
  if (!Number.isFinite(temperatureC)) {
    const error: SuppressedPhasesError = { code: "temperature_invalid", field: "temperatureC", value: temperatureC, message: `temperatureC must be a finite number, got ${temperatureC}` };
    throw Object.assign(new Error(error.message), { detail: error });
  }
  return parsed.constraints.filter((c) => constraintApplies(c, temperatureC)).map((c) => c.phase);
}

/**
 * The suppressed set for one calculation: the defaults at `temperatureC`, minus `enable`, plus `suppress`
 * (user overrides; unknown ids are the caller's to validate against the data set).
 */
export function suppressedPhases(temperatureC: number, overrides: { enable?: readonly string[]; suppress?: readonly string[] } = {}): string[] {
  const enabled = new Set(overrides.enable ?? []);
  const result = defaultSuppressedPhases(temperatureC).filter((id) => !enabled.has(id));
  for (const id of overrides.suppress ?? []) if (!result.includes(id)) result.push(id);
  return result;
}
