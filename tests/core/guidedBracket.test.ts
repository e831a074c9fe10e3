/**
 * The margin-guided search for the largest mass (src/core/planner/guidedBracket.ts) against thresholds known
 * in closed form. A limit whose allowance is fixed and whose demand grows linearly with the mass,
 * margin = F ÷ (a + b·m), crosses 1 at m* = (F − a) ÷ b (algebra); the search must end with a bracket that
 * holds at its lower end, fails at its upper end, contains m* and is no wider than the tolerance — whatever
 * the margin does, since the verdict alone settles each end. Margins that guide badly (a jump, a margin
 * stuck at its cap, a margin that lies) must still give the bisection's answer.
 */
import { describe, expect, it } from "vitest";
import { guidedLargestMass, type GuidedSearch, type MassJudgement } from "../../src/core/planner/guidedBracket.js";

const search = (over: Partial<GuidedSearch> = {}): GuidedSearch => ({
  floorKg: 20_000,
  ceilingKg: 50_000_000,
  relativeTolerance: 0.005,
  toleranceKg: 2000,
  minToleranceKg: 50,
  startKg: 1_500_000,
  ...over,
});

/** A linear demand against a fixed allowance: holds exactly up to (F − a) ÷ b. */
function linearLimit(F: number, a: number, b: number): { at: (m: number) => MassJudgement; thresholdKg: number; calls: () => number } {
  let n = 0;
  return {
    at: (m) => {
      n++;
      const score = F / (a + b * m);
      return { holds: score >= 1, score };
    },
    thresholdKg: (F - a) / b,
    calls: () => n,
  };
}

function expectBracket(lo: number, hi: number | null, thresholdKg: number, s: GuidedSearch): void {
  expect(lo).toBeLessThanOrEqual(thresholdKg);
  expect(hi).not.toBeNull();
  expect(hi!).toBeGreaterThan(thresholdKg);
  expect(hi! - lo).toBeLessThanOrEqual(Math.min(s.toleranceKg, Math.max(s.minToleranceKg, s.relativeTolerance * lo)));
}

describe("guided search for the largest mass", () => {
  it("closes on a linear demand's crossing (F ÷ (a + b·m) = 1) from above and from below in a few judgements", () => {
    for (const start of [300_000, 1_500_000, 9_000_000]) {
      const lim = linearLimit(600_000, 50_000, 0.25); // m* = 2,200 t
      const s = search({ startKg: start });
      const b = guidedLargestMass(lim.at, s);
      expectBracket(b.lo, b.hi, lim.thresholdKg, s);
      // A bisection from [floor, 4 × start] to 2 t takes 11 or more; the line needs about four.
      expect(lim.calls()).toBeLessThanOrEqual(6);
    }
  });

  it("keeps the bracket it is given: the mass known to hold and the one known to fail", () => {
    const lim = linearLimit(600_000, 50_000, 0.25);
    const s = search({ holdsKg: 2_000_000, failsKg: 3_000_000, startKg: 2_000_000 });
    const b = guidedLargestMass(lim.at, s);
    expectBracket(b.lo, b.hi, lim.thresholdKg, s);
  });

  it("gives none (lo 0) when even the floor fails, and the ceiling when it holds", () => {
    const none = linearLimit(1000, 5000, 1); // fails everywhere
    expect(guidedLargestMass(none.at, search())).toEqual({ lo: 0, hi: 20_000 });
    const any = linearLimit(1e12, 0, 1e-6); // holds up to 10¹⁸ kg
    expect(guidedLargestMass(any.at, search()).lo).toBe(50_000_000);
  });

  it("a limit that jumps (a different notch above a mass) still ends at the verdict's change", () => {
    // The margin follows one line below 1,800 t and drops to another above it: the verdict changes at 1,800 t.
    const at = (m: number): MassJudgement => {
      const score = m <= 1_800_000 ? 900_000 / (50_000 + 0.25 * m) : 200_000 / (50_000 + 0.25 * m);
      return { holds: score >= 1, score };
    };
    const s = search();
    const b = guidedLargestMass(at, s);
    expectBracket(b.lo, b.hi, 1_800_000, s);
  });

  it("a margin that does not guide (stuck at its cap, or lying) gives a bisection's answer", () => {
    const thresholdKg = 2_345_000;
    for (const score of [() => 99, () => Number.NaN, (m: number) => m / 1e5]) {
      const at = (m: number): MassJudgement => ({ holds: m <= thresholdKg, score: score(m) });
      const s = search();
      const b = guidedLargestMass(at, s);
      expectBracket(b.lo, b.hi, thresholdKg, s);
    }
  });
});
