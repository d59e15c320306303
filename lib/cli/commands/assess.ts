import { runAssessment } from "../../service/assess";
import { printServiceError } from "../print-service-error";
import { readJsonInput } from "../read-input";

export const summary = "durability assessment: assemblage, scenarios, exposure classes, flags and cautions";

/**
 * `npm run cli -- assess --input FILE.json` prints `{ assemblage, scenarios, exposureClasses, compliance,
 * flags, cautions, ... }` (input schema: `npm run cli -- schema assess`). Exit 2 naming the field on bad
 * input, 1 when a computation fails.
 */
export async function run(args: string[]): Promise<number> {
  const input = readJsonInput(args);
  if (!input.ok) {
    process.stderr.write(`${input.message}\n`);
    return 2;
  }
  const outcome = await runAssessment(input.value, {
    onProgress: args.includes("--progress") ? (f) => process.stderr.write(`progress ${(100 * f).toFixed(0)} %\n`) : undefined,
  });
  if (!outcome.ok) return printServiceError(outcome.error);
  process.stdout.write(JSON.stringify(outcome.value, null, 2) + "\n");
  return 0;
}
