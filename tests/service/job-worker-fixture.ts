import { threadId } from "node:worker_threads";

/**
 * Computations for the worker-runner tests, run inside a job's worker thread by
 * `lib/service/job-worker-bootstrap.cjs` (not a test file itself).
 */
type Progress = { onProgress: (fraction: number) => void };

/** Sums 1..n in steps, reporting progress, and says which thread it ran on. */
export async function sumInSteps(raw: unknown, { onProgress }: Progress) {
  const n = (raw as { n: number }).n;
  let sum = 0;
  for (let i = 1; i <= n; i++) {
    sum += i;
    onProgress(i / n);
  }
  return { ok: true as const, value: { sum, threadId } };
}

/**
 * Reports a quarter done, then computes without ever yielding. Run on the main thread this would freeze
 * the process for good; in a worker only `terminate()` ends it.
 */
export async function spinForever(_raw: unknown, { onProgress }: Progress) {
  onProgress(0.25);
  // Let the progress message leave before the loop takes the thread.
  await new Promise((resolve) => setTimeout(resolve, 20));
  let x = 0;
  for (;;) x = (x + 1) % 1_000_003;
}

/** Fails unexpectedly. */
export async function throwInside() {
  throw new Error("boom inside the worker");
}

/** Answers with a value that cannot cross to the main thread (a function). */
export async function uncloneableResult() {
  return { ok: true as const, value: { callback: () => 1 } };
}
