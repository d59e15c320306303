import { solveInPlace } from "./dense-lu";
import { WATER_MOLAR_MASS_KG_PER_MOL, type EquilibriumProblem } from "./problem";
import type { SoluteActivityTerms } from "./types";
import { getOrCreate } from "../memo/get-or-create";

/**
 * The state of the element-potential formulation (Gordon & McBride 1994, NASA RP-1311, ch. 2; Smith &
 * Missen 1982, Chemical Reaction Equilibrium Analysis, ch. 6): dimensionless element potentials
 * λ_j = μ_j/RT, the amount of each phase and which phases are present.
 *
 * Phase amounts: aqueous → kg of water W; solid solution or gas → total moles N; pure solid → moles;
 * reservoir (fixed-pressure gas) → moles taken up from the reservoir (either sign).
 * Species amounts follow from these at equilibrium:
 *   aqueous solute   n_i = W·m_i,  m_i = exp(a_i·λ − g_i − ln γ_i(I))
 *   water            n_w = W / M_w
 *   solution member  n_i = N·exp(a_i·λ − g_i)
 * and the unknowns are solved by Newton's method on
 *   element balances    Σ_i a_ij n_i − b_j = 0
 *   ionic strength      ln I − ln(½ Σ z_i² m_i) = 0
 *   each present phase  pure: a_k·λ − g_k = 0; solution: ln Σ_i exp(a_i·λ − g_i) = 0;
 *                       aqueous: a_w·λ − g_w − ln a_w = 0; reservoir: a_r·λ − g_r − ln p_r = 0.
 * Activity coefficients enter through I with their exact derivatives, so convergence is quadratic.
 */
export type SolverState = {
  lambda: Float64Array;
  amount: Float64Array;
  active: Uint8Array;
  lnIonicStrength: number;
};

export function cloneState(s: SolverState): SolverState {
  return { lambda: s.lambda.slice(), amount: s.amount.slice(), active: s.active.slice(), lnIonicStrength: s.lnIonicStrength };
}

const MAX_EXPONENT = 600;
const safeExp = (x: number) => Math.exp(x > MAX_EXPONENT ? MAX_EXPONENT : x);

/** Aqueous quantities at the current λ and ionic strength. */
export type AqueousEvaluation = {
  ionicStrength: number;
  molality: Float64Array; // per problem species (0 for non-solutes)
  lnGamma: Float64Array;
  /** d ln γ_i / d I */
  dLnGammaDI: Float64Array;
  totalMolality: number;
  chargedMolality: number;
  lnWaterActivity: number;
  /** Per solute, ∂ ln a_w / ∂ m_i = −M_w c_i(I) (0 for non-solutes). */
  dLnAwDMolality: Float64Array;
  /** ∂ ln a_w / ∂ I at fixed molalities. */
  dLnAwDI: number;
};

export function evaluateAqueous(
  p: EquilibriumProblem,
  lambda: Float64Array,
  lnIonicStrength: number,
  into?: AqueousEvaluation,
): AqueousEvaluation {
  const nS = p.species.length;
  const nE = p.elements.length;
  const st = p.stoich;
  const molality = into ? into.molality.fill(0) : new Float64Array(nS);
  const lnGamma = into ? into.lnGamma.fill(0) : new Float64Array(nS);
  const dLnGammaDI = into ? into.dLnGammaDI.fill(0) : new Float64Array(nS);
  const dLnAwDMolality = into ? into.dLnAwDMolality.fill(0) : new Float64Array(nS);
  const ionicStrength = Math.exp(lnIonicStrength);
  let totalMolality = 0;
  let chargedMolality = 0;
  let sumMC = 0;
  let sumMDc = 0;
  const classTerms: (SoluteActivityTerms | undefined)[] = new Array(p.activityTerms.length);
  if (p.aqueous >= 0) {
    const members = p.phases[p.aqueous].species;
    for (let q = 0; q < members.length; q++) {
      const i = members[q];
      if (i === p.water) continue;
      const species = p.species[i];
      const k = p.activityClass[i];
      const terms = classTerms[k] ?? (classTerms[k] = p.activityTerms[k](ionicStrength));
      const lg = terms[0];
      const c = terms[2];
      // Zero stoichiometric coefficients are skipped: adding 0·λ_j would not change the sum.
      let t = -species.g - lg;
      const nz = p.nonZero[i];
      for (let x = 0; x < nz.length; x++) t += st[i * nE + nz[x]] * lambda[nz[x]];
      const m = safeExp(t);
      molality[i] = m;
      lnGamma[i] = lg;
      dLnGammaDI[i] = terms[1];
      dLnAwDMolality[i] = -WATER_MOLAR_MASS_KG_PER_MOL * c;
      sumMC += m * c;
      sumMDc += m * terms[3];
      totalMolality += m;
      if (species.charge !== 0) chargedMolality += m;
    }
  }
  const lnWaterActivity = -WATER_MOLAR_MASS_KG_PER_MOL * sumMC;
  const dLnAwDI = -WATER_MOLAR_MASS_KG_PER_MOL * sumMDc;
  if (into) {
    into.ionicStrength = ionicStrength;
    into.totalMolality = totalMolality;
    into.chargedMolality = chargedMolality;
    into.lnWaterActivity = lnWaterActivity;
    into.dLnAwDI = dLnAwDI;
    return into;
  }
  return { ionicStrength, molality, lnGamma, dLnGammaDI, totalMolality, chargedMolality, lnWaterActivity, dLnAwDMolality, dLnAwDI };
}

/** exp(a_i·λ − g_i) for the members of a solid solution or gas phase. */
export function memberTerms(p: EquilibriumProblem, phase: number, lambda: Float64Array): Float64Array {
  const members = p.phases[phase].species;
  const y = new Float64Array(members.length);
  for (let k = 0; k < members.length; k++) y[k] = safeExp(speciesAffinity(p, members[k], lambda));
  return y;
}

/** a_i·λ − g_i of a species (its affinity of formation from the element potentials, in RT units). */
export function speciesAffinity(p: EquilibriumProblem, i: number, lambda: Float64Array): number {
  const nE = p.elements.length;
  const nz = p.nonZero[i];
  let t = -p.species[i].g;
  for (let x = 0; x < nz.length; x++) t += p.stoich[i * nE + nz[x]] * lambda[nz[x]];
  return t;
}

export type NewtonOutcome = {
  converged: boolean;
  iterations: number;
  /** Largest relative element-balance residual. */
  balanceResidual: number;
  /** Largest phase-condition residual (RT units). */
  conditionResidual: number;
  singular: boolean;
  /** An element with a non-zero total carried by no present phase. */
  unsupportedElement?: number;
};

type Assembly = {
  matrix: Float64Array;
  rhs: Float64Array;
  size: number;
  activeList: number[];
  lnICol: number;
  balanceResidual: number;
  conditionResidual: number;
  unsupportedElement?: number;
  aq?: AqueousEvaluation;
};

/**
 * Buffers of one problem's Newton iterations, reused from iteration to iteration (an assembly is read
 * before the next one is built: callers never keep two).
 */
type Workspace = {
  matrix: Float64Array;
  rhs: Float64Array;
  /** The LU factors of the matrix and the Newton step, for `solveFixedPhases`. */
  factors: Float64Array;
  delta: Float64Array;
  F: Float64Array;
  scale: Float64Array;
  dHalfZ2mDLambda: Float64Array;
  dLnAwDLambda: Float64Array;
  aq: AqueousEvaluation;
};
/** Keyed by the stoichiometry array, which problems of one structure (one template) share. */
const workspaces = new WeakMap<Float64Array, Workspace>();

function workspaceOf(p: EquilibriumProblem): Workspace {
  return getOrCreate(workspaces, p.stoich, () => newWorkspace(p.elements.length, p.species.length, p.elements.length + 1 + p.phases.length));
}

function newWorkspace(nE: number, nS: number, maxSize: number): Workspace {
  return {
    matrix: new Float64Array(maxSize * maxSize),
    rhs: new Float64Array(maxSize),
    factors: new Float64Array(maxSize * maxSize),
    delta: new Float64Array(maxSize),
    F: new Float64Array(nE),
    scale: new Float64Array(nE),
    dHalfZ2mDLambda: new Float64Array(nE),
    dLnAwDLambda: new Float64Array(nE),
    aq: {
      ionicStrength: 0,
      molality: new Float64Array(nS),
      lnGamma: new Float64Array(nS),
      dLnGammaDI: new Float64Array(nS),
      totalMolality: 0,
      chargedMolality: 0,
      lnWaterActivity: 0,
      dLnAwDMolality: new Float64Array(nS),
      dLnAwDI: 0,
    },
  };
}

/**
 * Builds the Newton system J·Δ = −F for the present phases. The matrix, right-hand side and aqueous
 * evaluation returned live in the problem's workspace and are overwritten by the next call.
 */
export function assemble(p: EquilibriumProblem, s: SolverState): Assembly {
  const nE = p.elements.length;
  const st = p.stoich;
  const w = workspaceOf(p);
  const activeList: number[] = [];
  for (let k = 0; k < p.phases.length; k++) if (s.active[k]) activeList.push(k);
  const aqueousActive = p.aqueous >= 0 && s.active[p.aqueous] === 1;
  const lnICol = aqueousActive ? nE : -1;
  const base = nE + (aqueousActive ? 1 : 0);
  const size = base + activeList.length;
  const matrix = w.matrix.fill(0, 0, size * size);
  const rhs = w.rhs.fill(0, 0, size);
  const F = w.F.fill(0);
  const scale = w.scale.fill(0);
  let conditionResidual = 0;
  let aq: AqueousEvaluation | undefined;

  for (let k = 0; k < activeList.length; k++) {
    const phase = activeList[k];
    const col = base + k;
    const row = base + k;
    const kind = p.phases[phase].kind;
    const amount = s.amount[phase];
    if (kind === "aqueous") {
      aq = evaluateAqueous(p, s.lambda, s.lnIonicStrength, w.aq);
      const I = aq.ionicStrength;
      let halfZ2m = 0;
      const dHalfZ2mDLambda = w.dHalfZ2mDLambda.fill(0);
      let halfZ2mGammaI = 0;
      // ∂ ln a_w/∂λ_l = Σ_i (∂ ln a_w/∂m_i) m_i a_il and ∂ ln a_w/∂ ln I through the molalities.
      const dLnAwDLambda = w.dLnAwDLambda.fill(0);
      let dLnAwDLnIViaMolality = 0;
      const members = p.phases[phase].species;
      for (let q = 0; q < members.length; q++) {
        const i = members[q];
        const nz = p.nonZero[i];
        if (i === p.water) {
          for (let x = 0; x < nz.length; x++) {
            const j = nz[x];
            const a = st[i * nE + j];
            F[j] += (a * amount) / WATER_MOLAR_MASS_KG_PER_MOL;
            scale[j] += Math.abs(a * amount) / WATER_MOLAR_MASS_KG_PER_MOL;
            matrix[j * size + col] += a / WATER_MOLAR_MASS_KG_PER_MOL;
          }
          continue;
        }
        const m = aq.molality[i];
        const z = p.species[i].charge;
        const gI = aq.dLnGammaDI[i] * I; // d ln γ / d ln I
        halfZ2m += 0.5 * z * z * m;
        halfZ2mGammaI += 0.5 * z * z * m * gI;
        const wm = aq.dLnAwDMolality[i];
        dLnAwDLnIViaMolality -= wm * m * gI;
        for (let x = 0; x < nz.length; x++) {
          const j = nz[x];
          const a = st[i * nE + j];
          F[j] += a * amount * m;
          scale[j] += Math.abs(a * amount * m);
          matrix[j * size + col] += a * m;
          matrix[j * size + lnICol] -= a * amount * m * gI;
          const weight = amount * a * m;
          for (let y = 0; y < nz.length; y++) matrix[j * size + nz[y]] += weight * st[i * nE + nz[y]];
          dHalfZ2mDLambda[j] += 0.5 * z * z * m * a;
          dLnAwDLambda[j] += wm * m * a;
        }
      }
      // Ionic-strength row.
      const lnIRow = nE;
      const gResidual = s.lnIonicStrength - Math.log(Math.max(halfZ2m, 1e-300));
      rhs[lnIRow] = -gResidual;
      conditionResidual = Math.max(conditionResidual, Math.abs(gResidual));
      for (let l = 0; l < nE; l++) matrix[lnIRow * size + l] += -dHalfZ2mDLambda[l] / halfZ2m;
      matrix[lnIRow * size + lnICol] += 1 + halfZ2mGammaI / halfZ2m;
      // Water condition: a_w·λ − g_w − ln a_w = 0.
      const c = speciesAffinity(p, p.water, s.lambda) - aq.lnWaterActivity;
      rhs[row] = -c;
      conditionResidual = Math.max(conditionResidual, Math.abs(c));
      for (let l = 0; l < nE; l++) matrix[row * size + l] += st[p.water * nE + l] - dLnAwDLambda[l];
      matrix[row * size + lnICol] += -(dLnAwDLnIViaMolality + aq.dLnAwDI * I);
    } else if (kind === "solid-solution" || kind === "gas") {
      const members = p.phases[phase].species;
      const y = memberTerms(p, phase, s.lambda);
      let sum = 0;
      for (const v of y) sum += v;
      for (let q = 0; q < members.length; q++) {
        const i = members[q];
        const nz = p.nonZero[i];
        for (let x = 0; x < nz.length; x++) {
          const j = nz[x];
          const a = st[i * nE + j];
          F[j] += a * amount * y[q];
          scale[j] += Math.abs(a * amount * y[q]);
          matrix[j * size + col] += a * y[q];
          const wq = amount * a * y[q];
          for (let v = 0; v < nz.length; v++) matrix[j * size + nz[v]] += wq * st[i * nE + nz[v]];
          matrix[row * size + j] += (y[q] * a) / sum;
        }
      }
      const c = Math.log(sum);
      rhs[row] = -c;
      conditionResidual = Math.max(conditionResidual, Math.abs(c));
    } else {
      const i = p.phases[phase].species[0];
      const nz = p.nonZero[i];
      for (let x = 0; x < nz.length; x++) {
        const j = nz[x];
        const a = st[i * nE + j];
        F[j] += a * amount;
        scale[j] += Math.abs(a * amount);
        matrix[j * size + col] += a;
        matrix[row * size + j] += a;
      }
      const c = speciesAffinity(p, i, s.lambda);
      rhs[row] = -c;
      conditionResidual = Math.max(conditionResidual, Math.abs(c));
    }
  }

  let balanceResidual = 0;
  let unsupportedElement: number | undefined;
  for (let j = 0; j < nE; j++) {
    let rowEmpty = true;
    for (let c = 0; c < size; c++) if (matrix[j * size + c] !== 0) rowEmpty = false;
    if (rowEmpty) {
      // No present phase carries this element: freeze its potential. Fine for the charge when no
      // ions are present, or an element with zero total; otherwise the phase set cannot hold it.
      matrix[j * size + j] = 1;
      rhs[j] = 0;
      if (j !== p.chargeRow && p.totals[j] > 0) unsupportedElement = j;
      continue;
    }
    const residual = F[j] - p.totals[j];
    rhs[j] = -residual;
    const denominator = Math.max(p.totals[j], scale[j], 1e-300);
    balanceResidual = Math.max(balanceResidual, Math.abs(residual) / denominator);
  }
  return { matrix, rhs, size, activeList, lnICol, balanceResidual, conditionResidual, unsupportedElement, aq };
}

export type NewtonOptions = { maxIterations: number; balanceTolerance: number; conditionTolerance: number; deadline: number };

/** Newton iterations for a fixed set of present phases. Mutates `s`. */
export function solveFixedPhases(p: EquilibriumProblem, s: SolverState, o: NewtonOptions): NewtonOutcome {
  const nE = p.elements.length;
  const amountLimit = divergenceLimit(p);
  const workspace = workspaceOf(p);
  let last: Assembly | undefined;
  for (let iteration = 0; iteration <= o.maxIterations; iteration++) {
    const a = assemble(p, s);
    last = a;
    if (a.unsupportedElement !== undefined)
      return { converged: false, iterations: iteration, balanceResidual: a.balanceResidual, conditionResidual: a.conditionResidual, singular: false, unsupportedElement: a.unsupportedElement };
    // Converged at the tolerances; or, after many iterations, stalled at round-off (regularised steps of a
    // dry assemblage) still a hundred times inside what the result promises (1e-10 relative balance).
    const stalledAtRoundOff = iteration >= STALL_ITERATIONS && a.balanceResidual <= 100 * o.balanceTolerance && a.conditionResidual <= 100 * o.conditionTolerance;
    if ((a.balanceResidual <= o.balanceTolerance && a.conditionResidual <= o.conditionTolerance) || stalledAtRoundOff)
      return { converged: true, iterations: iteration, balanceResidual: a.balanceResidual, conditionResidual: a.conditionResidual, singular: false };
    if (iteration === o.maxIterations || performance.now() > o.deadline) break;
    // The step and the factorised copy of the matrix live in the workspace too (the matrix itself is kept for the
    // regularised retry below).
    const delta = workspace.delta;
    delta.set(a.rhs.subarray(0, a.size));
    workspace.factors.set(a.matrix.subarray(0, a.size * a.size));
    if (!solveInPlace(workspace.factors, delta, a.size)) {
      // Element potentials not fixed by the present phases (a dry solid assemblage with fewer phases than
      // elements leaves directions of λ free): regularise the λ block (Tikhonov) for a near least-norm step.
      delta.set(a.rhs.subarray(0, a.size));
      const m = a.matrix;
      for (let j = 0; j < nE; j++) {
        let rowMax = 0;
        for (let c = 0; c < a.size; c++) rowMax = Math.max(rowMax, Math.abs(m[j * a.size + c]));
        m[j * a.size + j] += 1e-9 * rowMax;
      }
      if (!solveInPlace(m, delta, a.size))
        return { converged: false, iterations: iteration, balanceResidual: a.balanceResidual, conditionResidual: a.conditionResidual, singular: true };
    }
    const alpha = stepLength(p, s, delta, a);
    for (let j = 0; j < nE; j++) s.lambda[j] += alpha * delta[j];
    if (a.lnICol >= 0) s.lnIonicStrength += alpha * delta[a.lnICol];
    const base = nE + (a.lnICol >= 0 ? 1 : 0);
    let diverging = false;
    a.activeList.forEach((phase, k) => {
      s.amount[phase] += alpha * delta[base + k];
      if (!(Math.abs(s.amount[phase]) <= amountLimit)) diverging = true;
    });
    // Amounts far beyond the system's size mean a nearly singular phase set: stop early.
    if (diverging)
      return { converged: false, iterations: iteration + 1, balanceResidual: Infinity, conditionResidual: Infinity, singular: true };
  }
  return { converged: false, iterations: o.maxIterations, balanceResidual: last?.balanceResidual ?? Infinity, conditionResidual: last?.conditionResidual ?? Infinity, singular: false };
}

/** Iterations after which a residual stuck near round-off counts as converged. */
const STALL_ITERATIONS = 30;

/**
 * Phase amounts beyond 10³ times the total element amount are a diverging Newton iteration: no phase can hold more
 * than the elements there are, and converging iterations of this data set stay far below it, while a nearly singular
 * phase set grows its amounts by a roughly constant factor per iteration (with 10⁶, such runs took 12–30 iterations
 * to be stopped; with 10³ a full assessment needs about 8 % fewer Newton iterations, same results).
 */
function divergenceLimit(p: EquilibriumProblem): number {
  let total = 0;
  for (let j = 0; j < p.totals.length; j++) total += Math.abs(p.totals[j]);
  return 1e3 * Math.max(total, 1e-300);
}

/** Largest change of ln(amount) allowed per step for abundant species, and for any species. */
const MAX_LN_STEP_MAJOR = 3;
const MAX_LN_STEP_ANY = 40;

/**
 * Damping in the spirit of the Gordon–McBride control factor: the step is shortened so that no abundant
 * species changes by more than e³ and no species at all by more than e⁴⁰ per iteration.
 */
function stepLength(p: EquilibriumProblem, s: SolverState, delta: Float64Array, a: Assembly): number {
  const nE = p.elements.length;
  let major = 0;
  let any = 0;
  const dLnI = a.lnICol >= 0 ? delta[a.lnICol] : 0;
  for (const phase of a.activeList) {
    const kind = p.phases[phase].kind;
    if (kind === "pure-solid" || kind === "reservoir") continue;
    const y = kind === "aqueous" ? undefined : memberTerms(p, phase, s.lambda);
    const members = p.phases[phase].species;
    for (let q = 0; q < members.length; q++) {
      const i = members[q];
      const nz = p.nonZero[i];
      let change = 0;
      for (let x = 0; x < nz.length; x++) change += p.stoich[i * nE + nz[x]] * delta[nz[x]];
      let abundance: number;
      if (kind === "aqueous") {
        if (i === p.water) abundance = 1;
        else {
          change -= a.aq!.dLnGammaDI[i] * a.aq!.ionicStrength * dLnI;
          abundance = a.aq!.molality[i] * WATER_MOLAR_MASS_KG_PER_MOL;
        }
      } else abundance = y![q];
      const magnitude = Math.abs(change);
      if (abundance > 1e-10 && magnitude > major) major = magnitude;
      if (magnitude > any) any = magnitude;
    }
  }
  let alpha = 1;
  if (major > MAX_LN_STEP_MAJOR) alpha = Math.min(alpha, MAX_LN_STEP_MAJOR / major);
  if (any > MAX_LN_STEP_ANY) alpha = Math.min(alpha, MAX_LN_STEP_ANY / any);
  if (Math.abs(dLnI) > MAX_LN_STEP_MAJOR) alpha = Math.min(alpha, MAX_LN_STEP_MAJOR / Math.abs(dLnI));
  return alpha;
}
