import { guarded, jsonResponse } from "@/lib/service/http";
import { openApiDocument } from "@/lib/service/openapi";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = guarded(() => jsonResponse(200, openApiDocument()));
