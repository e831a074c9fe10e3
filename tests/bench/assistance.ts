/**
 * The assistance search of a departure (issue 14, target 1): its CPU and work per departure, before (every
 * candidate judged to the end: `setFullRanking(true)`) and after (a candidate stopped once its peak coupler
 * tension passes the best option's: `pruneLosers`, as `taut check` runs it), in this run, on the seeded
 * all-different departures that do not start; and its share of the departure ÷ plan ratio. Figures, not
 * assertions. The check's steps are repeated here (plan, masses, then the search, in one memo) so the search
 * can be measured alone; the options and divided trains of the two rankings are compared as they go.
 */
import { isDeepStrictEqual } from "node:util";
import { Run } from "../../src/core/dynamics/runner.js";
import { planStart, type StartCase } from "../../src/core/index.js";
import { startableMasses } from "../../src/core/planner/startableMass.js";
import { searchAssistance, setFullRanking } from "../../src/core/dispatch/assistance.js";
import { withEvaluationMemo } from "../../src/core/planner/evaluationMemo.js";
import { CHECK_ASSISTANCE_BUDGET, CHECK_DIVIDE_BUDGET } from "../../src/cli/batch/jobs.js";
import { assistanceReport } from "../../src/profiles/assistanceReport.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { allDifferentDepartures } from "./departures.js";
import { heading, line, median } from "./util.js";

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
}

/** The check's steps for one departure, the assistance search measured alone (null: the departure starts). */
function assistanceOf(c: StartCase): Measured | null {
  return withEvaluationMemo(() => {
    const p = planStart(c, { skipMassSearch: true, skipVerification: true, skipSensitivity: true });
    if (p.verdict === "starts") return null;
    const m = startableMasses(c, { own: p.verdict });
    const w0 = { ...work };
    const t0 = process.cpuUsage();
    const a = searchAssistance(c, { baseVerdict: p.verdict, budget: CHECK_ASSISTANCE_BUDGET, divideBudget: CHECK_DIVIDE_BUDGET, maxFullPlans: 1, reportedOnly: true, pruneLosers: true, lightestStarts: m.startsKg > 0 });
    const ms = cpuMs(t0);
    const rep = assistanceReport(a, CHECK_ASSISTANCE_BUDGET + CHECK_DIVIDE_BUDGET);
    return { cpuMs: ms, vehicleSteps: work.vehicleSteps - w0.vehicleSteps, searches: work.searches - w0.searches, pruned: a.pruned, answer: { option: rep.assistance[0] ?? null, divide: rep.divide, complete: a.complete, runs: a.plannerRuns } };
  });
}

export function benchAssistance(n: number): void {
  countWork();
  const lib = builtinLibrary();
  const cases = allDifferentDepartures(n).map((d) => {
    const r = parseStartCase(d, lib);
    if (!r.ok) throw new Error(`generated departure ${String(d.id)} does not parse`);
    return r.value;
  });
  planStart(cases[0]!, { skipMassSearch: true }); // warm-up
  // One plan of each train (its verdict and verified plan, no mass search): the ratio's denominator.
  let planMs = 0;
  for (const c of cases) {
    const t0 = process.cpuUsage();
    planStart(c, { skipMassSearch: true });
    planMs += cpuMs(t0);
  }
  const before: Array<Measured | null> = [];
  const after: Array<Measured | null> = [];
  try {
    for (const c of cases) {
      setFullRanking(true);
      before.push(assistanceOf(c));
      setFullRanking(false);
      after.push(assistanceOf(c));
    }
  } finally {
    setFullRanking(false);
  }
  const helped = before.map((b, k) => [b, after[k]] as const).filter((x): x is readonly [Measured, Measured] => x[0] !== null && x[1] !== null);
  const same = helped.filter(([b, a]) => isDeepStrictEqual(b.answer, a.answer)).length;
  const fig = (pick: (m: Measured) => number, side: 0 | 1, f: (x: number) => string) => {
    const xs = helped.map((x) => pick(x[side]));
    return `${f(median(xs))} / ${f(Math.max(...xs))}`;
  };
  const sum = (pick: (m: Measured) => number, side: 0 | 1) => helped.reduce((s, x) => s + pick(x[side]), 0);
  const M = (x: number) => `${(x / 1e6).toFixed(1)}M`;
  const ms = (x: number) => `${x.toFixed(0)}`;
  const whole = (x: number) => `${x}`;
  heading(`The assistance search of a departure (first ${n} all-different departures; ${helped.length} do not start; in process, one thread; before = every candidate judged to the end)`);
  line("CPU per departure, median / worst, before", `${fig((m) => m.cpuMs, 0, ms)} ms`);
  line("CPU per departure, median / worst, after", `${fig((m) => m.cpuMs, 1, ms)} ms`, `Σ ${(sum((m) => m.cpuMs, 0) / 1000).toFixed(1)} → ${(sum((m) => m.cpuMs, 1) / 1000).toFixed(1)} s`);
  line("vehicle-steps per departure, median / worst, before", fig((m) => m.vehicleSteps, 0, M));
  line("vehicle-steps per departure, median / worst, after", fig((m) => m.vehicleSteps, 1, M), `Σ ${M(sum((m) => m.vehicleSteps, 0))} → ${M(sum((m) => m.vehicleSteps, 1))} (${((100 * sum((m) => m.vehicleSteps, 1)) / Math.max(1, sum((m) => m.vehicleSteps, 0))).toFixed(0)} %)`);
  line("plan searches run per departure, median / worst", `${fig((m) => m.searches, 0, whole)} → ${fig((m) => m.searches, 1, whole)}`, `Σ ${sum((m) => m.searches, 0)} → ${sum((m) => m.searches, 1)}, of which ${sum((m) => m.pruned, 1)} stopped early (a limit failed, or the peak passed the best option's)`);
  line("its share of departure ÷ plan (Σ search ÷ Σ plans)", `${(sum((m) => m.cpuMs, 0) / planMs).toFixed(2)}× → ${(sum((m) => m.cpuMs, 1) / planMs).toFixed(2)}×`, `over all ${n} departures; Σ plans ${(planMs / 1000).toFixed(1)} s CPU`);
  line("same option, divided train, runs and completeness", `${same} of ${helped.length}`, same === helped.length ? "" : "DIFFERENT ANSWERS");
}

// `npx tsx tests/bench/assistance.ts [n]`: this part of the bench alone.
if (process.argv[1] && import.meta.url.endsWith(process.argv[1].replace(/^.*\/tests\//, "/tests/"))) benchAssistance(Number(process.argv[2] ?? 24));
