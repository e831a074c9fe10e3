/**
 * The key figures of a note, for the card and the editor: the gradient under the standing train
 * (length-weighted mean and range), the steepest rise and sharpest curve within the clear distance
 * ahead, and the sharpest curve under the train. Pure; metres and ‰.
 */
import type { SegmentFile } from "../../../profiles/schemas.js";

export interface StretchFigures {
  /** Length-weighted mean gradient, ‰. */
  meanGradient: number;
  minGradient: number;
  maxGradient: number;
  /** Smallest curve radius, m; 0 when all straight. */
  sharpestRadius: number;
}

export interface NoteFigures {
  under?: StretchFigures;
  ahead?: StretchFigures;
}

/** Figures over the chainage range [fromM, toM]; undefined for an empty range or no track there. */
export function stretchFigures(segs: readonly SegmentFile[], fromM: number, toM: number): StretchFigures | undefined {
  if (!(toM > fromM) || segs.length === 0) return undefined;
  const first = segs[0]!;
  const last = segs[segs.length - 1]!;
  let weighted = 0;
  let covered = 0;
  let min = Infinity;
  let max = -Infinity;
  let sharpest = 0;
  segs.forEach((s, k) => {
    // The end segments extend beyond the profile, as the physics takes them.
    const a = k === 0 ? Math.min(s.from_m, fromM) : s.from_m;
    const b = k === segs.length - 1 ? Math.max(s.from_m + s.length_m, toM) : s.from_m + s.length_m;
    const lo = Math.max(a, fromM);
    const hi = Math.min(b, toM);
    if (hi <= lo) return;
    weighted += s.gradient_permille * (hi - lo);
    covered += hi - lo;
    min = Math.min(min, s.gradient_permille);
    max = Math.max(max, s.gradient_permille);
    if (s.curveRadius_m > 0 && (sharpest === 0 || s.curveRadius_m < sharpest)) sharpest = s.curveRadius_m;
  });
  if (covered === 0 || first === undefined || last === undefined) return undefined;
  return { meanGradient: weighted / covered, minGradient: min, maxGradient: max, sharpestRadius: sharpest };
}

/** Under the train (rear to front) and ahead of it (front to the end of the clear distance). */
export function noteFigures(segs: readonly SegmentFile[], frontM: number, trainLengthM: number, clearAheadM: number): NoteFigures {
  const out: NoteFigures = {};
  if (Number.isFinite(trainLengthM)) {
    const under = stretchFigures(segs, frontM - trainLengthM, frontM);
    if (under) out.under = under;
  }
  const ahead = stretchFigures(segs, frontM, frontM + clearAheadM);
  if (ahead) out.ahead = ahead;
  return out;
}
