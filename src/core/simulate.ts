/**
 * Run the dynamics model through a control policy: brakes released on a schedule, notches chosen by a
 * controller every control interval. Records what planners, trainers and charts need: the moment the
 * last vehicle moves, coupler peaks with time and place, take-up speeds, slips, a decimated series.
 */
import { applyBrakes, createState, kineticEnergyJ, step, type DynamicsState } from "./dynamics.js";
import { stableTimeStep, type TrainModel } from "./trainModel.js";

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
  /** A unit slipped within the last control interval. */
  slipped: boolean;
  notch: number;
  /** Largest coupler tension and compression since the previous observation, N. */
  maxTensionN: number;
  maxCompressionN: number;
}

export interface Controls {
  /** Notch for all powered units (they work in step), chosen at each control interval. */
  notch(obs: Observation): number;
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
}

export interface SlipEpisode {
  unit: number;
  startS: number;
  endS: number;
  /** Times the protection cut in during the episode. */
  cuts: number;
  speedMps: number;
}

export interface SimSeries {
  timeS: Float64Array;
  leadSpeedMps: Float64Array;
  tailSpeedMps: Float64Array;
  notch: Float64Array;
  leadTravelM: Float64Array;
  maxTensionN: Float64Array;
  maxCompressionN: Float64Array;
  effortN: Float64Array;
}

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

/** A vehicle counts as moving forward above this speed, m/s. */
const MOVING_MPS = 0.01;
/** Slips closer together than this belong to one episode, s. */
const SLIP_EPISODE_GAP_S = 3;

/** Run the model. */
export function simulate(m: TrainModel, controls: Controls, opts: SimulateOptions): SimResult {
  const dt = opts.dt ?? stableTimeStep(m);
  const controlEvery = Math.max(1, Math.round((opts.controlIntervalS ?? 0.1) / dt));
  const seriesEvery = Math.max(1, Math.round((opts.seriesIntervalS ?? 0.5) / dt));
  const totalSteps = Math.ceil(opts.durationS / dt - 1e-9);
  const s = createState(m, opts.trackEnergy ? { trackEnergy: true } : {});
  const lead = m.nl > 0 ? m.locoVehicle[0]! : 0;
  const tail = m.n - 1;
  const started = new Uint8Array(m.n);
  let startedCount = 0;
  let lastVehicleMovesS: number | null = null;
  let locoTravelToStretchM: number | null = null;
  const brakesDoneS = Math.max(
    controls.trainBrakeReleaseS + maxOf(m.brakeReleaseDelayS) + m.brakeReleaseRampS,
    controls.locoBrakeReleaseS + 3,
  );

  const cap = Math.floor(totalSteps / seriesEvery) + 2;
  const series: SimSeries = {
    timeS: new Float64Array(cap),
    leadSpeedMps: new Float64Array(cap),
    tailSpeedMps: new Float64Array(cap),
    notch: new Float64Array(cap),
    leadTravelM: new Float64Array(cap),
    maxTensionN: new Float64Array(cap),
    maxCompressionN: new Float64Array(cap),
    effortN: new Float64Array(cap),
  };
  let nSeries = 0;
  let seriesMaxT = 0;
  let seriesMaxC = 0;
  const record = () => {
    series.timeS[nSeries] = s.t;
    series.leadSpeedMps[nSeries] = s.v[lead]!;
    series.tailSpeedMps[nSeries] = s.v[tail]!;
    series.notch[nSeries] = s.notch[0] ?? 0;
    series.leadTravelM[nSeries] = s.x[lead]!;
    series.maxTensionN[nSeries] = seriesMaxT;
    series.maxCompressionN[nSeries] = seriesMaxC;
    let e = 0;
    for (let k = 0; k < m.nl; k++) e += s.effortN[k]!;
    series.effortN[nSeries] = e;
    nSeries++;
    seriesMaxT = 0;
    seriesMaxC = 0;
  };

  const episodes: SlipEpisode[] = [];
  const lastCount = new Int32Array(m.nl);
  const openEpisode: Array<SlipEpisode | null> = Array.from({ length: m.nl }, () => null);
  const observe = (): Observation => {
    let effort = 0;
    let target = 0;
    let slipped = false;
    for (let k = 0; k < m.nl; k++) {
      effort += s.effortN[k]!;
      target += s.targetN[k]!;
      const c = s.slipCount[k]!;
      if (c > lastCount[k]!) {
        slipped = true;
        const ep = openEpisode[k];
        if (ep && s.t - ep.endS <= SLIP_EPISODE_GAP_S) {
          ep.endS = s.t;
          ep.cuts += c - lastCount[k]!;
        } else {
          const fresh: SlipEpisode = { unit: k, startS: s.lastSlipT[k]!, endS: s.t, cuts: c - lastCount[k]!, speedMps: Math.abs(s.v[m.locoVehicle[k]!]!) };
          episodes.push(fresh);
          openEpisode[k] = fresh;
        }
        lastCount[k] = c;
      }
    }
    const obs: Observation = {
      timeS: s.t,
      leadSpeedMps: s.v[lead]!,
      leadTravelM: s.x[lead]!,
      tailTravelM: s.x[tail]!,
      tailSpeedMps: s.v[tail]!,
      allMoving: startedCount === m.n,
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
    return obs;
  };

  applyBrakes(m, s, controls.trainBrakeReleaseS, controls.locoBrakeReleaseS);
  s.notch.fill(clampNotch(controls.notch(observe()), m));
  record();
  let stoppedBy: SimResult["stoppedBy"] = "duration";
  let steps = 0;
  const progressEvery = Math.max(1, Math.floor(totalSteps / 50));
  for (; steps < totalSteps; ) {
    if (s.t <= brakesDoneS) applyBrakes(m, s, controls.trainBrakeReleaseS, controls.locoBrakeReleaseS);
    step(m, s, dt);
    steps++;
    if (s.intervalMaxTensionN > seriesMaxT) seriesMaxT = s.intervalMaxTensionN;
    if (s.intervalMaxCompressionN > seriesMaxC) seriesMaxC = s.intervalMaxCompressionN;
    if (startedCount < m.n) {
      for (let i = 0; i < m.n; i++) {
        if (started[i] === 0 && s.v[i]! > MOVING_MPS) {
          started[i] = 1;
          startedCount++;
        }
      }
      if (startedCount === m.n) {
        lastVehicleMovesS = s.t;
        locoTravelToStretchM = s.x[lead]!;
      }
    }
    if (steps % seriesEvery === 0) record();
    if (steps % controlEvery === 0) {
      const obs = observe();
      if (opts.stopWhen?.(obs)) {
        stoppedBy = "condition";
        break;
      }
      s.notch.fill(clampNotch(controls.notch(obs), m));
    }
    if (steps % progressEvery === 0) {
      opts.onProgress?.(steps / totalSteps);
      if (opts.shouldStop?.()) {
        stoppedBy = "cancelled";
        break;
      }
    }
  }
  observe(); // close slip episodes
  if (steps % seriesEvery !== 0) record();

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
  const trim = (a: Float64Array) => a.slice(0, nSeries);
  const log = s.takeUp;
  const result: SimResult = {
    dt,
    steps,
    stoppedBy,
    lastVehicleMovesS,
    locoTravelToStretchM,
    peakTensionN: peakT,
    peakTensionAt: peakTAt,
    peakCompressionN: peakC,
    peakCompressionAt: peakCAt,
    couplerPeakTensionN: s.peakTensionN.slice(),
    couplerPeakCompressionN: s.peakCompressionN.slice(),
    maxRunOutMps: log.maxRunOutMps,
    maxRunInMps: log.maxRunInMps,
    takeUpEvents: Array.from({ length: log.count }, (_, k) => ({ timeS: log.timeS[k]!, coupling: log.coupling[k]!, relSpeedMps: log.relSpeedMps[k]! })),
    slipEpisodes: episodes,
    final: { timeS: s.t, leadSpeedMps: s.v[lead]!, leadTravelM: s.x[lead]!, tailTravelM: s.x[tail]! },
    series: {
      timeS: trim(series.timeS),
      leadSpeedMps: trim(series.leadSpeedMps),
      tailSpeedMps: trim(series.tailSpeedMps),
      notch: trim(series.notch),
      leadTravelM: trim(series.leadTravelM),
      maxTensionN: trim(series.maxTensionN),
      maxCompressionN: trim(series.maxCompressionN),
      effortN: trim(series.effortN),
    },
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
  opts.onProgress?.(1);
  return result;
}

function clampNotch(n: number, m: TrainModel): number {
  const max = m.notchStride - 1;
  return n < 0 ? 0 : n > max ? max : Math.round(n);
}

function maxOf(a: Float64Array): number {
  let x = 0;
  for (let i = 0; i < a.length; i++) if (a[i]! > x) x = a[i]!;
  return x;
}

/** A controller that follows a fixed notch@seconds sequence. */
export function sequenceControls(seq: ReadonlyArray<{ notch: number; atS: number }>, brakes: { trainBrakeReleaseS: number; locoBrakeReleaseS: number }): Controls {
  const sorted = [...seq].sort((a, b) => a.atS - b.atS);
  return {
    ...brakes,
    notch(obs) {
      let n = 0;
      for (const e of sorted) if (obs.timeS + 1e-9 >= e.atS) n = e.notch;
      return n;
    },
  };
}
