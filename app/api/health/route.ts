import { healthReport } from "@/lib/service/health";

export const dynamic = "force-dynamic";

export function GET() {
  return Response.json(healthReport());
}
