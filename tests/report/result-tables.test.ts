import { describe, expect, it } from "vitest";
import { keyFigures } from "../../lib/report/key-figures";
import { resultTables } from "../../lib/report/result-tables";
import { demoResult } from "./real-result";

describe("resultTables", () => {
  it("lists every exposure class of both standards with its source, the limiting values and the pore solution", async () => {
    const result = await demoResult();
    const [findings, classes, limits, solution] = resultTables(result);
    expect(findings.title).toBe("What the durability scenarios found");
    expect(classes.title).toBe("Exposure classes");
    expect(classes.rows).toHaveLength(result.exposureClasses.en206.classes.length + result.exposureClasses.aci318.classes.length);
    expect(classes.rows.every((row) => row[4].length > 0)).toBe(true);
    expect(limits.rows.some((row) => row[4] === "NOT MET")).toBe(result.compliance.en206.concat(result.compliance.aci318).some((c) => c.pass === false));
    expect(solution.rows[0][0]).toBe("pH");
  });

  it("gives no table for a result without those parts", () => {
    expect(resultTables({})).toEqual([]);
  });
});

describe("keyFigures of a real assessment", () => {
  it("reads the pH, porosity (as per cent) and portlandite content where the service puts them", async () => {
    const result = await demoResult();
    const figures = Object.fromEntries(keyFigures(result).map((f) => [f.id, f.value]));
    expect(figures.pH).toBe(result.assemblage.paste.poreSolution!.pH);
    expect(figures.capillaryPorosity).toBeCloseTo(result.assemblage.paste.porosity.capillaryFraction * 100, 12);
    expect(figures.portlandite).toBe(result.assemblage.paste.perM3.portlanditeKg);
  });
});

describe("keyFigures of the carbonation time", () => {
  const withTime = (timeToCoverYears: number) => ({ scenarios: { carbonation: { depth: { timeToCoverYears } } } });
  const timeOf = (result: unknown) => keyFigures(result).find((f) => f.id === "carbonationTimeToCover")?.value;

  it("gives the years up to 1000 and 'more than 1000' beyond (design working lives are at most 100 years, EN 1990 Table 2.1)", () => {
    expect(timeOf(withTime(62.5))).toBe(62.5);
    expect(timeOf(withTime(1000))).toBe(1000);
    expect(timeOf(withTime(19780))).toBe("more than 1000");
  });
});

describe("the report model of a real assessment", () => {
  it("carries the page's charts (the shared mapping) for the assemblage, both scenarios and the timeline", async () => {
    const { resultCharts } = await import("../../lib/charts/result-charts");
    const result = await demoResult();
    const ids = resultCharts(result).map((c) => c.id);
    for (const id of ["phase-volumes", "sweep-sulfate", "sweep-carbonation", "hydration-timeline"]) expect(ids).toContain(id);
  });
});
