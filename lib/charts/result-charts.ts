import type { ChartData } from "./chart-data";
import { carbonationDepthChart, type DepthPoint } from "./carbonation-depth";
import { chlorideIsothermChart, type IsothermPoint } from "./chloride-isotherm";
import { elementTemperatureChart } from "./element-temperature";
import { heatOfHydrationChart } from "./heat-of-hydration";
import { hydrationTimelineChart, type TimelinePointVolumes } from "./hydration-timeline";
import { phaseVolumesChart, type AssemblageVolumes } from "./phase-volumes";
import { rhTemperatureMapChart, type RhTemperatureCell } from "./rh-temperature-map";
import { scenarioSweepChart, type ScenarioSweep, type SweepPoint } from "./scenario-sweep";
import { strengthMaturityChart, type MaturityPoint, type StrengthPoint } from "./strength-maturity";

/**
 * The charts of an assessment result, for the results page and the reports (one mapping, so the page, its
 * data tables, the CSV downloads and the PDF show the same numbers). Results are read defensively: a saved
 * result may come from an older engine, and a part that is absent gives no chart rather than a guess.
 *
 * Where the parts are read (an object at each path, first match wins):
 * - assemblage: `assemblage.paste` (`volumes` with `pore-solution`, `porosity.chemicalShrinkageCm3` as the
 *   empty porosity; per 100 g binder), or a flat `assemblage` with `phases: [{ id, volumeCm3 }]` or `phaseVolumesCm3`;
 * - scenarios: `scenarios` — an array, or an object of scenarios, each a sweep `{ id, title, doseLabel, doseUnit,
 *   points: [{ dose, pH, phases | phaseVolumesCm3 }] }` or `{ sweep: <that>, summary }`;
 * - carbonation depth: `scenarios.carbonation.depth.depthCurve` — `[{ timeYears, depthMm }]`, with the cover from
 *   `inputs.exposure.coverMm` or `inputs.project.element.coverMm`;
 * - chloride binding isotherm: `scenarios.chloride.isotherm` — `[{ freeChlorideMolPerKgWater, boundChlorideMgPerGBinder,
 *   totalChlorideMassPercent }]`, with `scenarios.chloride.summary.exposure.freeChlorideMolPerKgWater`;
 * - hydration timeline: `assemblage.timeline`, `timeline` or `hydrationTimeline` — `[{ ageDays, phases | phaseVolumesCm3, poreSolutionVolumeCm3 }]`;
 * - heat of hydration: `curing.heatModel` — `curve: [{ equivalentAgeH, cumulativeHeatJPerGBinder }]`, `label`,
 *   `referenceTemperatureC`, `perPhaseCheckJPerGCement`, `cementFractionOfBinder` (results saved before it was
 *   reported have no curve and no chart);
 * - element temperature, strength, maturity: `curing` — the curing advice (`temperature`, `strength`,
 *   `maturity`, `strengthTargets`); the DEF limit from `curing.limits.maxTemperatureC` or 70 °C (Taylor, Famy &
 *   Scrivener 2001, Cem. Concr. Res. 31, 683);
 * - RH–temperature map: `scenarios.drying.rhTemperatureMaps` — `[{ family, cells }]`, one chart per family; or
 *   `rhTemperatureMap` / `humidityTemperatureMap` — `[{ temperatureC, relativeHumidityPercent, state }]`.
 */
type Loose = Record<string, unknown>;

const isObject = (v: unknown): v is Loose => v !== null && typeof v === "object" && !Array.isArray(v);
const isNumber = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);
const numberArray = (v: unknown): number[] | undefined => (Array.isArray(v) && v.every((x) => typeof x === "number") ? (v as number[]) : undefined);

/** DEF threshold drawn when the result states none (Taylor, Famy & Scrivener 2001: about 70 °C). */
const DEF_LIMIT_C = 70;

/** Phase volumes (cm³) from `phaseVolumesCm3: {}` or `phases: [{ id, volumeCm3 }]`. */
export function phaseVolumesOf(part: unknown): Record<string, number> {
  if (!isObject(part)) return {};
  if (isObject(part.phaseVolumesCm3)) {
    const out: Record<string, number> = {};
    for (const [id, v] of Object.entries(part.phaseVolumesCm3)) if (isNumber(v)) out[id] = v;
    return out;
  }
  const out: Record<string, number> = {};
  if (Array.isArray(part.phases))
    for (const phase of part.phases) if (isObject(phase) && typeof phase.id === "string" && isNumber(phase.volumeCm3)) out[phase.id] = (out[phase.id] ?? 0) + phase.volumeCm3;
  return out;
}

function first(result: Loose, keys: string[]): unknown {
  for (const key of keys) if (result[key] !== undefined && result[key] !== null) return result[key];
  return undefined;
}

const PORE_SOLUTION_ID = "pore-solution";

/**
 * The base assemblage: `assemblage.paste` of the assess service (`volumes` with `pore-solution`, empty
 * porosity = `porosity.chemicalShrinkageCm3`), or a flat `assemblage` with `phases`/`phaseVolumesCm3`.
 */
function assemblageOf(result: Loose): AssemblageVolumes | undefined {
  const a = result.assemblage;
  if (!isObject(a)) return undefined;
  const paste = isObject(a.paste) ? a.paste : a;
  const volumes = isObject(paste.volumes) ? phaseVolumesOf({ phaseVolumesCm3: paste.volumes }) : phaseVolumesOf(paste);
  const poreSolution = volumes[PORE_SOLUTION_ID];
  delete volumes[PORE_SOLUTION_ID];
  if (Object.keys(volumes).length === 0) return undefined;
  const porosity = isObject(paste.porosity) ? paste.porosity : {};
  const inputs = isObject(result.inputs) ? result.inputs : {};
  const age = isObject(inputs.age) && inputs.age.mode === "age" && isNumber(inputs.age.ageDays) ? `${inputs.age.ageDays} d` : null;
  const temperatureC = isNumber(a.temperatureC) ? a.temperatureC : isNumber(paste.temperatureC) ? paste.temperatureC : null;
  const label = typeof a.label === "string" ? a.label : [age, temperatureC !== null ? `${temperatureC} °C` : null].filter(Boolean).join(" at ") || "Assemblage";
  return {
    label,
    phaseVolumesCm3: volumes,
    poreSolutionCm3: isNumber(poreSolution) ? poreSolution : isNumber(porosity.poreSolutionVolumeCm3) ? porosity.poreSolutionVolumeCm3 : isNumber(paste.poreSolutionCm3) ? paste.poreSolutionCm3 : null,
    emptyPorosityCm3: isNumber(porosity.chemicalShrinkageCm3) ? porosity.chemicalShrinkageCm3 : isNumber(paste.emptyPorosityCm3) ? paste.emptyPorosityCm3 : null,
  };
}

function sweepsOf(result: Loose): ScenarioSweep[] {
  const raw = result.scenarios;
  const list = Array.isArray(raw) ? raw : isObject(raw) ? Object.entries(raw).map(([id, v]) => (isObject(v) ? { id, ...v } : v)) : [];
  const sweeps: ScenarioSweep[] = [];
  for (const entry of list) {
    // A scenario of the assess service carries its sweep under `sweep`, beside its summary.
    const s = isObject(entry) && isObject(entry.sweep) ? { id: entry.id, ...entry.sweep } : entry;
    if (!isObject(s) || !Array.isArray(s.points)) continue;
    const points: SweepPoint[] = s.points
      .filter((p): p is Loose => isObject(p) && isNumber(p.dose))
      .map((p) => ({ dose: p.dose as number, phaseVolumesCm3: phaseVolumesOf(p), pH: isNumber(p.pH) ? p.pH : null }));
    if (points.length === 0) continue;
    const id = typeof s.id === "string" ? s.id : `scenario-${sweeps.length + 1}`;
    sweeps.push({
      id,
      title: typeof s.title === "string" ? s.title : id,
      doseLabel: typeof s.doseLabel === "string" ? s.doseLabel : "Dose",
      doseUnit: typeof s.doseUnit === "string" ? s.doseUnit : "",
      points,
    });
  }
  return sweeps;
}

function timelineOf(result: Loose): TimelinePointVolumes[] {
  const raw = first(result, ["timeline", "hydrationTimeline"]) ?? (isObject(result.assemblage) ? result.assemblage.timeline : undefined);
  const points = isObject(raw) && Array.isArray(raw.points) ? raw.points : raw;
  if (!Array.isArray(points)) return [];
  return points
    .filter((p): p is Loose => isObject(p) && isNumber(p.ageDays))
    .map((p) => ({
      ageDays: p.ageDays as number,
      phaseVolumesCm3: { ...phaseVolumesOf(p), ...(isNumber(p.poreSolutionVolumeCm3) ? { "pore solution": p.poreSolutionVolumeCm3 } : {}) },
    }));
}

const isCell = (c: unknown): c is RhTemperatureCell =>
  isObject(c) && isNumber(c.temperatureC) && isNumber(c.relativeHumidityPercent) && typeof c.state === "string";

/** The maps of the drying scenario: `scenarios.drying.rhTemperatureMaps: [{ family, cells }]`, one chart per family. */
function familyMapsOf(result: Loose): { family: string; cells: RhTemperatureCell[] }[] {
  const drying = isObject(result.scenarios) && isObject(result.scenarios.drying) ? result.scenarios.drying : undefined;
  if (!drying || !Array.isArray(drying.rhTemperatureMaps)) return [];
  return drying.rhTemperatureMaps
    .filter((m): m is Loose => isObject(m) && typeof m.family === "string" && Array.isArray(m.cells))
    .map((m) => ({ family: m.family as string, cells: (m.cells as unknown[]).filter(isCell) }))
    .filter((m) => m.cells.length > 0);
}

function rhMapOf(result: Loose): RhTemperatureCell[] {
  const raw = first(result, ["rhTemperatureMap", "humidityTemperatureMap"]);
  const cells = isObject(raw) && Array.isArray(raw.cells) ? raw.cells : raw;
  if (!Array.isArray(cells)) return [];
  return cells
    .filter((c): c is Loose => isObject(c) && isNumber(c.temperatureC) && isNumber(c.relativeHumidityPercent) && typeof c.state === "string")
    .map((c) => ({ temperatureC: c.temperatureC as number, relativeHumidityPercent: c.relativeHumidityPercent as number, state: c.state as string }));
}

/** The carbonation depth curve (`scenarios.carbonation.depth.depthCurve`) and the cover of the input (exposure, else element). */
function carbonationDepthOf(result: Loose): { curve: DepthPoint[]; coverMm?: number } | undefined {
  const carbonation = isObject(result.scenarios) && isObject(result.scenarios.carbonation) ? result.scenarios.carbonation : undefined;
  const depth = carbonation && isObject(carbonation.depth) ? carbonation.depth : undefined;
  if (!depth || !Array.isArray(depth.depthCurve)) return undefined;
  const curve = depth.depthCurve.filter((p): p is DepthPoint => isObject(p) && isNumber(p.timeYears) && isNumber(p.depthMm));
  if (curve.length === 0) return undefined;
  const inputs = isObject(result.inputs) ? result.inputs : {};
  const exposureCover = isObject(inputs.exposure) ? inputs.exposure.coverMm : undefined;
  const project = isObject(inputs.project) && isObject(inputs.project.element) ? inputs.project.element.coverMm : undefined;
  const coverMm = isNumber(exposureCover) ? exposureCover : isNumber(project) ? project : undefined;
  return { curve, ...(coverMm !== undefined ? { coverMm } : {}) };
}

/** The chloride scenario's isotherm (`scenarios.chloride.isotherm`) and its exposure point (`summary.exposure`). */
function isothermOf(result: Loose): { points: IsothermPoint[]; exposureFreeChlorideMolPerKgWater?: number } | undefined {
  const chloride = isObject(result.scenarios) && isObject(result.scenarios.chloride) ? result.scenarios.chloride : undefined;
  if (!chloride || !Array.isArray(chloride.isotherm)) return undefined;
  const points = chloride.isotherm.filter(
    (p): p is IsothermPoint => isObject(p) && isNumber(p.freeChlorideMolPerKgWater) && isNumber(p.boundChlorideMgPerGBinder) && isNumber(p.totalChlorideMassPercent),
  );
  if (points.length < 2) return undefined;
  const exposure = isObject(chloride.summary) && isObject(chloride.summary.exposure) ? chloride.summary.exposure.freeChlorideMolPerKgWater : undefined;
  return { points, ...(isNumber(exposure) ? { exposureFreeChlorideMolPerKgWater: exposure } : {}) };
}

function curingCharts(result: Loose): ChartData[] {
  const curing = result.curing;
  if (!isObject(curing)) return [];
  const charts: ChartData[] = [];
  const model = curing.heatModel;
  if (isObject(model) && Array.isArray(model.curve)) {
    const curve = model.curve.filter((p): p is { equivalentAgeH: number; cumulativeHeatJPerGBinder: number } => isObject(p) && isNumber(p.equivalentAgeH) && p.equivalentAgeH > 0 && isNumber(p.cumulativeHeatJPerGBinder));
    const check = isObject(model.perPhaseCheckJPerGCement) && isNumber(model.perPhaseCheckJPerGCement.lerchBogue) && isNumber(model.perPhaseCheckJPerGCement.taylor1997)
      ? { lerchBogue: model.perPhaseCheckJPerGCement.lerchBogue, taylor1997: model.perPhaseCheckJPerGCement.taylor1997 }
      : undefined;
    if (curve.length > 1)
      charts.push(
        heatOfHydrationChart({
          label: typeof model.label === "string" ? model.label : "heat model",
          referenceTemperatureC: isNumber(model.referenceTemperatureC) ? model.referenceTemperatureC : 20,
          curve,
          ...(check ? { perPhaseCheckJPerGCement: check } : {}),
          ...(isNumber(model.cementFractionOfBinder) ? { cementFractionOfBinder: model.cementFractionOfBinder } : {}),
        }),
      );
  }
  const t = curing.temperature;
  if (isObject(t)) {
    const timesH = numberArray(t.timesH);
    const coreC = numberArray(t.coreC);
    const surfaceC = numberArray(t.surfaceC);
    if (timesH && coreC && surfaceC && timesH.length > 0) {
      const limits = isObject(curing.limits) ? curing.limits : {};
      const maxC = isNumber(limits.maxTemperatureC) ? limits.maxTemperatureC : DEF_LIMIT_C;
      charts.push(
        elementTemperatureChart(
          { timesH, coreC, surfaceC, ...(numberArray(t.surfaceBC) ? { surfaceBC: numberArray(t.surfaceBC) } : {}) },
          { maxTemperatureC: maxC, label: `Delayed-ettringite limit ${maxC} °C` },
        ),
      );
    }
  }
  const strength = Array.isArray(curing.strength) ? (curing.strength.filter((s) => isObject(s) && isNumber(s.timeH)) as StrengthPoint[]) : [];
  const maturity = Array.isArray(curing.maturity) ? (curing.maturity.filter((m) => isObject(m) && isNumber(m.timeH)) as MaturityPoint[]) : [];
  const targets = Array.isArray(curing.strengthTargets)
    ? (curing.strengthTargets.filter((x) => isObject(x) && typeof x.label === "string" && isNumber(x.strengthMPa)) as { label: string; strengthMPa: number }[])
    : [];
  if (strength.length > 0 || maturity.length > 0) charts.push(strengthMaturityChart(strength, maturity, targets));
  return charts;
}

/** Every chart the result supports, in reading order. */
export function resultCharts(result: unknown): ChartData[] {
  if (!isObject(result)) return [];
  const charts: ChartData[] = [];
  const assemblage = assemblageOf(result);
  if (assemblage) charts.push(phaseVolumesChart([assemblage]));
  for (const sweep of sweepsOf(result)) charts.push(scenarioSweepChart(sweep));
  const depth = carbonationDepthOf(result);
  if (depth) charts.push(carbonationDepthChart(depth.curve, depth.coverMm));
  const isotherm = isothermOf(result);
  if (isotherm) charts.push(chlorideIsothermChart(isotherm.points, isotherm.exposureFreeChlorideMolPerKgWater));
  const timeline = timelineOf(result);
  if (timeline.length > 1) charts.push(hydrationTimelineChart(timeline));
  charts.push(...curingCharts(result));
  const cells = rhMapOf(result);
  if (cells.length > 0) charts.push(rhTemperatureMapChart(cells));
  for (const map of familyMapsOf(result)) charts.push(rhTemperatureMapChart(map.cells, map.family));
  return charts;
}
