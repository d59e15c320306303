"use client";

import { useId, useState } from "react";
import {
  Area,
  AreaChart,
  Bar,
  BarChart,
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { formatTick, xAxisTicks } from "../../lib/charts/axis-ticks";
import { axisCaption, type ChartData } from "../../lib/charts/chart-data";
import { chartCsv, chartCsvFileName } from "../../lib/charts/csv";
import { DataTable } from "./data-table";

/** A palette distinguishable in print and by most colour-vision types (Okabe & Ito 2008 colour set). */
const PALETTE = ["#0072B2", "#E69F00", "#009E73", "#CC79A7", "#56B4E9", "#D55E00", "#F0E442", "#000000", "#999999"];
const DASHES = ["", "6 3", "2 2", "8 3 2 3"];

/** A series' own colour (phase colours, `lib/charts/phase-colours.ts`), else one by position. */
const colourOf = (chart: ChartData, index: number) => chart.series[index].colour ?? PALETTE[index % PALETTE.length];

/** The series that are drawn (table-only ones are in the data table and the CSV alone), with their index in `series`. */
const drawn = (chart: ChartData) => chart.series.map((s, index) => ({ s, i: index })).filter(({ s }) => !s.tableOnly);

function downloadCsv(chart: ChartData) {
  const blob = new Blob([chartCsv(chart)], { type: "text/csv;charset=utf-8" });
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = chartCsvFileName(chart);
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

function Axes({ chart }: { chart: ChartData }) {
  const xIsNumber = chart.x.scale !== "category";
  const ticks = xIsNumber ? xAxisTicks(chart) : undefined;
  return (
    <>
      <CartesianGrid strokeDasharray="3 3" />
      <XAxis
        dataKey={chart.x.key}
        type={xIsNumber ? "number" : "category"}
        scale={chart.x.scale === "log" ? "log" : "auto"}
        domain={!xIsNumber ? undefined : chart.x.scale === "log" ? ["dataMin", "dataMax"] : ticks ? [ticks[0], ticks[ticks.length - 1]] : ["auto", "auto"]}
        ticks={ticks}
        tickFormatter={xIsNumber ? (value: number) => formatTick(value) : undefined}
        allowDataOverflow={false}
        label={{ value: axisCaption(chart.x.label, chart.x.unit), position: "insideBottom", offset: -10 }}
      />
      <YAxis yAxisId="left" tickFormatter={(value: number) => formatTick(value)} label={{ value: axisCaption(chart.yLeft.label, chart.yLeft.unit), angle: -90, position: "insideLeft", style: { textAnchor: "middle" } }} />
      {chart.yRight ? (
        <YAxis yAxisId="right" orientation="right" domain={["auto", "auto"]} tickFormatter={(value: number) => formatTick(value)} label={{ value: axisCaption(chart.yRight.label, chart.yRight.unit), angle: 90, position: "insideRight", style: { textAnchor: "middle" } }} />
      ) : null}
      <Tooltip />
      {/* Legend text in the page's text colour: light phase colours (empty pores, amorphous silica) would be unreadable as text. */}
      <Legend verticalAlign="top" formatter={(value) => <span className="chart-legend-label">{value}</span>} />
      {chart.thresholds.map((t) => (
        <ReferenceLine key={t.label} yAxisId={t.axis} y={t.value} ifOverflow="extendDomain" stroke="#B00020" strokeDasharray="6 4" label={{ value: t.label, position: "insideTopLeft" }} />
      ))}
    </>
  );
}

function Drawing({ chart }: { chart: ChartData }) {
  const margin = { top: 10, right: chart.yRight ? 30 : 10, bottom: 30, left: 10 };
  switch (chart.kind) {
    case "stacked-bar":
      return (
        <BarChart data={chart.rows} margin={margin}>
          {Axes({ chart })}
          {drawn(chart).map(({ s, i }) => (
            <Bar key={s.key} dataKey={s.key} name={s.label} stackId="stack" yAxisId={s.axis} fill={colourOf(chart, i)} stroke="#9a9a9a" strokeWidth={0.5} isAnimationActive={false} />
          ))}
        </BarChart>
      );
    case "stacked-area":
      return (
        <AreaChart data={chart.rows} margin={margin}>
          {Axes({ chart })}
          {drawn(chart).map(({ s, i }) =>
            s.axis === "left" ? (
              <Area key={s.key} dataKey={s.key} name={s.label} stackId="stack" yAxisId="left" type="monotone" stroke={colourOf(chart, i)} fill={colourOf(chart, i)} fillOpacity={0.85} isAnimationActive={false} />
            ) : (
              <Area key={s.key} dataKey={s.key} name={s.label} yAxisId="right" type="monotone" stroke="#000" strokeWidth={2} strokeDasharray="5 3" fill="none" isAnimationActive={false} connectNulls={false} />
            ),
          )}
        </AreaChart>
      );
    case "scatter":
      return (
        <ScatterChart margin={margin}>
          {Axes({ chart })}
          {drawn(chart).map(({ s, i }) => (
            <Scatter
              key={s.key}
              name={s.label}
              yAxisId="left"
              data={chart.rows.filter((r) => r[s.key] !== null).map((r) => ({ [chart.x.key]: r[chart.x.key], [s.key]: r[s.key] }))}
              dataKey={s.key}
              fill={colourOf(chart, i)}
              shape={(["circle", "square", "triangle", "diamond", "cross", "star", "wye"] as const)[i % 7]}
              isAnimationActive={false}
            />
          ))}
        </ScatterChart>
      );
    default:
      return (
        <LineChart data={chart.rows} margin={margin}>
          {Axes({ chart })}
          {drawn(chart).map(({ s, i }) => (
            <Line key={s.key} dataKey={s.key} name={s.label} yAxisId={s.axis} type="monotone" stroke={colourOf(chart, i)} strokeDasharray={DASHES[i % DASHES.length]} dot={false} strokeWidth={2} isAnimationActive={false} connectNulls={false} />
          ))}
        </LineChart>
      );
  }
}

/** One chart with its title, axis units, legend, a data-table toggle and a CSV download. */
export function ChartPanel({ chart, height = 320 }: { chart: ChartData; height?: number }) {
  const [showTable, setShowTable] = useState(false);
  const tableId = useId();
  const titleId = useId();
  return (
    <figure className="chart-panel" aria-labelledby={titleId} data-chart={chart.id}>
      <figcaption id={titleId}>
        <h4>{chart.title}</h4>
        {chart.note ? <p className="hint">{chart.note}</p> : null}
        {chart.thresholds.length > 0 ? (
          <p className="hint">Limit lines (dashed): {chart.thresholds.map((t) => `${t.label} (${t.value} ${t.unit})`).join("; ")}.</p>
        ) : null}
      </figcaption>
      <p className="visually-hidden">
        {`${chart.title}: ${drawn(chart).map(({ s }) => s.label).join(", ")} against ${axisCaption(chart.x.label, chart.x.unit)}. The data table gives the values.`}
      </p>
      <div className="chart-drawing">
        <ResponsiveContainer width="100%" height={height} minWidth={200} initialDimension={{ width: 640, height }}>
          {Drawing({ chart })}
        </ResponsiveContainer>
      </div>
      <div className="chart-actions">
        <button type="button" className="secondary" aria-expanded={showTable} aria-controls={tableId} onClick={() => setShowTable((v) => !v)}>
          {showTable ? "Hide data table" : "Show data table"}
        </button>
        <button type="button" className="secondary" onClick={() => downloadCsv(chart)}>
          Download CSV
        </button>
      </div>
      <div id={tableId} hidden={!showTable} className="chart-table">
        {showTable ? <DataTable chart={chart} /> : null}
      </div>
    </figure>
  );
}
