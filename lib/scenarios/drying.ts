import type { RhTemperatureCell } from "../charts/rh-temperature-map";
import { hydratePaste, type HydratedPaste } from "../cement/hydrate-paste";
import { hydrationFamilies, type HydrationFamily } from "../data/hydration-states";
import { loadDataset, type Dataset } from "../data/load-dataset";
import { equilibrateSystem, phaseIds } from "../equilibrium/equilibrate";
import type { EquilibriumFailure } from "../equilibrium/failure";
import { GAS_CONSTANT_J_PER_MOL_K } from "../equilibrium/problem";
import type { EquilibriumResult, SerializedState } from "../equilibrium/result";
import { serviceTemperatureRangeC, type ExposureInput } from "../schema/exposure-input";
import { saturationPressureBar } from "../thermo/water-saturation-pressure";
import { alkaliBoundFractionOf, bookedPaste, recordPaste, type ScenarioBase, type ScenarioSweep, type SweepPoint } from "./sweep";

/**
 * Drying: the hydration states of the paste's solids at the service relative humidity and temperature — ettringite
 * or its collapsed low-water form metaettringite, monosulfate-14/12/10.5, gypsum/bassanite/anhydrite, the families of
 * `lib/data/hydration-states.json` — and the relative-humidity–temperature map of which member of each family is stable.
 *
 * Method (a constrained equilibrium, documented):
 * 1. The saturated paste is equilibrated at the service temperature (`hydratePaste`).
 * 2. Its solids alone — the element totals of every hydrate, without the pore solution — are equilibrated with water
 *    vapour at fixed partial pressure p(H2O) = RH/100 · p_sat(T) (IAPWS-IF97 saturation pressure). A fixed vapour
 *    pressure makes the system solid–gas: there is no liquid to hold the dissolved alkalis, and no solid of the data
 *    set hosts them, so the pore solution's dissolved elements are left out (reported as `excludedPoreSolutionMol`;
 *    on drying they would deposit as alkali salts not in the data set). Alkalis that the binder model holds in C-S-H by
 *    a distribution ratio stay with the C-S-H outside the engine (reported as `alkaliInCshMol`).
 * 3. Only hydration-state changes are allowed: the solids may take the other members of their own families, nothing
 *    else forms. Drying at service temperatures changes hydrate water contents topotactically but does not
 *    re-crystallise the assemblage (Baquerizo, Matschei & Scrivener 2016, Cem. Concr. Res. 79, 31; the note in
 *    `hydration-states.json` on the decomposition that the data would otherwise predict below about 6 % RH).
 * The map compares the members of each family on their own (one formula unit, other solids suppressed), as the cited
 * studies tabulate them. Equilibrium gives the drying branch only: rehydration of metaettringite needs much higher
 * humidity (hysteresis; Baquerizo et al. 2016), which no equilibrium model represents.
 */

/** Relative humidity evaluated at most / at least, % (p must stay below p_sat, and above 0; this module's limits). */
const RH_MAX_PERCENT = 99.5;
const RH_MIN_PERCENT = 1;
/** Temperature range of the vapour-pressure equilibria, °C (that of the engine and of the IAPWS-IF97 fit used here). */
const TEMPERATURE_MIN_C = 0;
const TEMPERATURE_MAX_C = 99;
/** Default map grid: RH %, denser at low humidity where the transitions lie; T °C, the common service and curing range (this module's choice). */
export const DEFAULT_MAP_RELATIVE_HUMIDITIES_PERCENT = [1, 2, 3, 5, 7, 10, 15, 20, 35, 50, 65, 80, 95] as const;
export const DEFAULT_MAP_TEMPERATURES_C = [5, 20, 35, 50, 65, 80] as const;
/** Sweep points allowed (this module's bound). */
const POINTS_MIN = 2;
const POINTS_MAX = 200;
/** Bisection steps on log RH for a transition humidity: resolves it to a factor 10^(2/2^14) ≈ 1.0003 (this module's choice). */
const BISECTION_STEPS = 14;
/** Below this amount (mol per 100 g binder, or per formula unit in the map) a solid counts as absent (numerical zero; this module's choice). */
const ABSENT_MOL = 1e-9;
/** Saturation index above which an absent, allowed solid means the engine did not reach the minimum (this module's choice). */
const SUPERSATURATION_TOLERANCE = 1e-3;
const KELVIN_OFFSET = 273.15;

export type DryingError = EquilibriumFailure | { code: "invalid_input"; field: string; message: string };

export type FamilyState = {
  family: string;
  /** The member held by the saturated paste (the most abundant when several). */
  saturatedMember: string;
  /** The member stable at the service humidity (the most abundant when two coexist at a transition). */
  stableMember: string;
  /** Family amount, mol per 100 g binder. */
  moles: number;
  /** Solid volume of the family after drying minus before, cm³ per 100 g binder (negative: shrinks). */
  volumeChangeCm3: number;
  /** The humidity below which the next drier member is stable at this temperature, %, from the family map (null: outside 1–99.5 %). */
  nextTransitionBelowRhPercent: number | null;
};

export type DryingState = {
  temperatureC: number;
  relativeHumidityPercent: number;
  /** Fixed water-vapour pressure, bar (RH/100 · p_sat(T)); null where the paste is taken as saturated (RH ≥ 99.5 % or permanently wet). */
  waterVapourPressureBar: number | null;
  /** Solid phases after drying, mol and cm³ per 100 g binder (hydrates only; unreacted binder is unchanged). */
  phases: { id: string; moles: number; volumeCm3: number }[];
  families: FamilyState[];
  /** Water given off by the solids to the vapour, mol per 100 g binder (structural water of the hydrates). */
  waterReleasedMol: number;
  /** Solid volume after drying minus that of the saturated paste's hydrates, cm³ per 100 g binder. */
  solidVolumeChangeCm3: number;
  /** Elements dissolved in the saturated paste's pore solution, left out of the solid–gas system, mol per 100 g binder. */
  excludedPoreSolutionMol: Record<string, number>;
  /** Alkali held in C-S-H by the binder model's distribution ratio, outside the engine, mol per 100 g binder. */
  alkaliInCshMol: Record<string, number>;
  /** Saturation indices (log10 Ω per formula unit) of ettringite and metaettringite after drying, when the family is present. */
  ettringiteSaturationIndex: number | null;
  metaettringiteSaturationIndex: number | null;
  /** ΔrG of Ca6Al2(SO4)3(OH)12·26H2O → metaettringite + n H2O(g) at these conditions, kJ per mol ettringite (< 0: collapse favoured). */
  ettringiteDehydrationGibbsKJPerMol: number | null;
  /** Water molecules lost per formula unit on that collapse (from the two formulas). */
  ettringiteDehydrationWaterPerFormula: number | null;
  /** Largest saturation index of an allowed but absent solid after drying (≈ 0 or below at a true minimum). */
  maxSaturationIndexOfAbsentSolids: number;
};

export type FamilyMap = { family: string; members: string[]; cells: RhTemperatureCell[] };

export type DryingScenario = {
  /** The dried assemblage against relative humidity at the (highest) service temperature. */
  sweep: ScenarioSweep;
  /** One state per distinct service temperature (the ends of a range), at the service humidity. */
  service: DryingState[];
  /** The relative-humidity–temperature map, one per data family, for the chart (`rhTemperatureMapChart`). */
  rhTemperatureMaps: FamilyMap[];
  summary: {
    serviceRelativeHumidityPercent: number | null;
    serviceTemperaturesC: number[];
    /** Whether the saturated paste holds ettringite at all. */
    ettringitePresent: boolean;
    /** Whether ettringite collapses to metaettringite at any evaluated service condition. */
    ettringiteCollapsed: boolean;
    /** Humidity below which ettringite collapses at the highest service temperature, % (family map; null: outside 1–99.5 %). */
    ettringiteCollapseBelowRhPercent: number | null;
    /** At the service condition least favourable to ettringite (most negative ΔrG): ΔrG, kJ/mol ettringite. */
    ettringiteDehydrationGibbsKJPerMol: number | null;
    /** Solid-volume change of the ettringite family on drying at that condition, cm³ per 100 g binder and L per m³. */
    ettringiteVolumeChangeCm3: number;
    ettringiteVolumeChangeLitresPerM3: number;
    /** Stable member per family at that condition. */
    stableMembers: Record<string, string>;
    warnings: string[];
  };
};

type Outcome<T> = { ok: true; value: T } | { ok: false; error: DryingError };

const clampTemperature = (t: number) => Math.min(TEMPERATURE_MAX_C, Math.max(TEMPERATURE_MIN_C, t));
const vapourPressureBar = (temperatureC: number, relativeHumidityPercent: number) => (relativeHumidityPercent / 100) * saturationPressureBar(temperatureC + KELVIN_OFFSET);

/** Members of a family, wettest first (by water per formula unit). */
function membersWettestFirst(family: HydrationFamily): string[] {
  return [...family.members].sort((a, b) => b.waterPerFormulaInCementNotation - a.waterPerFormulaInCementNotation).map((m) => m.id);
}

/**
 * The stable member of one family at (T, RH): one formula unit of the wettest member's elements equilibrated with water
 * vapour at p = RH/100 · p_sat(T), every other solid suppressed. Returns the index (wettest = 0) of the most abundant member.
 * Cold-started on purpose: warm starts across a change of fixed pressure were seen to return a non-minimum.
 */
function stableMemberIndex(members: readonly string[], suppressed: string[], elements: Record<string, number>, temperatureC: number, relativeHumidityPercent: number, dataset: Dataset): Outcome<number> {
  const result = equilibrateSystem({
    temperatureC,
    elementTotalsMol: elements,
    fixedPartialPressuresBar: { H2O: vapourPressureBar(temperatureC, relativeHumidityPercent) },
    suppressedPhases: suppressed,
    dataset,
  });
  if (!result.ok) return result;
  let best = -1;
  let bestMoles = 0;
  members.forEach((id, index) => {
    const moles = result.value.phases.find((p) => p.id === id)?.moles ?? 0;
    if (moles > bestMoles) [best, bestMoles] = [index, moles];
  });
  if (best < 0) return { ok: false, error: { code: "invalid_input", field: "dataset", message: `no member of the family ${members.join("/")} is stable at ${temperatureC} °C, ${relativeHumidityPercent} % RH` } };
  return { ok: true, value: best };
}

type FamilySetup = { family: HydrationFamily; members: string[]; suppressed: string[]; elements: Record<string, number> };

function familySetup(family: HydrationFamily, dataset: Dataset): FamilySetup | undefined {
  const members = membersWettestFirst(family);
  const wettest = dataset.species.find((s) => s.id === members[0]);
  if (!wettest || members.some((id) => !dataset.species.some((s) => s.id === id))) return undefined;
  const suppressed = [...phaseIds(dataset)].filter((id) => !members.includes(id));
  return { family, members, suppressed, elements: { ...wettest.elements } };
}

/**
 * The humidity (%) below which member k (or a drier one) is stable and above which a wetter one is, at T, by bisection on
 * log RH between 1 and 99.5 %; null when the boundary lies outside that range.
 */
function transitionRhPercent(setup: FamilySetup, boundary: number, temperatureC: number, dataset: Dataset): Outcome<number | null> {
  // Like the map, a transition depends on the data set alone: each is bisected once per data set (treat as read-only).
  const key = JSON.stringify([setup.members, boundary, temperatureC]);
  let known = transitionCache.get(dataset);
  if (!known) transitionCache.set(dataset, (known = new Map()));
  const cached = known.get(key);
  if (cached) return cached;
  const result = bisectTransitionRhPercent(setup, boundary, temperatureC, dataset);
  if (known.size >= MAXIMUM_CACHED_TRANSITIONS) known.clear();
  known.set(key, result);
  return result;
}

/** Transitions already bisected, per data set (a cap keeps a long-running service bounded; this module's choice). */
const transitionCache = new WeakMap<Dataset, Map<string, Outcome<number | null>>>();
const MAXIMUM_CACHED_TRANSITIONS = 1024;

function bisectTransitionRhPercent(setup: FamilySetup, boundary: number, temperatureC: number, dataset: Dataset): Outcome<number | null> {
  const drierAt = (rh: number): Outcome<boolean> => {
    const index = stableMemberIndex(setup.members, setup.suppressed, setup.elements, temperatureC, rh, dataset);
    return index.ok ? { ok: true, value: index.value >= boundary } : index;
  };
  const atTop = drierAt(RH_MAX_PERCENT);
  if (!atTop.ok) return atTop;
  if (atTop.value) return { ok: true, value: null };
  const atBottom = drierAt(RH_MIN_PERCENT);
  if (!atBottom.ok) return atBottom;
  if (!atBottom.value) return { ok: true, value: null };
  let [low, high] = [Math.log10(RH_MIN_PERCENT), Math.log10(RH_MAX_PERCENT)];
  for (let step = 0; step < BISECTION_STEPS; step++) {
    const mid = (low + high) / 2;
    const drier = drierAt(10 ** mid);
    if (!drier.ok) return drier;
    if (drier.value) low = mid;
    else high = mid;
  }
  return { ok: true, value: 10 ** ((low + high) / 2) };
}

/**
 * The humidity (%) below which the drier member at `drierMemberId` (or a still drier one) of the family named `familyName`
 * is stable at `temperatureC`, by bisection of family-alone equilibria on log RH; null when outside 1–99.5 %.
 */
export function familyTransitionRhPercent(familyName: string, drierMemberId: string, temperatureC: number, dataset: Dataset): Outcome<number | null> {
  const family = hydrationFamilies().find((f) => f.family === familyName);
  const setup = family ? familySetup(family, dataset) : undefined;
  if (!setup) return { ok: false, error: { code: "invalid_input", field: "familyName", message: `no hydration-state family "${familyName}" with all members in the data set` } };
  const boundary = setup.members.indexOf(drierMemberId);
  if (boundary < 1) return { ok: false, error: { code: "invalid_input", field: "drierMemberId", message: `"${drierMemberId}" is not a drier member of ${familyName} (members, wettest first: ${setup.members.join(", ")})` } };
  if (!(temperatureC >= TEMPERATURE_MIN_C && temperatureC <= TEMPERATURE_MAX_C)) return { ok: false, error: { code: "invalid_input", field: "temperatureC", message: `must be between ${TEMPERATURE_MIN_C} and ${TEMPERATURE_MAX_C} °C` } };
  return transitionRhPercent(setup, boundary, temperatureC, dataset);
}

/** Maps already computed, per data set and grid: the map depends on neither the mix nor the exposure. */
const mapCache = new WeakMap<Dataset, Map<string, FamilyMap[]>>();

/**
 * The relative-humidity–temperature map of each hydration-state family: the stable member on a grid (RH %, T °C).
 * Each cell is one equilibrium of the family alone at fixed water-vapour pressure. Results are cached per data set and
 * grid (treat them as read-only).
 */
export function hydrationStateMaps(
  relativeHumiditiesPercent: readonly number[],
  temperaturesC: readonly number[],
  dataset: Dataset,
  families: readonly HydrationFamily[] = hydrationFamilies(),
): Outcome<FamilyMap[]> {
  for (const [index, rh] of relativeHumiditiesPercent.entries())
    if (!(rh >= RH_MIN_PERCENT && rh <= RH_MAX_PERCENT)) return { ok: false, error: { code: "invalid_input", field: `map.relativeHumiditiesPercent[${index}]`, message: `must be between ${RH_MIN_PERCENT} and ${RH_MAX_PERCENT} %` } };
  for (const [index, t] of temperaturesC.entries())
    if (!(t >= TEMPERATURE_MIN_C && t <= TEMPERATURE_MAX_C)) return { ok: false, error: { code: "invalid_input", field: `map.temperaturesC[${index}]`, message: `must be between ${TEMPERATURE_MIN_C} and ${TEMPERATURE_MAX_C} °C` } };
  const key = JSON.stringify([relativeHumiditiesPercent, temperaturesC, families.map((f) => f.family)]);
  const cached = mapCache.get(dataset)?.get(key);
  if (cached) return { ok: true, value: cached };
  const maps: FamilyMap[] = [];
  for (const family of families) {
    const setup = familySetup(family, dataset);
    if (!setup) continue;
    const cells: RhTemperatureCell[] = [];
    for (const temperatureC of temperaturesC)
      for (const relativeHumidityPercent of relativeHumiditiesPercent) {
        const index = stableMemberIndex(setup.members, setup.suppressed, setup.elements, temperatureC, relativeHumidityPercent, dataset);
        if (!index.ok) return index;
        cells.push({ temperatureC, relativeHumidityPercent, state: setup.members[index.value] });
      }
    maps.push({ family: family.family, members: setup.members, cells });
  }
  if (!mapCache.has(dataset)) mapCache.set(dataset, new Map());
  mapCache.get(dataset)!.set(key, maps);
  return { ok: true, value: maps };
}

/** Solid element totals of a hydrated paste (hydrates only, solid-solution members included), mol per 100 g binder. */
function solidElementTotals(assemblage: EquilibriumResult, elementsOf: ReadonlyMap<string, Record<string, number>>): Record<string, number> {
  const totals: Record<string, number> = {};
  for (const phase of assemblage.phases) {
    if (phase.kind === "gas") continue;
    for (const member of phase.members ?? [{ id: phase.id, moles: phase.moles }])
      for (const [element, count] of Object.entries(elementsOf.get(member.id) ?? {})) totals[element] = (totals[element] ?? 0) + count * member.moles;
  }
  return totals;
}

/** Dissolved element amounts of the pore solution (solvent excluded), mol per 100 g binder. */
function poreSolutionElementsMol(assemblage: EquilibriumResult): Record<string, number> {
  const out: Record<string, number> = {};
  const solution = assemblage.solution;
  if (!solution) return out;
  for (const [element, molality] of Object.entries(solution.elementMolality)) if (element !== "H" && element !== "O" && molality > 0) out[element] = molality * solution.waterKg;
  return out;
}

type SaturatedContext = {
  paste: HydratedPaste;
  totals: Record<string, number>;
  suppressed: string[];
  /** Hydration-state families with a member in the saturated paste. */
  families: FamilySetup[];
};

function saturatedContext(paste: HydratedPaste, dataset: Dataset, elementsOf: ReadonlyMap<string, Record<string, number>>): SaturatedContext {
  const present = new Set<string>();
  for (const phase of paste.assemblage.phases) if (phase.kind !== "gas" && phase.moles > ABSENT_MOL) present.add(phase.id);
  const families = hydrationFamilies()
    .filter((f) => f.members.some((m) => present.has(m.id)))
    .map((f) => familySetup(f, dataset))
    .filter((s): s is FamilySetup => s !== undefined);
  const allowed = new Set([...present, ...families.flatMap((f) => f.members)]);
  const suppressed = [...phaseIds(dataset)].filter((id) => !allowed.has(id));
  return { paste, totals: solidElementTotals(paste.assemblage, elementsOf), suppressed, families };
}

const molesIn = (phases: readonly { id: string; moles: number }[], id: string) => phases.find((p) => p.id === id)?.moles ?? 0;
const volumeIn = (phases: readonly { id: string; volumeCm3: number }[], id: string) => phases.find((p) => p.id === id)?.volumeCm3 ?? 0;

/** The dried state of the saturated paste's solids at (T, RH), or the saturated state itself where RH ≥ 99.5 %. */
/** The largest saturation index of an allowed solid absent from a result (−∞ when none). */
function maxAbsentSaturationIndex(result: EquilibriumResult, suppressed: ReadonlySet<string>): number {
  const present = new Set(result.phases.map((p) => p.id));
  let maxSi = Number.NEGATIVE_INFINITY;
  for (const [id, si] of Object.entries(result.saturationIndices)) if (!suppressed.has(id) && !present.has(id) && si > maxSi) maxSi = si;
  return maxSi;
}

/**
 * The dried state; `chain.warmStart` starts the solid–gas equilibrium from a neighbouring humidity's (the sweep), and
 * a warm result that leaves an allowed solid supersaturated is solved again cold. `chain.onState` receives the state.
 */
function driedState(
  ctx: SaturatedContext,
  temperatureC: number,
  relativeHumidityPercent: number,
  saturated: boolean,
  dataset: Dataset,
  withTransitions = true,
  chain: { warmStart?: SerializedState; onState?: (state: SerializedState) => void } = {},
): Outcome<DryingState> {
  const before = ctx.paste.assemblage.phases.filter((p) => p.kind !== "gas").map((p) => ({ id: p.id, moles: p.moles, volumeCm3: p.volumeCm3 }));
  let after = before;
  let waterReleasedMol = 0;
  let saturationIndices: Record<string, number> = ctx.paste.assemblage.saturationIndices;
  let vapourBar: number | null = null;
  if (!saturated) {
    vapourBar = vapourPressureBar(temperatureC, relativeHumidityPercent);
    const spec = { temperatureC, elementTotalsMol: ctx.totals, fixedPartialPressuresBar: { H2O: vapourBar }, suppressedPhases: ctx.suppressed, dataset };
    let result = equilibrateSystem({ ...spec, warmStart: chain.warmStart });
    if (chain.warmStart && (!result.ok || maxAbsentSaturationIndex(result.value, new Set(ctx.suppressed)) > SUPERSATURATION_TOLERANCE)) result = equilibrateSystem(spec);
    if (!result.ok) return result;
    chain.onState?.(result.value.state);
    after = result.value.phases.filter((p) => p.kind !== "gas").map((p) => ({ id: p.id, moles: p.moles, volumeCm3: p.volumeCm3 }));
    waterReleasedMol = -Object.values(result.value.gasUptakeMol).reduce((sum, mol) => sum + mol, 0);
    saturationIndices = result.value.saturationIndices;
  }
  const suppressedSet = new Set(ctx.suppressed);
  const presentAfter = new Set(after.map((p) => p.id));
  let maxSi = Number.NEGATIVE_INFINITY;
  if (!saturated) for (const [id, si] of Object.entries(saturationIndices)) if (!suppressedSet.has(id) && !presentAfter.has(id) && si > maxSi) maxSi = si;

  const families: FamilyState[] = [];
  for (const setup of ctx.families) {
    const pick = (phases: typeof before) => setup.members.reduce((best, id) => (molesIn(phases, id) > molesIn(phases, best) ? id : best), setup.members[0]);
    const saturatedMember = pick(before);
    const stableMember = pick(after);
    const stableIndex = setup.members.indexOf(stableMember);
    const next = withTransitions && stableIndex < setup.members.length - 1 ? transitionRhPercent(setup, stableIndex + 1, temperatureC, dataset) : { ok: true as const, value: null };
    if (!next.ok) return next;
    families.push({
      family: setup.family.family,
      saturatedMember,
      stableMember,
      moles: setup.members.reduce((sum, id) => sum + molesIn(before, id), 0),
      volumeChangeCm3: setup.members.reduce((sum, id) => sum + volumeIn(after, id) - volumeIn(before, id), 0),
      nextTransitionBelowRhPercent: next.value,
    });
  }

  const ettringiteFamily = ctx.families.find((f) => f.members.includes("ettringite") && f.members.includes("metaettringite"));
  let siEttringite: number | null = null;
  let siMeta: number | null = null;
  let gibbs: number | null = null;
  let waterPerFormula: number | null = null;
  if (ettringiteFamily) {
    siEttringite = saturationIndices["ettringite"] ?? null;
    siMeta = saturationIndices["metaettringite"] ?? null;
    const h = (id: string) => dataset.species.find((s) => s.id === id)?.elements.H ?? 0;
    waterPerFormula = (h("ettringite") - h("metaettringite")) / 2;
    // ΔrG(ett → meta + n H2O(g)) = μ°meta + n μ(H2O,g) − μ°ett = RT ln10 · (SI_ett − SI_meta), the element potentials cancelling.
    if (siEttringite !== null && siMeta !== null) gibbs = (GAS_CONSTANT_J_PER_MOL_K * (temperatureC + KELVIN_OFFSET) * Math.LN10 * (siEttringite - siMeta)) / 1000;
  }
  const solidVolume = (phases: typeof before) => phases.reduce((sum, p) => sum + p.volumeCm3, 0);
  return {
    ok: true,
    value: {
      temperatureC,
      relativeHumidityPercent,
      waterVapourPressureBar: vapourBar,
      phases: after,
      families,
      waterReleasedMol,
      solidVolumeChangeCm3: solidVolume(after) - solidVolume(before),
      excludedPoreSolutionMol: poreSolutionElementsMol(ctx.paste.assemblage),
      alkaliInCshMol: { ...ctx.paste.alkaliInCshMol },
      ettringiteSaturationIndex: siEttringite,
      metaettringiteSaturationIndex: siMeta,
      ettringiteDehydrationGibbsKJPerMol: gibbs,
      ettringiteDehydrationWaterPerFormula: waterPerFormula,
      maxSaturationIndexOfAbsentSolids: maxSi,
    },
  };
}

/** n humidities from 1 % to 99.5 % evenly spaced on a logarithmic axis (the transitions lie at low humidity). */
export function logarithmicHumiditiesPercent(points: number): number[] {
  const n = Math.max(2, Math.floor(points));
  return Array.from({ length: n }, (_, i) => RH_MIN_PERCENT * (RH_MAX_PERCENT / RH_MIN_PERCENT) ** (i / (n - 1)));
}

/**
 * The drying scenario (see the module comment). Service conditions: `exposure.relativeHumidityPercent` (none: the map
 * and the humidity sweep only; "permanently-wet" without a humidity: saturated) at each end of
 * `exposure.serviceTemperatureC` (none: the base temperature). `options.points` humidities for the sweep;
 * `options.map` overrides the map grid.
 */
export function dryingScenario(
  base: ScenarioBase,
  exposure: ExposureInput,
  options: {
    points: number;
    map?: { relativeHumiditiesPercent?: readonly number[]; temperaturesC?: readonly number[] };
    /**
     * The reduced path of a Monte Carlo sample: only the service states (the saturated paste and its solids dried at the
     * service humidity), which decide the flag. The humidity sweep, the map and the transition humidities are left out
     * (empty, null).
     */
    serviceOnly?: boolean;
  },
): Outcome<DryingScenario> {
  if (!Number.isInteger(options.points) || options.points < POINTS_MIN || options.points > POINTS_MAX)
    return { ok: false, error: { code: "invalid_input", field: "points", message: `points must be an integer from ${POINTS_MIN} to ${POINTS_MAX}` } };
  let dataset = base.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return { ok: false, error: { code: "invalid_input", field: "dataset", message: loaded.error.message } };
    dataset = loaded.value;
  }
  const elementsOf = new Map(dataset.species.map((s) => [s.id, s.elements]));
  const warnings: string[] = [];

  const range = serviceTemperatureRangeC(exposure) ?? { minC: base.temperatureC, maxC: base.temperatureC };
  const temperatures = [...new Set([range.minC, range.maxC])].map((t) => {
    const clamped = clampTemperature(t);
    if (clamped !== t) warnings.push(`service temperature ${t} °C evaluated at ${clamped} °C (vapour-pressure equilibria are computed for ${TEMPERATURE_MIN_C}–${TEMPERATURE_MAX_C} °C)`);
    return clamped;
  });
  const hottest = Math.max(...temperatures);

  let serviceRh: number | null = exposure.relativeHumidityPercent ?? (exposure.wetting === "permanently-wet" ? 100 : null);
  const serviceSaturated = serviceRh !== null && serviceRh >= RH_MAX_PERCENT;
  if (serviceRh !== null && serviceRh < RH_MIN_PERCENT) {
    warnings.push(`relative humidity ${serviceRh} % evaluated at ${RH_MIN_PERCENT} %`);
    serviceRh = RH_MIN_PERCENT;
  }

  const contexts = new Map<number, SaturatedContext>();
  for (const temperatureC of temperatures) {
    // A sample starts from the reference's paste at this temperature; otherwise the base's solver state only (see `ScenarioBase.warmFrom`).
    const booked = bookedPaste(base.book, "drying", temperatureC);
    const paste = hydratePaste(base.composition, {
      temperatureC,
      binderContentKgPerM3: base.binderContentKgPerM3,
      suppress: base.suppress,
      enable: base.enable,
      dataset,
      warmStart: (booked ?? base.warmFrom)?.assemblage.state,
      alkaliBoundFraction: booked ? alkaliBoundFractionOf(booked, base.composition.reactedElementsMol) : undefined,
    });
    if (!paste.ok) return paste;
    recordPaste(base.book, "drying", temperatureC, paste.value);
    contexts.set(temperatureC, saturatedContext(paste.value, dataset, elementsOf));
  }

  const service: DryingState[] = [];
  if (serviceRh !== null)
    for (const temperatureC of temperatures) {
      // A Monte Carlo sample starts the dried solids from the reference run's at the same conditions (checked as in the sweep).
      const key = `drying-service@${temperatureC}`;
      const book = base.book;
      const state = driedState(contexts.get(temperatureC)!, temperatureC, Math.min(serviceRh, 100), serviceSaturated, dataset, !options.serviceOnly, {
        warmStart: book?.mode === "read" ? book.states.get(key) : undefined,
        onState: (s) => {
          if (book?.mode === "record") book.states.set(key, s);
        },
      });
      if (!state.ok) return state;
      if (state.value.maxSaturationIndexOfAbsentSolids > SUPERSATURATION_TOLERANCE)
        warnings.push(`at ${temperatureC} °C, ${serviceRh} % RH an allowed solid is absent but supersaturated (SI ${state.value.maxSaturationIndexOfAbsentSolids.toFixed(3)}): not a converged equilibrium`);
      service.push(state.value);
    }

  const hotContext = contexts.get(hottest)!;
  const unreacted = hotContext.paste.phases.filter((p) => p.origin === "unreacted");
  const points: SweepPoint[] = [];
  let previousState: SerializedState | undefined;
  for (const rh of options.serviceOnly ? [] : logarithmicHumiditiesPercent(options.points)) {
    // Each humidity starts from the previous one's solids (checked: a supersaturated warm result is solved cold).
    const state = driedState({ ...hotContext, families: [] }, hottest, rh, false, dataset, true, { warmStart: previousState, onState: (s) => (previousState = s) });
    if (!state.ok) return state;
    const phaseVolumesCm3: Record<string, number> = {};
    for (const p of state.value.phases) phaseVolumesCm3[p.id] = (phaseVolumesCm3[p.id] ?? 0) + p.volumeCm3;
    for (const p of unreacted) phaseVolumesCm3[p.id] = (phaseVolumesCm3[p.id] ?? 0) + p.volumeCm3;
    points.push({ dose: rh, phaseVolumesCm3, pH: null });
  }

  const map: Outcome<FamilyMap[]> = options.serviceOnly
    ? { ok: true, value: [] }
    : hydrationStateMaps(options.map?.relativeHumiditiesPercent ?? DEFAULT_MAP_RELATIVE_HUMIDITIES_PERCENT, options.map?.temperaturesC ?? DEFAULT_MAP_TEMPERATURES_C, dataset);
  if (!map.ok) return map;

  const ettringitePresent = hotContext.families.some((f) => f.members.includes("ettringite"));
  let collapseRh: number | null = null;
  const ettringiteSetup = hotContext.families.find((f) => f.members.includes("ettringite"));
  if (ettringiteSetup && !options.serviceOnly) {
    const t = transitionRhPercent(ettringiteSetup, ettringiteSetup.members.indexOf("metaettringite"), hottest, dataset);
    if (!t.ok) return t;
    collapseRh = t.value;
  }
  const worst = service.reduce<DryingState | undefined>((w, s) => (w === undefined || (s.ettringiteDehydrationGibbsKJPerMol ?? Infinity) < (w.ettringiteDehydrationGibbsKJPerMol ?? Infinity) ? s : w), undefined);
  const ettringiteState = worst?.families.find((f) => f.family === ettringiteSetup?.family.family);
  const ettringiteVolumeChangeCm3 = ettringiteState?.volumeChangeCm3 ?? 0;

  return {
    ok: true,
    value: {
      sweep: { id: "drying", title: `Solids after drying at ${hottest} °C`, doseLabel: "Relative humidity", doseUnit: "%", points },
      service,
      rhTemperatureMaps: map.value,
      summary: {
        serviceRelativeHumidityPercent: serviceRh,
        serviceTemperaturesC: temperatures,
        ettringitePresent,
        ettringiteCollapsed: service.some((s) => s.families.some((f) => f.saturatedMember === "ettringite" && f.stableMember === "metaettringite")),
        ettringiteCollapseBelowRhPercent: collapseRh,
        ettringiteDehydrationGibbsKJPerMol: worst?.ettringiteDehydrationGibbsKJPerMol ?? null,
        ettringiteVolumeChangeCm3,
        // cm³ per 100 g binder → L per m³ concrete: × B/100 (see `per100gToPerM3`)
        ettringiteVolumeChangeLitresPerM3: (ettringiteVolumeChangeCm3 * base.binderContentKgPerM3) / 100,
        stableMembers: Object.fromEntries((worst?.families ?? []).map((f) => [f.family, f.stableMember])),
        warnings,
      },
    },
  };
}
