/**
 * Cautions shown with every result (PRACTICE.md "Cautions the tool must show"), plus the ones a
 * particular case calls for. Plain words, our own.
 */
import { gradeAt } from "../physics/track.js";
import type { StartCase } from "../train/types.js";

/** Shown with every plan, card and table. */
export const STANDARD_CAUTIONS: readonly string[] = [
  "Advisory only. Operating rules, timetables, special and local instructions, the locomotive's own instructions and the driver's judgement always prevail. Taut never authorises a movement.",
  "Decisions on assistance, dividing the train or reducing the load belong to those your railway's rules name.",
  "Adhesion is statistical and every figure here is an estimate with wide uncertainty: read the margins, not a single 'safe' number.",
  "Plan and brief before departure. Use of a device in the cab follows local rules; nothing here needs input while the train moves.",
];

/** How the start is made, where the case's cautions depend on it. */
export interface StartHow {
  kind: "power" | "gravity";
  /** On a falling grade: the locomotive brake alone holds the released train. */
  locoBrakeHolds: boolean;
}

/** Extra cautions for this case. */
export function caseCautions(c: StartCase, totalResistanceN: number, how?: StartHow): string[] {
  const out: string[] = [];
  if (totalResistanceN < 0 || how?.kind === "gravity") {
    out.push("On this falling grade the train will move when its brakes release: control the start with the brakes, not with power.");
    if (how && !how.locoBrakeHolds) {
      out.push(
        "The locomotive brake alone cannot hold this train here: a heavy train on a falling grade is held on the train brake. Ease the train brake in stages only where it allows graduated release; a brake that releases fully once released (direct release) cannot be eased that way: follow the local instructions for starting on this grade.",
      );
    }
  }
  if (c.conditions.sand) {
    out.push("Do not sand over points or crossings; heavy sanding can insulate track circuits. Check the sand boxes before departure.");
  }
  if (gradeAt(c.location.track, c.location.frontAtM - 1) >= 5) {
    out.push("Rising grade: hold on the locomotive brake in a low notch while the train brake releases; do not start by first bunching the slack.");
  }
  if (c.location.track.segments.some((g) => g.curveRadiusM > 0 && g.curveRadiusM < 300)) {
    out.push("Sharp curve under or ahead of the train: take power one notch at a time; a sudden pull can lift light wagons off the inside rail.");
  }
  return out;
}
