import { z } from "zod";
import { assessInput } from "../../schema/assess-input";
import { curingBinderFormSchema } from "../../schema/curing-binder-form";
import { curingInputSchema } from "../../schema/curing-input";
import { equilibrateInput } from "../../schema/equilibrate-input";
import { hydrateInput } from "../../schema/hydrate-input";

export const summary = "print the JSON Schema of a command's input (assess, hydrate, cure, equilibrate)";

// `cure` takes either form of the curing input: the cement's phases, or the binder as the assessment gives it.
const schemas: Record<string, z.ZodType> = { assess: assessInput, hydrate: hydrateInput, cure: z.union([curingInputSchema, curingBinderFormSchema]), equilibrate: equilibrateInput };

/** `npm run cli -- schema <command>`: the JSON Schema (draft 2020-12) generated from the shared zod schema. */
export async function run(args: string[]): Promise<number> {
  const name = args[0];
  const schema = name ? schemas[name] : undefined;
  if (!schema) {
    process.stderr.write(`schema: give one of ${Object.keys(schemas).join(", ")}\n`);
    return 2;
  }
  process.stdout.write(JSON.stringify(z.toJSONSchema(schema, { io: "input", unrepresentable: "any" }), null, 2) + "\n");
  return 0;
}
