import { binderSystemFromInput, type BinderSystem } from "../cement/binder-system";
import { hydratePaste, type HydratedPaste } from "../cement/hydrate-paste";
import { hydrationTimeline, type TimelineEntry, type TimelineWarning } from "../cement/hydration-timeline";
import { classifyExposure, type ExposureClassification } from "../advisory/exposure-classes";
import { checkCompliance, type ComplianceResult } from "../advisory/exposure-compliance";
import { mixForCompliance } from "../advisory/mix-for-compliance";
import { sortFlags, type Flag } from "../advisory/flag";
import { carbonationDepassivationFlag } from "../advisory/flag-rules/carbonation-depassivation";
import { gypsumFormationFlag } from "../advisory/flag-rules/gypsum-formation";
import { lowAlkalinityReserveFlag } from "../advisory/flag-rules/low-alkalinity-reserve";
import { magnesiumSulfateAttackFlag } from "../advisory/flag-rules/magnesium-sulfate-attack";
import { sulfateAttackFlag } from "../advisory/flag-rules/sulfate-attack";
import { severeSulfateExposure } from "../advisory/sulfate-exposure";
import { describeFailure } from "../equilibrium/failure";
import { binderSystemIssue } from "../cement/binder-system-issue";
import { carbonationScenario, type CarbonationScenario } from "../scenarios/carbonation";
import { chlorideBinding, exposureChlorideMgPerL, type ChlorideBindingScenario } from "../scenarios/chloride-binding";
import { dryingScenario, type DryingScenario } from "../scenarios/drying";
import { temperatureHistory, type TemperatureHistoryResult } from "../scenarios/temperature-history";
import { thaumasite, type ThaumasiteResult } from "../scenarios/thaumasite";
import { chlorideBindingLimitFlag } from "../advisory/flag-rules/chloride-binding-limit";
import { defDecisionTemperaturesC, delayedEttringiteFormationFlag } from "../advisory/flag-rules/delayed-ettringite-formation";
import { ettringiteDehydrationFlag } from "../advisory/flag-rules/ettringite-dehydration";
import { thaumasiteFormationFlag } from "../advisory/flag-rules/thaumasite-formation";
import { sulfateIngress, type SulfateScenario } from "../scenarios/sulfate-ingress";
import type { Dataset } from "../data/load-dataset";
import { alkaliBoundFractionOf, bookedPaste, recordPaste, type ScenarioBase, type WarmStartBook } from "../scenarios/sweep";
import { binderInputOf, type AssessInput } from "../schema/assess-input";
import { assessmentCuring, type AssessmentCuringAdvice } from "./assessment-curing";
import { pasteFailureMessage } from "./paste-failure";
import { domainError, validationError, type ServiceOutcome } from "./outcome";


/**
 * One assessment on one data set: the base assemblage at the input's age, every durability scenario that the
 * exposure calls for, their flags, the exposure classes and compliance, and the curing advice. `runAssessment`
 * (`assess.ts`) runs it on the data set as loaded and, for the Monte Carlo option, on each sampled data set
 * (`assessment-samples.ts`).
 */

export type AssessmentScenarios = {
  sulfate?: SulfateScenario;
  carbonation?: CarbonationScenario;
  temperature?: TemperatureHistoryResult;
  thaumasite?: ThaumasiteResult;
  chloride?: ChlorideBindingScenario;
  drying?: DryingScenario;
};

export type AssessmentResult = {
  inputs: AssessInput;
  assemblage: {
    temperatureC: number;
    paste: Omit<HydratedPaste, "assemblage"> & { assemblage: Omit<HydratedPaste["assemblage"], "state"> };
    timeline: TimelineEntry[];
  };
  scenarios: AssessmentScenarios;
  /** Scenarios the engine could not complete, with the typed reason; the rest of the assessment stands. */
  scenarioErrors: Partial<Record<keyof AssessmentScenarios, { code: string; message: string }>>;
  exposureClasses: ExposureClassification;
  compliance: ComplianceResult;
  curing?: AssessmentCuringAdvice;
  flags: Flag[];
  uncertainty?: {
    samples: number;
    seed: number;
    /** Phase id → P5/P50/P95 of its volume, cm³ per 100 g binder. */
    phaseVolumesCm3: Record<string, { p5: number; p50: number; p95: number; mean: number }>;
    failedSamples: number;
  };
  cautions: string[];
  warnings: { code: string; [key: string]: unknown }[];
  versions: { dataset: string; engine: string };
};

/**
 * The scenario each scenario flag is computed from (the other flags need only the base paste, the exposure or the
 * curing model). A Monte Carlo sample whose scenario failed has not evaluated its flags: they are left out of those
 * flags' fired fractions rather than counted as not fired.
 */
export const SCENARIO_OF_FLAG: Readonly<Record<string, keyof AssessmentScenarios>> = {
  "sulfate-attack": "sulfate",
  "gypsum-formation": "sulfate",
  "magnesium-sulfate-attack": "sulfate",
  "carbonation-depassivation": "carbonation",
  "delayed-ettringite-formation": "temperature",
  "thaumasite-formation": "thaumasite",
  "chloride-binding-limit": "chloride",
  "ettringite-dehydration": "drying",
};

/** Sweep points of the Monte Carlo samples (each sample reruns every scenario; fewer points keep it tractable). */
export const MONTE_CARLO_SWEEP_POINTS = 8;

export type Deterministic = Omit<AssessmentResult, "inputs" | "uncertainty" | "cautions" | "versions">;

export type AssessOptions = {
  points: number;
  withTimeline: boolean;
  /** Warm starts recorded by a reference run, or read by a Monte Carlo sample (`WarmStartBook`). */
  book?: WarmStartBook;
  /**
   * The Monte Carlo path: drying at the service conditions only (`dryingScenario`'s `serviceOnly`), and, when the book
   * is read, the temperature and thaumasite scenarios reduced to their service/curing states with the stability
   * temperatures found by root finding from the reference run's.
   */
  reduced?: boolean;
};

/**
 * The binder and its reacted composition at the input's age. It does not depend on the data set, so a Monte Carlo run
 * computes it once for the deterministic assessment and every sample.
 */
export function binderSystemOf(input: AssessInput): ServiceOutcome<BinderSystem> {
  const system = binderSystemFromInput(binderInputOf(input));
  if (system.ok) return system;
  const error = system.error;
  const issues = error.code === "invalid_input" ? error.issues : [binderSystemIssue(error)];
  return validationError(issues.map((i) => ({ ...i, path: i.path.startsWith("cement") || i.path.startsWith("supplementaryMaterials") ? `binder.${i.path}` : i.path })));
}

/** Everything for one data set: the base assemblage, the scenarios and their flags. */
export function assessWithDataset(input: AssessInput, binder: BinderSystem, dataset: Dataset, options: AssessOptions): ServiceOutcome<Deterministic> {
  const { points, withTimeline, book } = options;
  const system = { ok: true as const, value: binder };
  const temperatureC = input.age.mode === "age" ? input.age.curingTemperatureC : 20;
  const overrides = { suppress: input.options.suppressedPhases, enable: input.options.allowedPhases, dataset };
  const reacted = system.value.composition.reactedElementsMol;
  const warmFrom = (start: HydratedPaste | undefined) => (start ? { warmStart: start.assemblage.state, alkaliBoundFraction: alkaliBoundFractionOf(start, reacted) } : {});
  // The paste at its age: the age-dependent kinetic constraints apply (none without an age, in the degrees mode).
  const ageDays = input.age.mode === "age" ? input.age.ageDays : undefined;
  const paste = hydratePaste(system.value.composition, { temperatureC, binderContentKgPerM3: input.mix.binderContentKgPerM3, ageDays, ...overrides, ...warmFrom(bookedPaste(book, "base", temperatureC)) });
  if (!paste.ok) return domainError(paste.error.code, pasteFailureMessage(paste.error, { age: input.age, temperatureC, composition: system.value.composition }));
  recordPaste(book, "base", temperatureC, paste.value);
  let timeline: TimelineEntry[] = [];
  const timelineWarnings: (TimelineWarning & { scope: "timeline" })[] = [];
  if (withTimeline) {
    const series = hydrationTimeline(system.value.binder, { temperatureC, points, firstAgeDays: 1 / 24, lastAgeDays: 3650, ...overrides });
    if (!series.ok) return domainError(series.error.code, describeFailure(series.error));
    timeline = series.value.entries;
    // The paste's own warnings are those of the assessment's age; the timeline adds only what is new, marked as its own
    // (a reaction model extrapolated to 10 years in the chart says nothing of the assessment's age).
    timelineWarnings.push(...series.value.warnings.filter((w) => !paste.value.warnings.some((x) => x.code === w.code)).map((w) => ({ ...w, scope: "timeline" as const })));
  }
  const exposure = input.exposure;
  const serviceTemperatureC =
    typeof exposure.serviceTemperatureC === "number" ? exposure.serviceTemperatureC : exposure.serviceTemperatureC ? (exposure.serviceTemperatureC.minC + exposure.serviceTemperatureC.maxC) / 2 : 20;
  const scenarioTemperatureC = Math.min(100, Math.max(0, serviceTemperatureC));
  // The unexposed paste at the service temperature, solved once (from the base paste) as every scenario's first warm
  // start; when it cannot be solved the scenarios start cold and report their own failure.
  const service = hydratePaste(system.value.composition, {
    temperatureC: scenarioTemperatureC,
    binderContentKgPerM3: input.mix.binderContentKgPerM3,
    ...overrides,
    ...warmFrom(bookedPaste(book, "service", scenarioTemperatureC) ?? paste.value),
  });
  if (service.ok) recordPaste(book, "service", scenarioTemperatureC, service.value);
  const base: ScenarioBase = {
    composition: system.value.composition,
    temperatureC: scenarioTemperatureC,
    binderContentKgPerM3: input.mix.binderContentKgPerM3,
    suppress: input.options.suppressedPhases,
    enable: input.options.allowedPhases,
    dataset,
    warmFrom: service.ok ? service.value : undefined,
    book,
  };
  const scenarios: AssessmentScenarios = {};
  const scenarioErrors: AssessmentResult["scenarioErrors"] = {};
  const flags: Flag[] = [];
  const context = { exposure, waterBinderRatio: input.mix.waterBinderRatio, curingMaxTemperatureC: input.curing.maxTemperatureC };

  if (severeSulfateExposure(exposure).any || (exposure.sulfateMgPerL ?? 0) > 0) {
    const sulfate = sulfateIngress(base, exposure, { points });
    if (!sulfate.ok) scenarioErrors.sulfate = { code: sulfate.error.code, message: `at ${(sulfate.error.dose * 1000).toFixed(1)} mmol SO4 per 100 g binder: ${describeFailure(sulfate.error)}` };
    else {
      scenarios.sulfate = sulfate.value;
      for (const flag of [sulfateAttackFlag(sulfate.value, context), gypsumFormationFlag(sulfate.value, context), magnesiumSulfateAttackFlag(sulfate.value, context)]) if (flag) flags.push(flag);
    }
  }
  // One cover for the depth, the flag and its words: the exposure's, else the element's.
  const coverMm = exposure.coverMm ?? input.project?.element?.coverMm;
  const carbonation = carbonationScenario(base, exposure, { points, coverMm });
  if (!carbonation.ok) scenarioErrors.carbonation = { code: carbonation.error.code, message: describeFailure(carbonation.error) };
  else {
    scenarios.carbonation = carbonation.value;
    const depassivation = carbonationDepassivationFlag(carbonation.value, { exposure: { ...exposure, coverMm } });
    if (depassivation) flags.push(depassivation);
  }
  const reserve = lowAlkalinityReserveFlag({ portlanditeKgPerM3: paste.value.perM3.portlanditeKg, carbonatableCaMolPerM3: paste.value.perM3.carbonatableCaMol, pH: paste.value.poreSolution?.pH ?? null });
  if (reserve) flags.push(reserve);

  // The curing peak: the element model's core peak when the thermal model is given, else the entered maximum.
  const { curing, warnings: curingWarnings } = assessmentCuring(input, system.value, dataset, book);
  if (curing) flags.push(...curing.flags);
  const curingMaxTemperatureC = curing ? Math.max(curing.temperature.peakCoreC, input.curing.maxTemperatureC ?? -Infinity) : input.curing.maxTemperatureC;
  const scenarioContext = { ...context, curingMaxTemperatureC };
  const temperature = temperatureHistory(base, exposure, {
    points,
    curingMaxTemperatureC,
    // The element model's peak can exceed the data set's 100 °C (the curing warnings say why); its DEF state is then taken there.
    curingAboveDataSet: "evaluate-at-limit",
    reduced: options.reduced,
    decisionTemperaturesC: curingMaxTemperatureC === undefined ? undefined : defDecisionTemperaturesC(curingMaxTemperatureC),
  });
  if (!temperature.ok) scenarioErrors.temperature = { code: temperature.error.code, message: temperature.error.message };
  else {
    scenarios.temperature = temperature.value;
    const def = delayedEttringiteFormationFlag(temperature.value, scenarioContext);
    if (def) flags.push(def);
  }

  // The thaumasite-formation flag reads the service state, not the stability temperature (a sample need not find it).
  const thaumasiteResult = thaumasite(base, exposure, { points: Math.max(5, Math.round(points / 2)), reduced: options.reduced, limitNeeded: false });
  if (!thaumasiteResult.ok) scenarioErrors.thaumasite = { code: thaumasiteResult.error.code, message: thaumasiteResult.error.message };
  else {
    scenarios.thaumasite = thaumasiteResult.value;
    const thaumasiteFlag = thaumasiteFormationFlag(thaumasiteResult.value, scenarioContext);
    if (thaumasiteFlag) flags.push(thaumasiteFlag);
  }

  if (exposureChlorideMgPerL(exposure) !== null || exposure.deIcingSalts) {
    const chloride = chlorideBinding(base, exposure, { points });
    if (!chloride.ok) scenarioErrors.chloride = { code: chloride.error.code, message: chloride.error.message };
    else {
      scenarios.chloride = chloride.value;
      const chlorideFlag = chlorideBindingLimitFlag(chloride.value, scenarioContext);
      if (chlorideFlag) flags.push(chlorideFlag);
    }
  }
  if (exposure.relativeHumidityPercent !== undefined) {
    const drying = dryingScenario(base, exposure, { points, serviceOnly: options.reduced });
    if (!drying.ok) scenarioErrors.drying = { code: drying.error.code, message: drying.error.message };
    else {
      scenarios.drying = drying.value;
      const dryingFlag = ettringiteDehydrationFlag(drying.value, scenarioContext);
      if (dryingFlag) flags.push(dryingFlag);
    }
  }

  const exposureClasses = classifyExposure(exposure);
  const compliance = checkCompliance(mixForCompliance({ mix: input.mix, specification: input.specification, supplementaryMaterials: binder.binder.supplementaryMaterials }), exposureClasses);
  flags.push(...compliance.flags);

  const { state: _state, ...assemblageWithoutState } = paste.value.assemblage;
  return {
    ok: true,
    value: {
      assemblage: { temperatureC, paste: { ...paste.value, assemblage: assemblageWithoutState }, timeline },
      scenarios,
      scenarioErrors,
      exposureClasses,
      compliance,
      curing,
      flags: sortFlags(flags),
      warnings: [
        ...paste.value.warnings,
        ...timelineWarnings,
        ...curingWarnings,
        ...Object.entries(scenarioErrors).map(([scenario, e]) => ({ code: "scenario_failed", scenario, reason: e!.code, message: e!.message })),
      ] as AssessmentResult["warnings"],
    },
  };
}
