/**
 * The start planner against the physics it plans with and the practice it must respect
 * (PRACTICE.md "Starting", "Wheel slip", "Slack and forces").
 */
import { describe, expect, it } from "vitest";
import { slipEn, whyEn } from "../tools/english.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { planStart, type PlanResult } from "../../src/core/planner/index.js";
import { notchSequence } from "../../src/core/planner/plan.js";
import { plannerContext } from "../../src/core/planner/context.js";
import { modelFromCase } from "../../src/core/train/trainModel.js";
import { sequenceControls, simulate } from "../../src/core/dynamics/simulate.js";
import type { StartCase } from "../../src/core/train/types.js";

const lib = builtinLibrary();

function fromJson(json: unknown): StartCase {
  const r = parseStartCase(json, lib);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

type CaseOver = { train?: Record<string, unknown>; location?: unknown; conditions?: Record<string, unknown>; locomotives?: unknown[]; target?: unknown };
function caseOf(o: CaseOver = {}): StartCase {
  return fromJson({
    schema: "taut/start-case@1",
    locomotives: o.locomotives ?? [{ profile: "illustrative-6axle-3000", count: 1, position: "head" }],
    train: { trailingMass_t: 1400, wagons: 28, length_m: 392, couplerSlack_mm: 60, bearing: "roller", couplerLimit_kN: 850, wagonType: "bogie-hopper-loaded", ...o.train },
    location: o.location ?? { gradient_permille: 4, curveRadius_m: 0, clearAhead_m: 1500 },
    conditions: { rail: "dry", sand: false, temperature_C: 10, ...o.conditions },
    target: o.target ?? { speed_kmh: 15 },
  });
}

const verdictRank = { starts: 0, marginal: 1, "needs-assistance": 2 } as const;

/** The plan's notch timing replayed in the full model at the given adhesion quantile. */
function replay(c: StartCase, p: PlanResult, quantile: number) {
  const model = modelFromCase(c, { adhesionQuantile: quantile });
  // Every control group's notch where there are several (a helper's a few seconds after the head's).
  const seq = notchSequence(
    plannerContext(c, quantile),
    p.steps.map((s) => ({ notch: s.notch, startS: s.startS, groupNotches: s.groups ? Int32Array.from(s.groups.map((g) => g.notch)) : null })),
  );
  const powerS = p.steps[1]!.startS;
  const end = p.steps[p.steps.length - 1]!.startS + p.steps[p.steps.length - 1]!.advanceWhen.afterS;
  return simulate(model, sequenceControls(seq, { trainBrakeReleaseS: 0, locoBrakeReleaseS: powerS }), { durationS: end });
}

describe("every plan, re-run in the full dynamics, honours the coupler allowance and reaches its target on the rail it assumes", () => {
  const cases: Array<[string, StartCase]> = [
    ...builtinCaseJson.map((j) => [(j as { id: string }).id, fromJson(j)] as [string, StartCase]),
    ["level bunched, 1400 t", caseOf({ location: { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 1500 }, train: { slackState: "bunched" } })],
    ["6 ‰ with a 350 m curve, damp and sanded", caseOf({ location: { gradient_permille: 6, curveRadius_m: 350, clearAhead_m: 1500 }, conditions: { rail: "damp", sand: true }, train: { trailingMass_t: 1000, wagons: 20, length_m: 280 } })],
    ["two units, 3000 t on 5 ‰", caseOf({ locomotives: [{ profile: "illustrative-6axle-3000", count: 2 }], train: { trailingMass_t: 3000, wagons: 50, length_m: 700 }, location: { gradient_permille: 5, curveRadius_m: 0, clearAhead_m: 2000 } })],
  ];
  it.each(cases)("%s", (_name, c) => {
    const p = planStart(c, { skipMassSearch: true });
    if (p.verdict === "needs-assistance") {
      expect(p.steps).toEqual([]);
      expect(p.margin).toBeLessThan(1);
      return;
    }
    const threshold = c.settings.slipRiskThreshold;
    const allowance = c.train.couplerLimitN / c.settings.couplerSafetyFactor;
    const target = c.target.kind === "speed" ? c.target.speedMps : Infinity;
    if (p.verdict === "starts") {
      expect(p.peakCouplerForceN).toBeLessThanOrEqual(allowance);
      // Our own replay (independent of the planner's search) with the rail at the threshold's quantile and
      // the slip protection holding any excess at what the rails give: the couplers stay within their
      // allowance and the train reaches its target.
      const res = replay(c, p, threshold);
      expect(res.peakTensionN).toBeLessThanOrEqual(allowance * 1.02);
      expect(res.final.leadSpeedMps).toBeGreaterThanOrEqual(0.97 * target);
    } else {
      // A marginal plan says why, and reaches its target on the rail it assumes (threshold or marginal bound).
      expect(p.reasons.length).toBeGreaterThan(0);
      expect(p.timeToTargetS).not.toBeNull();
      const res = replay(c, p, p.planQuantile);
      expect(res.final.leadSpeedMps).toBeGreaterThanOrEqual(0.97 * target);
    }
    // Where a notch asks for more than the rail the plan assumes may give (slip risk above the plan's quantile:
    // the threshold's, or the marginal bound's for a marginal plan made on it), the step says the slip
    // protection is expected to act.
    for (const s of p.steps) {
      if (s.slipRisk > p.planQuantile + 0.03) expect(s.protectionActs).toBe(true);
      if (s.protectionActs) expect(whyEn(s.why)).toMatch(/slip protection/);
    }
  });
});

describe("the stretch", () => {
  // Common practice (NAVFAC P-301 [P]; PRACTICE.md): notch 1 first, the lowest notch that does the job,
  // the locomotive at about 1 mph until the whole train moves.
  it.each([
    ["level, bunched", { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 1500 }, "bunched"],
    ["rising 4 ‰", { gradient_permille: 4, curveRadius_m: 0, clearAhead_m: 1500 }, "from-profile"],
    ["rising 8 ‰ on a curve", { gradient_permille: 8, curveRadius_m: 500, clearAhead_m: 1500 }, "from-profile"],
  ])("%s: stretch notch below the highest notch used later; locomotive ≤ 1.6 km/h until the last vehicle moves", (_n, location, slackState) => {
    const c = caseOf({ location, train: { slackState } });
    const p = planStart(c, { skipMassSearch: true });
    expect(p.verdict).not.toBe("needs-assistance");
    const stretch = p.steps.find((s) => s.phase === "stretch")!;
    const highest = Math.max(...p.steps.map((s) => s.notch));
    expect(stretch.notch).toBeLessThan(highest);
    const moves = p.stretch.lastVehicleMovesS;
    expect(moves).not.toBeNull();
    const powerS = stretch.startS;
    let vMax = 0;
    for (let k = 0; k < p.series.timeS.length; k++) {
      if (p.series.timeS[k]! <= powerS + moves!) vMax = Math.max(vMax, p.series.speedMps[k]!);
    }
    expect(vMax * 3.6).toBeLessThanOrEqual(1.6 * 1.15);
  });

  it("on a rising grade, power that holds the train is on before the train brake releases, and it never rolls back", () => {
    const c = caseOf({ location: { gradient_permille: 10, curveRadius_m: 0, clearAhead_m: 1500 }, train: { trailingMass_t: 1200, wagons: 24, length_m: 336 } });
    const p = planStart(c, { skipMassSearch: true });
    const prepare = p.steps[0]!;
    expect(prepare.phase).toBe("prepare");
    expect(prepare.notch).toBeGreaterThan(0);
    expect(whyEn(prepare.why)).toMatch(/holds/);
    // Never rolls back more than gear and slack play.
    expect(Math.min(...p.series.locoTravelM)).toBeGreaterThan(-0.5);
  });
});

describe("a case where starting in full notch at once breaks the coupling allowance, and the plan does not", () => {
  // Heavy train, level, bunched, working limit 400 kN (÷ 1.2 = 333 kN): full notch snatches the rear.
  const c = caseOf({
    locomotives: [{ profile: "illustrative-6axle-3000", count: 2 }],
    train: { trailingMass_t: 2400, wagons: 40, length_m: 560, couplerLimit_kN: 400, slackState: "bunched" },
    location: { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 1500 },
  });
  it("full notch at once exceeds it; the plan keeps within it", () => {
    const model = modelFromCase(c);
    const full = simulate(model, sequenceControls([{ notch: 8, atS: 0 }], { trainBrakeReleaseS: -1e6, locoBrakeReleaseS: 0 }), { durationS: 40 });
    const allowance = c.train.couplerLimitN / c.settings.couplerSafetyFactor;
    expect(full.peakTensionN).toBeGreaterThan(allowance);
    const p = planStart(c, { skipMassSearch: true });
    expect(p.steps.length).toBeGreaterThan(2);
    expect(p.peakCouplerForceN).toBeLessThanOrEqual(allowance);
  });
});

describe("5000 t on 20 ‰ with 850 kN couplings", () => {
  // Grade alone: 5000 t × 9.81 × sin(atan 0.02) ≈ 981 kN behind the first coupling > 850 kN (PRACTICE.md
  // "Coupling strength limits trailing mass on steep grades").
  it("needs assistance for reason coupler, even with locomotives enough at the head", () => {
    const c = caseOf({
      locomotives: [{ profile: "illustrative-6axle-3000", count: 4 }],
      train: { trailingMass_t: 5000, wagons: 60, length_m: 840, couplerLimit_kN: 850 },
      location: { gradient_permille: 20, curveRadius_m: 0, clearAhead_m: 1500 },
    });
    const p = planStart(c, { skipMassSearch: true });
    expect(p.verdict).toBe("needs-assistance");
    expect(p.reasons).toContain("coupler");
    expect(p.static.margins.power).toBeGreaterThan(1);
  });
});

describe("monotonic: more mass, a steeper grade or a worse rail never gives a faster plan or a better verdict; sand never makes things worse", () => {
  const base = { train: { trailingMass_t: 1100, wagons: 22, length_m: 308 }, location: { gradient_permille: 5, curveRadius_m: 0, clearAhead_m: 2000 }, target: { speed_kmh: 12 } };
  const outcome = (o: CaseOver) => {
    const p = planStart(caseOf({ ...base, ...o, train: { ...base.train, ...o.train } }), { skipMassSearch: true });
    return { rank: verdictRank[p.verdict], time: p.timeToTargetS ?? Infinity };
  };
  const notBetter = (worse: ReturnType<typeof outcome>, better: ReturnType<typeof outcome>) => {
    expect(worse.rank).toBeGreaterThanOrEqual(better.rank);
    if (worse.rank === better.rank) expect(worse.time).toBeGreaterThanOrEqual(better.time - 1);
  };
  it("mass", () => {
    notBetter(outcome({ train: { trailingMass_t: 1500 } }), outcome({}));
    notBetter(outcome({ train: { trailingMass_t: 2200 } }), outcome({ train: { trailingMass_t: 1500 } }));
  });
  it("grade", () => {
    notBetter(outcome({ location: { gradient_permille: 9, curveRadius_m: 0, clearAhead_m: 2000 } }), outcome({}));
    notBetter(outcome({ location: { gradient_permille: 14, curveRadius_m: 0, clearAhead_m: 2000 } }), outcome({ location: { gradient_permille: 9, curveRadius_m: 0, clearAhead_m: 2000 } }));
  });
  it("rail condition", () => {
    notBetter(outcome({ conditions: { rail: "wet" } }), outcome({ conditions: { rail: "dry" } }));
    notBetter(outcome({ conditions: { rail: "leaves" } }), outcome({ conditions: { rail: "wet" } }));
  });
  it("sand", () => {
    for (const rail of ["wet", "frost"]) notBetter(outcome({ conditions: { rail, sand: false } }), outcome({ conditions: { rail, sand: true } }));
  });
});

describe("seeded and deterministic", () => {
  it("the same case always gives the same plan", () => {
    const c = fromJson(builtinCaseJson[0]);
    const a = planStart(c, { skipMassSearch: true });
    const b = planStart(c, { skipMassSearch: true });
    expect(JSON.stringify(b.steps)).toBe(JSON.stringify(a.steps));
    expect(b.verdict).toBe(a.verdict);
    expect(Array.from(b.series.speedMps)).toEqual(Array.from(a.series.speedMps));
  });
});

describe("steps a driver can follow", () => {
  it("each step has an observable trigger, a fallback notch not above its own, and a why line with figures", () => {
    const p = planStart(fromJson(builtinCaseJson[0]), { skipMassSearch: true });
    expect(p.steps.map((s) => s.phase)).toEqual(expect.arrayContaining(["prepare", "stretch", "accelerate"]));
    for (const s of p.steps) {
      expect(["time", "moved", "speed", "target"]).toContain(s.advanceWhen.primary);
      expect(s.fallbackNotch).toBeLessThanOrEqual(s.notch);
      expect(whyEn(s.why)).toMatch(/\d/);
      expect(whyEn(s.why).length).toBeLessThan(400);
    }
    expect(p.steps[p.steps.length - 1]!.advanceWhen.primary).toBe("target");
    expect(p.slipGuidance.driver.length).toBeGreaterThan(2);
    expect(slipEn(p.slipGuidance).stall.join(" ")).toMatch(/secure|brake/i);
  });
});
