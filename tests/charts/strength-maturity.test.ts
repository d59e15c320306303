import { describe, it, expect } from "vitest";
import { strengthMaturityChart } from "../../lib/charts/strength-maturity";

describe("strength and maturity chart", () => {
  it("joins strength and equivalent age on time, leaving empty cells where one side is missing", () => {
    const chart = strengthMaturityChart(
      [
        { timeH: 24, coreMPa: 12, surfaceMPa: 8 },
        { timeH: 48, coreMPa: 20, surfaceMPa: 15 },
      ],
      [
        { timeH: 48, coreEquivalentAgeH: 90, surfaceEquivalentAgeH: 52 },
        { timeH: 72, coreEquivalentAgeH: 130, surfaceEquivalentAgeH: 76 },
      ],
    );
    expect(chart.rows).toEqual([
      { timeH: 24, coreMPa: 12, surfaceMPa: 8, coreAgeH: null, surfaceAgeH: null },
      { timeH: 48, coreMPa: 20, surfaceMPa: 15, coreAgeH: 90, surfaceAgeH: 52 },
      { timeH: 72, coreMPa: null, surfaceMPa: null, coreAgeH: 130, surfaceAgeH: 76 },
    ]);
  });

  it("reads strength on the left axis in MPa and equivalent age on the right in hours, with targets as lines", () => {
    const chart = strengthMaturityChart([], [], [{ label: "Striking 10 MPa", strengthMPa: 10 }]);
    expect(chart.yLeft.unit).toBe("MPa");
    expect(chart.yRight?.unit).toBe("h");
    expect(chart.series.filter((s) => s.axis === "right").map((s) => s.unit)).toEqual(["h", "h"]);
    expect(chart.thresholds).toEqual([{ label: "Striking 10 MPa", value: 10, unit: "MPa", axis: "left" }]);
  });
});
