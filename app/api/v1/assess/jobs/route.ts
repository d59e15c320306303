import { startAssessmentJob } from "@/lib/service/assess-jobs";
import { guarded, outcomeResponse, readJsonBody } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** POST /api/v1/assess/jobs: validate, start the assessment off the request path, answer 202 with the job. */
export const POST = guarded(async (request: Request) => {
  const body = await readJsonBody(request);
  if (!body.ok) return body.response;
  return outcomeResponse(startAssessmentJob(body.value), 202);
});
