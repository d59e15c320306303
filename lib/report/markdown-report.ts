import type { ReportModel, ReportTable } from "./report-model";
import { chartTable, formatCell, robustnessSentence } from "./report-model";

/** Escapes the characters that would break a Markdown table cell. */
function cell(text: string): string {
  return text.replace(/\\/g, "\\\\").replace(/\|/g, "\\|").replace(/\r?\n/g, " ");
}

function table(t: ReportTable, level = "###"): string[] {
  const lines = [`${level} ${t.title}`, ""];
  if (t.rows.length === 0) return [...lines, "(no rows)", ""];
  lines.push(`| ${t.columns.map(cell).join(" | ")} |`, `| ${t.columns.map(() => "---").join(" | ")} |`);
  for (const row of t.rows) lines.push(`| ${row.map(cell).join(" | ")} |`);
  if (t.note) lines.push("", `_${t.note}_`);
  lines.push("");
  return lines;
}

function cautionBlock(cautions: readonly string[]): string[] {
  return ["> **Cautions**", ">", ...cautions.map((c) => `> - ${c}`), ""];
}

/**
 * The Markdown summary of a saved assessment: project, currency of the result, inputs, assumptions, data
 * provenance, key figures, result tables (every chart's series as a table), flags, the cautions (at the top
 * and the end), and the validation dossier as an appendix.
 */
export function renderMarkdownReport(model: ReportModel): string {
  const lines: string[] = [`# ${model.title}`, "", `_${model.subtitle}_ · saved ${model.savedAt}`, ""];
  lines.push(...cautionBlock(model.cautions));
  lines.push("## Project", "");
  if (model.project.length === 0) lines.push("(no project details given)", "");
  for (const row of model.project) lines.push(`- **${row.label}:** ${row.value}`);
  lines.push("", "## Versions", "", `- Data set: ${model.versions.dataset}`, `- Engine: ${model.versions.engine}`, "", model.currencyStatement, "");
  lines.push("## Inputs", "", ...table(model.inputs, "###").slice(2));
  lines.push("## Assumptions", "", ...model.assumptions.map((a) => `- ${a}`), "");
  lines.push("## Data provenance", "", `Data set version ${model.provenance.datasetVersion} (running today), files:`, "");
  for (const file of model.provenance.files) {
    lines.push(`- **${file.title}** (${file.family}, ${file.date})`);
    for (const source of file.sources) lines.push(`  - ${source}`);
  }
  lines.push("", "## Results", "");
  if (model.keyFigures.length > 0)
    lines.push(...table({ title: "Key figures", columns: ["Quantity", "Value", "Unit"], rows: model.keyFigures.map((k) => [k.label, formatCell(k.value), k.unit]) }));
  if (model.computationNotes.length > 0) lines.push("### Computation notes", "", ...model.computationNotes.map((n) => `- ${n}`), "");
  for (const chart of model.charts) lines.push(...table(chartTable(chart)));
  for (const extra of model.tables) lines.push(...table(extra));
  lines.push("## Flags", "");
  if (model.flags.length === 0) lines.push("No flags were raised.", "");
  for (const flag of model.flags) {
    lines.push(`### ${flag.severity.toUpperCase()}: ${flag.title}`, "", flag.explanation, "", `Basis: ${flag.basis}`, "");
    if (flag.robustness) lines.push(robustnessSentence(flag.robustness), "");
    if (flag.actions.length > 0) lines.push("Actions:", ...flag.actions.map((a) => `- ${a}`), "");
  }
  lines.push("## Cautions", "", ...model.cautions.map((c) => `- ${c}`), "");
  lines.push("## Appendix: validation dossier", "", model.validationNote, "");
  if (model.validation) lines.push(...table(model.validation).slice(2));
  return lines.join("\n");
}
