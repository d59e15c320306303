import { describe, it, expect } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

/**
 * The committed starter data are what their generator writes (lib/data/scripts/write-starter-data.py, which
 * fits the heat capacity of water to IAPWS-95 with Debian's python3-iapws). A hand edit of the JSON that the
 * script does not know about would be lost the next time someone regenerates the data.
 * Numbers are compared to 1e-9 relative: the last printed digit of the water Cp fit depends on the
 * python3-iapws build.
 */
const files = ["aqueous", "gases", "solids"];
const starterDirectory = join(__dirname, "../../../lib/data/starter");

function expectSameData(written: unknown, committed: unknown, path: string): void {
  if (typeof committed === "number" && typeof written === "number") {
    const scale = Math.max(Math.abs(committed), 1e-300);
    if (Math.abs(written - committed) / scale > 1e-9) expect.fail(`${path}: generator writes ${written}, committed ${committed}`);
    return;
  }
  if (committed !== null && typeof committed === "object") {
    expect(typeof written, path).toBe("object");
    const keys = new Set([...Object.keys(committed), ...Object.keys(written as object)]);
    for (const key of keys) expectSameData((written as Record<string, unknown>)[key], (committed as Record<string, unknown>)[key], `${path}.${key}`);
    return;
  }
  expect(written, path).toEqual(committed);
}

describe("starter data generator", () => {
  it("writes exactly the committed aqueous, gas and solid files", () => {
    const directory = mkdtempSync(join(tmpdir(), "hydrastate-starter-"));
    try {
      execFileSync("/usr/bin/python3", [join(__dirname, "../../../lib/data/scripts/write-starter-data.py"), directory], { encoding: "utf8" });
      for (const file of files) {
        const written = JSON.parse(readFileSync(join(directory, `${file}.json`), "utf8"));
        const committed = JSON.parse(readFileSync(join(starterDirectory, `${file}.json`), "utf8"));
        expectSameData(written, committed, file);
      }
    } finally {
      rmSync(directory, { recursive: true, force: true });
    }
  }, 60_000);
});
