import packageJson from "../../package.json";
import { loadDataset } from "../data/load-dataset";
import type { Versions } from "../store/assessment-store";

/** The engine version: the package version (package.json). */
export const ENGINE_VERSION: string = packageJson.version;

/**
 * The versions the running service computes with: the data-set hash of `loadDataset()` and the engine
 * version. A data set that fails to load reports `unavailable` (the computations then fail with their own error).
 */
export function runningVersions(): Versions {
  const loaded = loadDataset();
  return { dataset: loaded.ok ? loaded.value.version : "unavailable", engine: ENGINE_VERSION };
}
