/**
 * The plan search: prepare → stretch → build → accelerate, each phase tried on clones of the run that
 * reached it, choosing by common practice (lowest stretch notch that moves the whole train slowly;
 * quickest build pace that keeps couplers within their allowance) and checked by the full dynamics.
 * Deterministic: the same case always gives the same plan.
 */
import { Run, type Observation } from "../dynamics/runner.js";
import { stabilityTimeStep } from "../train/trainModel.js";
import { Branch } from "./branch.js";
import { rigidAccelerate } from "./rigid.js";
import { holdingNotch, MIN_NOTCH_DWELL_S, notchAdhesion, notchEffortAllN, type PlannerContext } from "./context.js";

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
  /** Time the locomotive brake comes off and the stretch notch is taken, s. */
  powerS: number;
  holdNotch: number;
  stretch: { notch: number; outcome: StretchOutcome; tried: Array<{ notch: number; outcome: StretchOutcome }> } | null;
  buildDwellS: number | null;
  /** Build pace kept the couplers within their allowance. */
  buildWithinAllowance: boolean;
  /** Time the build phase ended (highest notch reached or no further notch allowed), s. */
  buildEndS: number | null;
  targetReachedS: number | null;
  /** Locomotive travel when the target was reached, m. */
  targetTravelM: number | null;
  stalled: boolean;
  /** The notch-up was held back by the slip-risk cap at some point. */
  adhesionCapped: boolean;
  /** Slip-risk cap the plan was made with (above the case's threshold when the target needed more). */
  riskCap: number;
  failure: null | "cannot-hold" | "cannot-start";
}

export interface SearchOptions {
  shouldStop?: () => boolean;
  onProgress?: (fraction: number) => void;
  /** "verdict": follow the acceleration with the one-mass model (the verdict needs no more). */
  mode?: "full" | "verdict";
}

class Cancelled extends Error {}

/** Run the search for a case. */
export function searchPlan(ctx: PlannerContext, opts: SearchOptions = {}): SearchResult {
  const check = () => {
    if (opts.shouldStop?.()) throw new Cancelled("cancelled");
  };
  const hold = holdingNotch(ctx);
  const powerS = ctx.releaseS + 2;
  const run = Run.start(ctx.model, { trainBrakeReleaseS: 0, locoBrakeReleaseS: powerS });
  const prep = new Branch(run, []);
  prep.open("prepare", Math.max(0, hold));
  const base: SearchResult = {
    branch: prep,
    powerS,
    holdNotch: hold,
    stretch: null,
    buildDwellS: null,
    buildWithinAllowance: true,
    buildEndS: null,
    targetReachedS: null,
    targetTravelM: null,
    stalled: false,
    adhesionCapped: false,
    riskCap: ctx.riskCap,
    failure: null,
  };
  if (hold < 0) return { ...base, failure: "cannot-hold" };

  // Prepare: release the train brake with the locomotive brake (and a holding notch on a rising grade) on.
  while (prep.run.s.t < powerS - 1e-9) {
    const obs = prep.tick(ctx);
    if (obs.leadTravelM < -ROLL_BACK_LIMIT_M) break;
  }
  prep.current.trigger = "time";
  check();
  opts.onProgress?.(0.2);

  // Stretch: the lowest notch that gets every vehicle moving with the locomotive slow and couplers easy.
  const tried: Array<{ notch: number; outcome: StretchOutcome }> = [];
  let chosen: { branch: Branch; notch: number; outcome: StretchOutcome } | null = null;
  const stretchCap = opts.mode === "verdict" ? ctx.riskCap : 0.5;
  for (let n = Math.max(1, hold); n <= ctx.maxNotch; n++) {
    if (notchAdhesion(ctx, n, 0).risk > stretchCap) break;
    if (!canEverMove(ctx, n)) continue;
    const b = prep.clone();
    const outcome = stretchWith(ctx, b, n);
    tried.push({ notch: n, outcome });
    check();
    if (outcome === "weak") continue;
    chosen = { branch: b, notch: n, outcome };
    break;
  }
  opts.onProgress?.(0.45);
  if (!chosen) return { ...base, stretch: { notch: 0, outcome: "weak", tried }, failure: "cannot-start" };
  const stretch = { notch: chosen.notch, outcome: chosen.outcome, tried };

  // Coarse notches may leave no way to the target within the slip-risk cap. Check each cap of the ladder
  // with the one-mass model (cheap) from where the stretch ended and plan with the first that gets there.
  let plannedCtx = ctx;
  let riskCap = ctx.riskCap;
  for (const cap of riskLadder(ctx, opts)) {
    plannedCtx = cap === ctx.riskCap ? ctx : { ...ctx, riskCap: cap };
    riskCap = cap;
    const probe = accelerateRigid(plannedCtx, chosen.branch, MIN_NOTCH_DWELL_S, powerS);
    if (probe.reachedS !== null) break;
  }

  // Build: the shortest pace between notches that keeps the couplers within their allowance.
  let built: { branch: Branch; dwell: number; endS: number; capped: boolean } | null = null;
  for (const dwell of BUILD_DWELLS_S) {
    const b = chosen.branch.clone();
    const r = buildWith(plannedCtx, b, dwell);
    check();
    built = { branch: b, dwell, endS: r.endS, capped: r.capped };
    if (b.peakTensionN() <= ctx.couplerAllowanceN) break;
  }
  opts.onProgress?.(0.65);
  const b = built!.branch;
  const withinAllowance = b.peakTensionN() <= ctx.couplerAllowanceN;

  // Accelerate: hold the highest notch the rails allow (adjusting as speed changes) to the target.
  const acc = opts.mode === "verdict" ? accelerateRigid(plannedCtx, b, built!.dwell, powerS) : accelerate(plannedCtx, b, built!.dwell, powerS, check);
  opts.onProgress?.(0.85);
  return {
    ...base,
    branch: b,
    stretch,
    riskCap,
    buildDwellS: built!.dwell,
    buildWithinAllowance: withinAllowance,
    buildEndS: built!.endS,
    targetReachedS: acc.reachedS,
    targetTravelM: acc.travelM,
    stalled: acc.stalled,
    adhesionCapped: built!.capped || acc.capped,
  };
}

/** Slip-risk caps to try: the case's own, then (unless only the verdict is wanted) more lenient ones. */
function riskLadder(ctx: PlannerContext, opts: SearchOptions): number[] {
  if (opts.mode === "verdict") return [ctx.riskCap];
  return [ctx.riskCap, 0.25, 0.5].filter((x, i) => i === 0 || x > ctx.riskCap);
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
  return notchEffortAllN(ctx, notch, 0) > rolling;
}

/** Take `notch` and wait for the last vehicle to move; classify how it went. */
function stretchWith(ctx: PlannerContext, b: Branch, notch: number): StretchOutcome {
  b.current.trigger = "time";
  b.open("stretch", notch);
  const start = b.run.s.t;
  const limit = ctx.c.settings.stretchSpeedMps;
  let outcome: StretchOutcome = "ok";
  let movedAt = -1;
  for (;;) {
    const obs = b.tick(ctx);
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

/** The notch the policy wants next, or the same notch. */
function nextNotch(ctx: PlannerContext, obs: Observation, notch: number, inStepS: number, dwell: number, capped: { hit: boolean }): number {
  return policyNotch(ctx, notch, Math.max(0, obs.leadSpeedMps), inStepS, dwell, obs.effortSettled && !obs.slipped, obs.maxTensionN, capped);
}

/**
 * The planner's notch rule: ease off a notch if its slip risk has crept over the cap; advance one notch
 * only after the dwell, with the current settled, when the next notch's slip risk (now and a little
 * faster) stays within the cap and the extra effort keeps the head coupling within its allowance.
 */
export function policyNotch(ctx: PlannerContext, notch: number, v: number, inStepS: number, dwell: number, settled: boolean, tensionN: number, capped: { hit: boolean }): number {
  if (notch > 1 && notchAdhesion(ctx, notch, v).risk > ctx.riskCap) return notch - 1;
  if (notch >= ctx.maxNotch || inStepS < dwell || !settled) return notch;
  const up = notch + 1;
  if (notchRiskAhead(ctx, up, v) > ctx.riskCap) {
    capped.hit = true;
    return notch;
  }
  // Quasi-static rise of the head coupler force from the extra effort must stay within the allowance.
  const extra = notchEffortAllN(ctx, up, v) - notchEffortAllN(ctx, notch, v);
  const leadShare = 1 - (ctx.consist.vehicles[ctx.model.locoVehicle[0] ?? 0]?.massKg ?? 0) / ctx.trainMassKg;
  if (tensionN + extra * leadShare > 0.95 * ctx.couplerAllowanceN) return notch;
  return up;
}

/**
 * Highest slip risk a notch will carry from the present speed up to the target. While the effort is held
 * by the current limit, adhesion falls with speed and the risk rises; once the power limit takes over,
 * effort falls faster than adhesion and the risk falls. So the worst is at the present speed, where the
 * power limit takes over, or at the target.
 */
export function notchRiskAhead(ctx: PlannerContext, notch: number, v: number): number {
  const m = ctx.model;
  const top = Math.max(v, targetSpeedMps(ctx));
  let worst = notchAdhesion(ctx, notch, v).risk;
  worst = Math.max(worst, notchAdhesion(ctx, notch, top).risk);
  for (let k = 0; k < m.nl; k++) {
    const idx = k * m.notchStride + Math.min(notch, m.notchStride - 1);
    const corner = m.notchPowerW[idx]! / m.notchCurrentN[idx]!;
    if (corner > v && corner < top) worst = Math.max(worst, notchAdhesion(ctx, notch, corner).risk);
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

/** Notch up at the given pace until the highest notch is reached or none is allowed for a while. */
function buildWith(ctx: PlannerContext, b: Branch, dwell: number): { endS: number; capped: boolean } {
  const capped = { hit: false };
  let lastChange = b.run.s.t;
  for (;;) {
    const obs = b.tick(ctx);
    if (targetReached(ctx, obs)) break;
    const notch = b.current.notch;
    const next = nextNotch(ctx, obs, notch, obs.timeS - b.current.startS, dwell, capped);
    if (next !== notch) {
      b.current.trigger = next > notch ? "time" : "speed";
      b.open("build", next);
      lastChange = obs.timeS;
    } else if ((notch >= ctx.maxNotch && obs.timeS - lastChange >= dwell) || obs.timeS - lastChange > 15) {
      break;
    }
    if (obs.timeS - b.steps[1]!.startS > ACCELERATE_MAX_S) break;
  }
  return { endS: b.run.s.t, capped: capped.hit };
}

function targetReached(ctx: PlannerContext, obs: Observation): boolean {
  const t = ctx.c.target;
  return t.kind === "speed" ? obs.leadSpeedMps >= t.speedMps : obs.tailTravelM >= t.distanceM;
}

/** Carry on with the same policy until the target, a stall or the time limit. */
function accelerate(ctx: PlannerContext, b: Branch, dwell: number, powerS: number, check: () => void) {
  // Stretched and rolling, no coupling goes in or out of its slack any more: the stability-limited step
  // is enough (the accuracy limit is for slack engagement).
  b.run.setStep(Math.max(b.run.dt, stabilityTimeStep(ctx.model)));
  const capped = { hit: false };
  let reachedS: number | null = null;
  let travelM: number | null = null;
  let stalled = false;
  let slowSince = -1;
  let ticks = 0;
  let best = Math.max(0, b.run.s.v[b.run.lead]!);
  let bestAt = b.run.s.t;
  // The step current at the end of the build is the one held to accelerate.
  b.current.phase = b.current.phase === "stretch" ? "stretch" : "accelerate";
  for (;;) {
    const obs = b.tick(ctx);
    if (targetReached(ctx, obs)) {
      reachedS = obs.timeS;
      travelM = obs.leadTravelM;
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
    const notch = b.current.notch;
    const next = nextNotch(ctx, obs, notch, obs.timeS - b.current.startS, dwell, capped);
    if (next !== notch) {
      b.current.trigger = "speed";
      b.open("accelerate", next);
    }
    if (++ticks % 200 === 0) check();
  }
  if (b.current.phase === "stretch" && reachedS !== null) b.current.trigger = "target";
  return { reachedS, travelM, stalled, capped: capped.hit };
}

/** The acceleration followed with the one-mass model from where the build ended. */
function accelerateRigid(ctx: PlannerContext, b: Branch, dwell: number, powerS: number) {
  const run = b.run;
  const out = rigidAccelerate(
    ctx,
    { timeS: run.s.t, speedMps: run.s.v[run.lead]!, travelM: run.s.x[run.lead]!, notch: b.current.notch },
    (notch, v, inStepS, capped) => policyNotch(ctx, notch, v, inStepS, dwell, true, 0, capped),
    Math.max(0, ACCELERATE_MAX_S - (run.s.t - powerS)),
  );
  return { reachedS: out.reachedS, travelM: out.reachedS === null ? null : out.travelM, stalled: out.stalled, capped: out.capped };
}
