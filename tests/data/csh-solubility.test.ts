import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import path from "node:path";
import { componentTotals, equilibrateSystem } from "../../lib/equilibrium/equilibrate";
import { defaultSuppressedPhases } from "../../lib/data/kinetic-constraints";
import { defaultDatasetFiles, loadDataset, type Dataset } from "../../lib/data/load-dataset";
import { formationConsistencyJPerMol } from "../../lib/data/consistency";
import { dissolutionLog10K } from "../../lib/data/cement-dissolution";
import { speciesAtTemperature } from "../../lib/data/species-at-temperature";

/**
 * C-S-H solubility through the engine and the full data set (issue 3 acceptance): CaO–SiO2–H2O mixtures of
 * bulk Ca/Si 0.7–2.0 (and one with excess lime) at 25 °C, compared with the published solubility curve of
 * Greenberg & Chang (1965, J. Phys. Chem. 69, 553). The reference points live in
 * `tests/fixtures/csh/csh-solubility-25c.json` with their provenance: recalled from memory, not transcribed.
 *
 * Two C-S-H models are checked: the default data set (`lib/data/cement/csh.json`, the four-end-member solution of
 * Kulik 2011, Cem. Concr. Res. 41, 477), and the earlier default it replaced on 2026-12-02, the ideal binary of Kulik &
 * Kersten (2001) with end-members per one Si (`tests/fixtures/csh/csh-two-end-members-kulik-kersten-2001.json`, loaded
 * with the rest of the default files in place of `csh.json`), whose known deviations are kept as the reason.
 *
 * Comparison at equal dissolved Ca: the curve Si(Ca) does not depend on the liquid/solid ratio, whereas the
 * dissolved amounts at a given bulk Ca/Si do. Model molalities (mol/kg water) are compared with mmol/L; at
 * these concentrations (ionic strength below 0.07 mol/kg) the two differ by less than 0.5 % (common practice).
 */
type Point = { dissolvedCalciumMmolPerL: number; dissolvedSiliconMmolPerL: number };
const fixture = JSON.parse(readFileSync(path.join(__dirname, "../fixtures/csh/csh-solubility-25c.json"), "utf8")) as {
  solubilityCurve: Point[];
  portlanditeSaturatedEnd: Point;
  caSiOfCshWithPortlandite: { min: number; max: number };
};

type SweepPoint = { bulkCaSi: number; calciumMmolPerKg: number; siliconMmolPerKg: number; cshCaSi: number; portlanditeMol: number };

/** 0.05 mol SiO2 per kg of water: a dilute suspension (liquid/solid about 100–200 g/g), typical of such experiments. */
const SILICA_MOL_PER_KG_WATER = 0.05;
const WATER_MOLAR_MASS_G_PER_MOL = 18.015;
const BULK_CA_SI = [0.7, 0.8, 0.9, 1.0, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2.0];
/** Excess lime puts the mixture on the portlandite-saturated end. */
const LIME_SATURATED_BULK_CA_SI = 2.5;

function datasetWith(cshFile?: string): Dataset {
  const files = cshFile ? defaultDatasetFiles().map((f) => (path.basename(f) === "csh.json" && path.basename(path.dirname(f)) === "cement" ? cshFile : f)) : undefined;
  const loaded = loadDataset(files);
  if (!loaded.ok) throw new Error(loaded.error.message);
  return loaded.value;
}

function equilibriumAt(dataset: Dataset, bulkCaSi: number): SweepPoint {
  const totals = componentTotals({ CaO: bulkCaSi * SILICA_MOL_PER_KG_WATER, SiO2: SILICA_MOL_PER_KG_WATER, H2O: 1000 / WATER_MOLAR_MASS_G_PER_MOL }, "mol");
  if (!totals.ok) throw new Error(totals.error.message);
  const result = equilibrateSystem({ temperatureC: 25, elementTotalsMol: totals.value, suppressedPhases: defaultSuppressedPhases(25), dataset });
  if (!result.ok) throw new Error(JSON.stringify(result.error));
  const r = result.value;
  const elementsOf = new Map(dataset.species.map((s) => [s.id, s.elements]));
  const csh = r.phases.find((p) => p.id === "csh");
  // Ca/Si of the solid solution weighted by Si: end-members need not hold one Si each.
  let ca = 0;
  let si = 0;
  for (const m of csh?.members ?? []) {
    ca += m.moles * (elementsOf.get(m.id)?.Ca ?? 0);
    si += m.moles * (elementsOf.get(m.id)?.Si ?? 0);
  }
  return {
    bulkCaSi,
    calciumMmolPerKg: r.solution!.elementMolality.Ca * 1000,
    siliconMmolPerKg: r.solution!.elementMolality.Si * 1000,
    cshCaSi: si > 0 ? ca / si : NaN,
    portlanditeMol: r.phases.find((p) => p.id === "portlandite")?.moles ?? 0,
  };
}

/** Model Si at a dissolved Ca, by linear interpolation of log Si against log Ca between neighbouring sweep points; null outside the swept Ca. */
function modelSiliconAt(sweep: SweepPoint[], calciumMmol: number): number | null {
  const curve = [...sweep].sort((a, b) => a.calciumMmolPerKg - b.calciumMmolPerKg);
  for (let i = 1; i < curve.length; i += 1) {
    const lo = curve[i - 1];
    const hi = curve[i];
    if (calciumMmol >= lo.calciumMmolPerKg && calciumMmol <= hi.calciumMmolPerKg) {
      const f = Math.log(calciumMmol / lo.calciumMmolPerKg) / Math.log(hi.calciumMmolPerKg / lo.calciumMmolPerKg);
      return Math.exp(Math.log(lo.siliconMmolPerKg) + f * Math.log(hi.siliconMmolPerKg / lo.siliconMmolPerKg));
    }
  }
  return null;
}

const withinFactorOfTwo = (model: number | null, reference: number) => {
  expect(model).not.toBeNull();
  expect(model! / reference).toBeGreaterThan(0.5);
  expect(model! / reference).toBeLessThan(2);
};
const end = fixture.portlanditeSaturatedEnd;
const range = fixture.caSiOfCshWithPortlandite;

describe("C-S-H solubility at 25 °C, default data set (four-end-member solution of Kulik 2011, Cem. Concr. Res. 41, 477), against Greenberg & Chang (1965, J. Phys. Chem. 69, 553; points from memory, see the fixture)", () => {
  const dataset = datasetWith();
  const sweep = BULK_CA_SI.map((c) => equilibriumAt(dataset, c));
  const lime = equilibriumAt(dataset, LIME_SATURATED_BULK_CA_SI);
  const endMembers = dataset.species.filter((s) => s.solution === "csh");

  it("loads four end-members whose ΔfG°, ΔfH° and S° agree within 1 kJ/mol by Gibbs–Helmholtz (CODATA element entropies)", () => {
    expect(endMembers.map((s) => s.id).sort()).toEqual(["csh-ca0.6667-si1", "csh-ca0.8333-si0.6667", "csh-ca1.3333-si1", "csh-ca1.5-si0.6667"]);
    for (const s of endMembers) expect(Math.abs(formationConsistencyJPerMol(s) ?? Infinity), s.id).toBeLessThan(1000);
  });

  // log K (= Ca+2, SiO(OH)3-, OH-, H2O) at 25 °C recalled from Kulik (2011) and Lothenbach et al. (2019, Cem. Concr.
  // Res. 115, 472), from memory; same source as the ΔfG° (guards typing and the ions of this data set only).
  const publishedLog10K: Record<string, number> = { "csh-ca0.6667-si1": -6.19, "csh-ca0.8333-si0.6667": -6.9, "csh-ca1.3333-si1": -10.96, "csh-ca1.5-si0.6667": -10.47 };
  for (const [id, log10K] of Object.entries(publishedLog10K)) {
    it(`gives ${id} a solubility product within 0.3 of log K ${log10K} (Kulik 2011, from memory)`, () => {
      const result = dissolutionLog10K(speciesAtTemperature(dataset, 298.15), id, 298.15, "SiO(OH)3-");
      if (!result.ok) throw new Error(result.error.message);
      expect(Math.abs(result.value - log10K)).toBeLessThan(0.3);
    });
  }

  for (const point of fixture.solubilityCurve) {
    it(`gives dissolved Si within a factor of 2 of ${point.dissolvedSiliconMmolPerL} mmol/L at ${point.dissolvedCalciumMmolPerL} mmol/L Ca`, () => {
      withinFactorOfTwo(modelSiliconAt(sweep, point.dissolvedCalciumMmolPerL), point.dissolvedSiliconMmolPerL);
    });
  }

  it(`gives dissolved Ca within 20 % of ${end.dissolvedCalciumMmolPerL} mmol/L and Si within a factor of 2 of ${end.dissolvedSiliconMmolPerL} mmol/L with portlandite (Greenberg & Chang 1965, from memory)`, () => {
    expect(lime.portlanditeMol).toBeGreaterThan(0);
    expect(Math.abs(lime.calciumMmolPerKg / end.dissolvedCalciumMmolPerL - 1)).toBeLessThan(0.2);
    withinFactorOfTwo(lime.siliconMmolPerKg, end.dissolvedSiliconMmolPerL);
  });

  it(`gives C-S-H of Ca/Si ${range.min}–${range.max} coexisting with portlandite (Taylor 1997, Cement Chemistry; Chen et al. 2004, Cem. Concr. Res. 34, 1499; from memory)`, () => {
    expect(lime.cshCaSi).toBeGreaterThanOrEqual(range.min);
    expect(lime.cshCaSi).toBeLessThanOrEqual(range.max);
  });

  it("raises the Ca/Si of C-S-H and lowers dissolved Si as dissolved Ca rises, from solid Ca/Si below 0.8 to above 1.5 (Greenberg & Chang 1965; Chen et al. 2004)", () => {
    const ordered = [...sweep].sort((a, b) => a.calciumMmolPerKg - b.calciumMmolPerKg);
    for (let i = 1; i < ordered.length; i += 1) {
      expect(ordered[i].cshCaSi).toBeGreaterThan(ordered[i - 1].cshCaSi);
      expect(ordered[i].siliconMmolPerKg).toBeLessThan(ordered[i - 1].siliconMmolPerKg);
    }
    expect(ordered[0].cshCaSi).toBeLessThan(0.8);
    expect(ordered[ordered.length - 1].cshCaSi).toBeGreaterThan(1.5);
  });
});

describe("C-S-H solubility at 25 °C, the earlier ideal binary of Kulik & Kersten (2001), replaced as the default, against Greenberg & Chang (1965, J. Phys. Chem. 69, 553; points from memory, see the fixture)", () => {
  const dataset = datasetWith(path.join(__dirname, "../fixtures/csh/csh-two-end-members-kulik-kersten-2001.json"));
  const sweep = BULK_CA_SI.map((c) => equilibriumAt(dataset, c));
  const lime = equilibriumAt(dataset, LIME_SATURATED_BULK_CA_SI);

  for (const point of fixture.solubilityCurve.filter((p) => p.dissolvedCalciumMmolPerL >= 2)) {
    it(`gives dissolved Si within a factor of 2 of ${point.dissolvedSiliconMmolPerL} mmol/L at ${point.dissolvedCalciumMmolPerL} mmol/L Ca`, () => {
      withinFactorOfTwo(modelSiliconAt(sweep, point.dissolvedCalciumMmolPerL), point.dissolvedSiliconMmolPerL);
    });
  }

  it("does not reach the silica-rich end of the curve (1 mmol/L Ca): KNOWN DEVIATION", () => {
    // KNOWN DEVIATION. Target: Si within a factor of 2 of 1.5 mmol/L at 1.0 mmol/L Ca (Greenberg & Chang 1965, from
    // memory). The model has no C-S-H below Ca/Si 0.83 (its tobermorite-like end-member; the source's second binary,
    // tobermorite-like + SiO2, is not in the data set), so the lowest dissolved Ca along the C-S-H curve is about
    // 1.07 mmol/kg, reached at the pure end-member, and the point lies outside the curve. Pinned: 1.0–1.25 mmol/kg.
    const lowestCalcium = Math.min(...sweep.map((p) => p.calciumMmolPerKg));
    expect(lowestCalcium).toBeGreaterThan(1.0);
    expect(lowestCalcium).toBeLessThan(1.25);
    expect(modelSiliconAt(sweep, 1.0)).toBeNull();
  });

  it(`gives dissolved Ca within 20 % of ${end.dissolvedCalciumMmolPerL} mmol/L and Si within a factor of 2 of ${end.dissolvedSiliconMmolPerL} mmol/L with portlandite (Greenberg & Chang 1965, from memory)`, () => {
    expect(lime.portlanditeMol).toBeGreaterThan(0);
    expect(Math.abs(lime.calciumMmolPerKg / end.dissolvedCalciumMmolPerL - 1)).toBeLessThan(0.2);
    withinFactorOfTwo(lime.siliconMmolPerKg, end.dissolvedSiliconMmolPerL);
  });

  it("gives C-S-H of Ca/Si 1.56 with portlandite, below the 1.6–1.8 observed: KNOWN DEVIATION", () => {
    // KNOWN DEVIATION. Target: Ca/Si 1.6–1.8 for C-S-H coexisting with portlandite (Taylor 1997, Cement Chemistry;
    // Chen et al. 2004, Cem. Concr. Res. 34, 1499; from memory). Reason: in an ideal solution whose end-members are
    // written per one Si, tobermorite-like + 0.8333 portlandite → jennite-like has ΔrG° ≈ −4.8 kJ/mol, so
    // x(jennite-like) = 1/(1 + exp(ΔrG°/RT)) ≈ 0.87 and Ca/Si = 0.83 + 0.83·0.87 ≈ 1.56. The same data written per
    // two Si would give x ≈ 0.98 and Ca/Si ≈ 1.65: the formula unit decides it, and the source's is per one Si
    // (from memory). The four-end-member default above gives 1.63. Pinned: 1.56 ± 0.02.
    expect(Math.abs(lime.cshCaSi - 1.56)).toBeLessThan(0.02);
  });
});
