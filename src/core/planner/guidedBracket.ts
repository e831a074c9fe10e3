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

/** Guided judgements while only one end is known (up or down to the prediction). */
const MAX_OUTWARD = 6;
/** Guided judgements once both ends are known; any that fails to halve the bracket ends the guiding. */
const MAX_INWARD = 3;

export function guidedLargestMass(at: (massKg: number) => MassJudgement, s: GuidedSearch): MassBracket {
  const width = (lo: number) => Math.min(s.toleranceKg, Math.max(s.minToleranceKg, s.relativeTolerance * lo));
  let lo: number | null = s.holdsKg && s.holdsKg > 0 ? s.holdsKg : null;
  let hi: number | null = s.failsKg ?? null;
  // 1 ÷ score of every mass judged (the straight line's points).
  const inv = new Map<number, number>();
  let last: number[] = [];
  const judge = (m: number): void => {
    const j = at(m);
    if (j.score > 0 && Number.isFinite(j.score)) {
      inv.set(m, 1 / j.score);
      last = [...last.slice(-1), m];
    }
    if (j.holds) lo = lo === null ? m : Math.max(lo, m);
    else hi = hi === null ? m : Math.min(hi, m);
  };
  if (lo === null && hi === null) judge(Math.min(s.ceilingKg, Math.max(s.floorKg, s.startKg)));
  let outward = 0;
  let inward = 0;
  let guiding = true;
  for (;;) {
    if (lo !== null && hi !== null && hi - lo <= width(lo)) return { lo, hi };
    if (lo !== null && lo >= s.ceilingKg) return { lo: s.ceilingKg, hi: null };
    if (hi !== null && hi <= s.floorKg) return { lo: 0, hi };
    let next: number;
    if (lo !== null && hi !== null) {
      const span = hi - lo;
      const w = width(lo);
      // The line through the bracket's ends when their scores agree with their verdicts (the holding end
      // scores ≥ 1, the failing one below), else through the last two judgements.
      const a = inv.get(lo);
      const b = inv.get(hi);
      const prediction = a !== undefined && b !== undefined && a <= 1 && b > 1 ? crossing(lo, a, hi, b) : lineCrossing(last, inv);
      if (guiding && inward < MAX_INWARD && prediction !== null) {
        inward++;
        const p = Math.min(hi, Math.max(lo, prediction));
        // Close the bracket from the prediction: just past it on the side of the end that has further to move
        // (a good prediction then leaves a bracket narrower than the tolerance after one more judgement).
        next = p - lo > hi - p ? p - 0.45 * w : p + 0.45 * w;
        const inside = Math.min(0.05 * w, 0.02 * span);
        next = Math.min(hi - inside, Math.max(lo + inside, next));
        judge(next);
        // A guided judgement that did not halve the bracket: the margin is not a straight line here (a limit
        // that jumps, a margin at its cap): halve from now on.
        if (hi - lo > 0.5 * span) guiding = false;
        continue;
      }
      next = 0.5 * (lo + hi);
    } else if (hi === null) {
      // Everything tried holds: just above the prediction (at least 2 % more, at most fourfold).
      const from = lo!;
      const p = lineCrossing(last, inv);
      const aim = p === null ? null : p + 0.45 * width(p);
      next = outward++ < MAX_OUTWARD ? Math.max(from * 1.02, Math.min(from * 4, aim ?? from * 2)) : from * 2;
      next = Math.min(s.ceilingKg, next);
    } else {
      // Everything tried fails: just below the prediction (at least 2 % less, at most to a quarter).
      const from = hi;
      const p = lineCrossing(last, inv);
      const aim = p === null ? null : p - 0.45 * width(p);
      next = outward++ < MAX_OUTWARD ? Math.min(from / 1.02, Math.max(from / 4, aim ?? from / 2)) : from / 2;
      next = Math.max(s.floorKg, next);
    }
    judge(next);
  }
}

/** Where the straight line through (m1, v1) and (m2, v2) reaches 1; null when it does not rise. */
function crossing(m1: number, v1: number, m2: number, v2: number): number | null {
  if (m1 === m2 || !(v2 !== v1)) return null;
  const slope = (v2 - v1) / (m2 - m1);
  if (!(slope > 0)) return null;
  const p = m2 + (1 - v2) / slope;
  return Number.isFinite(p) && p > 0 ? p : null;
}

/** The crossing of the line through the last two judgements; from one, a demand in proportion to the mass. */
function lineCrossing(last: readonly number[], inv: ReadonlyMap<number, number>): number | null {
  if (last.length === 0) return null;
  const m2 = last[last.length - 1]!;
  const v2 = inv.get(m2)!;
  if (last.length === 2) {
    const m1 = last[0]!;
    const p = crossing(m1, inv.get(m1)!, m2, v2);
    if (p !== null) return p;
  }
  const p = m2 / v2;
  return Number.isFinite(p) && p > 0 ? p : null;
}
