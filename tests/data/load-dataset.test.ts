import { describe, it, expect, beforeEach } from "vitest";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { clearDatasetCache, defaultDatasetFiles, loadDataset } from "../../lib/data/load-dataset";

const directory = mkdtempSync(path.join(tmpdir(), "hydrastate-dataset-"));

function header(family: string) {
  return {
    family,
    title: `test file ${family}`,
    provenance: { sources: ["made up for a loader test"], generatedBy: "tests/data/load-dataset.test.ts", date: "2026-12-01" },
    units: { energy: "J/mol", entropy: "J/(mol K)", heatCapacity: "J/(mol K)", molarVolume: "cm3/mol" },
    defaultUncertaintyLog10K: { value: 0.3, basis: "test" },
  };
}

const constantCp = { model: "constant", cpJPerMolK: 50 };
const someStandard = { gibbsJPerMol: -1000, enthalpyJPerMol: -1000, entropyJPerMolK: 10 };

function writeJson(name: string, content: unknown): string {
  const file = path.join(directory, name);
  writeFileSync(file, typeof content === "string" ? content : JSON.stringify(content));
  return file;
}

beforeEach(() => clearDatasetCache());

describe("loadDataset", () => {
  it("loads the starter files by default with parsed formulas, molar masses and uncertainties", () => {
    expect(defaultDatasetFiles().some((f) => f.endsWith(path.join("starter", "aqueous.json")))).toBe(true);
    const result = loadDataset();
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const gypsum = result.value.species.find((s) => s.id === "gypsum");
    expect(gypsum?.elements).toEqual({ Ca: 1, S: 1, O: 6, H: 4 });
    // CRC Handbook molar mass of CaSO4·2H2O, 172.17 g/mol (from memory).
    expect(gypsum?.molarMassGPerMol).toBeCloseTo(172.17, 1);
    const sulfate = result.value.species.find((s) => s.id === "SO4-2");
    expect(sulfate?.charge).toBe(-2);
    expect(sulfate?.family).toBe("starter-aqueous");
    for (const species of result.value.species) expect(Number.isFinite(species.uncertaintyLog10K)).toBe(true);
    const starterFamilies = result.value.files.map((f) => f.family).filter((f) => f.startsWith("starter-"));
    expect(starterFamilies.sort()).toEqual(["starter-aqueous", "starter-gases", "starter-solids"]);
    expect(result.value.version).toMatch(/^[0-9a-f]{16}$/);
  });

  it("returns the cached object on a second call", () => {
    expect(loadDataset()).toBe(loadDataset());
  });

  it("applies the file default uncertainty to entries without one and keeps stated ones", () => {
    const file = writeJson("defaults.json", {
      ...header("defaults"),
      species: [
        { id: "A", formula: "NaCl", phase: "solid", standard: someStandard, heatCapacity: constantCp, molarVolumeCm3PerMol: 27, source: "test" },
        { id: "B", formula: "KCl", phase: "solid", standard: someStandard, heatCapacity: constantCp, molarVolumeCm3PerMol: 37, source: "test", uncertaintyLog10K: 0.05 },
      ],
    });
    const result = loadDataset([file]);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.species.map((s) => s.uncertaintyLog10K)).toEqual([0.3, 0.05]);
  });

  it("gives a different version when a file's content changes", () => {
    const file = writeJson("version.json", { ...header("v"), species: [] });
    const first = loadDataset([file]);
    writeJson("version.json", { ...header("v2"), species: [] });
    clearDatasetCache();
    const second = loadDataset([file]);
    expect(first.ok && second.ok).toBe(true);
    if (first.ok && second.ok) expect(first.value.version).not.toBe(second.value.version);
  });

  it("rejects a missing file", () => {
    const result = loadDataset([path.join(directory, "absent.json")]);
    expect(result).toMatchObject({ ok: false, error: { code: "file_unreadable", path: "" } });
  });

  it("rejects a file that is not JSON", () => {
    const file = writeJson("broken.json", "{ not json");
    expect(loadDataset([file])).toMatchObject({ ok: false, error: { code: "json_syntax", file } });
  });

  it("rejects a schema violation and names the path inside the file", () => {
    const file = writeJson("schema.json", {
      ...header("schema"),
      species: [{ id: "A", formula: "NaCl", phase: "solid", standard: someStandard, heatCapacity: constantCp, source: "test" }],
    });
    const result = loadDataset([file]);
    expect(result).toMatchObject({ ok: false, error: { code: "schema_invalid", file } });
    if (!result.ok) {
      expect(result.error.path).toContain("species[0]");
      expect(result.error.message).toContain("molarVolumeCm3PerMol");
    }
  });

  it("rejects a formula the parser cannot read, naming the entry", () => {
    const file = writeJson("formula.json", {
      ...header("formula"),
      species: [{ id: "A", formula: "Na(Cl", phase: "aqueous", standard: someStandard, heatCapacity: constantCp, source: "test" }],
    });
    expect(loadDataset([file])).toMatchObject({ ok: false, error: { code: "formula_invalid", path: "species[0].formula" } });
  });

  it("rejects an id defined twice across files", () => {
    const first = writeJson("dup-1.json", {
      ...header("dup1"),
      species: [{ id: "Na+", formula: "Na+", phase: "aqueous", standard: someStandard, heatCapacity: constantCp, source: "test" }],
    });
    const second = writeJson("dup-2.json", {
      ...header("dup2"),
      species: [{ id: "Na+", formula: "Na+", phase: "aqueous", standard: someStandard, heatCapacity: constantCp, source: "test" }],
    });
    const result = loadDataset([first, second]);
    expect(result).toMatchObject({ ok: false, error: { code: "duplicate_id", file: second, path: "species[0].id" } });
    if (!result.ok) expect(result.error.message).toContain(first);
  });

  it("rejects an end-member whose solution is not declared, and accepts it once declared in any file", () => {
    const member = writeJson("member.json", {
      ...header("member"),
      species: [
        { id: "csh-a", formula: "(CaO)1.5(SiO2)1(H2O)2.5", phase: "solid", solution: "csh", standard: someStandard, heatCapacity: constantCp, molarVolumeCm3PerMol: 80, source: "test" },
      ],
    });
    expect(loadDataset([member])).toMatchObject({ ok: false, error: { code: "unknown_solution", path: "species[0].solution" } });
    const declaration = writeJson("declaration.json", {
      ...header("declaration"),
      species: [],
      solutions: [{ id: "csh", name: "C-S-H", model: "ideal", source: "test" }],
    });
    const result = loadDataset([member, declaration]);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value.solutions.map((s) => s.id)).toEqual(["csh"]);
  });

  it("rejects an empty list of files", () => {
    expect(loadDataset([])).toMatchObject({ ok: false, error: { code: "no_files" } });
  });
});
