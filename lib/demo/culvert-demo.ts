import cementPresets from "../data/binders/cement-presets.json";
import { bogueAstmC150 } from "../cement/bogue";
import type { AssessInputRaw } from "../schema/assess-input";

/**
 * DEMO SCENARIO — invented for the demonstration of Hydrastate, not a real structure or a real site.
 *
 * "Fernbrook Lane box culvert": a fictional cast-in-place box culvert, 0.45 m walls, placed on a warm day into
 * sulfate-bearing clay with sodium-sulfate groundwater. All numbers here are typical, made-up values chosen so
 * that the demo shows the sulfate and curing-temperature parts of the advice; they are not measurements.
 * The cement is the typical CEM I preset of `lib/data/binders/cement-presets.json` with 25 % slag by the typical
 * slag preset (both labelled "typical, replace with your certificate"). The thermal model's cement phases are the
 * ASTM C150 Bogue composition of that preset, as the form derives them.
 */
export const DEMO_LABEL = "Demo scenario (invented numbers): Fernbrook Lane box culvert in sulfate-bearing clay";

const presetOxides = cementPresets.presets.find((p) => p.id === "en197-cem-i")!.cement.oxidesMassPercent;
const bogue = bogueAstmC150(presetOxides).phasesMassPercent;
const round1 = (x: number) => Math.round(x * 10) / 10;

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
  // C35/45 (fck,cyl 35 MPa) matches the thermal model's mean strength of 43 MPa (fcm = fck + 8 MPa, EN 1992-1-1 Table 3.1).
  specification: { strengthClass: "C35/45" },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  exposure: {
    sulfateMgPerL: 1800,
    sulfateCation: "Na",
    soilSulfateMgPerKg: 4200,
    soilSulfateExtraction: "acid-soluble",
    waterPH: 6.8,
    chlorideMgPerL: 120,
    co2Percent: 0.04,
    serviceTemperatureC: 15,
    relativeHumidityPercent: 95,
    wetting: "wet-rarely-dry",
    freezing: { exposed: false },
  },
  curing: {
    // Invented placement on a warm day: 24 °C concrete, air 22 ± 6 °C, plywood formwork struck at 72 h.
    thermal: {
      element: { thicknessM: 0.45, geometry: "symmetric" },
      concrete: { binderKgPerM3: 360, waterBinderRatio: 0.45, fcm28MPa: 43 },
      cement: {
        phasesMassPercent: { C3S: round1(bogue.C3S), C2S: round1(bogue.C2S), C3A: round1(bogue.C3A), C4AF: round1(bogue.C4AF), SO3: presetOxides.SO3, MgO: presetOxides.MgO },
      },
      supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 25 }],
      placementTemperatureC: 24,
      ambient: { kind: "daily-sine", meanC: 22, amplitudeC: 6 },
      faces: { a: { cover: "plywood-formwork", stripAtH: 72, coverAfterStrip: "exposed" } },
      curing: { plannedCuringDays: 5 },
    },
  },
  options: { sweepPoints: 20, suppressedPhases: [], allowedPhases: [] },
};
