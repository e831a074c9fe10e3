/**
 * The settled train: once a stretched, rolling train's relative motion has died down, every vehicle moves
 * with one speed and each coupling carries the quasi-static force T_j = Σ_{i≤j} (F_i − R_i − m_i·g·sin θ_i −
 * m_i(1+γ_i)·a), a the whole train's acceleration (PHYSICS.md §5 with the vehicles' accelerations equal).
 * Then one Newton's law for the whole train per control interval replaces the chain's hundreds of stiff
 * steps, and the couplings' forces (their peaks, the wheel-climb check's buff) follow from the prefix sums.
 *
 * It ends when anything could start a surge or a run-in: a notch change, the speed falling low, a coupling's
 * force less its sway reaching zero (it would go into its slack). The chain's remaining sway adds to the next
 * surge, and the settled train cannot hand that sway back, so a settled stretch that ends before the run
 * does is run again with the full chain from where the train settled (runner.ts `runStretchAsChain`): only a
 * stretch in which the run ends stays run as one, and every figure before it is the full chain's.
 */
import { GRAVITY_MPS2 } from "../physics/constants.js";
import { BENCH } from "./benchOnly.js";
import { updateTraction, type DynamicsState } from "./dynamics.js";
import type { TrainModel } from "../train/trainModel.js";

/** Slowest speed at which the train may run as one, m/s: below it vehicles may stop and stick again. */
export const SETTLED_MIN_SPEED_MPS = 1;
/** Time after a notch change before the chain's remaining sway is measured: the surge's first passes, s. */
export const SETTLE_AFTER_CHANGE_S = 4;
/** Time the remaining sway is measured over before the train may run as one (a 150-wagon train's slowest mode swings in about 8 s), s. */
export const SWAY_WINDOW_S = 10;
/**
 * The sway measured at the control intervals is taken this much larger (its crests fall between them), and
 * never under 1 kN. A coupling whose force less that sway may reach zero is near its slack: the full chain is
 * needed. So every coupling of a train running as one carries at least the floor (1 kN) beyond its sway.
 * (A fixed 2 kN beyond the sway as well kept a long train in the chain throughout: its tail coupling carries
 * only the last wagon — 3.7 kN on a 150-wagon train's 2 ‰ rise, under 1 kN on the level — and the train's
 * slowest sway, lightly damped, keeps about half of that on it for minutes.)
 */
export const SWAY_ALLOWANCE = 1.1;
export const SWAY_FLOOR_N = 1000;

/**
 * May a coupling run as one while its quasi-static force plus its upward sway passes the peak it has reached
 * (the model then reports that crest as the coupling's new peak: high by the sway's allowance unless the
 * chain is stirred anew)?
 * A long train creeping up to speed holds its head couplings at their creeping peak for minutes, which kept
 * it in the full chain. Off: the earlier rule (one sway both ways, no new peak as one), for the benchmark's
 * before/after.
 */
let creepingPeakAsOne = true;
export function setCreepingPeakAsOne(on: boolean): void {
  creepingPeakAsOne = on;
}

/** The sway allowed for over a measured crest (`SWAY_ALLOWANCE`, at least `SWAY_FLOOR_N`), N. */
function allowance(measuredN: number): number {
  return Math.max(SWAY_FLOOR_N, SWAY_ALLOWANCE * measuredN);
}

/** The settled train's own state beside the chain's. */
export interface Settled {
  /** x_i − x_lead when the train settled, m. */
  offsetM: Float64Array;
  /** The notches it settled in: any change sends it back to the chain. */
  notch: Int32Array;
  /** Engaged side of each coupling when it settled (+1 draft, −1 buff). */
  side: Int8Array;
  /** The sway each coupling's force showed above its quasi-static force (on its engaged side) before it settled, allowance included, N. */
  swayUpN: Float64Array;
  /** The same below its quasi-static force (towards its slack), N. */
  swayDownN: Float64Array;
  /** Each coupling's quasi-static force now (its force as reported adds the sway on its engaged side), N. */
  meanN: Float64Array;
  /** A coupling nears its slack (or, with `creepingPeakAsOne` off, its crest could set a new peak). */
  leave: boolean;
}

/**
 * The chain's quasi-static coupler forces into `out` (n − 1): F_j = F_{j−1} + net_j − m_j(1+γ_j)·a with a the
 * whole train's acceleration, from the chain's own net external forces (every vehicle moving, so each
 * vehicle's acceleration is exactly (F_{j−1} − F_j + net_j) / m_j(1+γ_j)).
 */
export function quasiStaticForces(m: TrainModel, s: DynamicsState, out: Float64Array): void {
  const n = m.n;
  let effMass = 0;
  let momentum = 0;
  for (let i = 0; i < n; i++) {
    effMass += m.effMassKg[i]!;
    momentum += m.effMassKg[i]! * s.acc[i]!;
  }
  const a = momentum / effMass;
  let fq = 0;
  let fPrev = 0;
  for (let j = 0; j < n - 1; j++) {
    const f = s.couplerF[j]!;
    fq += s.acc[j]! * m.effMassKg[j]! - fPrev + f - m.effMassKg[j]! * a;
    fPrev = f;
    out[j] = fq;
  }
}

/**
 * Widen each coupling's measured sway by the chain's present departure from its quasi-static force: `sway`
 * holds 2(n − 1) figures, the upward sway (away from the slack, on the side the coupling is engaged now) of
 * coupling j at j and the downward sway (towards its slack) at n − 1 + j.
 */
export function measureSway(m: TrainModel, s: DynamicsState, mean: Float64Array, sway: Float64Array): void {
  quasiStaticForces(m, s, mean);
  const k = m.n - 1;
  for (let j = 0; j < k; j++) {
    const d = (s.engaged[j]! < 0 ? -1 : 1) * (s.couplerF[j]! - mean[j]!);
    if (d > sway[j]!) sway[j] = d;
    if (-d > sway[k + j]!) sway[k + j] = -d;
  }
}

/** Coupling j's upward and downward allowances from the measured sways (one figure both ways with `creepingPeakAsOne` off). */
function allowances(sway: Float64Array, k: number, j: number): [number, number] {
  const up = sway[j]!;
  const down = sway[k + j]!;
  if (BENCH && !creepingPeakAsOne) {
    const w = allowance(Math.max(up, down));
    return [w, w];
  }
  return [allowance(up), allowance(down)];
}

/**
 * May the train run as one now? Moving well above a crawl, every coupling engaged on the side of its
 * quasi-static force and, less the downward sway measured, far enough from its slack. A coupling's
 * quasi-static force plus its upward sway may pass the peak it has already reached: running as one then
 * reports that crest as the new peak (the crest the chain would reach, with the allowance over the sway measured).
 */
export function maySettle(m: TrainModel, s: DynamicsState, lead: number, mean: Float64Array, sway: Float64Array): boolean {
  if (s.v[lead]! < SETTLED_MIN_SPEED_MPS * 1.5) return false;
  for (let i = 0; i < m.n; i++) if (s.v[i]! <= 0) return false;
  quasiStaticForces(m, s, mean);
  const k = m.n - 1;
  for (let j = 0; j < k; j++) {
    const side = s.engaged[j]!;
    const f = side * mean[j]!;
    const [up, down] = allowances(sway, k, j);
    if (side === 0 || f - down <= 0) return false;
    if (BENCH && !creepingPeakAsOne && f + up > (side > 0 ? s.peakTensionN[j]! : s.peakCompressionN[j]!)) return false;
  }
  return true;
}

/** Why `maySettle` refused (for the benchmarks): 0 too slow, 1 a vehicle not moving forward, 2 a coupling in its slack or
 * its quasi-static force within the floor of it, 7 only the sway measured takes a coupling to its slack. */
export function settledRefusal(m: TrainModel, s: DynamicsState, lead: number, mean: Float64Array): number {
  if (s.v[lead]! < SETTLED_MIN_SPEED_MPS * 1.5) return 0;
  for (let i = 0; i < m.n; i++) if (s.v[i]! <= 0) return 1;
  const k = m.n - 1;
  for (let j = 0; j < k; j++) if (s.engaged[j]! === 0 || s.engaged[j]! * mean[j]! <= SWAY_FLOOR_N) return 2;
  return 7;
}

/** Begin running the train as one: the vehicles' places behind the lead kept as they are now. */
export function settle(m: TrainModel, s: DynamicsState, lead: number, mean: Float64Array, measuredSway: Float64Array): Settled {
  const n = m.n;
  const offsetM = new Float64Array(n);
  let effMass = 0;
  let momentum = 0;
  for (let i = 0; i < n; i++) {
    offsetM[i] = s.x[i]! - s.x[lead]!;
    effMass += m.effMassKg[i]!;
    momentum += m.effMassKg[i]! * s.v[i]!;
  }
  // The train's speed is its momentum's: the vehicles' small spread averaged out.
  s.v.fill(momentum / effMass);
  const k = n - 1;
  const swayUpN = new Float64Array(k);
  const swayDownN = new Float64Array(k);
  for (let j = 0; j < k; j++) [swayUpN[j], swayDownN[j]] = allowances(measuredSway, k, j);
  return { offsetM, notch: s.notch.slice(), side: Int8Array.from(s.engaged), swayUpN, swayDownN, meanN: mean.slice(), leave: false };
}

/** The settled train must go back to the chain: a notch changed, it is slow, or its forces could matter. */
export function mustUnsettle(m: TrainModel, s: DynamicsState, st: Settled, lead: number): boolean {
  if (st.leave || s.v[lead]! < SETTLED_MIN_SPEED_MPS) return true;
  for (let k = 0; k < m.nl; k++) if (s.notch[k] !== st.notch[k]) return true;
  return false;
}

/**
 * Advance the settled train by dt (kick–drift–kick on the one mass); the state's positions, speeds,
 * accelerations, efforts and coupler forces updated as the chain would have them (each coupling's force its
 * quasi-static force with the measured sway added on its engaged side: the crest the chain would reach).
 */
export function settledStep(m: TrainModel, s: DynamicsState, st: Settled, lead: number, dt: number): void {
  const h = 0.5 * dt;
  const n = m.n;
  let v = s.v[lead]! + s.acc[lead]! * h;
  const xLead = s.x[lead]! + v * dt;
  s.t += dt;
  const x = s.x;
  const off = st.offsetM;
  for (let i = 0; i < n; i++) x[i] = xLead + off[i]!;
  s.v.fill(v);
  updateTraction(m, s, dt);
  const a = settledForces(m, s, st, v);
  v += a * h;
  s.v.fill(v);
}

/** The external forces at speed v, the train's acceleration and the coupler forces; returns the acceleration. */
function settledForces(m: TrainModel, s: DynamicsState, st: Settled, v: number): number {
  const n = m.n;
  const x = s.x;
  const seg = s.seg;
  const net = s.acc; // each vehicle's net external force until the acceleration is known
  const g = GRAVITY_MPS2;
  const fade = m.fadeSpeedMps;
  let total = 0;
  let effMass = 0;
  for (let i = 0; i < n; i++) {
    const ch = m.chainage0M[i]! + x[i]!;
    let k = seg[i]!;
    while (ch >= m.segEndM[k]!) k++;
    while (ch < m.segStartM[k]!) k--;
    seg[i] = k;
    const mass = m.massKg[i]!;
    let res = m.davisA[i]! + (m.davisB[i]! + m.davisC[i]! * v) * v + mass * m.segCurveNPerKg[k]!;
    if (v < fade) res += m.breakawayExcessN[i]! * (1 - v / fade);
    const f = s.tractionN[i]! - mass * g * m.segSin[k]! - res - s.brakeN[i]!;
    net[i] = f;
    total += f;
    effMass += m.effMassKg[i]!;
  }
  const a = total / effMass;
  const F = s.couplerF;
  const mean = st.meanN;
  let maxT = s.intervalMaxTensionN;
  let maxC = s.intervalMaxCompressionN;
  let fq = 0;
  for (let j = 0; j < n - 1; j++) {
    fq += net[j]! - m.effMassKg[j]! * a;
    mean[j] = fq;
    const side = st.side[j]!;
    const crest = side * fq + st.swayUpN[j]!;
    if (side * fq - st.swayDownN[j]! <= 0) st.leave = true;
    if (side > 0) {
      F[j] = crest;
      if (crest > maxT) maxT = crest;
      if (crest > s.peakTensionN[j]!) {
        if (BENCH && !creepingPeakAsOne) st.leave = true;
        s.peakTensionN[j] = crest;
        s.peakTensionT[j] = s.t;
      }
    } else {
      F[j] = -crest;
      if (crest > maxC) maxC = crest;
      if (crest > s.peakCompressionN[j]!) {
        if (BENCH && !creepingPeakAsOne) st.leave = true;
        s.peakCompressionN[j] = crest;
        s.peakCompressionT[j] = s.t;
      }
    }
  }
  s.intervalMaxTensionN = maxT;
  s.intervalMaxCompressionN = maxC;
  s.acc.fill(a);
  return a;
}
