/**
 * `npm run cli -- cure --input FILE.json`: the curing advisory (heat, element temperature, maturity and
 * strength, curing period, evaporation, cold weather, flags) as JSON. Bad input → one line naming the field, exit 2.
 */
import { readJsonInput } from "../read-input";
import { parseCuringInput } from "../../schema/curing-input";
import { adviseCuring } from "../../curing/advise-curing";

export const summary = "curing advisory: element temperature, maturity, strength, curing period and risk flags";

export async function run(args: string[]): Promise<number> {
  const read = readJsonInput(args);
  if (!read.ok) {
    process.stderr.write(`${read.message}\n`);
    return 2;
  }
  const parsed = parseCuringInput(read.value);
  if (!parsed.ok) {
    process.stderr.write(`input: ${parsed.error.message}\n`);
    return 2;
  }
  const advice = adviseCuring(parsed.value);
  process.stdout.write(JSON.stringify(advice, null, 2) + "\n");
  return 0;
}
