import { afterEach, describe, expect, it, vi } from "vitest";
import { createJobRegistry, type JobRunner } from "../../lib/service/jobs";

afterEach(() => vi.useRealTimers());

const tick = () => new Promise((resolve) => setImmediate(resolve));

/** A runner that reports progress in steps and waits for `release` between them, honouring the signal. */
function steppedRunner(steps: number) {
  const gates: (() => void)[] = [];
  const runner: JobRunner<{ steps: number }> = async (_raw, { signal, onProgress }) => {
    for (let i = 1; i <= steps; i++) {
      await new Promise<void>((resolve) => gates.push(resolve));
      if (signal.aborted) return { ok: false, error: { kind: "domain", code: "cancelled", message: "cancelled" } };
      onProgress(i / steps);
    }
    return { ok: true, value: { steps } };
  };
  const release = async () => {
    await tick();
    gates.shift()?.();
    await tick();
  };
  return { runner, release };
}

describe("the job registry", () => {
  it("starts a job queued, runs it off the call, reports progress and then the result", async () => {
    const { runner, release } = steppedRunner(2);
    const jobs = createJobRegistry(runner);
    const started = jobs.start({});
    expect(started.ok && started.value.state).toBe("queued");
    const id = started.ok ? started.value.id : "";
    await release();
    const midway = jobs.status(id);
    expect(midway.ok && [midway.value.state, midway.value.progress]).toEqual(["running", 0.5]);
    await release();
    const done = jobs.status(id);
    expect(done.ok && [done.value.state, done.value.progress, done.value.result]).toEqual(["succeeded", 1, { steps: 2 }]);
  });

  it("keeps a job queued until its runner reports that it started (a pool's queue), then running", async () => {
    let start: (() => void) | undefined;
    let finish: (() => void) | undefined;
    const runner: JobRunner<string> = (_raw, { onStart }) =>
      new Promise((resolve) => {
        start = onStart;
        finish = () => resolve({ ok: true, value: "done" });
      });
    const jobs = createJobRegistry(runner);
    const started = jobs.start({});
    const id = started.ok ? started.value.id : "";
    await tick();
    expect(jobs.status(id).ok && (jobs.status(id) as { value: { state: string } }).value.state).toBe("queued");
    start!();
    expect((jobs.status(id) as { value: { state: string } }).value.state).toBe("running");
    finish!();
    await tick();
    expect((jobs.status(id) as { value: { state: string } }).value.state).toBe("succeeded");
  });

  it("cancels a running job through its AbortSignal", async () => {
    const { runner, release } = steppedRunner(3);
    const jobs = createJobRegistry(runner);
    const started = jobs.start({});
    const id = started.ok ? started.value.id : "";
    await release();
    const cancelled = jobs.cancel(id);
    expect(cancelled.ok && cancelled.value.state).toBe("cancelled");
    await release();
    const after = jobs.status(id);
    expect(after.ok && after.value.state).toBe("cancelled");
    expect(jobs.activeCount()).toBe(0);
  });

  it("records a failed computation's error and an unexpected throw as internal, without stack", async () => {
    const failing = createJobRegistry<never>(async () => ({ ok: false, error: { kind: "validation", issues: [{ path: "mix", message: "required" }] } }));
    const a = failing.start({});
    await tick();
    await tick();
    const status = failing.status(a.ok ? a.value.id : "");
    expect(status.ok && status.value.error).toEqual({ kind: "validation", issues: [{ path: "mix", message: "required" }] });
    const spy = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const throwing = createJobRegistry<never>(async () => {
      throw new Error("boom");
    });
    const b = throwing.start({});
    await tick();
    await tick();
    const thrown = throwing.status(b.ok ? b.value.id : "");
    expect(thrown.ok && thrown.value.error).toEqual({ kind: "domain", code: "internal", message: "the computation failed unexpectedly" });
    expect(spy).toHaveBeenCalledTimes(1);
    spy.mockRestore();
  });

  it("refuses more than maxActive jobs at once as busy", () => {
    const jobs = createJobRegistry(steppedRunner(1).runner, { maxActive: 1 });
    expect(jobs.start({}).ok).toBe(true);
    const second = jobs.start({});
    expect(!second.ok && second.error).toMatchObject({ kind: "domain", code: "busy" });
  });

  it("fails a job that passes its time limit and aborts it", async () => {
    vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout"] });
    const { runner } = steppedRunner(1);
    const jobs = createJobRegistry(runner, { timeLimitMs: 1000 });
    const started = jobs.start({});
    vi.advanceTimersByTime(1001);
    const status = jobs.status(started.ok ? started.value.id : "");
    expect(status.ok && status.value.state).toBe("failed");
    expect(status.ok && status.value.error).toMatchObject({ kind: "domain", code: "time_limit" });
  });

  it("answers not_found for an unknown id and forgets finished jobs after the retention time", async () => {
    let nowMs = 0;
    const jobs = createJobRegistry(async () => ({ ok: true, value: 1 }), { retentionMs: 1000, now: () => nowMs });
    expect(jobs.status("nope").ok).toBe(false);
    const started = jobs.start({});
    await tick();
    await tick();
    const id = started.ok ? started.value.id : "";
    expect(jobs.status(id).ok).toBe(true);
    nowMs = 2000;
    const gone = jobs.status(id);
    expect(!gone.ok && gone.error).toMatchObject({ code: "not_found" });
  });
});
