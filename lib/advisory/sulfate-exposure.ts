import { classifyAci318Sulfate } from "./aci318-classification";
import { classifyEn206ChemicalAttack } from "./en206-classification";
import type { Severity } from "./flag";
import { ACI318, EN206 } from "./standards-data";
import type { ExposureInput } from "../schema/exposure-input";

/** The sulfate exposure class of the input, as the sulfate flags weigh it. */
export type SulfateExposure = {
  /** EN 206 XA2/XA3 from sulfate, or ACI 318 S2/S3. */
  severe: boolean;
  /** Any sulfate class: EN 206 XA1–XA3 from sulfate, or ACI 318 S1–S3. */
  any: boolean;
  /** "EN 206 XA2, ACI 318 S2", or "no sulfate class". */
  label: string;
};

export function severeSulfateExposure(exposure: ExposureInput): SulfateExposure {
  const en = classifyEn206ChemicalAttack(exposure);
  const aci = classifyAci318Sulfate(exposure).assignment.exposureClass;
  const enClass = en.sulfateGoverns ? en.governingClass : undefined;
  const severe = enClass === "XA2" || enClass === "XA3" || aci === "S2" || aci === "S3";
  const any = severe || enClass === "XA1" || aci === "S1";
  return { severe, any, label: [enClass && `EN 206 ${enClass}`, aci && aci !== "S0" && `ACI 318 ${aci}`].filter(Boolean).join(", ") || "no sulfate class" };
}

/**
 * A sulfate flag's severity weighed by the exposure class: the equilibrium sweeps add the sulfate whatever its
 * concentration (a dilute water only needs more of itself), so the class says how fast the exposure can bring it.
 * Without a sulfate class the flag is information only; with a mild class (XA1/S1) at most a caution.
 */
export function severityForSulfateClass(computed: Severity, exposure: SulfateExposure): Severity {
  if (!exposure.any) return "info";
  if (!exposure.severe && computed === "warning") return "caution";
  return computed;
}

const lowestBand = (bands: readonly { exposureClass: string; min: number | null }[], exposureClass: string) => bands.find((b) => b.exposureClass === exposureClass)?.min;
const en206Sulfate = EN206.chemicalAttack.characteristics.find((c) => c.id === "groundwater-sulfate");
/** EN 206 Table 2: lower limit of XA1 for sulfate in ground water, mg/L. */
const EN206_XA1_SULFATE_MG_PER_L = en206Sulfate ? lowestBand(en206Sulfate.bands, "XA1") : undefined;
/** ACI 318-19 Table 19.3.1.1: lower limit of S1 for sulfate in water, ppm. */
const ACI318_S1_SULFATE_PPM = lowestBand(ACI318.sulfate.water.bands, "S1");

/** Why a sulfate flag is information only, for its explanation. */
export function belowSulfateClassesSentence(sulfateMgPerL: number | undefined): string {
  const given = sulfateMgPerL !== undefined && sulfateMgPerL > 0 ? `The exposure's sulfate (${sulfateMgPerL} mg/L in the water)` : "The exposure's sulfate";
  return (
    `${given} is below the lowest sulfate classes (EN 206 Table 2 XA1 from ${EN206_XA1_SULFATE_MG_PER_L} mg/L, ACI 318-19 Table 19.3.1.1 S1 from ${ACI318_S1_SULFATE_PPM} ppm): ` +
    "the equilibrium above needs far more of this water than reaches the concrete in ordinary service, so this is information, not a predicted attack."
  );
}
