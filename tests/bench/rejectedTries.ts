/**
 * What a plan's rejected tries cost (issue 14): a plan search tries stretch notches (lowest first) and build
 * paces (shortest first) on clones of the run, keeps one of each and drops the rest. Over the first 40 seeded
 * all-different departures (tests/bench/departures.ts), for the departure's own plan (`planStart` without the
 * mass search) and for a holding judgement (`judge` at depth "starts", verdict-only, at the departure's
 * largest startable mass): vehicle-steps of the tries kept against those dropped, by phase, and how far into
 * a dropped try it was certain to be dropped (with the work done after that). Figures, not assertions.
 * Then before → after for the exact saving (search.ts `setCutDroppedPaces`: a build pace certain to be dropped
 * is not run on): vehicle-steps and CPU of the own plans and of the departures' checks with their mass searches
 * (`runJob` check with masses, as tests/bench/batch.ts), two rounds alternating which goes first, and whether
 * every outcome's figures agree (elapsed time aside).
 * Run: `nice npx tsx tests/bench/rejectedTries.ts [count]` (`--saving` for the before → after alone, `--tries`
 * without it).
 *
 * What it showed (first 100 departures; vehicle-steps are exact, CPU on a shared machine): the tries dropped
 * are a small part of the work. Departures' checks with their mass searches, 990 M vehicle-steps: dropped
 * stretch notches 11.1 M (1.1 %, 76 tries, all "weak": the train crept and stood short of moving its last
 * vehicle for 90 s; 68 of them stood still, held, from about a fifth of the way in, but that standing tail
 * costs almost nothing), dropped build paces 3.5 M (34 tries, each certain from its first moment — the
 * stretch had already passed the coupler allowance — now not started), and no accelerate phase is ever
 * dropped. Own plans and holding judgements dropped 0.5 % and 1.1 % (stretch only). The work is on the plan's
 * own line: the accelerate phase (65 % of the checks' work) and the preparing (20 %; 91 of 470 preparings
 * ended in an earlier one's state in the same check, 7.6 M).
 */
import { judge, planStart, startableMasses } from "../../src/core/planner/index.js";
import { withTrailingMass } from "../../src/core/planner/startableMass.js";
import { logSearchTries, setCutDroppedPaces, type SearchTry } from "../../src/core/planner/search.js";
import { vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import type { StartCase } from "../../src/core/train/types.js";
import { runJob, type CheckOutcome } from "../../src/cli/batch/jobs.js";
import { cpuMs, heading, line } from "./util.js";
import { allDifferentCases } from "../tools/departures.js";

/** Each departure's largest startable mass, kg (0: none). */
export function largestStartable(cases: readonly StartCase[]): number[] {
  return cases.map((c) => startableMasses(c, { startsOnly: true }).startsKg);
}

const PHASES = ["prepare", "stretch", "build", "accelerate"] as const;

function summarise(name: string, log: SearchTry[], plans: number): void {
  const M = (x: number) => `${(x / 1e6).toFixed(2)} M`;
  let all = 0;
  for (const t of log) all += t.vehicleSteps;
  heading(`${name}: ${plans} plan(s), ${M(all)} vehicle-steps in all (${M(all / Math.max(1, plans))} per plan)`);
  for (const phase of PHASES) {
    const xs = log.filter((t) => t.phase === phase);
    const kept = xs.filter((t) => t.kept);
    const dropped = xs.filter((t) => !t.kept);
    const sum = (ts: SearchTry[], f: (t: SearchTry) => number) => ts.reduce((a, t) => a + f(t), 0);
    const keptW = sum(kept, (t) => t.vehicleSteps);
    const dropW = sum(dropped, (t) => t.vehicleSteps);
    const certain = dropped.filter((t) => t.certainAfterS !== null);
    const labels = new Map<string, number>();
    for (const t of dropped) labels.set(`${t.label}${t.outcome ? ` ${t.outcome}` : ""}`, (labels.get(`${t.label}${t.outcome ? ` ${t.outcome}` : ""}`) ?? 0) + 1);
    line(
      `${phase}: kept / dropped`,
      `${M(keptW)} / ${M(dropW)}`,
      `${((100 * (keptW + dropW)) / Math.max(1, all)).toFixed(1)} % of all; CPU ${sum(kept, (t) => t.ms).toFixed(0)} / ${sum(dropped, (t) => t.ms).toFixed(0)} ms; ${kept.length} kept, ${dropped.length} dropped${dropped.length ? ` (${[...labels].map(([l, k]) => `${k}× ${l}`).join(", ")})` : ""}`,
    );
    if (dropped.length) {
      const simS = sum(dropped, (t) => t.simS);
      line(
        `  … dropped tries' simulated time`,
        `${simS.toFixed(0)} s`,
        `certain early in ${certain.length}: at ${sum(certain, (t) => t.certainAfterS!).toFixed(0)} of their ${sum(certain, (t) => t.simS).toFixed(0)} s; ${M(sum(dropped, (t) => t.stepsAfterCertain))} vehicle-steps, ${sum(dropped, (t) => t.msAfterCertain ?? 0).toFixed(0)} ms CPU after that`,
      );
    }
  }
}


/** The own plans and the holding judgements of `cases`, their parts logged; CPU ms of each kind. */
export function measureTries(cases: readonly StartCase[], masses: readonly number[], own: SearchTry[], holding: SearchTry[]): { ownMs: number; holdingMs: number; holdingPlans: number } {
  let ownMs = 0;
  let holdingMs = 0;
  let holdingPlans = 0;
  for (const [k, c] of cases.entries()) {
    logSearchTries(own, cpuMs);
    let t0 = cpuMs();
    planStart(c, { skipMassSearch: true });
    ownMs += cpuMs() - t0;
    const m = masses[k]!;
    if (m > 0) {
      const heavy = withTrailingMass(c, m);
      logSearchTries(holding, cpuMs);
      t0 = cpuMs();
      judge(heavy, { depth: "starts", stopWhenFailed: true });
      holdingMs += cpuMs() - t0;
      holdingPlans++;
    }
    logSearchTries(null);
  }
  return { ownMs, holdingMs, holdingPlans };
}

/** Before → after of the cut build paces: own plans and departures' checks, vehicle-steps and CPU per departure. */
export function droppedPacesBeforeAfter(cases: readonly StartCase[], rounds = 2): void {
  const sums = { own: [0, 0, 0, 0], check: [0, 0, 0, 0] };
  const outcomes: Array<Map<number, string>> = [new Map(), new Map()];
  let differ = 0;
  for (let round = 0; round < rounds; round++) {
    for (const on of round % 2 === 0 ? [false, true] : [true, false]) {
      setCutDroppedPaces(on);
      const i = on ? 1 : 0;
      let w0 = vehicleStepsDone();
      let t0 = cpuMs();
      for (const c of cases) planStart(c, { skipMassSearch: true });
      sums.own[2 * i]! += vehicleStepsDone() - w0;
      sums.own[2 * i + 1]! += cpuMs() - t0;
      w0 = vehicleStepsDone();
      t0 = cpuMs();
      for (const [k, c] of cases.entries()) {
        const o = runJob({ kind: "check", case: c, masses: true }) as CheckOutcome;
        const figures = JSON.stringify({ ...o, elapsedMs: 0, masses: o.masses ? { ...o.masses, elapsedMs: 0 } : null });
        const seen = outcomes[i]!.get(k);
        if (seen === undefined) outcomes[i]!.set(k, figures);
        else if (seen !== figures) differ++;
      }
      sums.check[2 * i]! += vehicleStepsDone() - w0;
      sums.check[2 * i + 1]! += cpuMs() - t0;
    }
  }
  setCutDroppedPaces(true);
  for (const [k, figures] of outcomes[0]!) if (outcomes[1]!.get(k) !== figures) differ++;
  const per = rounds * cases.length;
  const M = (x: number) => (x / per / 1e6).toFixed(3);
  const ms = (x: number) => (x / per).toFixed(0);
  heading(`Build paces certain to be dropped, run to their end → cut (first ${cases.length} departures, ${rounds} rounds, in process, one thread)`);
  line("own plans: vehicle-steps per departure", `${M(sums.own[0]!)} → ${M(sums.own[2]!)} M`, `CPU ${ms(sums.own[1]!)} → ${ms(sums.own[3]!)} ms`);
  line("checks with mass searches: vehicle-steps", `${M(sums.check[0]!)} → ${M(sums.check[2]!)} M`, `CPU ${ms(sums.check[1]!)} → ${ms(sums.check[3]!)} ms; ${((100 * (sums.check[0]! - sums.check[2]!)) / Math.max(1, sums.check[0]!)).toFixed(2)} % less work`);
  line("outcomes with other figures", `${differ}`, "of every check, both ways and every round (elapsed time aside)");
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv.find((a, i) => i >= 2 && /^\d+$/.test(a)) ?? 40);
  const cases = allDifferentCases(n);
  if (process.argv.includes("--saving")) {
    droppedPacesBeforeAfter(cases);
    process.exit(0);
  }
  const masses = largestStartable(cases);
  const own: SearchTry[] = [];
  const holding: SearchTry[] = [];
  const r = measureTries(cases, masses, own, holding);
  summarise(`Own plans (planStart, no mass search; first ${n} departures)`, own, n);
  line("CPU", `${(r.ownMs / n).toFixed(0)} ms per departure`);
  summarise(`Holding judgements (judge "starts", verdict-only, at the largest startable mass)`, holding, r.holdingPlans);
  line("CPU", `${(r.holdingMs / Math.max(1, r.holdingPlans)).toFixed(0)} ms per judgement`);
  const checks: SearchTry[] = [];
  logSearchTries(checks, cpuMs);
  const t0 = cpuMs();
  // Preparings that end in the state of an earlier one in the same check (the same train on another rail).
  let prepares = 0;
  let repeated = 0;
  let repeatedSteps = 0;
  let repeatedMs = 0;
  for (const c of cases) {
    const from = checks.length;
    runJob({ kind: "check", case: c, masses: true });
    const seen = new Set<string>();
    for (const t of checks.slice(from)) {
      if (t.phase !== "prepare" || !t.digest) continue;
      prepares++;
      if (seen.has(t.digest)) {
        repeated++;
        repeatedSteps += t.vehicleSteps;
        repeatedMs += t.ms;
      } else seen.add(t.digest);
    }
  }
  const checkMs = cpuMs() - t0;
  logSearchTries(null);
  summarise(`Departures' checks with their mass searches (runJob check, masses)`, checks, n);
  line("CPU", `${(checkMs / n).toFixed(0)} ms per departure`);
  line("preparings ending as an earlier one of the check", `${repeated} of ${prepares}`, `${(repeatedSteps / 1e6).toFixed(2)} M vehicle-steps, ${repeatedMs.toFixed(0)} ms CPU (a share of them could be cloned instead)`);
  if (!process.argv.includes("--tries")) droppedPacesBeforeAfter(cases);
}
