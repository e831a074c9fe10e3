/**
 * What the planner knows about a case before it simulates anything: the static figures, the forces on the
 * standing train, whether it would roll back or run away when released, the limits it must respect, the
 * rail it plans on (a quantile of the rail condition) and the notch it can hold with.
 */
import { adhesionSpeedFactor, slipRisk, standstillMedian } from "../physics/adhesion.js";
import { locoBrakeHoldingN, trainBrakeHoldingN } from "../physics/brakes.js";
import { buildConsist, type Consist } from "../train/consist.js";
import { standingForces } from "../train/standing.js";
import { staticCheckOf } from "./staticCheck.js";
import { modelFromCase, trainBrakeReleaseS } from "../train/trainModel.js";
import { notchTargetN } from "../dynamics/runner.js";
import type { Settings, StartCase } from "../train/types.js";
import { minimumAccelerationMps2, needAtN } from "./need.js";
import { WHEEL_CLIMB_ALLOWANCE, buffLateralRatio } from "../physics/wheelClimb.js";
import { standingNotches } from "./groupNotches.js";

import type { StartKind } from "./outcome.js";
import type { PlannerContext } from "./contextShape.js";

export type { StartKind } from "./outcome.js";
export type { PlannerContext } from "./contextShape.js";


/** Notch settling: the effort lag's time constant ×3 and never under the 2–3 s practice minimum. */
export const MIN_NOTCH_DWELL_S = 3;
/** What a holding force must exceed the pull it holds by [M]: the pull itself is an estimate. */
export const HOLD_RESERVE = 1.1;

/** The highest slip risk of the needed effort still judged marginal (never below the threshold). */
export function marginalBound(s: Settings): number {
  return Math.max(s.slipRiskThreshold, s.marginalSlipRisk ?? 0.25);
}

/** The planner's view of a case, planning on the rail at its `quantile` (default: the slip-risk threshold). */
export function plannerContext(c: StartCase, quantile = c.settings.slipRiskThreshold): PlannerContext {
  const consist = buildConsist(c);
  const forces = standingForces(consist, c.location.track);
  const st = staticCheckOf(c, consist, forces);
  const cond = c.adhesion[c.conditions.rail];
  let grade = 0;
  let hold = 0;
  let trainBrakeN = 0;
  let locoBrakeN = 0;
  let effMassKg = 0;
  for (let i = 0; i < forces.gradeN.length; i++) {
    grade += forces.gradeN[i]!;
    hold += forces.breakawayN[i]! + forces.curveN[i]!;
    const v = consist.vehicles[i]!;
    if (v.loco) locoBrakeN += locoBrakeHoldingN(v.loco);
    else trainBrakeN += trainBrakeHoldingN(v.massKg);
    effMassKg += v.effectiveMassKg;
  }
  const runAwayPullN = -grade - hold;
  const startKind: StartKind = runAwayPullN > 0 ? "gravity" : "power";
  const locoBrakeHolds = locoBrakeN >= HOLD_RESERVE * runAwayPullN;
  // A train the locomotive brake cannot hold on a falling grade is held on the train brake, eased in stages.
  const model = modelFromCase(c, { adhesionQuantile: quantile, graduatedRelease: startKind === "gravity" && !locoBrakeHolds });
  const specs = model.locoSpecs;
  const groupMaxNotch = consist.controlGroups.map((g) => Math.min(...g.units.map((k) => specs[k]!.notchPower.length)));
  return {
    c,
    consist,
    forces,
    st,
    model,
    quantile,
    sigmaLn: cond.sigmaLn,
    mu0Median: Float64Array.from(specs.map((s) => standstillMedian(cond, c.conditions.sand && s.sanders))),
    threshold: c.settings.slipRiskThreshold,
    couplerAllowanceN: c.train.couplerLimitN / c.settings.couplerSafetyFactor,
    buffAllowanceN: (c.train.couplerBuffLimitN ?? c.train.couplerLimitN) / c.settings.couplerSafetyFactor,
    wheelClimb: wheelClimbOf(c, consist),
    segRadiusM: Float64Array.from(c.location.track.segments.map((g) => g.curveRadiusM)),
    groupMaxNotch,
    ladder: null,
    standingSeg: standingSegments(c, consist),
    scratch: new Float64Array(consist.vehicles.length),
    scratchEffort: new Float64Array(consist.vehicles.length),
    rollBackPullN: grade - hold,
    runAwayPullN,
    locoBrakeN,
    trainBrakeN,
    startKind,
    locoBrakeHolds,
    releaseS: trainBrakeReleaseS(consist.lengthM),
    // With several control groups the search's notch numbers are levels (Σ of the groups' notches).
    maxNotch: consist.controlGroups.length > 1 ? groupMaxNotch.reduce((s, n) => s + n, 0) : Math.min(...specs.map((s) => s.notchPower.length)),
    trainMassKg: consist.vehicles.reduce((s, v) => s + v.massKg, 0),
    effMassKg,
    aMinMps2: minimumAccelerationMps2(c.target),
  };
}

/**
 * The wheel-climb check's figures per coupling: made when a unit stands behind the head (it pushes) or the
 * train is mixed; the neighbour with the larger L/V per newton of buff is the one that counts.
 */
function wheelClimbOf(c: StartCase, consist: Consist): PlannerContext["wheelClimb"] {
  const vs = consist.vehicles;
  const nc = Math.max(0, vs.length - 1);
  const ratio = new Float64Array(nc);
  const vehicle = new Int32Array(nc);
  const active = c.locomotives.some((g) => g.position !== "head") || c.train.groups !== undefined;
  for (let j = 0; j < nc; j++) {
    const a = buffLateralRatio(1, 1, vs[j]!.lengthM, vs[j]!.axles, vs[j]!.massKg);
    const b = buffLateralRatio(1, 1, vs[j + 1]!.lengthM, vs[j + 1]!.axles, vs[j + 1]!.massKg);
    ratio[j] = Math.max(a, b);
    vehicle[j] = b > a ? j + 1 : j;
  }
  return { active, allowance: WHEEL_CLIMB_ALLOWANCE, ratioPerNPerInvR: ratio, vehicle };
}

/** The track segment under each vehicle's centre where the train stands. */
function standingSegments(c: StartCase, consist: Consist): Int32Array {
  const segs = c.location.track.segments;
  return Int32Array.from(consist.vehicles, (v) => {
    let k = 0;
    while (k < segs.length - 1 && v.centreChainageM >= segs[k]!.startM + segs[k]!.lengthM) k++;
    return k;
  });
}

/** A notch as every unit's notch: with several control groups a number is a level, standing for its group notches (groupNotches.ts). */
export type NotchSetting = number | ArrayLike<number>;

/** The notch unit k works in under a setting. */
export function unitNotch(ctx: PlannerContext, setting: NotchSetting, k: number): number {
  if (typeof setting === "number") return ctx.model.groupCount > 1 ? standingNotches(ctx, setting)[ctx.model.unitGroup[k]!]! : setting;
  return setting[ctx.model.unitGroup[k]!] ?? 0;
}

/** Σ effort all units ask for in a notch at a speed, N. */
export function notchEffortAllN(ctx: PlannerContext, notch: NotchSetting, speedMps: number): number {
  let f = 0;
  for (let k = 0; k < ctx.model.nl; k++) f += notchTargetN(ctx.model, k, unitNotch(ctx, notch, k), speedMps);
  return f;
}

/** Σ effort the rails pass in a notch at a speed on the rail the plan assumes (the protection holds the rest back), N. */
export function notchDeliveredN(ctx: PlannerContext, notch: NotchSetting, speedMps: number): number {
  const m = ctx.model;
  const factor = adhesionSpeedFactor(speedMps);
  let f = 0;
  for (let k = 0; k < m.nl; k++) f += Math.min(notchTargetN(m, k, unitNotch(ctx, notch, k), speedMps), m.adhesiveWeightN[k]! * m.mu0[k]! * factor);
  return f;
}

/** Every unit in this notch asks for at least what the rails give on the rail the plan assumes. */
export function notchSaturated(ctx: PlannerContext, notch: NotchSetting, speedMps: number): boolean {
  const m = ctx.model;
  const factor = adhesionSpeedFactor(speedMps);
  for (let k = 0; k < m.nl; k++) if (notchTargetN(m, k, unitNotch(ctx, notch, k), speedMps) < m.adhesiveWeightN[k]! * m.mu0[k]! * factor) return false;
  return true;
}

/**
 * Slip risk and adhesion use of a notch at a speed (worst unit, against the median adhesion and the
 * condition's spread): the chance that the rails give less than the notch asks, i.e. that the wheel-slip
 * protection acts in this step.
 */
export function notchAdhesion(ctx: PlannerContext, notch: NotchSetting, speedMps: number): { risk: number; use: number } {
  const m = ctx.model;
  let risk = 0;
  let use = 0;
  const factor = adhesionSpeedFactor(speedMps);
  for (let k = 0; k < m.nl; k++) {
    const demandMu = notchTargetN(m, k, unitNotch(ctx, notch, k), speedMps) / m.adhesiveWeightN[k]!;
    const mu = ctx.mu0Median[k]! * factor;
    risk = Math.max(risk, slipRisk(demandMu, mu, ctx.sigmaLn));
    use = Math.max(use, demandMu / mu);
  }
  return { risk, use };
}

/** `notchAdhesion(ctx, notch, speedMps).risk` alone (the same number, without the pair). */
export function notchRisk(ctx: PlannerContext, notch: NotchSetting, speedMps: number): number {
  const m = ctx.model;
  let risk = 0;
  const factor = adhesionSpeedFactor(speedMps);
  for (let k = 0; k < m.nl; k++) {
    const demandMu = notchTargetN(m, k, unitNotch(ctx, notch, k), speedMps) / m.adhesiveWeightN[k]!;
    const mu = ctx.mu0Median[k]! * factor;
    risk = Math.max(risk, slipRisk(demandMu, mu, ctx.sigmaLn));
  }
  return risk;
}

/**
 * Lowest notch that, with the locomotive brake, holds the train against rolling back (with 10 % in hand) on
 * the rail the plan assumes; 0 when nothing pulls it back; −1 when no notch can.
 */
export function holdingNotch(ctx: PlannerContext): number {
  if (ctx.rollBackPullN <= 0) return 0;
  for (let n = 1; n <= ctx.maxNotch; n++) {
    if (notchDeliveredN(ctx, n, 0) + ctx.locoBrakeN >= HOLD_RESERVE * ctx.rollBackPullN) return n;
  }
  return -1;
}

/** The effort the train needs at this travel and speed to keep the slowest acceleration, N. */
export function needNowN(ctx: PlannerContext, travelM: number, speedMps: number, seg: Int32Array): number {
  return needAtN(ctx.model, ctx.aMinMps2, ctx.effMassKg, travelM, speedMps, seg);
}
