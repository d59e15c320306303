import { axisCaption, type ChartData } from "./chart-data";

/**
 * CSV text of a chart's data (RFC 4180: comma separated, CRLF line ends, fields with comma, quote or line
 * break quoted and inner quotes doubled). The header gives each column with its unit; empty cells are gaps.
 */
export function chartCsv(chart: ChartData): string {
  const header = [axisCaption(chart.x.label, chart.x.unit), ...chart.series.map((s) => axisCaption(s.label, s.unit))];
  const lines = [header.map(csvField).join(",")];
  for (const row of chart.rows) {
    const cells = [row[chart.x.key], ...chart.series.map((s) => row[s.key])];
    lines.push(cells.map((cell) => csvField(cell === null || cell === undefined ? "" : String(cell))).join(","));
  }
  return lines.join("\r\n") + "\r\n";
}

/** One CSV field, quoted only when it must be. */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A file name for the chart's CSV download: the chart id, kebab-case, `.csv`. */
export function chartCsvFileName(chart: ChartData, prefix = "hydrastate"): string {
  const slug = `${prefix}-${chart.id}`.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "");
  return `${slug}.csv`;
}
