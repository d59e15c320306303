import { molarMassGPerMol } from "../chem/atomic-weights";
import { parseFormula } from "../chem/formula";
import { loadDataset, type Dataset } from "../data/load-dataset";
import { speciesAtTemperatureResult } from "../data/species-at-temperature";
import { equilibrateInput, type EquilibrateInput } from "../schema/equilibrate-input";
import { formatIssues } from "../schema/format-issues";
import { saturationPressureBar } from "../thermo/water-saturation-pressure";
import { individualIonParameters } from "../data/ion-size-parameters";
import { sodiumChlorideDominatedParameters, truesdellJonesModel, type TruesdellJonesParameters } from "../thermo/truesdell-jones";
import type { EquilibriumOutcome } from "./failure";
import type { AqueousActivityModel } from "./types";
import { getOrCreate } from "../memo/get-or-create";
import { minimise } from "./minimise";
import { buildProblem } from "./problem";
import { buildResult, deserializeState, type EquilibriumResult, type SerializedState } from "./result";

/** One system in element totals, as the cement and scenario layers build it. */
export type SystemSpecification = {
  temperatureC: number;
  elementTotalsMol: Record<string, number>;
  /** Gas formula (`CO2`, `H2O`) or gas species id (`CO2(g)`) → fixed partial pressure, bar. */
  fixedPartialPressuresBar?: Record<string, number>;
  suppressedPhases?: string[];
  activity?: TruesdellJonesParameters;
  timeLimitMs?: number;
  warmStart?: SerializedState;
  dataset?: Dataset;
};

const ZERO_CELSIUS_K = 273.15;

/** Gas species id for a key given as formula or id. */
function gasId(dataset: Dataset, key: string): string | undefined {
  const direct = dataset.species.find((s) => s.phase === "gas" && (s.id === key || s.id === `${key}(g)`));
  return direct?.id;
}

const phaseIdsOf = new WeakMap<Dataset, ReadonlySet<string>>();

/** Ids that `suppressedPhases` may name: pure solids and solid solutions (computed once per data set). */
export function phaseIds(dataset: Dataset): ReadonlySet<string> {
  return getOrCreate(phaseIdsOf, dataset, () => {
    const ids = new Set<string>();
    for (const s of dataset.species) if (s.phase === "solid") ids.add(s.solution ?? s.id);
    return ids;
  });
}

/** Activity models by parameter set and temperature: a sweep at one temperature builds its model once. */
const activityModels = new WeakMap<TruesdellJonesParameters, Map<number, AqueousActivityModel>>();

function activityModelAt(temperatureK: number, params: TruesdellJonesParameters): AqueousActivityModel {
  const byTemperature = getOrCreate(activityModels, params, () => new Map<number, AqueousActivityModel>());
  if (byTemperature.size > 256 && !byTemperature.has(temperatureK)) byTemperature.clear();
  return getOrCreate(byTemperature, temperatureK, () => truesdellJonesModel(temperatureK, params));
}

/**
 * Equilibrium of a system given by element totals at a temperature: loads the standard potentials at T,
 * builds the problem and minimises its Gibbs energy. Never throws for bad input: failures are typed.
 */
export function equilibrateSystem(spec: SystemSpecification): EquilibriumOutcome<EquilibriumResult> {
  if (!(spec.temperatureC >= 0 && spec.temperatureC <= 100))
    return { ok: false, error: { code: "invalid_input", field: "temperatureC", message: "must be between 0 and 100 °C" } };
  let dataset = spec.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return { ok: false, error: { code: "invalid_input", field: "dataset", message: `${loaded.error.file} ${loaded.error.path}: ${loaded.error.message}` } };
    dataset = loaded.value;
  }
  const temperatureK = spec.temperatureC + ZERO_CELSIUS_K;
  const atT = speciesAtTemperatureResult(dataset, temperatureK);
  if (!atT.ok) return { ok: false, error: { code: "invalid_input", field: "dataset", message: atT.error.message } };

  const fixed: Record<string, number> = {};
  for (const [key, pressureBar] of Object.entries(spec.fixedPartialPressuresBar ?? {})) {
    const id = gasId(dataset, key);
    if (!id) return { ok: false, error: { code: "invalid_input", field: `fixedPartialPressuresBar.${key}`, message: "no such gas in the data set" } };
    const species = dataset.species.find((s) => s.id === id)!;
    const isWaterVapour = species.elements.H === 2 && species.elements.O === 1 && Object.keys(species.elements).length === 2;
    if (isWaterVapour) {
      const psatBar = saturationPressureBar(temperatureK);
      if (!(pressureBar < psatBar))
        return {
          ok: false,
          error: {
            code: "invalid_input",
            field: `fixedPartialPressuresBar.${key}`,
            message: `must be below the saturation pressure ${psatBar.toPrecision(4)} bar at ${spec.temperatureC} °C (give liquid water as a component instead)`,
          },
        };
    }
    fixed[id] = pressureBar;
  }
  const known = phaseIds(dataset);
  const suppressed = spec.suppressedPhases ?? [];
  for (const [index, id] of suppressed.entries()) {
    if (!known.has(id)) return { ok: false, error: { code: "invalid_input", field: `suppressedPhases[${index}]`, message: `unknown phase id "${id}"` } };
  }
  const problem = buildProblem({
    temperatureK,
    species: atT.value as never,
    elementTotalsMol: spec.elementTotalsMol,
    fixedPartialPressuresBar: fixed,
    suppressedPhases: suppressed,
    activity: activityModelAt(temperatureK, spec.activity ?? sodiumChlorideDominatedParameters),
  });
  if (!problem.ok) return problem;
  const warmStart = spec.warmStart ? deserializeState(problem.value, spec.warmStart) : undefined;
  const solved = minimise(problem.value, { warmStart, timeLimitMs: spec.timeLimitMs });
  if (!solved.ok) return solved;
  return { ok: true, value: buildResult(problem.value, solved.value.state, solved.value) };
}

/** Element totals (mol) of components given as formulas with amounts in mol or g. */
export function componentTotals(
  components: Record<string, number>,
  unit: "mol" | "g",
): EquilibriumOutcome<Record<string, number>> {
  const totals: Record<string, number> = {};
  for (const [formula, amount] of Object.entries(components)) {
    const parsed = parseFormula(formula);
    if (!parsed.ok) return { ok: false, error: { code: "invalid_input", field: `components.${formula}`, message: parsed.error.message } };
    if (parsed.value.charge !== 0)
      return { ok: false, error: { code: "invalid_input", field: `components.${formula}`, message: "components must be neutral formulas" } };
    const moles = unit === "g" ? amount / molarMassGPerMol(parsed.value.elements) : amount;
    for (const [element, count] of Object.entries(parsed.value.elements)) totals[element] = (totals[element] ?? 0) + count * moles;
  }
  return { ok: true, value: totals };
}

/** The engine's public entry for the `equilibrate` command and route: validated input → result. */
export function equilibrate(raw: unknown, options: { warmStart?: SerializedState; dataset?: Dataset } = {}): EquilibriumOutcome<EquilibriumResult> {
  const parsed = equilibrateInput.safeParse(raw);
  if (!parsed.success) {
    const first = formatIssues(parsed.error)[0];
    return { ok: false, error: { code: "invalid_input", field: first.path, message: first.message } };
  }
  const input = parsed.data;
  const totals = componentTotals(input.components, input.unit);
  if (!totals.ok) return totals;
  return equilibrateSystem({
    temperatureC: input.temperatureC,
    elementTotalsMol: totals.value,
    fixedPartialPressuresBar: input.fixedPartialPressuresBar,
    suppressedPhases: input.suppressedPhases,
    // Natural-water systems: the individual Truesdell–Jones å, ḃ where published, the common pair otherwise.
    activity: {
      ...(input.activityModel ?? sodiumChlorideDominatedParameters),
      neutral: "unity",
      individual: input.individualIonParameters ? individualIonParameters() : undefined,
    },
    timeLimitMs: input.timeLimitMs,
    warmStart: options.warmStart,
    dataset: options.dataset,
  });
}

export type { EquilibrateInput };
