/**
 * The "If wheels slip" card (src/core/planner/slip.ts), its headline for a step, and a helper's call
 * (src/core/planner/lines.ts HelperCall), in words.
 */
import { namespace } from "../messages.js";

export const guidance = namespace("guidance", {
  // What the driver does, in order.
  driverHoldNotch: "Hold the notch while the protection acts: do not notch up, and do not shut off for a single slip.",
  driverKeepSanding: "Keep sanding.",
  driverSandNow: "Sand now.",
  driverNoSandersEase: "No sanders on this locomotive: be ready to ease off sooner.",
  driverDropFallback: "If the slip keeps returning, drop to this step's fallback notch: a lower notch that grips often pulls better than a higher one that keeps slipping.",
  driverWaitSettle: "Wait for the slip to stop and the current to settle before advancing again — then one notch at a time, more slowly than planned.",
  driverNoSpin: "Never let the wheels spin at a standstill: it burns the rail and the wheels. Shut off and start again.",
  driverStopSandingPoints: "Stop sanding before points and crossings; sand can insulate track circuits.",
  // What the protection does.
  protectionSandsItself: "It sands the rails by itself on locomotives so fitted.",
  protectionNoSandersOnlyPower: "This locomotive has no sanders: its protection can only reduce power.",
  protectionCutsPower: "It cuts power (excitation) sharply, by more the harder the wheels slip — the ammeter drops and the slipping axle slows to the train's speed.",
  protectionReapplies: "It then reapplies power quickly, levelling off near where the slip began; a slip that keeps returning is cut again each time — which is when you drop a notch.",
  // If the train stalls.
  stallGradeSecure: "If the train stops on the grade: apply the train brake and the locomotive brake and secure the train before anything else.",
  stallGradeSuspectBrake: "Suspect a brake that has not released along the train; check the rear brake-pipe pressure or air flow.",
  stallGradeRestart: "Restart from the prepare step: holding notch on the locomotive brake, release the train brake, add power as it releases, ease off the locomotive brake.",
  stallGradeNoBunching: "Do not bunch the slack to get a run at it on a rising grade: the rear can roll back and part the train.",
  stallAskAssistance: "If it still will not start, ask for assistance or consider dividing the train, as your rules require.",
  stallLevelShutOff: "If the train stops: shut off, apply the brakes and let the current fall.",
  stallLevelSuspectBrake: "Suspect a brake that has not released along the train.",
  stallLevelRestart: "Restart from the prepare step and take the slack out at the lowest notch that moves the train.",
  // The headline for a step.
  headNoPower: "No power in this step.",
  headHold: "Hold notch {notch} while the protection acts.",
  headHoldSand: "Hold notch {notch} while the protection acts, and sand.",
  headTakePower: "If the wheels slip when you take power, hold that notch while the protection acts.",
  headTakePowerSand: "If the wheels slip when you take power, hold that notch while the protection acts, and sand.",
  headShutOff: "Still slipping in notch {notch}: shut off, let the current fall, and start again.",
  headDrop: "Still slipping: drop to notch {notch}.",
});
