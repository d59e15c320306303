import { duplicateAssessment } from "@/lib/service/assessments";
import { guarded, outcomeResponse, readJsonBody, routeParam } from "@/lib/service/http";
import { assessmentStore } from "@/lib/service/store-instance";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const POST = guarded(async (request, context) => {
  const body = await readJsonBody(request);
  if (!body.ok) return body.response;
  return outcomeResponse(duplicateAssessment(assessmentStore(), await routeParam(context, "id"), body.value), 201);
});
