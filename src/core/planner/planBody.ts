/**
 * The start planner: from a start case to a notch sequence with slip risk, coupler forces and a verdict.
 * The verdict, its margin and the plan come from the one decision (decision.ts); this module turns them
 * into what a driver and a dispatcher read: steps, cautions, the slip card, the largest masses, advice.
 * The largest masses' search is handed in (plan.ts hands in startableMass.ts): a plan that skips it — the
 * app's first plan — then carries none of the search's code (the planner worker's first script).
 */
import { caseCautions, STANDARD_CAUTIONS, type Caution } from "./cautions.js";
import { modelFromCase } from "../train/trainModel.js";
import { continueRun, sequenceControls, simulate } from "../dynamics/simulate.js";
import { slipGuidance } from "./slip.js";
import { massCeilingKg } from "./massCeiling.js";
import { gradeAt } from "../physics/track.js";
import type { StartCase } from "../train/types.js";
import type { PlannerContext } from "./context.js";
import { HELPER_FOLLOW_S, brakeSchedule, runsAsOneWhenSettled, type SearchResult } from "./search.js";
import type { StepRecord } from "./branch.js";
import { planSteps } from "./steps.js";
import type { PlanOptions, PlanResult, PlanSeries, PlanStep } from "./types.js";
import { goesAt, judge, quasiStaticLimits, startsAt, vehicleRef, type Decision } from "./decision.js";
import { WHEEL_CLIMB_ALLOWANCE, nadalLimit } from "../physics/wheelClimb.js";
import type { LimitCheck } from "./outcome.js";
import type { AdviceLine, ChangeLine } from "./lines.js";
import { marginalBound, plannerContext } from "./context.js";
import { MAX_MARGIN } from "./need.js";
import type { Reason } from "./outcome.js";

/** The largest startable and marginal masses of a case whose own verdict is `own` (startableMass.ts). */
export type MassSearch = (c: StartCase, own: Decision["verdict"], opts: PlanOptions) => { startsKg: number; marginalKg: number; ceilingKg: number };

/** The parts of a plan that are searches of their own, handed in by plan.ts: the largest masses and the sensitivity table. */
export interface PlanSearches {
  masses: MassSearch;
  sensitivity: (c: StartCase) => PlanResult["sensitivity"];
}

/**
 * Plan the start of a case, its largest masses and sensitivity table from `searches` (required unless
 * `opts` skips both). Throws a "cancelled" error when `shouldStop` says so.
 */
export function planStartWith(c: StartCase, opts: PlanOptions, searches: PlanSearches | null): PlanResult {
  if ((!opts.skipMassSearch || !opts.skipSensitivity) && !searches) throw new RangeError("planStartWith: the searches are needed unless the plan skips them");
  const progress = opts.onProgress;
  const d = judge(c, {
    depth: "full",
    ...(opts.shouldStop ? { shouldStop: opts.shouldStop } : {}),
    ...(progress ? { onProgress: (f: number) => progress(opts.skipMassSearch ? f : 0.5 * f) } : {}),
  });
  const shown = d.shown;
  const ctx = shown.ctx;
  const r = shown.search!;
  const goes = d.verdict !== "needs-assistance" && r.failure === null;
  const verification = opts.skipVerification || !goes ? null : verify(ctx, r);
  const steps = goes ? planSteps(ctx, r) : [];
  const masses = opts.skipMassSearch || !searches ? { startsKg: Number.NaN, marginalKg: Number.NaN, ceilingKg: massCeilingKg(c) } : searches.masses(c, d.verdict, opts);
  progress?.(1);
  const run = r.branch.run;
  const series = run.seriesView();
  return {
    verdict: d.verdict,
    reasons: d.reasons,
    margin: d.margin,
    binding: d.binding,
    limits: d.limits,
    margins: reasonMargins(d.limits),
    startKind: d.startKind,
    planQuantile: ctx.quantile,
    advice: advice(c, d, masses),
    static: ctx.st,
    steps,
    peakCouplerForceN: r.branch.peakTensionN(),
    peakCompressionN: r.branch.steps.reduce((m, s) => Math.max(m, s.peakCompressionN), 0),
    couplerPeaksN: run.s.peakTensionN.slice(),
    couplerCompressionPeaksN: run.s.peakCompressionN.slice(),
    // From the threshold's plan, as the limits are.
    wheelClimb: d.threshold.search ? wheelClimbOf(d.threshold.ctx, d.threshold.search) : null,
    timeToTargetS: r.targetReachedS === null ? null : r.targetReachedS - r.powerS,
    trailingMassKg: c.train.trailingMassKg,
    maxStartableMassKg: masses.startsKg,
    largestMarginalMassKg: masses.marginalKg,
    massSearchCeilingKg: masses.ceilingKg,
    slipGuidance: slipGuidance({
      sand: c.conditions.sand,
      sanders: ctx.model.locoSpecs.some((s) => s.sanders),
      risingGrade: gradeAt(c.location.track, c.location.frontAtM - 1) > 2 || ctx.rollBackPullN > 0,
      pointsAhead: true,
    }),
    cautions: [
      ...STANDARD_CAUTIONS,
      ...caseCautions(c, ctx.st.resistance.totalN, { kind: ctx.startKind, locoBrakeHolds: ctx.locoBrakeHolds }),
      ...protectionCautions(steps),
      ...heatingCautions(ctx, steps),
    ],
    series: {
      timeS: series.timeS,
      speedMps: series.leadSpeedMps,
      notch: series.notch,
      locoTravelM: series.leadTravelM,
      maxTensionN: series.maxTensionN,
    } satisfies PlanSeries,
    verification,
    sensitivity: opts.skipSensitivity || !searches ? [] : searches.sensitivity(c),
    stretch: {
      // Eased off in stages, a train gravity starts is moving before the preparing ends: 0 s then.
      lastVehicleMovesS: run.lastVehicleMovesS === null ? null : Math.max(0, run.lastVehicleMovesS - r.powerS),
      locoTravelToStretchM: run.locoTravelToStretchM,
      maxRunOutMps: run.s.takeUp.maxRunOutMps,
    },
  };
}

/** The plan's highest wheel-climb L/V with where it was (when the check is made). */
function wheelClimbOf(ctx: PlannerContext, r: SearchResult): PlanResult["wheelClimb"] {
  const peak = ctx.wheelClimb.active ? r.branch.wheelClimbPeak() : null;
  if (!peak) return null;
  return { ratio: peak.ratio, allowance: WHEEL_CLIMB_ALLOWANCE, nadalLimit: nadalLimit(), vehicle: vehicleRef(ctx, peak.vehicle), forceN: peak.forceN, radiusM: peak.radiusM };
}

/** The smallest margin of each reason, 99 when none of its limits is in question. */
export function reasonMargins(limits: readonly LimitCheck[]): PlanResult["margins"] {
  const m = { adhesion: MAX_MARGIN, power: MAX_MARGIN, coupler: MAX_MARGIN, distance: MAX_MARGIN, brake: MAX_MARGIN };
  for (const l of limits) m[l.reason as Reason] = Math.min(m[l.reason as Reason], l.margin);
  return m;
}

/**
 * Why the verdict is what it is, and — unless it starts — what would change it: sand, another rail, less
 * load, assistance. Sand and the rail are judged on the quasi-static limits (no plan needed for them).
 */
function advice(c: StartCase, d: Decision, masses: { startsKg: number; marginalKg: number }): AdviceLine[] {
  if (d.verdict === "starts") return [];
  const out: AdviceLine[] = [];
  const b = d.limits.find((l) => l.name === d.binding)!;
  out.push({ code: "limited-by", limit: b.name, margin: b.margin, what: b.what });
  if (d.verdict === "marginal") {
    // Exceeded within its band: brief the start carefully.
    const soft = d.limits.filter((l) => l.level === "soft");
    if (soft.length > 0) out.push({ code: "within-band", limits: soft.map((l) => ({ limit: l.name, band: l.band!.what })) });
    // A plan on a better rail than the threshold's: about one start in 1/q the rail gives less and the train may stall.
    if (d.relaxed) out.push({ code: "relaxed", quantile: d.shown.ctx.quantile, oneIn: Math.max(2, Math.round(1 / d.shown.ctx.quantile)) });
  }
  const changes: ChangeLine[] = [];
  const spec = d.threshold.ctx.model.locoSpecs;
  const bound = marginalBound(c.settings);
  const qsMargin = (x: StartCase): number => Math.min(...quasiStaticLimits(plannerContext(x), bound).limits.map((l) => l.margin));
  const traction = d.limits.some((l) => (l.name === "adhesion" || l.name === "power" || l.name === "time-to-target" || l.name === "brake-holding") && l.level !== "within");
  if (traction) {
    if (!c.conditions.sand && spec.some((s) => s.sanders)) {
      const m = qsMargin({ ...c, conditions: { ...c.conditions, sand: true } });
      changes.push({ code: "sand", margin: m });
    }
    if (c.conditions.rail !== "dry") {
      const m = qsMargin({ ...c, conditions: { ...c.conditions, rail: "dry" } });
      changes.push({ code: "better-rail", sand: c.conditions.sand, margin: m });
    }
  }
  if (Number.isFinite(masses.startsKg)) {
    // A mixed train's load above tare is scaled in every wagon group in proportion.
    if (masses.startsKg > 0) changes.push({ code: "less-load", startsKg: masses.startsKg, marginalKg: masses.marginalKg > masses.startsKg ? masses.marginalKg : null, scaled: Boolean(c.train.groups) });
    else changes.push({ code: "less-load-none" });
  } else changes.push({ code: "less-load-unsearched" });
  changes.push({ code: "assistance" });
  out.push({ code: "changes", changes });
  return out;
}

/** Where the plan counts on the slip protection, what that costs. */
function protectionCautions(steps: readonly PlanStep[]): Caution[] {
  const acting = steps.filter((s) => s.protectionActs);
  if (acting.length === 0) return [];
  // Expect repeated slips in those steps: hold the notch and sand while the protection copes; at a
  // standstill never let the wheels spin.
  return [{ code: "protection-acts", steps: acting.length, standstill: acting.some((s) => s.phase === "stretch" || s.phase === "prepare") }];
}

/** Longest a plan may hold current above the continuous rating at low speed before we say so, s [M]. */
const HEATING_WARN_S = 60;

/**
 * DC traction motors heat fast at low speed and high current (Alaska Railroad manual p. 64-18 [P]: do not
 * keep power on a standing locomotive longer than needed). Flag steps that hold effort above the continuous
 * rating below the continuous speed for long.
 */
function heatingCautions(ctx: PlannerContext, steps: PlanStep[]): Caution[] {
  const spec = ctx.model.locoSpecs[0];
  if (!spec) return [];
  const perUnitContinuous = spec.continuousTractiveEffortN * ctx.model.nl;
  const hot = steps.filter((s) => s.notch > 0 && s.tractiveEffortN > perUnitContinuous && s.speedMps < spec.continuousSpeedMps && s.advanceWhen.afterS > HEATING_WARN_S);
  if (hot.length === 0) return [];
  const longest = Math.max(...hot.map((s) => s.advanceWhen.afterS));
  // Keep within the locomotive's short-time ratings; do not hold power on a train that is not moving.
  return [{ code: "heating", holdS: longest }];
}

/** Does this case start? Exactly the plan's verdict, with no more work than that needs. */
export function plannerStarts(c: StartCase, shouldStop?: () => boolean): boolean {
  return startsAt(c, shouldStop);
}

/** Is this case at least marginal? Exactly the plan's verdict, with no more work than that needs. */
export function plannerGoes(c: StartCase, shouldStop?: () => boolean): boolean {
  return goesAt(c, shouldStop);
}

/**
 * The notch changes of a plan's steps as a replayable sequence: each step's notch at its start, with every
 * control group's notch where there are several — a helper's new notch `HELPER_FOLLOW_S` after the head's,
 * as the search ran it.
 */
export function notchSequence(ctx: PlannerContext, steps: ReadonlyArray<Pick<StepRecord, "notch" | "startS" | "groupNotches">>): Array<{ notch: number; atS: number; groups?: Int32Array }> {
  const helpers = ctx.consist.controlGroups.map((g) => g.control === "helper");
  const out: Array<{ notch: number; atS: number; groups?: Int32Array }> = [];
  let before: Int32Array | null = null;
  steps.forEach((st, k) => {
    const groups = st.groupNotches;
    if (!groups) return void out.push({ notch: st.notch, atS: st.startS });
    if (k > 0 && before && helpers.some((h, g) => h && before![g] !== groups[g])) {
      const first = Int32Array.from(groups, (n, g) => (helpers[g] ? before![g]! : n));
      out.push({ notch: st.notch, atS: st.startS, groups: first });
      out.push({ notch: st.notch, atS: st.startS + HELPER_FOLLOW_S, groups });
    } else out.push({ notch: st.notch, atS: st.startS, groups });
    before = groups;
  });
  return out;
}

/**
 * Re-run the chosen notch timing in the full model on the median rail: on a rail better than the plan
 * assumes each notch passes more of what it asks into the couplers. Reported, not judged (the verdict is
 * the decision's, on the pessimistic rail).
 */
function verify(ctx: PlannerContext, r: SearchResult): NonNullable<PlanResult["verification"]> {
  const q = 0.5;
  const model = modelFromCase(ctx.c, { adhesionQuantile: q, graduatedRelease: ctx.startKind === "gravity" && !ctx.locoBrakeHolds });
  const seq = notchSequence(ctx, r.branch.steps);
  // Slips and coupler peaks come with notch changes: verify through the last change and a minute after it.
  const lastChange = r.branch.steps[r.branch.steps.length - 1]!.startS;
  const end = Math.min(r.branch.run.s.t, lastChange + 60);
  // The same model as the plan's own run: the settled train as one mass after the build-up.
  const fromS = r.buildEndS ?? r.powerS;
  const opts = { durationS: end, ...(runsAsOneWhenSettled() ? { runAsOneWhenSettled: { fromS } } : {}) };
  // The preparing (brakes released, no power yet) is the plan's own when the slip protection never acted
  // in it: the better rail changes nothing there, so the re-run starts where the plan's preparing ended.
  const prepared = r.prepared.cloneOnBetterRail(model);
  const controls = sequenceControls(seq, brakeSchedule(ctx));
  const res = prepared ? continueRun(prepared, controls, opts) : simulate(model, controls, opts);
  return {
    adhesionQuantile: q,
    slipped: res.slipEpisodes.length > 0,
    slipEpisodes: res.slipEpisodes.length,
    peakCouplerForceN: res.peakTensionN,
    overAllowance: res.peakTensionN > ctx.couplerAllowanceN * 1.02,
    finalSpeedMps: res.final.leadSpeedMps,
  };
}
