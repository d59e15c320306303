import { describe, it, expect } from "vitest";
import { chlorideBindingLimitFlag, DEPASSIVATION_THRESHOLD_CHLORIDE_MASS_PERCENT_OF_BINDER } from "../../../lib/advisory/flag-rules/chloride-binding-limit";
import { binderSystemFromInput } from "../../../lib/cement/binder-system";
import { chlorideBinding } from "../../../lib/scenarios/chloride-binding";
import { exposureInput, type ExposureInput } from "../../../lib/schema/exposure-input";

/** The flag on real scenario results of a typical CEM I paste (w/b 0.5, 350 kg/m³, 28 days at 20 °C). */
const system = binderSystemFromInput({
  cement: { kind: "preset", presetId: "en197-cem-i" },
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
});
if (!system.ok) throw new Error(JSON.stringify(system.error));
const base = { composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350 };

function flagFor(raw: Record<string, unknown>) {
  const exposure: ExposureInput = exposureInput.parse(raw);
  const result = chlorideBinding(base, exposure, { points: 12 });
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return { result: result.value, flag: chlorideBindingLimitFlag(result.value, { exposure, waterBinderRatio: 0.5 }) };
}

describe("chloride-binding-limit", () => {
  it("warns when a strong brine (60 000 mg/L chloride) uses up the AFm capacity and the total chloride passes 0.4 % of binder (common practice threshold)", () => {
    const { result, flag } = flagFor({ chlorideMgPerL: 60_000 });
    expect(result.summary.exposure!.afmCapacityExhausted).toBe(true);
    expect(result.summary.exposure!.totalChlorideMassPercent).toBeGreaterThan(DEPASSIVATION_THRESHOLD_CHLORIDE_MASS_PERCENT_OF_BINDER);
    expect(flag?.severity).toBe("warning");
    expect(flag?.explanation).toMatch(/Friedel's salt/);
    expect(flag?.explanation).toMatch(/ΔrG = -?\d+\.\d\d kJ\/mol/);
    expect(flag?.basis).toMatch(/EN 206 Table 15/);
    expect(flag?.actions.length).toBeGreaterThan(0);
  });

  it("cautions for sea water: the total chloride passes 0.4 % while the AFm still buffers it", () => {
    const { result, flag } = flagFor({ seawater: "submerged" });
    expect(result.summary.exposure!.afmCapacityExhausted).toBe(false);
    expect(flag?.severity).toBe("caution");
    expect(flag?.explanation).toMatch(/coexist/);
  });

  it("does not fire for water with 500 mg/L chloride, below the paste's own free chloride", () => {
    expect(flagFor({ chlorideMgPerL: 500 }).flag).toBeUndefined();
  });

  it("does not fire for unreinforced concrete, where the depassivation threshold does not apply", () => {
    expect(flagFor({ chlorideMgPerL: 60_000, reinforced: false }).flag).toBeUndefined();
  });

  it("gives information only for de-icing salts without a concentration, and nothing without any chloride source", () => {
    expect(flagFor({ deIcingSalts: true }).flag?.severity).toBe("info");
    expect(flagFor({}).flag).toBeUndefined();
  });
});
