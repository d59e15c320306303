import { performance } from "node:perf_hooks";

/** Median wall time of `repeats` calls of `fn`, in milliseconds, after `warmup` unmeasured calls. */
export function medianMs(fn: () => unknown, repeats = 50, warmup = 5): number {
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    fn();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  const mid = times.length >> 1;
  return times.length % 2 ? times[mid] : (times[mid - 1] + times[mid]) / 2;
}
