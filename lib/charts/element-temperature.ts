import { finiteOrNull, type ChartData, type ChartThreshold } from "./chart-data";

/** The temperature part of the curing advice (`CuringAdvice["temperature"]`). */
export type ElementTemperatureSeries = {
  timesH: readonly number[];
  coreC: readonly number[];
  surfaceC: readonly number[];
  surfaceBC?: readonly number[];
};

/** Limits drawn across the chart, °C (e.g. the delayed-ettringite limit of 70 °C). */
export type TemperatureLimits = { maxTemperatureC?: number; label?: string };

/**
 * Core and surface temperature of the element against time after placement (h), with the maximum-temperature
 * limit drawn as a line. The core–surface difference is a series of its own, read on the same axis.
 */
export function elementTemperatureChart(temperature: ElementTemperatureSeries, limits: TemperatureLimits = {}): ChartData {
  const n = Math.min(temperature.timesH.length, temperature.coreC.length, temperature.surfaceC.length);
  const hasB = temperature.surfaceBC !== undefined && temperature.surfaceBC.length >= n;
  const rows = [];
  for (let i = 0; i < n; i++) {
    const core = temperature.coreC[i];
    const surface = temperature.surfaceC[i];
    rows.push({
      timeH: temperature.timesH[i],
      core: finiteOrNull(core),
      surface: finiteOrNull(surface),
      ...(hasB ? { surfaceB: finiteOrNull(temperature.surfaceBC![i]) } : {}),
      difference: finiteOrNull(core - surface),
    });
  }
  const thresholds: ChartThreshold[] = [];
  if (limits.maxTemperatureC !== undefined)
    thresholds.push({ label: limits.label ?? `Maximum ${limits.maxTemperatureC} °C`, value: limits.maxTemperatureC, unit: "°C", axis: "left" });
  return {
    id: "element-temperature",
    title: "Element temperature",
    kind: "line",
    x: { key: "timeH", label: "Time after placement", unit: "h", scale: "linear" },
    yLeft: { label: "Temperature", unit: "°C" },
    series: [
      { key: "core", label: "Core", unit: "°C", axis: "left" },
      { key: "surface", label: hasB ? "Surface (face A)" : "Surface", unit: "°C", axis: "left" },
      ...(hasB ? [{ key: "surfaceB", label: "Surface (face B)", unit: "°C", axis: "left" as const }] : []),
      { key: "difference", label: "Core − surface", unit: "°C", axis: "left" },
    ],
    rows,
    thresholds,
    note: "One-dimensional heat model of the element; limit lines as stated.",
  };
}
