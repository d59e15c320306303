import rules from "../data/binders/oxide-to-phase-rules.json";
import type { OxideAnalysisMassPercent } from "../schema/binder-input";
import { checkAnalysisTotal, type AnalysisTotalWarning } from "./analysis-total";
import { oxideMolarMassGPerMol } from "./oxides";
import { allocateSulfate } from "./sulfate-allocation";

export type BoguePhase = "C3S" | "C2S" | "C3A" | "C4AF" | "ssFerrite";

export type BogueWarning =
  | AnalysisTotalWarning
  | { code: "negative_bogue_phase"; phase: BoguePhase; massPercent: number };

export type BogueOptions = {
  /** Subtract free lime from CaO (Taylor 1997 §4.3; ASTM C150 notes). Default true. */
  subtractFreeLime?: boolean;
  /** Allocate SO3 to K2SO4, then Na2SO4, before CaSO4 (Taylor 1997 §4.3). Default true. */
  alkaliSulfatesFirst?: boolean;
  /** Subtract the CaO bound to CO2 as calcite (limestone in cement), CaO = CO2·M(CaO)/M(CO2). Default true. */
  subtractCalcite?: boolean;
};

export type BogueResult = {
  /** "normal": A/F ≥ 0.64 (C4AF and C3A); "low-alumina": A/F < 0.64 (ferrite solid solution, no C3A). */
  ferriteCase: "normal" | "low-alumina";
  aluminaFerricRatio: number;
  /** Potential phase composition, mass % of the cement. ssFerrite is zero in the normal case, C4AF zero in the other. */
  phasesMassPercent: Record<BoguePhase, number>;
  /** The CaO (mass %) entered in the equations after the corrections. */
  correctedCaOMassPercent: number;
  /** The SO3 (mass %) assigned to calcium sulfate after the alkali sulfates. */
  calciumSulfateSO3MassPercent: number;
  arcaniteMassPercent: number;
  thenarditeMassPercent: number;
  warnings: BogueWarning[];
};

function linear(coefficients: Record<string, number>, values: Record<string, number>): number {
  let sum = 0;
  for (const [key, coefficient] of Object.entries(coefficients)) sum += coefficient * (values[key] ?? 0);
  return sum;
}

/**
 * Potential phase composition by the Bogue equations of ASTM C150 Annex A1 (coefficients in
 * `lib/data/binders/oxide-to-phase-rules.json`), A/F = Al2O3/Fe2O3 by mass:
 *  A/F ≥ 0.64: C3S = 4.071 C − 7.600 S − 6.718 A − 1.430 F − 2.852 S̄; C2S = 2.867 S − 0.7544 C3S;
 *              C3A = 2.650 A − 1.692 F; C4AF = 3.043 F.
 *  A/F < 0.64: ss(C4AF + C2F) = 2.100 A + 1.702 F; C3A = 0; C3S = 4.071 C − 7.600 S − 4.479 A − 2.859 F − 2.852 S̄.
 * with the corrections of Taylor (1997) §4.3: C is CaO less free lime (and less CaO bound in calcite), and S̄ is
 * the SO3 left after K2SO4 and Na2SO4 have been formed. Inputs and outputs in mass %.
 */
export function bogueAstmC150(oxides: OxideAnalysisMassPercent, options: BogueOptions = {}): BogueResult {
  const { subtractFreeLime = true, alkaliSulfatesFirst = true, subtractCalcite = true } = options;
  const sulfate = allocateSulfate(oxides.SO3 ?? 0, oxides.K2O ?? 0, oxides.Na2O ?? 0, alkaliSulfatesFirst);
  const so3Molar = oxideMolarMassGPerMol("SO3");
  const calciumSulfateSO3MassPercent = sulfate.calciumSulfateMol * so3Molar;
  const calciteCaOMassPercent = subtractCalcite ? ((oxides.CO2 ?? 0) * oxideMolarMassGPerMol("CaO")) / oxideMolarMassGPerMol("CO2") : 0;
  const correctedCaOMassPercent = (oxides.CaO ?? 0) - (subtractFreeLime ? (oxides.freeLime ?? 0) : 0) - calciteCaOMassPercent;
  const values: Record<string, number> = {
    CaO: correctedCaOMassPercent,
    SiO2: oxides.SiO2 ?? 0,
    Al2O3: oxides.Al2O3 ?? 0,
    Fe2O3: oxides.Fe2O3 ?? 0,
    SO3: calciumSulfateSO3MassPercent,
  };
  const aluminaFerricRatio = values.Fe2O3 > 0 ? values.Al2O3 / values.Fe2O3 : Number.POSITIVE_INFINITY;
  const ferriteCase = aluminaFerricRatio >= rules.aluminaFerricRatioThreshold ? "normal" : "low-alumina";
  const phases: Record<BoguePhase, number> = { C3S: 0, C2S: 0, C3A: 0, C4AF: 0, ssFerrite: 0 };
  if (ferriteCase === "normal") {
    const c = rules.normalCase;
    phases.C3S = linear(c.C3S, values);
    phases.C2S = linear(c.C2S, { ...values, C3S: phases.C3S });
    phases.C3A = linear(c.C3A, values);
    phases.C4AF = linear(c.C4AF, values);
  } else {
    const c = rules.lowAluminaCase;
    phases.C3S = linear(c.C3S, values);
    phases.C2S = linear(c.C2S, { ...values, C3S: phases.C3S });
    phases.ssFerrite = linear(c.ssFerrite, values);
  }
  const warnings: BogueWarning[] = [];
  const totalWarning = checkAnalysisTotal(oxides, "cement");
  if (totalWarning) warnings.push(totalWarning);
  for (const phase of Object.keys(phases) as BoguePhase[]) {
    if (phases[phase] < 0) warnings.push({ code: "negative_bogue_phase", phase, massPercent: phases[phase] });
  }
  return {
    ferriteCase,
    aluminaFerricRatio,
    phasesMassPercent: phases,
    correctedCaOMassPercent,
    calciumSulfateSO3MassPercent,
    arcaniteMassPercent: sulfate.arcaniteMol * (oxideMolarMassGPerMol("K2O") + so3Molar),
    thenarditeMassPercent: sulfate.thenarditeMol * (oxideMolarMassGPerMol("Na2O") + so3Molar),
    warnings,
  };
}
