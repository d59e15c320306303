import rules from "../data/binders/volume-rules.json";
import { waterDensityKgPerM3 } from "../thermo/water-density";

/**
 * Volume bookkeeping of a hydrating paste, per 100 g binder, and its scaling to 1 m³ of concrete. Pure
 * functions; the phase volumes come from the equilibrium calculation and the unreacted solids.
 *
 * Definitions (Powers & Brownyard 1947; Lothenbach et al. 2008, Cem. Concr. Res. 38, 1):
 *   initial paste          V0  = V(binder) + V(mixing water)
 *   chemical shrinkage     Vcs = V(reacted binder) + V(mixing water) − V(hydrates) − V(pore solution)
 *   capillary porosity     φ   = (V(pore solution) + Vcs) / V0      (shrinkage space empty when sealed, refilled when water-cured)
 *   volume balance         V(solids) + V(pore solution) + Vcs = V0, solids = hydrates + unreacted binder.
 */

/** Density of the mixing water, g/cm³, at the mixing temperature (Kell 1975 via lib/thermo). */
export function mixingWaterDensityGPerCm3(temperatureC: number): number {
  return waterDensityKgPerM3(temperatureC + 273.15) / 1000;
}

export function initialPasteVolumeCm3(binderVolumeCm3: number, mixingWaterMassG: number, waterDensityGPerCm3: number): number {
  return binderVolumeCm3 + mixingWaterMassG / waterDensityGPerCm3;
}

export type ShrinkageInput = {
  reactedBinderVolumeCm3: number;
  mixingWaterVolumeCm3: number;
  hydrateVolumeCm3: number;
  poreSolutionVolumeCm3: number;
};

/** Vcs = V(reacted binder) + V(mixing water) − V(hydrates) − V(pore solution), cm³ per 100 g binder. */
export function chemicalShrinkageCm3(input: ShrinkageInput): number {
  return input.reactedBinderVolumeCm3 + input.mixingWaterVolumeCm3 - input.hydrateVolumeCm3 - input.poreSolutionVolumeCm3;
}

/** φ = (V(pore solution) + Vcs) / V0, a fraction of the paste volume. */
export function capillaryPorosityFraction(poreSolutionVolumeCm3: number, chemicalShrinkageVolumeCm3: number, initialPasteVolume: number): number {
  return (poreSolutionVolumeCm3 + chemicalShrinkageVolumeCm3) / initialPasteVolume;
}

export type VolumeBalance = {
  residualCm3: number;
  relativeResidual: number;
  toleranceRelative: number;
  withinTolerance: boolean;
};

/** Checks V(solids) + V(pore solution) + Vcs against V0 (tolerance 0.5 %, volume-rules.json). */
export function volumeBalance(
  solidVolumesCm3: Record<string, number>,
  poreSolutionVolumeCm3: number,
  chemicalShrinkageVolumeCm3: number,
  initialPasteVolume: number,
): VolumeBalance {
  const solids = Object.values(solidVolumesCm3).reduce((sum, v) => sum + v, 0);
  const residualCm3 = solids + poreSolutionVolumeCm3 + chemicalShrinkageVolumeCm3 - initialPasteVolume;
  const relativeResidual = Math.abs(residualCm3) / initialPasteVolume;
  const toleranceRelative = rules.volumeBalanceToleranceRelative;
  return { residualCm3, relativeResidual, toleranceRelative, withinTolerance: relativeResidual <= toleranceRelative };
}

/**
 * Per-100 g binder → per m³ of concrete: × (binder content kg/m³ × 1000 g/kg / 100 g) = × 10·B.
 * Volumes: cm³ per 100 g → L per m³ is × B/100; masses: g per 100 g → kg per m³ is × B/100.
 */
export function per100gToPerM3(valuePer100gBinder: number, binderContentKgPerM3: number): number {
  return (valuePer100gBinder * binderContentKgPerM3) / 100;
}

export type VolumeEntry = { unit: "litresPerM3" | "fraction"; value: number };

export function litresPerM3(entry: VolumeEntry | undefined): number {
  if (!entry) return 0;
  return entry.unit === "litresPerM3" ? entry.value : entry.value * 1000;
}

export type ConcreteVolumeCheck = {
  pasteLitresPerM3: number;
  aggregateLitresPerM3: number;
  airLitresPerM3: number;
  totalLitresPerM3: number;
  warning?: { code: "mix_volume_mismatch"; totalLitresPerM3: number; targetLitresPerM3: number; toleranceRelative: number };
};

/** Paste (from binder content) + aggregate + air against 1000 L/m³ (±2 %, volume-rules.json); needs the aggregate volume. */
export function concreteVolumeCheck(
  initialPasteVolumePer100gCm3: number,
  binderContentKgPerM3: number,
  aggregate: VolumeEntry | undefined,
  air: VolumeEntry | undefined,
): ConcreteVolumeCheck {
  const pasteLitresPerM3 = per100gToPerM3(initialPasteVolumePer100gCm3, binderContentKgPerM3);
  const aggregateLitresPerM3 = litresPerM3(aggregate);
  const airLitresPerM3 = litresPerM3(air);
  const totalLitresPerM3 = pasteLitresPerM3 + aggregateLitresPerM3 + airLitresPerM3;
  const target = rules.concreteVolumeTargetLitresPerM3;
  const tolerance = rules.concreteVolumeToleranceRelative;
  const check: ConcreteVolumeCheck = { pasteLitresPerM3, aggregateLitresPerM3, airLitresPerM3, totalLitresPerM3 };
  if (aggregate && Math.abs(totalLitresPerM3 - target) > tolerance * target) {
    check.warning = { code: "mix_volume_mismatch", totalLitresPerM3, targetLitresPerM3: target, toleranceRelative: tolerance };
  }
  return check;
}
