/**
 * The largest trailing mass that still starts (and the largest that is at least marginal), everything else
 * unchanged: the same wagons and length, each wagon carrying its share. Found by bisection over the one
 * verdict (decision.ts), bracketed by the case's own verdict, so that a case that starts never has a largest
 * startable mass below its own and one that needs assistance never has a largest marginal mass above it.
 */
import type { StartCase } from "../train/types.js";
import { CEILING_KG_PER_WAGON, massCeilingKg } from "./massCeiling.js";
export { CEILING_KG_PER_WAGON, massCeilingKg };
import type { Verdict } from "./outcome.js";
import { goesJudgement, judge, quasiStaticLimits } from "./decision.js";
import { guidedLargestMass, type GuidedSearch, type MassJudgement } from "./guidedBracket.js";
import { marginalBound, plannerContext } from "./context.js";
import { withEvaluationMemo } from "./evaluationMemo.js";
import { withLumpedWagons } from "../train/lumped.js";

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

/** Relative width the search narrows to (0.5 %), and never wider than 2 t. */
const RELATIVE_TOLERANCE = 0.005;
const TOLERANCE_KG = 2000;

/** The search's widths (guidedBracket.ts), between the floor and the ceiling of a case. */
function searchOf(c: StartCase): Omit<GuidedSearch, "startKg" | "holdsKg" | "failsKg"> {
  return { floorKg: floorKgOf(c), ceilingKg: massCeilingKg(c), relativeTolerance: RELATIVE_TOLERANCE, toleranceKg: TOLERANCE_KG, minToleranceKg: MIN_TOLERANCE_KG };
}

/**
 * Largest mass for which `ok` holds with this train's wagons, location and conditions — NOT its own mass:
 * the search never starts from the train's own mass, so every train of the same make-up in the same place
 * and conditions reads the same figure (`reconciled` then settles the few trains whose own verdict
 * disagrees with it, near a limit where the verdict is not monotone in mass). `atLeastKg` is a mass known to
 * hold (0 for none). The probe is the quasi-static limit's bracket: its upper end fails before any dynamics,
 * so when a plan at its lower end holds, that one plan settles the answer (the dynamics only verify it); when
 * it fails, the search goes on below it, guided by the margin.
 */
function canonicalMass(c: StartCase, at: (m: number, why: JudgementReason) => MassJudgement, atLeastKg: number, probe: Bracket, guide: ((m: number) => MassJudgement) | null = null): Bracket {
  const ok = (m: number, why: JudgementReason): boolean => at(m, why).holds;
  const probeKg = probe.lo;
  const s = searchOf(c);
  const { floorKg, ceilingKg: ceiling } = s;
  let lo = atLeastKg;
  let hi = ceiling;
  // A mass known to fail (none yet).
  let failing = false;
  if (probeKg > Math.max(lo, floorKg) && probeKg < hi) {
    if (ok(probeKg, "probe")) {
      lo = probeKg;
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
  // No quasi-static limit below the ceiling (a falling grade: the brakes hold any load): the ceiling itself
  // is the likeliest answer, and one plan there settles it instead of a plan at every doubling.
  if (!failing && probeKg >= ceiling && lo < ceiling) {
    if (ok(ceiling, "ceiling")) return { lo: ceiling, hi: null };
    hi = ceiling;
    failing = true;
  }
  // Nothing known to hold or fail yet (the quasi-static limits rule out even the lightest train, or set no
  // probe): the floor decides (quasi-statically, when they rule it out: no plan).
  if (lo < floorKg && !failing) {
    if (!ok(floorKg, "floor")) return { lo: 0, hi: floorKg };
    lo = floorKg;
  }
  // The rest follows the margin (guidedBracket.ts): from what holds (when anything is known to) and what
  // fails to the mass where the smallest margin crosses 1, each end settled by the verdict. With nothing
  // known to hold, it steps down from the failing end (to the floor at worst: then none holds).
  return guidedWithGuide(at, guide, { ...s, holdsKg: lo >= floorKg ? lo : 0, failsKg: failing ? hi : null, startKg: hi });
}

/** Steps out from a guide's bracket the full model did not confirm, at most. */
const MAX_STEPS_OUT = 4;

/**
 * `guidedLargestMass` over `at`, the full model's judgement, with a cheaper model's search first when there is
 * one (`guide`: the same judgement on lumped wagons, train/lumped.ts): its bracket says where to look, the full
 * model judges that bracket's two ends, and the full search goes on from what they settle — nothing further
 * when the guide was right (two plans instead of a dozen where the verdict jumps with the mass). The answer
 * has the same guarantee as without a guide: a mass the full model holds, one within the tolerance above it
 * that it fails.
 */
function guidedWithGuide(at: (m: number, why: JudgementReason) => MassJudgement, guide: ((m: number) => MassJudgement) | null, s: GuidedSearch): Bracket {
  let lo = s.holdsKg ?? 0;
  let hi = s.failsKg ?? null;
  const width = (m: number) => Math.min(s.toleranceKg, Math.max(s.minToleranceKg, s.relativeTolerance * m));
  const settled = () => lo > 0 && hi !== null && hi - lo <= width(lo);
  const bisecting = (m: number) => at(m, "search");
  if (guide === null || settled()) return guidedLargestMass(bisecting, s);
  const g = guidedLargestMass(guide, s);
  // A guide that finds no mass holding above the floor says nothing the full search can start from (near the
  // floor the verdict of a near-empty train is not a guide to a loaded one's): the full search alone.
  if (!(g.lo > s.floorKg)) return guidedLargestMass(bisecting, s);
  const inside = (m: number | null): m is number => m !== null && m >= s.floorKg && m <= s.ceilingKg && m > lo && (hi === null || m < hi);
  const judged = (m: number, why: JudgementReason): boolean => {
    const holds = at(m, why).holds;
    if (holds) lo = m;
    else hi = m;
    return holds;
  };
  // Where to step out to if the full model disagrees: up (it holds at the guide's failing end), down (it fails
  // at the guide's holding end), or nowhere. The failing end first: when the full model holds there, the
  // holding end below it needs no plan.
  let up: boolean | null = null;
  if (inside(g.hi) && judged(g.hi, "guide")) up = true;
  else if (inside(g.lo)) up = judged(g.lo, "guide") ? null : false;
  // The full model's limit lies beyond the guide's bracket (the guide was a little off): it is near, so step
  // out from it by the tolerance (twice; a guide is most often off by a width or two), then doubling, rather
  // than searching the whole bracket the probe left.
  let step = width(up === false && hi !== null ? hi : Math.max(lo, s.floorKg));
  for (let k = 0; up !== null && !settled() && k < MAX_STEPS_OUT; k++, step *= k >= 2 ? 2 : 1) {
    const m = up ? lo + step : (hi as number) - step;
    if (!inside(m)) break;
    if (judged(m, "step-out") !== up) break;
  }
  return guidedLargestMass(bisecting, { ...s, holdsKg: lo, failsKg: hi, startKg: hi ?? (lo > 0 ? lo : s.startKg) });
}

/**
 * The figure this train reads, from the canonical bracket `b` and its own verdict: b's answer when the
 * train's own verdict agrees with it (nearly always), else a search from the train's own mass — up from it
 * when it holds there but b's answer is lighter, down from it when it fails there but b's answer is not
 * lighter — so that this train holds ⇔ its mass ≤ the figure. `lowKg` is a mass known to hold (the train's
 * own when it holds, or a largest mass the figure may not fall below; 0: none) and `failsKg` one known to fail
 * (the train's own when it fails; null: none). `seen` holds every verdict the searches have found.
 */
function reconciled(c: StartCase, at: (m: number, why: JudgementReason) => MassJudgement, b: Bracket, lowKg: number, failsKg: number | null, seen: ReadonlyMap<number, boolean>): number {
  if (b.lo >= lowKg && (failsKg === null || b.lo < failsKg)) return b.lo;
  let holds = lowKg;
  let fails = failsKg;
  for (const [m, h] of seen) {
    if (h && m > holds && (fails === null || m < fails)) holds = m;
  }
  for (const [m, h] of seen) {
    if (!h && m > holds && (fails === null || m < fails)) fails = m;
  }
  return guidedLargestMass((m) => at(m, "reconcile"), { ...searchOf(c), holdsKg: holds, failsKg: fails, startKg: fails ?? holds }).lo;
}

/**
 * The largest mass for which the quasi-static limits allow the verdict (all within, or none over), and the
 * mass just above it where they do not (so neither does the decision: it needs them within, or none over).
 */
function quasiStaticMassKg(own: StartCase, need: "within" | "not-over"): Bracket {
  // Not from the train's own mass: the bracket (and so every search it starts) is the same for every
  // train of this make-up in this place and these conditions.
  const c = withTrailingMass(own, own.train.wagons * QS_START_KG_PER_WAGON);
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

/** Wagons a body in the lumped guide: about a dozen bodies; none under 24 wagons (the full model is cheap there). */
const GUIDE_BODIES = 12;
function guideLumpOf(c: StartCase): number {
  return c.train.wagons >= 2 * GUIDE_BODIES ? Math.floor(c.train.wagons / GUIDE_BODIES) : 1;
}

/** Where the quasi-static search starts, kg per wagon (any fixed mass; a loaded wagon's order). */
const QS_START_KG_PER_WAGON = 50_000;

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
   * The figures of the make-up (these wagons, locomotives, place and conditions), not reconciled with the
   * train's own verdict (see `startableMasses`): what a load table shows, and no plan of the train's own mass.
   */
  ofMakeUp?: boolean;
  /**
   * A verdict already found elsewhere (another thread judging the masses `massProbesKg` gives while this
   * one plans the case): true or false for "starts" or "goes" (at least marginal) at a mass, or undefined.
   */
  verdictAt?: MassVerdictLookup;
  /**
   * Plan every judgement to its end (what the searches did before verdict-only plans): for benchmarks that
   * compare. By default a judgement's plans stop as soon as a limit has failed (decision.ts, `stopWhenFailed`):
   * the same verdicts; a stopped plan's margin only guides the search.
   */
  fullPlans?: boolean;
  /**
   * Guide a search the quasi-static probe did not settle by the same search on lumped wagons first (default
   * true; false: the full model only, as before, for the agreement test and the bench).
   */
  lumpedGuide?: boolean;
  /** Told of every judgement the searches make (for benchmarks and tests: how much work a search did). */
  onJudgement?: (need: "starts" | "goes", massKg: number, holds: boolean, score: number, why: JudgementReason) => void;
  /** Told of every judgement on lumped wagons the guide makes (not a full-model judgement; for benchmarks). */
  onGuideJudgement?: (need: "starts" | "goes", massKg: number, holds: boolean) => void;
}

/**
 * Why a search judged a mass: the quasi-static probe, the ceiling or the floor (canonicalMass), an end of the
 * lumped guide's bracket or a step out from it, the margin-guided search, the train's own mass, or the search
 * that reconciles the figure with the train's own verdict.
 */
export type JudgementReason = "probe" | "ceiling" | "floor" | "guide" | "step-out" | "search" | "own" | "reconcile";

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
 * The largest trailing masses that start and that are at least marginal, with this train's wagons
 * (README "How Taut decides"). Two steps:
 *  1. the figures of the make-up — the same for every trailing mass of these wagons, locomotives, place and
 *     conditions: a search that never starts from the train's own mass (`canonicalMass`) ends at a mass that
 *     holds with one within 0.5 % above it that fails;
 *  2. the train's own verdict wins where it disagrees (near a limit the verdict can change back and forth
 *     within a per cent or two of mass): a train that starts reads at least its own mass (the search goes on
 *     up from it), one that does not reads the heaviest mass below its own that was found to hold.
 * So the case starts ⇔ its mass ≤ `startsKg`, it needs assistance ⇔ its mass > `marginalKg`, each figure is a
 * mass whose verdict holds, and every train whose verdict agrees with the make-up's figures reads those.
 */
export function startableMasses(c: StartCase, opts: StartableMassOptions = {}): StartableMasses {
  // The two searches try some masses in common (the threshold's plan is the same for both).
  return withEvaluationMemo(() => searchMasses(c, opts));
}

function remember(seen: Map<number, boolean>, m: number, j: MassJudgement): MassJudgement {
  seen.set(m, j.holds);
  return j;
}

function searchMasses(c: StartCase, opts: StartableMassOptions): StartableMasses {
  const told = (need: "starts" | "goes", m: number, j: MassJudgement, why: JudgementReason): MassJudgement => {
    opts.onJudgement?.(need, m, j.holds, j.score, why);
    return j;
  };
  const stop = opts.shouldStop;
  const known = opts.verdictAt;
  const verdictOnly = opts.fullPlans !== true;
  // Each judgement gives the verdict (exactly startsAt's / goesAt's) and the margin the search follows.
  const startsJ = (m: number, why: JudgementReason): MassJudgement => {
    const v = known?.("starts", m);
    if (v !== undefined) return told("starts", m, { holds: v, score: Number.NaN }, why);
    const d = judge(withTrailingMass(c, m), { depth: "starts", stopWhenFailed: verdictOnly, ...(stop ? { shouldStop: stop } : {}) });
    return told("starts", m, { holds: d.verdict === "starts", score: d.margin }, why);
  };
  const goesJ = (m: number, why: JudgementReason): MassJudgement => {
    const v = known?.("goes", m);
    return told("goes", m, v !== undefined ? { holds: v, score: Number.NaN } : goesJudgement(withTrailingMass(c, m), stop, { stopWhenFailed: verdictOnly }), why);
  };
  // The same judgements on lumped wagons, to guide a search the quasi-static probe did not settle.
  const lump = opts.lumpedGuide === false ? 1 : guideLumpOf(c);
  const startsGuide =
    lump > 1
      ? (m: number): MassJudgement =>
          withLumpedWagons(lump, () => {
            const d = judge(withTrailingMass(c, m), { depth: "starts", stopWhenFailed: verdictOnly, ...(stop ? { shouldStop: stop } : {}) });
            const holds = d.verdict === "starts";
            opts.onGuideJudgement?.("starts", m, holds);
            return { holds, score: d.margin };
          })
      : null;
  const goesGuide =
    lump > 1
      ? (m: number): MassJudgement =>
          withLumpedWagons(lump, () => {
            const j = goesJudgement(withTrailingMass(c, m), stop, { stopWhenFailed: verdictOnly });
            opts.onGuideJudgement?.("goes", m, j.holds);
            return j;
          })
      : null;
  const own = opts.own;
  const ownKg = c.train.trailingMassKg;
  // Every verdict found, by mass (the reconciling search starts from the nearest ones).
  const seenStarts = new Map<number, boolean>();
  const seenGoes = new Map<number, boolean>();
  const startsAt = (m: number, why: JudgementReason): MassJudgement => remember(seenStarts, m, startsJ(m, why));
  const goesAt = (m: number, why: JudgementReason): MassJudgement => remember(seenGoes, m, goesJ(m, why));
  const makeUp = opts.ofMakeUp === true;
  const ceilingKg = massCeilingKg(c);
  const starts = canonicalMass(c, startsAt, 0, quasiStaticMassKg(c, "within"), startsGuide);
  let startsKg = starts.lo;
  let ownStarts = false;
  if (!makeUp) {
    ownStarts = own !== undefined ? own === "starts" : startsAt(ownKg, "own").holds;
    seenStarts.set(ownKg, ownStarts);
    startsKg = reconciled(c, startsAt, starts, ownStarts ? ownKg : 0, ownStarts ? null : ownKg, seenStarts);
  }
  if (opts.startsOnly) return { startsKg, marginalKg: Number.NaN, ceilingKg };
  // Whatever starts goes: the make-up's largest startable mass is a lower end of its marginal one, and the
  // train's own figure of the two a lower end of its own.
  for (const [m, h] of seenStarts) if (h) seenGoes.set(m, true);
  const goes = canonicalMass(c, goesAt, starts.lo, quasiStaticMassKg(c, "not-over"), goesGuide);
  let marginalKg = goes.lo;
  if (!makeUp) {
    const ownGoes = ownStarts || (own !== undefined ? own !== "needs-assistance" : goesAt(ownKg, "own").holds);
    seenGoes.set(ownKg, ownGoes);
    marginalKg = reconciled(c, goesAt, goes, Math.max(startsKg, ownGoes ? ownKg : 0), ownGoes ? null : ownKg, seenGoes);
  }
  return { startsKg, marginalKg: Math.max(startsKg, marginalKg), ceilingKg };
}
