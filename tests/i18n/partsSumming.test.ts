/**
 * A printed breakdown adds up to its printed total: the largest-remainder method (Hamilton's method; Balinski &
 * Young, "Fair Representation", 1982) — each part rounded down, the missing units to the largest remainders.
 * Checked against that definition written out here, on random parts of either sign.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { partsSummingTo, roundHalfAway } from "../../src/i18n/rounding.js";

describe("partsSummingTo", () => {
  it("worked examples: rounded alone they would not add up", () => {
    // 12.7 + 24.6 + 120.65 + 28.45 = 186.4 → 186; rounded alone 13 + 25 + 121 + 28 = 187, one too many:
    // rounded down 12 + 24 + 120 + 28 = 184, two units to the largest remainders (0.7 and 0.65).
    expect(partsSummingTo([12.7, 24.6, 120.65, 28.45])).toEqual([13, 24, 121, 28]);
    // -55.4 + 10.3 + 0.3 = -44.8 → -45, which rounding alone already gives: unchanged.
    expect(partsSummingTo([-55.4, 10.3, 0.3])).toEqual([-55, 10, 0]);
  });

  it("adds up to the total rounded alike, each part within one unit, unchanged when rounding alone already adds up", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5000, max: 5000, noNaN: true }), { minLength: 1, maxLength: 6 }), fc.integer({ min: 0, max: 2 }), (parts, d) => {
        const got = partsSummingTo(parts, d);
        const scale = 10 ** d;
        const sum = Math.round(got.reduce((a, b) => a + b * scale, 0));
        expect(sum).toBe(Math.round(roundHalfAway(parts.reduce((a, b) => a + b, 0), d) * scale));
        got.forEach((g, i) => expect(Math.abs(g - parts[i]!)).toBeLessThan(1 / scale + 1e-9));
        const alone = parts.map((p) => roundHalfAway(p, d));
        if (Math.round(alone.reduce((a, b) => a + b * scale, 0)) === sum) expect(got).toEqual(alone);
      }),
      { seed: 20261203, numRuns: 500 },
    );
  });
});
