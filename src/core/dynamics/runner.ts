/**
 * A run of the dynamics model that can be advanced, observed and cloned: the state plus the brake
 * schedule and the running records (when each vehicle first moved, slips, a decimated series).
 * `simulate` drives one run to the end; the planner clones runs to try alternatives from a shared start.
 */
import { adhesionSpeedFactor, slipRisk } from "../physics/adhesion.js";
import { BENCH } from "./benchOnly.js";
import { activeOnlyStepping, applyBrakes, applyBrakesFrom, countVehicleSteps, createState, evaluate, evaluateActive, shapedState, shapedTakeUp, step, stepActive, vehicleStepsDone, type DynamicsState } from "./dynamics.js";
import { CONTROL_INTERVAL_S, integratorSteps, stepDividing, type TrainModel } from "../train/trainModel.js";
import { SETTLED_MIN_SPEED_MPS, SETTLE_AFTER_CHANGE_S, SWAY_WINDOW_S, maySettle, measureSway, mustUnsettle, settle, settledRefusal as settleRefusal, settledStep, type Settled } from "./settled.js";

/** What a controller (a driver, or the planner's policy) can observe. */
export interface Observation {
  timeS: number;
  leadSpeedMps: number;
  leadTravelM: number;
  /** Travel of the last vehicle, m. */
  tailTravelM: number;
  tailSpeedMps: number;
  /** Every vehicle has moved forward since the start. */
  allMoving: boolean;
  /** Σ effort transmitted by all units and Σ of what their notches ask for at this speed, N. */
  effortN: number;
  effortTargetN: number;
  /** Effort within 5 % of what the notch asks for (traction current has settled). */
  effortSettled: boolean;
  /** A unit slipped since the previous observation. */
  slipped: boolean;
  notch: number;
  /** Largest coupler tension and compression since the previous observation, N. */
  maxTensionN: number;
  maxCompressionN: number;
}

export interface SlipEpisode {
  unit: number;
  startS: number;
  endS: number;
  /** Times the protection cut in during the episode. */
  cuts: number;
  speedMps: number;
}

export interface SeriesBuffer {
  n: number;
  timeS: Float64Array;
  leadSpeedMps: Float64Array;
  tailSpeedMps: Float64Array;
  notch: Float64Array;
  leadTravelM: Float64Array;
  maxTensionN: Float64Array;
  maxCompressionN: Float64Array;
  effortN: Float64Array;
}

export interface BrakeSchedule {
  /** When the train brake release starts at the head, s. */
  trainBrakeReleaseS: number;
  /** When the locomotive brake is eased off, s. */
  locoBrakeReleaseS: number;
}

/** A vehicle counts as moving forward above this speed, m/s. */
export const MOVING_MPS = 0.01;
/** Slips closer together than this belong to one episode, s. */
const SLIP_EPISODE_GAP_S = 3;
/** Time the locomotive brake takes to ease off, s (matches `applyBrakes`). */
const LOCO_BRAKE_EASE_S = 3;
/**
 * After the last vehicle moves, the run-out's last impacts at the rear die down within a few seconds; the
 * run keeps its take-up step this long before it changes to the rolling step, s.
 */
export const RUN_OUT_SETTLE_S = 5;

/** Vehicle-steps integrated before every vehicle had moved (brakes releasing, slack taken up), this process. */
let beforeAllMovedWork = 0;

/** The work of the runs so far before every vehicle had moved, vehicle-steps (for the benchmarks). */
export function vehicleStepsBeforeAllMoved(): number {
  return beforeAllMovedWork;
}

/**
 * Where the runs' work goes, vehicle-steps, by phase (for the benchmarks): 0 quiescent intervals (one
 * evaluation), 1 before every vehicle moved with the brakes still releasing, 2 before every vehicle moved
 * with the brakes off, 3 every vehicle moved, still at the take-up step, 4 the full chain at the rolling step,
 * 5 the settled train. Steps (integrator steps or evaluations) in the same phases at 6…11, and the
 * vehicle-steps a full step of every vehicle would have done at 12…17.
 */
const phaseTally = new Float64Array(18);

/**
 * The full chain's work after every vehicle moved, vehicle-steps, by why it was not the settled train (for
 * the benchmarks): 0 running as one not asked for yet, 1 the brakes still releasing, 2…6 within the settle
 * delay and sway window after a notch change (0–4, 4–6, 6–8, 8–10, 10–14 s after it), 7 later (the window
 * measured and running as one refused, or a fresh window under way), 8 the settled train. Then the refusals
 * at a window's end: 9 too slow, 10 a vehicle not moving forward, 11 a coupling in its slack or its
 * quasi-static force within the floor of it, 16 only the sway measured takes a coupling to its slack. Of 7: 12 the
 * lead slower than running as one asks (`SETTLED_MIN_SPEED_MPS` × 1.5), 13 slower than 3 m/s, 14 faster; 15 (of 12)
 * slower than it may run as one (`SETTLED_MIN_SPEED_MPS`).
 */
const settleTally = new Float64Array(17);

/** A copy of `settleTally` so far, this process. */
export function workBySettleState(): Float64Array {
  return settleTally.slice();
}

/** A copy of the work by phase so far (`phaseTally`), this process. */
export function workByPhase(): Float64Array {
  return phaseTally.slice();
}

/** Add work to a phase of `phaseTally`. */
function tally(phase: number, vehicleStepsDelta: number, stepsDelta: number, n: number): void {
  phaseTally[phase]! += vehicleStepsDelta;
  phaseTally[6 + phase]! += stepsDelta;
  phaseTally[12 + phase]! += stepsDelta * n;
}

/**
 * A quiescent interval before every vehicle has moved evaluates only what can change (`evaluateActive`, on by
 * default); off, every vehicle (the benchmark's before). The figures are the same either way.
 */
let quiescentActive = true;

export function setQuiescentActiveOnly(on: boolean): void {
  quiescentActive = on;
}

export interface RunOptions {
  /** A fixed step for the whole run (rounded down to a whole fraction of the control interval), s. */
  dt?: number;
  controlIntervalS?: number;
  seriesIntervalS?: number;
  trackEnergy?: boolean;
}

export class Run {
  /** The present integrator step: a whole fraction of the control interval, s. */
  dt!: number;
  /** Integrator steps per control interval. */
  stepsPerInterval!: number;
  readonly controlIntervalS!: number;
  /** Control intervals between samples of the series. */
  readonly seriesEvery!: number;
  lead!: number;
  brakes!: BrakeSchedule;
  brakesDoneS!: number;
  started!: Uint8Array;
  startedCount = 0;
  lastVehicleMovesS: number | null = null;
  locoTravelToStretchM: number | null = null;
  episodes: SlipEpisode[] = [];
  private lastSlipCount!: Int32Array;
  private openEpisode!: Array<SlipEpisode | null>;
  series!: SeriesBuffer;
  /** Vehicles that have not moved yet (the first `waitingCount` entries). */
  private waiting!: Int32Array;
  private waitingCount!: number;
  private seriesMaxT = 0;
  private seriesMaxC = 0;
  /** The clock: the run's start time and the control intervals completed since. */
  private readonly t0!: number;
  private intervals = 0;
  /** Step to change to once the run-out has passed (0: none pending). */
  private rollingStepS!: number;
  /** Steps actually integrated (quiescent intervals are skipped in one evaluation; a settled interval is one). */
  steps = 0;
  /** Run the train as one mass whenever it has settled (settled.ts); off unless asked for. */
  private settleWhenSteady = false;
  /** The settled train while it runs as one (null: the full chain). */
  private settled: Settled | null = null;
  /**
   * The run as it stood when the train settled (never changed afterwards, so clones share it): a settled
   * stretch that must end before the run does is run again from here with the full chain.
   */
  private settledFrom: RunSnapshot | null = null;
  /** The notches of the last interval and when they last changed, s. */
  private notchSeen!: Int32Array;
  private notchChangedS = -Infinity;
  /** Each coupling's quasi-static force and the sways above and below it measured since `swayFromS` (settled.ts `measureSway`), N. */
  private meanScratch!: Float64Array;
  private sway!: Float64Array;
  private swayFromS = Infinity;
  /** Vehicles whose train brake is released in full for good, in order of release (`applyBrakesFrom`). */
  private brakesReleased = 0;

  constructor(
    readonly m: TrainModel,
    public s: DynamicsState,
    brakes: BrakeSchedule,
    opts: RunOptions = {},
    from: Run | null = null,
  ) {
    if (from) {
      // A copy (`clone`): built by this constructor, so it has the same shape in the engine as every run.
      Object.assign(this, from);
      this.s = s;
      return;
    }
    this.controlIntervalS = opts.controlIntervalS ?? CONTROL_INTERVAL_S;
    const choice = integratorSteps(m, this.controlIntervalS);
    const first = opts.dt === undefined ? choice.takeUpS : stepDividing(this.controlIntervalS, opts.dt);
    this.stepsPerInterval = Math.round(this.controlIntervalS / first);
    this.dt = this.controlIntervalS / this.stepsPerInterval;
    this.rollingStepS = opts.dt === undefined && choice.rollingS > this.dt ? choice.rollingS : 0;
    this.seriesEvery = Math.max(1, Math.round((opts.seriesIntervalS ?? 0.5) / this.controlIntervalS));
    this.t0 = s.t;
    this.lead = m.nl > 0 ? m.locoVehicle[0]! : 0;
    this.brakes = brakes;
    this.brakesDoneS = brakesEnd(m, brakes);
    this.started = new Uint8Array(m.n);
    this.waiting = Int32Array.from({ length: m.n }, (_, i) => i);
    this.waitingCount = m.n;
    this.lastSlipCount = new Int32Array(m.nl);
    this.notchSeen = new Int32Array(m.nl);
    this.meanScratch = new Float64Array(Math.max(0, m.n - 1));
    this.sway = new Float64Array(2 * Math.max(0, m.n - 1));
    this.openEpisode = Array.from({ length: m.nl }, () => null);
    this.series = emptySeries(256);
    applyBrakes(m, s, brakes.trainBrakeReleaseS, brakes.locoBrakeReleaseS);
    evaluate(m, s, 0);
  }

  /** A fresh run of the model from standing. */
  static start(m: TrainModel, brakes: BrakeSchedule, opts: RunOptions = {}): Run {
    const r = new Run(m, createState(m, opts.trackEnergy ? { trackEnergy: true } : {}), brakes, opts);
    r.record();
    return r;
  }

  /**
   * Use a different fixed step from now on, s: rounded down so a whole number of steps fills each
   * control interval.
   */
  setStep(dtS: number): void {
    this.stepsPerInterval = Math.ceil(this.controlIntervalS / dtS - 1e-9);
    this.dt = this.controlIntervalS / this.stepsPerInterval;
    if (this.rollingStepS <= this.dt) this.rollingStepS = 0;
  }

  /**
   * From now on run the train as one mass whenever it has settled after the last notch change, and as the
   * full chain whenever it has not (settled.ts). Not with the energy ledger (the one mass keeps none).
   */
  runAsOneWhenSettled(): void {
    if (!this.s.energy) this.settleWhenSteady = true;
  }

  /** The train runs as one mass now. */
  get runningAsOne(): boolean {
    return this.settled !== null;
  }

  /** Change when the locomotive brake comes off (it must not be in the past). */
  setLocoBrakeRelease(atS: number): void {
    this.brakes = { ...this.brakes, locoBrakeReleaseS: atS };
    this.brakesDoneS = brakesEnd(this.m, this.brakes);
  }

  /** Every unit to one notch (units in multiple). */
  setNotch(notch: number): void {
    const max = this.m.notchStride - 1;
    this.s.notch.fill(notch < 0 ? 0 : notch > max ? max : Math.round(notch));
  }

  /** Each control group's units to the group's notch (`notches[g]`, group 0 the head's). */
  setGroupNotches(notches: ArrayLike<number>): void {
    const max = this.m.notchStride - 1;
    for (let k = 0; k < this.m.nl; k++) {
      const notch = notches[this.m.unitGroup[k]!] ?? 0;
      this.s.notch[k] = notch < 0 ? 0 : notch > max ? max : Math.round(notch);
    }
  }

  get notch(): number {
    return this.s.notch[0] ?? 0;
  }

  /** Advance by one control interval: integrate, or skip at once when nothing can move. */
  advanceInterval(onStretchRunAgain?: (obs: Observation) => void): void {
    this.followNotches(onStretchRunAgain);
    this.interval();
    if (this.settleWhenSteady && !this.settled && this.mayRunAsOne()) this.measureOrSettle();
  }

  /** One control interval of the settled train or the chain, with the clock, series and step change after it. */
  private interval(): void {
    const m = this.m;
    const s = this.s;
    const steps = this.stepsPerInterval;
    if (this.settled) {
      settledStep(m, s, this.settled, this.lead, this.controlIntervalS);
      this.afterStep();
      this.steps++;
      countVehicleSteps(m.n);
      if (BENCH) {
        tally(5, m.n, 1, m.n);
        settleTally[8]! += m.n;
      }
    } else if (this.quiescent()) {
      // Everything stands and is held: only brakes and the effort lag change. One evaluation over the
      // interval finds the moment (to within the interval) when something breaks away.
      const span = this.controlIntervalS;
      s.t += span;
      if (s.t <= this.brakesDoneS + span) this.applyBrakes();
      // Before every vehicle has moved, only what can change is looked at (`evaluateActive`, exact).
      let looked = m.n;
      if (this.startedCount < m.n && (!BENCH || (activeOnlyStepping() && quiescentActive))) looked = evaluateActive(m, s, span);
      else evaluate(m, s, span);
      this.afterStep();
      if (BENCH) tally(0, looked, 1, m.n);
    } else if (this.startedCount < m.n) {
      // Until every vehicle has moved, most of the train often rests: integrate only what can change (exact).
      const work0 = BENCH ? vehicleStepsDone() : 0;
      const activeOnly = !BENCH || activeOnlyStepping();
      for (let k = 0; k < steps; k++) {
        if (s.t <= this.brakesDoneS) this.applyBrakes();
        if (activeOnly) stepActive(m, s, this.dt);
        else step(m, s, this.dt);
        this.afterStep();
      }
      this.steps += steps;
      if (BENCH) {
        beforeAllMovedWork += vehicleStepsDone() - work0;
        tally(s.t <= this.brakesDoneS ? 1 : 2, vehicleStepsDone() - work0, steps, m.n);
      }
    } else {
      for (let k = 0; k < steps; k++) {
        if (s.t <= this.brakesDoneS) this.applyBrakes();
        step(m, s, this.dt);
        this.afterStep();
      }
      this.steps += steps;
      if (BENCH) {
        tally(this.rollingStepS > 0 ? 3 : 4, steps * m.n, steps, m.n);
        const why = this.settleState();
        settleTally[why]! += steps * m.n;
        if (why === 7) {
          const v = s.v[this.lead]!;
          settleTally[v < SETTLED_MIN_SPEED_MPS * 1.5 ? (v < SETTLED_MIN_SPEED_MPS ? 15 : 12) : v < 3 ? 13 : 14]! += steps * m.n;
        }
      }
    }
    // The clock counts whole intervals, so rounding in the steps never accumulates: after k intervals the
    // time is exactly t0 + k × interval.
    this.intervals++;
    s.t = this.t0 + intervalsToS(this.intervals, this.controlIntervalS);
    if (this.intervals % this.seriesEvery === 0) this.record();
    if (this.rollingStepS > 0 && this.lastVehicleMovesS !== null && s.t >= this.lastVehicleMovesS + RUN_OUT_SETTLE_S) {
      this.setStep(this.rollingStepS);
      this.rollingStepS = 0;
    }
  }

  /** The brakes' holding capacities for the present time (only the vehicles whose brake can be changing: `applyBrakesFrom`). */
  private applyBrakes(): void {
    this.brakesReleased = applyBrakesFrom(this.m, this.s, this.brakes.trainBrakeReleaseS, this.brakes.locoBrakeReleaseS, this.brakesReleased);
  }

  /** Note a notch change; the settled train goes back to the chain for it (and when slow or near a slack). */
  private followNotches(onStretchRunAgain?: (obs: Observation) => void): void {
    if (this.settled && mustUnsettle(this.m, this.s, this.settled, this.lead)) this.runStretchAsChain(onStretchRunAgain);
    const s = this.s;
    for (let k = 0; k < this.m.nl; k++) {
      if (s.notch[k] !== this.notchSeen[k]) {
        this.notchSeen.set(s.notch);
        this.notchChangedS = s.t;
        this.swayFromS = Infinity;
        break;
      }
    }
  }

  /**
   * The settled stretch ends before the run does: go back to where the train settled and run the stretch
   * again with the full chain, in the notches it settled in, observed every interval as a controller does.
   * So the clock, series, slips and every coupling's peak are the full chain's, and its sway carries on into
   * what follows (the settled train cannot hand it back). The notches now asked for stay asked for. Each
   * observation of the stretch run again goes to `onObserved` (a branch folds it into its step records).
   */
  private runStretchAsChain(onObserved?: (obs: Observation) => void): void {
    const snap = this.settledFrom!;
    const end = this.intervals;
    const notches = this.s.notch.slice();
    this.settled = null;
    this.settledFrom = null;
    this.restore(snap);
    // The controller observed the interval in which the train settled.
    this.observe();
    while (this.intervals < end) {
      this.interval();
      const obs = this.observe();
      onObserved?.(obs);
    }
    this.s.notch.set(notches);
  }

  /** The run as it stands (a snapshot to run a settled stretch again from). */
  private snapshot(): RunSnapshot {
    return {
      s: cloneState(this.s),
      intervals: this.intervals,
      steps: this.steps,
      dt: this.dt,
      stepsPerInterval: this.stepsPerInterval,
      rollingStepS: this.rollingStepS,
      brakesReleased: this.brakesReleased,
      seriesN: this.series.n,
      seriesMaxT: this.seriesMaxT,
      seriesMaxC: this.seriesMaxC,
      episodes: this.episodes.map((e) => ({ ...e })),
      openEpisode: this.openEpisode.map((e) => (e ? this.episodes.indexOf(e) : -1)),
      lastSlipCount: this.lastSlipCount.slice(),
    };
  }

  /** Back to a snapshot (which stays as it is). */
  private restore(p: RunSnapshot): void {
    this.s = cloneState(p.s);
    this.intervals = p.intervals;
    this.steps = p.steps;
    this.dt = p.dt;
    this.stepsPerInterval = p.stepsPerInterval;
    this.rollingStepS = p.rollingStepS;
    this.brakesReleased = p.brakesReleased;
    this.series.n = p.seriesN;
    this.seriesMaxT = p.seriesMaxT;
    this.seriesMaxC = p.seriesMaxC;
    this.episodes = p.episodes.map((e) => ({ ...e }));
    this.openEpisode = p.openEpisode.map((i) => (i >= 0 ? this.episodes[i]! : null));
    this.lastSlipCount = p.lastSlipCount.slice();
  }

  /**
   * Measure the chain's sway about its quasi-static forces over a window; at the window's end run the
   * train as one if every coupling stays clear of its slack (settled.ts), else measure a fresh window.
   */
  private measureOrSettle(): void {
    const s = this.s;
    if (s.t < this.swayFromS) {
      this.swayFromS = s.t;
      this.sway.fill(0);
    }
    measureSway(this.m, s, this.meanScratch, this.sway);
    if (s.t - this.swayFromS < SWAY_WINDOW_S) return;
    if (maySettle(this.m, s, this.lead, this.meanScratch, this.sway)) {
      this.settledFrom = this.snapshot();
      this.settled = settle(this.m, s, this.lead, this.meanScratch, this.sway);
    }
    else if (BENCH) settleTally[9 + settleRefusal(this.m, s, this.lead, this.meanScratch)]!++;
    this.swayFromS = Infinity;
  }

  /** Every vehicle moving, the brakes off, and the last notch change long enough ago for its surge to pass. */
  private mayRunAsOne(): boolean {
    return this.startedCount === this.m.n && this.s.t > this.brakesDoneS && this.s.t - this.notchChangedS >= SETTLE_AFTER_CHANGE_S;
  }

  /** Why the full chain runs now that every vehicle has moved (`settleTally`'s index). */
  private settleState(): number {
    if (!this.settleWhenSteady) return 0;
    if (this.s.t <= this.brakesDoneS) return 1;
    const since = this.s.t - this.notchChangedS;
    if (since < SETTLE_AFTER_CHANGE_S) return 2;
    if (since < SETTLE_AFTER_CHANGE_S + SWAY_WINDOW_S) return since < 6 ? 3 : since < 8 ? 4 : since < 10 ? 5 : 6;
    return 7;
  }

  /** Nothing moves, nothing accelerates, the effort is not changing. */
  private quiescent(): boolean {
    const s = this.s;
    for (let i = 0; i < this.m.n; i++) if (s.v[i] !== 0 || s.acc[i] !== 0) return false;
    for (let k = 0; k < this.m.nl; k++) if (Math.abs(s.targetN[k]! - s.effortN[k]!) > 1) return false;
    return true;
  }

  private afterStep(): void {
    const s = this.s;
    if (s.intervalMaxTensionN > this.seriesMaxT) this.seriesMaxT = s.intervalMaxTensionN;
    if (s.intervalMaxCompressionN > this.seriesMaxC) this.seriesMaxC = s.intervalMaxCompressionN;
    if (this.waitingCount > 0) {
      // Only the vehicles still standing are looked at; a vehicle that moves leaves the list.
      const w = this.waiting;
      for (let q = this.waitingCount - 1; q >= 0; q--) {
        const i = w[q]!;
        if (s.v[i]! > MOVING_MPS) {
          this.started[i] = 1;
          this.startedCount++;
          w[q] = w[--this.waitingCount]!;
        }
      }
      if (this.waitingCount === 0) {
        this.lastVehicleMovesS = s.t;
        this.locoTravelToStretchM = s.x[this.lead]!;
      }
    }
  }

  /** Append a sample to the series. */
  record(): void {
    const s = this.s;
    let b = this.series;
    if (b.n > 0 && b.timeS[b.n - 1] === s.t) return;
    if (b.n === b.timeS.length) b = this.series = growSeries(b);
    const k = b.n++;
    b.timeS[k] = s.t;
    b.leadSpeedMps[k] = s.v[this.lead]!;
    b.tailSpeedMps[k] = s.v[this.m.n - 1]!;
    b.notch[k] = s.notch[0] ?? 0;
    b.leadTravelM[k] = s.x[this.lead]!;
    b.maxTensionN[k] = this.seriesMaxT;
    b.maxCompressionN[k] = this.seriesMaxC;
    let e = 0;
    for (let u = 0; u < this.m.nl; u++) e += s.effortN[u]!;
    b.effortN[k] = e;
    this.seriesMaxT = 0;
    this.seriesMaxC = 0;
  }

  /** Observe, resetting the interval maxima and updating slip episodes. */
  observe(): Observation {
    const m = this.m;
    const s = this.s;
    let effort = 0;
    let target = 0;
    let slipped = false;
    for (let k = 0; k < m.nl; k++) {
      effort += s.effortN[k]!;
      target += s.targetN[k]!;
      const c = s.slipCount[k]!;
      const open = this.openEpisode[k];
      if (c === this.lastSlipCount[k]! && open && s.lastSlipT[k]! > open.endS) {
        // The protection is still holding the effort at what the rails give: the episode goes on.
        open.endS = s.lastSlipT[k]!;
        slipped = true;
      }
      if (c > this.lastSlipCount[k]!) {
        slipped = true;
        const ep = this.openEpisode[k];
        if (ep && s.t - ep.endS <= SLIP_EPISODE_GAP_S) {
          ep.endS = s.t;
          ep.cuts += c - this.lastSlipCount[k]!;
        } else {
          const fresh: SlipEpisode = { unit: k, startS: s.lastSlipT[k]!, endS: s.t, cuts: c - this.lastSlipCount[k]!, speedMps: Math.abs(s.v[m.locoVehicle[k]!]!) };
          this.episodes.push(fresh);
          this.openEpisode[k] = fresh;
        }
        this.lastSlipCount[k] = c;
      }
    }
    const obs: Observation = {
      timeS: s.t,
      leadSpeedMps: s.v[this.lead]!,
      leadTravelM: s.x[this.lead]!,
      tailTravelM: s.x[m.n - 1]!,
      tailSpeedMps: s.v[m.n - 1]!,
      allMoving: this.startedCount === m.n,
      effortN: effort,
      effortTargetN: target,
      effortSettled: Math.abs(target - effort) <= 0.05 * Math.max(target, 1),
      slipped,
      notch: s.notch[0] ?? 0,
      maxTensionN: s.intervalMaxTensionN,
      maxCompressionN: s.intervalMaxCompressionN,
    };
    s.intervalMaxTensionN = 0;
    s.intervalMaxCompressionN = 0;
    // Couplings a step leaves as they stand count in the new interval's maxima at its first step (stepActive).
    s.intervalMaxStale = true;
    return obs;
  }

  /** Slip risk of asking for `notch` at the lead unit's current speed, worst unit (median adhesion, condition's σ). */
  slipRiskOfNotch(notch: number, speedMps: number, sigmaLn: number, medianMu0: Float64Array): number {
    const m = this.m;
    let worst = 0;
    for (let k = 0; k < m.nl; k++) {
      const demand = notchTargetN(m, k, notch, speedMps);
      const mu = medianMu0[k]! * adhesionSpeedFactor(speedMps);
      const r = slipRisk(demand / m.adhesiveWeightN[k]!, mu, sigmaLn);
      if (r > worst) worst = r;
    }
    return worst;
  }

  /**
   * A deep copy that goes on with model `m`, which must be this run's model on another rail (only the
   * units' adhesion differs). Its state so far is exactly what `m` would have given when the wheel-slip
   * protection never acted in this run and `m`'s rail gives every unit at least as much: the adhesion limit
   * is the one place the rail enters the dynamics. Null otherwise.
   */
  cloneOnBetterRail(m: TrainModel): Run | null {
    if (m.n !== this.m.n || m.nl !== this.m.nl) return null;
    for (let k = 0; k < m.nl; k++) if (this.s.slipCount[k]! > 0 || !(m.mu0[k]! >= this.m.mu0[k]!)) return null;
    const r = this.clone();
    (r as { m: TrainModel }).m = m;
    return r;
  }

  /** A deep copy that can be advanced independently. */
  clone(): Run {
    const r = new Run(this.m, cloneState(this.s), this.brakes, {}, this);
    r.started = this.started.slice();
    r.waiting = this.waiting.slice();
    r.episodes = this.episodes.map((e) => ({ ...e }));
    r.lastSlipCount = this.lastSlipCount.slice();
    r.notchSeen = this.notchSeen.slice();
    r.settled = this.settled ? { ...this.settled, meanN: this.settled.meanN.slice() } : null;
    r.sway = this.sway.slice();
    r.meanScratch = this.meanScratch.slice();
    r.openEpisode = this.openEpisode.map((e) => (e ? (r.episodes[this.episodes.indexOf(e)] ?? null) : null));
    r.series = copySeries(this.series);
    return r;
  }

  /** The recorded series, trimmed. */
  seriesView(): SeriesBuffer {
    const b = this.series;
    const t = (a: Float64Array) => a.slice(0, b.n);
    return {
      n: b.n,
      timeS: t(b.timeS),
      leadSpeedMps: t(b.leadSpeedMps),
      tailSpeedMps: t(b.tailSpeedMps),
      notch: t(b.notch),
      leadTravelM: t(b.leadTravelM),
      maxTensionN: t(b.maxTensionN),
      maxCompressionN: t(b.maxCompressionN),
      effortN: t(b.effortN),
    };
  }
}

/** What a run is when the train settles, to run the settled stretch again with the full chain from. */
interface RunSnapshot {
  s: DynamicsState;
  intervals: number;
  steps: number;
  dt: number;
  stepsPerInterval: number;
  rollingStepS: number;
  brakesReleased: number;
  seriesN: number;
  seriesMaxT: number;
  seriesMaxC: number;
  episodes: SlipEpisode[];
  openEpisode: number[];
  lastSlipCount: Int32Array;
}

/** Time after k control intervals, s: k ÷ (intervals per second) when that is a whole number, so 0.1 s intervals give decimal times. */
function intervalsToS(k: number, intervalS: number): number {
  const perS = 1 / intervalS;
  return Number.isInteger(perS) ? k / perS : k * intervalS;
}

/** Effort unit k asks for in `notch` at a speed, N (before adhesion). */
export function notchTargetN(m: TrainModel, k: number, notch: number, speedMps: number): number {
  if (notch <= 0) return 0;
  const idx = k * m.notchStride + Math.min(notch, m.notchStride - 1);
  const sp = Math.max(Math.abs(speedMps), 1e-3);
  return Math.min(m.notchCurrentN[idx]!, m.notchPowerW[idx]! / sp);
}

function brakesEnd(m: TrainModel, b: BrakeSchedule): number {
  let maxDelay = 0;
  for (let i = 0; i < m.n; i++) if (m.brakeReleaseDelayS[i]! > maxDelay) maxDelay = m.brakeReleaseDelayS[i]!;
  return Math.max(b.trainBrakeReleaseS + maxDelay + m.brakeReleaseRampS, b.locoBrakeReleaseS + LOCO_BRAKE_EASE_S);
}

function emptySeries(cap: number): SeriesBuffer {
  const f = () => new Float64Array(cap);
  return { n: 0, timeS: f(), leadSpeedMps: f(), tailSpeedMps: f(), notch: f(), leadTravelM: f(), maxTensionN: f(), maxCompressionN: f(), effortN: f() };
}

function growSeries(b: SeriesBuffer): SeriesBuffer {
  const next = emptySeries(b.timeS.length * 2);
  next.n = b.n;
  for (const key of ["timeS", "leadSpeedMps", "tailSpeedMps", "notch", "leadTravelM", "maxTensionN", "maxCompressionN", "effortN"] as const) next[key].set(b[key]);
  return next;
}

function copySeries(b: SeriesBuffer): SeriesBuffer {
  return {
    n: b.n,
    timeS: b.timeS.slice(),
    leadSpeedMps: b.leadSpeedMps.slice(),
    tailSpeedMps: b.tailSpeedMps.slice(),
    notch: b.notch.slice(),
    leadTravelM: b.leadTravelM.slice(),
    maxTensionN: b.maxTensionN.slice(),
    maxCompressionN: b.maxCompressionN.slice(),
    effortN: b.effortN.slice(),
  };
}

/** Deep copy of a dynamics state (in the one shape every state has: `shapedState`). */
export function cloneState(s: DynamicsState): DynamicsState {
  const copy = shapedState(s);
  for (const key of Object.keys(s) as Array<keyof DynamicsState>) {
    const v = s[key];
    if (ArrayBuffer.isView(v)) (copy as unknown as Record<string, unknown>)[key] = (v as Float64Array).slice();
  }
  copy.takeUp = shapedTakeUp({
    ...s.takeUp,
    timeS: s.takeUp.timeS.slice(),
    coupling: s.takeUp.coupling.slice(),
    relSpeedMps: s.takeUp.relSpeedMps.slice(),
  });
  if (s.energy) {
    const e = s.energy;
    copy.energy = {
      ...e,
      lastX: e.lastX.slice(),
      lastTraction: e.lastTraction.slice(),
      lastResist: e.lastResist.slice(),
      lastBrake: e.lastBrake.slice(),
      lastGrade: e.lastGrade.slice(),
      lastExt: e.lastExt.slice(),
      lastCoupler: e.lastCoupler.slice(),
    };
  }
  return copy;
}
