/**
 * Longitudinal train dynamics: the chain of vehicle masses and couplings integrated with a fixed-step
 * leapfrog (kick–drift–kick) scheme. m_i(1+γ_i)·a_i = F_c,i−1 − F_c,i + F_t,i − F_r,i − m_i·g·sin θ_i − F_curve,i
 * (PHYSICS.md §5). Coupling law: dead band of free slack, loading/unloading curves with a steep
 * change-over between them (hysteresis), end stop and light damping (PHYSICS.md §4). A standing vehicle
 * stays put until the net force on it exceeds what holds it (breakaway, curve, brakes).
 * `step` advances the state by dt; the caller owns the clock.
 */
import { GRAVITY_MPS2 } from "../physics/constants.js";
import { PRELOAD_RAMP_M } from "../physics/coupling.js";
import type { TrainModel } from "../train/trainModel.js";
import { BENCH } from "./benchOnly.js";

export interface DynamicsState {
  t: number;
  /** Displacement of each vehicle from where it stood, m (forward positive). */
  x: Float64Array;
  v: Float64Array;
  acc: Float64Array;
  /** Cached track segment of each vehicle. */
  seg: Int32Array;
  /** Hysteretic gear force of each coupling (magnitude on its engaged side), N. */
  gearF: Float64Array;
  /** Gear deflection at the last evaluation (magnitude), m. */
  gearDefl: Float64Array;
  /** Total coupling force, tension positive, N. */
  couplerF: Float64Array;
  /** −1 buff engaged, 0 in the slack, +1 draft engaged. */
  engaged: Int8Array;
  /** Tractive effort each vehicle receives (0 for wagons), N. */
  tractionN: Float64Array;
  /** Brake holding capacity now, N (set by the caller from the brake schedule). */
  brakeN: Float64Array;
  /** Per powered unit: notch, lagged effort, target effort. */
  notch: Int32Array;
  effortN: Float64Array;
  targetN: Float64Array;

  // Running records, updated in the force evaluation so the hot loop reads each value once.
  peakTensionN: Float64Array;
  peakTensionT: Float64Array;
  peakCompressionN: Float64Array;
  peakCompressionT: Float64Array;
  /** Largest tension / compression anywhere since the last `resetInterval`. */
  intervalMaxTensionN: number;
  intervalMaxCompressionN: number;
  /** Slip triggers since the start, and per unit the time of the last one. */
  slipCount: Int32Array;
  lastSlipT: Float64Array;
  /** Effort-lag factors for the last evaluation interval (recomputed when it changes). */
  lagDt: number;
  lagRise: number;
  lagFall: number;
  /** Take-up events: a coupling going from slack to engaged. */
  takeUp: TakeUpLog;
  energy: EnergyLedger | null;

  // The resting vehicles' part of a step (`stepActive`): which vehicles may change at the next evaluation.
  /** 1: the vehicle moved or was pushed at its last evaluation, or its brake changed since so that it may move (0: it rests). */
  restless: Uint8Array;
  /** `restless` describes the state (false after an evaluation of every vehicle, which does not keep it). */
  restlessValid: boolean;
  /** Runs of the vehicles evaluated at the last evaluation as [first, last] pairs (scratch). */
  runs: Int32Array;
  /** The interval maxima were reset (`observe`) and the couplings not evaluated since are not in them yet. */
  intervalMaxStale: boolean;
}

/** Couplings coming out of the slack: when, which, and how fast the two vehicles closed or parted. */
export interface TakeUpLog {
  count: number;
  timeS: Float64Array;
  coupling: Int32Array;
  /** Relative speed at engagement, m/s: positive run-out (parting), negative run-in (closing). */
  relSpeedMps: Float64Array;
  maxRunOutMps: number;
  maxRunInMps: number;
}

/** Work and energy, J, for the energy-balance check. */
export interface EnergyLedger {
  traction: number;
  resistance: number;
  brakes: number;
  grade: number;
  coupling: number;
  /** Forces at the last evaluation (for trapezoidal work), per vehicle and coupling. */
  lastX: Float64Array;
  lastTraction: Float64Array;
  lastResist: Float64Array;
  lastBrake: Float64Array;
  lastGrade: Float64Array;
  lastExt: Float64Array;
  lastCoupler: Float64Array;
}

const TAKE_UP_CAPACITY = 4096;
/** Below this relative speed an engagement is not logged as a take-up event, m/s. */
const TAKE_UP_LOG_SPEED = 0.02;
const MIN_POWER_SPEED = 1e-3;
const CK0 = 7.5 / 44 + 0.161;

/** A fresh state: all vehicles standing, slack as the model sets it, brakes as given. */
export function createState(m: TrainModel, opts: { trackEnergy?: boolean } = {}): DynamicsState {
  const n = m.n;
  const nc = Math.max(0, n - 1);
  const s = shapedState({
    t: 0,
    x: new Float64Array(n),
    v: new Float64Array(n),
    acc: new Float64Array(n),
    seg: new Int32Array(n),
    gearF: new Float64Array(nc),
    gearDefl: new Float64Array(nc),
    couplerF: new Float64Array(nc),
    engaged: new Int8Array(nc),
    tractionN: new Float64Array(n),
    brakeN: new Float64Array(n),
    notch: new Int32Array(m.nl),
    effortN: new Float64Array(m.nl),
    targetN: new Float64Array(m.nl),
    peakTensionN: new Float64Array(nc),
    peakTensionT: new Float64Array(nc),
    peakCompressionN: new Float64Array(nc),
    peakCompressionT: new Float64Array(nc),
    intervalMaxTensionN: 0,
    intervalMaxCompressionN: 0,
    slipCount: new Int32Array(m.nl),
    lastSlipT: new Float64Array(m.nl).fill(-Infinity),
    lagDt: -1,
    lagRise: 0,
    lagFall: 0,
    takeUp: shapedTakeUp({
      count: 0,
      timeS: new Float64Array(TAKE_UP_CAPACITY),
      coupling: new Int32Array(TAKE_UP_CAPACITY),
      relSpeedMps: new Float64Array(TAKE_UP_CAPACITY),
      maxRunOutMps: 0,
      maxRunInMps: 0,
    }),
    energy: null,
    restless: new Uint8Array(n),
    restlessValid: false,
    runs: new Int32Array(2 * n + 2),
    intervalMaxStale: false,
  });
  for (let i = 0; i < n; i++) s.seg[i] = segmentOf(m, m.chainage0M[i]!, 0);
  // Couplings that stand exactly at the edge of their slack start engaged with no load.
  for (let j = 0; j < nc; j++) {
    const ext = m.ext0M[j]!;
    s.engaged[j] = ext > m.halfSlackM[j]! - 1e-12 ? 1 : ext < -m.halfSlackM[j]! + 1e-12 ? -1 : 0;
  }
  if (opts.trackEnergy) {
    s.energy = {
      traction: 0,
      resistance: 0,
      brakes: 0,
      grade: 0,
      coupling: 0,
      lastX: new Float64Array(n),
      lastTraction: new Float64Array(n),
      lastResist: new Float64Array(n),
      lastBrake: new Float64Array(n),
      lastGrade: new Float64Array(n),
      lastExt: Float64Array.from(m.ext0M),
      lastCoupler: new Float64Array(nc),
    };
  }
  evaluate(m, s, 0);
  return s;
}

/**
 * Every state is built here, so that all of them — fresh or cloned — share one shape in the engine and the
 * hot loops see one kind of object. Its number fields start as fractions, then take their values: a field
 * that began as a small integer would change its stored form at the first fraction (every compiled hot loop
 * thrown away and made again, with the run meanwhile interpreted).
 */
export function shapedState(p: DynamicsState): DynamicsState {
  const s: DynamicsState = {
    t: 0.5,
    x: p.x,
    v: p.v,
    acc: p.acc,
    seg: p.seg,
    gearF: p.gearF,
    gearDefl: p.gearDefl,
    couplerF: p.couplerF,
    engaged: p.engaged,
    tractionN: p.tractionN,
    brakeN: p.brakeN,
    notch: p.notch,
    effortN: p.effortN,
    targetN: p.targetN,
    peakTensionN: p.peakTensionN,
    peakTensionT: p.peakTensionT,
    peakCompressionN: p.peakCompressionN,
    peakCompressionT: p.peakCompressionT,
    intervalMaxTensionN: 0.5,
    intervalMaxCompressionN: 0.5,
    slipCount: p.slipCount,
    lastSlipT: p.lastSlipT,
    lagDt: 0.5,
    lagRise: 0.5,
    lagFall: 0.5,
    takeUp: p.takeUp,
    energy: p.energy,
    restless: p.restless,
    restlessValid: p.restlessValid,
    runs: p.runs,
    intervalMaxStale: p.intervalMaxStale,
  };
  s.t = p.t;
  s.intervalMaxTensionN = p.intervalMaxTensionN;
  s.intervalMaxCompressionN = p.intervalMaxCompressionN;
  s.lagDt = p.lagDt;
  s.lagRise = p.lagRise;
  s.lagFall = p.lagFall;
  return s;
}

/** The take-up log in its one shape (as `shapedState`). */
export function shapedTakeUp(p: TakeUpLog): TakeUpLog {
  const log: TakeUpLog = { count: p.count, timeS: p.timeS, coupling: p.coupling, relSpeedMps: p.relSpeedMps, maxRunOutMps: 0.5, maxRunInMps: 0.5 };
  log.maxRunOutMps = p.maxRunOutMps;
  log.maxRunInMps = p.maxRunInMps;
  return log;
}

function segmentOf(m: TrainModel, chainage: number, guess: number): number {
  let k = guess;
  while (chainage >= m.segEndM[k]!) k++;
  while (chainage < m.segStartM[k]!) k--;
  return k;
}

/** Vehicle-steps integrated since the process started (every vehicle of a full step; the active ones of `stepActive`). */
let vehicleSteps = 0;

/** Vehicle-steps integrated so far in this process (for the benchmarks: work, not time). */
export function vehicleStepsDone(): number {
  return vehicleSteps;
}

/** Count work done outside `step` (the settled train's interval: every vehicle once). */
export function countVehicleSteps(k: number): void {
  if (BENCH) vehicleSteps += k;
}

/**
 * Integrate only the vehicles that can change while most rest (`stepActive`): on by default; off to compare
 * with the full step throughout (the benchmark, the exactness test). The figures are the same either way.
 */
let activeOnly = true;

export function setActiveOnlyStepping(on: boolean): void {
  activeOnly = on;
}

export function activeOnlyStepping(): boolean {
  return !BENCH || activeOnly;
}

/** Advance the state by dt seconds (kick–drift–kick). Notches and brake capacities are read from the state. */
export function step(m: TrainModel, s: DynamicsState, dt: number): void {
  if (BENCH) vehicleSteps += m.n;
  const h = 0.5 * dt;
  const n = m.n;
  const x = s.x;
  const v = s.v;
  const acc = s.acc;
  // First half-kick fused with the drift.
  for (let i = 0; i < n; i++) {
    let vi = v[i]!;
    const ai = acc[i]!;
    if (ai !== 0) {
      const vn = vi + ai * h;
      // A vehicle whose speed would change sign stops; the next evaluation decides whether it sticks.
      vi = (vi > 0 && vn < 0) || (vi < 0 && vn > 0) ? 0 : vn;
      v[i] = vi;
    }
    x[i]! += vi * dt;
  }
  s.t += dt;
  evaluate(m, s, dt, h);
}

/**
 * `step` for a train most of whose vehicles rest (the brakes releasing, the train still standing or taking
 * up its slack): only the vehicles that can change are integrated — each that moved or was pushed at its last
 * evaluation, whose brake changed since so that it may break away (`applyBrakes` marks it: `mayBreakAway`),
 * and their neighbours, with the couplings
 * between them; and every unit (its effort changes by itself). Exact: a vehicle that stood still with no
 * force moving it, between neighbours that did the same, has the same position, speed, coupling forces and
 * acceleration at the next evaluation, so the full step would compute for it what it already holds (the
 * hysteretic gear force at an unchanged deflection is its own fixed point). The couplings not evaluated still
 * count in the interval's largest forces: once after each reset (`intervalMaxStale`), while each keeps its
 * value. Not with the energy ledger (the full `step` then).
 */
export function stepActive(m: TrainModel, s: DynamicsState, dt: number): void {
  if (s.energy !== null) return step(m, s, dt);
  const n = m.n;
  const restless = s.restless;
  if (!s.restlessValid) restless.fill(1);
  const h = 0.5 * dt;
  const x = s.x;
  const v = s.v;
  const acc = s.acc;
  const runs = s.runs;
  for (let k = 0; k < m.nl; k++) restless[m.locoVehicle[k]!] = 1;
  // One pass: the first half-kick and drift of the restless vehicles, and which vehicles to evaluate (the
  // restless and their neighbours) as runs.
  let count = 0;
  let nRuns = 0;
  let open = false;
  let before = 0;
  let here = restless[0]!;
  for (let i = 0; i < n; i++) {
    const after = i < n - 1 ? restless[i + 1]! : 0;
    if (here !== 0) {
      let vi = v[i]!;
      const ai = acc[i]!;
      if (ai !== 0) {
        const vn = vi + ai * h;
        vi = (vi > 0 && vn < 0) || (vi < 0 && vn > 0) ? 0 : vn;
        v[i] = vi;
      }
      x[i]! += vi * dt;
    }
    if ((before | here | after) !== 0) {
      count++;
      if (!open) {
        runs[2 * nRuns] = i;
        open = true;
      }
      runs[2 * nRuns + 1] = i;
    } else if (open) {
      nRuns++;
      open = false;
    }
    before = here;
    here = after;
  }
  s.t += dt;
  if (open) nRuns++;
  if (BENCH) vehicleSteps += count;
  evaluateRuns(m, s, dt, h, runs, nRuns, restless);
  s.restlessValid = true;
  if (s.intervalMaxStale) countStandingCouplings(s, n);
}

/**
 * After an evaluation of only part of the train (`stepActive`, `evaluateActive`): the couplings not evaluated
 * keep their forces, so count every coupling once in this interval's largest forces (once after each reset).
 */
function countStandingCouplings(s: DynamicsState, n: number): void {
  const F = s.couplerF;
  let maxT = s.intervalMaxTensionN;
  let maxC = s.intervalMaxCompressionN;
  for (let j = 0; j < n - 1; j++) {
    const f = F[j]!;
    if (f > maxT) maxT = f;
    if (-f > maxC) maxC = -f;
  }
  s.intervalMaxTensionN = maxT;
  s.intervalMaxCompressionN = maxC;
  s.intervalMaxStale = false;
}

/**
 * `evaluate` for a train that stands and is held throughout an interval (the run's quiescent interval: the
 * brakes releasing, nothing moving yet), looking only at what can change: every unit (its effort), each
 * vehicle whose brake change may free it (`mayBreakAway`), each that moved or was pushed at its last
 * evaluation, and their neighbours — the runs `stepActive` would take, without its kicks and drift. Exact for
 * the reason `stepActive` is: every other vehicle, standing and held between standing neighbours, would be
 * given what it holds. The couplings not evaluated count in the interval's largest forces as in
 * `stepActive` (every vehicle when `restless` does not describe the state); the full `evaluate` with the
 * energy ledger. Returns how many vehicles it evaluated.
 */
export function evaluateActive(m: TrainModel, s: DynamicsState, dt: number): number {
  if (s.energy !== null) {
    evaluate(m, s, dt);
    return m.n;
  }
  const n = m.n;
  const restless = s.restless;
  if (!s.restlessValid) restless.fill(1);
  for (let k = 0; k < m.nl; k++) restless[m.locoVehicle[k]!] = 1;
  const runs = s.runs;
  let nRuns = 0;
  let open = false;
  let before = 0;
  let here = n > 0 ? restless[0]! : 0;
  let count = 0;
  for (let i = 0; i < n; i++) {
    const after = i < n - 1 ? restless[i + 1]! : 0;
    if ((before | here | after) !== 0) {
      count++;
      if (!open) {
        runs[2 * nRuns] = i;
        open = true;
      }
      runs[2 * nRuns + 1] = i;
    } else if (open) {
      nRuns++;
      open = false;
    }
    before = here;
    here = after;
  }
  if (open) nRuns++;
  evaluateRuns(m, s, dt, 0, runs, nRuns, restless);
  s.restlessValid = true;
  if (s.intervalMaxStale) countStandingCouplings(s, n);
  return count;
}

/**
 * Evaluate coupler forces, traction and accelerations at the current positions and speeds. `dt` is the
 * time since the previous evaluation (for the effort lag); `kickH` > 0 also applies the closing half-kick.
 * One pass head to tail: each coupling's force is computed just before the vehicle behind needs it.
 */
export function evaluate(m: TrainModel, s: DynamicsState, dt: number, kickH = 0): void {
  const runs = s.runs;
  runs[0] = 0;
  runs[1] = m.n - 1;
  evaluateRuns(m, s, dt, kickH, runs, m.n > 0 ? 1 : 0, null);
  s.restlessValid = false;
  s.intervalMaxStale = false;
}

/**
 * `evaluate` over runs of neighbouring vehicles ([first, last] pairs in `runs`): each run's couplings and
 * vehicles, the coupling ahead of a run as it stands. With `restless`, notes which vehicles moved or were
 * pushed (`stepActive`).
 */
function evaluateRuns(m: TrainModel, s: DynamicsState, dt: number, kickH: number, runs: Int32Array, nRuns: number, restless: Uint8Array | null): void {
  updateTraction(m, s, dt);
  const n = m.n;
  const x = s.x;
  const v = s.v;
  const t = s.t;
  const F = s.couplerF;
  let maxT = s.intervalMaxTensionN;
  let maxC = s.intervalMaxCompressionN;
  const ext0 = m.ext0M;
  const halfSlack = m.halfSlackM;
  const gearF = s.gearF;
  const gearDefl = s.gearDefl;
  const engaged = s.engaged;
  const transK = m.transitionK;
  const unloadR = m.unloadRatio;
  const damp = m.dampingC;
  const peakT = s.peakTensionN;
  const peakC = s.peakCompressionN;
  const fade = m.fadeSpeedMps;
  const g = GRAVITY_MPS2;
  const en = s.energy;
  const chain0 = m.chainage0M;
  const segEnd = m.segEndM;
  const segStart = m.segStartM;
  const segSin = m.segSin;
  const segCurve = m.segCurveNPerKg;
  const seg = s.seg;
  const massA = m.massKg;
  const dA = m.davisA;
  const dB = m.davisB;
  const dC = m.davisC;
  const excess = m.breakawayExcessN;
  const traction = s.tractionN;
  const brakeA = s.brakeN;
  const invM = m.invEffMass;
  const acc = s.acc;
  for (let r = 0; r < nRuns; r++) {
  const last = runs[2 * r + 1]!;
  const first = runs[2 * r]!;
  let fFront = first > 0 ? F[first - 1]! : 0;
  for (let i = first; i <= last; i++) {
    // The coupling behind vehicle i.
    let f = 0;
    if (i < n - 1) {
      const ext = ext0[i]! + x[i]! - x[i + 1]!;
      const hs = halfSlack[i]!;
      if (ext > hs) {
        const w = v[i]! - v[i + 1]!;
        if (engaged[i] !== 1) engage(s, i, 1, w, t);
        const e = ext - hs;
        const travel = m.draftTravelM[i]!;
        // gearForce, written out here: called, its nine numbers would be boxed at every coupling and step.
        let xi = e / travel;
        if (xi > 1) xi = 1;
        const lin = m.draftLinear[i]!;
        let load = m.draftRatedN[i]! * xi * (lin + (1 - lin) * xi);
        const preload = m.draftPreloadN[i]!;
        if (preload > 0) load += e < PRELOAD_RAMP_M ? (preload * e) / PRELOAD_RAMP_M : preload;
        let gf = gearF[i]! + transK[i]! * (e - gearDefl[i]!);
        if (gf > load) gf = load;
        else {
          const unload = load * unloadR[i]!;
          if (gf < unload) gf = unload;
        }
        gearF[i] = gf;
        gearDefl[i] = e;
        f = gf + damp[i]! * w;
        if (e > travel) f += m.endStopK[i]! * (e - travel);
        if (f < 0) f = 0;
        if (f > maxT) maxT = f;
        if (f > peakT[i]!) {
          peakT[i] = f;
          s.peakTensionT[i] = t;
        }
      } else if (ext < -hs) {
        const w = v[i]! - v[i + 1]!;
        if (engaged[i] !== -1) engage(s, i, -1, w, t);
        const e = -ext - hs;
        const travel = m.buffTravelM[i]!;
        // gearForce, written out (as in draft).
        let xi = e / travel;
        if (xi > 1) xi = 1;
        const lin = m.buffLinear[i]!;
        let load = m.buffRatedN[i]! * xi * (lin + (1 - lin) * xi);
        const preload = m.buffPreloadN[i]!;
        if (preload > 0) load += e < PRELOAD_RAMP_M ? (preload * e) / PRELOAD_RAMP_M : preload;
        let gf = gearF[i]! + transK[i]! * (e - gearDefl[i]!);
        if (gf > load) gf = load;
        else {
          const unload = load * unloadR[i]!;
          if (gf < unload) gf = unload;
        }
        gearF[i] = gf;
        gearDefl[i] = e;
        f = -gf + damp[i]! * w;
        if (e > travel) f -= m.endStopK[i]! * (e - travel);
        if (f > 0) f = 0;
        if (-f > maxC) maxC = -f;
        if (-f > peakC[i]!) {
          peakC[i] = -f;
          s.peakCompressionT[i] = t;
        }
      } else if (engaged[i] !== 0) {
        engaged[i] = 0;
        gearF[i] = 0;
        gearDefl[i] = 0;
      }
      F[i] = f;
    }

    // Vehicle i.
    const ch = chain0[i]! + x[i]!;
    let k = seg[i]!;
    if (ch >= segEnd[k]! || ch < segStart[k]!) {
      k = segmentOf(m, ch, k);
      seg[i] = k;
    }
    const mass = massA[i]!;
    const grade = mass * g * segSin[k]!;
    const fApp = traction[i]! - grade + fFront - f;
    fFront = f;
    const vi = v[i]!;
    const sp = vi < 0 ? -vi : vi;
    let res = dA[i]! + (dB[i]! + dC[i]! * sp) * sp + mass * segCurve[k]!;
    if (sp < fade) res += excess[i]! * (1 - sp / fade);
    const brake = brakeA[i]!;
    const hold = res + brake;
    let a = 0;
    let resisting = 0;
    if (vi === 0) {
      if (fApp > hold || fApp < -hold) {
        resisting = fApp > 0 ? hold : -hold;
        a = (fApp - resisting) * invM[i]!;
      }
    } else {
      resisting = vi > 0 ? hold : -hold;
      a = (fApp - resisting) * invM[i]!;
    }
    acc[i] = a;
    if (kickH > 0 && a !== 0) {
      const vn = vi + a * kickH;
      v[i] = (vi > 0 && vn < 0) || (vi < 0 && vn > 0) ? 0 : vn;
    }
    if (restless !== null) restless[i] = vi !== 0 || a !== 0 ? 1 : 0;
    if (en !== null) account(en, i, x[i]!, traction[i]!, resisting, res, brake, grade);
  }
  }
  s.intervalMaxTensionN = maxT;
  s.intervalMaxCompressionN = maxC;
  if (en !== null) {
    for (let j = 0; j < n - 1; j++) {
      const ext = ext0[j]! + x[j]! - x[j + 1]!;
      en.coupling += 0.5 * (en.lastCoupler[j]! + F[j]!) * (ext - en.lastExt[j]!);
      en.lastExt[j] = ext;
      en.lastCoupler[j] = F[j]!;
    }
  }
}

/**
 * Hysteretic gear force at deflection e (magnitude, m): the previous force moved along the steep
 * change-over line, then held between the unloading and loading curves (PHYSICS.md §4).
 */
export function gearForce(prevF: number, prevE: number, e: number, travel: number, rated: number, lin: number, preload: number, unloadRatio: number, kTransition: number): number {
  let xi = e / travel;
  if (xi > 1) xi = 1;
  let load = rated * xi * (lin + (1 - lin) * xi);
  if (preload > 0) load += e < PRELOAD_RAMP_M ? (preload * e) / PRELOAD_RAMP_M : preload;
  const g = prevF + kTransition * (e - prevE);
  if (g > load) return load;
  const unload = load * unloadRatio;
  return g < unload ? unload : g;
}

/** Traction: effort follows the notch with a lag, limited by adhesion; the slip protection holds it at what the rails give. */
export function updateTraction(m: TrainModel, s: DynamicsState, dt: number): void {
  if (m.nl === 0) return;
  if (dt !== s.lagDt) {
    s.lagDt = dt;
    s.lagRise = dt > 0 ? 1 - Math.exp(-dt / m.effortRiseS) : 0;
    s.lagFall = dt > 0 ? 1 - Math.exp(-dt / m.effortFallS) : 0;
  }
  const rise = s.lagRise;
  const fall = s.lagFall;
  const stride = m.notchStride;
  const v = s.v;
  for (let k = 0; k < m.nl; k++) {
    const i = m.locoVehicle[k]!;
    const sp = Math.abs(v[i]!);
    const notch = s.notch[k]!;
    let target = 0;
    if (notch > 0) {
      const cur = m.notchCurrentN[k * stride + notch]!;
      const pow = m.notchPowerW[k * stride + notch]! / (sp > MIN_POWER_SPEED ? sp : MIN_POWER_SPEED);
      target = cur < pow ? cur : pow;
    }
    s.targetN[k] = target;
    let e = s.effortN[k]!;
    e += (target - e) * (target > e ? rise : fall);
    // Curtius–Kniffler shape scales the standstill adhesion with speed.
    const limit = m.adhesiveWeightN[k]! * m.mu0[k]! * ((7.5 / (sp * 3.6 + 44) + 0.161) / CK0);
    if (e > limit) {
      // The protection acts: a new slip unless it was already acting at the previous evaluation.
      if (!(s.lastSlipT[k]! >= s.t - dt - 1e-9)) s.slipCount[k]! += 1;
      s.lastSlipT[k] = s.t;
      e = m.slipCutFraction * limit;
    }
    s.effortN[k] = e;
    s.tractionN[i] = e;
  }
}

function engage(s: DynamicsState, j: number, side: 1 | -1, relSpeed: number, t: number): void {
  s.engaged[j] = side;
  s.gearF[j] = 0;
  s.gearDefl[j] = 0;
  const log = s.takeUp;
  if (side === 1 && relSpeed > log.maxRunOutMps) log.maxRunOutMps = relSpeed;
  if (side === -1 && -relSpeed > log.maxRunInMps) log.maxRunInMps = -relSpeed;
  if (Math.abs(relSpeed) >= TAKE_UP_LOG_SPEED && log.count < TAKE_UP_CAPACITY) {
    log.timeS[log.count] = t;
    log.coupling[log.count] = j;
    log.relSpeedMps[log.count] = relSpeed;
    log.count++;
  }
}

/** Trapezoidal work of each force over the displacement since the last evaluation. */
function account(en: EnergyLedger, i: number, xi: number, traction: number, resisting: number, res: number, brake: number, grade: number): void {
  const dx = xi - en.lastX[i]!;
  en.traction += 0.5 * (en.lastTraction[i]! + traction) * dx;
  en.grade += 0.5 * (en.lastGrade[i]! + grade) * dx;
  // Split the resisting force between running resistance and brakes in proportion.
  const hold = res + brake;
  const r = hold > 0 ? (resisting * res) / hold : 0;
  const b = hold > 0 ? (resisting * brake) / hold : 0;
  en.resistance += 0.5 * (en.lastResist[i]! + r) * dx;
  en.brakes += 0.5 * (en.lastBrake[i]! + b) * dx;
  en.lastX[i] = xi;
  en.lastTraction[i] = traction;
  en.lastGrade[i] = grade;
  en.lastResist[i] = r;
  en.lastBrake[i] = b;
}

/** Kinetic energy including rotating mass, J. */
export function kineticEnergyJ(m: TrainModel, s: DynamicsState): number {
  let e = 0;
  for (let i = 0; i < m.n; i++) e += 0.5 * m.effMassKg[i]! * s.v[i]! * s.v[i]!;
  return e;
}

/** `mayBreakAway` looks (true, the default); off, every brake change makes its vehicle restless (the benchmark's before). */
let heldCheck = true;

export function setBrakeChangeHeldCheck(on: boolean): void {
  heldCheck = on;
}

/**
 * Can a resting vehicle whose brake has just changed (`brakeN`) move at the next evaluation? The test that
 * evaluation makes for a standing vehicle, with the same numbers in the same order: what pushes it (its
 * couplings' forces as they stand, gravity along the grade) beyond what holds it (running resistance at
 * standstill with the breakaway excess, curve, the new brake). A vehicle still held — at rest (no speed, no
 * acceleration) — gets from the next evaluation exactly what it has, when its neighbours rest too; when one
 * of them is restless it is evaluated anyway, with its new brake. So it need not be made restless: the brake
 * release no longer sets a whole train's evaluation going while only its front moves (the graduated release
 * eases every wagon's brake at once, for a minute or more).
 */
export function mayBreakAway(m: TrainModel, s: DynamicsState, i: number): boolean {
  if ((BENCH && !heldCheck) || s.v[i] !== 0 || s.acc[i] !== 0) return true;
  const n = m.n;
  const k = s.seg[i]!;
  const mass = m.massKg[i]!;
  const grade = mass * GRAVITY_MPS2 * m.segSin[k]!;
  const fFront = i > 0 ? s.couplerF[i - 1]! : 0;
  const f = i < n - 1 ? s.couplerF[i]! : 0;
  const fApp = s.tractionN[i]! - grade + fFront - f;
  // As in `evaluateRuns` at sp = 0.
  const sp = 0;
  let res = m.davisA[i]! + (m.davisB[i]! + m.davisC[i]! * sp) * sp + mass * m.segCurveNPerKg[k]!;
  if (sp < m.fadeSpeedMps) res += m.breakawayExcessN[i]! * (1 - sp / m.fadeSpeedMps);
  const hold = res + s.brakeN[i]!;
  return fApp > hold || fApp < -hold;
}

/** Set the brake holding capacities for time t from the release schedule; a resting vehicle whose brake changed so that it may move is restless (`mayBreakAway`). */
export function applyBrakes(m: TrainModel, s: DynamicsState, trainReleaseS: number, locoReleaseS: number): void {
  const t = s.t;
  const ramp = m.brakeReleaseRampS;
  const n = m.n;
  const trainBrakeN = m.trainBrakeN;
  const locoBrakeN = m.locoBrakeN;
  const delay = m.brakeReleaseDelayS;
  const brakeN = s.brakeN;
  const restless = s.restless;
  for (let i = 0; i < n; i++) {
    let cap = 0;
    const tb = trainBrakeN[i]!;
    if (tb > 0) {
      const start = trainReleaseS + delay[i]!;
      cap += t <= start ? tb : t >= start + ramp ? 0 : tb * (1 - (t - start) / ramp);
    }
    const lb = locoBrakeN[i]!;
    if (lb > 0) {
      // The locomotive brake is eased off over a few seconds.
      const lr = 3;
      cap += t <= locoReleaseS ? lb : t >= locoReleaseS + lr ? 0 : lb * (1 - (t - locoReleaseS) / lr);
    }
    if (brakeN[i] !== cap) {
      brakeN[i] = cap;
      if (restless[i] === 0 && mayBreakAway(m, s, i)) restless[i] = 1;
    }
  }
}

/** A model's vehicles by brake: those with a locomotive brake, and the rest with a train brake in order of its release. */
interface BrakeOrder {
  loco: Int32Array;
  byRelease: Int32Array;
}
const brakeOrders = new WeakMap<TrainModel, BrakeOrder>();

function brakeOrder(m: TrainModel): BrakeOrder {
  let o = brakeOrders.get(m);
  if (!o) {
    const loco: number[] = [];
    const train: number[] = [];
    for (let i = 0; i < m.n; i++) {
      if (m.locoBrakeN[i]! > 0) loco.push(i);
      else if (m.trainBrakeN[i]! > 0) train.push(i);
    }
    // Stable: vehicles released at the same moment keep their order (any model of the same train agrees).
    train.sort((a, b) => m.brakeReleaseDelayS[a]! - m.brakeReleaseDelayS[b]!);
    o = { loco: Int32Array.from(loco), byRelease: Int32Array.from(train) };
    brakeOrders.set(m, o);
  }
  return o;
}

/**
 * `applyBrakes` for a run whose clock only goes forward, looking only at the vehicles whose brake can be
 * changing: every vehicle with a locomotive brake, and the others from `done` on in order of their train
 * brake's release, up to the first whose release has not begun (it and every later one still hold in full,
 * as they were set). `done` counts the vehicles in that order already released in full (they hold nothing
 * more for good); returns the new count. The same capacities, and the same vehicles made restless.
 */
export function applyBrakesFrom(m: TrainModel, s: DynamicsState, trainReleaseS: number, locoReleaseS: number, done: number): number {
  const t = s.t;
  const ramp = m.brakeReleaseRampS;
  const trainBrakeN = m.trainBrakeN;
  const locoBrakeN = m.locoBrakeN;
  const delay = m.brakeReleaseDelayS;
  const brakeN = s.brakeN;
  const restless = s.restless;
  const order = brakeOrder(m);
  const loco = order.loco;
  for (let q = 0; q < loco.length; q++) {
    const i = loco[q]!;
    let cap = 0;
    const tb = trainBrakeN[i]!;
    if (tb > 0) {
      const start = trainReleaseS + delay[i]!;
      cap += t <= start ? tb : t >= start + ramp ? 0 : tb * (1 - (t - start) / ramp);
    }
    const lb = locoBrakeN[i]!;
    const lr = 3;
    cap += t <= locoReleaseS ? lb : t >= locoReleaseS + lr ? 0 : lb * (1 - (t - locoReleaseS) / lr);
    if (brakeN[i] !== cap) {
      brakeN[i] = cap;
      if (restless[i] === 0 && mayBreakAway(m, s, i)) restless[i] = 1;
    }
  }
  const byRelease = order.byRelease;
  let next = done;
  for (let q = done; q < byRelease.length; q++) {
    const i = byRelease[q]!;
    const start = trainReleaseS + delay[i]!;
    if (t <= start) break;
    const tb = trainBrakeN[i]!;
    let cap = 0;
    cap += t >= start + ramp ? 0 : tb * (1 - (t - start) / ramp);
    if (brakeN[i] !== cap) {
      brakeN[i] = cap;
      if (restless[i] === 0 && mayBreakAway(m, s, i)) restless[i] = 1;
    }
    if (q === next && cap === 0) next++;
  }
  return next;
}

