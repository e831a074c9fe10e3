/**
 * The integrator's step and the run's clock. The step is chosen per train (integratorSteps): the largest that
 * divides the control interval, stays within the stability limit and keeps every coupling's peak within
 * 0.5 % of a fine reference. The reference here is the same model integrated at 0.1 ms, 30–60 times finer:
 * leapfrog converges as the step shrinks (tests/core/dynamics.reference.test.ts checks the model itself against
 * an independent integrator), so the fine run stands for the exact solution of the model's equations.
 */
import { describe, expect, it } from "vitest";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { bunchedSlackM, CONTROL_INTERVAL_S, integratorSteps, modelFromCase, RUN_OUT_SLACK_M, stabilityTimeStep } from "../../src/core/train/trainModel.js";
import { sequenceControls, simulate } from "../../src/core/dynamics/simulate.js";
import { Run } from "../../src/core/dynamics/runner.js";
import { planStart } from "../../src/core/planner/plan.js";
import type { StartCase } from "../../src/core/train/types.js";

const lib = builtinLibrary();
const demo = (id: string) => builtinCaseJson.find((j) => (j as { id: string }).id === id) as Record<string, unknown>;

function parsed(json: Record<string, unknown>): StartCase {
  const r = parseStartCase(json, lib);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

/** Trains that differ in what limits the step: run-out of bunched slack, light wagons, screw couplings and buffers. */
const trains: Array<[string, StartCase]> = [
  // 60 loaded hoppers on a dip: 3 m of slack bunched at the start, the run-out the finer step is for (on a
  // dry, sanded rail: on the demo's frost it needs assistance and has no steps to replay).
  ["ore train on a dip (run-out of 3 m of bunched slack)", parsed({ ...demo("demo-ore-lantern"), conditions: { rail: "dry", sand: true, temperature_C: -8 } })],
  // Empty hoppers: the lightest wagons make the stability limit the tighter one.
  [
    "60 empty hoppers, bunched (stability-limited)",
    parsed({
      ...demo("demo-aggregate-ashvale"),
      train: { trailingMass_t: 1300, wagons: 60, length_m: 840, couplerSlack_mm: 75, bearing: "roller", couplerLimit_kN: 850, wagonType: "bogie-hopper-empty", slackState: "bunched" },
      location: { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 2000 },
    }),
  ],
  // Screw couplings with pre-loaded buffers.
  ["covered goods, screw couplings and buffers", parsed({ ...demo("demo-goods-cinderfield"), conditions: { rail: "dry", sand: true, temperature_C: 10 } })],
  // 1 m of bunched slack: below the run-out threshold, so the rolling step throughout.
  [
    "40 ore wagons with 25 mm slack",
    parsed({ ...demo("demo-ore-lantern"), train: { ...(demo("demo-ore-lantern").train as object), wagons: 40, trailingMass_t: 3600, length_m: 560, couplerSlack_mm: 25 }, conditions: { rail: "dry", sand: true, temperature_C: 5 } }),
  ],
];

describe("the integrator's step, chosen per train", () => {
  it("divides the control interval into a whole number of steps and stays within the stability limit", () => {
    for (const [, c] of trains) {
      const m = modelFromCase(c);
      const { takeUpS, rollingS } = integratorSteps(m);
      for (const dt of [takeUpS, rollingS]) {
        const perInterval = CONTROL_INTERVAL_S / dt;
        expect(Math.abs(perInterval - Math.round(perInterval))).toBeLessThan(1e-9);
        expect(dt).toBeLessThanOrEqual(stabilityTimeStep(m) + 1e-12);
      }
      expect(takeUpS).toBeLessThanOrEqual(rollingS);
    }
  });

  it("takes the finer step only for a train with metres of bunched slack to run out", () => {
    const ore = modelFromCase(trains[0]![1]);
    const short = modelFromCase(trains[3]![1]);
    expect(bunchedSlackM(ore)).toBeGreaterThan(RUN_OUT_SLACK_M);
    expect(integratorSteps(ore).takeUpS).toBeLessThan(integratorSteps(ore).rollingS);
    expect(bunchedSlackM(short)).toBeLessThan(RUN_OUT_SLACK_M);
    expect(integratorSteps(short).takeUpS).toBe(integratorSteps(short).rollingS);
  });

  // The planner's own notch timing for each train (brakes, stretch, build and a little of the acceleration),
  // run at the chosen steps and at 0.1 ms.
  it.each(trains)("%s: every coupling's peak within 0.5 % of a 0.1 ms reference", (_name, c) => {
    const plan = planStart(c, { skipMassSearch: true, skipVerification: true });
    const powerS = plan.steps[1]?.startS ?? 0;
    const lastChangeS = plan.steps[plan.steps.length - 1]?.startS ?? 0;
    expect(plan.steps.length).toBeGreaterThan(1);
    const controls = sequenceControls(
      plan.steps.map((s) => ({ notch: s.notch, atS: s.startS })),
      { trainBrakeReleaseS: 0, locoBrakeReleaseS: powerS },
    );
    const durationS = Math.min(lastChangeS + 20, powerS + 90);
    const m = modelFromCase(c);
    const ours = simulate(m, controls, { durationS });
    const fine = simulate(m, controls, { durationS, dt: 1e-4 });
    // The chosen step is much coarser than the reference (else the check would say nothing).
    expect(ours.steps).toBeLessThan(fine.steps / 25);
    const top = Math.max(fine.peakTensionN, fine.peakCompressionN);
    expect(top).toBeGreaterThan(100_000);
    for (let j = 0; j < m.n - 1; j++) {
      expect(Math.abs(ours.couplerPeakTensionN[j]! - fine.couplerPeakTensionN[j]!)).toBeLessThanOrEqual(0.005 * top);
      expect(Math.abs(ours.couplerPeakCompressionN[j]! - fine.couplerPeakCompressionN[j]!)).toBeLessThanOrEqual(0.005 * top);
    }
  });
});

describe("the run's clock", () => {
  it("is exact: a control interval lasts 0.1 s, whatever the step, and k intervals end at k × 0.1 s", () => {
    const c = trains[0]![1];
    const m = modelFromCase(c);
    const run = Run.start(m, { trainBrakeReleaseS: 0, locoBrakeReleaseS: 5 });
    run.setNotch(3);
    for (let k = 1; k <= 1500; k++) {
      // Change the step now and then, to steps that do not divide 0.1 s themselves.
      if (k === 400) run.setStep(0.0047);
      if (k === 900) run.setStep(0.0071);
      run.advanceInterval();
      expect(run.s.t).toBe(k / 10);
    }
    expect(run.steps).toBeGreaterThan(0);
  });

  it("simulate ends at the duration asked for", () => {
    const m = modelFromCase(trains[2]![1]);
    const seq = [{ notch: 1, atS: 2 }, { notch: 3, atS: 20 }, { notch: 5, atS: 40 }];
    for (const durationS of [33.3, 400]) {
      const r = simulate(m, sequenceControls(seq, { trainBrakeReleaseS: -1e6, locoBrakeReleaseS: 5 }), { durationS });
      expect(r.final.timeS).toBe(durationS);
      expect(r.stoppedBy).toBe("duration");
    }
  });
});
