import { dataTable } from "@/lib/service/data-table";
import { guarded, outcomeResponse } from "@/lib/service/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = guarded(() => outcomeResponse(dataTable()));
