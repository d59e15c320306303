import { runHydrate } from "../../service/hydrate";
import { printServiceError } from "../print-service-error";
import { readJsonInput } from "../read-input";

export const summary = "hydrate assemblage, volumes, pore solution and timeline of a binder, mix and age";

/**
 * `npm run cli -- hydrate --input FILE.json`: prints `{ assemblage, volumes, porosity, poreSolution,
 * timeline, ... }`. Without a `timeline` entry in the input the default timeline is computed (40 ages
 * from 1 hour to 10 years). Exit 2 naming the field on bad input, 1 on a failed computation.
 */
export async function run(args: string[]): Promise<number> {
  const input = readJsonInput(args);
  if (!input.ok) {
    process.stderr.write(`${input.message}\n`);
    return 2;
  }
  const raw = input.value as Record<string, unknown>;
  const withTimeline = raw && typeof raw === "object" && !("timeline" in raw) ? { ...raw, timeline: {} } : raw;
  const outcome = runHydrate(withTimeline);
  if (!outcome.ok) return printServiceError(outcome.error);
  const { state: _state, ...assemblage } = outcome.value.assemblage;
  process.stdout.write(JSON.stringify({ ...outcome.value, assemblage }, null, 2) + "\n");
  return 0;
}
