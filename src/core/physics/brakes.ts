/**
 * Brake holding forces: what the locomotive (independent) brake and the train brake hold when applied.
 * Holding forces act like static friction: they hold a vehicle up to their value and resist its motion
 * with that value once it moves.
 */
import { GRAVITY_MPS2 } from "./constants.js";
import type { LocomotiveSpec } from "./types.js";

/**
 * Locomotive brake holding force as a fraction of the locomotive's weight when the profile gives none:
 * PHYSICS.md "Additions" gives 10–20 % of the weight as retarding force [M]; we take the middle, 15 %.
 */
export const DEFAULT_LOCO_BRAKE_FRACTION = 0.15;

/** Train brake holding force of a wagon, fully applied, as a fraction of its weight [M]. */
export const TRAIN_BRAKE_FRACTION = 0.1;

/** What the locomotive brake of one unit holds, N: the profile's value, else 15 % of its weight [M]. */
export function locoBrakeHoldingN(spec: LocomotiveSpec): number {
  return spec.locoBrakeHoldingN ?? DEFAULT_LOCO_BRAKE_FRACTION * spec.massKg * GRAVITY_MPS2;
}

/** What the train brake of a wagon holds, fully applied, N. */
export function trainBrakeHoldingN(massKg: number): number {
  return TRAIN_BRAKE_FRACTION * massKg * GRAVITY_MPS2;
}
