import rules from "../data/binders/volume-rules.json";
import { waterDensityKgPerM3 } from "../thermo/water-density";

/**
 * Volume bookkeeping of a hydrating paste, per 100 g binder, and its scaling to 1 m³ of concrete. Pure
 * functions; the phase volumes come from the equilibrium calculation and the unreacted solids.
 *
 * Definitions (Powers & Brownyard 1947; Lothenbach et al. 2008, Cem. Concr. Res. 38, 1):
 *   initial paste          V0  = V(binder) + V(mixing water)
 *   chemical shrinkage     Vcs = V(reacted binder) + V(mixing water) − V(hydrates) − V(pore solution)
 *   water-filled and empty φ_we = (V(pore solution) + Vcs) / V0   (all space the solids leave; shrinkage space empty
 *                                                                   when sealed, refilled when water-cured)
 *   gel pores              V_gp = min(φ_g / (1 − φ_g) · V(C-S-H), V(pore solution) + Vcs)
 *   capillary porosity     φ_cap = (V(pore solution) + Vcs − V_gp) / V0   (Powers' definition: gel pores excluded)
 *   volume balance         V(solids) + V(pore solution) + Vcs = V0, solids = hydrates + unreacted binder.
 * The equilibrium C-S-H holds only its interlayer water, so the water of its gel pores is in the pore solution;
 * φ_g is Powers' characteristic gel porosity (`lib/data/binders/gel-pores.json`).
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

/**
 * φ_we = (V(pore solution) + Vcs + V_gw) / V0, a fraction of the paste volume: every pore the solids leave, water-filled
 * or empty, gel pores of the C-S-H included, with V_gw the gel water that the C-S-H end-members carry in their own
 * molar volume (`gelWaterInCarriersCm3`, 0 when they hold the solid particle only).
 */
export function waterFilledAndEmptyFraction(poreSolutionVolumeCm3: number, chemicalShrinkageVolumeCm3: number, initialPasteVolume: number, gelWaterInCarriersCm3 = 0): number {
  return (poreSolutionVolumeCm3 + chemicalShrinkageVolumeCm3 + gelWaterInCarriersCm3) / initialPasteVolume;
}

export type PoreSpaceClasses = {
  /** V_gp: gel pores of the gel-pore carriers, cm³ per 100 g binder. */
  gelPoreVolumeCm3: number;
  /** V(pore solution) + Vcs + V_gw − V_gp: capillary pores in Powers' sense, cm³ per 100 g binder. */
  capillaryPoreVolumeCm3: number;
  /** V_gp / V0. */
  gelPorosityFraction: number;
  /** φ_cap = (V(pore solution) + Vcs + V_gw − V_gp) / V0 (Powers & Brownyard 1947). */
  capillaryPorosityFraction: number;
};

/**
 * Splits the space the solids leave (pore solution + shrinkage space) into gel and capillary pores as Powers &
 * Brownyard (1947) do. The gel pores belong to the gel-pore-carrying solid (the C-S-H) at the characteristic gel
 * porosity φ_g (pores per volume of gel): V_gp = φ_g / (1 − φ_g) · V(carrier solid), limited to the pore space
 * present (they are the smallest pores, the last to empty). Where the carrier's end-members hold gel water in their
 * own molar volume (`gelWaterInCarriersCm3`, V_gw), the solid particle is V(carrier) − V_gw and V_gw counts among the
 * gel pores, so that water is not counted twice. Gel + capillary = pore solution + shrinkage + V_gw exactly; the split
 * classifies volume only and leaves the pore solution's chemistry and every balance unchanged.
 */
export function classifyPoreSpace(
  poreSolutionVolumeCm3: number,
  chemicalShrinkageVolumeCm3: number,
  gelPoreCarrierVolumeCm3: number,
  characteristicGelPorosity: number,
  initialPasteVolume: number,
  gelWaterInCarriersCm3 = 0,
): PoreSpaceClasses {
  const poreSpaceCm3 = poreSolutionVolumeCm3 + chemicalShrinkageVolumeCm3;
  // The carrier's own gel water is part of its gel pores already; only the rest is taken from the pore space.
  const particleVolumeCm3 = Math.max(0, gelPoreCarrierVolumeCm3 - gelWaterInCarriersCm3);
  const gelCapacityCm3 = (characteristicGelPorosity / (1 - characteristicGelPorosity)) * particleVolumeCm3;
  const fromPoreSpaceCm3 = Math.max(0, Math.min(gelCapacityCm3 - gelWaterInCarriersCm3, poreSpaceCm3));
  const gelPoreVolumeCm3 = gelWaterInCarriersCm3 + fromPoreSpaceCm3;
  const capillaryPoreVolumeCm3 = poreSpaceCm3 - fromPoreSpaceCm3;
  return {
    gelPoreVolumeCm3,
    capillaryPoreVolumeCm3,
    gelPorosityFraction: gelPoreVolumeCm3 / initialPasteVolume,
    capillaryPorosityFraction: capillaryPoreVolumeCm3 / initialPasteVolume,
  };
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
