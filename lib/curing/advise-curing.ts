import type { Flag } from "../advisory/flag";
import type { CuringInput } from "../schema/curing-input";
import { cementFractionOfBinder, type CuringBinder, type ScmFraction } from "./binder-description";
import { ambientTemperatureC, type AmbientHistory } from "./ambient-temperature";
import { assessEarlyFreezing, type FreezingAssessment } from "./cold-weather";
import { curingCautions, type CuringCaution } from "./curing-cautions";
import {
  concreteThermalData,
  curingInputDefaults,
  curingLimitData,
  hydrationModelData,
  maturityStrengthData,
} from "./curing-data";
import { curingModelWarnings, type CuringModelWarning } from "./model-range-warnings";
import { minimumCuringPeriod, type CuringClass, type CuringDurationResult } from "./curing-duration";
import { curingFlags } from "./curing-flags";
import { simulateElementTemperature, type FaceBoundary } from "./element-temperature";
import { equivalentAgeH } from "./equivalent-age";
import { unoEvaporationKgPerM2H } from "./evaporation-rate";
import { hydrationHeatSource, sampledHeatSource, type HeatSource } from "./heat-source";
import type { HydrationParameters } from "./hydration-degree";
import { perPhaseHeatJPerG } from "./per-phase-heat";
import { steamEnclosureTemperatureC } from "./steam-curing";
import { meanStrengthMPa, timeToStrengthH } from "./strength-development";
import { coverCoefficientWPerM2K, surfaceCover } from "./surface-heat-transfer";

const percent = 100; // mass % → mass fraction
const joulesPerGramPerJPerKg = 1 / 1000;
const minutesPerHour = 60;
/** The heat curve reported with the advice: equivalent ages from 1 h to 1 year, log-spaced (common practice for a heat curve). */
const reportedCurve = { firstEquivalentAgeH: 1, lastEquivalentAgeH: 8760, points: 25 } as const;

export type CuringAdvice = {
  heatModel: {
    label: string;
    source: HeatSourceKind;
    /** Short name of the source (`HEAT_SOURCE_NAMES`). */
    sourceName: string;
    referenceTemperatureC: number;
    activationEnergyJPerMol: number;
    ultimateHeatJPerGBinder: number | null;
    hydration: HydrationParameters | null;
    /** Classic per-phase heat of the cement at complete hydration, J/g cement (the check). */
    perPhaseCheckJPerGCement: { lerchBogue: number; taylor1997: number };
    /** Mass fraction of Portland cement in the binder: the per-phase check per g binder is the value above times this. */
    cementFractionOfBinder: number;
    /** The heat source's cumulative heat, J/g binder, against equivalent age at its reference temperature (h), 1 h to 1 year. */
    curve: { equivalentAgeH: number; cumulativeHeatJPerGBinder: number }[];
  };
  heat: { timeH: number; coreEquivalentAgeH: number; coreHeatJPerGBinder: number }[];
  temperature: {
    timesH: number[];
    coreC: number[];
    surfaceC: number[];
    surfaceBC?: number[];
    peakCoreC: number;
    peakTimeH: number;
    maxDifferenceC: number;
    maxDifferenceTimeH: number;
    maxTemperatureC: number;
  };
  maturity: { timeH: number; coreEquivalentAgeH: number; surfaceEquivalentAgeH: number }[];
  maturityBasis: { method: string; activationEnergyJPerMol: number; referenceTemperatureC: number };
  strength: { timeH: number; coreMPa: number; surfaceMPa: number }[];
  strengthTargets: { label: string; strengthMPa: number; coreTimeH: number | null; surfaceTimeH: number | null }[];
  evaporationKgM2H: number | null;
  minimumCuringDays: number | null;
  curing: CuringDurationResult;
  coldWeather: FreezingAssessment;
  flags: Flag[];
  cautions: CuringCaution[];
  /** Where the result lies outside what its models hold (`model-range-warnings.ts`); empty when it does not. */
  warnings: CuringModelWarning[];
};

function curingScms(input: CuringInput): ScmFraction[] {
  const defaults = hydrationModelData.defaults;
  return input.supplementaryMaterials.map((m): ScmFraction => {
    const fraction = m.massPercentOfBinder / percent;
    switch (m.type) {
      case "slag":
        return { kind: "slag", massFractionOfBinder: fraction };
      case "fly-ash":
      case "siliceous-fly-ash":
        return { kind: "fly-ash", massFractionOfBinder: fraction, caoMassFraction: m.caoMassPercent !== undefined ? m.caoMassPercent / percent : defaults.flyAshCaOMassFraction.value };
      case "calcareous-fly-ash":
        return { kind: "fly-ash", massFractionOfBinder: fraction, caoMassFraction: m.caoMassPercent !== undefined ? m.caoMassPercent / percent : defaults.calcareousFlyAshCaOMassFraction.value };
      case "silica-fume":
        return { kind: "silica-fume", massFractionOfBinder: fraction };
      case "limestone":
        return { kind: "limestone", massFractionOfBinder: fraction };
      default:
        return { kind: "pozzolan", massFractionOfBinder: fraction };
    }
  });
}

/** The binder of the input in the curing model's terms (mass fractions). */
export function curingBinderOf(input: CuringInput): CuringBinder {
  const p = input.cement.phasesMassPercent;
  return {
    cementPhases: {
      C3S: p.C3S / percent,
      C2S: p.C2S / percent,
      C3A: p.C3A / percent,
      C4AF: p.C4AF / percent,
      ...(p.SO3 !== undefined ? { SO3: p.SO3 / percent } : {}),
      ...(p.freeCaO !== undefined ? { freeCaO: p.freeCaO / percent } : {}),
      ...(p.MgO !== undefined ? { MgO: p.MgO / percent } : {}),
    },
    ...(input.cement.blaineM2PerKg !== undefined ? { blaineM2PerKg: input.cement.blaineM2PerKg } : {}),
    scms: curingScms(input),
    binderKgPerM3: input.concrete.binderKgPerM3,
    waterBinderRatio: input.concrete.waterBinderRatio,
  };
}

function ambientHistoryOf(input: CuringInput): AmbientHistory {
  const a = input.ambient;
  if (a.kind === "daily-sine")
    return {
      kind: "daily-sine",
      meanC: a.meanC,
      amplitudeC: a.amplitudeC,
      peakHourOfDay: a.peakHourOfDay ?? curingInputDefaults.sinePeakHourOfDay.value,
      placementHourOfDay: a.placementHourOfDay ?? curingInputDefaults.placementHourOfDay.value,
    };
  return a;
}

type FaceInput = NonNullable<CuringInput["faces"]["b"]>;

function faceBoundary(face: FaceInput, environmentC: (timeH: number) => number): FaceBoundary {
  const before = surfaceCover(face.cover)!;
  const after = surfaceCover(face.coverAfterStrip)!;
  const wind = face.windSpeedMPerS ?? curingInputDefaults.windSpeedMPerS.value;
  const stripAtH = face.stripAtH ?? Number.POSITIVE_INFINITY;
  return {
    environmentC,
    coefficientWPerM2K: (timeH, meanFilmC) => {
      if (timeH >= stripAtH) return coverCoefficientWPerM2K(after, wind, meanFilmC);
      return face.hWPerM2K ?? coverCoefficientWPerM2K(before, wind, meanFilmC);
    },
  };
}

const round = (x: number, digits: number) => {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
};

/** Indices of the full time series kept for output: one every `outputIntervalH`, always the last. */
function outputIndices(timesH: readonly number[], outputIntervalH: number): number[] {
  const stepH = timesH[1] - timesH[0];
  const stride = Math.max(1, Math.round(outputIntervalH / stepH));
  const indices: number[] = [];
  for (let i = 0; i < timesH.length; i += stride) indices.push(i);
  if (indices[indices.length - 1] !== timesH.length - 1) indices.push(timesH.length - 1);
  return indices;
}

export type AdviseCuringOptions = {
  /** Label of an entered heat curve in the output (e.g. the thermodynamic heat of the binder form); default "entered heat curve". */
  heatCurveLabel?: string;
  /** Where an entered heat curve comes from; default "entered" (a measured curve). */
  heatCurveSource?: Exclude<HeatSourceKind, "per-phase">;
};

/** The kinds of heat source: a curve entered by the user, the thermodynamic heat of the binder, or the classic per-phase heats. */
export type HeatSourceKind = "entered" | "thermodynamic" | "per-phase";

/** Short names of the heat sources, for key figures and comparisons. */
const HEAT_SOURCE_NAMES: Record<HeatSourceKind, string> = {
  entered: "entered heat curve",
  thermodynamic: "data-set enthalpies",
  "per-phase": "classic per-phase heats",
};

/**
 * The whole curing advisory for validated input: heat source, element temperature history, maturity and
 * strength at core and surface, EN 13670 curing period, evaporation, cold-weather check, flags and cautions.
 */
export function adviseCuring(input: CuringInput, options: AdviseCuringOptions = {}): CuringAdvice {
  const binder = curingBinderOf(input);
  let heatSource: HeatSource;
  const heatSourceKind: HeatSourceKind = input.heatCurve ? (options.heatCurveSource ?? "entered") : "per-phase";
  let ultimate: number | null = null;
  let hydration: HydrationParameters | null = null;
  if (input.heatCurve) {
    heatSource = sampledHeatSource(
      input.heatCurve.points.map((p) => ({ equivalentAgeH: p.equivalentAgeH, cumulativeHeatJPerKgBinder: p.cumulativeHeatJPerG / joulesPerGramPerJPerKg })),
      input.heatCurve.referenceTemperatureC,
      input.heatCurve.activationEnergyJPerMol,
      options.heatCurveLabel ?? "entered heat curve",
    );
  } else {
    const details = hydrationHeatSource(binder);
    heatSource = details.source;
    ultimate = details.ultimateHeatJPerKgBinder;
    hydration = details.parameters;
  }

  const ambient = ambientHistoryOf(input);
  const ambientC = (timeH: number) => ambientTemperatureC(ambient, timeH);
  const steam = input.steamCuring;
  const environmentC = steam ? (timeH: number) => steamEnclosureTemperatureC(steam, ambientC, timeH) : ambientC;

  const durationH = input.durationH ?? curingInputDefaults.durationH.value;
  const timeStepH = (input.timeStepMin ?? curingInputDefaults.timeStepMin.value) / minutesPerHour;
  const thermal = simulateElementTemperature({
    thicknessM: input.element.thicknessM,
    geometry: input.element.geometry,
    nodeCount: input.element.nodeCount ?? curingInputDefaults.nodeCount.value,
    densityKgPerM3: input.concrete.densityKgPerM3 ?? concreteThermalData.densityKgPerM3.value,
    specificHeatJPerKgK: input.concrete.specificHeatJPerKgK ?? concreteThermalData.specificHeatJPerKgK.value,
    conductivityWPerMK: input.concrete.conductivityWPerMK ?? concreteThermalData.conductivityWPerMK.value,
    binderKgPerM3: input.concrete.binderKgPerM3,
    heatSource,
    placementTemperatureC: input.placementTemperatureC,
    durationH,
    timeStepH,
    scheme: input.scheme,
    faceA: faceBoundary(input.faces.a, environmentC),
    ...(input.faces.b ? { faceB: faceBoundary(input.faces.b, environmentC) } : {}),
  });

  const activationEnergyJPerMol = input.maturity.activationEnergyJPerMol ?? maturityStrengthData.activationEnergyJPerMol.default;
  const referenceTemperatureC = input.maturity.referenceTemperatureC ?? maturityStrengthData.referenceTemperatureC.default;
  const coreAge = equivalentAgeH(thermal.timesH, thermal.coreC, activationEnergyJPerMol, referenceTemperatureC);
  const surfaceAge = equivalentAgeH(thermal.timesH, thermal.surfaceC, activationEnergyJPerMol, referenceTemperatureC);

  const fcm28 = input.concrete.fcm28MPa;
  const cementClass = input.concrete.cementClass ?? curingInputDefaults.cementClass.value;
  const fck = input.concrete.fckMPa ?? fcm28 - maturityStrengthData.characteristicMarginMPa.value;
  const curingClass = (input.curing.curingClass ?? curingInputDefaults.curingClass.value) as CuringClass;
  const curing = minimumCuringPeriod(curingClass, thermal.timesH, thermal.surfaceC, surfaceAge, fck, fcm28, cementClass);

  const evaporationKgM2H = input.evaporation
    ? unoEvaporationKgPerM2H({
        concreteTemperatureC: input.evaporation.concreteTemperatureC ?? input.placementTemperatureC,
        airTemperatureC: input.evaporation.airTemperatureC,
        relativeHumidityPercent: input.evaporation.relativeHumidityPercent,
        windSpeedKmH: input.evaporation.windSpeedKmH,
      })
    : null;

  const freezingStrengthMPa = input.limits.freezingStrengthMPa ?? curingLimitData.freezingRequiredStrengthMPa.value;
  const coldWeather = assessEarlyFreezing(thermal.timesH, thermal.surfaceC, surfaceAge, freezingStrengthMPa, fcm28, cementClass);

  const silicaFume = binder.scms.some((s) => s.kind === "silica-fume" && s.massFractionOfBinder > 0);
  const lowWaterBinderOrSilicaFume =
    input.limits.lowWaterBinderOrSilicaFume ?? (silicaFume || binder.waterBinderRatio < curingLimitData.evaporationLowWcmKgPerM2H.lowWaterBinderBelow);

  const flags = curingFlags({
    peakCoreC: thermal.peakCoreC,
    peakTimeH: thermal.peakTimeH,
    maxTemperatureC: thermal.maxTemperatureC,
    ettringiteStabilityTemperatureC: input.limits.ettringiteStabilityTemperatureC,
    maxDifferenceC: thermal.maxDifferenceC,
    maxDifferenceTimeH: thermal.maxDifferenceTimeH,
    differenceLimitC: input.limits.maxDifferenceC,
    evaporationKgPerM2H: evaporationKgM2H,
    lowWaterBinderOrSilicaFume,
    firstSubZeroSurfaceH: coldWeather.firstSubZeroSurfaceH,
    strengthAtFirstSubZeroMPa: coldWeather.strengthAtFirstSubZeroMPa,
    freezingStrengthMPa,
    plannedCuringDays: input.curing.plannedCuringDays,
    minimumCuringDays: curing.computedDays,
    curingClass,
  });

  const keep = outputIndices(thermal.timesH, input.outputIntervalH ?? curingInputDefaults.outputIntervalH.value);
  const pick = (series: readonly number[], digits: number) => keep.map((i) => round(series[i], digits));
  const timesH = pick(thermal.timesH, 4);

  return {
    heatModel: {
      label: heatSource.label,
      source: heatSourceKind,
      sourceName: HEAT_SOURCE_NAMES[heatSourceKind],
      referenceTemperatureC: heatSource.referenceTemperatureC,
      activationEnergyJPerMol: round(heatSource.activationEnergyJPerMol, 0),
      ultimateHeatJPerGBinder: ultimate === null ? null : round(ultimate * joulesPerGramPerJPerKg, 1),
      hydration,
      perPhaseCheckJPerGCement: {
        lerchBogue: round(perPhaseHeatJPerG(binder.cementPhases, 1, "lerch-bogue"), 1),
        taylor1997: round(perPhaseHeatJPerG(binder.cementPhases, 1, "taylor-1997"), 1),
      },
      cementFractionOfBinder: round(cementFractionOfBinder(binder), 4),
      curve: reportedHeatCurve(heatSource),
    },
    heat: keep.map((i) => ({
      timeH: round(thermal.timesH[i], 4),
      coreEquivalentAgeH: round(thermal.coreSourceEquivalentAgeH[i], 3),
      coreHeatJPerGBinder: round(thermal.coreHeatJPerKgBinder[i] * joulesPerGramPerJPerKg, 2),
    })),
    temperature: {
      timesH,
      coreC: pick(thermal.coreC, 2),
      surfaceC: pick(thermal.surfaceC, 2),
      ...(thermal.surfaceBC ? { surfaceBC: pick(thermal.surfaceBC, 2) } : {}),
      peakCoreC: round(thermal.peakCoreC, 2),
      peakTimeH: round(thermal.peakTimeH, 3),
      maxDifferenceC: round(thermal.maxDifferenceC, 2),
      maxDifferenceTimeH: round(thermal.maxDifferenceTimeH, 3),
      maxTemperatureC: round(thermal.maxTemperatureC, 2),
    },
    maturity: keep.map((i) => ({ timeH: round(thermal.timesH[i], 4), coreEquivalentAgeH: round(coreAge[i], 3), surfaceEquivalentAgeH: round(surfaceAge[i], 3) })),
    maturityBasis: { method: "ASTM C1074 equivalent age (Arrhenius)", activationEnergyJPerMol, referenceTemperatureC },
    strength: keep.map((i) => ({
      timeH: round(thermal.timesH[i], 4),
      coreMPa: round(meanStrengthMPa(coreAge[i], fcm28, cementClass), 2),
      surfaceMPa: round(meanStrengthMPa(surfaceAge[i], fcm28, cementClass), 2),
    })),
    strengthTargets: input.strengthTargets.map((t) => ({
      label: t.label,
      strengthMPa: t.strengthMPa,
      coreTimeH: nullableRound(timeToStrengthH(thermal.timesH, coreAge, t.strengthMPa, fcm28, cementClass), 2),
      surfaceTimeH: nullableRound(timeToStrengthH(thermal.timesH, surfaceAge, t.strengthMPa, fcm28, cementClass), 2),
    })),
    evaporationKgM2H: evaporationKgM2H === null ? null : round(evaporationKgM2H, 3),
    minimumCuringDays: curing.computedDays === null ? null : round(curing.computedDays, 2),
    curing,
    coldWeather,
    flags,
    cautions: [...curingCautions],
    warnings: curingModelWarnings({
      maxTemperatureC: thermal.maxTemperatureC,
      maxSourceEquivalentAgeH: Math.max(...thermal.finalSourceEquivalentAgeH),
      heatCurveLastAgeH: heatSource.lastEquivalentAgeH,
    }),
  };
}

function nullableRound(x: number | null, digits: number): number | null {
  return x === null ? null : round(x, digits);
}

/** The heat source sampled on `reportedCurve`'s log-spaced equivalent ages, J/g binder. */
function reportedHeatCurve(source: HeatSource): CuringAdvice["heatModel"]["curve"] {
  const { firstEquivalentAgeH, lastEquivalentAgeH, points } = reportedCurve;
  const ratio = Math.log(lastEquivalentAgeH / firstEquivalentAgeH) / (points - 1);
  return Array.from({ length: points }, (_, i) => {
    const equivalentAgeH = firstEquivalentAgeH * Math.exp(ratio * i);
    return { equivalentAgeH: round(equivalentAgeH, 4), cumulativeHeatJPerGBinder: round(source.cumulativeHeatJPerKgBinder(equivalentAgeH) * joulesPerGramPerJPerKg, 2) };
  });
}
