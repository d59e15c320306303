import type { Flag } from "../flag";
import type { SulfateScenario } from "../../scenarios/sulfate-ingress";

/** `gypsum-formation`: gypsum precipitates within the sulfate sweep (decalcification and softening near the surface). */
export function gypsumFormationFlag(result: SulfateScenario): Flag | undefined {
  const s = result.summary;
  if (s.gypsumOnsetDoseMmolPer100g === null) return undefined;
  return {
    id: "gypsum-formation",
    severity: "caution",
    title: "Gypsum forms as sulfate accumulates",
    explanation:
      `Ca²⁺ + SO4²⁻ + 2 H2O → gypsum becomes favourable (ΔrG ≤ 0, saturation index 0) once about ${s.gypsumOnsetDoseMmolPer100g.toFixed(0)} mmol SO4 per 100 g binder have been taken up ` +
      `(${s.cation}2SO4/${s.cation}SO4 water at ${s.sulfateMgPerL} mg/L). Its calcium comes from portlandite and C-S-H, which softens the surface zone.`,
    basis: "Lothenbach et al. 2010, Cem. Concr. Res. 40, 1211 (gypsum in the outer zone of sulfate-attacked pastes); the equilibrium sweep of this assessment.",
    actions: ["Check the binder's sulfate resistance (ASTM C1012) and consider a lower w/cm.", "Where the exposure is acidic or flowing, check the EN 206 XA class of the water (pH, aggressive CO2) as well."],
  };
}
