import { describe, expect, it } from "vitest";
import { renderPdfReport } from "../../lib/report/pdf-report";
import { pdfSafe } from "../../lib/report/pdf-text";
import { buildReportModel } from "../../lib/report/report-model";
import { sampleCharts, sampleFiles, sampleSaved } from "./sample-assessment";

const running = { dataset: "abc123", engine: "0.1.0" };
const model = buildReportModel({ saved: sampleSaved, running, datasetFiles: sampleFiles, charts: sampleCharts });

/** The text shown by an uncompressed pdfkit PDF: its `TJ` operators hold hex-encoded WinAnsi strings. */
function shownText(pdf: Buffer): string {
  const source = pdf.toString("latin1");
  const pieces: string[] = [];
  for (const match of source.matchAll(/<([0-9a-fA-F]+)>/g)) pieces.push(Buffer.from(match[1], "hex").toString("latin1"));
  return pieces.join("");
}

function pageCount(pdf: Buffer): number {
  return pdf.toString("latin1").match(/\/Type \/Page\b/g)?.length ?? 0;
}

describe("renderPdfReport", () => {
  it("produces a PDF file", async () => {
    const pdf = await renderPdfReport(model);
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(pdf.subarray(-6).toString("latin1")).toContain("%%EOF");
  });

  it("carries the project name in the page text and in the document title", async () => {
    const pdf = await renderPdfReport(model, { compress: false });
    expect(shownText(pdf)).toContain("Quay Extension Phase 2");
    // The document title (Info dictionary) is not compressed, so the name is findable in a compressed file too.
    const compressed = (await renderPdfReport(model)).toString("latin1");
    expect(compressed).toContain("Quay Extension Phase 2");
  });

  it("prints the cautions in the footer of every page", async () => {
    const long = buildReportModel({ saved: sampleSaved, running, datasetFiles: sampleFiles, charts: [...sampleCharts, ...sampleCharts, ...sampleCharts] });
    const pdf = await renderPdfReport(long, { compress: false });
    const pages = pageCount(pdf);
    expect(pages).toBeGreaterThan(1);
    const text = shownText(pdf);
    const firstCaution = "This is a thermodynamic guide";
    expect(text.split(firstCaution).length - 1).toBe(pages);
    expect(text).toContain(`page ${pages} of ${pages}`);
  });

  it("prints the provenance sources and the flags", async () => {
    const text = shownText(await renderPdfReport(model, { compress: false }));
    expect(text).toContain("Perkins & Palmer 1999");
    expect(text).toContain("WARNING: Sulfate attack");
  });

  it("prints the computation notes of the result", async () => {
    const saved = { ...sampleSaved, result: { ...(sampleSaved.result as object), warnings: [{ code: "loi_taken_as_co2", material: "cement", loiMassPercent: 2.1 }] } };
    const text = shownText(await renderPdfReport(buildReportModel({ saved, running, datasetFiles: [], charts: [] }), { compress: false }));
    expect(text).toContain("Computation notes");
    expect(text).toContain("The loss on ignition of the cement (2.1 %) is taken as CO2 (calcite), as no CO2 was given.");
  });
});

describe("pdfSafe", () => {
  it("replaces symbols outside the built-in fonts' encoding and keeps those inside", () => {
    expect(pdfSafe("−1.2 ≤ SI, 20 °C, cm³, CO₂ – μm")).toBe("-1.2 <= SI, 20 °C, cm³, CO2 – µm");
    expect(pdfSafe("漢")).toBe("?");
  });
});

describe("renderPdfReport with the full standard cautions", () => {
  it("fits every standard caution text, whole, in the footer of each page", async () => {
    const { cautionTextsFor } = await import("../../lib/advisory/cautions");
    const cautions = [...cautionTextsFor("assessment"), ...cautionTextsFor("monte-carlo").slice(-1), ...cautionTextsFor("carbonation-depth").slice(-1)];
    const saved = { ...sampleSaved, result: { ...(sampleSaved.result as object), cautions } };
    const pdf = await renderPdfReport(buildReportModel({ saved, running, datasetFiles: sampleFiles, charts: sampleCharts }), { compress: false });
    const text = shownText(pdf).replace(/\s+/g, " ");
    const pages = pageCount(pdf);
    // The last words of the last caution appear once per page: nothing was cut off.
    const ending = pdfSafe(cautions[cautions.length - 1]).slice(-40).replace(/\s+/g, " ");
    expect(text.split(ending).length - 1).toBe(pages);
  });
});
