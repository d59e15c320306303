import { guarded, jsonResponse, methodNotAllowed } from "@/lib/service/http";
import { openApiDocument } from "@/lib/service/openapi";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = guarded(() => jsonResponse(200, openApiDocument()));

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const POST = methodNotAllowed(["GET"]);
export const PUT = methodNotAllowed(["GET"]);
export const PATCH = methodNotAllowed(["GET"]);
export const DELETE = methodNotAllowed(["GET"]);
