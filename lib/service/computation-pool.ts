import type { Worker } from "node:worker_threads";
import { domainError, type ServiceOutcome } from "./outcome";
import { missingFileMessage, resolveWorkerFiles, startWorkerThread, WorkerJobError, type WorkerModule } from "./worker-job-runner";

/**
 * A small pool of long-lived worker threads for computations on the request path (`POST /api/v1/assess`),
 * so that the server's main thread keeps answering other requests while one computes. A job's own worker
 * (`worker-job-runner.ts`) pays the start-up (tsx, the data set, JIT warm-up) on every job; a pool worker pays
 * it once and is reused.
 * - Workers start on first use, at most `size` of them; requests wait in a FIFO queue and are sent to an idle
 *   worker as `{ id, raw }` messages (entry `job-worker-bootstrap.cjs` in its pool mode).
 * - A request's AbortSignal removes it from the queue, or, once it runs, terminates its worker: the outcome is
 *   the typed `cancelled` error, and the next request starts a fresh worker.
 * - A worker that crashes rejects only its current request, with a `WorkerJobError` (the caller reports it as
 *   internal, without stack), and is replaced for the next one.
 * - Idle workers are unref'd, so an idle pool keeps no process alive.
 * - At most `maxQueued` requests wait: one more is answered at once with the typed `busy` error (503 on the routes),
 *   rather than waiting out its time limit behind the others.
 */
export type PoolRunOptions = {
  signal?: AbortSignal;
  onProgress?: (fraction: number) => void;
  /** Called when the request leaves the queue for a worker (a job registry then reports it running, not queued). */
  onStart?: () => void;
};

export type PoolStats = { workers: number; busy: number; queued: number };

export type ComputationPool<T> = {
  /** The module's function applied to `raw` in a pool worker. */
  run(raw: unknown, options?: PoolRunOptions): Promise<ServiceOutcome<T>>;
  stats(): PoolStats;
  /**
   * Starts the workers now, up to the pool's size, and has each load its module and run the module's `warmUp` export
   * if it has one, with `options` (a server calls this at start, so that the first request does not wait for it).
   * Missing worker files are left for the first request to report.
   */
  warm(options?: unknown): void;
  /** Cancels every queued and running request and terminates the workers; a later `run` starts new ones. */
  close(): Promise<void>;
};

export type ComputationPoolOptions = {
  /** Worker threads at most (default 1). */
  size?: number;
  /** Requests that may wait for a worker (default: no bound). */
  maxQueued?: number;
};

/** Pool sizes accepted: a bound against typing errors, not a tuning (common practice). */
export const POOL_SIZE_LIMITS = { min: 1, max: 16 } as const;

export type PoolSizeError<F extends string = string> = { code: "invalid_pool_size"; field: F; value: string; min: number; max: number };

/**
 * A pool size from an environment variable's text: unset or empty gives the default; anything but an integer within
 * the limits (default POOL_SIZE_LIMITS) is an error naming the variable.
 */
export function poolSizeFrom<F extends string>(
  field: F,
  text: string | undefined,
  defaultSize: number,
  limits: { min: number; max: number } = POOL_SIZE_LIMITS,
): { ok: true; value: number } | { ok: false; error: PoolSizeError<F> } {
  if (text === undefined || text.trim() === "") return { ok: true, value: defaultSize };
  const value = Number(text);
  if (Number.isInteger(value) && value >= limits.min && value <= limits.max) return { ok: true, value };
  return { ok: false, error: { code: "invalid_pool_size", field, value: text, min: limits.min, max: limits.max } };
}

/**
 * The size to start a pool with from a parsed environment variable (`poolSizeFrom`): an invalid value is reported in
 * one log line naming the variable and its limits, and the default is used, so a typing error never stops the server.
 */
export function sizeOrDefault(parsed: { ok: true; value: number } | { ok: false; error: PoolSizeError }, defaultSize: number): number {
  if (!parsed.ok) console.error(JSON.stringify({ level: "warn", ...parsed.error, using: defaultSize }));
  return parsed.ok ? parsed.value : defaultSize;
}

type PoolMessage<T> =
  | { type: "progress"; id: number; fraction: number }
  | { type: "outcome"; id: number; outcome: ServiceOutcome<T> }
  | { type: "error"; id: number; message: string };

type Request<T> = {
  id: number;
  raw: unknown;
  options: PoolRunOptions;
  resolve: (outcome: ServiceOutcome<T>) => void;
  reject: (error: Error) => void;
  abort: () => void;
};

type Slot<T> = { worker: Worker; state: "idle" | "busy" | "stopping"; request: Request<T> | null };

const cancelledQueued = () => domainError("cancelled", "the computation was cancelled before it started");
const cancelledRunning = () => domainError("cancelled", "the computation's worker was stopped");
const queueFull = (maxQueued: number) => domainError("busy", `the service is busy: ${maxQueued} computations are already waiting; try again shortly`, { maxQueued });

export function createComputationPool<T>(module: WorkerModule, options: ComputationPoolOptions = {}): ComputationPool<T> {
  const size = options.size ?? 1;
  if (!Number.isInteger(size) || size < POOL_SIZE_LIMITS.min || size > POOL_SIZE_LIMITS.max)
    throw new RangeError(`pool size must be an integer from ${POOL_SIZE_LIMITS.min} to ${POOL_SIZE_LIMITS.max}, got ${size}`);
  const maxQueued = options.maxQueued ?? Number.POSITIVE_INFINITY;
  if (!(maxQueued >= 0)) throw new RangeError(`maxQueued must be 0 or more, got ${maxQueued}`);
  const queue: Request<T>[] = [];
  const slots = new Set<Slot<T>>();
  let nextId = 1;

  /** Ends a request once: detaches its abort listener and frees its worker (unless that is being stopped). */
  function release(slot: Slot<T> | null, request: Request<T>) {
    request.options.signal?.removeEventListener("abort", request.abort);
    if (slot && slot.request === request) {
      slot.request = null;
      if (slot.state === "busy") {
        slot.state = "idle";
        slot.worker.unref();
      }
    }
  }

  function stop(slot: Slot<T>) {
    slot.state = "stopping";
    slot.request = null;
    void slot.worker.terminate();
  }

  function startWorker(modulePath: string): Slot<T> {
    const worker = startWorkerThread({ mode: "pool", modulePath, exportName: module.exportName });
    const slot: Slot<T> = { worker, state: "idle", request: null };
    slots.add(slot);
    worker.on("message", (message: PoolMessage<T>) => {
      const request = slot.request;
      if (!request || request.id !== message.id) return; // a late answer to a request already ended
      if (message.type === "progress") return request.options.onProgress?.(message.fraction);
      release(slot, request);
      if (message.type === "outcome") request.resolve(message.outcome);
      else request.reject(new WorkerJobError(message.message));
      dispatch();
    });
    // A crash: only the current request fails; the exit that follows frees the place for a new worker.
    worker.on("error", (caught) => {
      const request = slot.request;
      slot.state = "stopping";
      if (request) {
        release(slot, request);
        slot.request = null;
        request.reject(new WorkerJobError(caught instanceof Error ? caught.message : String(caught)));
      }
    });
    worker.on("exit", (code) => {
      slots.delete(slot);
      const request = slot.request;
      if (request) {
        release(slot, request);
        request.reject(new WorkerJobError(`the computation's worker stopped (exit code ${code}) before it gave a result`));
      }
      dispatch();
    });
    return slot;
  }

  /** Sends queued requests to idle workers, starting workers up to `size`. */
  function dispatch() {
    while (queue.length > 0) {
      let slot = [...slots].find((s) => s.state === "idle");
      if (!slot) {
        if (slots.size >= size) return;
        const files = resolveWorkerFiles(module);
        if (!files.ok) {
          const request = queue.shift()!;
          release(null, request);
          request.reject(new WorkerJobError(missingFileMessage(files.missingPath)));
          continue;
        }
        slot = startWorker(files.modulePath);
      }
      const request = queue.shift()!;
      slot.state = "busy";
      slot.request = request;
      slot.worker.ref();
      try {
        slot.worker.postMessage({ id: request.id, raw: request.raw });
        request.options.onStart?.();
      } catch (caught) {
        release(slot, request);
        request.reject(new WorkerJobError(`the input cannot be sent to the worker: ${caught instanceof Error ? caught.message : String(caught)}`));
      }
    }
  }

  return {
    run(raw, runOptions = {}) {
      return new Promise<ServiceOutcome<T>>((resolve, reject) => {
        const { signal } = runOptions;
        if (signal?.aborted) return resolve(cancelledQueued());
        const mustWait = queue.length > 0 || (slots.size >= size && ![...slots].some((s) => s.state === "idle"));
        if (mustWait && queue.length >= maxQueued) return resolve(queueFull(maxQueued));
        const request: Request<T> = {
          id: nextId++,
          raw,
          options: runOptions,
          resolve,
          reject,
          abort: () => {
            const index = queue.indexOf(request);
            if (index >= 0) {
              queue.splice(index, 1);
              release(null, request);
              return resolve(cancelledQueued());
            }
            const slot = [...slots].find((s) => s.request === request);
            if (!slot) return; // already answered
            stop(slot); // its exit lets the next request start on a fresh worker
            release(null, request);
            resolve(cancelledRunning());
          },
        };
        signal?.addEventListener("abort", request.abort, { once: true });
        queue.push(request);
        dispatch();
      });
    },
    warm(options) {
      while (slots.size < size) {
        const files = resolveWorkerFiles(module);
        if (!files.ok) return;
        const slot = startWorker(files.modulePath);
        slot.worker.unref();
        slot.worker.postMessage({ warm: true, options });
      }
    },
    stats() {
      const all = [...slots];
      return { workers: all.length, busy: all.filter((s) => s.state === "busy").length, queued: queue.length };
    },
    async close() {
      for (const request of queue.splice(0)) {
        release(null, request);
        request.resolve(cancelledQueued());
      }
      const stopping: Promise<number>[] = [];
      for (const slot of slots) {
        const request = slot.request;
        if (request) {
          release(slot, request);
          request.resolve(cancelledRunning());
        }
        slot.state = "stopping";
        slot.request = null;
        stopping.push(slot.worker.terminate());
      }
      await Promise.all(stopping);
    },
  };
}
