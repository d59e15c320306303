import { phaseHeatData } from "./curing-data";
import { clinkerPhases, type ClinkerPhase, type ClinkerPhaseFractions } from "./binder-description";

export type PhaseHeatSetId = "lerch-bogue" | "taylor-1997";
export type PhaseDegrees = number | Partial<Record<ClinkerPhase, number>>;

/**
 * The classic per-phase heat of hydration of a Portland cement, J per g of cement:
 *   Q = Σ_i p_i · α_i · ΔH_i
 * with p_i the phase mass fraction, α_i its degree of hydration (0–1; a single number applies to every
 * phase) and ΔH_i the heat of complete hydration of the pure phase (J/g) from the chosen set:
 * Lerch & Bogue (1934) as compiled by Bogue (1947), or Taylor (1997) Cement Chemistry, 2nd ed., ch. 7.
 * This is the check against which the thermodynamic-engine heat will be compared, not the method.
 * Phases absent from `phaseMassFractions` contribute nothing.
 */
export function perPhaseHeatJPerG(
  phaseMassFractions: ClinkerPhaseFractions,
  degrees: PhaseDegrees,
  setId: PhaseHeatSetId = "lerch-bogue",
): number {
  const set = phaseHeatData.sets.find((s) => s.id === setId);
  if (!set) throw new RangeError(`unknown phase heat set ${setId}`);
  let heatJPerG = 0;
  for (const phase of clinkerPhases) {
    const fraction = phaseMassFractions[phase] ?? 0;
    if (fraction === 0) continue;
    const degree = typeof degrees === "number" ? degrees : (degrees[phase] ?? 0);
    heatJPerG += fraction * Math.min(1, Math.max(0, degree)) * set.heatsJPerG[phase];
  }
  return heatJPerG;
}
