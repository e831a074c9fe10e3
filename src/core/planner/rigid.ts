/**
 * The stretched, moving train as one mass: used to follow a plan's acceleration to the target when only
 * the verdict is needed (the largest-startable-mass search). Every vehicle keeps its own place on the
 * profile; couplings are taken as taut, so the only dynamics left is Newton's law for the whole train.
 */
import { GRAVITY_MPS2 } from "../physics/constants.js";
import { adhesionSpeedFactor } from "../physics/adhesion.js";
import { notchTargetN } from "../dynamics/runner.js";
import type { PlannerContext } from "./context.js";

export interface RigidStart {
  timeS: number;
  speedMps: number;
  travelM: number;
  notch: number;
}

export interface RigidOutcome {
  reachedS: number | null;
  travelM: number;
  stalled: boolean;
  capped: boolean;
}

const DT_S = 0.1;

/**
 * Follow the notch policy `next(notch, speed, inStepS)` from `start` until the target, a stall, no progress
 * for a minute, or `maxS`.
 */
export function rigidAccelerate(
  ctx: PlannerContext,
  start: RigidStart,
  next: (notch: number, speedMps: number, inStepS: number, capped: { hit: boolean }) => number,
  maxS: number,
): RigidOutcome {
  const m = ctx.model;
  const n = m.n;
  // The speed terms of every vehicle's resistance add up once; the grade and curve terms change only when a
  // vehicle passes onto another segment, which happens at known travels (the train moves as one).
  let effMass = 0;
  let davisA = 0;
  let davisB = 0;
  let davisC = 0;
  let excess = 0;
  for (let i = 0; i < n; i++) {
    effMass += m.effMassKg[i]!;
    davisA += m.davisA[i]!;
    davisB += m.davisB[i]!;
    davisC += m.davisC[i]!;
    excess += m.breakawayExcessN[i]!;
  }
  let t = start.timeS;
  let v = Math.max(0, start.speedMps);
  let x = start.travelM;
  let notch = start.notch;
  let stepStart = t;
  let best = v;
  let bestAt = t;
  const capped = { hit: false };
  const target = ctx.c.target;
  const seg = new Int32Array(n);
  const profile = { gradeCurveN: 0, nextChangeM: -Infinity };
  const placeOnProfile = () => {
    // Each vehicle's segment at travel x, the grade and curve force of the whole train, and the travel at
    // which the next vehicle reaches the end of its segment (travel only grows: v ≥ 0).
    let sum = 0;
    let next = Infinity;
    for (let i = 0; i < n; i++) {
      const ch = m.chainage0M[i]! + x;
      let k = seg[i]!;
      while (ch >= m.segEndM[k]!) k++;
      while (ch < m.segStartM[k]!) k--;
      seg[i] = k;
      sum += m.massKg[i]! * (GRAVITY_MPS2 * m.segSin[k]! + m.segCurveNPerKg[k]!);
      const end = m.segEndM[k]! - m.chainage0M[i]!;
      if (end < next) next = end;
    }
    profile.gradeCurveN = sum;
    profile.nextChangeM = next;
  };
  placeOnProfile();
  while (t - start.timeS < maxS) {
    // Tractive effort: the notch's demand, held to what median adhesion gives.
    let f = 0;
    const factor = adhesionSpeedFactor(v);
    for (let k = 0; k < m.nl; k++) f += Math.min(notchTargetN(m, k, notch, v), m.adhesiveWeightN[k]! * ctx.mu0Median[k]! * factor);
    if (x >= profile.nextChangeM) placeOnProfile();
    let r = davisA + (davisB + davisC * v) * v + profile.gradeCurveN;
    // Breakaway resistance still fading out at a crawl, as in the full model.
    if (v < m.fadeSpeedMps) r += excess * (1 - v / m.fadeSpeedMps);
    const a = (f - r) / effMass;
    v = Math.max(0, v + a * DT_S);
    x += v * DT_S;
    t += DT_S;
    // Taut couplings: the last vehicle travels as far as the locomotive.
    const reached = target.kind === "speed" ? v >= target.speedMps : x >= target.distanceM;
    if (reached) return { reachedS: t, travelM: x, stalled: false, capped: capped.hit };
    if (v <= 0.01 && t - bestAt > 20 && t - start.timeS > 20) return { reachedS: null, travelM: x, stalled: true, capped: capped.hit };
    // No speed gained for a minute: a speed target is out of reach (a distance target only needs motion).
    if (v > best + 0.05) {
      best = v;
      bestAt = t;
    } else if (target.kind === "speed" && t - bestAt > 60) return { reachedS: null, travelM: x, stalled: v <= 0.01, capped: capped.hit };
    const nn = next(notch, v, t - stepStart, capped);
    if (nn !== notch) {
      notch = nn;
      stepStart = t;
    }
  }
  return { reachedS: null, travelM: x, stalled: false, capped: capped.hit };
}
