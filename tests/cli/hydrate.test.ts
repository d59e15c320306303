import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";

function cli(input: unknown) {
  const run = spawnSync(process.execPath, ["--import", "tsx", "lib/cli/main.ts", "hydrate", "--input", "-"], { input: JSON.stringify(input), encoding: "utf8", timeout: 120_000 });
  return { code: run.status, stdout: run.stdout, stderr: run.stderr };
}

const blended = {
  cement: { kind: "preset", presetId: "en197-cem-i" },
  supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 35, composition: { kind: "preset", presetId: "slag-typical" } }],
  mix: { waterBinderRatio: 0.45, binderContentKgPerM3: 360 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
};

describe("cli hydrate", () => {
  it("prints assemblage, volumes, porosity, pore solution and a 40-age timeline from 1 hour to 10 years", () => {
    const out = cli(blended);
    expect(out.code).toBe(0);
    const r = JSON.parse(out.stdout);
    for (const key of ["assemblage", "volumes", "porosity", "poreSolution", "timeline"]) expect(r).toHaveProperty(key);
    expect(r.volumes["pore-solution"]).toBeGreaterThan(0);
    expect(r.volumes["unreacted-slag"]).toBeGreaterThan(0);
    expect(r.timeline).toHaveLength(40);
    expect(r.timeline[0].ageDays).toBeCloseTo(1 / 24, 10);
    expect(r.timeline[39].ageDays).toBeCloseTo(3650, 6);
    // The hydrate volume grows with age (common practice: hydration fills space).
    const hydrates = (e: { phases: { origin: string; volumeCm3: number }[] }) => e.phases.filter((p) => p.origin === "hydrate").reduce((s, p) => s + p.volumeCm3, 0);
    expect(hydrates(r.timeline[39])).toBeGreaterThan(hydrates(r.timeline[0]));
    expect(r.warnings.map((w: { code: string }) => w.code)).toContain("scm_model_extrapolated");
  });

  it("prints the whole JSON into a shell pipe under the tsx launcher that `npm run cli` uses (output above 64 KiB)", () => {
    // Regression: the exit was forced with process.exit(), which cut the output at 65 536 bytes in `npm run cli -- hydrate
    // ... | jq` (a real pipe; the socket pair that spawnSync gives a child did not show it).
    const run = spawnSync("sh", ["-c", "node_modules/.bin/tsx lib/cli/main.ts hydrate --input - | cat"], { input: JSON.stringify(blended), encoding: "utf8", timeout: 120_000, maxBuffer: 1e8 });
    expect(run.status).toBe(0);
    expect(run.stdout.length).toBeGreaterThan(65_536);
    expect(JSON.parse(run.stdout).timeline).toHaveLength(40);
  });

  it("exits 2 naming the field and its limit on bad input", () => {
    const out = cli({ ...blended, mix: { waterBinderRatio: 0.95, binderContentKgPerM3: 360 } });
    expect(out.code).toBe(2);
    expect(out.stderr).toContain("waterBinderRatio must be between 0.25 and 0.80");
    const unknown = cli({ ...blended, suppressedPhases: ["unobtainium"] });
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toContain("suppressedPhases[0]");
  });
});
