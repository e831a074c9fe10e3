/**
 * The track under and ahead of the train: gradient and curvature by chainage, and elevation.
 * Chainage grows in the direction of travel; beyond the profile's ends the end segments extend.
 */
import type { TrackProfile, TrackSegment } from "./types.js";

/** A uniform profile long enough for any train: one segment around chainage 0. */
export function uniformTrack(gradePermille: number, curveRadiusM: number): TrackProfile {
  return { segments: [{ startM: -1e6, lengthM: 2e6, gradePermille, curveRadiusM }] };
}

/** Index of the segment holding `chainageM` (clamped to the ends). */
export function segmentIndexAt(track: TrackProfile, chainageM: number): number {
  const segs = track.segments;
  let lo = 0;
  let hi = segs.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if ((segs[mid] as TrackSegment).startM <= chainageM) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** Gradient at a chainage, ‰. */
export function gradeAt(track: TrackProfile, chainageM: number): number {
  return (track.segments[segmentIndexAt(track, chainageM)] as TrackSegment).gradePermille;
}

/** Curve radius at a chainage, m (0 = straight). */
export function curveRadiusAt(track: TrackProfile, chainageM: number): number {
  return (track.segments[segmentIndexAt(track, chainageM)] as TrackSegment).curveRadiusM;
}

/**
 * Height above the profile's first point, m: the integral of sin(atan(i)) along the track,
 * consistent with the grade force m·g·sin(atan(i)).
 */
export function elevationAt(track: TrackProfile, chainageM: number): number {
  const segs = track.segments;
  const first = segs[0] as TrackSegment;
  let h = 0;
  let x = first.startM;
  for (let k = 0; k < segs.length; k++) {
    const s = segs[k] as TrackSegment;
    const end = k === segs.length - 1 ? Infinity : s.startM + s.lengthM;
    const slope = Math.sin(Math.atan(s.gradePermille / 1000));
    if (chainageM <= end || k === segs.length - 1) return h + slope * (chainageM - x);
    h += slope * (end - x);
    x = end;
  }
  return h;
}

/** Flattened segment arrays for the dynamics loop. */
export interface TrackArrays {
  startM: Float64Array;
  endM: Float64Array;
  sinTheta: Float64Array;
  curvePermille: Float64Array;
}
