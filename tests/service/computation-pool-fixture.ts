import { threadId } from "node:worker_threads";

/**
 * The computation of the computation-pool tests, run inside a pool worker by
 * `lib/service/job-worker-bootstrap.cjs` (not a test file itself). The worker keeps this module loaded
 * between requests, so `ran` lists every request this worker has begun.
 */
type Progress = { onProgress: (fraction: number) => void };

export type FixtureRequest =
  /** Compute for `ms` without ever yielding (on the main thread this would stall every timer for `ms`). */
  | { action: "busy"; tag: string; ms: number }
  /** Compute without end: only terminating the worker stops it. */
  | { action: "spin"; tag: string }
  /** Crash the worker: an exception that nothing catches, outside the request's promise. */
  | { action: "crash"; tag: string }
  /** Fail inside the request's promise: the worker survives. */
  | { action: "throw"; tag: string };

export type FixtureResult = { tag: string; ran: string[]; threadId: number };

const ran: string[] = [];

/** The pool's warm-up (`ComputationPool.warm`): recorded like a request, as "warm-up" (with its options as JSON when given). */
export function warmUp(options?: unknown) {
  ran.push(options === undefined ? "warm-up" : `warm-up ${JSON.stringify(options)}`);
}

/** Records the tag, reports that it started (progress 0), then does its action; answers with the tags this worker has run. */
export async function act(raw: unknown, { onProgress }: Progress) {
  const request = raw as FixtureRequest;
  ran.push(request.tag);
  onProgress(0);
  if (request.action === "busy") {
    const until = Date.now() + request.ms;
    let spins = 0;
    while (Date.now() < until) spins++;
  } else if (request.action === "spin") {
    // Let the progress message leave before the loop takes the thread.
    await new Promise((resolve) => setTimeout(resolve, 20));
    let x = 0;
    for (;;) x = (x + 1) % 1_000_003;
  } else if (request.action === "crash") {
    setImmediate(() => {
      throw new Error("crash inside the pool worker");
    });
    return new Promise(() => undefined);
  } else if (request.action === "throw") {
    throw new Error("boom inside the pool worker");
  }
  const value: FixtureResult = { tag: request.tag, ran: [...ran], threadId };
  return { ok: true as const, value };
}
