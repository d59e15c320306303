// Starts the production server on the embedded default store, building first when no build exists.
import { existsSync } from "node:fs";
import { spawnSync, spawn } from "node:child_process";

const nextBin = "node_modules/next/dist/bin/next";
if (!existsSync(".next/BUILD_ID")) {
  const build = spawnSync(process.execPath, [nextBin, "build"], { stdio: "inherit" });
  if (build.status !== 0) process.exit(build.status ?? 1);
}
const port = process.env.PORT ?? "3000";
const server = spawn(process.execPath, [nextBin, "start", "-p", port], { stdio: "inherit" });
server.on("exit", (code) => process.exit(code ?? 0));
for (const signal of ["SIGINT", "SIGTERM"]) process.on(signal, () => server.kill(signal));
