/**
 * The plan search: prepare → stretch → build → accelerate, each phase tried on clones of the run that
 * reached it, choosing by common practice (lowest stretch notch that moves the whole train slowly;
 * quickest build pace that keeps couplers within their allowance) and checked by the full dynamics, on the
 * rail the plan assumes (a quantile of the rail condition; the wheel-slip protection holds any effort above
 * what that rail gives at what it gives). A train that gravity starts once its brakes are eased is started
 * on the brakes: no notch until the train needs one. Deterministic: the same case always gives the same plan.
 */
import { BENCH } from "../dynamics/benchOnly.js";
import { vehicleStepsDone } from "../dynamics/dynamics.js";
import { Run, type BrakeSchedule, type Observation } from "../dynamics/runner.js";
import { SETTLED_MIN_SPEED_MPS } from "../dynamics/settled.js";
import { stabilityTimeStep } from "../train/trainModel.js";
import { Branch } from "./branch.js";
import { rigidResistanceAt, rigidResistanceCurve } from "./need.js";
import { GROUP_RATIO_LIMIT, estimateCouplers, raises, settingLevel, standingNotches, type CouplerEstimate } from "./groupNotches.js";
import type { Phase } from "./types.js";
import { MIN_NOTCH_DWELL_S, holdingNotch, needNowN, notchDeliveredN, notchRisk, notchSaturated, unitNotch, type NotchSetting, type PlannerContext, type StartKind } from "./context.js";

/** Longest the planner waits for a stretch notch to get the last vehicle moving, s. */
export const STRETCH_MAX_S = 90;
/** Longest the plan may take from first power to the target, s. */
export const ACCELERATE_MAX_S = 900;
/** Build paces tried, shortest first: seconds at least between notch advances. */
export const BUILD_DWELLS_S = [MIN_NOTCH_DWELL_S, 6, 10];
/** Roll-back beyond this much locomotive travel counts as rolling back, m. */
export const ROLL_BACK_LIMIT_M = 0.5;

export type StretchOutcome = "ok" | "weak" | "fast" | "force" | "rollback";

export interface SearchResult {
  branch: Branch;
  /** Time the locomotive brake comes off and the stretch notch is taken (or gravity takes over), s. */
  powerS: number;
  holdNotch: number;
  startKind: StartKind;
  stretch: { notch: number; outcome: StretchOutcome; tried: Array<{ notch: number; outcome: StretchOutcome }> } | null;
  buildDwellS: number | null;
  /** Build pace kept the couplers within their allowance. */
  buildWithinAllowance: boolean;
  /** Time the build phase ended (highest notch reached or no further notch allowed), s, and the locomotive's travel then, m. */
  buildEndS: number | null;
  buildEndTravelM: number | null;
  targetReachedS: number | null;
  /** Locomotive travel when the target was reached, m. */
  targetTravelM: number | null;
  /** Highest locomotive speed and the tail's furthest travel the plan reached (progress when it fell short), m/s and m. */
  bestSpeedMps: number;
  bestTailTravelM: number;
  stalled: boolean;
  /** A notch-up was held back because the rails would give no more or the train needed no more. */
  adhesionCapped: boolean;
  failure: null | "cannot-hold" | "cannot-start";
  /** The run at the end of the preparing (brakes released, no power taken yet), for re-runs that share it. */
  prepared: Run;
  /** The search stopped once the plan had failed (`SearchOptions.stopWhenFailed`): its figures are those at the stop. */
  stoppedEarly: boolean;
}

/** The plan's own line so far, for a verdict-only evaluation's check (`SearchOptions.stopWhenFailed`). */
export interface PlanSoFar {
  branch: Branch;
  startKind: StartKind;
  /** The build is over (a power start's travel to the running notch is known). */
  buildDone: boolean;
  buildEndTravelM: number | null;
}

export interface SearchOptions {
  shouldStop?: () => boolean;
  onProgress?: (fraction: number) => void;
  /**
   * A verdict-only evaluation (decision.ts): stop as soon as the plan's own line (the stretch chosen, the build
   * kept, each interval of the accelerate phase) has failed at `level`; `key` names the check for the memo.
   */
  stopWhenFailed?: { key: string; failed: (p: PlanSoFar) => boolean };
}

class Cancelled extends Error {}

/** When the brakes come off: the train brake from the start, the locomotive brake when power is taken. */
export function brakeSchedule(ctx: PlannerContext): BrakeSchedule {
  const powerS = ctx.releaseS + 2;
  // Held on the train brake eased in stages (graduated release): the locomotive brake is not what holds it.
  if (ctx.startKind === "gravity" && !ctx.locoBrakeHolds) return { trainBrakeReleaseS: 0, locoBrakeReleaseS: 0 };
  return { trainBrakeReleaseS: 0, locoBrakeReleaseS: powerS };
}

/**
 * Begin a step at notch `notch` (with several control groups: at level `notch`, the standing train's setting
 * of that level unless `set` gives the groups' notches); otherwise every unit in that notch.
 */
function openStep(ctx: PlannerContext, b: Branch, phase: Phase, notch: number, set: Int32Array | null = null): void {
  if (ctx.model.groupCount <= 1) return b.open(phase, notch);
  const groups = set ?? standingNotches(ctx, notch);
  const before = b.steps.length > 0 ? Int32Array.from(b.run.s.notch) : null;
  b.open(phase, groups[0]!, groups);
  // A helper's driver takes the new notch on the head driver's call, a little after the head.
  const follow = ctx.consist.controlGroups.map((g) => g.control === "helper");
  if (before && follow.some((x) => x)) {
    b.run.s.notch.set(before);
    b.setGroups(groups, follow, HELPER_FOLLOW_S);
  }
}

/** The search's notch of a step: the notch, or with several control groups the level (Σ of the groups' notches). */
function levelOf(b: Branch): number {
  const g = b.current.groupNotches;
  return g ? settingLevel(g) : b.current.notch;
}

/**
 * How long after the head a helper's driver takes a new notch: the head driver's radio call and the
 * helper driver's response [M: a few seconds; common practice is to call each change and confirm it].
 */
export const HELPER_FOLLOW_S = 3;

/**
 * The run after the build-up: once the surge of each notch change has passed and the train's relative
 * motion has died down it runs as one mass (dynamics/settled.ts), back to the full chain for every notch
 * change. On by default, for the plan and every search alike; off only to compare with the full chain
 * throughout (tests/core/settled.test.ts, the benchmark).
 */
let settleInAccelerate = true;

/** Run the plans after this with the settled train as one mass (true, the default) or the full chain throughout. */
export function setRunAsOneWhenSettled(on: boolean): void {
  settleInAccelerate = on;
}

/** Whether plans run the settled train as one mass. */
export function runsAsOneWhenSettled(): boolean {
  return !BENCH || settleInAccelerate;
}

/**
 * One part of a plan search, for the benchmark (BENCH only): the preparing, a stretch notch or build pace
 * tried, or the accelerate phase; whether the plan kept it; its work (vehicle-steps) and simulated time, and
 * for a try that was dropped how far into it (s) its dropping was certain, with the work done after that.
 */
export interface SearchTry {
  phase: "prepare" | "stretch" | "build" | "accelerate";
  /** The stretch notch or the build pace (s between notches); 0 otherwise. */
  label: number;
  kept: boolean;
  vehicleSteps: number;
  simS: number;
  /** A dropped try: simulated time into it when it was certain to be dropped (null: only at its end). */
  certainAfterS: number | null;
  /** A dropped try: vehicle-steps done after it was certain to be dropped, and the time that took by the logger's clock, ms. */
  stepsAfterCertain: number;
  msAfterCertain?: number;
  /** The accelerate phase: its vehicle-steps after the last rise of any unit's notch (every unit at the highest notch it takes from there). */
  stepsAfterLastRaise?: number;
  /** Of those: in control intervals ending below the speed a train may run as one at (settled.ts), and running as one. */
  afterRaiseSlow?: number;
  afterRaiseAsOne?: number;
  /** Time it took by the logger's clock, ms; a stretch try's outcome. */
  ms: number;
  outcome?: StretchOutcome;
  /** The preparing: a digest of the run's state at its end (two preparings ending in the same state share it). */
  digest?: string;
}

let tryLog: SearchTry[] | null = null;
let tryClock: () => number = () => 0;

/** Log every search's parts into `log` from now on (null: stop), timed by `clock` (ms). For the benchmark. */
export function logSearchTries(log: SearchTry[] | null, clock: () => number = () => 0): void {
  tryLog = log;
  tryClock = clock;
}

/** The work and the clock when a part begins (BENCH logging only). */
function mark(): { w: number; t: number } {
  return BENCH && tryLog ? { w: vehicleStepsDone(), t: tryClock() } : { w: 0, t: 0 };
}

function logTry(from: { w: number; t: number }, t: Omit<SearchTry, "vehicleSteps" | "ms">): void {
  if (BENCH && tryLog) tryLog.push({ ...t, vehicleSteps: vehicleStepsDone() - from.w, ms: tryClock() - from.t });
}

/**
 * A build pace before the last that has taken a coupling beyond its allowance is certain to be dropped; it is
 * not run on (the stretch already beyond it: not started). The same plans, every figure (tests/core/
 * droppedPaces.test.ts). On by default, for every plan; off only to compare (the benchmark, the test).
 */
let cutDroppedPaces = true;

/** Cut build paces certain to be dropped (true, the default) or run each to its end as before. */
export function setCutDroppedPaces(on: boolean): void {
  cutDroppedPaces = on;
}

function cutsDroppedPaces(): boolean {
  return !BENCH || cutDroppedPaces;
}

/** Run the search for a case. */
export function searchPlan(ctx: PlannerContext, opts: SearchOptions = {}): SearchResult {
  const phases = searchPhases(ctx, opts);
  for (;;) {
    const r = phases.next();
    if (r.done) return r.value;
  }
}

/** Control intervals of the accelerate phase between two pauses of a resumable search (resumableSearch.ts). */
export const ACCELERATE_SLICE_TICKS = 100;

/**
 * The search, pausing on the plan's own line once the stretch is chosen, once the build is over and every
 * `ACCELERATE_SLICE_TICKS` control intervals of the accelerate phase (resumableSearch.ts runs it a phase at a
 * time); returning the search's result.
 */
export function* searchPhases(ctx: PlannerContext, opts: SearchOptions): Generator<PlanSoFar, SearchResult, void> {
  const check = () => {
    if (opts.shouldStop?.()) throw new Cancelled("cancelled");
  };
  const hold = holdingNotch(ctx);
  const powerS = ctx.releaseS + 2;
  const w0 = mark();
  const run = Run.start(ctx.model, brakeSchedule(ctx));
  const prep = new Branch(run, []);
  openStep(ctx, prep, "prepare", Math.max(0, hold));
  const base: SearchResult = {
    branch: prep,
    powerS,
    holdNotch: hold,
    startKind: ctx.startKind,
    stretch: null,
    buildDwellS: null,
    buildWithinAllowance: true,
    buildEndS: null,
    buildEndTravelM: null,
    targetReachedS: null,
    targetTravelM: null,
    bestSpeedMps: 0,
    bestTailTravelM: 0,
    stalled: false,
    adhesionCapped: false,
    failure: null,
    prepared: run,
    stoppedEarly: false,
  };
  const failed = opts.stopWhenFailed?.failed;
  if (hold < 0) return { ...base, failure: "cannot-hold" };

  // Prepare: release the train brake with the locomotive brake (and a holding notch on a rising grade) on;
  // on a falling grade the locomotive brake holds the released train, or the train brake is eased in stages.
  const graduated = ctx.startKind === "gravity" && !ctx.locoBrakeHolds;
  while (prep.run.s.t < powerS - 1e-9) {
    const obs = prep.tick(ctx);
    if (obs.leadTravelM < -ROLL_BACK_LIMIT_M) return { ...base, failure: "cannot-hold" };
    // Eased in stages, the train starts by itself before the brake is fully off: that ends the preparing.
    if (graduated && obs.allMoving) break;
  }
  prep.current.trigger = graduated && prep.run.lastVehicleMovesS !== null ? "moved" : "time";
  if (BENCH && tryLog) logTry(w0, { phase: "prepare", label: 0, kept: true, simS: prep.run.s.t, certainAfterS: null, stepsAfterCertain: 0, digest: stateDigest(prep.run) });
  check();
  opts.onProgress?.(0.2);

  if (ctx.startKind === "gravity") {
    // No notch: gravity starts the train; power only if it then needs more to reach the target.
    const b = prep.clone();
    openStep(ctx, b, "accelerate", 0);
    const gravitySoFar: PlanSoFar = { branch: b, startKind: ctx.startKind, buildDone: true, buildEndTravelM: null };
    const wa = mark();
    const acc = yield* accelerate(ctx, b, MIN_NOTCH_DWELL_S, prep.run.s.t, check, gravitySoFar, failed && (() => failed(gravitySoFar)));
    if (BENCH && tryLog) logTry(wa, { phase: "accelerate", label: 0, kept: true, simS: b.run.s.t - prep.run.s.t, certainAfterS: null, stepsAfterCertain: 0 });
    opts.onProgress?.(0.85);
    return { ...base, branch: b, powerS: prep.run.s.t, ...accelerationOutcome(acc), stoppedEarly: acc.stoppedEarly };
  }

  // Stretch: the lowest notch that gets every vehicle moving with the locomotive slow and couplers easy.
  const tried: Array<{ notch: number; outcome: StretchOutcome }> = [];
  let chosen: { branch: Branch; notch: number; outcome: StretchOutcome } | null = null;
  for (let n = Math.max(1, hold); n <= ctx.maxNotch; n++) {
    // Once a notch asks for all the rails give, a higher one gives no more on this rail.
    const last = notchSaturated(ctx, n, 0);
    if (!canEverMove(ctx, n)) {
      if (last) break;
      continue;
    }
    const ws = mark();
    const b = prep.clone();
    const watch = BENCH && tryLog ? { lastWorkS: prep.run.s.t, stepsAt: ws.w, clockAt: ws.t } : undefined;
    const outcome = stretchWith(ctx, b, n, watch);
    tried.push({ notch: n, outcome });
    if (BENCH && tryLog && watch) {
      const dropped = outcome === "weak" || outcome === "rollback";
      // A weak try's last part with no work done: the train stood, held, to the end (known at the earliest then).
      const idle = dropped && watch.lastWorkS < b.run.s.t - 1e-9;
      logTry(ws, { phase: "stretch", label: n, kept: !dropped, simS: b.run.s.t - prep.run.s.t, certainAfterS: idle ? watch.lastWorkS - prep.run.s.t : null, stepsAfterCertain: 0, msAfterCertain: idle ? tryClock() - watch.clockAt : 0, outcome });
    }
    check();
    if (outcome === "weak" || outcome === "rollback") {
      if (last) break;
      continue;
    }
    chosen = { branch: b, notch: n, outcome };
    break;
  }
  opts.onProgress?.(0.45);
  if (!chosen) return { ...base, stretch: { notch: 0, outcome: "weak", tried }, failure: "cannot-start" };
  const stretch = { notch: chosen.notch, outcome: chosen.outcome, tried };
  const stretched: PlanSoFar = { branch: chosen.branch, startKind: ctx.startKind, buildDone: false, buildEndTravelM: null };
  if (failed?.(stretched)) return { ...base, branch: chosen.branch, stretch, stoppedEarly: true };
  yield stretched;

  // Build: the shortest pace between notches that keeps the couplers within their allowance (the last pace
  // whatever it gives). A pace before the last that takes a coupling beyond the allowance — in the stretch
  // already, or at any moment of the pace, the peaks only growing — is certain to be dropped: it is not run on
  // from there (`cutDroppedPaces`), and the next is tried.
  const lastDwell = BUILD_DWELLS_S[BUILD_DWELLS_S.length - 1]!;
  const cut = cutsDroppedPaces();
  let built: { branch: Branch; dwell: number; endS: number; endTravelM: number; capped: boolean } | null = null;
  for (const dwell of BUILD_DWELLS_S) {
    const wb = mark();
    const watch = BENCH && tryLog ? { overAtS: null as number | null, stepsAt: 0 } : undefined;
    const t0 = chosen.branch.run.s.t;
    const dropAboveN = cut && dwell !== lastDwell ? ctx.couplerAllowanceN : Infinity;
    if (chosen.branch.peakTensionN() > dropAboveN) {
      if (BENCH && tryLog) logTry(wb, { phase: "build", label: dwell, kept: false, simS: 0, certainAfterS: 0, stepsAfterCertain: 0 });
      continue;
    }
    const b = chosen.branch.clone();
    const r = buildWith(ctx, b, dwell, watch, dropAboveN);
    check();
    if (r.over) {
      if (BENCH && tryLog && watch) logTry(wb, { phase: "build", label: dwell, kept: false, simS: b.run.s.t - t0, certainAfterS: Math.max(0, (watch.overAtS ?? b.run.s.t) - t0), stepsAfterCertain: vehicleStepsDone() - (watch.overAtS !== null ? watch.stepsAt : wb.w) });
      continue;
    }
    built = { branch: b, dwell, endS: r.endS, endTravelM: b.run.s.x[b.run.lead]!, capped: r.capped };
    const within = b.peakTensionN() <= ctx.couplerAllowanceN;
    if (BENCH && tryLog && watch) {
      const dropped = !within && dwell !== lastDwell;
      logTry(wb, { phase: "build", label: dwell, kept: !dropped, simS: b.run.s.t - t0, certainAfterS: dropped && watch.overAtS !== null ? Math.max(0, watch.overAtS - t0) : null, stepsAfterCertain: dropped ? vehicleStepsDone() - (watch.overAtS !== null ? watch.stepsAt : wb.w) : 0 });
    }
    if (within) break;
  }
  opts.onProgress?.(0.65);
  const b = built!.branch;
  const withinAllowance = b.peakTensionN() <= ctx.couplerAllowanceN;
  const builtPart = { ...base, branch: b, stretch, buildDwellS: built!.dwell, buildWithinAllowance: withinAllowance, buildEndS: built!.endS, buildEndTravelM: built!.endTravelM };
  const soFar: PlanSoFar = { branch: b, startKind: ctx.startKind, buildDone: true, buildEndTravelM: built!.endTravelM };
  if (failed?.(soFar)) return { ...builtPart, adhesionCapped: built!.capped, stoppedEarly: true };
  yield soFar;

  // Accelerate: hold the notch the policy settles on (adjusting as speed changes) to the target.
  const wa = mark();
  const ta = b.run.s.t;
  const ticks: number[] | null = BENCH && tryLog ? [] : null;
  const acc = yield* accelerate(ctx, b, built!.dwell, powerS, check, soFar, failed && (() => failed(soFar)), ticks);
  if (BENCH && tryLog && ticks) {
    // From the interval in which a unit's notch last rose (the phase's start if none rose in it).
    let from = wa.w;
    for (let i = 0; i < ticks.length; i += 4) if (ticks[i + 3] === 1) from = ticks[i]!;
    let slow = 0;
    let asOne = 0;
    for (let i = 0; i < ticks.length; i += 4) {
      if (ticks[i]! < from) continue;
      if (ticks[i + 2] === 1) slow += ticks[i + 1]!;
      else if (ticks[i + 2] === 2) asOne += ticks[i + 1]!;
    }
    logTry(wa, { phase: "accelerate", label: 0, kept: true, simS: b.run.s.t - ta, certainAfterS: null, stepsAfterCertain: 0, stepsAfterLastRaise: vehicleStepsDone() - from, afterRaiseSlow: slow, afterRaiseAsOne: asOne });
  }
  opts.onProgress?.(0.85);
  const out = accelerationOutcome(acc);
  return { ...builtPart, ...out, adhesionCapped: built!.capped || out.adhesionCapped, stoppedEarly: acc.stoppedEarly };
}

function accelerationOutcome(acc: AccelerateOutcome) {
  return {
    targetReachedS: acc.reachedS,
    targetTravelM: acc.travelM,
    bestSpeedMps: acc.bestSpeedMps,
    bestTailTravelM: acc.bestTailTravelM,
    stalled: acc.stalled,
    adhesionCapped: acc.capped,
  };
}

export function isCancelled(e: unknown): boolean {
  return e instanceof Cancelled;
}

/**
 * A notch can only ever keep the whole train moving if its effort exceeds the train's resistance once
 * rolling (running, grade and curve; breakaway fades as each vehicle gets going).
 */
function canEverMove(ctx: PlannerContext, notch: number): boolean {
  const f = ctx.forces;
  let rolling = 0;
  for (let i = 0; i < f.gradeN.length; i++) rolling += f.runningN[i]! + f.gradeN[i]! + f.curveN[i]!;
  return notchDeliveredN(ctx, notch, 0) > rolling;
}

/** Take `notch` and wait for the last vehicle to move; classify how it went. */
function stretchWith(ctx: PlannerContext, b: Branch, notch: number, watch?: { lastWorkS: number; stepsAt: number; clockAt: number }): StretchOutcome {
  b.current.trigger = "time";
  openStep(ctx, b, "stretch", notch);
  const start = b.run.s.t;
  const limit = ctx.c.settings.stretchSpeedMps;
  let outcome: StretchOutcome = "ok";
  let movedAt = -1;
  for (;;) {
    const obs = b.tick(ctx);
    if (BENCH && watch && vehicleStepsDone() !== watch.stepsAt) {
      watch.lastWorkS = obs.timeS;
      watch.stepsAt = vehicleStepsDone();
      watch.clockAt = tryClock();
    }
    if (obs.leadTravelM < -ROLL_BACK_LIMIT_M) return "rollback";
    if (obs.maxTensionN > ctx.couplerAllowanceN || b.current.peakTensionN > ctx.couplerAllowanceN) outcome = "force";
    // The whole train moving at up to the practice speed is fine; the locomotive racing ahead is not.
    if (!obs.allMoving && obs.leadSpeedMps > 1.15 * limit && outcome === "ok") outcome = "fast";
    if (obs.allMoving && movedAt < 0) movedAt = obs.timeS;
    // Hold until the effort has settled after the last vehicle moved, so the step's figures are complete.
    if (movedAt >= 0 && obs.effortSettled && obs.timeS - start >= MIN_NOTCH_DWELL_S) break;
    if (movedAt >= 0 && obs.timeS - movedAt > 10) break;
    if (obs.timeS - start > STRETCH_MAX_S) return "weak";
  }
  b.current.trigger = "moved";
  return outcome;
}

/** The notch (with several control groups: the level and the groups' notches) the policy wants next, or the same. */
function nextNotch(ctx: PlannerContext, b: Branch, obs: Observation, inStepS: number, dwell: number, capped: { hit: boolean }, seg: Int32Array): { notch: number; set: Int32Array | null } {
  const notch = levelOf(b);
  const v = Math.max(0, obs.leadSpeedMps);
  const settled = obs.effortSettled && !obs.slipped;
  // Time since power was taken (searchPlan's powerS): how far along the pace the adhesion limit counts on.
  const sincePowerS = Math.max(0, obs.timeS - (ctx.releaseS + 2));
  const groups = b.current.groupNotches;
  if (groups) {
    if (notch >= ctx.maxNotch || inStepS < dwell || !settled) return { notch, set: null };
    const set = groupPolicy(ctx, groups, v, obs.leadTravelM, obs.maxTensionN, obs.maxCompressionN, capped, seg, sincePowerS);
    return set ? { notch: settingLevel(set), set } : { notch, set: null };
  }
  return { notch: policyNotch(ctx, notch, v, obs.leadTravelM, inStepS, dwell, settled, obs.maxTensionN, capped, seg, sincePowerS), set: null };
}

/**
 * The planner's notch rule. Advance one notch only after the dwell, with the current settled, when the rails
 * pass more in the next notch (on the rail the plan assumes), that notch asks no more than that rail gives
 * from here to the target — or the present one falls short of the start (`fallsShort`) — and the extra
 * effort keeps the head coupling within its allowance. So a plan holds the highest notch within the rail,
 * notching up as speed lets. A notch is never dropped for slipping the protection copes with (the driver
 * drops one only when it cannot: the If wheels slip card). A train that gravity starts gets no notch until
 * it needs one to keep the slowest acceleration that still reaches its target.
 */
export function policyNotch(
  ctx: PlannerContext,
  notch: number,
  v: number,
  travelM: number,
  inStepS: number,
  dwell: number,
  settled: boolean,
  tensionN: number,
  capped: { hit: boolean },
  seg: Int32Array,
  sincePowerS = 0,
): number {
  if (notch >= ctx.maxNotch || inStepS < dwell || !settled) return notch;
  const up = notch + 1;
  const now = notchDeliveredN(ctx, notch, v);
  const gain = notchDeliveredN(ctx, up, v) - now;
  if (gain <= 1) {
    capped.hit = true;
    return notch;
  }
  // A train gravity starts takes power only when it needs it.
  if (ctx.startKind === "gravity" && now >= needNowN(ctx, travelM, v, seg)) {
    capped.hit = true;
    return notch;
  }
  // Within the rail the plan assumes: the next notch only when what it asks stays within what the rail at
  // the plan's quantile gives, from here to the target (the adhesion limit's rail, so a plan that starts asks
  // no step its verdict did not count on). Beyond it only when the present notch falls behind what the start
  // needs at the pace the adhesion limit counts on: no notch within keeps it on its way there, and the slip
  // protection holds the notch at what the rail gives — the effort that limit's allowance is made of.
  if (ctx.startKind === "power" && notchRiskAhead(ctx, up, v) > ctx.quantile && !fallsShort(ctx, notch, up, now, v, travelM, seg, sincePowerS)) {
    capped.hit = true;
    return notch;
  }
  // Quasi-static rise of the head coupler force from the extra effort must stay within the allowance.
  const leadShare = 1 - (ctx.consist.vehicles[ctx.model.locoVehicle[0] ?? 0]?.massKg ?? 0) / ctx.trainMassKg;
  if (tensionN + gain * leadShare > 0.95 * ctx.couplerAllowanceN) return notch;
  return up;
}

/**
 * `fallsShort` skips the rail's risk at each speed when the risk at the target already exceeds the quantile
 * (true, the default): the risk ahead at any speed below the target is at least that one, so only the notch's
 * surplus decides — the same answer, without a slip risk per unit and speed. A train creeping at its limit asks
 * this at every control interval (a mass search's holding judgements, its lumped guide). False: every speed's
 * risk worked out, as before (the exactness test, the benchmark).
 */
let topRiskDecides = true;

export function setFallsShortTopRisk(on: boolean): void {
  topRiskDecides = on;
}

let topRiskWalks = 0;

/** The walks `fallsShort` made without the risk at each speed, since the process started (benchmarks, tests). */
export function fallsShortTopRiskWalks(): number {
  return topRiskWalks;
}

/** The least progress the accelerate phase waits for before it calls the target out of reach: 0.05 m/s a minute. */
const PROGRESS_MPS2 = 0.05 / 60;

/**
 * The present notch falls short of the start: it is behind what the start needs now (the effort that keeps
 * the pace the adhesion limit counts on: the target in ten minutes from rest), and holding it does not keep
 * the start on that pace — it would reach the speed from which the next notch stays within the rail the plan
 * assumes (or the target) later than the slowest acceptable start does (at speed s after s ÷ a_min from
 * taking power), or somewhere on the way it would hardly gain speed at all (resistance, breakaway fading at
 * a crawl included, taken where the train is now). Then no notch within keeps the start on its way, and the
 * slip protection, holding the next notch at what the rail gives, is what the adhesion limit counts on.
 * A train well ahead of that pace may hold a notch that has fallen behind it for a while: it is still on the
 * start the verdict judged.
 */
function fallsShort(ctx: PlannerContext, notch: NotchSetting, up: NotchSetting, nowN: number, v: number, travelM: number, seg: Int32Array, sincePowerS: number): boolean {
  if (nowN >= needNowN(ctx, travelM, v, seg)) return false;
  const top = targetSpeedMps(ctx);
  // Twice the progress the accelerate phase waits for: the one-mass estimate here must not hold a notch that
  // the full dynamics, with its sway, then finds creeping below that progress (a plan given up short of the target).
  const leastN = 2 * ctx.effMassKg * PROGRESS_MPS2;
  // Taken where the train is now: the resistance depends on the speed alone (summed over the train once).
  const resistance = rigidResistanceCurve(ctx.model, travelM, seg);
  let s = v;
  let timeS = 0;
  // notchRiskAhead(ctx, up, s) at each speed: its parts at the target and at the power limit's corners are the
  // same at every speed below the target, taken once.
  const ahead = riskAheadParts(ctx, up, top);
  const overAtTop = (!BENCH || topRiskDecides) && ahead.topRisk > ctx.quantile;
  // Then the walk ends at the target itself (near a target of 1 m/s or more, speed and target are within a
  // factor of two, so the rest of the way is exact and the last step lands on the target) and the time only
  // grows on the way (the surplus stays positive, else it falls short at once): once the time is behind the
  // slowest start's at the target, the answer at the end is "falls short" already.
  const behindEarly = overAtTop && top >= 1 && ctx.aMinMps2 > 0;
  if (BENCH && overAtTop) topRiskWalks++;
  while (s < top && (overAtTop || riskAheadAt(ctx, up, s, ahead) > ctx.quantile)) {
    const ds = Math.min(0.05, top - s);
    const surplusN = notchDeliveredN(ctx, notch, s) - rigidResistanceAt(resistance, s);
    if (surplusN < leastN) return true;
    timeS += (ds * ctx.effMassKg) / surplusN;
    s += ds;
    if (behindEarly && (sincePowerS + timeS) * ctx.aMinMps2 > top + 1e-9) return true;
  }
  return (sincePowerS + timeS) * ctx.aMinMps2 > s + 1e-9;
}

/**
 * The notch rule with several control groups: raise one group by one notch — the group whose raise keeps the
 * couplings most evenly loaded (groupNotches.ts) — when the rails pass more, a train gravity starts needs
 * more, and the couplers stay within their allowances: the estimate of the new setting, and the present
 * peaks raised by what the estimate adds, in tension and in compression (wheel climb included). Null: hold.
 */
function groupPolicy(ctx: PlannerContext, from: Int32Array, v: number, travelM: number, tensionN: number, compressionN: number, capped: { hit: boolean }, seg: Int32Array, sincePowerS: number): Int32Array | null {
  const now = estimateCouplers(ctx, from, v, travelM, seg);
  if (ctx.startKind === "gravity" && now.deliveredN >= needNowN(ctx, travelM, v, seg)) {
    capped.hit = true;
    return null;
  }
  // A raise may not take a coupling beyond 95 % of its allowance, nor add to one that is there already.
  const within = (e: CouplerEstimate): boolean => {
    const addT = e.maxTensionN - now.maxTensionN;
    const addC = e.maxCompressionN - now.maxCompressionN;
    return (
      e.worstRatio <= Math.max(GROUP_RATIO_LIMIT, now.worstRatio) &&
      (addT <= 0 || tensionN + addT <= GROUP_RATIO_LIMIT * ctx.couplerAllowanceN) &&
      (addC <= 0 || compressionN + addC <= GROUP_RATIO_LIMIT * ctx.buffAllowanceN)
    );
  };
  // A power start raises a group only while the new setting asks within the rail the plan assumes, up to
  // the target, or when the present one falls short of the start (as policyNotch).
  const railAllows = (set: Int32Array): boolean =>
    ctx.startKind !== "power" || notchRiskAhead(ctx, set, v) <= ctx.quantile || fallsShort(ctx, from, set, now.deliveredN, v, travelM, seg, sincePowerS);
  // Every group a notch up together (as synchronous distributed power does) while that keeps within.
  const together = raiseAll(ctx, from);
  if (together) {
    const e = estimateCouplers(ctx, together, v, travelM, seg);
    if (e.deliveredN - now.deliveredN > 1 && within(e) && railAllows(together)) return together;
  }
  const ups = raises(ctx, from, v, travelM, seg, false).filter((u) => u.gainN > 1);
  if (ups.length === 0) {
    capped.hit = true;
    return null;
  }
  const allowed = ups.filter((u) => railAllows(u.notches));
  if (allowed.length === 0) {
    capped.hit = true;
    return null;
  }
  return allowed.find((u) => within(u.estimate))?.notches ?? null;
}

/** Every group below its highest notch one notch up; null when that is every group's highest already, or only some can go. */
function raiseAll(ctx: PlannerContext, from: Int32Array): Int32Array | null {
  const next = Int32Array.from(from);
  let raised = 0;
  for (let g = 0; g < from.length; g++) {
    if (from[g]! < ctx.groupMaxNotch[g]!) {
      next[g]! += 1;
      raised++;
    }
  }
  return raised > 1 ? next : null;
}

/**
 * Highest slip risk a notch will carry from the present speed up to the target. While the effort is held
 * by the current limit, adhesion falls with speed and the risk rises; once the power limit takes over,
 * effort falls faster than adhesion and the risk falls. So the worst is at the present speed, where the
 * power limit takes over, or at the target.
 */
export function notchRiskAhead(ctx: PlannerContext, notch: NotchSetting, v: number): number {
  const m = ctx.model;
  const top = Math.max(v, targetSpeedMps(ctx));
  let worst = notchRisk(ctx, notch, v);
  worst = Math.max(worst, notchRisk(ctx, notch, top));
  for (let k = 0; k < m.nl; k++) {
    const n = unitNotch(ctx, notch, k);
    if (n <= 0) continue;
    const idx = k * m.notchStride + Math.min(n, m.notchStride - 1);
    const corner = m.notchPowerW[idx]! / m.notchCurrentN[idx]!;
    if (corner > v && corner < top) worst = Math.max(worst, notchRisk(ctx, notch, corner));
  }
  return worst;
}

/** `notchRiskAhead`'s speed-independent parts below `top`: the risk at `top`, and each unit's corner speed and its risk there. */
export interface RiskAheadParts {
  top: number;
  topRisk: number;
  corner: Float64Array;
  cornerRisk: Float64Array;
}

export function riskAheadParts(ctx: PlannerContext, notch: NotchSetting, top: number): RiskAheadParts {
  const m = ctx.model;
  const corner = new Float64Array(m.nl).fill(Number.NaN);
  const cornerRisk = new Float64Array(m.nl);
  for (let k = 0; k < m.nl; k++) {
    const n = unitNotch(ctx, notch, k);
    if (n <= 0) continue;
    const idx = k * m.notchStride + Math.min(n, m.notchStride - 1);
    corner[k] = m.notchPowerW[idx]! / m.notchCurrentN[idx]!;
    if (corner[k]! < top) cornerRisk[k] = notchRisk(ctx, notch, corner[k]!);
  }
  return { top, topRisk: notchRisk(ctx, notch, top), corner, cornerRisk };
}

/** `notchRiskAhead(ctx, notch, v)` for a speed v below `top` of `riskAheadParts` (the same number). */
export function riskAheadAt(ctx: PlannerContext, notch: NotchSetting, v: number, p: RiskAheadParts): number {
  let worst = notchRisk(ctx, notch, v);
  worst = Math.max(worst, p.topRisk);
  for (let k = 0; k < p.corner.length; k++) {
    const c = p.corner[k]!;
    // NaN (a unit in no notch) is never between.
    if (c > v && c < p.top) worst = Math.max(worst, p.cornerRisk[k]!);
  }
  return worst;
}

/** The speed the plan accelerates to: the target speed, or for a distance target a modest running speed. */
function targetSpeedMps(ctx: PlannerContext): number {
  const t = ctx.c.target;
  if (t.kind === "speed") return t.speedMps;
  const vmax = Math.min(...ctx.model.locoSpecs.map((s) => s.maxSpeedMps));
  return Math.min(vmax, 40 / 3.6);
}

/**
 * Notch up at the given pace until the highest notch is reached or none is allowed for a while; or stop
 * (`over`) as soon as a coupling's tension passes `dropAboveN` (the branch's peak before the build is below it).
 */
function buildWith(ctx: PlannerContext, b: Branch, dwell: number, watch?: { overAtS: number | null; stepsAt: number }, dropAboveN = Infinity): { endS: number; capped: boolean; over: boolean } {
  const capped = { hit: false };
  const seg = new Int32Array(ctx.model.n);
  let lastChange = b.run.s.t;
  for (;;) {
    const obs = b.tick(ctx);
    if (BENCH && watch && watch.overAtS === null && b.peakTensionN() > ctx.couplerAllowanceN) {
      watch.overAtS = obs.timeS;
      watch.stepsAt = vehicleStepsDone();
    }
    // Every tick's peak goes into the step current then, so the current step's peak covers the whole pace.
    if (b.current.peakTensionN > dropAboveN) return { endS: b.run.s.t, capped: capped.hit, over: true };
    if (targetReached(ctx, obs)) break;
    const notch = levelOf(b);
    const { notch: next, set } = nextNotch(ctx, b, obs, obs.timeS - b.current.startS, dwell, capped, seg);
    if (next !== notch) {
      b.current.trigger = next > notch ? "time" : "speed";
      openStep(ctx, b, "build", next, set);
      lastChange = obs.timeS;
    } else if ((notch >= ctx.maxNotch && obs.timeS - lastChange >= dwell) || obs.timeS - lastChange > 15) {
      break;
    }
    if (obs.timeS - b.steps[1]!.startS > ACCELERATE_MAX_S) break;
  }
  return { endS: b.run.s.t, capped: capped.hit, over: false };
}

function targetReached(ctx: PlannerContext, obs: Observation): boolean {
  const t = ctx.c.target;
  return t.kind === "speed" ? obs.leadSpeedMps >= t.speedMps : obs.tailTravelM >= t.distanceM;
}

interface AccelerateOutcome {
  reachedS: number | null;
  travelM: number | null;
  stalled: boolean;
  capped: boolean;
  bestSpeedMps: number;
  bestTailTravelM: number;
  stoppedEarly: boolean;
}

/**
 * Carry on with the same policy until the target, a stall or the time limit (or, when given, `failed` holds);
 * pausing with `soFar` every `ACCELERATE_SLICE_TICKS` control intervals.
 */
function* accelerate(ctx: PlannerContext, b: Branch, dwell: number, powerS: number, check: () => void, soFar: PlanSoFar, failed?: () => boolean, intervals: number[] | null = null): Generator<PlanSoFar, AccelerateOutcome, void> {
  // Stretched and rolling, no coupling goes in or out of its slack any more: the stability-limited step
  // is enough (the accuracy limit is for slack engagement).
  if (ctx.startKind === "power") b.run.setStep(Math.max(b.run.dt, stabilityTimeStep(ctx.model)));
  // Once the surge of each notch change has passed, the train runs as one mass (dynamics/settled.ts).
  if (!BENCH || settleInAccelerate) b.run.runAsOneWhenSettled();
  const capped = { hit: false };
  const seg = new Int32Array(ctx.model.n);
  let reachedS: number | null = null;
  let travelM: number | null = null;
  let stalled = false;
  let slowSince = -1;
  let ticks = 0;
  let best = Math.max(0, b.run.s.v[b.run.lead]!);
  let bestAt = b.run.s.t;
  let bestTail = b.run.s.x[b.run.m.n - 1]!;
  let stoppedEarly = false;
  // The step current at the end of the build is the one held to accelerate.
  b.current.phase = b.current.phase === "stretch" ? "stretch" : "accelerate";
  const seen = BENCH && intervals ? Int32Array.from(b.run.s.notch) : null;
  for (;;) {
    const w0 = BENCH && intervals ? vehicleStepsDone() : 0;
    let rose = 0;
    if (BENCH && seen) {
      for (let k = 0; k < seen.length; k++) if (b.run.s.notch[k]! > seen[k]!) rose = 1;
      seen.set(b.run.s.notch);
    }
    const obs = b.tick(ctx);
    // The benchmark's record of each interval: work counter before it, its work, 1 slow / 2 as one / 0 the
    // chain, and 1 if a unit's notch rose at its start.
    if (BENCH && intervals) intervals.push(w0, vehicleStepsDone() - w0, obs.leadSpeedMps < 1.5 * SETTLED_MIN_SPEED_MPS ? 1 : b.run.runningAsOne ? 2 : 0, rose);
    if (obs.tailTravelM > bestTail) bestTail = obs.tailTravelM;
    if (targetReached(ctx, obs)) {
      reachedS = obs.timeS;
      travelM = obs.leadTravelM;
      best = Math.max(best, obs.leadSpeedMps);
      b.current.trigger = "target";
      break;
    }
    if (obs.leadSpeedMps <= 0.01) {
      if (slowSince < 0) slowSince = obs.timeS;
      if (obs.timeS - slowSince > 20) {
        stalled = true;
        break;
      }
    } else slowSince = -1;
    // No progress for a minute at a notch the policy will not raise: the target is out of reach.
    if (obs.leadSpeedMps > best + 0.05) {
      best = obs.leadSpeedMps;
      bestAt = obs.timeS;
    } else if (ctx.c.target.kind === "speed" && obs.timeS - bestAt > 60) break;
    if (obs.timeS - powerS > ACCELERATE_MAX_S) break;
    if (failed?.()) {
      stoppedEarly = true;
      break;
    }
    const notch = levelOf(b);
    const { notch: next, set } = nextNotch(ctx, b, obs, obs.timeS - b.current.startS, dwell, capped, seg);
    if (next !== notch) {
      b.current.trigger = "speed";
      openStep(ctx, b, next > notch && notch === 0 ? "build" : "accelerate", next, set);
    }
    if (++ticks % 200 === 0) check();
    if (ticks % ACCELERATE_SLICE_TICKS === 0) yield soFar;
  }
  if (b.current.phase === "stretch" && reachedS !== null) b.current.trigger = "target";
  return { reachedS, travelM, stalled, capped: capped.hit, bestSpeedMps: best, bestTailTravelM: bestTail, stoppedEarly };
}

/** A digest of a run's state (time, positions, speeds, forces, brakes, notches, efforts), for the benchmark's log. */
function stateDigest(r: Run): string {
  const s = r.s;
  let h = 2166136261;
  const mix = (a: Float64Array | Int32Array) => {
    const u = new Uint32Array(a.buffer, a.byteOffset, a.byteLength / 4);
    for (let i = 0; i < u.length; i++) h = Math.imul(h ^ u[i]!, 16777619);
  };
  mix(Float64Array.of(s.t));
  for (const a of [s.x, s.v, s.acc, s.couplerF, s.gearF, s.brakeN, s.effortN, s.targetN, s.peakTensionN, s.peakCompressionN]) mix(a);
  mix(s.notch);
  return `${r.m.n}:${(h >>> 0).toString(16)}`;
}
