import { describe, it, expect } from "vitest";
import { spawnSync } from "node:child_process";
import { join } from "node:path";

const root = join(__dirname, "../..");

function cli(args: string[]) {
  return spawnSync("npx", ["tsx", "lib/cli/main.ts", "schema", ...args], { cwd: root, encoding: "utf8", timeout: 60_000 });
}

describe("schema command", () => {
  it("prints the JSON Schema of cure with both input forms, generated from the zod schemas", () => {
    const r = cli(["cure"]);
    expect(r.status).toBe(0);
    const schema = JSON.parse(r.stdout);
    expect(schema.$schema).toMatch(/2020-12/);
    const forms = schema.anyOf as { properties: Record<string, unknown>; required: string[] }[];
    expect(forms).toHaveLength(2);
    expect(forms[0].required).toContain("cement");
    expect(forms[1].required).toContain("binder");
    expect(forms[1].properties).not.toHaveProperty("heatCurve");
  });

  it("exits 2 naming the commands for an unknown one", () => {
    const r = cli(["nope"]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain("schema: give one of assess, hydrate, cure, equilibrate");
  });
});
