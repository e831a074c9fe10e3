/**
 * The settled train as one mass (src/core/dynamics/settled.ts) against the full chain throughout. After each
 * notch change the plan runs the full chain until the surge has passed and its remaining sway is measured;
 * then, while the quasi-static forces less the sway below them keep every coupling out of its
 * slack, the train runs as one mass (each coupling reported at its force plus the sway above it, a crest past
 * its peak as its new peak). The reference is the same decision (`judge`, README "How Taut decides")
 * made with the full chain to the target. Seeded departures from the batch benchmark's generator
 * (tests/bench/departures.ts), small and medium trains so it stays quick, and the 150-wagon benchmark train
 * (its tail coupling carries only the last wagon, a few kN, yet it must run as one). Agreement asked for (issue 14):
 * identical verdicts, every limit's margin within 1 %, time and distance to the target within 2 %, peak
 * coupler tension and compression within 1 %.
 *
 * Quasi-static coupler forces of a train moving as one: Newton's second law for the part of the train behind
 * each coupling (the coupling carries that part's resistance, grade force and inertia); any text on train
 * dynamics, e.g. Garg & Dukkipati, "Dynamics of Railway Vehicle Systems", 1984, ch. 9.
 */
import { afterEach, describe, expect, it } from "vitest";
import { judge } from "../../src/core/index.js";
import { brakeSchedule, setRunAsOneWhenSettled } from "../../src/core/planner/search.js";
import { notchSequence } from "../../src/core/planner/plan.js";
import { continueRun, sequenceControls, simulate } from "../../src/core/dynamics/simulate.js";
import { Run } from "../../src/core/dynamics/runner.js";
import { modelFromCase } from "../../src/core/train/trainModel.js";
import { GRAVITY_MPS2 } from "../../src/core/physics/constants.js";
import { setCreepingPeakAsOne } from "../../src/core/dynamics/settled.js";
import { seededDepartures } from "../tools/departures.js";
import { longTrainCase } from "../bench/dynamics.js";
import { decide, rel } from "./helpers/asOne.js";


afterEach(() => {
  setRunAsOneWhenSettled(true);
  setCreepingPeakAsOne(true);
});

describe("the settled train as one mass agrees with the full chain", () => {
  it("on seeded departures: verdicts, margins, time and distance to target, coupler peaks", () => {
    let engaged = 0;
    let longEngaged = false;
    const long = longTrainCase();
    for (const c of [...seededDepartures(8, 70), long]) {
      const full = decide(c, false);
      const one = decide(c, true);
      const id = `${c.train.wagons} wagons, ${c.conditions.rail}`;
      expect(one.verdict, id).toBe(full.verdict);
      expect(one.limits.map((l) => l.name), id).toEqual(full.limits.map((l) => l.name));
      full.limits.forEach((l, i) => expect(rel(one.limits[i]!.margin, l.margin), `${id}: ${l.name}`).toBeLessThanOrEqual(0.01));
      const a = full.shown.search;
      const b = one.shown.search;
      expect(b === null, id).toBe(a === null);
      if (!a || !b) continue;
      if (b.branch.run.steps < a.branch.run.steps) {
        engaged++;
        if (c === long) longEngaged = true;
      }
      expect(b.targetReachedS === null, id).toBe(a.targetReachedS === null);
      if (a.targetReachedS !== null) {
        expect(rel(b.targetReachedS! - b.powerS, a.targetReachedS - a.powerS), `${id}: time to target`).toBeLessThanOrEqual(0.02);
        expect(rel(b.targetTravelM!, a.targetTravelM!), `${id}: distance to target`).toBeLessThanOrEqual(0.02);
      }
      const compression = (r: typeof a) => r.branch.steps.reduce((m, s) => Math.max(m, s.peakCompressionN), 0);
      expect(rel(b.branch.peakTensionN(), a.branch.peakTensionN()), `${id}: peak tension`).toBeLessThanOrEqual(0.01);
      expect(rel(compression(b), compression(a)), `${id}: peak compression`).toBeLessThanOrEqual(0.01);
    }
    // The sample must exercise the cheaper model, or this test could not fail.
    expect(engaged).toBeGreaterThanOrEqual(3);
    // The 150-wagon train runs as one for part of its run to the target (not the full chain throughout).
    expect(longEngaged).toBe(true);
  });

  it("runs as one only with the quasi-static forces: each coupling carries what the train behind it needs", () => {
    // The 150-wagon benchmark train on its even 2 ‰ rise, full notch held until it has settled.
    const c = longTrainCase();
    const m = modelFromCase(c);
    const run = Run.start(m, { trainBrakeReleaseS: 0, locoBrakeReleaseS: 0 });
    run.runAsOneWhenSettled();
    run.setNotch(m.notchStride - 1);
    while (!run.runningAsOne && run.s.t < 600) {
      run.advanceInterval();
      run.observe();
    }
    expect(run.runningAsOne).toBe(true);
    run.advanceInterval();
    const s = run.s;
    const v = s.v[run.lead]!;
    const a = s.acc[run.lead]!;
    // Behind coupling j: Σ (running resistance + grade force + m(1+γ)·a − tractive effort) of the vehicles behind it.
    const sin = Math.sin(Math.atan(c.location.track.segments[0]!.gradePermille / 1000));
    let behind = 0;
    const sways: number[] = [];
    const heads: number[] = [];
    for (let j = m.n - 2; j >= 0; j--) {
      const i = j + 1;
      behind += m.davisA[i]! + (m.davisB[i]! + m.davisC[i]! * v) * v + m.massKg[i]! * GRAVITY_MPS2 * sin + m.effMassKg[i]! * a - s.tractionN[i]!;
      // The reported force is the quasi-static one plus the sway the chain showed before it settled: never
      // less, and more only by that sway (under a tenth of the head's force on this even rise).
      expect(s.couplerF[j]!).toBeGreaterThanOrEqual(behind - 1e-6 * Math.abs(behind));
      sways.push(s.couplerF[j]! - behind);
      heads.push(behind);
    }
    expect(Math.max(...sways)).toBeLessThanOrEqual(0.1 * Math.max(...heads));
  });
});

describe("a coupling at its creeping peak runs as one, its new peak reported at its crest", () => {
  it("the 150-wagon plan's notch timing: no more steps than when a new peak sent the train back, every coupling's peak never low and within 1 % high", () => {
    // The long train creeps up to speed with its head couplings at the highest force they have reached;
    // when no crest may pass the peak reached, it stays in the full chain there. Running as one, each new
    // peak is the quasi-static force plus the upward sway measured before it settled: high by at most that.
    // A settled stretch that ends before the run does (here at each notch of the acceleration but the last)
    // is run again with the full chain (runner.ts `runStretchAsChain`), so only the final stretch saves steps.
    const c = longTrainCase();
    const d = judge(c);
    const r = d.shown.search!;
    const ctx = d.shown.ctx;
    const m = modelFromCase(c);
    const controls = sequenceControls(notchSequence(ctx, r.branch.steps), brakeSchedule(ctx));
    const durationS = r.branch.run.s.t;
    const asOne = { durationS, runAsOneWhenSettled: { fromS: r.buildEndS ?? r.powerS } };
    const full = simulate(m, controls, { durationS });
    setCreepingPeakAsOne(false);
    const noNewPeak = simulate(m, controls, asOne);
    setCreepingPeakAsOne(true);
    const one = simulate(m, controls, asOne);
    expect(one.steps).toBeLessThanOrEqual(noNewPeak.steps);
    expect(one.steps).toBeLessThan(full.steps);
    expect(rel(one.peakTensionN, full.peakTensionN)).toBeLessThanOrEqual(0.01);
    expect(one.peakTensionN).toBeGreaterThanOrEqual(full.peakTensionN * (1 - 0.001));
    for (let j = 0; j < m.n - 1; j++) {
      expect(rel(one.couplerPeakTensionN[j]!, full.couplerPeakTensionN[j]!), `coupling ${j}`).toBeLessThanOrEqual(0.01);
      expect(rel(one.couplerPeakCompressionN[j]!, full.couplerPeakCompressionN[j]!), `coupling ${j}`).toBeLessThanOrEqual(0.01);
      expect(one.couplerPeakTensionN[j]!, `coupling ${j} low`).toBeGreaterThanOrEqual(full.couplerPeakTensionN[j]! * (1 - 0.001));
      expect(one.couplerPeakCompressionN[j]!, `coupling ${j} low`).toBeGreaterThanOrEqual(full.couplerPeakCompressionN[j]! * (1 - 0.001));
    }
    expect(rel(one.final.leadSpeedMps, full.final.leadSpeedMps)).toBeLessThanOrEqual(0.01);
    expect(rel(one.final.leadTravelM, full.final.leadTravelM)).toBeLessThanOrEqual(0.01);
  });
});

describe("the verifying re-run shares the plan's preparing", () => {
  it("starting where the plan's preparing ended gives exactly the re-run from standing", () => {
    // The reference is the re-run made from standing on the median rail (what the plan's verification was
    // before it shared the preparing); with the brakes released and no slip, the better rail changes nothing.
    const c = longTrainCase();
    const d = judge(c);
    const r = d.shown.search!;
    const ctx = d.shown.ctx;
    const median = modelFromCase(c, { adhesionQuantile: 0.5 });
    const seq = notchSequence(ctx, r.branch.steps);
    const controls = sequenceControls(seq, brakeSchedule(ctx));
    const opts = { durationS: r.branch.steps[2]!.startS + 30 };
    const fresh = simulate(median, controls, opts);
    const prepared = r.prepared.cloneOnBetterRail(median);
    expect(prepared).not.toBeNull();
    const shared = continueRun(prepared!, controls, opts);
    expect(shared.final).toEqual(fresh.final);
    expect(shared.peakTensionN).toBe(fresh.peakTensionN);
    expect(shared.peakCompressionN).toBe(fresh.peakCompressionN);
    expect(Array.from(shared.couplerPeakTensionN)).toEqual(Array.from(fresh.couplerPeakTensionN));
    expect(shared.slipEpisodes).toEqual(fresh.slipEpisodes);
    expect(Array.from(shared.series.leadSpeedMps)).toEqual(Array.from(fresh.series.leadSpeedMps));
    // A worse rail than the plan's is no such rail: no sharing.
    expect(r.prepared.cloneOnBetterRail(modelFromCase(c, { adhesionQuantile: 0.01 }))).toBeNull();
  });
});
