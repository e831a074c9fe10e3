/**
 * Browser-test setup: make sure Debian's Chromium is there (install it when running as root), build the
 * app into a temporary folder, serve it with `vite preview` (spawned directly, stopped by its PID), and
 * hand the URL to the tests.
 */
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { TestProject } from "vitest/node";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    chromiumPath: string;
  }
}

export const CHROMIUM = "/usr/bin/chromium";
const root = fileURLToPath(new URL("../..", import.meta.url));

function ensureChromium(): void {
  if (existsSync(CHROMIUM)) return;
  if (typeof process.getuid === "function" && process.getuid() === 0) {
    console.log("[e2e] installing Debian's chromium (apt-get)…");
    const r = spawnSync("sh", ["-c", "apt-get update && apt-get install -y chromium"], { stdio: "inherit" });
    if (r.status === 0 && existsSync(CHROMIUM)) return;
  }
  throw new Error(`Chromium is missing at ${CHROMIUM}. Install it with: apt-get update && apt-get install -y chromium (as root).`);
}

/** A TCP port free on the loopback address now. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const a = s.address();
      s.close(() => (a && typeof a === "object" ? resolve(a.port) : reject(new Error("no port"))));
    });
  });
}

async function waitForServer(url: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const t0 = Date.now();
  while (Date.now() - t0 < timeoutMs) {
    if (child.exitCode !== null) throw new Error(`vite preview exited with code ${child.exitCode}`);
    try {
      const r = await fetch(url);
      if (r.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`vite preview did not answer at ${url} within ${timeoutMs} ms`);
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  ensureChromium();
  const outDir = mkdtempSync(join(tmpdir(), "taut-e2e-dist-"));
  const vite = join(root, "node_modules/.bin/vite");
  const config = join(root, "src/app/vite.config.ts");
  const build = spawnSync(vite, ["build", "--config", config, "--outDir", outDir, "--emptyOutDir", "--logLevel", "warn"], { cwd: root, stdio: "inherit" });
  if (build.status !== 0) throw new Error(`vite build failed (exit ${build.status})`);
  const port = await freePort();
  const child = spawn(vite, ["preview", "--config", config, "--outDir", outDir, "--host", "127.0.0.1", "--port", String(port), "--strictPort"], {
    cwd: root,
    stdio: ["ignore", "pipe", "pipe"],
  });
  let log = "";
  child.stdout?.on("data", (d: Buffer) => (log += d.toString()));
  child.stderr?.on("data", (d: Buffer) => (log += d.toString()));
  const baseURL = `http://127.0.0.1:${port}/`;
  try {
    await waitForServer(baseURL, child, 30_000);
  } catch (e) {
    child.kill("SIGTERM");
    throw new Error(`${(e as Error).message}\n${log}`);
  }
  project.provide("baseURL", baseURL);
  project.provide("chromiumPath", CHROMIUM);
  return async () => {
    if (child.pid !== undefined && child.exitCode === null) {
      process.kill(child.pid, "SIGTERM");
      await new Promise((r) => child.once("exit", r));
    }
    rmSync(outDir, { recursive: true, force: true });
  };
}
