/**
 * The largest masses' search ceiling, apart from the search (startableMass.ts): a plan that skips the search
 * still reports its ceiling, without carrying the search's code.
 */
import type { StartCase } from "../train/types.js";

/**
 * Heaviest wagon the search goes to, kg: beyond any freight wagon's gross mass [M], so a largest mass at this
 * ceiling means the locomotives set no limit (on a falling grade, for example, the brakes hold any load).
 */
export const CEILING_KG_PER_WAGON = 250_000;
/** The search's ceiling for a case: 250 t a wagon, or the case's own mass if that is more, kg. */
export function massCeilingKg(c: StartCase): number {
  return Math.max(c.train.trailingMassKg, c.train.wagons * CEILING_KG_PER_WAGON);
}
