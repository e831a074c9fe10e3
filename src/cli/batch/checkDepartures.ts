/**
 * Check a day's departures: for each good row, the plan's verdict, reasons and margin (with the limit it is
 * of), the largest startable and marginal masses and the cheapest assistance, worked out in a pool of worker
 * threads. Identical departures share one check and one mass search; the mass search starts from the
 * departure's own verdict, so a train that starts never shows a largest startable mass below its own.
 */
import type { LocomotiveSpec } from "../../core/physics/types.js";
import type { StartCase } from "../../core/train/types.js";
import type { AssistanceReport, DivideReport } from "../../profiles/report.js";
import type { Departure } from "./departures.js";
import type { DepartureProblem } from "../../profiles/departures.js";
import type { CheckOutcome, JobOutcome } from "./jobs.js";
import type { JobPool } from "./pool.js";

/** One answered (or refused) departure, in output units. */
export interface DepartureRow {
  id: string;
  /** CSV line (1-based, header is line 1) or JSON array index (0-based) of the row. */
  line?: number;
  index?: number;
  rail?: string;
  sand?: boolean;
  trailingMass_t?: number;
  verdict?: CheckOutcome["verdict"];
  reasons?: CheckOutcome["reasons"];
  margin?: number;
  /** The limit the margin is of. */
  binding?: CheckOutcome["binding"];
  maxStartableMass_t?: number;
  /** Largest trailing mass that is at least marginal. */
  largestMarginalMass_t?: number;
  peakCouplerForce_kN?: number;
  timeToTarget_s?: number | null;
  /** The cheapest assistance option that starts (null when none is needed or none works). */
  assistance?: AssistanceReport | null;
  /** When no option works: the largest first part that starts. */
  divide?: DivideReport | null;
  /** The assistance search was cut short by its cap. */
  searchCapped?: boolean;
  /** Why it does not start and what would change it. */
  advice?: string[];
  /** Bad input (the row names its line or index) or an internal failure. */
  error?: string;
  /** "input" for a row that could not be read, "internal" for one the calculation failed on. */
  errorKind?: "input" | "internal";
  /**
   * The error as codes, for the printout in other languages: kept beside `error` on the row itself, never
   * in the JSON or CSV (publicRow drops it), where `error` stays the English text.
   */
  problem?: RowProblem;
}

/** What is wrong with a row as data: where it is (a CSV line or a JSON index) and what. */
export type RowProblem =
  | { kind: "input"; problem: DepartureProblem }
  | { kind: "unread"; line?: number; index?: number }
  | { kind: "internal"; line?: number; index?: number; message: string };

/** A row as the JSON output gives it: without the codes behind its error. */
export function publicRow(r: DepartureRow): Omit<DepartureRow, "problem"> {
  const { problem: _codes, ...rest } = r;
  return rest;
}

export interface CheckProgress {
  done: number;
  total: number;
}

export interface CheckStats {
  /** Distinct checks and mass searches run (identical work is shared). */
  checks: number;
  massSearches: number;
  /** Time each distinct check and each mass search took on its thread, ms. */
  checkMs: number[];
  massMs: number[];
}

/** The key of a case. */
function keyOf(c: StartCase): string {
  return JSON.stringify(c);
}

/**
 * A departure's work, estimated before it is done: its vehicles (wagons and units), since a plan's work is
 * vehicle-steps. On the first 80 seeded all-different departures of the batch benchmark its rank correlation
 * with the thread time a check took is 0.73 (the trailing mass alone 0.44; a quasi-static difficulty figure
 * made it no better) — good enough to hand the long ones out first.
 */
export function estimatedCost(c: StartCase): number {
  return c.train.wagons + c.locomotives.reduce((n, g) => n + g.count, 0);
}

/**
 * In which order the distinct checks go to the pool: `costliest-first` (the default) so that a long departure
 * does not come last and leave the other threads idle at the end; `input` in the file's order (for the batch
 * benchmark's comparison). The rows are given in the file's order either way.
 */
export type CheckOrder = "costliest-first" | "input";

/** Answer every departure; bad rows come back with their error, the others with their figures. */
export async function checkDepartures(
  deps: readonly Departure[],
  pool: Pick<JobPool, "run">,
  opts: { helper?: LocomotiveSpec; onProgress?: (p: CheckProgress) => void; order?: CheckOrder } = {},
): Promise<{ rows: DepartureRow[]; stats: CheckStats }> {
  const checks = new Map<string, Promise<JobOutcome>>();
  const stats: CheckStats = { checks: 0, massSearches: 0, checkMs: [], massMs: [] };
  const timed = (p: Promise<JobOutcome>) =>
    p.then((o) => {
      if (o.kind === "check") {
        stats.checkMs.push(o.elapsedMs);
        if (o.masses) stats.massMs.push(o.masses.elapsedMs);
      } else stats.massMs.push(o.elapsedMs);
      return o;
    });
  // Queue every distinct check first, in the chosen order; the rows below then wait for theirs.
  const distinct = new Map<string, StartCase>();
  for (const d of deps) if (d.case && !distinct.has(keyOf(d.case))) distinct.set(keyOf(d.case), d.case);
  const queued = [...distinct.entries()];
  // A stable sort: equal estimates keep the file's order.
  if ((opts.order ?? "costliest-first") === "costliest-first") queued.sort(([, a], [, b]) => estimatedCost(b) - estimatedCost(a));
  for (const [k, c] of queued) {
    // The check and the largest masses in one job: the mass search is bracketed by the departure's own
    // verdict (startableMass.ts) and shares the plans it has in common with the check on that thread.
    checks.set(k, timed(pool.run({ kind: "check", case: c, masses: true, ...(opts.helper ? { helper: opts.helper } : {}) })));
    stats.checks++;
    stats.massSearches++;
  }
  let done = 0;
  const total = deps.length;
  const tick = () => opts.onProgress?.({ done: ++done, total });
  const rows = deps.map(async (d): Promise<DepartureRow> => {
    const base: DepartureRow = { id: d.id, ...(d.line !== undefined ? { line: d.line } : {}), ...(d.index !== undefined ? { index: d.index } : {}) };
    if (!d.case) {
      tick();
      const at = d.line !== undefined ? { line: d.line } : { index: d.index ?? 0 };
      const problem: RowProblem | undefined = d.problem ? { kind: "input", problem: d.problem } : d.error === undefined ? { kind: "unread", ...at } : undefined;
      return { ...base, error: d.error ?? `${d.where}: cannot be read`, errorKind: "input", ...(problem ? { problem } : {}) };
    }
    const c = d.case;
    const check = checks.get(keyOf(c))!;
    const described: DepartureRow = { ...base, rail: c.conditions.rail, sand: c.conditions.sand, trailingMass_t: Math.round(c.train.trailingMassKg / 1000) };
    try {
      const o = (await check) as CheckOutcome;
      const m = o.masses!;
      return {
        ...described,
        verdict: o.verdict,
        reasons: o.reasons,
        margin: o.margin,
        binding: o.binding,
        maxStartableMass_t: Math.floor(m.maxStartableMassKg / 1000),
        largestMarginalMass_t: Math.floor(m.largestMarginalMassKg / 1000),
        peakCouplerForce_kN: o.peakCouplerForce_kN,
        timeToTarget_s: o.timeToTarget_s,
        assistance: o.assistance,
        divide: o.divide,
        ...(o.searchCapped ? { searchCapped: true } : {}),
        ...(o.advice.length > 0 ? { advice: o.advice } : {}),
      };
    } catch (e) {
      const message = (e as Error).message;
      const at = d.line !== undefined ? { line: d.line } : { index: d.index ?? 0 };
      return { ...described, error: `${d.where}: internal error: ${message}`, errorKind: "internal", problem: { kind: "internal", ...at, message } };
    } finally {
      tick();
    }
  });
  return { rows: await Promise.all(rows), stats };
}
