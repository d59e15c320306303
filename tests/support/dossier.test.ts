import { mkdtempSync, mkdirSync, rmSync, writeFileSync, existsSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { collectDossier } from "../../lib/validation/collect";
import { checkPasses, checksDirectory, dossierPath, mergeCheckFiles, readDossier, type CheckFile } from "../../lib/validation/dossier";

const roots: string[] = [];
/** A temporary repository root with the test files the records below name. */
function tempRoot(): string {
  const root = mkdtempSync(path.join(tmpdir(), "hydrastate-dossier-"));
  roots.push(root);
  mkdirSync(path.join(root, "tests"), { recursive: true });
  for (const name of ["a", "b"]) writeFileSync(path.join(root, "tests", `${name}.test.ts`), "");
  return root;
}
afterEach(() => {
  while (roots.length) rmSync(roots.pop()!, { recursive: true, force: true });
});

const check = (id: string, passed: boolean) => ({
  id, quantity: "pKw", conditions: "25 °C", source: "IAPWS R11-07", reference: 13.995, computed: passed ? 13.995 : 14.2, tolerance: 0.01, unit: "", relative: false, passed, testFile: "tests/thermo/x.test.ts", testName: "t",
});
const file = (testFile: string, checks: ReturnType<typeof check>[], versions = { dataset: "d1", engine: "0.1.0" }, recordedAt = "2026-12-01T10:00:00Z"): CheckFile => ({ testFile, recordedAt, versions, checks });

describe("checkPasses", () => {
  it("applies an absolute tolerance inclusively and a relative one against |reference|", () => {
    expect(checkPasses({ reference: 10, computed: 10.5, tolerance: 0.5 })).toBe(true);
    expect(checkPasses({ reference: 10, computed: 10.6, tolerance: 0.5 })).toBe(false);
    expect(checkPasses({ reference: -10, computed: -10.9, tolerance: 0.1, relative: true })).toBe(true);
    expect(checkPasses({ reference: -10, computed: -11.1, tolerance: 0.1, relative: true })).toBe(false);
    expect(checkPasses({ reference: 1, computed: Number.NaN, tolerance: 1 })).toBe(false);
  });
});

describe("mergeCheckFiles", () => {
  it("counts checks, passes and failures over the files in name order", () => {
    const dossier = mergeCheckFiles([file("tests/b.test.ts", [check("b", false)]), file("tests/a.test.ts", [check("a1", true), check("a2", true)])], new Date("2026-12-01T12:00:00Z"));
    expect(dossier.summary).toEqual({ checks: 3, passed: 2, failed: 1, testFiles: 2 });
    expect(dossier.checks.map((c) => c.id)).toEqual(["a1", "a2", "b"]);
    expect(dossier.generatedAt).toBe("2026-12-01T12:00:00.000Z");
  });

  it("takes the versions of the latest record and names files recorded with other versions", () => {
    const dossier = mergeCheckFiles([file("tests/old.test.ts", [], { dataset: "d0", engine: "0.1.0" }, "2026-11-01T00:00:00Z"), file("tests/new.test.ts", [], { dataset: "d1", engine: "0.1.0" }, "2026-12-01T00:00:00Z")]);
    expect(dossier.versions).toEqual({ dataset: "d1", engine: "0.1.0" });
    expect(dossier.mixedVersions).toEqual(["tests/old.test.ts"]);
  });
});

describe("readDossier and collectDossier", () => {
  it("returns null when nothing has been recorded", () => {
    expect(readDossier(tempRoot())).toBeNull();
  });

  it("merges per-file records on the fly, skipping unreadable ones, so a later run is never hidden by an older merged file", () => {
    const root = tempRoot();
    mkdirSync(checksDirectory(root), { recursive: true });
    writeFileSync(path.join(checksDirectory(root), "a.json"), JSON.stringify(file("tests/a.test.ts", [check("a", true)])));
    writeFileSync(path.join(checksDirectory(root), "broken.json"), "{ half");
    const collected = collectDossier(root, new Date("2026-12-01T00:00:00Z"));
    expect(existsSync(dossierPath(root))).toBe(true);
    expect(JSON.parse(readFileSync(dossierPath(root), "utf8")).summary).toEqual(collected.summary);
    writeFileSync(path.join(checksDirectory(root), "b.json"), JSON.stringify(file("tests/b.test.ts", [check("b", false)])));
    expect(readDossier(root)?.summary).toMatchObject({ checks: 2, failed: 1 });
  });

  it("leaves out the records of test files that no longer exist", () => {
    const root = tempRoot();
    mkdirSync(checksDirectory(root), { recursive: true });
    writeFileSync(path.join(checksDirectory(root), "gone.json"), JSON.stringify(file("tests/gone.test.ts", [check("g", true)])));
    writeFileSync(path.join(checksDirectory(root), "a.json"), JSON.stringify(file("tests/a.test.ts", [check("a", true)])));
    expect(readDossier(root)?.checks.map((c) => c.id)).toEqual(["a"]);
  });

  it("reads the merged file when the per-file records are gone", () => {
    const root = tempRoot();
    mkdirSync(checksDirectory(root), { recursive: true });
    writeFileSync(path.join(checksDirectory(root), "a.json"), JSON.stringify(file("tests/a.test.ts", [check("a", true)])));
    collectDossier(root, new Date("2026-12-01T00:00:00Z"));
    rmSync(checksDirectory(root), { recursive: true });
    expect(readDossier(root)?.generatedAt).toBe("2026-12-01T00:00:00.000Z");
  });
});
