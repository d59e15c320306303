import { runAssessment } from "@/lib/service/assess";
import { jsonComputation } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * POST /api/v1/assess: the whole assessment on the request, aborted after 120 s (→ 504). Long Monte Carlo
 * runs belong in the job API (`/api/v1/assess/jobs`), which reports progress and can be cancelled.
 */
export const POST = jsonComputation((body, signal) => runAssessment(body, { signal }), { timeLimitMs: 120_000 });
