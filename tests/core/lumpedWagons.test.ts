/**
 * Lumped wagons (src/core/train/lumped.ts), the cheap stand-in the mass searches are guided by. References:
 *  - conservation: a body of k wagons carries their mass, axles, length and resistance (sums of per-vehicle
 *    forces; Davis 1926's terms are per vehicle), so the whole train weighs and resists the same;
 *  - springs and dead bands in series (Hooke's law, from memory: compliances add): k couplings in series
 *    stretch k times as far at one force, with k times the free slack, so the train's total free slack is the
 *    same (up to the tail block's inner couplings, which have no link behind them);
 *  - locomotives are never lumped: each stays a body of its own, in its place, with its own coupling count.
 */
import { describe, expect, it } from "vitest";
import { buildConsist, withTrailingMass, type StartCase, type Vehicle } from "../../src/core/index.js";
import { lumpedConsist, lumpedWagons, withLumpedWagons } from "../../src/core/train/lumped.js";
import { gearDeflectionM } from "../../src/core/physics/coupling.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { allDifferentDepartures } from "../bench/departures.js";

/** Seeded bench departure `k` (0-based) as a start case. */
function departure(k: number): StartCase {
  const r = parseStartCase(allDifferentDepartures(k + 1)[k], builtinLibrary());
  if (!r.ok) throw new Error(`departure ${k + 1} does not parse`);
  return r.value;
}

const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

describe("lumped wagons", () => {
  // Departure 64: a unit at the head and one at the rear, 74 loaded hoppers; departure 1: units at the head only.
  for (const k of [0, 63]) {
    const c = departure(k);
    const whole = buildConsist(c);
    const lumped = lumpedConsist(whole, 6);

    it(`departure ${k + 1}: the same mass, axles, length and resistance in about a sixth of the bodies`, () => {
      const fields: Array<(v: Vehicle) => number> = [(v) => v.massKg, (v) => v.effectiveMassKg, (v) => v.axles, (v) => v.lengthM, (v) => v.davis.aN, (v) => v.davis.bNsPerM, (v) => v.davis.cNs2PerM2, (v) => v.breakawayN];
      for (const f of fields) {
        const a = sum(whole.vehicles.map(f));
        expect(sum(lumped.vehicles.map(f))).toBeCloseTo(a, 6 - Math.ceil(Math.log10(Math.abs(a) + 1)));
      }
      const units = whole.locoIndices.length;
      expect(lumped.vehicles.length).toBeLessThanOrEqual(units + Math.ceil(c.train.wagons / 6) + units);
      expect(lumped.vehicles.length).toBeGreaterThanOrEqual(units + Math.floor(c.train.wagons / 6));
      // The bodies stand where their wagons stood: the front of the first and the rear of the last are the train's.
      const front = (v: Vehicle) => v.centreChainageM + v.lengthM / 2;
      const rear = (v: Vehicle) => v.centreChainageM - v.lengthM / 2;
      expect(front(lumped.vehicles[0]!)).toBeCloseTo(front(whole.vehicles[0]!), 6);
      expect(rear(lumped.vehicles.at(-1)!)).toBeCloseTo(rear(whole.vehicles.at(-1)!), 6);
      for (let j = 1; j < lumped.vehicles.length; j++) expect(front(lumped.vehicles[j]!)).toBeCloseTo(rear(lumped.vehicles[j - 1]!), 6);
    });

    it(`departure ${k + 1}: locomotives stay bodies of their own, in order`, () => {
      const unitsOf = (cs: typeof whole) => cs.locoIndices.map((i) => cs.vehicles[i]!.loco!.id);
      expect(unitsOf(lumped)).toEqual(unitsOf(whole));
      for (const i of lumped.locoIndices) expect(lumped.vehicles[i]!.massKg).toBe(lumped.vehicles[i]!.loco!.massKg);
      // A unit at the rear is still the last body.
      if (c.locomotives.some((g) => g.position === "rear")) expect(lumped.locoIndices.at(-1)).toBe(lumped.vehicles.length - 1);
    });

    it(`departure ${k + 1}: couplings in series — the free slack adds up, and so does a gear's stretch at one force`, () => {
      const one = whole.couplings[0]!;
      // Between two bodies of six wagons: the link and half of each body's five inner couplings, six in all.
      const j = lumped.vehicles.findIndex((v, i) => v.kind === "wagon" && lumped.vehicles[i + 1]?.kind === "wagon");
      const s = lumped.couplings[j]!.freeSlackM / one.freeSlackM;
      expect(s).toBeGreaterThan(4.5);
      for (const forceN of [1e5, 5e5, 1.5e6]) {
        expect(gearDeflectionM(lumped.couplings[j]!.draft, forceN)).toBeCloseTo(s * gearDeflectionM(one.draft, forceN), 9);
        expect(gearDeflectionM(lumped.couplings[j]!.buff, forceN)).toBeCloseTo(s * gearDeflectionM(one.buff, forceN), 9);
      }
      expect(lumped.couplings[j]!.endStopStiffnessNPerM * s).toBeCloseTo(one.endStopStiffnessNPerM, 0);
      // The train's free slack: all but the tail block's inner couplings' (at most five of them).
      const slack = (cs: typeof whole) => sum(cs.couplings.map((x) => x.freeSlackM));
      expect(slack(lumped)).toBeLessThanOrEqual(slack(whole) + 1e-9);
      expect(slack(lumped)).toBeGreaterThanOrEqual(slack(whole) - 5 * one.freeSlackM - 1e-9);
    });
  }

  it("applies only inside withLumpedWagons, and to every consist built there", () => {
    const c = withTrailingMass(departure(0), 5e6);
    const n = buildConsist(c).vehicles.length;
    expect(lumpedWagons()).toBe(1);
    const inside = withLumpedWagons(8, () => buildConsist(c).vehicles.length);
    expect(inside).toBeLessThan(n / 4);
    expect(lumpedWagons()).toBe(1);
    expect(buildConsist(c).vehicles.length).toBe(n);
    expect(() => withLumpedWagons(8, () => { throw new Error("inside"); })).toThrow("inside");
    expect(lumpedWagons()).toBe(1);
  });
});
