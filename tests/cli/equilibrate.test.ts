import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";

/** Runs `npm run cli -- equilibrate --input -` as a user would, with JSON on standard input. */
function cli(input: string) {
  const run = spawnSync(process.execPath, ["--import", "tsx", "lib/cli/main.ts", "equilibrate", "--input", "-"], { input, encoding: "utf8", timeout: 60_000 });
  return { code: run.status, stdout: run.stdout, stderr: run.stderr };
}

describe("cli equilibrate", () => {
  it("prints the result with the documented keys", () => {
    const out = cli(JSON.stringify({ temperatureC: 25, components: { H2O: 55.508, "Ca(OH)2": 0.1 }, unit: "mol", fixedPartialPressuresBar: { CO2: 0.0004 }, suppressedPhases: ["anhydrite"] }));
    expect(out.code).toBe(0);
    const result = JSON.parse(out.stdout);
    for (const key of ["converged", "temperatureC", "pH", "ionicStrength", "phases", "saturationIndices", "solution", "elementPotentials", "iterations", "massBalanceResidual"])
      expect(result).toHaveProperty(key);
    expect(result.phases[0]).toMatchObject({ id: "calcite" });
    expect(Object.keys(result.phases[0])).toEqual(expect.arrayContaining(["id", "moles", "grams", "volumeCm3"]));
    expect(Object.keys(result.solution)).toEqual(expect.arrayContaining(["waterKg", "elementMolality", "species"]));
  });

  it("runs an array of systems as a batch, in order", () => {
    const systems = [20, 40, 60].map((temperatureC) => ({ temperatureC, components: { H2O: 55.508, "Ca(OH)2": 0.1 } }));
    const out = cli(JSON.stringify(systems));
    expect(out.code).toBe(0);
    const results = JSON.parse(out.stdout);
    expect(results.map((r: { temperatureC: number }) => r.temperatureC)).toEqual([20, 40, 60]);
    expect(results[1].warmStarted).toBe(true);
  });

  it("exits non-zero naming the field on bad input, without a stack trace", () => {
    for (const [input, field] of [
      [{ temperatureC: 101, components: { H2O: 1 } }, "temperatureC"],
      [{ temperatureC: 25, components: { "Ca(OH": 1 } }, "components.Ca(OH"],
      [{ temperatureC: 25, components: { H2O: -2 } }, "components.H2O"],
      [{ temperatureC: 25, components: { H2O: 1 }, suppressedPhases: ["nonsuchite"] }, "suppressedPhases[0]"],
    ] as const) {
      const out = cli(JSON.stringify(input));
      expect(out.code).toBe(2);
      expect(out.stderr).toContain(field);
      expect(out.stderr).not.toMatch(/\n\s+at /);
    }
    const broken = cli("{ not json");
    expect(broken.code).toBe(2);
    expect(broken.stderr).toContain("not valid JSON");
  });
});
