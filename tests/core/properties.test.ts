/**
 * Property tests (fast-check): invariants of the static start check that must hold for every case, not
 * only the worked examples. Run counts are modest so the suite stays fast; on a failure fast-check prints
 * the seed and the smallest counterexample it found.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  adhesionQuantile,
  medianAdhesion,
  RAIL_CONDITIONS,
  staticCheck,
  type LocoGroup,
  type RailCondition,
  type StartCase,
} from "../../src/core/index.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";

const lib = builtinLibrary();
const locoIds = [...lib.locomotives.keys()];
const wagonIds = [...lib.wagons.keys()];
/** Runs per property; raise it for a deeper search, e.g. PROPERTY_RUNS=5000 npm test. */
const RUNS = { numRuns: Number(process.env.PROPERTY_RUNS ?? 60) };

/** Rail conditions from best to worst by median adhesion in the default table (PHYSICS.md §2). */
const WORSENING: RailCondition[] = ["dry", "wet", "damp", "frost", "greasy", "leaves"];

// ---------------------------------------------------------------- arbitraries
const railArb = fc.constantFrom(...RAIL_CONDITIONS);
const curveArb = fc.oneof(fc.constant(0), fc.integer({ min: 80, max: 3000 }));

/** Any start case the file schema accepts (uniform location), in file form. */
const caseFileArb = fc
  .record({
    loco: fc.constantFrom(...locoIds),
    count: fc.integer({ min: 1, max: 3 }),
    position: fc.constantFrom<"head" | "rear" | "mid">("head", "rear", "mid"),
    midAt: fc.double({ min: 0, max: 0.999, noNaN: true }),
    // Per wagon within the schema's 5–150 t (src/profiles/schemas.ts); up to 15 000 t in all.
    massPerWagon_t: fc.double({ min: 5, max: 100, noNaN: true }),
    wagons: fc.integer({ min: 1, max: 150 }),
    wagonLength_m: fc.double({ min: 8, max: 25, noNaN: true }),
    couplerSlack_mm: fc.integer({ min: 0, max: 200 }),
    bearing: fc.constantFrom<"roller" | "plain">("roller", "plain"),
    couplerLimit_kN: fc.integer({ min: 100, max: 3000 }),
    wagonType: fc.option(fc.constantFrom(...wagonIds), { nil: undefined }),
    gradient_permille: fc.double({ min: -60, max: 60, noNaN: true }),
    curveRadius_m: curveArb,
    clearAhead_m: fc.integer({ min: 0, max: 5000 }),
    rail: railArb,
    sand: fc.boolean(),
    temperature_C: fc.integer({ min: -60, max: 60 }),
  })
  .map((r) => ({
    schema: "taut/start-case@1",
    locomotives: [{ profile: r.loco, count: r.count, position: r.position === "mid" ? { afterWagon: Math.max(1, Math.floor(r.midAt * r.wagons)) } : r.position }],
    train: {
      trailingMass_t: r.massPerWagon_t * r.wagons,
      wagons: r.wagons,
      length_m: r.wagons * r.wagonLength_m,
      couplerSlack_mm: r.couplerSlack_mm,
      bearing: r.bearing,
      couplerLimit_kN: r.couplerLimit_kN,
      ...(r.wagonType ? { wagonType: r.wagonType } : {}),
    },
    location: { gradient_permille: r.gradient_permille, curveRadius_m: r.curveRadius_m, clearAhead_m: r.clearAhead_m },
    conditions: { rail: r.rail, sand: r.sand, temperature_C: r.temperature_C },
    target: { speed_kmh: 20 },
  }));

/** A resolved case on level or rising track (see the note on falling grades below). */
const risingCaseArb = fc
  .record({
    file: caseFileArb,
    gradient_permille: fc.double({ min: 0, max: 40, noNaN: true }),
  })
  .map(({ file, gradient_permille }) => ({ ...file, location: { ...file.location, gradient_permille } }));

function resolve(file: unknown): StartCase | undefined {
  const r = parseStartCase(file, lib);
  return r.ok ? r.value : undefined;
}

const withMass = (c: StartCase, kg: number): StartCase => ({ ...c, train: { ...c.train, trailingMassKg: kg } });
const withRail = (c: StartCase, rail: RailCondition, sand = c.conditions.sand): StartCase => ({ ...c, conditions: { ...c.conditions, rail, sand } });

// ---------------------------------------------------------------- properties
describe("static start check: properties over generated cases", () => {
  it("every valid case gives finite numbers and a verdict", () => {
    fc.assert(
      fc.property(caseFileArb, (file) => {
        const c = resolve(file);
        fc.pre(c !== undefined); // e.g. afterWagon beyond the train: rejected at the boundary, tested elsewhere
        const s = staticCheck(c!);
        const r = s.resistance;
        for (const x of [r.startingN, r.gradeN, r.curveN, r.runningN, r.totalN, s.requiredN, s.availableN, s.currentLimitN, s.adhesionLimitN, s.peakTensionN, s.peakCompressionN, s.stretchTravelM, s.margin]) {
          expect(Number.isFinite(x)).toBe(true);
        }
        for (const m of Object.values(s.margins)) expect(Number.isFinite(m) && m >= 0).toBe(true);
        expect(s.slipRiskAtStart).toBeGreaterThanOrEqual(0);
        expect(s.slipRiskAtStart).toBeLessThanOrEqual(1);
        expect(["starts", "marginal", "needs-assistance"]).toContain(s.verdict);
        expect(s.verdict === "starts").toBe(s.reasons.length === 0);
        // The parts add up to the total (breakaway includes the running term at rest).
        expect(r.startingN + r.runningN + r.gradeN + r.curveN).toBeCloseTo(r.totalN, 3);
      }),
      RUNS,
    );
  });

  it("resistance grows with mass: breakaway, running and curve never fall; grade grows on a rising grade", () => {
    fc.assert(
      fc.property(caseFileArb, fc.double({ min: 1.01, max: 3, noNaN: true }), (file, factor) => {
        const c = resolve(file);
        fc.pre(c !== undefined);
        const a = staticCheck(c!).resistance;
        const b = staticCheck(withMass(c!, c!.train.trailingMassKg * factor)).resistance;
        const tol = 1e-6;
        expect(b.startingN + b.runningN).toBeGreaterThan(a.startingN + a.runningN - tol);
        expect(b.runningN).toBeGreaterThanOrEqual(a.runningN - tol);
        expect(b.curveN).toBeGreaterThanOrEqual(a.curveN - tol);
        expect(Math.abs(b.gradeN)).toBeGreaterThanOrEqual(Math.abs(a.gradeN) - tol);
        if (c!.location.track.segments[0]!.gradePermille >= 0) expect(b.totalN).toBeGreaterThan(a.totalN);
      }),
      RUNS,
    );
  });

  // On a falling grade gravity helps: a heavier train can need less effort to start (the check below shows
  // it), so "heavier never has a larger margin" is a claim about level and rising track.
  it("a heavier train never has a larger margin (level or rising track)", () => {
    fc.assert(
      fc.property(risingCaseArb, fc.double({ min: 1.01, max: 3, noNaN: true }), (file, factor) => {
        const c = resolve(file);
        fc.pre(c !== undefined);
        const light = staticCheck(c!);
        const heavy = staticCheck(withMass(c!, c!.train.trailingMassKg * factor));
        expect(heavy.margin).toBeLessThanOrEqual(light.margin + 1e-9);
        expect(heavy.margins.adhesion).toBeLessThanOrEqual(light.margins.adhesion + 1e-9);
        expect(heavy.margins.power).toBeLessThanOrEqual(light.margins.power + 1e-9);
        expect(heavy.margins.coupler).toBeLessThanOrEqual(light.margins.coupler + 1e-9);
        expect(heavy.slipRiskAtStart).toBeGreaterThanOrEqual(light.slipRiskAtStart - 1e-12);
      }),
      RUNS,
    );
  });

  it("on a falling grade steeper than the breakaway resistance, more mass means less to overcome (physics, not a bug)", () => {
    const c = resolve({
      schema: "taut/start-case@1",
      locomotives: [{ profile: locoIds[0], count: 1, position: "head" }],
      train: { trailingMass_t: 1000, wagons: 20, length_m: 300, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970 },
      location: { gradient_permille: -10, curveRadius_m: 0, clearAhead_m: 500 },
      conditions: { rail: "dry", sand: false, temperature_C: 10 },
      target: { speed_kmh: 10 },
    })!;
    expect(staticCheck(withMass(c, 2e6)).resistance.totalN).toBeLessThan(staticCheck(c).resistance.totalN);
  });

  it("a worse rail condition never gives more adhesion (dry > wet > damp > frost > greasy > leaves)", () => {
    fc.assert(
      fc.property(
        caseFileArb,
        fc.integer({ min: 0, max: WORSENING.length - 2 }),
        fc.integer({ min: 1, max: WORSENING.length - 1 }),
        fc.double({ min: 0, max: 40, noNaN: true }),
        (file, i, step, speedMps) => {
          const c = resolve(file);
          fc.pre(c !== undefined);
          const better = WORSENING[i]!;
          const worse = WORSENING[Math.min(WORSENING.length - 1, i + step)]!;
          for (const sand of [false, true]) {
            expect(medianAdhesion(c!.adhesion, worse, sand, speedMps)).toBeLessThanOrEqual(medianAdhesion(c!.adhesion, better, sand, speedMps));
            const b = staticCheck(withRail(c!, better, sand));
            const w = staticCheck(withRail(c!, worse, sand));
            expect(w.adhesionLimitN).toBeLessThanOrEqual(b.adhesionLimitN + 1e-9);
            expect(w.availableN).toBeLessThanOrEqual(b.availableN + 1e-9);
            expect(w.margins.adhesion).toBeLessThanOrEqual(b.margins.adhesion + 1e-9);
            for (let k = 0; k < b.locos.length; k++) {
              expect(w.locos[k]!.muMedian).toBeLessThanOrEqual(b.locos[k]!.muMedian);
              expect(w.locos[k]!.muDesign).toBeLessThanOrEqual(b.locos[k]!.muDesign);
            }
          }
        },
      ),
      RUNS,
    );
  });

  it("the ordering holds in the default table at every quantile a user may choose as slip-risk threshold", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.5, noNaN: true }), fc.boolean(), (p, sand) => {
        const mus = WORSENING.map((r) => {
          const e = lib.adhesion[r];
          return adhesionQuantile(sand ? e.sanded : e.median, e.sigmaLn, p);
        });
        for (let k = 1; k < mus.length; k++) expect(mus[k]!).toBeLessThanOrEqual(mus[k - 1]!);
      }),
      { numRuns: 200 },
    );
  });

  it("sand never lowers adhesion", () => {
    fc.assert(
      fc.property(caseFileArb, (file) => {
        const c = resolve(file);
        fc.pre(c !== undefined);
        const dry = staticCheck(withRail(c!, c!.conditions.rail, false));
        const sanded = staticCheck(withRail(c!, c!.conditions.rail, true));
        expect(sanded.adhesionLimitN).toBeGreaterThanOrEqual(dry.adhesionLimitN);
        expect(sanded.availableN).toBeGreaterThanOrEqual(dry.availableN);
        expect(sanded.slipRiskAtStart).toBeLessThanOrEqual(dry.slipRiskAtStart + 1e-12);
        for (const r of RAIL_CONDITIONS) expect(c!.adhesion[r].sanded).toBeGreaterThanOrEqual(c!.adhesion[r].median);
      }),
      RUNS,
    );
  });

  it("a locomotive without sanders gains nothing from sand", () => {
    const spec = { ...lib.locomotives.get(locoIds[0]!)!.spec, sanders: false };
    fc.assert(
      fc.property(caseFileArb, (file) => {
        const c0 = resolve(file);
        fc.pre(c0 !== undefined);
        const locomotives: LocoGroup[] = [{ spec, count: 1, position: "head" }];
        const c = { ...c0!, locomotives };
        expect(staticCheck(withRail(c, c.conditions.rail, true)).adhesionLimitN).toBe(staticCheck(withRail(c, c.conditions.rail, false)).adhesionLimitN);
      }),
      { numRuns: 20 },
    );
  });
});
