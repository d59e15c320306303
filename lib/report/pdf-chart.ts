import type { ChartData } from "../charts/chart-data";
import { axisCaption } from "../charts/chart-data";
import { pdfSafe } from "./pdf-text";

/** Series colours (distinguishable in print; the legend names each series so colour is never the only cue). */
const PALETTE = ["#1f4e79", "#c55a11", "#548235", "#7030a0", "#bf9000", "#2e75b6", "#a50021", "#3b3838", "#00b0a0", "#ff7c80"];

type Box = { x: number; y: number; width: number; height: number };

function numbersOf(chart: ChartData, axis: "left" | "right", stacked: boolean): number[] {
  const series = chart.series.filter((s) => s.axis === axis && !s.tableOnly);
  if (!stacked) return chart.rows.flatMap((row) => series.map((s) => row[s.key]).filter((v): v is number => typeof v === "number" && Number.isFinite(v)));
  return chart.rows.map((row) => series.reduce((sum, s) => sum + (typeof row[s.key] === "number" ? (row[s.key] as number) : 0), 0));
}

function range(values: number[], includeZero: boolean): [number, number] {
  if (values.length === 0) return [0, 1];
  let low = Math.min(...values, ...(includeZero ? [0] : []));
  let high = Math.max(...values, ...(includeZero ? [0] : []));
  if (low === high) (low -= 1), (high += 1);
  const pad = (high - low) * 0.05;
  return [includeZero && low === 0 ? 0 : low - pad, high + pad];
}

function tick(value: number): string {
  const magnitude = Math.abs(value);
  return magnitude !== 0 && (magnitude < 0.01 || magnitude >= 1e5) ? value.toExponential(1) : Number(value.toPrecision(3)).toString();
}

/**
 * Draws a chart as vector graphics: axes with captions and units, five ticks per axis, each series as a
 * line (stacked areas as cumulative lines, stacked bars as bars), thresholds dashed, and a legend below.
 * Returns the height used, pt.
 */
export function drawChart(doc: PDFKit.PDFDocument, chart: ChartData, box: Box): number {
  const plot = { x: box.x + 45, y: box.y + 18, width: box.width - 90, height: box.height - 60 };
  const stacked = chart.kind === "stacked-area" || chart.kind === "stacked-bar";
  const category = chart.x.scale === "category" || chart.kind === "stacked-bar";
  const rows = chart.rows;
  const xs = rows.map((row, index) => (category ? index : Number(row[chart.x.key])));
  const logX = chart.x.scale === "log" && xs.every((x) => x > 0);
  const xt = (x: number) => (logX ? Math.log10(x) : x);
  const [xLow, xHigh] = category ? [-0.5, rows.length - 0.5] : range(xs.map(xt), false);
  const [yLow, yHigh] = range(numbersOf(chart, "left", stacked).concat(chart.thresholds.filter((t) => t.axis === "left").map((t) => t.value)), true);
  const rightSeries = chart.series.filter((s) => s.axis === "right" && !s.tableOnly);
  const [rLow, rHigh] = range(numbersOf(chart, "right", false), false);
  const px = (x: number) => plot.x + ((xt(x) - xLow) / (xHigh - xLow)) * plot.width;
  const pxIndex = (i: number) => plot.x + ((i - xLow) / (xHigh - xLow)) * plot.width;
  const py = (y: number) => plot.y + plot.height - ((y - yLow) / (yHigh - yLow)) * plot.height;
  const pr = (y: number) => plot.y + plot.height - ((y - rLow) / (rHigh - rLow)) * plot.height;

  doc.save();
  doc.font("Helvetica-Bold").fontSize(9).fillColor("#000").text(pdfSafe(chart.title), box.x, box.y, { width: box.width, lineBreak: false });
  doc.lineWidth(0.5).strokeColor("#000").rect(plot.x, plot.y, plot.width, plot.height).stroke();
  doc.font("Helvetica").fontSize(6);
  for (let i = 0; i <= 4; i++) {
    const value = yLow + ((yHigh - yLow) * i) / 4;
    doc.text(tick(value), plot.x - 40, py(value) - 3, { width: 36, align: "right", lineBreak: false });
    if (rightSeries.length > 0) {
      const right = rLow + ((rHigh - rLow) * i) / 4;
      doc.text(tick(right), plot.x + plot.width + 4, pr(right) - 3, { width: 40, lineBreak: false });
    }
  }
  if (category) {
    const step = Math.max(1, Math.ceil(rows.length / 8));
    rows.forEach((row, i) => {
      if (i % step === 0) doc.text(pdfSafe(String(row[chart.x.key] ?? "")).slice(0, 18), pxIndex(i) - 30, plot.y + plot.height + 3, { width: 60, align: "center", lineBreak: false });
    });
  } else {
    for (let i = 0; i <= 4; i++) {
      const t = xLow + ((xHigh - xLow) * i) / 4;
      const value = logX ? 10 ** t : t;
      doc.text(tick(value), plot.x + ((t - xLow) / (xHigh - xLow)) * plot.width - 20, plot.y + plot.height + 3, { width: 40, align: "center", lineBreak: false });
    }
  }
  doc.fontSize(7).text(pdfSafe(axisCaption(chart.x.label, chart.x.unit)), plot.x, plot.y + plot.height + 12, { width: plot.width, align: "center", lineBreak: false });
  doc.text(pdfSafe(axisCaption(chart.yLeft.label, chart.yLeft.unit)), box.x, plot.y - 10, { width: 200, lineBreak: false });
  if (chart.yRight) doc.text(pdfSafe(axisCaption(chart.yRight.label, chart.yRight.unit)), plot.x + plot.width - 150, plot.y - 10, { width: 190, align: "right", lineBreak: false });

  const leftSeries = chart.series.filter((s) => s.axis === "left" && !s.tableOnly);
  // A series' own colour (phase colours, lib/charts/phase-colours.ts), else one by position.
  const colour = (key: string) => {
    const index = chart.series.findIndex((s) => s.key === key);
    return chart.series[index].colour ?? PALETTE[index % PALETTE.length];
  };
  if (chart.kind === "stacked-bar") {
    const barWidth = (plot.width / Math.max(1, rows.length)) * 0.6;
    rows.forEach((row, i) => {
      let base = 0;
      for (const s of leftSeries) {
        const value = typeof row[s.key] === "number" ? (row[s.key] as number) : 0;
        if (value <= 0) continue;
        doc.rect(pxIndex(i) - barWidth / 2, py(base + value), barWidth, py(base) - py(base + value)).fill(colour(s.key));
        base += value;
      }
    });
  } else {
    const cumulative = rows.map(() => 0);
    for (const s of leftSeries) {
      let started = false;
      rows.forEach((row, i) => {
        const raw = row[s.key];
        if (typeof raw !== "number" || !Number.isFinite(raw)) return (started = false);
        const y = stacked ? (cumulative[i] += raw) : raw;
        const x = category ? pxIndex(i) : px(xs[i]);
        if (!started) doc.moveTo(x, py(y));
        else doc.lineTo(x, py(y));
        started = true;
      });
      doc.lineWidth(1).strokeColor(colour(s.key)).stroke();
    }
  }
  for (const s of rightSeries) {
    let started = false;
    rows.forEach((row, i) => {
      const raw = row[s.key];
      if (typeof raw !== "number" || !Number.isFinite(raw)) return (started = false);
      const x = category ? pxIndex(i) : px(xs[i]);
      if (!started) doc.moveTo(x, pr(raw));
      else doc.lineTo(x, pr(raw));
      started = true;
    });
    doc.lineWidth(1).dash(3, { space: 2 }).strokeColor(colour(s.key)).stroke().undash();
  }
  for (const threshold of chart.thresholds) {
    const y = threshold.axis === "right" ? pr(threshold.value) : py(threshold.value);
    doc.moveTo(plot.x, y).lineTo(plot.x + plot.width, y).lineWidth(0.8).dash(5, { space: 3 }).strokeColor("#a50021").stroke().undash();
    doc.fontSize(6).fillColor("#a50021").text(pdfSafe(`${threshold.label} ${threshold.value} ${threshold.unit}`), plot.x + 2, y - 8, { width: plot.width, lineBreak: false });
  }

  // Legend: colour swatch (solid: left axis, dashed mark: right axis) and the series name with its unit.
  let lx = plot.x;
  let ly = plot.y + plot.height + 24;
  doc.fontSize(6).fillColor("#000");
  for (const s of chart.series) {
    if (s.tableOnly) continue;
    const label = pdfSafe(`${s.label}${s.axis === "right" ? " (right axis)" : ""}`);
    const width = doc.widthOfString(label) + 16;
    if (lx + width > plot.x + plot.width) (lx = plot.x), (ly += 9);
    doc.rect(lx, ly + 1, 8, 4).fill(colour(s.key));
    doc.fillColor("#000").text(label, lx + 10, ly, { lineBreak: false });
    lx += width;
  }
  doc.restore();
  return Math.max(box.height, ly + 10 - box.y);
}
