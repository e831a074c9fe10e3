/**
 * From the search's step records to the plan a driver reads: what to watch for before advancing, the
 * expected figures, the fallback notch if the wheels slip, and one plain line of physics saying why —
 * including where the notch asks for more than the rail may give and the slip protection is expected to act.
 */
import { adhesionSpeedFactor, slipRiskAfterSlip } from "../physics/adhesion.js";
import { notchTargetN } from "../dynamics/runner.js";
import { mpsToKmh } from "../physics/units.js";
import type { StepRecord } from "./branch.js";
import { notchDeliveredN, notchEffortAllN, type PlannerContext } from "./context.js";
import type { SearchResult } from "./search.js";
import type { GroupStep, PlanStep } from "./types.js";
import { groupName, groupNotchWords, settingLevel, unitDeliveredN } from "./groupNotches.js";
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

const kN = (n: number): string => `${Math.round(n / 1000)} kN`;
/** A fraction as whole percent; one above zero that would read 0 reads "< 1 %" (it is not nil). */
const pct = (x: number): string => (x > 0 && x < 0.005 ? "< 1 %" : `${Math.round(x * 100)} %`);
const km = (mps: number): string => `${mpsToKmh(mps).toFixed(1)} km/h`;

/** Asking this much more than the rail gives counts as asking more (below it the two are the same figure) [D]. */
const BEYOND_RAIL = 1.01;

/** The notch asks for more than the rail the plan assumes passes, at the step's start or end speed. */
function asksBeyondRail(ctx: PlannerContext, rec: StepRecord): boolean {
  if (rec.notch <= 0) return false;
  return [rec.startSpeedMps, rec.endSpeedMps].some((v) => {
    const speed = Math.max(0, v);
    const setting = rec.groupNotches ?? rec.notch;
    return notchEffortAllN(ctx, setting, speed) > notchDeliveredN(ctx, setting, speed) * BEYOND_RAIL;
  });
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
    const speed = Math.max(0, rec.endSpeedMps);
    const protectionActs = asksBeyondRail(ctx, rec);
    return {
      phase: rec.phase,
      notch: rec.notch,
      advanceWhen: { afterS: duration, movedM: Math.max(0, moved), speedMps: speed, primary: rec.trigger },
      startS: rec.startS,
      speedMps: speed,
      tractiveEffortN: rec.effortN,
      adhesionUse: rec.maxUse,
      adhesionUseAt: { speedMps: rec.maxUseSpeedMps, tractiveEffortN: rec.maxUseEffortN },
      slipRisk: rec.maxRisk,
      protectionActs,
      peakCouplerForceN: rec.peakTensionN,
      fallbackNotch: rec.notch === 0 ? 0 : fallbackNotch(ctx, rec.notch, speed),
      why: whyLine(ctx, r, rec, k, resistanceN) + (protectionActs ? protectionLine(ctx, rec) : "") + groupLine(ctx, rec),
      ...(rec.groupNotches ? { groups: groupSteps(ctx, rec, k > 0 ? recs[k - 1]!.groupNotches : null) } : {}),
    };
  });
}

/** Each control group's notch, share of the effort and (helpers) coordination in a step. */
function groupSteps(ctx: PlannerContext, rec: StepRecord, before: Int32Array | null): GroupStep[] {
  const notches = rec.groupNotches!;
  const v = Math.max(0, rec.endSpeedMps);
  const effort = new Float64Array(notches.length);
  let total = 0;
  for (let k = 0; k < ctx.model.nl; k++) {
    const e = unitDeliveredN(ctx, notches, k, v);
    effort[ctx.model.unitGroup[k]!]! += e;
    total += e;
  }
  return ctx.consist.controlGroups.map((g, i) => {
    const name = groupName(g.position, g.control, i);
    const step: GroupStep = { name, control: g.control, notch: notches[i]!, effortShare: total > 0 ? effort[i]! / total : 0 };
    const was = before?.[i] ?? 0;
    if (g.control === "helper" && was !== notches[i]) step.coordination = helperCall(rec, name, was, notches[i]!, notches[0]!);
    return step;
  });
}

/** The words of a helper's notch change: the head acts, calls it, and the helper follows (search.ts HELPER_FOLLOW_S). */
function helperCall(rec: StepRecord, name: string, was: number, now: number, head: number): string {
  const sign = rec.phase === "stretch" ? ", or as soon as the head reports the train moving, whichever comes first" : "";
  const act = now > was ? `takes notch ${now}` : now === 0 ? "shuts off" : `eases to notch ${now}`;
  return `The head takes notch ${head} first and calls the ${name} by radio; the ${name} ${act} about ${HELPER_FOLLOW_S} s later${sign}, and confirms.`;
}

/** With several control groups, the step's notches in words: " Notches: head 5 · rear 3 (head 52 %, rear 48 % of the effort)." */
function groupLine(ctx: PlannerContext, rec: StepRecord): string {
  if (!rec.groupNotches || settingLevel(rec.groupNotches) <= 0) return "";
  const shares = groupSteps(ctx, rec, null);
  return ` Notches ${groupNotchWords(ctx, rec.groupNotches)} (${shares.map((g) => `${g.name} ${pct(g.effortShare)}`).join(", ")} of the effort).`;
}

/** What the slip protection is expected to do in a step whose notch asks more than the rail may give. */
function protectionLine(ctx: PlannerContext, rec: StepRecord): string {
  const v = Math.max(0, rec.startSpeedMps);
  const asks = notchEffortAllN(ctx, rec.groupNotches ?? rec.notch, v);
  const gives = notchDeliveredN(ctx, rec.groupNotches ?? rec.notch, v);
  const still = rec.startSpeedMps <= 0.01 ? " No wheelspin at a standstill: it burns the rail." : "";
  return ` It asks ${kN(asks)}, more than a poor rail gives (${kN(gives)}): the slip protection may act (chance ${pct(rec.maxRisk)}), holding the effort there; expect slips, hold the notch and sand.${still}`;
}

function whyLine(ctx: PlannerContext, r: SearchResult, rec: StepRecord, k: number, resistanceN: number): string {
  const c = ctx.c;
  const allowance = ctx.couplerAllowanceN;
  switch (rec.phase) {
    case "prepare": {
      const release = `the train brake releases along ${Math.round(ctx.consist.lengthM)} m in about ${Math.round(ctx.releaseS)} s`;
      const sand = c.conditions.sand && ctx.model.locoSpecs.some((s) => s.sanders) ? "; sand before the wheels turn" : "";
      if (rec.notch > 0) {
        return `Grade pulls the train back with ${kN(ctx.rollBackPullN)} more than its brakes-off resistance holds: notch ${rec.notch} (${kN(notchDeliveredN(ctx, rec.notch, 0))}) with the locomotive brake (${kN(ctx.locoBrakeN)}) holds it while ${release}${sand}.`;
      }
      if (ctx.startKind === "gravity") {
        if (ctx.locoBrakeHolds) {
          return `On this falling grade the released train pulls forward with ${kN(ctx.runAwayPullN)}; the locomotive brake holds up to ${kN(ctx.locoBrakeN)}, enough: keep it applied while ${release}. No power is needed: easing the locomotive brake off starts the train.`;
        }
        const share = Math.max(0, Math.min(100, Math.round((100 * ctx.runAwayPullN) / Math.max(1, ctx.trainBrakeN))));
        return `On this falling grade the released train pulls forward with ${kN(ctx.runAwayPullN)}; the locomotive brake holds only ${kN(ctx.locoBrakeN)} of it, so it cannot hold the train. Keep the train brake applied and release it in stages where the brake allows it (graduated release): the train starts once about ${share} % of the train brake's ${kN(ctx.trainBrakeN)} is left. No power is needed.`;
      }
      return `No power on a standing train until its brakes are off: the locomotive brake holds while ${release}${sand}.`;
    }
    case "stretch": {
      const moved = r.branch.run.locoTravelToStretchM;
      const travel = moved !== null ? `the last vehicle moves after about ${Math.max(0, moved).toFixed(1)} m of locomotive travel` : "the slack comes out wagon by wagon";
      const tooFast = r.stretch?.outcome === "fast" ? ` The locomotive runs faster than ${km(c.settings.stretchSpeedMps)} here even in the lowest notch that moves the train: check it with the locomotive brake.` : "";
      return `Notch ${rec.notch} gives ${kN(rec.effortN)} against ${kN(resistanceN)} to start the whole train at once: wagons break away one by one at walking pace and ${travel}; peak coupler ${kN(rec.peakTensionN)} of ${kN(allowance)} allowed.${tooFast}`;
    }
    case "build":
      if (rec.notch === 0) return rollLine(ctx, rec);
      // The adhesion figure with its basis: the notch's effort at the speed where it uses the most adhesion.
      return `At ${km(rec.maxUseSpeedMps)} notch ${rec.notch} asks ${kN(rec.maxUseEffortN)}, ${pct(rec.maxUse)} of the median adhesion there (slip risk ${pct(rec.maxRisk)}); advance only once the current has settled${k === 2 ? ` — at least ${Math.round(r.buildDwellS ?? 3)} s per notch` : ""}; peak coupler ${kN(rec.peakTensionN)} of ${kN(allowance)} allowed.`;
    case "accelerate": {
      if (rec.notch === 0) return rollLine(ctx, rec);
      const reason = r.adhesionCapped && (rec.groupNotches ? settingLevel(rec.groupNotches) : rec.notch) < ctx.maxNotch ? " A higher notch would pass no more on a poor rail, or is not needed." : "";
      const to = c.target.kind === "speed" ? `to ${km(c.target.speedMps)}` : `until the train has cleared ${Math.round(c.target.distanceM)} m`;
      return `Hold notch ${rec.notch} ${to}: ${kN(rec.effortN)} against the running, grade and curve resistance accelerates the stretched train; slip risk ${pct(rec.maxRisk)}.${reason}`;
    }
  }
}

/** A step without power on a falling grade: gravity accelerates the train, the brakes control it. */
function rollLine(ctx: PlannerContext, rec: StepRecord): string {
  const c = ctx.c;
  const duration = Math.max(1e-9, rec.endS - rec.startS);
  const accel = Math.max(0, rec.endSpeedMps - Math.max(0, rec.startSpeedMps)) / duration;
  const to = c.target.kind === "speed" ? `${km(c.target.speedMps)}` : `the ${Math.round(c.target.distanceM)} m target`;
  const travel = rec.endTravelM;
  const within = travel <= c.location.clearAheadM ? `within the ${Math.round(c.location.clearAheadM)} m clear ahead` : `beyond the ${Math.round(c.location.clearAheadM)} m clear ahead: have it under control before then`;
  const control = `control the speed with the train brake${ctx.locoBrakeHolds ? "" : " (eased in stages)"} and the locomotive brake`;
  if (rec.trigger !== "target") {
    return `No power yet: gravity accelerates the train at about ${accel.toFixed(2)} m/s² to ${km(rec.endSpeedMps)} after about ${Math.round(travel)} m; ${control}. Beyond that it needs power to reach ${to}.`;
  }
  return `No power: gravity accelerates the train at about ${accel.toFixed(2)} m/s²; ${control}. It reaches ${to} after about ${Math.round(travel)} m of travel, ${within}; then hold the speed on the brakes.`;
}
