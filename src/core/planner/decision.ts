/**
 * How Taut decides: the one definition of the verdict, its margin and the limit that binds. Every answer a
 * dispatcher or a driver reads — the plan, the departures check, the load table, the margins per rail
 * condition, the assistance and the app's screens — comes from `judge` here, so they cannot disagree.
 *
 * Each limit is a named check of a demand against an allowance; its margin is allowance ÷ demand and it is
 * "within" exactly when the margin is at least 1. A limit that is not within may still be "soft": exceeded,
 * but inside a stated band (the coupler's working limit itself rather than limit ÷ safety factor; the rail
 * at the marginal slip-risk bound rather than at the threshold; ...). The limits:
 *
 *  - adhesion: what the rails pass of the units' full-notch effort, with the rail at the slip-risk threshold's
 *    quantile of its condition (a pessimistic rail), against the effort the start needs along the slowest
 *    acceptable start (need.ts). The wheel-slip protection holds any notch asking more at what the rails give,
 *    so the effort the plan *needs* is what counts, not what a notch asks. Band: the same at the marginal bound.
 *  - power: the units' full-notch effort (current limit and power), with 10 % in hand, against the same need.
 *    Band: without the 10 %.
 *  - brake holding: what holds the train while its brake releases — on a rising grade the locomotive brake
 *    and a holding notch against the pull back; on a falling grade the locomotive brake and the train brake
 *    (eased in stages) against the pull forward — with 10 % in hand. Band: without it.
 *  - coupler tension and compression: the peaks of the planned start in the full dynamics against the
 *    working limit ÷ safety factor (in buff the train's buff limit, default the same). Band: up to the
 *    working limit.
 *  - wheel climb (when units push or the train is mixed): the highest L/V a compressed coupler on a curve
 *    puts on a vehicle's flanging wheel, against Nadal's limit ÷ 1.2 (physics/wheelClimb.ts). Band: Nadal's
 *    limit itself.
 *  - distance: locomotive travel until the plan is at its running notch against the distance clear ahead.
 *    Band: the stretch (every vehicle moving) within it.
 *  - time to target: the planned start reaches its target within the plan's time cap. No band. Counted when
 *    adhesion and power are within (otherwise they, not the time, are what fails).
 *
 * The verdict: "starts" when the plan made on the rail at the threshold keeps every limit within;
 * "marginal" when a plan keeps every limit within its band and reaches its target — one made on the rail at
 * the marginal bound (shown when it does), or the threshold's; "needs assistance" otherwise. The margin printed is the
 * smallest margin of the threshold's plan, named with its limit, so "starts" ⇔ margin ≥ 1 by construction.
 */
import { MAX_MARGIN, motorEffortN, needPath, pathMargin, railEffortN, rigidResistanceN, unitMuAt, type NeedPath, type PathMargin } from "./need.js";
import { HOLD_RESERVE, marginalBound, plannerContext, type PlannerContext } from "./context.js";
import { ACCELERATE_MAX_S, type PlanSoFar, type SearchOptions, type SearchResult } from "./search.js";
import { memoSearchPlan } from "./evaluationMemo.js";
import { POWER_RESERVE } from "./staticCheck.js";
import { WHEEL_CLIMB_ALLOWANCE, WHEEL_CLIMB_MARGIN, nadalLimit } from "../physics/wheelClimb.js";
import type { BandWhat, LimitWhat, VehicleRef } from "./limitLines.js";
import { LIMIT_REASON, type LimitCheck, type LimitLevel, type LimitName, type Reason, type StartKind, type Verdict } from "./outcome.js";

export { LIMIT_REASON, LIMIT_WORDS, type LimitCheck, type LimitLevel, type LimitName } from "./outcome.js";
import type { StartCase } from "../train/types.js";

const ratio = (allowance: number, demand: number): number => (demand <= 0 ? MAX_MARGIN : Math.min(MAX_MARGIN, allowance / demand));

/** A limit check: margin and level follow from demand, allowance and band, nothing else. */
export function limitCheck(name: LimitName, unit: LimitCheck["unit"], demand: number, allowance: number, band: LimitCheck["band"], what: LimitWhat): LimitCheck {
  const margin = ratio(allowance, demand);
  const level: LimitLevel = margin >= 1 ? "within" : band !== null && band.allowance >= band.demand ? "soft" : "over";
  return { name, reason: LIMIT_REASON[name], unit, demand, allowance, margin, level, band, what };
}

/** The limit with the smallest margin (ties: the first listed). */
export function bindingLimit(limits: readonly LimitCheck[]): LimitCheck {
  return limits.reduce((b, l) => (l.margin < b.margin ? l : b));
}

const allWithin = (ls: readonly LimitCheck[]) => ls.every((l) => l.level === "within");
const noneOver = (ls: readonly LimitCheck[]) => ls.every((l) => l.level !== "over");

// ---------------------------------------------------------------------------------------------- quasi-static

/** The limits known before any dynamics: adhesion and power along the need path, and brake holding. */
export interface QuasiStatic {
  limits: LimitCheck[];
  path: NeedPath;
  /** The worst point of the path for the rail at the plan's quantile and at the marginal bound, and for power. */
  adhesion: PathMargin;
  adhesionAtBound: PathMargin;
  power: PathMargin;
  /** Adhesion and power within: the start's traction is not in question, so its time to target counts. */
  tractionWithin: boolean;
}

/** The quasi-static limits, the rail taken at `ctx.quantile` and its band at `boundQ`. */
export function quasiStaticLimits(ctx: PlannerContext, boundQ: number): QuasiStatic {
  const m = ctx.model;
  const path = needPath(m, ctx.c.target);
  const muBound = unitMuAt(ctx.c, m.locoSpecs, boundQ);
  const adhesion = pathMargin(path, (v) => railEffortN(m, m.mu0, v));
  const adhesionAtBound = pathMargin(path, (v) => railEffortN(m, muBound, v));
  const power = pathMargin(path, (v) => motorEffortN(m, v));
  // No effort needed where gravity alone takes the train to its target; else where along the path the margin is least.
  const gravity: LimitWhat = { code: "gravity" };
  const at = (p: PathMargin) => ({ availableN: p.availableN, needN: p.needN, speedMps: p.speedMps, travelM: p.travelM });
  const rail: BandWhat = { code: "rail-quantile", quantile: boundQ };
  const limits: LimitCheck[] = [
    limitCheck("adhesion", "N", adhesion.needN, adhesion.availableN, { demand: adhesionAtBound.needN, allowance: adhesionAtBound.availableN, what: rail }, adhesion.needed ? { code: "adhesion-path", quantile: ctx.quantile, ...at(adhesion) } : gravity),
    // Power keeps 10 % in hand.
    limitCheck("power", "N", power.needN, power.availableN / POWER_RESERVE, { demand: power.needN, allowance: power.availableN, what: { code: "no-reserve" } }, power.needed ? { code: "power-path", ...at(power) } : gravity),
  ];
  const hold = brakeHolding(ctx, muBound);
  if (hold) limits.push(hold);
  const tractionWithin = limits[0]!.level === "within" && limits[1]!.level === "within";
  return { limits, path, adhesion, adhesionAtBound, power, tractionWithin };
}

/**
 * What holds the train while its brake releases. Rising grade: the locomotive brake and the strongest notch
 * the rail passes (at the plan's quantile) against the pull back. Falling grade: the locomotive brake and the
 * train brake, eased in stages where the brake allows it, against the pull forward at rest and at the target
 * speed. Null when nothing pulls the released train either way.
 */
function brakeHolding(ctx: PlannerContext, muBound: Float64Array): LimitCheck | null {
  const m = ctx.model;
  if (ctx.rollBackPullN > 0) {
    const atQ = ctx.locoBrakeN + railEffortN(m, m.mu0, 0);
    const atBound = ctx.locoBrakeN + railEffortN(m, muBound, 0);
    return limitCheck(
      "brake-holding",
      "N",
      ctx.rollBackPullN,
      atQ / HOLD_RESERVE,
      { demand: ctx.rollBackPullN, allowance: atBound, what: { code: "no-reserve-bound" } },
      { code: "hold-rising", locoBrakeN: ctx.locoBrakeN, powerN: atQ - ctx.locoBrakeN, pullN: ctx.rollBackPullN },
    );
  }
  if (ctx.runAwayPullN > 0) {
    const vTarget = ctx.c.target.kind === "speed" ? ctx.c.target.speedMps : 40 / 3.6;
    const pullAtSpeed = -rigidResistanceN(m, 0, vTarget, new Int32Array(m.n));
    const pull = Math.max(ctx.runAwayPullN, pullAtSpeed);
    const holds = ctx.locoBrakeN + ctx.trainBrakeN;
    return limitCheck(
      "brake-holding",
      "N",
      pull,
      holds / HOLD_RESERVE,
      { demand: pull, allowance: holds, what: { code: "no-reserve" } },
      { code: "hold-falling", trainBrakeN: ctx.trainBrakeN, locoBrakeN: ctx.locoBrakeN, pullN: pull },
    );
  }
  return null;
}

// ---------------------------------------------------------------------------------------------- dynamic

/** The limits the planned start shows in the full dynamics. */
export function dynamicLimits(ctx: PlannerContext, r: SearchResult, withTarget: boolean): LimitCheck[] {
  const c = ctx.c;
  const out: LimitCheck[] = [];
  const tension = r.branch.peakTensionN();
  const compression = r.branch.steps.reduce((x, s) => Math.max(x, s.peakCompressionN), 0);
  const limit = c.train.couplerLimitN;
  const factor = c.settings.couplerSafetyFactor;
  out.push(limitCheck("coupler-tension", "N", tension, ctx.couplerAllowanceN, { demand: tension, allowance: limit, what: { code: "working-limit" } }, { code: "coupler-tension", peakN: tension, limitN: limit, factor }));
  // The working limit in buff: the train's own, else the same as in draft.
  const buffLimit = c.train.couplerBuffLimitN ?? limit;
  out.push(limitCheck("coupler-compression", "N", compression, ctx.buffAllowanceN, { demand: compression, allowance: buffLimit, what: { code: "working-limit" } }, { code: "coupler-compression", peakN: compression, limitN: buffLimit, factor }));
  if (ctx.wheelClimb.active) out.push(wheelClimbLimit(ctx, r));
  const stretchM = r.branch.run.locoTravelToStretchM;
  if (stretchM !== null) {
    const clear = c.location.clearAheadM;
    const built = r.startKind === "power" ? (r.buildEndTravelM ?? stretchM) : stretchM;
    const demand = Math.max(built, c.target.kind === "distance" ? c.target.distanceM : 0);
    out.push(
      limitCheck("distance", "m", demand, clear, { demand: stretchM, allowance: clear, what: { code: "stretch-within-clear" } }, { code: "distance", travelM: demand, power: r.startKind === "power", orTarget: c.target.kind === "distance", clearM: clear }),
    );
  }
  if (withTarget) {
    const t = c.target;
    const reached = r.targetReachedS !== null;
    const progress = t.kind === "speed" ? r.bestSpeedMps / t.speedMps : r.bestTailTravelM / t.distanceM;
    // Not reached: the margin is the share of the target reached (below 1); reached: time cap ÷ time taken.
    const demand = reached ? Math.max(1e-6, r.targetReachedS! - r.powerS) : ACCELERATE_MAX_S / Math.max(1e-6, Math.min(0.999, progress));
    out.push(limitCheck("time-to-target", "s", demand, ACCELERATE_MAX_S, null, reached ? { code: "target-reached", afterS: demand } : { code: "target-not-reached", share: progress }));
  }
  return out;
}

/**
 * Wheel climb under buff (physics/wheelClimb.ts): the highest L/V a compressed coupler on a curve put on a
 * vehicle's flanging wheel during the planned start, against Nadal's limit ÷ its margin. Band: Nadal's limit.
 */
function wheelClimbLimit(ctx: PlannerContext, r: SearchResult): LimitCheck {
  const peak = r.branch.wheelClimbPeak();
  const nadal = nadalLimit();
  const what: LimitWhat = peak
    ? { code: "wheel-climb", ratio: peak.ratio, vehicle: vehicleRef(ctx, peak.vehicle), forceN: peak.forceN, radiusM: peak.radiusM, allowance: WHEEL_CLIMB_ALLOWANCE, nadal, nadalMargin: WHEEL_CLIMB_MARGIN }
    : { code: "wheel-climb-none" };
  const demand = peak?.ratio ?? 0;
  return limitCheck("wheel-climb", "ratio", demand, WHEEL_CLIMB_ALLOWANCE, { demand, allowance: nadal, what: { code: "nadal-itself" } }, what);
}

/** A vehicle of the consist by its index: a wagon with its number and mass, or a locomotive unit by its number. */
export function vehicleRef(ctx: PlannerContext, index: number): VehicleRef {
  const v = ctx.consist.vehicles[index];
  if (!v) return { kind: "vehicle", number: index + 1 };
  if (v.kind === "wagon") return { kind: "wagon", number: v.wagonNumber ?? index + 1, massKg: v.massKg };
  return { kind: "unit", number: ctx.consist.locoIndices.indexOf(index) + 1 };
}

// ---------------------------------------------------------------------------------------------- the decision

/** One evaluation of a case on the rail at one quantile. */
export interface Evaluation {
  ctx: PlannerContext;
  qs: QuasiStatic;
  search: SearchResult | null;
  limits: LimitCheck[];
}

export interface Decision {
  verdict: Verdict;
  /** The reasons of the limits that decide the verdict (the binding limit's first); empty when it starts. */
  reasons: Reason[];
  /** The binding limit's margin (the smallest of the threshold's plan); starts ⇔ margin ≥ 1. */
  margin: number;
  binding: LimitName;
  /** Every limit of the threshold's plan. */
  limits: LimitCheck[];
  startKind: StartKind;
  /** The plan to show: the threshold's, or (marginal) the one made on the rail at the marginal bound. */
  shown: Evaluation;
  /** The shown plan was made on the rail at the marginal bound. */
  relaxed: boolean;
  /** The threshold's evaluation (the margins' source). */
  threshold: Evaluation;
  /** The marginal bound's evaluation when one was made. */
  bound: Evaluation | null;
}

/** How far `judge` needs to go: only whether it starts, whether it is at least marginal, or everything. */
export type JudgeDepth = "starts" | "marginal" | "full";

export interface JudgeOptions extends Omit<SearchOptions, "stopWhenFailed"> {
  depth?: JudgeDepth;
  /**
   * Verdict only: each plan stops as soon as it has failed — at depth "starts" a limit not within, at depth
   * "marginal" a limit over its band — instead of running to the target (`failedSoFar`). The verdict is the
   * full plans' exactly; the limits' figures of a plan that stopped are those at the stop (a failing limit's
   * margin is then no smaller than the full plan's, and still below 1). Ignored at depth "full".
   */
  stopWhenFailed?: boolean;
}

/** How a verdict-only plan fails: a limit not within (for "starts") or over its band (for "at least marginal"). */
export type FailLevel = "within" | "over";

/**
 * Whether the plan made so far has already failed at `level`, whatever the rest of it does: the coupler peaks
 * and the wheel-climb L/V only grow along a plan; the travel to the stretch is final once the last vehicle
 * moves, and a power start's travel to the running notch once the build is over. (The time to the target is
 * settled only at the end, so it never stops a plan early.)
 */
export function failedSoFar(ctx: PlannerContext, level: FailLevel): (p: PlanSoFar) => boolean {
  const fails = (l: LimitCheck) => (level === "within" ? l.level !== "within" : l.level === "over");
  // The answer depends on these figures alone (dynamicLimits without the target): asked at every control
  // interval, it is worked out again only when one of them has changed since the last time.
  let last: { tensionN: number; compressionN: number; climb: number; stretchM: number | null; kind: StartKind; buildEndM: number | null; buildDone: boolean; failed: boolean } | null = null;
  return (p) => {
    const b = p.branch;
    const tensionN = b.peakTensionN();
    const compressionN = b.steps.reduce((x, s) => Math.max(x, s.peakCompressionN), 0);
    const climb = ctx.wheelClimb.active ? (b.wheelClimbPeak()?.ratio ?? -1) : -1;
    const stretchM = b.run.locoTravelToStretchM;
    if (last && last.tensionN === tensionN && last.compressionN === compressionN && last.climb === climb && last.stretchM === stretchM && last.kind === p.startKind && last.buildEndM === p.buildEndTravelM && last.buildDone === p.buildDone) return last.failed;
    const failed = failedNow(p);
    last = { tensionN, compressionN, climb, stretchM, kind: p.startKind, buildEndM: p.buildEndTravelM, buildDone: p.buildDone, failed };
    return failed;
  };
  function failedNow(p: PlanSoFar): boolean {
    const partial = { branch: p.branch, startKind: p.startKind, buildEndTravelM: p.buildEndTravelM } as SearchResult;
    for (const l of dynamicLimits(ctx, partial, false)) {
      // The distance limit's own figure waits for the build (power start); its band, the stretch, is final already.
      if (l.name === "distance" && level === "within" && p.startKind === "power" && !p.buildDone) continue;
      if (fails(l)) return true;
    }
    return false;
  }
}

/** The search options of one plan of `judge`: stop at `level` when the evaluation is verdict-only. */
function planOptions(ctx: PlannerContext, base: SearchOptions, level: FailLevel | null): SearchOptions {
  return level === null ? base : { ...base, stopWhenFailed: { key: level, failed: failedSoFar(ctx, level) } };
}

/** The quasi-static part of an evaluation on the rail at quantile `q` (its band at `boundQ`). */
function quasiStatic(c: StartCase, q: number, boundQ: number): Evaluation {
  const ctx = plannerContext(c, q);
  const qs = quasiStaticLimits(ctx, boundQ);
  return { ctx, qs, search: null, limits: qs.limits };
}

/** The evaluation completed by the planned start in the full dynamics. */
function withPlan(e: Evaluation, opts: SearchOptions): Evaluation {
  const search = memoSearchPlan(e.ctx, opts);
  return { ...e, search, limits: [...e.qs.limits, ...dynamicLimits(e.ctx, search, e.qs.tractionWithin)] };
}

function decision(verdict: Verdict, thr: Evaluation, shown: Evaluation, bound: Evaluation | null): Decision {
  const b = bindingLimit(thr.limits);
  const deciding = verdict === "starts" ? [] : verdict === "marginal" ? thr.limits.filter((l) => l.level !== "within") : [...thr.limits, ...(bound?.limits ?? [])].filter((l) => l.level === "over");
  const reasons: Reason[] = [];
  for (const l of [b, ...deciding]) if (verdict !== "starts" && l.level !== "within" && !reasons.includes(l.reason)) reasons.push(l.reason);
  return { verdict, reasons, margin: b.margin, binding: b.name, limits: thr.limits, startKind: thr.ctx.startKind, shown, relaxed: shown !== thr, threshold: thr, bound };
}

/**
 * The verdict of a case (and, at depth "full", every limit and the plan to show). At depth "starts" only
 * "starts" is exact (anything else comes back as "needs-assistance" without the work to tell marginal from
 * it); at depth "marginal" the verdict is exact; "full" also runs the threshold's plan when the quasi-static
 * limits already rule the start out, so every limit has its figure.
 */
export function judge(c: StartCase, opts: JudgeOptions = {}): Decision {
  const depth = opts.depth ?? "full";
  const thrQ = c.settings.slipRiskThreshold;
  const boundQ = marginalBound(c.settings);
  const search: SearchOptions = { ...(opts.shouldStop ? { shouldStop: opts.shouldStop } : {}), ...(opts.onProgress ? { onProgress: opts.onProgress } : {}) };
  // Verdict only: at depth "starts" a plan fails once a limit is not within; at "marginal" once one is over
  // its band (the threshold's plan then can neither start nor be the marginal plan, so the verdict is kept).
  const level: FailLevel | null = !opts.stopWhenFailed || depth === "full" ? null : depth === "starts" ? "within" : "over";
  const pre = quasiStatic(c, thrQ, boundQ);
  const qsOver = !noneOver(pre.qs.limits);
  if (qsOver && depth !== "full") return decision("needs-assistance", pre, pre, null);
  if (depth === "starts" && !allWithin(pre.qs.limits)) return decision("needs-assistance", pre, pre, null);
  const thr = withPlan(pre, planOptions(pre.ctx, search, level));
  if (qsOver) return decision("needs-assistance", thr, thr, null);
  if (allWithin(thr.limits)) return decision("starts", thr, thr, null);
  if (depth === "starts") return decision("needs-assistance", thr, thr, null);
  // Marginal: a plan on the rail at the marginal bound keeps every limit within its band, or the threshold's
  // does. The bound's plan is shown when it works, so that every marginal plan assumes the same rail (and a
  // heavier train's is never the quicker for assuming a better one).
  const boundPre = quasiStatic(c, boundQ, boundQ);
  const bound = withPlan(boundPre, planOptions(boundPre.ctx, search, level));
  if (noneOver(bound.limits) && bound.search!.targetReachedS !== null) return decision("marginal", thr, bound, bound);
  if (noneOver(thr.limits) && thr.search!.targetReachedS !== null) return decision("marginal", thr, thr, bound);
  return decision("needs-assistance", thr, thr, bound);
}

/** Exactly `judge(c).verdict === "starts"`, with no more work than that needs (a plan stops once it fails). */
export function startsAt(c: StartCase, shouldStop?: () => boolean, opts: { stopWhenFailed?: boolean } = {}): boolean {
  return judge(c, { depth: "starts", stopWhenFailed: opts.stopWhenFailed ?? true, ...(shouldStop ? { shouldStop } : {}) }).verdict === "starts";
}

/** Exactly `judge(c).verdict !== "needs-assistance"`, with no more work than that needs (a plan stops once it fails). */
export function goesAt(c: StartCase, shouldStop?: () => boolean, opts: { stopWhenFailed?: boolean } = {}): boolean {
  return goesJudgement(c, shouldStop, { stopWhenFailed: opts.stopWhenFailed ?? true }).holds;
}

/**
 * The smallest margin of an evaluation against being "over" (a limit with a band: against its band's
 * allowance, or its own margin when that is larger), so the score is ≥ 1 about when none is over (and a plan that misses its target scores below 1). A guide for the
 * mass search (guidedBracket.ts), never a verdict.
 */
function notOverScore(e: Evaluation): number {
  let s = Infinity;
  for (const l of e.limits) s = Math.min(s, l.band ? Math.max(l.margin, ratio(l.band.allowance, l.band.demand)) : l.margin);
  if (e.search && e.search.targetReachedS === null) s = Math.min(s, 0.99);
  return s === Infinity ? MAX_MARGIN : s;
}

/**
 * `goesAt`'s verdict with a score for the mass search to follow: the best "not over" margin of the plans it
 * made (guidedBracket.ts). The verdict is exactly `goesAt`'s, from the same plans; the score adds none. With
 * `stopWhenFailed` each plan stops once a limit is over its band: the verdict is the same, and the score of a
 * plan that stopped is taken at the stop (no smaller than the full plan's, still below 1).
 */
export function goesJudgement(c: StartCase, shouldStop?: () => boolean, verdictOnly: { stopWhenFailed?: boolean } = {}): { holds: boolean; score: number } {
  const opts: SearchOptions = shouldStop ? { shouldStop } : {};
  const level: FailLevel | null = verdictOnly.stopWhenFailed ? "over" : null;
  const boundQ = marginalBound(c.settings);
  const pre = quasiStatic(c, c.settings.slipRiskThreshold, boundQ);
  if (!noneOver(pre.qs.limits)) return { holds: false, score: notOverScore(pre) };
  // Traction not within on the threshold's rail: it cannot start, so it goes when either plan keeps within
  // its bands — the marginal bound's first, which settles it alone when it does (no threshold's plan needed).
  if (!allWithin(pre.qs.limits)) {
    const goes = (e: Evaluation) => noneOver(e.limits) && e.search!.targetReachedS !== null;
    const boundPre = quasiStatic(c, boundQ, boundQ);
    const atBound = withPlan(boundPre, planOptions(boundPre.ctx, opts, level));
    if (goes(atBound)) return { holds: true, score: notOverScore(atBound) };
    const atThr = withPlan(pre, planOptions(pre.ctx, opts, level));
    return { holds: goes(atThr), score: Math.max(notOverScore(atBound), notOverScore(atThr)) };
  }
  const d = judge(c, { depth: "marginal", ...(shouldStop ? { shouldStop } : {}), ...(verdictOnly.stopWhenFailed ? { stopWhenFailed: true } : {}) });
  const score = d.verdict === "starts" ? d.margin : Math.max(notOverScore(d.threshold), d.bound ? notOverScore(d.bound) : 0);
  return { holds: d.verdict !== "needs-assistance", score };
}
