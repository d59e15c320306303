import { molarMassGPerMol } from "../chem/atomic-weights";
import { loadDataset, type Dataset } from "../data/load-dataset";
import { suppressedPhases } from "../data/kinetic-constraints";
import alkaliUptake from "../data/binders/alkali-uptake.json";
import gelPores from "../data/binders/gel-pores.json";
import { gelWaterInCarriersMol } from "./csh-gel-water";
import { equilibrateSystem } from "../equilibrium/equilibrate";
import { getOrCreate } from "../memo/get-or-create";
import type { EquilibriumFailure } from "../equilibrium/failure";
import type { EquilibriumResult, SerializedState } from "../equilibrium/result";
import { potassiumHydroxideDominatedParameters } from "../thermo/truesdell-jones";
import { waterDensityKgPerM3 } from "../thermo/water-density";
import type { BulkComposition, BulkCompositionWarning } from "./bulk-composition";
import { chemicalShrinkageCm3, classifyPoreSpace, initialPasteVolumeCm3, mixingWaterDensityGPerCm3, per100gToPerM3, volumeBalance, waterFilledAndEmptyFraction, type VolumeBalance } from "./volumes";

/** Molar mass of water, g/mol (IUPAC 2021 atomic weights: 2 × 1.008 + 15.999). */
const WATER_G_PER_MOL = 18.015;
const KELVIN_OFFSET = 273.15;

export type PhaseAmount = {
  id: string;
  origin: "hydrate" | "unreacted";
  grams: number;
  volumeCm3: number;
};

export type HydrationWarning =
  | BulkCompositionWarning
  | { code: "ionic_strength_beyond_activity_model"; ionicStrengthMolPerKg: number; validUpToMolPerKg: number }
  | { code: "no_pore_solution"; message: string }
  | { code: "near_invariant_point"; message: string }
  | { code: "alkali_uptake_limited_by_pore_water"; boundFraction: number; distributionRatioFraction: number; poreWaterG: number };

/** The hydrated paste at one age, per 100 g binder, with the same figures per m³ of concrete. */
export type HydratedPaste = {
  temperatureC: number;
  assemblage: EquilibriumResult;
  /** Every solid, hydrates and unreacted binder: grams and cm³ per 100 g binder. */
  phases: PhaseAmount[];
  /** Phase id → cm³ per 100 g binder, the unreacted binder and `pore-solution` included. */
  volumes: Record<string, number>;
  /** Paste volumes in cm³ per 100 g binder and porosities as fractions of the initial paste volume (`volumes.ts`). */
  porosity: {
    initialPasteVolumeCm3: number;
    /** All liquid, gel-pore water of the C-S-H included (one solution chemically). */
    poreSolutionVolumeCm3: number;
    /** Empty space left by chemical shrinkage (sealed curing; water-filled when water-cured). */
    chemicalShrinkageCm3: number;
    /** Gel pores of the C-S-H at Powers' characteristic gel porosity (`gel-pores.json`), its own gel water included. */
    gelPoreVolumeCm3: number;
    /** Gel water the C-S-H end-members hold inside their own molar volume (`csh-gel-water.ts`), cm³ per 100 g binder. */
    gelWaterInCshCm3: number;
    /** Pore solution + shrinkage space − gel pores: Powers' capillary pores. */
    capillaryPoreVolumeCm3: number;
    /**
     * (pore solution + chemical shrinkage) / initial paste volume: every pore the solids leave, water-filled or
     * empty, gel pores of the C-S-H included (not Powers' capillary porosity).
     */
    waterFilledAndEmptyFraction: number;
    /** Capillary porosity as Powers & Brownyard (1947) define it: capillary pore volume / initial paste volume, gel pores excluded. */
    capillaryFraction: number;
    /** The characteristic gel porosity used for the split (gel pores per volume of gel), fraction. */
    characteristicGelPorosity: number;
    balance: VolumeBalance;
  };
  boundWaterG: number;
  portlanditeG: number;
  /** Ca in hydrates other than carbonates, mol per 100 g binder: what carbonation can turn into CaCO3. */
  carbonatableCaMol: number;
  /** Alkali held in C-S-H by the distribution ratio (Hong & Glasser 1999), mol per 100 g binder. */
  alkaliInCshMol: Record<string, number>;
  poreSolution: {
    pH: number | null;
    ionicStrengthMolPerKg: number | null;
    waterKg: number;
    elementsMmolPerKg: Record<string, number>;
  } | null;
  perM3: {
    binderContentKgPerM3: number;
    phasesKg: Record<string, number>;
    volumesLitres: Record<string, number>;
    portlanditeKg: number;
    boundWaterKg: number;
    carbonatableCaMol: number;
  };
  warnings: HydrationWarning[];
};

export type HydrationOptions = {
  temperatureC: number;
  binderContentKgPerM3: number;
  /** Extra phases to suppress, and default constraints to lift. */
  suppress?: readonly string[];
  enable?: readonly string[];
  /**
   * Age of the paste, d, for the age-dependent kinetic constraints (a phase that forms only over weeks, such as
   * thaumasite); absent, the long-term view of the durability scenarios, in which such a phase may form.
   */
  ageDays?: number;
  warmStart?: SerializedState;
  /** Fractions of Na and K bound in C-S-H at a neighbouring age: the starting guess of the uptake iteration. */
  alkaliBoundFraction?: Record<string, number>;
  dataset?: Dataset;
  timeLimitMs?: number;
};

/** Ionic strength up to which the b-dot model is used with confidence, mol/kg (common practice). */
const ACTIVITY_MODEL_LIMIT_MOL_PER_KG = 1;

/** H2O-equivalent water held in the solids (H/2 per formula unit), mol per 100 g binder. */
function boundWaterMol(result: EquilibriumResult, elementsOf: (id: string) => Record<string, number>): number {
  let total = 0;
  for (const phase of result.phases) {
    for (const member of phase.members ?? [{ id: phase.id, moles: phase.moles }]) total += ((elementsOf(member.id).H ?? 0) / 2) * member.moles;
  }
  return total;
}

/**
 * Equilibrates the reacted part of a paste (bulk composition from the binder model) at the curing
 * temperature and adds the unreacted binder back as inert solids: the thermodynamic assemblage of a
 * partly hydrated paste, with unreacted clinker and SCM as the kinetic constraint (Lothenbach &
 * Winnefeld 2006, Cem. Concr. Res. 36, 209; Lothenbach et al. 2008, Cem. Concr. Res. 38, 1).
 * Pore-solution activities use the KOH-dominated b-dot set (Helgeson et al. 1981).
 * Volumes follow `volumes.ts` (Powers & Brownyard definitions); the pore space is reported both whole
 * (`waterFilledAndEmptyFraction`) and as Powers' capillary porosity, without the gel pores of the C-S-H.
 */
export function hydratePaste(
  composition: BulkComposition,
  options: HydrationOptions,
): { ok: true; value: HydratedPaste } | { ok: false; error: EquilibriumFailure } {
  let dataset = options.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return { ok: false, error: { code: "invalid_input", field: "dataset", message: loaded.error.message } };
    dataset = loaded.value;
  }
  const byId = speciesById(dataset);
  const elementsOf = (id: string): Record<string, number> => byId.get(id)?.elements ?? {};
  const suppressed = suppressedPhases(options.temperatureC, { enable: options.enable, suppress: options.suppress, ageDays: options.ageDays });
  const uptake = alkaliUptakeByCsh(composition.reactedElementsMol, (totals, warmStart) =>
    equilibrateSystem({
      temperatureC: options.temperatureC,
      elementTotalsMol: totals,
      suppressedPhases: suppressed,
      activity: potassiumHydroxideDominatedParameters,
      warmStart,
      dataset,
      timeLimitMs: options.timeLimitMs,
    }), options.warmStart, options.alkaliBoundFraction);
  if (!uptake.ok) return uptake;
  const { assemblage, boundMol, limited } = uptake.value;
  const warnings: HydrationWarning[] = [...composition.warnings];
  if (limited) warnings.push({ code: "alkali_uptake_limited_by_pore_water", ...limited, poreWaterG: (assemblage.solution?.waterKg ?? 0) * 1000 });
  if (assemblage.nearInvariant)
    warnings.push({ code: "near_invariant_point", message: "the assemblage lies near an invariant point: phases within 0.01 log10 units of saturation may be left out" });

  // The bound alkali travel with the C-S-H as hydroxide (mass added, volume neglected: a few tenths of a cm³).
  const boundHydroxideG = Object.entries(boundMol).reduce((sum, [e, mol]) => sum + mol * molarMassGPerMol({ [e]: 1, O: 1, H: 1 }), 0);
  const phases: PhaseAmount[] = assemblage.phases.map((p) => ({ id: p.id, origin: "hydrate", grams: p.grams + (p.id === "csh" ? boundHydroxideG : 0), volumeCm3: p.volumeCm3 }));
  for (const solid of composition.unreactedSolids) {
    if (solid.massG > 0) phases.push({ id: solid.id, origin: "unreacted", grams: solid.massG, volumeCm3: solid.volumeCm3 });
  }
  const hydrateVolumeCm3 = assemblage.phases.reduce((sum, p) => sum + p.volumeCm3, 0);
  const solution = assemblage.solution;
  let poreSolutionVolumeCm3 = 0;
  let poreSolution: HydratedPaste["poreSolution"] = null;
  if (solution) {
    // Solution mass = water + dissolved solids; its density taken as that of water at T (dilute-solution
    // approximation, under 3 % error below 1 mol/kg; common practice).
    let soluteMassG = 0;
    for (const s of solution.species) {
      if (s.name === "H2O(l)") continue;
      soluteMassG += s.molality * solution.waterKg * (byId.get(s.name)?.molarMassGPerMol ?? 0);
    }
    const densityGPerCm3 = waterDensityKgPerM3(options.temperatureC + KELVIN_OFFSET) / 1000;
    poreSolutionVolumeCm3 = (solution.waterKg * 1000 + soluteMassG) / densityGPerCm3;
    const elementsMmolPerKg: Record<string, number> = {};
    for (const [e, m] of Object.entries(solution.elementMolality)) if (e !== "H" && e !== "O") elementsMmolPerKg[e] = m * 1000;
    poreSolution = { pH: assemblage.pH, ionicStrengthMolPerKg: assemblage.ionicStrength, waterKg: solution.waterKg, elementsMmolPerKg };
    if ((assemblage.ionicStrength ?? 0) > ACTIVITY_MODEL_LIMIT_MOL_PER_KG)
      warnings.push({ code: "ionic_strength_beyond_activity_model", ionicStrengthMolPerKg: assemblage.ionicStrength!, validUpToMolPerKg: ACTIVITY_MODEL_LIMIT_MOL_PER_KG });
  } else warnings.push({ code: "no_pore_solution", message: "all water is bound in solids: the paste has no liquid pore solution at equilibrium" });

  const mixingWaterDensity = mixingWaterDensityGPerCm3(options.temperatureC);
  const initialVolume = initialPasteVolumeCm3(composition.binderVolumeCm3, composition.mixingWaterMassG, mixingWaterDensity);
  const shrinkage = chemicalShrinkageCm3({
    reactedBinderVolumeCm3: composition.reactedBinderVolumeCm3,
    mixingWaterVolumeCm3: composition.mixingWaterMassG / mixingWaterDensity,
    hydrateVolumeCm3,
    poreSolutionVolumeCm3,
  });
  const volumes: Record<string, number> = {};
  for (const p of phases) volumes[p.id] = (volumes[p.id] ?? 0) + p.volumeCm3;
  const solidVolumes = { ...volumes };
  volumes["pore-solution"] = poreSolutionVolumeCm3;
  const gelPoreCarrierVolumeCm3 = phases.filter((p) => p.origin === "hydrate" && gelPores.carrierPhaseIds.value.includes(p.id)).reduce((sum, p) => sum + p.volumeCm3, 0);
  const gelPorosity = gelPores.characteristicGelPorosity.value;
  // Gel water the C-S-H end-members hold in their own molar volume, at the density of the mixing water.
  const gelWaterInCarriersCm3 = (gelWaterInCarriersMol(assemblage, elementsOf) * WATER_G_PER_MOL) / mixingWaterDensity;
  const poreClasses = classifyPoreSpace(poreSolutionVolumeCm3, shrinkage, gelPoreCarrierVolumeCm3, gelPorosity, initialVolume, gelWaterInCarriersCm3);

  // Bound alkali hydroxide XOH carries ½ H2O per X.
  const boundWaterG = (boundWaterMol(assemblage, elementsOf) + Object.values(boundMol).reduce((a, b) => a + b / 2, 0)) * WATER_G_PER_MOL;
  const portlanditeG = assemblage.phases.find((p) => p.id === "portlandite")?.grams ?? 0;
  let carbonatableCaMol = 0;
  for (const phase of assemblage.phases) {
    const members = phase.members ?? [{ id: phase.id, moles: phase.moles }];
    for (const member of members) {
      const elements = elementsOf(member.id);
      if (elements.C) continue; // already carbonate (calcite, monocarbonate, hemicarbonate, thaumasite)
      carbonatableCaMol += (elements.Ca ?? 0) * member.moles;
    }
  }
  const scale = (v: number) => per100gToPerM3(v, options.binderContentKgPerM3);
  const phasesKg: Record<string, number> = {};
  const volumesLitres: Record<string, number> = {};
  // per100gToPerM3 turns g per 100 g binder into kg/m³ and cm³ per 100 g into L/m³.
  for (const p of phases) phasesKg[p.id] = (phasesKg[p.id] ?? 0) + scale(p.grams);
  for (const [id, v] of Object.entries(volumes)) volumesLitres[id] = scale(v);
  return {
    ok: true,
    value: {
      temperatureC: options.temperatureC,
      assemblage,
      phases,
      volumes,
      porosity: {
        initialPasteVolumeCm3: initialVolume,
        poreSolutionVolumeCm3,
        chemicalShrinkageCm3: shrinkage,
        gelPoreVolumeCm3: poreClasses.gelPoreVolumeCm3,
        gelWaterInCshCm3: gelWaterInCarriersCm3,
        capillaryPoreVolumeCm3: poreClasses.capillaryPoreVolumeCm3,
        waterFilledAndEmptyFraction: waterFilledAndEmptyFraction(poreSolutionVolumeCm3, shrinkage, initialVolume, gelWaterInCarriersCm3),
        capillaryFraction: poreClasses.capillaryPorosityFraction,
        characteristicGelPorosity: gelPorosity,
        balance: volumeBalance(solidVolumes, poreSolutionVolumeCm3, shrinkage, initialVolume),
      },
      boundWaterG,
      portlanditeG,
      carbonatableCaMol,
      alkaliInCshMol: boundMol,
      poreSolution,
      perM3: {
        binderContentKgPerM3: options.binderContentKgPerM3,
        phasesKg,
        volumesLitres,
        portlanditeKg: scale(portlanditeG),
        boundWaterKg: scale(boundWaterG),
        // mol per 100 g binder × (B kg/m³ × 10 per 100 g) = mol/m³
        carbonatableCaMol: carbonatableCaMol * options.binderContentKgPerM3 * 10,
      },
      warnings,
    },
  };
}

const speciesIndex = new WeakMap<Dataset, ReadonlyMap<string, Dataset["species"][number]>>();

/** The data set's species by id, built once per data set (a sweep hydrates the paste hundreds of times). */
function speciesById(dataset: Dataset): ReadonlyMap<string, Dataset["species"][number]> {
  return getOrCreate(speciesIndex, dataset, () => new Map(dataset.species.map((s) => [s.id, s])));
}

type Solve = (totals: Record<string, number>, warmStart?: SerializedState) => { ok: true; value: EquilibriumResult } | { ok: false; error: EquilibriumFailure };

/**
 * Alkali uptake by C-S-H with a constant distribution ratio Rd (mL/g; Hong & Glasser 1999, as applied by
 * Lothenbach & Winnefeld 2006): bound = Rd·m(C-S-H)·c(pore solution). Each pass removes the bound alkali
 * as hydroxide (X + O + H, electroneutral) from the system and re-solves, warm-started, until the bound
 * amounts change by less than the tolerance. The pore solution is taken as 1 mL per g of water.
 *
 * Nearly dry pastes (low w/b, late ages): removing the alkali lets the hydrates take up more of the little pore
 * water, so the amount Rd asks for can leave no solution at all, while the Na still needs one. Rd's own limit as the
 * pore volume goes to zero is all the alkali bound, and that system needs no solution: when a step cannot be solved,
 * the system with all the alkali in the C-S-H is tried, and taken if it has no solution left. Otherwise the step is
 * halved towards the last computed amount, within a small budget of unsolved steps per paste (each costs hundreds of
 * ms); when the budget is spent, the last computed assemblage is kept and `limited` reports how far the uptake got,
 * rather than failing the paste. (A last step that had to be halved also counts as limited.)
 */
export function alkaliUptakeByCsh(
  totals: Record<string, number>,
  solve: Solve,
  warmStart?: SerializedState,
  startingFraction: Record<string, number> = {},
): { ok: true; value: { assemblage: EquilibriumResult; boundMol: Record<string, number>; limited: AlkaliUptakeLimit | null } } | { ok: false; error: EquilibriumFailure } {
  const ratios = alkaliUptake.distributionRatioMlPerG;
  const iterations = alkaliUptake.iterations;
  // `bound` is always the amount removed from the system that `result` was solved for.
  const withoutBound = (amounts: Record<string, number>) => {
    const reduced = { ...totals };
    for (const element of ["Na", "K"] as const) {
      if (!amounts[element]) continue;
      reduced[element] -= amounts[element];
      reduced.O -= amounts[element];
      reduced.H -= amounts[element];
    }
    return reduced;
  };
  const none = { Na: 0, K: 0 };
  let bound: Record<string, number> = { Na: (startingFraction.Na ?? 0) * (totals.Na ?? 0), K: (startingFraction.K ?? 0) * (totals.K ?? 0) };
  let result = solve(withoutBound(bound), warmStart);
  // A neighbour's fraction can be more than this paste's little water allows: start again from no uptake.
  if (!result.ok && (bound.Na > 0 || bound.K > 0)) [bound, result] = [none, solve(withoutBound(none), warmStart)];
  let wanted: Record<string, number> | null = null;
  let waterRanOut = false;
  let unsolvedSteps = 0;
  for (let pass = 0; pass < iterations.maximum && result.ok; pass++) {
    const csh = result.value.phases.find((p) => p.id === "csh");
    const solution = result.value.solution;
    if (!csh || !solution) break;
    const poreMl = solution.waterKg * 1000;
    const next: Record<string, number> = { Na: 0, K: 0 };
    let change = 0;
    for (const element of ["Na", "K"] as const) {
      const total = totals[element] ?? 0;
      if (total <= 0) continue;
      const rdTimesMass = ratios[element].value * csh.grams;
      next[element] = (total * rdTimesMass) / (poreMl + rdTimesMass);
      change = Math.max(change, Math.abs(next[element] - bound[element]) / total);
    }
    wanted = next;
    if (change < iterations.relativeTolerance) {
      waterRanOut = false;
      break;
    }
    let step = next;
    let attempt = solve(withoutBound(step), result.value.state);
    if (!attempt.ok) {
      // Rd's own limit for a paste whose water runs out: bound → all as the pore volume → 0. With all the alkali in the
      // C-S-H nothing needs a solution, so that system can be solved with none; it is the answer when it has none.
      const all = { Na: totals.Na ?? 0, K: totals.K ?? 0 };
      const dry = solve(withoutBound(all), result.value.state);
      if (dry.ok && !dry.value.solution) {
        result = dry;
        bound = all;
        waterRanOut = false;
        break;
      }
    }
    // Unsolved steps cost hundreds of ms each (the whole retry chain runs): a few per paste, shared by all passes.
    while (!attempt.ok && ++unsolvedSteps < iterations.unsolvedStepsAllowed) {
      step = { Na: (bound.Na + step.Na) / 2, K: (bound.K + step.K) / 2 };
      attempt = solve(withoutBound(step), result.value.state);
    }
    waterRanOut = step !== next || !attempt.ok;
    if (!attempt.ok) break;
    result = attempt;
    bound = step;
  }
  if (!result.ok) return result;
  let limited: AlkaliUptakeLimit | null = null;
  if (wanted && waterRanOut) {
    const total = (totals.Na ?? 0) + (totals.K ?? 0);
    const fraction = (amounts: Record<string, number>) => (total > 0 ? (amounts.Na + amounts.K) / total : 0);
    limited = { boundFraction: fraction(bound), distributionRatioFraction: fraction(wanted) };
  }
  return { ok: true, value: { assemblage: result.value, boundMol: Object.fromEntries(Object.entries(bound).filter(([, v]) => v > 0)), limited } };
}

/** How far the alkali uptake got when the pore water ran out: fractions of the reacted Na + K held in C-S-H. */
type AlkaliUptakeLimit = { boundFraction: number; distributionRatioFraction: number };
