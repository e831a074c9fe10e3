/**
 * Where a plan's preparation phase spends its work (issue 14): vehicle-steps and integrator steps by phase
 * (quiescent intervals, brakes releasing before every vehicle moved, brakes off before every vehicle moved,
 * every vehicle moved at the take-up step, the chain at the rolling step, the settled train), with the share
 * of the train integrated (vehicle-steps ÷ a full step's) and the step sizes, for plans at 40 and 150 wagons
 * and 40 seeded all-different departures. Run: `nice npx tsx tests/bench/preparation.ts`.
 */
import { planStart } from "../../src/core/planner/index.js";
import { setBrakeChangeHeldCheck, vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import { workByPhase } from "../../src/core/dynamics/runner.js";
import { integratorSteps, modelFromCase } from "../../src/core/train/trainModel.js";
import type { StartCase } from "../../src/core/train/types.js";
import { longTrainCase } from "./dynamics.js";
import { fortyWagonCase } from "./planner.js";
import { seededDepartures } from "../tools/departures.js";

const PHASES = ["quiescent (one evaluation)", "brakes releasing, not all moved", "brakes off, not all moved", "all moved, take-up step", "chain, rolling step", "settled (one mass)"];

export function preparationBreakdown(name: string, cases: StartCase[], opts: { massSearch?: boolean } = {}): { work: number; cpuMs: number; byPhase: Float64Array } {
  const p0 = workByPhase();
  const w0 = vehicleStepsDone();
  const t0 = process.cpuUsage();
  for (const c of cases) planStart(c, opts.massSearch ? {} : { skipMassSearch: true });
  const d = process.cpuUsage(t0);
  const p1 = workByPhase();
  const by = p1.map((v, i) => v - p0[i]!);
  const work = vehicleStepsDone() - w0;
  const cpuMs = (d.user + d.system) / 1000;
  console.log(`\n${name}: ${cases.length} plan(s), ${(work / cases.length / 1e6).toFixed(3)} M vehicle-steps per plan, CPU ${(cpuMs / cases.length).toFixed(0)} ms per plan`);
  let total = 0;
  for (let k = 1; k < 6; k++) total += by[k]!;
  for (let k = 0; k < 6; k++) {
    const vs = by[k]!;
    const steps = by[6 + k]!;
    const full = by[12 + k]!;
    console.log(
      `  ${PHASES[k]!.padEnd(34)} ${(vs / cases.length / 1e6).toFixed(3).padStart(7)} M/plan ${k > 0 ? ((100 * vs) / total).toFixed(1).padStart(5) + " %" : "  (not counted)"}  steps ${(steps / cases.length).toFixed(0).padStart(7)}/plan  share integrated ${full > 0 ? ((100 * vs) / full).toFixed(1) : "-"} %`,
    );
  }
  return { work, cpuMs, byPhase: by };
}

function stepSizes(name: string, cases: StartCase[]): void {
  const hist = new Map<string, number>();
  for (const c of cases) {
    const ch = integratorSteps(modelFromCase(c));
    const key = `take-up ${(ch.takeUpS * 1000).toFixed(2)} ms / rolling ${(ch.rollingS * 1000).toFixed(2)} ms`;
    hist.set(key, (hist.get(key) ?? 0) + 1);
  }
  console.log(`${name} steps: ${[...hist].map(([k, v]) => `${v}× ${k}`).join("; ")}`);
}

const forty = [fortyWagonCase()];
const long = [longTrainCase()];
const many = seededDepartures(40, 200);
// Warm-up (compiled code), not counted.
for (const c of many.slice(0, 3)) planStart(c, { skipMassSearch: true });
stepSizes("40 wagons", forty);
stepSizes("150 wagons", long);
stepSizes("40 departures", many);
preparationBreakdown("40 wagons", forty);
preparationBreakdown("150 wagons", long);
preparationBreakdown("40 seeded departures (no mass search)", many);
if (process.argv.includes("--mass")) preparationBreakdown("40 seeded departures (with mass search)", many, { massSearch: true });

// Before → after: a brake change making its vehicle restless always, against only when it may break away.
{
  const rounds: Array<[string, boolean]> = [["before (every brake change restless)", false], ["after (mayBreakAway)", true], ["before (every brake change restless)", false], ["after (mayBreakAway)", true]];
  for (const [label, on] of rounds) {
    setBrakeChangeHeldCheck(on);
    const a = preparationBreakdown(`${label}: 40 seeded departures`, many);
    const b = preparationBreakdown(`${label}: 150 wagons`, long);
    const f = preparationBreakdown(`${label}: 40 wagons`, forty);
    void a, b, f;
  }
  setBrakeChangeHeldCheck(true);
}
