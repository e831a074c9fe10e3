/** The settled train run as one mass against the full chain: shared by the tests that compare the two. */
import { judge, type StartCase } from "../../../src/core/index.js";
import { setRunAsOneWhenSettled } from "../../../src/core/planner/search.js";

/** |x − ref| ÷ |ref| (0 when equal). */
export const rel = (x: number, ref: number): number => (x === ref ? 0 : Math.abs(x - ref) / Math.max(Math.abs(ref), 1e-9));

/** The case's decision with the settled train run as one (`asOne`) or the full chain throughout. */
export function decide(c: StartCase, asOne: boolean): ReturnType<typeof judge> {
  setRunAsOneWhenSettled(asOne);
  try {
    return judge(c);
  } finally {
    setRunAsOneWhenSettled(true);
  }
}
