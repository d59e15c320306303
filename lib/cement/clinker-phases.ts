import phaseData from "../data/binders/clinker-phases.json";
import { molarMassGPerMol } from "../chem/atomic-weights";

/** Ids of the anhydrous solids a binder is made of (clinker phases, set regulator, alkali sulfates, calcite). */
export type ClinkerPhaseId =
  | "alite"
  | "belite"
  | "aluminate"
  | "ferrite"
  | "ferrite-c2f"
  | "periclase"
  | "free-lime"
  | "calcite"
  | "gypsum"
  | "bassanite"
  | "anhydrite"
  | "arcanite"
  | "thenardite"
  | "aphthitalite";

export type ScmType =
  | "slag"
  | "siliceous-fly-ash"
  | "calcareous-fly-ash"
  | "silica-fume"
  | "metakaolin"
  | "limestone"
  | "natural-pozzolan";

export type ClinkerPhase = {
  id: ClinkerPhaseId;
  notation: string;
  formula: string;
  /** Atoms per formula unit. */
  elements: Record<string, number>;
  /** From the element stoichiometry and the IUPAC 2021 atomic weights. */
  molarMassGPerMol: number;
  densityGPerCm3: number;
  /** Molar volume = M / ρ. */
  molarVolumeCm3PerMol: number;
  source: string;
  recalledFromMemory: boolean;
};

const phasesById = new Map<ClinkerPhaseId, ClinkerPhase>(
  phaseData.phases.map((entry) => {
    const elements = entry.elements as unknown as Record<string, number>;
    const molarMass = molarMassGPerMol(elements);
    const phase: ClinkerPhase = {
      id: entry.id as ClinkerPhaseId,
      notation: entry.notation,
      formula: entry.formula,
      elements,
      molarMassGPerMol: molarMass,
      densityGPerCm3: entry.densityGPerCm3,
      molarVolumeCm3PerMol: molarMass / entry.densityGPerCm3,
      source: entry.source,
      recalledFromMemory: entry.recalledFromMemory,
    };
    return [phase.id, phase];
  }),
);

/** Stoichiometry, molar mass and density of one anhydrous binder phase (data: `lib/data/binders/clinker-phases.json`). */
export function clinkerPhase(id: ClinkerPhaseId): ClinkerPhase {
  const phase = phasesById.get(id);
  if (!phase) throw new Error(`clinkerPhase: no entry for ${id} in clinker-phases.json`);
  return phase;
}

export function allClinkerPhases(): ClinkerPhase[] {
  return [...phasesById.values()];
}

/** Density (g/cm³) of the glass, or of the whole material, of a supplementary cementitious material. */
export function scmDensityGPerCm3(type: ScmType): number {
  const entry = phaseData.scmGlasses.find((glass) => glass.type === type);
  if (!entry) throw new Error(`scmDensityGPerCm3: no density for ${type} in clinker-phases.json`);
  return entry.densityGPerCm3;
}

/** Density (g/cm³) assigned to minor oxides held in solid solution in clinker (common practice, ≈ mean clinker density). */
export const clinkerMinorOxidesDensityGPerCm3: number = phaseData.clinkerMinors.densityGPerCm3;
