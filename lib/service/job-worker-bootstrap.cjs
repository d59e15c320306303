// The entry of a computation's worker thread: a job's own worker (lib/service/worker-job-runner.ts) or a
// long-lived worker of the computation pool (lib/service/computation-pool.ts). It stays outside the Next
// bundle: the server starts it by path, and it loads the TypeScript module named in `workerData` with tsx (a
// runtime dependency, the same loader the CLI runs on), so the worker runs the very source the tests check.
// Plain CommonJS because a worker entry must be a file Node can run without a loader.
"use strict";

const { parentPort, workerData } = require("node:worker_threads");
const { require: requireTypeScript } = require("tsx/cjs/api");

function post(message) {
  parentPort.postMessage(message);
}

/** Only the message crosses to the main thread, never the stack. */
const messageOf = (caught) => (caught instanceof Error ? caught.message : String(caught));

/** The module, loaded on first use (a pool worker keeps it, with the data set it loads, for later requests). */
let loadedModule;
function loadModule() {
  loadedModule ??= requireTypeScript(workerData.modulePath, __filename);
  return loadedModule;
}

/** The module's function. */
function computation() {
  const run = loadModule()[workerData.exportName];
  if (typeof run !== "function") throw new Error(`${workerData.modulePath} has no function ${workerData.exportName}`);
  return run;
}

/**
 * A pool worker's warm-up (`ComputationPool.warm`): load the module and run its `warmUp(options)` export, if it has one, so
 * that the first request finds the code compiled. Nothing is answered; a failure here shows again, reported, at the
 * first request.
 */
async function warmUp(options) {
  try {
    const warm = loadModule().warmUp;
    if (typeof warm === "function") await warm(options);
  } catch {
    // reported by the first request
  }
}

/** A job: one computation of `workerData.raw`; messages `{ type: "progress", fraction }`, then one `{ type: "outcome", outcome }` or `{ type: "error", message }`. */
async function runJob() {
  const outcome = await computation()(workerData.raw, { onProgress: (fraction) => post({ type: "progress", fraction }) });
  post({ type: "outcome", outcome });
}

/**
 * A pool worker: computes each `{ id, raw }` it is sent, one at a time, and answers with the same messages
 * carrying the request's `id`. A failure (or an outcome that cannot cross threads) answers only that request.
 * `{ warm: true, options }` asks for the warm-up, with the options given to `warm`.
 */
function servePool() {
  parentPort.on("message", async ({ id, raw, warm, options }) => {
    if (warm) return warmUp(options);
    try {
      const outcome = await computation()(raw, { onProgress: (fraction) => post({ type: "progress", id, fraction }) });
      post({ type: "outcome", id, outcome });
    } catch (caught) {
      post({ type: "error", id, message: messageOf(caught) });
    }
  });
}

if (workerData.mode === "pool") servePool();
else runJob().catch((caught) => post({ type: "error", message: messageOf(caught) }));
