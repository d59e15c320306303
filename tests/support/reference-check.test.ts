import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { checkFile, checksDirectory } from "../../lib/validation/dossier";
import { createReferenceChecker } from "./reference-check";

// Records go to a temporary root: the deliberate failures below must not reach the real dossier.
const recordRoot = mkdtempSync(path.join(tmpdir(), "hydrastate-reference-"));
const expectReference = createReferenceChecker(recordRoot);
const recordFile = path.join(checksDirectory(recordRoot), "support__reference-check.test.ts.json");
afterAll(() => rmSync(recordRoot, { recursive: true, force: true }));

describe("expectReference", () => {
  it("passes within the tolerance and records the check with its test file and name", () => {
    // Arithmetic, not science: this test checks the helper itself (2/3 to 3 decimals is 0.667).
    expectReference({ id: "helper-pass", quantity: "two thirds", conditions: "exact arithmetic", source: "arithmetic", reference: 0.667, computed: 2 / 3, tolerance: 0.001, unit: "" });
    const recorded = checkFile.parse(JSON.parse(readFileSync(recordFile, "utf8")));
    const entry = recorded.checks.find((c) => c.id === "helper-pass");
    expect(entry).toMatchObject({ passed: true, testFile: "tests/support/reference-check.test.ts", source: "arithmetic", relative: false });
    expect(entry?.testName).toContain("passes within the tolerance");
  });

  it("fails outside the tolerance and records the failure before failing", () => {
    expect(() => expectReference({ id: "helper-fail", quantity: "two thirds", conditions: "exact arithmetic", source: "arithmetic", reference: 0.7, computed: 2 / 3, tolerance: 0.01, unit: "" })).toThrow(/two thirds/);
    const recorded = checkFile.parse(JSON.parse(readFileSync(recordFile, "utf8")));
    expect(recorded.checks.find((c) => c.id === "helper-fail")?.passed).toBe(false);
  });

  it("reads a relative tolerance as a fraction of the reference", () => {
    expectReference({ id: "helper-relative", quantity: "ratio", conditions: "exact arithmetic", source: "arithmetic", reference: 100, computed: 100.9, tolerance: 0.01, unit: "", relative: true });
    expect(() => expectReference({ id: "helper-relative-fail", quantity: "ratio", conditions: "exact arithmetic", source: "arithmetic", reference: 100, computed: 101.1, tolerance: 0.01, unit: "", relative: true })).toThrow();
  });
});
