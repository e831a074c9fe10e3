/**
 * The assistance check (issue: assistance, load tables, batch): options verified by the planner's dynamics,
 * the mid-train split point, the divided train, the budget and cancellation.
 */
import { describe, expect, it } from "vitest";
import { EN, groupName, noteEn } from "../tools/english.js";
import {
  candidatePlacements,
  divideTrain,
  firstPart,
  GRAVITY_MPS2,
  isCancelled,
  planStart,
  plannerStarts,
  proportionalSplitWagon,
  searchAssistance,
  sequenceControls,
  simulate,
  staticCheck,
  modelFromCase,
  withAddedUnits,
  type StartCase,
} from "../../src/core/index.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { notchSequence } from "../../src/core/planner/plan.js";
import { plannerContext } from "../../src/core/planner/context.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { testLoco, testWagon, uniformCase } from "../tools/cases.js";

const lib = builtinLibrary();
function fromJson(json: unknown): StartCase {
  const r = parseStartCase(json, lib);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

/**
 * A heavy six-axle unit of our own for the steep case (test input, not a real class): four of the demo's
 * 138 t units cannot reach even 10 km/h on 20 ‰ within the 10 % slip-risk threshold with 5000 t behind
 * them, so the case would test adhesion, not couplers.
 */
const heavyUnit = {
  schema: "taut/locomotive@1",
  id: "test-heavy-6axle",
  label: "Heavy 6-axle test unit (test input, not a real class)",
  mass_t: 150,
  adhesiveMass_t: 150,
  length_m: 23,
  axles: 6,
  railPower_kW: 3300,
  notches: 8,
  notchPower: [0.0325, 0.0962, 0.2003, 0.3238, 0.4876, 0.6411, 0.8296, 1.0],
  notchStartingEffort: [0.12, 0.25, 0.38, 0.5, 0.62, 0.75, 0.88, 1.0],
  startingTractiveEffort_kN: 520,
  continuousTractiveEffort_kN: 380,
  continuousSpeed_kmh: 25,
  maxSpeed_kmh: 100,
  sanders: true,
};

/** 5000 t, 60 wagons, on a uniform 20 ‰ rise, 850 kN couplings (working allowance 850/1.2 = 708 kN). */
const steep = fromJson({
  schema: "taut/start-case@1",
  locomotives: [{ profile: heavyUnit, count: 2, position: "head" }],
  train: { trailingMass_t: 5000, wagons: 60, length_m: 840, couplerSlack_mm: 60, bearing: "roller", couplerLimit_kN: 850, wagonType: "bogie-hopper-loaded" },
  location: { gradient_permille: 20, curveRadius_m: 0, clearAhead_m: 1500 },
  conditions: { rail: "dry", sand: true, temperature_C: 10 },
  target: { speed_kmh: 10 },
});
const spec = steep.locomotives[0]!.spec;
const allowanceN = 850_000 / 1.2;

describe("5000 t on 20 ‰ with 850 kN couplings", () => {
  // [D] The grade alone behind the head group: 5000 t × g × sin(atan 0.020) = 980.5 kN > 850 kN, whatever
  // pulls it from the head (PRACTICE.md: "Coupling strength limits trailing mass on steep grades" [S]).
  const gradeBehindHeadN = 5_000_000 * GRAVITY_MPS2 * Math.sin(Math.atan(0.02));
  it("the grade alone exceeds the coupling limit behind the head [D]", () => {
    expect(gradeBehindHeadN / 1000).toBeCloseTo(980.5, 0);
    expect(gradeBehindHeadN).toBeGreaterThan(850_000);
  });

  it.each([1, 2, 3, 4, 5, 6])("%i more at the head: needs assistance, reason coupler", (k) => {
    const c = withAddedUnits(steep, spec, [{ count: k, position: "head" }]);
    const st = staticCheck(c);
    // Enough units at the head to give the effort: it is the couplings, not power, that stop it.
    if (k >= 2) expect(st.margins.power).toBeGreaterThan(1.1);
    expect(st.peakTensionN).toBeGreaterThan(850_000);
    const p = planStart(c, { skipMassSearch: true, skipVerification: true });
    expect(p.verdict).toBe("needs-assistance");
    expect(p.reasons).toContain("coupler");
  });

  const result = searchAssistance(steep, { allLevels: true, divide: false, budget: 30, maxFullPlans: 4 });

  it("the search rules out every head-only option on the couplers and finds rear or mid-train options that start", () => {
    for (const x of result.rejected.filter((r) => r.added.every((a) => a.position === "head"))) {
      expect(x.verdict).toBe("needs-assistance");
      // Judged by the planned start, the couplers rule it out; screened out before any dynamics, it is the
      // effort (adhesion, power) that is short already (the full plan then names the couplers too, above).
      if (x.by === "planner") expect(x.reasons).toContain("coupler");
      else expect(x.reasons.some((r) => r === "adhesion" || r === "power")).toBe(true);
    }
    expect(result.options.length).toBeGreaterThan(0);
    for (const o of result.options) {
      expect(o.verdict).toBe("starts");
      expect(o.added.some((a) => a.position !== "head")).toBe(true);
      expect(o.peakCouplerForceN).toBeLessThanOrEqual(allowanceN);
    }
  });

  it("options come cheapest first: fewest added units, then lowest peak coupler force", () => {
    const o = result.options;
    for (let k = 1; k < o.length; k++) {
      expect(o[k]!.units).toBeGreaterThanOrEqual(o[k - 1]!.units);
      if (o[k]!.units === o[k - 1]!.units) expect(o[k]!.peakCouplerForceN).toBeGreaterThanOrEqual(o[k - 1]!.peakCouplerForceN);
    }
  });

  it("an option, replayed in the dynamics model outside the planner at the accepted slip risk, keeps within the allowance and slips only where the plan says the protection acts", () => {
    const o = result.options[0]!;
    const plan = o.plan!;
    const model = modelFromCase(o.case, { adhesionQuantile: o.case.settings.slipRiskThreshold });
    // Every control group's notch as the plan sets it (rear and mid-train units are remote: their own notch).
    const recs = plan.steps.map((s) => ({ notch: s.notch, startS: s.startS, groupNotches: s.groups ? Int32Array.from(s.groups.map((g) => g.notch)) : null }));
    const seq = notchSequence(plannerContext(o.case), recs);
    const last = plan.steps[plan.steps.length - 1]!;
    const res = simulate(model, sequenceControls(seq, { trainBrakeReleaseS: 0, locoBrakeReleaseS: plan.steps[1]!.startS }), { durationS: last.startS + last.advanceWhen.afterS });
    // Slips only where the plan says the notch asks more than the rail gives (the protection is expected to act).
    for (const e of res.slipEpisodes) {
      const step = [...plan.steps].reverse().find((st) => st.startS <= e.startS + 1e-9)!;
      const previous = plan.steps[plan.steps.indexOf(step) - 1];
      expect(step.protectionActs || previous?.protectionActs === true).toBe(true);
    }
    expect(res.peakTensionN).toBeLessThanOrEqual(allowanceN * 1.02);
    // Units at the rear push: the couplings ahead of them go into compression, reported where it peaks.
    if (o.added.some((a) => a.position === "rear")) {
      expect(o.peakCompressionN).toBeGreaterThan(50_000);
      expect(o.peakCompressionAt).toBeGreaterThan((2 * plan.couplerCompressionPeaksN.length) / 3);
      expect(noteEn(o.note)).toMatch(/Shoving from the rear/);
      expect(noteEn(o.note)).toMatch(/remote power/);
      expect(o.effortSplit.map((g) => (g.place === "all" ? "all" : groupName(EN, g.place)))).toContain("rear");
    }
  });
});

describe("the mid-train split point", () => {
  // [D] Uniform 10 ‰, all units alike and in step, each pulling its share: with h units at the head and m
  // after wagon N, the coupling just ahead of the mid units carries h·F − R_head − N·r (F the effort per
  // unit = total resistance ÷ (h + m), r one wagon's resistance). It is least where that is nearest zero.
  it.each([
    [1, 1],
    [2, 1],
    [1, 2],
  ])("%i at the head and %i mid-train", (h, m) => {
    const loco = testLoco({ startingTractiveEffortN: 300_000 });
    const c = uniformCase({ locos: [{ spec: loco, count: h, position: "head" }], wagons: 60, trailingMassKg: 3_000_000, gradePermille: 10, wagon: testWagon({ startingResistancePermille: 2.5 }) });
    const perKg = GRAVITY_MPS2 * (Math.sin(Math.atan(0.01)) + 0.0025);
    const r = 50_000 * perKg;
    const locoRes = loco.massKg * GRAVITY_MPS2 * (Math.sin(Math.atan(0.01)) + 0.0025);
    const total = 60 * r + (h + m) * locoRes;
    const f = total / (h + m);
    const exact = (h * f - h * locoRes) / r;
    const n = proportionalSplitWagon(c, loco, m);
    expect(Math.abs(n - exact)).toBeLessThanOrEqual(0.5 + 1e-9);
  });

  it("candidate placements: head, rear and mid-train for one unit; two units add the mixed placements, no duplicates", () => {
    const c = uniformCase({ wagons: 40 });
    const one = candidatePlacements(c, c.locomotives[0]!.spec, 1).map((x) => JSON.stringify(x));
    expect(one).toContain(JSON.stringify([{ count: 1, position: "head" }]));
    expect(one).toContain(JSON.stringify([{ count: 1, position: "rear" }]));
    expect(one.some((x) => x.includes("afterWagon"))).toBe(true);
    expect(new Set(one).size).toBe(one.length);
    const two = candidatePlacements(c, c.locomotives[0]!.spec, 2);
    expect(two.every((x) => x.reduce((s, a) => s + a.count, 0) === 2)).toBe(true);
    expect(two.some((x) => x.length === 2 && x.some((a) => a.position === "head") && x.some((a) => a.position === "rear"))).toBe(true);
  });
});

describe("no option works: dividing the train", () => {
  // Covered goods in leaf fall (demo): one or two more of its 84 t units cannot start it within the slip-risk
  // threshold; common practice is to take part of the train (PRACTICE.md, Alaska Railroad manual p. 64-18 [P]).
  const goods = fromJson(builtinCaseJson[2]);
  const d = divideTrain(goods, { budget: 12 });

  it("the first part starts (full, verified plan) and one wagon more does not (verdict run)", () => {
    expect(d.wagons).toBeGreaterThan(0);
    expect(d.wagons).toBeLessThan(goods.train.wagons);
    expect(d.plan?.verdict).toBe("starts");
    expect(plannerStarts(firstPart(goods, d.wagons + 1))).toBe(false);
    expect(d.trailingMassKg).toBeCloseTo((goods.train.trailingMassKg * d.wagons) / goods.train.wagons, 6);
    expect(d.remainingWagons + d.wagons).toBe(goods.train.wagons);
    expect(d.trips).toBe(Math.ceil(goods.train.wagons / d.wagons));
  });

  it("a rear unit stays with the rest of the train; a mid unit ahead of the cut goes with the first part", () => {
    const c = withAddedUnits(goods, goods.locomotives[0]!.spec, [{ count: 1, position: "rear" }, { count: 1, position: { afterWagon: 5 } }]);
    const part = firstPart(c, 10);
    expect(part.locomotives.map((g) => g.position)).toEqual(["head", { afterWagon: 5 }]);
    expect(part.train.lengthM).toBeCloseTo(goods.train.lengthM / 3, 6);
  });
});

describe("search limits", () => {
  const goods = fromJson(builtinCaseJson[2]);
  it("a case that starts needs no assistance and costs no search", () => {
    const c = fromJson({ ...(builtinCaseJson[2] as object), conditions: { rail: "dry", sand: false, temperature_C: 10 } });
    const a = searchAssistance(c);
    expect(a.needed).toBe(false);
    expect(a.options).toEqual([]);
  });
  it("the budget caps the planner runs for the options and says so", () => {
    const a = searchAssistance(goods, { budget: 2, divide: false });
    expect(a.plannerRuns).toBeLessThanOrEqual(2);
    expect(a.complete).toBe(false);
  });
  it("shouldStop cancels", () => {
    let calls = 0;
    expect.assertions(1);
    try {
      searchAssistance(goods, { shouldStop: () => ++calls > 3 });
    } catch (e) {
      expect(isCancelled(e)).toBe(true);
    }
  });
});
