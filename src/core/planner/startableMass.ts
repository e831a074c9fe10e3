/**
 * The largest trailing mass that still starts (and the largest that is at least marginal), everything else
 * unchanged: the same wagons and length, each wagon carrying its share. Found by bisection over the one
 * verdict (decision.ts), bracketed by the case's own verdict, so that a case that starts never has a largest
 * startable mass below its own and one that needs assistance never has a largest marginal mass above it.
 */
import type { StartCase } from "../train/types.js";
import type { Verdict } from "./outcome.js";
import { goesJudgement, judge, quasiStaticLimits } from "./decision.js";
import { guidedLargestMass, type MassJudgement } from "./guidedBracket.js";
import { marginalBound, plannerContext } from "./context.js";
import { withEvaluationMemo } from "./evaluationMemo.js";

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
/** Lightest train searched: one tonne per wagon (lighter is not a train). */
const floorKgOf = (c: StartCase): number => c.train.wagons * 1000;

/**
 * Largest trailing mass (kg) for which `starts(case)` holds; 0 when even a near-empty train does not
 * start. Doubles up from the case's mass to bracket the limit, then bisects. A plain bisection over any
 * verdict function (the load table accepts one); the product's own figures come from `startableMasses`.
 */
export function largestStartableMassKg(c: StartCase, starts: (c: StartCase) => boolean, opts: MassSearchOptions = {}): number {
  return startableBracketKg(c, starts, opts).lo;
}

/** The bracket the search ends with: `lo` holds (0: none does), `hi` fails (null: no failing mass tried). */
interface Bracket {
  lo: number;
  hi: number | null;
}

function startableBracketKg(c: StartCase, starts: (c: StartCase) => boolean, opts: MassSearchOptions): Bracket {
  const tol = opts.toleranceKg ?? 500;
  const ceiling = opts.ceilingKg ?? 5e7;
  const floorKg = floorKgOf(c);
  const ok = (m: number): boolean => starts(withTrailingMass(c, m));
  const bound = opts.upperBoundKg;
  if (bound !== undefined) {
    if (bound < floorKg) return { lo: 0, hi: null };
    if (ok(bound)) return { lo: bound, hi: null };
  }
  let lo: number;
  let hi: number;
  const guess = opts.guessKg;
  if (guess !== undefined && guess > floorKg && (bound === undefined || guess < bound)) {
    const top = bound ?? ceiling;
    if (ok(guess)) {
      lo = guess;
      hi = Math.min(top, guess * GUESS_STEP);
      while (hi < top && ok(hi)) {
        lo = hi;
        hi = Math.min(top, hi * GUESS_STEP);
      }
      if (hi >= top && bound === undefined && ok(hi)) return { lo: hi, hi: null };
    } else {
      hi = guess;
      lo = Math.max(floorKg, guess / GUESS_STEP);
      while (lo > floorKg && !ok(lo)) {
        hi = lo;
        lo = Math.max(floorKg, lo / GUESS_STEP);
      }
      if (lo <= floorKg && !ok(floorKg)) return { lo: 0, hi: floorKg };
    }
  } else {
    if (!ok(floorKg)) return { lo: 0, hi: floorKg };
    lo = floorKg;
    hi = bound ?? Math.max(c.train.trailingMassKg, 2 * floorKg);
    while (bound === undefined && ok(hi)) {
      lo = hi;
      if (hi >= ceiling) return { lo: ceiling, hi: null };
      hi = Math.min(ceiling, hi * 2);
    }
  }
  return bisect(lo, hi, ok, opts.relativeTolerance ?? 0.005, tol);
}

function bisect(lo: number, hi: number, ok: (m: number) => boolean, rel: number, tol: number): Bracket {
  while (hi - lo > Math.min(tol, Math.max(MIN_TOLERANCE_KG, rel * lo))) {
    const mid = 0.5 * (lo + hi);
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  return { lo, hi };
}

/**
 * Heaviest wagon the search goes to, kg: beyond any freight wagon's gross mass [M], so a largest mass at this
 * ceiling means the locomotives set no limit (on a falling grade, for example, the brakes hold any load).
 */
export const CEILING_KG_PER_WAGON = 250_000;
/** The search's ceiling for a case: 250 t a wagon, or the case's own mass if that is more, kg. */
export function massCeilingKg(c: StartCase): number {
  return Math.max(c.train.trailingMassKg, c.train.wagons * CEILING_KG_PER_WAGON);
}
/** Relative width the search narrows to (0.5 %), and never wider than 2 t. */
const RELATIVE_TOLERANCE = 0.005;
const TOLERANCE_KG = 2000;

/**
 * Largest mass for which `ok` holds, given what is known of the case's own mass (`ownOk`) and a mass known
 * to hold (`atLeastKg`, 0 for none). The probe is the quasi-static limit's bracket: its upper end fails
 * before any dynamics, so when a plan at its lower end holds, that one plan settles the answer (the
 * dynamics only verify it); when it fails, the search goes on below it with plans.
 */
function largestMass(c: StartCase, at: (m: number) => MassJudgement, ownOk: boolean, atLeastKg: number, probe: Bracket): number {
  const ok = (m: number): boolean => at(m).holds;
  const probeKg = probe.lo;
  const own = c.train.trailingMassKg;
  const floorKg = floorKgOf(c);
  const ceiling = massCeilingKg(c);
  let lo = Math.max(atLeastKg, ownOk ? own : 0);
  let hi = ownOk ? ceiling : own;
  // A mass known to fail (the case's own when it does; none yet when it holds).
  let failing = !ownOk;
  if (hi <= lo) return lo;
  // Below the floor (nothing known to hold yet) the floor decides between "none" and a search — but a probe
  // that holds settles that too, and the floor is the dearest train to plan (light wagons take the smallest
  // steps): so the probe first, the floor only when the probe fails.
  let floorUnknown = lo < floorKg;
  if (floorUnknown) lo = floorKg;
  if (probeKg > lo && probeKg < hi) {
    if (ok(probeKg)) {
      lo = probeKg;
      floorUnknown = false;
      // Just above the probe the quasi-static limits already rule the verdict out: no plan can bring it back.
      if (probe.hi !== null && probe.hi > lo && probe.hi < hi) {
        hi = probe.hi;
        failing = true;
      }
    } else {
      hi = probeKg;
      failing = true;
    }
  }
  if (floorUnknown && !ok(floorKg)) return 0;
  // No quasi-static limit below the ceiling (a falling grade: the brakes hold any load): the ceiling itself
  // is the likeliest answer, and one plan there settles it instead of a plan at every doubling.
  if (!failing && probeKg >= ceiling && lo < ceiling) {
    if (ok(ceiling)) return ceiling;
    hi = ceiling;
    failing = true;
  }
  // The rest follows the margin (guidedBracket.ts): from what holds (and what fails, when known) to the
  // mass where the smallest margin crosses 1, each end settled by the verdict.
  return guidedLargestMass(at, {
    floorKg,
    ceilingKg: ceiling,
    relativeTolerance: RELATIVE_TOLERANCE,
    toleranceKg: TOLERANCE_KG,
    minToleranceKg: MIN_TOLERANCE_KG,
    holdsKg: lo,
    failsKg: failing ? hi : null,
    startKg: lo,
  }).lo;
}

/**
 * The largest mass for which the quasi-static limits allow the verdict (all within, or none over), and the
 * mass just above it where they do not (so neither does the decision: it needs them within, or none over).
 */
function quasiStaticMassKg(c: StartCase, need: "within" | "not-over"): Bracket {
  const key = `${need}|${JSON.stringify(c)}`;
  const known = quasiStaticCache.get(key);
  if (known) return known;
  const bound = marginalBound(c.settings);
  // Each limit's score: its margin ("within"), or against its band where it has one ("not over"); the
  // verdict is from the levels themselves.
  const at = (m: number): MassJudgement => {
    const ls = quasiStaticLimits(plannerContext(withTrailingMass(c, m)), bound).limits;
    const holds = need === "within" ? ls.every((l) => l.level === "within") : ls.every((l) => l.level !== "over");
    let score = Infinity;
    for (const l of ls) score = Math.min(score, need === "not-over" && l.band ? Math.max(l.margin, l.band.allowance / Math.max(1e-9, l.band.demand)) : l.margin);
    return { holds, score };
  };
  const b = guidedLargestMass(at, {
    floorKg: floorKgOf(c),
    ceilingKg: 5e7,
    relativeTolerance: 0.002,
    toleranceKg: 200,
    minToleranceKg: MIN_TOLERANCE_KG,
    startKg: c.train.trailingMassKg,
  });
  if (quasiStaticCache.size >= 8) quasiStaticCache.delete(quasiStaticCache.keys().next().value!);
  quasiStaticCache.set(key, b);
  return b;
}

/** The last few quasi-static brackets (a plan's mass search and the probes speculated for it ask the same). */
const quasiStaticCache = new Map<string, Bracket>();

export interface StartableMasses {
  /** Largest trailing mass that starts, kg (0: none). */
  startsKg: number;
  /** Largest trailing mass that is at least marginal, kg (0: none); never below `startsKg`. */
  marginalKg: number;
  /** The search's ceiling (`massCeilingKg`): a mass equal to it means "no limit up to here", kg. */
  ceilingKg: number;
}

export interface StartableMassOptions {
  /** The case's own verdict when the caller already has it (saves a plan). */
  own?: Verdict;
  shouldStop?: () => boolean;
  /** Only the largest startable mass (skip the largest marginal one). */
  startsOnly?: boolean;
  /**
   * A verdict already found elsewhere (another thread judging the masses `massProbesKg` gives while this
   * one plans the case): true or false for "starts" or "goes" (at least marginal) at a mass, or undefined.
   */
  verdictAt?: MassVerdictLookup;
}

/** See `StartableMassOptions.verdictAt`. */
export type MassVerdictLookup = (need: "starts" | "goes", massKg: number) => boolean | undefined;

/**
 * The masses the two searches plan first (the quasi-static limits, or the ceiling where they set none): what
 * another thread may judge ahead of time. The searches go elsewhere only when these plans fail or the case's
 * own verdict already settles them.
 */
export function massProbesKg(c: StartCase): { startsKg: number; goesKg: number } {
  const ceiling = massCeilingKg(c);
  const first = (b: Bracket) => Math.min(b.lo, ceiling);
  return { startsKg: first(quasiStaticMassKg(c, "within")), goesKg: first(quasiStaticMassKg(c, "not-over")) };
}

/**
 * The largest trailing masses that start and that are at least marginal, with this train's wagons. By
 * construction: the case starts ⇔ its mass ≤ `startsKg`, and it needs assistance ⇔ its mass > `marginalKg`.
 */
export function startableMasses(c: StartCase, opts: StartableMassOptions = {}): StartableMasses {
  // The two searches try some masses in common (the threshold's plan is the same for both).
  return withEvaluationMemo(() => searchMasses(c, opts));
}

function searchMasses(c: StartCase, opts: StartableMassOptions): StartableMasses {
  const stop = opts.shouldStop;
  const known = opts.verdictAt;
  // Each judgement gives the verdict (exactly startsAt's / goesAt's) and the margin the search follows.
  const startsJ = (m: number): MassJudgement => {
    const v = known?.("starts", m);
    if (v !== undefined) return { holds: v, score: Number.NaN };
    const d = judge(withTrailingMass(c, m), { depth: "starts", ...(stop ? { shouldStop: stop } : {}) });
    return { holds: d.verdict === "starts", score: d.margin };
  };
  const goesJ = (m: number): MassJudgement => {
    const v = known?.("goes", m);
    return v !== undefined ? { holds: v, score: Number.NaN } : goesJudgement(withTrailingMass(c, m), stop);
  };
  const own = opts.own;
  const ownStarts = own !== undefined ? own === "starts" : startsJ(c.train.trailingMassKg).holds;
  const startsKg = largestMass(c, startsJ, ownStarts, 0, quasiStaticMassKg(c, "within"));
  const ceilingKg = massCeilingKg(c);
  if (opts.startsOnly) return { startsKg, marginalKg: Number.NaN, ceilingKg };
  const ownGoes = ownStarts || (own !== undefined ? own !== "needs-assistance" : goesJ(c.train.trailingMassKg).holds);
  const marginalKg = largestMass(c, goesJ, ownGoes, startsKg, quasiStaticMassKg(c, "not-over"));
  return { startsKg, marginalKg: Math.max(startsKg, marginalKg), ceilingKg };
}
