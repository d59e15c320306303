"use client";

import { cautionsOf, flagsOf, keyFigures } from "../../lib/report/key-figures";
import { computationNotesOf } from "../../lib/report/computation-notes";
import { resultCharts } from "../../lib/charts/result-charts";
import { withPhaseLabels } from "../../lib/charts/phase-labels";
import { cautionTextsFor } from "../../lib/advisory/cautions";
import { CautionList, FlagList } from "./flag-list";
import { ChartPanel } from "./chart-panel";
import { ExposureClassTable, PoreSolutionTable, ScenarioFindingsTable } from "./result-tables";
import { formatChartCell } from "./data-table";

/**
 * The results of an assessment: flags first (most severe first), the cautions (always shown, the standard
 * assessment cautions when a result carries none), key figures, the computation notes (what could not be computed,
 * what is extrapolated), charts, what each scenario found, and the pore solution and exposure-class tables.
 */
export function ResultsView({ result, heading = "Results" }: { result: unknown; heading?: string }) {
  const flags = flagsOf(result);
  const cautions = cautionsOf(result);
  const figures = keyFigures(result);
  const notes = computationNotesOf(result);
  // Phase ids become readable names in legends, data tables and CSV columns alike.
  const charts = resultCharts(result).map(withPhaseLabels);
  return (
    <section className="results" aria-labelledby="results-title">
      <h2 id="results-title" tabIndex={-1}>
        {heading}
      </h2>
      <section className="result-section" aria-labelledby="flags-title">
        <h3 id="flags-title">Risk flags</h3>
        <FlagList flags={flags} />
      </section>
      <CautionList cautions={cautions.length > 0 ? cautions : cautionTextsFor("assessment")} />
      {figures.length > 0 ? (
        <section className="result-section" aria-labelledby="figures-title">
          <h3 id="figures-title">Key figures</h3>
          <dl className="key-figures">
            {figures.map((f) => (
              <div key={f.id}>
                <dt>{f.label}</dt>
                <dd>
                  {formatChartCell(f.value)} {f.unit}
                </dd>
              </div>
            ))}
          </dl>
        </section>
      ) : null}
      {notes.length > 0 ? (
        <section className="result-section" aria-labelledby="notes-title">
          <h3 id="notes-title">Computation notes</h3>
          <ul className="computation-notes">
            {notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        </section>
      ) : null}
      {charts.length > 0 ? (
        <section className="result-section charts" aria-labelledby="charts-title">
          <h3 id="charts-title">Charts</h3>
          {charts.map((chart) => (
            <ChartPanel key={chart.id} chart={chart} />
          ))}
        </section>
      ) : null}
      <ScenarioFindingsTable result={result} />
      <PoreSolutionTable result={result} />
      <ExposureClassTable result={result} />
    </section>
  );
}
