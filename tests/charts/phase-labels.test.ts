import { describe, it, expect } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { phaseLabel, withPhaseLabels } from "../../lib/charts/phase-labels";
import { phaseVolumesChart } from "../../lib/charts/phase-volumes";

/** Every solid id of the data files (cement data and the starter solids). */
function solidIds(): string[] {
  const ids: string[] = [];
  const files = [
    ...readdirSync("lib/data/cement").map((f) => join("lib/data/cement", f)),
    "lib/data/starter/solids.json",
  ].filter((f) => f.endsWith(".json"));
  for (const file of files) {
    const data = JSON.parse(readFileSync(file, "utf8")) as { species?: { id: string; formula?: string; state?: string; phase?: string; aggregation?: string }[] };
    for (const s of data.species ?? []) if (/^[a-z]/.test(s.id)) ids.push(s.id);
  }
  return ids;
}

describe("readable phase names", () => {
  it("names the phases as the trade writes them (mineral names and cement chemist notation, common practice)", () => {
    expect(phaseLabel("csh")).toBe("C-S-H");
    expect(phaseLabel("fe-siliceous-hydrogarnet")).toBe("Fe-siliceous hydrogarnet");
    expect(phaseLabel("monosulfate-14")).toBe("Monosulfate (14 H2O)");
    expect(phaseLabel("friedel-salt")).toBe("Friedel's salt");
    expect(phaseLabel("c4ah13")).toBe("C₄AH₁₃");
    // Solid-solution end-members by molar ratio: Ca/Si 1.67 / 1 and Mg/Si 1.5 / 1.
    expect(phaseLabel("csh-ca1.67-si1")).toBe("C-S-H end-member (Ca/Si 1.67)");
    expect(phaseLabel("msh-mg1.5-si1")).toBe("M-S-H end-member (Mg/Si 1.5)");
    expect(phaseLabel("csh-ca1-si2")).toBe("C-S-H end-member (Ca/Si 0.5)");
    // An end-member of the default C-S-H (lib/data/cement/csh.json): 1.5 Ca per 0.6667 Si.
    expect(phaseLabel("csh-ca1.5-si0.6667")).toBe("C-S-H end-member (Ca/Si 2.25)");
  });

  it("names the unreacted binder of the hydration timeline and the liquid (mineral names of the clinker phases, common practice)", () => {
    expect(phaseLabel("alite")).toBe("Alite (C₃S, unreacted)");
    expect(phaseLabel("ferrite")).toBe("Ferrite (C₄AF, unreacted)");
    expect(phaseLabel("clinker-minor-oxides")).toBe("Minor clinker oxides (unreacted)");
    expect(phaseLabel("unreacted-slag")).toBe("Unreacted slag");
    expect(phaseLabel("unreacted-siliceous-fly-ash")).toBe("Unreacted siliceous fly ash");
    expect(phaseLabel("pore-solution")).toBe("Pore solution");
    expect(phaseLabel("pore solution")).toBe("Pore solution");
    expect(phaseLabel("unreacted-")).toBe("unreacted-");
  });

  it("returns an id it has no name for as it is, including names of Object's prototype", () => {
    expect(phaseLabel("unknown-phase")).toBe("unknown-phase");
    expect(phaseLabel("Pore solution")).toBe("Pore solution");
    expect(phaseLabel("constructor")).toBe("constructor");
    expect(phaseLabel("csh-ca1-si0")).toBe("csh-ca1-si0");
  });

  it("has a name, distinct from every other, for each solid in the data files", () => {
    const ids = solidIds();
    expect(ids.length).toBeGreaterThan(30);
    const missing = ids.filter((id) => phaseLabel(id) === id);
    expect(missing).toEqual([]);
    const names = ids.map(phaseLabel);
    expect(new Set(names).size).toBe(new Set(ids).size);
  });

  it("renames only the series of a chart, leaving the rows, axes and the input unchanged", () => {
    const chart = phaseVolumesChart([{ label: "28 d", phaseVolumesCm3: { csh: 20, portlandite: 5 }, poreSolutionCm3: 9 }]);
    const named = withPhaseLabels(chart);
    expect(named.series.map((s) => s.label)).toEqual(chart.series.map((s) => phaseLabel(s.label)));
    expect(named.series.map((s) => s.label)).toContain("C-S-H");
    expect(named.series.map((s) => s.key)).toEqual(chart.series.map((s) => s.key));
    expect(named.rows).toBe(chart.rows);
    expect(chart.series.map((s) => s.label)).toContain("csh");
  });
});
