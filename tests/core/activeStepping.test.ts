/**
 * Integrating only the vehicles that can change while most of the train rests (`stepActive`,
 * src/core/dynamics/dynamics.ts) against integrating every vehicle at every step. The reference is the full
 * integration itself: the claim is exactness (a resting vehicle between resting neighbours, its brake
 * unchanged, would be given exactly what it holds), so the plans must be identical — every figure, series,
 * coupler peak and step — on the demo cases and seeded departures from the batch benchmark's generator
 * (tests/bench/departures.ts), with less work (vehicle-steps) where part of the train rests.
 */
import { isDeepStrictEqual } from "node:util";
import { afterEach, describe, expect, it } from "vitest";
import { planStart, type StartCase } from "../../src/core/index.js";
import { setActiveOnlyStepping, vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { seededDepartures } from "../tools/departures.js";

afterEach(() => setActiveOnlyStepping(true));

function plan(c: StartCase, activeOnly: boolean) {
  setActiveOnlyStepping(activeOnly);
  const before = vehicleStepsDone();
  const p = planStart(c, { skipMassSearch: true });
  return { p, work: vehicleStepsDone() - before };
}

function demos(): Array<[string, StartCase]> {
  const lib = builtinLibrary();
  return builtinCaseJson.map((j) => {
    const r = parseStartCase(j, lib);
    if (!r.ok) throw new Error("demo case invalid");
    return [String((j as { id: string }).id), r.value];
  });
}

describe("integrating only the vehicles that can change gives the full integration's plan", () => {
  it("identical plans on the demos and seeded departures, with less work", () => {
    const cases: Array<[string, StartCase]> = [...demos(), ...seededDepartures(10, 80).map((c): [string, StartCase] => [`${c.train.wagons} wagons, ${c.conditions.rail}`, c])];
    let full = 0;
    let active = 0;
    for (const [id, c] of cases) {
      const a = plan(c, false);
      const b = plan(c, true);
      expect(b.p.verdict, id).toBe(a.p.verdict);
      expect(Array.from(b.p.couplerPeaksN), id).toEqual(Array.from(a.p.couplerPeaksN));
      expect(Array.from(b.p.couplerCompressionPeaksN), id).toEqual(Array.from(a.p.couplerCompressionPeaksN));
      // Every figure, the series and the steps included (-0 and +0 told apart).
      expect(isDeepStrictEqual(b.p, a.p), id).toBe(true);
      expect(b.work, id).toBeLessThanOrEqual(a.work);
      full += a.work;
      active += b.work;
    }
    expect(active).toBeLessThan(0.9 * full);
  });
});
