/**
 * A plan as JSON text and back, exactly: typed arrays, NaN and the infinities survive (plain JSON would turn
 * them into objects and nulls). Used for the demo plan worked out at build time and shown at first load.
 * Numbers round-trip bit for bit: JSON writes the shortest decimal that reads back as the same double.
 */
import type { PlanResult } from "../core/planner/types.js";

const F64 = "$f64";
const NUM = "$num";

/** JSON text of a plan. */
export function encodePlan(plan: PlanResult): string {
  return encodeExact(plan);
}

/** The plan back from `encodePlan`'s text. */
export function decodePlan(text: string): PlanResult {
  return decodeExact(text) as PlanResult;
}

/** JSON text of any value made of plain objects, arrays, numbers (any double), strings and Float64Arrays. */
export function encodeExact(x: unknown): string {
  return JSON.stringify(x, (_key, value: unknown) => {
    // Tagged by name, not instanceof: an array made in another realm (a worker, a test environment) counts too.
    if (Object.prototype.toString.call(value) === "[object Float64Array]") {
      return { [F64]: Array.from(value as Float64Array, (x) => (Number.isFinite(x) ? x : { [NUM]: String(x) })) };
    }
    if (typeof value === "number" && !Number.isFinite(value)) return { [NUM]: String(value) };
    return value;
  });
}

/** The value back from `encodeExact`'s text. */
export function decodeExact(text: string): unknown {
  return JSON.parse(text, (_key, value: unknown) => {
    if (value && typeof value === "object") {
      const o = value as Record<string, unknown>;
      if (NUM in o) return Number(o[NUM]);
      if (F64 in o) return Float64Array.from(o[F64] as number[]);
    }
    return value;
  });
}
