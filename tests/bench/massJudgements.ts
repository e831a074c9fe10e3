/**
 * Where a mass search's work goes (issue 14, target 1): the two searches of each of the first `n` seeded
 * all-different departures (tests/bench/departures.ts), given the case's own verdict as `taut check` runs
 * them, judgement by judgement. Work is counted in vehicle-steps (noise-free): all of it, and the part
 * before every vehicle had moved (brakes releasing, slack taken up) against the part after (the stretched
 * train accelerating to its target). Figures, not assertions.
 *
 * What it showed at main 9e7068c (first 40 departures): about 77 judgements, nearly all at the mass where the
 * quasi-static limits stop allowing the verdict, and nearly all of those hold — so each runs to its target,
 * creeping at about the slowest pace a start may take (the quasi-static limit binds with margin 1.000), below
 * the speed at which the settled train runs as one, in the full chain for minutes of simulated time.
 */
import { goesJudgement, judge, planStart, startableMasses, withTrailingMass, type JudgementReason } from "../../src/core/planner/index.js";
import { fallsShortTopRiskWalks, setFallsShortTopRisk } from "../../src/core/planner/search.js";
import { runJob, type CheckOutcome } from "../../src/cli/batch/jobs.js";
import { withEvaluationMemo } from "../../src/core/planner/evaluationMemo.js";
import { vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import { vehicleStepsBeforeAllMoved } from "../../src/core/dynamics/runner.js";
import { cpuMs, heading, line } from "./util.js";
import { allDifferentCases } from "../tools/departures.js";

interface Tally {
  judgements: number;
  steps: number;
  beforeAllMoved: number;
  cpuMs: number;
}

export function benchMassJudgements(n: number): void {
  const cases = allDifferentCases(n);
  const held: Tally = { judgements: 0, steps: 0, beforeAllMoved: 0, cpuMs: 0 };
  const failed: Tally = { judgements: 0, steps: 0, beforeAllMoved: 0, cpuMs: 0 };
  let searchMs = 0;
  for (const c of cases) {
    const own = planStart(c, { skipMassSearch: true, skipVerification: true, skipSensitivity: true }).verdict;
    let s0 = vehicleStepsDone();
    let b0 = vehicleStepsBeforeAllMoved();
    let t0 = cpuMs();
    const start = t0;
    withEvaluationMemo(() =>
      startableMasses(c, {
        own,
        onJudgement: (_need, _m, holds) => {
          const t = holds ? held : failed;
          const s1 = vehicleStepsDone();
          const b1 = vehicleStepsBeforeAllMoved();
          const t1 = cpuMs();
          t.judgements++;
          t.steps += s1 - s0;
          t.beforeAllMoved += b1 - b0;
          t.cpuMs += t1 - t0;
          s0 = s1;
          b0 = b1;
          t0 = t1;
        },
      }),
    );
    searchMs += cpuMs() - start;
  }
  const M = (x: number) => `${(x / 1e6).toFixed(1)} M`;
  const pct = (x: number, of: number) => `${((100 * x) / Math.max(1, of)).toFixed(0)} %`;
  const all = held.steps + failed.steps;
  heading(`Mass searches, judgement by judgement (first ${n} all-different departures, own verdict given, in process, one thread)`);
  line("CPU, both searches", `${(searchMs / 1000).toFixed(1)} s`, `${(searchMs / n).toFixed(0)} ms per departure`);
  line("judgements: hold / fail", `${held.judgements} / ${failed.judgements}`, `${((held.judgements + failed.judgements) / n).toFixed(2)} per departure`);
  line("vehicle-steps of judgements that hold", M(held.steps), `${pct(held.steps, all)} of the searches' work; ${pct(held.cpuMs, held.cpuMs + failed.cpuMs)} of their CPU`);
  line("… of which after every vehicle moved", M(held.steps - held.beforeAllMoved), `${pct(held.steps - held.beforeAllMoved, held.steps)}: the stretched train creeping on to its target`);
  line("vehicle-steps of judgements that fail", M(failed.steps), "verdict-only: each stops once a limit has failed");
}

/**
 * The mass searches' tail and the honest floor of a verified departure (issue 14, target 1), on the first `n`
 * seeded all-different departures, in this process, one thread, CPU time:
 *  - both mass searches (own verdict given, as `taut check` runs them) with the look-ahead's exact short cuts
 *    off and on (search.ts `setFallsShortTopRisk`; alternating which goes first): CPU and judgements, and
 *    whether any answer or judgement differs;
 *  - the judgements by why they were asked (startableMass.ts `JudgementReason`), the lumped guide's own
 *    judgements apart, and every judgement of the departures that judge 4 masses or more;
 *  - the floor: a departure's own plan (as the check makes it) plus one holding plan at each distinct answer
 *    mass (above 0) — what no search can go under while every answer is a full-model plan — against one plan
 *    of the same train (verdict and verified plan, the ratio's denominator), next to the measured Σ
 *    departures (check, assistance, both masses: `runJob`) ÷ Σ plans.
 * What it showed on the first 100 (2 shared cores, whose load moves a 25 s sum by ±10 %): the searches
 * 23.9 → 23.1 s with the short cuts in one run, 26.7 → 26.7 s in another; departure 85 alone 3.3 → 2.2 s,
 * its lumped guide 1.7 → 0.8 s; 207 full-model judgements either way and none different, 147 of them the
 * probe holding (the answer itself); the six departures judging 4 or more masses 6.6–7.9 s; the floor 2.78×
 * one plan against 4.3–4.4× measured, so no search that verifies every answer with a full plan brings a
 * departure to 1.5× a plan; 41 % need assistance.
 * Run alone: npx tsx tests/bench/massJudgements.ts [n]
 */
export function benchVerifiedFloor(n: number): void {
  const cases = allDifferentCases(n);
  const timed = <T>(f: () => T): [T, number] => {
    const t0 = cpuMs();
    const v = f();
    return [v, cpuMs() - t0];
  };
  planStart(cases[0]!, { skipMassSearch: true }); // warm-up
  const sum = { plan: 0, departure: 0, own: 0, holding: 0, before: 0, after: 0, judgedBefore: 0, judgedAfter: 0, guideBefore: 0, guideAfter: 0, guideJudged: 0, assistOwn: 0, assistDeparture: 0 };
  let differ = 0;
  let needsAssistance = 0;
  let notHolding = 0;
  const reasons = new Map<string, { count: number; ms: number }>();
  const tail: string[] = [];
  let tailMs = 0;
  let tailCount = 0;
  let walks = 0;
  for (const [k, c] of cases.entries()) {
    const [, planMs] = timed(() => planStart(c, { skipMassSearch: true }));
    const [o, departureMs] = timed(() => runJob({ kind: "check", case: c, masses: true }) as CheckOutcome);
    const [own, ownMs] = timed(() => planStart(c, { skipMassSearch: true, skipVerification: true, skipSensitivity: true }).verdict);
    sum.plan += planMs;
    sum.departure += departureMs;
    sum.own += ownMs;
    if (own === "needs-assistance") {
      needsAssistance++;
      sum.assistOwn += ownMs;
      sum.assistDeparture += departureMs;
    }
    // The two searches, short cuts off and on, alternating which goes first.
    const search = (on: boolean) => {
      setFallsShortTopRisk(on);
      const judged: Array<{ need: string; massKg: number; holds: boolean; why: JudgementReason; ms: number }> = [];
      const guide = { count: 0, ms: 0 };
      let t = cpuMs();
      const w0 = fallsShortTopRiskWalks();
      const [m, ms] = timed(() =>
        startableMasses(c, {
          own,
          onJudgement: (need, massKg, holds, _score, why) => {
            const now = cpuMs();
            judged.push({ need, massKg, holds, why, ms: now - t });
            t = now;
          },
          onGuideJudgement: () => {
            const now = cpuMs();
            guide.count++;
            guide.ms += now - t;
            t = now;
          },
        }),
      );
      return { m, ms, judged, guide, walks: fallsShortTopRiskWalks() - w0 };
    };
    const [x, y] = k % 2 === 0 ? [search(false), search(true)] : [search(true), search(false)];
    const [before, after] = k % 2 === 0 ? [x, y] : [y, x];
    setFallsShortTopRisk(true);
    walks += after.walks;
    sum.before += before.ms;
    sum.after += after.ms;
    sum.judgedBefore += before.judged.length;
    sum.judgedAfter += after.judged.length;
    sum.guideBefore += before.guide.ms;
    sum.guideAfter += after.guide.ms;
    sum.guideJudged += after.guide.count;
    const strip = (j: typeof after.judged) => j.map(({ ms: _ms, ...rest }) => rest);
    if (JSON.stringify(before.m) !== JSON.stringify(after.m) || JSON.stringify(strip(before.judged)) !== JSON.stringify(strip(after.judged))) differ++;
    for (const j of after.judged) {
      const key = `${j.why} ${j.holds ? "holds" : "fails"}`;
      const r = reasons.get(key) ?? { count: 0, ms: 0 };
      r.count++;
      r.ms += j.ms;
      reasons.set(key, r);
    }
    if (after.judged.length >= 4) {
      tailCount++;
      tailMs += after.ms;
      const js = after.judged.map((j) => `${j.need} ${(j.massKg / 1000).toFixed(1)} t ${j.holds ? "holds" : "fails"} (${j.why}, ${j.ms.toFixed(0)} ms)`);
      const g = after.guide.count ? `; lumped guide ${after.guide.count} judgements, ${before.guide.ms.toFixed(0)} → ${after.guide.ms.toFixed(0)} ms` : "";
      tail.push(`departure ${k + 1} (${c.train.wagons} wagons, ${c.conditions.rail}), ${(before.ms / 1000).toFixed(2)} → ${(after.ms / 1000).toFixed(2)} s${g}: ${js.join("; ")}`);
    }
    // One holding plan at each distinct answer mass, nothing shared (a fresh memo each).
    const answers = [...new Set([after.m.startsKg, after.m.marginalKg])].filter((m) => m > 0);
    for (const m of answers) {
      const at = withTrailingMass(c, m);
      const [holds, ms] = timed(() =>
        withEvaluationMemo(() => (m === after.m.startsKg ? judge(at, { depth: "starts", stopWhenFailed: true }).verdict === "starts" : goesJudgement(at, undefined, { stopWhenFailed: true }).holds)),
      );
      if (!holds) notHolding++;
      sum.holding += ms;
    }
  }
  const s = (ms: number) => `${(ms / 1000).toFixed(1)} s`;
  heading(`The mass searches' tail and the floor of a verified departure (first ${n} all-different departures, in process, one thread, CPU)`);
  line(
    "mass searches, look-ahead short cuts off → on",
    `${s(sum.before)} → ${s(sum.after)}`,
    `${(sum.after / sum.before).toFixed(2)}×; judgements ${sum.judgedBefore} → ${sum.judgedAfter}; ${differ} of ${n} departures with another answer or judgement; ${walks} short-cut walks`,
  );
  const byReason = [...reasons].sort((a, b) => b[1].ms - a[1].ms).map(([key, r]) => `${key} ${r.count} (${s(r.ms)})`);
  line("full-model judgements by why they were asked", `${sum.judgedAfter}`, byReason.join(", "));
  line(
    "lumped guide (judgements on a dozen bodies), short cuts off → on",
    `${s(sum.guideBefore)} → ${s(sum.guideAfter)}`,
    `${sum.guideJudged} judgements; not in the full-model judgements' CPU above`,
  );
  line("departures judging 4 masses or more", `${tailCount}`, `${s(tailMs)} of the searches' ${s(sum.after)}`);
  for (const t of tail) console.log(`    ${t}`);
  line("Σ departures ÷ Σ plans (measured)", `${(sum.departure / sum.plan).toFixed(2)}×`, `${s(sum.departure)} ÷ ${s(sum.plan)}; a plan: verdict and verified plan`);
  line(
    "floor of a verified departure",
    `${((sum.own + sum.holding) / sum.plan).toFixed(2)}×`,
    `Σ floor ÷ Σ plans: own plan ${s(sum.own)} + one holding plan at each distinct answer mass ${s(sum.holding)}${notHolding ? `; ${notHolding} answers did not hold (a defect)` : ""}; the assistance search is not in it`,
  );
  line(
    "… above the floor",
    s(sum.departure - sum.own - sum.holding),
    `the mass searches beyond one holding plan per answer ${s(sum.after - sum.holding)}; the assistance searches and the rest ${s(sum.departure - sum.own - sum.after)} (Σ departures − own plans − searches measured alone)`,
  );
  line(
    "departures that need assistance",
    `${((100 * needsAssistance) / n).toFixed(0)} %`,
    `${needsAssistance} of ${n}: own plan ${(sum.assistOwn / Math.max(1, needsAssistance)).toFixed(0)} ms mean (fails early), the whole departure ${(sum.assistDeparture / Math.max(1, needsAssistance)).toFixed(0)} ms mean; the others' own plan ${((sum.own - sum.assistOwn) / Math.max(1, n - needsAssistance)).toFixed(0)} ms`,
  );
}

if (process.argv[1] && import.meta.url.endsWith(process.argv[1].replace(/^.*\/tests\//, "/tests/"))) benchVerifiedFloor(Number(process.argv[2] ?? 100));
