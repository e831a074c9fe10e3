/**
 * A plan search run a phase at a time (resumableSearch.ts, as the assistance ranking runs its
 * candidates) against the same search run in one go: the same plan, step for step and figure for figure; and
 * the peak coupler tension at every pause is a floor of the finished plan's (peaks only grow along a plan,
 * the property the ranking relies on). The reference is the one-go search itself (common practice: a
 * resumed computation equals the uninterrupted one). Seeded departures from the benchmark's generator.
 */
import { describe, expect, it } from "vitest";
import { plannerContext } from "../../src/core/planner/context.js";
import { searchPlan, type SearchResult } from "../../src/core/planner/search.js";
import { memoResumableSearch, ResumableSearch } from "../../src/core/planner/resumableSearch.js";
import { failedSoFar } from "../../src/core/planner/decision.js";
import { memoSearchPlan, withEvaluationMemo } from "../../src/core/planner/evaluationMemo.js";
import { Run } from "../../src/core/dynamics/runner.js";
import { seededDepartures } from "../tools/departures.js";

/** The figures of a search that a plan is made of (the branch's steps and the search's own figures). */
function figures(r: SearchResult) {
  const { branch, prepared, ...rest } = r;
  return { ...rest, steps: branch.steps, peakN: branch.peakTensionN(), t: branch.run.s.t, x: Array.from(branch.run.s.x), v: Array.from(branch.run.s.v), preparedT: prepared.s.t };
}

describe("a search resumed phase by phase equals the search run in one go", () => {
  const cases = seededDepartures(8, 40);
  let paused = 0;
  let severalInAccelerate = 0;

  for (const [k, c] of cases.entries()) {
    it(`departure ${k + 1}: every step and figure the same; the peak at each pause no more than the plan's`, () => {
      const whole = searchPlan(plannerContext(c));
      const s = new ResumableSearch(plannerContext(c));
      const floors: number[] = [];
      let guard = 0;
      while (!s.continueSearch()) {
        floors.push(s.floorN());
        expect(++guard).toBeLessThan(10_000);
      }
      expect(figures(s.result!)).toEqual(figures(whole));
      for (let j = 1; j < floors.length; j++) expect(floors[j]!).toBeGreaterThanOrEqual(floors[j - 1]!);
      for (const f of floors) expect(f).toBeLessThanOrEqual(whole.branch.peakTensionN());
      expect(s.floorN()).toBe(whole.branch.peakTensionN());
      paused += floors.length;
      if (floors.length >= 4) severalInAccelerate++;
    });
  }

  it("paused the searches, several times within the accelerate phase", () => {
    expect(paused).toBeGreaterThan(cases.length);
    expect(severalInAccelerate).toBeGreaterThan(0);
  });

  it("a search stopped once it has failed (a limit, or a peak ceiling) stops where the one-go search stops", () => {
    let stopped = 0;
    for (const c of cases) {
      const ceilingN = 0.7 * searchPlan(plannerContext(c)).branch.peakTensionN();
      const check = (ctx: ReturnType<typeof plannerContext>) => {
        const fails = failedSoFar(ctx, "within");
        return { key: `within, peak to ${ceilingN} N`, failed: (p: Parameters<typeof fails>[0]) => fails(p) || p.branch.peakTensionN() > ceilingN };
      };
      const ctx = plannerContext(c);
      const one = searchPlan(ctx, { stopWhenFailed: check(ctx) });
      const ctx2 = plannerContext(c);
      const s = new ResumableSearch(ctx2, { stopWhenFailed: check(ctx2) });
      while (!s.continueSearch());
      expect(figures(s.result!)).toEqual(figures(one));
      if (one.stoppedEarly) stopped++;
    }
    expect(stopped).toBeGreaterThan(0);
  });

  it("the memo keeps a resumed search once finished: the next judgement plans nothing", () => {
    const c = cases[0]!;
    withEvaluationMemo(() => {
      const s = memoResumableSearch(plannerContext(c));
      while (!s.continueSearch());
      let started = 0;
      const start = Run.start;
      Run.start = (...args: Parameters<typeof Run.start>) => {
        started++;
        return start.apply(Run, args);
      };
      try {
        const again = memoSearchPlan(plannerContext(c));
        expect(again).toBe(s.result);
        const resumedAgain = memoResumableSearch(plannerContext(c));
        expect(resumedAgain.result).toBe(s.result);
      } finally {
        Run.start = start;
      }
      expect(started).toBe(0);
    });
  });
});
