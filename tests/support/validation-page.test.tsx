import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { renderToStaticMarkup } from "react-dom/server";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import ValidationPage from "../../app/validation/page";
import { checksDirectory } from "../../lib/validation/dossier";

// The page reads the dossier under the working directory; each test runs in an empty temporary one.
const original = process.cwd();
let root = "";
beforeEach(() => {
  root = mkdtempSync(path.join(tmpdir(), "hydrastate-page-"));
  process.chdir(root);
});
afterEach(() => {
  process.chdir(original);
  rmSync(root, { recursive: true, force: true });
});

describe("the validation dossier page", () => {
  it("says the dossier is not generated yet when the suite has not run", () => {
    expect(renderToStaticMarkup(<ValidationPage />)).toContain("has not been generated yet — run <code>npm test</code>");
  });

  it("lists each recorded check with source, reference, computed value, tolerance and result in words", () => {
    mkdirSync(checksDirectory(root), { recursive: true });
    mkdirSync(path.join(root, "tests", "thermo"), { recursive: true });
    writeFileSync(path.join(root, "tests", "thermo", "water-ionisation.test.ts"), ""); // records of missing test files are left out
    const check = { id: "pkw-25", quantity: "pKw", conditions: "25 °C, 0.1 MPa", source: "IAPWS R11-07 (Bandura & Lvov 2006)", reference: 13.995, computed: 13.9951, tolerance: 0.01, unit: "", relative: false, passed: true, testFile: "tests/thermo/water-ionisation.test.ts", testName: "pKw" };
    writeFileSync(path.join(checksDirectory(root), "thermo__water-ionisation.test.ts.json"), JSON.stringify({ testFile: check.testFile, recordedAt: "2026-12-01T00:00:00Z", versions: { dataset: "d1", engine: "0.1.0" }, checks: [check, { ...check, id: "x", computed: 14.5, passed: false }] }));
    const html = renderToStaticMarkup(<ValidationPage />);
    expect(html).toContain("IAPWS R11-07 (Bandura &amp; Lvov 2006)");
    expect(html).toContain("13.995");
    expect(html).toContain("± 0.01");
    expect(html).toContain("✓ pass");
    expect(html).toContain("✗ FAIL");
    expect(html).toContain("1 passed, 1 failed");
  });
});
