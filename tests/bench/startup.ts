/**
 * Start-up of the command line (issue 14, target 2): `taut --version` against `node -e 0` (median of
 * alternating runs, so both see the same machine), and a whole `taut plan` process on the 150-wagon train.
 * The bin runs the plain JavaScript build (build/cli); it is brought up to date first.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { heading, line, median, target } from "./util.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const bin = join(repo, "src/cli/taut.mjs");

function wallMs(args: string[]): number {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, args, { cwd: repo, encoding: "utf8", maxBuffer: 1 << 26 });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`${args.join(" ")} failed (${r.status}): ${r.stderr}`);
  return ms;
}

/** GNU time, where installed: a process's CPU with its threads (user + system). */
const GNU_TIME = "/usr/bin/time";

/** Wall time and, where GNU time is installed, CPU (user + system, all threads) of a process, ms. */
function wallAndCpuMs(args: string[], dir: string): { wallMs: number; cpuMs: number | null } {
  if (!existsSync(GNU_TIME)) return { wallMs: wallMs(args), cpuMs: null };
  const out = join(dir, "time.txt");
  const t0 = performance.now();
  const r = spawnSync(GNU_TIME, ["-f", "%U %S", "-o", out, process.execPath, ...args], { cwd: repo, encoding: "utf8", maxBuffer: 1 << 26 });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`${args.join(" ")} failed (${r.status}): ${r.stderr}`);
  const [user, sys] = readFileSync(out, "utf8").trim().split("\n").at(-1)!.split(" ").map(Number);
  return { wallMs: ms, cpuMs: 1000 * (user! + sys!) };
}

/** The 150-wagon train of the planner benchmark as a case file. */
export const LONG_TRAIN_JSON = {
  schema: "taut/start-case@1",
  locomotives: [{ profile: "illustrative-6axle-3000", count: 2, position: "head" }],
  train: { trailingMass_t: 7000, wagons: 150, length_m: 2100, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970, wagonType: "bogie-hopper-loaded", slackState: "bunched" },
  location: { gradient_permille: 2, curveRadius_m: 0, clearAhead_m: 3000 },
  conditions: { rail: "dry", sand: true, temperature_C: 10 },
  target: { speed_kmh: 30 },
};

export function run(): void {
  heading("Command line start-up — real processes, median of alternating runs");
  wallMs([bin, "--version"]); // brings the build up to date
  const runs = 15;
  const node: number[] = [];
  const version: number[] = [];
  const help: number[] = [];
  for (let k = 0; k < runs; k++) {
    node.push(wallMs(["-e", "0"]));
    version.push(wallMs([bin, "--version"]));
    help.push(wallMs([bin, "plan", "--help"]));
  }
  const n = median(node);
  line("node -e 0", `${n.toFixed(0)} ms`);
  line("taut --version", `${median(version).toFixed(0)} ms`, `${(median(version) / n).toFixed(2)}× node -e 0`);
  line("taut plan --help (every command loaded)", `${median(help).toFixed(0)} ms`, `${(median(help) / n).toFixed(2)}× node -e 0`);
  target({ target: "taut --version ≤ 2 × node -e 0", figure: `${(median(version) / n).toFixed(2)}×`, ratio: median(version) / n / 2 });

  const dir = mkdtempSync(join(tmpdir(), "taut-bench-startup-"));
  try {
    const file = join(dir, "long-150.json");
    writeFileSync(file, JSON.stringify(LONG_TRAIN_JSON));
    const runs = [0, 1, 2].map(() => wallAndCpuMs([bin, "plan", file], dir));
    const p = median(runs.map((x) => x.wallMs));
    line("taut plan, 150 wagons (whole process)", `${(p / 1000).toFixed(2)} s`, `runs: ${runs.map((x) => (x.wallMs / 1000).toFixed(2)).join(", ")} s`);
    if (runs[0]!.cpuMs !== null) {
      const cpu = median(runs.map((x) => x.cpuMs!));
      line("taut plan, 150 wagons: CPU of the process (user + system, all threads)", `${(cpu / 1000).toFixed(2)} s`, `runs: ${runs.map((x) => (x.cpuMs! / 1000).toFixed(2)).join(", ")} s; the mass search's first plans run on two threads beside the plan`);
    }
    target({ target: "taut plan at 150 wagons, whole process ≤ 1.5 s", figure: `${(p / 1000).toFixed(2)} s`, ratio: p / 1500 });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
