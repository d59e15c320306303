import rules from "../data/binders/oxide-to-phase-rules.json";
import type { OxideAnalysisMassPercent } from "../schema/binder-input";

/**
 * Sum of a chemical analysis in mass %: every oxide, plus LOI (or CO2 when no LOI is given, CO2 being part of
 * LOI), plus Cl. Free lime is part of CaO and is not added again.
 */
export function analysisTotalMassPercent(oxides: OxideAnalysisMassPercent): number {
  const o = (value: number | undefined) => value ?? 0;
  return (
    o(oxides.CaO) + o(oxides.SiO2) + o(oxides.Al2O3) + o(oxides.Fe2O3) + o(oxides.MgO) + o(oxides.SO3) + o(oxides.Na2O) +
    o(oxides.K2O) + o(oxides.TiO2) + o(oxides.P2O5) + o(oxides.Mn2O3) + (oxides.LOI ?? o(oxides.CO2)) + o(oxides.Cl)
  );
}

export type AnalysisTotalWarning = {
  code: "analysis_total_out_of_range";
  /** Which analysis: "cement" or "supplementaryMaterials.<type>". */
  material: string;
  totalMassPercent: number;
  minMassPercent: number;
  maxMassPercent: number;
};

export const analysisTotalRangeMassPercent = rules.analysisTotalRangeMassPercent as [number, number];

/** A warning when the analysis total lies outside 97–101 % (range and basis in oxide-to-phase-rules.json). */
export function checkAnalysisTotal(oxides: OxideAnalysisMassPercent, material: string): AnalysisTotalWarning | undefined {
  const totalMassPercent = analysisTotalMassPercent(oxides);
  const [minMassPercent, maxMassPercent] = analysisTotalRangeMassPercent;
  if (totalMassPercent >= minMassPercent && totalMassPercent <= maxMassPercent) return undefined;
  return { code: "analysis_total_out_of_range", material, totalMassPercent, minMassPercent, maxMassPercent };
}
