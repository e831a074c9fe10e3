/**
 * `taut plan` with several control groups and wagon groups (issue 12): the file fields `locomotives[].control`
 * and `train.groups` (INTERFACE.md, second round), the steps' group notches, the wheel-climb figure, and
 * `--helper-control` for the units the assistance options add.
 */
import { describe, expect, it } from "vitest";
import { taut, tautWithInput } from "../tools/cli.js";

const mixedPushed = {
  schema: "taut/start-case@1",
  locomotives: [
    { profile: "illustrative-6axle-3000", count: 1, position: "head" },
    { profile: "illustrative-6axle-3000", count: 1, position: "rear", control: "helper" },
  ],
  train: {
    groups: [
      { wagons: 10, wagonType: "bogie-hopper-empty", mass_t: 240 },
      { wagons: 20, wagonType: "bogie-hopper-loaded", mass_t: 2000 },
    ],
    couplerSlack_mm: 50,
    bearing: "roller",
    couplerLimit_kN: 970,
  },
  location: { gradient_permille: 8, curveRadius_m: 300, clearAhead_m: 1500 },
  conditions: { rail: "dry", sand: true, temperature_C: 10 },
  target: { speed_kmh: 15 },
};

describe("taut plan with unit groups and wagon groups", () => {
  it("reads the groups, names every group's notch in each step, gives the wheel-climb figure and what the mass search scales", async () => {
    const r = await tautWithInput(JSON.stringify(mixedPushed), "plan", "-", "--json", "--no-assistance");
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const p = JSON.parse(r.stdout);
    expect(p.steps.length).toBeGreaterThan(1);
    for (const s of p.steps) expect(s.groups.map((g: { name: string }) => g.name)).toEqual(["head", "rear helper"]);
    // The helper follows the head's call: said in a step where its notch changes.
    expect(p.steps.some((s: { groups: Array<{ coordination?: string }> }) => s.groups[1]!.coordination?.includes("radio"))).toBe(true);
    expect(p.wheelClimb.vehicle).toMatch(/^(wagon \d+ \(\d+ t\)|unit \d+ \(locomotive\))$/);
    expect(p.limits.map((l: { name: string }) => l.name)).toContain("wheel-climb");
    expect(p.massSearchScales).toMatch(/above tare/);
  });

  it("the table shows the groups' notches (head N · rear helper M)", async () => {
    const r = await tautWithInput(JSON.stringify(mixedPushed), "plan", "-", "--no-assistance");
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/head \d · rear helper \d/);
  });

  it("refuses a train without groups that leaves out its mass, and groups that disagree with a mass given", async () => {
    const { groups: _g, ...noGroups } = mixedPushed.train;
    const a = await tautWithInput(JSON.stringify({ ...mixedPushed, train: noGroups }), "plan", "-", "--json");
    expect(a.code).toBe(2);
    expect(a.stderr).toMatch(/train\.trailingMass_t: is needed/);
    const b = await tautWithInput(JSON.stringify({ ...mixedPushed, train: { ...mixedPushed.train, trailingMass_t: 3000 } }), "plan", "-", "--json");
    expect(b.code).toBe(2);
    expect(b.stderr).toMatch(/must match the groups' 2240 t/);
  });

  it("--mass on a mixed train scales every group's load above tare (the empties stay at tare)", async () => {
    const { applyOverrides } = await import("../../src/cli/caseOverrides.js");
    const tare = { "bogie-hopper-empty": 24, "bogie-hopper-loaded": 25 } as Record<string, number>;
    const out = applyOverrides(mixedPushed, { trailingMass_t: 2740 }, () => undefined, (id) => ({ tare_t: tare[id]!, length_m: 14 })) as typeof mixedPushed;
    // Empties: 10 × 24 t = 240 t, no load. Loaded: 20 × 25 t tare + (2000 − 500) t of load, scaled by (2740 − 240 − 500) / 1500.
    expect(out.train.groups[0]!.mass_t).toBeCloseTo(240, 9);
    expect(out.train.groups[1]!.mass_t).toBeCloseTo(500 + 1500 * (2000 / 1500), 9);
    const r = await tautWithInput(JSON.stringify(mixedPushed), "plan", "-", "--mass", "2740", "--json", "--no-assistance");
    expect(r.code).toBe(0);
  });

  it("--helper-control helper: the assistance options' rear and mid-train units are helpers", async () => {
    const r = await taut("plan", "profiles/cases/demo-ore-lantern.json", "--json", "--helper-control", "helper");
    expect(r.code).toBe(0);
    const p = JSON.parse(r.stdout);
    const pushing = p.assistance.filter((o: { locomotives: Array<{ position: unknown }> }) => o.locomotives.some((l) => l.position !== "head"));
    expect(pushing.length).toBeGreaterThan(0);
    for (const o of pushing) {
      expect(o.note).toMatch(/as a helper/);
      for (const l of o.locomotives) if (l.position !== "head") expect(l.control).toBe("helper");
    }
    const bad = await taut("plan", "profiles/cases/demo-ore-lantern.json", "--helper-control", "sideways");
    expect(bad.code).toBe(2);
  });
});
