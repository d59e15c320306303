import { describe, it, expect } from "vitest";
import { chartCsv, chartCsvFileName, csvField } from "../../lib/charts/csv";
import type { ChartData } from "../../lib/charts/chart-data";

const chart: ChartData = {
  id: "Element temperature",
  title: "t",
  kind: "line",
  x: { key: "timeH", label: "Time", unit: "h", scale: "linear" },
  yLeft: { label: "Temperature", unit: "°C" },
  series: [
    { key: "a", label: "Core, centre", unit: "°C", axis: "left" },
    { key: "b", label: 'Surface "A"', unit: "°C", axis: "left" },
  ],
  rows: [
    { timeH: 0, a: 20, b: 20 },
    { timeH: 1.5, a: 21.25, b: null },
  ],
  thresholds: [],
};

describe("chart CSV", () => {
  it("writes a header with units, one line per row, CRLF line ends and empty cells for gaps (RFC 4180)", () => {
    const text = chartCsv(chart);
    expect(text).toBe('Time (h),"Core, centre (°C)","Surface ""A"" (°C)"\r\n0,20,20\r\n1.5,21.25,\r\n');
  });

  it("quotes fields only when they hold a comma, a quote or a line break (RFC 4180 section 2)", () => {
    expect(csvField("plain")).toBe("plain");
    expect(csvField("a,b")).toBe('"a,b"');
    expect(csvField('say "x"')).toBe('"say ""x"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
  });

  it("reads back to the same numbers when parsed as comma-separated values", () => {
    const lines = chartCsv(chart).trim().split("\r\n");
    expect(lines).toHaveLength(chart.rows.length + 1);
    const second = lines[2].split(",");
    expect(Number(second[0])).toBe(1.5);
    expect(Number(second[1])).toBe(21.25);
  });

  it("gives a kebab-case file name ending in .csv", () => {
    expect(chartCsvFileName(chart)).toBe("hydrastate-element-temperature.csv");
  });
});
