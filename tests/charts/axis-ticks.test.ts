import { describe, it, expect } from "vitest";
import { formatTick, xAxisTicks } from "../../lib/charts/axis-ticks";
import type { ChartData } from "../../lib/charts/chart-data";

const chart = (xs: number[], scale: ChartData["x"]["scale"], unit: string): ChartData => ({
  id: "c",
  title: "c",
  kind: "line",
  x: { key: "x", label: "x", unit, scale },
  yLeft: { label: "y", unit: "" },
  series: [],
  rows: xs.map((x) => ({ x })),
  thresholds: [],
});

describe("tick labels", () => {
  it("keep at most four significant digits (the timeline printed 0.45742083098942177)", () => {
    expect(formatTick(0.45742083098942177)).toBe("0.4574");
    expect(formatTick(55.12775401198385)).toBe("55.13");
    expect(formatTick(3650)).toBe("3650");
    expect(formatTick(0)).toBe("0");
    expect(formatTick(2.5e-5)).toBe("2.5e-5");
  });
});

describe("x axis ticks", () => {
  it("sit at the powers of ten within the data on a logarithmic age axis from one hour to ten years", () => {
    expect(xAxisTicks(chart([1 / 24, 1, 28, 3650], "log", "d"))).toEqual([0.1, 1, 10, 100, 1000]);
    expect(xAxisTicks(chart([2, 5], "log", "d"))).toBeUndefined(); // no two decades inside: left to the library
  });

  it("sit at whole days on an axis in hours longer than three days, at most about ten of them", () => {
    expect(xAxisTicks(chart([0, 84, 168], "linear", "h"))).toEqual([0, 24, 48, 72, 96, 120, 144, 168]);
    const month = xAxisTicks(chart([0, 720], "linear", "h"))!;
    expect(month.length).toBeLessThanOrEqual(11);
    expect(month.every((t) => t % 24 === 0)).toBe(true);
  });

  it("are left to the drawing library otherwise", () => {
    expect(xAxisTicks(chart([0, 48], "linear", "h"))).toBeUndefined();
    expect(xAxisTicks(chart([0, 1], "linear", "mol CO2 per 100 g binder"))).toBeUndefined();
    expect(xAxisTicks(chart([], "log", "d"))).toBeUndefined();
  });
});
