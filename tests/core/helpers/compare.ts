/**
 * The engine and a general-purpose integrator (odex: Hairer & Wanner's ODEX Gragg–Bulirsch–Stoer
 * extrapolation code, ported to JavaScript, from the registry) on the same chain equations, sampled on one
 * time grid — shared by the reference test and the benchmark.
 */
import * as odexModule from "odex";
import { createState, evaluate, step } from "../../../src/core/dynamics/dynamics.js";
import { stableTimeStep } from "../../../src/core/train/trainModel.js";
import { chainModel } from "./chainModel.js";
import { refCouplerForce, refDerivative, type RefChain } from "./referenceChain.js";

// odex is CommonJS: depending on the loader its class is on the namespace or on its default export.
const Solver: typeof odexModule.Solver = (odexModule as { Solver?: typeof odexModule.Solver }).Solver ?? (odexModule as unknown as { default: { Solver: typeof odexModule.Solver } }).default.Solver;

const G = 9.80665;

/**
 * A train rolling at 1 m/s on level track with its slack bunched, when the locomotive (vehicle 0) takes
 * power: plain equations both integrators can take (every vehicle keeps moving forward).
 */
export function rollingChain(masses: number[], o: { halfSlackM: number; effortN: number; powerW: number }): RefChain {
  const n = masses.length;
  return {
    masses,
    effMasses: masses.map((m, i) => m * (i === 0 ? 1.15 : 1.03)),
    davisA: masses.map((m) => 0.0011 * m * G),
    davisB: masses.map((m) => 0.00002 * m),
    davisC: masses.map(() => 6),
    breakawayExcess: masses.map((m) => 0.0013 * m * G),
    fadeSpeed: 2 / 3.6,
    sinTheta: 0,
    halfSlack: o.halfSlackM,
    ext0: Array.from({ length: n - 1 }, () => -o.halfSlackM),
    travel: 0.148,
    rated: 2.52e6,
    linear: 0.3,
    endStopK: 2e8,
    damping: 5e4,
    loco: 0,
    effortN: o.effortN,
    powerW: o.powerW,
    riseS: 1.5,
    fallS: 0.5,
  };
}

/** The 10-vehicle case of the reference test. */
export function tenVehicleCase(): RefChain {
  const masses = [120_000, ...Array.from({ length: 9 }, (_, i) => 50_000 + 5_000 * i)];
  return rollingChain(masses, { halfSlackM: 0.03, effortN: 300_000, powerW: 1.5e6 });
}

export function engineModel(c: RefChain) {
  return chainModel({
    masses: c.masses,
    effMasses: c.effMasses,
    davisA: c.davisA,
    davisB: c.davisB,
    davisC: c.davisC,
    breakawayExcessN: c.breakawayExcess,
    gradePermille: Math.tan(Math.asin(c.sinTheta)) * 1000,
    halfSlackM: c.halfSlack,
    ext0M: c.ext0,
    travelM: c.travel,
    ratedN: c.rated,
    linearShare: c.linear,
    unloadRatio: 1, // elastic: the reference ODE has no hysteresis state
    endStopK: c.endStopK,
    dampingC: c.damping,
    loco: c.loco,
    effortN: c.effortN,
    powerW: c.powerW,
    effortRiseS: c.riseS,
  });
}

/** Coupler force histories sampled every `every` seconds up to T, from the engine. */
export function engineHistory(c: RefChain, T: number, every: number, dt?: number): number[][] {
  const m = engineModel(c);
  const s = createState(m);
  const v0 = 1;
  s.v.fill(v0);
  s.notch[0] = 8;
  evaluate(m, s, 0);
  const h = dt ?? stableTimeStep(m);
  const out: number[][] = [Array.from(s.couplerF)];
  let next = every;
  let prevT = s.t;
  const prevF = Float64Array.from(s.couplerF);
  while (s.t < T - 1e-9) {
    step(m, s, h);
    // Sample on the exact grid by linear interpolation between steps.
    while (next <= s.t + 1e-12 && next <= T + 1e-9) {
      const f = (next - prevT) / (s.t - prevT);
      const row = new Array<number>(prevF.length);
      for (let j = 0; j < prevF.length; j++) row[j] = prevF[j]! + f * (s.couplerF[j]! - prevF[j]!);
      out.push(row);
      next += every;
    }
    prevT = s.t;
    prevF.set(s.couplerF);
  }
  return out;
}

/** The same histories from odex at the given tolerance. */
export function odexHistory(c: RefChain, T: number, every: number, tol: number): number[][] {
  const n = c.masses.length;
  const solver = new Solver(2 * n + 1);
  solver.absoluteTolerance = tol;
  solver.relativeTolerance = tol;
  solver.denseOutput = true;
  solver.maxSteps = 1e7;
  const y0 = [...new Array<number>(n).fill(0), ...new Array<number>(n).fill(1), 0];
  const out: number[][] = [];
  solver.solve(
    refDerivative(c),
    0,
    y0,
    T,
    solver.grid(every, (_t: number, y: number[]) => {
      const f: number[] = [];
      for (let j = 0; j < n - 1; j++) f.push(refCouplerForce(c, c.ext0[j]! + y[j]! - y[j + 1]!, y[n + j]! - y[n + j + 1]!));
      out.push(f);
    }),
  );
  return out;
}

export function maxDeviationOverPeak(a: number[][], b: number[][]): { dev: number; peak: number } {
  let peak = 0;
  let dev = 0;
  const len = Math.min(a.length, b.length);
  for (let k = 0; k < len; k++) {
    for (let j = 0; j < a[k]!.length; j++) {
      peak = Math.max(peak, Math.abs(b[k]![j]!));
      dev = Math.max(dev, Math.abs(a[k]![j]! - b[k]![j]!));
    }
  }
  return { dev, peak };
}


/** Largest error in any coupling's peak tension, relative to the largest peak (what the planner checks). */
export function peakForceError(a: number[][], b: number[][]): number {
  const nc = b[0]?.length ?? 0;
  let worst = 0;
  let top = 0;
  for (let j = 0; j < nc; j++) {
    let pa = 0;
    let pb = 0;
    for (const row of a) pa = Math.max(pa, row[j]!);
    for (const row of b) pb = Math.max(pb, row[j]!);
    worst = Math.max(worst, Math.abs(pa - pb));
    top = Math.max(top, pb);
  }
  return top > 0 ? worst / top : 0;
}

/** Peaks of each coupling over a run: tension and compression, N (both positive). */
export interface CouplingPeaks {
  tensionN: Float64Array;
  compressionN: Float64Array;
}

/** Each coupling's peaks over T seconds from the engine at step dt: what it records at every step. */
export function enginePeaks(c: RefChain, T: number, dt: number): CouplingPeaks {
  const m = engineModel(c);
  const s = createState(m);
  s.v.fill(1);
  s.notch[0] = 8;
  evaluate(m, s, 0);
  const steps = Math.round(T / dt);
  for (let k = 0; k < steps; k++) step(m, s, dt);
  return { tensionN: s.peakTensionN.slice(), compressionN: s.peakCompressionN.slice() };
}

/**
 * Each coupling's peaks from odex at a tolerance: seen every `every` seconds in its dense output, or, with
 * `every` left out, at the end of each of its own steps (no dense output: the cheapest way to read it). The
 * derivative and the output callback allocate nothing of ours per call.
 */
export function odexPeaks(c: RefChain, T: number, tol: number, every?: number): CouplingPeaks & { steps: number; evaluations: number } {
  const n = c.masses.length;
  const solver = new Solver(2 * n + 1);
  solver.absoluteTolerance = tol;
  solver.relativeTolerance = tol;
  solver.denseOutput = every !== undefined;
  solver.maxSteps = 1e7;
  const y0 = [...new Array<number>(n).fill(0), ...new Array<number>(n).fill(1), 0];
  const tensionN = new Float64Array(n - 1);
  const compressionN = new Float64Array(n - 1);
  const look = (y: number[]) => {
    for (let j = 0; j < n - 1; j++) {
      const f = refCouplerForce(c, c.ext0[j]! + y[j]! - y[j + 1]!, y[n + j]! - y[n + j + 1]!);
      if (f > tensionN[j]!) tensionN[j] = f;
      if (-f > compressionN[j]!) compressionN[j] = -f;
    }
  };
  // Our own grid output (odex's `grid` helper makes a new array at every point): one buffer, filled from the
  // dense output at each grid time the step just taken covers.
  const buf = new Array<number>(2 * n + 1).fill(0);
  let next = 0;
  const sample = (nr: number, _xOld: number, x: number, y: number[], interpolate?: (i: number, x: number) => number) => {
    if (every === undefined || nr === 1 || !interpolate) {
      look(y);
      next = x + (every ?? 0);
      return;
    }
    for (; next <= x; next += every) {
      for (let i = 0; i < buf.length; i++) buf[i] = interpolate(i, next);
      look(buf);
    }
  };
  const out = solver.solve(refDerivative(c), 0, y0, T, sample);
  return { tensionN, compressionN, steps: out.nStep, evaluations: out.nEval };
}

/** Largest difference of any coupling's peak (tension or compression) from the reference's, over the reference's largest peak. */
export function couplingPeakError(a: CouplingPeaks, ref: CouplingPeaks): number {
  let top = 0;
  let worst = 0;
  for (let j = 0; j < ref.tensionN.length; j++) {
    top = Math.max(top, ref.tensionN[j]!, ref.compressionN[j]!);
    worst = Math.max(worst, Math.abs(a.tensionN[j]! - ref.tensionN[j]!), Math.abs(a.compressionN[j]! - ref.compressionN[j]!));
  }
  return top > 0 ? worst / top : 0;
}
