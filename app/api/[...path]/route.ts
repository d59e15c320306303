import { guarded, notFoundResponse } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Every path under /api without a route: 404 with a JSON body, whatever the method. */
const notFound = guarded((request: Request) => notFoundResponse(new URL(request.url).pathname));

export const GET = notFound;
export const POST = notFound;
export const PUT = notFound;
export const PATCH = notFound;
export const DELETE = notFound;
export const HEAD = notFound;
export const OPTIONS = notFound;
