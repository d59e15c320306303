import { describe, expect, it } from "vitest";
import { POST as assess } from "../../app/api/v1/assess/route";
import { POST as startJob } from "../../app/api/v1/assess/jobs/route";
import { DELETE as cancelJob, GET as jobStatus } from "../../app/api/v1/assess/jobs/[id]/route";
import { GET as health } from "../../app/api/v1/health/route";
import { assessmentJobPool } from "../../lib/service/assess-jobs";
import { culvertDemo } from "../../lib/demo/culvert-demo";
import { runningVersions } from "../../lib/service/versions";
import { context, json, jsonRequest } from "./request";

const monteCarlo = (samples: number) => ({ ...culvertDemo, options: { ...culvertDemo.options, monteCarlo: { samples, seed: 7 } } });

async function pollUntilFinished(id: string, timeoutMs = 120_000): Promise<Record<string, unknown>> {
  const started = Date.now();
  for (;;) {
    const status = await json(await jobStatus(jsonRequest(`/assess/jobs/${id}`, "GET"), context({ id })));
    if (!["queued", "running"].includes(status.state as string)) return status;
    if (Date.now() - started > timeoutMs) throw new Error(`job ${id} still ${status.state} after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

describe("POST /api/v1/assess", () => {
  it("answers 200 with the assessment: flags, cautions, scenarios and the running versions", async () => {
    const response = await assess(jsonRequest("/assess", "POST", culvertDemo), context());
    expect(response.status).toBe(200);
    const body = await json(response);
    expect(Array.isArray(body.flags)).toBe(true);
    expect((body.cautions as string[]).length).toBeGreaterThan(0);
    expect(body.scenarios).toHaveProperty("sulfate");
    expect(body.versions).toEqual(runningVersions());
  });

  it("answers 422 with the path and limit of a bad field", async () => {
    const response = await assess(jsonRequest("/assess", "POST", { ...culvertDemo, mix: { ...culvertDemo.mix, waterBinderRatio: 1.5 } }), context());
    expect(response.status).toBe(422);
    const issues = (await json(response)).issues as { path: string; message: string }[];
    expect(issues.some((i) => i.path === "mix.waterBinderRatio" && /0\.25 and 0\.80/.test(i.message))).toBe(true);
  });

  it("answers 413 for a body above the limit", async () => {
    const response = await assess(jsonRequest("/assess", "POST", { ...culvertDemo, padding: "x".repeat(270_000) }), context());
    expect(response.status).toBe(413);
  });
});

describe("the assessment job API", () => {
  it("starts a Monte Carlo job (202), reports progress, and gives the result with each flag's fired fraction", async () => {
    const started = await startJob(jsonRequest("/assess/jobs", "POST", monteCarlo(10)), context());
    expect(started.status).toBe(202);
    const job = await json(started);
    expect(job.state).toBe("queued");
    const finished = await pollUntilFinished(job.id as string);
    expect(finished.state, JSON.stringify(finished.error)).toBe("succeeded");
    expect(finished.progress).toBe(1);
    const result = finished.result as { flags: { robustness?: { samples: number; firedFraction: number; notEvaluated?: number } }[]; uncertainty: { samples: number; failedSamples: number } };
    expect(result.uncertainty.samples).toBe(10);
    expect(result.flags.length).toBeGreaterThan(0);
    for (const flag of result.flags) {
      // Every sample that succeeded either evaluated the flag or could not (its scenario failed there).
      expect(flag.robustness!.samples + (flag.robustness!.notEvaluated ?? 0)).toBe(10 - result.uncertainty.failedSamples);
      expect(flag.robustness!.firedFraction).toBeGreaterThanOrEqual(0);
      expect(flag.robustness!.firedFraction).toBeLessThanOrEqual(1);
    }
  });

  it("cancels a running job: the state becomes cancelled and stays so", async () => {
    const started = await json(await startJob(jsonRequest("/assess/jobs", "POST", monteCarlo(1000)), context()));
    const id = started.id as string;
    await new Promise((resolve) => setTimeout(resolve, 200));
    const cancelled = await cancelJob(jsonRequest(`/assess/jobs/${id}`, "DELETE"), context({ id }));
    expect(cancelled.status).toBe(200);
    expect((await json(cancelled)).state).toBe("cancelled");
    await new Promise((resolve) => setTimeout(resolve, 300));
    const later = await json(await jobStatus(jsonRequest(`/assess/jobs/${id}`, "GET"), context({ id })));
    expect(later.state).toBe("cancelled");
    expect(later.progress as number).toBeLessThan(1);
  });

  it("computes the job on the job pool's worker thread: other requests are answered meanwhile, and cancel ends the worker", async () => {
    const started = await json(await startJob(jsonRequest("/assess/jobs", "POST", monteCarlo(1000)), context()));
    const id = started.id as string;
    const statusOf = async () => json(await jobStatus(jsonRequest(`/assess/jobs/${id}`, "GET"), context({ id })));
    // Past the first progress report the assessment is computing in its worker.
    for (let waitedMs = 0; ((await statusOf()).progress as number) === 0; waitedMs += 50) {
      if (waitedMs > 120_000) throw new Error("the job reported no progress");
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    expect(assessmentJobPool().stats()).toMatchObject({ workers: 1, busy: 1 });
    const answer = await health(jsonRequest("/health", "GET"), context());
    expect(answer.status).toBe(200);
    expect((await statusOf()).state).toBe("running");
    await cancelJob(jsonRequest(`/assess/jobs/${id}`, "DELETE"), context({ id }));
    for (let waitedMs = 0; assessmentJobPool().stats().workers > 0; waitedMs += 20) {
      if (waitedMs > 30_000) throw new Error("the cancelled job's worker did not exit");
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
    expect((await statusOf()).state).toBe("cancelled");
  });

  it("keeps a second job queued while the job pool's one worker computes the first, then runs it on the same long-lived worker", async () => {
    const first = await json(await startJob(jsonRequest("/assess/jobs", "POST", monteCarlo(1000)), context()));
    const second = await json(await startJob(jsonRequest("/assess/jobs", "POST", monteCarlo(10)), context()));
    const statusOf = async (id: string) => json(await jobStatus(jsonRequest(`/assess/jobs/${id}`, "GET"), context({ id })));
    for (let waitedMs = 0; (await statusOf(first.id as string)).state !== "running"; waitedMs += 50) {
      if (waitedMs > 120_000) throw new Error("the first job did not start");
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    expect((await statusOf(second.id as string)).state).toBe("queued");
    expect(assessmentJobPool().stats()).toMatchObject({ busy: 1, queued: 1 });
    await cancelJob(jsonRequest(`/assess/jobs/${first.id}`, "DELETE"), context({ id: first.id as string }));
    const finished = await pollUntilFinished(second.id as string);
    expect(finished.state, JSON.stringify(finished.error)).toBe("succeeded");
    // A third job reuses the worker the second ran on: no worker is started or stopped in between.
    const third = await json(await startJob(jsonRequest("/assess/jobs", "POST", monteCarlo(10)), context()));
    expect((await pollUntilFinished(third.id as string)).state).toBe("succeeded");
    expect(assessmentJobPool().stats()).toEqual({ workers: 1, busy: 0, queued: 0 });
  }, 240_000);

  it("answers 422 at once for invalid input instead of starting a job", async () => {
    const response = await startJob(jsonRequest("/assess/jobs", "POST", { ...culvertDemo, mix: { ...culvertDemo.mix, waterBinderRatio: 0.1 } }), context());
    expect(response.status).toBe(422);
  });

  it("answers 404 for an unknown job", async () => {
    const response = await jobStatus(jsonRequest("/assess/jobs/nope", "GET"), context({ id: "nope" }));
    expect(response.status).toBe(404);
    expect((await json(response)).error).toBe("not_found");
    expect((await cancelJob(jsonRequest("/assess/jobs/nope", "DELETE"), context({ id: "nope" }))).status).toBe(404);
  });
});
