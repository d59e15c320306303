import { atomicWeightGPerMol } from "../chem/atomic-weights";
import { clinkerPhase, type ClinkerPhaseId, type ScmType } from "../cement/clinker-phases";
import { clinkerDegree } from "../cement/bulk-composition";
import { partitionCementOxides, type ClinkerPartitionError } from "../cement/clinker-partition";
import { oxideIds, oxideMolarMassGPerMol, type OxideId, type OxideMassesG } from "../cement/oxides";
import type { ReactionDegrees } from "../cement/reaction-degrees";
import type { ResolvedBinder, ResolvedScm } from "../cement/resolve-binder";
import type { PhaseAnalysisMassPercent } from "../schema/binder-input";
import { anhydrousEnthalpyData } from "./anhydrous-enthalpy";

/**
 * The anhydrous solids that have reacted at one age, and all the water, in mol per 100 g binder: the reactant
 * side of the thermodynamic heat of hydration. It follows the bookkeeping of `lib/cement/bulk-composition.ts`
 * (same partition of the analysis, same degree per phase, same SCM split into reactive and inert parts), so
 * that Σ ν·elements of these reactants equals the composition's `reactedElementsMol`; the heat module checks
 * that closure at every age rather than trusting it.
 */
export type ReactantGroup = "clinker" | "sulfates-and-lime" | "clinker-solid-solution" | "chloride" | "scm" | "water";

export type ReactedAmount = { id: string; mol: number; group: ReactantGroup; scmType?: ScmType };

export type UncoveredReactant = { scmType: ScmType; reactedMassG: number; reason: string };

export type ReactedBinder = { reactants: ReactedAmount[]; uncovered: UncoveredReactant[] };

export type ReactedBinderError = ClinkerPartitionError | { code: "normative_assignment_failed"; scmType: ScmType; oxide: OxideId; excessMol: number };

const clinkerPhaseGroup: Partial<Record<ClinkerPhaseId, ReactantGroup>> = {
  alite: "clinker", belite: "clinker", aluminate: "clinker", ferrite: "clinker", "ferrite-c2f": "clinker", periclase: "clinker",
};

const phaseInputIds: Record<keyof PhaseAnalysisMassPercent, ClinkerPhaseId> = {
  alite: "alite", belite: "belite", aluminate: "aluminate", ferrite: "ferrite", periclase: "periclase", freeLime: "free-lime",
  calcite: "calcite", gypsum: "gypsum", bassanite: "bassanite", anhydrite: "anhydrite", arcanite: "arcanite", aphthitalite: "aphthitalite",
};

/** Reactant id of a clinker-derived solid in the anhydrous-enthalpy data file (the same ids). */
function reactantIdOf(id: ClinkerPhaseId): string {
  return id;
}

const inertOxides: readonly OxideId[] = ["TiO2", "P2O5", "Mn2O3"];

export function reactedBinder(binder: ResolvedBinder, degrees: ReactionDegrees): { ok: true; value: ReactedBinder } | { ok: false; error: ReactedBinderError } {
  const reactants: ReactedAmount[] = [];
  const uncovered: UncoveredReactant[] = [];
  const add = (id: string, mol: number, group: ReactantGroup, scmType?: ScmType) => {
    if (mol !== 0) reactants.push({ id, mol, group, ...(scmType ? { scmType } : {}) });
  };
  const cementMassG = binder.cementMassPercentOfBinder;
  const addPhase = (id: ClinkerPhaseId, massG: number, molarMassGPerMol: number) =>
    add(reactantIdOf(id), (massG * clinkerDegree(id, degrees)) / molarMassGPerMol, clinkerPhaseGroup[id] ?? "sulfates-and-lime");

  if (binder.cement.kind === "oxides") {
    const partition = partitionCementOxides(binder.cement.oxidesMassPercent);
    if (!partition.ok) return partition;
    const p = partition.value;
    const scale = cementMassG / 100;
    let clinkerMassG = 0;
    let clinkerReactedG = 0;
    for (const [id, massG] of Object.entries(p.phasesG) as [ClinkerPhaseId, number][]) {
      if (!massG) continue;
      addPhase(id, massG * scale, molarMassOf(id));
      if (id === "alite" || id === "belite" || id === "aluminate" || id === "ferrite" || id === "ferrite-c2f") {
        clinkerMassG += massG;
        clinkerReactedG += massG * clinkerDegree(id, degrees);
      }
    }
    const meanDegree = clinkerMassG > 0 ? clinkerReactedG / clinkerMassG : 0;
    const solidSolution = anhydrousEnthalpyData.clinkerSolidSolution;
    for (const oxide of ["MgO", "Na2O", "K2O"] as const) {
      const massG = (p.clinkerSolidSolutionG[oxide] ?? 0) * scale * meanDegree;
      add(solidSolution[oxide], massG / oxideMolarMassGPerMol(oxide), "clinker-solid-solution");
    }
    add("water", (p.waterG * scale) / oxideMolarMassGPerMol("H2O"), "water");
    // Per mol Cl: 0.5 CaCl2 − 0.5 CaO (Cl enters with O≡Cl removed).
    const chlorineMol = (p.chlorineG * scale) / atomicWeightGPerMol("Cl");
    add(anhydrousEnthalpyData.chloride.calciumChlorideId, chlorineMol / 2, "chloride");
    add(anhydrousEnthalpyData.chloride.limeId, -chlorineMol / 2, "chloride");
  } else {
    const entries = Object.entries(binder.cement.phasesMassPercent).filter(([, v]) => v !== undefined) as [keyof PhaseAnalysisMassPercent, number][];
    const total = entries.reduce((sum, [, v]) => sum + v, 0);
    for (const [key, massPercent] of entries) {
      const id = phaseInputIds[key];
      addPhase(id, (massPercent / total) * cementMassG, molarMassOf(id));
    }
  }

  for (const scm of binder.supplementaryMaterials) {
    const degree = degrees.scm[scm.type] ?? 0;
    const reactedOxides = reactedScmOxidesG(scm, degree);
    const reactedMassG = Object.values(reactedOxides).reduce((s: number, v) => s + (v ?? 0), 0);
    if (reactedMassG <= 0) continue;
    if (!anhydrousEnthalpyData.supplementaryMaterials.covered.includes(scm.type)) {
      uncovered.push({ scmType: scm.type, reactedMassG, reason: `the enthalpy of the ${scm.type} glass is not in lib/data/binders/anhydrous-enthalpies.json` });
      continue;
    }
    const normative = normativeAssemblage(reactedOxides);
    if (!normative.ok) return { ok: false, error: { code: "normative_assignment_failed", scmType: scm.type, oxide: normative.oxide, excessMol: normative.excessMol } };
    for (const [id, mol] of Object.entries(normative.value)) add(id, mol, "scm", scm.type);
  }

  add("water", (binder.mix.waterBinderRatio * 100) / oxideMolarMassGPerMol("H2O"), "water");
  return { ok: true, value: { reactants, uncovered } };
}

function molarMassOf(id: ClinkerPhaseId): number {
  return clinkerPhase(id).molarMassGPerMol;
}

/** Reacted oxide masses (g per 100 g binder) of an SCM: its reactive part (inert minors excluded) times the degree, as in bulk-composition.ts. */
export function reactedScmOxidesG(scm: ResolvedScm, degree: number): OxideMassesG {
  const oxides = scm.oxidesMassPercent;
  let co2 = oxides.CO2 ?? 0;
  if (scm.type === "limestone" && oxides.CO2 === undefined && oxides.LOI !== undefined) co2 = oxides.LOI;
  const loiRest = Math.max(0, (oxides.LOI ?? 0) - co2);
  let weightSum = loiRest;
  const weights: OxideMassesG = {};
  for (const id of oxideIds) {
    const value = id === "CO2" ? co2 : id === "H2O" ? 0 : ((oxides as Record<string, number | undefined>)[id] ?? 0);
    weights[id] = value;
    weightSum += value;
  }
  const reacted: OxideMassesG = {};
  for (const id of oxideIds) {
    if (inertOxides.includes(id)) continue;
    const massG = ((weights[id] ?? 0) / weightSum) * scm.massPercentOfBinder * scm.reactiveFraction * degree;
    if (massG > 0) reacted[id] = massG;
  }
  return reacted;
}

/**
 * Normative assemblage of reacted SCM oxides (mol of each reactant id), in the order of the data file's note:
 * SO3 + CaO → anhydrite, CO2 + CaO → calcite, CO2 + MgO → magnesite, then the oxides alone.
 */
function normativeAssemblage(oxidesG: OxideMassesG): { ok: true; value: Record<string, number> } | { ok: false; oxide: OxideId; excessMol: number } {
  const ids = anhydrousEnthalpyData.supplementaryMaterials.normativeIds;
  const mol = (id: OxideId) => (oxidesG[id] ?? 0) / oxideMolarMassGPerMol(id);
  let ca = mol("CaO");
  let mg = mol("MgO");
  const out: Record<string, number> = {};
  const put = (id: string, n: number) => {
    if (n > 0) out[id] = (out[id] ?? 0) + n;
  };
  const sulfate = mol("SO3");
  if (sulfate > ca) return { ok: false, oxide: "SO3", excessMol: sulfate - ca };
  put(ids.SO3WithCaO, sulfate);
  ca -= sulfate;
  let carbonate = mol("CO2");
  const calcite = Math.min(carbonate, ca);
  put(ids.CO2WithCaO, calcite);
  ca -= calcite;
  carbonate -= calcite;
  const magnesite = Math.min(carbonate, mg);
  put(ids.CO2WithMgO, magnesite);
  mg -= magnesite;
  carbonate -= magnesite;
  if (carbonate > 1e-12) return { ok: false, oxide: "CO2", excessMol: carbonate };
  put(ids.CaO, ca);
  put(ids.MgO, mg);
  put(ids.SiO2, mol("SiO2"));
  put(ids.Al2O3, mol("Al2O3"));
  put(ids.Fe2O3, mol("Fe2O3"));
  put(ids.Na2O, mol("Na2O"));
  put(ids.K2O, mol("K2O"));
  return { ok: true, value: out };
}
