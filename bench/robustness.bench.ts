import { binderSystemFromInput } from "../lib/cement/binder-system";
import { hydratePaste } from "../lib/cement/hydrate-paste";
import { hydrationTimeline } from "../lib/cement/hydration-timeline";
import { loadDataset } from "../lib/data/load-dataset";
import cementPresets from "../lib/data/binders/cement-presets.json";

/**
 * How often the engine fails on the pastes users can enter: base pastes of every cement preset over the schema's
 * w/b range, ages and curing temperatures, and 40-age hydration timelines at low w/b (the nearly dry pastes are the
 * engine's weak case). Counts, not timings: the figures the closing notes and the C-S-H data note quote, reproducible
 * here instead of in throw-away scripts. No target: the aim is none unsolved.
 */
const WATER_BINDER_RATIOS = [0.25, 0.3, 0.35, 0.4, 0.5, 0.6, 0.7, 0.8];
const AGES_DAYS = [1, 7, 28, 365, 3650];
const CURING_TEMPERATURES_C = [5, 20, 40, 60, 80];
const TIMELINE_WATER_BINDER_RATIOS = [0.25, 0.28, 0.32];
const TIMELINE_TEMPERATURES_C = [10, 20, 40, 60];
const TIMELINE_POINTS = 40;
/** Binder content of every paste, kg/m³ (per-100-g results do not depend on it; typical structural concrete). */
const BINDER_KG_PER_M3 = 350;

export async function run(): Promise<Record<string, unknown>> {
  const dataset = loadDataset();
  if (!dataset.ok) throw new Error(dataset.error.message);
  const presetIds = cementPresets.presets.map((p) => p.id);
  const binderFor = (presetId: string, waterBinderRatio: number, ageDays: number, curingTemperatureC: number) =>
    binderSystemFromInput({
      cement: { kind: "preset", presetId },
      mix: { waterBinderRatio, binderContentKgPerM3: BINDER_KG_PER_M3 },
      age: { mode: "age", ageDays, curingTemperatureC },
    });

  const pasteStart = performance.now();
  let pastes = 0;
  const unsolvedPastes: string[] = [];
  for (const presetId of presetIds)
    for (const waterBinderRatio of WATER_BINDER_RATIOS)
      for (const ageDays of AGES_DAYS)
        for (const temperatureC of CURING_TEMPERATURES_C) {
          const system = binderFor(presetId, waterBinderRatio, ageDays, temperatureC);
          if (!system.ok) throw new Error(`preset ${presetId} rejected: ${JSON.stringify(system.error)}`);
          pastes++;
          const paste = hydratePaste(system.value.composition, { temperatureC, binderContentKgPerM3: BINDER_KG_PER_M3, dataset: dataset.value });
          if (!paste.ok) unsolvedPastes.push(`${presetId} w/b ${waterBinderRatio} ${ageDays} d ${temperatureC} °C: ${paste.error.message}`);
        }
  const pasteMs = performance.now() - pasteStart;

  const timelineStart = performance.now();
  let ages = 0;
  let unsolvedAgeCount = 0;
  const unsolvedAges: string[] = [];
  for (const presetId of presetIds)
    for (const waterBinderRatio of TIMELINE_WATER_BINDER_RATIOS)
      for (const temperatureC of TIMELINE_TEMPERATURES_C) {
        const system = binderFor(presetId, waterBinderRatio, 28, temperatureC);
        if (!system.ok) throw new Error(`preset ${presetId} rejected: ${JSON.stringify(system.error)}`);
        ages += TIMELINE_POINTS;
        const timeline = hydrationTimeline(system.value.binder, { temperatureC, points: TIMELINE_POINTS, firstAgeDays: 1 / 24, lastAgeDays: 3650, dataset: dataset.value });
        const where = `${presetId} w/b ${waterBinderRatio} ${temperatureC} °C`;
        if (!timeline.ok) {
          unsolvedAges.push(`${where}: all ages, ${timeline.error.code}`);
          unsolvedAgeCount += TIMELINE_POINTS;
          continue;
        }
        for (const w of timeline.value.warnings) {
          if (w.code !== "timeline_ages_unsolved") continue;
          unsolvedAgeCount += w.ageDays.length;
          unsolvedAges.push(`${where}: ${w.ageDays.map((a) => a.toPrecision(3)).join(", ")} d`);
        }
      }
  const timelineMs = performance.now() - timelineStart;

  return {
    basePastes: { count: pastes, unsolved: unsolvedPastes.length, unsolvedPastes, ms: Math.round(pasteMs) },
    timelines: { ages, unsolved: unsolvedAgeCount, unsolvedAges, ms: Math.round(timelineMs) },
  };
}
