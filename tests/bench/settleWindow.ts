/**
 * Why a rolling, stretched train runs as the full chain rather than as one mass (issue 14, settled.ts): over
 * the first 40 seeded all-different departures, the full chain's vehicle-steps after every vehicle moved,
 * split by how long after the last notch change they fall (within the settle delay and sway window, or later:
 * a window measured and running as one refused), against the settled train's; and why the refusals were.
 * Plans alone, then the checks with their mass searches (`runJob`, as tests/bench/batch.ts).
 * Run: `nice npx tsx tests/bench/settleWindow.ts`.
 */
import { planStart } from "../../src/core/planner/index.js";
import { workBySettleState } from "../../src/core/dynamics/runner.js";
import { runJob } from "../../src/cli/batch/jobs.js";
import { seededDepartures } from "../tools/departures.js";
import type { StartCase } from "../../src/core/train/types.js";

const LABELS = [
  "running as one not asked for yet",
  "brakes still releasing",
  "(a) 0–4 s after a notch change",
  "(a) 4–6 s after",
  "(a) 6–8 s after",
  "(a) 8–10 s after",
  "(a) 10–14 s after",
  "(b) later (refused or a fresh window)",
  "(c) settled, one mass",
];

export function settleBreakdown(name: string, cases: StartCase[], masses: boolean): Float64Array {
  const b0 = workBySettleState();
  const t0 = process.cpuUsage();
  for (const c of cases) {
    if (masses) runJob({ kind: "check", case: c, masses: true });
    else planStart(c, { skipMassSearch: true });
  }
  const d = process.cpuUsage(t0);
  const by = workBySettleState().map((v, i) => v - b0[i]!);
  let total = 0;
  for (let k = 0; k < 9; k++) total += by[k]!;
  console.log(`\n${name}: CPU ${((d.user + d.system) / 1000).toFixed(0)} ms; after every vehicle moved ${(total / 1e6).toFixed(2)} M vehicle-steps`);
  for (let k = 0; k < 9; k++) console.log(`  ${LABELS[k]!.padEnd(40)} ${(by[k]! / 1e6).toFixed(2).padStart(8)} M  ${((100 * by[k]!) / total).toFixed(1).padStart(5)} %`);
  console.log(`  of (b): lead under 1 m/s ${(by[15]! / 1e6).toFixed(2)} M, 1–1.5 m/s ${(by[12]! / 1e6).toFixed(2)} M, 1.5–3 m/s ${(by[13]! / 1e6).toFixed(2)} M, faster ${(by[14]! / 1e6).toFixed(2)} M`);
  console.log(`  refusals at a window's end: too slow ${by[9]}, a vehicle not moving ${by[10]}, a coupling near its slack ${by[11]}`);
  return by;
}

const many = seededDepartures(40, 200);
planStart(many[0]!, { skipMassSearch: true }); // warm-up
settleBreakdown("40 seeded departures, plans", many, false);
if (!process.argv.includes("--plans")) settleBreakdown("40 seeded departures, checks with mass searches", many, true);
