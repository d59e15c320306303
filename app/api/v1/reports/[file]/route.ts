import { guarded, notFoundResponse, routeParam, methodNotAllowed } from "@/lib/service/http";
import { reportResponse } from "@/lib/service/reports";
import { assessmentStore } from "@/lib/service/store-instance";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** GET /api/v1/reports/{id}.pdf and /api/v1/reports/{id}.md */
export const GET = guarded(async (request, context) => {
  const file = await routeParam(context, "file");
  const match = /^(.+)\.(pdf|md)$/.exec(file);
  if (!match) return notFoundResponse(new URL(request.url).pathname);
  return reportResponse(assessmentStore(), match[1], match[2] as "pdf" | "md");
});

// Other methods: 405 with a JSON body (Next would answer with an empty one).
export const POST = methodNotAllowed(["GET"]);
export const PUT = methodNotAllowed(["GET"]);
export const PATCH = methodNotAllowed(["GET"]);
export const DELETE = methodNotAllowed(["GET"]);
