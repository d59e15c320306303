import type { BinderSystem } from "../cement/binder-system";
import { adviseCuring, type CuringAdvice } from "../curing/advise-curing";
import type { CuringModelWarning } from "../curing/model-range-warnings";
import { THERMODYNAMIC_HEAT_LABEL, thermodynamicHeatCurve } from "../curing/thermodynamic-heat";
import type { Dataset } from "../data/load-dataset";
import type { HeatCurveInput, WarmStartBook } from "../scenarios/sweep";
import type { AssessInput } from "../schema/assess-input";

export type CuringHeatWarning = { code: "thermodynamic_heat_unavailable"; reason: string; message: string };
/** The warnings of an assessment's curing part: the heat source fallback and the model-range warnings of the advice. */
export type AssessmentCuringWarning = CuringHeatWarning | CuringModelWarning;

/**
 * The element temperature the classic per-phase heats would give (Schindler & Folliard 2005 curve), beside the one the
 * thermodynamic heat drives: the spread between two published heat models, for the engineer to see.
 */
export type PerPhaseHeatCheck = { label: string; peakCoreC: number; peakTimeH: number; maxDifferenceC: number };

/** The curing advice of an assessment, with the per-phase check when the thermodynamic heat drove it. */
export type AssessmentCuringAdvice = CuringAdvice & { perPhaseHeatCheck?: PerPhaseHeatCheck };

/**
 * The curing advice of an assessment. Its heat source is, in this order: the heat curve entered with the thermal model
 * (a measured calorimetry curve governs); the heat of hydration from the enthalpies of the thermodynamic data set for
 * the assessment's binder, mix and reaction model (issue 6: the method; the classic per-phase heats are reported beside
 * it as the check); and, where the data set lacks an enthalpy (the glasses of slag, fly ash and natural pozzolans, and
 * metakaolin), the per-phase heats with the Schindler & Folliard (2005) curve, with a warning saying so.
 *
 * With the thermodynamic heat, the element temperature of the per-phase heats is reported beside it (`perPhaseHeatCheck`):
 * for a plain CEM I the two published models can differ by 20 °C at the peak (tests/service/assessment-curing.test.ts).
 *
 * The thermodynamic curve is computed once per data set as loaded: a Monte Carlo sample reads the reference run's
 * curve from the warm-start book, so its element temperature, and the curing peak its DEF check uses, are the
 * deterministic run's (the heat's data uncertainty is not sampled). Neither it nor the reference run computes the check.
 */
export function assessmentCuring(input: AssessInput, binder: BinderSystem, dataset: Dataset, book: WarmStartBook | undefined): { curing?: AssessmentCuringAdvice; warnings: AssessmentCuringWarning[] } {
  const thermal = input.curing.thermal;
  if (!thermal) return { warnings: [] };
  if (thermal.heatCurve) {
    const entered = adviseCuring(thermal);
    return { curing: entered, warnings: entered.warnings };
  }
  const computed = book?.mode === "read" && book.heatCurve !== undefined ? { curve: book.heatCurve, warning: undefined } : thermodynamicCurve(binder, dataset);
  if (book?.mode === "record") book.heatCurve = computed.curve;
  if (!computed.curve) {
    const fallback = adviseCuring(thermal);
    return { curing: fallback, warnings: [...(computed.warning ? [computed.warning] : []), ...fallback.warnings] };
  }
  const curing = adviseCuring({ ...thermal, heatCurve: computed.curve }, { heatCurveLabel: THERMODYNAMIC_HEAT_LABEL, heatCurveSource: "thermodynamic" });
  // The Monte Carlo path (its reference run and its samples) needs only the flags; the check is for the deterministic result.
  if (book) return { curing, warnings: curing.warnings };
  const perPhase = adviseCuring(thermal);
  const t = perPhase.temperature;
  return { curing: { ...curing, perPhaseHeatCheck: { label: perPhase.heatModel.label, peakCoreC: t.peakCoreC, peakTimeH: t.peakTimeH, maxDifferenceC: t.maxDifferenceC } }, warnings: curing.warnings };
}

function thermodynamicCurve(binder: BinderSystem, dataset: Dataset): { curve: HeatCurveInput | null; warning?: CuringHeatWarning } {
  const curve = thermodynamicHeatCurve(binder.binder, { dataset });
  if (curve.ok) return { curve: curve.value.heatCurveInput };
  const error = curve.error;
  const message =
    error.code === "enthalpy_unavailable"
      ? `the data set has no enthalpy for the ${error.uncovered.map((u) => u.scmType).join(", ")} glass`
      : "message" in error && typeof error.message === "string"
        ? error.message
        : error.code;
  return { curve: null, warning: { code: "thermodynamic_heat_unavailable", reason: error.code, message } };
}
