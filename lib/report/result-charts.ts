import type { ChartData } from "../charts/chart-data";
import { elementTemperatureChart } from "../charts/element-temperature";
import { hydrationTimelineChart } from "../charts/hydration-timeline";
import { phaseVolumesChart } from "../charts/phase-volumes";
import { scenarioSweepChart, type ScenarioSweep, type SweepPoint } from "../charts/scenario-sweep";
import { strengthMaturityChart, type MaturityPoint, type StrengthPoint } from "../charts/strength-maturity";
import { valueAt } from "./key-figures";

/**
 * The charts of a saved result, built with the same chart-data functions the web page uses (`lib/charts`),
 * so the report's figures and tables are the page's series. Saved results are JSON of any engine version:
 * each part is read defensively and a chart is left out when its data are absent or malformed.
 */

const isRecord = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === "object" && !Array.isArray(v);
const isNumberRecord = (v: unknown): v is Record<string, number> => isRecord(v) && Object.values(v).every((x) => typeof x === "number");
const numbers = (v: unknown): v is number[] => Array.isArray(v) && v.every((x) => typeof x === "number");

function phaseVolumeChart(result: unknown): ChartData | null {
  const assemblage = valueAt(result, ["assemblage"]);
  const volumes = valueAt(assemblage, ["volumes"]) ?? valueAt(result, ["volumes"]);
  if (!isNumberRecord(volumes)) return null;
  const { "pore-solution": poreSolution, ...solids } = volumes;
  const shrinkage = valueAt(assemblage, ["porosity", "chemicalShrinkageCm3"]);
  const temperature = valueAt(assemblage, ["temperatureC"]);
  return phaseVolumesChart([
    {
      label: typeof temperature === "number" ? `at ${temperature} °C` : "assemblage",
      phaseVolumesCm3: solids,
      poreSolutionCm3: typeof poreSolution === "number" ? poreSolution : null,
      emptyPorosityCm3: typeof shrinkage === "number" ? shrinkage : null,
    },
  ]);
}

function sweepPoints(points: unknown): SweepPoint[] | null {
  if (!Array.isArray(points)) return null;
  const out: SweepPoint[] = [];
  for (const p of points) {
    if (!isRecord(p) || typeof p.dose !== "number" || !isNumberRecord(p.phaseVolumesCm3)) return null;
    out.push({ dose: p.dose, phaseVolumesCm3: p.phaseVolumesCm3, pH: typeof p.pH === "number" ? p.pH : null });
  }
  return out;
}

function scenarioCharts(result: unknown): ChartData[] {
  const scenarios = valueAt(result, ["scenarios"]);
  const list = Array.isArray(scenarios) ? scenarios : isRecord(scenarios) ? Object.values(scenarios) : [];
  const charts: ChartData[] = [];
  for (const scenario of list) {
    const sweepSource = isRecord(scenario) && isRecord(scenario.sweep) ? scenario.sweep : scenario;
    if (!isRecord(sweepSource)) continue;
    const points = sweepPoints(sweepSource.points);
    if (!points || points.length === 0) continue;
    const sweep: ScenarioSweep = {
      id: String(sweepSource.id ?? (scenario as Record<string, unknown>).id ?? `scenario-${charts.length + 1}`),
      title: String(sweepSource.title ?? (scenario as Record<string, unknown>).title ?? "Scenario"),
      doseLabel: String(sweepSource.doseLabel ?? "Dose"),
      doseUnit: String(sweepSource.doseUnit ?? ""),
      points,
    };
    charts.push(scenarioSweepChart(sweep));
  }
  return charts;
}

function timelineChart(result: unknown): ChartData | null {
  const timeline = valueAt(result, ["assemblage", "timeline"]) ?? valueAt(result, ["timeline"]);
  if (!Array.isArray(timeline) || timeline.length === 0) return null;
  const points = [];
  for (const entry of timeline) {
    if (!isRecord(entry) || typeof entry.ageDays !== "number" || !Array.isArray(entry.phases)) return null;
    const phaseVolumesCm3: Record<string, number> = {};
    for (const phase of entry.phases) if (isRecord(phase) && typeof phase.id === "string" && typeof phase.volumeCm3 === "number") phaseVolumesCm3[phase.id] = phase.volumeCm3;
    points.push({ ageDays: entry.ageDays, phaseVolumesCm3 });
  }
  return hydrationTimelineChart(points);
}

function curingCharts(result: unknown): ChartData[] {
  const curing = valueAt(result, ["curing"]);
  const advice = isRecord(curing) && isRecord(curing.advice) ? curing.advice : curing;
  if (!isRecord(advice)) return [];
  const charts: ChartData[] = [];
  const temperature = advice.temperature;
  if (isRecord(temperature) && numbers(temperature.timesH) && numbers(temperature.coreC) && numbers(temperature.surfaceC)) {
    charts.push(elementTemperatureChart({ timesH: temperature.timesH, coreC: temperature.coreC, surfaceC: temperature.surfaceC, surfaceBC: numbers(temperature.surfaceBC) ? temperature.surfaceBC : undefined }));
  }
  if (Array.isArray(advice.strength) && Array.isArray(advice.maturity)) {
    const targets = Array.isArray(advice.strengthTargets) ? (advice.strengthTargets as { label: string; strengthMPa: number }[]).filter((t) => isRecord(t) && typeof t.strengthMPa === "number") : [];
    charts.push(strengthMaturityChart(advice.strength as StrengthPoint[], advice.maturity as MaturityPoint[], targets));
  }
  return charts;
}

/** Every chart the saved result has data for, in page order. */
export function resultCharts(result: unknown): ChartData[] {
  const charts: ChartData[] = [];
  const volumes = phaseVolumeChart(result);
  if (volumes) charts.push(volumes);
  charts.push(...scenarioCharts(result));
  const timeline = timelineChart(result);
  if (timeline) charts.push(timeline);
  charts.push(...curingCharts(result));
  return charts;
}
