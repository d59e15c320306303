import type { ChartData } from "./chart-data";

/** Tick label of a number: at most four significant digits, no trailing zeros (`0.4574…` → "0.4574", `3650` → "3650"). */
export function formatTick(value: number): string {
  if (!Number.isFinite(value)) return "";
  if (value === 0) return "0";
  const magnitude = Math.abs(value);
  if (magnitude >= 1e5 || magnitude < 1e-3) return value.toExponential(1);
  return Number(value.toPrecision(4)).toString();
}

/** Hours per day: a time axis in hours longer than three days gets ticks at whole days. */
const HOURS_PER_DAY = 24;
/** Most ticks on an axis before whole-day ticks are spaced out to every n days. */
const MAXIMUM_TICKS = 10;

/**
 * Ticks for the x axis where the drawing library's own would read badly, or undefined to leave them to it: the powers of
 * ten within the data on a logarithmic axis (ages from hours to years), whole days from 0 on an axis in hours that spans
 * more than three days (the axis then ends at the last whole day).
 */
export function xAxisTicks(chart: ChartData): number[] | undefined {
  const xs = chart.rows.map((row) => row[chart.x.key]).filter((x): x is number => typeof x === "number" && Number.isFinite(x));
  if (xs.length === 0) return undefined;
  const low = Math.min(...xs);
  const high = Math.max(...xs);
  if (chart.x.scale === "log") {
    if (!(low > 0)) return undefined;
    // Within the data: the axis spans the data, not the decades around it.
    const ticks: number[] = [];
    for (let exponent = Math.ceil(Math.log10(low)); exponent <= Math.floor(Math.log10(high)); exponent++) ticks.push(Number((10 ** exponent).toPrecision(1)));
    return ticks.length >= 2 ? ticks : undefined;
  }
  if (chart.x.unit === "h" && high - Math.min(0, low) > 3 * HOURS_PER_DAY) {
    const days = Math.ceil(high / HOURS_PER_DAY);
    const everyDays = Math.max(1, Math.ceil(days / MAXIMUM_TICKS));
    const ticks: number[] = [];
    for (let d = 0; d <= days; d += everyDays) ticks.push(d * HOURS_PER_DAY);
    return ticks;
  }
  return undefined;
}
