/**
 * Start-up of the command line (issue 14, target 2): `taut --version` against `node -e 0` (median of
 * alternating runs, so both see the same machine), and a whole `taut plan` process on the 150-wagon train.
 * The bin runs the plain JavaScript build (build/cli); it is brought up to date first.
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
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
    const plans = [0, 1, 2].map(() => wallMs([bin, "plan", file]));
    const p = median(plans);
    line("taut plan, 150 wagons (whole process)", `${(p / 1000).toFixed(2)} s`, `runs: ${plans.map((x) => (x / 1000).toFixed(2)).join(", ")} s`);
    target({ target: "taut plan at 150 wagons, whole process ≤ 1.5 s", figure: `${(p / 1000).toFixed(2)} s`, ratio: p / 1500 });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
