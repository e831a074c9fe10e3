/**
 * The assistance search of a departure (issue 14, target 1): its CPU and work per departure, on the seeded
 * all-different departures that do not start, by four rankings of the candidates (see `Ranking`): the full
 * ranking, the ranking before (a candidate stopped once its peak coupler tension passes the best found before
 * it), the ranking after (candidates planned a phase at a time, the lowest peak so far first, as `taut check`
 * runs it) and the exact-search floor (the answer's peak known beforehand: no ordering can do less); and
 * their share of the departure ÷ plan ratio. Figures, not assertions. The check's steps are repeated here
 * (plan, masses, then the search, in one memo) so the search can be measured alone; every ranking's option
 * (its verdict and peak), divided train, runs and completeness are compared with the full ranking's.
 */
import { isDeepStrictEqual } from "node:util";
import { Run } from "../../src/core/dynamics/runner.js";
import { planStart, type StartCase } from "../../src/core/index.js";
import { startableMasses } from "../../src/core/planner/startableMass.js";
import { searchAssistance, setFullRanking, setJudgeByFloor, setKnownCeiling } from "../../src/core/dispatch/assistance.js";
import { withEvaluationMemo } from "../../src/core/planner/evaluationMemo.js";
import { CHECK_ASSISTANCE_BUDGET, CHECK_DIVIDE_BUDGET } from "../../src/cli/batch/jobs.js";
import { assistanceReport } from "../../src/profiles/assistanceReport.js";
import { heading, line, median } from "./util.js";
import { allDifferentCases } from "../tools/departures.js";

/** Work counters: vehicle-steps integrated and plan searches run (each begins one run from standing). */
const work = { vehicleSteps: 0, searches: 0 };
let counting = false;

/** Count the work of every run in this process (wraps the runner's methods; the bench only). */
function countWork(): void {
  if (counting) return;
  counting = true;
  const advance = Run.prototype.advanceInterval;
  Run.prototype.advanceInterval = function (this: Run): void {
    const before = this.steps;
    advance.call(this);
    // A settled interval is one step of the whole train as one mass; counted per vehicle like the others.
    work.vehicleSteps += (this.steps - before) * this.m.n;
  };
  const start = Run.start.bind(Run);
  Run.start = (...args: Parameters<typeof Run.start>) => {
    work.searches++;
    return start(...args);
  };
}

const cpuMs = (from: NodeJS.CpuUsage): number => {
  const d = process.cpuUsage(from);
  return (d.user + d.system) / 1000;
};

interface Measured {
  cpuMs: number;
  vehicleSteps: number;
  searches: number;
  pruned: number;
  answer: unknown;
  /** The lowest peak coupler tension of the options at each number of units added (the full ranking's). */
  bestPeakN: Map<number, number>;
}

/**
 * The four rankings: every candidate judged to the end (`setFullRanking(true)`); stopped once its peak passes
 * the best found before it (`setJudgeByFloor(false)`, the ranking before this one); planned a phase at a time,
 * lowest peak so far first (the default, as `taut check` runs it); and with the answer's peak known
 * beforehand as the ceiling (`setKnownCeiling`): what a perfect ordering of the candidates would cost.
 */
type Ranking = "full" | "ceiling" | "floor" | "exact";

/** The check's steps for one departure, the assistance search measured alone (null: the departure starts). */
function assistanceOf(c: StartCase, ranking: Ranking, exact?: Map<number, number>): Measured | null {
  setFullRanking(ranking === "full");
  setJudgeByFloor(ranking !== "ceiling");
  setKnownCeiling(ranking === "exact" ? (units) => exact?.get(units) ?? Infinity : null);
  try {
    return withEvaluationMemo(() => {
      const p = planStart(c, { skipMassSearch: true, skipVerification: true, skipSensitivity: true });
      if (p.verdict === "starts") return null;
      const m = startableMasses(c, { own: p.verdict });
      const w0 = { ...work };
      const t0 = process.cpuUsage();
      const a = searchAssistance(c, { baseVerdict: p.verdict, budget: CHECK_ASSISTANCE_BUDGET, divideBudget: CHECK_DIVIDE_BUDGET, maxFullPlans: 1, reportedOnly: true, pruneLosers: true, lightestStarts: m.startsKg > 0 });
      const ms = cpuMs(t0);
      const rep = assistanceReport(a, CHECK_ASSISTANCE_BUDGET + CHECK_DIVIDE_BUDGET);
      const bestPeakN = new Map<number, number>();
      for (const o of a.options) bestPeakN.set(o.units, Math.min(bestPeakN.get(o.units) ?? Infinity, o.peakCouplerForceN));
      const option = a.options[0];
      return {
        cpuMs: ms,
        vehicleSteps: work.vehicleSteps - w0.vehicleSteps,
        searches: work.searches - w0.searches,
        pruned: a.pruned,
        answer: { option: rep.assistance[0] ?? null, verdict: option?.verdict ?? null, peakN: option?.peakCouplerForceN ?? null, divide: rep.divide, complete: a.complete, runs: a.plannerRuns },
        bestPeakN,
      };
    });
  } finally {
    setFullRanking(false);
    setJudgeByFloor(true);
    setKnownCeiling(null);
  }
}

export function benchAssistance(n: number): void {
  countWork();
  const cases = allDifferentCases(n);
  planStart(cases[0]!, { skipMassSearch: true }); // warm-up
  // One plan of each train (its verdict and verified plan, no mass search): the ratio's denominator.
  let planMs = 0;
  for (const c of cases) {
    const t0 = process.cpuUsage();
    planStart(c, { skipMassSearch: true });
    planMs += cpuMs(t0);
  }
  const rankings: Ranking[] = ["full", "ceiling", "floor", "exact"];
  const rows: Array<Record<Ranking, Measured>> = [];
  for (const c of cases) {
    const full = assistanceOf(c, "full");
    if (!full) continue;
    const ceiling = assistanceOf(c, "ceiling")!;
    const floor = assistanceOf(c, "floor")!;
    const exact = assistanceOf(c, "exact", full.bestPeakN)!;
    rows.push({ full, ceiling, floor, exact });
  }
  const sum = (r: Ranking, pick: (m: Measured) => number) => rows.reduce((s, x) => s + pick(x[r]), 0);
  const med = (r: Ranking, pick: (m: Measured) => number) => median(rows.map((x) => pick(x[r])));
  const worst = (r: Ranking, pick: (m: Measured) => number) => Math.max(...rows.map((x) => pick(x[r])));
  const M = (x: number) => `${(x / 1e6).toFixed(1)}M`;
  const cpu = (m: Measured) => m.cpuMs;
  const steps = (m: Measured) => m.vehicleSteps;
  const names: Record<Ranking, string> = {
    full: "full ranking (every candidate to the end)",
    ceiling: "before: stopped past the best found so far",
    floor: "after: a phase at a time, lowest peak first",
    exact: "exact-search floor (answer's peak known beforehand)",
  };
  heading(`The assistance search of a departure (first ${n} all-different departures; ${rows.length} do not start; in process, one thread)`);
  for (const r of rankings) {
    line(`${names[r]}: CPU Σ, median / worst per departure`, `${(sum(r, cpu) / 1000).toFixed(1)} s`, `${med(r, cpu).toFixed(0)} / ${worst(r, cpu).toFixed(0)} ms; share of departure ÷ plan ${(sum(r, cpu) / planMs).toFixed(2)}×`);
    line(`${names[r]}: vehicle-steps Σ, median / worst`, M(sum(r, steps)), `${M(med(r, steps))} / ${M(worst(r, steps))}; ${sum(r, (m) => m.searches)} plan searches begun, ${sum(r, (m) => m.pruned)} stopped early`);
  }
  const ratio = (a: Ranking, b: Ranking, pick: (m: Measured) => number) => (sum(a, pick) / Math.max(1e-9, sum(b, pick))).toFixed(2);
  line("before ÷ after: CPU, vehicle-steps", `${ratio("ceiling", "floor", cpu)}×, ${ratio("ceiling", "floor", steps)}×`, `after ÷ exact-search floor: ${ratio("floor", "exact", cpu)}×, ${ratio("floor", "exact", steps)}×; full ÷ after: ${ratio("full", "floor", steps)}× vehicle-steps`);
  const same = (r: Ranking) => rows.filter((x) => isDeepStrictEqual(x[r].answer, x.full.answer)).length;
  const all = rankings.slice(1).every((r) => same(r) === rows.length);
  line("same option, verdict, peak, divided train, runs and completeness as the full ranking", rankings.slice(1).map((r) => `${r} ${same(r)} of ${rows.length}`).join(", "), all ? "" : "DIFFERENT ANSWERS");
}

// `npx tsx tests/bench/assistance.ts [n]`: this part of the bench alone.
if (process.argv[1] && import.meta.url.endsWith(process.argv[1].replace(/^.*\/tests\//, "/tests/"))) benchAssistance(Number(process.argv[2] ?? 60));
