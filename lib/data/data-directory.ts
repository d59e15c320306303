import { existsSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

/**
 * Absolute path of `lib/data/`. Resolved from this module's own location when that is a file URL whose
 * folder holds `starter/` (vitest, tsx), otherwise from `process.cwd()` + `lib/data` (a bundled Next.js
 * server, whose module URL does not point into the source tree). Returns undefined when neither exists.
 */
export function dataDirectory(): string | undefined {
  const candidates: string[] = [];
  try {
    const moduleUrl = import.meta.url;
    if (moduleUrl.startsWith("file:")) candidates.push(path.dirname(fileURLToPath(moduleUrl)));
  } catch {
    // import.meta.url unavailable in this bundle: fall back to the working directory.
  }
  candidates.push(path.join(process.cwd(), "lib", "data"));
  return candidates.find((directory) => existsSync(path.join(directory, "starter")));
}
