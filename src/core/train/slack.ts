/**
 * Initial slack state of each coupling of a standing train. From the profile, each coupling is
 * stretched when the part of the train ahead of it would roll forward faster (or back slower) than
 * the part behind it, and bunched in the opposite case: bunched in a sag and on a falling grade,
 * stretched over a crest and on a rising grade (PHYSICS.md §5; PRACTICE.md "Sag", "Crest").
 */
import type { Consist } from "./consist.js";
import { gradeAt } from "../physics/track.js";
import type { SlackState } from "./types.js";
import type { TrackProfile } from "../physics/types.js";

/** +1 stretched, −1 bunched, one entry per coupling (head to tail). */
export type SlackSigns = Int8Array;

/** Relative tendency below which two parts of the train count as on the same grade, as a grade fraction. */
const SAME_GRADE_TOLERANCE = 1e-5;

/** Slack state per coupling for the chosen mode. */
export function initialSlack(consist: Consist, track: TrackProfile, mode: SlackState): SlackSigns {
  const n = consist.couplings.length;
  const signs = new Int8Array(n);
  if (mode !== "from-profile") {
    signs.fill(mode === "stretched" ? 1 : -1);
    return signs;
  }
  const vs = consist.vehicles;
  // sin θ of each vehicle's place, weighted by mass, accumulated from the head.
  const massPrefix = new Float64Array(vs.length + 1);
  const slopePrefix = new Float64Array(vs.length + 1);
  for (let i = 0; i < vs.length; i++) {
    const v = vs[i]!;
    const s = Math.sin(Math.atan(gradeAt(track, v.centreChainageM) / 1000));
    massPrefix[i + 1] = massPrefix[i]! + v.massKg;
    slopePrefix[i + 1] = slopePrefix[i]! + v.massKg * s;
  }
  const totalMass = massPrefix[vs.length]!;
  const totalSlope = slopePrefix[vs.length]!;
  const meanSlope = totalSlope / totalMass;
  for (let j = 0; j < n; j++) {
    const frontSlope = slopePrefix[j + 1]! / massPrefix[j + 1]!;
    const rearSlope = (totalSlope - slopePrefix[j + 1]!) / (totalMass - massPrefix[j + 1]!);
    // Free acceleration along the track is −g·sinθ: the part with the lower mean slope pulls ahead.
    const tendency = rearSlope - frontSlope;
    if (tendency > SAME_GRADE_TOLERANCE) signs[j] = 1;
    else if (tendency < -SAME_GRADE_TOLERANCE) signs[j] = -1;
    // Same grade ahead and behind: the train hangs back on a rising grade and runs in on a falling or level one.
    else signs[j] = meanSlope > SAME_GRADE_TOLERANCE ? 1 : -1;
  }
  return signs;
}
