import type { AssessInputRaw } from "../schema/assess-input";

/**
 * DEMO SCENARIO — invented for the demonstration of Hydrastate, not a real structure or a real site.
 *
 * "Fernbrook Lane box culvert": a fictional cast-in-place box culvert, 0.45 m walls, placed on a warm day into
 * sulfate-bearing clay with sodium-sulfate groundwater. All numbers here are typical, made-up values chosen so
 * that the demo shows the sulfate and curing-temperature parts of the advice; they are not measurements.
 * The cement is the typical CEM I preset of `lib/data/binders/cement-presets.json` with 25 % slag by the typical
 * slag preset (both labelled "typical, replace with your certificate").
 */
export const DEMO_LABEL = "Demo scenario (invented numbers): Fernbrook Lane box culvert in sulfate-bearing clay";

export const culvertDemo: AssessInputRaw = {
  project: {
    name: "Fernbrook Lane box culvert (demo)",
    reference: "DEMO-0001",
    element: { type: "wall", thicknessM: 0.45, coverMm: 50 },
  },
  binder: {
    cement: { kind: "preset", presetId: "en197-cem-i" },
    supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 25, composition: { kind: "preset", presetId: "slag-typical" } }],
  },
  mix: {
    waterBinderRatio: 0.45,
    binderContentKgPerM3: 360,
    aggregateVolume: { unit: "litresPerM3", value: 700 },
    airVolume: { unit: "litresPerM3", value: 20 },
  },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  exposure: {
    sulfateMgPerL: 1800,
    sulfateCation: "Na",
    soilSulfateMgPerKg: 4200,
    soilSulfateExtraction: "acid-soluble",
    waterPH: 6.8,
    chlorideMgPerL: 120,
    co2Percent: 0.04,
    serviceTemperatureC: 12,
    relativeHumidityPercent: 95,
    wetting: "wet-rarely-dry",
    freezing: { exposed: false },
  },
  curing: {
    maxTemperatureC: 58,
  },
  options: { sweepPoints: 20, suppressedPhases: [], allowedPhases: [] },
};
