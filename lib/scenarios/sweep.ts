import type { BulkComposition } from "../cement/bulk-composition";
import { hydratePaste, type HydratedPaste } from "../cement/hydrate-paste";
import type { Dataset } from "../data/load-dataset";
import type { EquilibriumFailure } from "../equilibrium/failure";
import type { CuringInput } from "../schema/curing-input";
import type { SerializedState } from "../equilibrium/result";

/** One point of a scenario sweep, in the shape the charts read (`lib/charts/scenario-sweep.ts`). */
export type SweepPoint = {
  dose: number;
  /** Phase id → cm³ per 100 g binder (hydrates, unreacted binder, `pore-solution`). */
  phaseVolumesCm3: Record<string, number>;
  pH: number | null;
};

export type ScenarioSweep<P extends SweepPoint = SweepPoint> = {
  id: string;
  title: string;
  doseLabel: string;
  doseUnit: string;
  points: P[];
};

export type SweepFailure = EquilibriumFailure & { dose: number };

/** The paste a scenario starts from: its bulk composition and the conditions of the base assemblage. */
export type ScenarioBase = {
  composition: BulkComposition;
  temperatureC: number;
  binderContentKgPerM3: number;
  suppress?: readonly string[];
  enable?: readonly string[];
  dataset?: Dataset;
  /**
   * A converged paste of the base composition (at `temperatureC`, or near it): the warm start of the first point of
   * every chain, so that the scenarios do not each solve the unexposed paste from a cold start. Only its solver state is
   * used; the alkali-uptake iteration still starts from no bound alkali, as from a cold start.
   */
  warmFrom?: HydratedPaste;
  /** Converged pastes of a reference run, recorded or read point by point (Monte Carlo samples; see `WarmStartBook`). */
  book?: WarmStartBook;
};

/**
 * Converged pastes of a reference run by scenario, chain and point (dose or temperature). In `record` mode every
 * scenario stores the paste it solved at each point; in `read` mode (a Monte Carlo sample over the same points with a
 * perturbed data set) each point starts from the reference paste at the same point before its neighbour in the chain:
 * composition and temperature are the same, only the standard potentials differ by the sampled deviates, so the
 * phase set rarely changes and Newton needs few iterations. The result is still the minimum of the sample's own
 * problem (the minimiser checks every phase); only the starting point differs.
 */
export type WarmStartBook = {
  mode: "record" | "read";
  /** Chain → its points in the order solved. */
  chains: Map<string, { point: number; paste: HydratedPaste }[]>;
  /** Figures of the reference run that seed a sample's root finding (e.g. a stability temperature), by name. */
  figures: Map<string, number>;
  /** Solver states of equilibria other than pastes (e.g. the dried solids of the drying scenario), by name. */
  states: Map<string, SerializedState>;
  /**
   * The thermodynamic heat curve of the reference run's curing model (null: not available for this binder), so that a
   * sample's element temperature is the reference's; undefined until the reference run has computed it.
   */
  heatCurve?: HeatCurveInput | null;
};

/** A heat curve as the curing model takes it (`curing.thermal.heatCurve`). */
export type HeatCurveInput = NonNullable<CuringInput["heatCurve"]>;

export function newWarmStartBook(): WarmStartBook {
  return { mode: "record", chains: new Map(), figures: new Map(), states: new Map() };
}

/** The same pastes and figures, for reading. */
export function readingBook(book: WarmStartBook): WarmStartBook {
  return { ...book, mode: "read" };
}

/**
 * The reference paste at this point of this chain, when the book is being read; with `nearest`, the reference paste
 * of the chain nearest to the point (root finding evaluates a sample at temperatures the reference did not visit).
 */
export function bookedPaste(book: WarmStartBook | undefined, chain: string, point: number, nearest = false): HydratedPaste | undefined {
  if (book?.mode !== "read") return undefined;
  const entries = book.chains.get(chain);
  if (!entries) return undefined;
  let best: { point: number; paste: HydratedPaste } | undefined;
  for (const entry of entries) {
    if (entry.point === point) return entry.paste;
    if (nearest && (!best || Math.abs(entry.point - point) < Math.abs(best.point - point))) best = entry;
  }
  return best?.paste;
}

/** Stores a solved paste when the book is being recorded. */
export function recordPaste(book: WarmStartBook | undefined, chain: string, point: number, paste: HydratedPaste): void {
  if (book?.mode !== "record") return;
  let entries = book.chains.get(chain);
  if (!entries) book.chains.set(chain, (entries = []));
  entries.push({ point, paste });
}

/** Fractions of Na and K a paste holds in C-S-H: the starting guess of the alkali-uptake iteration of a neighbouring solve. */
export function alkaliBoundFractionOf(paste: HydratedPaste, reactedElementsMol: Record<string, number>): Record<string, number> {
  return Object.fromEntries(Object.entries(paste.alkaliInCshMol).map(([e, mol]) => [e, reactedElementsMol[e] > 0 ? mol / reactedElementsMol[e] : 0]));
}

/**
 * The one generic sweep: for each dose, the scenario says how the bulk composition (and temperature)
 * change; each equilibrium is warm-started from the previous dose, so a 40-point sweep costs little more
 * than a few cold solves. Points come back in dose order with the full hydrated paste for the scenario to
 * read its own quantities from.
 */
export function sweepPaste(
  base: ScenarioBase,
  doses: readonly number[],
  at: (dose: number) => { addedElementsMol?: Record<string, number>; temperatureC?: number; suppress?: readonly string[] },
  chain = "sweep",
): { ok: true; value: { dose: number; paste: HydratedPaste }[] } | { ok: false; error: SweepFailure } {
  const out: { dose: number; paste: HydratedPaste }[] = [];
  // The last point of the chain: its state and its bound-alkali fractions (of its own totals), the next point's start.
  let previous: { state: SerializedState; fraction: Record<string, number> } | undefined;
  for (const dose of doses) {
    const change = at(dose);
    const reacted = { ...base.composition.reactedElementsMol } as Record<string, number>;
    for (const [element, mol] of Object.entries(change.addedElementsMol ?? {})) reacted[element] = (reacted[element] ?? 0) + mol;
    const composition: BulkComposition = { ...base.composition, reactedElementsMol: reacted as BulkComposition["reactedElementsMol"] };
    const booked = bookedPaste(base.book, chain, dose, true);
    let warmStart: SerializedState | undefined;
    let alkaliBoundFraction: Record<string, number> | undefined;
    if (booked) [warmStart, alkaliBoundFraction] = [booked.assemblage.state, alkaliBoundFractionOf(booked, reacted)];
    else if (previous) [warmStart, alkaliBoundFraction] = [previous.state, previous.fraction];
    // From the base's paste only the solver state: the alkali-uptake iteration starts from no bound alkali, as a cold
    // first point does, so that it stops where it did (it stops within a tolerance, so its result depends on its start).
    else if (base.warmFrom) warmStart = base.warmFrom.assemblage.state;
    const paste = hydratePaste(composition, {
      temperatureC: change.temperatureC ?? base.temperatureC,
      binderContentKgPerM3: base.binderContentKgPerM3,
      suppress: [...(base.suppress ?? []), ...(change.suppress ?? [])],
      enable: base.enable,
      warmStart,
      alkaliBoundFraction,
      dataset: base.dataset,
    });
    if (!paste.ok) return { ok: false, error: { ...paste.error, dose } };
    previous = { state: paste.value.assemblage.state, fraction: alkaliBoundFractionOf(paste.value, reacted) };
    recordPaste(base.book, chain, dose, paste.value);
    out.push({ dose, paste: paste.value });
  }
  return { ok: true, value: out };
}

/** Evenly spaced doses from 0 to `maximum` inclusive. */
export function linearDoses(maximum: number, points: number): number[] {
  const n = Math.max(2, Math.floor(points));
  return Array.from({ length: n }, (_, i) => (maximum * i) / (n - 1));
}

/** The chart point of a hydrated paste at a dose. */
export function sweepPoint(dose: number, paste: HydratedPaste): SweepPoint {
  return { dose, phaseVolumesCm3: { ...paste.volumes }, pH: paste.poreSolution?.pH ?? null };
}

/** Total solid volume (hydrates and unreacted binder), cm³ per 100 g binder. */
export function solidVolumeCm3(paste: HydratedPaste): number {
  return paste.phases.reduce((sum, p) => sum + p.volumeCm3, 0);
}

/** Moles of a phase (0 when absent). */
export function phaseMoles(paste: HydratedPaste, id: string): number {
  return paste.assemblage.phases.find((p) => p.id === id)?.moles ?? 0;
}
