import type { ResolvedBinder } from "./resolve-binder";
import { clinkerReactingPhases, parrotKillohDegrees, type ClinkerReactingPhase } from "./parrot-killoh";
import { scmReactionDegree, type ScmReactionWarning } from "./scm-reaction";
import type { ScmType } from "./clinker-phases";
import { minimumWaterCementRatioForFullHydration, powersMaximumDegreeOfHydration } from "./powers-model";

/** Clinker phases (and kinetic SCMs) whose computed degree was held at the degree the mixing water allows (see `reactionDegreesAtAges`). */
export type WaterLimitedClinkerWarning = {
  code: "clinker_reaction_limited_by_water";
  waterBinderRatio: number;
  minimumSealed: number;
  maximumDegree: number;
  phases: { phase: ClinkerReactingPhase; unlimitedDegree: number }[];
  supplementaryMaterials: { type: ScmType; unlimitedDegree: number }[];
};

export type ReactionDegreeWarning = ScmReactionWarning | WaterLimitedClinkerWarning;

/** Degrees of reaction (0–1) of the clinker phases and of the reactive part of each SCM at one age. */
export type ReactionDegrees = {
  clinker: Record<ClinkerReactingPhase, number>;
  scm: Partial<Record<ScmType, number>>;
  /** Absolute uncertainty of each SCM degree (about one standard deviation); zero for entered degrees. */
  scmUncertaintyAbsolute: Partial<Record<ScmType, number>>;
  warnings: ReactionDegreeWarning[];
};

/**
 * Reaction degrees at each age (days) for a binder cured at `curingTemperatureC`: Parrot & Killoh (1984) for
 * the clinker phases, with the water/binder ratio standing for w/c (the PK water factor is a space limit, and
 * the SCM hydrates share that space; an assumption of this model) and the Blaine fineness of the Portland part;
 * the published curves of `scm-reaction.ts` for each SCM. One PK integration serves all ages.
 *
 * Water limit: the equilibrium is a closed system holding only the mixing water, and Powers' model (Powers &
 * Brownyard 1947, in the form of Jensen & Hansen 2001, Cem. Concr. Res. 31, 647) says a sealed paste can hydrate only to
 * α_max = (w/c)/(w/c)_min,sealed ≈ (w/c)/0.42 before its capillary water is used up. PK's own water factor allows
 * more at low w/c (alite to H·w/c + 0.3 = 0.75 at w/c 0.25), which left the equilibrium with almost no pore
 * solution. Each clinker phase is therefore held at α_max, a simplification (the phases do not run dry at the same
 * overall degree), and a warning names the phases held. The reactive part of a slag, fly ash, silica fume or calcined
 * clay is held at the same α_max, as its hydrates share the water (the assumption behind w/b standing for w/c above).
 */
export function reactionDegreesAtAges(binder: ResolvedBinder, agesDays: readonly number[], curingTemperatureC: number): ReactionDegrees[] {
  const clinkerSeries = parrotKillohDegrees(agesDays, {
    waterCementRatio: binder.mix.waterBinderRatio,
    blaineM2PerKg: binder.cement.blaineM2PerKg,
    curingTemperatureC,
  });
  const waterBinderRatio = binder.mix.waterBinderRatio;
  const maximumDegree = powersMaximumDegreeOfHydration(waterBinderRatio, "sealed");
  const minimumSealed = minimumWaterCementRatioForFullHydration("sealed");
  return agesDays.map((ageDays, index) => {
    const scm: Partial<Record<ScmType, number>> = {};
    const scmUncertaintyAbsolute: Partial<Record<ScmType, number>> = {};
    const warnings: ReactionDegreeWarning[] = [];
    const heldScm: { type: ScmType; unlimitedDegree: number }[] = [];
    for (const material of binder.supplementaryMaterials) {
      const degree = scmReactionDegree(material.type, ageDays, curingTemperatureC);
      // Only kinetic SCM degrees are held: limestone enters the equilibrium whole (its degree is 1 by definition).
      const limited = degree.model === "table" && degree.degree > maximumDegree;
      if (limited) heldScm.push({ type: material.type, unlimitedDegree: degree.degree });
      scm[material.type] = limited ? maximumDegree : degree.degree;
      scmUncertaintyAbsolute[material.type] = degree.uncertaintyAbsolute;
      warnings.push(...degree.warnings);
    }
    const held = clinkerReactingPhases.filter((phase) => clinkerSeries[phase][index] > maximumDegree);
    if (held.length > 0 || heldScm.length > 0) {
      warnings.push({
        code: "clinker_reaction_limited_by_water",
        waterBinderRatio,
        minimumSealed,
        maximumDegree,
        phases: held.map((phase) => ({ phase, unlimitedDegree: clinkerSeries[phase][index] })),
        supplementaryMaterials: heldScm,
      });
    }
    const clinker = Object.fromEntries(clinkerReactingPhases.map((phase) => [phase, Math.min(clinkerSeries[phase][index], maximumDegree)])) as Record<ClinkerReactingPhase, number>;
    return {
      clinker,
      scm,
      scmUncertaintyAbsolute,
      warnings,
    };
  });
}

/** Reaction degrees for the binder's own `age` input: computed from age and temperature, or as entered. */
export function reactionDegreesForInput(binder: ResolvedBinder): ReactionDegrees {
  const age = binder.age;
  if (age.mode === "age") return reactionDegreesAtAges(binder, [age.ageDays], age.curingTemperatureC)[0];
  const scm: Partial<Record<ScmType, number>> = {};
  const scmUncertaintyAbsolute: Partial<Record<ScmType, number>> = {};
  for (const material of binder.supplementaryMaterials) {
    // Limestone is handed whole to the equilibrium calculation (see scm-reaction.ts).
    scm[material.type] = material.type === "limestone" ? (age.scmDegrees?.limestone ?? 1) : (age.scmDegrees?.[material.type] ?? 0);
    scmUncertaintyAbsolute[material.type] = 0;
  }
  return { clinker: { ...age.clinkerDegrees }, scm, scmUncertaintyAbsolute, warnings: [] };
}
