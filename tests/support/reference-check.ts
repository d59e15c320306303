import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { expect } from "vitest";
import packageJson from "../../package.json";
import { loadDataset } from "../../lib/data/load-dataset";
import { checkPasses, checksDirectory, type CheckFile, type RecordedCheck } from "../../lib/validation/dossier";

/**
 * A published-value check: asserts |computed − reference| ≤ tolerance (or ≤ tolerance·|reference| when
 * `relative`) with vitest, and records the check for the validation dossier in
 * `tests/artifacts/validation/<test file>.json` (ignored by git). The record is written before the
 * assertion, so a failing check appears in the dossier as failed.
 */
export type ReferenceCheck = {
  /** Stable id within the test file, e.g. "portlandite-pH-25C". */
  id: string;
  quantity: string;
  conditions: string;
  /** The outside source, as cited beside the check. */
  source: string;
  reference: number;
  computed: number;
  tolerance: number;
  unit: string;
  relative?: boolean;
};

function repositoryRoot(): string {
  return path.resolve(path.dirname(new URL(import.meta.url).pathname), "..", "..");
}

function currentVersions(): { dataset: string; engine: string } {
  const loaded = loadDataset();
  return { dataset: loaded.ok ? loaded.value.version : "unavailable", engine: packageJson.version };
}

/** Keeps this process's checks per test file and rewrites that file's record after each check. */
function recorder(recordRoot: string): (check: RecordedCheck) => void {
  const recorded = new Map<string, RecordedCheck[]>();
  return (check) => {
    const list = recorded.get(check.testFile) ?? [];
    const index = list.findIndex((c) => c.id === check.id && c.testName === check.testName);
    if (index >= 0) list[index] = check;
    else list.push(check);
    recorded.set(check.testFile, list);
    const file: CheckFile = { testFile: check.testFile, recordedAt: new Date().toISOString(), versions: currentVersions(), checks: list };
    const directory = checksDirectory(recordRoot);
    mkdirSync(directory, { recursive: true });
    const name = check.testFile.replace(/^tests\//, "").replace(/[\\/]/g, "__") + ".json";
    writeFileSync(path.join(directory, name), JSON.stringify(file, null, 2) + "\n");
  };
}

/**
 * A checker that records under `<recordRoot>/tests/artifacts/validation` (default: the repository). The
 * helper's own tests record elsewhere so that their deliberate failures never reach the dossier.
 */
export function createReferenceChecker(recordRoot: string = repositoryRoot()): (check: ReferenceCheck) => void {
  const root = repositoryRoot();
  const record = recorder(recordRoot);
  return (check) => {
    const state = expect.getState();
    const testFile = state.testPath ? path.relative(root, state.testPath).split(path.sep).join("/") : "unknown";
    const relative = check.relative === true;
    const passed = checkPasses({ ...check, relative });
    record({ ...check, relative, passed, testFile, testName: state.currentTestName ?? "" });
    const limit = relative ? check.tolerance * Math.abs(check.reference) : check.tolerance;
    const message = `${check.quantity} (${check.conditions}): computed ${check.computed} ${check.unit}, reference ${check.reference} ${check.unit} ± ${limit} (${check.source})`;
    expect(Number.isFinite(check.computed), message).toBe(true);
    expect(Math.abs(check.computed - check.reference), message).toBeLessThanOrEqual(limit);
  };
}

/** The checker of the test suite: records into the repository's `tests/artifacts/validation/`. */
export const expectReference = createReferenceChecker();
