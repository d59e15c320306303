import PDFDocument from "pdfkit";
import { drawChart } from "./pdf-chart";
import { pdfSafe } from "./pdf-text";
import type { ReportModel, ReportTable } from "./report-model";
import { chartTable, formatCell, robustnessSentence } from "./report-model";

export type PdfOptions = {
  /** Deflate page streams (default true); tests turn it off to read the text. */
  compress?: boolean;
  /** Fixed creation date (for reproducible output in tests). */
  creationDate?: Date;
};

const PAGE = { size: "A4" as const, marginPt: 50, footerPt: 118 };
const MAX_COLUMNS_PER_TABLE = 8;

type Doc = PDFKit.PDFDocument;

function bottom(doc: Doc): number {
  return doc.page.height - doc.page.margins.bottom;
}

function ensureSpace(doc: Doc, heightPt: number): void {
  if (doc.y + heightPt > bottom(doc)) doc.addPage();
}

function heading(doc: Doc, text: string, size = 13): void {
  ensureSpace(doc, size * 3);
  doc.moveDown(0.6).font("Helvetica-Bold").fontSize(size).fillColor("#000").text(pdfSafe(text), doc.page.margins.left);
  doc.moveDown(0.3).font("Helvetica").fontSize(9);
}

function paragraph(doc: Doc, text: string, size = 9): void {
  doc.font("Helvetica").fontSize(size).fillColor("#000").text(pdfSafe(text), doc.page.margins.left, undefined, { width: contentWidth(doc) });
}

function contentWidth(doc: Doc): number {
  return doc.page.width - doc.page.margins.left - doc.page.margins.right;
}

/** Splits a wide table into column groups that repeat the first column. */
function columnGroups(t: ReportTable): ReportTable[] {
  if (t.columns.length <= MAX_COLUMNS_PER_TABLE) return [t];
  const groups: ReportTable[] = [];
  const step = MAX_COLUMNS_PER_TABLE - 1;
  for (let start = 1; start < t.columns.length; start += step) {
    const indices = [0, ...Array.from({ length: Math.min(step, t.columns.length - start) }, (_, i) => start + i)];
    groups.push({ ...t, title: `${t.title} (columns ${start + 1}–${indices[indices.length - 1] + 1} of ${t.columns.length})`, columns: indices.map((i) => t.columns[i]), rows: t.rows.map((r) => indices.map((i) => r[i] ?? "")) });
  }
  return groups;
}

function drawTable(doc: Doc, t: ReportTable, fontSize = 7): void {
  for (const group of columnGroups(t)) {
    heading(doc, group.title, 10);
    const width = contentWidth(doc);
    const left = doc.page.margins.left;
    // Widths by the longest text of each column, within limits.
    const lengths = group.columns.map((c, i) => Math.min(60, Math.max(c.length, ...group.rows.map((r) => (r[i] ?? "").length), 4)));
    const total = lengths.reduce((a, b) => a + b, 0);
    const widths = lengths.map((l) => (l / total) * width);
    const rowHeight = (cells: string[], bold: boolean) => {
      doc.font(bold ? "Helvetica-Bold" : "Helvetica").fontSize(fontSize);
      return Math.max(...cells.map((c, i) => doc.heightOfString(pdfSafe(c || " "), { width: widths[i] - 4 }))) + 3;
    };
    const drawRow = (cells: string[], bold: boolean) => {
      const h = rowHeight(cells, bold);
      if (doc.y + h > bottom(doc)) {
        doc.addPage();
        if (!bold) drawRow(group.columns, true);
      }
      const y = doc.y;
      let x = left;
      doc.font(bold ? "Helvetica-Bold" : "Helvetica").fontSize(fontSize).fillColor("#000");
      cells.forEach((c, i) => {
        doc.text(pdfSafe(c), x + 2, y + 1.5, { width: widths[i] - 4 });
        x += widths[i];
      });
      doc.moveTo(left, y + h).lineTo(left + width, y + h).lineWidth(0.3).strokeColor(bold ? "#000" : "#999").stroke();
      doc.x = left;
      doc.y = y + h;
    };
    drawRow(group.columns, true);
    if (group.rows.length === 0) paragraph(doc, "(no rows)", fontSize);
    for (const row of group.rows) drawRow(row, false);
    if (group.note) {
      doc.moveDown(0.3);
      paragraph(doc, group.note, 7);
    }
  }
}

/** Draws the cautions (and page number) in the bottom margin of every buffered page. */
function drawFooters(doc: Doc, model: ReportModel): void {
  const range = doc.bufferedPageRange();
  const text = pdfSafe(`Cautions: ${model.cautions.join(" ")}`);
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const savedBottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing inside the margin must not start a new page
    const left = doc.page.margins.left;
    const width = contentWidth(doc);
    const top = doc.page.height - PAGE.footerPt + 8;
    doc.moveTo(left, top - 4).lineTo(left + width, top - 4).lineWidth(0.5).strokeColor("#000").stroke();
    // The whole caution text must fit the footer: shrink the type (down to 4 pt) rather than cut it.
    const available = PAGE.footerPt - 30;
    let size = 5.6;
    doc.font("Helvetica");
    while (size > 4 && doc.fontSize(size).heightOfString(text, { width, align: "justify" }) > available) size -= 0.2;
    doc.fontSize(size).fillColor("#333").text(text, left, top, { width, align: "justify" });
    doc.fontSize(6.5).fillColor("#000").text(pdfSafe(`${model.title} · data set ${model.versions.dataset} · engine ${model.versions.engine} · page ${i - range.start + 1} of ${range.count}`), left, doc.page.height - 22, { width, align: "center", lineBreak: false });
    doc.page.margins.bottom = savedBottom;
  }
}

/**
 * The PDF report of a saved assessment (pdfkit, built-in Helvetica, no fonts fetched): title, project,
 * versions and whether the result would compute the same today, inputs, assumptions, data provenance, key
 * figures, each chart drawn as vector graphics and printed as a table, further tables, flags, the
 * validation appendix, and the cautions in the footer of every page. Resolves to the file's bytes.
 */
export function renderPdfReport(model: ReportModel, options: PdfOptions = {}): Promise<Buffer> {
  const doc = new PDFDocument({
    size: PAGE.size,
    margins: { top: PAGE.marginPt, left: PAGE.marginPt, right: PAGE.marginPt, bottom: PAGE.footerPt },
    bufferPages: true,
    compress: options.compress ?? true,
    // Title = the project name alone: an ASCII title is stored as a literal string outside the compressed
    // streams, so the name can be found in the bytes of the file (the browser test checks this).
    info: { Title: pdfSafe(model.subtitle), Subject: pdfSafe(`Hydrastate assessment report: ${model.title}`), Creator: "Hydrastate", Producer: "Hydrastate", CreationDate: options.creationDate ?? new Date() },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  doc.font("Helvetica-Bold").fontSize(18).text(pdfSafe(model.title));
  doc.font("Helvetica").fontSize(11).text(pdfSafe(model.subtitle));
  doc.fontSize(8).fillColor("#333").text(pdfSafe(`Saved ${model.savedAt}`)).fillColor("#000");

  heading(doc, "Project");
  if (model.project.length === 0) paragraph(doc, "(no project details given)");
  for (const row of model.project) paragraph(doc, `${row.label}: ${row.value}`);

  heading(doc, "Versions");
  paragraph(doc, `Data set ${model.versions.dataset}, engine ${model.versions.engine}.`);
  paragraph(doc, model.currencyStatement);

  drawTable(doc, model.inputs);

  heading(doc, "Assumptions");
  for (const a of model.assumptions) paragraph(doc, `• ${a}`);

  heading(doc, "Data provenance");
  paragraph(doc, `Data set version ${model.provenance.datasetVersion} (running today). Files and their sources:`);
  for (const file of model.provenance.files) {
    ensureSpace(doc, 30);
    doc.font("Helvetica-Bold").fontSize(8).text(pdfSafe(`${file.title} (${file.family}, ${file.date})`));
    doc.font("Helvetica").fontSize(7);
    for (const source of file.sources) doc.text(pdfSafe(`– ${source}`), { indent: 10 });
  }

  heading(doc, "Results");
  if (model.keyFigures.length > 0)
    drawTable(doc, { title: "Key figures", columns: ["Quantity", "Value", "Unit"], rows: model.keyFigures.map((k) => [k.label, formatCell(k.value), k.unit]) }, 8);
  if (model.computationNotes.length > 0) {
    doc.font("Helvetica-Bold").fontSize(9).text("Computation notes");
    doc.font("Helvetica").fontSize(8);
    for (const note of model.computationNotes) doc.text(pdfSafe(`– ${note}`), { indent: 10 });
    doc.moveDown(0.5);
  }
  for (const chart of model.charts) {
    const chartHeight = 230;
    ensureSpace(doc, chartHeight + 10);
    const used = drawChart(doc, chart, { x: doc.page.margins.left, y: doc.y + 6, width: contentWidth(doc), height: chartHeight });
    doc.x = doc.page.margins.left;
    doc.y = doc.y + used + 10;
    drawTable(doc, chartTable(chart), 6.5);
  }
  for (const extra of model.tables) drawTable(doc, extra);

  heading(doc, "Flags");
  if (model.flags.length === 0) paragraph(doc, "No flags were raised.");
  for (const flag of model.flags) {
    ensureSpace(doc, 60);
    doc.font("Helvetica-Bold").fontSize(9).text(pdfSafe(`${flag.severity.toUpperCase()}: ${flag.title}`));
    paragraph(doc, flag.explanation, 8);
    paragraph(doc, `Basis: ${flag.basis}`, 8);
    if (flag.robustness) paragraph(doc, robustnessSentence(flag.robustness), 8);
    for (const action of flag.actions) paragraph(doc, `• ${action}`, 8);
    doc.moveDown(0.4);
  }

  heading(doc, "Appendix: validation dossier");
  paragraph(doc, model.validationNote, 8);
  if (model.validation) drawTable(doc, model.validation, 6);

  drawFooters(doc, model);
  doc.end();
  return done;
}
