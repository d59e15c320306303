import { loadDataset } from "../lib/data/load-dataset";
import { runAssessment } from "../lib/service/assess";

/** A full assessment (base, timeline and scenarios at 40 points, no Monte Carlo), and with 200 Monte Carlo samples. Targets 300 ms and 5 s. */
export async function run(): Promise<Record<string, unknown>> {
  if (!loadDataset().ok) throw new Error("data set invalid");
  const input = {
    binder: { cement: { kind: "preset", presetId: "en197-cem-ii-b-s" } },
    mix: { waterBinderRatio: 0.45, binderContentKgPerM3: 360 },
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
    exposure: { sulfateMgPerL: 2500, sulfateCation: "Na", chlorideMgPerL: 500, relativeHumidityPercent: 70, serviceTemperatureC: 10, wetting: "wet-dry", coverMm: 40 },
    curing: { maxTemperatureC: 60 },
    options: { sweepPoints: 40 },
  };
  const time = async (value: unknown) => {
    const start = performance.now();
    const r = await runAssessment(value);
    if (!r.ok) throw new Error(`assessment failed: ${JSON.stringify(r.error)}`);
    return performance.now() - start;
  };
  await time(input);
  const full = [await time(input), await time(input), await time(input)].sort((a, b) => a - b)[1];
  const monteCarlo = await time({ ...input, options: { sweepPoints: 40, monteCarlo: { samples: 200, seed: 1 } } });
  return { fullAssessment40PointsMedianMs: full, monteCarlo200SamplesMs: monteCarlo, targets: { fullMs: 300, monteCarloMs: 5000 } };
}
