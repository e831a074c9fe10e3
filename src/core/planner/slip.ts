/**
 * The "If wheels slip" card, in our own words, from PRACTICE.md "Wheel slip" and "Starting". It leads
 * with what the driver does, in the order it is done — hold the notch while the protection acts, sand,
 * drop to the step's fallback notch only if the slip keeps returning, wait for the current to settle —
 * and gives what the locomotive's protection does as the reason for holding. The headline for a step
 * (`slipHeadline`) says the same thing in one line, so the card never tells the driver two things at once.
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
  // What you do, in order (PRACTICE.md: hold the notch and sand on electronically controlled units; reduce
  // the throttle on continued slip; a lower notch sometimes pulls better; never advance while the current rises).
  const driver = [
    "Hold the notch while the protection acts: do not notch up, and do not shut off for a single slip.",
    ctx.sanders ? (ctx.sand ? "Keep sanding." : "Sand now.") : "No sanders on this locomotive: be ready to ease off sooner.",
    "If the slip keeps returning, drop to this step's fallback notch: a lower notch that grips often pulls better than a higher one that keeps slipping.",
    "Wait for the slip to stop and the current to settle before advancing again — then one notch at a time, more slowly than planned.",
    "Never let the wheels spin at a standstill: it burns the rail and the wheels. Shut off and start again.",
  ];
  if (ctx.pointsAhead) driver.push("Stop sanding before points and crossings; sand can insulate track circuits.");
  // Why you hold: the protection is already reducing power (builder's manual [S], PRACTICE.md).
  const protection = [
    ctx.sanders ? "It sands the rails by itself on locomotives so fitted." : "This locomotive has no sanders: its protection can only reduce power.",
    "It cuts power (excitation) sharply, by more the harder the wheels slip — the ammeter drops and the slipping axle slows to the train's speed.",
    "It then reapplies power quickly, levelling off near where the slip began; a slip that keeps returning is cut again each time — which is when you drop a notch.",
  ];
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
  return { driver, protection, stall };
}

/**
 * One line for a step: hold the step's notch while the protection acts, and only if the slip keeps
 * returning, drop to its fallback notch. The same words on the app's card and in the command line.
 */
export function slipHeadline(notch: number, fallbackNotch: number, sanders = true): { hold: string; then: string } {
  const sand = sanders ? ", and sand" : "";
  if (notch <= 0) {
    return { hold: "No power in this step.", then: `If the wheels slip when you take power, hold that notch while the protection acts${sand}.` };
  }
  const hold = `Hold notch ${notch} while the protection acts${sand}.`;
  if (fallbackNotch >= notch || fallbackNotch <= 0) {
    return { hold, then: `Still slipping in notch ${notch}: shut off, let the current fall, and start again.` };
  }
  return { hold, then: `Still slipping: drop to notch ${fallbackNotch}.` };
}
