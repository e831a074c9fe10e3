/**
 * Dividing the train ("doubling"): when it will not start whole, take the largest first part — wagons
 * from the head, with their share of the mass and length — that the train's own locomotives start, and
 * come back for the rest (common practice; PRACTICE.md, Alaska Railroad manual p. 64-18 [P]). Offered only
 * in a practical number of parts (the case's `maxDividedParts`, default 3): a first part smaller than
 * the train ÷ that number is no answer. Found by bisection on the wagon count with the one decision.
 */
import { planStart, plannerStarts, withTrailingMass, type PlanResult } from "../planner/index.js";
import { headPart } from "../train/groups.js";
import type { LocoGroup, StartCase } from "../train/types.js";

export interface DividedTrain {
  /** Wagons in the first part (from the head); 0 when no part of a practical size starts. */
  wagons: number;
  trailingMassKg: number;
  lengthM: number;
  /** Wagons and mass left for later trips. */
  remainingWagons: number;
  remainingMassKg: number;
  /** Trips needed if every trip takes a part of this size (the rest stands on other track, so a guide only). */
  trips: number;
  /** The most parts dividing may make (the case's setting). */
  maxParts: number;
  /** The full, verified plan of the first part (null when nothing starts or the budget ran out before it). */
  plan: PlanResult | null;
  /** The first part as a start case (null when nothing starts). */
  case: StartCase | null;
  plannerRuns: number;
}

export interface DivideOptions {
  /** Most planner runs; default 10. */
  budget?: number;
  /**
   * The part's plan without what the departures check never reports (the verifying re-run on the median rail
   * and the sensitivity table): its verdict, coupler force and time are the same.
   */
  reportedOnly?: boolean;
  /**
   * Whether the lightly loaded train (the mass search's floor) starts, when the caller's mass search already
   * knows (its largest startable mass is above none): dividing then offers nothing exactly when that search
   * says "none", without planning the floor again. Counted as a run all the same, so the budget reaches as
   * far as without it.
   */
  lightestStarts?: boolean;
  shouldStop?: () => boolean;
}

/**
 * The first `wagons` wagons of the train with the train's own locomotives: units at the head and those
 * mid-train ahead of the cut stay; units at the rear (or behind the cut) are left with the rest.
 */
export function firstPart(c: StartCase, wagons: number): StartCase {
  const locomotives: LocoGroup[] = c.locomotives.filter((g) => g.position === "head" || (typeof g.position === "object" && g.position.afterWagon < wagons));
  return {
    ...c,
    locomotives: locomotives.length > 0 ? locomotives : [{ ...c.locomotives[0]!, position: "head", control: "with-head" }],
    // A mixed train keeps the groups (and their loads) of the wagons in this part.
    train: headPart(c.train, wagons),
  };
}

/** The smallest first part dividing may offer: the train in at most `maxParts` trips. */
export function smallestPart(c: StartCase): number {
  const parts = Math.max(2, Math.round(c.settings.maxDividedParts ?? 3));
  return Math.max(1, Math.ceil(c.train.wagons / parts));
}

/** The largest first part that starts, if one of a practical size does. */
export function divideTrain(c: StartCase, opts: DivideOptions = {}): DividedTrain {
  const budget = opts.budget ?? 10;
  let runs = 0;
  const total = c.train.wagons;
  const maxParts = Math.max(2, Math.round(c.settings.maxDividedParts ?? 3));
  const least = smallestPart(c);
  const starts = (w: number): boolean => {
    runs++;
    return plannerStarts(firstPart(c, w), opts.shouldStop);
  };
  let best = 0;
  // A part that starts beside a largest startable mass of "none" would contradict it: when not even a lightly
  // loaded train of these wagons starts (the mass search's floor, 1 t a wagon), nothing is offered.
  const lightest = (): boolean => {
    runs++;
    return opts.lightestStarts ?? plannerStarts(withTrailingMass(c, total * 1000), opts.shouldStop);
  };
  // Bisection over [least, total − 1]: the smallest practical part is tried first (if it fails, nothing will).
  if (total >= 2 && least < total && lightest() && starts(least)) {
    let lo = least;
    let hi = total;
    while (hi - lo > 1 && runs < budget - 1) {
      const mid = (lo + hi) >> 1;
      if (starts(mid)) lo = mid;
      else hi = mid;
    }
    best = lo;
  }
  let plan: PlanResult | null = null;
  // Confirm with a full, verified plan (the same decision: it starts). When the budget runs out first, the
  // part stands on its verdict alone (plan null).
  if (best >= 1 && runs < budget) {
    plan = planStart(firstPart(c, best), { skipMassSearch: true, ...(opts.reportedOnly ? { skipVerification: true, skipSensitivity: true } : {}), ...(opts.shouldStop ? { shouldStop: opts.shouldStop } : {}) });
    runs++;
  }
  const part = best >= 1 ? firstPart(c, best) : null;
  return {
    wagons: best,
    trailingMassKg: part?.train.trailingMassKg ?? 0,
    lengthM: part?.train.lengthM ?? 0,
    remainingWagons: total - best,
    remainingMassKg: c.train.trailingMassKg - (part?.train.trailingMassKg ?? 0),
    trips: best >= 1 ? Math.ceil(total / best) : 0,
    maxParts,
    plan,
    case: part,
    plannerRuns: runs,
  };
}
