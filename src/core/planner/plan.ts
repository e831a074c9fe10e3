/**
 * The start planner with its searches: planBody.ts's plan, the largest masses from startableMass.ts and the
 * sensitivity table from sensitivity.ts.
 * Everything else a plan is made of is in planBody.ts (re-exported here, so callers import one module).
 */
import { startableMasses } from "./startableMass.js";
import { sensitivity } from "./sensitivity.js";
import { planStartWith, type MassSearch, type PlanSearches } from "./planBody.js";
import type { StartCase } from "../train/types.js";
import type { PlanOptions, PlanResult } from "./types.js";

export * from "./planBody.js";

/** The largest masses of a case whose own verdict is known, as a plan reports them. */
const planMasses: MassSearch = (c, own, opts) =>
  startableMasses(c, { own, ...(opts.shouldStop ? { shouldStop: opts.shouldStop } : {}), ...(opts.massVerdictAt ? { verdictAt: opts.massVerdictAt } : {}) });

const searches: PlanSearches = { masses: planMasses, sensitivity };

/** Plan the start of a case. Throws a "cancelled" error when `shouldStop` says so. */
export function planStart(c: StartCase, opts: PlanOptions = {}): PlanResult {
  return planStartWith(c, opts, searches);
}

/** Largest trailing mass that starts, kg (startableMass.ts). */
export function maxStartableMassKg(c: StartCase, shouldStop?: () => boolean): number {
  return startableMasses(c, { startsOnly: true, ...(shouldStop ? { shouldStop } : {}) }).startsKg;
}
