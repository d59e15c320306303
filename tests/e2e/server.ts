import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, rmSync, statSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";

/**
 * The production server for the browser tests: `next build` when there is no build (or the sources are newer
 * than it), then `next start` on a free port with `HYDRASTATE_DB` in a temporary directory; resolves once
 * `/api/health` answers, and `stop()` ends that one process and removes the temporary files.
 */
export const REPO_ROOT = resolve(__dirname, "../..");
const NEXT_BIN = join(REPO_ROOT, "node_modules/next/dist/bin/next");
const BUILD_ID = join(REPO_ROOT, ".next/BUILD_ID");
const SOURCE_DIRS = ["app", "components", "lib"];
/** Time allowed for `next start` to answer the health check, ms. */
const START_TIMEOUT_MS = 90_000;

export type RunningServer = { baseUrl: string; databasePath: string; stop: () => Promise<void> };

function newestMtimeMs(dir: string): number {
  let newest = 0;
  if (!existsSync(dir)) return newest;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestMtimeMs(path));
    else if (/\.(tsx?|json|css|mjs)$/.test(entry.name)) newest = Math.max(newest, statSync(path).mtimeMs);
  }
  return newest;
}

/** True when there is no build, or a source file changed after it (so the tests never run an old build). */
export function buildIsMissingOrStale(): boolean {
  if (!existsSync(BUILD_ID)) return true;
  const builtAt = statSync(BUILD_ID).mtimeMs;
  return SOURCE_DIRS.some((dir) => newestMtimeMs(join(REPO_ROOT, dir)) > builtAt);
}

export function ensureBuild(): void {
  if (!buildIsMissingOrStale()) return;
  const build = spawnSync(process.execPath, [NEXT_BIN, "build"], { cwd: REPO_ROOT, stdio: "pipe", encoding: "utf8", env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" } });
  if (build.status !== 0) throw new Error(`next build failed (exit ${build.status}):\n${(build.stdout ?? "").slice(-4000)}\n${(build.stderr ?? "").slice(-4000)}`);
}

export function freePort(): Promise<number> {
  return new Promise((resolvePort, reject) => {
    const probe = createServer();
    probe.unref();
    probe.on("error", reject);
    probe.listen(0, "127.0.0.1", () => {
      const address = probe.address();
      const port = typeof address === "object" && address ? address.port : 0;
      probe.close(() => resolvePort(port));
    });
  });
}

async function waitForHealth(baseUrl: string, child: ChildProcess, output: () => string): Promise<void> {
  const deadline = Date.now() + START_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`next start exited with ${child.exitCode}:\n${output()}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the server did not answer /api/health within ${START_TIMEOUT_MS} ms:\n${output()}`);
}

export async function startServer(): Promise<RunningServer> {
  ensureBuild();
  const port = await freePort();
  const dataDir = mkdtempSync(join(tmpdir(), "hydrastate-e2e-"));
  const databasePath = join(dataDir, "e2e.sqlite");
  const child = spawn(process.execPath, [NEXT_BIN, "start", "-p", String(port), "-H", "127.0.0.1"], {
    cwd: REPO_ROOT,
    env: { ...process.env, HYDRASTATE_DB: databasePath, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production" },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let log = "";
  child.stdout?.on("data", (d) => (log = (log + d).slice(-8000)));
  child.stderr?.on("data", (d) => (log = (log + d).slice(-8000)));
  const baseUrl = `http://127.0.0.1:${port}`;
  const stop = async () => {
    if (child.exitCode === null) {
      child.kill("SIGTERM");
      await new Promise<void>((r) => {
        const timer = setTimeout(() => {
          if (child.exitCode === null) child.kill("SIGKILL");
          r();
        }, 5000);
        child.once("exit", () => {
          clearTimeout(timer);
          r();
        });
      });
    }
    rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await waitForHealth(baseUrl, child, () => log);
  } catch (error) {
    await stop();
    throw error;
  }
  return { baseUrl, databasePath, stop };
}
