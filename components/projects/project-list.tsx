"use client";

import { useCallback, useEffect, useState } from "react";
import { apiRequest, exportLinks, type AssessmentSummary, type SavedAssessment } from "../api-client";
import { dateTimeLabel } from "./date-label";

const MIN_COMPARE = 2;
const MAX_COMPARE = 4;

/** The saved assessments: open, duplicate, rename, delete, pick two to four to compare, export links. */
export function ProjectList() {
  const [items, setItems] = useState<AssessmentSummary[] | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [selected, setSelected] = useState<string[]>([]);
  const [renaming, setRenaming] = useState<{ id: string; name: string } | null>(null);

  const load = useCallback(async () => {
    const outcome = await apiRequest<{ assessments: AssessmentSummary[] }>("/api/v1/assessments");
    if (outcome.ok) setItems(outcome.value.assessments);
    else setMessage(outcome.message);
  }, []);
  useEffect(() => {
    void load();
  }, [load]);

  const duplicate = async (a: AssessmentSummary) => {
    const outcome = await apiRequest<SavedAssessment>(`/api/v1/assessments/${encodeURIComponent(a.id)}/duplicate`, { method: "POST", json: {} });
    setMessage(outcome.ok ? `Duplicated as “${outcome.value.name}”.` : outcome.message);
    await load();
  };
  const remove = async (a: AssessmentSummary) => {
    if (!window.confirm(`Delete “${a.name}”? This cannot be undone.`)) return;
    const outcome = await apiRequest(`/api/v1/assessments/${encodeURIComponent(a.id)}`, { method: "DELETE" });
    setMessage(outcome.ok ? `Deleted “${a.name}”.` : outcome.message);
    setSelected((s) => s.filter((id) => id !== a.id));
    await load();
  };
  const rename = async () => {
    if (!renaming) return;
    const outcome = await apiRequest<SavedAssessment>(`/api/v1/assessments/${encodeURIComponent(renaming.id)}`, { method: "PATCH", json: { name: renaming.name } });
    setMessage(outcome.ok ? `Renamed to “${outcome.value.name}”.` : (outcome.issues?.map((i) => i.message).join("; ") ?? outcome.message));
    if (outcome.ok) setRenaming(null);
    await load();
  };
  const toggle = (id: string) => setSelected((s) => (s.includes(id) ? s.filter((x) => x !== id) : s.length < MAX_COMPARE ? [...s, id] : s));

  if (items === null) return <p role="status">{message ?? "Loading the saved assessments…"}</p>;
  return (
    <div className="project-list">
      {message ? (
        <p role="status" className="status-message">
          {message}
        </p>
      ) : null}
      {items.length === 0 ? (
        <p>
          No saved assessments yet. <a href="/">Run an assessment</a> and save it.
        </p>
      ) : (
        <>
          <div className="compare-bar">
            <p id="compare-hint">
              Select {MIN_COMPARE} to {MAX_COMPARE} assessments to compare ({selected.length} selected).
            </p>
            {selected.length >= MIN_COMPARE ? (
              <a className="button primary" href={`/compare?ids=${selected.map(encodeURIComponent).join(",")}`}>
                Compare the selected
              </a>
            ) : (
              <span className="button disabled" aria-disabled="true">
                Compare the selected
              </span>
            )}
          </div>
          <table className="data-table projects">
            <caption>Saved assessments, most recently changed first</caption>
            <thead>
              <tr>
                <th scope="col">Compare</th>
                <th scope="col">Name</th>
                <th scope="col">Project</th>
                <th scope="col">Saved</th>
                <th scope="col">Versions</th>
                <th scope="col">Actions</th>
              </tr>
            </thead>
            <tbody>
              {items.map((a) => (
                <tr key={a.id}>
                  <td>
                    <input
                      type="checkbox"
                      aria-label={`Select “${a.name}” for comparison`}
                      aria-describedby="compare-hint"
                      checked={selected.includes(a.id)}
                      disabled={!selected.includes(a.id) && selected.length >= MAX_COMPARE}
                      onChange={() => toggle(a.id)}
                    />
                  </td>
                  <th scope="row">
                    {renaming?.id === a.id ? (
                      <form
                        className="rename-form"
                        onSubmit={(e) => {
                          e.preventDefault();
                          void rename();
                        }}
                      >
                        <label className="visually-hidden" htmlFor={`rename-${a.id}`}>
                          New name for “{a.name}”
                        </label>
                        <input id={`rename-${a.id}`} type="text" value={renaming.name} onChange={(e) => setRenaming({ id: a.id, name: e.target.value })} autoFocus />
                        <button type="submit" className="secondary">
                          Save name
                        </button>
                        <button type="button" className="link-button" onClick={() => setRenaming(null)}>
                          Cancel
                        </button>
                      </form>
                    ) : (
                      <a href={`/projects/${encodeURIComponent(a.id)}`}>{a.name}</a>
                    )}
                  </th>
                  <td>{a.projectName ?? "–"}</td>
                  <td>
                    <time dateTime={a.updatedAt}>{dateTimeLabel(a.updatedAt)}</time>
                  </td>
                  <td>
                    {a.isCurrent ? (
                      <span>
                        <span aria-hidden="true">✓ </span>current
                      </span>
                    ) : (
                      <span>
                        <span aria-hidden="true">⚠ </span>older {a.outdated.join(" and ")}
                      </span>
                    )}
                  </td>
                  <td className="actions">
                    <button type="button" className="link-button" onClick={() => setRenaming({ id: a.id, name: a.name })} aria-label={`Rename “${a.name}”`}>
                      Rename
                    </button>
                    <button type="button" className="link-button" onClick={() => duplicate(a)} aria-label={`Duplicate “${a.name}”`}>
                      Duplicate
                    </button>
                    <button type="button" className="link-button danger" onClick={() => remove(a)} aria-label={`Delete “${a.name}”`}>
                      Delete
                    </button>
                    {exportLinks(a.id).slice(0, 1).map((l) => (
                      <a key={l.format} href={l.href} aria-label={`${l.label} of “${a.name}”`}>
                        PDF
                      </a>
                    ))}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </>
      )}
    </div>
  );
}
