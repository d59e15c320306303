import { describe, it, expect } from "vitest";
import { binderSystemFromInput } from "../../../lib/cement/binder-system";
import { thaumasiteFormationFlag } from "../../../lib/advisory/flag-rules/thaumasite-formation";
import { parseExposureInput, type ExposureInputRaw } from "../../../lib/schema/exposure-input";
import { thaumasite } from "../../../lib/scenarios/thaumasite";
import type { ScenarioBase } from "../../../lib/scenarios/sweep";

/** Limestone-filler binder (typical): CEM I preset + 15 % limestone filler, w/b 0.5, 350 kg/m³, 28 days at 20 °C. */
const system = binderSystemFromInput({
  cement: { kind: "preset", presetId: "en197-cem-i" },
  supplementaryMaterials: [{ type: "limestone", massPercentOfBinder: 15, composition: { kind: "preset", presetId: "limestone-typical" } }],
  mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
});
if (!system.ok) throw new Error(JSON.stringify(system.error));
const base: ScenarioBase = { composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350 };

function exposureOf(raw: ExposureInputRaw) {
  const parsed = parseExposureInput(raw);
  if (!parsed.ok) throw new Error(parsed.error.message);
  return parsed.value;
}
function flagFor(raw: ExposureInputRaw) {
  const exposure = exposureOf(raw);
  const result = thaumasite(base, exposure, { points: 4 });
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return { result: result.value, flag: thaumasiteFormationFlag(result.value, { exposure, waterBinderRatio: 0.5 }) };
}

// Sodium sulfate groundwater, 3000 mg/L SO4 (EN 206 XA2/XA3 boundary, EN 206 Table 2).
const coldWet = flagFor({ sulfateMgPerL: 3000, sulfateCation: "Na", serviceTemperatureC: 5, wetting: "permanently-wet" });
const warmDry = flagFor({ sulfateMgPerL: 3000, sulfateCation: "Na", serviceTemperatureC: 25, wetting: "dry" });

describe("the thaumasite-formation flag (issue 5 acceptance)", () => {
  it("warns for a limestone-filler binder at 5 °C with sulfate and wet exposure (Thaumasite Expert Group 1999: cold, wet, sulfate and carbonate)", () => {
    expect(coldWet.flag).toBeDefined();
    expect(coldWet.flag!.id).toBe("thaumasite-formation");
    expect(coldWet.flag!.severity).toBe("warning");
  });

  it("is not raised at 25 °C in dry exposure", () => {
    expect(warmDry.flag).toBeUndefined();
  });

  it("names the reaction with its saturation index and ΔrG, and cites the expert group, BRE SD1 and Schmidt et al. 2008", () => {
    const flag = coldWet.flag!;
    expect(flag.explanation).toContain("thaumasite");
    expect(flag.explanation).toContain("saturation index");
    expect(flag.explanation).toContain("ΔrG");
    expect(flag.explanation).toContain("kJ/mol");
    expect(flag.basis).toContain("Thaumasite Expert Group 1999");
    expect(flag.basis).toContain("BRE Special Digest 1");
    expect(flag.basis).toContain("Schmidt");
    expect(flag.basis).toContain("Cem. Concr. Res. 38, 337");
    expect(flag.actions.length).toBeGreaterThan(1);
  });

  it("is not raised in the cold when the concrete stays dry (water is a necessary condition, Thaumasite Expert Group 1999)", () => {
    const dry = exposureOf({ sulfateMgPerL: 3000, serviceTemperatureC: 5, wetting: "dry" });
    expect(thaumasiteFormationFlag(coldWet.result, { exposure: dry, waterBinderRatio: 0.5 })).toBeUndefined();
  });

  it("gives only a caution when the engine finds thaumasite at a warm (25 °C) service temperature in wet exposure (most attack below about 15 °C, Thaumasite Expert Group 1999, from memory)", () => {
    expect(warmDry.result.summary.atService.thaumasiteMol).toBeGreaterThan(0);
    const wet = exposureOf({ sulfateMgPerL: 3000, serviceTemperatureC: 25, wetting: "wet-rarely-dry" });
    expect(thaumasiteFormationFlag(warmDry.result, { exposure: wet, waterBinderRatio: 0.5 })?.severity).toBe("caution");
  });

  it("is a caution only in a mild sulfate class (400 mg/L: EN 206 XA1, ACI 318 S1) and information below the classes (50 mg/L), though the equilibrium holds thaumasite in both", () => {
    const mild = flagFor({ sulfateMgPerL: 400, sulfateCation: "Na", serviceTemperatureC: 5, wetting: "permanently-wet" });
    expect(mild.result.summary.atService.thaumasiteMol).toBeGreaterThan(0);
    expect(mild.flag?.severity).toBe("caution");
    const dilute = flagFor({ sulfateMgPerL: 50, sulfateCation: "Na", serviceTemperatureC: 5, wetting: "permanently-wet" });
    expect(dilute.result.summary.atService.thaumasiteMol).toBeGreaterThan(0);
    expect(dilute.flag?.severity).toBe("info");
    expect(dilute.flag?.explanation).toContain("below the lowest sulfate classes (EN 206 Table 2 XA1 from 200 mg/L, ACI 318-19 Table 19.3.1.1 S1 from 150 ppm)");
  });

  it("is not raised without a sulfate source in the exposure", () => {
    const { flag } = flagFor({ serviceTemperatureC: 5, wetting: "permanently-wet" });
    expect(flag).toBeUndefined();
  });
});
