import model from "../data/binders/powers-model.json";

/**
 * Powers & Brownyard (1947) model of a Portland cement paste in the volume-fraction form of Jensen & Hansen
 * (2001, Cem. Concr. Res. 31, 647). With p = (w/c)/(w/c + ρw/ρc) the initial porosity and α the degree of
 * hydration, as fractions of the initial paste volume:
 *   capillary water    V_cw = p − 1.32 (1 − p) α
 *   gel water          V_gw = 0.60 (1 − p) α
 *   gel solid          V_gs = 1.52 (1 − p) α
 *   chemical shrinkage V_cs = 0.20 (1 − p) α   (empty in sealed curing, water-filled in saturated curing)
 *   unreacted cement   V_c  = (1 − p)(1 − α)
 * They sum to 1. Coefficients: `lib/data/binders/powers-model.json`. Used as an independent check on the
 * volumes from the equilibrium calculation.
 */
export type PowersPasteFractions = {
  initialPorosity: number;
  capillaryWater: number;
  gelWater: number;
  gelSolid: number;
  chemicalShrinkage: number;
  unreactedCement: number;
};

export type PowersOptions = { cementDensityGPerCm3?: number; waterDensityGPerCm3?: number };

export type CuringCondition = "sealed" | "saturated";

export function initialPorosity(waterCementRatio: number, options: PowersOptions = {}): number {
  const cementDensity = options.cementDensityGPerCm3 ?? model.cementDensityGPerCm3;
  const waterDensity = options.waterDensityGPerCm3 ?? model.waterDensityGPerCm3;
  return waterCementRatio / (waterCementRatio + waterDensity / cementDensity);
}

/** Volume fractions of the initial paste volume at degree of hydration α (0–1). */
export function powersPasteFractions(waterCementRatio: number, degreeOfHydration: number, options: PowersOptions = {}): PowersPasteFractions {
  const p = initialPorosity(waterCementRatio, options);
  const reactedCement = (1 - p) * degreeOfHydration;
  return {
    initialPorosity: p,
    capillaryWater: p - model.capillaryWaterCoefficient * reactedCement,
    gelWater: model.gelWaterCoefficient * reactedCement,
    gelSolid: model.gelSolidCoefficient * reactedCement,
    chemicalShrinkage: model.chemicalShrinkageCoefficient * reactedCement,
    unreactedCement: (1 - p) * (1 - degreeOfHydration),
  };
}

/**
 * Capillary porosity, fraction of the paste volume: capillary water plus chemical-shrinkage space
 * V_cw + V_cs = p − 1.12 (1 − p) α (the same volume in sealed and saturated curing; only its filling differs).
 */
export function powersCapillaryPorosity(waterCementRatio: number, degreeOfHydration: number, options: PowersOptions = {}): number {
  const f = powersPasteFractions(waterCementRatio, degreeOfHydration, options);
  return Math.max(0, f.capillaryWater + f.chemicalShrinkage);
}

/** Gel porosity V_gw / (V_gw + V_gs) = 0.60 / 2.12, independent of w/c and α. */
export function powersGelPorosity(): number {
  return model.gelWaterCoefficient / (model.gelWaterCoefficient + model.gelSolidCoefficient);
}

/** Chemical shrinkage, cm³ per g of cement: 0.20 α / ρc. */
export function powersChemicalShrinkageCm3PerGCement(degreeOfHydration: number, options: PowersOptions = {}): number {
  return (model.chemicalShrinkageCoefficient * degreeOfHydration) / (options.cementDensityGPerCm3 ?? model.cementDensityGPerCm3);
}

/**
 * Non-evaporable (chemically bound) water, g per g cement reacted, from the volume balance of the reaction:
 * cement + water → gel solid + shrinkage space gives w_n = ρw (1.52 + 0.20 − 1)/ρc.
 */
export function powersNonEvaporableWaterGPerGCement(options: PowersOptions = {}): number {
  const cementDensity = options.cementDensityGPerCm3 ?? model.cementDensityGPerCm3;
  const waterDensity = options.waterDensityGPerCm3 ?? model.waterDensityGPerCm3;
  return (waterDensity * (model.gelSolidCoefficient + model.chemicalShrinkageCoefficient - 1)) / cementDensity;
}

/**
 * Smallest w/c at which full hydration is possible: sealed, capillary water must cover the water consumed,
 * V_cw(α = 1) = 0 → w/c = 1.32 ρw/ρc ≈ 0.42; saturated, external water also fills the shrinkage space,
 * → w/c = (1.32 − 0.20) ρw/ρc ≈ 0.36.
 */
export function minimumWaterCementRatioForFullHydration(curing: CuringCondition, options: PowersOptions = {}): number {
  const cementDensity = options.cementDensityGPerCm3 ?? model.cementDensityGPerCm3;
  const waterDensity = options.waterDensityGPerCm3 ?? model.waterDensityGPerCm3;
  const coefficient = curing === "sealed" ? model.capillaryWaterCoefficient : model.capillaryWaterCoefficient - model.chemicalShrinkageCoefficient;
  return (coefficient * waterDensity) / cementDensity;
}

/** Largest degree of hydration the water allows: min(1, (w/c) / (w/c)_min). */
export function powersMaximumDegreeOfHydration(waterCementRatio: number, curing: CuringCondition, options: PowersOptions = {}): number {
  return Math.min(1, waterCementRatio / minimumWaterCementRatioForFullHydration(curing, options));
}
