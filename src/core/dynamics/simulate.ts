/**
 * Run the dynamics model through a control policy: brakes released on a schedule, notches chosen by a
 * controller every control interval. Records what planners, trainers and charts need: the moment the
 * last vehicle moves, coupler peaks with time and place, take-up speeds, slips, a decimated series.
 */
import { kineticEnergyJ, type DynamicsState } from "./dynamics.js";
import { Run, type Observation, type SeriesBuffer, type SlipEpisode } from "./runner.js";
import type { TrainModel } from "../train/trainModel.js";

export type { Observation, SlipEpisode } from "./runner.js";

export interface Controls {
  /** Notch for all powered units (they work in step), chosen at each control interval. */
  notch(obs: Observation): number;
  /** With several control groups: each group's notch (group 0 the head's); when given, it is what is set. */
  groupNotches?(obs: Observation): ArrayLike<number> | null;
  /** When the train brake release starts at the head, s. */
  trainBrakeReleaseS: number;
  /** When the locomotive brake is eased off, s. */
  locoBrakeReleaseS: number;
}

export interface SimulateOptions {
  durationS: number;
  dt?: number;
  controlIntervalS?: number;
  seriesIntervalS?: number;
  trackEnergy?: boolean;
  /** Stop early once this holds (checked at control intervals). */
  stopWhen?: (obs: Observation) => boolean;
  onProgress?: (fraction: number) => void;
  shouldStop?: () => boolean;
  /** Run the train as one mass while it is settled, after `fromS` (settled.ts). */
  runAsOneWhenSettled?: { fromS: number };
}

/** The decimated time series of a run. */
export type SimSeries = Omit<SeriesBuffer, "n">;

export interface SimResult {
  dt: number;
  steps: number;
  stoppedBy: "duration" | "condition" | "cancelled";
  lastVehicleMovesS: number | null;
  locoTravelToStretchM: number | null;
  peakTensionN: number;
  peakTensionAt: { coupling: number; timeS: number };
  peakCompressionN: number;
  peakCompressionAt: { coupling: number; timeS: number };
  couplerPeakTensionN: Float64Array;
  couplerPeakCompressionN: Float64Array;
  /** Fastest parting (run-out) and closing (run-in) of any coupling as it came out of the slack, m/s. */
  maxRunOutMps: number;
  maxRunInMps: number;
  takeUpEvents: Array<{ timeS: number; coupling: number; relSpeedMps: number }>;
  slipEpisodes: SlipEpisode[];
  final: { timeS: number; leadSpeedMps: number; leadTravelM: number; tailTravelM: number };
  series: SimSeries;
  state: DynamicsState;
  energy?: { tractionJ: number; resistanceJ: number; brakesJ: number; gradeJ: number; couplingJ: number; kineticJ: number };
}

/** Run the model through the controls until the duration, the stop condition or cancellation. */
export function simulate(m: TrainModel, controls: Controls, opts: SimulateOptions): SimResult {
  const runOpts: ConstructorParameters<typeof Run>[3] = { controlIntervalS: opts.controlIntervalS ?? 0.1, seriesIntervalS: opts.seriesIntervalS ?? 0.5 };
  if (opts.dt !== undefined) runOpts.dt = opts.dt;
  if (opts.trackEnergy) runOpts.trackEnergy = true;
  const run = Run.start(m, { trainBrakeReleaseS: controls.trainBrakeReleaseS, locoBrakeReleaseS: controls.locoBrakeReleaseS }, runOpts);
  return continueRun(run, controls, opts);
}

/**
 * Carry a run on through the controls until the duration (counted from the run's start), the stop
 * condition or cancellation: `simulate` from a run already advanced the way the controls would have.
 */
export function continueRun(run: Run, controls: Controls, opts: SimulateOptions): SimResult {
  const setControls = (obs: Observation) => {
    const groups = controls.groupNotches?.(obs) ?? null;
    if (groups) run.setGroupNotches(groups);
    else run.setNotch(controls.notch(obs));
  };
  setControls(run.observe());
  let stoppedBy: SimResult["stoppedBy"] = "duration";
  const intervals = Math.ceil(opts.durationS / run.controlIntervalS - 1e-9);
  const progressEvery = Math.max(1, Math.floor(intervals / 50));
  const settleFromS = opts.runAsOneWhenSettled?.fromS ?? Infinity;
  for (let k = Math.round(run.s.t / run.controlIntervalS) + 1; k <= intervals; k++) {
    if (run.s.t >= settleFromS - 1e-9) run.runAsOneWhenSettled();
    run.advanceInterval();
    const obs = run.observe();
    if (opts.stopWhen?.(obs)) {
      stoppedBy = "condition";
      break;
    }
    setControls(obs);
    if (k % progressEvery === 0) {
      opts.onProgress?.(k / intervals);
      if (opts.shouldStop?.()) {
        stoppedBy = "cancelled";
        break;
      }
    }
  }
  run.record();
  return resultOf(run, stoppedBy);
}

/** Summarise a run. */
export function resultOf(run: Run, stoppedBy: SimResult["stoppedBy"]): SimResult {
  const m = run.m;
  const s = run.s;
  let peakT = 0;
  let peakTAt = { coupling: 0, timeS: 0 };
  let peakC = 0;
  let peakCAt = { coupling: 0, timeS: 0 };
  for (let j = 0; j < m.n - 1; j++) {
    if (s.peakTensionN[j]! > peakT) {
      peakT = s.peakTensionN[j]!;
      peakTAt = { coupling: j, timeS: s.peakTensionT[j]! };
    }
    if (s.peakCompressionN[j]! > peakC) {
      peakC = s.peakCompressionN[j]!;
      peakCAt = { coupling: j, timeS: s.peakCompressionT[j]! };
    }
  }
  const log = s.takeUp;
  const view = run.seriesView();
  const result: SimResult = {
    dt: run.dt,
    steps: run.steps,
    stoppedBy,
    lastVehicleMovesS: run.lastVehicleMovesS,
    locoTravelToStretchM: run.locoTravelToStretchM,
    peakTensionN: peakT,
    peakTensionAt: peakTAt,
    peakCompressionN: peakC,
    peakCompressionAt: peakCAt,
    couplerPeakTensionN: s.peakTensionN.slice(),
    couplerPeakCompressionN: s.peakCompressionN.slice(),
    maxRunOutMps: log.maxRunOutMps,
    maxRunInMps: log.maxRunInMps,
    takeUpEvents: Array.from({ length: log.count }, (_, k) => ({ timeS: log.timeS[k]!, coupling: log.coupling[k]!, relSpeedMps: log.relSpeedMps[k]! })),
    slipEpisodes: run.episodes,
    final: { timeS: s.t, leadSpeedMps: s.v[run.lead]!, leadTravelM: s.x[run.lead]!, tailTravelM: s.x[m.n - 1]! },
    series: view,
    state: s,
  };
  if (s.energy) {
    result.energy = {
      tractionJ: s.energy.traction,
      resistanceJ: s.energy.resistance,
      brakesJ: s.energy.brakes,
      gradeJ: s.energy.grade,
      couplingJ: s.energy.coupling,
      kineticJ: kineticEnergyJ(m, s),
    };
  }
  return result;
}

/**
 * A controller that follows a fixed notch@seconds sequence; entries with `groups` set each control group's
 * notch (group 0 the head's) from then on.
 */
export function sequenceControls(seq: ReadonlyArray<{ notch: number; atS: number; groups?: ArrayLike<number> }>, brakes: { trainBrakeReleaseS: number; locoBrakeReleaseS: number }): Controls {
  const sorted = [...seq].sort((a, b) => a.atS - b.atS);
  const current = (obs: Observation) => {
    let e: (typeof sorted)[number] | null = null;
    for (const x of sorted) if (obs.timeS + 1e-9 >= x.atS) e = x;
    return e;
  };
  return {
    ...brakes,
    notch: (obs) => current(obs)?.notch ?? 0,
    groupNotches: (obs) => current(obs)?.groups ?? null,
  };
}
