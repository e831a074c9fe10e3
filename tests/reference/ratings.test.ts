/**
 * Tonnage ratings of the trade (PHYSICS.md §6), reproduced through the core's own functions.
 * The running rating at continuous tractive effort and the starting check are different questions and
 * are kept apart: the first uses the continuous TE and running resistance; the second (last block) uses the
 * starting effort and the breakaway resistance of the standing train. Marks as in PHYSICS.md.
 */
import { describe, expect, it } from "vitest";
import {
  curveResistancePerDegreePermille,
  gradeForceN,
  grossTrailingLoadKg,
  GRAVITY_MPS2,
  KG_PER_SHORT_TON,
  largestStartableMassKg,
  loadTable,
  M_PER_FT,
  NEWTONS_PER_LBF,
  ratingDrawbarPullN,
  ratingTons,
  rulingGradePermille,
  staticCheck,
  withAddedUnits,
  type StartCase,
} from "../../src/core/index.js";
import { ampleAdhesion, testLoco, testWagon, uniformCase } from "../tools/cases.js";

const lbf = (x: number): number => x * NEWTONS_PER_LBF;
const shortTons = (x: number): number => x * KG_PER_SHORT_TON;
/** A specific resistance in lb per short ton as force per unit weight (N/N): 1 lb/ton = 1/2000. */
const perWeight = (lbPerTon: number): number => lbPerTon / 2000;

describe("gross trailing load at continuous tractive effort (TR 0603 §2.10–2.11 [P])", () => {
  // [P] US Army Transportation School, TR 0603 "Railway operations", §2.10–2.11: GTL = DBP·W/(RR + GR + CR),
  // rounded up. Worked example: 120-short-ton locomotive, continuous TE 36,000 lb; W = 0.80 (cold);
  // RR 7 lb/ton; 1.5 % grade; 10° curve → 598 short tons; two locomotives → 1,196.
  const locoMass = shortTons(120);
  const radius10deg = (5729.5779513 / 10) * M_PER_FT; // [D] degree of curve on a 100 ft arc

  // [P] TR 0603 §2.18: drawbar pull = TE − 20 lb per ton of locomotive.
  it("drawbar pull: 36,000 lb − 20 lb/ton × 120 tons = 33,600 lb [P]", () => {
    expect(ratingDrawbarPullN(lbf(36_000), locoMass) / NEWTONS_PER_LBF).toBeCloseTo(33_600, 6);
  });

  it("598 short tons for one locomotive, 1,196 for two [P]", () => {
    const dbp = ratingDrawbarPullN(lbf(36_000), locoMass);
    const rr = perWeight(7);
    const gr = gradeForceN(1, 15) / GRAVITY_MPS2; // exact form of the 20 lb/ton per 1 % rule (§2.7)
    const cr = curveResistancePerDegreePermille(radius10deg) / 1000; // 0.8 lb/ton per degree (§2.8)
    expect(gr * 2000).toBeCloseTo(30, 2);
    expect(cr * 2000).toBeCloseTo(8, 9);
    const one = grossTrailingLoadKg(dbp, 0.8, [rr, gr, cr]) / KG_PER_SHORT_TON;
    expect(one).toBeGreaterThan(597);
    expect(Math.ceil(one)).toBe(598);
    // The source rates a locomotive consist as the number of units times one unit's (rounded) rating.
    expect(2 * Math.ceil(one)).toBe(1_196);
    // The formula is linear in drawbar pull: two units' pull gives twice the unrounded load.
    expect(grossTrailingLoadKg(2 * dbp, 0.8, [rr, gr, cr]) / KG_PER_SHORT_TON).toBeCloseTo(2 * one, 9);
  });
});

describe("gross trailing load through the load-table and assistance code path (TR 0603 §2.10–2.11 [P])", () => {
  // The same worked example with the same simplified inputs, put as a start case: one 120-short-ton unit whose
  // effort is W·DBP = 0.80 × 33,600 lb plus what lifts its own weight up the grade (the rating's 20 lb/ton for
  // the locomotive is already in the drawbar pull, so it has no breakaway of its own); wagons resisting RR + CR
  // = 7 + 8 lb/ton = 7.5 ‰ of their weight; a straight, uniform 15 ‰ grade (GR 30 lb/ton, §2.7); adhesion and
  // couplings not limiting. The rating question is "does the effort cover the resistance": power margin ≥ 1.
  const locoMass = shortTons(120);
  const dbp = ratingDrawbarPullN(lbf(36_000), locoMass);
  const unit = testLoco({
    massKg: locoMass,
    adhesiveMassKg: locoMass,
    startingTractiveEffortN: 0.8 * dbp + locoMass * GRAVITY_MPS2 * Math.sin(Math.atan(0.015)),
    startingResistancePermille: 0,
  });
  const one: StartCase = uniformCase({
    locos: [{ spec: unit, count: 1, position: "head" }],
    wagon: testWagon({ startingResistancePermille: 7.5 }),
    gradePermille: 15,
    curveRadiusM: 0,
    adhesion: ampleAdhesion(),
    couplerLimitN: 1e9,
    clearAheadM: 1e5,
  });
  const rating = (x: StartCase) => staticCheck(x).margins.power >= 1;
  const table = (c: StartCase) => loadTable(c, rating, { toleranceKg: 5 }).map((r) => r.maxTrailingMassKg / KG_PER_SHORT_TON);

  it("one unit: every row of the load table rounds up to 598 short tons [P]", () => {
    const rows = table(one);
    expect(rows.length).toBe(12);
    for (const t of rows) expect(Math.ceil(t)).toBe(598);
  });

  it("one unit added at the head by the assistance search's case builder: twice the load, rated 2 × 598 = 1,196 [P]", () => {
    const two = withAddedUnits(one, unit, [{ count: 1, position: "head" }]);
    expect(two.locomotives.reduce((s, g) => s + g.count, 0)).toBe(2);
    const [a] = table(one);
    const [b] = table(two);
    // Unrounded, two units haul twice what one does (1,194.7 short tons); the source rates a consist as the
    // number of units times one unit's rating rounded up: 2 × 598.
    expect(b! / a!).toBeCloseTo(2, 3);
    expect(2 * Math.ceil(b! / 2)).toBe(1_196);
  });
});

describe("ruling grade (TI 850-02 / AFMAN 32-1125(I), 2000, Eq. 3-3 [P])", () => {
  // [P] G[%] = TE/(20·(W_eng + N·W_car)) − 0.15, i.e. 20 lb/ton per 1 % of grade and 3 lb/ton rolling
  // resistance (0.15 % × 20). TE 100,000 lb, 400 t + 50 × 130 t → 0.5746 %. Ours is the exact form
  // (sin/tan instead of the small angle), which differs in the fifth decimal.
  it("TE 100,000 lb, 400 + 50 × 130 short tons → 0.5746 % [P]", () => {
    const g = rulingGradePermille(lbf(100_000), shortTons(400 + 50 * 130), perWeight(3)) / 10;
    expect(g).toBeCloseTo(0.5746, 4);
    const smallAngle = 100_000 / (20 * 6_900) - 0.15;
    expect(Math.abs(g - smallAngle)).toBeLessThan(1e-4);
  });
});

describe("rating tons (W. L. Webb, Railroad Construction, §212 [P])", () => {
  it("28,200 lb at 22.6 lb per rating ton → 1,248 [P]", () => {
    expect(Math.round(ratingTons(lbf(28_200), lbf(22.6)))).toBe(1_248);
  });
});

describe("starting limit mass through the start check (PHYSICS.md §6)", () => {
  // [P] the form used in Swiss/German traction practice: m_A = (F − m_L·g·i) / (g·(i + f_WA)).
  // [D] F = 300 kN, m_L = 84 t, i = 12.5 ‰, f_WA = 4 ‰ → 1,790 t.
  // Reproduced through the real code path: a locomotive giving 300 kN in full notch with no resistance of
  // its own at rest beyond grade, wagons with 4 ‰ starting resistance, adhesion not limiting, straight
  // uniform 12.5 ‰ track, couplings and distance not limiting. "Starts" means the full-notch effort covers
  // the total resistance at rest: the power margin (current limit ÷ resistance) is at least 1.
  const base = uniformCase({
    locos: [{ spec: testLoco({ massKg: 84_000, adhesiveMassKg: 84_000, startingTractiveEffortN: 300_000, startingResistancePermille: 0 }), count: 1, position: "head" }],
    wagons: 20,
    wagon: testWagon({ startingResistancePermille: 4 }),
    trailingMassKg: 1_000_000,
    gradePermille: 12.5,
    curveRadiusM: 0,
    adhesion: ampleAdhesion(),
    couplerLimitN: 1e9,
    clearAheadM: 1e5,
  });
  const formulaKg = (300_000 - 84_000 * GRAVITY_MPS2 * 0.0125) / (GRAVITY_MPS2 * (0.0125 + 0.004));

  it("the formula itself gives 1,790 t [D]", () => {
    expect(Math.round(formulaKg / 1000)).toBe(1_790);
  });

  it("largestStartableMassKg with the power-margin criterion gives 1,790 t within 0.5 %", () => {
    const kg = largestStartableMassKg(base, (x) => staticCheck(x).margins.power >= 1, { toleranceKg: 100 });
    expect(Math.abs(kg / formulaKg - 1)).toBeLessThan(0.005);
    expect(Math.abs(kg / 1_790_000 - 1)).toBeLessThan(0.005);
  });

  it("the same limit from the verdict: needs assistance only above it (nothing else limits)", () => {
    const kg = largestStartableMassKg(base, (x) => staticCheck(x).verdict !== "needs-assistance", { toleranceKg: 100 });
    expect(Math.abs(kg / 1_790_000 - 1)).toBeLessThan(0.005);
    const above = staticCheck({ ...base, train: { ...base.train, trailingMassKg: 1_810_000 } });
    expect(above.verdict).toBe("needs-assistance");
    expect(above.reasons).toEqual(["power"]);
  });

  it("a second unit added at the head (assistance case builder) doubles it: 3,580 t [D]", () => {
    const two = withAddedUnits(base, base.locomotives[0]!.spec, [{ count: 1, position: "head" }]);
    const kg = largestStartableMassKg(two, (x) => staticCheck(x).margins.power >= 1, { toleranceKg: 100 });
    // [D] m_A = (2F − 2·m_L·g·i) / (g·(i + f_WA)) = 2 × 1,790 t.
    expect(Math.abs(kg / (2 * formulaKg) - 1)).toBeLessThan(0.005);
  });

  it("the start check and the running rating are different: 4 ‰ breakaway vs the running terms", () => {
    // At the limit the resistance is exactly grade plus 4 ‰ breakaway on the wagons, with nothing from the
    // Davis running terms (they are not added on top of breakaway at rest).
    const s = staticCheck({ ...base, train: { ...base.train, trailingMassKg: formulaKg } });
    expect(s.requiredN).toBeCloseTo(300_000, -2);
  });
});
