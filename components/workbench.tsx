"use client";

import { useEffect, useRef, useState } from "react";
import type { AssessInput, AssessInputRaw } from "../lib/schema/assess-input";
import { AssessmentForm } from "./form/assessment-form";
import { ResultsView } from "./results/results-view";
import { JobProgress } from "./results/job-progress";
import { apiRequest, type FieldIssue, type JobStatus, type SavedAssessment } from "./api-client";

const POLL_INTERVAL_MS = 500;

type Run =
  | { state: "idle" }
  | { state: "computing" }
  | { state: "job"; id: string; progress: number; jobState: string }
  | { state: "done"; input: AssessInput; result: unknown }
  | { state: "failed"; message: string; issues?: FieldIssue[] };

/**
 * The assessment page: the form, the computation (directly, or as a background job for Monte Carlo runs with
 * progress and cancel; the page stays responsive because the work runs on the server), the results and saving.
 */
export function Workbench({ initialValues, fromName }: { initialValues?: AssessInputRaw; fromName?: string }) {
  const [run, setRun] = useState<Run>({ state: "idle" });
  const [saved, setSaved] = useState<SavedAssessment | null>(null);
  const [saveMessage, setSaveMessage] = useState<string | null>(null);
  const [saveName, setSaveName] = useState("");
  const abortRef = useRef<AbortController | null>(null);
  const jobRef = useRef<string | null>(null);
  const resultsRef = useRef<HTMLDivElement>(null);

  useEffect(() => () => abortRef.current?.abort(), []);
  useEffect(() => {
    if (run.state === "done" || run.state === "failed") resultsRef.current?.querySelector<HTMLElement>("h2, [role=alert]")?.focus();
  }, [run.state]);

  const submit = async (input: AssessInput) => {
    abortRef.current?.abort();
    const controller = new AbortController();
    abortRef.current = controller;
    setSaved(null);
    setSaveMessage(null);
    setSaveName(input.project?.name ?? "");
    if (input.options.monteCarlo) {
      const started = await apiRequest<JobStatus>("/api/v1/assess/jobs", { method: "POST", json: input, signal: controller.signal });
      if (!started.ok) return setRun({ state: "failed", message: started.message, issues: started.issues });
      jobRef.current = started.value.id;
      setRun({ state: "job", id: started.value.id, progress: started.value.progress ?? 0, jobState: started.value.state });
      for (;;) {
        await new Promise((r) => setTimeout(r, POLL_INTERVAL_MS));
        if (controller.signal.aborted || jobRef.current !== started.value.id) return;
        const status = await apiRequest<JobStatus>(`/api/v1/assess/jobs/${encodeURIComponent(started.value.id)}`, { signal: controller.signal });
        if (!status.ok) return setRun({ state: "failed", message: status.message });
        const s = status.value;
        if (s.state === "succeeded") return setRun({ state: "done", input, result: s.result });
        if (s.state === "cancelled") return setRun({ state: "failed", message: "The Monte Carlo run was cancelled." });
        if (s.state === "failed") return setRun({ state: "failed", message: s.error?.message ?? "The run failed.", issues: s.error?.issues });
        setRun({ state: "job", id: s.id, progress: s.progress, jobState: s.state });
      }
    }
    setRun({ state: "computing" });
    const outcome = await apiRequest<unknown>("/api/v1/assess", { method: "POST", json: input, signal: controller.signal });
    if (controller.signal.aborted) return;
    setRun(outcome.ok ? { state: "done", input, result: outcome.value } : { state: "failed", message: outcome.message, issues: outcome.issues });
  };

  const cancel = async () => {
    const id = jobRef.current;
    abortRef.current?.abort();
    jobRef.current = null;
    if (id) await apiRequest(`/api/v1/assess/jobs/${encodeURIComponent(id)}`, { method: "DELETE" });
    setRun({ state: "failed", message: "The computation was cancelled." });
  };

  const save = async () => {
    if (run.state !== "done") return;
    const name = saveName.trim() || run.input.project?.name || "Assessment";
    const outcome = await apiRequest<SavedAssessment>("/api/v1/assessments", { method: "POST", json: { name, inputs: run.input, result: run.result } });
    if (outcome.ok) {
      setSaved(outcome.value);
      setSaveMessage(`Saved as “${outcome.value.name}”.`);
    } else setSaveMessage(`Not saved: ${outcome.issues?.map((i) => i.message).join("; ") ?? outcome.message}`);
  };

  return (
    <div className="workbench">
      {fromName ? (
        <p className="demo-banner" role="status">
          Input loaded from the saved assessment “{fromName}”. Running it computes afresh with today’s data set and engine.
        </p>
      ) : null}
      <AssessmentForm onSubmit={submit} initialValues={initialValues} busy={run.state === "computing" || run.state === "job"} />
      <div ref={resultsRef} className="run-output">
        {run.state === "computing" ? (
          <div className="job-progress">
            <p>Computing the assessment on the server…</p>
            <button type="button" className="secondary" onClick={cancel}>
              Cancel
            </button>
          </div>
        ) : null}
        {run.state === "job" ? <JobProgress fraction={run.progress} state={run.jobState} onCancel={cancel} /> : null}
        {run.state === "failed" ? (
          <div className="error-summary" role="alert" tabIndex={-1}>
            <h3>
              <span aria-hidden="true">⚠ </span>
              {run.message}
            </h3>
            {run.issues ? (
              <ul>
                {run.issues.map((i) => (
                  <li key={`${i.path}:${i.message}`}>
                    <code>{i.path}</code>: {i.message}
                  </li>
                ))}
              </ul>
            ) : null}
          </div>
        ) : null}
        {run.state === "done" ? (
          <>
            <ResultsView result={run.result} />
            <section className="save-bar no-print" aria-labelledby="save-title">
              <h3 id="save-title">Save to the project files</h3>
              <div className="row">
                <div className="field">
                  <label htmlFor="save-name">Name of the saved assessment</label>
                  <input id="save-name" type="text" value={saveName} onChange={(e) => setSaveName(e.target.value)} />
                </div>
                <button type="button" className="primary" onClick={save}>
                  Save assessment
                </button>
              </div>
              {saveMessage ? <p role="status">{saveMessage}</p> : null}
              {saved ? (
                <p>
                  <a href={`/projects/${encodeURIComponent(saved.id)}`}>Open the saved assessment</a> · <a href="/projects">All project files</a>
                </p>
              ) : null}
            </section>
          </>
        ) : null}
      </div>
    </div>
  );
}
