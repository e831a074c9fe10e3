/**
 * Load table: the largest trailing mass that starts at a location with a locomotive set, for every
 * rail condition, with and without sand. Computed by bisection over the same verdict the planner gives,
 * so a mass just below a table value starts and one just above does not.
 */
import { plannerStarts } from "./planner/index.js";
import { largestStartableMassKg } from "./startableMass.js";
import { RAIL_CONDITIONS, type RailCondition, type StartCase } from "./types.js";

export interface LoadTableRow {
  rail: RailCondition;
  sand: boolean;
  maxTrailingMassKg: number;
}


/** Every rail condition, without then with sand. `base` supplies location, locomotives and the train make-up. */
export function loadTable(base: StartCase, starts: (c: StartCase) => boolean = plannerStarts): LoadTableRow[] {
  const rows: LoadTableRow[] = [];
  for (const rail of RAIL_CONDITIONS) {
    for (const sand of [false, true]) {
      const c: StartCase = { ...base, conditions: { ...base.conditions, rail, sand } };
      rows.push({ rail, sand, maxTrailingMassKg: largestStartableMassKg(c, starts) });
    }
  }
  return rows;
}
