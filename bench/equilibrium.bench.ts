import { equilibrateSystem } from "../lib/equilibrium/equilibrate";
import { componentTotals } from "../lib/equilibrium/equilibrate";
import { loadDataset } from "../lib/data/load-dataset";
import { medianMs } from "./timing";

/**
 * Median time of one equilibrium, cold (linear-programming start) and warm-started (from the result at
 * a slightly different composition, as in a sweep). The system is a hydrated-cement-like composition in
 * as many elements as the data set carries (target: 10 elements; warm ≤ 0.5 ms, cold ≤ 5 ms). Medians are taken
 * after unmeasured runs that let the JIT compile the solver (a serving process is in that state after its first
 * requests); the first cold solve of the process is reported apart.
 */
export async function run(): Promise<Record<string, unknown>> {
  const dataset = loadDataset();
  if (!dataset.ok) throw new Error(dataset.error.message);
  const has = (element: string) => dataset.value.species.some((s) => s.phase === "solid" && element in s.elements);
  const components: Record<string, number> = { H2O: 27.75, CaO: 1.1, SO3: 0.03, CO2: 0.01, Na2O: 0.003, K2O: 0.006, HCl: 0.001 };
  if (has("Si")) components.SiO2 = 0.34;
  if (has("Al")) components.Al2O3 = 0.05;
  if (has("Mg")) components.MgO = 0.04;
  if (has("Fe")) components.Fe2O3 = 0.018;
  const totals = componentTotals(components, "mol");
  if (!totals.ok) throw new Error("bad bench components");
  const spec = { temperatureC: 20, elementTotalsMol: totals.value, dataset: dataset.value };
  const firstStart = performance.now();
  const cold = equilibrateSystem(spec);
  const firstColdMs = performance.now() - firstStart;
  if (!cold.ok) throw new Error(`bench system did not converge: ${JSON.stringify(cold.error)}`);
  const nearby = componentTotals({ ...components, CaO: components.CaO * 1.001 }, "mol");
  if (!nearby.ok) throw new Error("bad bench components");
  const neighbour = { ...spec, elementTotalsMol: nearby.value, warmStart: cold.value.state };
  const warm = equilibrateSystem(neighbour);
  if (!warm.ok || !warm.value.warmStarted) throw new Error("warm start failed in the benchmark");
  return {
    elements: Object.keys(totals.value).length,
    stablePhases: cold.value.phases.map((p) => p.id),
    firstColdMs,
    coldMedianMs: medianMs(() => equilibrateSystem(spec), 100, 20),
    warmMedianMs: medianMs(() => equilibrateSystem(neighbour), 1000, 100),
    warmIterations: warm.value.iterations,
    targets: { coldMs: 5, warmMs: 0.5 },
  };
}
