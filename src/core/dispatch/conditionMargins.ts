/**
 * Margins per rail condition: for one case, the planner's verdict, the margin (available ÷ needed) and the
 * limiting reason for every rail condition, without and with sand — everything else unchanged.
 */
import { planStart } from "../planner/index.js";
import { RAIL_CONDITIONS, type RailCondition } from "../physics/types.js";
import type { Reason, Verdict } from "../planner/outcome.js";
import type { StartCase } from "../train/types.js";

export interface ConditionMargin {
  rail: RailCondition;
  sand: boolean;
  verdict: Verdict;
  /** The verdict's reasons (empty when it starts). */
  reasons: Reason[];
  /** Smallest of the adhesion, power and coupler margins. */
  margin: number;
  margins: { adhesion: number; power: number; coupler: number; distance: number };
  /** The reason with the smallest margin: what would limit first. */
  limitedBy: Reason;
}

export interface ConditionMarginOptions {
  /** Verdict runs only (no verifying re-run, acceleration followed with the one-mass model): faster. */
  quick?: boolean;
  shouldStop?: () => boolean;
  onProgress?: (fraction: number) => void;
}

/**
 * What limits: of the verdict's reasons (or of all four when it starts), the one whose margin is smallest
 * (ties in the order adhesion, power, coupler, distance).
 */
export function limitingReason(m: ConditionMargin["margins"], reasons: readonly Reason[] = []): Reason {
  const order: Reason[] = reasons.length > 0 ? [...reasons] : ["adhesion", "power", "coupler", "distance"];
  return order.reduce((best, r) => (m[r] < m[best] ? r : best), order[0]!);
}

/** The case with another rail condition and sanding. */
export function withConditions(c: StartCase, rail: RailCondition, sand: boolean): StartCase {
  return { ...c, conditions: { ...c.conditions, rail, sand } };
}

/** Every rail condition, without then with sand (12 planner runs). */
export function conditionMargins(c: StartCase, opts: ConditionMarginOptions = {}): ConditionMargin[] {
  const rows: ConditionMargin[] = [];
  const total = RAIL_CONDITIONS.length * 2;
  for (const rail of RAIL_CONDITIONS) {
    for (const sand of [false, true]) {
      const p = planStart(withConditions(c, rail, sand), {
        skipMassSearch: true,
        ...(opts.quick ? { skipVerification: true, verdictOnly: true } : {}),
        ...(opts.shouldStop ? { shouldStop: opts.shouldStop } : {}),
      });
      rows.push({ rail, sand, verdict: p.verdict, reasons: p.reasons, margin: p.margin, margins: p.margins, limitedBy: limitingReason(p.margins, p.reasons) });
      opts.onProgress?.(rows.length / total);
    }
  }
  return rows;
}
