/**
 * Command-line entry: `npm run cli -- <command> [--input FILE.json|-] [args]`.
 * Each command is one file in `lib/cli/commands/<command>.ts` exporting `run(args): Promise<number>`
 * (the exit code). Commands print JSON on standard output and a one-line message naming the field on error.
 */
import { readdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { dirname, join } from "node:path";

type Command = { run: (args: string[]) => Promise<number>; summary?: string };

const commandsDir = join(dirname(fileURLToPath(import.meta.url)), "commands");

function commandNames(): string[] {
  return readdirSync(commandsDir)
    .filter((f) => f.endsWith(".ts"))
    .map((f) => f.replace(/\.ts$/, ""))
    .sort();
}

async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  const names = commandNames();
  if (!name || name === "help" || name === "--help") {
    process.stdout.write(`usage: npm run cli -- <command> [options]\ncommands: ${names.join(", ")}\n`);
    return name ? 0 : 2;
  }
  if (!names.includes(name)) {
    process.stderr.write(`unknown command "${name}"; commands: ${names.join(", ")}\n`);
    return 2;
  }
  const command = (await import(join(commandsDir, `${name}.ts`))) as Command;
  return command.run(rest);
}

// The exit code is set, not forced with process.exit(): the process ends when standard output has drained. Forcing it
// cut piped output at 64 KiB when the CLI runs under the tsx launcher (`npm run cli -- hydrate ... | jq`), which relays
// the output of its child process through a pipe.
main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    // A bug, not a user error: say so in one line; the stack goes only to a debug run.
    process.stderr.write(`internal error: ${error instanceof Error ? error.message : String(error)}\n`);
    if (process.env.HYDRASTATE_DEBUG) console.error(error);
    process.exitCode = 70;
  },
);
