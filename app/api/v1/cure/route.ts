import { runCure } from "@/lib/service/cure";
import { jsonComputation } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const POST = jsonComputation((body) => runCure(body));
