import type { Flag } from "../flag";
import { belowSulfateClassesSentence, severeSulfateExposure, severityForSulfateClass } from "../sulfate-exposure";
import type { ExposureInput } from "../../schema/exposure-input";
import type { SulfateScenario } from "../../scenarios/sulfate-ingress";

/**
 * `gypsum-formation`: gypsum precipitates within the sulfate sweep (decalcification and softening near the surface).
 * A caution in a sulfate exposure class, information without one (`severityForSulfateClass`).
 */
export function gypsumFormationFlag(result: SulfateScenario, context: { exposure: ExposureInput }): Flag | undefined {
  const s = result.summary;
  if (s.gypsumOnsetDoseMmolPer100g === null) return undefined;
  const exposure = severeSulfateExposure(context.exposure);
  return {
    id: "gypsum-formation",
    severity: severityForSulfateClass("caution", exposure),
    title: exposure.any ? "Gypsum forms as sulfate accumulates" : "Gypsum could form with much more sulfate than this exposure brings",
    explanation:
      `Ca²⁺ + SO4²⁻ + 2 H2O → gypsum becomes favourable (ΔrG ≤ 0, saturation index 0) once about ${s.gypsumOnsetDoseMmolPer100g.toFixed(0)} mmol SO4 per 100 g binder have been taken up ` +
      `(${s.cation}2SO4/${s.cation}SO4 water at ${s.sulfateMgPerL} mg/L). Its calcium comes from portlandite and C-S-H, which softens the surface zone.` +
      (exposure.any ? "" : ` ${belowSulfateClassesSentence(context.exposure.sulfateMgPerL)}`),
    basis: "Lothenbach et al. 2010, Cem. Concr. Res. 40, 1211 (gypsum in the outer zone of sulfate-attacked pastes); the equilibrium sweep of this assessment.",
    actions: ["Check the binder's sulfate resistance (ASTM C1012) and consider a lower w/cm.", "Where the exposure is acidic or flowing, check the EN 206 XA class of the water (pH, aggressive CO2) as well."],
  };
}
