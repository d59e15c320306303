import type { MixForCompliance } from "./exposure-compliance";
import type { SpecificationInput } from "../schema/specification-input";

/**
 * Supplementary materials that count as "pozzolan or slag cement" for ACI 318-19 Table 19.3.2.1 (class S3, option 1):
 * slag, siliceous (Class F) fly ash, silica fume, metakaolin and natural pozzolans. Calcareous (Class C) fly ash and
 * limestone are not counted: high-calcium ash can lower sulfate resistance and limestone is not a pozzolan (ACI 201.2R;
 * common practice).
 */
const POZZOLAN_OR_SLAG_TYPES: ReadonlySet<string> = new Set(["slag", "siliceous-fly-ash", "silica-fume", "metakaolin", "natural-pozzolan"]);

/** Litres per m³ in one per cent by volume. */
const LITRES_PER_M3_PER_PERCENT = 10;

type VolumeInput = { unit: "litresPerM3" | "fraction"; value: number };

export type ComplianceInputs = {
  mix: { waterBinderRatio: number; binderContentKgPerM3: number; airVolume?: VolumeInput };
  specification?: SpecificationInput;
  /** The binder's supplementary materials, those of a blended cement preset included. */
  supplementaryMaterials: readonly { type: string; massPercentOfBinder: number }[];
};

/**
 * The mix as the exposure-class comparison reads it: w/b and binder content, the air content from the mix's air
 * volume, whether the binder holds pozzolan or slag, and what the specification states (strength class or specified
 * strength, ASTM sulfate-resistance designation, calcium chloride admixture, prestressing).
 */
export function mixForCompliance({ mix, specification = {}, supplementaryMaterials }: ComplianceInputs): MixForCompliance {
  const air = mix.airVolume;
  const airContentPercent = air === undefined ? undefined : air.unit === "litresPerM3" ? air.value / LITRES_PER_M3_PER_PERCENT : air.value * 100;
  const designation = specification.sulfateResistance;
  return {
    waterBinderRatio: mix.waterBinderRatio,
    binderContentKgPerM3: mix.binderContentKgPerM3,
    ...(specification.strengthClass !== undefined ? { strengthClass: specification.strengthClass } : {}),
    ...(specification.specifiedStrengthMPa !== undefined ? { fckMPa: specification.specifiedStrengthMPa } : {}),
    ...(designation !== undefined ? { sulfateResistanceDesignation: designation } : {}),
    withPozzolanOrSlag: supplementaryMaterials.some((m) => POZZOLAN_OR_SLAG_TYPES.has(m.type) && m.massPercentOfBinder > 0),
    ...(airContentPercent !== undefined ? { airContentPercent } : {}),
    ...(specification.calciumChlorideAdmixture !== undefined ? { calciumChlorideAdmixture: specification.calciumChlorideAdmixture } : {}),
    ...(specification.prestressed !== undefined ? { prestressed: specification.prestressed } : {}),
  };
}
