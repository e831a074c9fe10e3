/**
 * The "If wheels slip" card: what the locomotive's protection typically does, what the driver does,
 * and what to do if the train stalls — in our own words, from PRACTICE.md "Wheel slip" and "Starting".
 */
import type { SlipGuidance } from "./types.js";

export interface SlipContext {
  sand: boolean;
  sanders: boolean;
  risingGrade: boolean;
  /** Points or crossings ahead where sand must not be laid. */
  pointsAhead: boolean;
}

export function slipGuidance(ctx: SlipContext): SlipGuidance {
  const protection = [
    ctx.sanders ? "Sand is applied automatically on locomotives so fitted." : "This locomotive has no sanders: the protection can only reduce power.",
    "Power (excitation) is cut sharply, by more the harder the wheels slip — the ammeter drops and the slipping axle slows to the train's speed.",
    "Power is then reapplied quickly and levels off near where the slip began; a slip that keeps returning is cut again each time.",
  ];
  const driver = [
    "Hold the notch while the protection acts; do not notch up.",
    ctx.sanders ? (ctx.sand ? "Keep sanding." : "Sand now.") : "No sand on this locomotive: ease off sooner.",
    "If the slip keeps returning, drop to this step's fallback notch: a lower notch that grips often pulls better than a higher one that keeps slipping.",
    "Wait for the slip to stop and the current to settle before advancing again — then one notch at a time, more slowly than planned.",
    "Never let the wheels spin at a standstill: it burns the rail and the wheels. Shut off and start again.",
  ];
  if (ctx.pointsAhead) driver.push("Stop sanding before points and crossings; sand can insulate track circuits.");
  const stall = ctx.risingGrade
    ? [
        "If the train stops on the grade: apply the train brake and the locomotive brake and secure the train before anything else.",
        "Suspect a brake that has not released along the train; check the rear brake-pipe pressure or air flow.",
        "Restart from the prepare step: holding notch on the locomotive brake, release the train brake, add power as it releases, ease off the locomotive brake.",
        "Do not bunch the slack to get a run at it on a rising grade: the rear can roll back and part the train.",
        "If it still will not start, ask for assistance or consider dividing the train, as your rules require.",
      ]
    : [
        "If the train stops: shut off, apply the brakes and let the current fall.",
        "Suspect a brake that has not released along the train.",
        "Restart from the prepare step and take the slack out at the lowest notch that moves the train.",
        "If it still will not start, ask for assistance or consider dividing the train, as your rules require.",
      ];
  return { protection, driver, stall };
}
