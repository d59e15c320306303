import { evaluateAqueous, memberTerms, type AqueousEvaluation, type SolverState } from "./newton";
import { phaseSaturationIndex } from "./minimise";
import { CHARGE_ELEMENT, GAS_CONSTANT_J_PER_MOL_K, WATER_MOLAR_MASS_KG_PER_MOL, type EquilibriumProblem } from "./problem";

export type StablePhase = {
  id: string;
  kind: "pure-solid" | "solid-solution" | "gas";
  moles: number;
  grams: number;
  volumeCm3: number;
  /** Members of a solid solution or gas: moles and mole fraction. */
  members?: { id: string; moles: number; moleFraction: number }[];
};

export type SolutionSpecies = { name: string; molality: number; activity: number };

export type EquilibriumResult = {
  converged: true;
  temperatureC: number;
  pH: number | null;
  ionicStrength: number | null;
  phases: StablePhase[];
  /** Phase id → log10 Ω for every solid phase (pure or solid solution) of the problem, suppressed ones included. */
  saturationIndices: Record<string, number>;
  solution: {
    waterKg: number;
    waterActivity: number;
    /** Dissolved totals per kg of water; H and O exclude the solvent. */
    elementMolality: Record<string, number>;
    species: SolutionSpecies[];
  } | null;
  /** Moles taken up from each fixed-pressure gas reservoir (negative: released to it). */
  gasUptakeMol: Record<string, number>;
  /** Element potentials μ_j, J/mol; `charge` is the potential conjugate to the charge balance. */
  elementPotentials: Record<string, number>;
  /** Total Gibbs energy of the system, Σ_j b_j μ_j, J (reservoir exchange excluded). */
  gibbsEnergyJ: number;
  iterations: number;
  phaseChanges: number;
  warmStarted: boolean;
  /** The phase search ended near an invariant point: absent phases may be supersaturated by up to 0.01 (log10). */
  nearInvariant: boolean;
  /** Largest |Σ a_ij n_i − b_j| / b_j over the elements. */
  massBalanceResidual: number;
  units: { elementPotentials: "J/mol"; molality: "mol/kg"; volumeCm3: "cm3"; grams: "g" };
  /** The solver state, to warm-start a neighbouring calculation. */
  state: SerializedState;
};

export type SerializedState = {
  elements: string[];
  phases: string[];
  /** Element potentials μ_j/RT at `temperatureK`. */
  lambda: number[];
  amount: number[];
  active: number[];
  lnIonicStrength: number;
  /** Temperature of the state, K (states saved before it was recorded lack it). */
  temperatureK?: number;
};

export function serializeState(p: EquilibriumProblem, s: SolverState): SerializedState {
  return {
    elements: [...p.elements],
    phases: p.phases.map((phase) => phase.id),
    lambda: plainArray(s.lambda),
    amount: plainArray(s.amount),
    active: plainArray(s.active),
    lnIonicStrength: s.lnIonicStrength,
    temperatureK: p.temperatureK,
  };
}

/** A typed array as a plain array (JSON-ready), by a loop: `Array.from` is several times slower on typed arrays. */
function plainArray(values: Float64Array | Uint8Array): number[] {
  const out = new Array<number>(values.length);
  for (let i = 0; i < values.length; i++) out[i] = values[i];
  return out;
}

/**
 * Maps a serialized state onto a (possibly different) problem by element and phase names. A state saved at
 * another temperature keeps its element potentials in J/mol (λ scaled by T_saved/T): the potentials change far
 * less with temperature than μ/RT does, since μ°/RT of a hydrate of ΔfG° ≈ −15 MJ/mol moves by about 200 units
 * between 20 and 10 °C, and unscaled λ would start Newton's method with species amounts off by as many e-folds.
 */
export function deserializeState(p: EquilibriumProblem, saved: SerializedState): SolverState | undefined {
  const lambda = new Float64Array(p.elements.length);
  const scale = saved.temperatureK !== undefined && saved.temperatureK > 0 ? saved.temperatureK / p.temperatureK : 1;
  for (let j = 0; j < p.elements.length; j++) {
    const at = saved.elements[j] === p.elements[j] ? j : saved.elements.indexOf(p.elements[j]);
    if (at < 0) return undefined;
    lambda[j] = saved.lambda[at] * scale;
  }
  const amount = new Float64Array(p.phases.length);
  const active = new Uint8Array(p.phases.length);
  p.phases.forEach((phase, k) => {
    // Phase ids are unique: a state saved from a problem of the same structure has them at the same positions.
    const at = saved.phases[k] === phase.id ? k : saved.phases.indexOf(phase.id);
    if (at >= 0) {
      amount[k] = saved.amount[at];
      active[k] = saved.active[at] && !phase.suppressed ? 1 : 0;
    } else if (phase.kind === "reservoir") active[k] = 1;
  });
  return { lambda, amount, active, lnIonicStrength: Number.isFinite(saved.lnIonicStrength) ? saved.lnIonicStrength : Math.log(1e-3) };
}

/** Species amounts (mol) of the equilibrium state, per problem species. */
export function speciesAmounts(p: EquilibriumProblem, s: SolverState, evaluated?: AqueousEvaluation): Float64Array {
  const n = new Float64Array(p.species.length);
  const aq = p.aqueous >= 0 && s.active[p.aqueous] ? (evaluated ?? evaluateAqueous(p, s.lambda, s.lnIonicStrength)) : undefined;
  p.phases.forEach((phase, k) => {
    if (!s.active[k]) return;
    if (phase.kind === "aqueous") {
      for (const i of phase.species) n[i] = i === p.water ? s.amount[k] / WATER_MOLAR_MASS_KG_PER_MOL : s.amount[k] * aq!.molality[i];
    } else if (phase.kind === "solid-solution" || phase.kind === "gas") {
      const y = memberTerms(p, k, s.lambda);
      let sum = 0;
      for (const v of y) sum += v;
      phase.species.forEach((i, q) => (n[i] = (s.amount[k] * y[q]) / sum));
    } else n[phase.species[0]] = s.amount[k];
  });
  return n;
}

/** Largest relative element-balance residual of a state (reservoir exchange counted). */
export function balanceResidual(p: EquilibriumProblem, n: Float64Array): number {
  const nE = p.elements.length;
  const sum = new Float64Array(nE);
  const scale = new Float64Array(nE);
  // Species in order for every element, zero coefficients skipped (they add nothing).
  for (let i = 0; i < p.species.length; i++) {
    const nz = p.nonZero[i];
    for (let x = 0; x < nz.length; x++) {
      const j = nz[x];
      const term = p.stoich[i * nE + j] * n[i];
      sum[j] += term;
      scale[j] += Math.abs(term);
    }
  }
  let worst = 0;
  for (let j = 0; j < nE; j++) {
    const denominator = Math.max(p.totals[j], scale[j], 1e-300);
    worst = Math.max(worst, Math.abs(sum[j] - p.totals[j]) / denominator);
  }
  return worst;
}

export function buildResult(
  p: EquilibriumProblem,
  s: SolverState,
  meta: { iterations: number; phaseChanges: number; warmStarted: boolean; nearInvariant?: boolean },
): EquilibriumResult {
  const rt = GAS_CONSTANT_J_PER_MOL_K * p.temperatureK;
  // The solution is evaluated once, for the species amounts and the solution report alike.
  const aqueous = p.aqueous >= 0 && s.active[p.aqueous] ? evaluateAqueous(p, s.lambda, s.lnIonicStrength) : undefined;
  const n = speciesAmounts(p, s, aqueous);
  const phases: StablePhase[] = [];
  const saturationIndices: Record<string, number> = {};
  const gasUptakeMol: Record<string, number> = {};
  p.phases.forEach((phase, k) => {
    if (phase.kind === "pure-solid" || phase.kind === "solid-solution") {
      saturationIndices[phase.id] = s.active[k] ? 0 : phaseSaturationIndex(p, s, k);
    }
    if (phase.kind === "reservoir") {
      gasUptakeMol[phase.id] = -s.amount[k];
      return;
    }
    if (phase.kind === "aqueous" || !s.active[k] || !(s.amount[k] > 0)) return;
    let grams = 0;
    let volumeCm3 = 0;
    for (const i of phase.species) {
      grams += n[i] * p.species[i].molarMassGPerMol;
      volumeCm3 += n[i] * (p.species[i].molarVolumeCm3PerMol ?? 0);
    }
    const stable: StablePhase = { id: phase.id, kind: phase.kind, moles: s.amount[k], grams, volumeCm3 };
    if (phase.kind !== "pure-solid")
      stable.members = phase.species.map((i) => ({ id: p.species[i].id, moles: n[i], moleFraction: n[i] / s.amount[k] }));
    phases.push(stable);
  });

  let solution: EquilibriumResult["solution"] = null;
  let pH: number | null = null;
  let ionicStrength: number | null = null;
  if (aqueous) {
    const aq = aqueous;
    const nE = p.elements.length;
    // Sums per element index, species in order, and the elements in the order first met (the report's key order).
    const sums = new Float64Array(nE);
    const firstMet: number[] = [];
    const met = new Uint8Array(nE);
    const species: SolutionSpecies[] = [];
    for (const i of p.phases[p.aqueous].species) {
      if (i === p.water) {
        species.push({ name: p.species[i].id, molality: 1 / WATER_MOLAR_MASS_KG_PER_MOL, activity: Math.exp(aq.lnWaterActivity) });
        continue;
      }
      const m = aq.molality[i];
      species.push({ name: p.species[i].id, molality: m, activity: m * Math.exp(aq.lnGamma[i]) });
      const nz = p.nonZero[i];
      for (let x = 0; x < nz.length; x++) {
        const j = nz[x];
        if (j === p.chargeRow) continue;
        sums[j] += p.stoich[i * nE + j] * m;
        if (!met[j]) {
          met[j] = 1;
          firstMet.push(j);
        }
      }
    }
    const elementMolality: Record<string, number> = {};
    for (const j of firstMet) elementMolality[p.elements[j]] = sums[j];
    species.sort((x, y) => y.molality - x.molality);
    solution = { waterKg: s.amount[p.aqueous], waterActivity: Math.exp(aq.lnWaterActivity), elementMolality, species };
    ionicStrength = aq.ionicStrength;
    if (p.hydron >= 0) pH = -Math.log10(aq.molality[p.hydron] * Math.exp(aq.lnGamma[p.hydron]));
  }
  const elementPotentials: Record<string, number> = {};
  let gibbsOverRT = 0;
  p.elements.forEach((e, j) => {
    elementPotentials[e === CHARGE_ELEMENT ? "charge" : e] = s.lambda[j] * rt;
    gibbsOverRT += p.totals[j] * s.lambda[j];
  });
  return {
    converged: true,
    temperatureC: p.temperatureK - 273.15,
    pH,
    ionicStrength,
    phases,
    saturationIndices,
    solution,
    gasUptakeMol,
    elementPotentials,
    gibbsEnergyJ: gibbsOverRT * rt,
    iterations: meta.iterations,
    phaseChanges: meta.phaseChanges,
    warmStarted: meta.warmStarted,
    nearInvariant: meta.nearInvariant ?? false,
    massBalanceResidual: balanceResidual(p, n),
    units: { elementPotentials: "J/mol", molality: "mol/kg", volumeCm3: "cm3", grams: "g" },
    state: serializeState(p, s),
  };
}
