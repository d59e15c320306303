import { binderSystemFromInput } from "../../lib/cement/binder-system";
import { loadDataset, type Dataset } from "../../lib/data/load-dataset";
import type { ScenarioBase } from "../../lib/scenarios/sweep";

/**
 * The scenario tests' paste: typical CEM I preset, w/b 0.5, 350 kg/m³, 28 days at 20 °C (typical, not a specific
 * cement), with the whole data set.
 */
export function typicalCemIPaste(): { dataset: Dataset; base: ScenarioBase } {
  const loaded = loadDataset();
  if (!loaded.ok) throw new Error(loaded.error.message);
  const dataset = loaded.value;
  const system = binderSystemFromInput({
    cement: { kind: "preset", presetId: "en197-cem-i" },
    mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350 },
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  });
  if (!system.ok) throw new Error(JSON.stringify(system.error));
  return { dataset, base: { composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350, dataset } };
}
