import { valueAt } from "./key-figures";

/**
 * The assessment result (`lib/service/assess.ts`) in the layout that the shared chart mapping
 * (`lib/charts/result-charts.ts`) reads: the paste's solids as `assemblage.phases` with its pore solution and
 * empty (chemical-shrinkage) porosity, each scenario's `sweep` as the scenario, and `assemblage.timeline` as
 * `timeline`. Fields the result already has in that layout are kept, so when the chart mapping reads the
 * result directly this adds nothing. A copy; the saved result is not changed.
 */
type Loose = Record<string, unknown>;
const isObject = (v: unknown): v is Loose => v !== null && typeof v === "object" && !Array.isArray(v);

export function chartSourceOf(result: unknown): unknown {
  if (!isObject(result)) return result;
  const out: Loose = { ...result };
  const assemblage = result.assemblage;
  if (isObject(assemblage) && isObject(assemblage.paste) && assemblage.phases === undefined && assemblage.phaseVolumesCm3 === undefined) {
    const paste = assemblage.paste;
    const ageDays = valueAt(result, ["inputs", "age", "ageDays"]);
    const temperatureC = assemblage.temperatureC;
    out.assemblage = {
      ...assemblage,
      label: [typeof ageDays === "number" ? `${ageDays} d` : null, typeof temperatureC === "number" ? `at ${temperatureC} °C` : null].filter(Boolean).join(" ") || "Assemblage",
      phases: paste.phases,
      poreSolutionCm3: valueAt(paste, ["porosity", "poreSolutionVolumeCm3"]),
      emptyPorosityCm3: valueAt(paste, ["porosity", "chemicalShrinkageCm3"]),
      pH: valueAt(paste, ["poreSolution", "pH"]),
    };
    if (out.timeline === undefined && Array.isArray(assemblage.timeline)) out.timeline = assemblage.timeline;
  }
  const scenarios = result.scenarios;
  if (isObject(scenarios)) {
    const lifted: Loose = {};
    for (const [id, scenario] of Object.entries(scenarios)) lifted[id] = isObject(scenario) && isObject(scenario.sweep) && !Array.isArray(scenario.points) ? scenario.sweep : scenario;
    out.scenarios = lifted;
  }
  return out;
}
