import type { ChartData } from "../charts/chart-data";
import { csvField } from "../charts/csv";
import { phaseLabel } from "../charts/phase-labels";

/**
 * The key series of a saved assessment as one CSV file in long form (RFC 4180, CRLF): one line per
 * plotted value — chart, x quantity with unit, x value, series, unit, value — so that every chart's series
 * fit in one table that spreadsheets filter easily. Phase series carry their readable names (`phaseLabel`), as in
 * the CSV of the results page.
 */
export function seriesCsv(charts: readonly ChartData[]): string {
  const lines = [["chart", "x", "x unit", "x value", "series", "unit", "value"].join(",")];
  for (const chart of charts) {
    for (const row of chart.rows) {
      for (const series of chart.series) {
        const value = row[series.key];
        if (value === null || value === undefined) continue;
        lines.push([chart.id, chart.x.label, chart.x.unit, String(row[chart.x.key] ?? ""), phaseLabel(series.label), series.unit, String(value)].map(csvField).join(","));
      }
    }
  }
  return lines.join("\r\n") + "\r\n";
}
