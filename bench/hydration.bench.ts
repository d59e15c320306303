import { binderSystemFromInput } from "../lib/cement/binder-system";
import { hydrationTimeline } from "../lib/cement/hydration-timeline";
import { loadDataset } from "../lib/data/load-dataset";
import { medianMs } from "./timing";

/**
 * A 40-age timeline (1 hour to 10 years) for a slag-blended cement, warm-started point to point. Target < 100 ms.
 * The median is taken after five unmeasured timelines (JIT warm-up); the first timeline of the process is reported apart.
 */
export async function run(): Promise<Record<string, unknown>> {
  const dataset = loadDataset();
  if (!dataset.ok) throw new Error(dataset.error.message);
  const system = binderSystemFromInput({
    cement: { kind: "preset", presetId: "en197-cem-i" },
    supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 35, composition: { kind: "preset", presetId: "slag-typical" } }],
    mix: { waterBinderRatio: 0.45, binderContentKgPerM3: 360 },
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  });
  if (!system.ok) throw new Error("bench binder invalid");
  const timeline = () => {
    const r = hydrationTimeline(system.value.binder, { temperatureC: 20, points: 40, firstAgeDays: 1 / 24, lastAgeDays: 3650, dataset: dataset.value });
    if (!r.ok) throw new Error(`timeline failed: ${JSON.stringify(r.error)}`);
    return r;
  };
  const firstStart = performance.now();
  timeline();
  const firstTimelineMs = performance.now() - firstStart;
  return { firstTimelineMs, timeline40MedianMs: medianMs(timeline, 20, 5), targetMs: 100 };
}
