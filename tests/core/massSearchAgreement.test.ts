/**
 * The fast searches answer what the full ones do (issue 14, target 1). The largest startable and marginal
 * masses are found with the quasi-static limits as a probe, the floor planned only when the probe fails, the
 * ceiling tried first where no quasi-static limit binds, the marginal verdict settled by the marginal bound's
 * plan alone when it can be, and plans shared between the judgements of one piece of work. The reference here
 * is the definition itself (README "How Taut decides"): the largest mass for which the full decision
 * (`judge`, every plan made) says "starts" (or at least "marginal"), found by a plain doubling and bisection
 * from the lightest train, with no probe and no shared plans. Seeded departures from the batch benchmark's
 * generator (tests/bench/departures.ts), the small trains only so the reference stays quick.
 */
import { describe, expect, it } from "vitest";
import { judge, largestStartableMassKg, massCeilingKg, startableMasses, type StartCase } from "../../src/core/index.js";
import { searchAssistance } from "../../src/core/dispatch/assistance.js";
import { withEvaluationMemo } from "../../src/core/planner/evaluationMemo.js";
import { CHECK_ASSISTANCE_BUDGET, CHECK_DIVIDE_BUDGET, runJob, type CheckOutcome, type MassOutcome } from "../../src/cli/batch/jobs.js";
import { assistanceReport } from "../../src/profiles/assistanceReport.js";
import { seededDepartures } from "../tools/departures.js";

/** The reference: a plain search over the full decision's verdict, to 0.25 %. */
function referenceMassKg(c: StartCase, holds: (v: ReturnType<typeof judge>["verdict"]) => boolean): number {
  return largestStartableMassKg(c, (x) => holds(judge(x).verdict), { relativeTolerance: 0.0025, toleranceKg: 50, ceilingKg: massCeilingKg(c) });
}

/** Within 1 % of the reference (both "none" when the reference finds none). */
function expectWithinOnePercent(fast: number, reference: number, what: string): void {
  if (reference === 0) expect(fast, what).toBe(0);
  else expect(Math.abs(fast - reference) / reference, `${what}: ${fast} kg against ${reference} kg`).toBeLessThanOrEqual(0.01);
}

describe("fast mass search against the full search (seeded departures)", () => {
  const cases = seededDepartures(5, 20);

  it("draws departures with every verdict", () => {
    expect(new Set(cases.map((c) => judge(c).verdict)).size).toBe(3);
  });

  for (const [k, c] of cases.entries()) {
    it(`departure ${k + 1}: same verdict, largest masses within 1 %`, () => {
      const own = judge(c).verdict;
      const fast = startableMasses(c, { own });
      const startsRef = referenceMassKg(c, (v) => v === "starts");
      const goesRef = referenceMassKg(c, (v) => v !== "needs-assistance");
      expectWithinOnePercent(fast.startsKg, startsRef, "largest startable");
      expectWithinOnePercent(fast.marginalKg, Math.max(startsRef, goesRef), "largest marginal");
      // The verdicts the two searches give the departure itself agree, and agree with its own verdict.
      const mass = c.train.trailingMassKg;
      expect(mass <= fast.startsKg).toBe(own === "starts");
      expect(mass > fast.marginalKg).toBe(own === "needs-assistance");
      // The batch job (check and masses on one thread, plans shared) gives the same figures.
      const job = runJob({ kind: "check", case: c, masses: true }) as CheckOutcome;
      expect(job.verdict).toBe(own);
      const m = job.masses as MassOutcome;
      expect(m.maxStartableMassKg).toBe(fast.startsKg);
      expect(m.largestMarginalMassKg).toBe(fast.marginalKg);
    });
  }
});

describe("plans shared within one piece of work change no answer", () => {
  it("the assistance search finds the same options and rejections with and without the memo", () => {
    const c = seededDepartures(12, 20).find((x) => judge(x).verdict !== "starts");
    expect(c, "a small departure that does not start").toBeDefined();
    const opts = { budget: 12, divideBudget: 6, maxFullPlans: 1 };
    const plain = searchAssistance(c!, opts);
    const shared = withEvaluationMemo(() => searchAssistance(c!, opts));
    const summary = (a: typeof plain) => ({
      options: a.options.map((o) => ({ added: o.added, verdict: o.verdict, margin: o.margin, peak: o.peakCouplerForceN, time: o.timeToTargetS })),
      rejected: a.rejected.map((r) => ({ added: r.added, verdict: r.verdict, reasons: r.reasons, by: r.by })),
      divide: a.divide ? { wagons: a.divide.wagons, planned: a.divide.plan !== null } : null,
      runs: a.plannerRuns,
    });
    expect(summary(shared)).toEqual(summary(plain));
  });
});

describe("the departures check's assistance against the full search (seeded departures)", () => {
  // The check plans its option and its divided train without the verifying re-run and the sensitivity table
  // it never reports, and shares plans with the mass search: the option it reports must be the one the full
  // search (every plan complete, nothing shared) puts first, with the same figures, and the same divided train.
  const cases = seededDepartures(14, 20)
    .filter((c) => judge(c).verdict !== "starts")
    .slice(0, 3);

  const seen = { options: 0, divided: 0 };

  it("draws departures that need help", () => {
    expect(cases.length).toBe(3);
  });

  for (const [k, c] of cases.entries()) {
    it(`departure ${k + 1}: the same cheapest option and divided train`, () => {
      const full = searchAssistance(c, { budget: CHECK_ASSISTANCE_BUDGET, divideBudget: CHECK_DIVIDE_BUDGET, maxFullPlans: 1 });
      const ref = assistanceReport(full, CHECK_ASSISTANCE_BUDGET + CHECK_DIVIDE_BUDGET);
      const job = runJob({ kind: "check", case: c, masses: true }) as CheckOutcome;
      expect(job.assistance).toEqual(ref.assistance[0] ?? null);
      expect(job.divide).toEqual(ref.divide);
      expect(job.searchCapped).toBe(!full.complete);
      if (job.assistance) seen.options++;
      if (job.divide) seen.divided++;
    });
  }

  it("compared at least one option that works", () => {
    expect(seen.options).toBeGreaterThan(0);
  });
});
