import { atomicWeightGPerMol } from "../chem/atomic-weights";
import type { OxideAnalysisMassPercent, PhaseAnalysisMassPercent } from "../schema/binder-input";
import { analysisTotalRangeMassPercent, checkAnalysisTotal, type AnalysisTotalWarning } from "./analysis-total";
import { clinkerMinorOxidesDensityGPerCm3, clinkerPhase, scmDensityGPerCm3, type ClinkerPhaseId, type ScmType } from "./clinker-phases";
import { partitionCementOxides, type ClinkerPartitionError } from "./clinker-partition";
import { addOxideElementMoles, oxideIds, type OxideId, type OxideMassesG } from "./oxides";
import { minimumWaterCementRatioForFullHydration } from "./powers-model";
import type { ReactionDegreeWarning, ReactionDegrees } from "./reaction-degrees";
import type { ResolvedBinder, ResolvedScm } from "./resolve-binder";

/** Elements handed to the equilibrium calculation. Ti, P and Mn stay in the unreacted solids as inert. */
export type BulkElement = "Ca" | "Si" | "Al" | "Fe" | "Mg" | "S" | "C" | "Na" | "K" | "Cl" | "H" | "O";
export const bulkElements: readonly BulkElement[] = ["Ca", "Si", "Al", "Fe", "Mg", "S", "C", "Na", "K", "Cl", "H", "O"];

/** Oxides of the minor elements kept unreactive (TiO2, P2O5, Mn2O3). */
const inertOxides: readonly OxideId[] = ["TiO2", "P2O5", "Mn2O3"];

export type UnreactedSolid = {
  /** Clinker phase id, "clinker-minor-oxides", or "unreacted-<scm type>". */
  id: string;
  massG: number;
  densityGPerCm3: number;
  volumeCm3: number;
  /** Element moles in this solid; LOI of an SCM other than CO2 (unburnt carbon, moisture) has no stated composition. */
  elementsMol: Record<string, number>;
  /** Mass of that LOI remainder, g, included in massG but not in elementsMol. */
  unassignedLoiMassG: number;
};

export type BulkCompositionWarning =
  | AnalysisTotalWarning
  | ReactionDegreeWarning
  | { code: "water_insufficient_for_full_hydration"; waterBinderRatio: number; minimumSealed: number; minimumSaturated: number }
  | { code: "loi_taken_as_co2"; material: string; loiMassPercent: number };

export type BulkComposition = {
  basis: "per 100 g binder";
  binderMassG: number;
  mixingWaterMassG: number;
  /** Moles of each element in the reacted part of the binder plus all the water (mixing water and LOI water). */
  reactedElementsMol: Record<BulkElement, number>;
  reactedMassG: number;
  unreactedSolids: UnreactedSolid[];
  unreactedMassG: number;
  unreactedVolumeCm3: number;
  /** Volume of all the anhydrous binder at mixing (reacted and unreacted parts), cm³ per 100 g binder. */
  binderVolumeCm3: number;
  /** Volume of the binder part that has reacted, cm³ per 100 g binder (input to the chemical shrinkage). */
  reactedBinderVolumeCm3: number;
  warnings: BulkCompositionWarning[];
};

export type BulkCompositionError = ClinkerPartitionError;
export type BulkCompositionResult = { ok: true; value: BulkComposition } | { ok: false; error: BulkCompositionError };

/** Density of water at mixing taken as 1.0 g/cm³ for LOI water counted in the binder volume (common practice). */
const looseWaterDensityGPerCm3 = 1.0;

class Accumulator {
  readonly elements: Record<string, number> = {};
  readonly solids = new Map<string, { massG: number; volumeCm3: number; elementsMol: Record<string, number>; unassignedLoiMassG: number }>();
  binderVolumeCm3 = 0;

  addPhase(id: ClinkerPhaseId, totalMassG: number, degree: number) {
    if (totalMassG === 0) return;
    const phase = clinkerPhase(id);
    this.binderVolumeCm3 += totalMassG / phase.densityGPerCm3;
    const reactedMol = (totalMassG * degree) / phase.molarMassGPerMol;
    const unreactedMol = (totalMassG * (1 - degree)) / phase.molarMassGPerMol;
    const unreactedElements: Record<string, number> = {};
    for (const [element, count] of Object.entries(phase.elements)) {
      this.elements[element] = (this.elements[element] ?? 0) + reactedMol * count;
      unreactedElements[element] = unreactedMol * count;
    }
    this.addSolid(id, totalMassG * (1 - degree), phase.densityGPerCm3, unreactedElements);
  }

  addOxides(oxidesG: OxideMassesG, degree: number, solidId: string, densityGPerCm3: number) {
    const reacted: OxideMassesG = {};
    const unreacted: OxideMassesG = {};
    let totalG = 0;
    for (const id of oxideIds) {
      const massG = oxidesG[id] ?? 0;
      reacted[id] = massG * degree;
      unreacted[id] = massG - reacted[id];
      totalG += massG;
    }
    addOxideElementMoles(this.elements, reacted);
    this.binderVolumeCm3 += totalG / densityGPerCm3;
    this.addSolid(solidId, totalG * (1 - degree), densityGPerCm3, addOxideElementMoles({}, unreacted));
  }

  addSolid(id: string, massG: number, densityGPerCm3: number, elementsMol: Record<string, number>, unassignedLoiMassG = 0) {
    if (massG <= 0) return;
    const entry = this.solids.get(id) ?? { massG: 0, volumeCm3: 0, elementsMol: {}, unassignedLoiMassG: 0 };
    entry.massG += massG;
    entry.volumeCm3 += massG / densityGPerCm3;
    entry.unassignedLoiMassG += unassignedLoiMassG;
    for (const [element, moles] of Object.entries(elementsMol)) entry.elementsMol[element] = (entry.elementsMol[element] ?? 0) + moles;
    this.solids.set(id, entry);
  }

  addElement(element: string, moles: number) {
    this.elements[element] = (this.elements[element] ?? 0) + moles;
  }
}

/** Degree of reaction of a clinker-derived solid: its PK phase, ferrite-c2f with ferrite, periclase with alite, the rest whole. */
export function clinkerDegree(id: ClinkerPhaseId, degrees: ReactionDegrees): number {
  switch (id) {
    case "alite":
    case "belite":
    case "aluminate":
    case "ferrite":
      return degrees.clinker[id];
    case "ferrite-c2f":
      return degrees.clinker.ferrite;
    case "periclase":
      // Assumption of this model: periclase hydrates alongside alite (no published PK constants for MgO).
      return degrees.clinker.alite;
    default:
      // Free lime, calcium sulfates and alkali sulfates dissolve within the first hours (Taylor 1997, §7.2);
      // calcite is handed whole to the equilibrium calculation (Lothenbach et al. 2008, Cem. Concr. Res. 38, 848).
      return 1;
  }
}

/** Mass-weighted mean degree of the four clinker phases, for oxides held in solid solution in them. */
function meanClinkerDegree(phasesG: Partial<Record<ClinkerPhaseId, number>>, degrees: ReactionDegrees): number {
  let mass = 0;
  let reacted = 0;
  for (const id of ["alite", "belite", "aluminate", "ferrite", "ferrite-c2f"] as const) {
    const m = phasesG[id] ?? 0;
    mass += m;
    reacted += m * clinkerDegree(id, degrees);
  }
  return mass > 0 ? reacted / mass : 0;
}

/** The partition depends only on the analysis object; a timeline reuses it for every age. */
const partitionCache = new WeakMap<OxideAnalysisMassPercent, ReturnType<typeof partitionCementOxides>>();
function cachedPartition(oxides: OxideAnalysisMassPercent) {
  let partition = partitionCache.get(oxides);
  if (!partition) {
    partition = partitionCementOxides(oxides);
    partitionCache.set(oxides, partition);
  }
  return partition;
}

function addCementFromOxides(acc: Accumulator, oxides: OxideAnalysisMassPercent, cementMassG: number, degrees: ReactionDegrees, warnings: BulkCompositionWarning[]): ClinkerPartitionError | undefined {
  const partition = cachedPartition(oxides);
  if (!partition.ok) return partition.error;
  const p = partition.value;
  const scale = cementMassG / 100;
  if (p.loiTakenAsCO2) warnings.push({ code: "loi_taken_as_co2", material: "cement", loiMassPercent: oxides.LOI ?? 0 });
  for (const [id, massG] of Object.entries(p.phasesG) as [ClinkerPhaseId, number][]) acc.addPhase(id, massG * scale, clinkerDegree(id, degrees));
  const scaled = (record: OxideMassesG) => Object.fromEntries(Object.entries(record).map(([k, v]) => [k, (v ?? 0) * scale])) as OxideMassesG;
  acc.addOxides(scaled(p.clinkerSolidSolutionG), meanClinkerDegree(p.phasesG, degrees), "clinker-minor-oxides", clinkerMinorOxidesDensityGPerCm3);
  acc.addOxides(scaled(p.inertMinorOxidesG), 0, "clinker-minor-oxides", clinkerMinorOxidesDensityGPerCm3);
  // LOI water and chlorine enter the reacting system; Cl replaces ½ O (the O≡Cl of the analysis).
  addOxideElementMoles(acc.elements, { H2O: p.waterG * scale });
  acc.binderVolumeCm3 += (p.waterG * scale) / looseWaterDensityGPerCm3;
  const chlorineMol = (p.chlorineG * scale) / atomicWeightGPerMol("Cl");
  acc.addElement("Cl", chlorineMol);
  acc.addElement("O", -(p.oxygenEquivalentOfChlorineG * scale) / atomicWeightGPerMol("O"));
  acc.binderVolumeCm3 += ((p.chlorineG - p.oxygenEquivalentOfChlorineG) * scale) / clinkerMinorOxidesDensityGPerCm3;
  return undefined;
}

const phaseInputIds: Record<keyof PhaseAnalysisMassPercent, ClinkerPhaseId> = {
  alite: "alite",
  belite: "belite",
  aluminate: "aluminate",
  ferrite: "ferrite",
  periclase: "periclase",
  freeLime: "free-lime",
  calcite: "calcite",
  gypsum: "gypsum",
  bassanite: "bassanite",
  anhydrite: "anhydrite",
  arcanite: "arcanite",
  aphthitalite: "aphthitalite",
};

function addCementFromPhases(acc: Accumulator, phases: PhaseAnalysisMassPercent, cementMassG: number, degrees: ReactionDegrees, warnings: BulkCompositionWarning[]) {
  const entries = Object.entries(phases).filter(([, v]) => v !== undefined) as [keyof PhaseAnalysisMassPercent, number][];
  const total = entries.reduce((sum, [, v]) => sum + v, 0);
  const [minMassPercent, maxMassPercent] = analysisTotalRangeMassPercent;
  if (total < minMassPercent || total > maxMassPercent) {
    warnings.push({ code: "analysis_total_out_of_range", material: "cement (phase analysis)", totalMassPercent: total, minMassPercent, maxMassPercent });
  }
  for (const [key, massPercent] of entries) {
    const id = phaseInputIds[key];
    acc.addPhase(id, (massPercent / total) * cementMassG, clinkerDegree(id, degrees));
  }
}

/**
 * SCM with mass m (g): the LOI (less CO2) is kept with the unreacted solid (unburnt carbon, moisture), the rest
 * m' has the normalised oxide composition; its reactive part f·m' reacts to degree α except TiO2, P2O5, Mn2O3,
 * which stay inert. For limestone an LOI given without CO2 is taken as CO2.
 */
function addScm(acc: Accumulator, scm: ResolvedScm, degree: number, warnings: BulkCompositionWarning[]) {
  const oxides = scm.oxidesMassPercent;
  const material = `supplementaryMaterials.${scm.type}`;
  const totalWarning = checkAnalysisTotal(oxides, material);
  if (totalWarning) warnings.push(totalWarning);
  const massG = scm.massPercentOfBinder;
  let co2 = oxides.CO2 ?? 0;
  if (scm.type === "limestone" && oxides.CO2 === undefined && oxides.LOI !== undefined) {
    co2 = oxides.LOI;
    warnings.push({ code: "loi_taken_as_co2", material, loiMassPercent: oxides.LOI });
  }
  const loiRest = Math.max(0, (oxides.LOI ?? 0) - co2);
  const weights: OxideMassesG = {};
  let weightSum = loiRest;
  for (const id of oxideIds) {
    const value = id === "CO2" ? co2 : id === "H2O" ? 0 : ((oxides as Record<string, number | undefined>)[id] ?? 0);
    weights[id] = value;
    weightSum += value;
  }
  const density = scmDensityGPerCm3(scm.type as ScmType);
  const solidId = `unreacted-${scm.type}`;
  const reactiveOxides: OxideMassesG = {};
  const inertOxideMasses: OxideMassesG = {};
  for (const id of oxideIds) {
    const m = ((weights[id] ?? 0) / weightSum) * massG;
    reactiveOxides[id] = inertOxides.includes(id) ? 0 : m * scm.reactiveFraction;
    inertOxideMasses[id] = m - reactiveOxides[id];
  }
  // Reactive part: degree α. Non-reactive part (crystalline, inert minors, LOI rest): never reacts.
  acc.addOxides(reactiveOxides, degree, solidId, density);
  const loiRestG = (loiRest / weightSum) * massG;
  const inertMassG = Object.values(inertOxideMasses).reduce((sum: number, v) => sum + (v ?? 0), 0) + loiRestG;
  acc.binderVolumeCm3 += inertMassG / density;
  acc.addSolid(solidId, inertMassG, density, addOxideElementMoles({}, inertOxideMasses), loiRestG);
}

/**
 * Bulk composition handed to the equilibrium engine, per 100 g binder: the element moles of the reacted part
 * of every binder constituent plus all the water, and the unreacted solids (mass, volume). Mass is conserved:
 * Σ n_e·A_e + Σ unreacted masses = 100 g + mixing water (checked in the tests).
 * Alkalis and sulfate of the reacted part go wholly into the reacting system (the equilibrium, including alkali
 * uptake by C-S-H, decides where they end up).
 */
export function bulkComposition(binder: ResolvedBinder, degrees: ReactionDegrees): BulkCompositionResult {
  const warnings: BulkCompositionWarning[] = [...degrees.warnings];
  const acc = new Accumulator();
  const binderMassG = 100;
  const cementMassG = binder.cementMassPercentOfBinder;
  if (binder.cement.kind === "oxides") {
    const totalWarning = checkAnalysisTotal(binder.cement.oxidesMassPercent, "cement");
    if (totalWarning) warnings.push(totalWarning);
    const error = addCementFromOxides(acc, binder.cement.oxidesMassPercent, cementMassG, degrees, warnings);
    if (error) return { ok: false, error };
  } else {
    addCementFromPhases(acc, binder.cement.phasesMassPercent, cementMassG, degrees, warnings);
  }
  for (const scm of binder.supplementaryMaterials) addScm(acc, scm, degrees.scm[scm.type] ?? 0, warnings);

  const mixingWaterMassG = binder.mix.waterBinderRatio * binderMassG;
  addOxideElementMoles(acc.elements, { H2O: mixingWaterMassG });

  const minimumSealed = minimumWaterCementRatioForFullHydration("sealed");
  if (binder.mix.waterBinderRatio < minimumSealed) {
    warnings.push({
      code: "water_insufficient_for_full_hydration",
      waterBinderRatio: binder.mix.waterBinderRatio,
      minimumSealed,
      minimumSaturated: minimumWaterCementRatioForFullHydration("saturated"),
    });
  }

  const reactedElementsMol = Object.fromEntries(bulkElements.map((e) => [e, acc.elements[e] ?? 0])) as Record<BulkElement, number>;
  const reactedMassG = bulkElements.reduce((sum, e) => sum + reactedElementsMol[e] * atomicWeightGPerMol(e), 0);
  const unreactedSolids: UnreactedSolid[] = [...acc.solids.entries()].map(([id, s]) => ({
    id,
    massG: s.massG,
    densityGPerCm3: s.massG / s.volumeCm3,
    volumeCm3: s.volumeCm3,
    elementsMol: s.elementsMol,
    unassignedLoiMassG: s.unassignedLoiMassG,
  }));
  const unreactedMassG = unreactedSolids.reduce((sum, s) => sum + s.massG, 0);
  const unreactedVolumeCm3 = unreactedSolids.reduce((sum, s) => sum + s.volumeCm3, 0);
  return {
    ok: true,
    value: {
      basis: "per 100 g binder",
      binderMassG,
      mixingWaterMassG,
      reactedElementsMol,
      reactedMassG,
      unreactedSolids,
      unreactedMassG,
      unreactedVolumeCm3,
      binderVolumeCm3: acc.binderVolumeCm3,
      reactedBinderVolumeCm3: acc.binderVolumeCm3 - unreactedVolumeCm3,
      warnings,
    },
  };
}
