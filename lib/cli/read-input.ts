import { readFileSync } from "node:fs";

export type InputReadResult = { ok: true; value: unknown } | { ok: false; message: string };

/** Reads `--input FILE` (or `-` for standard input) from the argument list and parses it as JSON. */
export function readJsonInput(args: string[]): InputReadResult {
  const at = args.indexOf("--input");
  if (at < 0 || at + 1 >= args.length) return { ok: false, message: "missing --input FILE.json (use - for standard input)" };
  const path = args[at + 1];
  let text: string;
  try {
    text = readFileSync(path === "-" ? 0 : path, "utf8");
  } catch (error) {
    return { ok: false, message: `input: cannot read ${path}: ${(error as NodeJS.ErrnoException).code ?? "error"}` };
  }
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (error) {
    return { ok: false, message: `input: not valid JSON (${(error as Error).message})` };
  }
}
