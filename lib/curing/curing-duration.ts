import { en13670Data, type StrengthDevelopmentId } from "./curing-data";
import { relativeStrength, timeToStrengthH, type CementStrengthClass } from "./strength-development";

const hoursPerDay = 24;
const earlyAgeDays = 2; // EN 206 defines the strength-development ratio with the 2-day strength

export type CuringClass = 1 | 2 | 3 | 4;

export type CuringDurationResult = {
  curingClass: CuringClass;
  /** Surface strength that ends curing, MPa (null for class 1, which is a fixed period). */
  requiredSurfaceStrengthMPa: number | null;
  /** Minimum curing period from the computed surface strength development, days; null if not reached in the run. */
  computedDays: number | null;
  /** Strength-development ratio r = f_cm(2 d)/f_cm(28 d) at the reference temperature (EN 206 Table 16). */
  developmentRatio: number;
  development: StrengthDevelopmentId;
  /** Mean surface temperature over the curing period used to read the table, °C. */
  meanSurfaceTemperatureC: number;
  /** The standard's informative table value, days; null when the table does not cover the case. */
  tableDays: number | null;
  tableSource: string;
  basis: string;
};

/** EN 206 Table 16 strength development from r = f_cm2/f_cm28. */
export function strengthDevelopmentClass(ratio: number): StrengthDevelopmentId {
  const bands = [...en13670Data.strengthDevelopment].sort((a, b) => b.minimumRatio - a.minimumRatio);
  return (bands.find((b) => ratio >= b.minimumRatio) ?? bands[bands.length - 1]).id;
}

/** The EN 13670 Annex F table value (days) for the class, mean surface temperature and development; null if not tabulated. */
export function tableMinimumCuringDays(curingClass: CuringClass, surfaceTemperatureC: number, development: StrengthDevelopmentId): number | null {
  const table = en13670Data.minimumDaysTables.find((t) => t.curingClass === curingClass);
  if (!table) return null;
  const rows = [...table.rows].sort((a, b) => b.minSurfaceTemperatureC - a.minSurfaceTemperatureC);
  const row = rows.find((r) => surfaceTemperatureC >= r.minSurfaceTemperatureC);
  return row ? (row.days[development] ?? null) : null;
}

/**
 * Minimum curing period by EN 13670:2009 8.5: class 1 a fixed 12 h; classes 2–4 until the surface reaches
 * 35 / 50 / 70 % of the specified characteristic strength f_ck. The surface strength comes from the fib MC2010
 * function at the surface equivalent age, so the period follows the computed surface temperature.
 */
export function minimumCuringPeriod(
  curingClass: CuringClass,
  timesH: readonly number[],
  surfaceC: readonly number[],
  surfaceEquivalentAgeH: readonly number[],
  fckMPa: number,
  fcm28MPa: number,
  cementClass: CementStrengthClass,
): CuringDurationResult {
  const spec = en13670Data.curingClasses.find((c) => c.curingClass === curingClass);
  if (!spec) throw new RangeError(`unknown curing class ${curingClass}`);
  let computedH: number | null;
  let required: number | null = null;
  if (spec.periodH !== undefined) computedH = spec.periodH;
  else {
    required = (spec.fractionOfFck ?? 0) * fckMPa;
    computedH = timeToStrengthH(timesH, surfaceEquivalentAgeH, required, fcm28MPa, cementClass);
  }
  const endH = computedH ?? timesH[timesH.length - 1];
  let sum = 0;
  let count = 0;
  for (let i = 0; i < timesH.length && timesH[i] <= Math.max(endH, timesH[1] ?? 0); i++) {
    sum += surfaceC[i];
    count++;
  }
  const meanSurfaceTemperatureC = count ? sum / count : surfaceC[0];
  const developmentRatio = relativeStrength(earlyAgeDays * hoursPerDay, cementClass);
  const development = strengthDevelopmentClass(developmentRatio);
  const table = en13670Data.minimumDaysTables.find((t) => t.curingClass === curingClass);
  return {
    curingClass,
    requiredSurfaceStrengthMPa: required,
    computedDays: computedH === null ? null : computedH / hoursPerDay,
    developmentRatio,
    development,
    meanSurfaceTemperatureC,
    tableDays: tableMinimumCuringDays(curingClass, meanSurfaceTemperatureC, development),
    tableSource: table ? table.source : `EN 13670 tabulates class ${curingClass} only in national annexes; no table in the data file`,
    basis: spec.source,
  };
}
