/**
 * Sensitivity of the start margin, against the analytic form of the balance: margin = allowance ÷ demand
 * (the rail's effort ÷ the effort the start needs), so scaling adhesion by 0.9 scales an adhesion-limited
 * margin by exactly 0.9, and the needed effort grows with mass and grade by m·g·sin(atan i) (PHYSICS.md §1).
 */
import { describe, expect, it } from "vitest";
import { sensitivity } from "../../src/core/planner/sensitivity.js";
import { staticCheck } from "../../src/core/planner/staticCheck.js";
import { quasiStaticLimits } from "../../src/core/planner/decision.js";
import { marginalBound, plannerContext } from "../../src/core/planner/context.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";

const c = (() => {
  const r = parseStartCase(
    {
      schema: "taut/start-case@1",
      locomotives: [{ profile: "illustrative-6axle-1800" }],
      train: { trailingMass_t: 1200, wagons: 24, length_m: 336, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 850, slackState: "bunched" },
      location: { gradient_permille: 6, curveRadius_m: 0, clearAhead_m: 800 },
      conditions: { rail: "wet", sand: false, temperature_C: 10 },
      target: { speed_kmh: 15 },
    },
    builtinLibrary(),
  );
  if (!r.ok) throw new Error("bad case");
  return r.value;
})();

describe("sensitivity", () => {
  const rows = sensitivity(c);
  const by = (k: string) => rows.find((x) => x.input === k)!;
  const st = staticCheck(c);
  it("adhesion −10 % scales an adhesion-limited margin by exactly 0.9", () => {
    expect(st.margin).toBeCloseTo(st.margins.adhesion, 12);
    expect(by("adhesion").marginAfter / by("adhesion").marginBefore).toBeCloseTo(0.9, 9);
  });
  it("mass +10 % and +1 ‰ lower the margin by the extra resistance they bring", () => {
    expect(by("mass").marginAfter).toBeLessThan(by("mass").marginBefore);
    expect(by("grade").marginAfter).toBeLessThan(by("grade").marginBefore);
    // 6 → 7 ‰ under the whole train adds m·g·(sin(atan 0.007) − sin(atan 0.006)) to what is needed at every
    // point of the start, so the binding adhesion margin becomes allowance ÷ (demand + that).
    const totalMassKg = 1_200_000 + 120_000;
    const extra = totalMassKg * 9.80665 * (Math.sin(Math.atan(0.007)) - Math.sin(Math.atan(0.006)));
    const adhesion = quasiStaticLimits(plannerContext(c), marginalBound(c.settings)).limits.find((l) => l.name === "adhesion")!;
    expect(by("grade").marginBefore).toBeCloseTo(adhesion.margin, 12);
    expect(by("grade").marginAfter / (adhesion.allowance / (adhesion.demand + extra))).toBeCloseTo(1, 3);
  });
  it("slack leaves the margin alone but lengthens the stretch of a bunched train by the added slack", () => {
    expect(by("slack").marginAfter).toBeCloseTo(by("slack").marginBefore, 12);
    const couplings = 24; // 24 wagons + 1 locomotive → 24 couplings
    expect(by("slack").stretchTravelChangeM).toBeCloseTo(couplings * 0.025, 6);
  });
  it("rows come largest effect first", () => {
    const d = rows.map((x) => Math.abs(x.marginAfter - x.marginBefore));
    for (let k = 1; k < d.length; k++) expect(d[k]!).toBeLessThanOrEqual(d[k - 1]!);
  });
});
