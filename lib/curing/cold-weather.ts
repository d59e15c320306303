import { meanStrengthMPa, timeToStrengthH, type CementStrengthClass } from "./strength-development";

export type FreezingAssessment = {
  requiredStrengthMPa: number;
  /** Time for the surface to reach the required strength, h; null if not within the run. */
  timeToRequiredStrengthH: number | null;
  /** First time the surface falls below 0 °C, h; null if it never does in the run. */
  firstSubZeroSurfaceH: number | null;
  /** Surface strength at that time, MPa. */
  strengthAtFirstSubZeroMPa: number | null;
};

const freezingPointC = 0; // pore solution of fresh concrete freezes slightly below 0 °C; 0 °C is the conservative trigger (common practice)

/**
 * Cold-weather check: when the surface first falls below 0 °C, and whether its strength (fib MC2010 at the
 * surface equivalent age) has reached the strength required before first freezing.
 */
export function assessEarlyFreezing(
  timesH: readonly number[],
  surfaceC: readonly number[],
  surfaceEquivalentAgeH: readonly number[],
  requiredStrengthMPa: number,
  fcm28MPa: number,
  cementClass: CementStrengthClass,
): FreezingAssessment {
  const index = surfaceC.findIndex((t) => t < freezingPointC);
  return {
    requiredStrengthMPa,
    timeToRequiredStrengthH: timeToStrengthH(timesH, surfaceEquivalentAgeH, requiredStrengthMPa, fcm28MPa, cementClass),
    firstSubZeroSurfaceH: index < 0 ? null : timesH[index],
    strengthAtFirstSubZeroMPa: index < 0 ? null : meanStrengthMPa(surfaceEquivalentAgeH[index], fcm28MPa, cementClass),
  };
}
