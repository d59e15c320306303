import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { dossierPath, mergeCheckFiles, readCheckFiles, type ValidationDossier } from "./dossier";

/**
 * Merges the per-test-file check records into `tests/artifacts/validation-dossier.json`.
 * Run after the suite: `npx tsx lib/validation/collect.ts` (or from a vitest global teardown).
 */
export function collectDossier(root?: string, now: Date = new Date()): ValidationDossier {
  const dossier = mergeCheckFiles(readCheckFiles(root), now);
  const file = dossierPath(root);
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, JSON.stringify(dossier, null, 2) + "\n");
  return dossier;
}

if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  const dossier = collectDossier();
  process.stdout.write(`${dossier.summary.checks} checks (${dossier.summary.failed} failed) from ${dossier.summary.testFiles} test files → ${dossierPath()}\n`);
}
