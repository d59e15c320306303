import type { Flag } from "../flag";
import { belowSulfateClassesSentence, severeSulfateExposure, severityForSulfateClass } from "../sulfate-exposure";
import type { ExposureInput } from "../../schema/exposure-input";
import type { SulfateScenario } from "../../scenarios/sulfate-ingress";

/**
 * `magnesium-sulfate-attack`: brucite or M-S-H form from magnesium sulfate water, at the expense of portlandite and C-S-H.
 * A warning in a severe sulfate class (XA2/XA3, S2/S3), a caution in XA1/S1, information without a class.
 */
export function magnesiumSulfateAttackFlag(result: SulfateScenario, context: { exposure: ExposureInput }): Flag | undefined {
  const s = result.summary;
  if (s.cation !== "Mg" || s.magnesiumPhasesOnsetDoseMmolPer100g === null) return undefined;
  const exposure = severeSulfateExposure(context.exposure);
  return {
    id: "magnesium-sulfate-attack",
    severity: severityForSulfateClass("warning", exposure),
    title: exposure.any ? "Magnesium sulfate attack: brucite and M-S-H replace calcium phases" : "Brucite and M-S-H could form with much more magnesium sulfate than this exposure brings",
    explanation:
      `Mg²⁺ + portlandite → brucite + Ca²⁺ (and Mg²⁺ with C-S-H → M-S-H + Ca²⁺) is favourable in this paste from about ${s.magnesiumPhasesOnsetDoseMmolPer100g.toFixed(0)} mmol MgSO4 per 100 g binder; ` +
      (s.portlanditeExhaustedDoseMmolPer100g !== null ? `portlandite is exhausted at ${s.portlanditeExhaustedDoseMmolPer100g.toFixed(0)} mmol, after which C-S-H decalcifies. ` : "portlandite remains within the sweep. ") +
      "The brucite layer lowers the pH at the surface and M-S-H has no binding strength of note." +
      (exposure.any ? "" : ` ${belowSulfateClassesSentence(context.exposure.sulfateMgPerL)}`),
    basis: "Bonen & Cohen 1992, Cem. Concr. Res. 22, 169 and 707 (magnesium sulfate attack); EN 206 Table 2 Mg limits; the equilibrium sweep of this assessment.",
    actions: [
      "Prefer low-w/cm concrete with a slag-rich or fly-ash binder; note that high-slag binders can be vulnerable to MgSO4 — test (ASTM C1012 in MgSO4 solution).",
      "Consider a protective barrier where Mg exceeds EN 206 XA2 (1000 mg/L).",
    ],
  };
}
