import { equilibrate } from "../../equilibrium/equilibrate";
import { describeFailure } from "../../equilibrium/failure";
import type { EquilibriumResult } from "../../equilibrium/result";
import { readJsonInput } from "../read-input";

export const summary = "equilibrium phase assemblage of one system, or of an array of systems (batch)";

/** The printed result: the engine's result without the internal warm-start state. */
function printable(result: EquilibriumResult): Omit<EquilibriumResult, "state"> {
  const { state: _state, ...rest } = result;
  return rest;
}

/**
 * `npm run cli -- equilibrate --input FILE.json` (FILE may be `-`). An array of systems runs as a batch,
 * each warm-started from the previous one; the output is then an array in the same order. Exits 2 naming
 * the field on bad input, 1 if a system does not converge.
 */
export async function run(args: string[]): Promise<number> {
  const input = readJsonInput(args);
  if (!input.ok) {
    process.stderr.write(`${input.message}\n`);
    return 2;
  }
  const batch = Array.isArray(input.value);
  const systems = batch ? (input.value as unknown[]) : [input.value];
  if (systems.length === 0) {
    process.stderr.write("input: the batch array is empty\n");
    return 2;
  }
  const results: Omit<EquilibriumResult, "state">[] = [];
  let previous: EquilibriumResult | undefined;
  for (const [index, system] of systems.entries()) {
    const outcome = equilibrate(system, { warmStart: previous?.state });
    if (!outcome.ok) {
      const where = batch ? `[${index}] ` : "";
      const prefix = outcome.error.code === "invalid_input" ? "" : `${outcome.error.code}: `;
      process.stderr.write(`${where}${prefix}${describeFailure(outcome.error)}\n`);
      return outcome.error.code === "invalid_input" ? 2 : 1;
    }
    previous = outcome.value;
    results.push(printable(outcome.value));
  }
  process.stdout.write(JSON.stringify(batch ? results : results[0], null, 2) + "\n");
  return 0;
}
