import { getAssessment, removeAssessment, renameAssessment } from "@/lib/service/assessments";
import { exportResponse } from "@/lib/service/exports";
import { guarded, methodNotAllowedResponse, outcomeResponse, readJsonBody, routeParam, methodNotAllowed } from "@/lib/service/http";
import { assessmentStore } from "@/lib/service/store-instance";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** `{id}` is a record; `{id}.json` and `{id}.csv` are its exports (GET only). */
function exportFormat(segment: string): { id: string; format: "json" | "csv" } | null {
  const match = /^(.+)\.(json|csv)$/.exec(segment);
  return match ? { id: match[1], format: match[2] as "json" | "csv" } : null;
}

export const GET = guarded(async (_request, context) => {
  const segment = await routeParam(context, "id");
  const asExport = exportFormat(segment);
  if (asExport) return exportResponse(assessmentStore(), asExport.id, asExport.format);
  return outcomeResponse(getAssessment(assessmentStore(), segment));
});

export const PATCH = guarded(async (request, context) => {
  const segment = await routeParam(context, "id");
  if (exportFormat(segment)) return methodNotAllowedResponse(["GET"]);
  const body = await readJsonBody(request);
  if (!body.ok) return body.response;
  return outcomeResponse(renameAssessment(assessmentStore(), segment, body.value));
});

export const DELETE = guarded(async (_request, context) => {
  const segment = await routeParam(context, "id");
  if (exportFormat(segment)) return methodNotAllowedResponse(["GET"]);
  return outcomeResponse(removeAssessment(assessmentStore(), segment));
});

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const POST = methodNotAllowed(["GET", "PATCH", "DELETE"]);
export const PUT = methodNotAllowed(["GET", "PATCH", "DELETE"]);
