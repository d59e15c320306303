import rules from "../data/binders/oxide-to-phase-rules.json";
import type { OxideAnalysisMassPercent } from "../schema/binder-input";
import { clinkerPhase, type ClinkerPhaseId } from "./clinker-phases";
import { oxideMolarMassGPerMol, type OxideMassesG } from "./oxides";
import { allocateSulfate } from "./sulfate-allocation";
import { atomicWeightGPerMol } from "../chem/atomic-weights";

/**
 * Exact stoichiometric partition of a cement oxide analysis into phases: the same allocation as the Bogue
 * calculation (ASTM C150 Annex A1 with the corrections of Taylor 1997 §4.3) but solved in moles from the
 * molar masses, so that every gram of the analysis lands in exactly one phase (mass is conserved to
 * rounding). Order: free lime; CaO bound to CO2 as calcite; SO3 to K2SO4, Na2SO4, then CaSO4; Fe2O3 to
 * C4AF (and C2F when A/F < 0.64); the remaining Al2O3 to C3A; the remaining CaO and all SiO2 to C3S and C2S
 * (3x + 2y = CaO left, x + y = SiO2). MgO up to the solid-solution limit and the alkalis not in sulfates stay
 * in the clinker phases; TiO2, P2O5, Mn2O3 are kept inert; LOI − CO2 is water.
 * The analysis is first normalised to 100 g (Σ oxides + LOI + Cl − O≡Cl).
 */
export type ClinkerPartition = {
  /** g of each phase per 100 g of cement. */
  phasesG: Partial<Record<ClinkerPhaseId, number>>;
  /** g per 100 g of MgO and alkali oxides in solid solution in the clinker phases (react with the clinker). */
  clinkerSolidSolutionG: OxideMassesG;
  /** g per 100 g of minor oxides kept unreactive (TiO2, P2O5, Mn2O3). */
  inertMinorOxidesG: OxideMassesG;
  /** g of water per 100 g (LOI less CO2): gypsum water, portlandite and hydrate water of prehydration. */
  waterG: number;
  /** g of chlorine per 100 g, and the oxygen it replaces (O≡Cl, g), both entering the reacting system. */
  chlorineG: number;
  oxygenEquivalentOfChlorineG: number;
  /** 100 / (analysis mass) applied to every entry. */
  normalisationFactor: number;
  /** True when LOI had to stand in for CO2 (no CO2 given). */
  loiTakenAsCO2: boolean;
};

export type ClinkerPartitionError = {
  code: "clinker_phase_negative";
  phase: ClinkerPhaseId;
  massG: number;
};

export type ClinkerPartitionResult = { ok: true; value: ClinkerPartition } | { ok: false; error: ClinkerPartitionError };

/** Tolerance (g per 100 g) below which a negative phase from round-off is set to zero (common practice). */
const roundOffToleranceG = 1e-9;

export function partitionCementOxides(oxides: OxideAnalysisMassPercent): ClinkerPartitionResult {
  const m = (value: number | undefined) => value ?? 0;
  const loiTakenAsCO2 = oxides.CO2 === undefined && oxides.LOI !== undefined;
  const co2 = loiTakenAsCO2 ? m(oxides.LOI) : m(oxides.CO2);
  const water = Math.max(0, m(oxides.LOI) - co2);
  const chlorineMassPercent = m(oxides.Cl);
  const oxygenEquivalent = (0.5 * chlorineMassPercent * atomicWeightGPerMol("O")) / atomicWeightGPerMol("Cl");
  const rawTotal =
    m(oxides.CaO) + m(oxides.SiO2) + m(oxides.Al2O3) + m(oxides.Fe2O3) + m(oxides.MgO) + m(oxides.SO3) + m(oxides.Na2O) +
    m(oxides.K2O) + m(oxides.TiO2) + m(oxides.P2O5) + m(oxides.Mn2O3) + co2 + water + chlorineMassPercent - oxygenEquivalent;
  const f = 100 / rawTotal;
  const mol = (massPercent: number | undefined, oxide: Parameters<typeof oxideMolarMassGPerMol>[0]) => (m(massPercent) * f) / oxideMolarMassGPerMol(oxide);

  let caoMol = mol(oxides.CaO, "CaO");
  const freeLimeMol = mol(oxides.freeLime, "CaO");
  caoMol -= freeLimeMol;
  const calciteMol = (co2 * f) / oxideMolarMassGPerMol("CO2");
  caoMol -= calciteMol;
  const sulfate = allocateSulfate(m(oxides.SO3) * f, m(oxides.K2O) * f, m(oxides.Na2O) * f, true);
  caoMol -= sulfate.calciumSulfateMol;

  const al2o3Mol = mol(oxides.Al2O3, "Al2O3");
  const fe2o3Mol = mol(oxides.Fe2O3, "Fe2O3");
  const sio2Mol = mol(oxides.SiO2, "SiO2");
  const aluminaFerricRatio = fe2o3Mol > 0 ? (al2o3Mol * oxideMolarMassGPerMol("Al2O3")) / (fe2o3Mol * oxideMolarMassGPerMol("Fe2O3")) : Infinity;
  let ferriteMol: number, c2fMol: number, aluminateMol: number;
  if (aluminaFerricRatio >= rules.aluminaFerricRatioThreshold) {
    ferriteMol = fe2o3Mol;
    c2fMol = 0;
    aluminateMol = al2o3Mol - fe2o3Mol;
  } else {
    ferriteMol = al2o3Mol;
    c2fMol = fe2o3Mol - al2o3Mol;
    aluminateMol = 0;
  }
  caoMol -= 4 * ferriteMol + 2 * c2fMol + 3 * aluminateMol;
  const aliteMol = caoMol - 2 * sio2Mol;
  const beliteMol = sio2Mol - aliteMol;

  const mgoMassG = m(oxides.MgO) * f;
  const mgoInClinkerG = Math.min(mgoMassG, rules.magnesiaInClinkerSolidSolutionMaxMassPercent);
  const phasesMol: Partial<Record<ClinkerPhaseId, number>> = {
    alite: aliteMol,
    belite: beliteMol,
    aluminate: aluminateMol,
    ferrite: ferriteMol,
    "ferrite-c2f": c2fMol,
    "free-lime": freeLimeMol,
    calcite: calciteMol,
    anhydrite: sulfate.calciumSulfateMol,
    arcanite: sulfate.arcaniteMol,
    thenardite: sulfate.thenarditeMol,
  };
  const phasesG: Partial<Record<ClinkerPhaseId, number>> = {};
  for (const [id, moles] of Object.entries(phasesMol) as [ClinkerPhaseId, number][]) {
    let massG = moles * clinkerPhase(id).molarMassGPerMol;
    if (massG < 0 && massG > -roundOffToleranceG) massG = 0;
    if (massG < 0) return { ok: false, error: { code: "clinker_phase_negative", phase: id, massG } };
    phasesG[id] = massG;
  }
  phasesG.periclase = mgoMassG - mgoInClinkerG;
  return {
    ok: true,
    value: {
      phasesG,
      clinkerSolidSolutionG: {
        MgO: mgoInClinkerG,
        K2O: sulfate.potassiumOxideInClinkerMol * oxideMolarMassGPerMol("K2O"),
        Na2O: sulfate.sodiumOxideInClinkerMol * oxideMolarMassGPerMol("Na2O"),
      },
      inertMinorOxidesG: { TiO2: m(oxides.TiO2) * f, P2O5: m(oxides.P2O5) * f, Mn2O3: m(oxides.Mn2O3) * f },
      waterG: water * f,
      chlorineG: chlorineMassPercent * f,
      oxygenEquivalentOfChlorineG: oxygenEquivalent * f,
      normalisationFactor: f,
      loiTakenAsCO2,
    },
  };
}
