import { healthReport } from "@/lib/service/health";
import { guarded, jsonResponse } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = guarded(() => jsonResponse(200, healthReport()));
