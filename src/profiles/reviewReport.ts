/**
 * A Start review in the output shape (units in field names; the fitted factors named with `Factor`, each
 * with a 95 % interval) and in words: the words of the review, shared by `taut review` and the app's Start
 * review place, live here.
 */
import type { FactorEstimate, StartReviewResult } from "../core/dispatch/index.js";
import { LIMIT_WORDS } from "../core/planner/outcome.js";
import type { ReadRecording } from "./recording.js";
import { fixedText } from "./numbers.js";

const num = (x: number | null | undefined, decimals = 0): string => (x === null || x === undefined || !Number.isFinite(x) ? "—" : fixedText(x, decimals));

export interface FactorJson {
  value: number;
  /** 95 % interval. */
  low: number;
  high: number;
}

export interface ReviewReport {
  schema: "taut/review@1";
  recording: { kind: "gpx" | "csv"; samples: number; duration_s: number; notchLogged: boolean; currentLogged: boolean; notices: string[] };
  planned: { verdict: string; timeToTarget_s: number | null; distanceToTarget_m: number | null; stretch_s: number | null };
  actual: { timeToTarget_s: number | null; distanceToTarget_m: number | null; stretch_s: number | null };
  tookLonger: boolean | null;
  stretchTookLonger: boolean | null;
  /** The train behaved as if this much heavier (the units' effort as specified). */
  massFactor: FactorJson;
  /** The units gave this share of their effort (the train's mass as on its papers); null without a logged notch. */
  effortFactor: FactorJson | null;
  /** Both together, when the recording tells them apart. */
  jointFit: { massFactor: FactorJson; effortFactor: FactorJson } | null;
  separable: boolean | null;
  correlation: number | null;
  fit: { rms_kmh: number; samples: number; runs: number };
  replanned: { massFactor: number; effortFactor: number; verdict: string; margin: number; binding: string; verdictChanged: boolean };
  slips: Array<{ start_s: number; end_s: number; notch: number; speed_kmh: number; currentBefore_A: number; currentLowest_A: number; adhesionDemand: number }>;
  summary: string[];
  series?: { time_s: number[]; recordedSpeed_kmh: number[]; plannedSpeed_kmh: number[]; fittedSpeed_kmh: number[]; recordedDistance_m: number[]; plannedDistance_m: number[] };
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const r3 = (x: number) => Math.round(x * 1000) / 1000;
const orNull = (x: number | null, f: (x: number) => number) => (x === null ? null : f(x));
const factor = (e: FactorEstimate): FactorJson => ({ value: r3(e.value), low: r3(e.low), high: r3(e.high) });
const pct = (f: number) => `${Math.abs(Math.round((f - 1) * 100))} %`;

/** Express a review with units in names. */
export function reviewReport(r: StartReviewResult, read: ReadRecording, series: boolean): ReviewReport {
  const s = read.recording.samples;
  const best = r.jointFit ?? r.massFit;
  const report: ReviewReport = {
    schema: "taut/review@1",
    recording: { kind: read.kind, samples: s.length, duration_s: r1(s[s.length - 1]!.timeS - s[0]!.timeS), notchLogged: read.recording.notchLogged, currentLogged: read.recording.currentLogged, notices: read.notices },
    planned: { verdict: r.plan.verdict, timeToTarget_s: orNull(r.planned.timeToTargetS, r1), distanceToTarget_m: orNull(r.planned.distanceToTargetM, r1), stretch_s: orNull(r.planned.stretchS, r1) },
    actual: { timeToTarget_s: orNull(r.actual.timeToTargetS, r1), distanceToTarget_m: orNull(r.actual.distanceToTargetM, r1), stretch_s: orNull(r.actual.stretchS, r1) },
    tookLonger: r.tookLonger,
    stretchTookLonger: r.stretchTookLonger,
    massFactor: factor(r.massFit.estimates.massFactor!),
    effortFactor: r.effortFit ? factor(r.effortFit.estimates.effortFactor!) : null,
    jointFit: r.jointFit ? { massFactor: factor(r.jointFit.estimates.massFactor!), effortFactor: factor(r.jointFit.estimates.effortFactor!) } : null,
    separable: r.separable,
    correlation: r.correlation === null ? null : r3(r.correlation),
    fit: { rms_kmh: r3(best.rmsMps * 3.6), samples: best.samples, runs: r.runs },
    replanned: { massFactor: r3(r.applied.massFactor), effortFactor: r3(r.applied.effortFactor), verdict: r.replanned.verdict, margin: r3(r.replanned.margin), binding: r.replanned.binding, verdictChanged: r.replanned.changed },
    slips: r.slips.map((e) => ({ start_s: r1(e.startS), end_s: r1(e.endS), notch: e.notch, speed_kmh: r1(e.speedMps * 3.6), currentBefore_A: Math.round(e.currentBeforeA), currentLowest_A: Math.round(e.currentLowestA), adhesionDemand: r3(e.adhesionDemand) })),
    summary: reviewSummary(r),
  };
  if (series) {
    const o = r.overlay;
    const kmh = (xs: number[]) => xs.map((v) => Math.round(v * 360) / 100);
    report.series = { time_s: o.timeS, recordedSpeed_kmh: kmh(o.recordedSpeedMps), plannedSpeed_kmh: kmh(o.plannedSpeedMps), fittedSpeed_kmh: kmh(o.fittedSpeedMps), recordedDistance_m: o.recordedDistanceM, plannedDistance_m: o.plannedDistanceM };
  }
  return report;
}

export const VERDICT_WORDS: Record<string, string> = { starts: "starts", marginal: "marginal", "needs-assistance": "needs assistance" };

/** What the review says, one sentence each (the text output and the JSON `summary`). */
export function reviewSummary(r: StartReviewResult): string[] {
  const out: string[] = [];
  const m = r.massFit.estimates.massFactor!;
  const interval = (e: FactorEstimate) => `${num(e.low, 2)}–${num(e.high, 2)}`;
  out.push(`The train behaved as if ${pct(m.value)} ${m.value >= 1 ? "heavier" : "lighter"} than planned: mass factor ${num(m.value, 2)} (95 % interval ${interval(m)}), with the units' effort as specified.`);
  if (r.effortFit) {
    const e = r.effortFit.estimates.effortFactor!;
    out.push(`With the train's mass as planned, the units gave ${num(e.value * 100, 0)} % of their effort: effort factor ${num(e.value, 2)} (${interval(e)}).`);
    if (r.jointFit) {
      const jm = r.jointFit.estimates.massFactor!;
      const je = r.jointFit.estimates.effortFactor!;
      out.push(`The recording separates the two: together, mass factor ${num(jm.value, 2)} (${interval(jm)}) and effort factor ${num(je.value, 2)} (${interval(je)}).`);
    } else {
      out.push(`The recording cannot tell a heavier train from weaker units (they move the speed curve alike; correlation ${num(r.correlation ?? 1, 2)}): either explanation fits, and Taut does not choose between them.`);
    }
  } else {
    out.push("No notch was logged, so the driver is taken to have followed the plan's notches; the units' effort cannot be fitted.");
  }
  const p = r.planned;
  const a = r.actual;
  if (p.timeToTargetS !== null && a.timeToTargetS !== null) {
    out.push(`From the moment of start to the target: ${num(a.timeToTargetS, 0)} s and ${num(a.distanceToTargetM!, 0)} m recorded, ${num(p.timeToTargetS, 0)} s and ${num(p.distanceToTargetM!, 0)} m planned${r.tookLonger ? " — it took longer than planned" : ""}.`);
  } else if (a.timeToTargetS === null) out.push("The recording does not reach the case's target.");
  else out.push(`The recording reaches the target ${num(a.timeToTargetS, 0)} s after the moment of start; the plan does not reach it.`);
  if (p.stretchS !== null && a.stretchS !== null && p.stretchS < 0.5 && a.stretchS < 0.5) {
    out.push("The slack was out before the speed reached 2 km/h, in the plan and in the recording.");
  } else if (p.stretchS !== null && a.stretchS !== null) {
    out.push(`The locomotive covered the plan's travel to the stretched train in ${num(a.stretchS, 0)} s (planned ${num(p.stretchS, 0)} s)${r.stretchTookLonger ? ": the stretch took longer than planned" : ""}.`);
  }
  for (const s of r.slips) {
    out.push(`Slip at ${num(s.startS, 0)}–${num(s.endS, 0)} s in notch ${s.notch} (${num(s.speedMps * 3.6, 1)} km/h): the current fell from ${Math.round(s.currentBeforeA)} A to ${Math.round(s.currentLowestA)} A while the notch held. The rail gave less than the adhesion the notch asked, ${num(s.adhesionDemand, 2)}.`);
  }
  const re = r.replanned;
  const used = r.jointFit ? "both fitted factors" : `the mass factor ${num(r.applied.massFactor, 2)}`;
  out.push(
    re.changed
      ? `Re-planned with ${used}, the verdict changes: ${VERDICT_WORDS[r.plan.verdict]} → ${VERDICT_WORDS[re.verdict]} (margin ${num(re.margin, 2)}, ${LIMIT_WORDS[re.binding]}).`
      : `Re-planned with ${used}, the verdict stays ${VERDICT_WORDS[re.verdict]} (margin ${num(re.margin, 2)}, ${LIMIT_WORDS[re.binding]}).`,
  );
  return out;
}

