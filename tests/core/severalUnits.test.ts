/**
 * Several locomotives as they are really driven (issue 12): remote and helper groups with their own notch,
 * the buff allowance and wheel climb under buff, mixed trains of wagon groups. Expected figures come from
 * hand arithmetic written out here (statics of trains moving as one, Nadal's formula, the slack rule of
 * PHYSICS.md §5) or from the issue's own cases; none is copied from the program's output.
 */
import { describe, expect, it } from "vitest";
import { EN, groupName, limitWhatEn } from "../tools/english.js";
import {
  DEFAULT_SETTINGS,
  GRAVITY_MPS2,
  modelFromCase,
  planStart,
  sequenceControls,
  simulate,
  uniformTrack,
  type StartCase,
} from "../../src/core/index.js";
import { buildConsist } from "../../src/core/train/consist.js";
import { initialSlack } from "../../src/core/train/slack.js";
import { groupMassesKg, headPart } from "../../src/core/train/groups.js";
import { buffLateralRatio, nadalLimit, WHEEL_CLIMB_ALLOWANCE } from "../../src/core/physics/wheelClimb.js";
import { notchSequence } from "../../src/core/planner/plan.js";
import { plannerContext } from "../../src/core/planner/context.js";
import { withTrailingMass } from "../../src/core/planner/startableMass.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { ampleAdhesion, testLoco, testWagon } from "../tools/cases.js";

const lib = builtinLibrary();
function fromJson(json: unknown): StartCase {
  const r = parseStartCase(json, lib);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}
const kN = 1000;

describe("Nadal's limit and the buff lateral force (hand arithmetic)", () => {
  it("δ = 60°, μ = 0.5 gives 0.660; δ = 70° gives 0.947 — the 0.6–1.0 PHYSICS.md quotes [S: Nadal 1908]", () => {
    // tan 60° = 1.7321: (1.7321 − 0.5) / (1 + 0.5 × 1.7321) = 1.2321 / 1.8660 = 0.6603.
    expect(nadalLimit()).toBeCloseTo(0.6603, 4);
    // tan 70° = 2.7475: 2.2475 / 2.3737 = 0.9468.
    expect(nadalLimit((70 * Math.PI) / 180, 0.5)).toBeCloseTo(0.9468, 3);
    expect(WHEEL_CLIMB_ALLOWANCE).toBeCloseTo(0.6603 / 1.2, 4);
  });

  it("a 24 t, 14 m, four-axle empty under 447 kN of buff on a 250 m curve: L/V 0.43; none on straight track", () => {
    // Lateral: 447 kN × 14 m / (2 × 250 m) = 12.52 kN. Wheel load: 24 t × 9.80665 / 8 = 29.42 kN. 0.4255.
    expect(buffLateralRatio(447 * kN, 250, 14, 4, 24_000)).toBeCloseTo(12.516 / 29.42, 3);
    expect(buffLateralRatio(447 * kN, 0, 14, 4, 24_000)).toBe(0);
  });
});

/** The issue's first case: 5,200 t in 52 wagons on 20 ‰, four units at the head, 850 kN knuckles (708 kN allowed). */
const steepJson = (rear: Record<string, unknown> | null) => ({
  schema: "taut/start-case@1",
  locomotives: [{ profile: "illustrative-6axle-3000", count: 4, position: "head" }, ...(rear ? [{ profile: "illustrative-6axle-3000", count: 2, ...rear }] : [])],
  train: { trailingMass_t: 5200, wagons: 52, length_m: 728, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 850, wagonType: "bogie-hopper-loaded" },
  location: { gradient_permille: 20, curveRadius_m: 0, clearAhead_m: 1500 },
  conditions: { rail: "dry", sand: true, temperature_C: 10 },
  target: { speed_kmh: 10 },
});
const allowance850 = (850 * kN) / 1.2;

/** Replay a plan's notch timing, every group's notch included, in the dynamics model outside the planner. */
function replay(c: StartCase, p: ReturnType<typeof planStart>) {
  const ctx = plannerContext(c);
  const model = modelFromCase(c, { adhesionQuantile: c.settings.slipRiskThreshold });
  const recs = p.steps.map((s) => ({ notch: s.notch, startS: s.startS, groupNotches: s.groups ? Int32Array.from(s.groups.map((g) => g.notch)) : null }));
  const last = p.steps[p.steps.length - 1]!;
  return simulate(model, sequenceControls(notchSequence(ctx, recs), { trainBrakeReleaseS: 0, locoBrakeReleaseS: p.steps[1]!.startS }), { durationS: last.startS + last.advanceWhen.afterS });
}

describe("5,200 t on 20 ‰: units at the rear or mid-train with their own notch", () => {
  it("at equal notch (in multiple with the head) the head coupling goes beyond the allowance", () => {
    const p = planStart(fromJson(steepJson({ position: "rear", control: "with-head" })), { skipMassSearch: true, skipVerification: true });
    expect(p.limits.find((l) => l.name === "coupler-tension")!.level).not.toBe("within");
  });

  for (const [name, rear] of [
    ["two remote units at the rear", { position: "rear" }],
    ["two remote units mid-train", { position: { afterWagon: 26 } }],
    ["two helper units at the rear", { position: "rear", control: "helper" }],
  ] as const) {
    it(`${name}: starts, every coupling within 708 kN in the planned start and in a replay of it`, () => {
      const c = fromJson(steepJson(rear));
      const p = planStart(c, { skipMassSearch: true, skipVerification: true });
      expect(p.verdict).toBe("starts");
      expect(p.peakCouplerForceN).toBeLessThanOrEqual(allowance850);
      // Each step names both groups' notches, head first.
      for (const s of p.steps) expect(s.groups!.map((g) => groupName(EN, g.place))).toEqual(["head", typeof rear.position === "string" ? ("control" in rear ? "rear helper" : "rear") : "after wagon 26"]);
      const res = replay(c, p);
      expect(res.peakTensionN).toBeLessThanOrEqual(allowance850 * 1.02);
      if ("control" in rear) expect(p.steps.some((s) => s.groups!.some((g) => g.coordination !== undefined))).toBe(true);
    });
  }
});

/** The issue's second case: one unit at the head, two at the rear, 6,000 t on 5 ‰, 350 kN couplings. */
const oneTwo = fromJson({
  schema: "taut/start-case@1",
  locomotives: [{ profile: "illustrative-6axle-3000", count: 1, position: "head" }, { profile: "illustrative-6axle-3000", count: 2, position: "rear" }],
  train: { trailingMass_t: 6000, wagons: 60, length_m: 840, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 350, wagonType: "bogie-hopper-loaded" },
  location: { gradient_permille: 5, curveRadius_m: 0, clearAhead_m: 1500 },
  conditions: { rail: "dry", sand: true, temperature_C: 10 },
  target: { speed_kmh: 15 },
});

describe("one unit at the head and two at the rear (6,000 t, 5 ‰, 350 kN)", () => {
  const p = planStart(oneTwo, { skipMassSearch: true, skipVerification: true });

  it("starts and notches up, every step's couplers within the allowance (350 ÷ 1.2 = 292 kN)", () => {
    expect(p.verdict).toBe("starts");
    expect(oneTwo.locomotives[1]!.control).toBeUndefined(); // the default: remote at the rear
    const levels = p.steps.map((s) => s.groups!.reduce((a, g) => a + g.notch, 0));
    for (let k = 1; k < levels.length; k++) expect(levels[k]!).toBeGreaterThanOrEqual(levels[k - 1]!);
    expect(levels[levels.length - 1]!).toBeGreaterThan(levels[1]!);
    for (const s of p.steps) expect(s.peakCouplerForceN).toBeLessThanOrEqual((350 * kN) / 1.2);
    expect(p.limits.find((l) => l.name === "coupler-compression")!.level).toBe("within");
  });

  it("with the rear in multiple with the head (equal notch) it does not start within the allowances", () => {
    const c: StartCase = { ...oneTwo, locomotives: oneTwo.locomotives.map((g, i) => (i === 1 ? { ...g, control: "with-head" as const } : g)) };
    expect(planStart(c, { skipMassSearch: true, skipVerification: true }).verdict).not.toBe("starts");
  });
});

describe("the steady pull split, by hand (one head unit, two rear units, each its own constant effort)", () => {
  // 1 × 300 kN at the head, 2 × 200 kN at the rear, 40 wagons × 60 t on 5 ‰, rolling. Moving as one, every
  // vehicle takes the same acceleration a = (ΣE − ΣR − Σ m g sin θ) / Σ m(1+γ); the head coupling carries
  // E_head − (R + m g sin θ + m(1+γ) a) of the head unit, the coupling ahead of the rear units carries their
  // push less their own share likewise (compression).
  const head = testLoco({ startingTractiveEffortN: 300 * kN });
  const rear = testLoco({ startingTractiveEffortN: 200 * kN });
  const wagon = testWagon({ rotatingMassFraction: 0.05, startingResistancePermille: 0 });
  const c: StartCase = {
    locomotives: [
      { spec: head, count: 1, position: "head" },
      { spec: rear, count: 2, position: "rear", control: "remote" },
    ],
    train: { trailingMassKg: 40 * 60_000, wagons: 40, lengthM: 600, couplerSlackM: 0.05, bearing: "roller", couplerLimitN: 5000 * kN, coupling: "knuckle", wagon, slackState: "stretched" },
    location: { track: uniformTrack(5, 0), frontAtM: 0, clearAheadM: 5000 },
    conditions: { rail: "dry", sand: false, temperatureC: 10 },
    target: { kind: "speed", speedMps: 30 },
    adhesion: ampleAdhesion(),
    settings: DEFAULT_SETTINGS,
  };

  it("the couplings carry what the statics of the train moving as one give (within 2 %)", () => {
    const m = modelFromCase(c);
    // Brakes off from the start (the release's travel along the train is not what is tested here).
    m.trainBrakeN.fill(0);
    m.locoBrakeN.fill(0);
    const res = simulate(m, { trainBrakeReleaseS: 0, locoBrakeReleaseS: 0, notch: () => 1, groupNotches: () => [1, 1] }, { durationS: 40 });
    // Resistance of each vehicle from the model's own Davis terms at the final speed (the published Davis
    // formula, evaluated once per vehicle; the split is what is checked here, not the formula).
    const v = res.final.leadSpeedMps;
    const sinT = Math.sin(Math.atan(0.005));
    const force = (i: number) => m.davisA[i]! + (m.davisB[i]! + m.davisC[i]! * v) * v + m.massKg[i]! * GRAVITY_MPS2 * sinT;
    const sumE = 300 * kN + 400 * kN;
    let sumR = 0;
    let sumM = 0;
    for (let i = 0; i < m.n; i++) {
      sumR += force(i);
      sumM += m.effMassKg[i]!;
    }
    const a = (sumE - sumR) / sumM;
    expect(a).toBeGreaterThan(0);
    const headPull = 300 * kN - force(0) - m.effMassKg[0]! * a;
    const rearPush = 400 * kN - force(m.n - 1) - force(m.n - 2) - (m.effMassKg[m.n - 1]! + m.effMassKg[m.n - 2]!) * a;
    // Forces at the end of the run, rolling: the coupling behind the head unit and the one ahead of the rear pair.
    const s = res.state;
    expect(s.couplerF[0]! / headPull).toBeCloseTo(1, 1);
    expect(Math.abs(s.couplerF[0]! - headPull) / headPull).toBeLessThan(0.02);
    expect(Math.abs(-s.couplerF[m.n - 3]! - rearPush) / rearPush).toBeLessThan(0.02);
  });
});

/** 50 empty 24 t hoppers, one unit at the head and two pushing at the rear, 15 ‰ on a curve. */
const emptiesJson = (control: string, radius: number, wagonType = "bogie-hopper-empty", mass = 1200) => ({
  schema: "taut/start-case@1",
  locomotives: [{ profile: "illustrative-6axle-3000", count: 1, position: "head" }, { profile: "illustrative-6axle-3000", count: 2, position: "rear", control }],
  train: { groups: [{ wagons: 50, wagonType, mass_t: mass }], couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970 },
  location: { gradient_permille: 15, curveRadius_m: radius, clearAhead_m: 1500 },
  conditions: { rail: "dry", sand: true, temperature_C: 10 },
  target: { speed_kmh: 15 },
});

describe("wheel climb under buff", () => {
  it("empties pushed at equal notch on a 150 m curve: flagged with the vehicle and its L/V (hand-checked from the buff)", () => {
    const p = planStart(fromJson(emptiesJson("with-head", 150)), { skipMassSearch: true, skipVerification: true });
    const wc = p.limits.find((l) => l.name === "wheel-climb")!;
    expect(wc.level).not.toBe("within");
    expect(p.verdict).not.toBe("starts");
    expect(limitWhatEn(wc.what)).toMatch(/L\/V \d\.\d\d at wagon \d+ \(24 t\)/);
    // The figure from the buff it names: F × 14 m / (2 × 150 m) ÷ (24 t × g / 8).
    const w = p.wheelClimb!;
    expect(w.ratio).toBeCloseTo(((w.forceN * 14) / 300) / ((24_000 * GRAVITY_MPS2) / 8), 6);
  });

  it("the same train with the rear units remote: the planner keeps the pushers lower and stays within", () => {
    const flagged = planStart(fromJson(emptiesJson("with-head", 150)), { skipMassSearch: true, skipVerification: true });
    const p = planStart(fromJson(emptiesJson("remote", 150)), { skipMassSearch: true, skipVerification: true });
    expect(p.limits.find((l) => l.name === "wheel-climb")!.level).toBe("within");
    expect(p.wheelClimb!.ratio).toBeLessThan(flagged.wheelClimb!.ratio);
    expect(p.peakCompressionN).toBeLessThan(flagged.peakCompressionN);
  });

  it("a loaded train on straight track under the same push: no lateral force, nothing flagged", () => {
    const p = planStart(fromJson(emptiesJson("with-head", 0, "bogie-hopper-loaded", 5000)), { skipMassSearch: true, skipVerification: true });
    const wc = p.limits.find((l) => l.name === "wheel-climb")!;
    expect(wc.demand).toBe(0);
    expect(wc.level).toBe("within");
  });
});

describe("mixed trains: wagon groups", () => {
  const mixed = fromJson({
    schema: "taut/start-case@1",
    locomotives: [{ profile: "illustrative-6axle-3000", count: 2, position: "head" }],
    train: { groups: [{ wagons: 20, wagonType: "bogie-hopper-empty", mass_t: 480 }, { wagons: 30, wagonType: "bogie-hopper-loaded", mass_t: 3000 }], couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970 },
    location: { gradient_permille: 5, curveRadius_m: 0, clearAhead_m: 1500 },
    conditions: { rail: "dry", sand: true, temperature_C: 10 },
    target: { speed_kmh: 15 },
  });

  it("wagons, trailing mass and length are derived from the groups and their wagon types", () => {
    expect(mixed.train.wagons).toBe(50);
    expect(mixed.train.trailingMassKg).toBe(3_480_000);
    // 20 × 14.0 m + 30 × the loaded type's length.
    expect(mixed.train.lengthM).toBeCloseTo(20 * 14 + 30 * lib.wagons.get("bogie-hopper-loaded")!.lengthM, 9);
    const consist = buildConsist(mixed);
    expect(consist.vehicles[2]!.massKg).toBe(24_000);
    expect(consist.vehicles[2 + 20]!.massKg).toBe(100_000);
  });

  it("the largest-mass search scales every group's load above tare in proportion (empties stay empty)", () => {
    // Empties at tare (24 t) carry no load; the loaded group's 3000 − 30 × tare is scaled to make 4,000 t.
    const tare = lib.wagons.get("bogie-hopper-loaded")!.tareKg;
    const masses = groupMassesKg(withTrailingMass(mixed, 4_000_000).train);
    expect(masses[0]).toBeCloseTo(480_000, 3);
    expect(masses[1]).toBeCloseTo(30 * tare + (3_000_000 - 30 * tare) * ((4_000_000 - 480_000 - 30 * tare) / (3_000_000 - 30 * tare)), 3);
    expect(masses[0]! + masses[1]!).toBeCloseTo(4_000_000, 3);
  });

  it("dividing keeps the groups of the wagons in the part cut off", () => {
    const part = headPart(mixed.train, 25);
    expect(part.groups!.map((g) => g.wagons)).toEqual([20, 5]);
    expect(part.trailingMassKg).toBeCloseTo(480_000 + 5 * 100_000, 3);
  });
});

/**
 * A two-block train on a crest and in a sag: a heavy block (30 × 100 t) and a light one (20 × 24 t). Released
 * with no power, the train moves as one once its slack is out; between the blocks the coupling then carries
 * T = m_b·(a + g sin θ_b) for the block behind, with a = g (m_a sin θ_a' + m_b sin θ_b') / (m_a + m_b) where
 * sin θ' is the pull forward of each block's grade — resistance per tonne alike in both blocks cancels out.
 * Slack (PHYSICS.md §5): stretched where the part ahead would run away from the part behind (over a crest),
 * bunched where it would run into it (in a sag).
 */
describe("a two-block mixed train on a crest and in a sag", () => {
  const blocks = (heavyFirst: boolean) =>
    heavyFirst
      ? [{ wagons: 30, wagonType: "bogie-hopper-loaded", mass_t: 3000 }, { wagons: 20, wagonType: "bogie-hopper-empty", mass_t: 480 }]
      : [{ wagons: 20, wagonType: "bogie-hopper-empty", mass_t: 480 }, { wagons: 30, wagonType: "bogie-hopper-loaded", mass_t: 3000 }];
  // One unit; the first block stands on the first segment's grade, the second on the other side of the break.
  const caseOf = (heavyFirst: boolean, front: number, back: number): StartCase => {
    const len1 = heavyFirst ? 30 * lib.wagons.get("bogie-hopper-loaded")!.lengthM : 20 * 14;
    const c = fromJson({
      schema: "taut/start-case@1",
      locomotives: [{ profile: "illustrative-4axle-1100", count: 1, position: "head" }],
      train: { groups: blocks(heavyFirst), couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970 },
      location: {
        segments: [
          { from_m: -2000, length_m: 2000 - 18 - len1, gradient_permille: back, curveRadius_m: 0 },
          { from_m: -18 - len1, length_m: 3000 + 18 + len1, gradient_permille: front, curveRadius_m: 0 },
        ],
        frontAt_m: 0,
        clearAhead_m: 1500,
      },
      conditions: { rail: "dry", sand: false, temperature_C: 10 },
      target: { speed_kmh: 5 },
    });
    return c;
  };

  it("over a crest the couplings stand stretched, in a sag bunched", () => {
    const crest = caseOf(true, -20, 20);
    const sag = caseOf(true, 20, -20);
    const signs = (c: StartCase) => Array.from(initialSlack(buildConsist(c), c.location.track, "from-profile"));
    // The coupling between the blocks: behind the unit and 30 wagons (index 30).
    expect(signs(crest)[30]).toBe(1);
    expect(signs(sag)[30]).toBe(-1);
  });

  for (const [what, heavyFirst, front, back, sign] of [
    ["crest: the heavy block runs down ahead and pulls the light one up (tension)", true, -20, 20, 1],
    ["sag: the heavy block runs down behind and pushes the light one up (compression)", false, 20, -20, -1],
  ] as const) {
    it(what, () => {
      const c = caseOf(heavyFirst, front, back);
      const m = modelFromCase(c);
      // Brakes off from the start: the blocks' grades alone move the train.
      m.trainBrakeN.fill(0);
      m.locoBrakeN.fill(0);
      const res = simulate(m, { trainBrakeReleaseS: 0, locoBrakeReleaseS: 0, notch: () => 0 }, { durationS: 15 });
      // The unit (84 t) belongs with the first block.
      const unitT = 84;
      const aT = heavyFirst ? 3000 + unitT : 480 + unitT;
      const bT = heavyFirst ? 480 : 3000;
      const pullA = -Math.sin(Math.atan(front / 1000));
      const pullB = -Math.sin(Math.atan(back / 1000));
      const a = (GRAVITY_MPS2 * (aT * pullA + bT * pullB)) / (aT + bT);
      const expected = bT * 1000 * (a - GRAVITY_MPS2 * pullB);
      const j = heavyFirst ? 30 : 20; // the coupling between the blocks
      const f = res.state.couplerF[j]!;
      expect(Math.sign(f)).toBe(sign);
      expect(Math.abs(f - expected) / Math.abs(expected)).toBeLessThan(0.1);
      // The peak of that sign over the whole train is at the blocks' meeting point (within two couplings).
      const peaks = sign > 0 ? res.state.peakTensionN : res.state.peakCompressionN;
      let at = 0;
      for (let k = 1; k < peaks.length; k++) if (peaks[k]! > peaks[at]!) at = k;
      expect(Math.abs(at - j)).toBeLessThanOrEqual(2);
    });
  }
});
