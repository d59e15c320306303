import { describe, it, expect } from "vitest";
import { binderSystemFromInput } from "../../lib/cement/binder-system";
import { chlorideBinding, exposureChlorideMgPerL, SEAWATER_CHLORIDE_MG_PER_L, type ChlorideBindingScenario } from "../../lib/scenarios/chloride-binding";
import type { ScenarioBase } from "../../lib/scenarios/sweep";
import { exposureInput } from "../../lib/schema/exposure-input";
import { loadDataset } from "../../lib/data/load-dataset";

/**
 * The chloride-binding scenario on typical pastes (presets labelled "typical"; w/b 0.5, 350 kg/m³, 28 days at 20 °C).
 * Note on independence: the Friedel's and Kuzel's salt data come from Balonis et al. (2010, Cem. Concr. Res. 40,
 * 1009), so the checks below rest on other sources: the stoichiometry of Friedel's salt, ion-exchange studies of
 * AFm phases, and measured binding of blended pastes.
 */
function base(supplementaryMaterials: unknown[] = []): ScenarioBase {
  const system = binderSystemFromInput({
    cement: { kind: "preset", presetId: "en197-cem-i" },
    supplementaryMaterials,
    mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 350 },
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  });
  if (!system.ok) throw new Error(JSON.stringify(system.error));
  return { composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350 };
}

function run(b: ScenarioBase, exposureRaw: Record<string, unknown>, points = 13): ChlorideBindingScenario {
  const result = chlorideBinding(b, exposureInput.parse(exposureRaw), { points });
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  return result.value;
}

/** Bound chloride (mg/g binder) at a free chloride (mol/kg water), by linear interpolation along the isotherm. */
function boundAtFree(s: ChlorideBindingScenario, freeMolPerKg: number): number {
  const iso = s.isotherm;
  const i = iso.findIndex((p) => p.freeChlorideMolPerKgWater >= freeMolPerKg);
  if (i <= 0) throw new Error(`free chloride ${freeMolPerKg} mol/kg not inside the isotherm`);
  const [a, b] = [iso[i - 1], iso[i]];
  return a.boundChlorideMgPerGBinder + ((b.boundChlorideMgPerGBinder - a.boundChlorideMgPerGBinder) * (freeMolPerKg - a.freeChlorideMolPerKgWater)) / (b.freeChlorideMolPerKgWater - a.freeChlorideMolPerKgWater);
}

const portland = run(base(), { chlorideMgPerL: 19_400 });

describe("chloride binding in a plain Portland paste (NaCl)", () => {
  it("reaches a true equilibrium at every dose: no absent solid is left supersaturated (Gibbs-minimum condition)", () => {
    for (const p of portland.sweep.points) expect(p.maxSaturationIndexOfAbsentSolids, `dose ${p.dose}`).toBeLessThanOrEqual(1e-3);
  });

  it("conserves chloride: bound plus free equals the binder's chloride plus the dose at every point (mass balance)", () => {
    for (const p of portland.sweep.points) expect(p.boundChlorideMassPercent + p.freeChlorideMassPercent).toBeCloseTo(p.totalChlorideMassPercent, 6);
  });

  it("forms Friedel's or Kuzel's salt at the expense of the chloride-free AFm as chloride rises (Suryavanshi, Scantlebury & Lyon 1996, Cem. Concr. Res. 26, 717; Birnin-Yauri & Glasser 1998, Cem. Concr. Res. 28, 1713; from memory)", () => {
    const [first, ...rest] = portland.sweep.points;
    expect(first.friedelSaltMol + first.kuzelSaltMol).toBe(0);
    const last = rest[rest.length - 1];
    expect(last.friedelSaltMol).toBeGreaterThan(0);
    expect(last.chlorideFreeAfmMol).toBeLessThan(first.chlorideFreeAfmMol);
    expect(portland.summary.precursorAfm).not.toBeNull();
  });

  it("gives Friedel's salt a negative saturation index and a positive formation ΔrG before any chloride is added (no Friedel's salt without chloride; sign convention ΔrG = −RT ln10·SI of formation)", () => {
    expect(portland.summary.friedelSaltSaturationIndexUnexposed).toBeLessThan(0);
    expect(portland.summary.friedelFormationGibbsKJPerMolUnexposed!).toBeGreaterThan(0);
  });

  it("uses up the AFm capacity within the sweep, binding about one Cl per Al of the AFm as the formula Ca4Al2Cl2(OH)12·4H2O requires (Birnin-Yauri & Glasser 1998), and beyond it nearly all added chloride stays free", () => {
    const s = portland.summary;
    expect(s.capacityExhaustedAtTotalChlorideMassPercent).not.toBeNull();
    // the largest bound chloride is the AFm stoichiometric capacity, give or take Al drawn from ettringite or released to it
    expect(s.boundChlorideMaxMassPercent / s.afmStoichiometricCapacityMassPercent).toBeGreaterThan(0.8);
    expect(s.boundChlorideMaxMassPercent / s.afmStoichiometricCapacityMassPercent).toBeLessThan(1.3);
    expect(s.freeFractionOfIncrementAfterExhaustion!).toBeGreaterThan(0.9);
    expect(s.freeFractionOfIncrementBeforeExhaustion!).toBeLessThan(s.freeFractionOfIncrementAfterExhaustion!);
  });

  it("locates the exposure point at the exposure's free chloride and states it per m³ as % of binder × binder content", () => {
    const e = portland.summary.exposure!;
    expect(e.reachedInSweep).toBe(true);
    // 19 400 mg/L ÷ 35.45 g/mol = 0.547 mol/L (≈ mol/kg in dilute solution)
    expect(e.freeChlorideMolPerKgWater).toBeCloseTo(19.4 / 35.45, 3);
    expect(e.totalChlorideKgPerM3).toBeCloseTo((e.totalChlorideMassPercent / 100) * 350, 9);
    expect(e.boundChlorideMassPercent + e.freeChlorideMassPercent).toBeCloseTo(e.totalChlorideMassPercent, 6);
  });
});

describe("binders richer in reactive alumina bind more chloride than plain Portland cement at the same free chloride (Arya, Buenfeld & Newman 1990, Cem. Concr. Res. 20, 291; Thomas, Hooton, Scott & Zibara 2012, Cem. Concr. Res. 42, 1; from memory)", () => {
  const slag = run(base([{ type: "slag", massPercentOfBinder: 40, composition: { kind: "preset", presetId: "slag-typical" } }]), {});
  const metakaolin = run(base([{ type: "metakaolin", massPercentOfBinder: 10, composition: { kind: "preset", presetId: "metakaolin-typical" } }]), {});
  const freeMolPerKg = 0.5;

  it("with 40 % slag", () => {
    expect(boundAtFree(slag, freeMolPerKg)).toBeGreaterThan(boundAtFree(portland, freeMolPerKg));
  });

  it("with 10 % metakaolin", () => {
    expect(boundAtFree(metakaolin, freeMolPerKg)).toBeGreaterThan(boundAtFree(portland, freeMolPerKg));
  });

  it("without an exposure concentration the exposure point is absent", () => {
    expect(slag.summary.exposure).toBeNull();
  });
});

describe("sea-water exposure", () => {
  const sea = run(base(), { seawater: "submerged" }, 10);

  it("uses NaCl + MgCl2 and the chloride of standard sea water, about 19.4 g/L (Millero et al. 2008, Deep-Sea Res. I 55, 50; from memory)", () => {
    expect(sea.salt).toBe("NaCl+MgCl2 (sea-water ratio)");
    expect(exposureChlorideMgPerL(exposureInput.parse({ seawater: true }))).toBe(SEAWATER_CHLORIDE_MG_PER_L);
    expect(sea.summary.exposure!.freeChlorideMolPerKgWater).toBeCloseTo(0.547, 2);
  });

  it("precipitates the added magnesium as a magnesium solid (brucite or hydrotalcite) rather than leaving it dissolved (pH above 12 keeps Mg below µmol/kg; brucite solubility, common practice)", () => {
    // Mg held by the magnesium solids, mol per 100 g binder, from their volumes and the data set's molar volumes: it
    // must rise along the sweep (volumes alone need not: Friedel's salt can take Al from the hydrotalcite).
    const loaded = loadDataset();
    if (!loaded.ok) throw new Error(loaded.error.message);
    const magnesiumInSolids = (point: (typeof sea.sweep.points)[number]) =>
      ["brucite", "hydrotalcite", "msh"].reduce((sum, id) => {
        const species = loaded.value.species.filter((x) => x.id === id || x.solution === id);
        const molarVolume = species[0]?.molarVolumeCm3PerMol;
        return molarVolume && species.length === 1 ? sum + ((point.phaseVolumesCm3[id] ?? 0) / molarVolume) * (species[0].elements.Mg ?? 0) : sum;
      }, 0);
    const first = sea.sweep.points[0];
    const last = sea.sweep.points[sea.sweep.points.length - 1];
    expect(last.phaseVolumesCm3["brucite"] ?? 0).toBeGreaterThan(0);
    expect(magnesiumInSolids(last)).toBeGreaterThan(magnesiumInSolids(first));
  });
});

describe("bad options", () => {
  it("rejects a point count below 2 with a typed error naming the field", () => {
    const r = chlorideBinding(base(), exposureInput.parse({}), { points: 1 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatchObject({ code: "invalid_input", field: "points" });
  });

  it("rejects a maximum dose above 10 % of binder mass", () => {
    const r = chlorideBinding(base(), exposureInput.parse({}), { points: 5, maximumDoseMassPercent: 20 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatchObject({ code: "invalid_input", field: "maximumDoseMassPercent" });
  });
});
