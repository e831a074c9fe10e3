/**
 * The moving lock's rule, free of the browser: the device counts as moving once a position fix reports
 * a speed above the threshold, and as still again only after every fix for `stillAfterMs` stayed below it.
 */

/** Speed above which the device counts as moving, m/s (5 km/h: faster than walking in a cab). */
export const MOVING_ABOVE_MPS = 5 / 3.6;
/** Time every fix must stay below the threshold before the lock lifts, ms. */
export const STILL_AFTER_MS = 10_000;

export interface MotionState {
  moving: boolean;
  /** When the first slow fix after moving arrived, ms (null while fast or still). */
  slowSinceMs: number | null;
}

export const STILL: MotionState = { moving: false, slowSinceMs: null };

/** Next state after a fix with `speedMps` (null: the device gave no speed) at `atMs`. */
export function nextMotion(s: MotionState, speedMps: number | null, atMs: number, stillAfterMs = STILL_AFTER_MS): MotionState {
  if (speedMps !== null && Number.isFinite(speedMps) && speedMps > MOVING_ABOVE_MPS) return { moving: true, slowSinceMs: null };
  if (!s.moving) return STILL;
  if (speedMps === null) return s; // no speed reported: keep what we knew
  const since = s.slowSinceMs ?? atMs;
  if (atMs - since >= stillAfterMs) return STILL;
  return { moving: true, slowSinceMs: since };
}
