/**
 * The engine against an independent general-purpose integrator (odex: Hairer & Wanner's ODEX
 * Gragg–Bulirsch–Stoer extrapolation code, ported to JavaScript, from the registry) on the same equations.
 */
import { describe, expect, it } from "vitest";
import { CONTROL_INTERVAL_S, integratorSteps, RUN_OUT_STEP_S, stepDividing } from "../../src/core/train/trainModel.js";
import { engineHistory, engineModel, maxDeviationOverPeak, odexHistory, peakForceError, tenVehicleCase } from "./helpers/compare.js";
import { refDerivative } from "./helpers/referenceChain.js";

describe("engine against odex on the same equations, 10-vehicle train", () => {
  it("coupler force histories agree within 2 % of peak at the run-out step", () => {
    const c = tenVehicleCase();
    const T = 20;
    const every = 0.02;
    const ours = engineHistory(c, T, every, stepDividing(CONTROL_INTERVAL_S, RUN_OUT_STEP_S));
    const ref = odexHistory(c, T, every, 1e-9);
    expect(ref.length).toBeGreaterThan(900);
    const { dev, peak } = maxDeviationOverPeak(ours, ref);
    // The run-out puts real load on the couplings.
    expect(peak).toBeGreaterThan(100_000);
    expect(dev / peak).toBeLessThan(0.02);
  });

  it("every coupling's peak agrees within 0.5 % of the largest at the step chosen for this train", () => {
    const c = tenVehicleCase();
    const T = 20;
    // Sampled every millisecond, so the reference's peaks are not cut off between samples.
    const every = 0.001;
    const dt = integratorSteps(engineModel(c)).takeUpS;
    expect(dt).toBeGreaterThan(0.005);
    const ours = engineHistory(c, T, every, dt);
    const ref = odexHistory(c, T, every, 1e-10);
    expect(peakForceError(ours, ref)).toBeLessThan(0.005);
  });

  it("the reference equations' derivative reuses one array: the comparison does not time our allocations", () => {
    const c = tenVehicleCase();
    const f = refDerivative(c);
    const n = c.masses.length;
    const y = [...new Array<number>(n).fill(0), ...new Array<number>(n).fill(1), 0];
    const first = f(0, y);
    const copy = [...first];
    expect(f(0.5, y)).toBe(first);
    expect(first).toEqual(copy);
  });
});
