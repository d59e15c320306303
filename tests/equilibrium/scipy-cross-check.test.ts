/**
 * Independent cross-check of the Gibbs energy minimiser against SciPy (Debian python3-scipy), on ideal
 * systems where the equilibrium is the solution of a smooth convex programme that SciPy solves on its own.
 * The engine and `tests/fixtures/scipy/solve-dual.py` share only the posed problem (elements, totals b,
 * stoichiometry a_s and μ°/RT = g_s of every species): no code, no starting point, no phase set.
 *
 * Ideal system: γ = 1 on the molality scale with the matching ideal-dilute water activity
 * ln a_w = −M_w Σ_i m_i (the Gibbs–Duhem partner of γ = 1), an ideal gas mixture, and pure solids.
 * With n ≥ 0 and A n = b,
 *   G/RT = n_w g_w + Σ_i n_i [g_i + ln(n_i/(n_w M_w)) − 1] + Σ_gas n_i [g_i + ln(n_i/N)] + Σ_k n_k g_k,
 * whose partial derivatives are μ_i/RT = g_i + ln m_i, μ_w/RT = g_w − M_w Σ m_i and μ_k/RT = g_k. Every term
 * is convex (n ln(n/N) is the perspective of x ln x), so G is convex and homogeneous of degree one.
 *
 * Lagrange dual (Boyd & Vandenberghe 2004, Convex Optimization, §5.1–5.2 and §5.5; Smith & Missen 1982,
 * Chemical Reaction Equilibrium Analysis, ch. 6). The dual function is q(λ) = b·λ + inf_{n≥0}[G(n)/RT − λ·Aᵀn]
 * and the infimum splits by phase:
 *   pure solid  inf n_k (g_k − a_k·λ)                                   = 0 if a_k·λ ≤ g_k, else −∞;
 *   aqueous     for fixed n_w the solutes minimise at n_i = n_w M_w exp(a_i·λ − g_i), which leaves
 *               inf n_w [g_w − a_w·λ − M_w Σ_i exp(a_i·λ − g_i)]          = 0 if the bracket ≥ 0, else −∞;
 *   ideal gas   n_i ∝ exp(a_i·λ − g_i), which leaves inf N [−ln Σ_i exp(a_i·λ − g_i)] = 0 if Σ ≤ 1, else −∞.
 * Hence the dual is the smooth convex programme
 *   maximise b·λ  subject to  a_k·λ ≤ g_k for every pure solid k,
 *                             a_w·λ + M_w Σ_i exp(a_i·λ − g_i) ≤ g_w (the aqueous solution),
 *                             ln Σ_gas exp(a_i·λ − g_i) ≤ 0 (the gas phase).
 * Slater's condition holds (a λ far enough below zero is strictly feasible), so there is no duality gap:
 * the optimum b·λ* equals min G/RT, λ* = μ_element/RT, and the KKT multiplier of each constraint is the
 * amount of its phase (mol of solid, mol of water, mol of gas). A phase is present only where its
 * constraint is active, so the stable phases are the active solid (and gas) constraints.
 *
 * Why the dual and not the primal: posed naively on the raw mole numbers (55 mol of water beside 1e-15 mol
 * of CO2(aq), ln n singular at the bound n = 0, an objective near −5000 whose trace-species terms lie below
 * any absolute tolerance), SLSQP and trust-constr report success at badly wrong equilibria for
 * portlandite–calcite–water (tried with SciPy 1.10 from 1e-3 mol of every solute: SLSQP stopped 0.021 RT
 * above the minimum with 0.091 instead of 0.086 mol portlandite and the ion product of water 10^5 times Kw; trust-constr
 * reached G/RT but left H+ at 5.6e-11 instead of 4.2e-13 mol/kg). The dual has one unknown per element, all of order 10–10², no bounds and no
 * logarithm of an amount; trace species enter only through exp(a_i·λ − g_i), and the objective is linear.
 *
 * What the dual does not cure, found while writing this check: along exchange directions that keep every
 * major species fixed (in a near-neutral solution, H+ against OH−), b·λ is exactly flat and only the
 * curvature of the aqueous constraint, of the order of the trace molalities (~1e-7 mol/kg), fixes λ. SLSQP
 * stops on the change of the objective and reports success with λ several units off there: for gypsum +
 * water at 25 °C λ_H by 4.3 (pH off by 1.9), for 1e-5 mol CaCO3 in 1 kg of water λ_C by 16. The script
 * therefore takes SLSQP's active set and solves the KKT equations of that set by Levenberg–Marquardt
 * (MINPACK through scipy.optimize.root), with the stationarity residual summed exactly. Each result carries
 * a KKT certificate (KKT conditions are sufficient for a convex programme), checked in the first test of
 * each system: no constraint violated, stationarity satisfied, non-negative multipliers, same active set.
 *
 * Precision: in the near-neutral systems λ along the H+/OH− exchange direction is set by ~1e-14 mol of
 * charge imbalance against ~1e-7 mol of H+ and OH−, so both solvers' rounding moves λ (λ_S most, with
 * coefficient 8 in that direction) by a few 1e-7: gypsum + water agrees to about 4e-7, within the 1e-6
 * asked, but with less margin than the alkaline systems (about 1e-12).
 */
import { describe, it, expect } from "vitest";
import { spawnSync } from "node:child_process";
import path from "node:path";
import { parseFormulaOrThrow } from "../../lib/chem/formula";
import { defaultDatasetFiles, loadDataset } from "../../lib/data/load-dataset";
import { speciesAtTemperature } from "../../lib/data/species-at-temperature";
import { minimise } from "../../lib/equilibrium/minimise";
import { buildProblem, GAS_CONSTANT_J_PER_MOL_K, WATER_MOLAR_MASS_KG_PER_MOL, type EquilibriumProblem } from "../../lib/equilibrium/problem";
import { buildResult, type EquilibriumResult } from "../../lib/equilibrium/result";
import type { AqueousActivityModel } from "../../lib/equilibrium/types";

const PYTHON = "/usr/bin/python3";
const SCRIPT = path.join(__dirname, "..", "fixtures", "scipy", "solve-dual.py");
const scipyAvailable = spawnSync(PYTHON, ["-c", "import scipy"]).status === 0;
const skipNote = scipyAvailable
  ? ""
  : " (skipped: Debian python3-scipy is not importable by /usr/bin/python3; CI installs it, locally apt-get install python3-scipy)";

/** γ = 1 and the matching ideal-dilute water activity, ln a_w = −M_w Σ m_i (Gibbs–Duhem with γ = 1). */
const idealDilute: AqueousActivityModel = {
  parameterKey: () => "ideal",
  log10Gamma: () => 0,
  waterCoefficient: () => 1,
  soluteTerms: () => () => [0, 0, 1, 0],
};

type DualPhase = { id: string; kind: string; slack: number; active: boolean; multiplier: number };
type DualSolution = {
  success: boolean;
  slsqp: { success: boolean; message: string; iterations: number; lambda: number[]; optimalValue: number };
  kkt: { success: boolean; message: string; evaluations: number };
  elements: string[];
  lambda: number[];
  optimalValue: number;
  maxViolation: number;
  stationarityResidual: number;
  activeSetUnchanged: boolean;
  phases: DualPhase[];
};

type System = {
  title: string;
  temperatureC: number;
  /** Component formula → amount, mol: 1 kg of water (55.508 mol) and a few grams of solid, typical of a batch test. */
  componentsMol: Record<string, number>;
  /** "starter": the files of lib/data/starter only; "default": every file the product loads. */
  data: "starter" | "default";
};

function elementTotalsMol(componentsMol: Record<string, number>): Record<string, number> {
  const totals: Record<string, number> = {};
  for (const [formula, mol] of Object.entries(componentsMol))
    for (const [element, count] of Object.entries(parseFormulaOrThrow(formula).elements)) totals[element] = (totals[element] ?? 0) + count * mol;
  return totals;
}

/** Every species of the chosen data whose elements are present (buildProblem keeps exactly those). */
function engineProblem(system: System): EquilibriumProblem {
  const files = defaultDatasetFiles().filter((f) => system.data === "default" || path.basename(path.dirname(f)) === "starter");
  const loaded = loadDataset(files);
  if (!loaded.ok) throw new Error(loaded.error.message);
  const temperatureK = system.temperatureC + 273.15;
  const built = buildProblem({
    temperatureK,
    species: speciesAtTemperature(loaded.value, temperatureK),
    elementTotalsMol: elementTotalsMol(system.componentsMol),
    activity: idealDilute,
  });
  if (!built.ok) throw new Error(built.error.message);
  return built.value;
}

/** The posed problem as `solve-dual.py` reads it: elements, totals, and per phase the a_s and g_s. */
function exportProblem(p: EquilibriumProblem) {
  const nE = p.elements.length;
  const species = (i: number) => ({ id: p.species[i].id, g: p.species[i].g, stoich: Array.from({ length: nE }, (_, j) => p.stoich[i * nE + j]) });
  return {
    elements: p.elements,
    totals: Array.from(p.totals),
    waterMolarMassKgPerMol: WATER_MOLAR_MASS_KG_PER_MOL,
    phases: p.phases.map((phase) => {
      if (phase.kind === "reservoir") throw new Error(`phase ${phase.id}: fixed-pressure reservoirs are outside this cross-check`);
      if (phase.kind !== "aqueous") return { id: phase.id, kind: phase.kind, species: phase.species.map(species) };
      return { id: phase.id, kind: phase.kind, water: species(p.water), species: phase.species.filter((i) => i !== p.water).map(species) };
    }),
  };
}

function solveDual(p: EquilibriumProblem): DualSolution {
  const run = spawnSync(PYTHON, [SCRIPT], { input: JSON.stringify(exportProblem(p)), encoding: "utf8", timeout: 60_000 });
  if (run.status !== 0) throw new Error(`solve-dual.py failed (status ${run.status}): ${run.stderr}`);
  return JSON.parse(run.stdout) as DualSolution;
}

function engineResult(p: EquilibriumProblem): EquilibriumResult {
  const outcome = minimise(p);
  if (!outcome.ok) throw new Error(`minimise failed: ${JSON.stringify(outcome.error)}`);
  const { state, iterations, phaseChanges, warmStarted } = outcome.value;
  return buildResult(p, state, { iterations, phaseChanges, warmStarted });
}

const systems: System[] = [
  { title: "portlandite + calcite + water at 25 °C (starter data, Ca–C–O–H)", temperatureC: 25, componentsMol: { H2O: 55.508, "Ca(OH)2": 0.1, CaCO3: 0.01 }, data: "starter" },
  { title: "portlandite + calcite + water at 25 °C (all data files: aragonite competes with calcite)", temperatureC: 25, componentsMol: { H2O: 55.508, "Ca(OH)2": 0.1, CaCO3: 0.01 }, data: "default" },
  { title: "gypsum + water at 25 °C (starter data, Ca–S–O–H, near-neutral pH)", temperatureC: 25, componentsMol: { H2O: 55.508, "CaSO4·2H2O": 0.05 }, data: "starter" },
  { title: "gypsum + water at 60 °C (starter data: the sulfate phase changes)", temperatureC: 60, componentsMol: { H2O: 55.508, "CaSO4·2H2O": 0.05 }, data: "starter" },
  { title: "calcite + water in a closed system at 25 °C (1 mmol CaCO3)", temperatureC: 25, componentsMol: { H2O: 55.508, CaCO3: 0.001 }, data: "starter" },
  { title: "undersaturated calcite solution at 25 °C (0.01 mmol CaCO3, no solid)", temperatureC: 25, componentsMol: { H2O: 55.508, CaCO3: 0.00001 }, data: "starter" },
];

describe.each(systems)(`the minimiser on $title, against SciPy on the Lagrange dual${skipNote}`, (system) => {
  // Solved lazily inside the tests, so that a missing SciPy skips instead of failing at collection.
  let cached: { p: EquilibriumProblem; engine: EquilibriumResult; dual: DualSolution } | undefined;
  const solved = () => {
    if (!cached) {
      const p = engineProblem(system);
      cached = { p, engine: engineResult(p), dual: solveDual(p) };
    }
    return cached;
  };

  it.skipIf(!scipyAvailable)("lets SciPy report success with a KKT certificate (no violation, stationarity, y ≥ 0, stable active set)", () => {
    const { dual } = solved();
    expect(dual.slsqp.success, dual.slsqp.message).toBe(true);
    expect(dual.kkt.success, dual.kkt.message).toBe(true);
    expect(dual.success).toBe(true);
    expect(dual.maxViolation).toBeLessThanOrEqual(1e-12); // RT units
    expect(dual.stationarityResidual).toBeLessThanOrEqual(1e-12); // relative to |b|
    expect(dual.activeSetUnchanged).toBe(true);
    for (const phase of dual.phases.filter((ph) => ph.active)) expect(phase.multiplier, phase.id).toBeGreaterThanOrEqual(0);
  });

  it.skipIf(!scipyAvailable)("gives the same element potentials μ_j/RT within 1e-6 (absolute, dimensionless)", () => {
    const { p, engine, dual } = solved();
    const rt = GAS_CONSTANT_J_PER_MOL_K * p.temperatureK;
    expect(Object.keys(engine.elementPotentials).sort()).toEqual([...dual.elements].sort());
    dual.elements.forEach((element, j) => {
      expect(Math.abs(engine.elementPotentials[element] / rt - dual.lambda[j]), element).toBeLessThanOrEqual(1e-6);
    });
  });

  it.skipIf(!scipyAvailable)("finds as stable exactly the phases whose dual constraints are active, with the solution present", () => {
    const { engine, dual } = solved();
    const activeNonAqueous = dual.phases.filter((ph) => ph.kind !== "aqueous" && ph.active).map((ph) => ph.id).sort();
    expect(engine.phases.map((phase) => phase.id).sort()).toEqual(activeNonAqueous);
    expect(dual.phases.find((ph) => ph.kind === "aqueous")?.active).toBe(true);
    expect(engine.solution).not.toBeNull();
    // Absent phases are clearly undersaturated here, not borderline (slack in RT units).
    for (const phase of dual.phases.filter((ph) => !ph.active)) expect(phase.slack, phase.id).toBeGreaterThan(1e-3);
  });

  it.skipIf(!scipyAvailable)("reports saturation indices of absent solids equal to −slack/ln 10 of their dual constraints within 1e-6", () => {
    const { engine, dual } = solved();
    for (const phase of dual.phases.filter((ph) => ph.kind === "pure-solid" && !ph.active)) {
      expect(Math.abs(engine.saturationIndices[phase.id] + phase.slack / Math.LN10), phase.id).toBeLessThanOrEqual(1e-6);
    }
  });

  it.skipIf(!scipyAvailable)("has G/RT equal to the dual optimum b·λ within 1e-8 relative (no duality gap)", () => {
    const { p, engine, dual } = solved();
    const rt = GAS_CONSTANT_J_PER_MOL_K * p.temperatureK;
    expect(Math.abs(engine.gibbsEnergyJ / rt - dual.optimalValue) / Math.abs(dual.optimalValue)).toBeLessThanOrEqual(1e-8);
  });

  it.skipIf(!scipyAvailable)("has phase amounts equal to the dual's KKT multipliers within 1e-9 relative (mol of solid, mol of water)", () => {
    const { engine, dual } = solved();
    for (const phase of engine.phases) {
      const multiplier = dual.phases.find((ph) => ph.id === phase.id)!.multiplier;
      expect(Math.abs(phase.moles - multiplier) / multiplier, phase.id).toBeLessThanOrEqual(1e-9);
    }
    const waterMol = engine.solution!.waterKg / WATER_MOLAR_MASS_KG_PER_MOL;
    const waterMultiplier = dual.phases.find((ph) => ph.kind === "aqueous")!.multiplier;
    expect(Math.abs(waterMol - waterMultiplier) / waterMultiplier).toBeLessThanOrEqual(1e-9);
  });
});
