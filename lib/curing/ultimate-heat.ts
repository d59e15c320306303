import { phaseHeatData } from "./curing-data";
import { perPhaseHeatJPerG, type PhaseHeatSetId } from "./per-phase-heat";
import { cementFractionOfBinder, scmFraction, type CuringBinder } from "./binder-description";
import { flyAshTerms } from "./hydration-degree";

const joulesPerKgPerJPerG = 1000; // 1 J/g = 1000 J/kg

/**
 * Total heat of complete hydration of the binder, J per kg of binder (Schindler & Folliard 2005):
 *   Hu = Hcem · p_cem + 461 p_slag + 1800 p_FA-CaO · p_FA   [J/g]
 * with Hcem the per-phase heat of the cement at complete hydration (Lerch & Bogue set by default).
 * Silica fume, limestone filler and other pozzolans are counted as heat-free diluents (not covered by the regression).
 */
export function ultimateHeatJPerKgBinder(binder: CuringBinder, setId: PhaseHeatSetId = "lerch-bogue"): number {
  const cementHeatJPerG = perPhaseHeatJPerG(binder.cementPhases, 1, setId);
  const ash = flyAshTerms(binder);
  const heatJPerG =
    cementHeatJPerG * cementFractionOfBinder(binder) +
    phaseHeatData.scmUltimateHeatsJPerG.slag.value * scmFraction(binder, "slag") +
    phaseHeatData.scmUltimateHeatsJPerG.flyAshPerCaOFraction.value * ash.caoMassFraction * ash.fraction;
  return heatJPerG * joulesPerKgPerJPerG;
}
