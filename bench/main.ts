/**
 * `npm run bench`: runs every `bench/*.bench.ts` (each exports `run(): Promise<Record<string, unknown>>`)
 * and prints one JSON object keyed by file name. Speed targets are read from here, never from unit tests.
 */
import { readdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { dirname, join } from "node:path";
import { cpus } from "node:os";

const here = dirname(fileURLToPath(import.meta.url));
const only = process.argv[2];
const files = readdirSync(here)
  .filter((f) => f.endsWith(".bench.ts") && (!only || f.startsWith(only)))
  .sort();
const results: Record<string, unknown> = {
  machine: { cpu: cpus()[0]?.model ?? "unknown", cores: cpus().length, node: process.version },
};
async function main(): Promise<void> {
  for (const file of files) {
    const module = (await import(join(here, file))) as { run: () => Promise<Record<string, unknown>> };
    results[file.replace(/\.bench\.ts$/, "")] = await module.run();
  }
  process.stdout.write(JSON.stringify(results, null, 2) + "\n");
}

main().catch((error: unknown) => {
  process.stderr.write(`benchmark failed: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
