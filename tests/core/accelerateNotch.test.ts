/**
 * The notch a plan holds to its target stays within the rail the plan assumes (README "How Taut decides":
 * the adhesion limit's rail, at the slip-risk threshold's quantile): the planner advises the highest notch
 * whose effort that rail passes, notching up as speed lets, and a notch beyond it only where no notch within
 * keeps the start on its way — then the step is marked (the slip protection is expected to act).
 *
 * Every figure of the rail and of a notch is worked out here from the published formulas, never from the
 * program's output. Marks as in PHYSICS.md: [P] read in the source, [S] quoted second-hand, [M] from memory,
 * [D] arithmetic on those.
 */
import fc from "fast-check";
import jStat from "jstat";
import { describe, expect, it } from "vitest";
import { GRAVITY_MPS2, planStart, RAIL_CONDITIONS, type LocomotiveSpec, type StartCase } from "../../src/core/index.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";

const lib = builtinLibrary();
const g = GRAVITY_MPS2;

function fromJson(json: unknown): StartCase {
  const r = parseStartCase(json, lib);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

/** Curtius–Kniffler μ(v) = 7.5/(v + 44) + 0.161, v in km/h [S: Curtius & Kniffler, Elektrische Bahnen 20 (1950)]. */
const ck = (kmh: number) => 7.5 / (kmh + 44) + 0.161;

/**
 * What the rail at quantile q passes to one unit at a speed, N: u·μ_q·m_adh·g with μ_q the q-quantile of a
 * lognormal adhesion about the condition's median [P: S. Johnsson, "Adhesion as a statistical problem",
 * IMechE 1963] shaped over speed by Curtius–Kniffler; Φ⁻¹ from jStat (an independent library).
 */
function railN(spec: LocomotiveSpec, median: number, sigmaLn: number, q: number, kmh: number): number {
  const muQ = median * Math.exp(sigmaLn * jStat.normal.inv(q, 0, 1));
  return spec.adhesionUtilisation * muQ * (ck(kmh) / ck(0)) * spec.adhesiveMassKg * g;
}

/** Notch n's effort, N: F = min(F_start·s_n, P_rail·p_n / v) [PHYSICS.md §3; notch fractions S: White 1997, p. 3-10]. */
function notchN(spec: LocomotiveSpec, n: number, kmh: number): number {
  if (n <= 0) return 0;
  const v = Math.max(kmh / 3.6, 1e-3);
  return Math.min(spec.startingTractiveEffortN * spec.notchStartingEffort[n - 1]!, (spec.railPowerW * spec.notchPower[n - 1]!) / v);
}

/** Slip risk of asking F of one unit: Φ((ln μ_d − ln μ_median(v))/σ) [P: Johnsson 1963]. */
function riskOf(spec: LocomotiveSpec, median: number, sigmaLn: number, forceN: number, kmh: number): number {
  const muD = forceN / (spec.adhesionUtilisation * spec.adhesiveMassKg * g);
  return jStat.normal.cdf((Math.log(muD) - Math.log(median * (ck(kmh) / ck(0)))) / sigmaLn, 0, 1);
}

describe("the demo's accelerate notch by hand: aggregate block at Ashvale, 1,400 t, dry, one 3000 kW unit, 20 km/h", () => {
  const c = fromJson(builtinCaseJson.find((j) => (j as { id: string }).id === "demo-aggregate-ashvale"));
  const spec = c.locomotives[0]!.spec;
  // Dry rail: median 0.33, σ(ln μ) 0.12 [M: PHYSICS.md §2]; no sand; the threshold 10 % (the settings' default).
  const [median, sigma, q] = [0.33, 0.12, 0.1];
  const rail = (kmh: number) => railN(spec, median, sigma, q, kmh);
  // [D] The speed from which notch 5 asks no more than the rail at its 10 % quantile gives, up to 20 km/h:
  // below its power corner (3.6 × 2460 × 0.4876 / 285.2 = 15.1 km/h) it asks its current limit, 0.62 × 460 =
  // 285.2 kN, while the rail falls with speed — more than the rail from about 14 km/h (at 15 km/h the rail
  // gives 282.9 kN) — and beyond the corner its effort falls faster than the rail.
  let lo = 15;
  let hi = 20;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (notchN(spec, 5, mid) <= rail(mid)) hi = mid;
    else lo = mid;
  }
  const notch5WithinFromKmh = hi;
  const p = planStart(c, { skipMassSearch: true });
  const last = p.steps[p.steps.length - 1]!;
  const before = p.steps[p.steps.length - 2]!;

  it("the rail at its 10 % quantile: 325.5 kN at rest, 273.2 kN at 20 km/h [D]", () => {
    // 0.85 × 0.33·e^(0.12·(−1.2816)) × 138 t × g = 325.5 kN; × μ(20)/μ(0) = 0.2782/0.3315.
    expect(rail(0) / 1000).toBeCloseTo(325.5, 1);
    expect(rail(20) / 1000).toBeCloseTo(273.2, 1);
    // Notch 6 asks more than that all the way to the target (at 20 km/h 3.6 × 2460 × 0.6411 / 20 = 283.9 kN);
    // notch 5 does from about 15.3 km/h on (at 20 km/h it asks 215.9 kN).
    expect(notchN(spec, 6, 20) / 1000).toBeCloseTo(283.9, 1);
    expect(notchN(spec, 6, 20)).toBeGreaterThan(rail(20));
    expect(notchN(spec, 5, 20) / 1000).toBeCloseTo(215.9, 1);
    expect(notchN(spec, 5, 15)).toBeGreaterThan(rail(15));
    expect(rail(15) / 1000).toBeCloseTo(282.9, 1);
    expect(notch5WithinFromKmh).toBeGreaterThan(15);
    expect(notch5WithinFromKmh).toBeLessThan(15.6);
  });

  it("the verdict counts on that rail: it starts, limited by adhesion at 273 kN against the need", () => {
    expect(p.verdict).toBe("starts");
    const adhesion = p.limits.find((l) => l.name === "adhesion")!;
    expect(adhesion.allowance / 1000).toBeCloseTo(rail(20) / 1000, 0);
  });

  it("the plan holds notch 5 to the target, taken once speed lets, with its effort and slip risk by hand", () => {
    expect(last.phase).toBe("accelerate");
    expect(last.notch).toBe(5);
    expect(last.advanceWhen.primary).toBe("target");
    // Taken once notch 5 stays within the rail: the step before ends at that speed (the trigger is speed).
    expect(before.notch).toBe(4);
    expect(before.speedMps * 3.6).toBeGreaterThanOrEqual(notch5WithinFromKmh - 0.1);
    // Its effort at the target, and its slip risk (its highest, where it asks the most of the rail).
    expect(last.tractiveEffortN / 1000).toBeCloseTo(notchN(spec, 5, 20) / 1000, 0);
    const at = last.adhesionUseAt.speedMps * 3.6;
    expect(last.slipRisk).toBeCloseTo(riskOf(spec, median, sigma, notchN(spec, 5, at), at), 3);
    // Every step within the plan's quantile: nothing is marked, and the verdict and the steps tell one story.
    for (const s of p.steps) {
      expect(s.slipRisk).toBeLessThanOrEqual(q);
      expect(s.protectionActs).toBe(false);
    }
  });
});

// ---------------------------------------------------------------------------------------------- property

const locoIds = [...lib.locomotives.keys()];
const wagonIds = [...lib.wagons.keys()];
const deep = Number(process.env.PROPERTY_RUNS ?? 0);

interface Draw {
  loco: string;
  count: number;
  wagonType: string;
  wagons: number;
  load: number;
  grade: number;
  rail: (typeof RAIL_CONDITIONS)[number];
  sand: boolean;
  targetKmh: number;
}

function caseOf(d: Draw): StartCase {
  const w = lib.wagons.get(d.wagonType)!;
  const perWagonT = (w.tareKg + d.load * (w.maxGrossKg - w.tareKg)) / 1000;
  return fromJson({
    schema: "taut/start-case@1",
    locomotives: [{ profile: d.loco, count: d.count, position: "head" }],
    train: { trailingMass_t: perWagonT * d.wagons, wagons: d.wagons, length_m: d.wagons * w.lengthM, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 3000, wagonType: d.wagonType },
    location: { gradient_permille: d.grade, curveRadius_m: 0, clearAhead_m: 3000 },
    conditions: { rail: d.rail, sand: d.sand, temperature_C: 10 },
    target: { speed_kmh: d.targetKmh },
  });
}

/** The locomotive's mean acceleration over the 2 s before time `t` of the plan's run, m/s². */
function accelerationBefore(p: ReturnType<typeof planStart>, t: number): number {
  const { timeS, speedMps } = p.series;
  let j = 0;
  while (j < timeS.length - 1 && timeS[j + 1]! <= t) j++;
  let i = j;
  while (i > 0 && timeS[i]! > t - 2) i--;
  return timeS[j]! > timeS[i]! ? (speedMps[j]! - speedMps[i]!) / (timeS[j]! - timeS[i]!) : 0;
}

/** The light train fast-check found (a random seed, before the step's figures were taken up to the target). */
const lightTrain: Draw = {
  loco: "illustrative-6axle-1800",
  count: 1,
  wagonType: "bogie-hopper-loaded",
  wagons: 7,
  load: 0,
  grade: 0,
  rail: "wet",
  sand: true,
  targetKmh: 8,
};

describe("a light train at the limit of its notch: one 6-axle 1,800 kW unit, 7 empty bogie hoppers (168 t), level, wet rail sanded, 8 km/h", () => {
  const c = caseOf(lightTrain);
  const spec = c.locomotives[0]!.spec;
  // Wet rail sanded: median 0.26, σ(ln μ) 0.18 [M: profiles/conditions]; the threshold 10 % (the settings' default).
  const [median, sigma, q] = [0.26, 0.18, 0.1];
  const rail = (kmh: number) => railN(spec, median, sigma, q, kmh);
  const target = 8;
  const p = planStart(c, { skipMassSearch: true, skipVerification: true });
  const last = p.steps[p.steps.length - 1]!;

  it("by hand: notch 4 asks 190 kN, within the rail at its 10 % quantile up to 8.09 km/h — the target and no further [D]", () => {
    // 0.85 × 0.26·e^(0.18·(−1.2816)) × 120 t × g = 206.5 kN at rest; × μ(8)/μ(0) = 0.3052/0.3315 → 190.16 kN.
    expect(rail(0) / 1000).toBeCloseTo(206.5, 1);
    expect(rail(target) / 1000).toBeCloseTo(190.16, 2);
    // Notch 4: 0.5 × 380 = 190 kN up to its power corner 3.6 × 1500 × 0.36 / 190 = 10.2 km/h.
    expect(notchN(spec, 4, target) / 1000).toBeCloseTo(190, 6);
    expect(notchN(spec, 4, target)).toBeLessThan(rail(target));
    // Just beyond the target the rail gives less than notch 4 asks (at 8.1 km/h 190.0 kN, at 8.3 km/h 189.6 kN).
    expect(notchN(spec, 4, 8.3)).toBeGreaterThan(rail(8.3));
    // Notch 5 asks 0.62 × 380 = 235.6 kN: beyond the rail all the way.
    expect(notchN(spec, 5, target)).toBeGreaterThan(rail(0));
    // Notch 4's slip risk at the target: 9.92 %, within the 10 % quantile.
    expect(riskOf(spec, median, sigma, notchN(spec, 4, target), target)).toBeCloseTo(0.0992, 4);
  });

  it("the plan holds notch 4 to the target, unmarked, its slip risk the one at the target — not at the overshoot of the last 0.2 s", () => {
    expect(p.verdict).toBe("starts");
    expect(last.notch).toBe(4);
    expect(last.advanceWhen.primary).toBe("target");
    // The train gains 0.4 m/s² here: the control interval in which it passes 8 km/h ends near 8.3 km/h,
    // beyond where notch 4 is within the rail. The plan ends at the target, and so do the step's figures.
    expect(last.adhesionUseAt.speedMps * 3.6).toBeLessThanOrEqual(target + 1e-9);
    expect(last.slipRisk).toBeCloseTo(riskOf(spec, median, sigma, notchN(spec, 4, target), target), 4);
    expect(last.speedMps * 3.6).toBeCloseTo(target, 6);
    expect(last.tractiveEffortN / 1000).toBeCloseTo(190, 3);
    for (const s of p.steps) {
      expect(s.slipRisk).toBeLessThanOrEqual(q);
      expect(s.protectionActs).toBe(false);
      expect(s.why.protection).toBeNull();
    }
  });
});

describe("every plan's steps stay within its rail but where none within will do (planner level: small trains on random seeds)", () => {
  // Trains of 6–10 wagons (a plan costs 0.05–0.2 s): every locomotive and wagon profile, every rail condition.
  it("the notch held to the target is the highest within; a step above the quantile is marked, taken only when the notch below fell behind, and one notch beyond at most", () => {
    let plans = 0;
    fc.assert(
      fc.property(
        fc.record<Draw>({
          loco: fc.constantFrom(...locoIds),
          count: fc.integer({ min: 1, max: 2 }),
          wagonType: fc.constantFrom(...wagonIds),
          wagons: fc.integer({ min: 6, max: 10 }),
          load: fc.double({ min: 0, max: 1, noNaN: true }),
          grade: fc.double({ min: 0, max: 15, noNaN: true }),
          rail: fc.constantFrom(...RAIL_CONDITIONS),
          sand: fc.boolean(),
          targetKmh: fc.integer({ min: 8, max: 25 }),
        }),
        (d) => {
          const c = caseOf(d);
          const p = planStart(c, { skipMassSearch: true, skipVerification: true });
          if (p.verdict === "needs-assistance") return;
          plans++;
          const spec = c.locomotives[0]!.spec;
          const cond = c.adhesion[c.conditions.rail];
          const median = c.conditions.sand && spec.sanders ? cond.sanded : cond.median;
          const q = p.planQuantile;
          const aMin = d.targetKmh / 3.6 / 600;
          // The plan's own quantile: the threshold's when it starts.
          if (p.verdict === "starts") expect(q).toBe(c.settings.slipRiskThreshold);
          for (let i = 0; i < p.steps.length; i++) {
            const s = p.steps[i]!;
            if (s.notch <= 0) continue;
            // The figure on the step is the chance the rail gives less than the notch asks (by hand, where the
            // step asks the most of it).
            const at = s.adhesionUseAt.speedMps * 3.6;
            expect(s.slipRisk).toBeCloseTo(riskOf(spec, median, cond.sigmaLn, notchN(spec, s.notch, at), at), 3);
            const fromKmh = i > 0 ? Math.max(0, p.steps[i - 1]!.speedMps * 3.6) : 0;
            const toKmh = s.speedMps * 3.6;
            if (s.slipRisk <= q + 1e-9) {
              // Within: the notch held to the target is the highest within — the next asks more than the rail
              // gives somewhere between where it was taken and the target.
              // (A step that long: a light train may reach its target before the notch's dwell is over.)
              if (p.startKind === "power" && s.advanceWhen.primary === "target" && s.notch < spec.notchPower.length && s.advanceWhen.afterS > 20) {
                let beyond = false;
                for (let v = fromKmh; v <= toKmh + 1e-9; v += 0.05) beyond ||= notchN(spec, s.notch + 1, v) > railN(spec, median, cond.sigmaLn, q, v);
                expect(beyond).toBe(true);
              }
              continue;
            }
            // Above the quantile: marked, and never more than one notch beyond — the notch below it asked no
            // more than the rail at the quantile gives where this step began (or there is none below).
            expect(s.protectionActs).toBe(true);
            if ((s.phase === "build" || s.phase === "accelerate") && i > 0) {
              // Taken because the notch below fell behind the pace the adhesion limit counts on (the target in
              // ten minutes from rest): the train gained speed more slowly than that just before.
              expect(accelerationBefore(p, s.startS)).toBeLessThan(1.5 * aMin);
            }
            expect(notchN(spec, s.notch - 1, fromKmh)).toBeLessThanOrEqual(railN(spec, median, cond.sigmaLn, q, fromKmh) * 1.0001);
          }
        },
      ),
      // Random seeds (fast-check prints the seed of a failure). The light train above is run first: its step
      // read 10.2 % at the overshoot past the target while the train gained 0.40 m/s² (the rule allows a step
      // beyond the rail only below 0.0056 m/s²); PROPERTY_RUNS=2000 for a deeper hunt.
      { numRuns: Math.max(100, deep), examples: [[lightTrain]] },
    );
    expect(plans).toBeGreaterThan(20);
  });
});
