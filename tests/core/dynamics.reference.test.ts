/**
 * The engine against an independent general-purpose integrator (odex: Hairer & Wanner's ODEX
 * Gragg–Bulirsch–Stoer extrapolation code, ported to JavaScript, from the registry) on the same equations.
 */
import { describe, expect, it } from "vitest";
import { engineHistory, maxDeviationOverPeak, odexHistory, tenVehicleCase } from "./helpers/compare.js";

describe("engine against odex on the same equations, 10-vehicle train", () => {
  it("coupler force histories agree within 2 % of peak", () => {
    const c = tenVehicleCase();
    const T = 20;
    const every = 0.02;
    const ours = engineHistory(c, T, every);
    const ref = odexHistory(c, T, every, 1e-9);
    expect(ref.length).toBeGreaterThan(900);
    const { dev, peak } = maxDeviationOverPeak(ours, ref);
    // The run-out puts real load on the couplings.
    expect(peak).toBeGreaterThan(100_000);
    expect(dev / peak).toBeLessThan(0.02);
  });
});
