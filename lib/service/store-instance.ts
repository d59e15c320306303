import type { AssessmentStore } from "../store/assessment-store";
import { databasePath, openSqliteStore } from "../store/sqlite-store";
import { runningVersions } from "./versions";

/**
 * The process-wide assessment store, opened on first use at `HYDRASTATE_DB` (default
 * `data/hydrastate.sqlite`). Kept on `globalThis` because Next bundles each route separately and a
 * module-level variable would open one connection per route.
 */
const key = Symbol.for("hydrastate.assessmentStore");
type Holder = { [key]?: AssessmentStore };

export function assessmentStore(): AssessmentStore {
  const holder = globalThis as Holder;
  holder[key] ??= openSqliteStore({ path: databasePath(), currentVersions: runningVersions() });
  return holder[key];
}

/** Replaces the process-wide store (tests use an in-memory one); returns the previous one. */
export function setAssessmentStore(store: AssessmentStore | undefined): AssessmentStore | undefined {
  const holder = globalThis as Holder;
  const previous = holder[key];
  holder[key] = store;
  return previous;
}
