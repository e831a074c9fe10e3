/**
 * The settled train as one mass (src/core/dynamics/settled.ts) against the full chain throughout, on seeded
 * departures of every length from 15 to 150 wagons (tests/bench/departures.ts, two that start in each band of
 * lengths, and every departure looked at on the way, starting or not): the decision (`judge`) made both ways
 * gives identical verdicts, every limit's margin within 1 %, time to target within 2 % (issue 14). Then the
 * plan's own notch timing replayed both ways (`simulate`, the same controls): the train's peak tension and
 * compression, and every coupling's own peak (the app draws each), never more than 0.1 % low (figures err
 * high, never low); the train's peaks within 1 % high.
 *
 * A coupling's peak reached after the train went back to the chain once came out up to 3 % low: the chain
 * started again without the sway it keeps (the settled train cannot hand it back), and that sway adds to the
 * next surge. A settled stretch that ends before the run does is now run again with the full chain, so only
 * the run's final stretch is run as one, and it errs high by its sway allowance (1.1 × the sway measured,
 * at least 1 kN): coupling by coupling up to 2.6 % high among the first 100 departures (a 52-wagon train's
 * light rear couplings, where 1 kN is a few per cent), hence the bound of 3 % high on a coupling's own peak.
 * The second test takes the departures among the first 100 (tests/bench/departures.ts) on which a coupling
 * came out more than 0.1 % low that way (found with `tests/bench/settleWindow.ts --different 100`).
 */
import { afterEach, describe, expect, it } from "vitest";
import { judge, type StartCase } from "../../src/core/index.js";
import { brakeSchedule, setRunAsOneWhenSettled } from "../../src/core/planner/search.js";
import { notchSequence } from "../../src/core/planner/plan.js";
import { sequenceControls, simulate } from "../../src/core/dynamics/simulate.js";
import { modelFromCase } from "../../src/core/train/trainModel.js";
import { allDifferentCases } from "../tools/departures.js";
import { decide, rel } from "./helpers/asOne.js";


afterEach(() => setRunAsOneWhenSettled(true));

type Decision = ReturnType<typeof judge>;

/** A figure as one may be this much lower than the full chain's (rounding), and a coupling's own peak this much higher. */
const LOW = 0.001;
const COUPLING_HIGH = 0.03;

/**
 * Identical verdicts and limits; every margin within 1 %. Not one-sided: the search's own moments (when the
 * next notch is called) follow what it observes, so the plan made running as one may call a notch a few
 * tenths of a second from the full chain's (departure 25 below: 216.9 s against 216.6 s) and its margins are
 * a slightly different plan's, either side (there up to 0.9 % higher, on departure 0 0.3 % lower). The plan's own
 * figures are held one-sided against the full chain in `comparePeaks`: a peak never low, so its margin never high.
 */
function compareDecisions(id: string, full: Decision, one: Decision): void {
  expect(one.verdict, id).toBe(full.verdict);
  expect(one.limits.map((l) => l.name), id).toEqual(full.limits.map((l) => l.name));
  full.limits.forEach((l, i) => expect(rel(one.limits[i]!.margin, l.margin), `${id}: ${l.name}`).toBeLessThanOrEqual(0.01));
}

/**
 * The plan the app shows (made running as one), replayed with the full chain and as one: the train's peaks
 * and every coupling's own peak (1 kN and more) never more than 0.1 % low; the train's within 1 % high,
 * a coupling's within 3 % high. True when the replay as one ran as one somewhere.
 */
function comparePeaks(id: string, c: StartCase, one: Decision): boolean {
  const b = one.shown.search!;
  const ctx = one.shown.ctx;
  const m = modelFromCase(c);
  const controls = sequenceControls(notchSequence(ctx, b.branch.steps), brakeSchedule(ctx));
  const durationS = b.branch.run.s.t;
  const ref = simulate(m, controls, { durationS });
  const asOne = simulate(m, controls, { durationS, runAsOneWhenSettled: { fromS: b.buildEndS ?? b.powerS } });
  const within = (x: number, r: number, high: number, what: string) => {
    expect((x - r) / r, `${id}: ${what} low`).toBeGreaterThanOrEqual(-LOW);
    expect((x - r) / r, `${id}: ${what} high`).toBeLessThanOrEqual(high);
  };
  within(asOne.peakTensionN, ref.peakTensionN, 0.01, "peak tension");
  if (ref.peakCompressionN >= 1000) within(asOne.peakCompressionN, ref.peakCompressionN, 0.01, "peak compression");
  for (let j = 0; j < m.n - 1; j++) {
    if (ref.couplerPeakTensionN[j]! >= 1000) within(asOne.couplerPeakTensionN[j]!, ref.couplerPeakTensionN[j]!, COUPLING_HIGH, `coupling ${j} tension`);
    if (ref.couplerPeakCompressionN[j]! >= 1000) within(asOne.couplerPeakCompressionN[j]!, ref.couplerPeakCompressionN[j]!, COUPLING_HIGH, `coupling ${j} compression`);
  }
  return asOne.steps < ref.steps;
}

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
  const picked = BANDS.map(() => [] as Array<{ c: StartCase; full: ReturnType<typeof judge>; one: ReturnType<typeof judge> }>);
  for (const c of allDifferentCases(200)) {
    const b = BANDS.findIndex(([lo, hi]) => c.train.wagons >= lo && c.train.wagons < hi);
    if (b < 0 || picked[b]!.length >= 2) continue;
    const full = decide(c, false);
    const one = decide(c, true);
    // Verdicts and margins are compared on every departure looked at, starting or not.
    const id = `${c.train.wagons} wagons, ${c.conditions.rail}`;
    expect(one.verdict, id).toBe(full.verdict);
    expect(one.limits.map((l) => l.name), id).toEqual(full.limits.map((l) => l.name));
    compareDecisions(id, full, one);
    if (full.shown.search && one.shown.search) picked[b]!.push({ c, full, one });
    if (picked.every((p) => p.length >= 2)) break;
  }
  return picked.flat();
}

describe("the settled train as one mass agrees with the full chain at every length", () => {
  it("seeded departures of 15–150 wagons: verdicts, margins, time to target, the train's and every coupling's peaks", () => {
    const cases = sample();
    expect(cases.length).toBe(2 * BANDS.length);
    let settledSomewhere = 0;
    for (const { c, full, one } of cases) {
      const id = `${c.train.wagons} wagons, ${c.conditions.rail}`;
      const a = full.shown.search!;
      const b = one.shown.search!;
      expect(b.targetReachedS === null, id).toBe(a.targetReachedS === null);
      if (a.targetReachedS !== null) expect(rel(b.targetReachedS! - b.powerS, a.targetReachedS - a.powerS), `${id}: time to target`).toBeLessThanOrEqual(0.02);
      if (comparePeaks(id, c, one)) settledSomewhere++;
    }
    // The sample must exercise the cheaper model, or this test could not fail.
    expect(settledSomewhere).toBeGreaterThanOrEqual(3);
  });

  it("the departures whose couplings came out low after the train went back to the chain: no figure low now", () => {
    const all = allDifferentCases(100);
    let settledSomewhere = 0;
    for (const k of [0, 8, 25, 32, 39, 50, 62, 66, 97]) {
      const c = all[k]!;
      const full = decide(c, false);
      const one = decide(c, true);
      const id = `departure ${k}: ${c.train.wagons} wagons, ${c.conditions.rail}`;
      compareDecisions(id, full, one);
      expect(one.shown.search, id).not.toBeNull();
      if (comparePeaks(id, c, one)) settledSomewhere++;
    }
    // Some of them still end their run as one (the final stretch), or the high side would go untested.
    expect(settledSomewhere).toBeGreaterThanOrEqual(2);
  });
});
