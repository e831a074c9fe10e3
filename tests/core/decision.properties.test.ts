/**
 * Property tests (fast-check) of the one decision (README "How Taut decides"): its equivalences hold by
 * construction across plan, check, table and the worker; a stronger locomotive, more units, a better rail,
 * sand or an easier grade never make a start worse; time to target never shortens as the mass grows within a
 * verdict band; curve resistance never falls as the radius shrinks. Every locomotive and wagon profile in
 * profiles/ takes part. On a failure fast-check prints the seed and the smallest counterexample.
 *
 * Run counts, and why: the cheap properties (a formula, or the limits known before any dynamics, about a
 * millisecond a case) run 2,000+ cases each. Those that run the planner's full dynamics (0.05–0.3 s a case on
 * the 8–16-wagon trains drawn here, a mass search about ten of those) run a few dozen, so the whole file
 * stays near half a minute on one core; PROPERTY_RUNS raises the planner-level counts for a deeper search.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  bindingLimit,
  conditionMargin,
  curveResistancePermille,
  goesAt,
  judge,
  limitCheck,
  loadTableRow,
  marginalBound,
  planStart,
  plannerContext,
  quasiStaticLimits,
  RAIL_CONDITIONS,
  startsAt,
  withTrailingMass,
  type LocomotiveSpec,
  type RailCondition,
  type StartCase,
} from "../../src/core/index.js";
import { runJob, type MassOutcome } from "../../src/cli/batch/jobs.js";
import { runLoadTable } from "../../src/worker/jobs.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";

const lib = builtinLibrary();
const locoIds = [...lib.locomotives.keys()];
const wagonIds = [...lib.wagons.keys()];
/** Planner-level runs; raise for a deeper search, e.g. PROPERTY_RUNS=200. */
const deep = Number(process.env.PROPERTY_RUNS ?? 0);
const runs = (n: number) => ({ numRuns: Math.max(n, deep) });

/** Rail conditions from best to worst by the default table at every quantile (tests/core/properties.test.ts). */
const WORSENING: RailCondition[] = ["dry", "wet", "damp", "frost", "greasy", "leaves"];

interface Draw {
  loco: string;
  count: number;
  wagonType: string;
  wagons: number;
  /** Load per wagon between the type's tare and its gross, as a fraction. */
  load: number;
  grade: number;
  curve: number;
  rail: RailCondition;
  sand: boolean;
  targetKmh: number;
  temperature: number;
}

const draw = (wagons: { min: number; max: number }, grade: { min: number; max: number }) =>
  fc.record<Draw>({
    loco: fc.constantFrom(...locoIds),
    count: fc.integer({ min: 1, max: 2 }),
    wagonType: fc.constantFrom(...wagonIds),
    wagons: fc.integer(wagons),
    load: fc.double({ min: 0, max: 1, noNaN: true }),
    grade: fc.double({ min: grade.min, max: grade.max, noNaN: true }),
    curve: fc.oneof(fc.constant(0), fc.integer({ min: 150, max: 2000 })),
    rail: fc.constantFrom(...RAIL_CONDITIONS),
    sand: fc.boolean(),
    targetKmh: fc.integer({ min: 8, max: 25 }),
    temperature: fc.integer({ min: -20, max: 30 }),
  });

/** A resolved start case; couplings strong and the distance clear long, so adhesion and power decide. */
function caseOf(d: Draw, over: { spec?: LocomotiveSpec; couplerLimit_kN?: number } = {}): StartCase {
  const w = lib.wagons.get(d.wagonType)!;
  const perWagonT = (w.tareKg + d.load * (w.maxGrossKg - w.tareKg)) / 1000;
  const r = parseStartCase(
    {
      schema: "taut/start-case@1",
      locomotives: [{ profile: d.loco, count: d.count, position: "head" }],
      train: {
        trailingMass_t: perWagonT * d.wagons,
        wagons: d.wagons,
        length_m: d.wagons * w.lengthM,
        couplerSlack_mm: 50,
        bearing: "roller",
        couplerLimit_kN: over.couplerLimit_kN ?? 3000,
        wagonType: d.wagonType,
      },
      location: { gradient_permille: d.grade, curveRadius_m: d.curve, clearAhead_m: 3000 },
      conditions: { rail: d.rail, sand: d.sand, temperature_C: d.temperature },
      target: { speed_kmh: d.targetKmh },
    },
    lib,
  );
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

type Variation = "effort" | "power" | "adhesive-mass" | "count" | "rail" | "sand" | "grade";
const VARIATIONS: Variation[] = ["effort", "power", "adhesive-mass", "count", "rail", "sand", "grade"];

/** The case made stronger (or easier) in one respect, by `k` ≥ 1 where it scales. */
function stronger(c: StartCase, v: Variation, k: number): StartCase {
  const spec = c.locomotives[0]!.spec;
  const withSpec = (s: LocomotiveSpec): StartCase => ({ ...c, locomotives: c.locomotives.map((g) => ({ ...g, spec: s })) });
  switch (v) {
    case "effort":
      return withSpec({ ...spec, startingTractiveEffortN: spec.startingTractiveEffortN * k });
    case "power":
      return withSpec({ ...spec, railPowerW: spec.railPowerW * k });
    case "adhesive-mass":
      // More of the unit's own mass on driven axles (never more than all of it).
      return withSpec({ ...spec, adhesiveMassKg: Math.min(spec.massKg, spec.adhesiveMassKg * k) });
    case "count":
      return { ...c, locomotives: c.locomotives.map((g, i) => (i === 0 ? { ...g, count: g.count + 1 } : g)) };
    case "rail": {
      const i = WORSENING.indexOf(c.conditions.rail);
      return { ...c, conditions: { ...c.conditions, rail: WORSENING[Math.max(0, i - 1)]! } };
    }
    case "sand":
      return { ...c, conditions: { ...c.conditions, sand: true } };
    case "grade":
      // A rising grade eased (never below level).
      return { ...c, location: { ...c.location, track: { segments: c.location.track.segments.map((s) => ({ ...s, gradePermille: Math.max(0, s.gradePermille - 3 * (k - 1) - 0.5) })) } } };
  }
}

const qsLimits = (c: StartCase) => quasiStaticLimits(plannerContext(c), marginalBound(c.settings)).limits;
const marginOf = (ls: ReturnType<typeof qsLimits>, name: string) => ls.find((l) => l.name === name)?.margin ?? 99;

describe("curve resistance (cheap: 3,000 cases)", () => {
  it("never falls as the radius shrinks, and has no jump", () => {
    fc.assert(
      fc.property(fc.double({ min: 31, max: 5000, noNaN: true }), fc.double({ min: 31, max: 5000, noNaN: true }), (a, b) => {
        const [sharp, wide] = a < b ? [a, b] : [b, a];
        expect(curveResistancePermille(sharp)).toBeGreaterThanOrEqual(curveResistancePermille(wide));
        // Continuity: a millimetre changes it by a tiny amount (the steepest slope, 500/(R − 30)² ‰ per m at
        // R = 31 m, is 500 ‰/m; nowhere else near it).
        expect(Math.abs(curveResistancePermille(sharp) - curveResistancePermille(sharp + 1e-3))).toBeLessThan(0.5);
      }),
      { numRuns: 3000 },
    );
  });
});

describe("the verdict's arithmetic (cheap: 5,000 cases)", () => {
  // A limit is met exactly when its margin is at least 1, the binding limit is the smallest margin, so
  // "starts" (every limit met) ⇔ binding margin ≥ 1 — whatever the demands, allowances and bands.
  it("within ⇔ margin ≥ 1; soft only inside its band; the binding margin is the smallest", () => {
    const limitArb = fc.record({
      demand: fc.double({ min: -1e6, max: 1e7, noNaN: true }),
      allowance: fc.double({ min: 0, max: 1e7, noNaN: true }),
      band: fc.option(fc.record({ demand: fc.double({ min: 0, max: 1e7, noNaN: true }), allowance: fc.double({ min: 0, max: 1e7, noNaN: true }) }), { nil: null }),
    });
    fc.assert(
      fc.property(fc.array(limitArb, { minLength: 1, maxLength: 7 }), (ls) => {
        const checks = ls.map((l) => limitCheck("adhesion", "N", l.demand, l.allowance, l.band ? { ...l.band, what: { code: "no-reserve" } } : null, { code: "gravity" }));
        for (const c of checks) {
          expect(c.level === "within").toBe(c.margin >= 1);
          if (c.level === "soft") expect(c.band!.allowance).toBeGreaterThanOrEqual(c.band!.demand);
          if (c.demand > 0 && c.margin < 99) expect(c.margin).toBeCloseTo(c.allowance / c.demand, 9);
        }
        const b = bindingLimit(checks);
        expect(b.margin).toBe(Math.min(...checks.map((c) => c.margin)));
        expect(checks.every((c) => c.level === "within")).toBe(b.margin >= 1);
      }),
      { numRuns: 5000 },
    );
  });
});

describe("stronger is never worse, before any dynamics (cheap: 2,100 cases)", () => {
  // Every locomotive and wagon profile, trains of 1–60 wagons on rising or level track.
  it("a start whose adhesion, power and brake holding are within stays so when strengthened; margins that carry no added mass never fall", () => {
    fc.assert(
      fc.property(draw({ min: 1, max: 60 }, { min: 0, max: 30 }), fc.constantFrom(...VARIATIONS), fc.double({ min: 1, max: 2, noNaN: true }), (d, v, k) => {
        const c = caseOf(d);
        const s = stronger(c, v, k);
        const [lc, ls] = [qsLimits(c), qsLimits(s)];
        if (lc.every((l) => l.level === "within")) expect(ls.every((l) => l.level === "within")).toBe(true);
        if (v !== "count") {
          for (const name of ["adhesion", "power"]) expect(marginOf(ls, name)).toBeGreaterThanOrEqual(marginOf(lc, name) - 1e-9);
        }
      }),
      { numRuns: 2100 },
    );
  });
});

describe("one story across plan, check, table and the worker (planner level: 8 cases, each with two mass searches)", () => {
  it("starts ⇔ margin ≥ 1 ⇔ mass ≤ largest startable; needs assistance ⇔ mass > largest marginal; every surface gives the same figures", () => {
    fc.assert(
      fc.property(draw({ min: 8, max: 14 }, { min: -5, max: 18 }), (d) => {
        const c = caseOf(d, { couplerLimit_kN: 970 });
        const p = planStart(c, { skipVerification: true });
        const m = c.train.trailingMassKg;
        expect(p.verdict === "starts").toBe(p.margin >= 1);
        expect(p.verdict === "starts").toBe(m <= p.maxStartableMassKg);
        expect(p.verdict === "needs-assistance").toBe(m > p.largestMarginalMassKg);
        expect(p.margin).toBe(Math.min(...p.limits.map((l) => l.margin)));
        expect(p.limits.find((l) => l.name === p.binding)!.margin).toBe(p.margin);
        if (p.verdict === "needs-assistance") expect(p.steps).toEqual([]);
        else expect(p.timeToTargetS).not.toBeNull();
        // The margins per rail condition, the load table (core, command line's job, app's worker) and the
        // plan's own search give the same figures for the same case.
        const row = conditionMargin(c, c.conditions.rail, c.conditions.sand);
        expect([row.verdict, row.margin, row.binding]).toEqual([p.verdict, p.margin, p.binding]);
        // The load table shows the make-up's figure (README "Largest masses"): the plan's own, unless the
        // train's own verdict disagrees with it (near a limit where the verdict is not monotone in mass).
        const cell = loadTableRow(c, c.conditions.rail, c.conditions.sand).maxTrailingMassKg;
        if ((m <= cell) === (p.verdict === "starts")) expect(cell).toBe(p.maxStartableMassKg);
        expect((runJob({ kind: "mass", case: c, own: p.verdict }) as MassOutcome).largestMarginalMassKg).toBe(p.largestMarginalMassKg);
        expect(runLoadTable(structuredClone(c), [{ rail: c.conditions.rail, sand: c.conditions.sand }])[0]!.maxTrailingMassKg).toBe(cell);
      }),
      runs(8),
    );
  });
});

describe("the same story with several control groups and mixed trains (planner level: 6 cases, each with two mass searches)", () => {
  // A unit at the rear (remote or helper, its own notch) and, half the time, the wagons as two groups of
  // different load: the invariants of the one decision hold as they do for a train of one group.
  it("starts ⇔ margin ≥ 1 ⇔ mass ≤ largest startable; needs assistance ⇔ mass > largest marginal", () => {
    fc.assert(
      fc.property(draw({ min: 8, max: 12 }, { min: 0, max: 15 }), fc.constantFrom("remote", "helper"), fc.boolean(), (d, control, mixed) => {
        const base = caseOf(d, { couplerLimit_kN: 600 });
        const rear = { ...base.locomotives[0]!, count: 1, position: "rear" as const, control: control as "remote" | "helper" };
        const w = base.train.wagon;
        const split = Math.floor(base.train.wagons / 2);
        const perWagon = base.train.trailingMassKg / base.train.wagons;
        const light = Math.max(5000, Math.min(perWagon, (w.tareKg ?? perWagon) * 1.0));
        const train = mixed
          ? { ...base.train, groups: [{ wagons: split, wagon: w, massKg: light * split }, { wagons: base.train.wagons - split, wagon: w, massKg: perWagon * (base.train.wagons - split) }] }
          : base.train;
        const c: StartCase = { ...base, locomotives: [...base.locomotives, rear], train: mixed ? { ...train, trailingMassKg: train.groups!.reduce((a, g) => a + g.massKg, 0) } : train };
        const p = planStart(c, { skipVerification: true });
        const m = c.train.trailingMassKg;
        expect(p.verdict === "starts").toBe(p.margin >= 1);
        expect(p.verdict === "starts").toBe(m <= p.maxStartableMassKg);
        expect(p.verdict === "needs-assistance").toBe(m > p.largestMarginalMassKg);
        expect(p.margin).toBe(Math.min(...p.limits.map((l) => l.margin)));
        // Units pushing: the wheel-climb check is made, and every step names both groups' notches.
        expect(p.limits.some((l) => l.name === "wheel-climb")).toBe(true);
        for (const s of p.steps) expect(s.groups?.length).toBe(2);
      }),
      runs(6),
    );
  });
});

describe("stronger is never worse, in the planned start (planner level: 60 cases)", () => {
  // Trains of 8–16 wagons, couplings strong and the clear distance long so that effort decides.
  it("what starts (or is at least marginal) with a weaker set-up still does with a stronger one", () => {
    let exercised = 0;
    fc.assert(
      fc.property(draw({ min: 8, max: 16 }, { min: 0, max: 20 }), fc.constantFrom(...VARIATIONS), fc.double({ min: 1.05, max: 1.6, noNaN: true }), (d, v, k) => {
        const c = caseOf(d);
        const s = stronger(c, v, k);
        if (startsAt(c)) {
          exercised++;
          expect(startsAt(s)).toBe(true);
        } else if (goesAt(c)) {
          exercised++;
          expect(goesAt(s)).toBe(true);
        }
      }),
      runs(60),
    );
    // The draws are not all trains that need help anyway (the property would then say nothing).
    expect(exercised).toBeGreaterThan(10);
  });
});

/**
 * The one place a heavier train can be a little quicker: it may need the next notch to get every wagon moving
 * (the stretch takes the lowest notch that does), where the lighter one crept out of its slack a notch lower
 * and built up from there. That is bounded by the stretch of one notch: two notch dwells (2 × 3 s, the
 * practice minimum between notches) [common practice].
 */
const STRETCH_STEP_S = 6;

/**
 * Steps of the shown plan whose notch asks more than the rail its plan assumes gives (README "How Taut decides",
 * Steps): a plan takes one only where no notch within keeps the start at its pace, and the slip protection then
 * holds it at what the rail gives — more than the notch below gave. A heavier train falls behind that pace
 * sooner and takes such a step earlier, so it may reach its target sooner than a lighter one that held the
 * notch within for longer (seen: 254 t in 88 s, 216 t in 159 s, two 1800 kW units on frost). Plans that keep
 * within the rail ask the same efforts at the same speeds whatever the mass: those pairs are compared.
 */
const beyondSteps = (d: ReturnType<typeof judge>): number => d.shown.search!.branch.steps.filter((s) => s.notch > 0 && s.maxRisk > d.shown.ctx.quantile + 1e-9).length;

describe("time to target within a verdict band (planner level: 40 cases)", () => {
  it("never shortens as the mass grows (beyond one stretch notch)", () => {
    let compared = 0;
    let worstDrop = 0;
    fc.assert(
      fc.property(draw({ min: 8, max: 16 }, { min: 0, max: 15 }), fc.double({ min: 1.02, max: 1.3, noNaN: true }), (d, k) => {
        const c = caseOf(d, { couplerLimit_kN: 970 });
        const light = judge(c);
        const heavy = judge(withTrailingMass(c, c.train.trailingMassKg * k));
        const time = (x: typeof light) => (x.shown.search!.targetReachedS === null ? null : x.shown.search!.targetReachedS - x.shown.search!.powerS);
        const [tl, th] = [time(light), time(heavy)];
        if (light.verdict === heavy.verdict && light.verdict !== "needs-assistance" && tl !== null && th !== null && beyondSteps(heavy) === 0 && beyondSteps(light) === 0) {
          compared++;
          worstDrop = Math.max(worstDrop, tl - th);
          expect(th).toBeGreaterThanOrEqual(tl - STRETCH_STEP_S);
        }
      }),
      runs(40),
    );
    expect(compared).toBeGreaterThan(10);
    if (process.env.PROPERTY_RUNS) console.log(`largest shortening seen: ${worstDrop.toFixed(1)} s over ${compared} pairs`);
  });
});
