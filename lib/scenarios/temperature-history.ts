import { hydratePaste, type HydratedPaste } from "../cement/hydrate-paste";
import { suppressedPhases } from "../data/kinetic-constraints";
import { loadDataset, type Dataset } from "../data/load-dataset";
import type { EquilibriumFailure } from "../equilibrium/failure";
import type { SerializedState } from "../equilibrium/result";
import { serviceTemperatureRangeC, type ExposureInput } from "../schema/exposure-input";
import { alkaliBoundFractionOf, bookedPaste, linearDoses, phaseMoles, recordPaste, sweepPoint, type ScenarioBase, type ScenarioSweep, type SweepFailure, type SweepPoint, type WarmStartBook } from "./sweep";

/**
 * Temperature history and delayed ettringite formation (DEF). The same bulk composition is equilibrated
 * over a range of temperatures: ettringite is stable in a Portland paste at room temperature but not above
 * a mix-dependent temperature, where its sulfate passes to AFm, the pore solution (and, in real pastes, the
 * C-S-H) and can re-form ettringite after cooling, in the hardened paste (Taylor, Famy & Scrivener 2001,
 * Cem. Concr. Res. 31, 683; Lothenbach, Winnefeld, Alder, Wieland & Lunk 2007, Cem. Concr. Res. 37, 483).
 *
 * What this model does and does not hold:
 * - sulfate sorption on C-S-H is not in the data set: at high temperature the sulfate that leaves ettringite
 *   goes to AFm, the pore solution or a calcium sulfate in the model, so `sulfateOutsideAft` is the whole of it;
 * - hydrogarnets are suppressed below 50 °C by the default kinetic constraints (`lib/data/kinetic-constraints.json`),
 *   so the assemblage changes step-wise at 50 °C;
 * - the computed stability temperature comes out higher than the 65–75 °C reported for Portland pastes (about
 *   89 °C for the typical CEM I preset). Two reasons are known (tests/data/ettringite-temperature.test.ts): above
 *   50 °C the default constraints let siliceous hydrogarnet take the aluminium the AFm phases would hold, which
 *   leaves ettringite the only solid host of sulfate; and sulfate uptake by C-S-H, large at high temperature in real
 *   pastes, is not modelled. The data's ettringite log Ksp departs from Perkins & Palmer's temperature function by
 *   about 1.3 log10 units at 85 °C, but that comes from the constant Cp of Al(OH)4-, which cancels between
 *   Al-bearing solids and does not move this limit.
 *   It is reported as computed.
 */

/** Sweep range, °C, when the caller gives none: 5–95 °C covers service and steam/heat curing (common practice). */
const DEFAULT_SWEEP_FROM_C = 5;
const DEFAULT_SWEEP_TO_C = 95;
/** The data set covers 0–100 °C (issue 3 scope); temperatures outside are refused. */
export const DATA_SET_MIN_C = 0;
export const DATA_SET_MAX_C = 100;
/** Root-finding tolerance on temperature, °C, and iteration cap (a cap so nothing hangs). */
export const DEFAULT_TOLERANCE_C = 0.05;
export const DEFAULT_MAX_ITERATIONS = 40;
/** Below this amount, mol per 100 g binder, a phase is counted absent (numerical dust of the solver). */
const PRESENT_ABOVE_MOL = 1e-12;
/**
 * A warm-started solve can end with an allowed solid still supersaturated (a phase the minimiser left out after a
 * failed addition). Results with a saturation index above this, log10 units, are re-solved cold.
 */
const SUPERSATURATION_TOLERANCE_LOG10 = 1e-3;
/** Molar gas constant, J/(mol·K) (CODATA 2018, exact). */
const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;
const KELVIN_OFFSET = 273.15;

/** The AFt phases: where sulfate is held as ettringite. */
const AFT_PHASE_IDS = ["ettringite", "fe-ettringite"] as const;

export type TemperaturePoint = SweepPoint & {
  ettringiteMol: number;
  /** Saturation index (log10 Ω) of ettringite in the equilibrium assemblage (0 where it is present). */
  ettringiteSaturationIndex: number;
  /** Sulfate in the pore solution, mol SO3 per 100 g binder. */
  dissolvedSulfateMolSO3: number;
};

export type StabilityLimit =
  | { kind: "found"; temperatureC: number; iterations: number; bracketC: [number, number] }
  /** The phase is present at every temperature of the sweep. */
  | { kind: "stable-throughout"; upToC: number }
  /** The phase is absent at every temperature of the sweep (e.g. too little sulfate or aluminium). */
  | { kind: "absent-throughout"; fromC: number; toC: number }
  /** The root finding failed (an engine failure inside the bracket): the limit lies between these sweep temperatures. */
  | { kind: "bracketed"; bracketC: [number, number]; failure: string }
  /**
   * A Monte Carlo sample's limit, narrowed only until no decision temperature of its flags lies inside the bracket
   * (`decisionTemperaturesC`): the limit lies in `bracketC`, and every value in it gives the flags the same answer.
   */
  | { kind: "decided"; bracketC: [number, number] };

export type SulfateDistribution = {
  /** Sulfate of the whole paste, mol SO3 per 100 g binder. */
  totalMolSO3Per100gBinder: number;
  /** Held in AFt (ettringite, Fe-ettringite). */
  inAftMolSO3Per100gBinder: number;
  /** Held elsewhere (AFm, pore solution, calcium sulfates, ...): what can form ettringite later. */
  outsideAftMolSO3Per100gBinder: number;
  outsideAftMolSO3PerM3: number;
  /** Host → mol SO3 per 100 g binder; `pore-solution` for the dissolved sulfate. */
  byHostMolSO3Per100gBinder: Record<string, number>;
};

export type TemperatureState = {
  temperatureC: number;
  ettringiteMol: number;
  ettringiteVolumeCm3: number;
  /**
   * Saturation index of ettringite in the assemblage equilibrated WITHOUT ettringite: positive where ettringite
   * would form (it is then stable), negative where it is unstable. ΔrG of ettringite formation from the pore
   * solution = −RT ln10 · SI, kJ per mol of Ca6Al2(SO4)3(OH)12·26H2O.
   *
   * Null on a Monte Carlo sample's decided path where ettringite is present (`ettringiteMol` > 0): the index is then
   * positive (at a Gibbs energy minimum that holds a phase, the same system without it is supersaturated with it), and
   * the sample needs only that sign, not the equilibrium without ettringite that would give its value.
   */
  ettringiteSaturationIndexWithoutIt: number | null;
  ettringiteFormationGibbsKJPerMol: number | null;
  sulfate: SulfateDistribution;
  pH: number | null;
  phasesMol: Record<string, number>;
};

export type TemperatureHistoryResult = {
  sweep: ScenarioSweep<TemperaturePoint>;
  summary: {
    serviceTemperatureC: number;
    /** Set when the service temperature lies outside the data set's 0–100 °C and was evaluated at its limit. */
    serviceTemperatureClampedFromC: number | null;
    /** Null when no curing temperature was given. */
    curingTemperatureC: number | null;
    /** Set when the curing temperature lay above the data set's 100 °C and was evaluated at that limit (`curingAboveDataSet`). */
    curingTemperatureClampedFromC: number | null;
    /** The temperature above which ettringite is no longer stable in this mix (null unless a limit was found). */
    ettringiteStabilityTemperatureC: number | null;
    stabilityLimit: StabilityLimit;
    atService: TemperatureState;
    atCuring: TemperatureState | null;
    /** Sulfate that passes from AFm/solution into ettringite on cooling from curing to service, mol SO3 per 100 g binder and per m³. */
    sulfateToEttringiteOnCoolingMolSO3Per100gBinder: number | null;
    sulfateToEttringiteOnCoolingMolSO3PerM3: number | null;
    /** Ettringite volume that forms on cooling, cm³ per 100 g binder and L per m³ of concrete. */
    ettringiteVolumeGainOnCoolingCm3Per100gBinder: number | null;
    ettringiteVolumeGainOnCoolingLitresPerM3: number | null;
    /**
     * Sweep temperatures where the warm-started result left an allowed solid supersaturated and was re-solved cold,
     * and any supersaturation that remained (then the point is not a true equilibrium).
     */
    equilibriumChecks: EquilibriumChecks;
  };
};

/**
 * How far the sweep could be trusted: temperatures re-solved cold after a failed or non-equilibrium warm start,
 * any supersaturation that remained (the point is then not a true equilibrium), and chart points the engine could
 * not solve at all (left out of the sweep).
 */
export type EquilibriumChecks = {
  retriedAtC: number[];
  remainingSupersaturation: { temperatureC: number; phaseId: string; saturationIndex: number }[];
  failedAtC: { temperatureC: number; code: string }[];
};

export type TemperatureHistoryError =
  | SweepFailure
  | { code: "temperature_out_of_range"; field: string; temperatureC: number; minimumC: number; maximumC: number; message: string };

export type TemperatureHistoryOptions = {
  /** Points of the temperature sweep (the service and curing temperatures are added to them). */
  points: number;
  /** Maximum concrete temperature during curing, °C (`curing.maxTemperatureC`). */
  curingMaxTemperatureC?: number;
  /**
   * A curing temperature above the data set's 100 °C: refused (the default, for an entered value), or evaluated at
   * 100 °C and said so (`curingTemperatureClampedFromC`), for a peak computed by the element model. Ettringite only
   * loses stability on heating, so the state at 100 °C is the nearest the data can give to the hotter one.
   */
  curingAboveDataSet?: "refuse" | "evaluate-at-limit";
  sweepFromC?: number;
  sweepToC?: number;
  toleranceC?: number;
  maxIterations?: number;
  /**
   * The reduced path of a Monte Carlo sample read from a `WarmStartBook`: no temperature grid, only the service and
   * curing states, and the stability temperature by root finding from the reference run's (`stabilityLimitNear`), or,
   * with `decisionTemperaturesC`, only as far as those decisions need (`decidedStabilityLimit`).
   */
  reduced?: boolean;
  /**
   * The temperatures at which the flags read from this scenario compare the curing temperature with the ettringite
   * stability temperature (`defDecisionTemperaturesC` of the delayed-ettringite-formation flag). Used on the reduced path.
   */
  decisionTemperaturesC?: readonly number[];
};

/** ΔrG of precipitation from the saturation index: ΔrG = −RT ln10 · SI, kJ/mol per formula unit. */
export function formationGibbsKJPerMol(saturationIndex: number, temperatureC: number): number {
  return (-GAS_CONSTANT_J_PER_MOL_K * (temperatureC + KELVIN_OFFSET) * Math.LN10 * saturationIndex) / 1000;
}

/** Representative service temperature for DEF: the mid-point of the range, or the base temperature. */
/**
 * The service temperature of the DEF comparison: the mean of the service range (or the single value), evaluated within
 * the data set's 0–100 °C. A colder service (the schema takes down to −60 °C) is computed at 0 °C and said so: ettringite
 * only gains stability on cooling, so 0 °C is the conservative side for the sulfate that reforms it.
 */
function serviceTemperatureForDef(base: ScenarioBase, exposure: ExposureInput): { temperatureC: number; clampedFromC: number | null } {
  const range = serviceTemperatureRangeC(exposure);
  const wanted = range ? (range.minC + range.maxC) / 2 : base.temperatureC;
  const temperatureC = Math.min(Math.max(wanted, DATA_SET_MIN_C), DATA_SET_MAX_C);
  return { temperatureC, clampedFromC: temperatureC !== wanted ? wanted : null };
}

/**
 * Brent's method (Brent 1973, Algorithms for Minimization without Derivatives, ch. 4): inverse quadratic
 * interpolation and secant steps, falling back to bisection so the bracket always shrinks. `f` may fail
 * (an engine failure), which is passed back. Needs f(a)·f(b) ≤ 0; stops when the bracket is below `toleranceX`
 * or after `maxIterations` evaluations.
 */
export function brentRoot<E>(
  f: (x: number) => { ok: true; value: number } | { ok: false; error: E },
  bracket: { a: number; b: number; fa: number; fb: number },
  toleranceX: number,
  maxIterations: number,
): { ok: true; value: { x: number; iterations: number } } | { ok: false; error: E | { code: "no_sign_change"; fa: number; fb: number } } {
  let { a, b, fa, fb } = bracket;
  if (fa * fb > 0) return { ok: false, error: { code: "no_sign_change", fa, fb } };
  if (fa === 0) return { ok: true, value: { x: a, iterations: 0 } };
  if (fb === 0) return { ok: true, value: { x: b, iterations: 0 } };
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * toleranceX;
    const half = 0.5 * (c - b);
    if (Math.abs(half) <= tol || fb === 0) return { ok: true, value: { x: b, iterations: iteration - 1 } };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * half * s; // secant
        q = 1 - s;
      } else {
        const qa = fa / fc; // inverse quadratic interpolation
        const r = fb / fc;
        p = s * (2 * half * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      p = Math.abs(p);
      if (2 * p < Math.min(3 * half * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = half;
        e = d;
      }
    } else {
      d = half;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : Math.sign(half) * tol;
    const next = f(b);
    if (!next.ok) return next;
    fb = next.value;
  }
  return { ok: true, value: { x: b, iterations: maxIterations } };
}

/**
 * A solve at one temperature from a neighbouring paste (or several, tried in order). `retried` tells that the first
 * warm start failed or left an allowed solid supersaturated and another start (the next neighbour, then cold) was used.
 */
export type PasteAt = (
  temperatureC: number,
  warm?: HydratedPaste | readonly HydratedPaste[],
) => { ok: true; value: HydratedPaste; retried?: boolean } | { ok: false; error: EquilibriumFailure };

/** Most warm starts tried for one solve before the cold start (a cap so a hard point cannot take long). */
const MAX_WARM_STARTS_PER_SOLVE = 3;

/** Pastes ordered by distance in temperature from `temperatureC`: warm starts for a solve off the chain. */
export function byDistance(points: readonly { paste: HydratedPaste }[], temperatureC: number): HydratedPaste[] {
  return points.map((p) => p.paste).sort((x, y) => Math.abs(x.temperatureC - temperatureC) - Math.abs(y.temperatureC - temperatureC));
}

/** The warm starts for the next point of a chain: the latest pastes first (the chain runs in one direction). */
export function recent(points: readonly { paste: HydratedPaste }[], extra: readonly HydratedPaste[] = []): HydratedPaste[] {
  return [...points.slice(-2).reverse().map((p) => p.paste), ...extra];
}

/**
 * The ettringite stability limit of a Monte Carlo sample, narrowed only as far as its flag needs: the flag compares the
 * curing temperature with the limit at a few decision temperatures (`decisionTemperaturesC`), so it is enough to know on
 * which side of each the limit lies. Ettringite is taken as stable below the limit and not above it (one crossing, as
 * the root finding assumes), so the saturation index of ettringite in the paste without it decides each side: ≥ 0 at
 * t means the limit lies above t. The index at the curing and service temperatures comes from their states; the other
 * decision temperatures take one equilibrium each (`siWithoutAt`). The bracket is bounded by decision temperatures, or by
 * the service temperature below and the range's end above, and none lies inside it.
 *
 * Undefined (so that the caller finds the limit by root finding) where this cannot decide soundly: no decision
 * temperature, one outside the range, an equilibrium that fails, a non-monotonic index, or ettringite unstable at every decision
 * temperature without being stable at a lower service temperature (the limit could then lie below, or ettringite be
 * absent throughout: a different answer for the flag).
 */
export function decidedStabilityLimit(
  decisionTemperaturesC: readonly number[],
  range: { fromC: number; toC: number },
  atService: TemperatureState,
  atCuring: TemperatureState | null,
  siWithoutAt: (temperatureC: number) => number | undefined,
): StabilityLimit | undefined {
  const points = [...new Set(decisionTemperaturesC)].sort((a, b) => a - b);
  if (points.length === 0 || points.some((t) => !(t >= range.fromC && t <= range.toC))) return undefined;
  const known = new Map<number, boolean>([[atService.temperatureC, ettringiteStableIn(atService)]]);
  if (atCuring) known.set(atCuring.temperatureC, ettringiteStableIn(atCuring));
  const stableAt: boolean[] = [];
  for (const t of points) {
    let stable = known.get(t);
    if (stable === undefined) {
      const si = siWithoutAt(t);
      if (si === undefined || Number.isNaN(si)) return undefined;
      stable = si >= 0;
    }
    stableAt.push(stable);
  }
  // One crossing: stable points first, then unstable ones.
  const firstUnstable = stableAt.indexOf(false);
  if (firstUnstable >= 0 && stableAt.slice(firstUnstable).some(Boolean)) return undefined;
  if (firstUnstable < 0) return { kind: "decided", bracketC: [points[points.length - 1], range.toC] };
  if (firstUnstable > 0) return { kind: "decided", bracketC: [points[firstUnstable - 1], points[firstUnstable]] };
  // Unstable at every decision temperature: below them, only a stable service state bounds the limit.
  const serviceC = atService.temperatureC;
  if (serviceC < points[0] && ettringiteStableIn(atService)) return { kind: "decided", bracketC: [serviceC, points[0]] };
  return undefined;
}

/** Whether ettringite is stable in a state: its index without it ≥ 0, or, where that was not computed, its presence. */
export function ettringiteStableIn(state: Pick<TemperatureState, "ettringiteMol" | "ettringiteSaturationIndexWithoutIt">): boolean {
  return state.ettringiteSaturationIndexWithoutIt === null ? state.ettringiteMol > 0 : state.ettringiteSaturationIndexWithoutIt >= 0;
}

/** The most supersaturated allowed solid of a paste (suppressed phases excluded), or undefined if none exceeds the tolerance. */
export function supersaturatedSolid(paste: HydratedPaste, base: Pick<ScenarioBase, "suppress" | "enable">, extraSuppressed: readonly string[] = []): { phaseId: string; saturationIndex: number } | undefined {
  const suppressed = new Set([...suppressedPhases(paste.temperatureC, { enable: base.enable, suppress: base.suppress }), ...extraSuppressed]);
  let worst: { phaseId: string; saturationIndex: number } | undefined;
  for (const [phaseId, si] of Object.entries(paste.assemblage.saturationIndices)) {
    if (suppressed.has(phaseId) || !(si > SUPERSATURATION_TOLERANCE_LOG10)) continue;
    if (!worst || si > worst.saturationIndex) worst = { phaseId, saturationIndex: si };
  }
  return worst;
}

/**
 * One equilibrium of the base plus additions at a temperature, with extra phases suppressed, warm-started from a
 * neighbouring paste. When that start fails or leaves an allowed solid supersaturated, the next neighbours (at most
 * three in all) and then a cold start are tried; the result with the least supersaturation is kept.
 */
export function pasteAtTemperature(base: ScenarioBase, addedElementsMol: Record<string, number>, extraSuppressed: readonly string[], chain = "temperature"): PasteAt {
  const reacted = { ...base.composition.reactedElementsMol } as Record<string, number>;
  for (const [element, mol] of Object.entries(addedElementsMol)) reacted[element] = (reacted[element] ?? 0) + mol;
  const composition = { ...base.composition, reactedElementsMol: reacted as typeof base.composition.reactedElementsMol };
  const solve = (temperatureC: number, warm?: HydratedPaste) => {
    const warmStart: SerializedState | undefined = warm?.assemblage.state;
    // The base's paste gives only its solver state (see `ScenarioBase.warmFrom`).
    const alkaliBoundFraction = warm && warm !== base.warmFrom ? alkaliBoundFractionOf(warm, reacted) : undefined;
    return hydratePaste(composition, {
      temperatureC,
      binderContentKgPerM3: base.binderContentKgPerM3,
      suppress: [...(base.suppress ?? []), ...extraSuppressed],
      enable: base.enable,
      warmStart,
      alkaliBoundFraction,
      dataset: base.dataset,
    });
  };
  return (temperatureC, warm) => {
    const neighbours = warm === undefined ? [] : Array.isArray(warm) ? warm.slice(0, MAX_WARM_STARTS_PER_SOLVE) : [warm as HydratedPaste];
    // A Monte Carlo sample first tries the reference run's paste at the same temperature (see `WarmStartBook`).
    const booked = bookedPaste(base.book, chain, temperatureC, true);
    const starts: (HydratedPaste | undefined)[] = [...(booked ? [booked] : []), ...neighbours, undefined];
    let best: { value: HydratedPaste; excess: number; attempt: number } | undefined;
    let firstFailure: EquilibriumFailure | undefined;
    for (let attempt = 0; attempt < starts.length; attempt++) {
      const solved = solve(temperatureC, starts[attempt]);
      if (!solved.ok) {
        firstFailure ??= solved.error;
        continue;
      }
      const excess = supersaturatedSolid(solved.value, base, extraSuppressed)?.saturationIndex ?? 0;
      if (!best || excess < best.excess) best = { value: solved.value, excess, attempt };
      if (excess === 0) break;
    }
    if (!best) return { ok: false, error: firstFailure! };
    recordPaste(base.book, chain, temperatureC, best.value);
    return { ok: true, value: best.value, retried: best.attempt > 0 };
  };
}

/**
 * The temperature at which `phaseId` stops being stable, between a sweep temperature where it is present and a
 * neighbouring one where it is absent. The function whose root is sought is the saturation index of the phase in
 * the assemblage equilibrated without it: SI > 0 means the phase would precipitate (so it belongs to the stable
 * assemblage), SI < 0 that it would dissolve. Unlike the amount, which can jump to zero at an invariant point,
 * this index is continuous in temperature, so Brent's method converges on it. Each evaluation is warm-started
 * from the nearest previous one.
 */
/**
 * Where a phase stops being stable along a temperature sweep (points in increasing temperature, `dose` =
 * °C): absent throughout, stable throughout, or the first loss bracketed by the sweep and located by
 * `stabilityLimitTemperatureC` on the assemblage without that phase (a bracket is kept when root finding fails).
 */
export function phaseStabilityLimit(
  points: readonly { dose: number; paste: HydratedPaste }[],
  phaseId: string,
  pasteWithout: PasteAt,
  toleranceC: number,
  maxIterations: number,
): StabilityLimit {
  const isPresent = (paste: HydratedPaste) => phaseMoles(paste, phaseId) > PRESENT_ABOVE_MOL;
  const firstC = points[0].dose;
  const lastC = points[points.length - 1].dose;
  const firstPresent = points.findIndex((p) => isPresent(p.paste));
  if (firstPresent < 0) return { kind: "absent-throughout", fromC: firstC, toC: lastC };
  const lost = points.findIndex((p, i) => i > firstPresent && !isPresent(p.paste));
  if (lost < 0) return { kind: "stable-throughout", upToC: lastC };
  const present = { temperatureC: points[lost - 1].dose, paste: points[lost - 1].paste };
  const absent = { temperatureC: points[lost].dose, paste: points[lost].paste };
  const root = stabilityLimitTemperatureC(pasteWithout, phaseId, present, absent, toleranceC, maxIterations);
  return root.ok
    ? { kind: "found", temperatureC: root.value.temperatureC, iterations: root.value.iterations, bracketC: [present.temperatureC, absent.temperatureC] }
    : { kind: "bracketed", bracketC: [present.temperatureC, absent.temperatureC], failure: `${root.error.code} at ${root.error.temperatureC} °C` };
}

/**
 * d SI / d T (per °C) of a phase near a temperature, from the two pastes of a book's chain nearest to it (the reference
 * run's evaluations without the phase); undefined when the chain has fewer than two usable points.
 */
export function bookedSlopePerC(book: WarmStartBook | undefined, chain: string, phaseId: string, nearC: number): number | undefined {
  const entries = (book?.chains.get(chain) ?? [])
    .map((e) => ({ t: e.point, si: e.paste.assemblage.saturationIndices[phaseId] }))
    .filter((e) => Number.isFinite(e.si))
    .sort((a, b) => Math.abs(a.t - nearC) - Math.abs(b.t - nearC));
  const first = entries[0];
  const second = entries.find((e) => e.t !== first?.t);
  return first && second ? (second.si - first.si) / (second.t - first.t) : undefined;
}

/** Name of a stability limit in a `WarmStartBook`'s figures. */
export const stabilityFigure = (chain: string, phaseId: string) => `${chain}:${phaseId}:stability-limit-C`;

/** The point a stability limit gives to root finding from it: the limit itself, or the end of the range it names. */
export function stabilityHintC(limit: StabilityLimit): number {
  switch (limit.kind) {
    case "found":
      return limit.temperatureC;
    case "stable-throughout":
      return limit.upToC;
    case "absent-throughout":
      return limit.fromC;
    case "bracketed":
    case "decided":
      return (limit.bracketC[0] + limit.bracketC[1]) / 2;
  }
}

/** Steps away from the hint, °C: 1, 2, 4, … (a cap so nothing hangs; 2^12 °C spans any range of the data set). */
const FIRST_STEP_C = 1;
const MAX_STEPS = 12;

/**
 * The stability limit of a Monte Carlo sample by root finding from the reference run's limit, without a temperature
 * grid. The function is the one of `stabilityLimitTemperatureC`: f(T) = saturation index of the phase in the assemblage
 * equilibrated without it (≥ 0: the phase is stable). It is evaluated at the hint, then 1, 2, 4, … °C away from it —
 * upward while the phase is stable, downward while it is not — until the sign changes, and Brent's method locates the
 * root in that bracket to the tolerance of the full path. Reaching the top of the range still stable gives
 * "stable-throughout", the bottom still unstable "absent-throughout" (the phase is taken as stable below its limit, as
 * ettringite and thaumasite are). Each evaluation starts from the nearest one before it.
 */
export function stabilityLimitNear(
  pasteWithout: PasteAt,
  phaseId: string,
  range: { fromC: number; toC: number },
  hintC: number,
  toleranceC: number,
  maxIterations: number,
  /** d SI / d T near the hint (per °C, from the reference run): the first step then goes to just past the predicted root. */
  slopePerC?: number,
): StabilityLimit {
  const evaluated: HydratedPaste[] = [];
  const f = (t: number): { ok: true; value: number } | { ok: false; error: EquilibriumFailure & { temperatureC: number } } => {
    const paste = pasteWithout(t, byDistance(evaluated.map((p) => ({ paste: p })), t));
    if (!paste.ok) return { ok: false, error: { ...paste.error, temperatureC: t } };
    evaluated.push(paste.value);
    return { ok: true, value: paste.value.assemblage.saturationIndices[phaseId] ?? Number.NEGATIVE_INFINITY };
  };
  const failed = (error: { code: string; temperatureC: number }, bracketC: [number, number]): StabilityLimit => ({ kind: "bracketed", bracketC, failure: `${error.code} at ${error.temperatureC} °C` });
  let inner = Math.min(range.toC, Math.max(range.fromC, hintC));
  const first = f(inner);
  if (!first.ok) return failed(first.error, [range.fromC, range.toC]);
  let innerValue = first.value;
  const stableAtHint = innerValue >= 0;
  let step = FIRST_STEP_C;
  // With the reference's slope, the first step goes to just past the linearly predicted root (one tolerance beyond it).
  const predictedStepC = slopePerC !== undefined && slopePerC < 0 && Number.isFinite(innerValue) ? Math.abs(innerValue / slopePerC) + toleranceC : undefined;
  for (let i = 0; i < MAX_STEPS; i++) {
    if (i === 0 && predictedStepC !== undefined) step = Math.min(predictedStepC, FIRST_STEP_C * 2 ** (MAX_STEPS - 1));
    else if (i === 1 && predictedStepC !== undefined) step = Math.max(FIRST_STEP_C, 2 * predictedStepC);
    const t = stableAtHint ? Math.min(range.toC, inner + step) : Math.max(range.fromC, inner - step);
    if (t === inner) return stableAtHint ? { kind: "stable-throughout", upToC: range.toC } : { kind: "absent-throughout", fromC: range.fromC, toC: range.toC };
    const next = f(t);
    if (!next.ok) return failed(next.error, stableAtHint ? [inner, t] : [t, inner]);
    if (next.value >= 0 !== stableAtHint) {
      const present = stableAtHint ? { t: inner, v: innerValue } : { t, v: next.value };
      const absent = stableAtHint ? { t, v: next.value } : { t: inner, v: innerValue };
      const bracketC: [number, number] = [present.t, absent.t];
      const root = brentRoot(f, { a: present.t, b: absent.t, fa: Math.max(present.v, 0), fb: Math.min(absent.v, 0) }, toleranceC, maxIterations);
      if (!root.ok) return "temperatureC" in root.error ? failed(root.error, bracketC) : { kind: "bracketed", bracketC, failure: "no sign change" };
      return { kind: "found", temperatureC: root.value.x, iterations: root.value.iterations, bracketC };
    }
    inner = t;
    innerValue = next.value;
    if (!(i === 0 && predictedStepC !== undefined)) step *= 2;
  }
  return { kind: "bracketed", bracketC: [range.fromC, range.toC], failure: "no sign change within the step cap" };
}

export function stabilityLimitTemperatureC(
  pasteWithout: PasteAt,
  phaseId: string,
  present: { temperatureC: number; paste: HydratedPaste },
  absent: { temperatureC: number; paste: HydratedPaste },
  toleranceC: number,
  maxIterations: number,
): { ok: true; value: { temperatureC: number; iterations: number } } | { ok: false; error: EquilibriumFailure & { temperatureC: number } } {
  const evaluated: HydratedPaste[] = [present.paste, absent.paste];
  // Neighbours by distance in temperature: the nearest first, the others as fall-back warm starts.
  const nearest = (t: number): HydratedPaste[] => [...evaluated].sort((x, y) => Math.abs(x.temperatureC - t) - Math.abs(y.temperatureC - t));
  const f = (t: number): { ok: true; value: number } | { ok: false; error: EquilibriumFailure & { temperatureC: number } } => {
    const paste = pasteWithout(t, nearest(t));
    if (!paste.ok) return { ok: false, error: { ...paste.error, temperatureC: t } };
    evaluated.push(paste.value);
    return { ok: true, value: paste.value.assemblage.saturationIndices[phaseId] ?? Number.NEGATIVE_INFINITY };
  };
  const fa = f(present.temperatureC);
  if (!fa.ok) return fa;
  const fb = f(absent.temperatureC);
  if (!fb.ok) return fb;
  // Present at a: SI without it ≥ 0 there; absent at b: SI ≤ 0. Clamp round-off so the bracket holds.
  const root = brentRoot(f, { a: present.temperatureC, b: absent.temperatureC, fa: Math.max(fa.value, 0), fb: Math.min(fb.value, 0) }, toleranceC, maxIterations);
  if (!root.ok) {
    const error = root.error;
    if ("code" in error && error.code === "no_sign_change")
      return { ok: false, error: { code: "no_convergence", iterations: 0, residual: Math.abs(fa.value), activePhases: [], message: `no sign change of the ${phaseId} saturation index`, temperatureC: present.temperatureC } };
    return { ok: false, error: error as EquilibriumFailure & { temperatureC: number } };
  }
  return { ok: true, value: { temperatureC: root.value.x, iterations: root.value.iterations } };
}

/** Sulfate per host phase (and the pore solution), mol SO3 per 100 g binder. */
export function sulfateDistribution(paste: HydratedPaste, dataset: Dataset, binderContentKgPerM3: number): SulfateDistribution {
  const sulfurOf = new Map(dataset.species.map((s) => [s.id, s.elements.S ?? 0]));
  const byHost: Record<string, number> = {};
  for (const phase of paste.assemblage.phases) {
    const members = phase.members ?? [{ id: phase.id, moles: phase.moles }];
    const mol = members.reduce((sum, m) => sum + (sulfurOf.get(m.id) ?? 0) * m.moles, 0);
    if (mol > 0) byHost[phase.id] = mol;
  }
  const solution = paste.assemblage.solution;
  if (solution && (solution.elementMolality.S ?? 0) > 0) byHost["pore-solution"] = solution.elementMolality.S * solution.waterKg;
  const total = Object.values(byHost).reduce((a, b) => a + b, 0);
  const inAft = AFT_PHASE_IDS.reduce((sum, id) => sum + (byHost[id] ?? 0), 0);
  const outside = total - inAft;
  return {
    totalMolSO3Per100gBinder: total,
    inAftMolSO3Per100gBinder: inAft,
    outsideAftMolSO3Per100gBinder: outside,
    // mol per 100 g binder × (B kg/m³ × 10 per 100 g) = mol/m³
    outsideAftMolSO3PerM3: outside * binderContentKgPerM3 * 10,
    byHostMolSO3Per100gBinder: byHost,
  };
}

/** The state at a temperature; `without` null: the index without ettringite is not computed (see `TemperatureState`). */
function temperatureState(paste: HydratedPaste, without: HydratedPaste | null, dataset: Dataset, binderContentKgPerM3: number): TemperatureState {
  const si = without ? (without.assemblage.saturationIndices.ettringite ?? Number.NEGATIVE_INFINITY) : null;
  return {
    temperatureC: paste.temperatureC,
    ettringiteMol: phaseMoles(paste, "ettringite"),
    ettringiteVolumeCm3: paste.volumes.ettringite ?? 0,
    ettringiteSaturationIndexWithoutIt: si,
    ettringiteFormationGibbsKJPerMol: si === null ? null : formationGibbsKJPerMol(si, paste.temperatureC),
    sulfate: sulfateDistribution(paste, dataset, binderContentKgPerM3),
    pH: paste.poreSolution?.pH ?? null,
    phasesMol: Object.fromEntries(paste.assemblage.phases.map((p) => [p.id, p.moles])),
  };
}

function checkTemperature(field: string, temperatureC: number): TemperatureHistoryError | undefined {
  if (Number.isFinite(temperatureC) && temperatureC >= DATA_SET_MIN_C && temperatureC <= DATA_SET_MAX_C) return undefined;
  return {
    code: "temperature_out_of_range",
    field,
    temperatureC,
    minimumC: DATA_SET_MIN_C,
    maximumC: DATA_SET_MAX_C,
    message: `${field} must be between ${DATA_SET_MIN_C} and ${DATA_SET_MAX_C} °C, the range of the thermodynamic data set (got ${temperatureC})`,
  };
}

/**
 * The temperature-history scenario: a sweep of the assemblage against temperature, the assemblages at the
 * service and maximum curing temperatures, the ettringite stability temperature of this mix (Brent's method on
 * the engine), and the sulfate held outside ettringite at the curing temperature that could form ettringite later.
 */
export function temperatureHistory(
  base: ScenarioBase,
  exposure: ExposureInput,
  options: TemperatureHistoryOptions,
): { ok: true; value: TemperatureHistoryResult } | { ok: false; error: TemperatureHistoryError } {
  const service = serviceTemperatureForDef(base, exposure);
  const serviceC = service.temperatureC;
  const curingWanted = options.curingMaxTemperatureC;
  const clampCuring = options.curingAboveDataSet === "evaluate-at-limit" && curingWanted !== undefined && curingWanted > DATA_SET_MAX_C;
  const curingC = clampCuring ? DATA_SET_MAX_C : curingWanted;
  const fromC = options.sweepFromC ?? DEFAULT_SWEEP_FROM_C;
  const toC = options.sweepToC ?? DEFAULT_SWEEP_TO_C;
  for (const [field, t] of [["exposure.serviceTemperatureC", serviceC], ["curing.maxTemperatureC", curingC], ["options.sweepFromC", fromC], ["options.sweepToC", toC]] as const) {
    if (t === undefined) continue;
    const bad = checkTemperature(field, t);
    if (bad) return { ok: false, error: bad };
  }
  if (!(toC > fromC)) return { ok: false, error: { code: "temperature_out_of_range", field: "options.sweepToC", temperatureC: toC, minimumC: fromC, maximumC: DATA_SET_MAX_C, message: `options.sweepToC must exceed options.sweepFromC (${fromC} °C)` } };
  let dataset = base.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return { ok: false, error: { code: "invalid_input", field: "dataset", message: loaded.error.message, dose: fromC } };
    dataset = loaded.value;
  }
  const withData: ScenarioBase = { ...base, dataset };
  const grid = linearDoses(toC - fromC, options.points).map((d) => fromC + d);
  const reduced = options.reduced === true && base.book?.mode === "read";
  const temperatures = [...new Set([...(reduced ? [] : grid), serviceC, ...(curingC === undefined ? [] : [curingC])])].sort((a, b) => a - b);
  // The chain of warm-started equilibria, each checked: a warm start that leaves an allowed solid supersaturated
  // is re-solved cold (see `pasteAtTemperature`), so a non-equilibrium state is never carried to the next point.
  // (The generic `sweepPaste` warm-starts without this check; along this temperature path it carried such a state
  // from the monosulfate hydrate transition near 28 °C to 95 °C.)
  const plain = pasteAtTemperature(withData, {}, [], "temperature");
  const retriedAtC: number[] = [];
  const remainingSupersaturation: { temperatureC: number; phaseId: string; saturationIndex: number }[] = [];
  const points: { dose: number; paste: HydratedPaste }[] = [];
  const failedAtC: { temperatureC: number; code: string }[] = [];
  const essential = new Set([serviceC, ...(curingC === undefined ? [] : [curingC])]);
  const chainStart = withData.warmFrom ? [withData.warmFrom] : [];
  for (const t of temperatures) {
    const solved = plain(t, points.length > 0 ? recent(points) : chainStart);
    if (!solved.ok) {
      // A chart point the engine cannot solve (warm and cold) is left out and recorded; the service and curing states are required.
      if (essential.has(t)) return { ok: false, error: { ...solved.error, dose: t } };
      failedAtC.push({ temperatureC: t, code: solved.error.code });
      continue;
    }
    if (solved.retried) retriedAtC.push(t);
    const still = supersaturatedSolid(solved.value, withData);
    if (still) remainingSupersaturation.push({ temperatureC: t, ...still });
    points.push({ dose: t, paste: solved.value });
  }
  const dissolvedSulfate = (paste: HydratedPaste) => (paste.assemblage.solution ? (paste.assemblage.solution.elementMolality.S ?? 0) * paste.assemblage.solution.waterKg : 0);
  const chartPoints: TemperaturePoint[] = points.map(({ dose, paste }) => ({
    ...sweepPoint(dose, paste),
    ettringiteMol: phaseMoles(paste, "ettringite"),
    ettringiteSaturationIndex: paste.assemblage.saturationIndices.ettringite ?? Number.NEGATIVE_INFINITY,
    dissolvedSulfateMolSO3: dissolvedSulfate(paste),
  }));

  const withoutEttringite = pasteAtTemperature(withData, {}, ["ettringite"], "temperature-without-ettringite");
  const tolerance = options.toleranceC ?? DEFAULT_TOLERANCE_C;
  const maxIterations = options.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const figure = stabilityFigure("temperature", "ettringite");
  const hintC = base.book?.figures.get(figure);
  const rootNearHint = () =>
    stabilityLimitNear(withoutEttringite, "ettringite", { fromC, toC }, hintC!, tolerance, maxIterations, bookedSlopePerC(base.book, "temperature-without-ettringite", "ettringite", hintC!));
  // A sample with decision temperatures settles its limit after the service and curing states, which it reuses.
  const byDecision = reduced && hintC !== undefined && options.decisionTemperaturesC !== undefined;
  let stabilityLimit: StabilityLimit | undefined = byDecision
    ? undefined
    : reduced && hintC !== undefined
      ? rootNearHint()
      : phaseStabilityLimit(points, "ettringite", withoutEttringite, tolerance, maxIterations);
  if (base.book?.mode === "record" && stabilityLimit) base.book.figures.set(figure, stabilityHintC(stabilityLimit));

  const at = (t: number) => points.find((p) => p.dose === t)!.paste;
  const stateAt = (t: number): { ok: true; value: TemperatureState } | { ok: false; error: TemperatureHistoryError } => {
    const paste = at(t);
    // A sample deciding its flag needs only the sign of the index without ettringite: positive where ettringite is present.
    if (byDecision && phaseMoles(paste, "ettringite") > 0) return { ok: true, value: temperatureState(paste, null, dataset, base.binderContentKgPerM3) };
    const without = withoutEttringite(t, byDistance(points, t));
    if (!without.ok) return { ok: false, error: { ...without.error, dose: t } };
    return { ok: true, value: temperatureState(paste, without.value, dataset, base.binderContentKgPerM3) };
  };
  const atService = stateAt(serviceC);
  if (!atService.ok) return atService;
  let atCuring: TemperatureState | null = null;
  if (curingC !== undefined) {
    const s = stateAt(curingC);
    if (!s.ok) return s;
    atCuring = s.value;
  }
  if (!stabilityLimit) {
    const siWithoutAt = (t: number) => {
      const without = withoutEttringite(t, byDistance(points, t));
      return without.ok ? (without.value.assemblage.saturationIndices.ettringite ?? Number.NEGATIVE_INFINITY) : undefined;
    };
    stabilityLimit = decidedStabilityLimit(options.decisionTemperaturesC ?? [], { fromC, toC }, atService.value, atCuring, siWithoutAt) ?? rootNearHint();
  }
  // mol per 100 g binder × (B kg/m³ × 10 per 100 g) = mol/m³
  const molPerM3 = (per100g: number) => per100g * base.binderContentKgPerM3 * 10;
  const sulfateGain = atCuring ? Math.max(0, atService.value.sulfate.inAftMolSO3Per100gBinder - atCuring.sulfate.inAftMolSO3Per100gBinder) : null;
  const volumeGain = atCuring ? Math.max(0, atService.value.ettringiteVolumeCm3 - atCuring.ettringiteVolumeCm3) : null;
  return {
    ok: true,
    value: {
      sweep: { id: "temperature", title: "Assemblage against temperature", doseLabel: "Temperature", doseUnit: "°C", points: chartPoints },
      summary: {
        serviceTemperatureC: serviceC,
        serviceTemperatureClampedFromC: service.clampedFromC,
        curingTemperatureC: curingC ?? null,
        curingTemperatureClampedFromC: clampCuring ? curingWanted! : null,
        ettringiteStabilityTemperatureC: stabilityLimit.kind === "found" ? stabilityLimit.temperatureC : null,
        stabilityLimit,
        atService: atService.value,
        atCuring,
        sulfateToEttringiteOnCoolingMolSO3Per100gBinder: sulfateGain,
        sulfateToEttringiteOnCoolingMolSO3PerM3: sulfateGain === null ? null : molPerM3(sulfateGain),
        ettringiteVolumeGainOnCoolingCm3Per100gBinder: volumeGain,
        // cm³ per 100 g binder × B kg/m³ × 10 (100 g units per kg) / 1000 (cm³ per L) = L/m³
        ettringiteVolumeGainOnCoolingLitresPerM3: volumeGain === null ? null : (volumeGain * base.binderContentKgPerM3 * 10) / 1000,
        equilibriumChecks: { retriedAtC, remainingSupersaturation, failedAtC },
      },
    },
  };
}
