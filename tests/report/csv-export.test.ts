import { describe, expect, it } from "vitest";
import { seriesCsv } from "../../lib/report/csv-export";
import { sampleCharts } from "./sample-assessment";

describe("seriesCsv", () => {
  const csv = seriesCsv(sampleCharts);
  const lines = csv.split("\r\n");

  it("has one header and one CRLF line per plotted value", () => {
    expect(lines[0]).toBe("chart,x,x unit,x value,series,unit,value");
    const values = sampleCharts.reduce((n, chart) => n + chart.rows.reduce((m, row) => m + chart.series.filter((s) => row[s.key] !== null && row[s.key] !== undefined).length, 0), 0);
    expect(lines.filter((l) => l !== "").length).toBe(1 + values);
    expect(csv.endsWith("\r\n")).toBe(true);
  });

  it("carries the phase-volume and sweep series with their units", () => {
    expect(lines).toContain("phase-volumes,Assemblage,,28 d at 20 °C,C-S-H,cm³/100 g binder,30");
    expect(lines).toContain("sweep-sulfate,SO4 added,g/100 g binder,3,Gypsum,cm³/100 g binder,4.5");
  });

  it("quotes fields that hold a comma", () => {
    const chart = { ...sampleCharts[0], rows: [{ ...sampleCharts[0].rows[0], label: "28 d, 20 °C" }] };
    expect(seriesCsv([chart])).toContain('"28 d, 20 °C"');
  });
});
