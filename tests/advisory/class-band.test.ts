import { describe, it, expect } from "vitest";
import { bandContains, describeBand, findBand, type ClassBand } from "../../lib/advisory/class-band";

const band = (min: number | null, minInclusive: boolean, max: number | null, maxInclusive: boolean): ClassBand => ({
  exposureClass: "X",
  min,
  minInclusive,
  max,
  maxInclusive,
});

describe("class bands", () => {
  it("honour inclusive and exclusive ends exactly", () => {
    expect(bandContains(band(600, false, 3000, true), 600)).toBe(false);
    expect(bandContains(band(600, false, 3000, true), 3000)).toBe(true);
    expect(bandContains(band(150, true, 1500, false), 150)).toBe(true);
    expect(bandContains(band(150, true, 1500, false), 1500)).toBe(false);
    expect(bandContains(band(null, false, 150, false), -1e9)).toBe(true);
    expect(bandContains(band(10000, false, null, false), 1e12)).toBe(true);
  });

  it("find the first containing band or none", () => {
    const bands = [{ ...band(0, true, 1, false), exposureClass: "A" }, { ...band(1, true, 2, true), exposureClass: "B" }];
    expect(findBand(bands, 1)?.exposureClass).toBe("B");
    expect(findBand(bands, 2.5)).toBeUndefined();
  });

  it("describe themselves with the table's signs", () => {
    expect(describeBand(band(600, false, 3000, true), "mg/L")).toBe("> 600 and ≤ 3000 mg/L");
    expect(describeBand(band(null, false, 0.1, false), "% by mass")).toBe("< 0.1 % by mass");
  });
});
