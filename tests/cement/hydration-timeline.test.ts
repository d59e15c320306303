import { describe, expect, it } from "vitest";
import { binderSystemFromInput, binderTimeline, logarithmicAgesDays } from "../../lib/cement/binder-system";
import { hydratePaste } from "../../lib/cement/hydrate-paste";
import { hydrationTimeline } from "../../lib/cement/hydration-timeline";
import alkaliUptake from "../../lib/data/binders/alkali-uptake.json";

/**
 * The timeline warm-starts each age from the previous one and extrapolates the bound-alkali starting guess in
 * log(age). Reference: the same paste solved at each age on its own (cold, no guess), a check of the engine
 * against itself. The alkali-uptake iteration stops at a relative change of `iterations.relativeTolerance`, so
 * the two may differ by about that much in the alkali split, and far less elsewhere.
 */
describe("hydrationTimeline", () => {
  const system = binderSystemFromInput({
    cement: { kind: "preset", presetId: "en197-cem-i" },
    supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 35, composition: { kind: "preset", presetId: "slag-typical" } }],
    mix: { waterBinderRatio: 0.45, binderContentKgPerM3: 360 },
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  });
  if (!system.ok) throw new Error("binder invalid");
  const options = { temperatureC: 20, points: 24, firstAgeDays: 1 / 24, lastAgeDays: 3650 };
  const timeline = hydrationTimeline(system.value.binder, options);
  if (!timeline.ok) throw new Error(JSON.stringify(timeline.error));
  const ages = logarithmicAgesDays(options.firstAgeDays, options.lastAgeDays, options.points);
  const points = binderTimeline(system.value.binder, ages, options.temperatureC);
  if (!points.ok) throw new Error("timeline compositions invalid");

  it("gives at every age the assemblage of the paste solved on its own at that age", () => {
    const tolerance = alkaliUptake.iterations.relativeTolerance;
    for (const [index, point] of points.value.entries()) {
      const alone = hydratePaste(point.composition, { temperatureC: options.temperatureC, binderContentKgPerM3: 360 });
      if (!alone.ok) throw new Error(JSON.stringify(alone.error));
      const entry = timeline.value.entries[index];
      expect(entry.ageDays).toBeCloseTo(point.ageDays, 12);
      const grams = (phases: { id: string; grams: number }[]) => new Map(phases.map((p) => [p.id, p.grams]));
      const fromTimeline = grams(entry.phases);
      const fromAlone = grams(alone.value.phases);
      expect([...fromTimeline.keys()].sort()).toEqual([...fromAlone.keys()].sort());
      const solidTotal = [...fromAlone.values()].reduce((sum, g) => sum + g, 0);
      for (const [id, g] of fromAlone) expect(Math.abs((fromTimeline.get(id) ?? 0) - g)).toBeLessThan(tolerance * solidTotal);
      expect(Math.abs((entry.pH ?? 0) - (alone.value.poreSolution?.pH ?? 0))).toBeLessThan(0.01);
    }
  });
});
