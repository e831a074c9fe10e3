/**
 * From the search's step records to the plan a driver reads: what to watch for before advancing, the
 * expected figures, the fallback notch if the wheels slip, and one plain line of physics saying why —
 * including where the notch asks for more than the rail may give and the slip protection is expected to act.
 */
import { adhesionSpeedFactor, slipRiskAfterSlip } from "../physics/adhesion.js";
import { notchTargetN } from "../dynamics/runner.js";
import type { StepRecord } from "./branch.js";
import { notchDeliveredN, notchEffortAllN, type PlannerContext } from "./context.js";
import type { SearchResult } from "./search.js";
import type { GroupStep, PlanStep } from "./types.js";
import { groupPlace, settingLevel, unitDeliveredN } from "./groupNotches.js";
import { targetRef, type GroupShare, type HelperCall, type ProtectionLine, type StepWhy, type WhyLine } from "./lines.js";
import { HELPER_FOLLOW_S } from "./search.js";

/**
 * Fallback notch: the highest lower notch that, given a slip has just shown adhesion to be below this
 * step's demand, would itself slip with no more than the threshold probability (PHYSICS.md §2).
 */
export function fallbackNotch(ctx: PlannerContext, notch: number, speedMps: number): number {
  if (notch <= 1) return notch;
  const m = ctx.model;
  const threshold = ctx.c.settings.slipRiskThreshold;
  const factor = adhesionSpeedFactor(speedMps);
  for (let f = notch - 1; f >= 1; f--) {
    let worst = 0;
    for (let k = 0; k < m.nl; k++) {
      const w = m.adhesiveWeightN[k]!;
      const p = slipRiskAfterSlip(notchTargetN(m, k, f, speedMps) / w, notchTargetN(m, k, notch, speedMps) / w, ctx.mu0Median[k]! * factor, ctx.sigmaLn);
      worst = Math.max(worst, p);
    }
    if (worst <= threshold) return f;
  }
  return 1;
}

/**
 * The notch asks, somewhere in the step, for more than the rail the plan assumes passes: its slip risk there
 * is above the plan's quantile (the risk is the chance the rail gives less than the notch asks, and the rail
 * at quantile q gives less with chance q), so the slip protection is expected to act.
 */
function asksBeyondRail(ctx: PlannerContext, rec: StepRecord): boolean {
  return rec.notch > 0 && rec.maxRisk > ctx.quantile + 1e-9;
}

/** Turn the chosen branch into plan steps. */
export function planSteps(ctx: PlannerContext, r: SearchResult): PlanStep[] {
  const recs = r.branch.steps;
  const resistanceN = ctx.st.resistance.totalN;
  // Power steps after the stretch notch up to the running notch (build); the last is held to the target.
  const lastPower = recs.length - 1;
  return recs.map((rec, k) => {
    if ((rec.phase === "build" || rec.phase === "accelerate") && rec.notch > 0) rec.phase = k === lastPower && r.targetReachedS !== null ? "accelerate" : "build";
    const duration = rec.endS - rec.startS;
    const moved = rec.endTravelM - rec.startTravelM;
    const speed = endSpeedMps(ctx, rec);
    const protectionActs = asksBeyondRail(ctx, rec);
    return {
      phase: rec.phase,
      notch: rec.notch,
      advanceWhen: { afterS: duration, movedM: Math.max(0, moved), speedMps: speed, primary: rec.trigger },
      startS: rec.startS,
      speedMps: speed,
      tractiveEffortN: endEffortN(ctx, rec),
      adhesionUse: rec.maxUse,
      adhesionUseAt: { speedMps: rec.maxUseSpeedMps, tractiveEffortN: rec.maxUseEffortN },
      slipRisk: rec.maxRisk,
      protectionActs,
      peakCouplerForceN: rec.peakTensionN,
      fallbackNotch: rec.notch === 0 ? 0 : fallbackNotch(ctx, rec.notch, speed),
      why: { line: whyLine(ctx, r, rec, k, resistanceN), protection: protectionActs ? protectionLine(ctx, rec) : null, groups: groupShares(ctx, rec) } satisfies StepWhy,
      ...(rec.groupNotches ? { groups: groupSteps(ctx, rec, k > 0 ? recs[k - 1]!.groupNotches : null) } : {}),
    };
  });
}

/**
 * The speed a step ends at: where the run left it, but a step that ends at the plan's target speed ends at
 * that speed — the control interval in which the train passes the target carries a light train beyond it
 * (0.2 s at 0.4 m/s² is 0.3 km/h), and the plan is over at the target (branch.ts takes the step's adhesion
 * figures up to it too).
 */
function endSpeedMps(ctx: PlannerContext, rec: StepRecord): number {
  const v = Math.max(0, rec.endSpeedMps);
  const t = ctx.c.target;
  return rec.trigger === "target" && t.kind === "speed" && v > t.speedMps ? t.speedMps : v;
}

/** The effort the step's notch asks at the speed it ends at (endSpeedMps), N. */
function endEffortN(ctx: PlannerContext, rec: StepRecord): number {
  const v = endSpeedMps(ctx, rec);
  return v < rec.endSpeedMps ? notchEffortAllN(ctx, rec.groupNotches ?? rec.notch, v) : rec.effortN;
}

/** Each control group's notch, share of the effort and (helpers) coordination in a step. */
function groupSteps(ctx: PlannerContext, rec: StepRecord, before: Int32Array | null): GroupStep[] {
  const notches = rec.groupNotches!;
  const v = endSpeedMps(ctx, rec);
  const effort = new Float64Array(notches.length);
  let total = 0;
  for (let k = 0; k < ctx.model.nl; k++) {
    const e = unitDeliveredN(ctx, notches, k, v);
    effort[ctx.model.unitGroup[k]!]! += e;
    total += e;
  }
  return ctx.consist.controlGroups.map((g, i) => {
    const place = groupPlace(g.position, g.control, i);
    const step: GroupStep = { place, control: g.control, notch: notches[i]!, effortShare: total > 0 ? effort[i]! / total : 0 };
    const was = before?.[i] ?? 0;
    if (g.control === "helper" && was !== notches[i]) step.coordination = helperCall(rec, step.place, was, notches[i]!, notches[0]!);
    return step;
  });
}

/** A helper's notch change: the head acts, calls it, and the helper follows (search.ts HELPER_FOLLOW_S). */
function helperCall(rec: StepRecord, place: GroupStep["place"], was: number, now: number, head: number): HelperCall {
  return { headNotch: head, place, act: now > was ? "take" : now === 0 ? "shut-off" : "ease", notch: now, followS: HELPER_FOLLOW_S, stretch: rec.phase === "stretch" };
}

/** With several control groups, each group's notch and share of the effort in the step (null with one group or no power). */
function groupShares(ctx: PlannerContext, rec: StepRecord): GroupShare[] | null {
  if (!rec.groupNotches || settingLevel(rec.groupNotches) <= 0) return null;
  return groupSteps(ctx, rec, null).map((g) => ({ place: g.place, notch: g.notch, share: g.effortShare }));
}

/** What the slip protection is expected to do in a step whose notch asks more than the rail may give. */
function protectionLine(ctx: PlannerContext, rec: StepRecord): ProtectionLine {
  // Where the step asks the most of the rail (its slip risk is taken there).
  const v = Math.max(0, rec.maxUseSpeedMps);
  return {
    asksN: notchEffortAllN(ctx, rec.groupNotches ?? rec.notch, v),
    givesN: notchDeliveredN(ctx, rec.groupNotches ?? rec.notch, v),
    risk: rec.maxRisk,
    standstill: rec.startSpeedMps <= 0.01,
  };
}

function whyLine(ctx: PlannerContext, r: SearchResult, rec: StepRecord, k: number, resistanceN: number): WhyLine {
  const c = ctx.c;
  const allowanceN = ctx.couplerAllowanceN;
  switch (rec.phase) {
    case "prepare": {
      // The train brake releases along the train's length in about `releaseS`; sand before the wheels turn.
      const lengthM = ctx.consist.lengthM;
      const releaseS = ctx.releaseS;
      const sand = c.conditions.sand && ctx.model.locoSpecs.some((s) => s.sanders);
      if (rec.notch > 0) {
        return { code: "prepare-hold-back", pullN: ctx.rollBackPullN, notch: rec.notch, notchN: notchDeliveredN(ctx, rec.notch, 0), locoBrakeN: ctx.locoBrakeN, lengthM, releaseS, sand };
      }
      if (ctx.startKind === "gravity") {
        if (ctx.locoBrakeHolds) return { code: "prepare-gravity-loco-brake", pullN: ctx.runAwayPullN, locoBrakeN: ctx.locoBrakeN, lengthM, releaseS };
        // The train starts once about this share of the train brake is left (graduated release).
        const sharePercent = Math.max(0, Math.min(100, Math.round((100 * ctx.runAwayPullN) / Math.max(1, ctx.trainBrakeN))));
        return { code: "prepare-gravity-train-brake", pullN: ctx.runAwayPullN, locoBrakeN: ctx.locoBrakeN, sharePercent, trainBrakeN: ctx.trainBrakeN };
      }
      return { code: "prepare-brakes-off", lengthM, releaseS, sand };
    }
    case "stretch": {
      const moved = r.branch.run.locoTravelToStretchM;
      return {
        code: "stretch",
        notch: rec.notch,
        effortN: endEffortN(ctx, rec),
        resistanceN,
        stretchTravelM: moved !== null ? Math.max(0, moved) : null,
        peakN: rec.peakTensionN,
        allowanceN,
        fastOverMps: r.stretch?.outcome === "fast" ? c.settings.stretchSpeedMps : null,
      };
    }
    case "build":
      if (rec.notch === 0) return rollLine(ctx, rec);
      // The adhesion figure with its basis: the notch's effort at the speed where it uses the most adhesion.
      return { code: "build", atMps: rec.maxUseSpeedMps, notch: rec.notch, asksN: rec.maxUseEffortN, use: rec.maxUse, risk: rec.maxRisk, dwellS: k === 2 ? (r.buildDwellS ?? 3) : null, peakN: rec.peakTensionN, allowanceN };
    case "accelerate": {
      if (rec.notch === 0) return rollLine(ctx, rec);
      const higherNoMore = r.adhesionCapped && (rec.groupNotches ? settingLevel(rec.groupNotches) : rec.notch) < ctx.maxNotch;
      return { code: "accelerate", notch: rec.notch, target: targetRef(c.target), effortN: endEffortN(ctx, rec), risk: rec.maxRisk, higherNoMore };
    }
  }
}

/** A step without power on a falling grade: gravity accelerates the train, the brakes control it. */
function rollLine(ctx: PlannerContext, rec: StepRecord): WhyLine {
  const c = ctx.c;
  const duration = Math.max(1e-9, rec.endS - rec.startS);
  const accelMps2 = Math.max(0, rec.endSpeedMps - Math.max(0, rec.startSpeedMps)) / duration;
  // The speed is controlled with the train brake (eased in stages where the locomotive brake cannot hold) and the locomotive brake.
  const staged = !ctx.locoBrakeHolds;
  if (rec.trigger !== "target") return { code: "roll-then-power", accelMps2, toMps: rec.endSpeedMps, travelM: rec.endTravelM, staged, target: targetRef(c.target) };
  return { code: "roll-to-target", accelMps2, staged, target: targetRef(c.target), travelM: rec.endTravelM, clearM: c.location.clearAheadM };
}
