import { describe, expect, it } from "vitest";
import { convert, convertTemperature, KG_PER_SHORT_TON, M_PER_FT, MPS_PER_MPH, NEWTONS_PER_LBF } from "../../src/core/index.js";

// Source: NIST SP 811 (2008), Appendix B — exact conversion factors.
describe("unit conversions against NIST SP 811 factors", () => {
  it("pound-force", () => {
    expect(convert("force", 1, "lbf", "N")).toBe(4.4482216152605);
    expect(convert("force", 1000, "N", "lbf")).toBeCloseTo(1000 / 4.4482216152605, 12);
    expect(NEWTONS_PER_LBF).toBe(4.4482216152605);
  });
  it("short ton (2000 lb avoirdupois)", () => {
    expect(convert("mass", 1, "shortTon", "kg")).toBe(907.18474);
    expect(KG_PER_SHORT_TON).toBe(2000 * 0.45359237);
    expect(convert("mass", 1, "t", "shortTon")).toBeCloseTo(1.10231131, 8);
  });
  it("mile per hour and foot", () => {
    expect(convert("speed", 1, "mph", "mps")).toBe(0.44704);
    expect(MPS_PER_MPH).toBe((5280 * 0.3048) / 3600);
    expect(convert("length", 1, "ft", "m")).toBe(0.3048);
    expect(M_PER_FT).toBe(0.3048);
    expect(convert("speed", 36, "kmh", "mps")).toBeCloseTo(10, 12);
  });
  it("round trips", () => {
    for (const v of [0, 1, 12.5, -3, 1e6]) {
      expect(convert("force", convert("force", v, "kN", "lbf"), "lbf", "kN")).toBeCloseTo(v, 9);
      expect(convertTemperature(convertTemperature(v, "C", "F"), "F", "C")).toBeCloseTo(v, 9);
    }
    expect(convertTemperature(-40, "C", "F")).toBe(-40);
    expect(convertTemperature(100, "C", "F")).toBe(212);
  });
});
