/**
 * One story at the limit: over small seeded trains, every figure of a plan a user reads agrees with every
 * other — the verdict with its margin and binding limit, each step's slip risk with its mark, its why line,
 * its protection line and the plan's cautions, and the "still slipping" notch of the If-wheels-slip card with
 * the chance that notch slips in turn.
 *
 * The slip risks are worked out here from the published formulas, never from the program's output: the
 * lognormal adhesion [P: S. Johnsson, "Adhesion as a statistical problem", IMechE 1963] shaped over speed by
 * Curtius–Kniffler [S: Curtius & Kniffler, Elektrische Bahnen 20 (1950)], Φ and Φ⁻¹ from jStat (an independent
 * library); the risk of slipping again after a slip is the conditional probability P(μ < d_f | μ < d_n) =
 * Φ(z_f)/Φ(z_n) (the same lognormal; PHYSICS.md §2).
 */
import fc from "fast-check";
import jStat from "jstat";
import { describe, expect, it } from "vitest";
import { GRAVITY_MPS2, planStart, RAIL_CONDITIONS, type LocomotiveSpec, type PlanResult, type StartCase } from "../../src/core/index.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";

const lib = builtinLibrary();
const g = GRAVITY_MPS2;
const locoIds = [...lib.locomotives.keys()];
const wagonIds = [...lib.wagons.keys()];
const deep = Number(process.env.PROPERTY_RUNS ?? 0);

/** Curtius–Kniffler μ(v) = 7.5/(v + 44) + 0.161, v in km/h. */
const ck = (kmh: number) => 7.5 / (kmh + 44) + 0.161;

/** Notch n's effort of one unit, N: F = min(F_start·s_n, P_rail·p_n / v) [PHYSICS.md §3]. */
function notchN(spec: LocomotiveSpec, n: number, kmh: number): number {
  if (n <= 0) return 0;
  const v = Math.max(kmh / 3.6, 1e-3);
  return Math.min(spec.startingTractiveEffortN * spec.notchStartingEffort[n - 1]!, (spec.railPowerW * spec.notchPower[n - 1]!) / v);
}

/** z of asking F of one unit at a speed: (ln μ_d − ln μ_median(v))/σ. */
function zOf(spec: LocomotiveSpec, median: number, sigmaLn: number, forceN: number, kmh: number): number {
  const muD = forceN / (spec.adhesionUtilisation * spec.adhesiveMassKg * g);
  return (Math.log(muD) - Math.log(median * (ck(kmh) / ck(0)))) / sigmaLn;
}
const riskOf = (spec: LocomotiveSpec, median: number, sigmaLn: number, forceN: number, kmh: number) =>
  forceN <= 0 ? 0 : jStat.normal.cdf(zOf(spec, median, sigmaLn, forceN, kmh), 0, 1);

/** What the rail at quantile q passes to one unit at a speed, N. */
function railN(spec: LocomotiveSpec, median: number, sigmaLn: number, q: number, kmh: number): number {
  return spec.adhesionUtilisation * median * Math.exp(sigmaLn * jStat.normal.inv(q, 0, 1)) * (ck(kmh) / ck(0)) * spec.adhesiveMassKg * g;
}

interface Draw {
  loco: string;
  count: number;
  wagonType: string;
  wagons: number;
  load: number;
  grade: number;
  curveRadius: number;
  rail: (typeof RAIL_CONDITIONS)[number];
  sand: boolean;
  targetKmh: number;
}

export function caseOf(d: Draw): StartCase {
  const w = lib.wagons.get(d.wagonType)!;
  const perWagonT = (w.tareKg + d.load * (w.maxGrossKg - w.tareKg)) / 1000;
  const r = parseStartCase(
    {
      schema: "taut/start-case@1",
      locomotives: [{ profile: d.loco, count: d.count, position: "head" }],
      train: { trailingMass_t: perWagonT * d.wagons, wagons: d.wagons, length_m: d.wagons * w.lengthM, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 3000, wagonType: d.wagonType },
      location: { gradient_permille: d.grade, curveRadius_m: d.curveRadius, clearAhead_m: 3000 },
      conditions: { rail: d.rail, sand: d.sand, temperature_C: 10 },
      target: { speed_kmh: d.targetKmh },
    },
    lib,
  );
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

/** Every disagreement between two figures of one plan, in words (empty: one story). */
export function disagreements(c: StartCase, p: PlanResult): string[] {
  const out: string[] = [];
  const say = (ok: boolean, what: string) => {
    if (!ok) out.push(what);
  };
  // The verdict, its margin and its binding limit (README "How Taut decides": starts ⇔ margin ≥ 1).
  const least = p.limits.reduce((b, l) => (l.margin < b.margin ? l : b));
  say(p.margin === least.margin, `margin ${p.margin} is not the least limit's ${least.margin}`);
  say(p.binding === least.name, `binding ${p.binding} is not the least limit ${least.name}`);
  say((p.verdict === "starts") === p.margin >= 1, `verdict ${p.verdict} with margin ${p.margin}`);
  say(p.verdict !== "starts" || p.limits.every((l) => l.level === "within"), "starts with a limit not within");
  say(p.verdict !== "marginal" || p.limits.some((l) => l.level !== "within"), "marginal with every limit within");
  for (const l of p.limits) say(p.margins[l.reason] <= l.margin, `margins.${l.reason} ${p.margins[l.reason]} above limit ${l.name} ${l.margin}`);
  say(p.verdict === "needs-assistance" ? p.steps.length === 0 : p.steps.length > 0, `${p.verdict} with ${p.steps.length} steps`);
  if (p.steps.length === 0) return out;

  const spec = c.locomotives[0]!.spec;
  const cond = c.adhesion[c.conditions.rail];
  const median = c.conditions.sand && spec.sanders ? cond.sanded : cond.median;
  const q = p.planQuantile;
  const threshold = c.settings.slipRiskThreshold;
  const targetKmh = c.target.kind === "speed" ? c.target.speedMps * 3.6 : Infinity;
  let marked = 0;
  p.steps.forEach((s, i) => {
    const n = `step ${i + 1} (notch ${s.notch})`;
    // Its slip risk by hand, where it asks the most of the rail; within the step and the plan (up to the target).
    const atKmh = s.adhesionUseAt.speedMps * 3.6;
    const hand = riskOf(spec, median, cond.sigmaLn, notchN(spec, s.notch, atKmh), atKmh);
    say(Math.abs(s.slipRisk - hand) < 5e-4, `${n}: slip risk ${s.slipRisk} against ${hand} by hand at ${atKmh} km/h`);
    say(atKmh <= targetKmh + 1e-9, `${n}: its slip risk taken at ${atKmh} km/h, beyond the target`);
    say(s.speedMps * 3.6 <= targetKmh + 1e-9, `${n}: ends at ${s.speedMps * 3.6} km/h, beyond the target`);
    // The mark: exactly the steps whose risk is above the plan's quantile — the notch asks more than that rail gives.
    say(s.protectionActs === s.slipRisk > q + 1e-9, `${n}: marked ${s.protectionActs} with slip risk ${s.slipRisk} against quantile ${q}`);
    say((s.why.protection !== null) === s.protectionActs, `${n}: protection line ${s.why.protection !== null} but marked ${s.protectionActs}`);
    if (s.protectionActs) {
      marked++;
      const pr = s.why.protection!;
      say(pr.risk === s.slipRisk, `${n}: protection line risk ${pr.risk} against the step's ${s.slipRisk}`);
      say(pr.asksN > pr.givesN, `${n}: protection line asks ${pr.asksN} N, gives ${pr.givesN} N`);
      say(notchN(spec, s.notch, atKmh) > railN(spec, median, cond.sigmaLn, q, atKmh), `${n}: marked, but by hand the notch asks no more than the rail at ${q} there`);
    }
    // The why line tells the same risk and effort as the table.
    const w = s.why.line;
    if (w.code === "build") {
      say(w.risk === s.slipRisk, `${n}: why line risk ${w.risk} against ${s.slipRisk}`);
      say(w.atMps === s.adhesionUseAt.speedMps, `${n}: why line at ${w.atMps} against ${s.adhesionUseAt.speedMps}`);
      say(w.asksN === s.adhesionUseAt.tractiveEffortN, `${n}: why line asks ${w.asksN} against ${s.adhesionUseAt.tractiveEffortN}`);
    }
    if (w.code === "accelerate") {
      say(w.risk === s.slipRisk, `${n}: why line risk ${w.risk} against ${s.slipRisk}`);
      say(w.effortN === s.tractiveEffortN, `${n}: why line effort ${w.effortN} against ${s.tractiveEffortN}`);
      // "A higher notch would ask more than the rail gives": by hand, the next notch asks more than the rail at
      // the plan's quantile somewhere between where this one was taken and the target.
      if (w.higherNoMore && p.startKind === "power" && s.notch < spec.notchPower.length) {
        const from = i > 0 ? Math.max(0, p.steps[i - 1]!.speedMps * 3.6) : 0;
        let beyond = false;
        for (let v = from; v <= s.speedMps * 3.6 + 1e-9; v += 0.05) beyond ||= notchN(spec, s.notch + 1, v) > railN(spec, median, cond.sigmaLn, q, v);
        say(beyond, `${n}: "a higher notch asks more than the rail" but notch ${s.notch + 1} stays within from ${from} km/h to the target`);
      }
    }
    // The If-wheels-slip card's "still slipping" notch: lower than the step's (or the lowest), and, once a slip
    // has shown the rail gives less than this notch asks, it slips again with no more than the threshold's chance.
    if (s.notch > 1) {
      const v = s.speedMps * 3.6;
      say(s.fallbackNotch >= 1 && s.fallbackNotch < s.notch, `${n}: fallback ${s.fallbackNotch}`);
      if (s.fallbackNotch > 1) {
        const again = (f: number) => {
          const zn = zOf(spec, median, cond.sigmaLn, notchN(spec, s.notch, v), v);
          const zf = zOf(spec, median, cond.sigmaLn, Math.min(notchN(spec, f, v), notchN(spec, s.notch, v)), v);
          const atSlip = jStat.normal.cdf(zn, 0, 1);
          // A notch that never slips on this rail (Φ underflows): nothing to slip again.
          return atSlip > 0 ? Math.min(1, jStat.normal.cdf(zf, 0, 1) / atSlip) : 0;
        };
        say(again(s.fallbackNotch) <= threshold + 1e-6, `${n}: fallback ${s.fallbackNotch} slips again with ${again(s.fallbackNotch)}`);
        say(s.fallbackNotch === s.notch - 1 || again(s.fallbackNotch + 1) > threshold - 1e-6, `${n}: fallback ${s.fallbackNotch} is not the highest such notch`);
      }
    }
  });
  // The caution counts the marked steps.
  const caution = p.cautions.find((x) => x.code === "protection-acts") as { steps: number } | undefined;
  say((caution?.steps ?? 0) === marked, `caution counts ${caution?.steps ?? 0} marked steps, the table ${marked}`);
  // The time to target and the time-to-target limit, the plan's peak coupler force and the tension limit —
  // when the plan shown is the one the limits judged (a marginal plan made on the rail at the marginal bound
  // is another run: its figures differ from the threshold's limits by design; reported, not fixed here).
  if (q !== threshold) return out;
  const ttt = p.limits.find((l) => l.name === "time-to-target");
  if (ttt && p.timeToTargetS !== null && ttt.what.code === "target-reached") say(Math.abs(ttt.demand - p.timeToTargetS) < 1e-6, `time to target ${p.timeToTargetS} s, its limit ${ttt.demand} s`);
  const tension = p.limits.find((l) => l.name === "coupler-tension");
  if (tension) say(Math.abs(tension.demand - p.peakCouplerForceN) <= 1e-6 * Math.max(1, tension.demand), `peak coupler force ${p.peakCouplerForceN} N, its limit's ${tension.demand} N`);
  return out;
}

describe("a notch within the rail that creeps towards its limit is not held: 2 × 3000 kW units, 13 empty hoppers (312 t), 600 m curve, leaves unsanded, 27 km/h", () => {
  const d: Draw = { loco: "illustrative-6axle-3000", count: 2, wagonType: "bogie-hopper-empty", wagons: 13, load: 0, grade: 0, curveRadius: 600, rail: "leaves", sand: false, targetKmh: 27 };
  const c = caseOf(d);
  const spec = c.locomotives[0]!.spec;
  // Leaves, unsanded: median 0.06, σ(ln μ) 0.40 [M: profiles/conditions]; the threshold 10 %.
  const [median, sigma, q] = [0.06, 0.4, 0.1];
  const p = planStart(c, { skipMassSearch: true, skipVerification: true, skipSensitivity: true });
  const adhesion = p.limits.find((l) => l.name === "adhesion")!;

  // [D] The speed from which notch 2 asks no more than the rail at its 10 % quantile: its power, 2460 kW ×
  // 0.0962 = 236.7 kW a unit, falls with speed faster than the rail — within from about 25.4 km/h (33.6 kN).
  let lo = 15;
  let hi = 27;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (notchN(spec, 2, mid) <= railN(spec, median, sigma, q, mid)) hi = mid;
    else lo = mid;
  }
  const notch2WithinFromKmh = hi;

  it("by hand: notch 2 is within the rail only from 25.4 km/h, where notch 1 barely gains speed, and notch 1 cannot reach the target [D]", () => {
    expect(notch2WithinFromKmh).toBeCloseTo(25.4, 1);
    // At 20 km/h notch 2 asks 3.6 × 236.7 / 20 = 42.6 kN a unit against the rail's 34.7 kN.
    expect(notchN(spec, 2, 20) / 1000).toBeCloseTo(42.6, 1);
    expect(railN(spec, median, sigma, q, 20) / 1000).toBeCloseTo(34.7, 1);
    // Notch 1 of two units: 2 × 2460 kW × 0.0325 = 159.9 kW; at 27 km/h 159.9 × 3.6 / 27 = 21.3 kN, below the
    // effort the start needs there (the adhesion limit's demand: resistance and the slowest acceleration);
    // at 25.4 km/h 22.7 kN.
    expect((2 * notchN(spec, 1, 27)) / 1000).toBeCloseTo(21.3, 1);
    expect(adhesion.what.code).toBe("adhesion-path");
    expect(2 * notchN(spec, 1, 27)).toBeLessThan(adhesion.demand);
    expect((2 * notchN(spec, 1, notch2WithinFromKmh)) / 1000).toBeCloseTo(22.7, 1);
  });

  it("the plan on the rail its verdict assumes reaches the target: notch 2 beyond the rail, marked, once notch 1 no longer keeps the pace — not a plan given up short of it", () => {
    // Before: notch 1 held to 25.1 km/h for ten minutes, the target out of reach (92 %), the verdict marginal on
    // the time to target while the rail passed 2.19 times the need.
    expect(p.timeToTargetS).not.toBeNull();
    expect(p.verdict).toBe("starts");
    expect(p.binding).toBe("adhesion");
    const last = p.steps[p.steps.length - 1]!;
    expect(last.notch).toBe(2);
    expect(last.advanceWhen.primary).toBe("target");
    expect(last.protectionActs).toBe(true);
    const before = p.steps[p.steps.length - 2]!;
    expect(before.speedMps * 3.6).toBeLessThan(notch2WithinFromKmh);
    expect(disagreements(c, p)).toEqual([]);
  });
});

/** A small train at random: every locomotive and wagon profile, every rail, grades both ways, some curves. */
export const draws = fc.record<Draw>({
  loco: fc.constantFrom(...locoIds),
  count: fc.integer({ min: 1, max: 2 }),
  wagonType: fc.constantFrom(...wagonIds),
  wagons: fc.integer({ min: 5, max: 14 }),
  load: fc.double({ min: 0, max: 1, noNaN: true }),
  grade: fc.double({ min: -12, max: 18, noNaN: true }),
  curveRadius: fc.constantFrom(0, 0, 300, 600),
  rail: fc.constantFrom(...RAIL_CONDITIONS),
  sand: fc.boolean(),
  targetKmh: fc.integer({ min: 5, max: 30 }),
});

if (!process.env.HUNT) describe("one story at the limit: every figure of a small train's plan agrees with every other", () => {
  it("verdict, margin, binding limit, each step's slip risk, mark, why and protection lines, cautions and the slip card's notch", () => {
    fc.assert(
      fc.property(draws, (d) => {
        const c = caseOf(d);
        const p = planStart(c, { skipMassSearch: true, skipVerification: true, skipSensitivity: true });
        expect(disagreements(c, p)).toEqual([]);
      }),
      { numRuns: Math.max(60, deep) },
    );
  });
});
