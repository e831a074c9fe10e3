/**
 * Dividing the train ("doubling"): when it will not start whole, take the largest first part — wagons
 * from the head, with their share of the mass and length — that the train's own locomotives start, and
 * come back for the rest (common practice; PRACTICE.md, Alaska Railroad manual p. 64-18 [P]).
 * Found by bisection on the wagon count with the planner's verdict, below the static check's limit.
 */
import { planStart, plannerStarts, type PlanResult } from "../planner/index.js";
import { staticCheck } from "../planner/staticCheck.js";
import type { LocoGroup, StartCase } from "../train/types.js";

export interface DividedTrain {
  /** Wagons in the first part (from the head); 0 when not even one wagon starts. */
  wagons: number;
  trailingMassKg: number;
  lengthM: number;
  /** Wagons and mass left for later trips. */
  remainingWagons: number;
  remainingMassKg: number;
  /** Trips needed if every trip takes a part of this size (the rest stands on other track, so a guide only). */
  trips: number;
  /** The full, verified plan of the first part (null when nothing starts or the budget ran out before it). */
  plan: PlanResult | null;
  /** The first part as a start case (null when nothing starts). */
  case: StartCase | null;
  plannerRuns: number;
}

export interface DivideOptions {
  /** Most planner runs; default 10. */
  budget?: number;
  shouldStop?: () => boolean;
}

/**
 * The first `wagons` wagons of the train with the train's own locomotives: units at the head and those
 * mid-train ahead of the cut stay; units at the rear (or behind the cut) are left with the rest.
 */
export function firstPart(c: StartCase, wagons: number): StartCase {
  const share = wagons / c.train.wagons;
  const locomotives: LocoGroup[] = c.locomotives.filter((g) => g.position === "head" || (typeof g.position === "object" && g.position.afterWagon < wagons));
  return {
    ...c,
    locomotives: locomotives.length > 0 ? locomotives : [{ ...c.locomotives[0]!, position: "head" }],
    train: { ...c.train, wagons, trailingMassKg: c.train.trailingMassKg * share, lengthM: c.train.lengthM * share },
  };
}

/** The largest first part that starts. */
export function divideTrain(c: StartCase, opts: DivideOptions = {}): DividedTrain {
  const budget = opts.budget ?? 10;
  let runs = 0;
  const total = c.train.wagons;
  // The static limit bounds the planner's from above, at no planner cost.
  let hiStatic = 0;
  {
    let lo = 0;
    let hi = total;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (staticCheck(firstPart(c, mid)).verdict === "starts") lo = mid;
      else hi = mid;
    }
    hiStatic = lo;
  }
  const starts = (w: number): boolean => {
    runs++;
    return plannerStarts(firstPart(c, w), opts.shouldStop);
  };
  let best = 0;
  if (hiStatic >= 1) {
    // Planner bisection over [0, hiStatic]; the static limit itself is tried first (it often holds).
    if (starts(hiStatic)) best = hiStatic;
    else {
      let lo = 0;
      let hi = hiStatic;
      while (hi - lo > 1 && runs < budget - 1) {
        const mid = (lo + hi) >> 1;
        if (starts(mid)) lo = mid;
        else hi = mid;
      }
      best = lo;
    }
  }
  let plan: PlanResult | null = null;
  // Confirm with a full, verified plan; step down a little if the verification makes it marginal. When the
  // budget runs out first, the part stands on the verdict run alone (plan null).
  while (best >= 1 && runs < budget) {
    const p = planStart(firstPart(c, best), { skipMassSearch: true, ...(opts.shouldStop ? { shouldStop: opts.shouldStop } : {}) });
    runs++;
    if (p.verdict === "starts") {
      plan = p;
      break;
    }
    best = Math.floor(best * 0.9);
  }
  const part = best >= 1 ? firstPart(c, best) : null;
  return {
    wagons: best,
    trailingMassKg: part?.train.trailingMassKg ?? 0,
    lengthM: part?.train.lengthM ?? 0,
    remainingWagons: total - best,
    remainingMassKg: c.train.trailingMassKg - (part?.train.trailingMassKg ?? 0),
    trips: best >= 1 ? Math.ceil(total / best) : 0,
    plan,
    case: part,
    plannerRuns: runs,
  };
}
