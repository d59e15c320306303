import { startAssessmentJob } from "@/lib/service/assess-jobs";
import { guarded, outcomeResponse, readJsonBody, methodNotAllowed } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** POST /api/v1/assess/jobs: validate, start the assessment off the request path, answer 202 with the job. */
export const POST = guarded(async (request: Request) => {
  const body = await readJsonBody(request);
  if (!body.ok) return body.response;
  return outcomeResponse(startAssessmentJob(body.value), 202);
});

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const GET = methodNotAllowed(["POST"]);
export const PUT = methodNotAllowed(["POST"]);
export const PATCH = methodNotAllowed(["POST"]);
export const DELETE = methodNotAllowed(["POST"]);
