import { runningVersions } from "./versions";

export type HealthReport = { status: "ok"; service: "hydrastate"; engineVersion: string; datasetVersion: string; checkedAt: string };

/** The health document served at GET /api/v1/health (and /api/health): up, and which engine and data set answer. */
export function healthReport(now: Date = new Date()): HealthReport {
  const versions = runningVersions();
  return { status: "ok", service: "hydrastate", engineVersion: versions.engine, datasetVersion: versions.dataset, checkedAt: now.toISOString() };
}
