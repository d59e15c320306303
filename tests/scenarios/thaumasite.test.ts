import { describe, it, expect } from "vitest";
import { binderSystemFromInput } from "../../lib/cement/binder-system";
import { parseExposureInput, type ExposureInputRaw } from "../../lib/schema/exposure-input";
import { thaumasite, type ThaumasiteOptions } from "../../lib/scenarios/thaumasite";
import type { ScenarioBase } from "../../lib/scenarios/sweep";

/** Typical pastes (scenario brief): w/b 0.5, 350 kg/m³, 28 days at 20 °C; the limestone binder is CEM I + 15 % limestone filler (typical CEM II/A-LL proportion, EN 197-1 allows 6–20 %). */
function paste(limestonePercent: number): ScenarioBase {
  const system = binderSystemFromInput({
    cement: { kind: "preset", presetId: "en197-cem-i" },
    supplementaryMaterials: limestonePercent > 0 ? [{ type: "limestone", massPercentOfBinder: limestonePercent, composition: { kind: "preset", presetId: "limestone-typical" } }] : [],
    mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350 },
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  });
  if (!system.ok) throw new Error(JSON.stringify(system.error));
  return { composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350 };
}

function run(base: ScenarioBase, raw: ExposureInputRaw, options: ThaumasiteOptions) {
  const exposure = parseExposureInput(raw);
  if (!exposure.ok) throw new Error(exposure.error.message);
  const result = thaumasite(base, exposure.value, options);
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return result.value;
}

const limestoneBinder = paste(15);
const plainBinder = paste(0);
// Sodium sulfate groundwater at the EN 206 XA2/XA3 boundary, 3000 mg/L SO4 (EN 206 Table 2).
const coldWet = run(limestoneBinder, { sulfateMgPerL: 3000, sulfateCation: "Na", serviceTemperatureC: 5, wetting: "permanently-wet" }, { points: 7 });

describe("a limestone-filler paste in cold sodium sulfate water", () => {
  it("forms thaumasite at 5 °C (Schmidt, Lothenbach, Romer, Scrivener, Rentsch & Figi 2008, Cem. Concr. Res. 38, 337: thaumasite in limestone cement pastes in Na2SO4 solution at 8 °C)", () => {
    expect(coldWet.summary.serviceTemperatureC).toBe(5);
    expect(coldWet.summary.atService.thaumasiteMol).toBeGreaterThan(0);
    expect(coldWet.summary.atService.saturationIndexWithoutIt).toBeGreaterThan(0);
    expect(coldWet.summary.atService.formationGibbsKJPerMol).toBeLessThan(0);
  });

  it("forms less thaumasite as the temperature rises over 0–30 °C (its stability field shrinks with temperature: Thaumasite Expert Group 1999, DETR; Schmidt et al. 2008)", () => {
    const points = coldWet.sweep.points;
    expect(points[0].dose).toBe(0);
    expect(points[points.length - 1].dose).toBe(30);
    for (let i = 1; i < points.length; i++) expect(points[i].thaumasiteMol).toBeLessThanOrEqual(points[i - 1].thaumasiteMol * (1 + 1e-9));
    expect(points[points.length - 1].thaumasiteMol).toBeLessThan(points[0].thaumasiteMol);
  });

  it("doses the sulfate to the ettringite capacity of the reacted aluminium (3 SO4 per 2 Al, ettringite formula) plus 2 % SO3 of the binder mass", () => {
    const { Al, S } = limestoneBinder.composition.reactedElementsMol;
    // SO3 = 32.06 + 3 × 15.999 g/mol (IUPAC 2021 atomic weights)
    expect(coldWet.summary.sulfateDoseMolSO3Per100gBinder).toBeCloseTo(1.5 * Al - S + 2 / 80.057, 9);
    // the water that carries it: mol SO4 × 96.056 g/mol / 3000 mg/L
    expect(coldWet.summary.solutionAddedKgPer100gBinder).toBeCloseTo((coldWet.summary.sulfateDoseMolSO3Per100gBinder * 96.056) / 3, 6);
  });

  it("leaves no allowed solid supersaturated along the sweep (equilibrium check on every saturation index)", () => {
    expect(coldWet.summary.equilibriumChecks.remainingSupersaturation).toEqual([]);
  });
});

describe("the conditions thaumasite needs (Thaumasite Expert Group 1999)", () => {
  it("needs a sulfate source: without exposure sulfate no thaumasite forms at 5 °C", () => {
    const noSulfate = run(limestoneBinder, { serviceTemperatureC: 5, wetting: "permanently-wet" }, { points: 3 });
    expect(noSulfate.summary.sulfateDoseMolSO3Per100gBinder).toBe(0);
    expect(noSulfate.summary.atService.thaumasiteMol).toBe(0);
    expect(noSulfate.summary.atService.saturationIndexWithoutIt).toBeLessThan(0);
  });

  it("needs carbonate: the plain CEM I paste forms less thaumasite than the limestone-filler paste", () => {
    const plain = run(plainBinder, { sulfateMgPerL: 3000, serviceTemperatureC: 5, wetting: "permanently-wet" }, { points: 3 });
    expect(plain.summary.atService.thaumasiteMol).toBeLessThan(coldWet.summary.atService.thaumasiteMol);
  });

  it("takes carbonate from carbonate aggregate and from bicarbonate in the water: more thaumasite for the plain paste", () => {
    const plain = run(plainBinder, { sulfateMgPerL: 3000, serviceTemperatureC: 5, wetting: "permanently-wet" }, { points: 3 });
    const withCarbonate = run(plainBinder, { sulfateMgPerL: 3000, bicarbonateMgPerL: 300, carbonateAggregate: true, serviceTemperatureC: 5, wetting: "permanently-wet" }, { points: 3 });
    // HCO3 = 1.008 + 12.011 + 3 × 15.999 g/mol; calcite = 40.078 + 12.011 + 3 × 15.999 g/mol (IUPAC 2021)
    const litres = (withCarbonate.summary.sulfateDoseMolSO3Per100gBinder * 96.056) / 3;
    expect(withCarbonate.summary.carbonateMolPer100gBinder.water).toBeCloseTo((litres * 0.3) / 61.016, 6);
    expect(withCarbonate.summary.carbonateMolPer100gBinder.aggregate).toBeCloseTo(10 / 100.086, 6);
    expect(withCarbonate.summary.atService.thaumasiteMol).toBeGreaterThan(plain.summary.atService.thaumasiteMol);
  });
});

describe("service temperature and bad input", () => {
  it("evaluates the coldest service temperature, and a minimum below the data set at 0 °C, saying so", () => {
    const r = run(limestoneBinder, { sulfateMgPerL: 3000, serviceTemperatureC: { minC: -10, maxC: 20 } }, { points: 3 });
    expect(r.summary.serviceTemperatureC).toBe(0);
    expect(r.summary.serviceTemperatureClampedFromC).toBe(-10);
  });

  it("refuses a negative sulfate excess, naming the option", () => {
    const exposure = parseExposureInput({ sulfateMgPerL: 3000 });
    if (!exposure.ok) throw new Error(exposure.error.message);
    const r = thaumasite(limestoneBinder, exposure.value, { points: 3, sulfateExcessSo3MassPercent: -1 });
    expect(r.ok).toBe(false);
    if (!r.ok && r.error.code === "invalid_option") expect(r.error.field).toBe("options.sulfateExcessSo3MassPercent");
    else expect.unreachable("expected invalid_option");
  });
});
