import { describe, it, expect } from "vitest";
import { binderSystemFromInput } from "../../lib/cement/binder-system";
import { hydratePaste } from "../../lib/cement/hydrate-paste";
import { loadDataset } from "../../lib/data/load-dataset";
import { parseExposureInput } from "../../lib/schema/exposure-input";
import { brentRoot, DEFAULT_MAX_ITERATIONS, DEFAULT_TOLERANCE_C, formationGibbsKJPerMol, pasteAtTemperature, stabilityLimitNear, temperatureHistory } from "../../lib/scenarios/temperature-history";
import { delayedEttringiteFormationFlag } from "../../lib/advisory/flag-rules/delayed-ettringite-formation";
import { newWarmStartBook, phaseMoles, readingBook, type ScenarioBase } from "../../lib/scenarios/sweep";

/** The base paste of the scenario brief: typical CEM I preset, w/b 0.5, 350 kg/m³, 28 days at 20 °C (typical, not a specific cement). */
function basePaste(): ScenarioBase {
  const system = binderSystemFromInput({
    cement: { kind: "preset", presetId: "en197-cem-i" },
    mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350 },
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  });
  if (!system.ok) throw new Error(JSON.stringify(system.error));
  return { composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350 };
}

function exposure(raw: Record<string, unknown> = {}) {
  const parsed = parseExposureInput({ serviceTemperatureC: 20, ...raw });
  if (!parsed.ok) throw new Error(parsed.error.message);
  return parsed.value;
}

const base = basePaste();
const run = temperatureHistory(base, exposure(), { points: 12, curingMaxTemperatureC: 85 });
if (!run.ok) throw new Error(JSON.stringify(run.error));
const result = run.value;

describe("Brent's root finder", () => {
  // References: scipy.optimize.brentq (Debian python3-scipy 1.10), xtol 1e-12, run with /usr/bin/python3.
  const ok = (g: (x: number) => number) => (x: number) => ({ ok: true as const, value: g(x) });
  it.each([
    ["cos x − x on [0, 1]", (x: number) => Math.cos(x) - x, 0, 1, 0.7390851332151559],
    ["x³ − 2x − 5 on [2, 3] (Wallis's equation)", (x: number) => x ** 3 - 2 * x - 5, 2, 3, 2.094551481542327],
    ["eˣ − 10 on [0, 5]", (x: number) => Math.exp(x) - 10, 0, 5, 2.302585092994085],
  ])("finds the root of %s as scipy's brentq does", (_name, g, a, b, reference) => {
    const root = brentRoot(ok(g), { a, b, fa: g(a), fb: g(b) }, 1e-12, 100);
    expect(root.ok).toBe(true);
    if (root.ok) {
      expect(root.value.x).toBeCloseTo(reference, 10);
      expect(root.value.iterations).toBeLessThan(20);
    }
  });

  it("refuses a bracket without a sign change and stops at the iteration cap", () => {
    const g = (x: number) => x * x + 1;
    const refused = brentRoot(ok(g), { a: 0, b: 1, fa: 1, fb: 2 }, 1e-12, 100);
    expect(refused.ok).toBe(false);
    const wallis = (x: number) => x ** 3 - 2 * x - 5;
    const capped = brentRoot(ok(wallis), { a: 2, b: 3, fa: wallis(2), fb: wallis(3) }, 0, 2);
    expect(capped.ok && capped.value.iterations).toBe(2);
    if (capped.ok) expect(capped.value.x).toBeGreaterThan(2);
    if (capped.ok) expect(capped.value.x).toBeLessThan(3);
  });
});

describe("the temperature sweep of a CEM I paste, 5–95 °C", () => {
  const temperatures = result.sweep.points.map((p) => p.dose);

  it("covers 5 to 95 °C and includes the service and the curing temperatures", () => {
    expect(temperatures[0]).toBe(5);
    expect(temperatures[temperatures.length - 1]).toBe(95);
    expect(temperatures).toContain(20);
    expect(temperatures).toContain(85);
    expect([...temperatures].sort((a, b) => a - b)).toEqual(temperatures);
  });

  it("holds ettringite at 20 °C (Lothenbach, Winnefeld, Alder, Wieland & Lunk 2007, Cem. Concr. Res. 37, 483)", () => {
    expect(result.summary.atService.ettringiteMol).toBeGreaterThan(0);
    expect(result.sweep.points.find((p) => p.dose === 20)!.ettringiteMol).toBeGreaterThan(0);
  });

  it("has more sulfate in the pore solution when hot: measured pore solutions of Portland pastes at 40–60 °C carry more sulfate than at 20 °C (Lothenbach et al. 2007)", () => {
    const dissolved = (t: number) => result.sweep.points.find((p) => p.dose === t)!.dissolvedSulfateMolSO3;
    expect(dissolved(85)).toBeGreaterThan(10 * dissolved(20));
  });

  it("leaves no allowed solid supersaturated at any point (equilibrium check on every saturation index)", () => {
    expect(result.summary.equilibriumChecks.remainingSupersaturation).toEqual([]);
  });
});

describe("the ettringite stability temperature of this mix", () => {
  const limit = result.summary.stabilityLimit;

  it("is found by root finding and bracketed by the full equilibrium: ettringite present 0.5 °C below, absent 0.5 °C above", () => {
    expect(limit.kind).toBe("found");
    if (limit.kind !== "found") return;
    const at = (t: number) => {
      const paste = hydratePaste(base.composition, { temperatureC: t, binderContentKgPerM3: 350 });
      if (!paste.ok) throw new Error(JSON.stringify(paste.error));
      return phaseMoles(paste.value, "ettringite");
    };
    expect(at(limit.temperatureC - 0.5)).toBeGreaterThan(0);
    expect(at(limit.temperatureC + 0.5)).toBe(0);
  });

  it("lies above the 65–75 °C reported for Portland pastes: KNOWN DEVIATION (pinned, not tuned)", () => {
    // Published: ettringite decomposes in Portland pastes above about 65–75 °C (Lothenbach et al. 2007, Cem. Concr. Res.
    // 37, 483; Taylor, Famy & Scrivener 2001, Cem. Concr. Res. 31, 683; range as recalled, from memory).
    // KNOWN DEVIATION: the engine gives 89.4 °C (89.9 with the earlier two-end-member C-S-H). Reasons
    // (tests/data/ettringite-temperature.test.ts): above 50 °C siliceous hydrogarnet takes the Al the AFm phases would
    // hold, leaving ettringite the only solid sulfate host, and sulfate uptake by C-S-H is not modelled. (The data's 1.3 log10 units of ettringite log Ksp error at 85 °C
    // come from the Cp of Al(OH)4-, which cancels between Al solids.) The limit is sensitive to the Al host and the
    // alkalis: with the hydrogarnets suppressed this paste keeps ettringite beside monosulfate-12 to 92.5 °C, while the
    // fully hydrated composition of tests/data/ettringite-temperature.test.ts, equilibrated without alkali uptake by
    // C-S-H (1.2 mol/kg K in solution), has lost it by 50 °C; the published range lies between. This test pins the
    // value (±1.5 °C) so a change of data or engine shows up; it is NOT evidence of agreement with the published range.
    expect(result.summary.ettringiteStabilityTemperatureC).not.toBeNull();
    const t = result.summary.ettringiteStabilityTemperatureC!;
    expect(t).toBeGreaterThan(75);
    expect(Math.abs(t - 89.4)).toBeLessThan(1.5);
  });
});

describe("the sensitivity of the stability temperature to the ettringite data", () => {
  it("falls by about 10 °C when ettringite alone is made 1.3 log10 units less stable, still above 75 °C", () => {
    // Sensitivity check, not a reference value: ΔfG° and ΔfH° of ettringite both raised by 1.3·RT·ln10 at 358.15 K
    // (8.9 kJ/mol), which shifts its G(T) uniformly against every other solid. The published range (65–75 °C, see
    // above) is not reached even so.
    const loaded = loadDataset();
    if (!loaded.ok) throw new Error(loaded.error.message);
    const shiftJPerMol = 1.3 * 8.314462618 * 358.15 * Math.LN10;
    const species = loaded.value.species.map((s) =>
      s.id === "ettringite" && s.standard
        ? { ...s, standard: { ...s.standard, gibbsJPerMol: s.standard.gibbsJPerMol + shiftJPerMol, enthalpyJPerMol: (s.standard.enthalpyJPerMol ?? 0) + shiftJPerMol } }
        : s,
    );
    // A new version string: standard-state properties are cached per data-set version.
    const dataset = { ...loaded.value, species, version: `${loaded.value.version}-ettringite-less-stable` };
    const shifted = temperatureHistory({ ...base, dataset }, exposure(), { points: 12 });
    if (!shifted.ok) throw new Error(JSON.stringify(shifted.error));
    const t = shifted.value.summary.ettringiteStabilityTemperatureC!;
    expect(t).toBeLessThan(result.summary.ettringiteStabilityTemperatureC! - 7);
    expect(t).toBeGreaterThan(75);
  });
});

describe("the comparison of curing (85 °C) and service (20 °C)", () => {
  const { atCuring, atService } = result.summary;

  it("keeps every mole of sulfate of the paste in some host (mass balance against the bulk composition)", () => {
    const bulkSulfurMol = base.composition.reactedElementsMol.S;
    for (const state of [atCuring!, atService]) expect(state.sulfate.totalMolSO3Per100gBinder).toBeCloseTo(bulkSulfurMol, 8);
  });

  it("holds more sulfate outside ettringite at 85 °C than at 20 °C, and returns it to ettringite on cooling", () => {
    expect(atCuring!.sulfate.outsideAftMolSO3Per100gBinder).toBeGreaterThan(atService.sulfate.outsideAftMolSO3Per100gBinder);
    expect(result.summary.sulfateToEttringiteOnCoolingMolSO3Per100gBinder!).toBeGreaterThan(0);
    expect(result.summary.ettringiteVolumeGainOnCoolingCm3Per100gBinder!).toBeGreaterThan(0);
  });

  it("gives the per-m³ figures for 350 kg binder per m³ (3500 portions of 100 g)", () => {
    expect(atCuring!.sulfate.outsideAftMolSO3PerM3).toBeCloseTo(atCuring!.sulfate.outsideAftMolSO3Per100gBinder * 3500, 9);
    expect(result.summary.ettringiteVolumeGainOnCoolingLitresPerM3!).toBeCloseTo(result.summary.ettringiteVolumeGainOnCoolingCm3Per100gBinder! * 3.5, 9);
  });

  it("reports the driving force to re-form ettringite at service as a positive saturation index, ΔrG = −RT ln10 · SI", () => {
    expect(atService.ettringiteSaturationIndexWithoutIt).toBeGreaterThan(0);
    // ΔrG = −RT ln10 · SI: at 25 °C one log10 unit is 5.708 kJ/mol (R = 8.314462618 J/(mol K), CODATA 2018).
    expect(formationGibbsKJPerMol(1, 25)).toBeCloseTo(-5.708, 3);
    expect(atService.ettringiteFormationGibbsKJPerMol).toBeCloseTo(formationGibbsKJPerMol(atService.ettringiteSaturationIndexWithoutIt!, 20), 12);
  });
});

describe("a service temperature below the data set's 0 °C", () => {
  it("is evaluated at 0 °C and said so, instead of failing the scenario (the schema takes service temperatures down to −60 °C)", () => {
    const r = temperatureHistory(base, exposure({ serviceTemperatureC: -5 }), { points: 4, curingMaxTemperatureC: 85 });
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    expect(r.value.summary.serviceTemperatureC).toBe(0);
    expect(r.value.summary.serviceTemperatureClampedFromC).toBe(-5);
    expect(r.value.summary.atService.temperatureC).toBe(0);
    expect(result.summary.serviceTemperatureClampedFromC).toBeNull();
    const cold = exposure({ serviceTemperatureC: -5 });
    const flag = delayedEttringiteFormationFlag(r.value, { exposure: cold, curingMaxTemperatureC: 85, waterBinderRatio: 0.5 });
    expect(flag?.explanation).toContain("At the service temperature of 0.0 °C (the data set's limit; the service temperature entered is -5.0 °C)");
  });
});

describe("a curing peak above the data set's 100 °C, computed by the element model", () => {
  it("is evaluated at 100 °C and said so when asked (ettringite only loses stability on heating), and refused by default", () => {
    const r = temperatureHistory(base, exposure(), { points: 4, curingMaxTemperatureC: 117.8, curingAboveDataSet: "evaluate-at-limit" });
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    expect(r.value.summary.curingTemperatureC).toBe(100);
    expect(r.value.summary.curingTemperatureClampedFromC).toBe(117.8);
    expect(r.value.summary.atCuring!.temperatureC).toBe(100);
    expect(result.summary.curingTemperatureClampedFromC).toBeNull();
    const flag = delayedEttringiteFormationFlag(r.value, { exposure: exposure(), curingMaxTemperatureC: 117.8, waterBinderRatio: 0.5 });
    expect(flag?.severity).toBe("warning");
    expect(flag?.explanation).toContain("At 100.0 °C (the data set's limit; the computed maximum concrete temperature is 117.8 °C)");
    const refused = temperatureHistory(base, exposure(), { points: 4, curingMaxTemperatureC: 117.8 });
    expect(!refused.ok && refused.error.code).toBe("temperature_out_of_range");
  });
});

describe("bad input", () => {
  it("refuses a curing temperature outside the 0–100 °C of the data set, naming the field", () => {
    const r = temperatureHistory(base, exposure(), { points: 4, curingMaxTemperatureC: 120 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe("temperature_out_of_range");
      if (r.error.code === "temperature_out_of_range") expect(r.error.field).toBe("curing.maxTemperatureC");
    }
  });

  it("refuses a sweep whose end is not above its start", () => {
    const r = temperatureHistory(base, exposure(), { points: 4, sweepFromC: 50, sweepToC: 40 });
    expect(r.ok).toBe(false);
  });
});

describe("the Monte Carlo path: the stability temperature by root finding from the reference run's", () => {
  const book = newWarmStartBook();
  const reference = temperatureHistory({ ...base, book }, exposure(), { points: 12, curingMaxTemperatureC: 85 });
  if (!reference.ok) throw new Error(JSON.stringify(reference.error));
  const tolerance = DEFAULT_TOLERANCE_C;

  it("finds, on the same data, the limit the temperature grid brackets (like with like: only the search differs), to the root-finding tolerance", () => {
    const sample = temperatureHistory({ ...base, book: readingBook(book) }, exposure(), { points: 12, curingMaxTemperatureC: 85, reduced: true });
    if (!sample.ok) throw new Error(JSON.stringify(sample.error));
    const [a, b] = [reference.value.summary.stabilityLimit, sample.value.summary.stabilityLimit];
    expect(a.kind).toBe("found");
    expect(b.kind).toBe("found");
    if (a.kind !== "found" || b.kind !== "found") return;
    expect(Math.abs(a.temperatureC - b.temperatureC)).toBeLessThan(2 * tolerance);
    // The reduced path solves the service and curing states only, and they agree with the full path's.
    expect(sample.value.sweep.points.map((p) => p.dose)).toEqual([20, 85]);
    expect(sample.value.summary.atCuring!.ettringiteMol).toBeCloseTo(reference.value.summary.atCuring!.ettringiteMol, 8);
    expect(sample.value.summary.atService.ettringiteSaturationIndexWithoutIt).toBeCloseTo(reference.value.summary.atService.ettringiteSaturationIndexWithoutIt!, 6);
  });

  it("decides a sample's flag from the presence of ettringite where it is present, without the equilibrium without it (same decided bracket as from the computed indices)", () => {
    const decisions = [60, 65];
    const book60 = newWarmStartBook();
    const full = temperatureHistory({ ...base, book: book60 }, exposure(), { points: 12, curingMaxTemperatureC: 60 });
    if (!full.ok) throw new Error(JSON.stringify(full.error));
    const sample = temperatureHistory({ ...base, book: readingBook(book60) }, exposure(), { points: 12, curingMaxTemperatureC: 60, reduced: true, decisionTemperaturesC: decisions });
    if (!sample.ok) throw new Error(JSON.stringify(sample.error));
    const s = sample.value.summary;
    // Ettringite is present at 20 and 60 °C in this paste: the index without it is not computed there, and was positive on the full path.
    for (const [state, reference] of [[s.atService, full.value.summary.atService], [s.atCuring!, full.value.summary.atCuring!]] as const) {
      expect(state.ettringiteMol).toBeGreaterThan(0);
      expect(state.ettringiteSaturationIndexWithoutIt).toBeNull();
      expect(reference.ettringiteSaturationIndexWithoutIt!).toBeGreaterThan(0);
    }
    // The full path's limit lies above 65 °C, and the decided bracket says so.
    expect(full.value.summary.stabilityLimit.kind).toBe("found");
    if (full.value.summary.stabilityLimit.kind === "found") expect(full.value.summary.stabilityLimit.temperatureC).toBeGreaterThan(65);
    expect(s.stabilityLimit).toEqual({ kind: "decided", bracketC: [65, 95] });
  });

  const pasteWithout = pasteAtTemperature(base, {}, ["ettringite"]);
  const found = reference.value.summary.stabilityLimit;
  it.each([
    ["20 °C below", -20],
    ["7 °C above", 7],
  ])("walks out from a hint %s the limit and finds the same root", (_label, offsetC) => {
    if (found.kind !== "found") throw new Error("reference limit not found");
    const near = stabilityLimitNear(pasteWithout, "ettringite", { fromC: 5, toC: 95 }, found.temperatureC + offsetC, tolerance, DEFAULT_MAX_ITERATIONS);
    expect(near.kind).toBe("found");
    if (near.kind === "found") expect(Math.abs(near.temperatureC - found.temperatureC)).toBeLessThan(2 * tolerance);
  });

  it("reports stable throughout when the phase is still stable at the top of the range", () => {
    if (found.kind !== "found") throw new Error("reference limit not found");
    expect(stabilityLimitNear(pasteWithout, "ettringite", { fromC: 5, toC: found.temperatureC - 3 }, 40, tolerance, DEFAULT_MAX_ITERATIONS)).toEqual({ kind: "stable-throughout", upToC: found.temperatureC - 3 });
  });
});
