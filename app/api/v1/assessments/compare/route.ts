import { compareAssessmentIds } from "@/lib/service/assessments";
import { guarded, outcomeResponse } from "@/lib/service/http";
import { assessmentStore } from "@/lib/service/store-instance";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** GET /api/v1/assessments/compare?ids=a,b[,c[,d]] */
export const GET = guarded((request: Request) => outcomeResponse(compareAssessmentIds(assessmentStore(), new URL(request.url).searchParams.get("ids"))));
