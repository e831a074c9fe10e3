/**
 * Several control groups: the head's units (and any in multiple with them) and each remote or helper group
 * with its own notch. Moving, the planner raises every group a notch together (as synchronous distributed
 * power does) while that keeps every coupling within its allowances; otherwise, and always while the train
 * stands (the stretch's settings), one group-notch at a time: of the groups that can take another notch, the
 * one that adds effort the rail passes and keeps the couplings most evenly loaded — the smallest, over every
 * coupling, of its force against its allowance (tension against the draft allowance; compression against
 * the buff allowance and, on a curve, the buff force at which the lighter vehicle's wheel would reach the
 * wheel-climb allowance). A setting's *level* is the sum of the groups' notches: level n is reached after n
 * such raises, so the search's notch numbers stand for levels when there are several groups.
 *
 * The forces are estimates (the full dynamics then check the plan). Moving, the train moves as one: each
 * vehicle's effort less its resistance and its share of the acceleration, summed from the head. Standing, a
 * group's effort is held by the wagons nearest it before the rest of the train moves: the head's net pull
 * goes into the coupling behind it, a pusher's net push into the coupling ahead of it.
 *
 * With head and rear groups of equal pull the result is the familiar one: each pulls or pushes about the half
 * of the train nearest it, and the head coupling carries about half the pull it would with all power at the
 * head.
 */
import type { GroupPlace } from "./lines.js";
import { adhesionSpeedFactor } from "../physics/adhesion.js";
import { notchTargetN } from "../dynamics/runner.js";
import type { PlannerContext } from "./contextShape.js";
import { rigidVehicleResistanceN } from "./need.js";

/** Each control group's notch, group 0 the head's. */
export type GroupNotches = Int32Array;

/** Quasi-static coupler forces for a set of group notches, and the worst of them against its allowance. */
export interface CouplerEstimate {
  /** Largest force ÷ allowance over the couplings (tension or compression). */
  worstRatio: number;
  maxTensionN: number;
  maxCompressionN: number;
  /** Σ effort the rails pass, N. */
  deliveredN: number;
}

/** Effort unit k delivers in its group's notch at a speed on the rail the plan assumes, N. */
export function unitDeliveredN(ctx: PlannerContext, notches: ArrayLike<number>, k: number, speedMps: number): number {
  const m = ctx.model;
  const asked = notchTargetN(m, k, notches[m.unitGroup[k]!] ?? 0, speedMps);
  const rail = m.adhesiveWeightN[k]! * m.mu0[k]! * adhesionSpeedFactor(speedMps);
  return asked < rail ? asked : rail;
}

/** Per-vehicle resistance of the train moving as one at `travelM` and `speedMps`, N (written into `out`). */
function resistanceN(ctx: PlannerContext, travelM: number, v: number, seg: Int32Array, out: Float64Array): void {
  for (let i = 0; i < ctx.model.n; i++) out[i] = rigidVehicleResistanceN(ctx.model, i, travelM, v, seg);
}

/** The quasi-static coupler forces of the train moving as one under these group notches. */
export function estimateCouplers(ctx: PlannerContext, notches: ArrayLike<number>, speedMps: number, travelM: number, seg: Int32Array): CouplerEstimate {
  const m = ctx.model;
  const res = ctx.scratch;
  resistanceN(ctx, travelM, speedMps, seg, res);
  const effort = ctx.scratchEffort;
  effort.fill(0);
  let delivered = 0;
  for (let k = 0; k < m.nl; k++) {
    const e = unitDeliveredN(ctx, notches, k, speedMps);
    effort[m.locoVehicle[k]!] = e;
    delivered += e;
  }
  let totalRes = 0;
  let totalMass = 0;
  for (let i = 0; i < m.n; i++) {
    totalRes += res[i]!;
    totalMass += m.effMassKg[i]!;
  }
  const a = (delivered - totalRes) / totalMass;
  let t = 0;
  let worst = 0;
  let maxT = 0;
  let maxC = 0;
  for (let j = 0; j < m.n - 1; j++) {
    t += effort[j]! - res[j]! - m.effMassKg[j]! * a;
    let ratio: number;
    if (t >= 0) {
      ratio = t / ctx.couplerAllowanceN;
      if (t > maxT) maxT = t;
    } else {
      ratio = -t / buffAllowanceAtN(ctx, j, seg[j]!);
      if (-t > maxC) maxC = -t;
    }
    if (ratio > worst) worst = ratio;
  }
  return { worstRatio: worst, maxTensionN: maxT, maxCompressionN: maxC, deliveredN: delivered };
}

/** What coupling j may carry in buff where vehicle j stands on segment `segment`, N: the buff allowance, and on a curve the wheel-climb force. */
export function buffAllowanceAtN(ctx: PlannerContext, j: number, segment: number): number {
  const wc = ctx.wheelClimb;
  if (!wc.active) return ctx.buffAllowanceN;
  const r = ctx.segRadiusM[segment] ?? 0;
  if (r <= 0) return ctx.buffAllowanceN;
  return Math.min(ctx.buffAllowanceN, (wc.allowance * r) / wc.ratioPerNPerInvR[j]!);
}

/** Highest coupler ratio (force ÷ allowance) a raise may lead to: the policy's 5 % in hand. */
export const GROUP_RATIO_LIMIT = 0.95;

/** The level of a setting: the sum of its groups' notches. */
export function settingLevel(notches: ArrayLike<number>): number {
  let s = 0;
  for (let g = 0; g < notches.length; g++) s += notches[g]!;
  return s;
}

/** The highest level: every group at its highest notch. */
export function maxLevel(ctx: PlannerContext): number {
  return ctx.groupMaxNotch.reduce((s, n) => s + n, 0);
}

/**
 * Standing, each group's net effort (less its own units' standing resistance) goes into the coupling next to
 * it on the train's side: the worst of those against its allowance.
 */
export function standingRatio(ctx: PlannerContext, notches: ArrayLike<number>): number {
  const m = ctx.model;
  const f = ctx.forces;
  const net = new Float64Array(notches.length);
  for (let k = 0; k < m.nl; k++) {
    const i = m.locoVehicle[k]!;
    net[m.unitGroup[k]!]! += unitDeliveredN(ctx, notches, k, 0) - (f.breakawayN[i]! + f.gradeN[i]! + f.curveN[i]!);
  }
  let worst = 0;
  ctx.consist.controlGroups.forEach((g, k) => {
    const idx = g.units.map((u) => m.locoVehicle[u]!);
    const n = net[k]!;
    if (n <= 0) return;
    if (k === 0) {
      const j = Math.max(...idx);
      if (j < m.n - 1) worst = Math.max(worst, n / ctx.couplerAllowanceN);
    } else {
      const j = Math.min(...idx) - 1;
      if (j >= 0) worst = Math.max(worst, n / buffAllowanceAtN(ctx, j, ctx.standingSeg[j]!));
    }
  });
  return worst;
}

/** A setting one group-notch above another, with its estimate, its worst ratio and the effort it adds. */
export interface Raise {
  notches: GroupNotches;
  estimate: CouplerEstimate;
  ratio: number;
  gainN: number;
  /** The raised group asks more than the rail passes (the protection would hold it). */
  beyondRail: boolean;
}

/**
 * The settings one group-notch above `from`, best first: a raise that adds effort before one that does not,
 * one the rail passes whole before one the slip protection would trim, then the more even loading (the smaller worst ratio; `standing` adds the standing train's estimate).
 */
export function raises(ctx: PlannerContext, from: ArrayLike<number>, speedMps: number, travelM: number, seg: Int32Array, standing: boolean): Raise[] {
  const base = estimateCouplers(ctx, from, speedMps, travelM, seg).deliveredN;
  const out: Raise[] = [];
  for (let g = 0; g < from.length; g++) {
    if (from[g]! >= ctx.groupMaxNotch[g]!) continue;
    const next = Int32Array.from(from);
    next[g]! += 1;
    const estimate = estimateCouplers(ctx, next, speedMps, travelM, seg);
    const ratio = standing ? Math.max(estimate.worstRatio, standingRatio(ctx, next)) : estimate.worstRatio;
    out.push({ notches: next, estimate, ratio, gainN: estimate.deliveredN - base, beyondRail: asksBeyondRail(ctx, next, g, speedMps) });
  }
  // Stable: ties keep the head's raise first.
  return out.sort((a, b) => Number(b.gainN > 1) - Number(a.gainN > 1) || Number(a.beyondRail) - Number(b.beyondRail) || a.ratio - b.ratio);
}

/** Some unit of group g asks more in its notch than the rail the plan assumes passes (the protection would act). */
function asksBeyondRail(ctx: PlannerContext, notches: ArrayLike<number>, g: number, speedMps: number): boolean {
  const m = ctx.model;
  const factor = adhesionSpeedFactor(speedMps);
  for (let k = 0; k < m.nl; k++) {
    if (m.unitGroup[k] !== g) continue;
    if (notchTargetN(m, k, notches[g]!, speedMps) > m.adhesiveWeightN[k]! * m.mu0[k]! * factor) return true;
  }
  return false;
}

/** The best of `raises`; null when every group is at its highest notch. */
export function raiseOne(ctx: PlannerContext, from: ArrayLike<number>, speedMps: number, travelM: number, seg: Int32Array, standing: boolean): Raise | null {
  return raises(ctx, from, speedMps, travelM, seg, standing)[0] ?? null;
}

/**
 * The settings of the standing train, level by level from no power: each the even-loading raise of the one
 * before (the stretch tries them in order; the holding notch is the lowest that holds).
 */
export function powerLadder(ctx: PlannerContext): GroupNotches[] {
  if (ctx.ladder) return ctx.ladder;
  const seg = new Int32Array(ctx.model.n);
  const ladder: GroupNotches[] = [new Int32Array(ctx.groupMaxNotch.length)];
  for (;;) {
    const up = raiseOne(ctx, ladder[ladder.length - 1]!, 0, 0, seg, true);
    if (!up) break;
    ladder.push(up.notches);
  }
  ctx.ladder = ladder;
  return ladder;
}

/** The group notches of level `level` with the train standing where it stood. */
export function standingNotches(ctx: PlannerContext, level: number): GroupNotches {
  const ladder = powerLadder(ctx);
  return ladder[Math.max(0, Math.min(ladder.length - 1, level))]!;
}

/** A control group's place: the head (the first group), the rear or after a wagon, and whether it is a helper. */
export function groupPlace(position: PlannerContext["consist"]["controlGroups"][number]["position"], control: string, k: number): GroupPlace {
  const at: GroupPlace["at"] = k === 0 ? "head" : typeof position === "string" ? position : { afterWagon: position.afterWagon };
  return { at, helper: control === "helper" };
}
