import { maturityStrengthData } from "./curing-data";

export type CementStrengthClass = "R" | "N" | "S";
const hoursPerDay = 24;
const referenceAgeDays = maturityStrengthData.referenceAgeDays.value;

/** The fib MC2010 coefficient s of the cement strength class (0.20 R, 0.25 N, 0.38 S). */
export function strengthDevelopmentS(cementClass: CementStrengthClass): number {
  return maturityStrengthData.strengthDevelopmentS[cementClass].value;
}

/**
 * Relative strength by fib Model Code 2010 eq. 5.1-51 (also EN 1992-1-1 eq. 3.2):
 *   β_cc(t) = exp{ s [1 − (28/t)^½] },  t in days (here the equivalent age at 20 °C-type reference), β_cc(28) = 1.
 */
export function relativeStrength(equivalentAgeH: number, cementClass: CementStrengthClass): number {
  if (equivalentAgeH <= 0) return 0;
  const ageDays = equivalentAgeH / hoursPerDay;
  return Math.exp(strengthDevelopmentS(cementClass) * (1 - Math.sqrt(referenceAgeDays / ageDays)));
}

/** Mean compressive strength f_cm(t_e) = β_cc(t_e) · f_cm28, MPa. */
export function meanStrengthMPa(equivalentAgeH: number, fcm28MPa: number, cementClass: CementStrengthClass): number {
  return relativeStrength(equivalentAgeH, cementClass) * fcm28MPa;
}

/**
 * Equivalent age (h) at which f_cm(t_e) reaches the target, from the inverse of β_cc:
 *   t = 28 / (1 − ln(f/f_cm28)/s)² days. Null when the target is at or above the asymptote e^s · f_cm28.
 */
export function equivalentAgeForStrengthH(targetMPa: number, fcm28MPa: number, cementClass: CementStrengthClass): number | null {
  if (targetMPa <= 0) return 0;
  const s = strengthDevelopmentS(cementClass);
  const denominator = 1 - Math.log(targetMPa / fcm28MPa) / s;
  if (denominator <= 0) return null;
  return (referenceAgeDays / denominator ** 2) * hoursPerDay;
}

/**
 * First time (h) at which a cumulative equivalent-age history reaches the age that gives the target strength,
 * linearly interpolated between samples; null if it is not reached within the history.
 */
export function timeToStrengthH(
  timesH: readonly number[],
  equivalentAgesH: readonly number[],
  targetMPa: number,
  fcm28MPa: number,
  cementClass: CementStrengthClass,
): number | null {
  const targetAgeH = equivalentAgeForStrengthH(targetMPa, fcm28MPa, cementClass);
  if (targetAgeH === null) return null;
  if (targetAgeH <= 0) return 0;
  for (let i = 1; i < timesH.length; i++) {
    if (equivalentAgesH[i] >= targetAgeH) {
      const w = (targetAgeH - equivalentAgesH[i - 1]) / (equivalentAgesH[i] - equivalentAgesH[i - 1]);
      return timesH[i - 1] + w * (timesH[i] - timesH[i - 1]);
    }
  }
  return null;
}
