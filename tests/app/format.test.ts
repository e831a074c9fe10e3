/** formatNumber writes what Intl.NumberFormat("en-GB") writes (the independent check), without loading locale data. */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatNumber } from "../../src/app/format.js";

const intl = (x: number, d: number) => {
  const s = new Intl.NumberFormat("en-GB", { minimumFractionDigits: d, maximumFractionDigits: d }).format(x);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s.replace("-", "\u2212");
};

describe("formatNumber", () => {
  it("matches Intl.NumberFormat en-GB on hand-picked values: ties, grouping, signs", () => {
    const values = [0, -0, 0.5, 1.5, 2.5, -2.5, 0.125, 0.375, 1.005, 2.675, 999.5, 999.95, 1000, 1234.5, -1234.5, 1_000_000, 12_345_678.9, 4.4482216152605, -0.0001, -0.04, -0.05, 1e15 + 0.5, 123.456];
    for (const x of values) for (const d of [0, 1, 2, 3]) expect(formatNumber(x, d), `${x} with ${d} decimals`).toBe(intl(x, d));
  });

  it("matches Intl.NumberFormat en-GB on random values of the app's range", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.integer({ min: 0, max: 3 }), (x, d) => formatNumber(x, d) === intl(x, d)),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 3000) },
    );
  });

  it("matches Intl.NumberFormat en-GB on figures with few decimals (where ties happen)", () => {
    fc.assert(
      fc.property(fc.integer({ min: -10_000_000, max: 10_000_000 }), fc.integer({ min: 1, max: 4 }), fc.integer({ min: 0, max: 3 }), (n, e, d) => {
        const x = n / 10 ** e;
        return formatNumber(x, d) === intl(x, d);
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 3000) },
    );
  });

  it("writes a dash for what is not a number", () => {
    expect(formatNumber(Number.NaN, 1)).toBe("–");
    expect(formatNumber(Number.POSITIVE_INFINITY, 0)).toBe("–");
  });
});
