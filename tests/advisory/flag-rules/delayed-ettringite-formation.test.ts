import { describe, it, expect } from "vitest";
import { binderSystemFromInput } from "../../../lib/cement/binder-system";
import { delayedEttringiteFormationFlag } from "../../../lib/advisory/flag-rules/delayed-ettringite-formation";
import { parseExposureInput } from "../../../lib/schema/exposure-input";
import { temperatureHistory } from "../../../lib/scenarios/temperature-history";
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

  it("names the ettringite formation reaction with its saturation index and ΔrG in kJ/mol, and the data set's known over-stability", () => {
    expect(hot!.explanation).toContain("ettringite");
    expect(hot!.explanation).toContain("ΔrG");
    expect(hot!.explanation).toContain("kJ/mol");
    expect(hot!.explanation).toContain("saturation index");
    expect(hot!.explanation).toContain("too stable");
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
