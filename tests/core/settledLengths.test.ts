/**
 * The settled train as one mass (src/core/dynamics/settled.ts) against the full chain throughout, on seeded
 * departures of every length from 15 to 150 wagons (tests/bench/departures.ts, two that start in each band of
 * lengths, and every departure looked at on the way, starting or not): the decision (`judge`) made both ways
 * gives identical verdicts, every limit's margin within 1 %, time to target within 2 % (issue 14). Then the
 * plan's own notch timing replayed both ways (`simulate`, the same controls): the train's peak tension and
 * compression within 1 %. Coupling by coupling the peaks are not asserted: one reached after the train went
 * back to the chain can come out up to 3 % low (tests/bench/settleWindow.ts prints them).
 */
import { afterEach, describe, expect, it } from "vitest";
import { judge, type StartCase } from "../../src/core/index.js";
import { brakeSchedule, setRunAsOneWhenSettled } from "../../src/core/planner/search.js";
import { notchSequence } from "../../src/core/planner/plan.js";
import { sequenceControls, simulate } from "../../src/core/dynamics/simulate.js";
import { modelFromCase } from "../../src/core/train/trainModel.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { allDifferentDepartures } from "../bench/departures.js";

const rel = (x: number, ref: number): number => (x === ref ? 0 : Math.abs(x - ref) / Math.max(Math.abs(ref), 1e-9));

function decide(c: StartCase, asOne: boolean) {
  setRunAsOneWhenSettled(asOne);
  try {
    return judge(c);
  } finally {
    setRunAsOneWhenSettled(true);
  }
}

afterEach(() => setRunAsOneWhenSettled(true));

/** Bands of train length, wagons (upper bound exclusive). */
const BANDS: Array<[number, number]> = [
  [15, 35],
  [35, 60],
  [60, 85],
  [85, 110],
  [110, 130],
  [130, 151],
];

/** The first two seeded departures in each band that start (a plan to compare), with their decisions. */
function sample(): Array<{ c: StartCase; full: ReturnType<typeof judge>; one: ReturnType<typeof judge> }> {
  const lib = builtinLibrary();
  const picked = BANDS.map(() => [] as Array<{ c: StartCase; full: ReturnType<typeof judge>; one: ReturnType<typeof judge> }>);
  for (const d of allDifferentDepartures(200, 20261202)) {
    const r = parseStartCase(d, lib);
    if (!r.ok) throw new Error(`generated departure ${String(d.id)} does not parse`);
    const c = r.value;
    const b = BANDS.findIndex(([lo, hi]) => c.train.wagons >= lo && c.train.wagons < hi);
    if (b < 0 || picked[b]!.length >= 2) continue;
    const full = decide(c, false);
    const one = decide(c, true);
    // Verdicts and margins are compared on every departure looked at, starting or not.
    const id = `${c.train.wagons} wagons, ${c.conditions.rail}`;
    expect(one.verdict, id).toBe(full.verdict);
    expect(one.limits.map((l) => l.name), id).toEqual(full.limits.map((l) => l.name));
    full.limits.forEach((l, i) => expect(rel(one.limits[i]!.margin, l.margin), `${id}: ${l.name}`).toBeLessThanOrEqual(0.01));
    if (full.shown.search && one.shown.search) picked[b]!.push({ c, full, one });
    if (picked.every((p) => p.length >= 2)) break;
  }
  return picked.flat();
}

describe("the settled train as one mass agrees with the full chain at every length", () => {
  it("seeded departures of 15–150 wagons: verdicts, margins, time to target, the train's peaks", () => {
    const cases = sample();
    expect(cases.length).toBe(2 * BANDS.length);
    let settledSomewhere = 0;
    for (const { c, full, one } of cases) {
      const id = `${c.train.wagons} wagons, ${c.conditions.rail}`;
      const a = full.shown.search!;
      const b = one.shown.search!;
      expect(b.targetReachedS === null, id).toBe(a.targetReachedS === null);
      if (a.targetReachedS !== null) expect(rel(b.targetReachedS! - b.powerS, a.targetReachedS - a.powerS), `${id}: time to target`).toBeLessThanOrEqual(0.02);
      // The plan the app shows (made running as one), replayed with the full chain and as one.
      const ctx = one.shown.ctx;
      const m = modelFromCase(c);
      const controls = sequenceControls(notchSequence(ctx, b.branch.steps), brakeSchedule(ctx));
      const durationS = b.branch.run.s.t;
      const ref = simulate(m, controls, { durationS });
      const asOne = simulate(m, controls, { durationS, runAsOneWhenSettled: { fromS: b.buildEndS ?? b.powerS } });
      if (asOne.steps < ref.steps) settledSomewhere++;
      expect(rel(asOne.peakTensionN, ref.peakTensionN), `${id}: peak tension`).toBeLessThanOrEqual(0.01);
      expect(rel(asOne.peakCompressionN, ref.peakCompressionN), `${id}: peak compression`).toBeLessThanOrEqual(0.01);
    }
    // The sample must exercise the cheaper model, or this test could not fail.
    expect(settledSomewhere).toBeGreaterThanOrEqual(3);
  });
});
