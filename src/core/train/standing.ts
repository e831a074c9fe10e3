/**
 * Forces on each vehicle of the standing train: grade and curve from its own place on the profile,
 * breakaway and running resistance at rest. Summed, they give the train's resistance at starting.
 */
import type { Consist } from "./consist.js";
import { curveForceN, gradeForceN } from "../physics/resistance.js";
import { curveRadiusAt, gradeAt } from "../physics/track.js";
import type { TrackProfile } from "../physics/types.js";

export interface StandingForces {
  gradeN: Float64Array;
  curveN: Float64Array;
  /** Resistance to overcome at rest (breakaway), N. */
  breakawayN: Float64Array;
  /** Running resistance at zero speed (Davis constant term), N. */
  runningN: Float64Array;
}

/** Per-vehicle forces of the standing train. */
export function standingForces(consist: Consist, track: TrackProfile): StandingForces {
  const n = consist.vehicles.length;
  const f: StandingForces = {
    gradeN: new Float64Array(n),
    curveN: new Float64Array(n),
    breakawayN: new Float64Array(n),
    runningN: new Float64Array(n),
  };
  consist.vehicles.forEach((v, i) => {
    f.gradeN[i] = gradeForceN(v.massKg, gradeAt(track, v.centreChainageM));
    f.curveN[i] = curveForceN(v.massKg, curveRadiusAt(track, v.centreChainageM));
    f.breakawayN[i] = v.breakawayN;
    // Running resistance at rest cannot exceed what holds the vehicle at rest.
    f.runningN[i] = Math.min(v.davis.aN, v.breakawayN);
  });
  return f;
}

/** The whole train's resistance at the moment of starting, N (grade signed). */
export interface ResistanceAtStart {
  /** Breakaway in excess of running resistance at rest. */
  startingN: number;
  gradeN: number;
  curveN: number;
  /** Running resistance at rest (Davis constant terms). */
  runningN: number;
  /** starting + grade + curve + running. */
  totalN: number;
}

export function resistanceAtStart(f: StandingForces): ResistanceAtStart {
  const sum = (a: Float64Array): number => a.reduce((s, x) => s + x, 0);
  const breakaway = sum(f.breakawayN);
  const running = sum(f.runningN);
  const grade = sum(f.gradeN);
  const curve = sum(f.curveN);
  return { startingN: breakaway - running, gradeN: grade, curveN: curve, runningN: running, totalN: breakaway + grade + curve };
}
