import { loadDataset } from "../data/load-dataset";
import { renderMarkdownReport } from "../report/markdown-report";
import { renderPdfReport } from "../report/pdf-report";
import { buildReportModel, type ReportModel } from "../report/report-model";
import { resultTables } from "../report/result-tables";
import { resultCharts } from "../charts/result-charts";
import type { AssessmentStore } from "../store/assessment-store";
import { readDossier } from "../validation/dossier";
import { getAssessment } from "./assessments";
import { errorResponse } from "./http";
import type { ServiceOutcome } from "./outcome";
import { runningVersions } from "./versions";

/** The report model of a saved assessment, with the running data set's files and the validation dossier. */
export function reportModelFor(store: AssessmentStore, id: string): ServiceOutcome<ReportModel> {
  const saved = getAssessment(store, id);
  if (!saved.ok) return saved;
  const loaded = loadDataset();
  return {
    ok: true,
    value: buildReportModel({
      saved: saved.value,
      running: runningVersions(),
      datasetFiles: loaded.ok ? loaded.value.files : [],
      charts: resultCharts(saved.value.result),
      tables: resultTables(saved.value.result),
      dossier: readDossier(),
    }),
  };
}

/** A file name from the assessment name: lower-case letters, digits and dashes. */
export function fileSlug(name: string): string {
  return name.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 80) || "assessment";
}

/** `GET /api/v1/reports/{id}.pdf|.md`: the file, or the JSON error of a missing record. */
export async function reportResponse(store: AssessmentStore, id: string, format: "pdf" | "md"): Promise<Response> {
  const model = reportModelFor(store, id);
  if (!model.ok) return errorResponse(model.error);
  const name = `${fileSlug(model.value.title)}.${format}`;
  const disposition = `attachment; filename="${name}"`;
  if (format === "md")
    return new Response(renderMarkdownReport(model.value), { status: 200, headers: { "content-type": "text/markdown; charset=utf-8", "content-disposition": disposition } });
  const pdf = await renderPdfReport(model.value);
  return new Response(new Uint8Array(pdf), { status: 200, headers: { "content-type": "application/pdf", "content-disposition": disposition, "content-length": String(pdf.byteLength) } });
}
