/**
 * Issue 14, units away from the head: how much of their plans' work comes after the plan's last notch rise
 * (every unit then at the highest notch it takes; no surge from a rise can follow). Over the departures with
 * units away from the head among the first `count` of the all-different generator: each own plan (planStart)
 * and each check with its mass search (runJob check, masses: own plan and holding judgements), the
 * vehicle-steps of the accelerate phase after its run's last rise of any unit's notch (search.ts logs it,
 * BENCH only) against all the vehicle-steps done (a train with units away from the head runs the full chain
 * to the end: no rule lets couplings rattling between powered places run as one). That work is split by
 * what the train does in each control interval: below 1.5 m/s (no train runs as one there, settled.ts
 * `SETTLED_MIN_SPEED_MPS`), running as one, or the chain while moving — the last is the most a rule letting
 * rattling couplings run as one after the last rise could save.
 * Run: `nice npx tsx tests/bench/afterLastRaise.ts [count]` (default 200; `ROWS=1` prints each departure).
 * Measured (200): checks 420.15 M vehicle-steps, 40.9 % after the last rise, of it 81.60 M below 1.5 m/s and
 * 87.79 M (20.9 % of all) the chain while moving; own plans 95.17 M, 15.4 % and 14.0 %.
 */
import { planStart } from "../../src/core/planner/index.js";
import { logSearchTries, type SearchTry } from "../../src/core/planner/search.js";
import { SETTLED_MIN_SPEED_MPS } from "../../src/core/dynamics/settled.js";
import { vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import type { StartCase } from "../../src/core/train/types.js";
import { runJob } from "../../src/cli/batch/jobs.js";
import { allDifferentDepartures } from "./departures.js";

/** The departures with a unit away from the head among the first `count`. */
export function unitsAwayDepartures(count: number): Array<{ id: string; c: StartCase }> {
  const lib = builtinLibrary();
  const out: Array<{ id: string; c: StartCase }> = [];
  for (const d of allDifferentDepartures(count)) {
    const r = parseStartCase(d, lib);
    if (r.ok && r.value.locomotives.some((l) => l.position !== "head")) out.push({ id: String(d.id), c: r.value });
  }
  return out;
}

interface Share {
  total: number;
  accelerate: number;
  afterRaise: number;
  slow: number;
  asOne: number;
}

function measure(f: () => void): Share {
  const log: SearchTry[] = [];
  logSearchTries(log);
  const w0 = vehicleStepsDone();
  try {
    f();
  } finally {
    logSearchTries(null);
  }
  const acc = log.filter((t) => t.phase === "accelerate");
  return {
    total: vehicleStepsDone() - w0,
    accelerate: acc.reduce((a, t) => a + t.vehicleSteps, 0),
    afterRaise: acc.reduce((a, t) => a + (t.stepsAfterLastRaise ?? 0), 0),
    slow: acc.reduce((a, t) => a + (t.afterRaiseSlow ?? 0), 0),
    asOne: acc.reduce((a, t) => a + (t.afterRaiseAsOne ?? 0), 0),
  };
}

function add(a: Share, b: Share): void {
  a.total += b.total;
  a.accelerate += b.accelerate;
  a.afterRaise += b.afterRaise;
  a.slow += b.slow;
  a.asOne += b.asOne;
}

const M = (x: number) => (x / 1e6).toFixed(2);
const pc = (x: number, of: number) => ((100 * x) / Math.max(1, of)).toFixed(1);

if (import.meta.url === `file://${process.argv[1]}`) {
  const count = Number(process.argv[2] ?? 200);
  const cases = unitsAwayDepartures(count);
  {
    const own: Share = { total: 0, accelerate: 0, afterRaise: 0, slow: 0, asOne: 0 };
    const check: Share = { total: 0, accelerate: 0, afterRaise: 0, slow: 0, asOne: 0 };
    const rows: string[] = [];
    for (const { id, c } of cases) {
      const o = measure(() => planStart(c, { skipMassSearch: true }));
      const k = measure(() => runJob({ kind: "check", case: c, masses: true }));
      add(own, o);
      add(check, k);
      rows.push(`  ${id}: own ${M(o.total)} M, after last rise ${pc(o.afterRaise, o.total)} %; check ${M(k.total)} M, after last rise ${pc(k.afterRaise, k.total)} %`);
    }
    console.log(`${cases.length} departures with units away from the head among the first ${count}`);
    if (process.env.ROWS) console.log(rows.join("\n"));
    for (const [what, x] of [["own plans", own], ["checks with mass searches", check]] as const) {
      console.log(`  ${what}: ${M(x.total)} M vehicle-steps, accelerate ${pc(x.accelerate, x.total)} %, after the last notch rise ${M(x.afterRaise)} M = ${pc(x.afterRaise, x.total)} %`);
      console.log(`    of which below ${1.5 * SETTLED_MIN_SPEED_MPS} m/s ${M(x.slow)} M, running as one ${M(x.asOne)} M, the chain while moving ${M(x.afterRaise - x.slow - x.asOne)} M = ${pc(x.afterRaise - x.slow - x.asOne, x.total)} %`);
    }
  }
}
