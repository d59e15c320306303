import { loadDataset } from "../lib/data/load-dataset";
import { runAssessment } from "../lib/service/assess";
import { samplePool, SAMPLES_PER_RANGE } from "../lib/service/sample-pool";
import { culvertDemo } from "../lib/demo/culvert-demo";

/** The demo's element and climate without its slag: the thermodynamic heat covers a plain Portland cement. */
const plainPortlandThermal = { ...culvertDemo.curing!.thermal!, supplementaryMaterials: [] };

/**
 * A full assessment (base, timeline and scenarios at 40 points, no Monte Carlo), and with 200 Monte Carlo samples.
 * Targets 300 ms and 5 s (issue 5). The first run is reported apart: it fills the per-data-set caches (standard
 * potentials per temperature, problem structures, the drying map and transition humidities) and starts the JIT; after
 * two more unmeasured runs (JIT warm-up, as for the other benchmarks) the figure against the target is the median of five.
 * A second figure, with no target, adds the element temperature model for a plain CEM I, whose heat comes from the data
 * set's enthalpies (18 more equilibria, `lib/service/assessment-curing.ts`). The Monte Carlo figure includes one
 * deterministic assessment and the reference run of the samples' path; the per-sample figure subtracts the former.
 * The samples are shared by this thread and its sample workers (`lib/service/sample-pool.ts`, one fewer than the cores,
 * up to two cores), as in the service. Like the other figures, the Monte Carlo one is taken warm, as a long-lived
 * service computes it: a run of two ranges first starts the workers (thread start, TypeScript loading, data set),
 * which a serving thread pays once at start; one unmeasured 200-sample run then warms the samples' code in both
 * threads; the figure against the target is the median of three runs, each with a seed of its own (no sample of one
 * run is another's). The two warm-up runs are reported apart (the second is what the first Monte Carlo request after
 * a start costs).
 */
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
  const samples = 200;
  const time = async (value: unknown) => {
    const start = performance.now();
    const r = await runAssessment(value);
    if (!r.ok) throw new Error(`assessment failed: ${JSON.stringify(r.error)}`);
    return performance.now() - start;
  };
  const first = await time(input);
  for (let i = 0; i < 2; i++) await time(input);
  const runs: number[] = [];
  for (let i = 0; i < 5; i++) runs.push(await time(input));
  const full = runs.sort((a, b) => a - b)[2];
  // The same with the element temperature model driven by the thermodynamic heat (a plain Portland cement; reported, no target).
  const withThermal = { ...input, binder: { cement: { kind: "preset", presetId: "en197-cem-i" } }, curing: { thermal: plainPortlandThermal } };
  for (let i = 0; i < 2; i++) await time(withThermal);
  const thermalRuns: number[] = [];
  for (let i = 0; i < 5; i++) thermalRuns.push(await time(withThermal));
  const fullWithThermal = thermalRuns.sort((a, b) => a - b)[2];
  const monteCarloStart = await time({ ...input, options: { sweepPoints: 40, monteCarlo: { samples: 2 * SAMPLES_PER_RANGE, seed: 2 } } });
  // Each run its own seed: a repeated seed would find its samples' standard potentials still cached (per data-set version).
  const monteCarloInput = (seed: number) => ({ ...input, options: { sweepPoints: 40, monteCarlo: { samples, seed } } });
  const monteCarloFirst = await time(monteCarloInput(1));
  const monteCarloRuns: number[] = [];
  for (const seed of [11, 12, 13]) monteCarloRuns.push(await time(monteCarloInput(seed)));
  const monteCarlo = [...monteCarloRuns].sort((a, b) => a - b)[1];
  const sampleWorkers = samplePool().size;
  await samplePool().pool?.close();
  const round = (ms: number) => Math.round(ms);
  return {
    fullAssessment40PointsFirstRunMs: round(first),
    fullAssessment40PointsMedianMs: round(full),
    fullAssessmentWithThermodynamicHeatElementMedianMs: round(fullWithThermal),
    monteCarloWorkerStartRunMs: round(monteCarloStart),
    monteCarlo200SamplesFirstRunMs: round(monteCarloFirst),
    monteCarlo200SamplesRunsMs: monteCarloRuns.map(round),
    monteCarloSampleWorkers: sampleWorkers,
    monteCarlo200SamplesMedianMs: round(monteCarlo),
    monteCarloPerSampleMs: Math.round(((monteCarlo - full) / samples) * 10) / 10,
    targets: { fullMs: 300, monteCarloMs: 5000 },
    meetsTargets: { full: full < 300, monteCarlo: monteCarlo < 5000 },
  };
}
