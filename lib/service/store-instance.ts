import type { AssessmentStore } from "../store/assessment-store";
import { databasePath, openSqliteStore } from "../store/sqlite-store";
import { processWide } from "./process-wide";
import { runningVersions } from "./versions";

/**
 * The process-wide assessment store, opened on first use at `HYDRASTATE_DB` (default
 * `data/hydrastate.sqlite`). Kept on `globalThis` because Next bundles each route separately and a
 * module-level variable would open one connection per route.
 */
const store = processWide<AssessmentStore>("hydrastate.assessmentStore", () => openSqliteStore({ path: databasePath(), currentVersions: runningVersions() }));

export function assessmentStore(): AssessmentStore {
  return store.get();
}

/** Replaces the process-wide store (tests use an in-memory one); returns the previous one. */
export function setAssessmentStore(replacement: AssessmentStore | undefined): AssessmentStore | undefined {
  return store.replace(replacement);
}
