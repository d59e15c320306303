import { describe, it, expect } from "vitest";
import { phaseColour, phasesWithColour, seriesColours } from "../../lib/charts/phase-colours";
import { resultCharts } from "../../lib/charts/result-charts";
import { loadDataset } from "../../lib/data/load-dataset";
import { phaseIds } from "../../lib/equilibrium/equilibrate";
import { scmTypes } from "../../lib/schema/binder-input";
import { demoResult } from "../report/real-result";

/** The two names of the one pore solution (the paste's volumes and the timeline's series). */
const ALIASES = [["pore-solution", "pore solution"]];

describe("phase colours", () => {
  it("give every phase of the data set and every unreacted binder constituent a fixed colour", () => {
    const loaded = loadDataset();
    if (!loaded.ok) throw new Error(loaded.error.message);
    const unreacted = ["alite", "belite", "aluminate", "ferrite", "clinker-minor-oxides", ...scmTypes.map((t) => `unreacted-${t}`)];
    const missing = [...phaseIds(loaded.value), ...unreacted, "pore-solution", "empty porosity"].filter((id) => !phaseColour(id));
    expect(missing).toEqual([]);
  });

  it("never give two phases the same colour (only the two names of the pore solution share one)", () => {
    const byColour = new Map<string, string[]>();
    for (const id of phasesWithColour()) byColour.set(phaseColour(id)!.toLowerCase(), [...(byColour.get(phaseColour(id)!.toLowerCase()) ?? []), id]);
    const shared = [...byColour.values()].filter((ids) => ids.length > 1);
    expect(shared).toEqual(ALIASES);
  });

  it("are written as #rrggbb", () => {
    for (const id of phasesWithColour()) expect(phaseColour(id), id).toMatch(/^#[0-9a-f]{6}$/i);
  });

  it("keep a phase's colour whatever else the chart holds, and give unknown series colours no other series of the chart has", () => {
    const a = seriesColours(["csh", "portlandite", "ettringite"]);
    const b = seriesColours(["ettringite", "gypsum", "csh", "something-else", "another"]);
    expect(b[0]).toBe(a[2]);
    expect(b[2]).toBe(a[0]);
    expect(new Set(b).size).toBe(b.length);
    expect(b.slice(3).every((c) => !phasesWithColour().some((id) => phaseColour(id) === c))).toBe(true);
  });
});

describe("the demo scenario's charts", () => {
  it("draw each phase in the same colour in every chart, and no two drawn series of a chart in one colour", async () => {
    const charts = resultCharts(await demoResult());
    const colourOfPhase = new Map<string, Set<string>>();
    for (const chart of charts) {
      const drawn = chart.series.filter((s) => !s.tableOnly && s.colour);
      expect(new Set(drawn.map((s) => s.colour)).size, chart.id).toBe(drawn.length);
      for (const s of drawn) colourOfPhase.set(s.label, (colourOfPhase.get(s.label) ?? new Set()).add(s.colour!));
    }
    const inconsistent = [...colourOfPhase].filter(([, colours]) => colours.size > 1).map(([label]) => label);
    expect(inconsistent).toEqual([]);
    expect(colourOfPhase.size).toBeGreaterThan(10);
  }, 60_000);
});
