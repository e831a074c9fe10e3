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
  let effMass = 0;
  for (let i = 0; i < n; i++) effMass += m.effMassKg[i]!;
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
  while (t - start.timeS < maxS) {
    // Tractive effort: the notch's demand, held to what median adhesion gives.
    let f = 0;
    const factor = adhesionSpeedFactor(v);
    for (let k = 0; k < m.nl; k++) f += Math.min(notchTargetN(m, k, notch, v), m.adhesiveWeightN[k]! * ctx.mu0Median[k]! * factor);
    let r = 0;
    for (let i = 0; i < n; i++) {
      const ch = m.chainage0M[i]! + x;
      let k = seg[i]!;
      while (ch >= m.segEndM[k]!) k++;
      while (ch < m.segStartM[k]!) k--;
      seg[i] = k;
      r += m.davisA[i]! + (m.davisB[i]! + m.davisC[i]! * v) * v + m.massKg[i]! * (GRAVITY_MPS2 * m.segSin[k]! + m.segCurveNPerKg[k]!);
      // Breakaway resistance still fading out at a crawl, as in the full model.
      if (v < m.fadeSpeedMps) r += m.breakawayExcessN[i]! * (1 - v / m.fadeSpeedMps);
    }
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
