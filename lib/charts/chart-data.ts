/**
 * The data of one chart, independent of the drawing library: what the page draws, what its data table shows
 * and what its CSV download contains all come from this one value, so they cannot disagree.
 */

export type ChartKind = "stacked-bar" | "stacked-area" | "line" | "scatter";

/** One plotted quantity: `key` is the row field, `label` the legend and column heading, `unit` its unit. */
export type ChartSeries = {
  key: string;
  label: string;
  unit: string;
  /** Which y axis the series is read against. */
  axis: "left" | "right";
  /** Drawing colour (`phase-colours.ts`); without one the drawing picks by position. */
  colour?: string;
  /** In the data table and CSV but not drawn (a quantity that would flatten the others; the chart's note says so). */
  tableOnly?: boolean;
};

/** A horizontal line drawn across the chart, such as a temperature limit. */
export type ChartThreshold = { label: string; value: number; unit: string; axis: "left" | "right" };

export type ChartRow = Record<string, number | string | null>;

export type ChartData = {
  id: string;
  title: string;
  kind: ChartKind;
  /** The row field on the x axis, its heading and unit. */
  x: { key: string; label: string; unit: string; scale: "linear" | "log" | "category" };
  yLeft: { label: string; unit: string };
  yRight?: { label: string; unit: string };
  series: ChartSeries[];
  rows: ChartRow[];
  thresholds: ChartThreshold[];
  /** Sentence under the chart: basis of the figures, per what quantity. */
  note?: string;
};

/** Axis caption with its unit in brackets, e.g. "Age (d)"; an empty unit prints the label alone. */
export function axisCaption(label: string, unit: string): string {
  return unit ? `${label} (${unit})` : label;
}

/** Series keys are generated (`s0`, `s1`, …) so that phase names with dots or spaces never reach a data path. */
export function seriesKey(index: number): string {
  return `s${index}`;
}

/** Names in first-seen order over several records (e.g. the phases present at any age). */
export function unionOfKeys(records: readonly Record<string, number>[]): string[] {
  const seen: string[] = [];
  for (const record of records) for (const key of Object.keys(record)) if (!seen.includes(key)) seen.push(key);
  return seen;
}

/** A finite number or null (a gap in a line, an empty cell in the table). */
export function finiteOrNull(value: number | null | undefined): number | null {
  return typeof value === "number" && Number.isFinite(value) ? value : null;
}
