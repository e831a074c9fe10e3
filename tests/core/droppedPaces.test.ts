/**
 * Build paces certain to be dropped, not run on (src/core/planner/search.ts, `setCutDroppedPaces`): a plan
 * tries the build paces shortest first and keeps the first whose coupler peak stays within the allowance (the
 * last whatever it gives), so a pace before the last whose peak has gone beyond the allowance — the peaks only
 * grow along a run — can only be dropped. The reference is the search running every pace to its end: the
 * plans must be identical, every figure, series, step and peak, on seeded departures from the batch
 * benchmark's generator (tests/bench/departures.ts), with less work where a pace is cut. Some of them get a
 * larger coupler safety factor (a lower allowance), so that the stretch already passes the allowance (every
 * pace before the last is not started) or a pace passes it on the way (cut there); without those the cut
 * would never act and this test could not fail.
 */
import { isDeepStrictEqual } from "node:util";
import { afterEach, describe, expect, it } from "vitest";
import { judge, planStart, type StartCase } from "../../src/core/index.js";
import { logSearchTries, setCutDroppedPaces, type SearchTry } from "../../src/core/planner/search.js";
import { vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import { seededDepartures } from "../tools/departures.js";

afterEach(() => {
  setCutDroppedPaces(true);
  logSearchTries(null);
});

function withSafetyFactor(c: StartCase, times: number): StartCase {
  return { ...c, settings: { ...c.settings, couplerSafetyFactor: c.settings.couplerSafetyFactor * times } };
}

function plan(c: StartCase, cut: boolean, log: SearchTry[]) {
  setCutDroppedPaces(cut);
  logSearchTries(log);
  const before = vehicleStepsDone();
  const p = planStart(c, { skipMassSearch: true });
  // A verdict-only judgement (as a mass search makes it): its plans stop once a limit has failed.
  const j = judge(c, { depth: "marginal", stopWhenFailed: true });
  const work = vehicleStepsDone() - before;
  logSearchTries(null);
  return { p, j, work };
}

/** A judgement's plans, every figure (the search results: steps, peaks, series, the run's state). */
const searches = (d: ReturnType<typeof judge>) => [d.threshold.search, d.bound?.search ?? null];

describe("build paces certain to be dropped are not run on", () => {
  it("identical plans on seeded departures, with less work where a pace is cut", () => {
    const sample = seededDepartures(14, 60);
    // [departure, safety factor ×]: the first three keep their first pace with a peak within 1 % below the
    // allowance (a cut any earlier would change their plans); the last three pass it, in the stretch already
    // (2) or on the way (13, 8), and keep the last pace.
    const picked: Array<[number, number]> = [
      [2, 3],
      [13, 4.4],
      [8, 5.4],
      [2, 3.25],
      [13, 4.5],
      [8, 5.5],
    ];
    let notStarted = 0;
    let cutOnTheWay = 0;
    let full = 0;
    let cut = 0;
    for (const [k, times] of picked) {
      const c = withSafetyFactor(sample[k]!, times);
      const id = `departure ${k + 1}, ${c.train.wagons} wagons, safety factor × ${times}`;
      const a = plan(c, false, []);
      const log: SearchTry[] = [];
      const b = plan(c, true, log);
      expect(b.p.verdict, id).toBe(a.p.verdict);
      expect(Array.from(b.p.couplerPeaksN), id).toEqual(Array.from(a.p.couplerPeaksN));
      // Every figure, the series and the steps included (-0 and +0 told apart).
      expect(isDeepStrictEqual(b.p, a.p), id).toBe(true);
      expect(b.j.verdict, id).toBe(a.j.verdict);
      expect(b.j.margin, id).toBe(a.j.margin);
      expect(isDeepStrictEqual(b.j.limits, a.j.limits), id).toBe(true);
      expect(isDeepStrictEqual(searches(b.j), searches(a.j)), id).toBe(true);
      expect(b.work, id).toBeLessThanOrEqual(a.work);
      for (const t of log) {
        if (t.phase !== "build" || t.kept) continue;
        if (t.simS === 0) notStarted++;
        else cutOnTheWay++;
      }
      full += a.work;
      cut += b.work;
    }
    // Both ways of cutting occur, and they save work.
    expect(notStarted).toBeGreaterThan(0);
    expect(cutOnTheWay).toBeGreaterThan(0);
    expect(cut).toBeLessThan(full);
  });
});
