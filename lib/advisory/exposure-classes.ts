import type { ExposureInput } from "../schema/exposure-input";
import { classifyAci318, type Aci318Classification } from "./aci318-classification";
import { CAUTIONS } from "./cautions";
import { classifyEn206, type En206Classification } from "./en206-classification";

/** Exposure classes under EN 206 and ACI 318 side by side, with the statement that local provisions govern. */
export type ExposureClassification = {
  en206: En206Classification;
  aci318: Aci318Classification;
  /** National annexes and local codes govern; printed with every classification. */
  jurisdictionStatement: string;
};

export function classifyExposure(exposure: ExposureInput): ExposureClassification {
  return {
    en206: classifyEn206(exposure),
    aci318: classifyAci318(exposure),
    jurisdictionStatement: CAUTIONS["national-annexes-govern"].text,
  };
}
