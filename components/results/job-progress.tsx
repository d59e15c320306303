"use client";

/** Progress of a background job (Monte Carlo run) with a cancel button; announced politely to screen readers. */
export function JobProgress({ fraction, state, onCancel }: { fraction: number; state: string; onCancel: () => void }) {
  const percent = Math.round(Math.max(0, Math.min(1, fraction)) * 100);
  return (
    <div className="job-progress" role="group" aria-labelledby="job-progress-label">
      <p id="job-progress-label">
        Monte Carlo run {state === "queued" ? "queued" : "in progress"}: <span aria-live="polite">{percent} %</span>
      </p>
      <progress max={100} value={percent} aria-labelledby="job-progress-label">
        {percent} %
      </progress>
      <button type="button" className="secondary" onClick={onCancel}>
        Cancel the run
      </button>
    </div>
  );
}
