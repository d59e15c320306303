import { describe, it, expect } from "vitest";
import { curingInputFromBinderForm, isBinderForm } from "../../lib/curing/binder-form-input";
import { parseCuringInput } from "../../lib/schema/curing-input";

const base = {
  element: { thicknessM: 0.5 },
  concrete: { binderKgPerM3: 350, waterBinderRatio: 0.5, fcm28MPa: 38 },
  placementTemperatureC: 20,
  ambient: { kind: "constant", temperatureC: 15 },
};
const phaseCement = { kind: "phases", phasesMassPercent: { alite: 60, belite: 15, aluminate: 8, ferrite: 9, gypsum: 5, freeLime: 1, periclase: 2 } };

describe("binder form of the curing input", () => {
  it("turns the binder form into a valid curing input with the thermodynamic heat curve", () => {
    const raw = { ...base, binder: { cement: phaseCement, heatCalculation: { points: 6 } } };
    expect(isBinderForm(raw)).toBe(true);
    const converted = curingInputFromBinderForm(raw);
    if (!converted.ok) throw new Error(converted.error.message);
    const parsed = parseCuringInput(converted.value.curingInput);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.value.heatCurve?.points).toHaveLength(7); // (0, 0) and the six ages
    expect(parsed.value.heatCurve?.points.at(-1)?.cumulativeHeatJPerG).toBeGreaterThan(300);
  });

  it("derives the cement phases of the curing form from a phase analysis: SO3 of gypsum is 46.5 % of its mass (CaSO4·2H2O stoichiometry, common practice)", () => {
    const converted = curingInputFromBinderForm({ ...base, binder: { cement: phaseCement, heatCalculation: { points: 4 } } });
    if (!converted.ok) throw new Error(converted.error.message);
    const phases = (converted.value.curingInput.cement as { phasesMassPercent: Record<string, number> }).phasesMassPercent;
    expect(phases.C3S).toBeCloseTo(60, 9); // the analysis sums to 100
    expect(phases.MgO).toBeCloseTo(2, 9);
    expect(phases.SO3).toBeCloseTo(5 * 0.465, 2);
  });

  it("names the curing field when the mix is out of the binder model's range", () => {
    const converted = curingInputFromBinderForm({ ...base, concrete: { ...base.concrete, waterBinderRatio: 0.22 }, binder: { cement: phaseCement } });
    expect(converted.ok).toBe(false);
    if (converted.ok) return;
    expect(converted.error.field).toBe("concrete.waterBinderRatio");
    expect(converted.error.message).toMatch(/0\.25 and 0\.80/);
  });

  it("refuses a slag blend, naming binder.supplementaryMaterials and pointing to the phase form", () => {
    const converted = curingInputFromBinderForm({ ...base, binder: { cement: { kind: "preset", presetId: "en197-cem-iii-a" } } });
    expect(converted.ok).toBe(false);
    if (converted.ok) return;
    expect(converted.error.field).toBe("binder.supplementaryMaterials");
    expect(converted.error.message).toMatch(/slag/);
  });

  it("refuses both forms at once and unknown heatCalculation keys", () => {
    const both = curingInputFromBinderForm({ ...base, cement: { phasesMassPercent: { C3S: 60, C2S: 15, C3A: 8, C4AF: 9 } }, binder: { cement: phaseCement } });
    expect(!both.ok && both.error.field).toBe("cement");
    const unknown = curingInputFromBinderForm({ ...base, binder: { cement: phaseCement, heatCalculation: { temperature: 20 } } });
    expect(!unknown.ok && unknown.error.field).toBe("binder.heatCalculation.temperature");
    const range = curingInputFromBinderForm({ ...base, binder: { cement: phaseCement, heatCalculation: { temperatureC: 90 } } });
    expect(!range.ok && range.error.message).toBe("binder.heatCalculation.temperatureC must be between 5 and 60 °C");
  });
});
