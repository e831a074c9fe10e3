/**
 * Load tables and margins per rail condition (issue: assistance, load tables, batch). The table must agree
 * with the planner: a trailing mass 2 % below a table value starts, 2 % above does not. Monotonic in the
 * physics: better rail, sand and a flatter location never lower the largest startable mass.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { conditionMargins, limitingReason, loadTable, planStart, plannerStarts, RAIL_CONDITIONS, withTrailingMass, type LoadTableRow, type StartCase } from "../../src/core/index.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";

const lib = builtinLibrary();
function caseOn(gradientPermille: number): StartCase {
  const r = parseStartCase(
    {
      schema: "taut/start-case@1",
      locomotives: [{ profile: "illustrative-6axle-3000", count: 1, position: "head" }],
      train: { trailingMass_t: 1200, wagons: 24, length_m: 336, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970, wagonType: "bogie-hopper-loaded" },
      location: { gradient_permille: gradientPermille, curveRadius_m: 0, clearAhead_m: 1500 },
      conditions: { rail: "dry", sand: false, temperature_C: 10 },
      target: { speed_kmh: 15 },
    },
    lib,
  );
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

const at = (rows: LoadTableRow[], rail: string, sand: boolean) => rows.find((r) => r.rail === rail && r.sand === sand)!.maxTrailingMassKg;

describe("load table", () => {
  const flat = caseOn(6);
  const steep = caseOn(12);
  let flatRows: LoadTableRow[] = [];
  let steepRows: LoadTableRow[] = [];
  beforeAll(() => {
    flatRows = loadTable(flat);
    steepRows = loadTable(steep);
  }, 240_000);

  it("has every rail condition without and with sand", () => {
    expect(flatRows.map((r) => `${r.rail}/${r.sand}`)).toEqual(RAIL_CONDITIONS.flatMap((r) => [`${r}/false`, `${r}/true`]));
    expect(at(flatRows, "dry", false)).toBeGreaterThan(500_000);
  });

  it("dry ≥ wet ≥ leaves, with and without sand", () => {
    for (const rows of [flatRows, steepRows]) {
      for (const sand of [false, true]) {
        expect(at(rows, "dry", sand)).toBeGreaterThanOrEqual(at(rows, "wet", sand));
        expect(at(rows, "wet", sand)).toBeGreaterThanOrEqual(at(rows, "leaves", sand));
      }
    }
  });

  it("sand never lowers it (the units have sanders)", () => {
    for (const rows of [flatRows, steepRows]) for (const rail of RAIL_CONDITIONS) expect(at(rows, rail, true)).toBeGreaterThanOrEqual(at(rows, rail, false));
  });

  it("a steeper location never allows more", () => {
    for (const r of steepRows) expect(r.maxTrailingMassKg).toBeLessThanOrEqual(at(flatRows, r.rail, r.sand));
    // …and here it allows clearly less on dry rail.
    expect(at(steepRows, "dry", false)).toBeLessThan(0.8 * at(flatRows, "dry", false));
  });

  it("agrees with the planner: 1 % and 2 % below a table value start, 1 % and 2 % above do not", () => {
    let checked = 0;
    for (const [base, rows] of [[flat, flatRows], [steep, steepRows]] as const) {
      for (const row of rows) {
        if (row.maxTrailingMassKg <= 0) continue;
        const c: StartCase = { ...base, conditions: { ...base.conditions, rail: row.rail, sand: row.sand } };
        for (const f of [0.98, 0.99]) expect(plannerStarts(withTrailingMass(c, f * row.maxTrailingMassKg)), `${row.rail}/${row.sand} × ${f}`).toBe(true);
        for (const f of [1.01, 1.02]) expect(plannerStarts(withTrailingMass(c, f * row.maxTrailingMassKg)), `${row.rail}/${row.sand} × ${f}`).toBe(false);
        checked++;
      }
    }
    expect(checked).toBeGreaterThanOrEqual(12);
  }, 180_000);

  it("…and with the full, verified plan `taut plan` makes, on dry and wet rail", () => {
    for (const [rail, sand] of [["dry", false], ["wet", true]] as const) {
      const c: StartCase = { ...flat, conditions: { ...flat.conditions, rail, sand } };
      const m = at(flatRows, rail, sand);
      expect(planStart(withTrailingMass(c, 0.98 * m), { skipMassSearch: true }).verdict).toBe("starts");
      expect(planStart(withTrailingMass(c, 1.02 * m), { skipMassSearch: true }).verdict).not.toBe("starts");
    }
  }, 120_000);
});

describe("margins per rail condition", () => {
  const c = caseOn(8);
  const rows = conditionMargins(c);

  it("every condition without and with sand; the case's own condition agrees with its plan", () => {
    expect(rows.length).toBe(12);
    const own = rows.find((r) => r.rail === "dry" && !r.sand)!;
    const p = planStart(c, { skipMassSearch: true });
    expect(own.verdict).toBe(p.verdict);
    expect(own.margin).toBeCloseTo(p.margin, 9);
  });

  it("the adhesion margin follows the rail-condition table (PHYSICS.md §2 [M]): dry > wet > leaves, sand helps", () => {
    const m = (rail: string, sand: boolean) => rows.find((r) => r.rail === rail && r.sand === sand)!.margins.adhesion;
    expect(m("dry", false)).toBeGreaterThan(m("wet", false));
    expect(m("wet", false)).toBeGreaterThan(m("leaves", false));
    for (const rail of RAIL_CONDITIONS) expect(m(rail, true)).toBeGreaterThan(m(rail, false));
    // Same train, same place: the adhesion margin scales with the design-quantile μ, so dry ÷ wet is the ratio
    // of μ_median·exp(σ·z₀.₁): (0.33·e^(−1.2816·0.12)) ÷ (0.20·e^(−1.2816·0.18)) = 1.783 [D].
    expect(m("dry", false) / m("wet", false)).toBeCloseTo((0.33 * Math.exp(-1.2816 * 0.12)) / (0.2 * Math.exp(-1.2816 * 0.18)), 2);
  });

  it("the limiting reason is the verdict's reason with the smallest margin", () => {
    for (const r of rows) {
      if (r.reasons.length > 0) expect(r.reasons).toContain(r.limitedBy);
      expect(r.margins[r.limitedBy]).toBeLessThanOrEqual(Math.min(...(r.reasons.length ? r.reasons : (["adhesion", "power", "coupler", "distance"] as const)).map((k) => r.margins[k])) + 1e-12);
    }
    expect(limitingReason({ adhesion: 2, power: 1.5, coupler: 3, distance: 9, brake: 99 })).toBe("power");
    expect(limitingReason({ adhesion: 2, power: 1.5, coupler: 0.9, distance: 9, brake: 99 }, ["adhesion"])).toBe("adhesion");
  });
});
