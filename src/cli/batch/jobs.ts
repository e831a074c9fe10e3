/**
 * The work of a batch, as jobs a worker thread (or the calling thread) runs: checking one departure (plan,
 * verdict and the cheapest assistance) and finding the largest startable mass of one case. Jobs and results
 * are plain data (they cross a thread boundary by structured clone); results are already in output units.
 */
import { adviceText } from "../../i18n/renderAdvice.js";
import { ENGLISH, ENGLISH_SI } from "../../profiles/lineReport.js";
import { searchAssistance } from "../../core/dispatch/assistance.js";
import { goesAt, planStart, startableMasses, startsAt } from "../../core/planner/index.js";
import { withEvaluationMemo } from "../../core/planner/evaluationMemo.js";
import type { LocomotiveSpec } from "../../core/physics/types.js";
import type { LimitName, Reason, Verdict } from "../../core/planner/outcome.js";
import type { StartCase } from "../../core/train/types.js";
import { assistanceReport } from "../../profiles/assistanceReport.js";
import { r, type AssistanceReport, type DivideReport } from "../../profiles/report.js";

/** Planner runs a departure's assistance search may use for the options, and for dividing the train. */
export const CHECK_ASSISTANCE_BUDGET = 12;
export const CHECK_DIVIDE_BUDGET = 6;

export type Job =
  /** `masses`: also the largest masses, on the same thread, so the searches share the plans they have in common. */
  | { kind: "check"; case: StartCase; helper?: LocomotiveSpec; masses?: boolean }
  /**
   * The largest masses; `own` is the case's verdict when known (the figures agree with it), `startsOnly` skips the
   * marginal one, `ofMakeUp` gives the make-up's figures (a load table's cell: no plan of the case's own mass).
   */
  | { kind: "mass"; case: StartCase; own?: Verdict; startsOnly?: boolean; ofMakeUp?: boolean }
  /**
   * One verdict of a mass search, judged ahead of time (speculate.ts): "starts" or "goes" (at least marginal).
   * `shared` also receives it in word 0 (1 holds, 2 does not, 3 failed; word 1 is set when the job begins), for a
   * thread that waits without an event loop.
   */
  | { kind: "verdict"; case: StartCase; need: "starts" | "goes"; shared?: Int32Array };

export interface CheckOutcome {
  kind: "check";
  verdict: Verdict;
  reasons: Reason[];
  margin: number;
  /** The limit the margin is of. */
  binding: LimitName;
  peakCouplerForce_kN: number;
  timeToTarget_s: number | null;
  /** The cheapest option that starts, or null. */
  assistance: AssistanceReport | null;
  /** When no option works: the divided train. */
  divide: DivideReport | null;
  /** The search was cut short by its cap. */
  searchCapped: boolean;
  /** Why it does not start and what would change it (empty when it starts). */
  advice: string[];
  /** The largest masses when the job asked for them (bracketed by the verdict above). */
  masses?: MassOutcome;
  elapsedMs: number;
}

export interface MassOutcome {
  kind: "mass";
  maxStartableMassKg: number;
  /** NaN when only the largest startable mass was asked for. */
  largestMarginalMassKg: number;
  /** Masses the two searches judged (each a verdict; most are one plan). */
  judgements: number;
  elapsedMs: number;
}

export interface VerdictOutcome {
  kind: "verdict";
  holds: boolean;
  elapsedMs: number;
}

export type JobOutcome = CheckOutcome | MassOutcome | VerdictOutcome;

/** Run one job on this thread. */
export function runJob(job: Job): JobOutcome {
  if (job.kind === "verdict") return verdictJob(job);
  return withEvaluationMemo(() => (job.kind === "mass" ? massJob(job.case, job.own, job.startsOnly, job.ofMakeUp) : checkJob(job)));
}

/** Shared-state codes of a verdict job (see `Job`). */
export const VERDICT_PENDING = 0;
export const VERDICT_HOLDS = 1;
export const VERDICT_FAILS = 2;
export const VERDICT_ERROR = 3;

function verdictJob(job: Extract<Job, { kind: "verdict" }>): VerdictOutcome {
  const t0 = performance.now();
  if (job.shared) {
    Atomics.store(job.shared, 1, 1);
    Atomics.notify(job.shared, 1);
  }
  let holds: boolean;
  try {
    holds = job.need === "starts" ? startsAt(job.case) : goesAt(job.case);
  } catch (e) {
    if (job.shared) {
      Atomics.store(job.shared, 0, VERDICT_ERROR);
      Atomics.notify(job.shared, 0);
    }
    throw e;
  }
  if (job.shared) {
    Atomics.store(job.shared, 0, holds ? VERDICT_HOLDS : VERDICT_FAILS);
    Atomics.notify(job.shared, 0);
  }
  return { kind: "verdict", holds, elapsedMs: performance.now() - t0 };
}

function massJob(c: StartCase, own?: Verdict, startsOnly?: boolean, ofMakeUp?: boolean): MassOutcome {
  const t0 = performance.now();
  let judgements = 0;
  const m = startableMasses(c, { ...(own ? { own } : {}), ...(startsOnly ? { startsOnly: true } : {}), ...(ofMakeUp ? { ofMakeUp: true } : {}), onJudgement: () => judgements++ });
  return { kind: "mass", maxStartableMassKg: m.startsKg, largestMarginalMassKg: m.marginalKg, judgements, elapsedMs: performance.now() - t0 };
}

function checkJob(job: Extract<Job, { kind: "check" }>): CheckOutcome {
  const t0 = performance.now();
  const c = job.case;
  // The check reports no verification run (the plan's re-run on the median rail) and no sensitivity table:
  // not made, here nor for the assistance option and the divided train's first part.
  const p = planStart(c, { skipMassSearch: true, skipVerification: true, skipSensitivity: true });
  const planMs = performance.now() - t0;
  // The masses before the assistance: their search settles whether a lightly loaded train starts, which
  // dividing the train asks first (divideTrain.ts) — answered once, and the two can never disagree.
  const masses = job.masses ? massJob(c, p.verdict) : undefined;
  const t1 = performance.now();
  let assistance: AssistanceReport | null = null;
  let divide: DivideReport | null = null;
  let searchCapped = false;
  if (p.verdict !== "starts") {
    const a = searchAssistance(c, {
      baseVerdict: p.verdict,
      budget: CHECK_ASSISTANCE_BUDGET,
      divideBudget: CHECK_DIVIDE_BUDGET,
      maxFullPlans: 1,
      reportedOnly: true,
      // Only the cheapest option is reported, not the rejections: a candidate that cannot rank first is not judged to the end.
      pruneLosers: true,
      ...(masses ? { lightestStarts: masses.maxStartableMassKg > 0 } : {}),
      ...(job.helper ? { spec: job.helper } : {}),
    });
    const rep = assistanceReport(a, CHECK_ASSISTANCE_BUDGET + CHECK_DIVIDE_BUDGET);
    assistance = rep.assistance[0] ?? null;
    divide = rep.divide;
    searchCapped = !a.complete;
  }
  const checkMs = planMs + (performance.now() - t1);
  return {
    kind: "check",
    verdict: p.verdict,
    reasons: p.reasons,
    margin: r(p.margin, 3),
    binding: p.binding,
    peakCouplerForce_kN: r(p.peakCouplerForceN / 1000, 0),
    timeToTarget_s: p.timeToTargetS === null ? null : r(p.timeToTargetS, 0),
    assistance,
    divide,
    searchCapped,
    advice: p.advice.map((a) => adviceText(ENGLISH, ENGLISH_SI, a)),
    ...(masses ? { masses } : {}),
    elapsedMs: checkMs,
  };
}
