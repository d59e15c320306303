"use client";

import { useEffect, useState } from "react";
import { apiRequest, type AssessmentSummary } from "../api-client";
import { SEVERITY_PRESENTATION } from "../results/flag-list";
import { formatChartCell } from "../results/data-table";
import type { Severity } from "../../lib/advisory/flag";
import { readableInputValue } from "../../lib/report/input-value-label";

type Comparison = {
  assessments: AssessmentSummary[];
  inputDifferences: { path: string; values: unknown[] }[];
  flags: { id: string; title: string; severities: (string | null)[] }[];
  keyFigures: { id: string; label: string; unit: string; values: (number | string | null)[] }[];
};

const cell = (v: unknown): string =>
  v === undefined ? "(not given)" : v === null ? "–" : typeof v === "number" || typeof v === "string" ? formatChartCell(v) : typeof v === "boolean" ? (v ? "yes" : "no") : JSON.stringify(v);

/** Two to four saved assessments side by side: the inputs that differ (highlighted), flags and key figures. */
export function CompareView({ ids }: { ids: string[] }) {
  const [comparison, setComparison] = useState<Comparison | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  useEffect(() => {
    void apiRequest<Comparison>(`/api/v1/assessments/compare?ids=${ids.map(encodeURIComponent).join(",")}`).then((outcome) => {
      if (outcome.ok) setComparison(outcome.value);
      else setMessage(outcome.issues?.map((i) => i.message).join("; ") ?? outcome.message);
    });
  }, [ids]);
  if (!comparison) return <p role={message ? "alert" : "status"}>{message ?? "Loading the comparison…"}</p>;
  const names = comparison.assessments.map((a) => a.name);
  const head = (
    <tr>
      <th scope="col">Item</th>
      {comparison.assessments.map((a) => (
        <th scope="col" key={a.id}>
          <a href={`/projects/${encodeURIComponent(a.id)}`}>{a.name}</a>
        </th>
      ))}
    </tr>
  );
  return (
    <div className="compare">
      <section aria-labelledby="cmp-inputs">
        <h2 id="cmp-inputs">Inputs that differ</h2>
        {comparison.inputDifferences.length === 0 ? (
          <p>The inputs are the same.</p>
        ) : (
          <div className="table-scroll" tabIndex={0} role="region" aria-label="Inputs that differ (scrollable)">
            <table className="data-table compare-table">
              <caption>Only the fields that differ are listed; the highlighted cells differ from the first assessment.</caption>
              <thead>{head}</thead>
              <tbody>
                {comparison.inputDifferences.map((d) => (
                  <tr key={d.path}>
                    <th scope="row">
                      <code>{d.path}</code>
                    </th>
                    {d.values.map((v, i) => {
                      const differs = i > 0 && JSON.stringify(v) !== JSON.stringify(d.values[0]);
                      return (
                        <td key={i} className={differs ? "differs" : undefined}>
                          {cell(readableInputValue(d.path, v))}
                          {differs ? <span className="visually-hidden"> (differs)</span> : null}
                        </td>
                      );
                    })}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
      <section aria-labelledby="cmp-flags">
        <h2 id="cmp-flags">Flags</h2>
        {comparison.flags.length === 0 ? (
          <p>None of the assessments raises a flag.</p>
        ) : (
          <table className="data-table">
            <caption>Severity of each flag in each assessment</caption>
            <thead>{head}</thead>
            <tbody>
              {comparison.flags.map((f) => (
                <tr key={f.id}>
                  <th scope="row">{f.title}</th>
                  {f.severities.map((s, i) => {
                    const p = s ? SEVERITY_PRESENTATION[s as Severity] : null;
                    return (
                      <td key={i}>
                        {p ? (
                          <span className={`severity-text severity-${s}`}>
                            <span aria-hidden="true">{p.icon} </span>
                            {p.word}
                          </span>
                        ) : (
                          "not raised"
                        )}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      <section aria-labelledby="cmp-figures">
        <h2 id="cmp-figures">Key figures</h2>
        {comparison.keyFigures.length === 0 ? (
          <p>No key figures in these results.</p>
        ) : (
          <table className="data-table">
            <caption>Key figures of {names.join(", ")}</caption>
            <thead>{head}</thead>
            <tbody>
              {comparison.keyFigures.map((k) => (
                <tr key={k.id}>
                  <th scope="row">
                    {k.label}
                    {k.unit ? ` (${k.unit})` : ""}
                  </th>
                  {k.values.map((v, i) => (
                    <td key={i}>{cell(v)}</td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
    </div>
  );
}
