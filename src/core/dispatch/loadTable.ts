/**
 * Load table: the largest trailing mass that starts at a location with a locomotive set, for every
 * rail condition, with and without sand. Each cell is the make-up's largest startable mass (startableMass.ts:
 * the same decision and search as the plan's, these wagons; the figure every train of this make-up reads
 * unless its own verdict disagrees with it), so the cell's mass starts and one within 0.5 % above it does
 * not. Rows are independent: one can be computed on its own (in a worker).
 */
import { largestStartableMassKg, startableMasses } from "../planner/startableMass.js";
import { RAIL_CONDITIONS, type RailCondition } from "../physics/types.js";
import type { StartCase } from "../train/types.js";

export interface LoadTableRow {
  rail: RailCondition;
  sand: boolean;
  maxTrailingMassKg: number;
}

export interface LoadTableOptions {
  shouldStop?: () => boolean;
  /** With a custom `starts`: stop the bisection when the bracket is this narrow, kg (default 500). */
  toleranceKg?: number;
  /** Called after each row with the fraction done. */
  onProgress?: (fraction: number) => void;
}

/** The rows of a table, in order: every rail condition, without then with sand. */
export function loadTableCells(): Array<{ rail: RailCondition; sand: boolean }> {
  return RAIL_CONDITIONS.flatMap((rail) => [false, true].map((sand) => ({ rail, sand })));
}

/**
 * One row: the largest trailing mass for a rail condition and sanding. With `starts` given, a plain bisection
 * over that verdict; by default the plan's largest startable mass.
 */
export function loadTableRow(
  base: StartCase,
  rail: RailCondition,
  sand: boolean,
  starts?: (c: StartCase) => boolean,
  opts: Pick<LoadTableOptions, "shouldStop" | "toleranceKg"> = {},
): LoadTableRow {
  const c: StartCase = { ...base, conditions: { ...base.conditions, rail, sand } };
  const kg = starts
    ? largestStartableMassKg(c, starts, opts.toleranceKg !== undefined ? { toleranceKg: opts.toleranceKg } : {})
    : startableMasses(c, { startsOnly: true, ofMakeUp: true, ...(opts.shouldStop ? { shouldStop: opts.shouldStop } : {}) }).startsKg;
  return { rail, sand, maxTrailingMassKg: kg };
}

/** Every rail condition, without then with sand. `base` supplies location, locomotives and the train make-up. */
export function loadTable(base: StartCase, starts?: (c: StartCase) => boolean, opts: LoadTableOptions = {}): LoadTableRow[] {
  const cells = loadTableCells();
  return cells.map(({ rail, sand }, k) => {
    const row = loadTableRow(base, rail, sand, starts, opts);
    opts.onProgress?.((k + 1) / cells.length);
    return row;
  });
}
