// The entry of a job's worker thread (lib/service/worker-job-runner.ts). It stays outside the Next bundle:
// the server starts it by path, and it loads the TypeScript module named in `workerData` with tsx (a runtime
// dependency, the same loader the CLI runs on), so the worker runs the very source the tests check.
// Plain CommonJS because a worker entry must be a file Node can run without a loader.
"use strict";

const { parentPort, workerData } = require("node:worker_threads");
const { require: requireTypeScript } = require("tsx/cjs/api");

/** Messages to the main thread: `{ type: "progress", fraction }`, then one `{ type: "outcome", outcome }` or `{ type: "error", message }`. */
function post(message) {
  parentPort.postMessage(message);
}

async function main() {
  const loaded = requireTypeScript(workerData.modulePath, __filename);
  const run = loaded[workerData.exportName];
  if (typeof run !== "function") throw new Error(`${workerData.modulePath} has no function ${workerData.exportName}`);
  const outcome = await run(workerData.raw, { onProgress: (fraction) => post({ type: "progress", fraction }) });
  post({ type: "outcome", outcome });
}

main().catch((caught) => {
  // Only the message crosses to the main thread, never the stack.
  post({ type: "error", message: caught instanceof Error ? caught.message : String(caught) });
});
