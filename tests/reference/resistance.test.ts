/**
 * Resistance against published rules and worked examples (PHYSICS.md §1). Marks: [P] read in the
 * source, [S] quoted second-hand, [M] from memory, [D] arithmetic on those. Each check names its source.
 */
import { describe, expect, it } from "vitest";
import {
  breakawayResistancePermille,
  curveResistancePerDegreePermille,
  curveResistancePermille,
  davisCoefficients,
  degreeOfCurve,
  gradeForceN,
  GRAVITY_MPS2,
  KG_PER_SHORT_TON,
  M_PER_FT,
  MPS_PER_MPH,
  NEWTONS_PER_LBF,
  runningResistanceN,
} from "../../src/core/index.js";

/** Force per short ton of train, lbf/ton, from a force on `massKg`. */
const lbPerTon = (forceN: number, massKg: number): number => forceN / NEWTONS_PER_LBF / (massKg / KG_PER_SHORT_TON);
/** Specific resistance ‰ (N per kN of weight) as lb per short ton: 1 ‰ of 2000 lb is 2 lb. */
const permilleToLbPerTon = (permille: number): number => 2 * permille;

describe("grade resistance", () => {
  // [P] US Army Transportation School, TR 0603 "Railway operations", §2.7:
  // grade resistance is 20 lb per short ton per 1 % of grade.
  it("20 lbf per short ton per 1 % grade (TR 0603 §2.7 [P])", () => {
    const oneTon = KG_PER_SHORT_TON;
    const measured = lbPerTon(gradeForceN(oneTon, 10), oneTon);
    // The rule is the small-angle form (W·i); ours is exact, W·sin(atan i). They differ by the
    // factor sin(atan 0.01)/0.01 = 0.99995, i.e. by 0.001 lb/ton at 1 %.
    const smallAngleGap = 20 * (1 - Math.sin(Math.atan(0.01)) / 0.01);
    expect(Math.abs(measured - 20)).toBeLessThanOrEqual(smallAngleGap + 1e-9);
    expect(measured).toBeGreaterThan(19.99);
    // The rule is linear in the grade: 2 % gives 40 lb/ton, again within the small-angle gap (0.008 lb/ton).
    const gap2 = 40 * (1 - Math.sin(Math.atan(0.02)) / 0.02);
    expect(Math.abs(lbPerTon(gradeForceN(oneTon, 20), oneTon) - 40)).toBeLessThanOrEqual(gap2 + 1e-9);
  });

  // [D] exact form m·g·sin(atan i), g = 9.80665 m/s² (standard gravity); small angle: 1 ‰ ≈ 1 daN/t.
  it("1 t on 10 ‰ is 98.06 N (exact form) ≈ 98.07 N (small angle) [D]", () => {
    const f = gradeForceN(1000, 10);
    expect(f).toBeCloseTo(1000 * 9.80665 * Math.sin(Math.atan(0.01)), 9);
    expect(f).toBeCloseTo(98.0616, 4);
    expect(Math.abs(f - 98.0665) / 98.0665).toBeLessThan(1e-4); // 1 ‰ ≈ 9.80665 N/t
  });

  it("is signed: negative on a falling grade, zero on the level [D]", () => {
    expect(gradeForceN(1000, -10)).toBeCloseTo(-gradeForceN(1000, 10), 12);
    expect(gradeForceN(1000, -10)).toBeLessThan(0);
    expect(gradeForceN(1000, 0)).toBe(0);
  });
});

describe("curve resistance", () => {
  // [S] Röckl (standard gauge), as quoted in PHYSICS.md §1: R ≥ 300 m: 650/(R − 55) ‰; R < 300 m: 500/(R − 30) ‰.
  // Taken literally the branches jump at 300 m (2.653 ‰ above, 1.852 ‰ just below); we use their monotone
  // envelope [D]: each branch's own value wherever it is above the 300 m value, that value held flat between.
  it("Röckl where either branch is above the join, and no jump at 300 m [S][D]", () => {
    expect(curveResistancePermille(300)).toBeCloseTo(650 / 245, 12);
    expect(curveResistancePermille(300)).toBeCloseTo(2.653, 3);
    expect(curveResistancePermille(500)).toBeCloseTo(650 / 445, 12);
    expect(curveResistancePermille(1000)).toBeCloseTo(650 / 945, 12);
    // Small-radius branch where it gives more than the 300 m value: below 30 + 500·245/650 = 218.46 m.
    expect(curveResistancePermille(200)).toBeCloseTo(500 / 170, 12);
    expect(curveResistancePermille(100)).toBeCloseTo(500 / 70, 12);
    // Between the join and 218.46 m the 300 m value is held: a sharper curve never resists less.
    expect(curveResistancePermille(300 - 1e-9)).toBeCloseTo(650 / 245, 9);
    expect(curveResistancePermille(250)).toBeCloseTo(650 / 245, 12);
    expect(curveResistancePermille(30 + (500 * 245) / 650)).toBeCloseTo(650 / 245, 9);
    expect(curveResistancePermille(0)).toBe(0); // straight track
  });

  // [D] degree of curve on a 100 ft arc: D = (100 / R[ft]) rad = 5729.578 / R[ft] degrees.
  it("degree of curve is exact: D·R[ft] = 5729.578, and 10° is R = 174.64 m [D]", () => {
    for (const r of [100, 174.6375, 300, 500, 1746.375]) {
      expect(degreeOfCurve(r) * (r / 0.3048)).toBeCloseTo((100 * 180) / Math.PI, 9);
      expect(degreeOfCurve(r) * (r / 0.3048)).toBeCloseTo(5729.578, 3);
    }
    expect(degreeOfCurve((5729.5779513 / 10) * M_PER_FT)).toBeCloseTo(10, 6);
  });

  // [P] TR 0603 §2.8: curve resistance 0.8 lb per short ton per degree of curve; worked example 10° → 8 lb/ton.
  it("per-degree rule: 10° of curve gives 8 lb/ton (TR 0603 §2.8 [P])", () => {
    const r10 = (5729.5779513 / 10) * M_PER_FT;
    expect(permilleToLbPerTon(curveResistancePerDegreePermille(r10))).toBeCloseTo(8, 6);
  });

  // Cross-check of two sources: per-degree rule (TR 0603 §2.8 [P]) against Röckl [S], R = 300…1000 m.
  it("per-degree rule is within 15 % of Röckl for R = 300…1000 m, within 5 % at 500 m", () => {
    let worst = 0;
    for (let r = 300; r <= 1000; r += 10) {
      const rel = Math.abs(curveResistancePerDegreePermille(r) / curveResistancePermille(r) - 1);
      worst = Math.max(worst, rel);
    }
    expect(worst).toBeLessThan(0.15);
    expect(worst).toBeGreaterThan(0.1); // the gap is largest at 300 m (≈ 12 %): the check is not vacuous
    expect(Math.abs(curveResistancePerDegreePermille(500) / curveResistancePermille(500) - 1)).toBeLessThan(0.05);
  });
});

describe("running resistance (Davis)", () => {
  // [S] Car and Locomotive Cyclopedia, 1970, p. 842 (Davis equation with K·A = 0.044): 7200 short tons of
  // 143-ton 4-axle cars at 50 mph → 36,939 lb, 5.130 lb/ton. Davis form: W. J. Davis Jr., General Electric
  // Review 29, 1926 [M]. K·A = 0.044 is reproduced here as K = 0.0005 × A = 88 ft².
  it("7200 short tons of 143-ton cars at 50 mph: 36,939 lb, 5.130 lb/ton [S]", () => {
    const car = davisCoefficients({ massKg: 143 * KG_PER_SHORT_TON, axles: 4, b: 0.045, k: 0.0005, frontalAreaM2: 88 * M_PER_FT * M_PER_FT });
    const cars = 7200 / 143;
    const totalLb = (runningResistanceN(car, 50 * MPS_PER_MPH) * cars) / NEWTONS_PER_LBF;
    expect(Math.round(totalLb)).toBe(36_939);
    expect(totalLb / 7200).toBeCloseTo(5.13, 3);
  });

  // [M] Davis 1926: at rest only 1.3·W + 29·n remains.
  it("at rest only the journal and flange terms remain: 1.3·W + 29·n lb [M]", () => {
    const car = davisCoefficients({ massKg: 100 * KG_PER_SHORT_TON, axles: 4, b: 0.045, k: 0.0005, frontalAreaM2: 8 });
    expect(runningResistanceN(car, 0) / NEWTONS_PER_LBF).toBeCloseTo(1.3 * 100 + 29 * 4, 9);
    // Symmetric in direction of motion: resistance always opposes motion.
    expect(runningResistanceN(car, -10)).toBeCloseTo(runningResistanceN(car, 10), 9);
  });
});

describe("breakaway (starting) resistance", () => {
  // [M] W. W. Hay, Railroad Engineering, 2nd ed. 1982 (from memory): roller bearings ≈ 5 lb/ton, rising
  // to ≈ 10–15 lb/ton in severe cold; plain bearings 18–25 lb/ton above freezing, 25–35 below.
  // These check our arithmetic and unit handling (lb/ton ↔ ‰), not the world.
  it("roller ≈ 5 lb/ton when warm, 10–15 lb/ton in severe cold [M]", () => {
    expect(permilleToLbPerTon(breakawayResistancePermille("roller", 10))).toBeCloseTo(5, 9);
    const cold = permilleToLbPerTon(breakawayResistancePermille("roller", -35));
    expect(cold).toBeGreaterThanOrEqual(10);
    expect(cold).toBeLessThanOrEqual(15);
  });
  it("plain 18–25 lb/ton above freezing, 25–35 below [M]", () => {
    const warm = permilleToLbPerTon(breakawayResistancePermille("plain", 10));
    expect(warm).toBeGreaterThanOrEqual(18);
    expect(warm).toBeLessThanOrEqual(25);
    const cold = permilleToLbPerTon(breakawayResistancePermille("plain", -20));
    expect(cold).toBeGreaterThanOrEqual(25);
    expect(cold).toBeLessThanOrEqual(35);
  });
  it("1 lb per short ton is 4.903 N/t (NIST SP 811 factors) [D]", () => {
    // Specific resistance in ‰ is N per kN of weight; 1 lb/ton = 0.5 ‰ = 0.5·g N/t.
    expect((NEWTONS_PER_LBF / KG_PER_SHORT_TON) * 1000).toBeCloseTo(0.5 * GRAVITY_MPS2, 9);
  });
});
