import type { ChartData } from "../charts/chart-data";
import { computationNotesOf } from "./computation-notes";
import { axisCaption } from "../charts/chart-data";
import { phaseLabel, withPhaseLabels } from "../charts/phase-labels";
import type { Flag } from "../advisory/flag";
import { sortFlags } from "../advisory/flag";
import type { DatasetFileInfo } from "../data/dataset";
import type { SavedAssessment, Versions } from "../store/assessment-store";
import { flattenPaths } from "../store/flatten";
import { cautionsOf, flagsOf, keyFigures, valueAt, type KeyFigure } from "./key-figures";
import { readableInputValue } from "./input-value-label";
import type { ValidationDossier } from "../validation/dossier";

/**
 * The content of a report on a saved assessment, independent of the output format: the Markdown and PDF
 * renderers print the same model, so they cannot disagree. Tables are rows of text cells. Phases are named
 * by `phaseLabel` (lib/charts/phase-labels.ts) wherever the report prints one: chart series, assumptions, inputs.
 */
export type ReportTable = { title: string; columns: string[]; rows: string[][]; note?: string };

export type ReportModel = {
  title: string;
  subtitle: string;
  savedAt: string;
  versions: Versions;
  running: Versions;
  currencyStatement: string;
  project: { label: string; value: string }[];
  inputs: ReportTable;
  assumptions: string[];
  provenance: { datasetVersion: string; files: { title: string; family: string; sources: string[]; date: string }[] };
  keyFigures: KeyFigure[];
  /** What the engine could not compute, and where a model is extrapolated (`computationNotesOf`). */
  computationNotes: string[];
  charts: ChartData[];
  tables: ReportTable[];
  flags: Flag[];
  cautions: string[];
  validation: ReportTable | null;
  validationNote: string;
};

export type ReportSource = {
  saved: SavedAssessment;
  /** The running versions, to state whether the record would compute the same today. */
  running: Versions;
  /** The data files of the running data set (title, family, provenance). */
  datasetFiles: readonly DatasetFileInfo[];
  /** Charts of the result (the series the web page draws). */
  charts: readonly ChartData[];
  /** Further tables of the result (pore solution, exposure classes). */
  tables?: readonly ReportTable[];
  dossier?: ValidationDossier | null;
};

/** Fallback cautions when a saved result carries none (it always should). */
const FALLBACK_CAUTION =
  "Hydrastate is a thermodynamic guide, not a design tool: decisions rest with the applicable codes and standards, testing by a qualified laboratory and a responsible, licensed engineer.";

/** A number or value as printed in a table: numbers to 4 significant figures, text as is. */
export function formatCell(value: unknown): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isInteger(value) ? String(value) : Number(value.toPrecision(4)).toString();
  if (typeof value === "string") return value;
  if (typeof value === "boolean") return value ? "yes" : "no";
  const json = JSON.stringify(value);
  return json === "[]" || json === "{}" ? "(none)" : json;
}

export { robustnessSentence } from "./robustness-sentence";

/** The rows of a chart as a table (x column, then every series with its unit). */
export function chartTable(chart: ChartData): ReportTable {
  return {
    title: chart.title,
    columns: [axisCaption(chart.x.label, chart.x.unit), ...chart.series.map((s) => axisCaption(s.label, s.unit))],
    rows: chart.rows.map((row) => [formatCell(row[chart.x.key]), ...chart.series.map((s) => formatCell(row[s.key]))]),
    note: chart.note,
  };
}

const phaseNameOf = (id: unknown) => (typeof id === "string" ? phaseLabel(id) : formatCell(id));

function assumptionsOf(saved: SavedAssessment): string[] {
  const fromResult = valueAt(saved.result, ["assumptions"]);
  const listed = Array.isArray(fromResult) ? fromResult.filter((a): a is string => typeof a === "string") : [];
  const inputs = saved.inputs;
  const derived: string[] = [];
  const suppressed = valueAt(inputs, ["options", "suppressedPhases"]);
  if (Array.isArray(suppressed) && suppressed.length > 0) derived.push(`Phases suppressed on top of the default kinetic constraints: ${suppressed.map(phaseNameOf).join(", ")}.`);
  const allowed = valueAt(inputs, ["options", "allowedPhases"]);
  if (Array.isArray(allowed) && allowed.length > 0) derived.push(`Default kinetic constraints lifted for: ${allowed.map(phaseNameOf).join(", ")}.`);
  const samples = valueAt(inputs, ["options", "monteCarlo", "samples"]);
  if (typeof samples === "number") derived.push(`Uncertainty of the data propagated by Monte Carlo sampling with ${samples} samples.`);
  derived.push("Equilibrium of the hydrated binder at the stated age and temperature; transport, cracking and reaction rates are outside the equilibrium calculation.");
  return [...listed, ...derived];
}

function validationTable(dossier: ValidationDossier | null | undefined): { table: ReportTable | null; note: string } {
  if (!dossier) return { table: null, note: "The validation dossier has not been generated yet — run npm test." };
  return {
    table: {
      title: "Validation dossier: published-value checks of the test suite",
      columns: ["Quantity", "Conditions", "Source", "Reference", "Computed", "Tolerance", "Result"],
      rows: dossier.checks.map((c) => [
        c.quantity,
        c.conditions,
        c.source,
        `${formatCell(c.reference)} ${c.unit}`.trim(),
        `${formatCell(c.computed)} ${c.unit}`.trim(),
        c.relative ? `${formatCell(c.tolerance * 100)} %` : `± ${formatCell(c.tolerance)} ${c.unit}`.trim(),
        c.passed ? "pass" : "FAIL",
      ]),
    },
    note: `Generated ${dossier.generatedAt} from ${dossier.checks.length} checks (data set ${dossier.versions.dataset}, engine ${dossier.versions.engine}).`,
  };
}

export function buildReportModel(source: ReportSource): ReportModel {
  const { saved, running } = source;
  const project = valueAt(saved.inputs, ["project"]) as Record<string, unknown> | undefined;
  const projectRows: { label: string; value: string }[] = [];
  if (project && typeof project === "object") {
    if (typeof project.name === "string") projectRows.push({ label: "Project", value: project.name });
    if (typeof project.reference === "string") projectRows.push({ label: "Reference", value: project.reference });
    const element = project.element as Record<string, unknown> | undefined;
    if (element && typeof element === "object") {
      if (typeof element.type === "string") projectRows.push({ label: "Element", value: element.type });
      if (typeof element.thicknessM === "number") projectRows.push({ label: "Thickness", value: `${formatCell(element.thicknessM)} m` });
      if (typeof element.coverMm === "number") projectRows.push({ label: "Cover", value: `${formatCell(element.coverMm)} mm` });
    }
  }
  const inputRows = [...flattenPaths(saved.inputs).entries()].filter(([path]) => !path.startsWith("project.")).map(([path, value]) => [path, formatCell(readableInputValue(path, value))]);
  const stale: string[] = [];
  if (saved.versions.dataset !== running.dataset) stale.push(`the data set has changed (saved ${saved.versions.dataset}, now ${running.dataset})`);
  if (saved.versions.engine !== running.engine) stale.push(`the engine has changed (saved ${saved.versions.engine}, now ${running.engine})`);
  const currencyStatement =
    stale.length === 0
      ? `Computed with data set ${saved.versions.dataset} and engine ${saved.versions.engine}, the versions running today: it would compute the same today.`
      : `This result may not compute the same today: ${stale.join("; ")}. Recompute before relying on it.`;
  const cautions = cautionsOf(saved.result);
  const validation = validationTable(source.dossier);
  return {
    title: saved.name,
    subtitle: projectRows.find((r) => r.label === "Project")?.value ?? "Hydrastate assessment",
    savedAt: saved.updatedAt,
    versions: saved.versions,
    running,
    currencyStatement,
    project: projectRows,
    inputs: { title: "Inputs", columns: ["Field", "Value"], rows: inputRows },
    assumptions: assumptionsOf(saved),
    provenance: {
      datasetVersion: running.dataset,
      files: source.datasetFiles.map((f) => ({ title: f.title, family: f.family, sources: f.provenance.sources, date: f.provenance.date })),
    },
    keyFigures: keyFigures(saved.result),
    computationNotes: computationNotesOf(saved.result),
    // Phase series under their readable names, as on the results page (one label function for both).
    charts: source.charts.map(withPhaseLabels),
    tables: [...(source.tables ?? [])],
    flags: sortFlags(flagsOf(saved.result)),
    cautions: cautions.length > 0 ? cautions : [FALLBACK_CAUTION],
    validation: validation.table,
    validationNote: validation.note,
  };
}
