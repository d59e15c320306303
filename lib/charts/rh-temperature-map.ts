import { type ChartData } from "./chart-data";

/** One cell of the relative-humidity–temperature map: which state (hydrate, hydration state) is stable there. */
export type RhTemperatureCell = { temperatureC: number; relativeHumidityPercent: number; state: string };

/**
 * The relative-humidity–temperature map as a scatter: x temperature (°C), y relative humidity (%), one series
 * (colour and marker) per stable state, so each point reads "at T and RH, this state is stable". Each row holds
 * the RH of its point under the series of its state and null under the others.
 */
export function rhTemperatureMapChart(cells: readonly RhTemperatureCell[], family?: string): ChartData {
  const states: string[] = [];
  for (const cell of cells) if (!states.includes(cell.state)) states.push(cell.state);
  const keyOf = (state: string) => `s${states.indexOf(state)}`;
  const rows = cells.map((cell) => {
    const row: Record<string, number | string | null> = { temperatureC: cell.temperatureC };
    for (const state of states) row[keyOf(state)] = state === cell.state ? cell.relativeHumidityPercent : null;
    return row;
  });
  return {
    id: family ? `rh-temperature-map-${family.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "")}` : "rh-temperature-map",
    title: family ? `Stable states against relative humidity and temperature: ${family}` : "Stable states against relative humidity and temperature",
    kind: "scatter",
    x: { key: "temperatureC", label: "Temperature", unit: "°C", scale: "linear" },
    yLeft: { label: "Relative humidity", unit: "%" },
    series: states.map((state) => ({ key: keyOf(state), label: state, unit: "%", axis: "left" })),
    rows,
    thresholds: [],
    note: "Each point is one equilibrium calculation at fixed water vapour pressure; the marker shows the stable state.",
  };
}
