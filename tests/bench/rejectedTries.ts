/**
 * What a plan's rejected tries cost (issue 14): a plan search tries stretch notches (lowest first) and build
 * paces (shortest first) on clones of the run, keeps one of each and drops the rest. Over the first 40 seeded
 * all-different departures (tests/bench/departures.ts), for the departure's own plan (`planStart` without the
 * mass search) and for a holding judgement (`judge` at depth "starts", verdict-only, at the departure's
 * largest startable mass): vehicle-steps of the tries kept against those dropped, by phase, and how far into
 * a dropped try it was certain to be dropped (with the work done after that). Figures, not assertions.
 * Run: `nice npx tsx tests/bench/rejectedTries.ts [count]`.
 */
import { judge, planStart, startableMasses } from "../../src/core/planner/index.js";
import { withTrailingMass } from "../../src/core/planner/startableMass.js";
import { logSearchTries, type SearchTry } from "../../src/core/planner/search.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import type { StartCase } from "../../src/core/train/types.js";
import { runJob } from "../../src/cli/batch/jobs.js";
import { allDifferentDepartures } from "./departures.js";
import { heading, line } from "./util.js";

export function departureCases(n: number): StartCase[] {
  const lib = builtinLibrary();
  return allDifferentDepartures(n).map((d) => {
    const r = parseStartCase(d, lib);
    if (!r.ok) throw new Error(`generated departure ${String(d.id)} does not parse`);
    return r.value;
  });
}

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

function cpuMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
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

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 40);
  const cases = departureCases(n);
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
  for (const c of cases) runJob({ kind: "check", case: c, masses: true });
  const checkMs = cpuMs() - t0;
  logSearchTries(null);
  summarise(`Departures' checks with their mass searches (runJob check, masses)`, checks, n);
  line("CPU", `${(checkMs / n).toFixed(0)} ms per departure`);
}
