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
import { applyBrakes, applyBrakesFrom, createState, evaluate, mayBreakAway, setActiveOnlyStepping, setBrakeChangeHeldCheck, vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";
import { cloneState, setQuiescentActiveOnly, workByPhase } from "../../src/core/dynamics/runner.js";
import { modelFromCase } from "../../src/core/train/trainModel.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { seededDepartures } from "../tools/departures.js";

afterEach(() => {
  setActiveOnlyStepping(true);
  setBrakeChangeHeldCheck(true);
  setQuiescentActiveOnly(true);
});

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

describe("the brakes set only where they can be changing (applyBrakesFrom)", () => {
  it("gives every vehicle the capacity, and makes restless the vehicles, that setting every vehicle gives", () => {
    // The reference is `applyBrakes`, which works out every vehicle's brake from the release schedule at each
    // call; the claim is exactness over a whole release (wagons released in order down the train, the
    // locomotive brake eased off meanwhile), at a step's pace and at a control interval's.
    let compared = 0;
    let differ = 0;
    for (const [, c] of [...demos(), ...seededDepartures(4, 200).map((x): [string, StartCase] => ["", x])]) {
      const m = modelFromCase(c);
      const trainReleaseS = 0.7;
      const locoReleaseS = 30;
      for (const dt of [0.0137, 0.1]) {
        // A run sets every vehicle's brake when it starts (Run's constructor), then only what can change.
        const a = createState(m);
        const b = createState(m);
        applyBrakes(m, a, trainReleaseS, locoReleaseS);
        applyBrakes(m, b, trainReleaseS, locoReleaseS);
        let done = 0;
        const end = trainReleaseS + Math.max(...m.brakeReleaseDelayS) + m.brakeReleaseRampS + 5;
        while (a.t < Math.max(end, locoReleaseS + 5)) {
          a.t = b.t = a.t + dt;
          a.restless.fill(0);
          b.restless.fill(0);
          applyBrakes(m, a, trainReleaseS, locoReleaseS);
          done = applyBrakesFrom(m, b, trainReleaseS, locoReleaseS, done);
          for (let i = 0; i < m.n; i++) if (b.brakeN[i] !== a.brakeN[i] || b.restless[i] !== a.restless[i]) differ++;
          compared++;
        }
        // Every wagon's train brake is off in the end, and counted released for good.
        expect(done).toBe(Array.from(m.trainBrakeN).filter((tb, i) => tb > 0 && !(m.locoBrakeN[i]! > 0)).length);
      }
    }
    expect(differ).toBe(0);
    expect(compared).toBeGreaterThan(1000);
  });
});

describe("a brake change makes its vehicle restless only when it may break away (mayBreakAway)", () => {
  it("agrees with the evaluation itself on every standing vehicle, at brakes around what holds it", () => {
    // The reference is `evaluate`: a standing vehicle moves at the next evaluation exactly when what pushes it
    // passes what holds it. Each standing vehicle's brake is set from none to more than grade and coupling
    // forces push with, on trains standing on grades and changes of grade (seeded departures).
    let held = 0;
    let freed = 0;
    for (const c of seededDepartures(12, 120)) {
      const m = modelFromCase(c);
      const base = createState(m);
      base.brakeN.fill(0);
      evaluate(m, base, 0);
      for (let i = 0; i < m.n; i++) {
        if (base.v[i] !== 0) continue;
        const a0 = base.acc[i]!;
        for (const brakeN of [0, 1, 1e3, 1e4, 5e4, 1e5, 3e5]) {
          const s = cloneState(base);
          s.acc.fill(0);
          s.brakeN[i] = brakeN;
          const predicted = mayBreakAway(m, s, i);
          const e = cloneState(s);
          evaluate(m, e, 0);
          expect(predicted, `vehicle ${i}, brake ${brakeN} N, first acceleration ${a0}`).toBe(e.acc[i] !== 0);
          if (predicted) freed++;
          else held++;
        }
      }
    }
    // Both answers occur (the test tells them apart).
    expect(held).toBeGreaterThan(100);
    expect(freed).toBeGreaterThan(100);
  });

  it("the same plans with less work in the brake release than making every brake change restless and evaluating every vehicle while all stand", () => {
    // The reference: every brake change makes its vehicle restless, and a quiescent interval (everything
    // standing and held) evaluates every vehicle — the full evaluation of what `stepActive` and
    // `evaluateActive` skip. Seeded departures of up to 120 wagons, some standing for a minute or more
    // while the brake release runs down the train.
    const cases = seededDepartures(10, 120);
    const work = (on: boolean) => {
      setBrakeChangeHeldCheck(on);
      setQuiescentActiveOnly(on);
      const before = vehicleStepsDone();
      const quiet = workByPhase()[0]!;
      const plans = cases.map((c) => planStart(c, { skipMassSearch: true }));
      return { plans, work: vehicleStepsDone() - before, quiescentEvaluations: workByPhase()[0]! - quiet };
    };
    const every = work(false);
    const only = work(true);
    cases.forEach((_, k) => expect(isDeepStrictEqual(only.plans[k], every.plans[k]), `departure ${k}`).toBe(true));
    expect(only.work).toBeLessThan(every.work);
    expect(every.quiescentEvaluations).toBeGreaterThan(0);
    expect(only.quiescentEvaluations).toBeLessThan(0.5 * every.quiescentEvaluations);
  });
});
