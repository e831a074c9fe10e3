/** Words for plan steps, shared by the step cards and Cab steps. */
import type { Phase, PlanStep } from "../core/planner/types.js";
import type { Target } from "../core/train/types.js";
import { formatNumber, show, type UnitSystem } from "./format.js";

export const PHASE_WORD: Record<Phase, string> = { prepare: "Prepare", stretch: "Stretch", build: "Build", accelerate: "Accelerate" };

export const PHASE_LINE: Record<Phase, string> = {
  prepare: "Get ready: brakes, sand, holding power",
  stretch: "Take the slack out at low effort",
  build: "Notch up as adhesion and couplers allow",
  accelerate: "Accelerate the stretched train",
};

/** A distance moved: to the decimetre (or tenth of a foot) when short, else whole. */
function moved(m: number, units: UnitSystem): string {
  const shown = show("distance", m, units, 0);
  return Math.abs(m) < (units === "us" ? 3.048 : 10) ? show("distance", m, units, 1) : shown;
}

function targetText(t: Target | undefined, units: UnitSystem): string {
  if (!t) return "the target";
  return t.kind === "speed" ? show("speed", t.speedMps, units) : `${show("distance", t.distanceM, units)} travelled`;
}

/** What to watch, with its verb: "Advance after 8 s", "Advance at 5.0 km/h", "Hold until 20.0 km/h". */
export function advanceLead(s: PlanStep, units: UnitSystem, target?: Target): string {
  const a = s.advanceWhen;
  switch (a.primary) {
    case "time":
      return `Advance after ${formatNumber(a.afterS, 0)} s`;
    case "moved":
      return `Advance after ${moved(a.movedM, units)} of locomotive travel`;
    case "speed":
      return `Advance at ${show("speed", a.speedMps, units)}`;
    case "target":
      return `Hold until ${targetText(target, units)}`;
  }
}

/** The other observable conditions of the step (those set and not leading). */
export function advanceOthers(s: PlanStep, units: UnitSystem): string[] {
  const a = s.advanceWhen;
  const out: string[] = [];
  if (a.primary !== "time" && a.afterS > 0) out.push(`about ${formatNumber(a.afterS, 0)} s in this step`);
  if (a.primary !== "moved" && a.movedM > 0) out.push(`${moved(a.movedM, units)} moved`);
  if (a.primary !== "speed" && a.primary !== "target" && a.speedMps > 0) out.push(`${show("speed", a.speedMps, units)}`);
  return out;
}

/** Notch as shown: "0" reads as idle. */
export function notchText(n: number): string {
  return n <= 0 ? "0" : String(n);
}

/**
 * What a step says to do when a slip keeps returning (the driver first holds the notch while the
 * protection acts): the fallback notch, or shut off when there is no lower notch to drop to.
 */
export function stillSlipping(s: Pick<PlanStep, "notch" | "fallbackNotch">): string {
  if (s.notch <= 0) return "—";
  if (s.fallbackNotch <= 0 || s.fallbackNotch >= s.notch) return "shut off, start again";
  return `drop to notch ${s.fallbackNotch}`;
}

/** The label beside `stillSlipping`. */
export const STILL_SLIPPING_LABEL = "Slip keeps returning";
