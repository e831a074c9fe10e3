/**
 * The train as the dynamics loop sees it: one mass per vehicle and one connection per coupling, all
 * parameters flattened into Float64Arrays so the inner loop reads memory in order and allocates nothing.
 */
import { adhesionQuantile, standstillMedian } from "../physics/adhesion.js";
import { locoBrakeHoldingN, trainBrakeHoldingN } from "../physics/brakes.js";
import { GRAVITY_MPS2 } from "../physics/constants.js";
import { buildConsist, type Consist } from "./consist.js";
import { PRELOAD_RAMP_M, type CouplingSpec } from "../physics/coupling.js";
import { BREAKAWAY_FADE_SPEED_MPS, curveResistancePermille } from "../physics/resistance.js";
import { initialSlack } from "./slack.js";
import type { LocomotiveSpec, TrackProfile } from "../physics/types.js";
import type { SlackState, StartCase } from "./types.js";

export interface TrainModel {
  /** Vehicles, head to tail. */
  n: number;
  massKg: Float64Array;
  effMassKg: Float64Array;
  invEffMass: Float64Array;
  /** Davis terms R = a + b|v| + c v², N. */
  davisA: Float64Array;
  davisB: Float64Array;
  davisC: Float64Array;
  /** Breakaway in excess of the Davis constant term, fading out by `fadeSpeedMps`, N. */
  breakawayExcessN: Float64Array;
  fadeSpeedMps: number;
  /** Chainage of each vehicle's centre when standing, m. */
  chainage0M: Float64Array;
  lengthM: Float64Array;

  /** Couplings: `n − 1`; coupling j joins vehicles j and j + 1. */
  halfSlackM: Float64Array;
  /** Initial extension inside the slack: −half bunched, +half stretched, m. */
  ext0M: Float64Array;
  draftTravelM: Float64Array;
  draftRatedN: Float64Array;
  draftLinear: Float64Array;
  draftPreloadN: Float64Array;
  buffTravelM: Float64Array;
  buffRatedN: Float64Array;
  buffLinear: Float64Array;
  buffPreloadN: Float64Array;
  unloadRatio: Float64Array;
  transitionK: Float64Array;
  endStopK: Float64Array;
  dampingC: Float64Array;

  /** Powered units. */
  nl: number;
  locoVehicle: Int32Array;
  locoSpecs: LocomotiveSpec[];
  /** Highest notch of each unit. */
  locoNotches: Int32Array;
  /** Control group of each unit (0: the head's notch); `groupCount` groups in all. */
  unitGroup: Int32Array;
  groupCount: number;
  /** Current-limited effort per notch, N: [k·stride + notch], notch 0 = idle. */
  notchCurrentN: Float64Array;
  /** Rail power per notch, W: [k·stride + notch]. */
  notchPowerW: Float64Array;
  notchStride: number;
  /** u·m_adh·g of each unit, N: multiply by μ for the adhesion limit. */
  adhesiveWeightN: Float64Array;
  /** Adhesion coefficient at standstill this run assumes for each unit (sand included). */
  mu0: Float64Array;
  /** Time constants of the tractive-effort build-up and fall, s. */
  effortRiseS: number;
  effortFallS: number;
  /**
   * When the effort asked for exceeds what the rails give, the wheel-slip protection holds the effort at
   * this fraction of what the rails give (1: it trims the excitation to hold the effort at adhesion).
   */
  slipCutFraction: number;

  /** Brake holding capacity when fully applied, N. */
  trainBrakeN: Float64Array;
  locoBrakeN: Float64Array;
  /** Train-brake release: delay from the head to each vehicle, s. */
  brakeReleaseDelayS: Float64Array;
  brakeReleaseRampS: number;

  /** Track: segment bounds, sin θ and curve resistance per kg (N/kg). */
  segStartM: Float64Array;
  segEndM: Float64Array;
  segSin: Float64Array;
  segCurveNPerKg: Float64Array;
}

/** Options for building a model from a case. */
export interface ModelOptions {
  /** Quantile of the adhesion spread this run assumes (0.5 = median; 0.1 = the 10 % worst). */
  adhesionQuantile?: number;
  /** Override the case's slack state. */
  slackState?: SlackState;
  effortRiseS?: number;
  effortFallS?: number;
  /**
   * Train brake released in stages (graduated release, where the brake allows it): every vehicle's brake
   * eases together over the release time instead of a release running from the head to the rear.
   */
  graduatedRelease?: boolean;
}

/** Effort build-up time constant: current settles within ≈ 3τ (common practice: ≥ 2–3 s between notches) [M]. */
export const DEFAULT_EFFORT_RISE_S = 1.5;
export const DEFAULT_EFFORT_FALL_S = 0.5;
/**
 * Share of what the rails give that the wheel-slip protection holds the effort at when the notch asks for
 * more. The protection sands, cuts the excitation sharply and reapplies it, levelling off near the power at
 * which the slip began (PRACTICE.md "Wheel slip" [S: builder's maintenance manual]): on average the effort
 * stays close to what the rails give. We take it as exactly that; the small loss of each cycle is far inside
 * the scatter of adhesion itself, which the plan covers by judging the start at a pessimistic quantile [M].
 */
export const DEFAULT_SLIP_CUT = 1;
/** Brake holding forces (train 10 %, locomotive 15 % of weight by default): `physics/brakes.ts` [M]. */
export { TRAIN_BRAKE_FRACTION, DEFAULT_LOCO_BRAKE_FRACTION as LOCO_BRAKE_FRACTION } from "../physics/brakes.js";
/** A vehicle's brake releases over this time once the release reaches it, s [M]. */
export const BRAKE_RELEASE_RAMP_S = 8;

/**
 * Time for the train-brake release to reach the rear: about 1–3 minutes for 100–150 wagons (PRACTICE.md,
 * [M]); modelled as 10 s plus one second per 15 m of train.
 */
export function trainBrakeReleaseS(trainLengthM: number): number {
  return 10 + trainLengthM / 15;
}

/** Build the dynamics model of a start case. */
export function modelFromCase(c: StartCase, opts: ModelOptions = {}): TrainModel {
  const consist = buildConsist(c);
  const slack = initialSlack(consist, c.location.track, opts.slackState ?? c.train.slackState);
  const q = opts.adhesionQuantile ?? 0.5;
  const cond = c.adhesion[c.conditions.rail];
  return modelFromConsist(consist, slack, c.location.track, {
    muFor: (spec) => {
      const median = standstillMedian(cond, c.conditions.sand && spec.sanders);
      return q === 0.5 ? median : adhesionQuantile(median, cond.sigmaLn, q);
    },
    effortRiseS: opts.effortRiseS ?? DEFAULT_EFFORT_RISE_S,
    effortFallS: opts.effortFallS ?? DEFAULT_EFFORT_FALL_S,
    graduatedRelease: opts.graduatedRelease ?? false,
  });
}

export interface ConsistModelOptions {
  muFor: (spec: LocomotiveSpec) => number;
  effortRiseS: number;
  effortFallS: number;
  /** See `ModelOptions.graduatedRelease`. */
  graduatedRelease?: boolean;
}

/** Build the model from a placed consist, its initial slack signs and the track. */
export function modelFromConsist(consist: Consist, slack: Int8Array, track: TrackProfile, o: ConsistModelOptions): TrainModel {
  const vs = consist.vehicles;
  const n = vs.length;
  const nc = Math.max(0, n - 1);
  const f = (len: number) => new Float64Array(len);
  const m: TrainModel = {
    n,
    massKg: f(n),
    effMassKg: f(n),
    invEffMass: f(n),
    davisA: f(n),
    davisB: f(n),
    davisC: f(n),
    breakawayExcessN: f(n),
    fadeSpeedMps: BREAKAWAY_FADE_SPEED_MPS,
    chainage0M: f(n),
    lengthM: f(n),
    halfSlackM: f(nc),
    ext0M: f(nc),
    draftTravelM: f(nc),
    draftRatedN: f(nc),
    draftLinear: f(nc),
    draftPreloadN: f(nc),
    buffTravelM: f(nc),
    buffRatedN: f(nc),
    buffLinear: f(nc),
    buffPreloadN: f(nc),
    unloadRatio: f(nc),
    transitionK: f(nc),
    endStopK: f(nc),
    dampingC: f(nc),
    nl: consist.locoIndices.length,
    locoVehicle: Int32Array.from(consist.locoIndices),
    locoSpecs: consist.locoIndices.map((i) => vs[i]!.loco!),
    locoNotches: new Int32Array(consist.locoIndices.length),
    unitGroup: Int32Array.from(consist.unitGroup),
    groupCount: consist.controlGroups.length,
    notchCurrentN: f(0),
    notchPowerW: f(0),
    notchStride: 0,
    adhesiveWeightN: f(consist.locoIndices.length),
    mu0: f(consist.locoIndices.length),
    effortRiseS: o.effortRiseS,
    effortFallS: o.effortFallS,
    slipCutFraction: DEFAULT_SLIP_CUT,
    trainBrakeN: f(n),
    locoBrakeN: f(n),
    brakeReleaseDelayS: f(n),
    brakeReleaseRampS: o.graduatedRelease ? trainBrakeReleaseS(consist.lengthM) : BRAKE_RELEASE_RAMP_S,
    segStartM: f(track.segments.length),
    segEndM: f(track.segments.length),
    segSin: f(track.segments.length),
    segCurveNPerKg: f(track.segments.length),
  };
  const releaseS = trainBrakeReleaseS(consist.lengthM);
  const frontM = vs[0] ? vs[0].centreChainageM + vs[0].lengthM / 2 : 0;
  vs.forEach((v, i) => {
    m.massKg[i] = v.massKg;
    m.effMassKg[i] = v.effectiveMassKg;
    m.invEffMass[i] = 1 / v.effectiveMassKg;
    m.davisA[i] = v.davis.aN;
    m.davisB[i] = v.davis.bNsPerM;
    m.davisC[i] = v.davis.cNs2PerM2;
    m.breakawayExcessN[i] = Math.max(0, v.breakawayN - v.davis.aN);
    m.chainage0M[i] = v.centreChainageM;
    m.lengthM[i] = v.lengthM;
    if (v.kind === "locomotive") m.locoBrakeN[i] = locoBrakeHoldingN(v.loco!);
    else m.trainBrakeN[i] = trainBrakeHoldingN(v.massKg);
    // The release travels from the head: 0 s at the front, `releaseS` at the rear. Released in stages, every
    // brake eases together over the whole release time.
    m.brakeReleaseDelayS[i] = o.graduatedRelease || consist.lengthM <= 0 ? 0 : ((frontM - v.centreChainageM) / consist.lengthM) * (releaseS - BRAKE_RELEASE_RAMP_S);
  });
  consist.couplings.forEach((cp: CouplingSpec, j) => {
    m.halfSlackM[j] = cp.freeSlackM / 2;
    m.ext0M[j] = (slack[j]! > 0 ? 1 : -1) * (cp.freeSlackM / 2);
    m.draftTravelM[j] = cp.draft.travelM;
    m.draftRatedN[j] = cp.draft.forceAtTravelN;
    m.draftLinear[j] = cp.draft.linearShare;
    m.draftPreloadN[j] = cp.draft.preloadN ?? 0;
    m.buffTravelM[j] = cp.buff.travelM;
    m.buffRatedN[j] = cp.buff.forceAtTravelN;
    m.buffLinear[j] = cp.buff.linearShare;
    m.buffPreloadN[j] = cp.buff.preloadN ?? 0;
    m.unloadRatio[j] = cp.unloadingRatio;
    m.transitionK[j] = cp.transitionStiffnessNPerM;
    m.endStopK[j] = cp.endStopStiffnessNPerM;
    m.dampingC[j] = cp.dampingNsPerM;
  });
  const stride = 1 + Math.max(0, ...m.locoSpecs.map((s) => s.notchPower.length));
  m.notchStride = stride;
  m.notchCurrentN = f(stride * m.nl);
  m.notchPowerW = f(stride * m.nl);
  m.locoSpecs.forEach((s, k) => {
    m.locoNotches[k] = s.notchPower.length;
    for (let notch = 1; notch < stride; notch++) {
      const idx = Math.min(notch, s.notchPower.length) - 1;
      m.notchCurrentN[k * stride + notch] = s.startingTractiveEffortN * s.notchStartingEffort[idx]!;
      m.notchPowerW[k * stride + notch] = s.railPowerW * s.notchPower[idx]!;
    }
    m.adhesiveWeightN[k] = s.adhesionUtilisation * s.adhesiveMassKg * GRAVITY_MPS2;
    m.mu0[k] = o.muFor(s);
  });
  track.segments.forEach((s, k) => {
    m.segStartM[k] = k === 0 ? -Infinity : s.startM;
    m.segEndM[k] = k === track.segments.length - 1 ? Infinity : s.startM + s.lengthM;
    m.segSin[k] = Math.sin(Math.atan(s.gradePermille / 1000));
    m.segCurveNPerKg[k] = (curveResistancePermille(s.curveRadiusM) / 1000) * GRAVITY_MPS2;
  });
  return m;
}

/** The control interval: notches (and the planner's decisions) change only at its boundaries, s. */
export const CONTROL_INTERVAL_S = 0.1;

/**
 * Most accurate step a train needs while a slack run-out wave travels along it, s. Measured against a
 * 0.1 ms reference over the planner's own notch timing (tests/core/step.test.ts): trains that start with
 * metres of bunched slack (a 60-wagon ore train on a dip, 150 wagons bunched on a rise, 60 empties) take up
 * their slack at 0.3–0.5 m/s at the rear, and every coupling's peak stays within 0.5 % only at about 3 ms;
 * trains with no long run-out ahead (slack stretched or short, take-up under 0.26 m/s) keep it at 6 ms.
 */
export const RUN_OUT_STEP_S = 0.003;
/** Step for everything else: trains with no long run-out ahead, and any train once it is all moving, s. */
export const ACCURACY_STEP_S = 0.006;
/** Bunched free slack (Σ over the couplings that start bunched) above which a run-out wave needs RUN_OUT_STEP_S, m. */
export const RUN_OUT_SLACK_M = 2;

/** The integrator steps a run of this train takes, each a whole fraction of the control interval. */
export interface StepChoice {
  /** Step while the train's bunched slack runs out (until every vehicle moves), s. */
  takeUpS: number;
  /** Step once it has (and from the start when there is no long run-out), s. */
  rollingS: number;
}

/**
 * The largest steps that divide the control interval exactly, stay within the stability limit and keep
 * every coupling's peak within 0.5 % of a fine reference: chosen per train from its stiffest connection,
 * lightest vehicle and the slack it starts bunched.
 */
export function integratorSteps(m: TrainModel, controlIntervalS = CONTROL_INTERVAL_S): StepChoice {
  const stable = stabilityTimeStep(m);
  const rollingS = stepDividing(controlIntervalS, Math.min(stable, ACCURACY_STEP_S));
  const takeUpS = bunchedSlackM(m) > RUN_OUT_SLACK_M ? stepDividing(controlIntervalS, Math.min(stable, RUN_OUT_STEP_S)) : rollingS;
  return { takeUpS, rollingS };
}

/** Σ free slack of the couplings that start bunched: how far a run-out wave travels when power is taken, m. */
export function bunchedSlackM(m: TrainModel): number {
  let sum = 0;
  for (let j = 0; j < m.ext0M.length; j++) if (m.ext0M[j]! < 0) sum += 2 * m.halfSlackM[j]!;
  return sum;
}

/** The largest step ≤ `maxS` that fills `intervalS` with a whole number of steps, s. */
export function stepDividing(intervalS: number, maxS: number): number {
  return intervalS / Math.ceil(intervalS / maxS - 1e-9);
}

/**
 * One fixed step for the explicit integrator, s: the smaller of the train's two steps (for tests and tools
 * that integrate with one step throughout).
 */
export function stableTimeStep(m: TrainModel): number {
  return integratorSteps(m).takeUpS;
}

/**
 * The stability-limited step alone (margin × the leapfrog limit 2/ω), s: enough once the train is
 * stretched and rolling, when no coupling goes in or out of its slack.
 */
export function stabilityTimeStep(m: TrainModel, margin = 0.5): number {
  let kMax = 0;
  let cMax = 0;
  for (let j = 0; j < m.halfSlackM.length; j++) {
    const gearK = Math.max(
      ((2 - m.draftLinear[j]!) * m.draftRatedN[j]!) / m.draftTravelM[j]!,
      ((2 - m.buffLinear[j]!) * m.buffRatedN[j]!) / m.buffTravelM[j]!,
    );
    const preloadK = Math.max(m.draftPreloadN[j]!, m.buffPreloadN[j]!) / PRELOAD_RAMP_M;
    kMax = Math.max(kMax, gearK, preloadK, m.transitionK[j]!, m.endStopK[j]!);
    cMax = Math.max(cMax, m.dampingC[j]!);
  }
  let mMin = Infinity;
  for (let i = 0; i < m.n; i++) mMin = Math.min(mMin, m.effMassKg[i]!);
  if (kMax === 0) return 0.05;
  const omega = 2 * Math.sqrt(kMax / mMin);
  // Damping shrinks the stable step: ω·dt < 2(√(1+ζ²) − ζ), ζ = c_eff/(2 m ω) with c_eff ≤ 4c.
  const zeta = (4 * cMax) / (2 * mMin * omega);
  const limit = (2 * (Math.sqrt(1 + zeta * zeta) - zeta)) / omega;
  return margin * limit;
}

