/**
 * Dynamics engine against analytic solutions and conservation laws.
 */
import { describe, expect, it } from "vitest";
import { createState, evaluate, step } from "../../src/core/dynamics/dynamics.js";
import { stableTimeStep } from "../../src/core/train/trainModel.js";
import { GRAVITY_MPS2 } from "../../src/core/physics/constants.js";
import { chainModel } from "./helpers/chainModel.js";

describe("two masses joined by one linear spring, no slack", () => {
  // Closed form (any mechanics text, e.g. Meriam & Kraige, Engineering Mechanics: Dynamics, two-body
  // oscillator): relative motion has ω = √(k(1/m1 + 1/m2)); with the front mass given speed v0 and the
  // rear at rest, the extension is (v0/ω)·sin(ωt): period 2π/ω, amplitude v0/ω.
  const m1 = 120_000;
  const m2 = 80_000;
  const k = 2.5e6 / 0.15; // rated force at travel, linear: 16.7 MN/m
  const model = chainModel({ masses: [m1, m2], loco: -1, linearShare: 1, ratedN: 2.5e6, travelM: 0.15, endStopK: 2e8 });
  const omega = Math.sqrt(k * (1 / m1 + 1 / m2));
  const v0 = 0.3;

  it("period and amplitude match within 0.5 %", () => {
    const s = createState(model);
    s.v[0] = v0;
    evaluate(model, s, 0);
    const dt = stableTimeStep(model);
    const ext: number[] = [];
    const times: number[] = [];
    for (let t = 0; t < 5; t += dt) {
      step(model, s, dt);
      ext.push(s.x[0]! - s.x[1]!);
      times.push(s.t);
    }
    const amplitude = Math.max(...ext.map(Math.abs));
    expect(amplitude / (v0 / omega)).toBeCloseTo(1, 2);
    expect(Math.abs(amplitude / (v0 / omega) - 1)).toBeLessThan(0.005);
    // Period from upward zero crossings of the extension.
    const crossings: number[] = [];
    for (let i = 1; i < ext.length; i++) {
      if (ext[i - 1]! < 0 && ext[i]! >= 0) {
        const f = -ext[i - 1]! / (ext[i]! - ext[i - 1]!);
        crossings.push(times[i - 1]! + f * (times[i]! - times[i - 1]!));
      }
    }
    expect(crossings.length).toBeGreaterThan(5);
    const period = (crossings[crossings.length - 1]! - crossings[0]!) / (crossings.length - 1);
    expect(Math.abs(period / ((2 * Math.PI) / omega) - 1)).toBeLessThan(0.005);
  });

  it("conserves momentum exactly and energy closely without damping", () => {
    // Both masses keep moving forward (no friction reversal): momentum is exactly conserved by equal and
    // opposite coupler forces; the leapfrog keeps energy within a small bounded error.
    const s = createState(model);
    const va = 0.4;
    const vb = 0.1;
    s.v[0] = va;
    s.v[1] = vb;
    evaluate(model, s, 0);
    const dt = stableTimeStep(model);
    const e0 = 0.5 * m1 * va * va + 0.5 * m2 * vb * vb;
    for (let t = 0; t < 3; t += dt) step(model, s, dt);
    expect(m1 * s.v[0]! + m2 * s.v[1]!).toBeCloseTo(m1 * va + m2 * vb, 6);
    const e = s.x[0]! - s.x[1]!;
    const energy = 0.5 * m1 * s.v[0]! ** 2 + 0.5 * m2 * s.v[1]! ** 2 + 0.5 * k * e * e;
    expect(Math.abs(energy / e0 - 1)).toBeLessThan(0.01);
  });
});

describe("a stiff, slack-free chain behaves as one mass", () => {
  // Newton's second law for the whole train: with constant effort F, constant resistance R and grade,
  // v(t) = (F − R − M·g·sin θ)·t / M_eff once everything moves together.
  const n = 12;
  const masses = Array.from({ length: n }, (_, i) => (i === 0 ? 120_000 : 80_000));
  const eff = masses.map((m) => m * 1.04);
  const davisA = masses.map((m) => 0.0012 * m * GRAVITY_MPS2);
  const grade = 5;
  const F = 400_000;
  const model = chainModel({
    masses,
    effMasses: eff,
    davisA,
    gradePermille: grade,
    loco: 0,
    effortN: F,
    effortRiseS: 0, // the full effort at once: the law is for constant force
    linearShare: 1,
    ratedN: 2.5e7, // stiff: 167 MN/m
    travelM: 0.15,
    transitionK: 2e8,
    dampingC: 2e5,
  });
  it("speed after 20 s within 0.5 % of (F − R)·t / M", () => {
    const s = createState(model);
    s.notch[0] = 8;
    evaluate(model, s, 0);
    const dt = stableTimeStep(model);
    const T = 20;
    const stepsN = Math.round(T / dt);
    for (let k = 0; k < stepsN; k++) step(model, s, dt);
    const M = masses.reduce((a, b) => a + b, 0);
    const Meff = eff.reduce((a, b) => a + b, 0);
    const R = davisA.reduce((a, b) => a + b, 0) + M * GRAVITY_MPS2 * Math.sin(Math.atan(grade / 1000));
    const expected = ((F - R) * s.t) / Meff;
    const meanV = s.v.reduce((a, b) => a + b, 0) / n;
    expect(Math.abs(meanV / expected - 1)).toBeLessThan(0.005);
    expect(Math.abs(s.v[0]! / expected - 1)).toBeLessThan(0.005);
    expect(Math.abs(s.v[n - 1]! / expected - 1)).toBeLessThan(0.005);
  });
});

describe("slack take-up with the locomotive held at constant low speed", () => {
  // Kinematics (common practice: ≈ 150 mm per vehicle of locomotive travel before the last one moves,
  // PHYSICS.md §4): a locomotive at constant speed u reaches the last of n−1 bunched couplings of free slack s
  // after about (n−1)·s / u, plus the gear deflection each coupling takes to start its wagon.
  // At walking pace each wagon is brought up to speed by its gear almost at once, so the kinematic time is
  // approached; at 1 mph the gear pick-up adds tens of per cent (see the second check).
  const wagons = 30;
  const slack = 0.1;
  const u = 0.1;
  const masses = [1e12, ...Array.from({ length: wagons }, () => 60_000)];
  const breakaway = masses.map((m, i) => (i === 0 ? 0 : 0.0025 * m * GRAVITY_MPS2));
  const model = chainModel({
    masses,
    halfSlackM: slack / 2,
    ext0M: Array.from({ length: wagons }, () => -slack / 2),
    breakawayExcessN: breakaway,
    loco: -1,
    linearShare: 0.3,
    ratedN: 2.52e6,
    travelM: 0.148,
    unloadRatio: 0.4,
    dampingC: 5e4,
  });
  it("the last vehicle starts after ≈ total slack / speed", () => {
    const s = createState(model);
    s.v[0] = u;
    evaluate(model, s, 0);
    const dt = stableTimeStep(model);
    let lastMoves = NaN;
    for (let t = 0; t < 60 && Number.isNaN(lastMoves); t += dt) {
      step(model, s, dt);
      if (s.v[wagons]! > 0.01) lastMoves = s.t;
    }
    const expected = (wagons * slack) / u;
    expect(lastMoves).toBeGreaterThan(expected);
    expect(lastMoves).toBeLessThan(1.1 * expected);
    // The locomotive travel is the slack plus gear deflections.
    expect(s.x[0]! / (wagons * slack)).toBeGreaterThan(1);
    expect(s.x[0]! / (wagons * slack)).toBeLessThan(1.1);
  });
});

describe("stick and breakaway", () => {
  it("a standing vehicle stays put until the net force exceeds breakaway, and never creeps back", () => {
    const m = 80_000;
    const hold = 0.0025 * m * GRAVITY_MPS2; // 2.5 ‰
    // 2 ‰ down the grade is less than what holds it: it must not move at all.
    const model = chainModel({ masses: [m], loco: -1, breakawayExcessN: [hold], gradePermille: -2 });
    const s = createState(model);
    const dt = 0.005;
    for (let k = 0; k < 4000; k++) step(model, s, dt);
    expect(s.x[0]).toBe(0);
    expect(s.v[0]).toBe(0);
    // 3 ‰ exceeds it: it breaks away and runs down the grade.
    const steeper = chainModel({ masses: [m], loco: -1, breakawayExcessN: [hold], gradePermille: -3 });
    const s2 = createState(steeper);
    for (let k = 0; k < 4000; k++) step(steeper, s2, dt);
    expect(s2.v[0]).toBeGreaterThan(0);
  });
});
