import { seriesCsv } from "../report/csv-export";
import { resultCharts } from "../charts/result-charts";
import type { AssessmentStore } from "../store/assessment-store";
import { getAssessment } from "./assessments";
import { errorResponse } from "./http";
import { fileSlug } from "./reports";

/**
 * `GET /api/v1/assessments/{id}.json` (the saved record: inputs, result, versions, isCurrent) and
 * `{id}.csv` (the key series of its charts, long form) as downloads.
 */
export function exportResponse(store: AssessmentStore, id: string, format: "json" | "csv"): Response {
  const saved = getAssessment(store, id);
  if (!saved.ok) return errorResponse(saved.error);
  const disposition = `attachment; filename="${fileSlug(saved.value.name)}.${format}"`;
  if (format === "json")
    return new Response(JSON.stringify(saved.value, null, 2), { status: 200, headers: { "content-type": "application/json; charset=utf-8", "content-disposition": disposition } });
  return new Response(seriesCsv(resultCharts(saved.value.result)), { status: 200, headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": disposition } });
}
