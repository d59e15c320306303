/**
 * Next.js calls `register` once when the server starts. The assessment pool's worker is started and warmed then
 * (`lib/service/assess-pool.ts`), so that the first `POST /api/v1/assess` does not wait for the worker to start, load
 * the data set and compile the engine. Node.js runtime only: the pool uses worker threads.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { assessmentPool } = await import("./lib/service/assess-pool");
  assessmentPool().warm();
}
