import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { z } from "zod";

/**
 * The validation dossier: every published-value check of the test suite (quantity, conditions, source,
 * reference, computed value, tolerance, pass/fail), recorded by the checks themselves when the suite runs
 * (`tests/support/reference-check.ts`), never typed by hand. Per test file the checks go to
 * `tests/artifacts/validation/<test file>.json`; `collectDossier` merges them into
 * `tests/artifacts/validation-dossier.json`. Both are generated files, ignored by git.
 */
export const referenceCheck = z.object({
  id: z.string(),
  quantity: z.string(),
  conditions: z.string(),
  source: z.string(),
  reference: z.number(),
  computed: z.number(),
  tolerance: z.number(),
  unit: z.string(),
  relative: z.boolean(),
  passed: z.boolean(),
  testFile: z.string(),
  testName: z.string(),
});
export type RecordedCheck = z.infer<typeof referenceCheck>;

const versions = z.object({ dataset: z.string(), engine: z.string() });

export const checkFile = z.object({ testFile: z.string(), recordedAt: z.string(), versions, checks: z.array(referenceCheck) });
export type CheckFile = z.infer<typeof checkFile>;

export const validationDossier = z.object({
  generatedAt: z.string(),
  versions,
  /** Test files whose recorded versions differ from `versions` (recorded in an earlier run). */
  mixedVersions: z.array(z.string()),
  summary: z.object({ checks: z.number(), passed: z.number(), failed: z.number(), testFiles: z.number() }),
  checks: z.array(referenceCheck),
});
export type ValidationDossier = z.infer<typeof validationDossier>;

/** `tests/artifacts` under the working directory (the repository root for npm scripts and the server). */
export function artifactsDirectory(root: string = process.cwd()): string {
  return path.join(root, "tests", "artifacts");
}
export const checksDirectory = (root?: string) => path.join(artifactsDirectory(root), "validation");
export const dossierPath = (root?: string) => path.join(artifactsDirectory(root), "validation-dossier.json");

/** Whether a reference check passes: |computed − reference| ≤ tolerance, or ≤ tolerance·|reference| if relative. */
export function checkPasses(check: { reference: number; computed: number; tolerance: number; relative?: boolean }): boolean {
  const limit = check.relative ? check.tolerance * Math.abs(check.reference) : check.tolerance;
  return Number.isFinite(check.computed) && Math.abs(check.computed - check.reference) <= limit;
}

/** Merges per-file check records into one dossier (files in name order); unreadable files are skipped. */
export function mergeCheckFiles(files: readonly CheckFile[], now: Date = new Date()): ValidationDossier {
  const sorted = [...files].sort((a, b) => a.testFile.localeCompare(b.testFile));
  const latest = [...files].sort((a, b) => b.recordedAt.localeCompare(a.recordedAt))[0];
  const running = latest?.versions ?? { dataset: "unknown", engine: "unknown" };
  const checks = sorted.flatMap((f) => f.checks);
  const passed = checks.filter((c) => c.passed).length;
  return {
    generatedAt: now.toISOString(),
    versions: running,
    mixedVersions: sorted.filter((f) => f.versions.dataset !== running.dataset || f.versions.engine !== running.engine).map((f) => f.testFile),
    summary: { checks: checks.length, passed, failed: checks.length - passed, testFiles: sorted.length },
    checks,
  };
}

/** The per-file check records found under `tests/artifacts/validation/`, for test files that still exist. */
export function readCheckFiles(root?: string): CheckFile[] {
  const directory = checksDirectory(root);
  if (!existsSync(directory)) return [];
  const files: CheckFile[] = [];
  for (const name of readdirSync(directory).filter((n) => n.endsWith(".json")).sort()) {
    try {
      // Read at run time, not traced into the server bundle (the bundler would take the whole project).
      const parsed = checkFile.safeParse(JSON.parse(readFileSync(path.join(/*turbopackIgnore: true*/ directory, name), "utf8")));
      // A record of a test file that no longer exists (renamed or removed) is stale: left out.
      if (parsed.success && existsSync(path.join(/*turbopackIgnore: true*/ root ?? process.cwd(), parsed.data.testFile))) files.push(parsed.data);
    } catch {
      // a half-written file from an interrupted run: skipped
    }
  }
  return files;
}

/**
 * The dossier for the page and the report appendix: merged from the per-file records when there are any
 * (so it is never staler than the last run, whether or not the merge step ran), else the merged file, else
 * `null` ("not generated yet — run npm test").
 */
export function readDossier(root?: string): ValidationDossier | null {
  const files = readCheckFiles(root);
  if (files.length > 0) return mergeCheckFiles(files);
  const file = dossierPath(root);
  if (!existsSync(file)) return null;
  try {
    const parsed = validationDossier.safeParse(JSON.parse(readFileSync(file, "utf8")));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}
