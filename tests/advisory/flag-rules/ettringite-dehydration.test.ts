import { describe, it, expect } from "vitest";
import { ettringiteDehydrationFlag } from "../../../lib/advisory/flag-rules/ettringite-dehydration";
import { binderSystemFromInput } from "../../../lib/cement/binder-system";
import { loadDataset } from "../../../lib/data/load-dataset";
import { dryingScenario } from "../../../lib/scenarios/drying";
import { exposureInput, type ExposureInput } from "../../../lib/schema/exposure-input";

/**
 * The flag on real drying-scenario results of a typical CEM I paste (w/b 0.5, 350 kg/m³, 28 days at 20 °C). The collapse
 * humidity of ettringite in the data set was derived from a recalled transition (about 5 % RH at 25 °C, Baquerizo et al.
 * 2016, Cem. Concr. Res. 79, 31): the cases below sit well to either side of it, so they test the rule, not the data.
 */
const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const system = binderSystemFromInput({
  cement: { kind: "preset", presetId: "en197-cem-i" },
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
});
if (!system.ok) throw new Error(JSON.stringify(system.error));
const base = { composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350, dataset: loaded.value };

function flagFor(raw: Record<string, unknown>) {
  const exposure: ExposureInput = exposureInput.parse(raw);
  const result = dryingScenario(base, exposure, { points: 4, map: { relativeHumiditiesPercent: [50], temperaturesC: [20] } });
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return ettringiteDehydrationFlag(result.value, { exposure, waterBinderRatio: 0.5 });
}

describe("ettringite-dehydration", () => {
  it("cautions for a hot, very dry service (3 % RH, 60 °C), naming the reaction and its negative ΔrG", () => {
    const flag = flagFor({ relativeHumidityPercent: 3, serviceTemperatureC: 60, wetting: "dry" });
    expect(flag?.severity).toBe("caution");
    expect(flag?.explanation).toMatch(/metaettringite/);
    expect(flag?.explanation).toMatch(/ΔrG = -\d+\.\d kJ/);
    expect(flag?.basis).toMatch(/Baquerizo/);
    expect(flag?.actions.length).toBeGreaterThan(0);
  });

  it("warns when the same dry, hot exposure alternates with wetting (collapse and rehydration cycles; common practice)", () => {
    expect(flagFor({ relativeHumidityPercent: 3, serviceTemperatureC: 60, wetting: "wet-dry" })?.severity).toBe("warning");
  });

  it("gives information when the service humidity is within a factor 2 of the collapse humidity but above it (8 % RH at 25 °C against about 5 %)", () => {
    const flag = flagFor({ relativeHumidityPercent: 8, serviceTemperatureC: 25 });
    expect(flag?.severity).toBe("info");
    expect(flag?.explanation).toMatch(/ΔrG = \+\d+\.\d kJ/);
  });

  it("does not fire at 50 % RH and 20 °C, for permanently wet concrete, or without a service humidity", () => {
    expect(flagFor({ relativeHumidityPercent: 50, serviceTemperatureC: 20 })).toBeUndefined();
    expect(flagFor({ wetting: "permanently-wet" })).toBeUndefined();
    expect(flagFor({})).toBeUndefined();
  });
});
