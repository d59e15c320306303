/**
 * `npm run cli -- cure --input FILE.json`: the curing advisory (heat, element temperature, maturity and
 * strength, curing period, evaporation, cold weather, flags) as JSON. Bad input → one line naming the field, exit 2.
 *
 * Two input forms: the curing form (`cement.phasesMassPercent`, default heat model or an entered `heatCurve`), and
 * the binder form (`binder: { cement, supplementaryMaterials, heatCalculation? }` as in the assessment, mix from
 * `concrete`), whose heat curve is the thermodynamic heat of hydration of `lib/curing/thermodynamic-heat.ts`; the
 * output then carries a `thermodynamicHeat` section (the curve against age and its basis).
 */
import { readJsonInput } from "../read-input";
import { parseCuringInput } from "../../schema/curing-input";
import { adviseCuring } from "../../curing/advise-curing";
import { curingInputFromBinderForm, isBinderForm, thermodynamicHeatSection, type BinderFormConversion } from "../../curing/binder-form-input";
import { THERMODYNAMIC_HEAT_LABEL } from "../../curing/thermodynamic-heat";

export const summary = "curing advisory: element temperature, maturity, strength, curing period and risk flags";


export async function run(args: string[]): Promise<number> {
  const read = readJsonInput(args);
  if (!read.ok) {
    process.stderr.write(`${read.message}\n`);
    return 2;
  }
  let raw = read.value;
  let conversion: BinderFormConversion | undefined;
  if (isBinderForm(raw)) {
    const converted = curingInputFromBinderForm(raw);
    if (!converted.ok) {
      process.stderr.write(`input: ${converted.error.message}\n`);
      return 2;
    }
    conversion = converted.value;
    raw = conversion.curingInput;
  }
  const parsed = parseCuringInput(raw);
  if (!parsed.ok) {
    process.stderr.write(`input: ${parsed.error.message}\n`);
    return 2;
  }
  const advice = adviseCuring(parsed.value, conversion ? { heatCurveLabel: THERMODYNAMIC_HEAT_LABEL, heatCurveSource: "thermodynamic" } : {});
  const output = conversion ? { ...advice, thermodynamicHeat: thermodynamicHeatSection(conversion) } : advice;
  process.stdout.write(JSON.stringify(output, null, 2) + "\n");
  return 0;
}
