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
import { planStart, startableMasses } from "../../src/core/planner/index.js";
import { withEvaluationMemo } from "../../src/core/planner/evaluationMemo.js";
import { vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import { vehicleStepsBeforeAllMoved } from "../../src/core/dynamics/runner.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { allDifferentDepartures } from "./departures.js";
import { heading, line } from "./util.js";

interface Tally {
  judgements: number;
  steps: number;
  beforeAllMoved: number;
  cpuMs: number;
}

export function benchMassJudgements(n: number): void {
  const lib = builtinLibrary();
  const cases = allDifferentDepartures(n).map((d) => {
    const r = parseStartCase(d, lib);
    if (!r.ok) throw new Error(`generated departure ${String(d.id)} does not parse`);
    return r.value;
  });
  const cpuMs = () => {
    const u = process.cpuUsage();
    return (u.user + u.system) / 1000;
  };
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
