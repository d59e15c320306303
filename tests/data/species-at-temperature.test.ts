import { describe, it, expect } from "vitest";
import { loadDataset } from "../../lib/data/load-dataset";
import type { Dataset, LoadedSpecies } from "../../lib/data/dataset";
import { SpeciesAtTemperatureFailure, speciesAtTemperature, speciesAtTemperatureResult } from "../../lib/data/species-at-temperature";
import { gasConstantJPerMolK } from "../../lib/thermo/physical-constants";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const dataset = loaded.value;

function gibbsAt(data: Dataset, temperatureK: number): Map<string, number> {
  return new Map(speciesAtTemperature(data, temperatureK).map((s) => [s.id, s.gibbsJPerMol]));
}

function reactionSpecies(id: string, reaction: Record<string, number>): LoadedSpecies {
  return {
    id,
    formula: "Ca+2",
    phase: "aqueous",
    source: "test",
    logK: { reaction, log10K25: 0, deltaHJPerMol: 0, deltaCpJPerMolK: 0 },
    elements: { Ca: 1 },
    charge: 2,
    molarMassGPerMol: 40.078,
    uncertaintyLog10K: 0.1,
    family: "test",
  };
}

function withSpecies(extra: LoadedSpecies[], version: string): Dataset {
  return { ...dataset, species: [...dataset.species, ...extra], version };
}

describe("speciesAtTemperature", () => {
  it("returns one engine species per entry, with stoichiometry, charge, molar mass and volume", () => {
    const species = speciesAtTemperature(dataset, 298.15);
    expect(species).toHaveLength(dataset.species.length);
    const calcite = species.find((s) => s.id === "calcite")!;
    expect(calcite).toMatchObject({ phase: "solid", elements: { Ca: 1, C: 1, O: 3 }, charge: 0, molarVolumeCm3PerMol: 36.934 });
    expect(calcite.solution).toBeUndefined();
    expect(species.find((s) => s.id === "CO3-2")?.charge).toBe(-2);
  });

  it("gives the tabulated ΔfG° at 298.15 K for entries with formation data", () => {
    const gibbs = gibbsAt(dataset, 298.15);
    for (const entry of dataset.species.filter((s) => s.standard)) expect(gibbs.get(entry.id)).toBeCloseTo(entry.standard!.gibbsJPerMol, 6);
  });

  it("keeps H+ at zero at every temperature (the aqueous convention)", () => {
    for (const temperatureK of [273.15, 310, 373.15]) expect(gibbsAt(dataset, temperatureK).get("H+")).toBe(0);
  });

  it("defines a reaction entry so that its reaction has the stated log K", () => {
    for (const temperatureK of [278.15, 298.15, 348.15]) {
      const gibbs = gibbsAt(dataset, temperatureK);
      // CaSO4(aq) = Ca+2 + SO4-2, log K = −2.31 at 25 °C, ΔrH° = −6.9 kJ/mol (Bell & George 1953, data file).
      const deltaGJPerMol = gibbs.get("Ca+2")! + gibbs.get("SO4-2")! - gibbs.get("CaSO4(aq)")!;
      const log10K = -deltaGJPerMol / (gasConstantJPerMolK * temperatureK * Math.LN10);
      const expected = -2.31 + (6900 / (gasConstantJPerMolK * Math.LN10)) * (1 / temperatureK - 1 / 298.15);
      expect(log10K).toBeCloseTo(expected, 9);
    }
  });

  it("gives log Kw of water within 0.02 of IAPWS R11-07 from 0 to 100 °C", () => {
    // pKw at 0.1 MPa (Bandura & Lvov 2006, J. Phys. Chem. Ref. Data 35, 15; IAPWS R11-07): 0/25/50/75/100 °C.
    const iapwsPKw: [number, number][] = [[0, 14.946], [25, 13.995], [50, 13.264], [75, 12.696], [100, 12.252]];
    for (const [temperatureC, pKw] of iapwsPKw) {
      const temperatureK = temperatureC + 273.15;
      const gibbs = gibbsAt(dataset, temperatureK);
      const deltaGJPerMol = gibbs.get("H+")! + gibbs.get("OH-")! - gibbs.get("H2O(l)")!;
      expect(Math.abs(deltaGJPerMol / (gasConstantJPerMolK * temperatureK * Math.LN10) - pKw)).toBeLessThan(0.02);
    }
  });

  it("returns the cached array for the same data-set version and temperature", () => {
    expect(speciesAtTemperature(dataset, 300)).toBe(speciesAtTemperature(dataset, 300));
    expect(speciesAtTemperature(dataset, 300)).not.toBe(speciesAtTemperature(dataset, 301));
  });

  it("resolves reaction entries that depend on other reaction entries, in any file order", () => {
    const first = reactionSpecies("X-first", { "X-second": 1 });
    const second = reactionSpecies("X-second", { "Ca+2": 1 });
    const gibbs = gibbsAt(withSpecies([first, second], "chain"), 298.15);
    expect(gibbs.get("X-first")).toBeCloseTo(gibbs.get("Ca+2")!, 6);
  });

  it("reports a cycle of reaction definitions as a typed error", () => {
    const data = withSpecies([reactionSpecies("X-a", { "X-b": 1 }), reactionSpecies("X-b", { "X-a": 1 })], "cycle");
    const result = speciesAtTemperatureResult(data, 298.15);
    expect(result).toMatchObject({ ok: false, error: { code: "reaction_cycle", cycle: ["X-a", "X-b", "X-a"] } });
    expect(() => speciesAtTemperature(data, 298.15)).toThrow(SpeciesAtTemperatureFailure);
  });

  it("reports a reaction that names an absent species as a typed error", () => {
    const data = withSpecies([reactionSpecies("X-dangling", { "Zz+9": 1 })], "dangling");
    expect(speciesAtTemperatureResult(data, 298.15)).toMatchObject({ ok: false, error: { code: "missing_reference", speciesId: "X-dangling", missingId: "Zz+9" } });
  });

  it("rejects a temperature outside 0–100 °C, naming the field and the limits", () => {
    for (const temperatureK of [273.0, 373.3, Number.NaN]) {
      const result = speciesAtTemperatureResult(dataset, temperatureK);
      expect(result).toMatchObject({ ok: false, error: { code: "temperature_out_of_range", field: "temperatureK", minimumK: 273.15, maximumK: 373.15 } });
    }
  });
});

describe("entries shared between data sets (Monte Carlo samples)", () => {
  it("give the same potentials as copies that share nothing, and a changed entry its own", () => {
    const calcite = dataset.species.find((s) => s.id === "calcite" && s.standard)!;
    const shiftJPerMol = 1000;
    const shared: Dataset = {
      ...dataset,
      species: dataset.species.map((s) => (s === calcite ? { ...s, standard: { ...s.standard!, gibbsJPerMol: s.standard!.gibbsJPerMol + shiftJPerMol } } : s)),
      version: `${dataset.version}-shared-test`,
    };
    const copies: Dataset = { ...shared, species: structuredClone(shared.species), version: `${dataset.version}-copied-test` };
    const t = 333.15;
    const [a, b, plain] = [gibbsAt(shared, t), gibbsAt(copies, t), gibbsAt(dataset, t)];
    for (const [id, g] of b) expect(a.get(id), id).toBe(g);
    // A shift of G at 25 °C passes unchanged to every temperature for a formation-data entry (G(T) = ΔfG°(Tr) − ∫S dT).
    expect(a.get("calcite")! - plain.get("calcite")!).toBeCloseTo(shiftJPerMol, 6);
  });
});
