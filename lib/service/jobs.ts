import { randomUUID } from "node:crypto";
import type { ComputationPool } from "./computation-pool";
import { domainError, type ServiceError, type ServiceOutcome } from "./outcome";

/**
 * The registry of jobs for long computations (Monte Carlo assessments): started off the request path, polled
 * for progress, cancellable through an AbortSignal. Where the work runs is the runner's affair: the
 * assessment jobs use `poolJobRunner` (the long-lived workers of the job pool, `assess-jobs.ts`), tests may pass an
 * in-process runner or `workerJobRunner` (a worker thread per job). A job is "queued" until its runner reports
 * that it started (`onStart`; a runner that never does leaves it to the first progress report), then "running".
 * The registry is kept in memory: a restart forgets the jobs (the page then starts again). Finished jobs are kept
 * for `retentionMs` and then dropped; at most `maxActive` are queued or running at once, more → `busy` (503).
 */
export type JobState = "queued" | "running" | "succeeded" | "failed" | "cancelled";

export type JobStatus<T> = {
  id: string;
  state: JobState;
  /** 0–1, as reported by the computation. */
  progress: number;
  createdAt: string;
  finishedAt: string | null;
  result?: T;
  error?: ServiceError;
};

export type JobRunner<T> = (
  raw: unknown,
  options: { signal: AbortSignal; onProgress: (fraction: number) => void; onStart?: () => void },
) => Promise<ServiceOutcome<T>>;

/** A runner on a computation pool: the job waits in the pool's queue, then computes on a long-lived worker. */
export function poolJobRunner<T>(pool: () => Pick<ComputationPool<T>, "run">): JobRunner<T> {
  return (raw, options) => pool().run(raw, options);
}

export type JobRegistryOptions = {
  /** Jobs running at once (default 2). */
  maxActive?: number;
  /** Time a finished job stays available, ms (default 1 h). */
  retentionMs?: number;
  /** A running job is aborted after this, ms (default 10 min). */
  timeLimitMs?: number;
  now?: () => number;
};

type Job<T> = JobStatus<T> & { controller: AbortController; finishedAtMs: number | null; timer?: ReturnType<typeof setTimeout> };

export type JobRegistry<T> = {
  start(raw: unknown): ServiceOutcome<JobStatus<T>>;
  status(id: string): ServiceOutcome<JobStatus<T>>;
  cancel(id: string): ServiceOutcome<JobStatus<T>>;
  /** Ids of jobs currently queued or running. */
  activeCount(): number;
};

function publicStatus<T>(job: Job<T>): JobStatus<T> {
  const { controller: _c, finishedAtMs: _f, timer: _t, ...status } = job;
  return { ...status };
}

export function createJobRegistry<T>(runner: JobRunner<T>, options: JobRegistryOptions = {}): JobRegistry<T> {
  const maxActive = options.maxActive ?? 2;
  const retentionMs = options.retentionMs ?? 60 * 60 * 1000;
  const timeLimitMs = options.timeLimitMs ?? 10 * 60 * 1000;
  const now = options.now ?? Date.now;
  const jobs = new Map<string, Job<T>>();

  const isActive = (job: Job<T>) => job.state === "queued" || job.state === "running";

  function prune() {
    for (const [id, job] of jobs) if (job.finishedAtMs !== null && now() - job.finishedAtMs > retentionMs) jobs.delete(id);
  }

  function finish(job: Job<T>, state: JobState, fields: Partial<JobStatus<T>> = {}) {
    if (!isActive(job)) return;
    Object.assign(job, fields);
    job.state = state;
    job.finishedAtMs = now();
    job.finishedAt = new Date(job.finishedAtMs).toISOString();
    clearTimeout(job.timer);
  }

  async function execute(job: Job<T>, raw: unknown) {
    if (job.controller.signal.aborted) return;
    const started = () => {
      if (job.state === "queued") job.state = "running";
    };
    try {
      const outcome = await runner(raw, {
        signal: job.controller.signal,
        onStart: started,
        onProgress: (fraction) => {
          started();
          if (isActive(job) && Number.isFinite(fraction)) job.progress = Math.min(1, Math.max(job.progress, fraction));
        },
      });
      if (job.controller.signal.aborted) return; // already marked cancelled or timed out
      if (outcome.ok) finish(job, "succeeded", { result: outcome.value, progress: 1 });
      else finish(job, "failed", { error: outcome.error });
    } catch (caught) {
      // The one log line of an unexpected failure; the status carries no stack.
      console.error(JSON.stringify({ level: "error", job: job.id, message: caught instanceof Error ? caught.message : String(caught) }));
      finish(job, "failed", { error: { kind: "domain", code: "internal", message: "the computation failed unexpectedly" } });
    }
  }

  return {
    start(raw) {
      prune();
      const active = [...jobs.values()].filter(isActive).length;
      if (active >= maxActive) return domainError("busy", `at most ${maxActive} long computations run at once; try again shortly`, { maxActive });
      const id = randomUUID();
      const job: Job<T> = { id, state: "queued", progress: 0, createdAt: new Date(now()).toISOString(), finishedAt: null, controller: new AbortController(), finishedAtMs: null };
      job.timer = setTimeout(() => {
        if (!isActive(job)) return;
        job.controller.abort();
        finish(job, "failed", { error: { kind: "domain", code: "time_limit", message: `the computation did not finish within ${timeLimitMs} ms`, detail: { limitMs: timeLimitMs } } });
      }, timeLimitMs);
      jobs.set(id, job);
      // Off the request path: the computation starts after the response has been produced.
      setImmediate(() => void execute(job, raw));
      return { ok: true, value: publicStatus(job) };
    },
    status(id) {
      prune();
      const job = jobs.get(id);
      return job ? { ok: true, value: publicStatus(job) } : domainError("not_found", `no job with id ${id}`, { id });
    },
    cancel(id) {
      const job = jobs.get(id);
      if (!job) return domainError("not_found", `no job with id ${id}`, { id });
      if (isActive(job)) {
        job.controller.abort();
        finish(job, "cancelled");
      }
      return { ok: true, value: publicStatus(job) };
    },
    activeCount() {
      return [...jobs.values()].filter(isActive).length;
    },
  };
}
