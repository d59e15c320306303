import packageJson from "../../package.json";

export type HealthReport = { status: "ok"; service: "hydrastate"; engineVersion: string; checkedAt: string };

/** The health document served at GET /api/health: the service is up and which engine version answers. */
export function healthReport(now: Date = new Date()): HealthReport {
  return { status: "ok", service: "hydrastate", engineVersion: packageJson.version, checkedAt: now.toISOString() };
}
