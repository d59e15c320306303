import { describe, it, expect } from "vitest";
import { cautionsFor, cautionTextsFor, type ResultKind } from "../../lib/advisory/cautions";

const kinds: ResultKind[] = ["assessment", "scenario", "exposure-classification", "compliance", "carbonation-depth", "monte-carlo"];

describe("cautions", () => {
  it("give every kind of result the five statements issue 5 requires", () => {
    for (const kind of kinds) {
      const text = cautionTextsFor(kind).join(" ");
      expect(text).toMatch(/thermodynamic guide/);
      expect(text).toMatch(/Equilibrium is not kinetics/);
      expect(text).toMatch(/data set has uncertainty/);
      expect(text).toMatch(/codes and standards.*testing.*responsible, licensed engineer/);
      expect(text).toMatch(/National annexes.*local codes govern/);
    }
  });

  it("add the transport-model caution to carbonation depth results only", () => {
    expect(cautionsFor("carbonation-depth").map((c) => c.id)).toContain("simplified-transport-model");
    expect(cautionsFor("assessment").map((c) => c.id)).not.toContain("simplified-transport-model");
  });

  it("have no duplicate ids within a result", () => {
    for (const kind of kinds) {
      const ids = cautionsFor(kind).map((c) => c.id);
      expect(new Set(ids).size).toBe(ids.length);
    }
  });
});
