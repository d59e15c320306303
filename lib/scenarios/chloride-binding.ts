import { atomicWeightGPerMol } from "../chem/atomic-weights";
import type { HydratedPaste } from "../cement/hydrate-paste";
import { per100gToPerM3 } from "../cement/volumes";
import { loadDataset, type Dataset } from "../data/load-dataset";
import { suppressedPhases } from "../data/kinetic-constraints";
import { GAS_CONSTANT_J_PER_MOL_K } from "../equilibrium/problem";
import type { ExposureInput } from "../schema/exposure-input";
import { linearDoses, sweepPaste, sweepPoint, type ScenarioBase, type ScenarioSweep, type SweepFailure, type SweepPoint } from "./sweep";

/**
 * Chloride binding: the hydrated paste takes up increasing amounts of chloride; the equilibrium assemblage tells
 * how much is bound chemically in Friedel's salt (Ca4Al2Cl2(OH)12·4H2O), Kuzel's salt and any other Cl-bearing
 * solid of the data set, and how much stays free in the pore solution. The result is the chemical binding
 * isotherm (bound against free chloride) and the dose at which the AFm phases' capacity to bind chloride is used up,
 * beyond which added chloride stays free (Birnin-Yauri & Glasser 1998, Cem. Concr. Res. 28, 1713; Suryavanshi,
 * Scantlebury & Lyon 1996, Cem. Concr. Res. 26, 717; both from memory).
 *
 * Modelling choices (documented, not hidden):
 * - Chloride enters as salt, without water: ions diffuse into a saturated paste while its pore water stays. The salt
 *   is NaCl; when the exposure says sea water it is NaCl + MgCl2 in the Mg:Cl ratio of standard sea water, the other
 *   sea-water ions (SO4, Ca, K) left out so that this scenario isolates chloride (sulfate has its own scenario).
 * - Only chemical binding in solids is modelled: chloride sorbed on C-S-H (physical binding, a large part of the
 *   measured binding at low free chloride; Tang & Nilsson 1993, Cem. Concr. Res. 23, 247, from memory) is not in the
 *   data set, so bound chloride is a lower estimate and free chloride an upper one.
 * - Thaumasite is suppressed here: it is the thaumasite scenario's subject, forms slowly (mostly below about 15 °C;
 *   Crammond 2003, Cem. Concr. Compos. 25, 809, from memory), and with it the engine returned chloride assemblages
 *   with calcite left supersaturated (SI ≈ 0.6), i.e. not at equilibrium.
 * - Each point is a paste volume that has taken up that much chloride; transport from the surface is not modelled.
 *   The exposure point (pore solution at the exposure's chloride concentration) is the long-term state once the
 *   chloride has reached the depth considered at its surface concentration: an upper bound for the rebar depth.
 */

/** Molar mass of chlorine, g/mol (IUPAC 2021 standard atomic weight, via `atomicWeightGPerMol`). */
const CHLORIDE_G_PER_MOL = atomicWeightGPerMol("Cl");

/**
 * Chloride of standard sea water, mg/L (≈ 19.35 g/kg at salinity 35, i.e. 0.546 mol/kg of solution; Millero, Feistel,
 * Wright & McDougall 2008, Deep-Sea Res. I 55, 50, reference composition; recalled from memory, rounded to 19 400 mg/L
 * with the solution density 1.025 kg/L).
 */
export const SEAWATER_CHLORIDE_MG_PER_L = 19_400;
/** Mg/Cl molar ratio of standard sea water: 0.05282 / 0.54586 mol/kg (Millero et al. 2008; from memory). */
export const SEAWATER_MAGNESIUM_PER_CHLORIDE_MOL_PER_MOL = 0.0968;

/** Chloride added per 100 g binder, at most, % of binder mass (sanity bound of the option, this module's choice). */
const MAXIMUM_DOSE_LIMIT_MASS_PERCENT = 10;
/** Sweep points allowed (this module's bound: at least 2 for an isotherm, at most 200 to keep it fast). */
const POINTS_MIN = 2;
const POINTS_MAX = 200;
/**
 * Default sweep maximum: this multiple of the chloride that would turn every reacted Al into Friedel's salt
 * (Cl:Al = 1), so the plateau beyond the AFm capacity shows (this module's choice).
 */
const DOSE_RANGE_MULTIPLE_OF_ALUMINIUM = 1.0;
/** Below this many mol per 100 g binder a phase counts as absent (numerical zero of the engine's amounts; this module's choice). */
const ABSENT_MOL = 1e-9;
/** Saturation index above which an absent solid counts as supersaturated, i.e. the point is not an equilibrium (Ω > 1.0023; this module's choice). */
const SUPERSATURATION_TOLERANCE = 1e-3;
/** The data-set family whose chloride-free members count as AFm that can bind chloride (lib/data/cement/afm.json). */
const AFM_FAMILY = "cement-afm";

export type ChlorideSalt = "NaCl" | "NaCl+MgCl2 (sea-water ratio)";

export type ChloridePoint = SweepPoint & {
  /** Chloride in the paste (binder's own + added), % of binder mass (g per 100 g binder). */
  totalChlorideMassPercent: number;
  /** Chloride in solids (Friedel's salt, Kuzel's salt, …), % of binder mass. */
  boundChlorideMassPercent: number;
  /** Chloride dissolved in the pore solution, % of binder mass. */
  freeChlorideMassPercent: number;
  /** Free chloride concentration of the pore solution, mol/kg water. */
  freeChlorideMolPerKgWater: number;
  /** Bound chloride, mg per g binder (the usual axis of binding isotherms). */
  boundChlorideMgPerGBinder: number;
  /** Total, bound and free chloride per m³ of concrete, kg/m³ (% of binder × binder content / 100). */
  totalChlorideKgPerM3: number;
  boundChlorideKgPerM3: number;
  freeChlorideKgPerM3: number;
  friedelSaltMol: number;
  kuzelSaltMol: number;
  /** AFm phases without chloride (monosulfate, hemi-/monocarbonate, hydroxy-AFm, …), mol per 100 g binder. */
  chlorideFreeAfmMol: number;
  /** Largest saturation index among solids that are absent and not suppressed (≈ 0 at a true equilibrium), and that solid. */
  maxSaturationIndexOfAbsentSolids: number;
  mostSupersaturatedAbsentSolid: string | null;
};

export type ChlorideExposurePoint = {
  /** Free chloride of the exposure, mol/kg water (mg/L ÷ 1000 ÷ M_Cl, dilute-solution approximation; common practice). */
  freeChlorideMolPerKgWater: number;
  /** False when the sweep ends before the pore solution reaches the exposure's concentration (figures are then at the last dose). */
  reachedInSweep: boolean;
  totalChlorideMassPercent: number;
  boundChlorideMassPercent: number;
  freeChlorideMassPercent: number;
  totalChlorideKgPerM3: number;
  boundChlorideKgPerM3: number;
  freeChlorideKgPerM3: number;
  /** True when no chloride-free AFm is left at the exposure point: the chemical binding capacity is used up. */
  afmCapacityExhausted: boolean;
  /** The chloride-free AFm converting at the exposure point (most abundant there; else the unexposed paste's precursor). */
  precursorAfm: string | null;
  /** Saturation indices at the exposure point (log10 Ω per formula unit), at the sweep point nearest to it. */
  friedelSaltSaturationIndex: number;
  precursorSaturationIndex: number;
  /** ΔrG of precursor AFm + chloride → Friedel's salt, kJ per mol of Friedel's salt, at the exposure point (≤ 0 where it proceeds). */
  friedelFormationGibbsKJPerMol: number;
};

export type ChlorideBindingScenario = {
  salt: ChlorideSalt;
  sweep: ScenarioSweep<ChloridePoint>;
  /** Bound against free chloride, for the isotherm chart (same points as the sweep). */
  isotherm: { freeChlorideMolPerKgWater: number; boundChlorideMgPerGBinder: number; totalChlorideMassPercent: number }[];
  summary: {
    salt: ChlorideSalt;
    temperatureC: number;
    /** Chloride of the binder itself, % of binder mass. */
    binderChlorideMassPercent: number;
    maximumAddedChlorideMassPercent: number;
    /** The chloride-free AFm of the unexposed paste with the most moles: what Friedel's salt forms from. */
    precursorAfm: string | null;
    /** Stoichiometric AFm capacity: Cl per (Al+Fe) of Friedel's salt × (Al+Fe) in the unexposed paste's AFm, % of binder mass. */
    afmStoichiometricCapacityMassPercent: number;
    /** The largest bound chloride reached in the sweep, % of binder mass and kg/m³. */
    boundChlorideMaxMassPercent: number;
    boundChlorideMaxKgPerM3: number;
    /** Total chloride at which the last chloride-free AFm converts (interpolated), % of binder mass; null: not within the sweep. */
    capacityExhaustedAtTotalChlorideMassPercent: number | null;
    capacityExhaustedAtTotalChlorideKgPerM3: number | null;
    /** Free chloride of the pore solution at that point, mol/kg water. */
    capacityExhaustedAtFreeChlorideMolPerKgWater: number | null;
    /** Δfree/Δtotal before and after exhaustion (0: all added chloride bound, 1: all stays free); null where undefined. */
    freeFractionOfIncrementBeforeExhaustion: number | null;
    freeFractionOfIncrementAfterExhaustion: number | null;
    /** Friedel's salt saturation index in the unexposed paste and ΔrG of its formation from the precursor there, kJ/mol. */
    friedelSaltSaturationIndexUnexposed: number;
    friedelFormationGibbsKJPerMolUnexposed: number | null;
    /** The exposure point; null when the exposure gives no chloride concentration (no value, not sea water). */
    exposure: ChlorideExposurePoint | null;
    /** Points re-solved from a cold start because the warm-started result was not an equilibrium. */
    coldResolvedPoints: number;
    /** Points whose pore solution exceeds the activity model's range or that are not at a true equilibrium. */
    warnings: string[];
  };
};

export type ChlorideScenarioError = SweepFailure | { code: "invalid_input"; field: string; message: string };

/** The exposure's free chloride, mg/L: the entered value, else sea water's when the exposure is sea water, else null. */
export function exposureChlorideMgPerL(exposure: ExposureInput): number | null {
  if (exposure.chlorideMgPerL !== undefined && exposure.chlorideMgPerL > 0) return exposure.chlorideMgPerL;
  if (exposure.seawater !== undefined && exposure.seawater !== false) return SEAWATER_CHLORIDE_MG_PER_L;
  return null;
}

/** ΔrG = RT ln10 · (SI_precursor·(Al+Fe)_FS/(Al+Fe)_precursor − SI_FS), kJ per mol Friedel's salt (per formula unit, 2 Al). */
function conversionGibbsKJPerMol(temperatureC: number, siPrecursor: number, siFriedel: number, trivalentRatio: number): number {
  return (GAS_CONSTANT_J_PER_MOL_K * (temperatureC + 273.15) * Math.LN10 * (siPrecursor * trivalentRatio - siFriedel)) / 1000;
}

const interpolate = (x0: number, x1: number, y0: number, y1: number, x: number) => (x1 === x0 ? y0 : y0 + ((y1 - y0) * (x - x0)) / (x1 - x0));

/**
 * The chloride-binding scenario (see the module comment). Dose: chloride added, % of binder mass (g Cl per 100 g
 * binder), from 0 to `maximumDoseMassPercent` (default: Cl:Al = 1 on the reacted Al). Temperature: the base's.
 */
export function chlorideBinding(
  base: ScenarioBase,
  exposure: ExposureInput,
  options: { points: number; maximumDoseMassPercent?: number },
): { ok: true; value: ChlorideBindingScenario } | { ok: false; error: ChlorideScenarioError } {
  if (!Number.isInteger(options.points) || options.points < POINTS_MIN || options.points > POINTS_MAX)
    return { ok: false, error: { code: "invalid_input", field: "points", message: `points must be an integer from ${POINTS_MIN} to ${POINTS_MAX}` } };
  const maxOption = options.maximumDoseMassPercent;
  if (maxOption !== undefined && !(maxOption > 0 && maxOption <= MAXIMUM_DOSE_LIMIT_MASS_PERCENT))
    return {
      ok: false,
      error: { code: "invalid_input", field: "maximumDoseMassPercent", message: `maximumDoseMassPercent must be greater than 0 and at most ${MAXIMUM_DOSE_LIMIT_MASS_PERCENT} % of binder mass` },
    };
  let dataset: Dataset | undefined = base.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return { ok: false, error: { code: "invalid_input", field: "dataset", message: loaded.error.message } };
    dataset = loaded.value;
  }
  const elementsOf = new Map(dataset.species.map((s) => [s.id, s.elements]));
  const chlorideSolids = new Set(dataset.species.filter((s) => s.phase === "solid" && (s.elements.Cl ?? 0) > 0).map((s) => s.id));
  const chlorideFreeAfm = new Set(dataset.species.filter((s) => s.phase === "solid" && s.family === AFM_FAMILY && !(s.elements.Cl > 0)).map((s) => s.id));
  const friedel = elementsOf.get("friedel-salt");
  if (!friedel) return { ok: false, error: { code: "invalid_input", field: "dataset", message: "the data set has no friedel-salt entry" } };
  const trivalent = (e: Record<string, number> | undefined) => (e?.Al ?? 0) + (e?.Fe ?? 0);
  const chloridePerTrivalentFriedel = friedel.Cl / trivalent(friedel);

  const salt: ChlorideSalt = exposure.seawater !== undefined && exposure.seawater !== false ? "NaCl+MgCl2 (sea-water ratio)" : "NaCl";
  const magnesiumPerChloride = salt === "NaCl" ? 0 : SEAWATER_MAGNESIUM_PER_CHLORIDE_MOL_PER_MOL;
  const reactedAluminiumMol = base.composition.reactedElementsMol.Al ?? 0;
  const defaultMaximumMassPercent = Math.min(MAXIMUM_DOSE_LIMIT_MASS_PERCENT, Math.max(0.5, DOSE_RANGE_MULTIPLE_OF_ALUMINIUM * reactedAluminiumMol * CHLORIDE_G_PER_MOL));
  const maximumDoseMassPercent = maxOption ?? defaultMaximumMassPercent;
  const doses = linearDoses(maximumDoseMassPercent, options.points);
  const suppressedHere = [...(base.suppress ?? []).filter((id) => id !== "thaumasite"), "thaumasite"];
  const sweepBase: ScenarioBase = { ...base, dataset, suppress: suppressedHere };
  const addedAt = (doseMassPercent: number) => {
    const chlorideMol = doseMassPercent / CHLORIDE_G_PER_MOL;
    const magnesiumMol = magnesiumPerChloride * chlorideMol;
    return { addedElementsMol: { Cl: chlorideMol, Mg: magnesiumMol, Na: chlorideMol - 2 * magnesiumMol } };
  };
  const swept = sweepPaste(sweepBase, doses, addedAt, "chloride");
  if (!swept.ok) return swept;

  const suppressedSet = new Set([...suppressedPhases(base.temperatureC, { enable: base.enable, suppress: suppressedHere })]);
  const binderChlorideMassPercent = (base.composition.reactedElementsMol.Cl ?? 0) * CHLORIDE_G_PER_MOL;
  const pointOf = (dose: number, paste: HydratedPaste) => chloridePoint(dose, paste, binderChlorideMassPercent, base.binderContentKgPerM3, chlorideSolids, chlorideFreeAfm, elementsOf, suppressedSet);
  const warnings: string[] = [];
  const solved = swept.value.map(({ dose, paste }) => ({ dose, paste, point: pointOf(dose, paste) }));
  // A warm-started point that leaves an absent solid supersaturated is not an equilibrium (seen with the engine as of
  // this writing): solve that dose again from a cold start with the same generic sweep, and keep the better result.
  let coldResolvedPoints = 0;
  for (const entry of solved) {
    if (!(entry.point.maxSaturationIndexOfAbsentSolids > SUPERSATURATION_TOLERANCE)) continue;
    const cold = sweepPaste({ ...sweepBase, warmFrom: undefined, book: undefined }, [entry.dose], addedAt);
    if (!cold.ok) continue;
    const coldPoint = pointOf(entry.dose, cold.value[0].paste);
    if (coldPoint.maxSaturationIndexOfAbsentSolids < entry.point.maxSaturationIndexOfAbsentSolids) {
      [entry.paste, entry.point] = [cold.value[0].paste, coldPoint];
      coldResolvedPoints += 1;
    }
  }
  for (const { dose, paste, point } of solved) {
    if (paste.warnings.some((w) => w.code === "ionic_strength_beyond_activity_model"))
      warnings.push(`at ${dose.toFixed(3)} % added chloride the pore solution is beyond the activity model's range (ionic strength above 1 mol/kg)`);
    if (point.maxSaturationIndexOfAbsentSolids > SUPERSATURATION_TOLERANCE)
      warnings.push(`at ${dose.toFixed(3)} % added chloride ${point.mostSupersaturatedAbsentSolid} is absent but supersaturated (SI ${point.maxSaturationIndexOfAbsentSolids.toFixed(3)}): not a converged equilibrium`);
  }
  const points = solved.map((e) => e.point);
  const pastes = solved.map((e) => e.paste);

  const unexposed = pastes[0];
  let precursorAfm: string | null = null;
  let precursorMol = 0;
  let afmTrivalentMol = 0;
  for (const phase of unexposed.assemblage.phases) {
    if (!chlorideFreeAfm.has(phase.id)) continue;
    afmTrivalentMol += phase.moles * trivalent(elementsOf.get(phase.id));
    if (phase.moles > precursorMol) [precursorAfm, precursorMol] = [phase.id, phase.moles];
  }
  const trivalentRatio = precursorAfm ? trivalent(friedel) / trivalent(elementsOf.get(precursorAfm)) : 1;
  const siAt = (paste: HydratedPaste, id: string | null) => (id ? (paste.assemblage.saturationIndices[id] ?? Number.NEGATIVE_INFINITY) : Number.NEGATIVE_INFINITY);
  const T = base.temperatureC;

  // Exhaustion: the chloride-free AFm falls to zero; interpolate its decline between the last two points that still hold it.
  let exhaustedIndex = -1;
  for (let i = 1; i < points.length; i++) if (points[i].chlorideFreeAfmMol <= ABSENT_MOL && points[i].friedelSaltMol + points[i].kuzelSaltMol > ABSENT_MOL && points[i - 1].chlorideFreeAfmMol > ABSENT_MOL) { exhaustedIndex = i; break; }
  let exhaustedTotal: number | null = null;
  let exhaustedFree: number | null = null;
  if (exhaustedIndex > 0) {
    const a = points[exhaustedIndex - 1];
    const before = exhaustedIndex >= 2 ? points[exhaustedIndex - 2] : a;
    const slope = before !== a ? (a.chlorideFreeAfmMol - before.chlorideFreeAfmMol) / (a.totalChlorideMassPercent - before.totalChlorideMassPercent) : Number.NaN;
    const b = points[exhaustedIndex];
    // Where the AFm declines, extrapolate its zero; else fall back to the first point without it.
    exhaustedTotal = slope < 0 ? Math.min(b.totalChlorideMassPercent, a.totalChlorideMassPercent - a.chlorideFreeAfmMol / slope) : b.totalChlorideMassPercent;
    exhaustedFree = interpolate(a.totalChlorideMassPercent, b.totalChlorideMassPercent, a.freeChlorideMolPerKgWater, b.freeChlorideMolPerKgWater, exhaustedTotal);
  }
  const freeFraction = (from: ChloridePoint, to: ChloridePoint) =>
    to.totalChlorideMassPercent > from.totalChlorideMassPercent ? (to.freeChlorideMassPercent - from.freeChlorideMassPercent) / (to.totalChlorideMassPercent - from.totalChlorideMassPercent) : null;
  const freeFractionBefore = exhaustedIndex >= 2 ? freeFraction(points[0], points[exhaustedIndex - 1]) : null;
  const freeFractionAfter = exhaustedIndex > 0 && exhaustedIndex < points.length - 1 ? freeFraction(points[exhaustedIndex], points[points.length - 1]) : null;

  const exposureMgPerL = exposureChlorideMgPerL(exposure);
  let exposurePoint: ChlorideExposurePoint | null = null;
  if (exposureMgPerL !== null) {
    const target = exposureMgPerL / 1000 / CHLORIDE_G_PER_MOL;
    let i = points.findIndex((p) => p.freeChlorideMolPerKgWater >= target);
    const reachedInSweep = i >= 0;
    if (!reachedInSweep) i = points.length - 1;
    const lower = i > 0 && reachedInSweep ? points[i - 1] : points[i];
    const upper = points[i];
    const at = (key: "totalChlorideMassPercent" | "boundChlorideMassPercent" | "freeChlorideMassPercent") =>
      reachedInSweep ? interpolate(lower.freeChlorideMolPerKgWater, upper.freeChlorideMolPerKgWater, lower[key], upper[key], target) : upper[key];
    const total = at("totalChlorideMassPercent");
    const nearest = pastes[reachedInSweep && i > 0 && target - lower.freeChlorideMolPerKgWater < upper.freeChlorideMolPerKgWater - target ? i - 1 : i];
    // The AFm that converts at the exposure point: the most abundant chloride-free AFm still present there, else the unexposed paste's.
    const remaining = nearest.assemblage.phases.filter((p) => chlorideFreeAfm.has(p.id)).sort((a, b) => b.moles - a.moles)[0]?.id ?? precursorAfm;
    const siFriedel = siAt(nearest, "friedel-salt");
    const siPrecursor = siAt(nearest, remaining);
    const ratioHere = remaining ? trivalent(friedel) / trivalent(elementsOf.get(remaining)) : 1;
    exposurePoint = {
      freeChlorideMolPerKgWater: target,
      reachedInSweep,
      totalChlorideMassPercent: total,
      boundChlorideMassPercent: at("boundChlorideMassPercent"),
      freeChlorideMassPercent: at("freeChlorideMassPercent"),
      totalChlorideKgPerM3: per100gToPerM3(total, base.binderContentKgPerM3),
      boundChlorideKgPerM3: per100gToPerM3(at("boundChlorideMassPercent"), base.binderContentKgPerM3),
      freeChlorideKgPerM3: per100gToPerM3(at("freeChlorideMassPercent"), base.binderContentKgPerM3),
      afmCapacityExhausted: exhaustedTotal !== null ? total >= exhaustedTotal : points[0].chlorideFreeAfmMol <= ABSENT_MOL,
      precursorAfm: remaining,
      friedelSaltSaturationIndex: siFriedel,
      precursorSaturationIndex: siPrecursor,
      friedelFormationGibbsKJPerMol: conversionGibbsKJPerMol(T, Number.isFinite(siPrecursor) ? siPrecursor : 0, siFriedel, ratioHere),
    };
  }

  const boundMax = Math.max(...points.map((p) => p.boundChlorideMassPercent));
  const siFriedelUnexposed = siAt(unexposed, "friedel-salt");
  const sweep: ScenarioSweep<ChloridePoint> = {
    id: "chloride",
    title: `Chloride binding (${salt})`,
    doseLabel: "Chloride added",
    doseUnit: "% of binder mass",
    points,
  };
  return {
    ok: true,
    value: {
      salt,
      sweep,
      isotherm: points.map((p) => ({ freeChlorideMolPerKgWater: p.freeChlorideMolPerKgWater, boundChlorideMgPerGBinder: p.boundChlorideMgPerGBinder, totalChlorideMassPercent: p.totalChlorideMassPercent })),
      summary: {
        salt,
        temperatureC: T,
        binderChlorideMassPercent,
        maximumAddedChlorideMassPercent: maximumDoseMassPercent,
        precursorAfm,
        afmStoichiometricCapacityMassPercent: afmTrivalentMol * chloridePerTrivalentFriedel * CHLORIDE_G_PER_MOL,
        boundChlorideMaxMassPercent: boundMax,
        boundChlorideMaxKgPerM3: per100gToPerM3(boundMax, base.binderContentKgPerM3),
        capacityExhaustedAtTotalChlorideMassPercent: exhaustedTotal,
        capacityExhaustedAtTotalChlorideKgPerM3: exhaustedTotal === null ? null : per100gToPerM3(exhaustedTotal, base.binderContentKgPerM3),
        capacityExhaustedAtFreeChlorideMolPerKgWater: exhaustedFree,
        freeFractionOfIncrementBeforeExhaustion: freeFractionBefore,
        freeFractionOfIncrementAfterExhaustion: freeFractionAfter,
        friedelSaltSaturationIndexUnexposed: siFriedelUnexposed,
        friedelFormationGibbsKJPerMolUnexposed: precursorAfm ? conversionGibbsKJPerMol(T, siAt(unexposed, precursorAfm), siFriedelUnexposed, trivalentRatio) : null,
        exposure: exposurePoint,
        coldResolvedPoints,
        warnings,
      },
    },
  };
}

/** The chloride figures of one hydrated paste. */
function chloridePoint(
  dose: number,
  paste: HydratedPaste,
  binderChlorideMassPercent: number,
  binderContentKgPerM3: number,
  chlorideSolids: ReadonlySet<string>,
  chlorideFreeAfm: ReadonlySet<string>,
  elementsOf: ReadonlyMap<string, Record<string, number>>,
  suppressed: ReadonlySet<string>,
): ChloridePoint {
  let boundMol = 0;
  let afmMol = 0;
  for (const phase of paste.assemblage.phases) {
    for (const member of phase.members ?? [{ id: phase.id, moles: phase.moles }]) {
      if (chlorideSolids.has(member.id)) boundMol += (elementsOf.get(member.id)?.Cl ?? 0) * member.moles;
    }
    if (chlorideFreeAfm.has(phase.id)) afmMol += phase.moles;
  }
  const solution = paste.assemblage.solution;
  const freeMolality = solution?.elementMolality.Cl ?? 0;
  const freeMol = freeMolality * (solution?.waterKg ?? 0);
  const present = new Set(paste.assemblage.phases.map((p) => p.id));
  let maxSi = Number.NEGATIVE_INFINITY;
  let maxSiId: string | null = null;
  for (const [id, si] of Object.entries(paste.assemblage.saturationIndices)) if (!present.has(id) && !suppressed.has(id) && si > maxSi) [maxSi, maxSiId] = [si, id];
  const boundMassPercent = boundMol * CHLORIDE_G_PER_MOL;
  const freeMassPercent = freeMol * CHLORIDE_G_PER_MOL;
  const totalMassPercent = binderChlorideMassPercent + dose;
  return {
    ...sweepPoint(dose, paste),
    totalChlorideMassPercent: totalMassPercent,
    boundChlorideMassPercent: boundMassPercent,
    freeChlorideMassPercent: freeMassPercent,
    freeChlorideMolPerKgWater: freeMolality,
    // g per 100 g binder → mg per g binder: × 1000 mg/g ÷ 100 g = × 10
    boundChlorideMgPerGBinder: boundMassPercent * 10,
    totalChlorideKgPerM3: per100gToPerM3(totalMassPercent, binderContentKgPerM3),
    boundChlorideKgPerM3: per100gToPerM3(boundMassPercent, binderContentKgPerM3),
    freeChlorideKgPerM3: per100gToPerM3(freeMassPercent, binderContentKgPerM3),
    friedelSaltMol: present.has("friedel-salt") ? paste.assemblage.phases.find((p) => p.id === "friedel-salt")!.moles : 0,
    kuzelSaltMol: present.has("kuzel-salt") ? paste.assemblage.phases.find((p) => p.id === "kuzel-salt")!.moles : 0,
    chlorideFreeAfmMol: afmMol,
    maxSaturationIndexOfAbsentSolids: maxSi,
    mostSupersaturatedAbsentSolid: maxSiId,
  };
}
