import { axisCaption, type ChartData } from "../../lib/charts/chart-data";

/** A chart's numbers to 4 significant figures; gaps print as an en dash. */
export function formatChartCell(value: number | string | null | undefined): string {
  if (value === null || value === undefined) return "–";
  if (typeof value === "string") return value;
  if (Number.isInteger(value)) return String(value);
  return Number(value.toPrecision(4)).toString();
}

/** The data table of a chart: the x column and one column per series, each heading with its unit. */
export function DataTable({ chart }: { chart: ChartData }) {
  return (
    <div className="table-scroll" tabIndex={0} role="region" aria-label={`Data of ${chart.title} (scrollable)`}>
      <table className="data-table">
        <caption>Data of “{chart.title}”</caption>
        <thead>
          <tr>
            <th scope="col">{axisCaption(chart.x.label, chart.x.unit)}</th>
            {chart.series.map((s) => (
              <th scope="col" key={s.key}>
                {axisCaption(s.label, s.unit)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {chart.rows.map((row, i) => (
            <tr key={i}>
              <th scope="row">{formatChartCell(row[chart.x.key])}</th>
              {chart.series.map((s) => (
                <td key={s.key}>{formatChartCell(row[s.key])}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
