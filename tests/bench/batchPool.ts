/**
 * The batch pool's order of work (issue 14): `taut check` on all-different departures (tests/bench/departures.ts)
 * with the distinct departures handed to the threads in the file's order (TAUT_BENCH_CHECK_ORDER=input) and
 * costliest first (the default). Figures: the process's wall time, the threads' work (Σ of every job's time on its
 * thread) and the idle core time, wall × threads − work (start-up included, the same in both). Figures, not
 * assertions; the two runs go one after the other on a shared machine, so compare within one run.
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { allDifferentDepartures } from "./departures.js";
import { heading, line } from "./util.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));

interface Run {
  wallS: number;
  workS: number;
  workers: number;
  json: string;
}

function checkRun(file: string, order: "input" | "costliest-first"): Run {
  const env = { ...process.env };
  if (order === "input") env.TAUT_BENCH_CHECK_ORDER = "input";
  else delete env.TAUT_BENCH_CHECK_ORDER;
  const t0 = performance.now();
  const r = spawnSync(process.execPath, ["src/cli/taut.mjs", "check", file, "--json", "--quiet"], { cwd: repo, encoding: "utf8", env, maxBuffer: 1 << 28 });
  const wallS = (performance.now() - t0) / 1000;
  if (r.status !== 0) throw new Error(`taut check failed (${r.status}): ${r.stderr}`);
  const out = JSON.parse(r.stdout) as { departures: unknown[]; summary: { threadWork_s: number; workers: number } };
  return { wallS, workS: out.summary.threadWork_s, workers: out.summary.workers, json: JSON.stringify(out.departures) };
}

export function benchBatchPool(count: number): void {
  const dir = mkdtempSync(join(tmpdir(), "taut-bench-pool-"));
  try {
    const file = join(dir, `all-different-${count}.json`);
    writeFileSync(file, JSON.stringify(allDifferentDepartures(count)));
    heading(`Batch pool — order of work, taut check on ${count} all-different departures (real process)`);
    const runs = { input: checkRun(file, "input"), first: checkRun(file, "costliest-first") };
    for (const [label, r] of [["file's order", runs.input], ["costliest first", runs.first]] as const) {
      const idleS = r.wallS * r.workers - r.workS;
      line(`${label}: wall / threads' work`, `${r.wallS.toFixed(1)} / ${r.workS.toFixed(1)} s`, `${r.workers} threads; idle core time ${idleS.toFixed(1)} s (${((100 * idleS) / (r.wallS * r.workers)).toFixed(1)} %)`);
    }
    line("wall, costliest first ÷ file's order", `${(runs.first.wallS / runs.input.wallS).toFixed(3)}`);
    line("rows identical in both orders", runs.first.json === runs.input.json ? "yes" : "NO");
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
