import { afterEach, describe, expect, it, vi } from "vitest";
import { isMainThread, threadId } from "node:worker_threads";
import { createJobRegistry, type JobRegistry } from "../../lib/service/jobs";
import { liveWorkerCount, workerJobRunner } from "../../lib/service/worker-job-runner";

const fixture = (exportName: string) => workerJobRunner<unknown>({ modulePath: "tests/service/job-worker-fixture.ts", exportName });

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Polls until `check` holds; the bound only keeps a broken run from hanging (worker start-up loads tsx). */
async function until(check: () => boolean, what: string, limitMs = 60_000) {
  const started = Date.now();
  while (!check()) {
    if (Date.now() - started > limitMs) throw new Error(`gave up waiting for ${what}`);
    await sleep(20);
  }
}

const stateOf = (jobs: JobRegistry<unknown>, id: string) => {
  const status = jobs.status(id);
  if (!status.ok) throw new Error("job vanished");
  return status.value;
};

afterEach(async () => {
  await until(() => liveWorkerCount() === 0, "the workers of the test to exit");
});

describe("jobs computed in a worker thread", () => {
  it("run in another thread than the caller's, report progress by messages and give the worker's result", async () => {
    expect(isMainThread).toBe(true);
    const jobs = createJobRegistry<unknown>(fixture("sumInSteps"));
    const started = jobs.start({ n: 100 });
    const id = started.ok ? started.value.id : "";
    await until(() => !["queued", "running"].includes(stateOf(jobs, id).state), "the job to finish");
    const done = stateOf(jobs, id);
    expect(done.state).toBe("succeeded");
    expect(done.progress).toBe(1);
    // Gauss: 1 + 2 + … + 100 = 5050.
    const value = done.result as { sum: number; threadId: number };
    expect(value.sum).toBe(5050);
    expect(value.threadId).not.toBe(threadId);
  });

  it("keep the main thread answering while the computation never yields, and cancel stops the worker", async () => {
    const jobs = createJobRegistry<unknown>(fixture("spinForever"));
    const started = jobs.start({});
    const id = started.ok ? started.value.id : "";
    await until(() => stateOf(jobs, id).progress === 0.25, "the worker to report its first progress");
    expect(liveWorkerCount()).toBe(1);
    // The worker is now in a loop without end. Timers of the main thread still fire: were the loop on this
    // thread, none would, and this test would never get past the next line.
    let ticks = 0;
    const timer = setInterval(() => ticks++, 10);
    await until(() => ticks >= 5, "five timer ticks on the main thread");
    clearInterval(timer);
    expect(stateOf(jobs, id).state).toBe("running");

    const cancelled = jobs.cancel(id);
    expect(cancelled.ok && cancelled.value.state).toBe("cancelled");
    await until(() => liveWorkerCount() === 0, "the cancelled worker to exit");
    expect(stateOf(jobs, id).state).toBe("cancelled");
    expect(stateOf(jobs, id).progress).toBe(0.25);
  });

  it("terminate the worker when its signal aborts, as the registry does on cancel and at the time limit", async () => {
    const controller = new AbortController();
    const progress: number[] = [];
    const outcome = fixture("spinForever")({}, { signal: controller.signal, onProgress: (f) => progress.push(f) });
    await until(() => progress.length > 0, "the worker to start its loop");
    expect(liveWorkerCount()).toBe(1);
    controller.abort();
    expect(await outcome).toMatchObject({ ok: false, error: { kind: "domain", code: "cancelled" } });
    await until(() => liveWorkerCount() === 0, "the worker to exit");
    expect(progress).toEqual([0.25]);
  });

  it("report a failure inside the worker, or a result that cannot cross threads, as internal, without stack", async () => {
    const spy = vi.spyOn(console, "error").mockImplementation(() => undefined);
    for (const name of ["throwInside", "uncloneableResult"]) {
      const jobs = createJobRegistry<unknown>(fixture(name));
      const started = jobs.start({});
      const id = started.ok ? started.value.id : "";
      await until(() => stateOf(jobs, id).state === "failed", `${name} to fail`);
      expect(stateOf(jobs, id).error).toEqual({ kind: "domain", code: "internal", message: "the computation failed unexpectedly" });
    }
    const logged = spy.mock.calls.map((call) => String(call[0]));
    expect(logged[0]).toContain("boom inside the worker");
    expect(logged.every((line) => !line.includes("    at "))).toBe(true);
    spy.mockRestore();
  });

  it("fail with a message naming the missing file when the worker module is not there", async () => {
    const spy = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const jobs = createJobRegistry<unknown>(workerJobRunner({ modulePath: "lib/service/no-such-module.ts", exportName: "run" }));
    const started = jobs.start({});
    const id = started.ok ? started.value.id : "";
    await until(() => stateOf(jobs, id).state === "failed", "the job to fail");
    expect(String(spy.mock.calls[0][0])).toContain("no-such-module.ts is missing");
    spy.mockRestore();
  });
});
