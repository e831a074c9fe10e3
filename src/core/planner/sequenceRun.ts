/**
 * A given notch sequence run on a case the way the planner runs its own: the train brake released on the
 * plan's schedule (in stages on a falling grade the locomotive brake cannot hold), the locomotive brake held
 * until the first notch's effort has built up (3 s, common practice on a rising grade) and not before the
 * plan would ease it. `taut simulate` and the start review's re-simulations both run sequences this way.
 */
import { sequenceControls, type Controls } from "../dynamics/simulate.js";
import { modelFromCase, type TrainModel } from "../train/trainModel.js";
import type { StartCase } from "../train/types.js";
import { plannerContext } from "./context.js";
import { brakeSchedule } from "./search.js";

/** How long the locomotive brake holds after the first notch is taken, s. */
export const LOCO_BRAKE_HOLD_AFTER_POWER_S = 3;

export interface SequenceRunOptions {
  adhesionQuantile: number;
  /** The train brake is already released when the sequence starts. */
  brakeReleased?: boolean;
  /** Release the locomotive brake at this time instead of the planner's moment. */
  releaseAtS?: number;
}

export interface SequenceRun {
  model: TrainModel;
  controls: Controls;
  locoBrakeReleaseS: number;
  /** When the train brake starts to release, s (far before the start when it is already released). */
  trainBrakeReleaseS: number;
  /** The train brake is released in stages (a falling grade the locomotive brake cannot hold). */
  graduatedRelease: boolean;
}

export function sequenceRun(c: StartCase, seq: ReadonlyArray<{ notch: number; atS: number; groups?: ArrayLike<number> }>, opts: SequenceRunOptions): SequenceRun {
  const firstPower = seq.find((e) => e.notch > 0)?.atS ?? 0;
  const ctx = plannerContext(c);
  const graduated = !opts.brakeReleased && ctx.startKind === "gravity" && !ctx.locoBrakeHolds;
  const plan = brakeSchedule(ctx);
  const model = modelFromCase(c, { adhesionQuantile: opts.adhesionQuantile, graduatedRelease: graduated });
  const trainRelease = opts.brakeReleased ? -1e6 : plan.trainBrakeReleaseS;
  const afterPower = firstPower + LOCO_BRAKE_HOLD_AFTER_POWER_S;
  const locoBrakeReleaseS = opts.releaseAtS ?? (opts.brakeReleased ? afterPower : graduated ? plan.locoBrakeReleaseS : Math.max(plan.locoBrakeReleaseS, afterPower));
  return {
    model,
    controls: sequenceControls(seq, { trainBrakeReleaseS: trainRelease, locoBrakeReleaseS }),
    locoBrakeReleaseS,
    trainBrakeReleaseS: trainRelease,
    graduatedRelease: graduated,
  };
}
