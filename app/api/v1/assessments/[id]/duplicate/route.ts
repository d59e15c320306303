import { duplicateAssessment } from "@/lib/service/assessments";
import { guarded, outcomeResponse, readJsonBody, routeParam, methodNotAllowed } from "@/lib/service/http";
import { assessmentStore } from "@/lib/service/store-instance";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const POST = guarded(async (request, context) => {
  const body = await readJsonBody(request);
  if (!body.ok) return body.response;
  return outcomeResponse(duplicateAssessment(assessmentStore(), await routeParam(context, "id"), body.value), 201);
});

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const GET = methodNotAllowed(["POST"]);
export const PUT = methodNotAllowed(["POST"]);
export const PATCH = methodNotAllowed(["POST"]);
export const DELETE = methodNotAllowed(["POST"]);
