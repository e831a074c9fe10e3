/**
 * Start review: a recorded start held against its plan. Plans the case, lays the recording over the plan
 * at the moment of start, fits the observed factors by re-simulation (reviewFit.ts), finds slips in the
 * traction current, and re-judges the case with the fitted factors: would the verdict have changed?
 */
import { judge, planStart, type PlanResult, type Verdict } from "../planner/index.js";
import type { LimitName } from "../planner/outcome.js";
import type { StartCase } from "../train/types.js";
import { firstReach, integratedDistanceM, interpolate, recordingProblems, startMoment, type Recording, type RecordingProblem } from "./recording.js";
import { factorCorrelation, fitFactors, INSEPARABLE_CORRELATION, ReviewRuns, scaledCase, type Factors, type FitResult, type NotchAt } from "./reviewFit.js";
import { slipsFromCurrent, type SlipFromCurrent } from "./reviewSlips.js";

/** How a start went, by the same measures for the plan and the recording (times from the moment of start). */
export interface StartMeasures {
  /** From the moment of start to the target (speed or distance), s; null when not reached. */
  timeToTargetS: number | null;
  /** Locomotive travel from the moment of start to the target, m; null when not reached. */
  distanceToTargetM: number | null;
  /** From the moment of start until the locomotive has covered the plan's travel to the stretched train, s. */
  stretchS: number | null;
}

export interface ReviewOverlay {
  /** Seconds from the moment of start (the recording's, the plan's and the fitted run's laid together). */
  timeS: number[];
  recordedSpeedMps: number[];
  plannedSpeedMps: number[];
  fittedSpeedMps: number[];
  recordedDistanceM: number[];
  plannedDistanceM: number[];
}

export interface StartReviewResult {
  plan: PlanResult;
  planned: StartMeasures;
  actual: StartMeasures;
  /** The recorded start took longer to its target than planned (null when either did not reach it). */
  tookLonger: boolean | null;
  stretchTookLonger: boolean | null;
  /** Mass factor with the units' effort as specified. */
  massFit: FitResult;
  /** Effort factor with the train's mass as on its papers (only with a logged notch). */
  effortFit: FitResult | null;
  /** Both factors together, when the recording separates them. */
  jointFit: FitResult | null;
  /**
   * Whether the recording tells mass and effort apart: null when only the mass was fitted (no notch
   * logged, so the effort the driver asked for is not known).
   */
  separable: boolean | null;
  /** Correlation of the two estimates (near ±1: only their ratio is seen). */
  correlation: number | null;
  /** The factors the re-judged verdict uses: the joint fit, else the mass fit. */
  applied: Factors;
  replanned: { verdict: Verdict; margin: number; binding: LimitName; changed: boolean };
  slips: SlipFromCurrent[];
  overlay: ReviewOverlay;
  /** Re-simulations run. */
  runs: number;
}

/** The recording cannot be reviewed: the problems say why. */
export class RecordingRejected extends Error {
  override name = "RecordingRejected";
  constructor(readonly problems: RecordingProblem[]) {
    super(problems.map((p) => p.kind).join(", "));
  }
}

/** Review a recorded start of the case. Throws RecordingRejected when the samples cannot be a start. */
export function reviewStart(c: StartCase, recording: Recording): StartReviewResult {
  const problems = recordingProblems(recording);
  if (problems.length > 0) throw new RecordingRejected(problems);
  const s = recording.samples;
  const recT = s.map((x) => x.timeS);
  const recV = s.map((x) => x.speedMps);
  const recStart = startMoment(recT, recV)!;
  const recD = s.every((x) => x.distanceM !== undefined) ? s.map((x) => x.distanceM!) : integratedDistanceM(recT, recV);

  const plan = planStart(c, { skipMassSearch: true, skipVerification: true });
  const ps = plan.series;
  const planStartS = startMoment(ps.timeS, ps.speedMps);

  const logged = recording.notchLogged;
  const planned0 = planSequence(plan);
  const powerS = planned0.find((e) => e.notch > 0)?.atS ?? 0;
  const sequence = logged ? loggedSequence(recording, powerS) : planned0;
  const fixedOffsetS = logged ? firstLoggedPowerS(recording) - powerS : null;
  const runs = new ReviewRuns({ c, recording, sequence, fixedOffsetS, recordedStartS: recStart });

  const massFit = fitFactors(runs, ["massFactor"]);
  let effortFit: FitResult | null = null;
  let jointFit: FitResult | null = null;
  let separable: boolean | null = null;
  let correlation: number | null = null;
  if (logged) {
    effortFit = fitFactors(runs, ["effortFactor"]);
    correlation = factorCorrelation(runs, { massFactor: 1, effortFactor: 1 });
    separable = Math.abs(correlation) < INSEPARABLE_CORRELATION;
    if (separable) {
      jointFit = fitFactors(runs, ["massFactor", "effortFactor"]);
      correlation = jointFit.correlation ?? correlation;
      const wide = Object.values(jointFit.estimates).some((e) => e.high - e.low > 0.5);
      if (Math.abs(correlation) >= INSEPARABLE_CORRELATION || wide) {
        separable = false;
        jointFit = null;
      }
    }
  }
  const applied = jointFit?.factors ?? { massFactor: massFit.factors.massFactor, effortFactor: 1 };
  const re = judge(scaledCase(c, applied), { depth: "full" });

  const target = c.target;
  const measure = (t: ArrayLike<number>, v: ArrayLike<number>, d: ArrayLike<number>, start: number | null): StartMeasures => {
    if (start === null) return { timeToTargetS: null, distanceToTargetM: null, stretchS: null };
    const d0 = interpolate(t, d, start);
    const reach =
      target.kind === "speed"
        ? firstReach(t, v, target.speedMps, start)
        : firstReach(
            t,
            Array.from(d, (x) => x - d0),
            target.distanceM,
            start,
          );
    const stretchM = plan.stretch.locoTravelToStretchM;
    const stretchAt = stretchM === null ? null : firstReach(t, Array.from(d, (x) => x - interpolate(t, d, t[0]!)), stretchM);
    return {
      timeToTargetS: reach === null ? null : reach - start,
      distanceToTargetM: reach === null ? null : interpolate(t, d, reach) - d0,
      stretchS: stretchAt === null ? null : Math.max(0, stretchAt - start),
    };
  };
  const planned = measure(ps.timeS, ps.speedMps, ps.locoTravelM, planStartS);
  // The plan's series ends where the plan reaches its target, which may fall between two of its samples.
  if (planned.timeToTargetS === null && plan.timeToTargetS !== null && planStartS !== null) {
    const reach = ps.timeS[ps.timeS.length - 1]!;
    planned.timeToTargetS = reach - planStartS;
    planned.distanceToTargetM = interpolate(ps.timeS, ps.locoTravelM, reach) - interpolate(ps.timeS, ps.locoTravelM, planStartS);
  }
  const actual = measure(recT, recV, recD, recStart);
  const longer = (a: number | null, b: number | null) => (a === null || b === null ? null : a > b);

  const fitted = (jointFit ?? massFit).curve;
  const fitOffset = (jointFit ?? massFit).offsetS;
  const overlay: ReviewOverlay = { timeS: [], recordedSpeedMps: [], plannedSpeedMps: [], fittedSpeedMps: [], recordedDistanceM: [], plannedDistanceM: [] };
  const from = Math.max(recT[0]!, recStart - 10);
  const planShift = (planStartS ?? 0) - recStart;
  const d0Rec = interpolate(recT, recD, recStart);
  const d0Plan = interpolate(ps.timeS, ps.locoTravelM, planStartS ?? 0);
  for (let t = from; t <= recT[recT.length - 1]! + 1e-9; t += 1) {
    overlay.timeS.push(round(t - recStart, 1));
    overlay.recordedSpeedMps.push(round(interpolate(recT, recV, t), 3));
    overlay.plannedSpeedMps.push(round(interpolate(ps.timeS, ps.speedMps, t + planShift), 3));
    overlay.fittedSpeedMps.push(round(interpolate(fitted.timeS, fitted.speedMps, t - fitOffset), 3));
    overlay.recordedDistanceM.push(round(interpolate(recT, recD, t) - d0Rec, 1));
    overlay.plannedDistanceM.push(round(interpolate(ps.timeS, ps.locoTravelM, t + planShift) - d0Plan, 1));
  }

  return {
    plan,
    planned,
    actual,
    tookLonger: longer(actual.timeToTargetS, planned.timeToTargetS),
    stretchTookLonger: longer(actual.stretchS, planned.stretchS),
    massFit,
    effortFit,
    jointFit,
    separable,
    correlation,
    applied,
    replanned: { verdict: re.verdict, margin: re.margin, binding: re.binding, changed: re.verdict !== plan.verdict },
    slips: recording.currentLogged && logged ? slipsFromCurrent(s, c.locomotives, applied.effortFactor) : [],
    overlay,
    runs: runs.count,
  };
}

/**
 * The plan's notches as a sequence in run time: its steps as the driver reads them, or — when there are no
 * steps (a plan that needs assistance) — what its series shows the planner drove.
 */
export function planSequence(plan: Pick<PlanResult, "steps" | "series">): NotchAt[] {
  if (plan.steps.length > 0) return plan.steps.map((st) => ({ notch: st.notch, atS: st.startS }));
  const series = plan.series;
  const out: NotchAt[] = [];
  for (let i = 0; i < series.timeS.length; i++) {
    const n = series.notch[i]!;
    if (out.length === 0 || out[out.length - 1]!.notch !== n) out.push({ notch: n, atS: series.timeS[i]! });
  }
  return out;
}

/** When the recording first shows a notch above idle, s of the recording. */
function firstLoggedPowerS(r: Recording): number {
  return r.samples.find((x) => (x.notch ?? 0) > 0)?.timeS ?? r.samples[0]!.timeS;
}

/** The logged notches as a sequence in run time, power taken when the plan takes it. */
function loggedSequence(r: Recording, planPowerS: number): NotchAt[] {
  const shift = planPowerS - firstLoggedPowerS(r);
  const out: NotchAt[] = [];
  for (const x of r.samples) {
    const n = x.notch ?? 0;
    if (out.length === 0 || out[out.length - 1]!.notch !== n) out.push({ notch: n, atS: x.timeS + shift });
  }
  return out;
}

function round(x: number, digits: number): number {
  const k = 10 ** digits;
  return Math.round(x * k) / k;
}
