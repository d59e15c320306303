import { finiteOrNull, type ChartData, type ChartThreshold } from "./chart-data";

/** The heat model part of the curing advice (`CuringAdvice["heatModel"]`). */
export type HeatModelSummary = {
  label: string;
  referenceTemperatureC: number;
  curve: readonly { equivalentAgeH: number; cumulativeHeatJPerGBinder: number }[];
  /** Classic per-phase heats of the cement at complete hydration, J/g cement. */
  perPhaseCheckJPerGCement?: { lerchBogue: number; taylor1997: number };
  /** Portland cement mass fraction of the binder, turning the per-phase check into J/g binder. */
  cementFractionOfBinder?: number;
};

/**
 * Cumulative heat of hydration (J/g binder) against equivalent age at the heat model's reference temperature (h, log
 * axis), with the classic per-phase heats of the cement at complete hydration drawn as the check (Lerch & Bogue 1934;
 * Taylor 1997), per g binder: the cement's share only, as SCMs have no classic per-phase heat.
 */
export function heatOfHydrationChart(model: HeatModelSummary): ChartData {
  const rows = model.curve.map((p) => ({ equivalentAgeH: p.equivalentAgeH, heat: finiteOrNull(p.cumulativeHeatJPerGBinder) }));
  const thresholds: ChartThreshold[] = [];
  const check = model.perPhaseCheckJPerGCement;
  const fraction = model.cementFractionOfBinder ?? 1;
  const share = fraction < 1 ? ", cement share" : "";
  // One line: the two classic sets lie within a few per cent of each other, too close to label apart; Taylor's is in the note.
  const perGBinder = (jPerGCement: number) => Math.round(jPerGCement * fraction * 10) / 10;
  if (check) thresholds.push({ label: `Complete hydration, Lerch & Bogue per-phase heats${share}`, value: perGBinder(check.lerchBogue), unit: "J/g", axis: "left" });
  return {
    id: "heat-of-hydration",
    title: "Heat of hydration",
    kind: "line",
    x: { key: "equivalentAgeH", label: `Equivalent age at ${model.referenceTemperatureC} °C`, unit: "h", scale: "log" },
    yLeft: { label: "Heat released", unit: "J/g binder" },
    series: [{ key: "heat", label: "Cumulative heat", unit: "J/g binder", axis: "left" }],
    rows,
    thresholds,
    note:
      `Heat source of the element temperature: ${model.label}. The classic per-phase heats at complete hydration are drawn as the check, not the method` +
      (check ? ` (Taylor 1997: ${perGBinder(check.taylor1997)} J/g binder).` : "."),
  };
}
