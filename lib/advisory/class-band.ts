/**
 * A row of a standard's classification table: a class that applies where the measured value lies
 * within [min, max], each end inclusive or exclusive exactly as the table states it; `null` = unbounded.
 */
export type ClassBand = {
  exposureClass: string;
  min: number | null;
  minInclusive: boolean;
  max: number | null;
  maxInclusive: boolean;
};

export function bandContains(band: ClassBand, value: number): boolean {
  const aboveMin = band.min === null || (band.minInclusive ? value >= band.min : value > band.min);
  const belowMax = band.max === null || (band.maxInclusive ? value <= band.max : value < band.max);
  return aboveMin && belowMax;
}

/** The first band containing the value, or undefined where the value falls in no band (not aggressive). */
export function findBand<B extends ClassBand>(bands: readonly B[], value: number): B | undefined {
  return bands.find((b) => bandContains(b, value));
}

/** The band in words, e.g. "> 600 and ≤ 3000 mg/L". */
export function describeBand(band: ClassBand, unit: string): string {
  const parts: string[] = [];
  if (band.min !== null) parts.push(`${band.minInclusive ? "≥" : ">"} ${band.min}`);
  if (band.max !== null) parts.push(`${band.maxInclusive ? "≤" : "<"} ${band.max}`);
  return `${parts.join(" and ")} ${unit}`.trim();
}
