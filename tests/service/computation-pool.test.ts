import { afterEach, describe, expect, it } from "vitest";
import { performance } from "node:perf_hooks";
import { threadId } from "node:worker_threads";
import { culvertDemo } from "../../lib/demo/culvert-demo";
import { runAssessment, type AssessmentResult } from "../../lib/service/assess";
import { assessmentWorkerModule } from "../../lib/service/assess-jobs";
import { createComputationPool, type ComputationPool, type PoolRunOptions } from "../../lib/service/computation-pool";
import { jsonComputation } from "../../lib/service/http";
import { WorkerJobError } from "../../lib/service/worker-job-runner";
import type { FixtureRequest, FixtureResult } from "./computation-pool-fixture";

const pools: ComputationPool<unknown>[] = [];
afterEach(async () => {
  for (const created of pools.splice(0)) await created.close();
});

function assessmentPool(): ComputationPool<AssessmentResult> {
  const created = createComputationPool<AssessmentResult>(assessmentWorkerModule);
  pools.push(created as ComputationPool<unknown>);
  return created;
}

/** A pool of the fixture's `act`, with its requests typed. */
function fixturePool(size = 1, maxQueued?: number) {
  const created = createComputationPool<FixtureResult>({ modulePath: "tests/service/computation-pool-fixture.ts", exportName: "act" }, { size, maxQueued });
  pools.push(created as ComputationPool<unknown>);
  return { pool: created, run: (request: FixtureRequest, options?: PoolRunOptions) => created.run(request, options) };
}

/** The value of a successful outcome, or a failure that shows the outcome. */
function valueOf<T>(outcome: { ok: true; value: T } | { ok: false }): T {
  if (!outcome.ok) throw new Error(`expected success, got ${JSON.stringify(outcome)}`);
  return outcome.value;
}

/**
 * Event-loop delay of this (the main) thread: a chain of 10 ms timers, each recording how late it fired.
 * A computation on this thread delays the pending timer by its whole duration.
 */
function watchEventLoop(periodMs = 10) {
  let expected = performance.now() + periodMs;
  let maxLateMs = 0;
  let ticks = 0;
  const tick = () => {
    const now = performance.now();
    maxLateMs = Math.max(maxLateMs, now - expected);
    ticks++;
    expected = now + periodMs;
    timer = setTimeout(tick, periodMs);
  };
  let timer = setTimeout(tick, periodMs);
  return {
    stop() {
      clearTimeout(timer);
      // The timer still pending counts too: it would be late by the whole computation were it on this thread.
      maxLateMs = Math.max(maxLateMs, performance.now() - expected);
      return { maxLateMs, ticks };
    },
  };
}

/** A bad input whose error the assessment finds only with the data set (an unknown phase id). */
const unknownPhase = { ...culvertDemo, options: { ...culvertDemo.options, suppressedPhases: ["no-such-phase"] } };

describe("the computation pool", () => {
  it("gives the very outcome of runAssessment called directly, for the demo and for bad input", async () => {
    const assess = assessmentPool();
    // The pool's worker starts and computes while this thread computes the direct result (both load cold).
    const throughPoolPromise = assess.run(culvertDemo);
    const direct = await runAssessment(culvertDemo);
    const throughPool = await throughPoolPromise;
    expect(throughPool.ok, JSON.stringify(throughPool)).toBe(true);
    expect(throughPool).toEqual(direct);
    // What the route sends: the same JSON text.
    expect(JSON.stringify(throughPool)).toBe(JSON.stringify(direct));
    const poolError = await assess.run(unknownPhase);
    expect(poolError).toEqual(await runAssessment(unknownPhase));
    expect(poolError).toMatchObject({ ok: false, error: { kind: "validation", issues: [{ path: "options.suppressedPhases.0" }] } });
    expect(assess.stats()).toEqual({ workers: 1, busy: 0, queued: 0 });
  });

  it("answers two concurrent requests, first in first out, on the one long-lived worker", async () => {
    const { pool, run } = fixturePool();
    const [first, second] = (await Promise.all([run({ action: "busy", tag: "first", ms: 50 }), run({ action: "busy", tag: "second", ms: 50 })])).map(valueOf);
    expect(first.ran).toEqual(["first"]);
    expect(second.ran).toEqual(["first", "second"]);
    expect(second.threadId).toBe(first.threadId);
    expect(first.threadId).not.toBe(threadId);
    expect(pool.stats()).toEqual({ workers: 1, busy: 0, queued: 0 });
  });

  it("warms up: starts its workers at once, each runs the module's warmUp export before the first request, and a second warm-up starts no more", async () => {
    const { pool, run } = fixturePool(2);
    pool.warm();
    expect(pool.stats()).toEqual({ workers: 2, busy: 0, queued: 0 });
    pool.warm();
    expect(pool.stats().workers).toBe(2);
    const first = valueOf(await run({ action: "busy", tag: "first", ms: 1 }));
    expect(first.ran).toEqual(["warm-up", "first"]);
  });

  it("passes the warm-up's options to the module's warmUp export", async () => {
    const { pool, run } = fixturePool(1);
    pool.warm({ monteCarlo: true });
    expect(valueOf(await run({ action: "busy", tag: "first", ms: 1 })).ran).toEqual(['warm-up {"monteCarlo":true}', "first"]);
  });

  it("answers a request beyond maxQueued waiting ones at once as busy, and takes requests again once the queue drains", async () => {
    const { pool, run } = fixturePool(1, 1);
    const first = run({ action: "busy", tag: "first", ms: 300 });
    const waiting = run({ action: "busy", tag: "waiting", ms: 10 });
    const started = performance.now();
    const refused = await run({ action: "busy", tag: "refused", ms: 10 });
    expect(performance.now() - started).toBeLessThan(100); // answered without waiting for the worker (300 ms busy)
    expect(refused).toMatchObject({ ok: false, error: { kind: "domain", code: "busy", detail: { maxQueued: 1 } } });
    expect(pool.stats()).toMatchObject({ busy: 1, queued: 1 });
    expect(valueOf(await first).tag).toBe("first");
    const ranSoFar = valueOf(await waiting).ran;
    expect(ranSoFar).toEqual(["first", "waiting"]);
    // With the worker idle and nothing queued, a request is taken even though maxQueued is 1.
    expect(valueOf(await run({ action: "busy", tag: "later", ms: 10 })).ran).toEqual(["first", "waiting", "later"]);
  });

  it("never runs a request cancelled while it waits in the queue", async () => {
    const { pool, run } = fixturePool();
    const running = run({ action: "busy", tag: "running", ms: 200 });
    const controller = new AbortController();
    const queued = run({ action: "busy", tag: "cancelled", ms: 10 }, { signal: controller.signal });
    expect(pool.stats()).toMatchObject({ busy: 1, queued: 1 });
    controller.abort();
    expect(await queued).toMatchObject({ ok: false, error: { kind: "domain", code: "cancelled" } });
    expect(pool.stats().queued).toBe(0);
    // A signal aborted before the call: the request is not even queued.
    expect(await run({ action: "busy", tag: "never", ms: 10 }, { signal: AbortSignal.abort() })).toMatchObject({ ok: false, error: { code: "cancelled" } });
    const after = valueOf(await run({ action: "busy", tag: "after", ms: 10 }));
    valueOf(await running);
    expect(after.ran).toEqual(["running", "after"]);
  });

  it("terminates the worker of a request cancelled while it computes, and the next request succeeds on a new worker", async () => {
    const { pool, run } = fixturePool();
    const before = valueOf(await run({ action: "busy", tag: "before", ms: 1 }));
    const controller = new AbortController();
    const stuck = run({ action: "spin", tag: "stuck" }, { signal: controller.signal, onProgress: () => controller.abort() });
    const next = run({ action: "busy", tag: "next", ms: 1 });
    expect(await stuck).toMatchObject({ ok: false, error: { kind: "domain", code: "cancelled" } });
    const after = valueOf(await next);
    // A fresh worker: it has run only the request after the termination.
    expect(after.ran).toEqual(["next"]);
    expect(after.threadId).not.toBe(before.threadId);
    expect(pool.stats()).toEqual({ workers: 1, busy: 0, queued: 0 });
  });

  it("fails only the current request of a crashed worker, as an internal error without stack, and replaces the worker", async () => {
    const { pool, run } = fixturePool();
    const crashed = run({ action: "crash", tag: "crash" });
    const queuedBehind = run({ action: "busy", tag: "behind", ms: 1 });
    await expect(crashed).rejects.toThrow(WorkerJobError);
    await expect(crashed).rejects.toThrow("crash inside the pool worker");
    expect(valueOf(await queuedBehind).ran).toEqual(["behind"]);

    // Through the route wrapper: the 500 body of an unexpected failure, with a request id and no stack or message.
    const lines: string[] = [];
    const route = jsonComputation((body, signal) => pool.run(body, { signal }), { log: (line) => lines.push(line) });
    const request = new Request("http://localhost/api/v1/x", { method: "POST", body: JSON.stringify({ action: "crash", tag: "route" }) });
    const response = await route(request, { params: Promise.resolve({}) });
    expect(response.status).toBe(500);
    const text = await response.text();
    expect(JSON.parse(text)).toMatchObject({ error: "internal", requestId: expect.any(String) });
    expect(text).not.toContain("crash inside");
    expect(text).not.toMatch(/\bat \S+:\d+/);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toContain("crash inside the pool worker");

    // A failure inside the request's promise answers that request and keeps the worker.
    await expect(run({ action: "throw", tag: "throw" })).rejects.toThrow("boom inside the pool worker");
    const kept = valueOf(await run({ action: "busy", tag: "kept", ms: 1 }));
    // The route's crash replaced the worker before: this one has run the failing request and the next.
    expect(kept.ran).toEqual(["throw", "kept"]);
  });

  it("keeps the main thread's event loop free while a request computes for 600 ms", async () => {
    const { run } = fixturePool();
    valueOf(await run({ action: "busy", tag: "warm-up", ms: 1 }));
    let watch: ReturnType<typeof watchEventLoop> | undefined;
    const outcome = await run({ action: "busy", tag: "long", ms: 600 }, { onProgress: () => (watch = watchEventLoop()) });
    const delay = watch!.stop();
    valueOf(outcome);
    // Were the 600 ms loop on this thread, the pending 10 ms timer would be at least 590 ms late; 100 ms leaves room for a loaded machine.
    expect(delay.maxLateMs).toBeLessThan(100);
    expect(delay.ticks).toBeGreaterThanOrEqual(5);
  });
});
