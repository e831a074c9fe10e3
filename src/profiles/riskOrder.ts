/**
 * The order "most at risk first" for a day's departures, the same in the app's Departures screen and in
 * `taut check --sort risk`: needs assistance, then marginal, then starts — each by margin, smallest first,
 * the margin compared as it is printed (three decimals, as in the JSON and CSV) so that two rows that read
 * the same are not put in different orders by a difference nobody sees — then rows still being worked out,
 * then rows that could not be answered; ties keep the file's order.
 */
import type { Verdict } from "../core/planner/outcome.js";
import { roundHalfAway } from "./numbers.js";

export interface RiskKey {
  verdict?: Verdict | undefined;
  margin?: number | undefined;
  /** Place in the file (0-based). */
  order: number;
  /** The row could not be answered. */
  failed?: boolean;
}

const RANK: Record<Verdict, number> = { "needs-assistance": 0, marginal: 1, starts: 2 };

function rank(k: RiskKey): number {
  if (k.failed) return 4;
  return k.verdict !== undefined ? RANK[k.verdict] : 3;
}

/** Negative when `a` is more at risk than `b` (for Array.prototype.sort). */
export function compareRisk(a: RiskKey, b: RiskKey): number {
  const byRank = rank(a) - rank(b);
  if (byRank !== 0) return byRank;
  if (a.verdict !== undefined && b.verdict !== undefined && a.margin !== undefined && b.margin !== undefined) {
    const byMargin = roundHalfAway(a.margin, 3) - roundHalfAway(b.margin, 3);
    if (byMargin !== 0) return byMargin;
  }
  return a.order - b.order;
}

/** The rows most at risk first (a sorted copy). */
export function sortByRisk<T>(rows: readonly T[], key: (row: T, index: number) => RiskKey): T[] {
  const keyed = rows.map((row, i) => ({ row, k: key(row, i) }));
  keyed.sort((x, y) => compareRisk(x.k, y.k));
  return keyed.map((x) => x.row);
}
