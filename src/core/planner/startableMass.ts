/**
 * The largest trailing mass that still starts, everything else unchanged (same wagons, same length),
 * found by bisection over a verdict function. The verdict must be monotonic in mass.
 */
import type { StartCase } from "../train/types.js";

/** The bracket never needs to be narrower than this, kg. */
const MIN_TOLERANCE_KG = 50;

/** The case with a different trailing mass, wagons and length unchanged. */
export function withTrailingMass(c: StartCase, trailingMassKg: number): StartCase {
  return { ...c, train: { ...c.train, trailingMassKg } };
}

export interface MassSearchOptions {
  /** Stop when the bracket is this narrow, kg… */
  toleranceKg?: number;
  /**
   * …and no wider than this fraction of the mass found (default 0.5 %, never below 50 kg), so that a small
   * limit is found as closely, relatively, as a large one.
   */
  relativeTolerance?: number;
  /** Never search above this, kg. */
  ceilingKg?: number;
  /** A mass known not to be exceeded (e.g. the static limit): tried first, and the search stays below it. */
  upperBoundKg?: number;
  /** A cheap estimate of the answer: the bracket is built around it in steps of a few per cent. */
  guessKg?: number;
}

/** Bracket step around a guess: ×/÷ this factor until the verdict changes. */
const GUESS_STEP = 1.04;

/**
 * Largest trailing mass (kg) for which `starts(case)` holds; 0 when even a near-empty train does not
 * start. Doubles up from the case's mass to bracket the limit, then bisects.
 */
export function largestStartableMassKg(c: StartCase, starts: (c: StartCase) => boolean, opts: MassSearchOptions = {}): number {
  const tol = opts.toleranceKg ?? 500;
  const ceiling = opts.ceilingKg ?? 5e7;
  const floorKg = c.train.wagons * 1000; // one tonne per wagon: lighter is not a train
  const ok = (m: number): boolean => starts(withTrailingMass(c, m));
  const bound = opts.upperBoundKg;
  if (bound !== undefined) {
    if (bound < floorKg) return 0;
    // The bound itself usually holds (when the static limit is what binds): one evaluation then.
    if (ok(bound)) return bound;
  }
  let lo: number;
  let hi: number;
  const guess = opts.guessKg;
  if (guess !== undefined && guess > floorKg && (bound === undefined || guess < bound)) {
    // Bracket around the estimate: a few evaluations when it is close.
    const top = bound ?? ceiling;
    if (ok(guess)) {
      lo = guess;
      hi = Math.min(top, guess * GUESS_STEP);
      while (hi < top && ok(hi)) {
        lo = hi;
        hi = Math.min(top, hi * GUESS_STEP);
      }
      if (hi >= top && bound === undefined && ok(hi)) return hi;
    } else {
      hi = guess;
      lo = Math.max(floorKg, guess / GUESS_STEP);
      while (lo > floorKg && !ok(lo)) {
        hi = lo;
        lo = Math.max(floorKg, lo / GUESS_STEP);
      }
      if (lo <= floorKg && !ok(floorKg)) return 0;
    }
  } else {
    if (!ok(floorKg)) return 0;
    lo = floorKg;
    hi = bound ?? Math.max(c.train.trailingMassKg, 2 * floorKg);
    while (bound === undefined && ok(hi)) {
      lo = hi;
      if (hi >= ceiling) return ceiling;
      hi = Math.min(ceiling, hi * 2);
    }
  }
  const rel = opts.relativeTolerance ?? 0.005;
  while (hi - lo > Math.min(tol, Math.max(MIN_TOLERANCE_KG, rel * lo))) {
    const mid = 0.5 * (lo + hi);
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}
