import type { Dataset } from "../data/load-dataset";
import type { EquilibriumFailure } from "../equilibrium/failure";
import type { SerializedState } from "../equilibrium/result";
import { binderTimeline, logarithmicAgesDays } from "./binder-system";
import { hydratePaste, type HydrationWarning, type PhaseAmount } from "./hydrate-paste";
import type { ResolvedBinder } from "./resolve-binder";

export type TimelineEntry = {
  ageDays: number;
  /** Grams and cm³ per 100 g binder of every solid, hydrates and unreacted binder. */
  phases: PhaseAmount[];
  poreSolutionVolumeCm3: number;
  /** Powers' capillary porosity, gel pores of the C-S-H excluded, fraction of the paste (`HydratedPaste.porosity.capillaryFraction`). */
  capillaryPorosityFraction: number;
  /** Pore solution + shrinkage space, gel pores included, fraction of the paste (`HydratedPaste.porosity.waterFilledAndEmptyFraction`). */
  waterFilledAndEmptyPorosityFraction: number;
  pH: number | null;
};

/**
 * Ages of the timeline the engine could not solve (warm and cold), left out of the entries. A timeline is a chart of
 * the assessment, not its result: one hard age (a self-desiccating low-w/b paste whose last drops of pore water meet
 * nine solids) must not sink the assessment, so it is told, not fatal.
 */
export type TimelineWarning = HydrationWarning | { code: "timeline_ages_unsolved"; ageDays: number[]; reason: EquilibriumFailure["code"]; message: string };

/** Failures of one age that another age need not share; the rest (bad input, infeasible composition) end the timeline. */
const SKIPPABLE_FAILURES: ReadonlySet<EquilibriumFailure["code"]> = new Set(["no_convergence", "time_limit"]);

/**
 * The assemblage against age on a logarithmic axis at one curing temperature: reaction degrees from the
 * binder model at each age, each equilibrium warm-started from the previous age (the compositions change
 * smoothly, so most points need one or two Newton iterations). Ages the engine cannot solve are left out and
 * reported (`timeline_ages_unsolved`); the timeline fails only when no age is solved.
 */
export function hydrationTimeline(
  binder: ResolvedBinder,
  options: {
    temperatureC: number;
    points: number;
    firstAgeDays: number;
    lastAgeDays: number;
    suppress?: readonly string[];
    enable?: readonly string[];
    dataset?: Dataset;
    /** Time limit of each age's equilibrium, ms (the engine's default when absent). */
    timeLimitMs?: number;
  },
): { ok: true; value: { entries: TimelineEntry[]; warnings: TimelineWarning[] } } | { ok: false; error: EquilibriumFailure & { ageDays?: number } } {
  const ages = logarithmicAgesDays(options.firstAgeDays, options.lastAgeDays, options.points);
  const compositions = binderTimeline(binder, ages, options.temperatureC);
  if (!compositions.ok)
    return { ok: false, error: { code: "infeasible_composition", message: `the cement analysis gives a negative ${compositions.error.phase} (${compositions.error.massG.toFixed(2)} g per 100 g)` } };
  const entries: TimelineEntry[] = [];
  const warnings = new Map<string, HydrationWarning>();
  const unsolved: { ageDays: number; error: EquilibriumFailure }[] = [];
  let warmStart: SerializedState | undefined;
  let alkaliBoundFraction: Record<string, number> | undefined;
  // The bound-alkali fractions of the last two ages, to extrapolate the next age's starting guess linearly in
  // log(age): the fractions change smoothly, so the uptake iteration then usually needs one equilibrium per age.
  let previous: { lnAge: number; fraction: Record<string, number> } | undefined;
  let latest: { lnAge: number; fraction: Record<string, number> } | undefined;
  for (const point of compositions.value) {
    const lnAge = Math.log(point.ageDays);
    if (previous && latest && latest.lnAge !== previous.lnAge) {
      const step = (lnAge - latest.lnAge) / (latest.lnAge - previous.lnAge);
      const last = latest.fraction;
      const before = previous.fraction;
      alkaliBoundFraction = Object.fromEntries(Object.keys(last).map((e) => [e, Math.min(1, Math.max(0, last[e] + step * (last[e] - (before[e] ?? last[e]))))]));
    }
    const paste = hydratePaste(point.composition, {
      temperatureC: options.temperatureC,
      binderContentKgPerM3: binder.mix.binderContentKgPerM3,
      ageDays: point.ageDays,
      suppress: options.suppress,
      enable: options.enable,
      warmStart,
      alkaliBoundFraction,
      dataset: options.dataset,
      timeLimitMs: options.timeLimitMs,
    });
    if (!paste.ok) {
      if (!SKIPPABLE_FAILURES.has(paste.error.code)) return { ok: false, error: { ...paste.error, ageDays: point.ageDays } };
      unsolved.push({ ageDays: point.ageDays, error: paste.error });
      continue;
    }
    warmStart = paste.value.assemblage.state;
    const reacted = point.composition.reactedElementsMol;
    alkaliBoundFraction = Object.fromEntries(Object.entries(paste.value.alkaliInCshMol).map(([e, mol]) => [e, reacted[e as "Na" | "K"] > 0 ? mol / reacted[e as "Na" | "K"] : 0]));
    previous = latest;
    latest = { lnAge, fraction: alkaliBoundFraction };
    for (const w of paste.value.warnings) warnings.set(w.code, w);
    entries.push({
      ageDays: point.ageDays,
      phases: paste.value.phases,
      poreSolutionVolumeCm3: paste.value.porosity.poreSolutionVolumeCm3,
      capillaryPorosityFraction: paste.value.porosity.capillaryFraction,
      waterFilledAndEmptyPorosityFraction: paste.value.porosity.waterFilledAndEmptyFraction,
      pH: paste.value.poreSolution?.pH ?? null,
    });
  }
  if (entries.length === 0 && unsolved.length > 0) return { ok: false, error: { ...unsolved[0].error, ageDays: unsolved[0].ageDays } };
  const told: TimelineWarning[] = [...warnings.values()];
  if (unsolved.length > 0) {
    const ages = unsolved.map((u) => u.ageDays);
    told.push({
      code: "timeline_ages_unsolved",
      ageDays: ages,
      reason: unsolved[0].error.code,
      message: `the engine could not solve the assemblage at ${ages.length === 1 ? "age" : "ages"} ${ages.map((a) => `${Number(a.toPrecision(3))} d`).join(", ")} (${unsolved[0].error.message}); the timeline leaves ${ages.length === 1 ? "it" : "them"} out`,
    });
  }
  return { ok: true, value: { entries, warnings: told } };
}
