/**
 * Where a plan's preparation phase spends its work (issue 14): vehicle-steps and integrator steps by phase
 * (quiescent intervals, brakes releasing before every vehicle moved, brakes off before every vehicle moved,
 * every vehicle moved at the take-up step, the chain at the rolling step, the settled train), with the share
 * of the train integrated (vehicle-steps ÷ a full step's) and the step sizes, for plans at 40 and 150 wagons
 * and 40 seeded all-different departures; then before → after for the two exact savings of the brake release
 * (`mayBreakAway`, `evaluateActive`). Run: `nice npx tsx tests/bench/preparation.ts` (`--mass` adds the
 * breakdown with the mass search).
 *
 * What it showed (2 cores, shared): before every vehicle moved, about half the train is integrated at each
 * step, and nearly all of that half really moves — a group of released wagons creeping at 1–10 mm/s as the
 * brake eases (between the held locomotive and the wagons still braked), or a run-out wave at 0.1 m/s and
 * more; resting vehicles integrated only as neighbours. After every vehicle moved, practically none rests.
 * A larger step while the locomotive brake holds (the rolling step instead of the take-up step for trains
 * with bunched slack) saved 6 % of the work but moved single couplings' peaks by up to 2 % and one margin:
 * not within the integrator's tolerance, not kept.
 */
import { planStart } from "../../src/core/planner/index.js";
import { setBrakeChangeHeldCheck, vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import { setQuiescentActiveOnly, workByPhase } from "../../src/core/dynamics/runner.js";
import { integratorSteps, modelFromCase } from "../../src/core/train/trainModel.js";
import type { StartCase } from "../../src/core/train/types.js";
import { longTrainCase } from "./dynamics.js";
import { fortyWagonCase } from "./planner.js";
import { seededDepartures } from "../tools/departures.js";

const PHASES = ["quiescent (evaluations)", "brakes releasing, not all moved", "brakes off, not all moved", "all moved, take-up step", "chain, rolling step", "settled (one mass)"];

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
      `  ${PHASES[k]!.padEnd(34)} ${(vs / cases.length / 1e6).toFixed(3).padStart(7)} M/plan ${k > 0 ? ((100 * vs) / total).toFixed(1).padStart(5) + " %" : "  (no step) "}  steps ${(steps / cases.length).toFixed(0).padStart(7)}/plan  share integrated ${full > 0 ? ((100 * vs) / full).toFixed(1) : "-"} %`,
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

// Before → after: every brake change making its vehicle restless and every quiescent interval evaluating every
// vehicle, against only the vehicles a brake change may free (`mayBreakAway`) and a quiescent interval
// evaluating only what can change (`evaluateActive`). The same plans (tests/core/activeStepping.test.ts).
{
  const setBoth = (on: boolean) => {
    setBrakeChangeHeldCheck(on);
    setQuiescentActiveOnly(on);
  };
  const sums = new Map<string, { work: number; cpuMs: number; quiescent: number; release: number }>();
  for (let round = 0; round < 2; round++) {
    for (const [label, on] of [["before", false], ["after", true]] as const) {
      setBoth(on);
      for (const [name, cases] of [["40 wagons", forty], ["150 wagons", long], ["40 seeded departures", many]] as const) {
        const r = preparationBreakdown(`${label}: ${name}`, cases);
        const key = `${name} ${label}`;
        const e = sums.get(key) ?? { work: 0, cpuMs: 0, quiescent: 0, release: 0 };
        e.work += r.work / cases.length;
        e.cpuMs += r.cpuMs / cases.length;
        e.quiescent += r.byPhase[0]! / cases.length;
        e.release += (r.byPhase[1]! + r.byPhase[2]!) / cases.length;
        sums.set(key, e);
      }
    }
  }
  setBoth(true);
  console.log("\nBefore → after (per plan, mean of 2 rounds):");
  for (const name of ["40 wagons", "150 wagons", "40 seeded departures"]) {
    const b = sums.get(`${name} before`)!;
    const a = sums.get(`${name} after`)!;
    const M = (x: number) => (x / 2 / 1e6).toFixed(3);
    console.log(`  ${name}: vehicle-steps ${M(b.work)} → ${M(a.work)} M; before every vehicle moved ${M(b.release)} → ${M(a.release)} M; quiescent evaluations ${M(b.quiescent)} → ${M(a.quiescent)} M; CPU ${(b.cpuMs / 2).toFixed(0)} → ${(a.cpuMs / 2).toFixed(0)} ms`);
  }
}
