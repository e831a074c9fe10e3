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
  it("inch, mile, square foot, kip and horsepower", () => {
    // NIST SP 811 Appendix B.8: inch = 2.54E-02 m (exact); mile (international) = 1.609344E+03 m (exact);
    // square foot = 9.290304E-02 m² (exact); kip (1000 lbf) = 4.448222E+03 N; horsepower (550 ft·lbf/s) = 7.456999E+02 W.
    expect(convert("length", 1, "in", "m")).toBeCloseTo(0.0254, 15);
    expect(convert("length", 1, "mi", "m")).toBeCloseTo(1609.344, 9);
    expect(convert("area", 1, "ft2", "m2")).toBeCloseTo(0.09290304, 15);
    expect(convert("force", 1, "klbf", "N")).toBeCloseTo(4448.222, 3);
    expect(convert("power", 1, "hp", "W")).toBeCloseTo(745.6999, 4);
  });
  it("specific resistance: 1 lb per short ton is g/2 N per tonne", () => {
    // [D] from the NIST factors: 1 lbf = 0.45359237 kg × g_n, 1 short ton = 2000 × 0.45359237 kg.
    expect(convert("specificForce", 1, "lbfPerShortTon", "NPerT")).toBeCloseTo(9.80665 / 2, 12);
    expect(convert("grade", 10, "permille", "percent")).toBeCloseTo(1, 15);
  });
});
