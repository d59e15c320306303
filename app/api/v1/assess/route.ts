import { assessmentPool } from "@/lib/service/assess-pool";
import { jsonComputation, methodNotAllowed } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * POST /api/v1/assess: the whole assessment on the request, computed in the long-lived worker of the
 * assessment pool (`lib/service/assess-pool.ts`) so that the server keeps answering other requests
 * meanwhile; aborted after 120 s (→ 504) or when the client goes away, which stops the worker. Long Monte
 * Carlo runs belong in the job API (`/api/v1/assess/jobs`), which reports progress and can be cancelled.
 */
export const POST = jsonComputation((body, signal) => assessmentPool().run(body, { signal }), { timeLimitMs: 120_000 });

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const GET = methodNotAllowed(["POST"]);
export const PUT = methodNotAllowed(["POST"]);
export const PATCH = methodNotAllowed(["POST"]);
export const DELETE = methodNotAllowed(["POST"]);
