import { listAssessments, saveAssessment } from "@/lib/service/assessments";
import { guarded, outcomeResponse, readJsonBody, methodNotAllowed } from "@/lib/service/http";
import { assessmentStore } from "@/lib/service/store-instance";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = guarded(() => outcomeResponse(listAssessments(assessmentStore())));

export const POST = guarded(async (request: Request) => {
  const body = await readJsonBody(request);
  if (!body.ok) return body.response;
  return outcomeResponse(saveAssessment(assessmentStore(), body.value), 201);
});

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const PUT = methodNotAllowed(["GET", "POST"]);
export const PATCH = methodNotAllowed(["GET", "POST"]);
export const DELETE = methodNotAllowed(["GET", "POST"]);
