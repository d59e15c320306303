import type { BulkComposition } from "../cement/bulk-composition";
import { hydratePaste, type HydratedPaste } from "../cement/hydrate-paste";
import type { Dataset } from "../data/load-dataset";
import type { EquilibriumFailure } from "../equilibrium/failure";
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
};

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
): { ok: true; value: { dose: number; paste: HydratedPaste }[] } | { ok: false; error: SweepFailure } {
  const out: { dose: number; paste: HydratedPaste }[] = [];
  let warmStart: SerializedState | undefined;
  let alkaliBoundFraction: Record<string, number> | undefined;
  for (const dose of doses) {
    const change = at(dose);
    const reacted = { ...base.composition.reactedElementsMol } as Record<string, number>;
    for (const [element, mol] of Object.entries(change.addedElementsMol ?? {})) reacted[element] = (reacted[element] ?? 0) + mol;
    const composition: BulkComposition = { ...base.composition, reactedElementsMol: reacted as BulkComposition["reactedElementsMol"] };
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
    warmStart = paste.value.assemblage.state;
    alkaliBoundFraction = Object.fromEntries(
      Object.entries(paste.value.alkaliInCshMol).map(([e, mol]) => [e, reacted[e] > 0 ? mol / reacted[e] : 0]),
    );
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
