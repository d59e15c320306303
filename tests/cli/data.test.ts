import { describe, it, expect, vi, afterEach } from "vitest";
import { run, dataListRows, formatDataTable } from "../../lib/cli/commands/data";

afterEach(() => vi.restoreAllMocks());

function capture(stream: "stdout" | "stderr") {
  let text = "";
  vi.spyOn(process[stream], "write").mockImplementation((chunk: string | Uint8Array) => {
    text += String(chunk);
    return true;
  });
  return () => text;
}

describe("data list", () => {
  it("prints JSON rows with ΔfG°, log Ksp at 25 °C, molar volume, source and the memory marker", async () => {
    const out = capture("stdout");
    expect(await run(["list", "--json"])).toBe(0);
    const rows = JSON.parse(out()) as { id: string; log10Ksp25C?: number; molarVolumeCm3PerMol?: number; source: string; recalledFromMemory: boolean; dissolutionReaction?: string }[];
    const ettringite = rows.find((r) => r.id === "ettringite")!;
    // Perkins & Palmer (1999, Geochim. Cosmochim. Acta 63, 1969): log Ksp −44.9 ± 0.3
    expect(Math.abs(ettringite.log10Ksp25C! - -44.9)).toBeLessThan(0.3);
    expect(ettringite.dissolutionReaction).toBe("ettringite = 6 Ca+2 + 2 Al(OH)4- + 3 SO4-2 + 4 OH- + 26 H2O(l)");
    expect(ettringite.molarVolumeCm3PerMol).toBe(707);
    expect(ettringite.recalledFromMemory).toBe(true);
    expect(rows.find((r) => r.id === "Al(OH)4-")!.log10Ksp25C).toBeUndefined();
  });

  it("prints a table with one line per species, a header and the memory-marker legend", async () => {
    const out = capture("stdout");
    expect(await run(["list"])).toBe(0);
    const rowsResult = dataListRows();
    expect(rowsResult.ok).toBe(true);
    if (!rowsResult.ok) return;
    const lines = out().trimEnd().split("\n");
    expect(lines[0]).toMatch(/^id\s+phase\s+formula/);
    expect(lines.filter((l) => /^ettringite \*\s/.test(l))).toHaveLength(1);
    expect(lines.length).toBe(rowsResult.rows.length + 5);
    expect(formatDataTable(rowsResult.rows)).toContain("recalled from memory");
  });

  it("rejects an unknown subcommand or option with one line on standard error and exit code 2", async () => {
    const err = capture("stderr");
    expect(await run(["show"])).toBe(2);
    expect(await run(["list", "--csv"])).toBe(2);
    const lines = err().trimEnd().split("\n");
    expect(lines).toHaveLength(2);
    expect(lines[1]).toContain("--csv");
  });
});
