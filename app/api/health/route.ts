// Unversioned alias of GET /api/v1/health: the same handlers (route segment options must stay literal here).
export { GET, POST, PUT, PATCH, DELETE } from "../v1/health/route";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";
