import { describe, expect, it } from "vitest";
import { resultCharts } from "../../lib/charts/result-charts";
import { phaseLabel } from "../../lib/charts/phase-labels";
import { culvertDemo } from "../../lib/demo/culvert-demo";
import { renderMarkdownReport } from "../../lib/report/markdown-report";
import { renderPdfReport } from "../../lib/report/pdf-report";
import { pdfSafe } from "../../lib/report/pdf-text";
import { buildReportModel } from "../../lib/report/report-model";
import { resultTables } from "../../lib/report/result-tables";
import { seriesCsv } from "../../lib/report/csv-export";
import type { SavedAssessment } from "../../lib/store/assessment-store";
import { demoResult } from "./real-result";

/**
 * The reports name phases as the results page does (`phaseLabel`, common practice of the trade: C-S-H,
 * Monosulfate (12 H2O), Friedel's salt …), never by the data set's ids. Checked on the demo scenario's real
 * assessment, whose charts carry the ids as the service computes them.
 */
const running = { dataset: "d", engine: "e" };

async function demoReportSource() {
  const result = await demoResult();
  const inputs = structuredClone(culvertDemo) as typeof culvertDemo & { options: { suppressedPhases: string[]; allowedPhases: string[] } };
  inputs.options.suppressedPhases = ["monosulfate-12"];
  inputs.options.allowedPhases = ["kuzel-salt"];
  const saved: SavedAssessment = {
    id: "demo",
    name: "Demo culvert",
    projectName: "Fernbrook Lane box culvert (demo)",
    createdAt: "2026-12-01T10:00:00.000Z",
    updatedAt: "2026-12-01T10:00:00.000Z",
    versions: running,
    isCurrent: true,
    outdated: [],
    inputs,
    result,
  };
  const charts = resultCharts(result);
  return { saved, charts, model: buildReportModel({ saved, running, datasetFiles: [], charts, tables: resultTables(result) }) };
}

/** Series ids of the charts that have a readable name different from the id (csh, monosulfate-12, …). */
function renamedIds(charts: ReturnType<typeof resultCharts>): string[] {
  return [...new Set(charts.flatMap((c) => c.series.map((s) => s.label)))].filter((id) => phaseLabel(id) !== id);
}

/** Ids the prose of flags never uses as words: with a hyphen, a digit, or the solid-solution ids. */
const isCodeLike = (id: string) => /[-\d]/.test(id) || id === "csh" || id === "msh";
const asToken = (id: string) => new RegExp(`(?<![A-Za-z0-9-])${id.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}(?![A-Za-z0-9-])`);

describe("readable phase names in the reports", () => {
  it("names every phase series of the Markdown report's tables by its readable name, not its id", async () => {
    const { charts, model } = await demoReportSource();
    const ids = renamedIds(charts);
    // The demo's timeline and maps hold C-S-H, the monosulfates and the unreacted clinker (its own result).
    for (const id of ["csh", "monosulfate-12", "alite"]) expect(ids).toContain(id);
    const markdown = renderMarkdownReport(model);
    expect(markdown).toContain("| C-S-H (cm³/100 g binder) |");
    expect(markdown).toContain("| Monosulfate (12 H2O) (%) |");
    expect(markdown).toContain("Alite (C₃S, unreacted) (cm³/100 g binder)");
    for (const id of ids) {
      expect(markdown).toContain(phaseLabel(id));
      expect(markdown).not.toContain(`| ${id} (`);
      if (isCodeLike(id)) expect(markdown).not.toMatch(asToken(id));
    }
  });

  it("names the phases of the run options by their readable names in the inputs and assumptions", async () => {
    const { model } = await demoReportSource();
    const markdown = renderMarkdownReport(model);
    expect(markdown).toContain("| options.suppressedPhases.0 | Monosulfate (12 H2O) |");
    expect(markdown).toContain("| options.allowedPhases.0 | Kuzel's salt |");
    expect(markdown).toContain("Phases suppressed on top of the default kinetic constraints: Monosulfate (12 H2O).");
    expect(markdown).toContain("Default kinetic constraints lifted for: Kuzel's salt.");
    expect(markdown).not.toMatch(asToken("monosulfate-12"));
    expect(markdown).not.toMatch(asToken("kuzel-salt"));
  });

  it("prints the readable names in the PDF's legends and tables, and no raw id", async () => {
    const { charts, model } = await demoReportSource();
    const pdf = await renderPdfReport(model, { compress: false });
    const source = pdf.toString("latin1");
    const shown = [...source.matchAll(/<([0-9a-fA-F]+)>/g)].map((m) => Buffer.from(m[1], "hex").toString("latin1")).join("");
    // pdfSafe writes subscripts as digits: "C₃S" → "C3S" (the built-in fonts' encoding).
    for (const name of ["C-S-H", "Monosulfate (12 H2O)", "Alite (C3S, unreacted)", "Kuzel's salt"]) expect(shown).toContain(name);
    for (const id of renamedIds(charts).filter(isCodeLike)) {
      expect(shown).toContain(pdfSafe(phaseLabel(id)).slice(0, 12));
      expect(shown).not.toMatch(asToken(id));
    }
  });

  it("names the series of the CSV export as the results page's CSV does", async () => {
    const { charts } = await demoReportSource();
    const seriesColumn = seriesCsv(charts)
      .split("\r\n")
      .slice(1)
      .filter(Boolean)
      .map((line) => line.split(",")[4]);
    expect(seriesColumn).toContain("C-S-H");
    expect(seriesColumn).not.toContain("csh");
    expect(seriesColumn).not.toContain("monosulfate-12");
  });
});
