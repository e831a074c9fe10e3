/**
 * The start planner: from a start case to a notch sequence with slip risk, coupler forces and a verdict.
 * Static screen first; then a deterministic, phase-by-phase search in the full dynamics model
 * (median adhesion), and a verifying re-run of the chosen notch timing with pessimistic adhesion.
 */
import { caseCautions, STANDARD_CAUTIONS } from "./cautions.js";
import { modelFromCase } from "../train/trainModel.js";
import { sequenceControls, simulate } from "../dynamics/simulate.js";
import { sensitivity } from "./sensitivity.js";
import { slipGuidance } from "./slip.js";
import { largestStartableMassKg } from "./startableMass.js";
import { staticCheck } from "./staticCheck.js";
import { gradeAt } from "../physics/track.js";
import type { StartCase } from "../train/types.js";
import { MIN_NOTCH_DWELL_S, plannerContext, type PlannerContext } from "./context.js";
import { ACCELERATE_MAX_S, policyNotch, searchPlan, type SearchResult } from "./search.js";
import { rigidAccelerate } from "./rigid.js";
import { planSteps } from "./steps.js";
import type { PlanOptions, PlanResult, PlanSeries, PlanStep } from "./types.js";
import { planVerdict } from "./verdict.js";

/** Plan the start of a case. Throws a "cancelled" error when `shouldStop` says so. */
export function planStart(c: StartCase, opts: PlanOptions = {}): PlanResult {
  const ctx = plannerContext(c);
  const search = searchPlan(ctx, searchOptions(opts));
  const used = { ...ctx, riskCap: search.riskCap };
  const verification = opts.skipVerification || search.failure !== null ? null : verify(used, search);
  const v = planVerdict(used, search, { slip: verification?.slipped ?? false, coupler: verification?.overAllowance ?? false }, search.riskCap > ctx.riskCap || stretchAboveCap(ctx, search));
  const steps = search.failure === null ? planSteps(used, search) : [];
  const maxKg = opts.skipMassSearch ? Number.NaN : maxStartableMassKg(c, opts.shouldStop);
  opts.onProgress?.(1);
  const run = search.branch.run;
  const series = run.seriesView();
  return {
    verdict: v.verdict,
    reasons: v.reasons,
    margin: v.margin,
    margins: v.margins,
    static: ctx.st,
    steps,
    peakCouplerForceN: search.failure === null ? search.branch.peakTensionN() : ctx.st.peakTensionN,
    peakCompressionN: search.failure === null ? search.branch.steps.reduce((m, s) => Math.max(m, s.peakCompressionN), 0) : ctx.st.peakCompressionN,
    couplerPeaksN: run.s.peakTensionN.slice(),
    couplerCompressionPeaksN: run.s.peakCompressionN.slice(),
    timeToTargetS: search.targetReachedS === null ? null : search.targetReachedS - search.powerS,
    maxStartableMassKg: maxKg,
    slipGuidance: slipGuidance({
      sand: c.conditions.sand,
      sanders: ctx.model.locoSpecs.some((s) => s.sanders),
      risingGrade: gradeAt(c.location.track, c.location.frontAtM - 1) > 2 || ctx.rollBackPullN > 0,
      pointsAhead: true,
    }),
    cautions: [...STANDARD_CAUTIONS, ...caseCautions(c, ctx.st.resistance.totalN), ...heatingCautions(ctx, steps)],
    series: {
      timeS: series.timeS,
      speedMps: series.leadSpeedMps,
      notch: series.notch,
      locoTravelM: series.leadTravelM,
      maxTensionN: series.maxTensionN,
    } satisfies PlanSeries,
    verification,
    sensitivity: sensitivity(c),
    stretch: {
      lastVehicleMovesS: run.lastVehicleMovesS === null ? null : run.lastVehicleMovesS - search.powerS,
      locoTravelToStretchM: run.locoTravelToStretchM,
      maxRunOutMps: run.s.takeUp.maxRunOutMps,
    },
  };
}

/** Longest a plan may hold current above the continuous rating at low speed before we say so, s [M]. */
const HEATING_WARN_S = 60;

/**
 * DC traction motors heat fast at low speed and high current (Alaska Railroad manual p. 64-18 [P]: do not
 * keep power on a standing locomotive longer than needed). Flag steps that hold effort above the continuous
 * rating below the continuous speed for long.
 */
function heatingCautions(ctx: PlannerContext, steps: PlanStep[]): string[] {
  const spec = ctx.model.locoSpecs[0];
  if (!spec) return [];
  const perUnitContinuous = spec.continuousTractiveEffortN * ctx.model.nl;
  const hot = steps.filter((s) => s.notch > 0 && s.tractiveEffortN > perUnitContinuous && s.speedMps < spec.continuousSpeedMps && s.advanceWhen.afterS > HEATING_WARN_S);
  if (hot.length === 0) return [];
  const longest = Math.max(...hot.map((s) => s.advanceWhen.afterS));
  return [
    `The plan holds traction current above the continuous rating at low speed for up to ${Math.round(longest)} s: keep within the locomotive's short-time ratings and do not hold power on a train that is not moving.`,
  ];
}

/** The stretch notch itself carried more slip risk than the case accepts. */
function stretchAboveCap(ctx: PlannerContext, r: SearchResult): boolean {
  const st = r.branch.steps.find((s) => s.phase === "stretch");
  return st !== undefined && st.maxRisk > ctx.riskCap + 1e-9;
}

function searchOptions(opts: PlanOptions) {
  return {
    ...(opts.shouldStop ? { shouldStop: opts.shouldStop } : {}),
    ...(opts.onProgress ? { onProgress: (f: number) => opts.onProgress!(opts.skipMassSearch ? f : 0.5 * f) } : {}),
    mode: opts.verdictOnly ? ("verdict" as const) : ("full" as const),
  };
}

/** Does the planner say this case starts? The static verdict is checked first: the plan cannot do better. */
export function plannerStarts(c: StartCase, shouldStop?: () => boolean): boolean {
  if (staticCheck(c).verdict !== "starts") return false;
  return planStart(c, { skipMassSearch: true, skipVerification: true, verdictOnly: true, ...(shouldStop ? { shouldStop } : {}) }).verdict === "starts";
}

/**
 * Largest trailing mass the planner says starts: bisection over the planner's verdict, below the static
 * limit (which the planner can only lower).
 */
export function maxStartableMassKg(c: StartCase, shouldStop?: () => boolean): number {
  const staticMax = largestStartableMassKg(c, (x) => staticCheck(x).verdict === "starts");
  if (staticMax <= 0) return 0;
  // A cheap first estimate from the one-mass model brackets the answer, so the planner itself is asked
  // only a handful of times around it.
  const guess = largestStartableMassKg(c, rigidStarts, { upperBoundKg: staticMax, relativeTolerance: 0.01 });
  return largestStartableMassKg(c, (x) => plannerStarts(x, shouldStop), {
    upperBoundKg: staticMax,
    toleranceKg: Math.max(500, 0.002 * staticMax),
    ...(guess > 0 && guess < staticMax ? { guessKg: guess } : {}),
  });
}

/**
 * The one-mass estimate of "starts": the static check holds and the whole train, taken as one mass from
 * rest, reaches the target under the planner's notch rule within the slip-risk threshold.
 */
function rigidStarts(c: StartCase): boolean {
  const ctx = plannerContext(c);
  if (ctx.st.verdict !== "starts") return false;
  const out = rigidAccelerate(
    ctx,
    { timeS: 0, speedMps: 0, travelM: 0, notch: 1 },
    (notch, v, inStepS, capped) => policyNotch(ctx, notch, v, inStepS, MIN_NOTCH_DWELL_S, true, 0, capped),
    ACCELERATE_MAX_S,
  );
  return out.reachedS !== null;
}

/**
 * Re-run the chosen notch timing in the full model with adhesion at the accepted risk (the pessimistic
 * quantile): no wheel slip and couplers within their allowance confirm the plan.
 */
function verify(ctx: PlannerContext, r: SearchResult): NonNullable<PlanResult["verification"]> {
  // At the cap's quantile every step's demand is within what the rails give (risk ≤ cap ⟺ demand ≤ μ_cap).
  const q = Math.max(0.01, ctx.riskCap);
  const model = modelFromCase(ctx.c, { adhesionQuantile: q });
  const seq = r.branch.steps.map((s) => ({ notch: s.notch, atS: s.startS }));
  // Slips and coupler peaks come with notch changes: verify through the last change and a minute after
  // it (the notch then held was checked for its slip risk up to the target speed).
  const lastChange = r.branch.steps[r.branch.steps.length - 1]!.startS;
  const end = Math.min(r.branch.run.s.t, lastChange + 60);
  const res = simulate(model, sequenceControls(seq, { trainBrakeReleaseS: 0, locoBrakeReleaseS: r.powerS }), { durationS: end });
  return {
    adhesionQuantile: q,
    slipped: res.slipEpisodes.length > 0,
    slipEpisodes: res.slipEpisodes.length,
    peakCouplerForceN: res.peakTensionN,
    overAllowance: res.peakTensionN > ctx.couplerAllowanceN * 1.02,
    finalSpeedMps: res.final.leadSpeedMps,
  };
}
