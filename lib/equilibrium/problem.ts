import type { AqueousActivityModel, SoluteActivityTerms, SpeciesAtTemperature } from "./types";
import type { EquilibriumOutcome } from "./failure";
import { getOrCreate } from "../memo/get-or-create";

/** Molar gas constant, J/(mol·K) (CODATA 2018, exact). */
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;
/** Molar mass of water, kg/mol, from IUPAC 2021 standard atomic weights (H 1.008, O 15.999). */
export const WATER_MOLAR_MASS_KG_PER_MOL = 0.018015;
/**
 * Element totals below this fraction of the largest total are treated as absent: 25 orders of magnitude
 * is beyond any analytical meaning and keeps every species amount inside double precision.
 */
export const TRACE_CUTOFF_RELATIVE = 1e-25;
/** Name of the pseudo-element that carries the charge balance. */
export const CHARGE_ELEMENT = "charge";

export type PhaseKind = "aqueous" | "gas" | "solid-solution" | "pure-solid" | "reservoir";

export type ProblemPhase = {
  id: string;
  kind: PhaseKind;
  species: number[];
  /** Kinetically hindered: never allowed to form, but its saturation index is reported. */
  suppressed: boolean;
};

export type ProblemSpecies = {
  id: string;
  phase: number;
  charge: number;
  /** μ°/RT (dimensionless); for a fixed-pressure gas, μ°/RT + ln(p / 1 bar). */
  g: number;
  molarMassGPerMol: number;
  molarVolumeCm3PerMol?: number;
};

/** The indexed, temperature-fixed problem the minimiser works on. */
export type EquilibriumProblem = {
  temperatureK: number;
  elements: string[];
  chargeRow: number;
  totals: Float64Array;
  /** Row-major species × elements stoichiometry. */
  stoich: Float64Array;
  species: ProblemSpecies[];
  phases: ProblemPhase[];
  aqueous: number;
  water: number;
  /** Species index of H+, for pH. */
  hydron: number;
  /** Per species, the element columns with a non-zero coefficient (most species have three or four). */
  nonZero: Int32Array[];
  activity: AqueousActivityModel;
  /** Per species, the index of its activity class in `activityTerms` (solutes sharing a parameter key share it); −1 for non-solutes. */
  activityClass: Int32Array;
  /** Per activity class, [ln γ, d ln γ/dI, c, dc/dI] as a function of I (the model's `soluteTerms`). */
  activityTerms: ((ionicStrengthMolPerKg: number) => SoluteActivityTerms)[];
};

export type ProblemInput = {
  temperatureK: number;
  species: SpeciesAtTemperature[];
  elementTotalsMol: Record<string, number>;
  /** Gas species id → fixed partial pressure (bar): an open system in contact with a reservoir. */
  fixedPartialPressuresBar?: Record<string, number>;
  suppressedPhases?: string[];
  activity: AqueousActivityModel;
  /** Total pressure of a closed gas phase, bar (default 1). */
  totalPressureBar?: number;
};

const isWater = (s: SpeciesAtTemperature) =>
  s.phase === "aqueous" && s.charge === 0 && Object.keys(s.elements).length === 2 && s.elements.H === 2 && s.elements.O === 1;
const isHydron = (s: SpeciesAtTemperature) =>
  s.phase === "aqueous" && s.charge === 1 && Object.keys(s.elements).length === 1 && s.elements.H === 1;

/**
 * Builds the indexed problem: keeps the species whose elements are all present (in the totals or in a
 * fixed-pressure gas), groups them into phases (one aqueous solution, one ideal gas, one phase per solid
 * solution, one per pure solid, one reservoir per fixed-pressure gas) and turns standard Gibbs energies
 * into μ°/RT. A fixed water-vapour pressure removes the liquid phase: the system is then solid–gas.
 */
export function buildProblem(input: ProblemInput): EquilibriumOutcome<EquilibriumProblem> {
  const fixed = input.fixedPartialPressuresBar ?? {};
  // The id index is needed only for fixed-pressure gases (most calls have none).
  const byId = Object.keys(fixed).length > 0 ? new Map(input.species.map((s) => [s.id, s])) : new Map<string, SpeciesAtTemperature>();
  for (const [gasId, pressureBar] of Object.entries(fixed)) {
    const gas = byId.get(gasId);
    if (!gas || gas.phase !== "gas")
      return { ok: false, error: { code: "invalid_input", field: `fixedPartialPressuresBar.${gasId}`, message: "not a gas species of the data set" } };
    if (!(pressureBar > 0))
      return { ok: false, error: { code: "invalid_input", field: `fixedPartialPressuresBar.${gasId}`, message: "must be greater than 0 bar" } };
  }
  const waterVapourFixed = byId.size > 0 && input.species.some((s) => s.id in fixed && s.phase === "gas" && s.charge === 0 && s.elements.H === 2 && s.elements.O === 1 && Object.keys(s.elements).length === 2);

  const available = new Set<string>();
  let largestTotal = 0;
  for (const [element, amount] of Object.entries(input.elementTotalsMol)) {
    if (!(amount >= 0) || !Number.isFinite(amount))
      return { ok: false, error: { code: "invalid_input", field: `elements.${element}`, message: "amount must be a finite number ≥ 0 mol" } };
    largestTotal = Math.max(largestTotal, amount);
  }
  for (const [element, amount] of Object.entries(input.elementTotalsMol)) {
    if (amount > TRACE_CUTOFF_RELATIVE * largestTotal) available.add(element);
  }
  for (const gasId of Object.keys(fixed)) for (const e of Object.keys(byId.get(gasId)!.elements)) available.add(e);

  const suppressedList = [...(input.suppressedPhases ?? [])].sort();
  const key = [
    [...available].sort().join(","),
    Object.entries(fixed).sort().map(([k, v]) => `${k}=${v}`).join(","),
    suppressedList.join(","),
    input.totalPressureBar ?? 1,
  ].join("|");
  let templates = templateCache.get(input.species);
  if (!templates) {
    templates = new Map();
    templateCache.set(input.species, templates);
  }
  let template = templates.get(key);
  if (!template) {
    // The same species list at another temperature (or a Monte Carlo sample of it) has the same structure: reuse it
    // and evaluate only μ°/RT.
    const structureKey = `${speciesStructure(input.species)}#${key}`;
    const structure = structureCache.get(structureKey);
    if (structure) template = atTemperature(structure, input);
    else {
      const built = buildTemplate(input, available, fixed, waterVapourFixed);
      if (!built.ok) return built;
      template = built.value;
      if (structureCache.size > 256) structureCache.clear();
      structureCache.set(structureKey, template);
    }
    if (templates.size > 256) templates.clear();
    templates.set(key, template);
  }
  // Totals of the full element list, then the check that dropped (dependent) columns are obeyed.
  const fullTotals = template.fullElements.map((e, j) => (j === template!.fullChargeRow || !available.has(e) ? 0 : (input.elementTotalsMol[e] ?? 0)));
  for (const { column, coefficients } of template.dependent) {
    let implied = 0;
    let scale = Math.abs(fullTotals[column]);
    template.keep.forEach((q) => {
      implied -= coefficients[q] * fullTotals[q];
      scale = Math.max(scale, Math.abs(coefficients[q] * fullTotals[q]));
    });
    if (Math.abs(fullTotals[column] - implied) > 1e-9 * Math.max(scale, 1e-12)) {
      const element = template.fullElements[column];
      return {
        ok: false,
        error: {
          code: "infeasible_composition",
          element,
          message:
            element === CHARGE_ELEMENT
              ? `the components are not electroneutral (net charge ${implied.toExponential(3)} mol of the oxidation-state balance)`
              : `the total of ${element} is inconsistent with the species that carry it`,
        },
      };
    }
  }
  const totals = new Float64Array(template.keep.length);
  for (let k = 0; k < totals.length; k++) totals[k] = fullTotals[template.keep[k]];
  return {
    ok: true,
    value: {
      ...template.problem,
      totals,
      activity: input.activity,
      ...activityClasses(template.problem, input.activity),
    },
  };
}

type ActivityClasses = Pick<EquilibriumProblem, "activityClass" | "activityTerms">;
/** Activity classes by species list (one per template) and activity model: both are reused across calls. */
const activityClassCache = new WeakMap<readonly ProblemSpecies[], WeakMap<AqueousActivityModel, ActivityClasses>>();

/** Groups the solutes by the activity model's parameter key and resolves each class's terms once. */
function activityClasses(problem: Pick<EquilibriumProblem, "species" | "aqueous" | "water">, activity: AqueousActivityModel): ActivityClasses {
  const byModel = getOrCreate(activityClassCache, problem.species, () => new WeakMap<AqueousActivityModel, ActivityClasses>());
  return getOrCreate(byModel, activity, () => groupActivityClasses(problem, activity));
}

function groupActivityClasses(problem: Pick<EquilibriumProblem, "species" | "aqueous" | "water">, activity: AqueousActivityModel): ActivityClasses {
  const activityClass = new Int32Array(problem.species.length).fill(-1);
  const activityTerms: EquilibriumProblem["activityTerms"] = [];
  const byKey = new Map<string, number>();
  problem.species.forEach((s, i) => {
    if (s.phase !== problem.aqueous || i === problem.water) return;
    const key = activity.parameterKey(s.id, s.charge);
    let index = byKey.get(key);
    if (index === undefined) {
      index = activityTerms.length;
      byKey.set(key, index);
      activityTerms.push(activity.soluteTerms(s.id, s.charge));
    }
    activityClass[i] = index;
  });
  return { activityClass, activityTerms };
}

type ProblemTemplate = {
  problem: Omit<EquilibriumProblem, "totals" | "activity" | "activityClass" | "activityTerms">;
  fullElements: string[];
  fullChargeRow: number;
  keep: number[];
  dependent: { column: number; coefficients: Float64Array }[];
  /** Per problem species, its index in the input list and the constant added to G/RT (ln p of a reservoir, ln P of a gas). */
  inputIndex: Int32Array;
  gOffset: Float64Array;
};

/** Structural part of a problem (species, phases, reduced stoichiometry), reused while only totals change. */
const templateCache = new WeakMap<readonly SpeciesAtTemperature[], Map<string, ProblemTemplate>>();
/** Templates by species structure (everything but G) and key: shared by the temperatures and samples of one data set. */
const structureCache = new Map<string, ProblemTemplate>();
const structureOf = new WeakMap<readonly SpeciesAtTemperature[], string>();

/** A string that is equal for two species lists exactly when they differ at most in their Gibbs energies. */
function speciesStructure(species: readonly SpeciesAtTemperature[]): string {
  let signature = structureOf.get(species);
  if (signature === undefined) {
    signature = species
      .map((s) => `${s.id};${s.phase};${s.solution ?? ""};${s.charge};${Object.entries(s.elements).map(([e, n]) => `${e}${n}`).join(",")};${s.molarMassGPerMol};${s.molarVolumeCm3PerMol ?? ""}`)
      .join("\n");
    structureOf.set(species, signature);
  }
  return signature;
}

/** A structural template with the μ°/RT of another species list of the same structure, at its temperature. */
function atTemperature(template: ProblemTemplate, input: ProblemInput): ProblemTemplate {
  const rt = GAS_CONSTANT_J_PER_MOL_K * input.temperatureK;
  const species = template.problem.species.map((sp, i) => ({ ...sp, g: input.species[template.inputIndex[i]].gibbsJPerMol / rt + template.gOffset[i] }));
  return { ...template, problem: { ...template.problem, temperatureK: input.temperatureK, species } };
}

function buildTemplate(
  input: ProblemInput,
  available: Set<string>,
  fixed: Record<string, number>,
  waterVapourFixed: boolean,
): EquilibriumOutcome<ProblemTemplate> {
  const rt = GAS_CONSTANT_J_PER_MOL_K * input.temperatureK;
  const inputIndices: number[] = [];
  const kept = input.species.filter((s, index) => {
    const keepIt = Object.keys(s.elements).every((e) => available.has(e)) && !(waterVapourFixed && s.phase === "aqueous");
    if (keepIt) inputIndices.push(index);
    return keepIt;
  });
  const gOffset = new Float64Array(kept.length);
  const elementSet = new Set<string>();
  for (const s of kept) for (const [e, v] of Object.entries(s.elements)) if (v !== 0) elementSet.add(e);
  for (const element of available) {
    if (!elementSet.has(element))
      return { ok: false, error: { code: "infeasible_composition", element, message: `no species of the data set contains ${element}` } };
  }
  const elements = [...elementSet].sort();
  const hasCharge = kept.some((s) => s.charge !== 0);
  if (hasCharge) elements.push(CHARGE_ELEMENT);
  const chargeRow = hasCharge ? elements.length - 1 : -1;
  const nE = elements.length;

  const suppressed = new Set(input.suppressedPhases ?? []);
  const phases: ProblemPhase[] = [];
  const phaseIndex = new Map<string, number>();
  const phaseFor = (id: string, kind: PhaseKind): number => {
    let index = phaseIndex.get(id);
    if (index === undefined) {
      index = phases.length;
      phases.push({ id, kind, species: [], suppressed: suppressed.has(id) });
      phaseIndex.set(id, index);
    }
    return index;
  };
  const lnTotalPressure = Math.log(input.totalPressureBar ?? 1);
  const species: ProblemSpecies[] = [];
  const stoich = new Float64Array(kept.length * nE);
  let water = -1;
  let hydron = -1;
  kept.forEach((s, i) => {
    let phase: number;
    if (s.id in fixed) {
      phase = phaseFor(s.id, "reservoir");
      gOffset[i] = Math.log(fixed[s.id]);
    } else if (s.phase === "aqueous") phase = phaseFor("aqueous", "aqueous");
    else if (s.phase === "gas") {
      phase = phaseFor("gas", "gas");
      gOffset[i] = lnTotalPressure;
    } else if (s.solution) phase = phaseFor(s.solution, "solid-solution");
    else phase = phaseFor(s.id, "pure-solid");
    const g = s.gibbsJPerMol / rt + gOffset[i];
    phases[phase].species.push(i);
    species.push({ id: s.id, phase, charge: s.charge, g, molarMassGPerMol: s.molarMassGPerMol, molarVolumeCm3PerMol: s.molarVolumeCm3PerMol });
    for (let j = 0; j < nE; j++) stoich[i * nE + j] = j === chargeRow ? s.charge : (s.elements[elements[j]] ?? 0);
    if (isWater(s)) water = i;
    if (isHydron(s)) hydron = i;
  });
  const aqueous = phaseIndex.get("aqueous") ?? -1;
  if (aqueous >= 0 && water < 0)
    return { ok: false, error: { code: "infeasible_composition", element: "H", message: "aqueous species present but no H2O solvent species" } };
  const { keep, dependent } = independentElementColumns(stoich, nE, kept.length);
  const kE = keep.length;
  const reducedStoich = new Float64Array(kept.length * kE);
  for (let i = 0; i < kept.length; i++) keep.forEach((j, k) => (reducedStoich[i * kE + k] = stoich[i * nE + j]));
  const reducedElements = keep.map((j) => elements[j]);
  const nonZero = species.map((_, i) => {
    const columns: number[] = [];
    for (let k = 0; k < kE; k++) if (reducedStoich[i * kE + k] !== 0) columns.push(k);
    return Int32Array.from(columns);
  });
  return {
    ok: true,
    value: {
      problem: {
        temperatureK: input.temperatureK,
        elements: reducedElements,
        chargeRow: reducedElements.indexOf(CHARGE_ELEMENT),
        stoich: reducedStoich,
        nonZero,
        species,
        phases,
        aqueous,
        water,
        hydron,
      },
      fullElements: elements,
      fullChargeRow: chargeRow,
      keep,
      dependent,
      inputIndex: Int32Array.from(inputIndices),
      gOffset,
    },
  };
}

/**
 * Element columns that are not linear combinations of earlier ones (modified Gram–Schmidt over the species
 * dimension, charge last), and for each dropped column its combination of the kept ones. Without redox
 * species the charge balance is always such a combination (charge = Σ valence × element): keeping it
 * would make the Newton matrix singular. The totals must obey the same combination (checked per call),
 * otherwise the composition is not electroneutral.
 */
function independentElementColumns(
  stoich: Float64Array,
  nE: number,
  nS: number,
): { keep: number[]; dependent: { column: number; coefficients: Float64Array }[] } {
  const basis: Float64Array[] = [];
  const basisCoefficients: Float64Array[] = [];
  const keep: number[] = [];
  const dependent: { column: number; coefficients: Float64Array }[] = [];
  const norm = (v: Float64Array) => {
    let sum = 0;
    for (const x of v) sum += x * x;
    return Math.sqrt(sum);
  };
  for (let j = 0; j < nE; j++) {
    const v = new Float64Array(nS);
    for (let i = 0; i < nS; i++) v[i] = stoich[i * nE + j];
    const norm0 = norm(v);
    const coefficients = new Float64Array(nE); // v = column_j − Σ c_q column_q
    coefficients[j] = 1;
    for (let k = 0; k < basis.length; k++) {
      let d = 0;
      for (let i = 0; i < nS; i++) d += basis[k][i] * v[i];
      for (let i = 0; i < nS; i++) v[i] -= d * basis[k][i];
      for (let q = 0; q < nE; q++) coefficients[q] -= d * basisCoefficients[k][q];
    }
    const remaining = norm(v);
    if (norm0 === 0 || remaining <= 1e-9 * norm0) {
      // column_j = Σ_q (−coefficients[q]) column_q over the kept q.
      dependent.push({ column: j, coefficients });
      continue;
    }
    for (let i = 0; i < nS; i++) v[i] /= remaining;
    for (let q = 0; q < nE; q++) coefficients[q] /= remaining;
    basis.push(v);
    basisCoefficients.push(coefficients);
    keep.push(j);
  }
  return { keep, dependent };
}
