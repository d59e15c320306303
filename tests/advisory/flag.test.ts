import { describe, it, expect } from "vitest";
import { FLAG_IDS, isFlagId, severityRank, sortFlags, type Flag } from "../../lib/advisory/flag";

const flag = (id: string, severity: Flag["severity"], firedFraction?: number): Flag => ({
  id,
  severity,
  title: id,
  explanation: "x",
  basis: "common practice",
  actions: [],
  robustness: firedFraction === undefined ? undefined : { firedFraction, samples: 200 },
});

describe("flags", () => {
  it("contain exactly the ten ids listed in issue 5", () => {
    expect([...FLAG_IDS].sort()).toEqual(
      [
        "delayed-ettringite-formation",
        "sulfate-attack",
        "gypsum-formation",
        "magnesium-sulfate-attack",
        "thaumasite-formation",
        "carbonation-depassivation",
        "low-alkalinity-reserve",
        "chloride-binding-limit",
        "ettringite-dehydration",
        "exposure-class-noncompliance",
      ].sort(),
    );
    expect(isFlagId("sulfate-attack")).toBe(true);
    expect(isFlagId("alkali-silica")).toBe(false);
  });

  it("rank warning above caution above info", () => {
    expect(severityRank("warning")).toBeGreaterThan(severityRank("caution"));
    expect(severityRank("caution")).toBeGreaterThan(severityRank("info"));
  });

  it("sort by severity first, then by how often they fired, then by id, without mutating the input", () => {
    const input = [
      flag("b-info", "info"),
      flag("z-warn", "warning", 0.5),
      flag("a-caution", "caution"),
      flag("y-warn", "warning", 0.95),
      flag("a-warn", "warning", 0.5),
    ];
    const copy = [...input];
    expect(sortFlags(input).map((f) => f.id)).toEqual(["y-warn", "a-warn", "z-warn", "a-caution", "b-info"]);
    expect(input).toEqual(copy);
  });
});
