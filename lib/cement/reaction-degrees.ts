import type { ResolvedBinder } from "./resolve-binder";
import { parrotKillohDegrees, type ClinkerReactingPhase } from "./parrot-killoh";
import { scmReactionDegree, type ScmReactionWarning } from "./scm-reaction";
import type { ScmType } from "./clinker-phases";

/** Degrees of reaction (0–1) of the clinker phases and of the reactive part of each SCM at one age. */
export type ReactionDegrees = {
  clinker: Record<ClinkerReactingPhase, number>;
  scm: Partial<Record<ScmType, number>>;
  /** Absolute uncertainty of each SCM degree (about one standard deviation); zero for entered degrees. */
  scmUncertaintyAbsolute: Partial<Record<ScmType, number>>;
  warnings: ScmReactionWarning[];
};

/**
 * Reaction degrees at each age (days) for a binder cured at `curingTemperatureC`: Parrot & Killoh (1984) for
 * the clinker phases, with the water/binder ratio standing for w/c (the PK water factor is a space limit, and
 * the SCM hydrates share that space; an assumption of this model) and the Blaine fineness of the Portland part;
 * the published curves of `scm-reaction.ts` for each SCM. One PK integration serves all ages.
 */
export function reactionDegreesAtAges(binder: ResolvedBinder, agesDays: readonly number[], curingTemperatureC: number): ReactionDegrees[] {
  const clinkerSeries = parrotKillohDegrees(agesDays, {
    waterCementRatio: binder.mix.waterBinderRatio,
    blaineM2PerKg: binder.cement.blaineM2PerKg,
    curingTemperatureC,
  });
  return agesDays.map((ageDays, index) => {
    const scm: Partial<Record<ScmType, number>> = {};
    const scmUncertaintyAbsolute: Partial<Record<ScmType, number>> = {};
    const warnings: ScmReactionWarning[] = [];
    for (const material of binder.supplementaryMaterials) {
      const degree = scmReactionDegree(material.type, ageDays, curingTemperatureC);
      scm[material.type] = degree.degree;
      scmUncertaintyAbsolute[material.type] = degree.uncertaintyAbsolute;
      warnings.push(...degree.warnings);
    }
    return {
      clinker: {
        alite: clinkerSeries.alite[index],
        belite: clinkerSeries.belite[index],
        aluminate: clinkerSeries.aluminate[index],
        ferrite: clinkerSeries.ferrite[index],
      },
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
