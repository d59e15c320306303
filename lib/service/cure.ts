import { adviseCuring, type CuringAdvice } from "../curing/advise-curing";
import { curingInputFromBinderForm, isBinderForm, thermodynamicHeatSection, type BinderFormConversion } from "../curing/binder-form-input";
import { THERMODYNAMIC_HEAT_LABEL } from "../curing/thermodynamic-heat";
import { curingInputSchema } from "../schema/curing-input";
import { formatIssues } from "../schema/format-issues";
import { validationError, type ServiceOutcome } from "./outcome";
import { runningVersions } from "./versions";

export type CureOutput = CuringAdvice & { thermodynamicHeat?: ReturnType<typeof thermodynamicHeatSection>; versions: { dataset: string; engine: string } };

/**
 * `POST /api/v1/cure`: the curing advisory (schema `curingInputSchema`), every schema issue at once. As on the command
 * line, the input may instead give the binder as the assessment does (`binder: { cement, supplementaryMaterials,
 * heatCalculation? }`, `lib/curing/binder-form-input.ts`): the heat curve is then the thermodynamic heat of hydration
 * of that binder, and the output carries its `thermodynamicHeat` section.
 */
export function runCure(raw: unknown): ServiceOutcome<CureOutput> {
  let input = raw;
  let conversion: BinderFormConversion | undefined;
  if (isBinderForm(raw)) {
    const converted = curingInputFromBinderForm(raw);
    if (!converted.ok) return validationError([{ path: converted.error.field, message: converted.error.message }]);
    conversion = converted.value;
    input = conversion.curingInput;
  }
  const parsed = curingInputSchema.safeParse(input);
  if (!parsed.success) return validationError(formatIssues(parsed.error));
  if (!conversion) return { ok: true, value: { ...adviseCuring(parsed.data), versions: runningVersions() } };
  const advice = adviseCuring(parsed.data, { heatCurveLabel: THERMODYNAMIC_HEAT_LABEL, heatCurveSource: "thermodynamic" });
  return { ok: true, value: { ...advice, thermodynamicHeat: thermodynamicHeatSection(conversion), versions: runningVersions() } };
}
