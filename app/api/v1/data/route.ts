import { dataTable } from "@/lib/service/data-table";
import { guarded, outcomeResponse, methodNotAllowed } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = guarded(() => outcomeResponse(dataTable()));

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const POST = methodNotAllowed(["GET"]);
export const PUT = methodNotAllowed(["GET"]);
export const PATCH = methodNotAllowed(["GET"]);
export const DELETE = methodNotAllowed(["GET"]);
