/**
 * Planner benchmark (issue: start planner): full plans for the demo trains and a 150-wagon ~7000 t train,
 * and the largest-startable-mass search. Medians of several runs after warm-up.
 */
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { maxStartableMassKg, planStart } from "../../src/core/planner/index.js";
import type { StartCase } from "../../src/core/train/types.js";
import { longTrainCase } from "./dynamics.js";
import { heading, line, median, timeRuns } from "./util.js";

/** The INTERFACE.md example size: 40 wagons on the demo's Ashvale Loop, one 3000 kW unit, 1800 t, dry. */
function fortyWagonCase(): StartCase {
  const demo = builtinCaseJson[0] as Record<string, unknown>;
  const r = parseStartCase({ ...demo, id: "forty", train: { ...(demo.train as object), trailingMass_t: 1800, wagons: 40, length_m: 560 } }, builtinLibrary());
  if (!r.ok) throw new Error("forty-wagon case invalid");
  return r.value;
}

function demoCases(): Array<[string, StartCase]> {
  const lib = builtinLibrary();
  return builtinCaseJson.map((j) => {
    const r = parseStartCase(j, lib);
    if (!r.ok) throw new Error("demo case invalid");
    const c = r.value;
    return [`${(j as { id: string }).id} (${c.train.wagons} wagons, ${c.train.trailingMassKg / 1000} t)`, c];
  });
}

export function benchPlanner(): void {
  heading("Planner — one full plan (search + verifying re-run), median of 5 after warm-up");
  const cases: Array<[string, StartCase]> = [
    ...demoCases(),
    ["40 wagons, 1800 t at Ashvale Loop (1 unit)", fortyWagonCase()],
    ["long train (150 wagons, 7000 t, 2 units, 2 ‰)", longTrainCase()],
  ];
  for (const [name, c] of cases) {
    const { times, last } = timeRuns(() => planStart(c, { skipMassSearch: true }), 5, 1);
    line(name, `${median(times).toFixed(0)} ms`, `${last.verdict}; ${last.steps.length} steps; targets: ≤ 300 ms at 40 wagons, ≤ 1.5 s at 150`);
  }
  heading("Largest startable trailing mass (bisection over the planner), median of 3");
  for (const [name, c] of cases) {
    const { times, last } = timeRuns(() => maxStartableMassKg(c), 3, 1);
    line(name, `${median(times).toFixed(0)} ms`, `${Math.floor(last / 1000)} t; target ≤ 3 s`);
  }
}
