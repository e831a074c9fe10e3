/**
 * The dynamics model on whole start cases: energy balance, common practice on slack, robustness.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { modelFromCase } from "../../src/core/train/trainModel.js";
import { sequenceControls, simulate } from "../../src/core/dynamics/simulate.js";
import type { StartCase } from "../../src/core/train/types.js";

const lib = builtinLibrary();

function caseOf(overrides: { train?: object; location?: object; conditions?: object; locomotives?: object[] } = {}): StartCase {
  const json = {
    schema: "taut/start-case@1",
    locomotives: overrides.locomotives ?? [{ profile: "illustrative-6axle-1800", count: 1, position: "head" }],
    train: { trailingMass_t: 1500, wagons: 30, length_m: 420, couplerSlack_mm: 60, bearing: "roller", couplerLimit_kN: 850, wagonType: "bogie-hopper-loaded", ...overrides.train },
    location: overrides.location ?? { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 1000 },
    conditions: { rail: "dry", sand: true, temperature_C: 10, ...overrides.conditions },
    target: { speed_kmh: 20 },
  };
  const r = parseStartCase(json, lib);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

const released = { trainBrakeReleaseS: -1e6, locoBrakeReleaseS: 0 };

describe("energy balance over a start", () => {
  // Work–energy theorem: work by tractive effort = kinetic energy (with rotating mass) + potential energy +
  // energy dissipated by resistance and brakes + work done on the couplings (draft-gear hysteresis, damping,
  // and what the gears still hold).
  it.each([
    ["level, bunched", { gradient_permille: 0, curveRadius_m: 0, clearAhead_m: 1000 }, "bunched"],
    ["rising 8 ‰ with a curve, stretched", { gradient_permille: 8, curveRadius_m: 400, clearAhead_m: 1000 }, "stretched"],
  ])("%s: within 1 %", (_name, location, slackState) => {
    const c = caseOf({ location, train: { slackState } });
    const m = modelFromCase(c);
    const r = simulate(m, sequenceControls([{ notch: 1, atS: 0 }, { notch: 3, atS: 15 }, { notch: 5, atS: 25 }, { notch: 7, atS: 35 }], { trainBrakeReleaseS: -1e6, locoBrakeReleaseS: 2 }), {
      durationS: 90,
      trackEnergy: true,
    });
    const e = r.energy!;
    expect(e.tractionJ).toBeGreaterThan(1e6);
    const accounted = e.kineticJ + e.gradeJ + e.resistanceJ + e.brakesJ + e.couplingJ;
    expect(Math.abs(accounted - e.tractionJ) / e.tractionJ).toBeLessThan(0.01);
    // Dissipation is real: resistance takes a share, the couplings' work is not negative.
    expect(e.resistanceJ).toBeGreaterThan(0);
    expect(e.couplingJ).toBeGreaterThan(0);
  });
});

describe("common practice: stretch the train at low effort before taking full power", () => {
  // Common practice (PRACTICE.md "Starting"; Indian Railways training notes on run-out [P]): a full-notch start
  // from a bunched train snatches the rear; a notch-1 stretch followed by the same full notch does not.
  it("a full-notch start from bunched gives a higher peak coupler force than stretch-then-full", () => {
    const c = caseOf({ train: { slackState: "bunched" } });
    const m = modelFromCase(c);
    const full = simulate(m, sequenceControls([{ notch: 8, atS: 0 }], released), { durationS: 60 });
    const gentle = simulate(m, sequenceControls([{ notch: 1, atS: 0 }, { notch: 8, atS: 45 }], released), { durationS: 105 });
    expect(gentle.lastVehicleMovesS).not.toBeNull();
    expect(gentle.lastVehicleMovesS!).toBeLessThan(45);
    expect(full.peakTensionN).toBeGreaterThan(1.1 * gentle.peakTensionN);
    // And the rear is snatched harder: faster run-out.
    expect(full.maxRunOutMps).toBeGreaterThan(gentle.maxRunOutMps);
  });
});

describe("robustness", () => {
  it("no NaN or infinity for any valid case (property test)", () => {
    fc.assert(
      fc.property(
        fc.record({
          // Per wagon within the schema's 5–150 t (src/profiles/schemas.ts).
          massPerWagon: fc.integer({ min: 5, max: 100 }),
          wagons: fc.integer({ min: 2, max: 60 }),
          grade: fc.double({ min: -20, max: 20, noNaN: true }),
          radius: fc.oneof(fc.constant(0), fc.integer({ min: 80, max: 3000 })),
          slack: fc.integer({ min: 0, max: 120 }),
          rail: fc.constantFrom("dry", "damp", "wet", "frost", "leaves", "greasy"),
          sand: fc.boolean(),
          temp: fc.integer({ min: -40, max: 40 }),
          bearing: fc.constantFrom("roller", "plain"),
          coupling: fc.constantFrom("knuckle", "screw"),
          slackState: fc.constantFrom("bunched", "stretched", "from-profile"),
          notch: fc.integer({ min: 1, max: 8 }),
          rear: fc.boolean(),
        }),
        (p) => {
          const c = caseOf({
            train: { trailingMass_t: p.massPerWagon * p.wagons, wagons: p.wagons, length_m: p.wagons * 14, couplerSlack_mm: p.slack, bearing: p.bearing, coupling: p.coupling, slackState: p.slackState, wagonType: undefined },
            location: { gradient_permille: p.grade, curveRadius_m: p.radius, clearAhead_m: 500 },
            conditions: { rail: p.rail, sand: p.sand, temperature_C: p.temp },
            locomotives: [{ profile: "illustrative-4axle-1100", count: 1, position: "head" }, ...(p.rear ? [{ profile: "illustrative-4axle-1100", count: 1, position: "rear" }] : [])],
          });
          const m = modelFromCase(c);
          const r = simulate(m, sequenceControls([{ notch: 1, atS: 0 }, { notch: p.notch, atS: 5 }], released), { durationS: 15 });
          const all = [...r.state.x, ...r.state.v, ...r.state.couplerF, r.peakTensionN, r.peakCompressionN, r.final.leadSpeedMps];
          return all.every(Number.isFinite);
        },
      ),
      { numRuns: 40 },
    );
  });
});
