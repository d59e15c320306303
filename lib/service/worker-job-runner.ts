import { existsSync } from "node:fs";
import { isAbsolute, join } from "node:path";
import { Worker } from "node:worker_threads";
import type { JobRunner } from "./jobs";
import { domainError, type ServiceOutcome } from "./outcome";

/**
 * Worker threads for computations: the files and start-up shared with the computation pool (`computation-pool.ts`,
 * which the service's assessment jobs and `POST /api/v1/assess` use), and a job runner with a fresh worker per job
 * (`workerJobRunner`: for a computation that should not share a long-lived worker's memory), so the server's main
 * thread keeps answering requests while a long computation runs. The worker reports progress by messages and ends
 * with one outcome message; cancelling (or the registry's time limit) aborts the signal, which terminates the
 * worker at once, wherever the computation is.
 *
 * The worker's entry is `job-worker-bootstrap.cjs` beside this file, started by path and not bundled: it loads
 * the TypeScript module `modulePath` with tsx and calls its export `exportName(raw, { onProgress })`, which
 * returns a `ServiceOutcome`. Paths are taken from the project root, `HYDRASTATE_ROOT` or else the working
 * directory (`npm start`, `next start` and the tests all run there): bundled code has no reliable path of
 * its own source.
 */
export type WorkerModule = {
  /** The module the worker runs, relative to the project root (e.g. `lib/service/assess.ts`) or absolute. */
  modulePath: string;
  /** Its exported function `(raw, { onProgress }) => Promise<ServiceOutcome<T>>`. */
  exportName: string;
};

type WorkerMessage<T> = { type: "progress"; fraction: number } | { type: "outcome"; outcome: ServiceOutcome<T> } | { type: "error"; message: string };

const BOOTSTRAP_PATH = "lib/service/job-worker-bootstrap.cjs";

/** The project root the worker's files are found under. */
export function projectRoot(): string {
  return process.env.HYDRASTATE_ROOT ?? process.cwd();
}

// Not traced by the bundler: these files are run from the project directory, never copied into the build.
const fromRoot = (path: string) => (isAbsolute(path) ? path : join(/*turbopackIgnore: true*/ projectRoot(), path));

export type WorkerFiles = { ok: true; bootstrap: string; modulePath: string } | { ok: false; missingPath: string };

/** The bootstrap and the module of a worker, as absolute paths, or the first of them that is missing. */
export function resolveWorkerFiles(module: WorkerModule): WorkerFiles {
  const bootstrap = fromRoot(BOOTSTRAP_PATH);
  const modulePath = fromRoot(module.modulePath);
  for (const path of [bootstrap, modulePath]) if (!existsSync(path)) return { ok: false, missingPath: path };
  return { ok: true, bootstrap, modulePath };
}

/**
 * Starts a worker thread on the bootstrap. The bootstrap's path is written out in the `new Worker` call itself:
 * the bundler follows that expression to the ignored project root and leaves the file alone, whereas a path
 * handed in as a value (a parameter or a property) made it trace and compile the whole project, README and tests
 * included, which broke `next build`.
 */
export function startWorkerThread(workerData: Record<string, unknown>): Worker {
  return new Worker(fromRoot(BOOTSTRAP_PATH), { workerData });
}

/** The message of a missing worker file, with the remedy. */
export const missingFileMessage = (path: string) => `the job worker's file ${path} is missing (set HYDRASTATE_ROOT to the project directory)`;

/** Job workers started and not yet exited (for the tests and the health of the process; the computation pool counts its own). */
const liveWorkers = new Set<Worker>();

export function liveWorkerCount(): number {
  return liveWorkers.size;
}

/** Thrown into the registry (which logs the message and reports an internal failure) when the worker cannot do its job. */
export class WorkerJobError extends Error {}

export function workerJobRunner<T>(module: WorkerModule): JobRunner<T> {
  return (raw, { signal, onProgress, onStart }) =>
    new Promise<ServiceOutcome<T>>((resolve, reject) => {
      if (signal.aborted) return resolve(domainError("cancelled", "cancelled before the worker started"));
      const files = resolveWorkerFiles(module);
      if (!files.ok) return reject(new WorkerJobError(missingFileMessage(files.missingPath)));

      const worker = startWorkerThread({ modulePath: files.modulePath, exportName: module.exportName, raw });
      liveWorkers.add(worker);
      onStart?.();
      let settled = false;
      const settle = (finish: () => void) => {
        if (settled) return;
        settled = true;
        signal.removeEventListener("abort", stop);
        finish();
      };
      // Cancel and time limit: the worker is stopped wherever it is; the registry has already set the state.
      const stop = () => {
        settle(() => resolve(domainError("cancelled", "the job's worker was stopped")));
        void worker.terminate();
      };
      signal.addEventListener("abort", stop, { once: true });

      worker.on("message", (message: WorkerMessage<T>) => {
        if (message.type === "progress") onProgress(message.fraction);
        else if (message.type === "outcome") settle(() => resolve(message.outcome));
        else if (message.type === "error") settle(() => reject(new WorkerJobError(message.message)));
      });
      worker.on("error", (caught) => settle(() => reject(new WorkerJobError(caught instanceof Error ? caught.message : String(caught)))));
      worker.on("exit", (code) => {
        liveWorkers.delete(worker);
        settle(() => reject(new WorkerJobError(`the job's worker stopped (exit code ${code}) before it gave a result`)));
      });
    });
}
