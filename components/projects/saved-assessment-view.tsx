"use client";

import { useEffect, useState } from "react";
import { apiRequest, exportLinks, type SavedAssessment } from "../api-client";
import { ResultsView } from "../results/results-view";

/** One saved assessment: whether it would compute the same today, exports, the results and the inputs. */
export function SavedAssessmentView({ id }: { id: string }) {
  const [saved, setSaved] = useState<SavedAssessment | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  useEffect(() => {
    void apiRequest<SavedAssessment>(`/api/v1/assessments/${encodeURIComponent(id)}`).then((outcome) => {
      if (outcome.ok) setSaved(outcome.value);
      else setMessage(outcome.status === 404 ? "There is no saved assessment with this id." : outcome.message);
    });
  }, [id]);
  if (!saved) return <p role={message ? "alert" : "status"}>{message ?? "Loading the saved assessment…"}</p>;
  return (
    <article className="saved-assessment">
      <h1>{saved.name}</h1>
      <p className={saved.isCurrent ? "currency ok" : "currency warn"}>
        <span aria-hidden="true">{saved.isCurrent ? "✓ " : "⚠ "}</span>
        {saved.isCurrent
          ? `Computed with data set ${saved.versions.dataset} and engine ${saved.versions.engine}, the versions running today: it would compute the same today.`
          : `Computed with data set ${saved.versions.dataset} and engine ${saved.versions.engine}; the ${saved.outdated.join(" and ")} changed since. Recompute before relying on it.`}
      </p>
      <nav aria-label="Exports and actions" className="export-links no-print">
        <ul>
          {exportLinks(saved.id).map((l) => (
            <li key={l.format}>
              <a href={l.href} download>
                {l.label}
              </a>
            </li>
          ))}
          <li>
            <a href={`/?from=${encodeURIComponent(saved.id)}`}>Open the inputs in the form</a>
          </li>
          <li>
            <button type="button" className="link-button" onClick={() => window.print()}>
              Print
            </button>
          </li>
        </ul>
      </nav>
      <ResultsView result={saved.result} heading="Saved results" />
      <details className="saved-inputs">
        <summary>Inputs as saved</summary>
        <pre>{JSON.stringify(saved.inputs, null, 2)}</pre>
      </details>
    </article>
  );
}
