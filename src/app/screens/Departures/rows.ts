/**
 * The rows of a departures check: one per departure, answered by a `check` request or carrying the
 * error of its line; sorted by risk for the screen (needs assistance first, then marginal, each by margin,
 * then the rest); and the CSV export with `taut check --csv`'s columns and units (t, kN, s), in file order.
 */
import { sortByRisk } from "../../../profiles/riskOrder.js";
import { CHECK_CSV_HEADER, toCsv } from "../../../profiles/csv.js";
import { r } from "../../../profiles/report.js";
import type { CheckAnswer } from "../../../worker/protocol.js";
import { optionLineText } from "../shared/words.js";
import type { DepartureProblem } from "../../../profiles/departures.js";
import type { RowFailure } from "./rowErrors.js";

export interface DepartureRow {
  id: string;
  /** "line 4" or "[3]". */
  where: string;
  line?: number;
  index?: number;
  /** Position in the file (0-based), for file order. */
  order: number;
  rail?: string;
  sand?: boolean;
  trailingMassKg?: number;
  /** The answer, once it is in. */
  answer?: CheckAnswer;
  /** The row's start case as a file (to open it in Start plan and Assistance check). */
  file?: unknown;
  /** Why the row has no answer: bad input, or the calculation failed. */
  error?: string;
  /** A row the file's reader refused, as codes: shown in the language on screen (the error stays English for the export). */
  problem?: DepartureProblem;
  /** A row the planner did not answer, as codes: shown in the language on screen (the error stays English). */
  failure?: RowFailure;
  errorKind?: "input" | "internal";
}

/**
 * Risk order: needs assistance, marginal, starts (each by margin, smallest first), then rows still waiting;
 * bad rows last — the order `taut check --sort risk` gives (src/profiles/riskOrder.ts).
 */
export function byRisk(rows: readonly DepartureRow[]): DepartureRow[] {
  return sortByRisk(rows, (x) => ({ verdict: x.answer?.verdict, margin: x.answer?.margin, order: x.order, failed: x.error !== undefined }));
}

export interface DeparturesSummary {
  total: number;
  /** Rows that could be read (and so are checked). */
  checkable: number;
  /** Checked rows finished (answered, or failed in the calculation). */
  answered: number;
  needsAssistance: number;
  marginal: number;
  starts: number;
  bad: number;
}

export function summarise(rows: readonly DepartureRow[]): DeparturesSummary {
  const n = (f: (x: DepartureRow) => boolean) => rows.filter(f).length;
  return {
    total: rows.length,
    checkable: n((x) => x.errorKind !== "input"),
    answered: n((x) => x.answer !== undefined || x.errorKind === "internal"),
    needsAssistance: n((x) => x.answer?.verdict === "needs-assistance"),
    marginal: n((x) => x.answer?.verdict === "marginal"),
    starts: n((x) => x.answer?.verdict === "starts"),
    bad: n((x) => x.error !== undefined),
  };
}

/** The rows as CSV, in file order, rounded as the command line rounds them. */
export function departuresCsv(rows: readonly DepartureRow[]): string {
  const lines = [...rows]
    .sort((a, b) => a.order - b.order)
    .map((x) => {
      const a = x.answer;
      const opt = a?.assistance ?? null;
      const div = a?.divide ?? null;
      return [
        x.id,
        x.line,
        x.index,
        x.rail,
        x.sand,
        x.trailingMassKg === undefined ? undefined : Math.round(x.trailingMassKg / 1000),
        a?.verdict,
        a?.reasons.join(";"),
        a ? r(a.margin, 3) : undefined,
        a ? Math.floor(a.maxStartableMassKg / 1000) : undefined,
        a ? r(a.peakCouplerForceN / 1000, 0) : undefined,
        a ? (a.timeToTargetS === null ? null : r(a.timeToTargetS, 0)) : undefined,
        opt && a ? optionLineText(opt, a.helper.id) : a ? "" : undefined,
        opt?.verdict,
        opt ? r(opt.peakCouplerForceN / 1000, 1) : undefined,
        div?.wagons,
        div ? Math.floor(div.trailingMassKg / 1000) : undefined,
        x.error,
        a?.binding,
        a ? Math.floor(a.largestMarginalMassKg / 1000) : undefined,
      ];
    });
  return toCsv(CHECK_CSV_HEADER, lines);
}
