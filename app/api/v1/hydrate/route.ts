import { runHydrate } from "@/lib/service/hydrate";
import { jsonComputation } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const POST = jsonComputation((body) => runHydrate(body));
