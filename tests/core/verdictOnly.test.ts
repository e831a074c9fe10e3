/**
 * Verdict-only evaluations (`stopWhenFailed`, decision.ts): a plan that stops as soon as it has failed gives
 * the same verdict as the plan run to its end. The reference is the full decision itself (`judge`, README "How
 * Taut decides") on the same cases: seeded departures from the batch benchmark's generator
 * (tests/bench/departures.ts), some with a short clear distance ahead so that they fail on a dynamic limit, and
 * a long train whose couplers are too weak for it. Agreement asked for (issue 14): identical verdicts — "starts" at
 * depth "starts", "at least marginal" at depth "marginal" — and a plan that stopped did less work.
 */
import { describe, expect, it } from "vitest";
import { judge, goesJudgement, planStart, type StartCase } from "../../src/core/index.js";
import { startsAt } from "../../src/core/planner/decision.js";
import { withEvaluationMemo } from "../../src/core/planner/evaluationMemo.js";
import { seededDepartures } from "../tools/departures.js";
import { longTrainCase } from "../bench/dynamics.js";

/**
 * The departures as they are and with a short clear distance ahead (so that some fail on the travel to the
 * stretch or to the running notch), and the long train with couplers too weak for it (the tension passes the
 * working limit during the stretch).
 */
function cases(): Array<[string, StartCase]> {
  const out: Array<[string, StartCase]> = [];
  for (const c of seededDepartures(8, 70)) {
    const id = `${c.train.wagons} wagons, ${Math.round(c.train.trailingMassKg / 1000)} t, ${c.conditions.rail}`;
    out.push([id, c]);
    out.push([`${id}, 15 % of the clear distance`, { ...c, location: { ...c.location, clearAheadM: 0.15 * c.location.clearAheadM } }]);
  }
  const weak = longTrainCase();
  out.push(["long train, weak couplers", { ...weak, train: { ...weak.train, couplerLimitN: 520_000 } }]);
  return out;
}

describe("a verdict-only plan stops once it fails and gives the full plan's verdict", () => {
  it("starts: the same verdict on seeded departures; plans that failed stopped early with less work", () => {
    let stopped = 0;
    for (const [id, c] of cases()) {
      const full = judge(c, { depth: "starts" });
      const quick = judge(c, { depth: "starts", stopWhenFailed: true });
      expect(quick.verdict, id).toBe(full.verdict);
      expect(startsAt(c), id).toBe(full.verdict === "starts");
      const a = full.threshold.search;
      const b = quick.threshold.search;
      expect(b === null, id).toBe(a === null);
      if (!a || !b) continue;
      expect(a.stoppedEarly, id).toBe(false);
      if (b.stoppedEarly) {
        stopped++;
        expect(full.verdict, id).not.toBe("starts");
        expect(b.branch.run.s.t, id).toBeLessThan(a.branch.run.s.t);
        // The limit that stopped it fails in the full plan too, by at least as much.
        const failing = quick.limits.filter((l) => l.level !== "within" && l.name !== "time-to-target");
        expect(failing.length, id).toBeGreaterThan(0);
        for (const l of failing) expect(full.limits.find((x) => x.name === l.name)!.margin, `${id}: ${l.name}`).toBeLessThanOrEqual(l.margin);
      } else {
        // Not stopped: the very same plan.
        expect(b.branch.run.s.t, id).toBe(a.branch.run.s.t);
        expect(quick.limits.map((l) => l.margin), id).toEqual(full.limits.map((l) => l.margin));
      }
    }
    expect(stopped).toBeGreaterThan(0);
  });

  it("at least marginal: the same verdict on seeded departures; plans over a band stopped early", () => {
    let stopped = 0;
    for (const [id, c] of cases()) {
      const full = goesJudgement(c);
      const quick = goesJudgement(c, undefined, { stopWhenFailed: true });
      expect(quick.holds, id).toBe(full.holds);
      const d = judge(c, { depth: "marginal", stopWhenFailed: true });
      expect(d.verdict, id).toBe(judge(c, { depth: "marginal" }).verdict);
      for (const e of [d.threshold, d.bound]) {
        if (!e?.search?.stoppedEarly) continue;
        stopped++;
        expect(e.limits.some((l) => l.level === "over"), id).toBe(true);
      }
    }
    expect(stopped).toBeGreaterThan(0);
  });

  it("a plan that stopped never stands in for a whole plan of the same case", () => {
    const weak = cases().at(-1)![1];
    const alone = planStart(weak, { skipMassSearch: true, skipSensitivity: true });
    const after = withEvaluationMemo(() => {
      expect(startsAt(weak)).toBe(false);
      return planStart(weak, { skipMassSearch: true, skipSensitivity: true });
    });
    expect(after.verdict).toBe(alone.verdict);
    expect(after.limits).toEqual(alone.limits);
    expect(after.steps).toEqual(alone.steps);
  });
});
