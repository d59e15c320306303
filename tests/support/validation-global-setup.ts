import { rmSync } from "node:fs";
import { collectDossier } from "../../lib/validation/collect";
import { checksDirectory } from "../../lib/validation/dossier";

/**
 * Vitest global setup for the validation dossier (`test.globalSetup` in vitest.config.ts): clears the
 * per-file check records of the previous run, and after the run merges them into
 * `tests/artifacts/validation-dossier.json`. Only a whole-suite run clears (a single-file run keeps the rest).
 */
export default function setup(): () => void {
  const wholeSuite = !process.argv.slice(2).some((arg) => arg.startsWith("tests/"));
  if (wholeSuite) rmSync(checksDirectory(), { recursive: true, force: true });
  return () => {
    collectDossier();
  };
}
