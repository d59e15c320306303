import { assessmentJobs } from "@/lib/service/assess-jobs";
import { guarded, outcomeResponse, routeParam, methodNotAllowed } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** GET: progress (0–1), state and, once succeeded, the result. */
export const GET = guarded(async (_request, context) => outcomeResponse(assessmentJobs().status(await routeParam(context, "id"))));

/** DELETE: cancel (the job's worker thread is terminated at once). */
export const DELETE = guarded(async (_request, context) => outcomeResponse(assessmentJobs().cancel(await routeParam(context, "id"))));

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const POST = methodNotAllowed(["GET", "DELETE"]);
export const PUT = methodNotAllowed(["GET", "DELETE"]);
export const PATCH = methodNotAllowed(["GET", "DELETE"]);
