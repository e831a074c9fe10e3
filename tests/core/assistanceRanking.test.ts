/**
 * The assistance search ranks its candidates by the peak coupler tension of their planned starts; the
 * departures check stops judging a candidate once that peak has passed the best option's (issue 14, target
 * 1: `pruneLosers`). The reference here is the definition itself (README "How Taut decides", the assistance
 * check): every candidate judged to the end, the options the fewest added units and then the lowest peak,
 * the divided train when none works — what the search did before the pruning, and still does without it.
 * Seeded departures from the batch benchmark's generator (tests/bench/departures.ts), small trains so the
 * reference stays quick.
 */
import { describe, expect, it } from "vitest";
import { judge, type StartCase } from "../../src/core/index.js";
import { searchAssistance, setJudgeByFloor, type AssistanceOptions, type AssistanceResult } from "../../src/core/dispatch/assistance.js";
import { withEvaluationMemo } from "../../src/core/planner/evaluationMemo.js";
import { plannerContext } from "../../src/core/planner/context.js";
import { searchPlan } from "../../src/core/planner/search.js";
import { CHECK_ASSISTANCE_BUDGET, CHECK_DIVIDE_BUDGET } from "../../src/cli/batch/jobs.js";
import { assistanceReport } from "../../src/profiles/assistanceReport.js";
import { seededDepartures } from "../tools/departures.js";

/** What the search reports: every option with its figures (report form), the divided train, its extent. */
function answer(a: AssistanceResult) {
  const rep = assistanceReport(a, 0);
  return { options: rep.assistance, divide: rep.divide, plannerRuns: a.plannerRuns, complete: a.complete };
}

/**
 * The full ranking, the pruned one as the check runs it (candidates planned a phase at a time, lowest peak so
 * far first: `setJudgeByFloor(true)`, the default) and the pruned one by a ceiling from the candidates planned
 * before (`setJudgeByFloor(false)`).
 */
function both(c: StartCase, opts: AssistanceOptions): { full: AssistanceResult; pruned: AssistanceResult; ceiling: AssistanceResult } {
  // Each in a memo of its own, as the check runs it: nothing is shared between them.
  const full = withEvaluationMemo(() => searchAssistance(c, { ...opts, pruneLosers: false }));
  const pruned = withEvaluationMemo(() => searchAssistance(c, { ...opts, pruneLosers: true }));
  setJudgeByFloor(false);
  try {
    const ceiling = withEvaluationMemo(() => searchAssistance(c, { ...opts, pruneLosers: true }));
    return { full, pruned, ceiling };
  } finally {
    setJudgeByFloor(true);
  }
}

describe("a plan search stopped at a peak ceiling", () => {
  // The ranking's stop (search.ts's stopWhenFailed with a peak test) looks only at what the plan keeps: a
  // search that stops has passed the ceiling, so the whole plan's peak is above it; one that does not stop is
  // the whole plan, every step and figure. Over ceilings from half the plan's peak to above it.
  const cases = seededDepartures(6, 40);
  const atCeiling = (c: StartCase, ceilingN: number) => searchPlan(plannerContext(c), { stopWhenFailed: { key: `peak to ${ceilingN}`, failed: (p) => p.branch.peakTensionN() > ceilingN } });
  let stopped = 0;

  for (const [k, c] of cases.entries()) {
    it(`departure ${k + 1}: stopped only above the ceiling; otherwise the whole plan`, () => {
      const plan = searchPlan(plannerContext(c));
      const peakN = plan.branch.peakTensionN();
      for (const f of [0.5, 0.8, 0.95, 0.999, 1, 1.2]) {
        const r = atCeiling(c, f * peakN);
        if (r.stoppedEarly) {
          stopped++;
          expect(peakN).toBeGreaterThan(f * peakN);
          expect(r.branch.peakTensionN()).toBeGreaterThan(f * peakN);
          expect(r.branch.run.s.t).toBeLessThanOrEqual(plan.branch.run.s.t);
        } else {
          expect(r.branch.steps).toEqual(plan.branch.steps);
          expect(r.targetReachedS).toBe(plan.targetReachedS);
          expect(r.branch.peakTensionN()).toBe(peakN);
        }
      }
    });
  }

  it("stopped some searches", () => {
    expect(stopped).toBeGreaterThan(0);
  });
});

describe("the pruned ranking against the full ranking (seeded departures)", () => {
  // The first six small departures that do not start, and the last six of the first 58: those include
  // trains no option helps, divided.
  const needing = seededDepartures(58, 40).filter((c) => judge(c).verdict !== "starts");
  const cases = [...needing.slice(0, 6), ...needing.slice(-6)];
  const seen = { pruned: 0, options: 0, divided: 0, level2: 0 };

  it("draws departures that need help", () => {
    expect(cases.length).toBe(12);
  });

  for (const [k, c] of cases.entries()) {
    it(`departure ${k + 1}: the departures check's option and divided train, as the full ranking gives them`, () => {
      const base = judge(c).verdict;
      const { full, pruned, ceiling } = both(c, { baseVerdict: base, budget: CHECK_ASSISTANCE_BUDGET, divideBudget: CHECK_DIVIDE_BUDGET, maxFullPlans: 1, reportedOnly: true });
      expect(answer(pruned)).toEqual(answer(full));
      expect(answer(ceiling)).toEqual(answer(full));
      // The option's own plan, step for step (the ranking's plan, taken from the memo).
      expect(pruned.options.map((o) => o.plan?.steps)).toEqual(full.options.map((o) => o.plan?.steps));
      // Same units and placement (and every figure, above); the rejections kept are among the full search's.
      expect(pruned.options.map((o) => o.added)).toEqual(full.options.map((o) => o.added));
      for (const r of pruned.rejected) expect(full.rejected).toContainEqual(r);
      expect(full.pruned).toBe(0);
      seen.pruned += pruned.pruned;
      if (full.options.length > 0) seen.options++;
      if (full.options[0]?.units === 2) seen.level2++;
      if (full.divide && full.divide.wagons > 0) seen.divided++;
    });
  }

  it("with two options kept (as `taut plan` keeps them): the same two, in the same order", () => {
    const c = cases.find((x) => searchAssistance(x, { divide: false, maxUnits: 1, budget: 5 }).options.length > 0);
    expect(c, "a departure one unit helps").toBeDefined();
    const { full, pruned, ceiling } = both(c!, { budget: 10, maxFullPlans: 2, divide: false });
    expect(answer(pruned)).toEqual(answer(full));
    expect(answer(ceiling)).toEqual(answer(full));
    expect(full.options.length).toBe(2);
  });

  it("compared options of one and of two units, pruned candidates and a divided train", () => {
    expect(seen.options).toBeGreaterThan(0);
    expect(seen.level2).toBeGreaterThan(0);
    expect(seen.pruned).toBeGreaterThan(0);
    expect(seen.divided).toBeGreaterThan(0);
  });
});
