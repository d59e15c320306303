import { runEquilibrate } from "@/lib/service/equilibrate";
import { jsonComputation, methodNotAllowed } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The engine has its own time cap (`timeLimitMs` of the input, at most 60 s); the route allows a little more. */
export const POST = jsonComputation((body) => runEquilibrate(body), { timeLimitMs: 65_000 });

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const GET = methodNotAllowed(["POST"]);
export const PUT = methodNotAllowed(["POST"]);
export const PATCH = methodNotAllowed(["POST"]);
export const DELETE = methodNotAllowed(["POST"]);
