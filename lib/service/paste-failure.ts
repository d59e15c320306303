import type { BulkComposition } from "../cement/bulk-composition";
import { describeFailure, type EquilibriumFailure } from "../equilibrium/failure";
import type { AgeInput } from "../schema/binder-input";

/**
 * The message of a hydrated paste the engine could not solve: which paste (age or reaction degrees, temperature), the
 * engine's reason, and, for a paste short of water, that nearly dry pastes are the engine's known weak case.
 */
export function pasteFailureMessage(error: EquilibriumFailure, context: { age: AgeInput; temperatureC: number; composition: BulkComposition }): string {
  const which = context.age.mode === "age" ? `at ${context.age.ageDays} d and ${context.temperatureC} °C` : `at the given reaction degrees and ${context.temperatureC} °C`;
  const shortOfWater = context.composition.warnings.find((w) => w.code === "water_insufficient_for_full_hydration");
  const hint =
    shortOfWater && shortOfWater.code === "water_insufficient_for_full_hydration" && error.code === "no_convergence"
      ? ` The w/b ${shortOfWater.waterBinderRatio} is below the ${shortOfWater.minimumSealed.toFixed(2)} that full hydration needs (sealed, Powers' model), so little pore water is left: nearly dry pastes are the case the engine solves least reliably (a known limitation).`
      : "";
  return `The equilibrium of the hydrated paste ${which} could not be computed: ${describeFailure(error)}.${hint}`;
}
