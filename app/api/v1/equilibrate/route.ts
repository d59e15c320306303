import { runEquilibrate } from "@/lib/service/equilibrate";
import { jsonComputation } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The engine has its own time cap (`timeLimitMs` of the input, at most 60 s); the route allows a little more. */
export const POST = jsonComputation((body) => runEquilibrate(body), { timeLimitMs: 65_000 });
