import { describe, it, expect } from "vitest";
import { existsSync } from "node:fs";
import path from "node:path";
import { execFileSync } from "node:child_process";
import { tmpdir } from "node:os";
import { dataDirectory } from "../../lib/data/data-directory";

describe("dataDirectory", () => {
  it("finds lib/data with its starter folder", () => {
    const directory = dataDirectory();
    expect(directory).toBeDefined();
    expect(path.basename(directory!)).toBe("data");
    expect(existsSync(path.join(directory!, "starter", "aqueous.json"))).toBe(true);
  });

  it("resolves from the module location when run from another working directory (tsx)", () => {
    const tsxCli = path.join(process.cwd(), "node_modules", "tsx", "dist", "cli.mjs");
    const modulePath = path.join(process.cwd(), "lib", "data", "data-directory.ts");
    const code = `import { dataDirectory } from ${JSON.stringify(modulePath)}; console.log(dataDirectory());`;
    const printed = execFileSync(process.execPath, [tsxCli, "-e", code], { cwd: tmpdir(), encoding: "utf8" }).trim();
    expect(printed).toBe(path.join(process.cwd(), "lib", "data"));
  });
});
