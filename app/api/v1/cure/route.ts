import { runCure } from "@/lib/service/cure";
import { jsonComputation, methodNotAllowed } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const POST = jsonComputation((body) => runCure(body));

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const GET = methodNotAllowed(["POST"]);
export const PUT = methodNotAllowed(["POST"]);
export const PATCH = methodNotAllowed(["POST"]);
export const DELETE = methodNotAllowed(["POST"]);
