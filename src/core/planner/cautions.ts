/**
 * Cautions shown with every result (PRACTICE.md "Cautions the tool must show"), plus the ones a
 * particular case calls for. The core gives each as a code with its figures (SI); the words, our own, are
 * in the message catalogs (src/i18n/en/notes.ts and its translations) and rendered where they are shown.
 */
import { gradeAt } from "../physics/track.js";
import type { StartCase } from "../train/types.js";

/** A caution: a code, and the figures its words quote. */
export type Caution =
  | {
      code:
        | "advisory"
        | "decisions"
        | "statistical"
        | "brief"
        | "falling-grade"
        | "loco-brake-cannot-hold"
        | "sand-points"
        | "rising-grade"
        | "sharp-curve";
    }
  /** The slip protection is expected to act in `steps` steps; `standstill`: one of them is at a standstill. */
  | { code: "protection-acts"; steps: number; standstill: boolean }
  /** Traction current above the continuous rating at low speed for up to `holdS` seconds. */
  | { code: "heating"; holdS: number };

export type CautionCode = Caution["code"];

/** Shown with every plan, card and table: advisory only, who decides, figures are estimates, plan before departure. */
export const STANDARD_CAUTIONS: readonly Caution[] = [{ code: "advisory" }, { code: "decisions" }, { code: "statistical" }, { code: "brief" }];

/** How the start is made, where the case's cautions depend on it. */
export interface StartHow {
  kind: "power" | "gravity";
  /** On a falling grade: the locomotive brake alone holds the released train. */
  locoBrakeHolds: boolean;
}

/** Extra cautions for this case. */
export function caseCautions(c: StartCase, totalResistanceN: number, how?: StartHow): Caution[] {
  const out: Caution[] = [];
  // A falling grade: control the start with the brakes; where the locomotive brake alone cannot hold the
  // released train, it is held on the train brake (graduated release only where the brake allows it).
  if (totalResistanceN < 0 || how?.kind === "gravity") {
    out.push({ code: "falling-grade" });
    if (how && !how.locoBrakeHolds) out.push({ code: "loco-brake-cannot-hold" });
  }
  // Sand: never over points or crossings (track circuits); check the sand boxes.
  if (c.conditions.sand) out.push({ code: "sand-points" });
  // Rising grade: hold on the locomotive brake in a low notch; do not bunch the slack first.
  if (gradeAt(c.location.track, c.location.frontAtM - 1) >= 5) out.push({ code: "rising-grade" });
  // A sharp curve: one notch at a time; a sudden pull can lift light wagons off the inside rail.
  if (c.location.track.segments.some((g) => g.curveRadiusM > 0 && g.curveRadiusM < 300)) out.push({ code: "sharp-curve" });
  return out;
}
