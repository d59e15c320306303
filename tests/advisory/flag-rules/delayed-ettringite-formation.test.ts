import { describe, it, expect } from "vitest";
import { binderSystemFromInput } from "../../../lib/cement/binder-system";
import { defDecisionTemperaturesC, delayedEttringiteFormationFlag } from "../../../lib/advisory/flag-rules/delayed-ettringite-formation";
import { parseExposureInput } from "../../../lib/schema/exposure-input";
import { decidedStabilityLimit, temperatureHistory, type StabilityLimit } from "../../../lib/scenarios/temperature-history";
import type { ScenarioBase } from "../../../lib/scenarios/sweep";

/** Typical CEM I paste (scenario brief): w/b 0.5, 350 kg/m³, 28 days at 20 °C. */
const system = binderSystemFromInput({
  cement: { kind: "preset", presetId: "en197-cem-i" },
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
});
if (!system.ok) throw new Error(JSON.stringify(system.error));
const base: ScenarioBase = { composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350 };
const parsed = parseExposureInput({ serviceTemperatureC: 20, wetting: "wet-rarely-dry" });
if (!parsed.ok) throw new Error(parsed.error.message);
const exposure = parsed.value;

function resultFor(curingMaxTemperatureC: number) {
  const result = temperatureHistory(base, exposure, { points: 8, curingMaxTemperatureC });
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return result.value;
}
function flagFor(curingMaxTemperatureC: number) {
  return delayedEttringiteFormationFlag(resultFor(curingMaxTemperatureC), { exposure, curingMaxTemperatureC, waterBinderRatio: 0.5 });
}

describe("the delayed-ettringite-formation flag (issue 5 acceptance)", () => {
  const hot = flagFor(85);

  it("warns when the same mix is cured at 85 °C: above the 70 °C associated with DEF (Taylor, Famy & Scrivener 2001, Cem. Concr. Res. 31, 683)", () => {
    expect(hot).toBeDefined();
    expect(hot!.id).toBe("delayed-ettringite-formation");
    expect(hot!.severity).toBe("warning");
  });

  it("cites the 70 °C specification limit as common practice and Taylor, Famy & Scrivener 2001 in its basis", () => {
    expect(hot!.basis).toContain("70 °C");
    expect(hot!.basis).toMatch(/common/i);
    expect(hot!.basis).toContain("Taylor, Famy & Scrivener 2001");
  });

  it("names the ettringite formation reaction with its saturation index and ΔrG in kJ/mol, and why the model's stability temperature is likely too high", () => {
    expect(hot!.explanation).toContain("ettringite");
    expect(hot!.explanation).toContain("ΔrG");
    expect(hot!.explanation).toContain("kJ/mol");
    expect(hot!.explanation).toContain("saturation index");
    expect(hot!.explanation).toContain("likely too high");
    // The known reasons (tests/data/ettringite-temperature.test.ts), not the Al(OH)4- heat capacity, which cancels.
    expect(hot!.explanation).toMatch(/sulfate that C-S-H takes up/);
    expect(hot!.explanation).toMatch(/siliceous hydrogarnet/);
    expect(hot!.actions.length).toBeGreaterThan(1);
  });

  it("does not fire when the same mix is cured at 40 °C", () => {
    expect(flagFor(40)).toBeUndefined();
  });

  const warm = resultFor(67);

  it("gives a caution within the 5 °C margin below 70 °C (curing-limits data: Taylor, Famy & Scrivener 2001; common practice margin)", () => {
    expect(delayedEttringiteFormationFlag(warm, { exposure, curingMaxTemperatureC: 67, waterBinderRatio: 0.5 })?.severity).toBe("caution");
  });

  it("warns below 70 °C when the mix's own ettringite stability temperature is lower than the curing temperature (rule check on the 67 °C result with its limit set to 60 °C)", () => {
    const lowLimit = { ...warm, summary: { ...warm.summary, ettringiteStabilityTemperatureC: 60 } };
    const flag = delayedEttringiteFormationFlag(lowLimit, { exposure, curingMaxTemperatureC: 67, waterBinderRatio: 0.5 });
    expect(flag?.severity).toBe("warning");
    expect(flag?.explanation).toContain("exceeds the computed ettringite stability temperature");
  });

  it("does not fire when no curing temperature is known", () => {
    const result = temperatureHistory(base, exposure, { points: 4 });
    if (!result.ok) throw new Error(JSON.stringify(result.error));
    expect(delayedEttringiteFormationFlag(result.value, { exposure, waterBinderRatio: 0.5 })).toBeUndefined();
  });
});

describe("the flag from a Monte Carlo sample's decided limit", () => {
  // Property of the method, not a reference value: for a true stability temperature T_s and a curing temperature, the
  // bracket that decidedStabilityLimit narrows to (ettringite taken stable below T_s, index T_s − t) must give the same
  // flag as T_s found by root finding. The states are those of a real run, with their indices replaced.
  const real = resultFor(60);
  const withLimit = (limit: StabilityLimit, curingC: number, siAt: (t: number) => number) => {
    const s = real.summary;
    const atService = { ...s.atService, ettringiteSaturationIndexWithoutIt: siAt(s.atService.temperatureC) };
    const atCuring = { ...s.atCuring!, temperatureC: curingC, ettringiteSaturationIndexWithoutIt: siAt(curingC) };
    return { ...real, summary: { ...s, curingTemperatureC: curingC, atService, atCuring, stabilityLimit: limit, ettringiteStabilityTemperatureC: limit.kind === "found" ? limit.temperatureC : null } };
  };
  const severity = (result: typeof real, curingC: number) => delayedEttringiteFormationFlag(result, { exposure, curingMaxTemperatureC: curingC, waterBinderRatio: 0.5 })?.severity ?? "none";

  it("is the flag of the root itself, for limits and curing temperatures on a grid", () => {
    let compared = 0;
    for (let stabilityC = 30.25; stabilityC <= 94; stabilityC += 2.5) {
      for (let curingC = 25; curingC <= 89; curingC += 1.5) {
        const siAt = (t: number) => stabilityC - t;
        const states = withLimit({ kind: "stable-throughout", upToC: 95 }, curingC, siAt).summary;
        const decided = decidedStabilityLimit(defDecisionTemperaturesC(curingC), { fromC: 5, toC: 95 }, states.atService, states.atCuring, siAt);
        expect(decided?.kind, `T_s ${stabilityC}, curing ${curingC}`).toBe("decided");
        const found: StabilityLimit = { kind: "found", temperatureC: stabilityC, iterations: 1, bracketC: [stabilityC - 0.1, stabilityC + 0.1] };
        expect(severity(withLimit(decided!, curingC, siAt), curingC), `T_s ${stabilityC}, curing ${curingC}`).toBe(severity(withLimit(found, curingC, siAt), curingC));
        compared++;
      }
    }
    expect(compared).toBeGreaterThan(500);
  });

  it("reads a state whose index without ettringite was not computed (a sample, ettringite present) as stable, and says so in words", () => {
    const s = real.summary;
    const present = { ...s.atService, ettringiteMol: 0.01, ettringiteSaturationIndexWithoutIt: null, ettringiteFormationGibbsKJPerMol: null };
    const atCuring = { ...s.atCuring!, temperatureC: 60, ettringiteMol: 0.008, ettringiteSaturationIndexWithoutIt: null, ettringiteFormationGibbsKJPerMol: null };
    const decided = decidedStabilityLimit(defDecisionTemperaturesC(60), { fromC: 5, toC: 95 }, present, atCuring, () => -0.5);
    expect(decided).toEqual({ kind: "decided", bracketC: [60, 65] });
    const result = { ...real, summary: { ...s, atService: present, atCuring, stabilityLimit: decided!, ettringiteStabilityTemperatureC: null } };
    const flag = delayedEttringiteFormationFlag(result, { exposure, curingMaxTemperatureC: 60, waterBinderRatio: 0.5 });
    expect(flag?.severity).toBe("caution");
    expect(flag?.explanation).toContain("a positive saturation index (ettringite is present)");
    expect(flag?.explanation).not.toMatch(/null|NaN/);
  });

  it("is left to root finding where the sides cannot be told: unstable at every decision temperature and at the service temperature", () => {
    const siAt = () => -1;
    const states = withLimit({ kind: "absent-throughout", fromC: 5, toC: 95 }, 60, siAt).summary;
    expect(decidedStabilityLimit(defDecisionTemperaturesC(60), { fromC: 5, toC: 95 }, states.atService, states.atCuring, siAt)).toBeUndefined();
    // A decision temperature outside the range, too.
    expect(decidedStabilityLimit(defDecisionTemperaturesC(93), { fromC: 5, toC: 95 }, states.atService, states.atCuring, siAt)).toBeUndefined();
  });
});
