import type { ExposureInput } from "../schema/exposure-input";

/**
 * Unit conversions of exposure quantities used by both standards.
 * Atomic weights: IUPAC 2021 standard atomic weights (Mg 24.305, S 32.06, O 15.999).
 */

export const MAGNESIUM_G_PER_MOL = 24.305;
export const SULFATE_G_PER_MOL = 32.06 + 4 * 15.999;

/** Mg that accompanies the given SO4 where the sulfate is all MgSO4: c(Mg) = c(SO4)·M(Mg)/M(SO4). */
export function magnesiumFromMagnesiumSulfateMgPerL(sulfateMgPerL: number): number {
  return (sulfateMgPerL * MAGNESIUM_G_PER_MOL) / SULFATE_G_PER_MOL;
}

/** 1 % by mass = 10 000 mg/kg. */
export const MG_PER_KG_PER_MASS_PERCENT = 10_000;

export function soilSulfateMgPerKg(e: Pick<ExposureInput, "soilSulfateMgPerKg" | "soilSulfateMassPercent">):
  | { valueMgPerKg: number; derivedFrom?: string }
  | undefined {
  if (e.soilSulfateMgPerKg !== undefined) return { valueMgPerKg: e.soilSulfateMgPerKg };
  if (e.soilSulfateMassPercent !== undefined)
    return { valueMgPerKg: e.soilSulfateMassPercent * MG_PER_KG_PER_MASS_PERCENT, derivedFrom: `${e.soilSulfateMassPercent} % by mass × 10 000` };
  return undefined;
}

export function soilSulfateMassPercent(e: Pick<ExposureInput, "soilSulfateMgPerKg" | "soilSulfateMassPercent">):
  | { valueMassPercent: number; derivedFrom?: string }
  | undefined {
  if (e.soilSulfateMassPercent !== undefined) return { valueMassPercent: e.soilSulfateMassPercent };
  if (e.soilSulfateMgPerKg !== undefined)
    return { valueMassPercent: e.soilSulfateMgPerKg / MG_PER_KG_PER_MASS_PERCENT, derivedFrom: `${e.soilSulfateMgPerKg} mg/kg ÷ 10 000` };
  return undefined;
}
