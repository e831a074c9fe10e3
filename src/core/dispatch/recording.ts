/**
 * A recorded start as the review reads it: samples in time order with the locomotive's speed, and the notch,
 * traction current and distance when they were logged. The readers (src/profiles/recording) turn GPX tracks
 * and CSV logs into this; here it is checked for what cannot be a start, smoothed and its moment of start
 * found. Pure: no files, no words for the user (the problems are typed; the boundary phrases them).
 */

export interface RecordingSample {
  /** Seconds from the recording's first sample. */
  timeS: number;
  /** Locomotive speed, m/s (from the log, the track or the GPX speed extension). */
  speedMps: number;
  /** Distance travelled since the first sample, m, when known (logged, or along the track). */
  distanceM?: number;
  notch?: number;
  currentA?: number;
  /** Where the sample came from in the file ("line 14", "point 27"), for messages. */
  at: string;
}

export interface Recording {
  samples: RecordingSample[];
  /** Every sample carries a notch / a current. */
  notchLogged: boolean;
  currentLogged: boolean;
}

/** Longest interval between two samples that is still one recording, s (a few seconds of lost fix). */
export const MAX_GAP_S = 5;
/** Speed above which the train counts as moving, m/s (2 km/h: well above a smoothed fix's noise). */
export const START_SPEED_MPS = 2 / 3.6;
/** How long the speed must stay above START_SPEED_MPS to be the start, s. */
export const SUSTAIN_S = 5;
/** Backward travel that is a reversal and not noise, m. */
export const REVERSE_M = 10;

export type RecordingProblem =
  | { kind: "too-few"; count: number }
  | { kind: "out-of-order"; at: string; previousAt: string }
  | { kind: "gap"; at: string; previousAt: string; gapS: number }
  | { kind: "no-movement"; maxSpeedMps: number }
  | { kind: "reversing"; at: string; backM: number }
  | { kind: "negative-speed"; at: string };

/**
 * What makes the samples unusable as a start, in file order; empty when they can be reviewed. Checked:
 * enough samples, time order, gaps, a negative speed or a distance that runs backwards (reversing), and
 * some sustained movement.
 */
export function recordingProblems(r: Recording): RecordingProblem[] {
  const s = r.samples;
  if (s.length < 10) return [{ kind: "too-few", count: s.length }];
  for (let i = 1; i < s.length; i++) {
    const dt = s[i]!.timeS - s[i - 1]!.timeS;
    if (!(dt > 0)) return [{ kind: "out-of-order", at: s[i]!.at, previousAt: s[i - 1]!.at }];
    if (dt > MAX_GAP_S) return [{ kind: "gap", at: s[i]!.at, previousAt: s[i - 1]!.at, gapS: dt }];
  }
  for (const x of s) if (x.speedMps < 0) return [{ kind: "negative-speed", at: x.at }];
  let most = -Infinity;
  for (const x of s) {
    if (x.distanceM === undefined) continue;
    most = Math.max(most, x.distanceM);
    if (most - x.distanceM > REVERSE_M) return [{ kind: "reversing", at: x.at, backM: most - x.distanceM }];
  }
  if (startMoment(s.map((x) => x.timeS), s.map((x) => x.speedMps)) === null) {
    return [{ kind: "no-movement", maxSpeedMps: Math.max(...s.map((x) => x.speedMps)) }];
  }
  return [];
}

/**
 * The moment of start: the first time the speed rises through START_SPEED_MPS and stays above it for SUSTAIN_S
 * (interpolated between samples); null when the train never moves so. The same rule is applied to the
 * recording and to every re-simulation, so the two are laid over each other at the same event.
 */
export function startMoment(timeS: ArrayLike<number>, speedMps: ArrayLike<number>): number | null {
  const n = timeS.length;
  for (let i = 0; i < n; i++) {
    if (speedMps[i]! < START_SPEED_MPS) continue;
    let j = i;
    while (j + 1 < n && speedMps[j + 1]! >= START_SPEED_MPS) j++;
    if (timeS[j]! - timeS[i]! < SUSTAIN_S) {
      i = j;
      continue;
    }
    if (i === 0) return timeS[0]!;
    const v0 = speedMps[i - 1]!;
    const v1 = speedMps[i]!;
    const f = (START_SPEED_MPS - v0) / (v1 - v0);
    return timeS[i - 1]! + f * (timeS[i]! - timeS[i - 1]!);
  }
  return null;
}

/**
 * Speeds and distances along a track of planar positions (metres east and north of any origin), by a local
 * straight-line fit of each coordinate over ± halfWindowS seconds: the slope is the velocity. A least-squares
 * fit over a window is the usual smoothing differentiator for noisy samples; the noise of a slope fitted to
 * n equally spaced points falls as σ·√(12 / (n (n² − 1))) (Savitzky & Golay, Anal. Chem. 36, 1964, first-
 * derivative filter of degree 1). Distance is the path of the smoothed positions.
 */
export function trackSpeeds(timeS: readonly number[], eastM: readonly number[], northM: readonly number[], halfWindowS = 5): { speedMps: number[]; distanceM: number[] } {
  const n = timeS.length;
  const sx: number[] = new Array(n);
  const sy: number[] = new Array(n);
  const speed: number[] = new Array(n);
  let lo = 0;
  let hi = 0;
  for (let i = 0; i < n; i++) {
    const t0 = timeS[i]!;
    while (timeS[lo]! < t0 - halfWindowS) lo++;
    while (hi + 1 < n && timeS[hi + 1]! <= t0 + halfWindowS) hi++;
    let st = 0, sxx = 0, sE = 0, sN = 0, stE = 0, stN = 0;
    const m = hi - lo + 1;
    for (let k = lo; k <= hi; k++) {
      const t = timeS[k]! - t0;
      st += t;
      sxx += t * t;
      sE += eastM[k]!;
      sN += northM[k]!;
      stE += t * eastM[k]!;
      stN += t * northM[k]!;
    }
    const den = m * sxx - st * st;
    const vE = den > 0 ? (m * stE - st * sE) / den : 0;
    const vN = den > 0 ? (m * stN - st * sN) / den : 0;
    // The fitted line's value at t0 (the window's own centre may lie off t0 at the ends).
    sx[i] = (sE - vE * st) / m;
    sy[i] = (sN - vN * st) / m;
    speed[i] = Math.hypot(vE, vN);
  }
  const distance: number[] = [0];
  for (let i = 1; i < n; i++) distance.push(distance[i - 1]! + Math.hypot(sx[i]! - sx[i - 1]!, sy[i]! - sy[i - 1]!));
  return { speedMps: speed, distanceM: distance };
}

/** Distance by the trapezium rule over the speeds, m (for a log without a distance column). */
export function integratedDistanceM(timeS: readonly number[], speedMps: readonly number[]): number[] {
  const d = [0];
  for (let i = 1; i < timeS.length; i++) d.push(d[i - 1]! + 0.5 * (speedMps[i]! + speedMps[i - 1]!) * (timeS[i]! - timeS[i - 1]!));
  return d;
}

/** Linear interpolation of y(x) at xq on ascending x; clamped to the ends. */
export function interpolate(x: ArrayLike<number>, y: ArrayLike<number>, xq: number): number {
  const n = x.length;
  if (n === 0) return Number.NaN;
  if (xq <= x[0]!) return y[0]!;
  if (xq >= x[n - 1]!) return y[n - 1]!;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid]! <= xq) lo = mid;
    else hi = mid;
  }
  const f = (xq - x[lo]!) / (x[hi]! - x[lo]!);
  return y[lo]! + f * (y[hi]! - y[lo]!);
}

/** First time y(x) reaches `level` on ascending x (interpolated), or null. */
export function firstReach(x: ArrayLike<number>, y: ArrayLike<number>, level: number, fromX = -Infinity): number | null {
  for (let i = 0; i < x.length; i++) {
    if (x[i]! < fromX || y[i]! < level) continue;
    if (i === 0 || x[i - 1]! < fromX) return x[i]!;
    const f = (level - y[i - 1]!) / (y[i]! - y[i - 1]!);
    return x[i - 1]! + f * (x[i]! - x[i - 1]!);
  }
  return null;
}
