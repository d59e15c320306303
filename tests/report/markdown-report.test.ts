import { describe, expect, it } from "vitest";
import { renderMarkdownReport } from "../../lib/report/markdown-report";
import { buildReportModel } from "../../lib/report/report-model";
import { sampleCharts, sampleFiles, sampleSaved } from "./sample-assessment";

const running = { dataset: "abc123", engine: "0.1.0" };
const markdown = renderMarkdownReport(buildReportModel({ saved: sampleSaved, running, datasetFiles: sampleFiles, charts: sampleCharts }));

describe("renderMarkdownReport", () => {
  it("starts with the assessment name and carries the project name", () => {
    expect(markdown.startsWith("# Harbour wall W3 — sulfate check\n")).toBe(true);
    expect(markdown).toContain("Quay Extension Phase 2");
  });

  it("contains every caution of the result, at the top and in the cautions section", () => {
    for (const caution of (sampleSaved.result as { cautions: string[] }).cautions) expect(markdown.split(caution).length - 1).toBe(2);
  });

  it("lists the data files with their sources", () => {
    expect(markdown).toContain("**AFt phases** (cement, 2026-11-20)");
    expect(markdown).toContain("Perkins & Palmer 1999, Geochim. Cosmochim. Acta 63, 1969");
  });

  it("prints the phase-volume and scenario series as tables", () => {
    expect(markdown).toContain("### Phase volumes of the hydrate assemblage");
    expect(markdown).toMatch(/\| 28 d at 20 °C \| 30 \| 8 \| 6 \| 12 \| 3 \|/);
    expect(markdown).toContain("| SO4 added (g/100 g binder) |");
  });

  it("shows flags with severity in words, basis, robustness and actions", () => {
    expect(markdown).toContain("### WARNING: Sulfate attack: ettringite expansion possible");
    expect(markdown).toContain("Basis: EN 206 Table 2");
    expect(markdown).toContain("A caution or warning in 84 % of 200 Monte Carlo samples.");
    expect(markdown).toContain("- Use a sulfate-resisting cement.");
  });

  it("lists the computation notes of the result under the results, and leaves the section out without them", () => {
    const saved = { ...sampleSaved, result: { ...(sampleSaved.result as object), warnings: [{ code: "loi_taken_as_co2", material: "cement", loiMassPercent: 2.1 }] } };
    const text = renderMarkdownReport(buildReportModel({ saved, running, datasetFiles: [], charts: [] }));
    expect(text).toContain("### Computation notes\n\n- The loss on ignition of the cement (2.1 %) is taken as CO2 (calcite), as no CO2 was given.");
    expect(markdown).not.toContain("Computation notes");
  });

  it("escapes table separators inside cells", () => {
    const saved = { ...sampleSaved, inputs: { ...(sampleSaved.inputs as object), note: "a | b" } };
    const text = renderMarkdownReport(buildReportModel({ saved, running, datasetFiles: [], charts: [] }));
    expect(text).toContain("| note | a \\| b |");
  });
});
