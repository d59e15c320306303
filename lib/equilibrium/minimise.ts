import { solveInPlace } from "./dense-lu";
import type { EquilibriumOutcome } from "./failure";
import { assemble, cloneState, evaluateAqueous, memberTerms, solveFixedPhases, speciesAffinity, type SolverState } from "./newton";
import { WATER_MOLAR_MASS_KG_PER_MOL, type EquilibriumProblem } from "./problem";
import { solveLinearProgram } from "./simplex";

/**
 * Gibbs energy minimisation of a closed (or partly open) system by the element-potential method with an
 * active phase set: Newton's method for the present phases (see `newton.ts`), then phase removal when an
 * amount turns negative and phase addition by the largest positive saturation index, until no phase is
 * supersaturated and none is present in negative amount (the Kuhn–Tucker conditions of the minimum;
 * Smith & Missen 1982, §6.4). The cold start is the linear-programming initial approximation (Karpov,
 * Chudnenko & Kulik 1997, Am. J. Sci. 297, 767); a warm start reuses a previous state.
 *
 * Limits: ideal mixing in solid solutions and gas; activity coefficients from the supplied aqueous model;
 * 1 bar. Phase-rule violations (more pure phases than degrees of freedom) are resolved by swapping phases.
 */
export type MinimiseOptions = {
  maxNewtonIterations?: number;
  maxPhaseChanges?: number;
  timeLimitMs?: number;
  balanceTolerance?: number;
  conditionTolerance?: number;
  warmStart?: SolverState;
};

export type MinimiseReport = {
  state: SolverState;
  iterations: number;
  phaseChanges: number;
  warmStarted: boolean;
  /**
   * True when the phase search cycled near an invariant point and finished with the looser tolerance:
   * absent phases may then be supersaturated by up to NEAR_INVARIANT_TOLERANCE_LOG10.
   */
  nearInvariant: boolean;
};

/** Saturation index (log10) a left-out phase may keep at the end; above it the search is retried. */
const LEFT_OUT_TOLERANCE_LOG10 = 1e-6;
/**
 * Why a phase is left out for the rest of a search: its addition failed to converge or cycled (checked
 * again at the end), or no regular phase set can hold it next to the present ones (the phase rule; where
 * the remaining element potentials are not fixed by the phases, as in dry solid systems, its saturation
 * index is not defined and is not checked).
 */
const BLOCKED_NUMERICALLY = 1;
const BLOCKED_BY_PHASE_RULE = 2;
/**
 * Near an invariant point (five AFm/AFt phases almost coexisting) the phase search can cycle between sets
 * whose left-out member is supersaturated by a few thousandths. After a cycle the search adds, and
 * checks, only above 0.01 log10 units (57 J/mol at 25 °C, far inside the ±0.3 log10 uncertainty of the
 * hydrate data), and the result says so.
 */
export const NEAR_INVARIANT_TOLERANCE_LOG10 = 0.01;
/** How often the left-out phases are given another chance before the search fails. */
const MAX_RESETS = 2;
/**
 * The same for a warm start, which is followed by the cold start when it fails: none. A warm search that ends with a
 * left-out phase supersaturated almost never succeeds after a reset (3 of about 1400 searches of an assessment with
 * Monte Carlo samples, while 49 failed after spending 40–220 ms each on resets), so it hands over to the cold start at
 * once. Only the path changes: the result is the minimum the cold start reaches.
 */
const WARM_START_MAX_RESETS = 0;
/**
 * Smallest pivot (after row equilibration) the Newton matrix may have when a phase is added; below it the
 * phase set is treated as breaking the phase rule. Looser than the 1e-12 of a Newton step, so nearly
 * dependent sets (which make Newton steps explode) are swapped rather than tried (tuned on this data set).
 */
const PHASE_ADDITION_PIVOT_TOLERANCE = 1e-7;
/**
 * Newton iterations allowed per phase set in a warm-started search: from a neighbouring solution a set
 * converges in a few iterations or not usefully at all, and the cold start is the better fallback
 * (tuned on this data set: converged warm sets took at most about 30).
 */
const WARM_NEWTON_MAX_ITERATIONS = 60;
/**
 * Phase changes allowed in a warm-started search before it hands over to the cold start: neighbouring
 * points differ by a few phases, and a search that wanders further costs more than the LP start (tuned on
 * this data set: successful warm searches of the timelines and sweeps made at most 6).
 */
const WARM_MAX_PHASE_CHANGES = 10;
/** Newton iterations allowed per exchange trial (converged trials took at most 25 on this data set). */
const EXCHANGE_MAX_ITERATIONS = 30;
/** Saturation index threshold (log10 units) above which an absent phase is added. */
const ADD_THRESHOLD_LOG10 = 1e-9;
const LN10 = Math.log(10);

export function minimise(p: EquilibriumProblem, options: MinimiseOptions = {}): EquilibriumOutcome<MinimiseReport> {
  const started = performance.now();
  const limitMs = options.timeLimitMs ?? 5000;
  const deadline = started + limitMs;
  const newtonOptions = {
    maxIterations: options.maxNewtonIterations ?? 200,
    balanceTolerance: options.balanceTolerance ?? 1e-12,
    conditionTolerance: options.conditionTolerance ?? 1e-11,
    deadline,
  };
  if (options.warmStart && compatible(p, options.warmStart)) {
    const warmNewton = { ...newtonOptions, maxIterations: Math.min(newtonOptions.maxIterations, WARM_NEWTON_MAX_ITERATIONS) };
    const warm = run(p, cloneState(options.warmStart), warmNewton, options, deadline, started, limitMs, false, WARM_START_MAX_RESETS, WARM_MAX_PHASE_CHANGES);
    if (warm.ok) return { ok: true, value: { ...warm.value, warmStarted: true } };
  }
  const start = coldStart(p);
  if (!start.ok) return start;
  const cold = run(p, cloneState(start.value), newtonOptions, options, deadline, started, limitMs);
  if (cold.ok || cold.error.code !== "no_convergence") return cold.ok ? { ok: true, value: { ...cold.value, warmStarted: false } } : cold;
  // Near an invariant point the phase search can cycle from the LP's phase set. Start again from the
  // solution alone (the LP's element potentials) so that solids enter one at a time by saturation index. Not
  // possible when the LP left the solution out (it put all the water into hydrates, as for a nearly dry paste); the
  // retries after this one still run then, each adding the solution back when the search needs it (an element only
  // the solution can carry, or its saturation index).
  const solutionOnly = cloneState(start.value);
  if (p.aqueous >= 0 && solutionOnly.active[p.aqueous]) {
    p.phases.forEach((phase, k) => {
      if (phase.kind !== "aqueous" && phase.kind !== "reservoir") {
        solutionOnly.active[k] = 0;
        solutionOnly.amount[k] = 0;
      }
    });
    const retry = run(p, solutionOnly, newtonOptions, options, deadline, started, limitMs);
    if (retry.ok) return { ok: true, value: { ...retry.value, warmStarted: false } };
  }
  // Then let solids related by water alone coexist with the solution (gypsum + anhydrite in a brine).
  // Not tried earlier: in hydrated cement the AFm hydrates make such pairs near-degenerate.
  const withWaterPairs = run(p, cloneState(start.value), newtonOptions, options, deadline, started, limitMs, "after-cycling");
  if (withWaterPairs.ok) return { ok: true, value: { ...withWaterPairs.value, warmStarted: false } };
  // Then the same with such pairs allowed from the first addition. A nearly dry paste (a self-desiccated low-w/b paste
  // at a long age, a few mg of solution per 100 g binder) has its water activity set by an AFm hydrate pair
  // (monosulfate-12/-14) beside the solution; swapping one for the other changed the solution's water content each
  // time and the search cycled through AFm, sulfate and carbonate sets until the resets ran out.
  const withWaterPairsFromStart = run(p, cloneState(start.value), newtonOptions, options, deadline, started, limitMs, "from-start");
  if (withWaterPairsFromStart.ok) return { ok: true, value: { ...withWaterPairsFromStart.value, warmStarted: false } };
  // Last, the LP's phase set less one phase at a time, the gas first. The LP's set can be singular for Newton from the
  // start (a gas of one species beside the solution and the solids in a paste diluted in thousands of times its mass of
  // water near 0 °C; nine solids of a sulfate- and carbonate-dosed paste at 0–15 °C, amounts running to ±1e6 mol), and
  // then no addition is there to undo. Without one of its phases the set usually converges, and the phase search adds
  // back what belongs to the minimum. Tried last so that no system solved before takes another path.
  const lpPhases = p.phases.map((phase, k) => ({ phase, k })).filter(({ phase, k }) => start.value.active[k] && phase.kind !== "aqueous" && phase.kind !== "reservoir");
  lpPhases.sort((a, b) => Number(b.phase.kind === "gas") - Number(a.phase.kind === "gas") || a.k - b.k);
  for (const { k } of lpPhases) {
    const without = cloneState(start.value);
    without.active[k] = 0;
    without.amount[k] = 0;
    const reduced = run(p, without, newtonOptions, options, deadline, started, limitMs);
    if (reduced.ok) return { ok: true, value: { ...reduced.value, warmStarted: false } };
    if (reduced.error.code === "time_limit") return reduced;
  }
  return cold;
}

function compatible(p: EquilibriumProblem, s: SolverState): boolean {
  return s.lambda.length === p.elements.length && s.amount.length === p.phases.length && s.lambda.every(Number.isFinite);
}

type NewtonOptions = Parameters<typeof solveFixedPhases>[2];

function run(
  p: EquilibriumProblem,
  s: SolverState,
  newtonOptions: NewtonOptions,
  options: MinimiseOptions,
  deadline: number,
  started: number,
  limitMs: number,
  allowWaterPairs: false | "after-cycling" | "from-start" = false,
  maxResets = MAX_RESETS,
  maxChangesCap = Infinity,
): EquilibriumOutcome<Omit<MinimiseReport, "warmStarted">> {
  const maxChanges = Math.min(options.maxPhaseChanges ?? 4 * p.phases.length + 40, maxChangesCap);
  const blocked = new Uint8Array(p.phases.length);
  const visits = new Map<string, number>();
  let iterations = 0;
  let changes = 0;
  let lastAdded = -1;
  let resets = 0;
  let cycled = false;
  let beforeAdd: SolverState | undefined;
  for (;;) {
    if (performance.now() > deadline)
      return { ok: false, error: { code: "time_limit", elapsedMs: performance.now() - started, limitMs, message: "time limit reached" } };
    const outcome = solveFixedPhases(p, s, newtonOptions);
    iterations += outcome.iterations;
    if (!outcome.converged) {
      if (outcome.unsupportedElement !== undefined) {
        const candidate = bestCarrier(p, s, outcome.unsupportedElement, blocked);
        if (candidate >= 0 && changes < maxChanges) {
          s.active[candidate] = 1;
          s.amount[candidate] = 0;
          changes++;
          continue;
        }
      }
      if (lastAdded >= 0 && beforeAdd && changes < maxChanges) {
        // The phase set with the last addition did not converge. It usually means the new phase should
        // replace a present one (nearly degenerate AFm/AFt pairs): try each exchange from the last good
        // state; if none converges, go back and leave the new phase out.
        const exchanged = exchangeForAddition(p, beforeAdd, lastAdded, newtonOptions);
        iterations += exchanged.iterations;
        if (exchanged.state) Object.assign(s, exchanged.state);
        else {
          blocked[lastAdded] = BLOCKED_NUMERICALLY;
          Object.assign(s, cloneState(beforeAdd));
        }
        lastAdded = -1;
        beforeAdd = undefined;
        changes++;
        continue;
      }
      return {
        ok: false,
        error: {
          code: "no_convergence",
          iterations,
          residual: Math.max(outcome.balanceResidual, outcome.conditionResidual),
          activePhases: activeIds(p, s),
          message: outcome.singular ? "singular Newton matrix for the present phases" : "Newton iterations did not meet the tolerances",
        },
      };
    }
    // Remove a phase whose amount turned negative. After an addition, the ratio test of the simplex
    // method picks it: along the path from the previous (non-negative) amounts to the new ones, the
    // phase that reaches zero first leaves. This avoids the cycling of "most negative leaves".
    let worst = -1;
    let worstKey = Infinity;
    s.active.forEach((on, k) => {
      if (!on || p.phases[k].kind === "reservoir") return;
      const relative = s.amount[k] / amountScale(p, k);
      if (!(relative < -1e-14)) return;
      const before = beforeAdd && beforeAdd.active[k] ? Math.max(0, beforeAdd.amount[k]) : 0;
      // Once cycling, the lowest-index negative phase leaves (Bland's rule), else the ratio test decides.
      const key = cycled ? k : beforeAdd ? before / (before - s.amount[k]) : relative;
      if (key < worstKey) {
        worstKey = key;
        worst = k;
      }
    });
    if (worst >= 0) {
      if (++changes > maxChanges) return noConvergence(p, s, iterations, "too many phase changes");
      s.active[worst] = 0;
      s.amount[worst] = 0;
      continue;
    }
    // Add the most supersaturated absent phase; once the phase set has cycled, the first supersaturated
    // phase in a fixed order instead (the anti-cycling idea of Bland's rule, Bland 1977).
    let best = -1;
    let bestIndex = cycled ? NEAR_INVARIANT_TOLERANCE_LOG10 : ADD_THRESHOLD_LOG10;
    for (let k = 0; k < p.phases.length; k++) {
      const phase = p.phases[k];
      if (s.active[k] || phase.suppressed || blocked[k] || phase.kind === "reservoir") continue;
      const si = phaseSaturationIndex(p, s, k);
      if (si > bestIndex) {
        bestIndex = si;
        best = k;
        if (cycled) break;
      }
    }
    if (best < 0) {
      // Phases left out on the way (a failed or cycling addition) must not be supersaturated at the end,
      // or this is no minimum: give them another chance, a limited number of times, then fail.
      let leftOutSupersaturated = false;
      for (let k = 0; k < p.phases.length; k++) {
        // With the solution present every element potential is fixed, so even a phase-rule exclusion is checked.
        const checked = blocked[k] === BLOCKED_NUMERICALLY || (blocked[k] === BLOCKED_BY_PHASE_RULE && p.aqueous >= 0 && s.active[p.aqueous] === 1);
        if (checked && !s.active[k] && phaseSaturationIndex(p, s, k) > (cycled ? NEAR_INVARIANT_TOLERANCE_LOG10 : LEFT_OUT_TOLERANCE_LOG10)) leftOutSupersaturated = true;
      }
      if (leftOutSupersaturated) {
        if (++resets > maxResets) return noConvergence(p, s, iterations, "a phase left out during the search is supersaturated at the end");
        blocked.fill(0);
        visits.clear();
        continue;
      }
      for (let k = 0; k < p.phases.length; k++) if (s.active[k] && s.amount[k] < 0 && p.phases[k].kind !== "reservoir") s.amount[k] = 0;
      return { ok: true, value: { state: s, iterations, phaseChanges: changes, nearInvariant: cycled } };
    }
    if (++changes > maxChanges) return noConvergence(p, s, iterations, "too many phase changes");
    beforeAdd = cloneState(s);
    lastAdded = best;
    s.active[best] = 1;
    s.amount[best] = 0;
    if (p.phases[best].kind === "aqueous" && !Number.isFinite(s.lnIonicStrength)) s.lnIonicStrength = Math.log(1e-7);
    const regularity = phaseSetRegularity(p, s, true);
    // Once the search cycles, a solid related to a present one by water alone (gypsum/anhydrite in a
    // brine) is tried next to it, not swapped: they coexist at the one water activity where they balance.
    const waterPairAfterCycling =
      allowWaterPairs !== false && regularity === "dependent" && (cycled || allowWaterPairs === "from-start") && phaseSetRegularity(p, s, false) === "regular";
    if (regularity !== "regular" && !waterPairAfterCycling) {
      // Phase rule: swap with a present phase whose removal restores a regular system. First the one the simplex ratio
      // test names for this dependency; then any, in index order.
      let swapped = false;
      const named = regularity === "dependent" ? dependentLeaving(p, s, best) : -1;
      if (named >= 0) {
        s.active[named] = 0;
        if (phaseSetRegularity(p, s, true) === "regular") {
          s.amount[named] = 0;
          swapped = true;
        } else s.active[named] = 1;
      }
      for (let q = 0; q < p.phases.length && !swapped; q++) {
        if (q === best || !s.active[q] || p.phases[q].kind === "reservoir" || p.phases[q].kind === "aqueous") continue;
        s.active[q] = 0;
        if (phaseSetRegularity(p, s, true) === "regular") {
          s.amount[q] = 0;
          swapped = true;
        } else s.active[q] = 1;
      }
      // A set that is only ill-conditioned (independent stoichiometry, a small pivot) and has no swap is
      // tried as it is: the Newton iteration, with its own singularity test, decides.
      if (!swapped && regularity === "dependent") {
        s.active[best] = 0;
        blocked[best] = BLOCKED_BY_PHASE_RULE;
        lastAdded = -1;
        beforeAdd = undefined;
      }
    }
    const key = activeIds(p, s).join("|");
    const seen = (visits.get(key) ?? 0) + 1;
    visits.set(key, seen);
    if (seen > 1 && !cycled) {
      cycled = true;
      visits.clear();
    } else if (seen > 3) {
      // Still cycling under the fixed order: leave out the phase just added (checked again at the end).
      if (lastAdded < 0 || !beforeAdd) return noConvergence(p, s, iterations, "the phase set cycles");
      blocked[lastAdded] = BLOCKED_NUMERICALLY;
      Object.assign(s, cloneState(beforeAdd));
      lastAdded = -1;
      beforeAdd = undefined;
    }
  }
}

/**
 * From the last converged state, adds phase `k` and removes one present phase q (and, where that leaves another
 * present phase negative, that one too). First the q that the simplex ratio test names (the present phase that the
 * first Newton step of the set with `k` added drives to zero first): if that exchange converges with every amount
 * non-negative it is taken. Otherwise each q in turn, and of the exchanges that converge with every amount
 * non-negative, the one of lowest Gibbs energy.
 *
 * Why the ratio test first: on this data set it named the lowest-energy exchange in 112 of 119 exchanges (full
 * assessments of five cements and ten Monte Carlo samples), for one trial instead of about eight; where it names
 * another exchange that works, the search goes on from there to the same minimum.
 */
function exchangeForAddition(
  p: EquilibriumProblem,
  before: SolverState,
  k: number,
  newtonOptions: NewtonOptions,
): { state?: SolverState; iterations: number } {
  let iterations = 0;
  const trialOptions = { ...newtonOptions, maxIterations: Math.min(newtonOptions.maxIterations, EXCHANGE_MAX_ITERATIONS) };
  const exchange = (q: number): SolverState | undefined => {
    const trial = cloneState(before);
    trial.active[q] = 0;
    trial.amount[q] = 0;
    trial.active[k] = 1;
    trial.amount[k] = 0;
    const outcome = solveFixedPhases(p, trial, trialOptions);
    iterations += outcome.iterations;
    if (!outcome.converged) return undefined;
    const negative = mostNegative(p, trial);
    if (negative < 0) return trial;
    // The new phase may displace two present ones (Fe-AFm next to Fe-AFt and Fe-hydrogarnet): the solid driven negative
    // leaves as well, once (never the new phase or the solution).
    if (negative === k || p.phases[negative].kind === "aqueous") return undefined;
    trial.active[negative] = 0;
    trial.amount[negative] = 0;
    const second = solveFixedPhases(p, trial, trialOptions);
    iterations += second.iterations;
    return second.converged && mostNegative(p, trial) < 0 ? trial : undefined;
  };
  const named = ratioTestLeaving(p, before, k);
  if (named >= 0) {
    const state = exchange(named);
    if (state) return { state, iterations };
  }
  let best: SolverState | undefined;
  let bestGibbs = Infinity;
  for (let q = 0; q < p.phases.length; q++) {
    if (q === named || !before.active[q] || q === k || p.phases[q].kind === "reservoir" || p.phases[q].kind === "aqueous") continue;
    const trial = exchange(q);
    if (!trial) continue;
    // Of the exchanges that work, the one of lowest Gibbs energy, G/RT = Σ b_j λ_j.
    let gibbs = 0;
    for (let j = 0; j < p.totals.length; j++) gibbs += p.totals[j] * trial.lambda[j];
    if (gibbs < bestGibbs) {
      bestGibbs = gibbs;
      best = trial;
    }
  }
  return { state: best, iterations };
}

/**
 * The present phase (solid, solid solution or gas) that the first Newton step of the set with `k` added drives to
 * zero first, as the ratio test of the simplex method picks the leaving variable; −1 if the step is singular or
 * lowers no amount.
 */
function ratioTestLeaving(p: EquilibriumProblem, before: SolverState, k: number): number {
  const trial = cloneState(before);
  trial.active[k] = 1;
  trial.amount[k] = 0;
  const a = assemble(p, trial);
  const step = a.rhs.slice(0, a.size);
  if (!solveInPlace(a.matrix.slice(0, a.size * a.size), step, a.size)) return -1;
  const base = p.elements.length + (a.lnICol >= 0 ? 1 : 0);
  let leaving = -1;
  let firstZero = Infinity;
  for (let index = 0; index < a.activeList.length; index++) {
    const phase = a.activeList[index];
    const kind = p.phases[phase].kind;
    if (phase === k || kind === "reservoir" || kind === "aqueous") continue;
    const change = step[base + index];
    if (!(change < 0)) continue;
    const t = Math.max(0, trial.amount[phase]) / -change;
    if (t < firstZero) {
      firstZero = t;
      leaving = phase;
    }
  }
  return leaving;
}

function noConvergence(p: EquilibriumProblem, s: SolverState, iterations: number, message: string): EquilibriumOutcome<never> {
  return { ok: false, error: { code: "no_convergence", iterations, residual: NaN, activePhases: activeIds(p, s), message } };
}

function activeIds(p: EquilibriumProblem, s: SolverState): string[] {
  return p.phases.filter((_, k) => s.active[k]).map((phase) => phase.id);
}

/**
 * The Gibbs phase rule in its linear-algebra form: the condition vectors of the phases that fix element
 * potentials exactly (pure solids a_k, fixed-pressure gases a_r and, with `countSolvent`, the solvent a_w
 * when the solution is present) must be linearly independent ("dependent" otherwise). Hydrates that differ
 * only in water (C4AH13/C4AH19, gypsum/anhydrite) fail this next to an aqueous solution, which is right
 * unless the solutes move a_w to the one value where the pair balances (a brine): hence the option.
 * Checked on the plain stoichiometry, then on the full Newton matrix: a pivot below the tolerance is
 * "ill-conditioned" (a nearly dependent set, swapped for a present phase where one can go).
 */
function phaseSetRegularity(p: EquilibriumProblem, s: SolverState, countSolvent: boolean): "regular" | "dependent" | "ill-conditioned" {
  const nE = p.elements.length;
  const basis: Float64Array[] = [];
  const addVector = (i: number): boolean => {
    const v = new Float64Array(nE);
    for (let j = 0; j < nE; j++) v[j] = p.stoich[i * nE + j];
    let norm0 = 0;
    for (const x of v) norm0 += x * x;
    norm0 = Math.sqrt(norm0);
    for (const b of basis) {
      let d = 0;
      for (let j = 0; j < nE; j++) d += b[j] * v[j];
      for (let j = 0; j < nE; j++) v[j] -= d * b[j];
    }
    let norm = 0;
    for (const x of v) norm += x * x;
    norm = Math.sqrt(norm);
    if (norm <= 1e-8 * norm0) return false;
    for (let j = 0; j < nE; j++) v[j] /= norm;
    basis.push(v);
    return true;
  };
  for (let k = 0; k < p.phases.length; k++) {
    if (!s.active[k]) continue;
    const kind = p.phases[k].kind;
    if (kind === "pure-solid" || kind === "reservoir") {
      if (!addVector(p.phases[k].species[0])) return "dependent";
    } else if (kind === "aqueous" && p.water >= 0 && countSolvent) {
      if (!addVector(p.water)) return "dependent";
    }
  }
  const a = assemble(p, s);
  return solveInPlace(a.matrix, a.rhs, a.size, PHASE_ADDITION_PIVOT_TOLERANCE) ? "regular" : "ill-conditioned";
}

/**
 * The present pure solid that must leave when pure solid `k`, just made active, is a linear combination of the present
 * pure solids, fixed-pressure gases and (with a solution) water: its formula a_k = Σ c_q a_q. Forming t mol of k from
 * them changes each n_q by −c_q·t, so, as in the ratio test of the simplex method (Dantzig 1963, Linear programming and
 * extensions, ch. 7), the solid that reaches zero first, argmin n_q / c_q over c_q > 0, leaves; removing any other
 * drives that one negative or leaves the removed one supersaturated, and the search cycles. −1 when no present solid
 * is consumed (or k is not a pure solid). The coefficients solve the normal equations of the present formulas.
 */
function dependentLeaving(p: EquilibriumProblem, s: SolverState, k: number): number {
  if (p.phases[k].kind !== "pure-solid") return -1;
  const nE = p.elements.length;
  const columns: { phase: number; species: number }[] = [];
  for (let q = 0; q < p.phases.length; q++) {
    if (q === k || !s.active[q]) continue;
    const kind = p.phases[q].kind;
    if (kind === "pure-solid" || kind === "reservoir") columns.push({ phase: q, species: p.phases[q].species[0] });
    else if (kind === "aqueous" && p.water >= 0) columns.push({ phase: -1, species: p.water });
  }
  const m = columns.length;
  if (m === 0) return -1;
  const target = p.phases[k].species[0];
  const normal = new Float64Array(m * m);
  const rhs = new Float64Array(m);
  for (let a = 0; a < m; a++) {
    const ia = columns[a].species * nE;
    for (let b = 0; b < m; b++) {
      const ib = columns[b].species * nE;
      let dot = 0;
      for (let j = 0; j < nE; j++) dot += p.stoich[ia + j] * p.stoich[ib + j];
      normal[a * m + b] = dot;
    }
    let dot = 0;
    for (let j = 0; j < nE; j++) dot += p.stoich[ia + j] * p.stoich[target * nE + j];
    rhs[a] = dot;
  }
  if (!solveInPlace(normal, rhs, m)) return -1;
  let leaving = -1;
  let smallest = Infinity;
  for (let a = 0; a < m; a++) {
    const q = columns[a].phase;
    if (q < 0 || p.phases[q].kind !== "pure-solid" || !(rhs[a] > 1e-9)) continue;
    const ratio = Math.max(0, s.amount[q]) / rhs[a];
    if (ratio < smallest) {
      smallest = ratio;
      leaving = q;
    }
  }
  return leaving;
}

/** The present phase (not a reservoir) with the most negative amount relative to the system size, or −1 if none is negative. */
function mostNegative(p: EquilibriumProblem, s: SolverState): number {
  let worst = -1;
  let worstRelative = -1e-14;
  for (let j = 0; j < p.phases.length; j++) {
    if (!s.active[j] || p.phases[j].kind === "reservoir") continue;
    const relative = s.amount[j] / amountScale(p, j);
    if (relative < worstRelative) {
      worstRelative = relative;
      worst = j;
    }
  }
  return worst;
}

/** A typical magnitude of a phase amount, to judge "negative" relative to the system size. */
function amountScale(p: EquilibriumProblem, k: number): number {
  let total = 0;
  for (let j = 0; j < p.totals.length; j++) total += p.totals[j];
  return p.phases[k].kind === "aqueous" ? Math.max(total * WATER_MOLAR_MASS_KG_PER_MOL, 1e-300) : Math.max(total, 1e-300);
}

/**
 * log10 of the saturation ratio Ω of a phase at the current element potentials: pure solid
 * (a·λ − g)/ln10; solution or gas log10 Σ exp(a_i·λ − g_i); aqueous solution (ideal estimate)
 * log10[a_w* (1 + M_w Σ m_i*)], where * marks values implied by λ.
 */
export function phaseSaturationIndex(p: EquilibriumProblem, s: SolverState, k: number): number {
  const phase = p.phases[k];
  if (phase.kind === "pure-solid" || phase.kind === "reservoir") return speciesAffinity(p, phase.species[0], s.lambda) / LN10;
  if (phase.kind === "aqueous") {
    let sum = 0;
    let lnWater = 0;
    for (const i of phase.species) {
      if (i === p.water) lnWater = speciesAffinity(p, i, s.lambda);
      else sum += Math.exp(Math.min(600, speciesAffinity(p, i, s.lambda)));
    }
    return (lnWater + Math.log1p(WATER_MOLAR_MASS_KG_PER_MOL * sum)) / LN10;
  }
  let sum = 0;
  for (const v of memberTerms(p, k, s.lambda)) sum += v;
  return Math.log(sum) / LN10;
}

/** The absent, allowed phase containing element j with the largest saturation index. */
function bestCarrier(p: EquilibriumProblem, s: SolverState, j: number, blocked: Uint8Array): number {
  const nE = p.elements.length;
  let best = -1;
  let bestIndex = -Infinity;
  p.phases.forEach((phase, k) => {
    if (s.active[k] || phase.suppressed || blocked[k]) return;
    if (!phase.species.some((i) => p.stoich[i * nE + j] !== 0)) return;
    const si = phaseSaturationIndex(p, s, k);
    if (si > bestIndex) {
      bestIndex = si;
      best = k;
    }
  });
  return best;
}

/**
 * Initial approximation: minimise Σ n_i·g_i (mixing terms dropped; solutes on the mole-fraction scale,
 * g_i − ln M_w) subject to the element and charge balances and n ≥ 0, with one extra row bounding the
 * total amount so that the programme is bounded when fixed-pressure gases make the system open.
 */
function coldStart(p: EquilibriumProblem): EquilibriumOutcome<SolverState> {
  const nE = p.elements.length;
  const columns: { species: number; sign: number }[] = [];
  p.species.forEach((sp, i) => {
    const phase = p.phases[sp.phase];
    if (phase.suppressed) return;
    columns.push({ species: i, sign: 1 });
    if (phase.kind === "reservoir") columns.push({ species: i, sign: -1 });
  });
  const m = nE + 1;
  const n = columns.length + 1;
  const a = new Float64Array(m * n);
  const b = new Float64Array(m);
  const c = new Float64Array(n);
  let atomTotal = 0;
  for (let j = 0; j < nE; j++) {
    b[j] = p.totals[j];
    atomTotal += p.totals[j];
  }
  b[nE] = 10 * atomTotal + 10;
  const lnWaterMolarMass = Math.log(WATER_MOLAR_MASS_KG_PER_MOL);
  columns.forEach(({ species: i, sign }, col) => {
    for (let j = 0; j < nE; j++) a[j * n + col] = sign * p.stoich[i * nE + j];
    a[nE * n + col] = 1;
    const sp = p.species[i];
    const solute = p.phases[sp.phase].kind === "aqueous" && i !== p.water;
    c[col] = sign * (solute ? sp.g - lnWaterMolarMass : sp.g);
  });
  a[nE * n + n - 1] = 1; // slack of the bounding row
  const lp = solveLinearProgram(a, b, c, m, n);
  if (lp.status === "infeasible")
    return { ok: false, error: { code: "infeasible_composition", infeasibility: lp.infeasibility, message: "no combination of the available species matches the element totals" } };
  if (lp.status !== "optimal")
    return { ok: false, error: { code: "no_convergence", iterations: lp.iterations, residual: NaN, activePhases: [], message: "initial linear programme hit its iteration limit" } };

  const lambda = new Float64Array(nE);
  for (let j = 0; j < nE; j++) lambda[j] = lp.duals[j];
  // The LP treats solutes on the mole-fraction scale; shift so the molality scale is consistent.
  const amount = new Float64Array(p.phases.length);
  const active = new Uint8Array(p.phases.length);
  columns.forEach(({ species: i, sign }, col) => {
    const x = lp.x[col];
    if (x <= 0) return;
    const phase = p.species[i].phase;
    const kind = p.phases[phase].kind;
    if (kind === "aqueous") {
      if (i === p.water) {
        amount[phase] += x * WATER_MOLAR_MASS_KG_PER_MOL;
        active[phase] = 1;
      }
    } else {
      amount[phase] += sign * x;
      active[phase] = 1;
    }
  });
  p.phases.forEach((phase, k) => {
    if (phase.kind === "reservoir") active[k] = 1;
  });
  let lnIonicStrength = Math.log(1e-7);
  if (p.aqueous >= 0) {
    const aq = evaluateAqueous(p, lambda, Math.log(1e-3));
    let halfZ2m = 0;
    for (const i of p.phases[p.aqueous].species) halfZ2m += 0.5 * p.species[i].charge ** 2 * aq.molality[i];
    lnIonicStrength = Math.log(Math.min(1, Math.max(1e-8, halfZ2m)));
    if (active[p.aqueous] && amount[p.aqueous] <= 0) amount[p.aqueous] = 1e-6;
  }
  return { ok: true, value: { lambda, amount, active, lnIonicStrength } };
}
