/**
 * Next.js calls `register` once when the server starts. The workers of the assessment pool (`lib/service/assess-pool.ts`)
 * and of the job pool (`lib/service/assess-jobs.ts`, with its Monte Carlo sample worker) are started and warmed then, so
 * that the first `POST /api/v1/assess` or Monte Carlo job does not wait for a worker to start, load the data set and
 * compile the engine. Node.js runtime only: the pools use worker threads.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { assessmentPool } = await import("./lib/service/assess-pool");
  const { assessmentJobPool } = await import("./lib/service/assess-jobs");
  assessmentPool().warm();
  assessmentJobPool().warm({ monteCarlo: true });
}
