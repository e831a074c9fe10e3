/**
 * Tractive effort from power, by notch, and limited by adhesion (PHYSICS.md §3, INTERFACE.md).
 * Marks as in PHYSICS.md; each check names its source.
 */
import { describe, expect, it } from "vitest";
import {
  adhesionLimitedEffortN,
  adhesionLimitN,
  curtiusKniffler,
  effortFromPowerN,
  kmhToMps,
  notchEffortN,
} from "../../src/core/index.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";

describe("tractive effort from power", () => {
  // [S] W. J. White, "How Diesel-Electric Locomotives Operate", 1997, p. 3-10: rail power = η × engine power,
  // η ≈ 0.80–0.85. [D] F = P·η/v; F[kN] = 3.6·η·P[kW]/v[km/h]. Worked value: 3000 kW, η 0.82, 20 km/h → 442.8 kN.
  it("3000 kW engine, η 0.82, at 20 km/h: 442.8 kN [D]", () => {
    expect(effortFromPowerN(3_000_000, 0.82, kmhToMps(20)) / 1000).toBeCloseTo(442.8, 9);
  });
  it("F = 3.6·η·P/v at several speeds [D]", () => {
    for (const [v, kN] of [
      [10, 885.6],
      [30, 295.2],
      [40, 221.4],
      [60, 147.6],
      [100, 88.56],
    ] as const) {
      expect(effortFromPowerN(3_000_000, 0.82, kmhToMps(v)) / 1000).toBeCloseTo(kN, 9);
    }
  });
  it("the illustrative profiles' rail power is 80–85 % of their labelled engine power (White 1997 p. 3-10 [S])", () => {
    const lib = builtinLibrary();
    expect(lib.locomotives.size).toBeGreaterThanOrEqual(3);
    for (const { spec } of lib.locomotives.values()) {
      const m = /(\d{3,5}) kW/.exec(spec.label);
      expect(m, spec.label).not.toBeNull();
      const eta = spec.railPowerW / (Number(m![1]) * 1000);
      expect(eta).toBeGreaterThanOrEqual(0.8);
      expect(eta).toBeLessThanOrEqual(0.85);
    }
  });
});

describe("tractive effort by notch (INTERFACE.md formula)", () => {
  // INTERFACE.md: TE in notch n at speed v = min(startingTractiveEffort × notchStartingEffort[n],
  // railPower × notchPower[n] / v), v in m/s, before the adhesion limit.
  const lib = builtinLibrary();
  const loco = lib.locomotives.get("illustrative-6axle-1800")!.spec;

  it("min(current limit × share, power × share / v) in every notch and at several speeds", () => {
    for (let n = 1; n <= 8; n++) {
      for (const v of [0.3, 1, 3, 5, 10, 20, 27]) {
        const current = 380_000 * loco.notchStartingEffort[n - 1]!;
        const power = (1_500_000 * loco.notchPower[n - 1]!) / v;
        expect(notchEffortN(loco, n, v)).toBeCloseTo(Math.min(current, power), 6);
      }
    }
  });
  it("current-limited at standstill, on the power hyperbola above the crossover speed", () => {
    expect(notchEffortN(loco, 8, 0)).toBe(380_000);
    expect(notchEffortN(loco, 0, 0)).toBe(0); // idle
    const crossover = 1_500_000 / 380_000; // m/s, full notch
    expect(notchEffortN(loco, 8, crossover * 0.99)).toBeCloseTo(380_000, 6);
    expect(notchEffortN(loco, 8, crossover * 2)).toBeCloseTo(190_000, 6);
    // Power limit is P/v: doubling the speed halves the effort.
    expect(notchEffortN(loco, 8, 20) / notchEffortN(loco, 8, 10)).toBeCloseTo(0.5, 12);
  });

  // [D] PHYSICS.md §3: then ≤ u·μ·m_adh·g, μ from the rail condition and the Curtius–Kniffler shape [S].
  it("adhesion-limited TE is u·μ·m_adh·g when that is lower", () => {
    const dry = lib.adhesion.dry.median;
    const limit = loco.adhesionUtilisation * dry * loco.adhesiveMassKg * 9.80665;
    expect(limit).toBeLessThan(380_000); // adhesion limits this locomotive on dry rail at standstill
    expect(adhesionLimitedEffortN(loco, 8, 0, lib.adhesion, "dry", false)).toBeCloseTo(limit, 6);
    expect(adhesionLimitedEffortN(loco, 8, 0, lib.adhesion, "dry", false)).toBeCloseTo(adhesionLimitN(loco.adhesiveMassKg, loco.adhesionUtilisation, dry), 6);
    // At 10 km/h the coefficient follows Curtius–Kniffler: μ(10)/μ(0).
    const v = kmhToMps(10);
    const at10 = Math.min(notchEffortN(loco, 8, v), limit * (curtiusKniffler(10) / curtiusKniffler(0)));
    expect(adhesionLimitedEffortN(loco, 8, v, lib.adhesion, "dry", false)).toBeCloseTo(at10, 6);
    // In a low notch the current limit governs.
    expect(adhesionLimitedEffortN(loco, 1, 0, lib.adhesion, "dry", false)).toBeCloseTo(380_000 * 0.12, 6);
  });
});
