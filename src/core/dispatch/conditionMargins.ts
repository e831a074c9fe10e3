/**
 * Margins per rail condition: for one case, the verdict, the binding margin and the limit that binds for
 * every rail condition, without and with sand — everything else unchanged. The same decision as the plan
 * (decision.ts), so a row for the case's own condition reads exactly as its plan.
 */
import { judge } from "../planner/decision.js";
import { reasonMargins } from "../planner/plan.js";
import { RAIL_CONDITIONS, type RailCondition } from "../physics/types.js";
import type { LimitName, Reason, Verdict } from "../planner/outcome.js";
import type { PlanResult } from "../planner/types.js";
import type { StartCase } from "../train/types.js";

export interface ConditionMargin {
  rail: RailCondition;
  sand: boolean;
  verdict: Verdict;
  /** The verdict's reasons (empty when it starts). */
  reasons: Reason[];
  /** The binding limit's margin (the smallest); starts ⇔ margin ≥ 1. */
  margin: number;
  margins: PlanResult["margins"];
  /** The reason of the binding limit: what limits first. */
  limitedBy: Reason;
  /** The binding limit itself. */
  binding: LimitName;
}

export interface ConditionMarginOptions {
  /** Kept for callers that asked for verdict runs only: every row is the decision itself now. */
  quick?: boolean;
  shouldStop?: () => boolean;
  onProgress?: (fraction: number) => void;
}

/**
 * What limits: of the verdict's reasons (or of all when it starts), the one whose margin is smallest
 * (ties in the order adhesion, power, coupler, distance, brake).
 */
export function limitingReason(m: ConditionMargin["margins"], reasons: readonly Reason[] = []): Reason {
  const order: Reason[] = reasons.length > 0 ? [...reasons] : ["adhesion", "power", "coupler", "distance", "brake"];
  return order.reduce((best, r) => (m[r] < m[best] ? r : best), order[0]!);
}

/** The case with another rail condition and sanding. */
export function withConditions(c: StartCase, rail: RailCondition, sand: boolean): StartCase {
  return { ...c, conditions: { ...c.conditions, rail, sand } };
}

/** One row: the decision for a rail condition and sanding. */
export function conditionMargin(c: StartCase, rail: RailCondition, sand: boolean, shouldStop?: () => boolean): ConditionMargin {
  const d = judge(withConditions(c, rail, sand), shouldStop ? { shouldStop } : {});
  const binding = d.limits.find((l) => l.name === d.binding)!;
  return { rail, sand, verdict: d.verdict, reasons: d.reasons, margin: d.margin, margins: reasonMargins(d.limits), limitedBy: binding.reason, binding: d.binding };
}

/** Every rail condition, without then with sand (12 decisions). */
export function conditionMargins(c: StartCase, opts: ConditionMarginOptions = {}): ConditionMargin[] {
  const rows: ConditionMargin[] = [];
  const total = RAIL_CONDITIONS.length * 2;
  for (const rail of RAIL_CONDITIONS) {
    for (const sand of [false, true]) {
      rows.push(conditionMargin(c, rail, sand, opts.shouldStop));
      opts.onProgress?.(rows.length / total);
    }
  }
  return rows;
}
