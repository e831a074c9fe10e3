/**
 * The largest mass for which a verdict holds, found by following a margin rather than halving a bracket.
 * Every limit Taut checks is a ratio allowance ÷ demand, and a demand grows about in proportion to the
 * train's mass (resistance, the effort the start needs, the pull the couplers carry), so the reciprocal of
 * the smallest margin is close to a straight line in the mass: two judgements predict where it crosses 1,
 * and two more, just below and just above the prediction, close the bracket. The verdict alone decides
 * each end of the bracket (a mass is "lo" only when it holds, "hi" only when it fails); the margin only
 * chooses where to look next, and where it guides badly (a limit that jumps, a margin at its cap) the search
 * halves the bracket as a plain bisection would. So the answer has the same guarantee as a bisection's —
 * a mass that holds, with a failing one within the tolerance above it — from fewer judgements.
 */

/** A judgement at one mass: the verdict, and a score that is ≥ 1 about when it holds (the smallest margin). */
export interface MassJudgement {
  holds: boolean;
  score: number;
}

/** The bracket a search ends with: `lo` holds (0: none does), `hi` fails (null: none tried fails). */
export interface MassBracket {
  lo: number;
  hi: number | null;
}

export interface GuidedSearch {
  /** Lightest mass searched, kg: when it fails, none holds (lo 0). */
  floorKg: number;
  /** Heaviest mass searched, kg: when it holds, the answer is the ceiling (hi null). */
  ceilingKg: number;
  /** The bracket's width at the end: this fraction of the mass found, … */
  relativeTolerance: number;
  /** … no wider than this, kg, and never narrower than `minToleranceKg`. */
  toleranceKg: number;
  minToleranceKg: number;
  /** A mass known to hold (0: none) and one known to fail (null: none), kg. */
  holdsKg?: number;
  failsKg?: number | null;
  /** Where to judge first when nothing is known, kg (the case's own mass). */
  startKg: number;
}

/** Judgements the margin may guide before the search falls back to halving. */
const MAX_GUIDED = 10;
/** How far inside the bracket a guided mass must fall (a share of its width): the rest is for halving. */
const INSIDE = 0.02;

export function guidedLargestMass(at: (massKg: number) => MassJudgement, s: GuidedSearch): MassBracket {
  const width = (lo: number) => Math.min(s.toleranceKg, Math.max(s.minToleranceKg, s.relativeTolerance * lo));
  let lo = s.holdsKg && s.holdsKg > 0 ? s.holdsKg : null;
  let hi = s.failsKg ?? null;
  // The last two judgements (mass, 1 ÷ score) for the straight line.
  const seen: Array<{ m: number; inv: number }> = [];
  const judge = (m: number): boolean => {
    const j = at(m);
    if (j.score > 0 && Number.isFinite(j.score)) seen.push({ m, inv: 1 / j.score });
    if (seen.length > 2) seen.shift();
    if (j.holds) lo = lo === null ? m : Math.max(lo, m);
    else hi = hi === null ? m : Math.min(hi, m);
    return j.holds;
  };
  if (lo === null && hi === null) judge(Math.min(s.ceilingKg, Math.max(s.floorKg, s.startKg)));
  let guided = 0;
  // Guided judgements in a row that did not halve the bracket: after two, one halving step.
  let misses = 0;
  let spanBefore = Infinity;
  for (;;) {
    if (lo !== null && hi !== null && hi - lo <= width(lo)) return { lo, hi };
    if (lo !== null && lo >= s.ceilingKg) return { lo: s.ceilingKg, hi: null };
    if (hi !== null && hi <= s.floorKg) return { lo: 0, hi };
    const prediction = predict(seen);
    let next: number;
    if (lo !== null && hi !== null) {
      const span = hi - lo;
      if (span > 0.5 * spanBefore) misses++;
      else misses = 0;
      if (prediction === null || guided >= MAX_GUIDED || misses >= 2) {
        next = 0.5 * (lo + hi);
        misses = 0;
      } else {
        // Just beside the prediction, on the side of the end that has further to move.
        const w = width(lo);
        const p = Math.min(hi, Math.max(lo, prediction));
        next = p - lo > hi - p ? p - 0.4 * w : p + 0.4 * w;
        next = Math.min(hi - INSIDE * span, Math.max(lo + INSIDE * span, next));
        guided++;
      }
      spanBefore = span;
    } else if (hi === null) {
      // Everything tried holds: up to the prediction (at least 2 % more, at most fourfold).
      const from = lo!;
      // Just above the prediction, so that a good one gives the failing end at once.
      const p = prediction === null ? null : prediction + 0.4 * width(prediction);
      next = guided++ < MAX_GUIDED ? Math.max(from * 1.02, Math.min(from * 4, p ?? from * 2)) : from * 2;
      next = Math.min(s.ceilingKg, next);
    } else {
      // Everything tried fails: down to the prediction (at least 2 % less, at most to a quarter).
      const from = hi;
      // Just below the prediction, so that a good one gives the holding end at once.
      const p = prediction === null ? null : prediction - 0.4 * width(prediction);
      next = guided++ < MAX_GUIDED ? Math.min(from / 1.02, Math.max(from / 4, p ?? from / 2)) : from / 2;
      next = Math.max(s.floorKg, next);
    }
    judge(next);
  }
}

/** Where the line through the last two judgements (1 ÷ score against mass) reaches 1; from one, proportion. */
function predict(seen: ReadonlyArray<{ m: number; inv: number }>): number | null {
  if (seen.length === 0) return null;
  const b = seen[seen.length - 1]!;
  if (seen.length === 1 || seen[0]!.m === b.m || seen[0]!.inv === b.inv) {
    // One point: a demand in proportion to the mass.
    const p = b.m / b.inv;
    return Number.isFinite(p) && p > 0 ? p : null;
  }
  const a = seen[0]!;
  const slope = (b.inv - a.inv) / (b.m - a.m);
  if (!(slope > 0)) return null;
  const p = b.m + (1 - b.inv) / slope;
  return Number.isFinite(p) && p > 0 ? p : null;
}
