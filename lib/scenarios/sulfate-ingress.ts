import type { HydratedPaste } from "../cement/hydrate-paste";
import type { ExposureInput } from "../schema/exposure-input";
import { linearDoses, phaseMoles, solidVolumeCm3, sweepPaste, sweepPoint, type ScenarioBase, type ScenarioSweep, type SweepFailure, type SweepPoint } from "./sweep";

/** Molar mass of sulfate, SO4²⁻, g/mol (IUPAC 2021: 32.06 + 4 × 15.999). */
const SULFATE_G_PER_MOL = 96.056;
/** Molar mass of water, g/mol (IUPAC 2021). */
const WATER_G_PER_MOL = 18.015;
/** Sulfate concentration assumed when the exposure gives none: the EN 206 XA2/XA3 boundary, 3000 mg/L (a severe test case). */
const DEFAULT_SULFATE_MG_PER_L = 3000;
/** The sweep runs to this multiple of the sulfate that all the paste's Al could bind as ettringite (3 SO4 per 2 Al). */
const DOSE_RANGE_MULTIPLE_OF_ETTRINGITE_CAPACITY = 2;

export type SulfatePoint = SweepPoint & {
  solidVolumeChangeCm3: number;
  /** Solid volume change as a percentage of the initial capillary pore volume. */
  solidVolumeChangePercentOfPores: number;
  gypsumMol: number;
  ettringiteMol: number;
  portlanditeMol: number;
  solutionAddedKg: number;
};

export type SulfateScenario = {
  sweep: ScenarioSweep<SulfatePoint>;
  summary: {
    cation: "Na" | "Mg" | "Ca" | "K";
    sulfateMgPerL: number;
    /** Initial capillary pore volume (pore solution + empty shrinkage space), cm³ per 100 g binder. */
    initialPoreVolumeCm3: number;
    maximumSolidVolumeIncreasePercentOfPores: number;
    /** Dose at which the solid volume gain fills the initial pore volume (null: never within the sweep). */
    poresFilledAtDoseMmolPer100g: number | null;
    gypsumOnsetDoseMmolPer100g: number | null;
    portlanditeExhaustedDoseMmolPer100g: number | null;
    magnesiumPhasesOnsetDoseMmolPer100g: number | null;
    ettringiteIncreaseMolPer100g: number;
    /** The largest gypsum saturation index reached in the sweep (0 where gypsum forms). */
    gypsumSaturationIndexMax: number;
  };
};

/** Cation stoichiometry: moles of cation per mole of sulfate in the salt. */
const cationPerSulfate: Record<SulfateScenario["summary"]["cation"], number> = { Na: 2, K: 2, Mg: 1, Ca: 1 };

/**
 * Sulfate ingress: the hydrated paste reacts with increasing amounts of the exposure's sulfate solution
 * (the salt of the given cation at the given concentration, with its water), per 100 g binder. Tracks
 * AFm → ettringite, gypsum, portlandite and C-S-H decalcification and, with MgSO4, brucite and M-S-H, as in
 * the equilibrium studies of sulfate attack (Lothenbach, Bary, Le Bescop, Schmidt & Leterrier 2010, Cem.
 * Concr. Res. 40, 1211; Kunther, Lothenbach & Scrivener 2013, Cem. Concr. Res. 44, 77). The expansion
 * indicator is the increase of the solid volume against the paste's initial capillary pore volume:
 * expansion and cracking are expected once the new solids fill the pore space (Kunther et al. 2013).
 * Leaching by the added water is part of the result; transport (the gradient from the surface) is not:
 * each point is the state of a paste volume that has taken up that much solution.
 */
export function sulfateIngress(
  base: ScenarioBase,
  exposure: ExposureInput,
  options: { points: number },
): { ok: true; value: SulfateScenario } | { ok: false; error: SweepFailure } {
  const cation = exposure.sulfateCation ?? "Na";
  const sulfateMgPerL = exposure.sulfateMgPerL && exposure.sulfateMgPerL > 0 ? exposure.sulfateMgPerL : DEFAULT_SULFATE_MG_PER_L;
  const sulfateMolPerKgWater = sulfateMgPerL / 1000 / SULFATE_G_PER_MOL;
  const aluminium = base.composition.reactedElementsMol.Al;
  const maximumDoseMol = DOSE_RANGE_MULTIPLE_OF_ETTRINGITE_CAPACITY * 1.5 * Math.max(aluminium, 0.01);
  const doses = linearDoses(maximumDoseMol, options.points);
  const added = (doseMol: number) => {
    const waterKg = doseMol / sulfateMolPerKgWater;
    const waterMol = (waterKg * 1000) / WATER_G_PER_MOL;
    return {
      addedElementsMol: {
        S: doseMol,
        O: 4 * doseMol + waterMol,
        H: 2 * waterMol,
        [cation]: cationPerSulfate[cation] * doseMol,
      },
    };
  };
  const swept = sweepPaste(base, doses, added, "sulfate");
  if (!swept.ok) return swept;
  const first = swept.value[0].paste;
  const initialSolid = solidVolumeCm3(first);
  const initialPoreVolumeCm3 = first.porosity.poreSolutionVolumeCm3 + Math.max(0, first.porosity.chemicalShrinkageCm3);
  const points: SulfatePoint[] = swept.value.map(({ dose, paste }) => {
    const change = solidVolumeCm3(paste) - initialSolid;
    return {
      ...sweepPoint(dose * 1000, paste),
      solidVolumeChangeCm3: change,
      solidVolumeChangePercentOfPores: (100 * change) / initialPoreVolumeCm3,
      gypsumMol: phaseMoles(paste, "gypsum"),
      ettringiteMol: phaseMoles(paste, "ettringite"),
      portlanditeMol: phaseMoles(paste, "portlandite"),
      solutionAddedKg: dose / sulfateMolPerKgWater,
    };
  });
  const firstDose = (test: (p: SulfatePoint, paste: HydratedPaste) => boolean) => {
    const i = points.findIndex((p, k) => test(p, swept.value[k].paste));
    return i < 0 ? null : points[i].dose;
  };
  const hadPortlandite = points[0].portlanditeMol > 0;
  return {
    ok: true,
    value: {
      sweep: {
        id: "sulfate",
        title: `Sulfate ingress (${cation === "Na" || cation === "K" ? `${cation}2SO4` : `${cation}SO4`}, ${sulfateMgPerL} mg/L SO4)`,
        doseLabel: "Sulfate taken up",
        doseUnit: "mmol SO4 per 100 g binder",
        points,
      },
      summary: {
        cation,
        sulfateMgPerL,
        initialPoreVolumeCm3,
        maximumSolidVolumeIncreasePercentOfPores: Math.max(...points.map((p) => p.solidVolumeChangePercentOfPores)),
        poresFilledAtDoseMmolPer100g: firstDose((p) => p.solidVolumeChangePercentOfPores >= 100),
        gypsumOnsetDoseMmolPer100g: firstDose((p) => p.gypsumMol > 0),
        portlanditeExhaustedDoseMmolPer100g: hadPortlandite ? firstDose((p) => p.portlanditeMol === 0) : null,
        magnesiumPhasesOnsetDoseMmolPer100g:
          cation === "Mg" ? firstDose((_, paste) => paste.assemblage.phases.some((x) => x.id === "brucite" || x.id === "msh")) : null,
        ettringiteIncreaseMolPer100g: Math.max(...points.map((p) => p.ettringiteMol)) - points[0].ettringiteMol,
        gypsumSaturationIndexMax: Math.max(...swept.value.map(({ paste }) => paste.assemblage.saturationIndices.gypsum ?? -Infinity)),
      },
    },
  };
}
