import { healthReport } from "@/lib/service/health";
import { guarded, jsonResponse } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Unversioned alias of GET /api/v1/health. */
export const GET = guarded(() => jsonResponse(200, healthReport()));
