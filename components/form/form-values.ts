import type { AssessInputRaw } from "../../lib/schema/assess-input";

type Loose = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

/**
 * Schema values as the form's selects hold them, for opening a saved input or the demo: the selects carry text, so the
 * booleans behind "Sea water" (true → "yes") and "Calcium chloride admixture" (true/false → "yes"/"no") are written
 * as their options' values. The selects' `setValueAs` turns them back (`form-choices.ts`).
 */
export function formValuesOf(input: AssessInputRaw): AssessInputRaw {
  const out: Loose = structuredClone(input);
  if (out.exposure?.seawater === true) out.exposure.seawater = "yes";
  const chloride = out.specification?.calciumChlorideAdmixture;
  if (typeof chloride === "boolean") out.specification.calciumChlorideAdmixture = chloride ? "yes" : "no";
  return out as AssessInputRaw;
}
