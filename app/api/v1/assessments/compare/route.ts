import { compareAssessmentIds } from "@/lib/service/assessments";
import { guarded, outcomeResponse, methodNotAllowed } from "@/lib/service/http";
import { assessmentStore } from "@/lib/service/store-instance";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** GET /api/v1/assessments/compare?ids=a,b[,c[,d]] */
export const GET = guarded((request: Request) => outcomeResponse(compareAssessmentIds(assessmentStore(), new URL(request.url).searchParams.get("ids"))));

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const POST = methodNotAllowed(["GET"]);
export const PUT = methodNotAllowed(["GET"]);
export const PATCH = methodNotAllowed(["GET"]);
export const DELETE = methodNotAllowed(["GET"]);
