/**
 * Fit by re-simulation: the factor on the trailing mass (and, when the notch was logged, on the units'
 * effort) with which the dynamics model best reproduces a recorded start. Each trial runs the case — its
 * locomotives, location and brake release as the planner runs them — through the full dynamics and lays
 * the run's locomotive speed over the recording's; the factors are found by Gauss–Newton least squares
 * with finite-difference derivatives, and their intervals from the linearised covariance.
 *
 * Without a logged notch the driver is taken to have followed the plan's notches, and the moment of start
 * is free (the recording does not say when power was taken): it is fitted beside the factor. With a logged
 * notch the notches are replayed as logged, power at the moment the plan takes it, and the recording's
 * notch timeline fixes the alignment; the effort factor can then be fitted too. Mass and effort both set
 * the acceleration, largely as their ratio, so the fit says when a recording cannot tell them apart
 * instead of splitting the difference.
 */
import { simulate } from "../dynamics/simulate.js";
import { sequenceRun } from "../planner/index.js";
import type { StartCase } from "../train/types.js";
import type { LocomotiveSpec } from "../physics/types.js";
import { interpolate, startMoment, START_SPEED_MPS, type Recording } from "./recording.js";

export interface Factors {
  massFactor: number;
  effortFactor: number;
}

/** A notch and the moment it is taken, s of the run. */
export interface NotchAt {
  notch: number;
  atS: number;
}

/** Adhesion the re-simulations assume: the median of the case's rail condition (the day's rail is unknown). */
export const REVIEW_ADHESION_QUANTILE = 0.5;
/** Finite-difference step on a factor. */
const STEP = 0.02;
/** The factors searched stay within these bounds (a train twice as heavy as its papers is another train). */
export const FACTOR_RANGE: readonly [number, number] = [0.5, 2];
/** Seconds of the recording before its moment of start that are still compared (the standing train). */
const BEFORE_START_S = 10;
/** Gauss–Newton iterations at most. */
const MAX_ITERATIONS = 6;
/** A step on a factor smaller than this ends the search (a tenth of the ±0.05 the fit is asked to meet). */
const CONVERGED = 0.005;
/** |correlation| of the joint estimates beyond which mass and effort are not told apart. */
export const INSEPARABLE_CORRELATION = 0.9;

/** The case with the trailing mass and every unit's effort scaled (the planner's own inputs, nothing else). */
export function scaledCase(c: StartCase, f: Factors): StartCase {
  const spec = (s: LocomotiveSpec): LocomotiveSpec =>
    f.effortFactor === 1
      ? s
      : {
          ...s,
          startingTractiveEffortN: s.startingTractiveEffortN * f.effortFactor,
          continuousTractiveEffortN: s.continuousTractiveEffortN * f.effortFactor,
          railPowerW: s.railPowerW * f.effortFactor,
        };
  return {
    ...c,
    locomotives: c.locomotives.map((g) => ({ ...g, spec: spec(g.spec) })),
    train: { ...c.train, trailingMassKg: c.train.trailingMassKg * f.massFactor },
  };
}

/** A re-simulated start: the locomotive's speed and travel against the run's time. */
export interface RunCurve {
  timeS: Float64Array;
  speedMps: Float64Array;
  travelM: Float64Array;
  startS: number | null;
}

/**
 * Run a notch sequence on the case as `taut simulate` does (the brakes come off as the plan takes them off;
 * the locomotive brake holds until 3 s after the first notch), until `untilS`, or — with `afterStartS` —
 * until that long after the locomotive first moves.
 */
export function replay(c: StartCase, seq: readonly NotchAt[], until: { untilS: number; afterStartS?: number }): RunCurve {
  const { model, controls } = sequenceRun(c, seq, { adhesionQuantile: REVIEW_ADHESION_QUANTILE });
  let movedAt = -1;
  const after = until.afterStartS;
  const res = simulate(model, controls, {
    durationS: until.untilS,
    seriesIntervalS: 0.5,
    ...(after !== undefined
      ? {
          stopWhen: (o) => {
            if (movedAt < 0 && o.leadSpeedMps >= START_SPEED_MPS) movedAt = o.timeS;
            return movedAt >= 0 && o.timeS > movedAt + after;
          },
        }
      : {}),
  });
  const s = res.series;
  return { timeS: s.timeS, speedMps: s.leadSpeedMps, travelM: s.leadTravelM, startS: startMoment(s.timeS, s.leadSpeedMps) };
}

export interface FactorEstimate {
  value: number;
  /** 95 % interval. */
  low: number;
  high: number;
}

export interface FitResult {
  factors: Factors;
  /** Estimates of the factors that were fitted (the other held at 1). */
  estimates: Partial<Record<keyof Factors, FactorEstimate>>;
  /** Recording time minus run time at the fitted alignment, s. */
  offsetS: number;
  /** Root-mean-square speed difference over the compared stretch, m/s. */
  rmsMps: number;
  /** Samples compared. */
  samples: number;
  /** Correlation of the mass and effort estimates when both were free (or their derivatives compared). */
  correlation?: number;
  /** The re-simulated start at the fitted factors. */
  curve: RunCurve;
  /** Re-simulations run. */
  runs: number;
}

/** How the recording is laid over the runs. */
export interface ReviewSetup {
  c: StartCase;
  recording: Recording;
  /** The notches to replay, in run time. */
  sequence: NotchAt[];
  /** Recording time − run time when the notch timeline fixes it; null when it is fitted. */
  fixedOffsetS: number | null;
  /** Recording's moment of start, s. */
  recordedStartS: number;
}

/** The runs of one review, kept so that no factor pair is simulated twice. */
export class ReviewRuns {
  private cache = new Map<string, RunCurve>();
  count = 0;
  private readonly window: { fromS: number; toS: number };
  private readonly t: number[];
  private readonly v: number[];

  constructor(readonly setup: ReviewSetup) {
    const s = setup.recording.samples;
    const end = s[s.length - 1]!.timeS;
    this.window = { fromS: setup.recordedStartS - BEFORE_START_S, toS: end };
    const kept = s.filter((x) => x.timeS >= this.window.fromS);
    this.t = kept.map((x) => x.timeS);
    this.v = kept.map((x) => x.speedMps);
  }

  run(f: Factors): RunCurve {
    const key = `${f.massFactor.toFixed(5)}|${f.effortFactor.toFixed(5)}`;
    const hit = this.cache.get(key);
    if (hit) return hit;
    const c = scaledCase(this.setup.c, f);
    const span = this.window.toS - this.setup.recordedStartS;
    const curve =
      this.setup.fixedOffsetS === null
        ? replay(c, this.setup.sequence, { untilS: 3600, afterStartS: span + 60 })
        : replay(c, this.setup.sequence, { untilS: this.window.toS - this.setup.fixedOffsetS + 2 });
    this.count++;
    this.cache.set(key, curve);
    return curve;
  }

  /** Recording time − run time that lays the run's moment of start on the recording's. */
  startOffset(curve: RunCurve): number {
    if (this.setup.fixedOffsetS !== null) return this.setup.fixedOffsetS;
    // A run that never moves is laid at the end of its time, so the comparison sees it standing.
    const runStart = curve.startS ?? curve.timeS[curve.timeS.length - 1]!;
    return this.setup.recordedStartS - runStart;
  }

  /** Run speed minus recorded speed at each compared sample, m/s. */
  residuals(curve: RunCurve, offsetS: number): number[] {
    return this.t.map((t, i) => interpolate(curve.timeS, curve.speedMps, t - offsetS) - this.v[i]!);
  }

  /** The run's acceleration at each compared sample: the derivative of the residuals with the offset (negated). */
  accelerations(curve: RunCurve, offsetS: number): number[] {
    const h = 0.5;
    return this.t.map((t) => (interpolate(curve.timeS, curve.speedMps, t - offsetS + h) - interpolate(curve.timeS, curve.speedMps, t - offsetS - h)) / (2 * h));
  }

  get samples(): number {
    return this.t.length;
  }
}

type Free = keyof Factors;

/**
 * Least squares over the free factors (and the offset when it is not fixed), from `start`. Gauss–Newton
 * with forward differences for the factors and the run's own acceleration for the offset; a step that does
 * not lower the sum of squares is halved.
 */
export function fitFactors(runs: ReviewRuns, free: readonly Free[], start: Factors = { massFactor: 1, effortFactor: 1 }): FitResult {
  const offsetFree = runs.setup.fixedOffsetS === null;
  let f: Factors = { ...start };
  let curve = runs.run(f);
  let offset = runs.startOffset(curve);
  let r = runs.residuals(curve, offset);
  let sse = sumSq(r);
  let jac: number[][] = [];
  let prev: { f: Factors; curve: RunCurve } | null = null;
  for (let it = 0; it < MAX_ITERATIONS; it++) {
    jac = free.map((k) => {
      // One factor free and the last step long enough: the secant through the last two points is the
      // derivative (a run saved per iteration); otherwise a forward difference.
      const d = prev ? f[k] - prev.f[k] : 0;
      const secant = prev !== null && free.length === 1 && Math.abs(d) >= STEP / 4;
      const cg = secant ? prev!.curve : runs.run({ ...f, [k]: f[k] + STEP });
      const h = secant ? -d : STEP;
      // The offset is held while a factor moves (it has its own column).
      const rg = runs.residuals(cg, offset);
      return rg.map((x, i) => (x - r[i]!) / h);
    });
    if (offsetFree) jac.push(runs.accelerations(curve, offset).map((a) => -a));
    const step = solveNormal(jac, r);
    if (!step) break;
    let scale = 1;
    let accepted = false;
    for (let tries = 0; tries < 4; tries++, scale /= 2) {
      const g: Factors = { ...f };
      free.forEach((k, j) => {
        g[k] = clamp(f[k] - scale * step[j]!, FACTOR_RANGE[0], FACTOR_RANGE[1]);
      });
      const cg = runs.run(g);
      const og = offsetFree ? offset - scale * step[free.length]! : offset;
      const rg = runs.residuals(cg, og);
      const sg = sumSq(rg);
      if (sg <= sse) {
        const moved = Math.max(...free.map((k) => Math.abs(g[k] - f[k])));
        prev = { f, curve };
        f = g;
        curve = cg;
        offset = og;
        r = rg;
        sse = sg;
        accepted = true;
        if (moved < CONVERGED) it = MAX_ITERATIONS;
        break;
      }
    }
    if (!accepted) break;
  }
  const cov = covariance(jac, r);
  const estimates: FitResult["estimates"] = {};
  free.forEach((k, j) => {
    const half = cov ? 1.96 * Math.sqrt(Math.max(0, cov[j]![j]!)) : Number.POSITIVE_INFINITY;
    estimates[k] = { value: f[k], low: f[k] - half, high: f[k] + half };
  });
  const out: FitResult = { factors: f, estimates, offsetS: offset, rmsMps: Math.sqrt(sse / r.length), samples: r.length, curve, runs: runs.count };
  if (free.length === 2 && cov) out.correlation = cov[0]![1]! / Math.sqrt(cov[0]![0]! * cov[1]![1]!);
  return out;
}

/**
 * Correlation of mass and effort estimates from the two factors' derivative columns at a point (the
 * offset fixed): near ±1 the recording sees only their ratio.
 */
export function factorCorrelation(runs: ReviewRuns, at: Factors): number {
  const curve = runs.run(at);
  const offset = runs.startOffset(curve);
  const r = runs.residuals(curve, offset);
  const cols = (["massFactor", "effortFactor"] as const).map((k) => {
    const g = { ...at, [k]: at[k] + STEP };
    return runs.residuals(runs.run(g), offset).map((x, i) => (x - r[i]!) / STEP);
  });
  const a = dot(cols[0]!, cols[0]!);
  const b = dot(cols[0]!, cols[1]!);
  const d = dot(cols[1]!, cols[1]!);
  // For two parameters the estimates' correlation is −b / √(a d) (the inverse of the 2 × 2 normal matrix).
  return a > 0 && d > 0 ? -b / Math.sqrt(a * d) : 1;
}

function sumSq(r: readonly number[]): number {
  let s = 0;
  for (const x of r) s += x * x;
  return s;
}

function dot(a: readonly number[], b: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]! * b[i]!;
  return s;
}

function clamp(x: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, x));
}

/** Normal matrix JᵀJ of the columns. */
function normal(cols: readonly number[][]): number[][] {
  return cols.map((a) => cols.map((b) => dot(a, b)));
}

/** The Gauss–Newton step δ solving (JᵀJ) δ = Jᵀr, or null when the normal matrix is singular. */
function solveNormal(cols: readonly number[][], r: readonly number[]): number[] | null {
  const a = normal(cols);
  const inv = invert(a);
  if (!inv) return null;
  const g = cols.map((c) => dot(c, r));
  return inv.map((row) => dot(row, g));
}

/**
 * Covariance of the estimates: s² (JᵀJ)⁻¹ with s² the residual variance, widened for the residuals'
 * serial correlation by the AR(1) factor (1 + ρ)/(1 − ρ) — a smoothed 1 Hz speed is far from independent
 * sample to sample (Bretherton et al., "The effective number of spatial degrees of freedom of a
 * time-varying field", J. Climate 12, 1999, eq. 31).
 */
function covariance(cols: readonly number[][], r: readonly number[]): number[][] | null {
  if (cols.length === 0) return null;
  const inv = invert(normal(cols));
  if (!inv) return null;
  const n = r.length;
  const p = cols.length;
  const s2 = sumSq(r) / Math.max(1, n - p);
  let num = 0;
  let den = 0;
  const mean = r.reduce((a, b) => a + b, 0) / n;
  for (let i = 0; i < n; i++) {
    den += (r[i]! - mean) ** 2;
    if (i > 0) num += (r[i]! - mean) * (r[i - 1]! - mean);
  }
  const rho = den > 0 ? Math.min(0.96, Math.max(0, num / den)) : 0;
  const widen = (1 + rho) / (1 - rho);
  return inv.map((row) => row.map((x) => x * s2 * widen));
}

/** Inverse of a small symmetric matrix by Gauss–Jordan elimination; null when singular. */
function invert(a: readonly number[][]): number[][] | null {
  const n = a.length;
  const m = a.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))]);
  for (let col = 0; col < n; col++) {
    let piv = col;
    for (let i = col + 1; i < n; i++) if (Math.abs(m[i]![col]!) > Math.abs(m[piv]![col]!)) piv = i;
    const p = m[piv]![col]!;
    if (!(Math.abs(p) > 1e-12 * Math.max(1, Math.abs(a[col]![col]!)))) return null;
    [m[col], m[piv]] = [m[piv]!, m[col]!];
    const row = m[col]!;
    for (let j = 0; j < 2 * n; j++) row[j] = row[j]! / p;
    for (let i = 0; i < n; i++) {
      if (i === col) continue;
      const k = m[i]![col]!;
      if (k !== 0) for (let j = 0; j < 2 * n; j++) m[i]![j] = m[i]![j]! - k * row[j]!;
    }
  }
  return m.map((row) => row.slice(n));
}
