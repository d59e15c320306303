import type { AqueousActivityModel, SpeciesAtTemperature } from "./types";
import type { EquilibriumOutcome } from "./failure";

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
  activity: AqueousActivityModel;
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
  const rt = GAS_CONSTANT_J_PER_MOL_K * input.temperatureK;
  const fixed = input.fixedPartialPressuresBar ?? {};
  const byId = new Map(input.species.map((s) => [s.id, s]));
  for (const [gasId, pressureBar] of Object.entries(fixed)) {
    const gas = byId.get(gasId);
    if (!gas || gas.phase !== "gas")
      return { ok: false, error: { code: "invalid_input", field: `fixedPartialPressuresBar.${gasId}`, message: "not a gas species of the data set" } };
    if (!(pressureBar > 0))
      return { ok: false, error: { code: "invalid_input", field: `fixedPartialPressuresBar.${gasId}`, message: "must be greater than 0 bar" } };
  }
  const waterVapourFixed = input.species.some((s) => s.id in fixed && s.phase === "gas" && s.charge === 0 && s.elements.H === 2 && s.elements.O === 1 && Object.keys(s.elements).length === 2);

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

  const kept = input.species.filter(
    (s) => Object.keys(s.elements).every((e) => available.has(e)) && !(waterVapourFixed && s.phase === "aqueous"),
  );
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
  const totals = new Float64Array(nE);
  elements.forEach((e, j) => {
    if (j !== chargeRow && available.has(e)) totals[j] = input.elementTotalsMol[e] ?? 0;
  });

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
    let g = s.gibbsJPerMol / rt;
    if (s.id in fixed) {
      phase = phaseFor(s.id, "reservoir");
      g += Math.log(fixed[s.id]);
    } else if (s.phase === "aqueous") phase = phaseFor("aqueous", "aqueous");
    else if (s.phase === "gas") {
      phase = phaseFor("gas", "gas");
      g += lnTotalPressure;
    } else if (s.solution) phase = phaseFor(s.solution, "solid-solution");
    else phase = phaseFor(s.id, "pure-solid");
    phases[phase].species.push(i);
    species.push({ id: s.id, phase, charge: s.charge, g, molarMassGPerMol: s.molarMassGPerMol, molarVolumeCm3PerMol: s.molarVolumeCm3PerMol });
    elements.forEach((e, j) => {
      stoich[i * nE + j] = j === chargeRow ? s.charge : (s.elements[e] ?? 0);
    });
    if (isWater(s)) water = i;
    if (isHydron(s)) hydron = i;
  });
  const reduced = dropDependentElements(elements, stoich, totals, kept.length);
  if (!reduced.ok) return reduced;
  const aqueous = phaseIndex.get("aqueous") ?? -1;
  if (aqueous >= 0 && water < 0)
    return { ok: false, error: { code: "infeasible_composition", element: "H", message: "aqueous species present but no H2O solvent species" } };
  return {
    ok: true,
    value: {
      temperatureK: input.temperatureK,
      elements: reduced.value.elements,
      chargeRow: reduced.value.elements.indexOf(CHARGE_ELEMENT),
      totals: reduced.value.totals,
      stoich: reduced.value.stoich,
      species,
      phases,
      aqueous,
      water,
      hydron,
      activity: input.activity,
    },
  };
}

/**
 * Removes element columns that are linear combinations of earlier ones (modified Gram–Schmidt over the
 * species dimension, charge last). Without redox species the charge balance is always such a combination
 * (charge = Σ valence × element), and keeping it would make the Newton matrix singular. The totals must
 * obey the same combination, otherwise the composition is not electroneutral and is rejected.
 */
function dropDependentElements(
  elements: string[],
  stoich: Float64Array,
  totals: Float64Array,
  nS: number,
): EquilibriumOutcome<{ elements: string[]; stoich: Float64Array; totals: Float64Array }> {
  const nE = elements.length;
  const basis: Float64Array[] = []; // orthonormal columns
  const basisCoefficients: Float64Array[] = []; // each basis vector in terms of the kept columns
  const keep: number[] = [];
  for (let j = 0; j < nE; j++) {
    const v = new Float64Array(nS);
    for (let i = 0; i < nS; i++) v[i] = stoich[i * nE + j];
    const norm0 = Math.hypot(...v);
    const coefficients = new Float64Array(nE); // v = column_j − Σ c_k column_keep[k]
    coefficients[j] = 1;
    for (let k = 0; k < basis.length; k++) {
      let d = 0;
      for (let i = 0; i < nS; i++) d += basis[k][i] * v[i];
      for (let i = 0; i < nS; i++) v[i] -= d * basis[k][i];
      for (let q = 0; q < nE; q++) coefficients[q] -= d * basisCoefficients[k][q];
    }
    const norm = Math.hypot(...v);
    if (norm0 === 0 || norm <= 1e-9 * norm0) {
      // column_j = Σ (−coefficients[q]) column_q over kept q: check the totals obey it.
      let implied = 0;
      let scale = Math.abs(totals[j]);
      for (const q of keep) {
        implied -= coefficients[q] * totals[q];
        scale = Math.max(scale, Math.abs(coefficients[q] * totals[q]));
      }
      if (Math.abs(totals[j] - implied) > 1e-9 * Math.max(scale, 1e-12))
        return {
          ok: false,
          error: {
            code: "infeasible_composition",
            element: elements[j],
            message:
              elements[j] === CHARGE_ELEMENT
                ? `the components are not electroneutral (net charge ${implied.toExponential(3)} mol of the oxidation-state balance)`
                : `the total of ${elements[j]} is inconsistent with the species that carry it`,
          },
        };
      continue;
    }
    for (let i = 0; i < nS; i++) v[i] /= norm;
    for (let q = 0; q < nE; q++) coefficients[q] /= norm;
    basis.push(v);
    basisCoefficients.push(coefficients);
    keep.push(j);
  }
  if (keep.length === nE) return { ok: true, value: { elements, stoich, totals } };
  const kE = keep.length;
  const reducedStoich = new Float64Array(nS * kE);
  for (let i = 0; i < nS; i++) keep.forEach((j, k) => (reducedStoich[i * kE + k] = stoich[i * nE + j]));
  return { ok: true, value: { elements: keep.map((j) => elements[j]), stoich: reducedStoich, totals: Float64Array.from(keep, (j) => totals[j]) } };
}
