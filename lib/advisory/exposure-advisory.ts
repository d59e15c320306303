import { parseExposureInput, type InputError } from "../schema/exposure-input";
import { cautionTextsFor } from "./cautions";
import { classifyExposure, type ExposureClassification } from "./exposure-classes";
import { checkCompliance, validateMixForCompliance, type ComplianceResult, type MixError, type MixForCompliance } from "./exposure-compliance";
import { sortFlags, type Flag } from "./flag";

/**
 * The exposure-class part of an assessment, ready for the `assess` command and the API: parse the exposure,
 * classify it under EN 206 and ACI 318, check the mix against both (when a mix is given), and attach the
 * flags and the standard cautions.
 */
export type ExposureAdvisory = {
  exposureClasses: ExposureClassification;
  compliance?: ComplianceResult;
  flags: Flag[];
  cautions: string[];
};

export function assessExposureClasses(
  exposure: unknown,
  mix?: MixForCompliance,
): { ok: true; value: ExposureAdvisory } | { ok: false; error: InputError | MixError } {
  const parsed = parseExposureInput(exposure);
  if (!parsed.ok) return parsed;
  if (mix) {
    const mixError = validateMixForCompliance(mix);
    if (mixError) return { ok: false, error: mixError };
  }
  const exposureClasses = classifyExposure(parsed.value);
  const compliance = mix ? checkCompliance(mix, exposureClasses) : undefined;
  return {
    ok: true,
    value: { exposureClasses, compliance, flags: sortFlags(compliance?.flags ?? []), cautions: cautionTextsFor("exposure-classification") },
  };
}
