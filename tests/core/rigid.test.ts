/**
 * The one-mass model adds up the train's resistance once and re-places vehicles on the profile only when one
 * reaches the end of its segment. Checked against Newton's law for the whole train written out here with every
 * vehicle's grade, curve and running resistance summed afresh at each 0.1 s step (the same explicit scheme).
 */
import { describe, expect, it } from "vitest";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { plannerContext, type PlannerContext } from "../../src/core/planner/context.js";
import { rigidAccelerate } from "../../src/core/planner/rigid.js";
import { notchTargetN } from "../../src/core/dynamics/runner.js";
import { adhesionSpeedFactor } from "../../src/core/physics/adhesion.js";
import { GRAVITY_MPS2 } from "../../src/core/physics/constants.js";
import { gradeAt } from "../../src/core/physics/track.js";
import { rigidResistanceAt, rigidResistanceCurve } from "../../src/core/planner/need.js";
import { notchRiskAhead, riskAheadAt, riskAheadParts } from "../../src/core/planner/search.js";
import { seededDepartures } from "../tools/departures.js";
import { longTrainCase } from "../bench/dynamics.js";

/** Resistance of the whole train at travel x and speed v, each vehicle at its own place, N. */
function trainResistanceN(ctx: PlannerContext, x: number, v: number): number {
  const m = ctx.model;
  let r = 0;
  for (let i = 0; i < m.n; i++) {
    const ch = m.chainage0M[i]! + x;
    let k = 0;
    while (ch >= m.segEndM[k]!) k++;
    r += m.davisA[i]! + m.davisB[i]! * v + m.davisC[i]! * v * v + m.massKg[i]! * (GRAVITY_MPS2 * m.segSin[k]! + m.segCurveNPerKg[k]!);
    if (v < m.fadeSpeedMps) r += m.breakawayExcessN[i]! * (1 - v / m.fadeSpeedMps);
  }
  return r;
}

describe("one-mass model", () => {
  it("over a profile of four segments gives what summing every vehicle at every step gives", () => {
    const json = builtinCaseJson.find((j) => (j as { id: string }).id === "demo-ore-lantern") as Record<string, unknown>;
    const parsed = parseStartCase({ ...json, conditions: { rail: "dry", sand: true, temperature_C: 5 }, target: { distance_m: 340 } }, builtinLibrary());
    if (!parsed.ok) throw new Error("case invalid");
    const ctx = plannerContext(parsed.value);
    const m = ctx.model;
    // The train stands across the dip: vehicles change segment many times on the way to the target.
    expect(gradeAt(parsed.value.location.track, parsed.value.location.frontAtM - 900)).toBeLessThan(0);
    const notch = 6;
    const out = rigidAccelerate(ctx, { timeS: 0, speedMps: 0, travelM: 0, notch }, () => notch, 600);

    let effMass = 0;
    for (let i = 0; i < m.n; i++) effMass += m.effMassKg[i]!;
    let v = 0;
    let x = 0;
    let t = 0;
    let reachedS: number | null = null;
    while (t < 600) {
      let f = 0;
      for (let k = 0; k < m.nl; k++) f += Math.min(notchTargetN(m, k, notch, v), m.adhesiveWeightN[k]! * ctx.mu0Median[k]! * adhesionSpeedFactor(v));
      v = Math.max(0, v + ((f - trainResistanceN(ctx, x, v)) / effMass) * 0.1);
      x += v * 0.1;
      t += 0.1;
      if (x >= 340) {
        reachedS = t;
        break;
      }
    }
    expect(reachedS).not.toBeNull();
    expect(out.reachedS).not.toBeNull();
    expect(out.reachedS!).toBeCloseTo(reachedS!, 6);
    expect(Math.abs(out.travelM - x)).toBeLessThan(1e-6 * x);
  });
});

describe("the train's resistance as a function of speed at one place (the notch rule's look ahead)", () => {
  it("summed over the train once gives what summing every vehicle at every speed gives", () => {
    // Seeded departures (grades, curves, several segments, every wagon family) and the 150-wagon train; speeds
    // at a crawl (breakaway still fading) and rolling, places from standing to well along the track.
    let checked = 0;
    for (const c of [...seededDepartures(12, 200), longTrainCase()]) {
      const ctx = plannerContext(c);
      const seg = new Int32Array(ctx.model.n);
      for (const x of [0, 37.5, 400, 2500]) {
        const curve = rigidResistanceCurve(ctx.model, x, seg);
        for (const v of [0, 0.01, 0.5 * ctx.model.fadeSpeedMps, ctx.model.fadeSpeedMps, 1, 4.2, 8.33, 20]) {
          const ref = trainResistanceN(ctx, x, v);
          expect(Math.abs(rigidResistanceAt(curve, v) - ref), `${c.train.wagons} wagons at ${x} m, ${v} m/s`).toBeLessThanOrEqual(1e-9 * Math.max(Math.abs(ref), 1));
          checked++;
        }
      }
    }
    expect(checked).toBe(13 * 4 * 8);
  });

  it("the slip risk a notch carries up to the target, its parts at the target and the corners taken once, is the same number", () => {
    let checked = 0;
    for (const c of [...seededDepartures(12, 200), longTrainCase()]) {
      const ctx = plannerContext(c);
      const top = c.target.kind === "speed" ? c.target.speedMps : Math.min(...ctx.model.locoSpecs.map((s) => s.maxSpeedMps), 40 / 3.6);
      for (let notch = 1; notch <= ctx.maxNotch; notch++) {
        const parts = riskAheadParts(ctx, notch, top);
        for (let v = 0; v < top; v += top / 37) {
          expect(riskAheadAt(ctx, notch, v, parts), `${c.train.wagons} wagons, notch ${notch}, ${v} m/s`).toBe(notchRiskAhead(ctx, notch, v));
          checked++;
        }
      }
    }
    expect(checked).toBeGreaterThan(1000);
  });
});

