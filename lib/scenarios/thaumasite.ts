import { molarMassGPerMol } from "../chem/atomic-weights";
import type { HydratedPaste } from "../cement/hydrate-paste";
import { loadDataset } from "../data/load-dataset";
import { serviceTemperatureRangeC, type ExposureInput } from "../schema/exposure-input";
import { linearDoses, phaseMoles, sweepPoint, type ScenarioBase, type ScenarioSweep, type SweepFailure, type SweepPoint } from "./sweep";
import { bookedSlopePerC, byDistance, formationGibbsKJPerMol, pasteAtTemperature, recent, phaseStabilityLimit, stabilityFigure, stabilityHintC, stabilityLimitNear, supersaturatedSolid, DATA_SET_MAX_C, DATA_SET_MIN_C, DEFAULT_MAX_ITERATIONS, DEFAULT_TOLERANCE_C, type EquilibriumChecks, type StabilityLimit } from "./temperature-history";

/**
 * Thaumasite, Ca6Si2(SO4)2(CO3)2(OH)12·24H2O: the C-S-H of the paste reacts with sulfate and carbonate and loses
 * its binding power. It needs a sulfate source, a carbonate source (limestone filler, carbonate aggregate,
 * bicarbonate in the water), water, and is favoured by cold (Thaumasite Expert Group 1999, The thaumasite form of
 * sulfate attack: risks, diagnosis, remedial works and guidance on new construction, DETR, London; BRE Special
 * Digest 1; Schmidt, Lothenbach, Romer, Scrivener, Rentsch & Figi 2008, Cem. Concr. Res. 38, 337, who show its
 * stability field by equilibrium calculations and experiments at 8 and 20 °C).
 *
 * The scenario equilibrates the paste with the carbonate sources and a dose of the exposure's sulfate salt over a
 * temperature range (default 0–30 °C), reports thaumasite amount and saturation index at each temperature and at the
 * service temperature, and finds by root finding the temperature above which thaumasite is no longer stable.
 *
 * The sulfate dose (a model choice, documented): sulfate enters by diffusion from the surface, and thaumasite forms
 * where the paste is sulfate-saturated, after AFm has turned into ettringite. The dose is therefore the sulfate that
 * brings the paste up to its ettringite capacity (3 SO4 per 2 Al of the reacted binder, an upper bound because some
 * Al sits in hydrotalcite and hydrogarnet) plus an excess, by default 2 % SO3 of the binder mass; a fixed dose may be
 * given instead. The salt is that of the exposure's cation (Na2SO4 when none is given), added with the water that
 * carries it at the exposure's concentration, so the paste is also leached as a surface zone in contact with the
 * water is. Dissolved bicarbonate and carbonate come with that water (as Ca salts, calcium being the usual
 * counter-ion of groundwater bicarbonate; common practice).
 * Carbonate aggregate is taken as an excess of calcite available to the paste, by default 10 g per 100 g binder (typical).
 */

/** Default sweep, °C: 0–30 °C spans the cold to warm service temperatures where thaumasite is discussed (Schmidt et al. 2008). */
const DEFAULT_SWEEP_FROM_C = 0;
const DEFAULT_SWEEP_TO_C = 30;
/** Sulfate beyond the ettringite capacity, g SO3 per 100 g binder (model choice: a sulfate-saturated zone; see above). */
const DEFAULT_SULFATE_EXCESS_SO3_MASS_PERCENT = 2;
/** Calcite offered by carbonate aggregate, g per 100 g binder (typical: an excess over what thaumasite can use). */
const DEFAULT_CARBONATE_AGGREGATE_CALCITE_G_PER_100G = 10;
/** Ettringite, Ca6Al2(SO4)3(OH)12·26H2O: 3 SO4 per 2 Al (formula). */
const ETTRINGITE_SULFATE_PER_ALUMINIUM = 1.5;
/**
 * Sulfate concentration assumed when the exposure gives only soil sulfate, mg/L: the EN 206 XA2/XA3 boundary
 * (3000 mg/L, EN 206 Table 2), the same severe case as the sulfate-ingress scenario.
 */
const DEFAULT_SULFATE_MG_PER_L = 3000;

/** Molar masses from IUPAC 2021 atomic weights (`lib/chem/atomic-weights`). */
const SO3_G_PER_MOL = molarMassGPerMol({ S: 1, O: 3 });
const SO4_G_PER_MOL = molarMassGPerMol({ S: 1, O: 4 });
const HCO3_G_PER_MOL = molarMassGPerMol({ H: 1, C: 1, O: 3 });
const CO3_G_PER_MOL = molarMassGPerMol({ C: 1, O: 3 });
const CALCITE_G_PER_MOL = molarMassGPerMol({ Ca: 1, C: 1, O: 3 });
const WATER_G_PER_MOL = molarMassGPerMol({ H: 2, O: 1 });

type Cation = "Na" | "K" | "Mg" | "Ca";
/** Cation per sulfate in the salt: Na2SO4, K2SO4, MgSO4, CaSO4. */
const CATION_PER_SULFATE: Record<Cation, number> = { Na: 2, K: 2, Mg: 1, Ca: 1 };

export type ThaumasitePoint = SweepPoint & {
  thaumasiteMol: number;
  /** log10 Ω of thaumasite in the equilibrium assemblage (0 where it is present). */
  thaumasiteSaturationIndex: number;
  ettringiteMol: number;
};

export type ThaumasiteResult = {
  sweep: ScenarioSweep<ThaumasitePoint>;
  summary: {
    /** The temperature evaluated as the service temperature: the minimum of the service range (coldest is worst). */
    serviceTemperatureC: number;
    /** Set when the service minimum lies below the data set and was evaluated at 0 °C. */
    serviceTemperatureClampedFromC: number | null;
    sulfateCation: Cation;
    /** Whether the exposure has a sulfate source (groundwater or soil). Without one the dose is 0. */
    exposureSulfatePresent: boolean;
    sulfateDoseMolSO3Per100gBinder: number;
    sulfateDoseSo3MassPercentOfBinder: number;
    /** Exposure water added with the dose, kg per 100 g binder. */
    solutionAddedKgPer100gBinder: number;
    carbonateMolPer100gBinder: { binder: number; aggregate: number; water: number };
    atService: {
      thaumasiteMol: number;
      thaumasiteVolumeCm3Per100gBinder: number;
      thaumasiteLitresPerM3: number;
      /** log10 Ω of thaumasite in the assemblage equilibrated without it: > 0 where it is stable. */
      saturationIndexWithoutIt: number;
      /** ΔrG of thaumasite formation from the pore solution, −RT ln10 · SI, kJ per mol Ca6Si2(SO4)2(CO3)2(OH)12·24H2O. */
      formationGibbsKJPerMol: number;
      /** Share of the reacted binder's silicon taken from C-S-H into thaumasite, %. */
      siliconInThaumasitePercent: number;
      pH: number | null;
    };
    /** The temperature above which thaumasite is no longer stable with this exposure (null unless found). */
    thaumasiteStabilityTemperatureC: number | null;
    stabilityLimit: StabilityLimit;
    maximumThaumasiteVolumeCm3Per100gBinder: number;
    equilibriumChecks: EquilibriumChecks;
  };
};

export type ThaumasiteError =
  | SweepFailure
  | { code: "temperature_out_of_range"; field: string; temperatureC: number; minimumC: number; maximumC: number; message: string }
  | { code: "invalid_option"; field: string; value: number; message: string };

export type ThaumasiteOptions = {
  points: number;
  sweepFromC?: number;
  sweepToC?: number;
  /** Sulfate beyond the ettringite capacity, g SO3 per 100 g binder (default 2). */
  sulfateExcessSo3MassPercent?: number;
  /** A fixed sulfate dose, g SO3 per 100 g binder, instead of capacity + excess. */
  sulfateDoseSo3MassPercent?: number;
  /** Calcite offered by carbonate aggregate, g per 100 g binder (default 10). */
  carbonateAggregateCalciteGPer100g?: number;
  toleranceC?: number;
  maxIterations?: number;
  /** The reduced path of a Monte Carlo sample read from a `WarmStartBook`: the service state only, and the stability temperature by root finding from the reference run's. */
  reduced?: boolean;
  /**
   * On the reduced path: whether a flag's answer depends on the stability temperature. The thaumasite-formation flag's
   * does not (it reads the service state), so a sample leaves the limit undecided over the range (`kind: "decided"`).
   */
  limitNeeded?: boolean;
};

function add(to: Record<string, number>, elements: Record<string, number>, times: number) {
  for (const [e, n] of Object.entries(elements)) to[e] = (to[e] ?? 0) + n * times;
}

function hasExposureSulfate(e: ExposureInput): boolean {
  return (e.sulfateMgPerL ?? 0) > 0 || (e.soilSulfateMgPerKg ?? 0) > 0 || (e.soilSulfateMassPercent ?? 0) > 0;
}

function badTemperature(field: string, temperatureC: number): ThaumasiteError | undefined {
  if (Number.isFinite(temperatureC) && temperatureC >= DATA_SET_MIN_C && temperatureC <= DATA_SET_MAX_C) return undefined;
  return { code: "temperature_out_of_range", field, temperatureC, minimumC: DATA_SET_MIN_C, maximumC: DATA_SET_MAX_C, message: `${field} must be between ${DATA_SET_MIN_C} and ${DATA_SET_MAX_C} °C, the range of the thermodynamic data set (got ${temperatureC})` };
}

function badOption(field: string, value: number | undefined, maximum: number): ThaumasiteError | undefined {
  if (value === undefined || (Number.isFinite(value) && value >= 0 && value <= maximum)) return undefined;
  return { code: "invalid_option", field, value, message: `${field} must be between 0 and ${maximum} g per 100 g binder (got ${value})` };
}

/** The thaumasite scenario: see the module comment. */
export function thaumasite(
  base: ScenarioBase,
  exposure: ExposureInput,
  options: ThaumasiteOptions,
): { ok: true; value: ThaumasiteResult } | { ok: false; error: ThaumasiteError } {
  const fromC = options.sweepFromC ?? DEFAULT_SWEEP_FROM_C;
  const toC = options.sweepToC ?? DEFAULT_SWEEP_TO_C;
  for (const [field, t] of [["options.sweepFromC", fromC], ["options.sweepToC", toC]] as const) {
    const bad = badTemperature(field, t);
    if (bad) return { ok: false, error: bad };
  }
  if (!(toC > fromC)) return { ok: false, error: { code: "temperature_out_of_range", field: "options.sweepToC", temperatureC: toC, minimumC: fromC, maximumC: DATA_SET_MAX_C, message: `options.sweepToC must exceed options.sweepFromC (${fromC} °C)` } };
  // Upper bounds: sanity limits that reject unit slips (a dose of 50 % SO3 of the binder mass is no longer a paste).
  for (const [field, value, maximum] of [
    ["options.sulfateExcessSo3MassPercent", options.sulfateExcessSo3MassPercent, 50],
    ["options.sulfateDoseSo3MassPercent", options.sulfateDoseSo3MassPercent, 50],
    ["options.carbonateAggregateCalciteGPer100g", options.carbonateAggregateCalciteGPer100g, 1000],
  ] as const) {
    const bad = badOption(field, value, maximum);
    if (bad) return { ok: false, error: bad };
  }

  const range = serviceTemperatureRangeC(exposure);
  const serviceMinC = range ? range.minC : base.temperatureC;
  const serviceC = Math.min(Math.max(serviceMinC, DATA_SET_MIN_C), DATA_SET_MAX_C);
  const clampedFrom = serviceC !== serviceMinC ? serviceMinC : null;

  let dataset = base.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return { ok: false, error: { code: "invalid_input", field: "dataset", message: loaded.error.message, dose: fromC } };
    dataset = loaded.value;
  }
  const withData: ScenarioBase = { ...base, dataset };

  // Sulfate dose, mol SO3 per 100 g binder.
  const reacted = base.composition.reactedElementsMol as Record<string, number>;
  const sulfatePresent = hasExposureSulfate(exposure);
  const capacityDeficitMol = Math.max(0, ETTRINGITE_SULFATE_PER_ALUMINIUM * (reacted.Al ?? 0) - (reacted.S ?? 0));
  const doseMol = !sulfatePresent
    ? 0
    : options.sulfateDoseSo3MassPercent !== undefined
      ? options.sulfateDoseSo3MassPercent / SO3_G_PER_MOL
      : capacityDeficitMol + (options.sulfateExcessSo3MassPercent ?? DEFAULT_SULFATE_EXCESS_SO3_MASS_PERCENT) / SO3_G_PER_MOL;
  const cation: Cation = exposure.sulfateCation ?? "Na";
  const added: Record<string, number> = {};
  add(added, { [cation]: CATION_PER_SULFATE[cation], S: 1, O: 4 }, doseMol);

  // The sulfate arrives as the exposure water: the salt with its water at the given concentration, as in the
  // equilibrium studies of sulfate attack that mix the paste with increasing amounts of solution (Lothenbach, Bary,
  // Le Bescop, Schmidt & Leterrier 2010, Cem. Concr. Res. 40, 1211; Schmidt et al. 2008). The water's bicarbonate and
  // carbonate come with it. V (L) = SO4 mg / (SO4 mg/L); water mass taken as 1 kg/L (dilute solution).
  let waterCarbonateMol = 0;
  let solutionAddedKg = 0;
  if (doseMol > 0) {
    const sulfateMgPerL = (exposure.sulfateMgPerL ?? 0) > 0 ? exposure.sulfateMgPerL! : DEFAULT_SULFATE_MG_PER_L;
    const waterLitres = (doseMol * SO4_G_PER_MOL * 1000) / sulfateMgPerL;
    const waterMol = (waterLitres * 1000) / WATER_G_PER_MOL;
    add(added, { H: 2, O: 1 }, waterMol);
    solutionAddedKg = waterLitres;
    if ((exposure.sulfateMgPerL ?? 0) > 0) {
      const bicarbonateMol = (waterLitres * (exposure.bicarbonateMgPerL ?? 0)) / 1000 / HCO3_G_PER_MOL;
      const carbonateMol = (waterLitres * (exposure.carbonateMgPerL ?? 0)) / 1000 / CO3_G_PER_MOL;
      add(added, { Ca: 0.5, H: 1, C: 1, O: 3 }, bicarbonateMol); // ½ Ca(HCO3)2
      add(added, { Ca: 1, C: 1, O: 3 }, carbonateMol); // CaCO3
      waterCarbonateMol = bicarbonateMol + carbonateMol;
    }
  }
  const aggregateCalciteMol = exposure.carbonateAggregate
    ? (options.carbonateAggregateCalciteGPer100g ?? DEFAULT_CARBONATE_AGGREGATE_CALCITE_G_PER_100G) / CALCITE_G_PER_MOL
    : 0;
  add(added, { Ca: 1, C: 1, O: 3 }, aggregateCalciteMol);

  const grid = linearDoses(toC - fromC, options.points).map((d) => fromC + d);
  const reduced = options.reduced === true && base.book?.mode === "read";
  const temperatures = [...new Set([...(reduced ? [] : grid), serviceC])].sort((a, b) => a - b);
  const solve = pasteAtTemperature(withData, added, [], "thaumasite");
  const retriedAtC: number[] = [];
  const remainingSupersaturation: { temperatureC: number; phaseId: string; saturationIndex: number }[] = [];
  const points: { dose: number; paste: HydratedPaste }[] = [];
  // Start the chain from the paste without the exposure at the first temperature: a neighbouring state from which
  // the warm start reaches the dosed equilibrium more reliably than a cold start does (each result is checked anyway).
  // (A sample starts from the reference run's dosed pastes instead.)
  const undosed = reduced ? undefined : pasteAtTemperature(withData, {}, [], "thaumasite-undosed")(temperatures[0], withData.warmFrom ? [withData.warmFrom] : undefined);
  const undosedStart = undosed?.ok ? [undosed.value] : [];
  const failedAtC: { temperatureC: number; code: string }[] = [];
  for (const t of temperatures) {
    const solved = solve(t, recent(points, undosedStart));
    if (!solved.ok) {
      // A chart point the engine cannot solve (warm and cold) is left out and recorded; the service state is required.
      if (t === serviceC) return { ok: false, error: { ...solved.error, dose: t } };
      failedAtC.push({ temperatureC: t, code: solved.error.code });
      continue;
    }
    if (solved.retried) retriedAtC.push(t);
    const still = supersaturatedSolid(solved.value, withData);
    if (still) remainingSupersaturation.push({ temperatureC: t, ...still });
    points.push({ dose: t, paste: solved.value });
  }

  const withoutThaumasite = pasteAtTemperature(withData, added, ["thaumasite"], "thaumasite-without-thaumasite");
  const figure = stabilityFigure("thaumasite", "thaumasite");
  const hintC = base.book?.figures.get(figure);
  const tolerance = options.toleranceC ?? DEFAULT_TOLERANCE_C;
  const maxIterations = options.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const stabilityLimit: StabilityLimit =
    reduced && options.limitNeeded === false
      ? { kind: "decided", bracketC: [fromC, toC] }
      : reduced && hintC !== undefined
        ? stabilityLimitNear(withoutThaumasite, "thaumasite", { fromC, toC }, hintC, tolerance, maxIterations, bookedSlopePerC(base.book, "thaumasite-without-thaumasite", "thaumasite", hintC))
        : phaseStabilityLimit(points, "thaumasite", withoutThaumasite, tolerance, maxIterations);
  if (base.book?.mode === "record") base.book.figures.set(figure, stabilityHintC(stabilityLimit));

  const service = points.find((p) => p.dose === serviceC)!.paste;
  const serviceWithout = withoutThaumasite(serviceC, byDistance(points, serviceC));
  if (!serviceWithout.ok) return { ok: false, error: { ...serviceWithout.error, dose: serviceC } };
  const siWithout = serviceWithout.value.assemblage.saturationIndices.thaumasite ?? Number.NEGATIVE_INFINITY;
  const thaumasiteMol = phaseMoles(service, "thaumasite");
  const thaumasiteCm3 = service.volumes.thaumasite ?? 0;
  // Ca6Si2(SO4)2(CO3)2(OH)12·24H2O: 2 Si per formula unit.
  const siliconPercent = reacted.Si > 0 ? (100 * 2 * thaumasiteMol) / reacted.Si : 0;

  return {
    ok: true,
    value: {
      sweep: {
        id: "thaumasite",
        title: "Assemblage with sulfate and carbonate against temperature",
        doseLabel: "Temperature",
        doseUnit: "°C",
        points: points.map(({ dose, paste }) => ({
          ...sweepPoint(dose, paste),
          thaumasiteMol: phaseMoles(paste, "thaumasite"),
          thaumasiteSaturationIndex: paste.assemblage.saturationIndices.thaumasite ?? Number.NEGATIVE_INFINITY,
          ettringiteMol: phaseMoles(paste, "ettringite"),
        })),
      },
      summary: {
        serviceTemperatureC: serviceC,
        serviceTemperatureClampedFromC: clampedFrom,
        sulfateCation: cation,
        exposureSulfatePresent: sulfatePresent,
        sulfateDoseMolSO3Per100gBinder: doseMol,
        // mol SO3 per 100 g binder × g/mol = g SO3 per 100 g binder = % of binder mass
        sulfateDoseSo3MassPercentOfBinder: doseMol * SO3_G_PER_MOL,
        solutionAddedKgPer100gBinder: solutionAddedKg,
        carbonateMolPer100gBinder: { binder: reacted.C ?? 0, aggregate: aggregateCalciteMol, water: waterCarbonateMol },
        atService: {
          thaumasiteMol,
          thaumasiteVolumeCm3Per100gBinder: thaumasiteCm3,
          // cm³ per 100 g binder × B kg/m³ × 10 (100 g portions per kg) / 1000 (cm³ per L) = L/m³
          thaumasiteLitresPerM3: (thaumasiteCm3 * base.binderContentKgPerM3 * 10) / 1000,
          saturationIndexWithoutIt: siWithout,
          formationGibbsKJPerMol: formationGibbsKJPerMol(siWithout, serviceC),
          siliconInThaumasitePercent: siliconPercent,
          pH: service.poreSolution?.pH ?? null,
        },
        thaumasiteStabilityTemperatureC: stabilityLimit.kind === "found" ? stabilityLimit.temperatureC : null,
        stabilityLimit,
        maximumThaumasiteVolumeCm3Per100gBinder: Math.max(0, ...points.map((p) => p.paste.volumes.thaumasite ?? 0)),
        equilibriumChecks: { retriedAtC, remainingSupersaturation, failedAtC },
      },
    },
  };
}
